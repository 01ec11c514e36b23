package eval

import (
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// tilt computes a settlement block's tilt under the serviceability
// moment when tilt = yes, and defines its results. An error is
// reported and only the tilt results count as failed.
func (e *evaluator) tilt(s *Sheet, b *sheet.Analysis, blk *Block, o opts, res *SettleResult) {
	if o.word("tilt", "no") != "yes" {
		return
	}
	at := headerSpan(b.Span)
	if x := o["tilt"]; x != nil {
		at = x.Value.Span
	}
	t, err := settle.TiltOf(settle.TiltInput{Ground: blk.On.Model, Footing: blk.Of.Model,
		Actions: withSelfWeight(blk.Of, blk.On), Factors: res.Service.Factor, LongTerm: res.Service.Kind == design.QuasiPermanent})
	if err != nil {
		e.addOnFailed(s, blk, at, err, settle.Spec.ResultNames(settle.TiltOn))
		return
	}
	res.Tilt = t
	e.addOn(s, blk, &t.Trace, t.Values)
}

// addOnFailed reports the error of an add-on calculation of a settlement
// block (tilt, within) at at and marks its result names as failed.
func (e *evaluator) addOnFailed(s *Sheet, blk *Block, at source.Span, err error, names []string) {
	e.siteErrors(err, at, func(int, string) source.Span { return at })
	for _, n := range names {
		e.fail(s, blk.Name+"."+n)
	}
}

// addOn adds an add-on calculation's cautions, sources and results to
// its settlement block.
func (e *evaluator) addOn(s *Sheet, blk *Block, tr *trace.Trace, vals []trace.Value) {
	blk.Cautions = append(blk.Cautions, tr.Cautions...)
	blk.Sources = mergeSources(blk.Sources, tr.Sources)
	e.defineResults(s, blk, vals)
}

// TiltTrace is the tilt working of a settlement block, nil without tilt.
func (r *SettleResult) TiltTrace() *trace.Trace {
	if r == nil || r.Tilt == nil {
		return nil
	}
	return &r.Tilt.Trace
}
