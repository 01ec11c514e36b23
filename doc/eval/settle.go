package eval

import (
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/capacity"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// SettleResult is a settlement block's result: the serviceability load
// (with its working in Load) and the engine's calculation.
type SettleResult struct {
	Service design.Service
	Load    trace.Trace // the serviceability combination
	*settle.Result
	Tilt   *settle.Tilt   // tilt = yes: the tilt under the SLS moment
	Within *settle.Within // within = yes: centre against corner
}

// CapacityResult is a capacity block's table.
type CapacityResult = capacity.Result

// settleInput reads the settlement options shared by settlement and
// capacity blocks.
func (e *evaluator) settleInput(s *Sheet, blk *Block, o opts, methodKey string) (settle.Input, bool) {
	in := settle.Input{Ground: blk.On.Model, Footing: blk.Of.Model}
	ok := true
	sc := scope{e: e, s: s}
	if m := o.word(methodKey, ""); m != "" {
		in.Method, _ = settle.ParseMethod(m)
	}
	in.Stress, _ = stress.ParseMethod(o.word("stress", "boussinesq"))
	in.At, _ = stress.ParsePoint(o.word("at", "centre"))
	in.Rigid = o.word("rigid", "no") == "yes"
	if x := o["limit"]; x != nil {
		q, qok := e.quantity(sc, x, units.Length, "a settlement limit")
		ok = ok && qok
		in.Limit = optOf(q.V)
	}
	if x := o["times"]; x != nil {
		ts, tok := e.list(sc, x, units.Time, "a time")
		ok = ok && tok
		for _, t := range ts {
			in.Times = append(in.Times, t.V)
		}
	}
	if x := o["sublayers"]; x != nil {
		n, err := strconv.Atoi(x.Value.Value)
		if err != nil || n < 1 || n > 5000 {
			e.errs.Add(x.Value.Span, "sublayers = %s: expected a whole number from 1 to 5000", x.Value.Value)
			ok = false
		}
		in.Sublayers = n
	}
	if x := o["life"]; x != nil {
		q, qok := e.quantity(sc, x, units.Time, "a duration (the design working life)")
		ok = ok && qok
		in.Life = optOf(q.V)
	}
	in.Schmertmann1970 = o.word("schmertmann", "1978") == "1970"
	switch o.word("drainage_paths", "auto") {
	case "one-way":
		in.Drainage = settle.DrainOneWay
	case "two-way":
		in.Drainage = settle.DrainTwoWay
	}
	if x := o["depth"]; x != nil {
		d, dok := e.depthRule(sc, x)
		ok = ok && dok
		in.Depth = d
	}
	if x := o["skempton_bjerrum"]; x != nil && strings.TrimSpace(x.Value.Value) != "no" {
		q, qok := e.quantity(sc, x, units.None, "no or the pore-pressure coefficient A")
		ok = ok && qok
		in.SkemptonBjerrum = optOf(q.V)
	}
	in.Fluctuating = o.word("fluctuating", "no") == "yes"
	switch o.word("grain", "sand") {
	case "fine-silty":
		in.Grain = settle.FineSilty
	case "gravel":
		in.Grain = settle.Gravel
	}
	return in, ok
}

// depthRule reads the depth option: stress or stress(R) (down to where
// Δσ = R·σ′_v0, default 0.1), width or width(n) (n·B below the base), or a
// length (a fixed depth below ground level).
func (e *evaluator) depthRule(sc scope, x *sheet.Option) (settle.Depth, bool) {
	v := strings.TrimSpace(x.Value.Value)
	for _, r := range []struct {
		word string
		rule settle.DepthRule
	}{{"stress", settle.DepthStress}, {"width", settle.DepthWidth}} {
		if v == r.word {
			return settle.Depth{Rule: r.rule}, true
		}
		if rest, found := strings.CutPrefix(v, r.word+"("); found && strings.HasSuffix(rest, ")") {
			n, err := strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(rest, ")")), 64)
			if err != nil {
				e.errs.Add(x.Value.Span, "depth = %s: expected a number in the parentheses, as in %s(%s)", v, r.word, map[string]string{"stress": "0.2", "width": "2"}[r.word])
				return settle.Depth{}, false
			}
			d := settle.Depth{Rule: r.rule}
			if r.rule == settle.DepthStress {
				d.Ratio = optOf(n)
			} else {
				d.Widths = optOf(n)
			}
			return d, true
		}
	}
	if strings.HasPrefix(v, "stress") || strings.HasPrefix(v, "width") {
		e.errs.Add(x.Value.Span, "depth = %s: expected stress, stress(ratio), width, width(multiple of B) or a length", v)
		return settle.Depth{}, false
	}
	q, ok := e.quantity(sc, x, units.Length, "stress, stress(ratio), width, width(multiple of B) or a length below ground level")
	return settle.Depth{Rule: settle.DepthFixed, Z: optOf(q.V)}, ok
}

// settleAt points an engine error about an option at the option's value
// (the block's header otherwise).
func settleAt(o opts, header source.Span) func(int, string) source.Span {
	names := map[string]string{"life": "life", "Skempton–Bjerrum A": "skempton_bjerrum", "depth ratio": "depth", "depth widths": "depth", "depth": "depth",
		"limit": "limit", "time": "times", "sublayers": "sublayers", "grain": "grain"}
	return func(_ int, param string) source.Span {
		for _, n := range []string{names[param], param} {
			if x := o[n]; x != nil && x.Value.Span.File != nil {
				return x.Value.Span
			}
		}
		return header
	}
}

func optOf(v float64) site.Opt { return site.Some(v) }

// settlement runs the settlement engine for a block.
func (e *evaluator) settlement(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	in, ok := e.settleInput(s, blk, o, "method")
	if !ok {
		return false
	}
	kind, _ := design.ParseServiceKind(o.word("load", "characteristic"))
	res := &SettleResult{}
	fu := units.MustParse(in.Footing.ForceUnit())
	blk.selfWeight()
	svc, err := design.ServiceLoad(withSelfWeight(blk.Of, blk.On), kind, &res.Load, fu.Name)
	if err != nil {
		e.siteErrors(err, headerSpan(b.Span), func(int, string) source.Span { return headerSpan(b.Span) })
		return false
	}
	res.Service = svc
	in.V = optOf(svc.V)
	r, err := settle.Compute(in)
	if err != nil {
		e.siteErrors(err, headerSpan(b.Span), settleAt(o, headerSpan(b.Span)))
		return false
	}
	res.Result = r
	blk.Settle = res
	blk.Cautions = append(append([]trace.Caution(nil), res.Load.Cautions...), r.Trace.Cautions...)
	blk.Sources = mergeSources(res.Load.Sources, r.Trace.Sources)
	e.defineResults(s, blk, append([]trace.Value{{Symbol: "V_SLS", V: svc.V, Unit: fu.Name}}, r.Symbols...))
	e.tilt(s, b, blk, o, res)
	e.within(s, b, blk, o, res, in)
	mm := units.MustParse("mm")
	note := "total settlement within the limit (" + r.Method.String() + ")"
	c := e.addCheck(s, blk, blk.Name+" settlement: s_total <= s_lim", "<=",
		units.Quantity{V: r.Total, Dim: units.Length}, units.Quantity{V: r.Limit, Dim: units.Length}, mm,
		r.Util, r.OK, note)
	if len(r.Unverified) > 0 {
		why := "not verified: " + strings.Join(r.Unverified, "; ")
		c.unverified(why, why+" ("+r.Method.String()+")")
	}
	return true
}

// capacity runs the capacity table for a block.
func (e *evaluator) capacity(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	if o["approach"] == nil {
		o["approach"] = &sheet.Option{Name: sheet.Str{Value: "approach"}, Value: sheet.Str{Value: "FS(3.0)", Span: headerSpan(b.Span)}}
	}
	if o["widths"] == nil {
		e.errs.AddHint(headerSpan(b.Span), "add a line such as widths = 1.0 m, 1.5 m, 2.0 m", "a capacity block needs widths")
		return false
	}
	bin, bok := e.bearingInput(s, b, blk, o, "bearing_method")
	sin, sok := e.settleInput(s, blk, o, "settlement_method")
	widths, wok := e.list(scope{e: e, s: s}, o["widths"], units.Length, "a width")
	if !bok || !sok || !wok {
		return false
	}
	in := capacity.Input{Bearing: bin, Settle: sin, Limit: settle.DefaultLimit}
	if sin.Limit.Set {
		in.Limit = sin.Limit.V
	}
	for _, w := range widths {
		in.Widths = append(in.Widths, w.V)
	}
	r, err := capacity.Table(in)
	if err != nil {
		at := headerSpan(b.Span)
		if x := o["approach"]; x != nil && x.Value.Span.File != nil {
			at = x.Value.Span
		}
		e.siteErrors(err, at, settleAt(o, at))
		return false
	}
	blk.Capacity = r
	blk.Cautions = r.Trace.Cautions
	blk.Sources = r.Trace.Sources
	e.defineResults(s, blk, r.Values)
	return true
}

// mergeSources joins source lists, each source once, in order.
func mergeSources(lists ...[]trace.Source) []trace.Source {
	var t trace.Trace
	for _, l := range lists {
		for _, src := range l {
			t.Cite(src)
		}
	}
	return t.Sources
}
