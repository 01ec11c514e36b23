package bearing

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// twoLayer checks the founding layer over the weaker layer c.weak by
// Meyerhof & Hanna (1978), in the rectangular form given by Das (2011):
//
//	q_u = q_b + (1 + B′/L′)·[2c_a H/B′ + γ_1 H² (1 + 2D/H) K_s tanφ′_1/B′]·i_p − γ_1 H ≤ q_t
//
// where q_b is the lower layer's resistance at depth D + H (shape and
// inclination factors, no depth factor), q_t the upper layer's own
// resistance (the single-layer q_ult), K_s·tanφ′_1 = K_p·tanδ read from
// BR 470 Table A2 (see KpTanDelta), c_a = (c_a/c_1)·c_1 with c_a/c_1 from
// CaRatio, and i_p = (1 − β/90°)² plinth's reduction of the punching terms
// for an inclined load (Meyerhof & Hanna give charts for it; a caution
// says so). Beside it, the lower layer is checked under the load spread
// through the upper layer at SpreadTan horizontal per vertical. It
// returns nil when the lower layer is not weaker in this case.
func (c *calc) twoLayer(ld design.Load, d Drainage, g *geo, top soil, qt float64) (*TwoLayer, float64) {
	i := c.weak
	l2 := c.g.Layers[i]
	und2 := undrainedIn(l2, d)
	if !und2 && !l2.Phi.Set {
		return nil, qt
	}
	m, mat := c.opt.Method, ld.Set.Material
	z2 := l2.Top
	// numbers first: is the lower layer weaker under this case's values?
	// The steps that answer are worked dry (computed, not recorded) and
	// recorded below, in the order of the working, when it is.
	c.dry = true
	gam1 := c.gamma1(top)
	q1 := c.q1(m, top, gam1, g)
	s2 := c.lowerSoil(i, und2, mat, g)
	q2 := c.q2(m, s2, g)
	c.dry = false
	if q1 <= 0 || q2 >= q1 {
		return nil, qt
	}
	ln := layerName(c.g, i)
	vD := val("D", c.f.D, "m")
	vB, vL := val("B'", g.Bp, "m"), val("L'", g.Lp, "m")
	H := c.eval("H_1", fH1, "m", refMH, "thickness of the upper layer below the base, over "+ln, val("z_2", z2, "m"), vD)
	tl := &TwoLayer{Layer: i, H: H, QT: qt}
	vH := val("H_1", H, "m")
	gam1 = c.gamma1(top)
	vg1 := val("gamma_1", gam1, "kN/m3")
	// lower layer strength and overburden at its top
	s2 = c.lowerSoil(i, und2, mat, g)
	if und2 {
		s2.q = c.eval("q_H", fQH, "kPa", refMH, "overburden at the top of the lower layer",
			val("q", top.q, "kPa"), vg1, vH)
	} else {
		q0, q0s := top.q, "q'"
		if top.und {
			// the upper layer acts undrained: its overburden is total; the
			// lower drained layer sees the effective stress at its top
			q0, q0s = c.sv0e, "sigma'_v0"
		}
		s2.q = c.eval("q'_H", fQeH[q0s], "kPa", refMH, "effective overburden at the top of the lower layer",
			val(q0s, q0, "kPa"), vg1, vH)
	}
	// strip capacities q_1, q_2 and their ratio
	q1 = c.q1(m, top, gam1, g)
	tl.Q1 = q1
	g2 := *g
	g2.noDepth = true
	qb := c.resist(m, fLower, s2, &g2)
	q2 = c.q2(m, s2, g)
	tl.Q2 = q2
	rq := c.eval("r_q", fRq, "", refMH, "bearing capacity ratio q_2/q_1", val("q_2", q2, "kPa"), val("q_1", q1, "kPa"))
	tl.QB = qb
	// punching coefficients
	var ks float64
	fric := !top.und && top.phi > phiMin
	vphi := val("phi'_d", top.phi, "deg")
	if fric {
		if c.opt.Ks.Set {
			ks = c.take("K_s", c.opt.Ks.V, "", refMH, "punching shear coefficient (given)")
		} else {
			kt := c.took(trace.Interpolated, "K_p_tan_delta", KpTanDelta(top.phi), "", refKs, "K_p·tanδ of the upper layer (BR 470 Table A2, log-linear in φ′)", vphi)
			ks = c.eval("K_s", fKs, "", refKs, "punching shear coefficient", val("K_p_tan_delta", kt, ""), vphi)
			if top.phi < 35*degr-1e-9 || top.phi > 45*degr+1e-9 {
				c.ksOut = append(c.ksOut, caseValue{c.cas, top.phi})
			} else {
				c.warnOnce("ks-br470", trace.SevNote, refKs, "K_s comes from BR 470 Table A2 (K_p·tanδ), plinth's reading of the punching coefficient; it is not read from Meyerhof & Hanna's (1978) chart for this q_2/q_1. For a critical platform read K_s from the chart and enter it (option K_s).", vphi)
			}
		}
	}
	tl.Ks = ks
	c1, c1s := top.c, "c'_d"
	if top.und {
		c1, c1s = top.cu, "c_u_d"
	}
	var ca, ra float64
	coh := c1 > 0
	if coh {
		if c.opt.CaRatio.Set {
			ra = c.take("r_a", c.opt.CaRatio.V, "", refCa, "adhesion ratio c_a/c_1 (given)")
		} else {
			ra = c.eval("r_a", fRa, "", refCa, "adhesion ratio c_a/c_1, straight-line reading of the chart (plinth, from memory)", val("r_q", rq, ""))
		}
		ca = c.eval("c_a", fCa[c1s], "kPa", refCa, "adhesion on the punching faces", val("r_a", ra, ""), val(c1s, c1, "kPa"))
	}
	tl.CaC1 = ra
	sp := 1.0
	if g.strip {
		c.one("s_p", 1, refMH, "strip: no shape term on punching")
	} else {
		sp = c.eval("s_p", fSp, "", refMH, "shape term on punching (1 + B′/L′)", vB, vL)
	}
	ip := 1.0
	if g.H > 0 {
		ip = c.eval("i_p", fIp, "", trace.Ref{},
			"reduction of the punching terms for the inclined load (plinth: Meyerhof's i_q)", val("beta", g.beta, "deg"))
		c.warnOnce("two-layer-inclined", trace.SevNote, refMH, "Inclined load on a two-layer system: the punching terms are multiplied by i_p = (1 − β/90°)² in place of Meyerhof & Hanna's inclined-load charts.")
	} else {
		c.one("i_p", 1, trace.Ref{}, "vertical load")
	}
	// q_u
	var buf [10]trace.Value
	in := append(buf[:0], val("q_b", qb, "kPa"), val("s_p", sp, ""), val("i_p", ip, ""), vg1, vH, vB)
	if coh {
		in = append(in, val("c_a", ca, "kPa"))
	}
	if fric {
		in = append(in, vD, val("K_s", ks, ""), vphi)
	}
	qu := c.eval("q_u", fQu[b2i(coh)][b2i(fric)], "kPa", refMH, "punching-shear resistance of the two-layer system", in...)
	tl.QU = qu
	ql := c.eval("q_lim", fQlim, "kPa", refMH, "ultimate pressure: punching, capped by the upper layer's own resistance", val("q_ult", qt, "kPa"), val("q_u", qu, "kPa"))
	tl.Governs = qu < qt
	c.spread(ld, g, s2, tl, gam1, H)
	return tl, ql
}

// gamma1 records the unit weight of the upper layer in the punching
// terms: total for an undrained upper layer, else its γ′ of the N_γ term.
func (c *calc) gamma1(top soil) float64 {
	if !top.und {
		return c.eval("gamma_1", trace.S("gamma'"), "kN/m3", refMH, "unit weight of the upper layer (effective where submerged)", val("gamma'", top.gam, "kN/m3"))
	}
	l := c.g.Layers[c.fi]
	gs, v := "gamma", l.Gamma
	if c.zw <= c.f.D {
		gs, v = "gamma_sat", l.GammaSatOr()
	}
	return c.eval("gamma_1", trace.S(gs), "kN/m3", refMH, "total unit weight of the upper layer", val(gs, v, "kN/m3"))
}

// q1 records the surface strip capacity of the upper layer, the measure
// Meyerhof & Hanna (1978) compare the layers by.
func (c *calc) q1(m Method, top soil, gam1 float64, g *geo) float64 {
	if top.und {
		return c.eval("q_1", fQ1U[b2i(m == Terzaghi)], "kPa", refMH, "strip capacity of the upper layer (surface, undrained)", val("c_u_d", top.cu, "kPa"))
	}
	fa := Factors(m, top.phi)
	return c.eval("q_1", fQ1, "kPa", refMH, "strip capacity of the upper layer (surface)",
		val("c'_d", top.c, "kPa"), val("N_c", fa.Nc, ""), val("gamma_1", gam1, "kN/m3"), val("B'", g.Bp, "m"), val("N_gamma", fa.Ngamma, ""))
}

// lowerSoil records the design strength of the lower layer i and, drained,
// the unit weight of its N_γ term.
func (c *calc) lowerSoil(i int, und bool, mat design.MaterialSet, g *geo) soil {
	s := c.designSoil(i, und, mat, true)
	if !und {
		s.gam = c.unitWeight("gamma'_2", c.g.Layers[i], "gamma_l", "gamma_sat_l", c.g.Layers[i].Top, "z_2", g.Bp, "B'")
	}
	return s
}

// q2 records the surface strip capacity of the lower layer.
func (c *calc) q2(m Method, s2 soil, g *geo) float64 {
	if s2.und {
		return c.eval("q_2", fQ2U[b2i(m == Terzaghi)], "kPa", refMH, "strip capacity of the lower layer (surface, undrained)", val("c_u_2", s2.cu, "kPa"))
	}
	fa := Factors(m, s2.phi)
	return c.eval("q_2", fQ2, "kPa", refMH, "strip capacity of the lower layer (surface)",
		val("c'_2", s2.c, "kPa"), val("N_c_2", fa.Nc, ""), val("gamma'_2", s2.gam, "kN/m3"), val("B'", g.Bp, "m"), val("N_gamma_2", fa.Ngamma, ""))
}

func b2i(b bool) int {
	if b {
		return 1
	}
	return 0
}

// ncZero returns N_c at φ = 0 of method m: π + 2 (Prandtl), 1.5π + 1 for
// Terzaghi, from the formula trees.
func ncZero(m Method) float64 {
	f := fMain.NcU
	if m == Terzaghi {
		f = fMain.NcT0
	}
	v, err := trace.Eval(f, nil)
	if err != nil {
		return math.NaN()
	}
	return v
}

// Formulas of the two-layer check, built once.
var (
	fH1  = trace.Sub(trace.S("z_2"), trace.S("D"))
	fQH  = trace.Add(trace.S("q"), trace.Mul(trace.S("gamma_1"), trace.S("H_1")))
	fQeH = map[string]trace.Expr{
		"q'":        trace.Add(trace.S("q'"), trace.Mul(trace.S("gamma_1"), trace.S("H_1"))),
		"sigma'_v0": trace.Add(trace.S("sigma'_v0"), trace.Mul(trace.S("gamma_1"), trace.S("H_1"))),
	}
	// the strip capacity c N_c + ½ γ B N_γ (undrained N_c c_u, N_c printed
	// as its number)
	fQ1  = trace.Add(trace.Mul(trace.S("c'_d"), trace.S("N_c")), trace.Mul(trace.N(0.5), trace.S("gamma_1"), trace.S("B'"), trace.S("N_gamma")))
	fQ2  = trace.Add(trace.Mul(trace.S("c'_2"), trace.S("N_c_2")), trace.Mul(trace.N(0.5), trace.S("gamma'_2"), trace.S("B'"), trace.S("N_gamma_2")))
	fQ1U = [2]trace.Expr{trace.Mul(trace.N(ncZero(EC7)), trace.S("c_u_d")), trace.Mul(trace.N(ncZero(Terzaghi)), trace.S("c_u_d"))}
	fQ2U = [2]trace.Expr{trace.Mul(trace.N(ncZero(EC7)), trace.S("c_u_2")), trace.Mul(trace.N(ncZero(Terzaghi)), trace.S("c_u_2"))}
	fRq  = trace.Div(trace.S("q_2"), trace.S("q_1"))
	fKs  = trace.Div(trace.S("K_p_tan_delta"), trace.Fn("tan", trace.S("phi'_d")))
	// CaRatio's straight line, 0.6 at q_2/q_1 = 0 to 1.0 at 1
	fRa = trace.Add(trace.N(0.6), trace.Mul(trace.N(0.4), trace.Fn("min", trace.N(1), trace.Fn("max", trace.N(0), trace.S("r_q")))))
	fCa = map[string]trace.Expr{
		"c'_d":  trace.Mul(trace.S("r_a"), trace.S("c'_d")),
		"c_u_d": trace.Mul(trace.S("r_a"), trace.S("c_u_d")),
	}
	fSp   = trace.Add(trace.N(1), trace.Div(trace.S("B'"), trace.S("L'")))
	fIp   = trace.Pow(trace.Sub(trace.N(1), trace.Div(trace.S("beta"), trace.Deg(90))), trace.N(2))
	fQu   = mkQu()
	fQlim = trace.Fn("min", trace.S("q_ult"), trace.S("q_u"))
	// the load-spread check
	fBs    = trace.Add(trace.S("B'"), trace.Mul(trace.N(2), trace.S("n_s"), trace.S("H_1")))
	fLs    = trace.Add(trace.S("L'"), trace.Mul(trace.N(2), trace.S("n_s"), trace.S("H_1")))
	fAsStr = trace.S("B_s")
	fAs    = trace.Mul(trace.S("B_s"), trace.S("L_s"))
	fQEds  = trace.Add(trace.Div(trace.S("V_d"), trace.S("A_s")), trace.Mul(trace.S("gamma_1"), trace.S("H_1")))
	fQRdsF = map[string]trace.Expr{
		"q'_H": trace.Add(trace.Div(trace.Sub(trace.S("q_ult_s"), trace.S("q'_H")), trace.S("FS")), trace.S("q'_H")),
		"q_H":  trace.Add(trace.Div(trace.Sub(trace.S("q_ult_s"), trace.S("q_H")), trace.S("FS")), trace.S("q_H")),
	}
	fQRds  = trace.Div(trace.S("q_ult_s"), trace.S("gamma_Rv"))
	fUtilS = trace.Div(trace.S("q_Ed_s"), trace.S("q_Rd_s"))
)

// mkQu builds q_u = q_b + s_p·(adhesion + friction)·i_p − γ_1 H_1 with
// the terms that apply: [cohesive][frictional].
func mkQu() (f [2][2]trace.Expr) {
	ad := trace.Div(trace.Mul(trace.N(2), trace.S("c_a"), trace.S("H_1")), trace.S("B'"))
	fr := trace.Div(trace.Mul(trace.S("gamma_1"), trace.Pow(trace.S("H_1"), trace.N(2)), trace.Add(trace.N(1), trace.Div(trace.Mul(trace.N(2), trace.S("D")), trace.S("H_1"))), trace.S("K_s"), trace.Fn("tan", trace.S("phi'_d"))), trace.S("B'"))
	for coh := 0; coh < 2; coh++ {
		for fric := 0; fric < 2; fric++ {
			var q trace.Expr = trace.S("q_b")
			var p trace.Expr
			switch {
			case coh == 1 && fric == 1:
				p = trace.Add(ad, fr)
			case coh == 1:
				p = ad
			case fric == 1:
				p = fr
			}
			if p != nil {
				q = trace.Add(q, trace.Mul(trace.S("s_p"), p, trace.S("i_p")))
			}
			f[coh][fric] = trace.Sub(q, trace.Mul(trace.S("gamma_1"), trace.S("H_1")))
		}
	}
	return f
}

// spread checks the lower layer under the load spread through the upper
// layer at n horizontal per vertical (common practice): pressure V_d/A_s
// + γ_1 H on an equivalent footing B_s × L_s at the top of the lower layer,
// against that footing's resistance there (no depth factor).
func (c *calc) spread(ld design.Load, g *geo, s2 soil, tl *TwoLayer, gam1, H float64) {
	n := c.opt.SpreadTan
	vn, vH, vg1 := val("n_s", n, ""), val("H_1", H, "m"), val("gamma_1", gam1, "kN/m3")
	note := "load-spread gradient through the upper layer, horizontal per vertical, given"
	if !c.opt.spreadSet {
		note = "load-spread gradient through the upper layer, horizontal per vertical: assumed, default 1H:2V (common practice); give spread to change it"
	}
	c.take("n_s", n, "", trace.Ref{}, note)
	g3 := geo{strip: g.strip, Bf: g.Bf, D: g.D, alpha: g.alpha, V: g.V, H: g.H, beta: g.beta, noDepth: true}
	g3.Bp = c.eval("B_s", fBs, "m", trace.Ref{}, "spread width at the top of the lower layer", val("B'", g.Bp, "m"), vn, vH)
	if g.strip {
		g3.Ap = c.eval("A_s", fAsStr, c.uA, trace.Ref{}, "spread area per metre run", val("B_s", g3.Bp, "m"))
	} else {
		g3.Lp = c.eval("L_s", fLs, "m", trace.Ref{}, "spread length at the top of the lower layer", val("L'", g.Lp, "m"), vn, vH)
		g3.Ap = c.eval("A_s", fAs, c.uA, trace.Ref{}, "spread area", val("B_s", g3.Bp, "m"), val("L_s", g3.Lp, "m"))
	}
	qEd := c.eval("q_Ed_s", fQEds, "kPa", trace.Ref{}, "pressure on the lower layer under the spread load",
		val("V_d", g.V, c.uF), val("A_s", g3.Ap, c.uA), vg1, vH)
	qs := c.resist(c.opt.Method, fSpread, s2, &g3)
	var qRd float64
	if c.ap.Allowable() {
		q0s := "q'_H"
		if s2.und {
			q0s = "q_H"
		}
		qRd = c.eval("q_Rd_s", fQRdsF[q0s], "kPa", trace.Ref{}, "allowable pressure on the lower layer",
			val("q_ult_s", qs, "kPa"), val(q0s, s2.q, "kPa"), val("FS", c.ap.FS, ""))
	} else {
		grv := ld.Set.Resistance.GammaRv
		qRd = c.eval("q_Rd_s", fQRds, "kPa", trace.Ref{Source: trace.EN1997, Clause: "2.4.7.3.3, eq. (2.7b)"}, "design resistance of the lower layer",
			val("q_ult_s", qs, "kPa"), val("gamma_Rv", grv, ""))
	}
	u := UtilCap
	if qRd > 0 {
		u = math.Min(UtilCap, c.eval("util_s", fUtilS, "", trace.Ref{}, "utilisation of the lower layer under the spread load", val("q_Ed_s", qEd, "kPa"), val("q_Rd_s", qRd, "kPa")))
	}
	tl.SpreadQEd, tl.SpreadQRd, tl.SpreadUtil, tl.SpreadOK = qEd, qRd, u, u <= 1+1e-12
	if !tl.SpreadOK {
		c.warn("spread-fails", trace.SevWarning, trace.Ref{}, fmt.Sprintf("%s: the load-spread check of the lower layer gives utilisation %s: it disagrees with or confirms the punching check; review the platform thickness.", c.cas, units.Utilisation(u)), val("util_s", u, ""))
	}
}

// ksCaution raises one warning when K_s was extrapolated beyond BR 470
// Table A2 in any case, quoting the φ′_d of the governing case if it is
// one of them (the working printed in full), else of the first, and
// naming that case.
func (c *calc) ksCaution() {
	if len(c.ksOut) == 0 {
		return
	}
	at := c.ksOut[0]
	if g := c.r.Governing; g >= 0 {
		for _, k := range c.ksOut {
			if k.cas == c.r.Cases[g].Name {
				at = k
			}
		}
	}
	more := ""
	switch n := len(c.ksOut) - 1; {
	case n == 1:
		more = " (and in 1 other case, with its own φ′_d)"
	case n > 1:
		more = fmt.Sprintf(" (and in %d other cases, each with its own φ′_d)", n)
	}
	c.t.Cautions = append(c.t.Cautions, trace.Caution{Code: "ks-extrapolated", Severity: trace.SevCaution, Ref: refKs, Step: -1, Case: at.cas,
		Values:  []trace.Value{val("phi'_d", at.v, "deg")},
		Message: fmt.Sprintf("φ′_d = %.1f° in %s%s lies outside the 35°–45° of BR 470 Table A2: K_p·tanδ is extrapolated; enter K_s read from Meyerhof & Hanna's chart (option K_s) to replace it.", at.v/degr, at.cas, more)})
}
