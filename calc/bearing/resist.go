package bearing

import "github.com/plinth-calc/plinth/calc/trace"

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

// one records a factor the method takes as 1 (or 0 for Hansen's additive
// factors): a given value.
func (c *calc) one(sym string, v float64, ref trace.Ref, note string) float64 {
	return c.took(trace.Given, sym, v, "", ref, note)
}

// resistD is the drained (effective stress) resistance:
// q_ult = c′N_c·(factors) + q′N_q·(factors) + ½γ′B′N_γ·(factors).
func (c *calc) resistD(m Method, F *forms, s soil, g *geo) float64 {
	n := &F.n
	ref := methodRef(m, false)
	phi := s.phi
	vphi := val(n.phi, phi, "deg")
	vB, vL, vA := val(n.B, g.Bp, "m"), val(n.L, g.Lp, "m"), val(n.A, g.Ap, c.uA)
	vH, vV, valpha := val("H_d", g.H, c.uF), val("V_d", g.V, c.uF), val("alpha", g.alpha, "deg")
	vc := val(n.c, s.c, "kPa")
	fNq := F.NqE
	if m == Terzaghi {
		fNq = F.NqT
	}
	Nq := c.eval(n.Nq, fNq, "", ref, "bearing capacity factor", vphi)
	vNq := val(n.Nq, Nq, "")
	Nc := c.eval(n.Nc, F.NcE, "", ref, "bearing capacity factor", vNq, vphi)
	vNc := val(n.Nc, Nc, "")
	var Ng float64
	switch m {
	case EC7:
		Ng = c.eval(n.Ng, F.NgE, "", ref, "bearing capacity factor (rough base)", vNq, vphi)
	case Vesic:
		Ng = c.eval(n.Ng, F.NgV, "", ref, "bearing capacity factor", vNq, vphi)
	case Meyerhof:
		Ng = c.eval(n.Ng, F.NgM, "", ref, "bearing capacity factor", vNq, vphi)
	case Hansen:
		Ng = c.eval(n.Ng, F.NgH, "", ref, "bearing capacity factor", vNq, vphi)
	case Terzaghi:
		Ng = c.took(trace.Interpolated, n.Ng, TerzaghiNgamma(phi), "", refKumb, "bearing capacity factor from Kumbhojkar's (1993) table", vphi)
	}
	var Kp float64
	if m == Meyerhof {
		Kp = c.eval(n.Kp, F.Kp, "", ref, "passive pressure coefficient", vphi)
	}
	vKp := val(n.Kp, Kp, "")
	over10 := phi > 10*degr

	// shape
	sc, sq, sg := 1.0, 1.0, 1.0
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
		sq = c.eval(n.sq, F.sqE, "", ref, "shape factor", vB, vL, vphi)
		sg = c.eval(n.sg, F.sgE, "", ref, "shape factor", vB, vL)
		sc = c.eval(n.sc, F.scE, "", ref, "shape factor", val(n.sq, sq, ""), vNq)
	case m == Meyerhof:
		sc = c.eval(n.sc, F.scM, "", ref, "shape factor", vKp, vB, vL)
		if over10 {
			sq = c.eval(n.sq, F.sqM, "", ref, "shape factor (φ′ > 10°)", vKp, vB, vL)
			sg = c.eval(n.sg, F.sqM, "", ref, "shape factor (φ′ > 10°)", vKp, vB, vL)
		} else {
			c.one(n.sq, 1, ref, "φ′ ≤ 10°: taken as 1 (the source gives the formula for φ′ > 10° and 1 at φ′ = 0)")
			c.one(n.sg, 1, ref, "φ′ ≤ 10°: taken as 1")
		}
	case m == Hansen || m == Vesic:
		sc = c.eval(n.sc, F.scH, "", ref, "shape factor", vNq, vNc, vB, vL)
		if m == Hansen {
			sq = c.eval(n.sq, F.sqH, "", ref, "shape factor", vB, vL, vphi)
		} else {
			sq = c.eval(n.sq, F.sqV, "", ref, "shape factor", vB, vL, vphi)
		}
		sg = c.eval(n.sg, F.sgH, "", ref, "shape factor (not below 0.6)", vB, vL)
	case m == Terzaghi:
		sc = c.eval(n.sc, F.scT, "", ref, "shape factor (1.3 for a square; rectangle interpolated, common practice)", vB, vL)
		c.one(n.sq, 1, ref, "no shape factor on the q term")
		sg = c.eval(n.sg, F.sgT, "", ref, "shape factor (0.8 for a square; rectangle interpolated, common practice)", vB, vL)
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
			dc = c.eval(n.dc, F.dcM, "", ref, "depth factor", vKp, vD, vBf)
			if over10 {
				dq = c.eval(n.dq, F.dqM, "", ref, "depth factor (φ′ > 10°)", vKp, vD, vBf)
				dg = c.eval(n.dg, F.dqM, "", ref, "depth factor (φ′ > 10°)", vKp, vD, vBf)
			} else {
				c.one(n.dq, 1, ref, "φ′ ≤ 10°: taken as 1")
				c.one(n.dg, 1, ref, "φ′ ≤ 10°: taken as 1")
			}
		default:
			vk := val("k", g.k, "")
			dc = c.eval(n.dc, F.dcH, "", ref, "depth factor", vk)
			dq = c.eval(n.dq, F.dqH, "", ref, "depth factor", vphi, vk)
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
		switch m {
		case EC7, Vesic:
			mm := c.mExp(F, g, ref)
			vm := val(n.m, mm, "")
			iq = c.eval(n.iq, F.iqE, "", ref, "inclination factor", vH, vV, vA, vc, vphi, vm)
			ig = c.eval(n.ig, F.igE, "", ref, "inclination factor", vH, vV, vA, vc, vphi, vm)
			viq := val(n.iq, iq, "")
			if m == EC7 {
				ic = c.eval(n.ic, F.icE, "", ref, "inclination factor", viq, vNc, vphi)
			} else {
				ic = c.eval(n.ic, F.icV, "", ref, "inclination factor", viq, vNq)
			}
		case Hansen:
			iq = c.eval(n.iq, F.iqH, "", ref, "inclination factor (exponent 5)", vH, vV, vA, vc, vphi)
			ig = c.eval(n.ig, F.igH, "", ref, "inclination factor (exponent 5)", valpha, vH, vV, vA, vc, vphi)
			ic = c.eval(n.ic, F.icH, "", ref, "inclination factor", val(n.iq, iq, ""), vNq)
		default: // Meyerhof; Terzaghi borrows Meyerhof's
			rm := refMey63
			vb := val("beta", g.beta, "deg")
			ic = c.eval(n.ic, F.icM, "", rm, "inclination factor", vb)
			iq = c.eval(n.iq, F.icM, "", rm, "inclination factor", vb)
			ig = c.eval(n.ig, F.igM, "", rm, "inclination factor", vb, vphi)
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
			bc = c.eval(n.bc, F.bcH, "", ref, "base inclination factor", valpha)
			bq = c.eval(n.bq, F.bqH, "", ref, "base inclination factor", valpha, vphi)
			bg = c.eval(n.bg, F.bgH, "", ref, "base inclination factor", valpha, vphi)
		} else {
			bq = c.eval(n.bq, F.bqE, "", ref, "base inclination factor", valpha, vphi)
			bg = c.eval(n.bg, F.bqE, "", ref, "base inclination factor", valpha, vphi)
			bc = c.eval(n.bc, F.bcE, "", ref, "base inclination factor", val(n.bq, bq, ""), vNc, vphi)
		}
	}

	vq, vg, vNg := val(n.qe, s.q, "kPa"), val(n.gam, s.gam, "kN/m3"), val(n.Ng, Ng, "")
	f3 := func(in []trace.Value, a, b, c float64, sa, sb, sc string) []trace.Value {
		return append(in, val(sa, a, ""), val(sb, b, ""), val(sc, c, ""))
	}
	var f trace.Expr
	var buf [19]trace.Value
	in := append(buf[:0], vc, vNc, vq, vNq, vg, vB, vNg)
	switch m {
	case EC7:
		f = F.qultE
		in = f3(in, bc, sc, ic, n.bc, n.sc, n.ic)
		in = f3(in, bq, sq, iq, n.bq, n.sq, n.iq)
		in = f3(in, bg, sg, ig, n.bg, n.sg, n.ig)
	case Meyerhof:
		f = F.qultM
		in = f3(in, sc, dc, ic, n.sc, n.dc, n.ic)
		in = f3(in, sq, dq, iq, n.sq, n.dq, n.iq)
		in = f3(in, sg, dg, ig, n.sg, n.dg, n.ig)
	case Hansen, Vesic:
		f = F.qultH
		in = f3(in, sc, dc, ic, n.sc, n.dc, n.ic)
		in = f3(in, sq, dq, iq, n.sq, n.dq, n.iq)
		in = f3(in, sg, dg, ig, n.sg, n.dg, n.ig)
		in = f3(in, bc, bq, bg, n.bc, n.bq, n.bg)
	case Terzaghi:
		f = F.qultT
		in = f3(in, sc, ic, iq, n.sc, n.ic, n.iq)
		in = append(in, val(n.sg, sg, ""), val(n.ig, ig, ""))
	}
	note := "ultimate bearing pressure, drained"
	if s.local {
		note += " (local shear)"
	}
	return c.eval(n.qult, f, "kPa", ref, note, in...)
}

// mExp records the exponent m of the inclination factors (EN 1997-1 D.4;
// Vesić 1975).
func (c *calc) mExp(F *forms, g *geo, ref trace.Ref) float64 {
	n := &F.n
	if g.strip {
		return c.one(n.m, 2, ref, "strip: m = m_B with B′/L′ = 0 (H along B)")
	}
	vB, vL := val(n.B, g.Bp, "m"), val(n.L, g.Lp, "m")
	mB := c.eval(n.mB, F.mB, "", ref, "exponent for H along B′", vB, vL)
	mL := c.eval(n.mL, F.mL, "", ref, "exponent for H along L′", vB, vL)
	return c.eval(n.m, F.m, "", ref, "exponent for H at θ to L′", val(n.mL, mL, ""), val(n.mB, mB, ""), val("theta", c.thetaValue(), "deg"))
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
	if F == fMain && g.H > g.Ap*s.cu {
		c.hcLim = true
		c.warn("hc-limit", trace.SevWarning, refD3, "H_d exceeds A′c_u,d: the base slides before it can bear (EN 1997-1 D.3 needs H ≤ A′c_u); the check fails.",
			vH, val("A'c_u_d", g.Ap*s.cu, c.uF))
	}
	shape := func(f trace.Expr, note string) float64 {
		if g.strip {
			return c.one(n.sc, 1, ref, "strip: no shape factor")
		}
		return c.eval(n.sc, f, "", ref, note, vB, vL)
	}
	vk := val("k", g.k, "")
	depth := func(f trace.Expr) float64 {
		if g.noDepth {
			return c.one(n.dc, 1, ref, "no depth factor in this check")
		}
		if m == Meyerhof {
			return c.eval(n.dc, f, "", ref, "depth factor", val("D", g.D, "m"), val("B", g.Bf, "m"))
		}
		return c.eval(n.dc, f, "", ref, "depth factor", vk)
	}
	// Meyerhof's i_c = (1 − β/90°)², also borrowed by Terzaghi's method
	inclM := func(fref trace.Ref, note string) float64 {
		if g.H == 0 {
			return c.one(n.ic, 1, ref, "vertical load")
		}
		return c.eval(n.ic, F.icM, "", fref, note, val("beta", g.beta, "deg"))
	}
	base := func() float64 {
		if g.alpha == 0 {
			return c.one(n.bc, 1, ref, "horizontal base")
		}
		return c.eval(n.bc, F.bcU, "", ref, "base inclination factor", valpha)
	}
	switch m {
	case EC7:
		bc := base()
		sc := shape(F.scU, "shape factor")
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			ic = c.eval(n.ic, F.icU, "", ref, "inclination factor", vH, vA, vcu)
		}
		return c.eval(n.qult, F.qultU, "kPa", ref, c.noteU(s), vcu, val(n.bc, bc, ""), val(n.sc, sc, ""), val(n.ic, ic, ""), vq)
	case Meyerhof:
		Nc := c.eval(n.Nc, F.NcU, "", refPrandt, "bearing capacity factor at φ = 0")
		sc := shape(F.scMU, "shape factor (K_p = 1 at φ = 0)")
		dc := depth(F.dcMU)
		ic := inclM(ref, "inclination factor")
		return c.eval(n.qult, F.qultMU, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.dc, dc, ""), val(n.ic, ic, ""), vq)
	case Hansen:
		s1 := 0.0
		if g.strip {
			c.one(n.s1c, 0, ref, "strip: no shape term")
		} else {
			s1 = c.eval(n.s1c, F.s1cH, "", ref, "shape term (φ = 0)", vB, vL)
		}
		d1 := 0.0
		if g.noDepth {
			c.one(n.d1c, 0, ref, "no depth term in this check")
		} else {
			d1 = c.eval(n.d1c, F.d1cH, "", ref, "depth term (φ = 0)", vk)
		}
		i1 := 0.0
		if g.H == 0 {
			c.one(n.i1c, 0, ref, "vertical load")
		} else {
			i1 = c.eval(n.i1c, F.i1cH, "", ref, "inclination term (φ = 0)", vH, vA, vcu)
		}
		b1 := 0.0
		if g.alpha == 0 {
			c.one(n.b1c, 0, ref, "horizontal base")
		} else {
			b1 = c.eval(n.b1c, F.b1cH, "", ref, "base term (φ = 0)", valpha)
		}
		return c.eval(n.qult, F.qultHU, "kPa", ref, c.noteU(s), vcu, val(n.s1c, s1, ""), val(n.d1c, d1, ""), val(n.i1c, i1, ""), val(n.b1c, b1, ""), vq)
	case Vesic:
		Nc := c.eval(n.Nc, F.NcU, "", refPrandt, "bearing capacity factor at φ = 0")
		sc := shape(F.scVU, "shape factor (N_q/N_c = 1/(π + 2))")
		dc := depth(F.dcH)
		ic := 1.0
		if g.H == 0 {
			c.one(n.ic, 1, ref, "vertical load")
		} else {
			mm := c.mExp(F, g, ref)
			ic = c.eval(n.ic, F.icVU, "", ref, "inclination factor", val(n.m, mm, ""), vH, vA, vcu, val(n.Nc, Nc, ""))
		}
		bc := base()
		return c.eval(n.qult, F.qultVU, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.dc, dc, ""), val(n.ic, ic, ""), val(n.bc, bc, ""), vq)
	default: // Terzaghi
		Nc := c.eval(n.Nc, F.NcT0, "", ref, "bearing capacity factor at φ = 0 (1.5π + 1)")
		var sc float64
		switch {
		case g.strip:
			sc = c.one(n.sc, 1, ref, "strip: no shape factor")
		case g.circC:
			sc = c.one(n.sc, 1.3, ref, "circle (Terzaghi: 1.3 c N_c)")
		default:
			sc = c.eval(n.sc, F.scT, "", ref, "shape factor (1.3 for a square; rectangle interpolated, common practice)", vB, vL)
		}
		ic := inclM(refMey63, "inclination factor (Meyerhof 1963)")
		return c.eval(n.qult, F.qultTU, "kPa", ref, c.noteU(s), vcu, val(n.Nc, Nc, ""), val(n.sc, sc, ""), val(n.ic, ic, ""), vq)
	}
}

func (c *calc) noteU(s soil) string {
	if s.local {
		return "ultimate bearing pressure, undrained (local shear)"
	}
	return "ultimate bearing pressure, undrained"
}
