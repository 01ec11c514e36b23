package eval

import (
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/doc/sheet"
)

var withinNames = []string{"s_centre", "s_corner", "s_edge", "delta_s_in", "beta_in", "s_mid_B", "beta_B", "s_mid_L", "beta_L"}

// withinNotes describe the results of within = yes on a settlement block.
var withinNotes = map[string]string{
	"s_centre": "total settlement at the centre (flexible footing)", "s_corner": "total settlement at a corner (flexible footing)",
	"s_edge": "total settlement at the edge (flexible footing)", "delta_s_in": "differential settlement within the footing, centre less corner",
	"beta_in": "angular distortion within the footing, over the half-diagonal",
	"s_mid_B": "total settlement at the middle of a long side (flexible footing)",
	"beta_B":  "angular distortion from the centre to the middle of a long side, over B/2",
	"s_mid_L": "total settlement at the middle of a short side (flexible footing)",
	"beta_L":  "angular distortion from the centre to the middle of a short side, over L/2",
}

// init runs after settle.go's (files initialise in name order).
func init() {
	resultNames[sheet.KindSettlement] = append(resultNames[sheet.KindSettlement], withinNames...)
}

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
		e.addOnFailed(s, blk, at, err, withinNames)
		return
	}
	res.Within = w
	e.addOn(s, blk, &w.Trace, w.Values, withinNotes)
}
