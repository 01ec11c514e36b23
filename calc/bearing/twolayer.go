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
	gw := c.g.Gw()
	z2 := l2.Top
	H := z2 - c.f.D
	// numbers first: is the lower layer weaker under this case's values?
	gam1 := top.gam
	if top.und {
		gam1 = c.g.Layers[c.fi].Gamma
		if c.zw <= c.f.D {
			gam1 = c.g.Layers[c.fi].GammaSatOr()
		}
	}
	nc0 := math.Pi + 2
	if m == Terzaghi {
		nc0 = 1.5*math.Pi + 1
	}
	var q1 float64
	if top.und {
		q1 = nc0 * top.cu
	} else {
		fa := Factors(m, top.phi)
		q1 = top.c*fa.Nc + 0.5*gam1*g.Bp*fa.Ngamma
	}
	var q2, phi2, c2, cu2, gam2 float64
	if und2 {
		cu2 = l2.Cu.V / mat.GammaCu
		q2 = nc0 * cu2
	} else {
		phi2 = math.Max(phiMin, math.Atan(math.Tan(l2.Phi.V)/mat.GammaPhi))
		c2 = l2.C.Or(0) / mat.GammaC
		gam2 = l2.Gamma
		switch {
		case c.zw <= z2:
			gam2 = l2.GammaSatOr() - gw
		case c.zw < z2+g.Bp:
			gam2 = l2.GammaSatOr() - gw + (c.zw-z2)/g.Bp*(l2.Gamma-(l2.GammaSatOr()-gw))
		}
		fa := Factors(m, phi2)
		q2 = c2*fa.Nc + 0.5*gam2*g.Bp*fa.Ngamma
	}
	if q1 <= 0 || q2 >= q1 {
		return nil, qt
	}
	tl := &TwoLayer{Layer: i, H: H, QT: qt}
	ln := layerName(c.g, i)
	vD, vH := val("D", c.f.D, "m"), val("H_1", H, "m")
	vB, vL := val("B'", g.Bp, "m"), val("L'", g.Lp, "m")
	c.step("H_1", trace.Sub(trace.S("z_2"), trace.S("D")), H, "m", refMH, "thickness of the upper layer below the base, over "+ln, val("z_2", z2, "m"), vD)
	// unit weight of the upper layer in the punching terms
	if top.und {
		gs := "gamma"
		if c.zw <= c.f.D {
			gs = "gamma_sat"
		}
		c.step("gamma_1", trace.S(gs), gam1, "kN/m3", refMH, "total unit weight of the upper layer", val(gs, gam1, "kN/m3"))
	} else {
		c.step("gamma_1", trace.S("gamma'"), gam1, "kN/m3", refMH, "unit weight of the upper layer (effective where submerged)", val("gamma'", gam1, "kN/m3"))
	}
	vg1 := val("gamma_1", gam1, "kN/m3")
	// lower layer strength and overburden at its top
	s2 := c.designSoil(i, und2, mat, true)
	if und2 {
		s2.q = c.step("q_H", trace.Add(trace.S("q"), trace.Mul(trace.S("gamma_1"), trace.S("H_1"))), top.q+gam1*H, "kPa", refMH, "overburden at the top of the lower layer",
			val("q", top.q, "kPa"), vg1, vH)
	} else {
		s2.gam = c.unitWeight("gamma'_2", l2, "gamma_l", "gamma_sat_l", z2, "z_2", g.Bp, "B'")
		q0, q0s := top.q, "q'"
		if top.und {
			// the upper layer acts undrained: its overburden is total; the
			// lower drained layer sees the effective stress at its top
			q0, q0s = c.sv0e, "sigma'_v0"
		}
		s2.q = c.step("q'_H", trace.Add(trace.S(q0s), trace.Mul(trace.S("gamma_1"), trace.S("H_1"))), q0+gam1*H, "kPa", refMH, "effective overburden at the top of the lower layer",
			val(q0s, q0, "kPa"), vg1, vH)
	}
	// strip capacities q_1, q_2 and their ratio
	if top.und {
		tl.Q1 = c.step("q_1", trace.Mul(trace.N(nc0), trace.S("c_u_d")), q1, "kPa", refMH, "strip capacity of the upper layer (surface, undrained)", val("c_u_d", top.cu, "kPa"))
	} else {
		fa := Factors(m, top.phi)
		tl.Q1 = c.step("q_1", trace.Add(trace.Mul(trace.S("c'_d"), trace.S("N_c")), trace.Mul(trace.N(0.5), trace.S("gamma_1"), trace.S("B'"), trace.S("N_gamma"))), q1, "kPa", refMH,
			"strip capacity of the upper layer (surface)", val("c'_d", top.c, "kPa"), val("N_c", fa.Nc, ""), vg1, vB, val("N_gamma", fa.Ngamma, ""))
	}
	g2 := *g
	g2.noDepth = true
	qb := c.resist(m, fLower, s2, &g2)
	if und2 {
		tl.Q2 = c.step("q_2", trace.Mul(trace.N(nc0), trace.S("c_u_2")), q2, "kPa", refMH, "strip capacity of the lower layer (surface, undrained)", val("c_u_2", s2.cu, "kPa"))
	} else {
		fa := Factors(m, s2.phi)
		tl.Q2 = c.step("q_2", trace.Add(trace.Mul(trace.S("c'_2"), trace.S("N_c_2")), trace.Mul(trace.N(0.5), trace.S("gamma'_2"), trace.S("B'"), trace.S("N_gamma_2"))), q2, "kPa", refMH,
			"strip capacity of the lower layer (surface)", val("c'_2", s2.c, "kPa"), val("N_c_2", fa.Nc, ""), val("gamma'_2", s2.gam, "kN/m3"), vB, val("N_gamma_2", fa.Ngamma, ""))
	}
	rq := c.step("r_q", trace.Div(trace.S("q_2"), trace.S("q_1")), q2/q1, "", refMH, "bearing capacity ratio q_2/q_1", val("q_2", q2, "kPa"), val("q_1", q1, "kPa"))
	tl.QB = qb
	// punching coefficients
	var ks float64
	fric := !top.und && top.phi > phiMin
	if fric {
		vphi := val("phi'_d", top.phi, "deg")
		if c.opt.Ks.Set {
			ks = c.take("K_s", c.opt.Ks.V, "", refMH, "punching shear coefficient (given)")
		} else {
			kt := c.step("K_p_tan_delta", nil, KpTanDelta(top.phi), "", refKs, "K_p·tanδ of the upper layer (BR 470 Table A2, log-linear in φ′)", vphi)
			ks = c.step("K_s", trace.Div(trace.S("K_p_tan_delta"), trace.Fn("tan", trace.S("phi'_d"))), kt/math.Tan(top.phi), "", refKs, "punching shear coefficient", val("K_p_tan_delta", kt, ""), vphi)
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
			ra = c.step("r_a", trace.Add(trace.N(0.6), trace.Mul(trace.N(0.4), trace.Fn("min", trace.N(1), trace.S("r_q")))), CaRatio(rq), "", refCa, "adhesion ratio c_a/c_1, straight-line reading of the chart (plinth, from memory)", val("r_q", rq, ""))
		}
		ca = c.step("c_a", trace.Mul(trace.S("r_a"), trace.S(c1s)), ra*c1, "kPa", refCa, "adhesion on the punching faces", val("r_a", ra, ""), val(c1s, c1, "kPa"))
	}
	tl.CaC1 = ra
	sp := 1.0
	if g.strip {
		c.one("s_p", 1, refMH, "strip: no shape term on punching")
	} else {
		sp = c.step("s_p", trace.Add(trace.N(1), trace.Div(trace.S("B'"), trace.S("L'"))), 1+g.Bp/g.Lp, "", refMH, "shape term on punching (1 + B′/L′)", vB, vL)
	}
	ip := 1.0
	if g.H > 0 {
		beta := math.Atan(g.H / g.V)
		ip = c.step("i_p", trace.Pow(trace.Sub(trace.N(1), trace.Div(trace.S("beta"), trace.Deg(90))), trace.N(2)), math.Pow(1-beta/(90*degr), 2), "", trace.Ref{},
			"reduction of the punching terms for the inclined load (plinth: Meyerhof's i_q)", val("beta", beta, "deg"))
		c.warnOnce("two-layer-inclined", trace.SevNote, refMH, "Inclined load on a two-layer system: the punching terms are multiplied by i_p = (1 − β/90°)² in place of Meyerhof & Hanna's inclined-load charts.")
	} else {
		c.one("i_p", 1, trace.Ref{}, "vertical load")
	}
	// q_u
	var terms []trace.Expr
	in := []trace.Value{val("q_b", qb, "kPa"), val("s_p", sp, ""), val("i_p", ip, ""), vg1, vH, vB}
	pun := 0.0
	if coh {
		terms = append(terms, trace.Div(trace.Mul(trace.N(2), trace.S("c_a"), trace.S("H_1")), trace.S("B'")))
		in = append(in, val("c_a", ca, "kPa"))
		pun += 2 * ca * H / g.Bp
	}
	if fric {
		terms = append(terms, trace.Div(trace.Mul(trace.S("gamma_1"), trace.Pow(trace.S("H_1"), trace.N(2)), trace.Add(trace.N(1), trace.Div(trace.Mul(trace.N(2), trace.S("D")), trace.S("H_1"))), trace.S("K_s"), trace.Fn("tan", trace.S("phi'_d"))), trace.S("B'")))
		in = append(in, vD, val("K_s", ks, ""), val("phi'_d", top.phi, "deg"))
		pun += gam1 * H * H * (1 + 2*c.f.D/H) * ks * math.Tan(top.phi) / g.Bp
	}
	qu := qb + sp*pun*ip - gam1*H
	var fq trace.Expr = trace.S("q_b")
	if len(terms) > 0 {
		p := terms[0]
		if len(terms) > 1 {
			p = trace.Add(terms[0], terms[1])
		}
		fq = trace.Add(fq, trace.Mul(trace.S("s_p"), p, trace.S("i_p")))
	}
	fq = trace.Sub(fq, trace.Mul(trace.S("gamma_1"), trace.S("H_1")))
	tl.QU = c.step("q_u", fq, qu, "kPa", refMH, "punching-shear resistance of the two-layer system", in...)
	ql := c.step("q_lim", trace.Fn("min", trace.S("q_ult"), trace.S("q_u")), math.Min(qt, qu), "kPa", refMH, "ultimate pressure: punching, capped by the upper layer's own resistance", val("q_ult", qt, "kPa"), val("q_u", qu, "kPa"))
	tl.Governs = qu < qt
	c.spread(ld, g, s2, tl, gam1, H)
	return tl, ql
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
	g3 := geo{strip: g.strip, Bf: g.Bf, D: g.D, alpha: g.alpha, V: g.V, H: g.H, noDepth: true}
	g3.Bp = c.step("B_s", trace.Add(trace.S("B'"), trace.Mul(trace.N(2), trace.S("n_s"), trace.S("H_1"))), g.Bp+2*n*H, "m", trace.Ref{}, "spread width at the top of the lower layer", val("B'", g.Bp, "m"), vn, vH)
	if g.strip {
		g3.Ap = c.step("A_s", trace.S("B_s"), g3.Bp, c.uA, trace.Ref{}, "spread area per metre run", val("B_s", g3.Bp, "m"))
	} else {
		g3.Lp = c.step("L_s", trace.Add(trace.S("L'"), trace.Mul(trace.N(2), trace.S("n_s"), trace.S("H_1"))), g.Lp+2*n*H, "m", trace.Ref{}, "spread length at the top of the lower layer", val("L'", g.Lp, "m"), vn, vH)
		g3.Ap = c.step("A_s", trace.Mul(trace.S("B_s"), trace.S("L_s")), g3.Bp*g3.Lp, c.uA, trace.Ref{}, "spread area", val("B_s", g3.Bp, "m"), val("L_s", g3.Lp, "m"))
	}
	qEd := c.step("q_Ed_s", trace.Add(trace.Div(trace.S("V_d"), trace.S("A_s")), trace.Mul(trace.S("gamma_1"), trace.S("H_1"))), g.V/g3.Ap+gam1*H, "kPa", trace.Ref{}, "pressure on the lower layer under the spread load",
		val("V_d", g.V, c.uF), val("A_s", g3.Ap, c.uA), vg1, vH)
	qs := c.resist(c.opt.Method, fSpread, s2, &g3)
	var qRd float64
	if c.ap.Allowable() {
		q0s := "q'_H"
		if s2.und {
			q0s = "q_H"
		}
		qRd = c.step("q_Rd_s", trace.Add(trace.Div(trace.Sub(trace.S("q_ult_s"), trace.S(q0s)), trace.S("FS")), trace.S(q0s)), (qs-s2.q)/c.ap.FS+s2.q, "kPa", trace.Ref{}, "allowable pressure on the lower layer",
			val("q_ult_s", qs, "kPa"), val(q0s, s2.q, "kPa"), val("FS", c.ap.FS, ""))
	} else {
		grv := ld.Set.Resistance.GammaRv
		qRd = c.step("q_Rd_s", trace.Div(trace.S("q_ult_s"), trace.S("gamma_Rv")), qs/grv, "kPa", trace.Ref{Source: trace.EN1997, Clause: "2.4.7.3.3, eq. (2.7b)"}, "design resistance of the lower layer",
			val("q_ult_s", qs, "kPa"), val("gamma_Rv", grv, ""))
	}
	u := UtilCap
	if qRd > 0 {
		u = math.Min(UtilCap, c.step("util_s", trace.Div(trace.S("q_Ed_s"), trace.S("q_Rd_s")), qEd/qRd, "", trace.Ref{}, "utilisation of the lower layer under the spread load", val("q_Ed_s", qEd, "kPa"), val("q_Rd_s", qRd, "kPa")))
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
