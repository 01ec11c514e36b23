package bearing

import (
	"math"

	"plinth/calc/site"
	"plinth/calc/trace"
)

// Capacity is the bearing pressure a footing of one width can carry under
// a vertical central load.
type Capacity struct {
	B, L     float64  // width and length used (L = 0 for a strip)
	QUlt     float64  // ultimate bearing pressure of the governing case, with its design parameters (characteristic for FS), Pa
	QRd      float64  // design bearing resistance pressure R_d/A (allowable pressure q_a for an FS approach), Pa
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
	for _, cs := range r.Cases {
		if cs.QRd < cp.QRd {
			cp.QRd, cp.QUlt, cp.Drainage, cp.Case = cs.QRd, cs.QUlt, cs.Drainage, cs.Name
		}
	}
	if math.IsInf(cp.QRd, 1) {
		cp.QRd = 0
	}
	return cp, nil
}
