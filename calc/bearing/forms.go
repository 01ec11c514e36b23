package bearing

import "github.com/plinth-calc/plinth/calc/trace"

// Formula trees are built once per symbol set: the founding layer (main),
// the lower layer of a two-layer check (lower, suffix _2) and the
// load-spread check of the lower layer (spread, suffix _s).

var (
	sym = trace.S
	num = trace.N
	add = trace.Add
	sub = trace.Sub
	mul = trace.Mul
	div = trace.Div
	pow = trace.Pow
	fn  = trace.Fn
	deg = trace.Deg
	neg = trace.Negate
)

type names struct {
	phi, c, cu, gam, q, qe string // φ, c′, c_u, γ (of the N_γ term), q (total), q′ (effective)
	B, L, A                string // effective width, length, area
	Nq, Nc, Ng, Kp         string
	sc, sq, sg             string
	dc, dq, dg             string
	ic, iq, ig             string
	bc, bq, bg             string
	s1c, d1c, i1c, b1c     string // Hansen's additive φ = 0 factors
	m, mB, mL              string
	qult                   string
}

func mkNames(sfx, phi, c, cu, gam, q, qe, B, L, A, qult string) names {
	x := func(s string) string { return s + sfx }
	return names{
		phi: phi, c: c, cu: cu, gam: gam, q: q, qe: qe, B: B, L: L, A: A,
		Nq: x("N_q"), Nc: x("N_c"), Ng: x("N_gamma"), Kp: x("K_p"),
		sc: x("s_c"), sq: x("s_q"), sg: x("s_gamma"),
		dc: x("d_c"), dq: x("d_q"), dg: x("d_gamma"),
		ic: x("i_c"), iq: x("i_q"), ig: x("i_gamma"),
		bc: x("b_c"), bq: x("b_q"), bg: x("b_gamma"),
		s1c: x("s'_c"), d1c: x("d'_c"), i1c: x("i'_c"), b1c: x("b'_c"),
		m: x("m"), mB: x("m_B"), mL: x("m_L"),
		qult: qult,
	}
}

type forms struct {
	n names
	// EN 1997-1 Annex D
	NqE, NcE, NgE, bqE, bcE, sqE, sgE, scE, mB, mL, m, iqE, igE, icE, qultE expr
	bcU, scU, icU, qultU                                                    expr
	// Meyerhof (1963)
	Kp, NgM, scM, sqM, dcM, dqM, icM, igM, qultM, scMU, dcMU, qultMU expr
	// Hansen (1970) and Vesic (1973, 1975)
	NgH, scH, sqH, sgH, dcH, dqH, iqH, igH, icH, bcH, bqH, bgH, qultH expr
	s1cH, d1cH, i1cH, b1cH, qultHU                                    expr
	NgV, sqV, icV, scVU, icVU, qultVU                                 expr
	// Terzaghi (1943)
	NqT, scT, sgT, qultT, qultTU expr
	// shared
	NcU, NcT0 expr
}

type expr = trace.Expr

func mkForms(n names) *forms {
	phi, c, cu, gam, q, qe := sym(n.phi), sym(n.c), sym(n.cu), sym(n.gam), sym(n.q), sym(n.qe)
	B, L, A := sym(n.B), sym(n.L), sym(n.A)
	Nq, Nc, Ng := sym(n.Nq), sym(n.Nc), sym(n.Ng)
	alpha, H, V := sym("alpha"), sym("H_d"), sym("V_d")
	tan, sin := func(x expr) expr { return fn("tan", x) }, func(x expr) expr { return fn("sin", x) }
	one, two := num(1), num(2)
	BL := div(B, L)
	mx0 := func(x expr) expr { return fn("max", num(0), x) }
	f := &forms{n: n}
	// Annex D, D.4
	f.NqE = mul(fn("exp", mul(sym("pi"), tan(phi))), pow(tan(add(deg(45), div(phi, two))), two))
	f.NcE = mul(sub(Nq, one), fn("cot", phi))
	f.NgE = mul(two, sub(Nq, one), tan(phi))
	f.bqE = pow(sub(one, mul(alpha, tan(phi))), two)
	f.bcE = sub(sym(n.bq), div(sub(one, sym(n.bq)), mul(Nc, tan(phi))))
	f.sqE = add(one, mul(BL, sin(phi)))
	f.sgE = sub(one, mul(num(0.3), BL))
	f.scE = div(sub(mul(sym(n.sq), Nq), one), sub(Nq, one))
	f.mB = div(add(two, BL), add(one, BL))
	f.mL = div(add(two, div(L, B)), add(one, div(L, B)))
	f.m = add(mul(sym(n.mL), pow(fn("cos", sym("theta")), two)), mul(sym(n.mB), pow(sin(sym("theta")), two)))
	base := sub(one, div(H, add(V, mul(A, c, fn("cot", phi)))))
	f.iqE = pow(mx0(base), sym(n.m))
	f.igE = pow(mx0(base), add(sym(n.m), one))
	f.icE = mx0(sub(sym(n.iq), div(sub(one, sym(n.iq)), mul(Nc, tan(phi)))))
	f.qultE = add(mul(c, Nc, sym(n.bc), sym(n.sc), sym(n.ic)), mul(qe, Nq, sym(n.bq), sym(n.sq), sym(n.iq)),
		mul(num(0.5), gam, B, Ng, sym(n.bg), sym(n.sg), sym(n.ig)))
	// Annex D, D.3
	pi2 := add(sym("pi"), two)
	f.NcU = pi2
	f.bcU = sub(one, div(mul(two, alpha), pi2))
	f.scU = add(one, mul(num(0.2), BL))
	f.icU = mul(num(0.5), add(one, fn("sqrt", mx0(sub(one, div(H, mul(A, cu)))))))
	f.qultU = add(mul(pi2, cu, sym(n.bc), sym(n.sc), sym(n.ic)), q)
	// Meyerhof (1963), Bowles (1996) Tables 4-1, 4-5a
	Kp := sym(n.Kp)
	Df, Bf := sym("D"), sym("B")
	beta := sym("beta")
	f.Kp = pow(tan(add(deg(45), div(phi, two))), two)
	f.NgM = mul(sub(Nq, one), tan(mul(num(1.4), phi)))
	f.scM = add(one, mul(num(0.2), Kp, BL))
	f.sqM = add(one, mul(num(0.1), Kp, BL))
	f.dcM = add(one, mul(num(0.2), fn("sqrt", Kp), div(Df, Bf)))
	f.dqM = add(one, mul(num(0.1), fn("sqrt", Kp), div(Df, Bf)))
	f.icM = pow(sub(one, div(beta, deg(90))), two)
	f.igM = pow(mx0(sub(one, div(beta, phi))), two)
	f.qultM = add(mul(c, Nc, sym(n.sc), sym(n.dc), sym(n.ic)), mul(qe, Nq, sym(n.sq), sym(n.dq), sym(n.iq)),
		mul(num(0.5), gam, B, Ng, sym(n.sg), sym(n.dg), sym(n.ig)))
	f.scMU = f.scU
	f.dcMU = add(one, mul(num(0.2), div(Df, Bf)))
	f.qultMU = add(mul(cu, Nc, sym(n.sc), sym(n.dc), sym(n.ic)), q)
	// Hansen (1970), Bowles (1996) Tables 4-1, 4-5a, 4-5b
	k := sym("k")
	f.NgH = mul(num(1.5), sub(Nq, one), tan(phi))
	f.scH = add(one, mul(div(Nq, Nc), BL))
	f.sqH = add(one, mul(BL, sin(phi)))
	f.sgH = fn("max", num(0.6), sub(one, mul(num(0.4), BL)))
	f.dcH = add(one, mul(num(0.4), k))
	f.dqH = add(one, mul(two, tan(phi), pow(sub(one, sin(phi)), two), k))
	f.iqH = pow(mx0(sub(one, div(mul(num(0.5), H), add(V, mul(A, c, fn("cot", phi)))))), num(5))
	f.igH = pow(mx0(sub(one, div(mul(sub(num(0.7), div(alpha, deg(450))), H), add(V, mul(A, c, fn("cot", phi)))))), num(5))
	f.icH = mx0(sub(sym(n.iq), div(sub(one, sym(n.iq)), sub(Nq, one))))
	f.bcH = sub(one, div(alpha, deg(147)))
	f.bqH = fn("exp", neg(mul(two, alpha, tan(phi))))
	f.bgH = fn("exp", neg(mul(num(2.7), alpha, tan(phi))))
	f.qultH = add(mul(c, Nc, sym(n.sc), sym(n.dc), sym(n.ic), sym(n.bc)), mul(qe, Nq, sym(n.sq), sym(n.dq), sym(n.iq), sym(n.bq)),
		mul(num(0.5), gam, B, Ng, sym(n.sg), sym(n.dg), sym(n.ig), sym(n.bg)))
	f.s1cH = mul(num(0.2), BL)
	f.d1cH = mul(num(0.4), k)
	f.i1cH = sub(num(0.5), mul(num(0.5), fn("sqrt", mx0(sub(one, div(H, mul(A, cu)))))))
	f.b1cH = div(alpha, deg(147))
	f.qultHU = add(mul(pi2, cu, sub(sub(add(one, sym(n.s1c), sym(n.d1c)), sym(n.i1c)), sym(n.b1c))), q)
	f.NgV = mul(two, add(Nq, one), tan(phi))
	f.sqV = add(one, mul(BL, tan(phi)))
	f.icV = f.icH
	f.scVU = add(one, div(BL, pi2))
	f.icVU = mx0(sub(one, div(mul(sym(n.m), H), mul(A, cu, Nc))))
	f.qultVU = add(mul(cu, Nc, sym(n.sc), sym(n.dc), sym(n.ic), sym(n.bc)), q)
	// Terzaghi (1943)
	f.NqT = div(fn("exp", mul(two, sub(mul(num(0.75), sym("pi")), div(phi, two)), tan(phi))),
		mul(two, pow(fn("cos", add(deg(45), div(phi, two))), two)))
	f.NcT0 = add(mul(num(1.5), sym("pi")), one)
	f.scT = add(one, mul(num(0.3), BL))
	f.sgT = sub(one, mul(num(0.2), BL))
	f.qultT = add(mul(c, Nc, sym(n.sc), sym(n.ic)), mul(qe, Nq, sym(n.iq)), mul(num(0.5), gam, B, Ng, sym(n.sg), sym(n.ig)))
	f.qultTU = add(mul(cu, Nc, sym(n.sc), sym(n.ic)), q)
	return f
}

var (
	fMain   = mkForms(mkNames("", "phi'_d", "c'_d", "c_u_d", "gamma'", "q", "q'", "B'", "L'", "A'", "q_ult"))
	fLower  = mkForms(mkNames("_2", "phi'_2", "c'_2", "c_u_2", "gamma'_2", "q_H", "q'_H", "B'", "L'", "A'", "q_b"))
	fSpread = mkForms(mkNames("_s", "phi'_2", "c'_2", "c_u_2", "gamma'_2", "q_H", "q'_H", "B_s", "L_s", "A_s", "q_ult_s"))
)
