package bearing

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Capacity is the bearing pressure a footing of one width can carry under
// a vertical central load.
type Capacity struct {
	B, L     float64  // width and length used (L = 0 for a strip)
	QUlt     float64  // ultimate bearing pressure of the governing case, with its design parameters (characteristic for FS), Pa
	QRd      float64  // design bearing resistance pressure R_d/A (allowable pressure q_a for an FS approach), gross total, Pa: a drained case's effective pressure plus u_0
	Drainage Drainage // the drainage condition that governs
	Case     string   // the governing case
	Trace    trace.Trace
}

// CapacityAt returns the bearing pressure of the footing of in resized to
// width B (a rectangle keeps its L/B ratio; a circle's B is its diameter),
// under a vertical central load: the least design resistance pressure over
// the approach's combinations and the drainage conditions that apply. The
// actions of in are not used: the pressure does not depend on the load
// when the load is vertical and central. The document's capacity block
// tabulates it against width.
func CapacityAt(in Input, B float64) (*Capacity, error) {
	f := in.Footing
	if f.Shape == site.Rectangle && f.B > 0 {
		f.L = f.L / f.B * B
	}
	f.B = B
	in.Footing = f
	in.Actions = []site.Action{{Name: "unit", Kind: site.Permanent, V: 1}}
	in.Options.Sliding = No
	in.gross = true
	r, err := Check(in)
	if err != nil {
		return nil, err
	}
	cp := &Capacity{B: B, Trace: r.Trace, QRd: math.Inf(1)}
	if f.Shape == site.Rectangle {
		cp.L = f.L
	} else if f.Shape != site.Strip {
		cp.L = B
	}
	gov := -1
	for i, cs := range r.Cases {
		// One convention with the settlement and the footing's own check:
		// the table gives gross total pressures, so a drained (effective)
		// resistance pressure gains the pore pressure at the base back:
		// q_a = (q_ult − q′)/FS + q′ + u_0 = q_net/FS + σ_v0.
		q := cp.Trace.Compute(qaStep(cs))
		if q < cp.QRd {
			cp.QRd, cp.QUlt, cp.Drainage, cp.Case, gov = q, cs.QUlt, cs.Drainage, cs.Name, i
		}
	}
	if math.IsInf(cp.QRd, 1) {
		cp.QRd = 0
	}
	if gov >= 0 && r.Cases[gov].U0 > 0 {
		cp.QRd = cp.Trace.Eval(qaStep(r.Cases[gov]))
	}
	if err := cp.Trace.Err(); err != nil {
		return nil, fmt.Errorf("bearing capacity of %s at B = %g m: %w", footingName(f), B, err)
	}
	return cp, nil
}

var fQa = trace.Add(trace.S("q_Rd"), trace.S("u_0"))

// qaStep is the gross allowable pressure of case cs.
func qaStep(cs Case) trace.Step {
	return trace.Step{Symbol: "q_a", Formula: fQa, Unit: "kPa", Case: cs.Name,
		Inputs: []trace.Value{val("q_Rd", cs.QRd, "kPa"), val("u_0", cs.U0, "kPa")}, Ref: ref6521,
		Note: "gross allowable pressure: the effective resistance pressure with the pore pressure at the base added back (q_net/FS + σ_v0)"}
}
