package eval

import (
	"math"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// bearingInput builds the engine input shared by bearing and capacity
// blocks: ground, footing, actions (with self-weight when asked) and the
// bearing options.
func (e *evaluator) bearingInput(s *Sheet, b *sheet.Analysis, blk *Block, o opts, methodKey string) (bearing.Input, bool) {
	in := bearing.Input{Ground: blk.On.Model, Footing: blk.Of.Model, Actions: withSelfWeight(blk.Of, blk.On)}
	blk.selfWeight()
	ok := true
	if d := o.word("drainage", ""); d != "" {
		in.Options.Drainage, _ = bearing.ParseDrainage(d)
	}
	in.Options.Method, _ = bearing.ParseMethod(o.word(methodKey, "ec7"))
	in.Options.LocalShear, _ = bearing.ParseSwitch(o.word("local_shear", "auto"))
	if w := o.word("sliding", ""); w != "" {
		in.Options.Sliding, _ = bearing.ParseSwitch(w)
	}
	in.Options.TwoLayer, _ = bearing.ParseSwitch(o.word("two_layer", "auto"))
	switch o.word("interface", "") {
	case "precast":
		in.Options.Interface.KDelta = 2.0 / 3
	case "cast":
		in.Options.Interface.KDelta = 1 // given: not printed as assumed
	}
	if x := o["delta"]; x != nil {
		q, qok := e.quantity(scope{e: e, s: s}, x, units.Angle, "an angle")
		ok = ok && qok
		in.Options.Interface.Delta = site.Some(q.V)
	}
	var spread site.Opt
	for _, x := range []struct {
		name string
		dst  *site.Opt
	}{{"K_s", &in.Options.Ks}, {"r_a", &in.Options.CaRatio}, {"spread", &spread}} {
		if opt := o[x.name]; opt != nil {
			q, qok := e.quantity(scope{e: e, s: s}, opt, units.None, "a pure number")
			ok = ok && qok
			*x.dst = site.Some(q.V)
		}
	}
	if spread.Set {
		in.Options.SpreadTan = spread.V
		if !(spread.V > 0) {
			e.errs.Add(o["spread"].Value.Span, "spread = %s: expected a gradient more than 0 and at most 1 (horizontal per vertical)", o["spread"].Value.Value)
			ok = false
		}
	}
	in.Options.FSOnGross = o.word("fs_on", "net") == "gross"
	ap, aok := e.approach(s, o)
	in.Options.Approach = ap
	return in, ok && aok
}

// approach reads the approach option against the partial-factor sets in
// force (EN 1997-1 recommended, or the package's factors file).
func (e *evaluator) approach(s *Sheet, o opts) (design.Approach, bool) {
	annex, ok := e.annex(s)
	if !ok {
		return design.Approach{}, false
	}
	x := o["approach"]
	if x == nil {
		ap, err := annex.Lookup("DA1")
		if err != nil {
			e.errs.Add(s.Meta.Factors.Span, "the partial-factor file has no DA1, the default approach: %v", err)
			return ap, false
		}
		return ap, true
	}
	ap, err := annex.Lookup(x.Value.Value)
	if err != nil {
		e.errs.Add(x.Value.Span, "approach %s: %v", x.Value.Value, err)
		return ap, false
	}
	return ap, true
}

// withSelfWeight returns the footing's actions, adding its own weight and
// the backfill over it as a permanent action when self_weight = auto
// (see selfWeight).
func withSelfWeight(f *Footing, g *Ground) []site.Action {
	acts := append([]site.Action(nil), f.Actions...)
	if !f.SelfWeight {
		return acts
	}
	var tr trace.Trace
	w := selfWeight(f, g, &tr)
	return append([]site.Action{{Name: "Self weight and backfill", Kind: site.Permanent, V: w}}, acts...)
}

// selfWeight is the weight self_weight = auto adds (N, or N/m for a
// strip), worked out by the engine (design.Weight) with its working
// recorded in tr. 0 and no steps when self_weight is not auto (or the
// footing's values were refused, which is reported at the footing).
func selfWeight(f *Footing, g *Ground, tr *trace.Trace) float64 {
	if !f.SelfWeight {
		return 0
	}
	in := design.SelfWeight{Footing: f.Model, Ground: g.Model}
	if f.GammaCGiven {
		in.GammaC = site.Some(f.GammaC)
	}
	if f.HGiven {
		in.H = site.Some(f.H)
	}
	var t trace.Trace
	w, err := design.Weight(in, &t)
	if err != nil {
		return 0
	}
	*tr = t
	return w
}

// SelfWeightOn is the weight withSelfWeight adds (N, or N/m for a
// strip); 0 when self_weight is not auto.
func (f *Footing) SelfWeightOn(g *Ground) float64 {
	var tr trace.Trace
	return selfWeight(f, g, &tr)
}

// Resultant is the sum of the footing's characteristic actions as the
// engine takes them on ground g (site.Sum), with the self-weight
// self_weight = auto adds; w is that self-weight (0 when none). A nil g
// sums the actions as given.
func (f *Footing) Resultant(g *Ground) (sum site.Action, w float64) {
	if g == nil {
		return site.Sum(f.Actions), 0
	}
	return site.Sum(withSelfWeight(f, g)), f.SelfWeightOn(g)
}

// bearing runs the bearing engine for a block.
func (e *evaluator) bearing(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	in, ok := e.bearingInput(s, b, blk, o, "method")
	if !ok {
		return false
	}
	res, err := bearing.Check(in)
	if err != nil {
		e.siteErrors(err, headerSpan(b.Span), func(_ int, param string) source.Span {
			if x := o[param]; x != nil && x.Value.Span.File != nil {
				return x.Value.Span // an option the engine refused
			}
			return headerSpan(b.Span)
		})
		return false
	}
	blk.Bearing = res
	blk.Cautions = res.Trace.Cautions
	blk.Sources = res.Trace.Sources
	e.defineResults(s, blk, res.Values)
	if res.Governing >= 0 {
		c := res.Cases[res.Governing]
		fu := units.MustParse(in.Footing.ForceUnit())
		ch := e.addCheck(s, blk, blk.Name+" bearing: V_d <= R_d", "<=",
			units.Quantity{V: c.V, Dim: fu.Dim}, units.Quantity{V: c.R, Dim: fu.Dim}, fu, c.Util, c.OK,
			"bearing resistance, governing case: "+c.Name)
		if res.Unverified != "" {
			ch.unverified(res.Unverified, res.Unverified)
		}
	} else if res.Unverified != "" {
		// every load lifts the base: the check that fails is V_d > 0
		fu := units.MustParse(in.Footing.ForceUnit())
		c := e.addCheck(s, blk, blk.Name+" bearing: V_d > 0", ">",
			units.Quantity{V: res.UpliftV, Dim: fu.Dim}, units.Quantity{Dim: fu.Dim}, fu, math.NaN(), false, res.Unverified)
		c.unverified(res.Unverified, res.Unverified)
	}
	if res.GoverningSliding >= 0 {
		c := res.Sliding[res.GoverningSliding]
		fu := units.MustParse(in.Footing.ForceUnit())
		e.addCheck(s, blk, blk.Name+" sliding: H_d_h <= R_h_d", "<=",
			units.Quantity{V: c.H, Dim: fu.Dim}, units.Quantity{V: c.R, Dim: fu.Dim}, fu, c.Util, c.OK,
			"sliding resistance, governing case: "+c.Name)
	}
	return true
}
