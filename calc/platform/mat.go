package platform

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// MatPlan fixes L as a mat is sized.
type MatPlan int

const (
	MatSquare MatPlan = iota // L = B
	MatRatio                 // L = Ratio·B
	MatFixedL                // L given, B ≤ L
)

// MatInput is an outrigger load on a mat (or a crane pad).
type MatInput struct {
	Name string
	// F is the outrigger load, N, (0, 50000] kN: the working load the
	// allowable pressure is stated for.
	F    float64
	Plan MatPlan
	// B and L are the mat's plan, m, [0.1, 20], B ≤ L. B = 0: size the mat
	// (L is then used only by MatFixedL).
	B, L  float64
	Ratio float64 // MatRatio: L/B, [1, 10]
	// QAllow is the allowable bearing pressure under the mat, Pa, (0,
	// 10000] kPa.
	QAllow float64
	// T and Gamma are the mat's thickness (m, [0, 2]) and unit weight
	// (N/m³, [1, 100] kN/m³): its own weight γ_m·t·B·L bears with F. T = 0:
	// no self-weight.
	T, Gamma float64
	// Step rounds a sized B up to a multiple of Step, m; 0 means none.
	// [0.01, 1].
	Step float64
	// Z is the depth below the mat of the level where the stress is given
	// (the top of the subgrade: the platform thickness), m, [0, 20]; not
	// set: no stress.
	Z site.Opt
	// Angle is the load-spread angle to the vertical, rad, (0, 60°); 0
	// means 2:1 (stress.DefaultAngle).
	Angle float64
}

// MatResult is a mat checked or sized, with the stress below it.
type MatResult struct {
	Name    string
	B, L    float64
	Sized   bool    // B was solved for
	BReq    float64 // the width at which q = q_a (sized only)
	Weight  float64 // the mat's own weight, N
	Q       float64 // bearing pressure under the mat, Pa
	Util    float64 // q/q_a
	OK      bool
	Z       float64 // depth of the stress, m (0 when not asked)
	Spread  float64 // average stress increase at Z by load spread, Pa
	Centre  float64 // Boussinesq stress increase at Z under the centre, Pa
	HasZ    bool
	Values  []trace.Value
	Trace   trace.Trace
	Footing site.Footing // the mat as a footing, for calc/stress and calc/bearing
}

// Case is the mat as a loading case of Design: its bearing pressure on
// its B × L.
func (r *MatResult) Case(name string, kind CaseKind) Case {
	return Case{Name: name, Kind: kind, Q: r.Q, W: r.B, L: r.L}
}

// refMat: the bearing pressure of a mat against an allowable pressure is
// common practice, with no published source.
var refMat = trace.Ref{}

func validateMat(m MatInput) error {
	var errs site.Errors
	w := "mat"
	if m.Name != "" {
		w = "mat " + strconv.Quote(m.Name)
	}
	rng := func(p string, v, scale, lo, hi float64, unit string, open bool) {
		errs.Range(w, p, v, scale, lo, hi, open, unit)
	}
	rng("F", m.F, kN, 0, 50000, "kN", true)
	rng("q_a", m.QAllow, kPa, 0, 10000, "kPa", true)
	switch m.Plan {
	case MatSquare:
	case MatRatio:
		rng("L/B", m.Ratio, 1, 1, 10, "", false)
	case MatFixedL:
		rng("L", m.L, 1, 0.1, 20, "m", false)
	default:
		errs = append(errs, &site.InputError{Where: w, Param: "plan", Msg: "expected square, a ratio L/B or a fixed L"})
	}
	if m.B != 0 {
		rng("B", m.B, 1, 0.1, 20, "m", false)
		if m.Plan != MatSquare && m.Plan != MatRatio {
			if m.L < m.B {
				errs = append(errs, &site.InputError{Where: w, Param: "L", Msg: fmt.Sprintf("L = %g m is less than B = %g m: B is the shorter side", m.L, m.B)})
			}
		}
	}
	rng("t", m.T, 1, 0, 2, "m", false)
	if m.T > 0 {
		rng("gamma_m", m.Gamma, kNm3, 1, 100, "kN/m3", false)
		if m.Gamma*m.T >= m.QAllow {
			errs = append(errs, &site.InputError{Where: w, Param: "gamma_m·t", Msg: "the mat's own weight per area is not less than the allowable pressure: no size carries any load"})
		}
	}
	if m.Step != 0 {
		rng("Delta_B", m.Step, 1, 0.01, 1, "m", false)
	}
	if m.Z.Set {
		rng("z", m.Z.V, 1, 0, 20, "m", false)
	}
	if m.Angle != 0 {
		if d := m.Angle / deg; !(d > 0 && d < 60) {
			errs = append(errs, &site.RangeError{Where: w, Param: "spread angle", Value: d, Min: 0, Max: 60, Unit: "deg", OpenMin: true, Reason: "angle of load spread to the vertical"})
		}
	}
	return errs.Err()
}

// lengthExpr is L as a formula of B under the plan.
func lengthExpr(m MatInput) (trace.Expr, []trace.Value) {
	switch m.Plan {
	case MatRatio:
		return mul(S("r_LB"), S("B")), []trace.Value{val("r_LB", m.Ratio, "")}
	case MatFixedL:
		return S("L"), []trace.Value{val("L", m.L, "m")}
	}
	return S("B"), nil
}

// Mat checks an outrigger mat, or sizes it (B = 0) for the allowable
// pressure, and gives the stress increase at depth Z below it by load
// spread and by Boussinesq (calc/stress).
func Mat(m MatInput) (*MatResult, error) {
	if err := validateMat(m); err != nil {
		return nil, err
	}
	r := &MatResult{Name: m.Name}
	t := &r.Trace
	t.Take(trace.Step{Symbol: "F", Value: m.F, Unit: "kN", Note: "outrigger load (given)"})
	t.Take(trace.Step{Symbol: "q_a", Value: m.QAllow, Unit: "kPa", Note: "allowable bearing pressure under the mat (given)"})
	wt := m.T > 0
	if wt {
		t.Take(trace.Step{Symbol: "t", Value: m.T, Unit: "m", Note: "mat thickness (given)"})
		t.Take(trace.Step{Symbol: "gamma_m", Value: m.Gamma, Unit: "kN/m3", Note: "unit weight of the mat (given)"})
	}
	lx, lin := lengthExpr(m)
	// q(B) = (F + γ_m t B L)/(B L)
	area := mul(S("B"), lx)
	load := S("F")
	base := []trace.Value{val("F", m.F, "kN")}
	if wt {
		load = add(S("F"), mul(S("gamma_m"), S("t"), area))
		base = append(base, val("gamma_m", m.Gamma, "kN/m3"), val("t", m.T, "m"))
	}
	qx := div(load, area)
	if m.B == 0 {
		if err := sizeMat(m, r, qx, append(base, lin...)); err != nil {
			return nil, err
		}
	} else {
		r.B = t.Take(trace.Step{Symbol: "B", Value: m.B, Unit: "m", Note: "mat width (given)"})
	}
	vB := val("B", r.B, "m")
	switch m.Plan {
	case MatSquare:
		r.L = t.Take(trace.Step{Symbol: "L", Value: r.B, Unit: "m", Note: "square mat: L = B"})
	case MatRatio:
		r.L = t.Eval(trace.Step{Symbol: "L", Formula: lx, Inputs: append(lin, vB), Unit: "m", Note: "length at the fixed L/B"})
	default:
		r.L = t.Take(trace.Step{Symbol: "L", Value: m.L, Unit: "m", Note: "mat length (given)"})
	}
	vL := val("L", r.L, "m")
	A := t.Eval(trace.Step{Symbol: "A", Formula: mul(S("B"), S("L")), Inputs: []trace.Value{vB, vL}, Unit: "m2", Note: "plan area of the mat"})
	var q float64
	if wt {
		r.Weight = t.Eval(trace.Step{Symbol: "W_m", Formula: mul(S("gamma_m"), S("t"), S("A")), Inputs: []trace.Value{val("gamma_m", m.Gamma, "kN/m3"), val("t", m.T, "m"), val("A", A, "m2")},
			Unit: "kN", Note: "own weight of the mat"})
		q = t.Eval(trace.Step{Symbol: "q", Formula: div(add(S("F"), S("W_m")), S("A")), Inputs: []trace.Value{val("F", m.F, "kN"), val("W_m", r.Weight, "kN"), val("A", A, "m2")},
			Unit: "kPa", Ref: refMat, Note: "bearing pressure under the mat (uniform, common practice)"})
	} else {
		q = t.Eval(trace.Step{Symbol: "q", Formula: div(S("F"), S("A")), Inputs: []trace.Value{val("F", m.F, "kN"), val("A", A, "m2")}, Unit: "kPa", Ref: refMat, Note: "bearing pressure under the mat (uniform, common practice)"})
	}
	r.Q = q
	r.Util = t.Eval(trace.Step{Symbol: "util", Formula: div(S("q"), S("q_a")), Inputs: []trace.Value{val("q", q, "kPa"), val("q_a", m.QAllow, "kPa")}, Ref: refMat, Note: "utilisation of the allowable pressure"})
	r.OK = r.Util <= 1+1e-9
	r.Footing = site.Footing{Name: m.Name, Shape: site.Rectangle, B: r.B, L: r.L}
	if r.L == r.B {
		r.Footing.Shape, r.Footing.L = site.Square, 0
	}
	if err := t.Err(); err != nil {
		return nil, err
	}
	if m.Z.Set {
		if err := matStress(m, r); err != nil {
			return nil, err
		}
	}
	r.Values = []trace.Value{val("B", r.B, "m"), val("L", r.L, "m"), val("q", r.Q, "kPa"), val("util", r.Util, "")}
	if r.Sized {
		r.Values = append(r.Values, val("B_req", r.BReq, "m"))
	}
	if wt {
		r.Values = append(r.Values, val("W_m", r.Weight, "kN"))
	}
	if r.HasZ {
		r.Values = append(r.Values, val("z", r.Z, "m"), val("Delta_sigma_s", r.Spread, "kPa"), val("Delta_sigma_c", r.Centre, "kPa"))
	}
	return r, t.Err()
}

// sizeMat solves q(B) = q_a for B by Brent's method on the printed
// formula, then rounds up to the step.
func sizeMat(m MatInput, r *MatResult, qx trace.Expr, in []trace.Value) error {
	t := &r.Trace
	r.Sized = true
	ins := append([]trace.Value{val("B", 0, "m")}, in...)
	g := func(B float64) (float64, error) {
		ins[0].V = B
		v, err := trace.Eval(qx, ins)
		return v - m.QAllow, err
	}
	lo := site.MinWidth
	hi := math.Inf(1)
	if m.Plan == MatFixedL {
		hi = m.L
	}
	g0, err := g(lo)
	if err != nil {
		return err
	}
	switch {
	case g0 <= 0:
		r.BReq = t.Take(trace.Step{Symbol: "B_req", Value: lo, Unit: "m", Note: "the least width already carries the load"})
	default:
		b, err := solve.Expand(g, lo, 2*lo, 2, 60)
		if err != nil {
			return err
		}
		root, err := solve.Brent(g, b.A, b.B, solve.Options{Tol: 1e-9})
		if err != nil {
			return err
		}
		if root.F > 0 {
			root.X += root.Tol
		}
		ins[0].V = root.X
		r.BReq = t.Take(trace.Step{Symbol: "B_req", Kind: trace.Solved, Formula: sub(qx, S("q_a")), Inputs: append(append([]trace.Value(nil), ins...), val("q_a", m.QAllow, "kPa")),
			Value: root.X, Unit: "m", Ref: refSolve, Note: "width at which q = q_a, solved by Brent's method"})
	}
	if r.BReq > hi+1e-12 {
		return &site.InputError{Where: "mat", Param: "L", Msg: fmt.Sprintf("the fixed L = %g m is too short: the mat needs B = %.3g m > L at q_a", m.L, r.BReq)}
	}
	if m.Step > 0 {
		r.B = t.Eval(trace.Step{Symbol: "B", Formula: trace.Named("roundup", roundUp, S("B_req"), S("Delta_B")), Inputs: []trace.Value{val("B_req", r.BReq, "m"), val("Delta_B", m.Step, "m")},
			Unit: "m", Note: "mat width: B_req rounded up to the increment"})
		if r.B > hi+1e-12 {
			r.B = t.Take(trace.Step{Symbol: "B", Value: hi, Unit: "m", Note: "mat width: the fixed length (the rounded width exceeded it)"})
		}
	} else {
		r.B = t.Take(trace.Step{Symbol: "B", Value: r.BReq, Unit: "m", Note: "mat width: B_req"})
	}
	return t.Err()
}

// matStress records the stress increase at Z below the mat: the average
// by load spread and the Boussinesq value under the centre.
func matStress(m MatInput, r *MatResult) error {
	r.Z, r.HasZ = m.Z.V, true
	t := &r.Trace
	t.Take(trace.Step{Symbol: "z_b", Value: r.Z, Unit: "m", Note: "depth of the subgrade below the mat (given)"})
	s, err := stress.Explain(t, r.Footing, stress.Options{Method: stress.Spread, Angle: m.Angle}, r.Z, r.Q, "load spread")
	if err != nil {
		return err
	}
	c, err := stress.Explain(t, r.Footing, stress.Options{Method: stress.Boussinesq, Point: stress.Centre}, r.Z, r.Q, "Boussinesq")
	if err != nil {
		return err
	}
	r.Spread, r.Centre = s, c
	return t.Err()
}
