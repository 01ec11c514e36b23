package eval

import (
	"errors"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// DiffResult is a differential block's result: the two settlement blocks
// compared (their s_total) and the engine's angular distortion check.
type DiffResult struct {
	A, B    *Block  // the settlement blocks of the two footings
	Spacing float64 // centre-to-centre distance, m
	*settle.Diff
}

// settleBlock finds the settlement block named name above this block, on
// this sheet or a sheet it uses: by its result prefix, else by its
// footing's name (which must then have exactly one settlement block).
func (e *evaluator) settleBlock(s *Sheet, name sheet.Str) (*Block, bool) {
	var byFooting []*Block
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		for _, x := range t.Blocks() {
			if x.Kind != sheet.KindSettlement {
				continue
			}
			if x.Name == name.Value {
				return x, x.Settle != nil
			}
			if x.Of != nil && x.Of.Name == name.Value {
				byFooting = append(byFooting, x)
			}
		}
	}
	switch len(byFooting) {
	case 1:
		return byFooting[0], byFooting[0].Settle != nil
	case 0:
	default:
		e.errs.AddHint(name.Span, "name one by its result prefix: differential "+byFooting[0].Name+" to ...",
			"footing %s has %d settlement blocks", name.Value, len(byFooting))
		return nil, false
	}
	for _, x := range s.Src.Body {
		if a, ok := x.(*sheet.Analysis); ok && a.Kind == sheet.KindSettlement && (a.Footing.Value == name.Value || a.ResultPrefix().Value == name.Value) && s.blocks[a] == nil && a.Span.Start > name.Span.Start {
			e.errs.Add(name.Span, "the settlement block of %s is below this block: move it above", name.Value)
			return nil, false
		}
	}
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		if t.footings[name.Value] != nil {
			e.errs.AddHint(name.Span, "add a ```settlement "+name.Value+" on GROUND block above this one",
				"footing %s has no settlement block above: a differential block compares the settlement blocks' s_total", name.Value)
			return nil, false
		}
	}
	e.missingBlock(s, name, "footing", func(t *Sheet) []string { return keysOf(t.footings) })
	return nil, false
}

// differential evaluates ```differential A to B: the angular distortion
// β = |s_total,A − s_total,B|/L between two footings' settlement blocks.
func (e *evaluator) differential(s *Sheet, b *sheet.Analysis, blk *Block) {
	fail := func() { e.failResults(s, blk) }
	opts := e.options(b)
	for _, o := range b.Options() {
		blk.Options = append(blk.Options, o.Name.Value+" = "+o.Value.Value)
	}
	if b.Footing.Value == b.To.Value {
		e.errs.AddHint(b.To.Span, "name two different footings", "differential %s to %s compares a footing with itself", b.Footing.Value, b.To.Value)
		fail()
		return
	}
	a, aok := e.settleBlock(s, b.Footing)
	c, cok := e.settleBlock(s, b.To)
	if a != nil && c != nil && a.Of != nil && a.Of == c.Of {
		e.errs.AddHint(b.To.Span, "name two different footings", "%s and %s are settlement blocks of the same footing %s", b.Footing.Value, b.To.Value, a.Of.Name)
		fail()
		return
	}
	if opts == nil || !aok || !cok {
		fail()
		return
	}
	ok := true
	sc := scope{e: e, s: s}
	in := settle.DiffInput{A: a.Of.Name, B: c.Of.Name, SA: a.Settle.Total, SB: c.Settle.Total}
	x := opts["spacing"]
	if x == nil {
		e.errs.AddHint(headerSpan(b.Span), "add a line such as spacing = 6 m (centre to centre)", "a differential block needs the spacing of the two footings")
		ok = false
	} else {
		q, qok := e.quantity(sc, x, units.Length, "the centre-to-centre distance")
		ok = ok && qok
		in.Spacing = q.V
	}
	if l := opts["limit"]; l != nil {
		q, qok := e.quantity(sc, l, units.None, "a pure number such as 1/500")
		ok = ok && qok
		in.Limit = site.Some(q.V)
	}
	if !ok {
		fail()
		return
	}
	d, err := settle.Differential(in)
	if err != nil {
		var list site.Errors
		if !errors.As(err, &list) {
			list = site.Errors{err}
		}
		for _, x := range list {
			var re *site.RangeError
			switch {
			case errors.As(x, &re) && re.Param == "L" && opts["spacing"] != nil:
				o := opts["spacing"]
				e.errs.Add(o.Value.Span, "spacing = %s: %v", o.Value.Value, x)
			case errors.As(x, &re) && re.Param == "beta_lim" && opts["limit"] != nil:
				o := opts["limit"]
				e.errs.Add(o.Value.Span, "limit = %s: %v (an angular distortion such as 1/500)", o.Value.Value, x)
			default:
				e.errs.Add(headerSpan(b.Span), "%v", x)
			}
		}
		fail()
		return
	}
	blk.Diff = &DiffResult{A: a, B: c, Spacing: in.Spacing, Diff: d}
	blk.Cautions = d.Trace.Cautions
	blk.Sources = d.Trace.Sources
	e.defineResults(s, blk, d.Symbols)
	e.addCheck(s, blk, blk.Name+" angular distortion: beta <= beta_lim", "<=",
		units.Quantity{V: d.Beta}, units.Quantity{V: d.Limit}, units.Dimensionless,
		d.Util, d.OK, "angular distortion between "+a.Of.Name+" and "+c.Of.Name+" (s_total of "+a.Name+" and "+c.Name+")")
}
