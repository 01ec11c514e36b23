package bearing

import "github.com/plinth-calc/plinth/calc/trace"

// Formula trees are built once per symbol set: the founding layer (main),
// the lower layer of a two-layer check (lower, suffix _2) and the
// load-spread check of the lower layer (spread, suffix _s).

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
	phi, c, cu, gam, q, qe := trace.S(n.phi), trace.S(n.c), trace.S(n.cu), trace.S(n.gam), trace.S(n.q), trace.S(n.qe)
	B, L, A := trace.S(n.B), trace.S(n.L), trace.S(n.A)
	Nq, Nc, Ng := trace.S(n.Nq), trace.S(n.Nc), trace.S(n.Ng)
	alpha, H, V := trace.S("alpha"), trace.S("H_d"), trace.S("V_d")
	tan, sin := func(x expr) expr { return trace.Fn("tan", x) }, func(x expr) expr { return trace.Fn("sin", x) }
	one, two := trace.N(1), trace.N(2)
	BL := trace.Div(B, L)
	mx0 := func(x expr) expr { return trace.Fn("max", trace.N(0), x) }
	f := &forms{n: n}
	// Annex D, D.4
	f.NqE = trace.Mul(trace.Fn("exp", trace.Mul(trace.S("pi"), tan(phi))), trace.Pow(tan(trace.Add(trace.Deg(45), trace.Div(phi, two))), two))
	f.NcE = trace.Mul(trace.Sub(Nq, one), trace.Fn("cot", phi))
	f.NgE = trace.Mul(two, trace.Sub(Nq, one), tan(phi))
	f.bqE = trace.Pow(trace.Sub(one, trace.Mul(alpha, tan(phi))), two)
	f.bcE = trace.Sub(trace.S(n.bq), trace.Div(trace.Sub(one, trace.S(n.bq)), trace.Mul(Nc, tan(phi))))
	f.sqE = trace.Add(one, trace.Mul(BL, sin(phi)))
	f.sgE = trace.Sub(one, trace.Mul(trace.N(0.3), BL))
	f.scE = trace.Div(trace.Sub(trace.Mul(trace.S(n.sq), Nq), one), trace.Sub(Nq, one))
	f.mB = trace.Div(trace.Add(two, BL), trace.Add(one, BL))
	f.mL = trace.Div(trace.Add(two, trace.Div(L, B)), trace.Add(one, trace.Div(L, B)))
	f.m = trace.Add(trace.Mul(trace.S(n.mL), trace.Pow(trace.Fn("cos", trace.S("theta")), two)), trace.Mul(trace.S(n.mB), trace.Pow(sin(trace.S("theta")), two)))
	base := trace.Sub(one, trace.Div(H, trace.Add(V, trace.Mul(A, c, trace.Fn("cot", phi)))))
	f.iqE = trace.Pow(mx0(base), trace.S(n.m))
	f.igE = trace.Pow(mx0(base), trace.Add(trace.S(n.m), one))
	f.icE = mx0(trace.Sub(trace.S(n.iq), trace.Div(trace.Sub(one, trace.S(n.iq)), trace.Mul(Nc, tan(phi)))))
	f.qultE = trace.Add(trace.Mul(c, Nc, trace.S(n.bc), trace.S(n.sc), trace.S(n.ic)), trace.Mul(qe, Nq, trace.S(n.bq), trace.S(n.sq), trace.S(n.iq)),
		trace.Mul(trace.N(0.5), gam, B, Ng, trace.S(n.bg), trace.S(n.sg), trace.S(n.ig)))
	// Annex D, D.3
	pi2 := trace.Add(trace.S("pi"), two)
	f.NcU = pi2
	f.bcU = trace.Sub(one, trace.Div(trace.Mul(two, alpha), pi2))
	f.scU = trace.Add(one, trace.Mul(trace.N(0.2), BL))
	f.icU = trace.Mul(trace.N(0.5), trace.Add(one, trace.Fn("sqrt", mx0(trace.Sub(one, trace.Div(H, trace.Mul(A, cu)))))))
	f.qultU = trace.Add(trace.Mul(pi2, cu, trace.S(n.bc), trace.S(n.sc), trace.S(n.ic)), q)
	// Meyerhof (1963), Bowles (1996) Tables 4-1, 4-5a
	Kp := trace.S(n.Kp)
	Df, Bf := trace.S("D"), trace.S("B")
	beta := trace.S("beta")
	f.Kp = trace.Pow(tan(trace.Add(trace.Deg(45), trace.Div(phi, two))), two)
	f.NgM = trace.Mul(trace.Sub(Nq, one), tan(trace.Mul(trace.N(1.4), phi)))
	f.scM = trace.Add(one, trace.Mul(trace.N(0.2), Kp, BL))
	f.sqM = trace.Add(one, trace.Mul(trace.N(0.1), Kp, BL))
	f.dcM = trace.Add(one, trace.Mul(trace.N(0.2), trace.Fn("sqrt", Kp), trace.Div(Df, Bf)))
	f.dqM = trace.Add(one, trace.Mul(trace.N(0.1), trace.Fn("sqrt", Kp), trace.Div(Df, Bf)))
	f.icM = trace.Pow(trace.Sub(one, trace.Div(beta, trace.Deg(90))), two)
	f.igM = trace.Pow(mx0(trace.Sub(one, trace.Div(beta, phi))), two)
	f.qultM = trace.Add(trace.Mul(c, Nc, trace.S(n.sc), trace.S(n.dc), trace.S(n.ic)), trace.Mul(qe, Nq, trace.S(n.sq), trace.S(n.dq), trace.S(n.iq)),
		trace.Mul(trace.N(0.5), gam, B, Ng, trace.S(n.sg), trace.S(n.dg), trace.S(n.ig)))
	f.scMU = f.scU
	f.dcMU = trace.Add(one, trace.Mul(trace.N(0.2), trace.Div(Df, Bf)))
	f.qultMU = trace.Add(trace.Mul(cu, Nc, trace.S(n.sc), trace.S(n.dc), trace.S(n.ic)), q)
	// Hansen (1970), Bowles (1996) Tables 4-1, 4-5a, 4-5b
	k := trace.S("k")
	f.NgH = trace.Mul(trace.N(1.5), trace.Sub(Nq, one), tan(phi))
	f.scH = trace.Add(one, trace.Mul(trace.Div(Nq, Nc), BL))
	f.sqH = trace.Add(one, trace.Mul(BL, sin(phi)))
	f.sgH = trace.Fn("max", trace.N(0.6), trace.Sub(one, trace.Mul(trace.N(0.4), BL)))
	f.dcH = trace.Add(one, trace.Mul(trace.N(0.4), k))
	f.dqH = trace.Add(one, trace.Mul(two, tan(phi), trace.Pow(trace.Sub(one, sin(phi)), two), k))
	f.iqH = trace.Pow(mx0(trace.Sub(one, trace.Div(trace.Mul(trace.N(0.5), H), trace.Add(V, trace.Mul(A, c, trace.Fn("cot", phi)))))), trace.N(5))
	f.igH = trace.Pow(mx0(trace.Sub(one, trace.Div(trace.Mul(trace.Sub(trace.N(0.7), trace.Div(alpha, trace.Deg(450))), H), trace.Add(V, trace.Mul(A, c, trace.Fn("cot", phi)))))), trace.N(5))
	f.icH = mx0(trace.Sub(trace.S(n.iq), trace.Div(trace.Sub(one, trace.S(n.iq)), trace.Sub(Nq, one))))
	f.bcH = trace.Sub(one, trace.Div(alpha, trace.Deg(147)))
	f.bqH = trace.Fn("exp", trace.Negate(trace.Mul(two, alpha, tan(phi))))
	f.bgH = trace.Fn("exp", trace.Negate(trace.Mul(trace.N(2.7), alpha, tan(phi))))
	f.qultH = trace.Add(trace.Mul(c, Nc, trace.S(n.sc), trace.S(n.dc), trace.S(n.ic), trace.S(n.bc)), trace.Mul(qe, Nq, trace.S(n.sq), trace.S(n.dq), trace.S(n.iq), trace.S(n.bq)),
		trace.Mul(trace.N(0.5), gam, B, Ng, trace.S(n.sg), trace.S(n.dg), trace.S(n.ig), trace.S(n.bg)))
	f.s1cH = trace.Mul(trace.N(0.2), BL)
	f.d1cH = trace.Mul(trace.N(0.4), k)
	f.i1cH = trace.Sub(trace.N(0.5), trace.Mul(trace.N(0.5), trace.Fn("sqrt", mx0(trace.Sub(one, trace.Div(H, trace.Mul(A, cu)))))))
	f.b1cH = trace.Div(alpha, trace.Deg(147))
	f.qultHU = trace.Add(trace.Mul(pi2, cu, trace.Sub(trace.Sub(trace.Add(one, trace.S(n.s1c), trace.S(n.d1c)), trace.S(n.i1c)), trace.S(n.b1c))), q)
	f.NgV = trace.Mul(two, trace.Add(Nq, one), tan(phi))
	f.sqV = trace.Add(one, trace.Mul(BL, tan(phi)))
	f.icV = f.icH
	f.scVU = trace.Add(one, trace.Div(BL, pi2))
	f.icVU = mx0(trace.Sub(one, trace.Div(trace.Mul(trace.S(n.m), H), trace.Mul(A, cu, Nc))))
	f.qultVU = trace.Add(trace.Mul(cu, Nc, trace.S(n.sc), trace.S(n.dc), trace.S(n.ic), trace.S(n.bc)), q)
	// Terzaghi (1943)
	f.NqT = trace.Div(trace.Fn("exp", trace.Mul(two, trace.Sub(trace.Mul(trace.N(0.75), trace.S("pi")), trace.Div(phi, two)), tan(phi))),
		trace.Mul(two, trace.Pow(trace.Fn("cos", trace.Add(trace.Deg(45), trace.Div(phi, two))), two)))
	f.NcT0 = trace.Add(trace.Mul(trace.N(1.5), trace.S("pi")), one)
	f.scT = trace.Add(one, trace.Mul(trace.N(0.3), BL))
	f.sgT = trace.Sub(one, trace.Mul(trace.N(0.2), BL))
	f.qultT = trace.Add(trace.Mul(c, Nc, trace.S(n.sc), trace.S(n.ic)), trace.Mul(qe, Nq, trace.S(n.iq)), trace.Mul(trace.N(0.5), gam, B, Ng, trace.S(n.sg), trace.S(n.ig)))
	f.qultTU = trace.Add(trace.Mul(cu, Nc, trace.S(n.sc), trace.S(n.ic)), q)
	return f
}

var (
	fMain   = mkForms(mkNames("", "phi'_d", "c'_d", "c_u_d", "gamma'", "q", "q'", "B'", "L'", "A'", "q_ult"))
	fLower  = mkForms(mkNames("_2", "phi'_2", "c'_2", "c_u_2", "gamma'_2", "q_H", "q'_H", "B'", "L'", "A'", "q_b"))
	fSpread = mkForms(mkNames("_s", "phi'_2", "c'_2", "c_u_2", "gamma'_2", "q_H", "q'_H", "B_s", "L_s", "A_s", "q_ult_s"))
)
