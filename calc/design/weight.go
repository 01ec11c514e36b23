package design

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// DefaultGammaC is the unit weight of a reinforced-concrete footing
// assumed when none is given, N/m³ (24 kN/m³; EN 1991-1-1:2002 Table A.1
// gives 25 kN/m³ for reinforced concrete of normal weight, 24 kN/m³ for
// plain concrete; 24 kN/m³ is common practice for footings).
const DefaultGammaC = 24e3

// SelfWeight is the input of Weight: the footing, the ground whose total
// vertical stress loads the backfill, the footing's unit weight γ_c and
// its thickness h (each unset: the default, recorded as assumed).
type SelfWeight struct {
	Footing site.Footing
	Ground  site.Ground
	GammaC  site.Opt // N/m³, (0, 100] kN/m³; default DefaultGammaC
	H       site.Opt // m, (0, D]; default D (no backfill over the footing)
}

var fxWeight = trace.Add(trace.Mul(trace.S("gamma_c"), trace.S("A"), trace.S("h")), trace.Mul(trace.S("A"), trace.S("sigma_v,fill")))

// Weight returns the weight of the footing and of the backfill over it
// (N, or N/m for a strip), W = γ_c·A·h + A·σ_v(D − h), the backfill
// taking the ground model's total vertical stress from ground level to
// the top of the footing (common practice), and records its working in tr
// (each default marked "assumed, default").
func Weight(in SelfWeight, tr *trace.Trace) (float64, error) {
	m := in.Footing
	var errs site.Errors
	if err := m.Validate(); err != nil {
		errs = append(errs, err)
	}
	if err := in.Ground.Validate(); err != nil {
		errs = append(errs, err)
	}
	gc := in.GammaC.Or(DefaultGammaC)
	if d := gc / 1e3; !(d > 0 && d <= 100) {
		errs = append(errs, &site.RangeError{Where: m.Name, Param: "gamma_c", Value: d, Min: 0, Max: 100, Unit: "kN/m3"})
	}
	h := in.H.Or(m.D)
	if !(h > 0 && h <= m.D) {
		errs = append(errs, &site.RangeError{Where: m.Name, Param: "h", Value: h, Min: 0, Max: m.D, Unit: "m", Reason: "the footing's thickness is more than 0 and at most D"})
	}
	if len(errs) > 0 {
		return 0, errs
	}
	areaUnit, forceUnit := "m2", "kN"
	var area trace.Expr
	switch m.Shape {
	case site.Strip:
		area, areaUnit, forceUnit = trace.S("B"), "m", "kN/m"
	case site.Circle:
		area = trace.Div(trace.Mul(trace.S("pi"), trace.Pow(trace.S("B"), trace.N(2))), trace.N(4))
	case site.Rectangle:
		area = trace.Mul(trace.S("B"), trace.S("L"))
	default:
		area = trace.Pow(trace.S("B"), trace.N(2))
	}
	v := func(sym string, x float64, unit string) trace.Value {
		return trace.Value{Symbol: sym, V: x, Unit: unit}
	}
	ins := []trace.Value{v("B", m.B, "m")}
	if m.Shape == site.Rectangle {
		ins = append(ins, v("L", m.L, "m"))
	}
	if m.Shape == site.Circle {
		ins = append(ins, v("pi", math.Pi, ""))
	}
	note := "plan area of the footing"
	if m.Shape == site.Strip {
		note += " per metre run"
	}
	a := tr.Eval(trace.Step{Symbol: "A", Formula: area, Inputs: ins, Unit: areaUnit, Note: note})
	gcNote := "unit weight of the footing, given"
	if !in.GammaC.Set {
		gcNote = "unit weight of the footing: assumed, default (reinforced concrete, common practice); give gamma_c to change it"
	}
	tr.Take(trace.Step{Symbol: "gamma_c", Kind: trace.Given, Value: gc, Unit: "kN/m3", Note: gcNote})
	hNote := "thickness of the footing, given"
	if !in.H.Set {
		hNote = "thickness of the footing: assumed, default h = D (no backfill over it); give h to change it"
	}
	tr.Take(trace.Step{Symbol: "h", Kind: trace.Given, Value: h, Unit: "m", Note: hNote})
	tr.Take(trace.Step{Symbol: "D", Kind: trace.Given, Value: m.D, Unit: "m", Note: "depth of the underside below ground level"})
	// Σ γ·thickness over the strata above D − h (site.Ground.SigmaV).
	sv := tr.Take(trace.Step{Symbol: "sigma_v,fill", Kind: trace.Summed, Value: in.Ground.SigmaV(m.D - h), Unit: "kPa", Note: "total vertical stress of the ground model at depth D − h (the backfill over the footing)"})
	w := tr.Eval(trace.Step{Symbol: "W", Formula: fxWeight,
		Inputs: []trace.Value{v("gamma_c", gc, "kN/m3"), v("A", a, areaUnit), v("h", h, "m"), v("sigma_v,fill", sv, "kPa")},
		Unit:   forceUnit, Note: "self-weight and backfill, added by plinth as a permanent action (common practice)"})
	if err := tr.Err(); err != nil {
		return 0, fmt.Errorf("self-weight of %s: %w", m.Name, err)
	}
	return w, nil
}
