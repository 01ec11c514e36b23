package platform

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
)

var (
	S   = trace.S
	N   = trace.N
	add = trace.Add
	sub = trace.Sub
	mul = trace.Mul
	div = trace.Div
	pow = trace.Pow
	fn  = trace.Fn
)

func val(sym string, v float64, unit string) trace.Value {
	return trace.Value{Symbol: sym, V: v, Unit: unit}
}

// calc carries one design.
type calc struct {
	in  Input
	o   Options
	t   *trace.Trace
	r   *Result
	kp  float64 // K_p tanδ
	ngp float64 // N_γ of the platform material
	nc  float64 // N_c (cohesive subgrade)
	ngs float64 // N_γ of a granular subgrade
}

// Design runs the working-platform method of BR 470 (2004) Appendix A on
// in: for each loading case the subgrade alone, the platform material
// alone and, unless a thickness is given, the thickness at which the
// punching resistance reaches the design pressure; then every case at the
// design thickness, and the EN 1997-1 two-layer check beside it. Input
// outside its range returns site.Errors; the result never holds NaN.
func Design(in Input) (*Result, error) {
	if err := validate(in); err != nil {
		return nil, err
	}
	c := &calc{in: in, o: in.Options, r: &Result{Subgrade: in.Subgrade.Kind, Given: in.D.Set}}
	c.t = &c.r.Trace
	c.t.Steps = make([]trace.Step, 0, 16+30*len(in.Cases))
	c.common()
	for _, k := range in.Cases {
		c.r.Cases = append(c.r.Cases, c.required(k))
	}
	if err := c.t.Err(); err != nil {
		return nil, err
	}
	if err := c.thickness(); err != nil {
		return nil, err
	}
	for i := range c.r.Cases {
		c.check(&c.r.Cases[i])
	}
	if err := c.t.Err(); err != nil {
		return nil, err
	}
	c.cautions()
	c.compare()
	c.summarise()
	return c.r, nil
}

// common records the material steps shared by the cases.
func (c *calc) common() {
	t, p, s := c.t, c.in.Platform, c.in.Subgrade
	vphi := val("phi'_p", p.Phi, "deg")
	t.Take(trace.Step{Symbol: "phi'_p", Value: p.Phi, Unit: "deg", Note: "angle of shearing resistance of the platform material (given)"})
	t.Take(trace.Step{Symbol: "gamma_p", Value: p.Gamma, Unit: "kN/m3", Note: "unit weight of the platform material (given)"})
	if c.o.KpTanDelta.Set {
		c.kp = t.Take(trace.Step{Symbol: "K_p_tan_delta", Value: c.o.KpTanDelta.V, Note: "punching shear coefficient K_p·tanδ (given)"})
	} else {
		c.kp = t.Take(trace.Step{Symbol: "K_p_tan_delta", Kind: trace.Tabulated, Value: bearing.KpTanDelta(p.Phi), Inputs: []trace.Value{vphi}, Ref: refKp,
			Note: "punching shear coefficient read from the table against φ′_p (log-linear between 35°, 40° and 45°)"})
	}
	nq := t.Eval(trace.Step{Symbol: "N_q_p", Formula: nqExpr("phi'_p"), Inputs: []trace.Value{vphi}, Ref: refNg, Note: "bearing capacity factor of the platform material"})
	c.ngp = t.Eval(trace.Step{Symbol: "N_gamma_p", Formula: ngExpr("N_q_p", "phi'_p"), Inputs: []trace.Value{val("N_q_p", nq, ""), vphi}, Ref: refNg,
		Note: "bearing capacity factor of the platform material"})
	switch s.Kind {
	case Cohesive:
		t.Take(trace.Step{Symbol: "c_u", Value: s.Cu, Unit: "kPa", Note: "undrained shear strength of the subgrade (given)"})
		c.nc = t.Eval(trace.Step{Symbol: "N_c", Formula: add(S("pi"), N(2)), Ref: refNc, Note: "bearing capacity factor of the undrained subgrade"})
	case Granular:
		vs := val("phi'_s", s.Phi, "deg")
		t.Take(trace.Step{Symbol: "phi'_s", Value: s.Phi, Unit: "deg", Note: "angle of shearing resistance of the subgrade (given)"})
		t.Take(trace.Step{Symbol: "gamma_s", Value: s.Gamma, Unit: "kN/m3", Note: "unit weight of the subgrade (given)"})
		nqs := t.Eval(trace.Step{Symbol: "N_q_s", Formula: nqExpr("phi'_s"), Inputs: []trace.Value{vs}, Ref: refNg, Note: "bearing capacity factor of the subgrade"})
		c.ngs = t.Eval(trace.Step{Symbol: "N_gamma_s", Formula: ngExpr("N_q_s", "phi'_s"), Inputs: []trace.Value{val("N_q_s", nqs, ""), vs}, Ref: refNg,
			Note: "bearing capacity factor of the subgrade"})
	}
	note := "least platform thickness of the method (0.3 m, from memory)"
	if c.o.DMin != 0 {
		note = "least platform thickness (given)"
	}
	c.r.DMin = t.Take(trace.Step{Symbol: "D_min", Value: c.o.dMin(), Unit: "m", Ref: refDMin, Note: note})
}

// nqExpr is N_q = e^(π tanφ′) tan²(45° + φ′/2).
func nqExpr(phi string) trace.Expr {
	return mul(fn("exp", mul(S("pi"), fn("tan", S(phi)))), pow(fn("tan", add(trace.Deg(45), div(S(phi), N(2)))), N(2)))
}

// ngExpr is Vesić's N_γ = 2(N_q + 1) tanφ′.
func ngExpr(nq, phi string) trace.Expr {
	return mul(N(2), add(S(nq), N(1)), fn("tan", S(phi)))
}

// punchExpr is the method's resistance of the platform over the subgrade
// at thickness D: R_s + γ_p D² K_p tanδ s_p / W, with (1 + 2D/W) on the
// punching term over a granular subgrade when Options.DepthTerm is set.
func (c *calc) punchExpr() trace.Expr {
	terms := []trace.Expr{S("gamma_p"), pow(S("D"), N(2))}
	if c.o.DepthTerm {
		terms = append(terms, add(N(1), div(mul(N(2), S("D")), S("W"))))
	}
	terms = append(terms, S("K_p_tan_delta"), S("s_p"))
	return add(S("R_s"), div(mul(terms[0], terms[1:]...), S("W")))
}

func (c *calc) punchInputs(k *CaseResult, sp, D float64) []trace.Value {
	return []trace.Value{val("R_s", k.Rs, "kPa"), val("gamma_p", c.in.Platform.Gamma, "kN/m3"), val("D", D, "m"),
		val("W", k.W, "m"), val("K_p_tan_delta", c.kp, ""), val("s_p", sp, "")}
}

// required works one case up to its required thickness.
func (c *calc) required(k Case) CaseResult {
	t, name := c.t, k.Label()
	r := CaseResult{Name: name, Kind: k.Kind, Q: k.Q, W: k.W, L: k.L, Factor: k.factor(), FactorNone: k.factorNone()}
	step := func(s trace.Step) trace.Step { s.Case = name; return s }
	vW, vL := val("W", k.W, "m"), val("L", k.L, "m")
	t.Take(step(trace.Step{Symbol: "q_k", Value: k.Q, Unit: "kPa", Note: "characteristic bearing pressure under the track (given)"}))
	t.Take(step(trace.Step{Symbol: "W", Value: k.W, Unit: "m", Note: "width of the loaded area (given)"}))
	t.Take(step(trace.Step{Symbol: "L", Value: k.L, Unit: "m", Note: "length of the loaded area (given)"}))
	fnote := func(given bool, def string) string {
		if given {
			return "load factor (given)"
		}
		return def
	}
	t.Take(step(trace.Step{Symbol: "gamma_q", Value: r.Factor, Ref: refFactors, Note: fnote(k.Factor != 0, "load factor of "+k.Kind.String()+" with a platform (1.6 case 1, 1.2 case 2; from memory, as reproduced publicly)")}))
	t.Take(step(trace.Step{Symbol: "gamma_q0", Value: r.FactorNone, Ref: refFactors, Note: fnote(k.FactorNone != 0, "load factor of "+k.Kind.String()+" on the subgrade alone (2.0 case 1, 1.5 case 2; as reproduced publicly)")}))
	vq := val("q_k", k.Q, "kPa")
	r.QD = t.Eval(step(trace.Step{Symbol: "q_d", Formula: mul(S("gamma_q"), S("q_k")), Inputs: []trace.Value{val("gamma_q", r.Factor, ""), vq}, Unit: "kPa", Ref: refFactors, Note: "design bearing pressure with a platform"}))
	r.QD0 = t.Eval(step(trace.Step{Symbol: "q_d0", Formula: mul(S("gamma_q0"), S("q_k")), Inputs: []trace.Value{val("gamma_q0", r.FactorNone, ""), vq}, Unit: "kPa", Ref: refFactors, Note: "design bearing pressure on the subgrade alone"}))
	r.sp = t.Eval(step(trace.Step{Symbol: "s_p", Formula: add(N(1), div(S("W"), S("L"))), Inputs: []trace.Value{vW, vL}, Ref: refShape, Note: "shape factor of the punching term"}))
	sg := t.Eval(step(trace.Step{Symbol: "s_gamma", Formula: sub(N(1), mul(N(0.3), div(S("W"), S("L")))), Inputs: []trace.Value{vW, vL}, Ref: refShape, Note: "shape factor of the N_γ term"}))
	s := c.in.Subgrade
	if s.Kind == Cohesive {
		sc := t.Eval(step(trace.Step{Symbol: "s_c", Formula: add(N(1), mul(N(0.2), div(S("W"), S("L")))), Inputs: []trace.Value{vW, vL}, Ref: refShape, Note: "shape factor of the N_c term"}))
		r.Rs = t.Eval(step(trace.Step{Symbol: "R_s", Formula: mul(S("c_u"), S("N_c"), S("s_c")), Inputs: []trace.Value{val("c_u", s.Cu, "kPa"), val("N_c", c.nc, ""), val("s_c", sc, "")},
			Unit: "kPa", Ref: refCoh, Note: "bearing resistance of the subgrade alone"}))
	} else {
		r.Rs = t.Eval(step(trace.Step{Symbol: "R_s", Formula: mul(N(0.5), S("gamma_s"), S("W"), S("N_gamma_s"), S("s_gamma")),
			Inputs: []trace.Value{val("gamma_s", s.Gamma, "kN/m3"), vW, val("N_gamma_s", c.ngs, ""), val("s_gamma", sg, "")}, Unit: "kPa", Ref: refGran, Note: "bearing resistance of the subgrade alone"}))
	}
	r.UtilNone = t.Eval(step(trace.Step{Symbol: "util_0", Formula: div(S("q_d0"), S("R_s")), Inputs: []trace.Value{val("q_d0", r.QD0, "kPa"), val("R_s", r.Rs, "kPa")},
		Ref: refFactors, Note: "utilisation of the subgrade without a platform: above 1, a platform is needed"}))
	r.Needed = r.UtilNone > 1
	r.Rp = t.Eval(step(trace.Step{Symbol: "R_p", Formula: mul(N(0.5), S("gamma_p"), S("W"), S("N_gamma_p"), S("s_gamma")),
		Inputs: []trace.Value{val("gamma_p", c.in.Platform.Gamma, "kN/m3"), vW, val("N_gamma_p", c.ngp, ""), val("s_gamma", sg, "")}, Unit: "kPa", Ref: refLimit,
		Note: "bearing resistance of the platform material alone: the upper limit of R_d"}))
	ratio := c.o.dMaxRatio()
	r.DMax = t.Eval(step(trace.Step{Symbol: "D_max", Formula: mul(N(ratio), S("W")), Inputs: []trace.Value{vW}, Unit: "m", Ref: refDMax, Note: "largest thickness for which the method is used"}))
	switch {
	case r.QD > r.Rp:
		t.Take(step(trace.Step{Symbol: "D_req", Value: 0, Unit: "m", Ref: refLimit, Note: "no thickness: q_d exceeds the resistance of the platform material alone"}))
	case r.QD <= r.Rs:
		r.Solvable = true
		t.Take(step(trace.Step{Symbol: "D_req", Value: 0, Unit: "m", Ref: refCoh, Note: "none: the subgrade alone carries q_d"}))
	default:
		r.Solvable = true
		c.solve(&r)
	}
	return r
}

// solve finds D with R_s + punching(D) = q_d by Brent's method; the
// function solved is the printed formula evaluated by the recorder's
// evaluator.
func (c *calc) solve(r *CaseResult) {
	e := c.punchExpr()
	in := c.punchInputs(r, r.sp, 0)
	f := func(D float64) (float64, error) {
		in[2].V = D
		v, err := trace.Eval(e, in)
		return v - r.QD, err
	}
	b, err := solve.Expand(f, 0, r.W, 2, 60)
	var root solve.Root
	if err == nil {
		root, err = solve.Brent(f, b.A, b.B, solve.Options{Tol: 1e-9})
	}
	if err != nil {
		c.t.Take(trace.Step{Symbol: "D_req", Value: math.NaN(), Unit: "m", Case: r.Name}) // recorded as the trace's error
		return
	}
	if root.F < 0 { // the root from above, so that the thickness passes
		root.X += root.Tol
	}
	r.DReq, r.Iter = root.X, b.Evals+root.Iter+2
	ins := append([]trace.Value{val("q_d", r.QD, "kPa")}, c.punchInputs(r, r.sp, root.X)...)
	c.t.Take(trace.Step{Symbol: "D_req", Kind: trace.Solved, Formula: sub(e, S("q_d")), Inputs: ins, Value: root.X, Unit: "m", Ref: refSolve, Case: r.Name,
		Note: "thickness at which R_d = q_d: the root of the formula, solved by Brent's method (" + strconv.Itoa(r.Iter) + " evaluations, to 1e-9 m)"})
}

// thickness sets the design thickness.
func (c *calc) thickness() error {
	t, r := c.t, c.r
	r.DMax = math.Inf(1)
	solved := true
	var syms []trace.Expr
	var ins []trace.Value
	for i, k := range r.Cases {
		r.DMax = math.Min(r.DMax, k.DMax)
		r.Needed = r.Needed || k.Needed
		if !k.Solvable {
			solved = false
			continue
		}
		r.DReq = math.Max(r.DReq, k.DReq)
		s := "D_req" + strconv.Itoa(i+1)
		syms = append(syms, S(s))
		ins = append(ins, val(s, k.DReq, "m"))
	}
	if in := c.in; in.D.Set {
		r.D = t.Take(trace.Step{Symbol: "D", Value: in.D.V, Unit: "m", Note: "platform thickness to check (given)"})
		return nil
	}
	syms = append(syms, S("D_min"))
	ins = append(ins, val("D_min", r.DMin, "m"))
	note := "design thickness: the larger of the cases' required thickness and the least thickness"
	if !solved {
		note += " (a case no thickness can carry is left out)"
	}
	var f trace.Expr = S("D_min")
	if len(syms) > 1 {
		f = fn("max", syms...)
	}
	if st := c.o.Step; st > 0 {
		f = trace.Named("roundup", roundUp, f, S("Delta_D"))
		ins = append(ins, val("Delta_D", st, "m"))
		note += ", rounded up to the increment ΔD"
	}
	r.D = t.Eval(trace.Step{Symbol: "D", Formula: f, Inputs: ins, Unit: "m", Note: note})
	return t.Err()
}

// check works one case at the design thickness.
func (c *calc) check(k *CaseResult) {
	t := c.t
	step := func(s trace.Step) trace.Step { s.Case = k.Name; return s }
	pu := t.Eval(step(trace.Step{Symbol: "R_pu", Formula: c.punchExpr(), Inputs: c.punchInputs(k, k.sp, c.r.D), Unit: "kPa", Ref: c.refPunch(),
		Note: "punching resistance of the platform over the subgrade at D"}))
	k.Rd = t.Eval(step(trace.Step{Symbol: "R_d", Formula: fn("min", S("R_pu"), S("R_p")), Inputs: []trace.Value{val("R_pu", pu, "kPa"), val("R_p", k.Rp, "kPa")}, Unit: "kPa", Ref: refLimit,
		Note: "design bearing resistance: punching, at most the platform material's own resistance"}))
	k.Util = t.Eval(step(trace.Step{Symbol: "util", Formula: div(S("q_d"), S("R_d")), Inputs: []trace.Value{val("q_d", k.QD, "kPa"), val("R_d", k.Rd, "kPa")}, Ref: c.refPunch(),
		Note: "utilisation at the design thickness"}))
	k.OK = k.Util <= 1+1e-9 && k.Solvable
}

func (c *calc) refPunch() trace.Ref {
	if c.in.Subgrade.Kind == Granular {
		return refGran
	}
	return refCoh
}

// summarise fills the verdict and the summary values.
func (c *calc) summarise() {
	r := c.r
	r.OK = true
	for i, k := range r.Cases {
		r.OK = r.OK && k.OK
		if k.Util > r.Cases[r.Governing].Util {
			r.Governing = i
		}
	}
	flag := 0.0
	if r.Needed {
		flag = 1
	}
	r.Values = []trace.Value{val("D", r.D, "m"), val("D_req", r.DReq, "m"), val("D_min", r.DMin, "m"), val("D_max", r.DMax, "m"),
		val("platform_needed", flag, ""), val("util", r.Cases[r.Governing].Util, "")}
	for i, k := range r.Cases {
		n := strconv.Itoa(i + 1)
		r.Values = append(r.Values, val("q_d"+n, k.QD, "kPa"), val("R_s"+n, k.Rs, "kPa"), val("R_p"+n, k.Rp, "kPa"),
			val("R_d"+n, k.Rd, "kPa"), val("util_"+n, k.Util, ""), val("util_0_"+n, k.UtilNone, ""))
		if k.EC7 != nil && k.EC7.Governing >= 0 {
			r.Values = append(r.Values, val("util_EC7_"+n, k.EC7.Cases[k.EC7.Governing].Util, ""))
		}
	}
}

// roundUp is the smallest multiple of a[1] not less than a[0], with a
// multiple a[0] already is (to 1e-9 of a step) kept as it is.
func roundUp(a []float64) float64 {
	return math.Ceil(a[0]/a[1]-1e-9) * a[1]
}

func kpa(v float64) string { return fmt.Sprintf("%.1f kPa", v/kPa) }
