package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// Try is one bearing pressure tried by Allowable and the settlement there.
type Try struct {
	Q, S float64 // Pa, m
}

// Allow is the allowable bearing pressure for a settlement limit.
type Allow struct {
	Q     float64 // allowable gross bearing pressure q_allow, Pa
	QNet  float64 // q_allow − σ_v0, Pa
	S     float64 // total settlement at q_allow, m
	Limit float64 // the settlement limit, m
	Iter  int     // Brent iterations
	Tol   float64 // tolerance reached on q, Pa
	Lo    float64 // bracket: q where s < limit (no net load), Pa
	Hi    float64 // bracket: q where s > limit, Pa
	Tries []Try   // every pressure tried (bracket search then Brent), in order

	Result  *Result // the full calculation at q_allow
	Trace   trace.Trace
	Symbols []trace.Value // q_allow, q_net_allow, s_allow, s_lim
}

// AllowTol is the tolerance on q for Allowable: 1 Pa.
const AllowTol = 1.0

// Allowable finds the gross bearing pressure q_allow at which the total
// settlement (immediate + consolidation + secondary at the design life)
// of in equals sLim (m): it brackets the root upward from the pressure
// that removes no net load (q = σ_v0 at the base), doubling the trial net
// pressure from 100 kPa up to 20 MPa, then solves s_total(q) = s_lim by
// Brent's method (Brent 1973, ch. 4) to AllowTol. in.Q and in.V are
// ignored. The capacity block combines q_allow with the bearing
// resistance and takes the lower.
func Allowable(in Input, sLim float64) (*Allow, error) {
	if !(sLim > 0) || sLim > 1 {
		return nil, &site.RangeError{Where: in.Footing.Name, Param: "s_lim", Value: sLim * 1e3, Min: 0, Max: 1000, Unit: "mm", OpenMin: true}
	}
	in.V = site.Opt{}
	in.Limit = site.Some(sLim)
	probe := in
	probe.Q = site.Some(1e5)
	if _, err := probe.validate(); err != nil {
		return nil, err
	}
	sv := in.Ground.SigmaV(in.Footing.D)
	a := &Allow{Limit: sLim}
	f := func(q float64) (float64, error) {
		x := in
		x.Q = site.Some(q)
		r, err := compute(x, false)
		if err != nil {
			return 0, err
		}
		a.Tries = append(a.Tries, Try{Q: q, S: r.Total})
		return r.Total - sLim, nil
	}
	const qMax = 20e6
	lo := math.Max(sv, 1)
	flo, err := f(lo)
	if err != nil {
		return nil, err
	}
	if flo >= 0 {
		s0, sl := units.Apart(flo+sLim, sLim, mmUnit, -1, -1)
		return nil, &site.InputError{Where: in.Footing.Name, Param: "s_lim", Msg: fmt.Sprintf("the settlement with no net load (%s mm) already reaches the limit %s mm", s0, sl)}
	}
	hi := 0.0
	for step := 100e3; ; step *= 2 {
		q := math.Min(sv+step, qMax)
		fq, err := f(q)
		if err != nil {
			return nil, err
		}
		if fq >= 0 {
			hi = q
			break
		}
		lo = q
		if q >= qMax {
			return nil, &site.InputError{Where: in.Footing.Name, Param: "s_lim", Msg: fmt.Sprintf("the settlement stays below %.1f mm up to q = %g kPa", sLim*1e3, qMax/1e3)}
		}
	}
	a.Lo, a.Hi = lo, hi
	root, err := solve.Brent(f, lo, hi, solve.Options{Tol: AllowTol})
	if err != nil {
		return nil, err
	}
	a.Q, a.Iter, a.Tol = root.X, root.Iter, root.Tol
	x := in
	x.Q = site.Some(a.Q)
	res, err := compute(x, true)
	if err != nil {
		return nil, err
	}
	a.Result = res
	a.S = res.Total

	t := &a.Trace
	cs := "allowable pressure"
	ref := trace.Ref{Source: Brent1973, Clause: "ch. 4, zero"}
	take := func(sym string, kind trace.Kind, v float64, unit string, r trace.Ref, note string) {
		t.Take(trace.Step{Symbol: sym, Kind: kind, Value: v, Unit: unit, Ref: r, Note: note, Case: cs})
	}
	// The bracket, the root and the settlement there are the solver's.
	take("s_lim", trace.Given, sLim, "mm", trace.Ref{}, "settlement limit")
	take("q_lo", trace.Solved, a.Lo, "kPa", trace.Ref{}, "bracket: settlement below the limit")
	take("q_hi", trace.Solved, a.Hi, "kPa", trace.Ref{}, "bracket: settlement above the limit (net pressure doubled from 100 kPa)")
	take("q_allow", trace.Solved, a.Q, "kPa", ref, fmt.Sprintf("s_total(q) = s_lim solved by Brent's method: %d iterations, %d settlement calculations, tolerance %.3g kPa", a.Iter, len(a.Tries), a.Tol/1e3))
	a.QNet = t.Eval(trace.Step{Symbol: "q_net_allow", Formula: fxQNetAllow, Inputs: []trace.Value{val("q_allow", a.Q, "kPa"), val("sigma_v0", res.SigmaV0, "kPa")},
		Unit: "kPa", Note: "allowable net bearing pressure", Case: cs})
	take("s_allow", trace.Solved, a.S, "mm", trace.Ref{}, "total settlement at q_allow (working below)")
	u := res.Trace
	for i := range u.Steps {
		u.Steps[i].Case = prefix(u.Steps[i].Case)
	}
	for i := range u.Cautions {
		u.Cautions[i].Case = prefix(u.Cautions[i].Case)
	}
	t.Append(u, "")
	if err := t.Err(); err != nil {
		return nil, fmt.Errorf("allowable pressure of %s: %w", in.Footing.Name, err)
	}
	a.Symbols = []trace.Value{val("q_allow", a.Q, "kPa"), val("q_net_allow", a.QNet, "kPa"), val("s_allow", a.S, "mm"), val("s_lim", sLim, "mm")}
	return a, nil
}

var fxQNetAllow = trace.Sub(trace.S("q_allow"), trace.S("sigma_v0"))

func prefix(c string) string {
	if c == "" {
		return "at q_allow"
	}
	return "at q_allow: " + c
}
