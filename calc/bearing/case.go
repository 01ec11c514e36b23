package bearing

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// geo is the effective geometry and load of one case.
type geo struct {
	strip, circC bool // strip; Terzaghi circle under central load (diameter used)
	Bp, Lp, Ap   float64
	Bf, D, alpha float64
	V, H         float64
	eB, eL       float64
	noDepth      bool    // no depth factors (lower layer, load spread)
	swap         bool    // B′ lies along L (the shorter effective side)
	beta         float64 // inclination of the load, atan(H/V), when H > 0
	k            float64 // Hansen's depth ratio, when recorded
}

// soil is the design strength of one layer in one case.
type soil struct {
	und           bool
	cu, c, phi    float64
	gam, q        float64 // unit weight of the N_γ term; overburden (q or q′)
	layer         int
	local         bool
	phiClamp      bool
	kPhi, kC, kCu string // characteristic symbols
	nPhi, nC, nCu string // design symbols
}

var (
	gPhi = "gamma_phi"
	gC   = "gamma_c"
	gCu  = "gamma_cu"
)

// Formulas that do not depend on the input, built once.
var (
	fRkUlt  = trace.Mul(trace.S("q_ult"), trace.S("A'"))
	fRkLim  = trace.Mul(trace.S("q_lim"), trace.S("A'"))
	fRd     = trace.Div(trace.S("R_k"), trace.S("gamma_Rv"))
	fQEd    = trace.Div(trace.S("V_d"), trace.S("A'"))
	fQRd    = trace.Div(trace.S("R_d"), trace.S("A'"))
	fUtil   = trace.Div(trace.S("V_d"), trace.S("R_d"))
	fUtilHc = trace.Fn("max", fUtil, trace.Div(trace.S("H_d"), trace.Mul(trace.S("A'"), trace.S("c_u_d"))))
	fRdFS   = map[string]rdForms{"q_ult": mkRdForms("q_ult"), "q_lim": mkRdForms("q_lim")}
	fU      = trace.Mul(trace.S("u_0"), trace.S("A_b"))
	fVdEff  = trace.Sub(trace.S("V_d_tot"), trace.S("U"))
	fE      = trace.Fn("sqrt", trace.Add(trace.Pow(trace.S("e_B"), trace.N(2)), trace.Pow(trace.S("e_L"), trace.N(2))))
	fHd     = trace.Fn("sqrt", trace.Add(trace.Pow(trace.S("H_B_d"), trace.N(2)), trace.Pow(trace.S("H_L_d"), trace.N(2))))
	feB     = trace.Div(trace.Fn("abs", trace.S("M_B_d")), trace.S("V_d"))
	feL     = trace.Div(trace.Fn("abs", trace.S("M_L_d")), trace.S("V_d"))
	fBpB    = trace.Sub(trace.S("B"), trace.Mul(trace.N(2), trace.S("e_B")))
	fBpL    = trace.Sub(trace.S("L"), trace.Mul(trace.N(2), trace.S("e_L")))
	fApStr  = trace.S("B'")
	fApRect = trace.Mul(trace.S("B'"), trace.S("L'"))
	fBeta   = trace.Fn("atan", trace.Div(trace.S("H_d"), trace.S("V_d")))
	fk1     = trace.Div(trace.S("D"), trace.S("B"))
	fk2     = trace.Fn("atan", trace.Div(trace.S("D"), trace.S("B")))
	fThB    = trace.Fn("atan2", trace.Fn("abs", trace.S("H_B_d")), trace.Fn("abs", trace.S("H_L_d")))
	fThL    = trace.Fn("atan2", trace.Fn("abs", trace.S("H_L_d")), trace.Fn("abs", trace.S("H_B_d")))
	fIdent  = map[string]expr{"sigma_v0": trace.S("sigma_v0"), "sigma'_v0": trace.S("sigma'_v0"), "gamma'_k": trace.S("gamma'_k")}
	fOver   = mkOverForms()
	fSoil   = mkSoilForms()
)

// rdForms are the allowable bearing resistances of an allowable-stress
// approach for the ultimate pressure q (q_ult, or q_lim of a two-layer
// check): FS on the gross pressure with and without water at the base, FS
// on the net pressure with the effective (q′) or total (q) overburden.
type rdForms struct{ grossU, gross, net, netU trace.Expr }

func mkRdForms(q string) rdForms {
	A, Q, FS, u0 := trace.S("A'"), trace.S(q), trace.S("FS"), trace.S("u_0")
	net := func(q0 string) trace.Expr {
		return trace.Mul(A, trace.Add(trace.Div(trace.Sub(Q, trace.S(q0)), FS), trace.S(q0)))
	}
	return rdForms{
		grossU: trace.Mul(A, trace.Sub(trace.Div(trace.Add(Q, u0), FS), u0)),
		gross:  trace.Mul(A, trace.Div(Q, FS)),
		net:    net("q'"),
		netU:   net("q"),
	}
}

// soilForm returns the design-value formula of characteristic symbol k
// with partial factor g, for an angle (tan) or a strength, with or without
// the local-shear ⅔; clamp (an angle) bounds it below by phiMin. The table
// is built at start-up and only read after.
func soilForm(k, g string, angle, local, clamp bool) expr {
	return fSoil[soilKey{k, g, angle, local, clamp}]
}

type soilKey struct {
	k, g                string
	angle, local, clamp bool
}

func mkOverForms() map[string]expr {
	m := map[string]expr{}
	for _, from := range []string{"sigma_v0", "sigma'_v0", "gamma'_k"} {
		m[from] = trace.Div(trace.S(from), trace.S("gamma_gamma"))
	}
	return m
}

func mkSoilForms() map[soilKey]expr {
	fSoil := map[soilKey]expr{}
	for _, k := range []struct {
		k, g  string
		angle bool
	}{{"phi'_k", gPhi, true}, {"phi'_2k", gPhi, true}, {"phi'_cv_k", gPhi, true}, {"delta_k", gPhi, true},
		{"c'_k", gC, false}, {"c'_2k", gC, false}, {"c_u_k", gCu, false}, {"c_u_2k", gCu, false}} {
		for _, local := range []bool{false, true} {
			var f expr
			switch {
			case k.angle && local:
				f = trace.Fn("atan", trace.Div(trace.Mul(trace.N(2.0/3), trace.Fn("tan", trace.S(k.k))), trace.S(k.g)))
			case k.angle:
				f = trace.Fn("atan", trace.Div(trace.Fn("tan", trace.S(k.k)), trace.S(k.g)))
			case local:
				f = trace.Div(trace.Mul(trace.N(2.0/3), trace.S(k.k)), trace.S(k.g))
			default:
				f = trace.Div(trace.S(k.k), trace.S(k.g))
			}
			fSoil[soilKey{k.k, k.g, k.angle, local, false}] = f
			if k.angle {
				fSoil[soilKey{k.k, k.g, k.angle, local, true}] = trace.Fn("max", f, trace.N(phiMin))
			}
		}
	}
	return fSoil
}

// phiMin is the least φ′ used in a drained formula: the factors are then
// their φ′ → 0 limits to within 1e-8 without dividing by tan 0.
const phiMin = 1e-4

// bearingCase checks one design load under one drainage condition.
func (c *calc) bearingCase(ld design.Load, d Drainage) {
	name := ld.Name + " · " + d.String()
	c.cas = name
	c.hcLim = false
	c.pf = [4]bool{}
	start := len(c.t.Steps)
	ld.Record(c.t, c.acts, name, c.uF, c.uM)
	var u float64
	if d == Drained && c.u0 > 0 && !c.in.gross {
		ld.V, u = c.buoyant(start, ld.V)
	}
	if ld.V <= 0 {
		if c.r.Uplift == 0 || ld.V > c.r.UpliftV {
			c.r.UpliftV = ld.V
		}
		c.r.Uplift++
		c.warn("uplift", trace.SevWarning, ref652, fmt.Sprintf("%s: V_d = %.1f %s is not a downward load: the base is in tension or lifts, so bearing does not apply; check uplift and overturning separately.", name, ld.V/kN, c.uF), val("V_d", ld.V, c.uF))
		return
	}
	g, ok := c.geometry(ld, false)
	cs := Case{Name: name, Combination: ld.Name, Drainage: d, V: ld.V, H: g.H, EB: g.eB, EL: g.eL, U: u}
	if d == Drained {
		cs.U0 = c.u0
	}
	if !ok {
		cs.Util = c.take("util", UtilCap, "", trace.Ref{}, "no effective area: the check fails")
		cs.Factors = c.factors(start)
		c.r.Cases = append(c.r.Cases, cs)
		return
	}
	cs.B, cs.A = g.Bp, g.Ap
	if !g.strip {
		cs.L = g.Lp
	}
	fl := c.g.Layers[c.fi]
	und := undrainedIn(fl, d)
	s := c.designSoil(c.fi, und, ld.Set.Material, false)
	gg := ld.Set.Material.GammaGamma
	if und {
		s.q = c.overStep("q", "sigma_v0", c.sv0, gg, "total overburden at the base")
	} else {
		s.q = c.overStep("q'", "sigma'_v0", c.sv0e, gg, "effective overburden at the base")
		s.gam = c.overStep("gamma'", "gamma'_k", c.gEffK, gg, "unit weight in the N_γ term")
	}
	qult := c.resist(c.opt.Method, fMain, s, &g)
	qsym, qlim := "q_ult", qult
	if c.weak >= 0 {
		if tl, q := c.twoLayer(ld, d, &g, s, qult); tl != nil {
			cs.TwoLayer = tl
			qsym, qlim = "q_lim", q
		}
	}
	cs.QUlt = qlim
	vA, vV := val("A'", g.Ap, c.uA), val("V_d", ld.V, c.uF)
	vq := val(qsym, qlim, "kPa")
	fRk := fRkUlt
	if qsym == "q_lim" {
		fRk = fRkLim
	}
	rk := c.eval("R_k", fRk, c.uF, ref652, "characteristic bearing resistance", vq, vA)
	var rd float64
	if c.ap.Allowable() {
		q0, q0s := s.q, "q'"
		if und {
			q0s = "q"
		}
		fs := fRdFS[qsym]
		switch {
		case c.opt.FSOnGross && cs.U0 > 0:
			// gross total q_ult = q′_ult + u_0 over FS, less u_0 back to effective
			rd = c.eval("R_d", fs.grossU, c.uF, trace.Ref{},
				"allowable bearing resistance, FS on the gross pressure (fs_on = gross): gross total ultimate pressure q′ + u_0 over FS, less u_0 (common practice)", vA, vq, val("u_0", cs.U0, "kPa"), val("FS", c.ap.FS, ""))
		case c.opt.FSOnGross:
			rd = c.eval("R_d", fs.gross, c.uF, trace.Ref{},
				"allowable bearing resistance, FS on the gross ultimate pressure (fs_on = gross; common practice)", vA, vq, val("FS", c.ap.FS, ""))
		default:
			f := fs.net
			if und {
				f = fs.netU
			}
			rd = c.eval("R_d", f, c.uF, trace.Ref{},
				"allowable bearing resistance: net ultimate pressure over FS plus overburden (fs_on = net; common practice)", vA, vq, val(q0s, q0, "kPa"), val("FS", c.ap.FS, ""))
		}
	} else {
		grv := c.take("gamma_Rv", ld.Set.Resistance.GammaRv, "", refA5, "partial factor on bearing resistance ("+ld.Set.Resistance.Name+")")
		rd = c.eval("R_d", fRd, c.uF, trace.Ref{Source: trace.EN1997, Clause: "2.4.7.3.3, eq. (2.7b)"}, "design bearing resistance", val("R_k", rk, c.uF), val("gamma_Rv", grv, ""))
	}
	cs.R = rd
	cs.QEd = c.eval("q_Ed", fQEd, "kPa", ref652, "design bearing pressure on the effective area", vV, vA)
	cs.QRd = c.eval("q_Rd", fQRd, "kPa", ref652, "design bearing resistance as a pressure", val("R_d", rd, c.uF), vA)
	switch {
	case rd <= 0:
		cs.Util = c.take("util", UtilCap, "", trace.Ref{}, "no bearing resistance: the check fails")
	case c.hcLim:
		cs.Util = c.eval("util", fUtilHc, "", refD3,
			"utilisation: H_d exceeds A′c_u,d, the limit of D.3", vV, val("R_d", rd, c.uF), val("H_d", g.H, c.uF), vA, val("c_u_d", s.cu, "kPa"))
	default:
		cs.Util = c.eval("util", fUtil, "", ref652, "utilisation V_d/R_d", vV, val("R_d", rd, c.uF))
	}
	cs.Util = math.Min(cs.Util, UtilCap)
	cs.OK = cs.Util <= 1+1e-12
	cs.Factors = c.factors(start)
	c.r.Cases = append(c.r.Cases, cs)
}

// overStep records q = σ/γ_γ (the identity when γ_γ = 1).
func (c *calc) overStep(s, from string, v, gg float64, note string) float64 {
	unit := "kPa"
	if strings.HasPrefix(s, "gamma") {
		unit = "kN/m3"
	}
	if gg == 1 {
		return c.eval(s, fIdent[from], unit, trace.Ref{}, note, val(from, v, unit))
	}
	if !c.pf[3] {
		c.pf[3] = true
		c.take("gamma_gamma", gg, "", refA4, "partial factor on unit weight")
	}
	return c.eval(s, fOver[from], unit, refMat, note, val(from, v, unit), val("gamma_gamma", gg, ""))
}

// factors collects every factor recorded since step start.
func (c *calc) factors(start int) map[string]float64 {
	m := make(map[string]float64, 24)
	for _, s := range c.t.Steps[start:] {
		if isFactor(s.Symbol) {
			m[s.Symbol] = s.Value
		}
	}
	return m
}

func isFactor(s string) bool {
	switch s {
	case "m", "k", "r_q", "r_a", "gamma_G_sup", "gamma_G_inf", "gamma_Q", "gamma_phi", "gamma_c", "gamma_cu", "gamma_gamma", "gamma_Rv", "gamma_Rh", "FS":
		return true
	}
	for _, p := range []string{"N_", "s_", "d_", "i_", "b_", "s'_", "d'_", "i'_", "b'_", "m_", "K_", "psi_0_"} {
		if strings.HasPrefix(s, p) {
			return true
		}
	}
	return false
}

// buoyant applies plinth's one convention for water below the base in a
// drained (effective-stress) case: the water pressure on the base,
// U = u_0·A_b, acts upward on the whole plan area and is deducted from the
// design vertical action, V_d = V_d,tot − U, so the effective action is
// compared with the effective-stress resistance (EN 1997-1:2004 2.4.2(4),
// 6.5.2.1(1)P: actions include water pressures; Bond & Harris, Decoding
// Eurocode 7 (2008), ch. 10, deduct the uplift for drained bearing as for
// sliding, 6.5.3; clause numbers from memory). Groundwater pressures enter at their design level with
// no factor (EN 1997-1 2.4.6.1(6)P, common practice). The recorded V_d of
// the combination (from index start) is renamed V_d,tot; the new V_d
// step is the effective action every later formula reads.
func (c *calc) buoyant(start int, v float64) (float64, float64) {
	for i := len(c.t.Steps) - 1; i >= start; i-- {
		if c.t.Steps[i].Symbol == "V_d" {
			c.t.Steps[i].Symbol = "V_d_tot"
			c.t.Steps[i].Note = "design vertical action, total"
			break
		}
	}
	A := c.planArea()
	U := c.eval("U", fU, c.uF, ref6521, "water pressure on the base (design groundwater level, unfactored)", val("u_0", c.u0, "kPa"), val("A_b", A, c.uA))
	vp := c.eval("V_d", fVdEff, c.uF, ref6521, "effective design vertical action: the water pressure on the base deducted (drained, effective stress)", val("V_d_tot", v, c.uF), val("U", U, c.uF))
	return vp, U
}

// planArea records the plan area of the base A_b (per metre run for a
// strip).
func (c *calc) planArea() float64 {
	f := c.f
	vB := val("B", f.B, "m")
	switch f.Shape {
	case site.Strip:
		return c.eval("A_b", fAbStrip, c.uA, trace.Ref{}, "plan area of the base", vB)
	case site.Circle:
		return c.eval("A_b", fCircA, c.uA, trace.Ref{}, "plan area of the base", vB)
	}
	return c.eval("A_b", fApRectBL, c.uA, trace.Ref{}, "plan area of the base", vB, val("L", f.L, "m"))
}

var (
	fAbStrip  = trace.S("B")
	fApRectBL = trace.Mul(trace.S("B"), trace.S("L"))
)

// geometry records H_d, the eccentricities and the effective dimensions
// of one case. ok is false when the resultant lies outside the base.
// quiet suppresses the eccentricity cautions (they were raised by the
// bearing case of the same load).
func (c *calc) geometry(ld design.Load, quiet bool) (geo, bool) {
	f := c.f
	g := geo{strip: f.Shape == site.Strip, Bf: f.B, D: f.D, alpha: f.Alpha, V: ld.V}
	vV, vB := val("V_d", ld.V, c.uF), val("B", f.B, "m")
	if ld.HB != 0 || ld.HL != 0 {
		g.H = c.eval("H_d", fHd, c.uF, trace.Ref{}, "resultant horizontal action",
			val("H_B_d", ld.HB, c.uF), val("H_L_d", ld.HL, c.uF))
	} else {
		g.H = c.take("H_d", 0, c.uF, trace.Ref{}, "no horizontal action")
	}
	g.eB = c.eval("e_B", feB, "m", refD1, "eccentricity along B", val("M_B_d", ld.MB, c.uM), vV)
	if !g.strip {
		g.eL = c.eval("e_L", feL, "m", refD1, "eccentricity along L", val("M_L_d", ld.ML, c.uM), vV)
	}
	veB, veL := val("e_B", g.eB, "m"), val("e_L", g.eL, "m")
	var e, lim6, lim3, edge float64
	var what string
	switch f.Shape {
	case site.Circle:
		e = c.compute("e", fE, veB, veL)
		lim6, lim3, edge, what = f.B/8, 0.3*f.B, f.B/2, "r/4 (kern of a circle)"
	default:
		e = math.Max(g.eB/f.B, g.eL/f.L) * f.B
		if g.strip {
			e = g.eB
		}
		lim6, lim3, edge, what = f.B/6, f.B/3, f.B/2, "B/6 (middle third)"
	}
	if e >= edge {
		c.warn("ecc-out", trace.SevWarning, ref654, fmt.Sprintf("%s: the resultant lies at or outside the edge of the base (e = %.3f m): the footing overturns and has no bearing resistance.", c.cas, e), val("e", e, "m"))
		return g, false
	}
	if !quiet {
		if e > lim3 {
			lim := "B/3"
			if f.Shape == site.Circle {
				lim = "0.6 r"
			}
			c.warn("ecc-b3", trace.SevWarning, ref654, fmt.Sprintf("%s: eccentricity beyond %s: EN 1997-1 6.5.4(1)P asks for special precautions and a careful review of construction tolerances.", c.cas, lim), val("e", e, "m"), val("e_lim", lim3, "m"))
		} else if e > lim6 {
			c.warn("ecc-b6", trace.SevCaution, trace.Ref{Source: SrcMeyerhof1953, Clause: "eccentric loads"}, fmt.Sprintf("%s: eccentricity beyond %s: part of the base lifts off the ground under a linear pressure distribution.", c.cas, what), val("e", e, "m"), val("e_lim", lim6, "m"))
		} else if k := kern(f, g.eB, g.eL); k > 1.0/6 {
			c.warn("ecc-kern", trace.SevCaution, refKern, fmt.Sprintf("%s: e_B/B + e_L/L = %.3f > 1/6: the resultant lies outside the kern of the rectangle (a rhombus with half-diagonals B/6 and L/6) though each eccentricity is within its middle third, so a corner of the base lifts off under a linear pressure distribution (q_min = V/(BL) (1 - 6 e_B/B - 6 e_L/L) < 0).", c.cas, k), val("e_B", g.eB, "m"), val("e_L", g.eL, "m"))
		}
	}
	switch {
	case g.strip:
		g.Bp = c.eval("B'", fBpB, "m", refMey53, "effective width", vB, veB)
		g.Ap = c.eval("A'", fApStr, c.uA, refD1, "effective area per metre run", val("B'", g.Bp, "m"))
	case f.Shape == site.Circle:
		c.circle(&g, veB, veL)
	default:
		vL := val("L", f.L, "m")
		g.swap = c.compute("B'", fBpB, vB, veB) > c.compute("L'", fBpL, vL, veL)
		if !g.swap {
			g.Bp = c.eval("B'", fBpB, "m", refMey53, "effective width", vB, veB)
			g.Lp = c.eval("L'", fBpL, "m", refMey53, "effective length", vL, veL)
		} else {
			g.Bp = c.eval("B'", fBpL, "m", refMey53, "effective width (the shorter effective side, along L)", vL, veL)
			g.Lp = c.eval("L'", fBpB, "m", refMey53, "effective length (along B)", vB, veB)
		}
		g.Ap = c.eval("A'", fApRect, c.uA, refD1, "effective area", val("B'", g.Bp, "m"), val("L'", g.Lp, "m"))
	}
	if g.H > 0 {
		g.beta = c.eval("beta", fBeta, "deg", trace.Ref{}, "inclination of the load from the vertical", val("H_d", g.H, c.uF), vV)
		if !quiet && g.H/ld.V > 0.3 {
			c.warn("hv-large", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: H_d/V_d = %.2f: the load is steeply inclined (more than about 17°); the inclination factors reduce the resistance strongly and sliding may govern (common practice).", c.cas, g.H/ld.V), val("H_d/V_d", g.H/ld.V, ""))
		}
		if !g.strip && (c.opt.Method == EC7 || c.opt.Method == Vesic) {
			c.theta(&g, ld)
		}
	}
	if (c.opt.Method == Hansen || c.opt.Method == Vesic) && !g.noDepth {
		vD := val("D", f.D, "m")
		if f.D <= f.B {
			g.k = c.eval("k", fk1, "", refHan70, "depth ratio (D/B ≤ 1)", vD, vB)
		} else {
			g.k = c.eval("k", fk2, "", refHan70, "depth ratio, arctan(D/B) in radians (D/B > 1)", vD, vB)
		}
	}
	return g, true
}

// circle records the effective area of a circular base (the segment
// inside the chord at distance e from the centre) and its equivalent
// rectangle (API RP 2GEO, after API RP 2A); with a central load and the
// Terzaghi method the diameter itself is used.
func (c *calc) circle(g *geo, veB, veL trace.Value) {
	f := c.f
	vB := val("B", f.B, "m")
	if c.opt.Method == Terzaghi && veB.V == 0 && veL.V == 0 {
		g.circC = true
		g.Bp = c.eval("B'", fCircD, "m", refTerz, "diameter (Terzaghi's circular footing)", vB)
		g.Lp = c.eval("L'", fCircD, "m", refTerz, "diameter", vB)
		g.Ap = c.eval("A'", fCircA, c.uA, refTerz, "area of the circle", vB)
		return
	}
	R := c.eval("R", fCircR, "m", trace.Ref{}, "radius", vB)
	vR := val("R", R, "m")
	e := c.eval("e", fE, "m", refCircle, "resultant eccentricity", veB, veL)
	ve := val("e", e, "m")
	A := c.eval("A'", fSegA, c.uA, refCircle, "effective area (circular segment)", vR, ve)
	g.Ap = A
	be := c.eval("b_e", fSegB, "m", refCircle, "width of the effective segment", vR, ve)
	le := c.eval("l_e", fSegL, "m", refCircle, "chord length of the effective segment", vR, ve)
	vA, vbe, vle := val("A'", A, c.uA), val("b_e", be, "m"), val("l_e", le, "m")
	g.Lp = c.eval("L'", fSegLp, "m", refCircle, "equivalent effective length", vA, vle, vbe)
	g.Bp = c.eval("B'", fSegBp, "m", refCircle, "equivalent effective width", val("L'", g.Lp, "m"), vbe, vle)
}

// Formulas of the circular base, built once.
var (
	fCircD = trace.S("B")
	fCircA = trace.Div(trace.Mul(trace.S("pi"), trace.Pow(trace.S("B"), trace.N(2))), trace.N(4))
	fCircR = trace.Div(trace.S("B"), trace.N(2))
	fChord = trace.Fn("sqrt", trace.Sub(trace.Pow(trace.S("R"), trace.N(2)), trace.Pow(trace.S("e"), trace.N(2))))
	fSegA  = trace.Mul(trace.N(2), trace.Sub(trace.Mul(trace.Pow(trace.S("R"), trace.N(2)), trace.Fn("acos", trace.Div(trace.S("e"), trace.S("R")))), trace.Mul(trace.S("e"), fChord)))
	fSegB  = trace.Mul(trace.N(2), trace.Sub(trace.S("R"), trace.S("e")))
	fSegL  = trace.Mul(trace.N(2), fChord)
	fSegLp = trace.Fn("sqrt", trace.Div(trace.Mul(trace.S("A'"), trace.S("l_e")), trace.S("b_e")))
	fSegBp = trace.Div(trace.Mul(trace.S("L'"), trace.S("b_e")), trace.S("l_e"))
	fThE   = trace.Fn("atan2", trace.Fn("abs", trace.Add(trace.Mul(trace.S("H_B_d"), trace.S("e_B")), trace.Mul(trace.S("H_L_d"), trace.S("e_L")))),
		trace.Fn("abs", trace.Sub(trace.Mul(trace.S("H_L_d"), trace.S("e_B")), trace.Mul(trace.S("H_B_d"), trace.S("e_L")))))
)

// theta records the angle of H to the direction of L′ (EN 1997-1 D.4).
func (c *calc) theta(g *geo, ld design.Load) {
	vHB, vHL := val("H_B_d", ld.HB, c.uF), val("H_L_d", ld.HL, c.uF)
	note := "angle of H_d to the direction of L′"
	switch {
	case c.f.Shape == site.Circle && (g.eB != 0 || g.eL != 0):
		// B′ lies along the resultant eccentricity
		c.eval("theta", fThE, "deg", refD4, note+" (B′ along the eccentricity)", vHB, vHL, val("e_B", g.eB, "m"), val("e_L", g.eL, "m"))
	case g.swap:
		c.eval("theta", fThL, "deg", refD4, note+" (B′ lies along L)", vHB, vHL)
	default:
		c.eval("theta", fThB, "deg", refD4, note, vHB, vHL)
	}
}

// designSoil records the design strength of layer i: for the founding
// layer (lower = false) with Terzaghi's local-shear reduction when it
// applies, φ′_d = atan(tan φ′_k / γ_φ′), c′_d = c′_k/γ_c′, c_u,d =
// c_u,k/γ_cu (EN 1997-1 2.4.6.2).
func (c *calc) designSoil(i int, und bool, mat design.MaterialSet, lower bool) soil {
	l := c.g.Layers[i]
	s := soil{und: und, layer: i, local: c.local && !lower}
	s.kPhi, s.kC, s.kCu, s.nPhi, s.nC, s.nCu = "phi'_k", "c'_k", "c_u_k", "phi'_d", "c'_d", "c_u_d"
	if lower {
		s.kPhi, s.kC, s.kCu, s.nPhi, s.nC, s.nCu = "phi'_2k", "c'_2k", "c_u_2k", "phi'_2", "c'_2", "c_u_2"
	}
	ln := c.lname[i]
	ref := refMat
	note := "design value"
	if s.local {
		ref, note = refLocal, "design value with Terzaghi's local-shear reduction"
	}
	if und {
		c.take(s.kCu, l.Cu.V, "kPa", trace.Ref{}, "characteristic undrained strength of "+ln)
		g := c.pfStep(2, gCu, mat.GammaCu, mat.Name)
		f := soilForm(s.kCu, gCu, false, s.local, false)
		s.cu = c.eval(s.nCu, f, "kPa", ref, note, val(s.kCu, l.Cu.V, "kPa"), val(gCu, g, ""))
		return s
	}
	phik := l.Phi.V
	c.take(s.kPhi, phik, "deg", trace.Ref{}, "characteristic angle of shearing resistance of "+ln)
	g := c.pfStep(0, gPhi, mat.GammaPhi, mat.Name)
	vk, vg := val(s.kPhi, phik, "deg"), val(gPhi, g, "")
	f := soilForm(s.kPhi, gPhi, true, s.local, false)
	if c.compute(s.nPhi, f, vk, vg) < phiMin {
		s.phiClamp = true
		f = soilForm(s.kPhi, gPhi, true, s.local, true)
		note += "; φ′ ≈ 0 is replaced by 0.0001 rad so the factors take their φ′ → 0 limits"
	}
	s.phi = c.eval(s.nPhi, f, "deg", ref, note, vk, vg)
	ck := l.C.Or(0)
	c.take(s.kC, ck, "kPa", trace.Ref{}, "characteristic effective cohesion of "+ln)
	gc := c.pfStep(1, gC, mat.GammaC, mat.Name)
	fc := soilForm(s.kC, gC, false, s.local, false)
	s.c = c.eval(s.nC, fc, "kPa", ref, note, val(s.kC, ck, "kPa"), val(gC, gc, ""))
	return s
}

// pfStep records a material partial factor once per case.
func (c *calc) pfStep(k int, s string, v float64, set string) float64 {
	if !c.pf[k] && !c.dry {
		c.pf[k] = true
		what := [...]string{"on tan φ′", "on c′", "on c_u"}[k]
		c.take(s, v, "", refA4, "partial factor "+what+" ("+set+")")
	}
	return v
}

// kern returns e_B/B + e_L/L for a rectangle or square (0 for a strip or
// circle): the resultant lies inside the kern (core) of the rectangular
// base, a rhombus with half-diagonals B/6 and L/6, when it is at most 1/6.
// Source: the core of a rectangular section (Gere & Timoshenko, Mechanics
// of Materials); the corner pressure V/(BL)(1 − 6e_B/B − 6e_L/L) of
// biaxial eccentricity (Bowles 1996, §4-7).
func kern(f site.Footing, eB, eL float64) float64 {
	if f.Shape != site.Rectangle && f.Shape != site.Square {
		return 0
	}
	return eB/f.B + eL/f.Length()
}
