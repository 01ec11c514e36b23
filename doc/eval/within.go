package eval

import (
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// within computes, for within = yes, the settlement at the centre and a
// corner of the footing with the block's method, stress and sublayers,
// and the angular distortion between them. An error is reported and only
// these results count as failed.
func (e *evaluator) within(s *Sheet, b *sheet.Analysis, blk *Block, o opts, res *SettleResult, in settle.Input) {
	if o.word("within", "no") != "yes" {
		return
	}
	at := o["within"].Value.Span
	w, err := settle.WithinFooting(in)
	if err != nil {
		e.addOnFailed(s, blk, at, err, settle.Spec.ResultNames(settle.WithinOn))
		return
	}
	res.Within = w
	e.addOn(s, blk, &w.Trace, w.Values)
}
