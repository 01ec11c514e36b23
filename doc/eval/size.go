package eval

import (
	"errors"
	"fmt"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/size"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// SizeResult is a size block's answer: the chosen footing with the bearing
// and settlement results at it (printed as those blocks print them).
type SizeResult struct {
	*size.Result
	Ecc      size.Ecc
	NoSettle bool // settlement = no
}

// sizeBlock runs the sizing engine for a size block. The footing it sizes
// gives its shape, D and actions, and no B (the block chooses it); a
// rectangle gives its L (a fixed length) or the block a ratio.
func (e *evaluator) sizeBlock(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	f := blk.Of
	fspan := b.Footing.Span
	if !f.NoB {
		y := s.local[f.Name+".B"]
		sp := fspan
		if y != nil {
			sp = y.Span
		}
		e.errs.AddHint(sp, "leave B out of footing "+f.Name+" (the size block chooses it), or check the size you have with a bearing block",
			"footing %s gives B, which a size block would replace", f.Name)
		return false
	}
	bin, bok := e.bearingInput(s, b, blk, o, "bearing_method")
	sin, sok := e.settleInput(s, blk, o, "settlement_method")
	if !bok || !sok {
		return false
	}
	in := size.Input{Bearing: bin}
	in.Bearing.Actions = append([]site.Action(nil), f.Actions...)
	sc := scope{e: e, s: s}
	ok := e.sizeOptions(sc, o, &in, sin)
	switch f.Model.Shape {
	case site.Rectangle:
		switch {
		case o["ratio"] != nil && f.Model.L > 0:
			e.errs.AddHint(o["ratio"].Name.Span, "leave L out of footing "+f.Name+", or this ratio", "footing %s gives L = %g m, and a ratio would replace it", f.Name, f.Model.L)
			ok = false
		case o["ratio"] != nil:
			q, qok := e.quantity(sc, o["ratio"], units.None, "a pure number")
			ok = ok && qok
			in.Plan, in.Ratio = size.Ratio, q.V
		case f.Model.L > 0:
			in.Plan, in.L = size.FixedL, f.Model.L
		default:
			e.errs.AddHint(fspan, "give footing "+f.Name+" its L, or this block a ratio = 1.5 (L/B)", "a rectangle needs a fixed L or a ratio L/B to be sized")
			ok = false
		}
	default:
		if x := o["ratio"]; x != nil {
			e.errs.Add(x.Name.Span, "ratio sizes a rectangle; footing %s is a %s", f.Name, f.Model.Shape)
			ok = false
		}
	}
	res := &SizeResult{Ecc: in.Ecc, NoSettle: in.Settle == nil}
	if f.SelfWeight {
		sw := design.SelfWeight{Ground: blk.On.Model}
		if f.GammaCGiven {
			sw.GammaC = site.Some(f.GammaC)
		}
		if f.HGiven {
			sw.H = site.Some(f.H)
		}
		in.SelfWeight = &sw
	}
	if !ok {
		return false
	}
	r, err := size.Size(in)
	if err != nil {
		var ns *size.NoSize
		if errors.As(err, &ns) {
			at := headerSpan(b.Span)
			hint := "a larger max, a deeper or stronger founding layer, or a smaller load"
			if x := o["max"]; x != nil && !ns.FixedL {
				at = x.Value.Span
			} else if ns.FixedL {
				at, hint = fspan, "a longer L for footing "+f.Name+", or a ratio"
			}
			e.errs.AddHint(at, hint, "%v", err)
			return false
		}
		e.siteErrors(err, headerSpan(b.Span), func(_ int, param string) source.Span {
			if x := o[param]; x != nil && x.Value.Span.File != nil {
				return x.Value.Span
			}
			return headerSpan(b.Span)
		})
		return false
	}
	res.Result = r
	blk.Size = res
	blk.Cautions = append(blk.Cautions, r.Bearing.Trace.Cautions...)
	blk.Sources = mergeSources(r.Trace.Sources, r.WeightT.Sources, r.Bearing.Trace.Sources)
	if r.Settle != nil {
		blk.Cautions = append(blk.Cautions, r.Load.Cautions...)
		blk.Cautions = append(blk.Cautions, r.Settle.Trace.Cautions...)
		blk.Sources = mergeSources(blk.Sources, r.Load.Sources, r.Settle.Trace.Sources)
	}
	blk.SelfWeight = r.WeightT
	e.defineResults(s, blk, r.Values)
	gov := r.At.Checks[r.At.Governing]
	note := fmt.Sprintf("governing at B = %s: %s", units.Printed(r.B, units.MustParse("m"), -1), gov.Name)
	if r.Below != nil {
		bg := r.Below.Checks[r.Below.Governing]
		note += fmt.Sprintf("; at %s %s gives %s", units.Printed(r.Below.B, units.MustParse("m"), -1), bg.Name, units.Utilisation(r.Below.Util()))
	}
	e.addCheck(s, blk, blk.Name+" size: util <= 1", "<=", units.Quantity{V: r.At.Util()}, units.Quantity{V: 1}, units.Dimensionless, r.At.Util(), r.At.OK, note)
	return true
}

// sizeOptions reads the options a size and a schedule block share: the
// increment, the largest width or the standard sizes, the eccentricity
// limit and the settlement check (with its serviceability combination).
func (e *evaluator) sizeOptions(sc scope, o opts, in *size.Input, sin settle.Input) bool {
	ok := true
	length := func(name string) float64 {
		x := o[name]
		if x == nil {
			return 0
		}
		q, qok := e.quantity(sc, x, units.Length, "a length")
		if qok && !(q.V > 0) {
			e.errs.Add(x.Value.Span, "%s = %s: must be greater than 0", name, x.Value.Value)
			qok = false
		}
		ok = ok && qok
		return q.V
	}
	in.Step, in.Max = length("step"), length("max")
	if x := o["sizes"]; x != nil {
		ws, wok := e.list(sc, x, units.Length, "a width")
		ok = ok && wok
		for _, w := range ws {
			in.Sizes = append(in.Sizes, w.V)
		}
		if o["step"] != nil {
			e.errs.Add(o["step"].Name.Span, "step is not used with sizes: give one or the other")
			ok = false
		}
	}
	switch o.word("eccentricity", "B/3") {
	case "B/6":
		in.Ecc = size.Sixth
	case "none":
		in.Ecc = size.NoEcc
	}
	if o.word("settlement", "yes") != "no" {
		in.Service, _ = design.ParseServiceKind(o.word("load", "characteristic"))
		in.Settle = &sin
	}
	return ok
}
