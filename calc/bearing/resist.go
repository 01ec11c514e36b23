package bearing

import (
	"math"

	"github.com/plinth-calc/plinth/calc/trace"
)

// resist records the ultimate bearing pressure of one layer under one
// case by method m, with the symbols of F, and returns it (Pa).
func (c *calc) resist(m Method, F *forms, s soil, g *geo) float64 {
	if s.und {
		return c.resistU(m, F, s, g)
	}
	return c.resistD(m, F, s, g)
}

func methodRef(m Method, und bool) trace.Ref {
	switch m {
	case Meyerhof:
		return refMey63
	case Hansen:
		return refHan70
	case Vesic:
		return refVes75
	case Terzaghi:
		return refTerz
	}
	if und {
		return refD3
	}
	return refD4
}

// one records a factor taken as 1 (or 0 for Hansen's additive factors).
func (c *calc) one(sym string, v float64, ref trace.Ref, note string) float64 {
	return c.step(sym, nil, v, "", ref, note)
}

// resistD is the drained (effective stress) resistance:
// q_ult = c′N_c·(factors) + q′N_q·(factors) + ½γ′B′N_γ·(factors).
func (c *calc) resistD(m Method, F *forms, s soil, g *geo) float64 {
	n := &F.n
	ref := methodRef(m, false)
	phi, tp, sp := s.phi, math.Tan(s.phi), math.Sin(s.phi)
	vphi := val(n.phi, phi, "deg")
	vB, vL, vA := val(n.B, g.Bp, "m"), val(n.L, g.Lp, "m"), val(n.A, g.Ap, c.uA)
	vH, vV, valpha := val("H_d", g.H, c.uF), val("V_d", g.V, c.uF), val("alpha", g.alpha, "deg")
	vc := val(n.c, s.c, "kPa")
	fa := Factors(m, phi)
	Nq, Nc, Ng := fa.Nq, fa.Nc, fa.Ngamma
	if m == Terzaghi {
		c.step(n.Nq, F.NqT, Nq, "", ref, "bearing capacity factor", vphi)
	} else {
		c.step(n.Nq, F.NqE, Nq, "", ref, "bearing capacity factor", vphi)
	}
	vNq := val(n.Nq, Nq, "")
	c.step(n.Nc, F.NcE, Nc, "", ref, "bearing capacity factor", vNq, vphi)
	vNc := val(n.Nc, Nc, "")
	switch m {
	case EC7:
		c.step(n.Ng, F.NgE, Ng, "", ref, "bearing capacity factor (rough base)", vNq, vphi)
	case Vesic:
		c.step(n.Ng, F.NgV, Ng, "", ref, "bearing capacity factor", vNq, vphi)
	case Meyerhof:
		c.step(n.Ng, F.NgM, Ng, "", ref, "bearing capacity factor", vNq, vphi)
	case Hansen:
		c.step(n.Ng, F.NgH, Ng, "", ref, "bearing capacity factor", vNq, vphi)
	case Terzaghi:
		c.step(n.Ng, nil, Ng, "", refKumb, "bearing capacity factor from Kumbhojkar's (1993) table", vphi)
	}
	var Kp float64
	if m == Meyerhof {
		Kp = c.step(n.Kp, F.Kp, math.Pow(math.Tan(math.Pi/4+phi/2), 2), "", ref, "passive pressure coefficient", vphi)
	}
	vKp := val(n.Kp, Kp, "")
	over10 := phi > 10*degr

	// shape
	sc, sq, sg := 1.0, 1.0, 1.0
	r := 0.0
	if !g.strip {
		r = g.Bp / g.Lp
	}
	switch {
	case g.strip:
		c.one(n.sc, 1, ref, "strip: no shape factor")
		c.one(n.sq, 1, ref, "strip: no shape factor")
		c.one(n.sg, 1, ref, "strip: no shape factor")
	case m == Terzaghi && g.circC:
		sc = c.one(n.sc, 1.3, ref, "circle (Terzaghi: 1.3 c N_c)")
		c.one(n.sq, 1, ref, "no shape factor on the q term")
		sg = c.one(n.sg, 0.6, ref, "circle (Terzaghi: 0.3 γ B N_γ)")
	case m == EC7:
		sq = c.step(n.sq, F.sqE, 1+r*sp, "", ref, "shape factor", vB, vL, vphi)
		sg = c.step(n.sg, F.sgE, 1-0.3*r, "", ref, "shape factor", vB, vL)
		sc = c.step(n.sc, F.scE, (sq*Nq-1)/(Nq-1), "", ref, "shape factor", val(n.sq, sq, ""), vNq)
	case m == Meyerhof:
		sc = c.step(n.sc, F.scM, 1+0.2*Kp*r, "", ref, "shape factor", vKp, vB, vL)
		if over10 {
			sq = c.step(n.sq, F.sqM, 1+0.1*Kp*r, "", ref, "shape factor (φ′ > 10°)", vKp, vB, vL)
			sg = c.step(n.sg, F.sqM, sq, "", ref, "shape factor (φ′ > 10°)", vKp, vB, vL)
		} else {
			c.one(n.sq, 1, ref, "φ′ ≤ 10°: taken as 1 (the source gives the formula for φ′ > 10° and 1 at φ′ = 0)")
			c.one(n.sg, 1, ref, "φ′ ≤ 10°: taken as 1")
		}
	case m == Hansen || m == Vesic:
		sc = c.step(n.sc, F.scH, 1+Nq/Nc*r, "", ref, "shape factor", vNq, vNc, vB, vL)
		if m == Hansen {
			sq = c.step(n.sq, F.sqH, 1+r*sp, "", ref, "shape factor", vB, vL, vphi)
		} else {
			sq = c.step(n.sq, F.sqV, 1+r*tp, "", ref, "shape factor", vB, vL, vphi)
		}
		sg = c.step(n.sg, F.sgH, math.Max(0.6, 1-0.4*r), "", ref, "shape factor (not below 0.6)", vB, vL)
	case m == Terzaghi:
		sc = c.step(n.sc, F.scT, 1+0.3*r, "", ref, "shape factor (1.3 for a square; rectangle interpolated, common practice)", vB, vL)
		c.one(n.sq, 1, ref, "no shape factor on the q term")
		sg = c.step(n.sg, F.sgT, 1-0.2*r, "", ref, "shape factor (0.8 for a square; rectangle interpolated, common practice)", vB, vL)
	}

	// depth
	dc, dq, dg := 1.0, 1.0, 1.0
	hasD := m == Meyerhof || m == Hansen || m == Vesic
	if hasD {
		vD, vBf := val("D", g.D, "m"), val("B", g.Bf, "m")
		switch {
		case g.noDepth:
			c.one(n.dc, 1, ref, "no depth factor in this check")
			c.one(n.dq, 1, ref, "no depth factor in this check")
			c.one(n.dg, 1, ref, "no depth factor in this check")
		case m == Meyerhof:
			dc = c.step(n.dc, F.dcM, 1+0.2*math.Sqrt(Kp)*g.D/g.Bf, "", ref, "depth factor", vKp, vD, vBf)
			if over10 {
				dq = c.step(n.dq, F.dqM, 1+0.1*math.Sqrt(Kp)*g.D/g.Bf, "", ref, "depth factor (φ′ > 10°)", vKp, vD, vBf)
				dg = c.step(n.dg, F.dqM, dq, "", ref, "depth factor (φ′ > 10°)", vKp, vD, vBf)
			} else {
				c.one(n.dq, 1, ref, "φ′ ≤ 10°: taken as 1")
				c.one(n.dg, 1, ref, "φ′ ≤ 10°: taken as 1")
			}
		default:
			k := depthK(g.D, g.Bf)
			vk := val("k", k, "")
			dc = c.step(n.dc, F.dcH, 1+0.4*k, "", ref, "depth factor", vk)
			dq = c.step(n.dq, F.dqH, 1+2*tp*math.Pow(1-sp, 2)*k, "", ref, "depth factor", vphi, vk)
			c.one(n.dg, 1, ref, "depth factor")
		}
	}

	// inclination
	ic, iq, ig := 1.0, 1.0, 1.0
	if g.H == 0 {
		c.one(n.ic, 1, ref, "vertical load")
		c.one(n.iq, 1, ref, "vertical load")
		c.one(n.ig, 1, ref, "vertical load")
	} else {
		cot := 0.0
		if tp > 0 {
			cot = 1 / tp
		}
		den := g.V + g.Ap*s.c*cot
		switch m {
		case EC7, Vesic:
			mm := c.mExp(F, g, ref)
			vm := val(n.m, mm, "")
			base := math.Max(0, 1-g.H/den)
			iq = c.step(n.iq, F.iqE, math.Pow(base, mm), "", ref, "inclination factor", vH, vV, vA, vc, vphi, vm)
			ig = c.step(n.ig, F.igE, math.Pow(base, mm+1), "", ref, "inclination factor", vH, vV, vA, vc, vphi, vm)
			viq := val(n.iq, iq, "")
			if m == EC7 {
				ic = c.step(n.ic, F.icE, math.Max(0, iq-(1-iq)/(Nc*tp)), "", ref, "inclination factor", viq, vNc, vphi)
			} else {
				ic = c.step(n.ic, F.icV, math.Max(0, iq-(1-iq)/(Nq-1)), "", ref, "inclination factor", viq, vNq)
			}
		case Hansen:
			iq = c.step(n.iq, F.iqH, math.Pow(math.Max(0, 1-0.5*g.H/den), 5), "", ref, "inclination factor (exponent 5)", vH, vV, vA, vc, vphi)
			ig = c.step(n.ig, F.igH, math.Pow(math.Max(0, 1-(0.7-g.alpha/(450*degr))*g.H/den), 5), "", ref, "inclination factor (exponent 5)", valpha, vH, vV, vA, vc, vphi)
			ic = c.step(n.ic, F.icH, math.Max(0, iq-(1-iq)/(Nq-1)), "", ref, "inclination factor", val(n.iq, iq, ""), vNq)
		default: // Meyerhof; Terzaghi borrows Meyerhof's
			rm := refMey63
			beta := math.Atan(g.H / g.V)
			vb := val("beta", beta, "deg")
			ic = c.step(n.ic, F.icM, math.Pow(1-beta/(90*degr), 2), "", rm, "inclination factor", vb)
			iq = c.step(n.iq, F.icM, ic, "", rm, "inclination factor", vb)
			ig = c.step(n.ig, F.igM, math.Pow(math.Max(0, 1-beta/phi), 2), "", rm, "inclination factor", vb, vphi)
		}
	}

	// base inclination
	bc, bq, bg := 1.0, 1.0, 1.0
	hasB := m == EC7 || m == Hansen || m == Vesic
	if hasB {
		if g.alpha == 0 {
			c.one(n.bc, 1, ref, "horizontal base")
			c.one(n.bq, 1, ref, "horizontal base")
			c.one(n.bg, 1, ref, "horizontal base")
		} else if m == Hansen {
			bc = c.step(n.bc, F.bcH, 1-g.alpha/(147*degr), "", ref, "base inclination factor", valpha)
			bq = c.step(n.bq, F.bqH, math.Exp(-2*g.alpha*tp), "", ref, "base inclination factor", valpha, vphi)
			bg = c.step(n.bg, F.bgH, math.Exp(-2.7*g.alpha*tp), "", ref, "base inclination factor", valpha, vphi)
		} else {
			bq = c.step(n.bq, F.bqE, math.Pow(1-g.alpha*tp, 2), "", ref, "base inclination factor", valpha, vphi)
			bg = c.step(n.bg, F.bqE, bq, "", ref, "base inclination factor", valpha, vphi)
			bc = c.step(n.bc, F.bcE, bq-(1-bq)/(Nc*tp), "", ref, "base inclination factor", val(n.bq, bq, ""), vNc, vphi)
		}
	}

	vq, vg, vNg := val(n.qe, s.q, "kPa"), val(n.gam, s.gam, "kN/m3"), val(n.Ng, Ng, "")
	f3 := func(a, b, c float64, sa, sb, sc string) []trace.Value {
		return []trace.Value{val(sa, a, ""), val(sb, b, ""), val(sc, c, "")}
	}
	var q float64
	var f trace.Expr
	var in []trace.Value
	in = append(in, vc, vNc, vq, vNq, vg, vB, vNg)
	switch m {
	case EC7:
		q = s.c*Nc*bc*sc*ic + s.q*Nq*bq*sq*iq + 0.5*s.gam*g.Bp*Ng*bg*sg*ig
		f = F.qultE
		in = append(in, f3(bc, sc, ic, n.bc, n.sc, n.ic)...)
		in = append(in, f3(bq, sq, iq, n.bq, n.sq, n.iq)...)
		in = append(in, f3(bg, sg, ig, n.bg, n.sg, n.ig)...)
	case Meyerhof:
		q = s.c*Nc*sc*dc*ic + s.q*Nq*sq*dq*iq + 0.5*s.gam*g.Bp*Ng*sg*dg*ig
		f = F.qultM
		in = append(in, f3(sc, dc, ic, n.sc, n.dc, n.ic)...)
		in = append(in, f3(sq, dq, iq, n.sq, n.dq, n.iq)...)
		in = append(in, f3(sg, dg, ig, n.sg, n.dg, n.ig)...)
	case Hansen, Vesic:
		q = s.c*Nc*sc*dc*ic*bc + s.q*Nq*sq*dq*iq*bq + 0.5*s.gam*g.Bp*Ng*sg*dg*ig*bg
		f = F.qultH
		in = append(in, f3(sc, dc, ic, n.sc, n.dc, n.ic)...)
		in = append(in, f3(sq, dq, iq, n.sq, n.dq, n.iq)...)
		in = append(in, f3(sg, dg, ig, n.sg, n.dg, n.ig)...)
		in = append(in, f3(bc, bq, bg, n.bc, n.bq, n.bg)...)
	case Terzaghi:
		q = s.c*Nc*sc*ic + s.q*Nq*iq + 0.5*s.gam*g.Bp*Ng*sg*ig
		f = F.qultT
		in = append(in, f3(sc, ic, iq, n.sc, n.ic, n.iq)...)
		in = append(in, f3(sg, ig, 0, n.sg, n.ig, "")[:2]...)
	}
	note := "ultimate bearing pressure, drained"
	if s.local {
		note += " (local shear)"
	}
	return c.step(n.qult, f, q, "kPa", ref, note, in...)
}

func depthK(D, B float64) float64 {
	if D <= B {
		return D / B
	}
	return math.Atan(D / B)
}

// mExp records the exponent m of the inclination factors (EN 1997-1 D.4;
// Vesić 1975).
func (c *calc) mExp(F *forms, g *geo, ref trace.Ref) float64 {
	n := &F.n
	if g.strip {
		return c.one(n.m, 2, ref, "strip: m = m_B with B′/L′ = 0 (H along B)")
	}
	vB, vL := val(n.B, g.Bp, "m"), val(n.L, g.Lp, "m")
	r := g.Bp / g.Lp
	mB := c.step(n.mB, F.mB, (2+r)/(1+r), "", ref, "exponent for H along B′", vB, vL)
	mL := c.step(n.mL, F.mL, (2+1/r)/(1+1/r), "", ref, "exponent for H along L′", vB, vL)
	th := c.thetaValue()
	ct, st := math.Cos(th), math.Sin(th)
	return c.step(n.m, F.m, mL*ct*ct+mB*st*st, "", ref, "exponent for H at θ to L′", val(n.mL, mL, ""), val(n.mB, mB, ""), val("theta", th, "deg"))
}

// thetaValue returns the value of the latest "theta" step of the case.
func (c *calc) thetaValue() float64 {
	for i := len(c.t.Steps) - 1; i >= 0 && c.t.Steps[i].Case == c.cas; i-- {
		if c.t.Steps[i].Symbol == "theta" {
			return c.t.Steps[i].Value
		}
	}
	return 0
}

// resistU is the undrained (total stress) resistance, φ = 0.
func (c *calc) resistU(m Method, F *forms, s soil, g *geo) float64 {
	n := &F.n
	ref := methodRef(m, true)
	vB, vL, vA := val(n.B, g.Bp, "m"), val(n.L, g.Lp, "m"), val(n.A, g.Ap, c.uA)
	vH, valpha := val("H_d", g.H, c.uF), val("alpha", g.alpha, "deg")
	vcu, vq := val(n.cu, s.cu, "kPa"), val(n.q, s.q, "kPa")
	r := 0.0
	if !g.strip {
		r = g.Bp / g.Lp
	}
	if F == fMain && g.H > g.Ap*s.cu {
		c.hcLim = true
		c.warn("hc-limit", trace.SevWarning, refD3, "H_d exceeds A′c_u,d: the base slides before it can bear (EN 1997-1 D.3 needs H ≤ A′c_u); the check fails.",
			vH, val("A'c_u_d", g.Ap*s.cu, c.uF))
	}
	shape := func(f trace.Expr, v float64, note string) float64 {
		if g.strip {
			return c.one(n.sc, 1, ref, "strip: no shape factor")
		}
		return c.step(n.sc, f, v, "", ref, note, vB, vL)
	}
	k := 0.0
	depth := func(f trace.Expr, v float64) float64 {
		if g.noDepth {
			return c.one(n.dc, 1, ref, "no depth factor in this check")
		}
		if m == Meyerhof {
			return c.step(n.dc, f, v, "", ref, "depth factor", val("D", g.D, "m"), val("B", g.Bf, "m"))
		}
		return c.step(n.dc, f, v, "", ref, "depth factor", val("k", k, ""))
	}
	if !g.noDepth {
		k = depthK(g.D, g.Bf)
	}
	var q float64
	switch m {
	case EC7:
		bc := 1.0
		if g.alpha == 0 {
			c.one(n.bc, 1, ref, "horizontal base")
		} else {
			bc = c.step(n.bc, F.bcU, 1-2*g.alpha/(math.Pi+2), "", ref, "base inclination factor", valpha)
		}
		sc := shape(F.scU, 1+0.2*r, "shape factor")
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			ic = c.step(n.ic, F.icU, 0.5*(1+math.Sqrt(math.Max(0, 1-g.H/(g.Ap*s.cu)))), "", ref, "inclination factor", vH, vA, vcu)
		}
		q = (math.Pi+2)*s.cu*bc*sc*ic + s.q
		return c.step(n.qult, F.qultU, q, "kPa", ref, c.noteU(s), vcu, val(n.bc, bc, ""), val(n.sc, sc, ""), val(n.ic, ic, ""), vq)
	case Meyerhof:
		Nc := c.step(n.Nc, F.NcU, math.Pi+2, "", refPrandt, "bearing capacity factor at φ = 0")
		sc := shape(F.scMU, 1+0.2*r, "shape factor (K_p = 1 at φ = 0)")
		dc := depth(F.dcMU, 1+0.2*g.D/g.Bf)
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			beta := math.Atan(g.H / g.V)
			ic = c.step(n.ic, F.icM, math.Pow(1-beta/(90*degr), 2), "", ref, "inclination factor", val("beta", beta, "deg"))
		}
		q = s.cu*Nc*sc*dc*ic + s.q
		return c.step(n.qult, F.qultMU, q, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.dc, dc, ""), val(n.ic, ic, ""), vq)
	case Hansen:
		s1 := 0.0
		if g.strip {
			c.one(n.s1c, 0, ref, "strip: no shape term")
		} else {
			s1 = c.step(n.s1c, F.s1cH, 0.2*r, "", ref, "shape term (φ = 0)", vB, vL)
		}
		d1 := 0.0
		if g.noDepth {
			c.one(n.d1c, 0, ref, "no depth term in this check")
		} else {
			d1 = c.step(n.d1c, F.d1cH, 0.4*k, "", ref, "depth term (φ = 0)", val("k", k, ""))
		}
		i1 := 0.0
		if g.H == 0 {
			c.one(n.i1c, 0, ref, "vertical load")
		} else {
			i1 = c.step(n.i1c, F.i1cH, 0.5-0.5*math.Sqrt(math.Max(0, 1-g.H/(g.Ap*s.cu))), "", ref, "inclination term (φ = 0)", vH, vA, vcu)
		}
		b1 := 0.0
		if g.alpha == 0 {
			c.one(n.b1c, 0, ref, "horizontal base")
		} else {
			b1 = c.step(n.b1c, F.b1cH, g.alpha/(147*degr), "", ref, "base term (φ = 0)", valpha)
		}
		q = (math.Pi+2)*s.cu*(1+s1+d1-i1-b1) + s.q
		return c.step(n.qult, F.qultHU, q, "kPa", ref, c.noteU(s), vcu, val(n.s1c, s1, ""), val(n.d1c, d1, ""), val(n.i1c, i1, ""), val(n.b1c, b1, ""), vq)
	case Vesic:
		Nc := c.step(n.Nc, F.NcU, math.Pi+2, "", refPrandt, "bearing capacity factor at φ = 0")
		sc := shape(F.scVU, 1+r/(math.Pi+2), "shape factor (N_q/N_c = 1/(π + 2))")
		dc := depth(F.dcH, 1+0.4*k)
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			mm := c.mExp(F, g, ref)
			ic = c.step(n.ic, F.icVU, math.Max(0, 1-mm*g.H/(g.Ap*s.cu*Nc)), "", ref, "inclination factor", val(n.m, mm, ""), vH, vA, vcu, val(n.Nc, Nc, ""))
		}
		bc := 1.0
		if g.alpha == 0 {
			c.one(n.bc, 1, ref, "horizontal base")
		} else {
			bc = c.step(n.bc, F.bcU, 1-2*g.alpha/(math.Pi+2), "", ref, "base inclination factor", valpha)
		}
		q = s.cu*Nc*sc*dc*ic*bc + s.q
		return c.step(n.qult, F.qultVU, q, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.dc, dc, ""), val(n.ic, ic, ""), val(n.bc, bc, ""), vq)
	default: // Terzaghi
		Nc := c.step(n.Nc, F.NcT0, 1.5*math.Pi+1, "", ref, "bearing capacity factor at φ = 0 (1.5π + 1)")
		var sc float64
		switch {
		case g.strip:
			sc = c.one(n.sc, 1, ref, "strip: no shape factor")
		case g.circC:
			sc = c.one(n.sc, 1.3, ref, "circle (Terzaghi: 1.3 c N_c)")
		default:
			sc = c.step(n.sc, F.scT, 1+0.3*r, "", ref, "shape factor (1.3 for a square; rectangle interpolated, common practice)", vB, vL)
		}
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			beta := math.Atan(g.H / g.V)
			ic = c.step(n.ic, F.icM, math.Pow(1-beta/(90*degr), 2), "", refMey63, "inclination factor (Meyerhof 1963)", val("beta", beta, "deg"))
		}
		q = s.cu*Nc*sc*ic + s.q
		return c.step(n.qult, F.qultTU, q, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.ic, ic, ""), vq)
	}
}

func (c *calc) noteU(s soil) string {
	if s.local {
		return "ultimate bearing pressure, undrained (local shear)"
	}
	return "ultimate bearing pressure, undrained"
}
