package eval

import (
	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
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
	in := platform.Input{D: site.Some(D)}
	top, sub := g.Layers[0], g.Layers[1]
	in.Platform = platform.Platform{Phi: top.Phi.V, Gamma: top.Gamma}
	if sub.Fine() {
		in.Subgrade = platform.Subgrade{Kind: platform.Cohesive, Cu: sub.Cu.V, Gamma: sub.Gamma}
	} else {
		in.Subgrade = platform.Subgrade{Kind: platform.Granular, Phi: sub.Phi.V, Gamma: sub.Gamma}
	}
	var mat *platform.MatResult
	var qAllow float64 // the allowable pressure under the mat, as given
	if F, has := opt("outrigger", units.Force, "a force"); has {
		for _, n := range []string{"track_width", "track_length", "q1", "q2", "factor2"} {
			if x := o[n]; x != nil {
				e.errs.Add(x.Name.Span, "%s is an option of a track; with outrigger the mat's pressure is the loading case", n)
				ok = false
			}
		}
		mi := platform.MatInput{Name: blk.Name, F: F, Plan: platform.MatSquare, Z: site.Some(D)}
		mi.QAllow = need("allowable", units.Pressure, "a pressure")
		qAllow = mi.QAllow
		if b, has := opt("mat_width", units.Length, "a length"); has {
			mi.B = b
		} else {
			mi.Step = 0.05 // a sized mat on the size block's increment (README)
		}
		if l, has := opt("mat_length", units.Length, "a length"); has {
			mi.Plan, mi.L = platform.MatFixedL, l
		}
		if !ok {
			return false
		}
		mr, err := platform.Mat(mi)
		if err != nil {
			e.siteErrors(err, hdr, func(_ int, param string) source.Span {
				names := map[string]string{"F": "outrigger", "q_a": "allowable", "B": "mat_width", "L": "mat_length"}
				if x := o[names[param]]; x != nil && x.Value.Span.File != nil {
					return x.Value.Span
				}
				return hdr
			})
			return false
		}
		mat = mr
		c1 := mr.Case("Outrigger on the mat", platform.Case1)
		if f, has := opt("factor1", units.None, "a pure number"); has {
			c1.Factor = f
		}
		in.Cases = append(in.Cases, c1)
	} else {
		if x := o["allowable"]; x != nil {
			e.errs.Add(x.Name.Span, "allowable is the mat's allowable pressure, which needs outrigger")
			ok = false
		}
		W := need("track_width", units.Length, "a length")
		L := need("track_length", units.Length, "a length")
		q1 := need("q1", units.Pressure, "a pressure")
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
	blk.Mat = mat
	blk.Cautions = r.Trace.Cautions
	blk.Sources = r.Trace.Sources
	vals := r.Values
	if mat != nil {
		blk.Cautions = append(append([]trace.Caution(nil), mat.Trace.Cautions...), blk.Cautions...)
		blk.Sources = mergeSources(mat.Trace.Sources, blk.Sources)
		for _, v := range mat.Values {
			if v.Symbol == "W_m" {
				continue // no self-weight of the mat is taken (none given)
			}
			if v.Symbol == "util" {
				v.Symbol = "util_mat" // a utilisation: two decimals, never rounded onto 1
			} else {
				v.Symbol = "mat_" + v.Symbol
			}
			vals = append(vals, v)
		}
	}
	e.defineResults(s, blk, vals)
	if mat != nil {
		e.addCheck(s, blk, blk.Name+" mat: mat_q <= q_a", "<=", units.Quantity{V: mat.Q, Dim: units.Pressure}, units.Quantity{V: qAllow, Dim: units.Pressure},
			units.MustParse("kPa"), mat.Util, mat.OK, "outrigger mat pressure against the allowable bearing pressure")
	}
	gov := r.Cases[r.Governing]
	kPa := units.MustParse("kPa")
	e.addCheck(s, blk, blk.Name+" platform: q_d <= R_d", "<=", units.Quantity{V: gov.QD, Dim: units.Pressure}, units.Quantity{V: gov.Rd, Dim: units.Pressure},
		kPa, gov.Util, r.OK, "BR 470 punching through the platform into the subgrade, governing: "+gov.Name)
	return true
}
