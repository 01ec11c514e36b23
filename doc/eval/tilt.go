package eval

import (
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// tiltNotes describe the tilt results of a settlement block (tilt = yes).
var tiltNotes = map[string]string{
	"theta_B": "tilt under M_B (rigid footing, elastic half-space)", "omega_B": "tilt under M_B as a slope, tan θ_B",
	"delta_s_B": "settlement difference between the edges across B from the tilt",
	"theta_L":   "tilt under M_L (rigid footing, elastic half-space)", "omega_L": "tilt under M_L as a slope, tan θ_L",
	"delta_s_L": "settlement difference between the edges across L from the tilt",
}

var tiltNames = []string{"theta_B", "omega_B", "delta_s_B", "theta_L", "omega_L", "delta_s_L"}

// init runs after settle.go's (files initialise in name order), so the
// tilt names extend the settlement block's list.
func init() {
	resultNames[sheet.KindSettlement] = append(resultNames[sheet.KindSettlement], tiltNames...)
}

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
		e.addOnFailed(s, blk, at, err, tiltNames)
		return
	}
	res.Tilt = t
	e.addOn(s, blk, &t.Trace, t.Values, tiltNotes)
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
func (e *evaluator) addOn(s *Sheet, blk *Block, tr *trace.Trace, vals []trace.Value, notes map[string]string) {
	blk.Cautions = append(blk.Cautions, tr.Cautions...)
	blk.Sources = mergeSources(blk.Sources, tr.Sources)
	e.defineResults(s, blk, vals, notes)
}

// TiltTrace is the tilt working of a settlement block, nil without tilt.
func (r *SettleResult) TiltTrace() *trace.Trace {
	if r == nil || r.Tilt == nil {
		return nil
	}
	return &r.Tilt.Trace
}
