package settle

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Within is the differential settlement within one flexible footing:
// centre against corner (the edge of a strip or circle), by the same
// method, stress distribution and sublayers.
type Within struct {
	Centre, Corner float64 // total settlements, m
	Delta          float64 // s_centre − s_corner, m
	Dist           float64 // centre to corner (half-diagonal; half-width of a strip, radius of a circle), m
	Beta           float64 // Delta/Dist
	// Rectangles and squares: the middles of a long side (B/2 from the
	// centre) and of a short side (L/2), and β from the centre to each
	// (on a square, one side's values serve for both).
	MidB, MidL   float64
	BetaB, BetaL float64
	Trace        trace.Trace
	Values       []trace.Value // s_centre, s_corner (s_edge), delta_s_in, beta_in; s_mid_B, beta_B, s_mid_L, beta_L for a rectangle or square
}

// WithinFooting returns the settlement of a flexible footing at its centre
// and at a corner (the edge of a strip or circle) with in's method, stress
// distribution and sublayers, and the angular distortion between them,
// β = (s_centre − s_corner)/d over the half-diagonal d = √(B² + L²)/2
// (B/2 for a strip or circle); for a rectangle or square also at the
// middles of a long and a short side, β_B = (s_centre − s_mid,B)/(B/2) and
// β_L = (s_centre − s_mid,L)/(L/2). The corner uses Steinbrenner's and
// Boussinesq's superposition of corner rectangles (Bowles 1996, §5-6),
// as at = corner does; the calculations are the same as Compute's with
// At set, run without their working. A rigid footing settles uniformly
// and is refused, as are the load-spread stress and the sand methods
// (Schmertmann, Burland & Burbidge), which give no settlement at a point.
func WithinFooting(in Input) (*Within, error) {
	if in.Rigid {
		return nil, &site.InputError{Where: in.Footing.Name, Param: "rigid", Msg: "a rigid footing settles uniformly: the settlement within it needs a flexible footing (rigid = no)"}
	}
	if in.Stress == stress.Spread {
		return nil, &site.InputError{Where: in.Footing.Name, Param: "within", Msg: "the load-spread (2:1) stress is an average over the spread area, not the stress below a point: use stress = boussinesq"}
	}
	a, c := in, in
	a.At, c.At = stress.Centre, stress.Corner
	ra, err := compute(a, false)
	if err != nil {
		return nil, err
	}
	if ra.Method == Schmertmann || ra.Method == BurlandBurbidge {
		return nil, &site.InputError{Where: in.Footing.Name, Param: "within", Msg: "the " + ra.Method.String() + " method gives one settlement for the whole footing, not one at each point: use method = elastic or consolidation"}
	}
	rc, err := compute(c, false)
	if err != nil {
		return nil, err
	}
	f := in.Footing
	w := &Within{Centre: ra.Total, Corner: rc.Total}
	t := &w.Trace
	cs := "within the footing"
	ref := trace.Ref{Source: Bowles1996, Clause: "§5-6, superposition of corner rectangles"}
	eval := func(sym string, fx trace.Expr, vin []trace.Value, unit string, r trace.Ref, note string) float64 {
		return t.Eval(trace.Step{Symbol: sym, Formula: fx, Inputs: vin, Unit: unit, Ref: r, Note: note, Case: cs})
	}
	// The settlements at the points are the totals of calculations run
	// without their working (their formulas are those of Compute's).
	take := func(sym string, v float64, note string) {
		t.Take(trace.Step{Symbol: sym, Kind: trace.Summed, Value: v, Unit: "mm", Ref: ref, Note: note, Case: cs})
	}
	take("s_centre", w.Centre, "total settlement at the centre ("+ra.Method.String()+")")
	edge := "corner"
	if f.Shape == site.Strip || f.Shape == site.Circle {
		edge = "edge"
	}
	take("s_"+edge, w.Corner, "total settlement at the "+edge+", same method, stress distribution and sublayers")
	w.Delta = eval("delta_s_in", trace.Sub(trace.S("s_centre"), trace.S("s_"+edge)), []trace.Value{val("s_centre", w.Centre, "mm"), val("s_"+edge, w.Corner, "mm")}, "mm", trace.Ref{}, "differential settlement within the footing")
	switch f.Shape {
	case site.Strip, site.Circle:
		w.Dist = eval("d", trace.Div(trace.S("B"), trace.N(2)), []trace.Value{val("B", f.B, "m")}, "m", trace.Ref{}, "centre to edge")
	default:
		L := f.Length()
		w.Dist = eval("d", trace.Div(trace.Fn("sqrt", trace.Add(trace.Pow(trace.S("B"), trace.N(2)), trace.Pow(trace.S("L"), trace.N(2)))), trace.N(2)), []trace.Value{val("B", f.B, "m"), val("L", L, "m")}, "m", trace.Ref{}, "centre to corner (half-diagonal)")
	}
	w.Beta = eval("beta_in", trace.Div(trace.S("delta_s_in"), trace.S("d")), []trace.Value{val("delta_s_in", w.Delta, "mm"), val("d", w.Dist, "m")}, "", trace.Ref{Source: trace.EN1997, Clause: "Annex H"}, "angular distortion within the footing")
	t.WarnAll(trace.Caution{Code: "within-flexible", Severity: trace.SevNote, Case: cs,
		Message: "the footing is taken as flexible: a stiff footing or raft spreads the load and settles more evenly than this"})
	w.Values = []trace.Value{val("s_centre", w.Centre, "mm"), val("s_"+edge, w.Corner, "mm"), val("delta_s_in", w.Delta, "mm"), val("beta_in", w.Beta, "")}
	if edge == "edge" {
		return w.done(f.Name)
	}
	type side struct {
		p          stress.Point
		side, what string
		s, beta    *float64
	}
	sides := []side{{stress.MidB, "B", "middle of a long side", &w.MidB, &w.BetaB}, {stress.MidL, "L", "middle of a short side", &w.MidL, &w.BetaL}}
	square := f.Shape == site.Square
	if square { // the middles of a square's four sides are alike: one is computed
		sides = []side{{stress.MidB, "B", "middle of a side", &w.MidB, &w.BetaB}}
	}
	for _, m := range sides {
		x := in
		x.At = m.p
		r, err := compute(x, false)
		if err != nil {
			return nil, err
		}
		*m.s = r.Total
		ss := "s_mid_" + m.side
		take(ss, r.Total, "total settlement at the "+m.what+", "+m.side+"/2 from the centre")
		sv := f.B
		if m.side == "L" {
			sv = f.Length()
		}
		*m.beta = eval("beta_"+m.side, trace.Div(trace.Sub(trace.S("s_centre"), trace.S(ss)), trace.Div(trace.S(m.side), trace.N(2))), []trace.Value{val("s_centre", w.Centre, "mm"), val(ss, r.Total, "mm"), val(m.side, sv, "m")}, "",
			trace.Ref{Source: trace.EN1997, Clause: "Annex H"}, "angular distortion from the centre to the "+m.what)
		w.Values = append(w.Values, val(ss, r.Total, "mm"), val("beta_"+m.side, *m.beta, ""))
	}
	if square { // the short side's values are the long side's
		same := "a square's four sides are alike"
		w.MidL = eval("s_mid_L", trace.S("s_mid_B"), []trace.Value{val("s_mid_B", w.MidB, "mm")}, "mm", trace.Ref{}, same)
		w.BetaL = eval("beta_L", trace.S("beta_B"), []trace.Value{val("beta_B", w.BetaB, "")}, "", trace.Ref{}, same)
		w.Values = append(w.Values, val("s_mid_L", w.MidL, "mm"), val("beta_L", w.BetaL, ""))
	}
	return w.done(f.Name)
}

// done returns w, or the first of its steps whose formula was out of its
// domain.
func (w *Within) done(name string) (*Within, error) {
	if err := w.Trace.Err(); err != nil {
		return nil, fmt.Errorf("settlement within %s: %w", name, err)
	}
	return w, nil
}
