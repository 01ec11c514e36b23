package eval

import (
	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// PlatformResult is a platform block's design.
type PlatformResult = platform.Result

// platformBlock designs the working platform the ground model states
// (platform = yes: its first layer over the second, the subgrade) by
// BR 470: the stated thickness checked, the thickness required beside it.
func (e *evaluator) platformBlock(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	hdr := headerSpan(b.Span)
	g := blk.On.Model
	D, has := g.PlatformDepth()
	if !has {
		e.errs.AddHint(b.Ground.Span, "add platform = yes to ground "+blk.On.Name+" with the platform's granular layer first", "ground %s states no working platform", blk.On.Name)
		return false
	}
	sc := scope{e: e, s: s}
	ok := true
	need := func(name string, d units.Dim, what string) float64 {
		x := o[name]
		if x == nil {
			e.errs.AddHint(hdr, "add a line "+name+" = …", "a platform block needs %s (%s)", name, what)
			ok = false
			return 0
		}
		q, qok := e.quantity(sc, x, d, what)
		ok = ok && qok
		return q.V
	}
	opt := func(name string, d units.Dim, what string) (float64, bool) {
		x := o[name]
		if x == nil {
			return 0, false
		}
		q, qok := e.quantity(sc, x, d, what)
		ok = ok && qok
		return q.V, true
	}
	W := need("track_width", units.Length, "a length")
	L := need("track_length", units.Length, "a length")
	q1 := need("q1", units.Pressure, "a pressure")
	in := platform.Input{D: site.Some(D)}
	top, sub := g.Layers[0], g.Layers[1]
	in.Platform = platform.Platform{Phi: top.Phi.V, Gamma: top.Gamma}
	if sub.Fine() {
		in.Subgrade = platform.Subgrade{Kind: platform.Cohesive, Cu: sub.Cu.V, Gamma: sub.Gamma}
	} else {
		in.Subgrade = platform.Subgrade{Kind: platform.Granular, Phi: sub.Phi.V, Gamma: sub.Gamma}
	}
	c1 := platform.Case{Kind: platform.Case1, Q: q1, W: W, L: L}
	if f, has := opt("factor1", units.None, "a pure number"); has {
		c1.Factor = f
	}
	in.Cases = append(in.Cases, c1)
	if q2, has := opt("q2", units.Pressure, "a pressure"); has {
		c2 := platform.Case{Kind: platform.Case2, Q: q2, W: W, L: L}
		if f, has := opt("factor2", units.None, "a pure number"); has {
			c2.Factor = f
		}
		in.Cases = append(in.Cases, c2)
	} else if x := o["factor2"]; x != nil {
		e.errs.Add(x.Name.Span, "factor2 is the load factor of case 2, which needs q2")
		ok = false
	}
	if k, has := opt("kp_tan_delta", units.None, "a pure number"); has {
		in.Options.KpTanDelta = site.Some(k)
	}
	in.Options.EC7.Off = o.word("comparison", "yes") == "no"
	if !ok {
		return false
	}
	r, err := platform.Design(in)
	if err != nil {
		e.siteErrors(err, hdr, func(_ int, param string) source.Span {
			names := map[string]string{"W": "track_width", "L": "track_length", "q_k": "q1", "K_p_tan_delta": "kp_tan_delta"}
			for _, n := range []string{names[param], param} {
				if x := o[n]; x != nil && x.Value.Span.File != nil {
					return x.Value.Span
				}
			}
			return hdr
		})
		return false
	}
	blk.Platform = r
	blk.Cautions = r.Trace.Cautions
	blk.Sources = r.Trace.Sources
	e.defineResults(s, blk, r.Values)
	gov := r.Cases[r.Governing]
	kPa := units.MustParse("kPa")
	e.addCheck(s, blk, blk.Name+" platform: q_d <= R_d", "<=", units.Quantity{V: gov.QD, Dim: units.Pressure}, units.Quantity{V: gov.Rd, Dim: units.Pressure},
		kPa, gov.Util, r.OK, "BR 470 punching through the platform into the subgrade, governing: "+gov.Name)
	return true
}
