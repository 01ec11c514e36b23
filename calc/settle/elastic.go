package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Steinbrenner returns Steinbrenner's influence factors F1 and F2 for the
// settlement of the corner of a flexible, uniformly loaded b × l rectangle
// on an elastic layer of thickness H over a rigid base, with M = l/b and
// N = H/b:
//
//	F1 = (1/π)[M ln((1 + √(M²+1))√(M²+N²) / (M(1 + √(M²+N²+1))))
//	          + ln((M + √(M²+1))√(1+N²) / (M + √(M²+N²+1)))]
//	F2 = (N/2π) atan(M / (N√(M²+N²+1)))
//
// so that s = q b (1 − ν²)/E · [F1 + (1 − 2ν)/(1 − ν) F2] (Steinbrenner
// 1934; in the form of Bowles 1996, §5-6, eq. (5-16a), Table 5-2, where
// F1 = I1 and F2 = I2). M = +Inf gives the limit for a strip,
// F1 = ln(1 + N²)/(2π), F2 = (N/2π) atan(1/N); N = +Inf the half-space.
func Steinbrenner(M, N float64) (F1, F2 float64, err error) {
	var errs site.Errors
	if !(M > 0) {
		errs = append(errs, &site.RangeError{Param: "M", Value: M, Min: 0, Max: math.Inf(1), Reason: "M = L/B"})
	}
	if !(N >= 0) {
		errs = append(errs, &site.RangeError{Param: "N", Value: N, Min: 0, Max: math.Inf(1), Reason: "N = H/B"})
	}
	if math.IsInf(M, 1) && math.IsInf(N, 1) {
		errs = append(errs, &site.InputError{Param: "N", Msg: "a strip on an unbounded elastic layer settles without limit: give a finite H/B"})
	}
	if len(errs) > 0 {
		return 0, 0, one(errs)
	}
	F1, F2 = stein(M, N)
	return F1, F2, nil
}

func one(errs site.Errors) error {
	if len(errs) == 1 {
		return errs[0]
	}
	return errs
}

func stein(M, N float64) (f1, f2 float64) {
	switch {
	case N == 0:
		return 0, 0
	case math.IsInf(M, 1):
		l := math.Log1p(N * N)
		if N > 1e8 {
			l = 2 * math.Log(N)
		}
		return l / (2 * math.Pi), N * math.Atan(1/N) / (2 * math.Pi)
	case math.IsInf(N, 1):
		s := math.Sqrt(M*M + 1)
		return (M*math.Log((1+s)/M) + math.Log(M+s)) / math.Pi, 0
	}
	s1 := math.Sqrt(M*M + 1)
	s2 := math.Hypot(M, N)
	s3 := math.Hypot(s1, N)
	a0 := M * math.Log((1+s1)*s2/(M*(1+s3)))
	a1 := math.Log((M + s1) * math.Hypot(1, N) / (M + s3))
	return (a0 + a1) / math.Pi, N / (2 * math.Pi) * math.Atan(M/(N*s3))
}

func f1Expr(m, n string) trace.Expr {
	M, Nn := trace.S(m), trace.S(n)
	m2, n2 := trace.Pow(M, trace.N(2)), trace.Pow(Nn, trace.N(2))
	s1 := trace.Fn("sqrt", trace.Add(m2, trace.N(1)))
	s2 := trace.Fn("sqrt", trace.Add(m2, n2))
	s3 := trace.Fn("sqrt", trace.Add(m2, n2, trace.N(1)))
	a0 := trace.Mul(M, trace.Fn("ln", trace.Div(trace.Mul(trace.Add(trace.N(1), s1), s2), trace.Mul(M, trace.Add(trace.N(1), s3)))))
	a1 := trace.Fn("ln", trace.Div(trace.Mul(trace.Add(M, s1), trace.Fn("sqrt", trace.Add(trace.N(1), n2))), trace.Add(M, s3)))
	return trace.Mul(trace.Div(trace.N(1), trace.S("pi")), trace.Add(a0, a1))
}

func f2Expr(m, n string) trace.Expr {
	M, Nn := trace.S(m), trace.S(n)
	s3 := trace.Fn("sqrt", trace.Add(trace.Pow(M, trace.N(2)), trace.Pow(Nn, trace.N(2)), trace.N(1)))
	return trace.Mul(trace.Div(Nn, trace.Mul(trace.N(2), trace.S("pi"))), trace.Fn("atan", trace.Div(M, trace.Mul(Nn, s3))))
}

// erect is a rectangle with a corner at the point considered: sides b ≤ l
// (l = +Inf for a strip), n of them, written kb·B′ and kl·L′.
type erect struct {
	b, l   float64
	kb, kl float64
	bsym   string // "B" or "L" (which footing side b is a multiple of)
	lsym   string
	n      int
}

// elasticRects returns the rectangles around the chosen point. A circle is
// replaced by the square of equal area (common practice), B′ = B√π/2, its
// edge by the middle of the square's side.
func (k *calc) elasticRects() (bp, lp float64, rs []erect) {
	f := k.f
	bp, lp = f.B, f.Length()
	if f.Shape == site.Circle {
		bp = f.B * math.Sqrt(math.Pi) / 2
		lp = bp
	}
	var kx, ky float64
	switch k.c.point {
	case stress.Corner:
		kx, ky = 0.5, 0.5
	case stress.Characteristic:
		kx, ky = stress.CharRect, stress.CharRect
	case stress.MidB:
		kx = 0.5
	case stress.MidL:
		ky = 0.5
		if math.IsInf(lp, 1) || f.Shape == site.Circle {
			kx, ky = 0.5, 0 // a strip's or circle's edge
		}
	}
	edge := k.c.point == stress.Corner || k.c.point == stress.MidB || k.c.point == stress.MidL
	if math.IsInf(lp, 1) || (f.Shape == site.Circle && edge) {
		ky = 0 // a strip is unbounded along L; a circle's edge is taken at mid-side of its square
	}
	xs := []float64{0.5 + kx, 0.5 - kx}
	ys := []float64{0.5 + ky, 0.5 - ky}
	for _, a := range xs {
		for _, c := range ys {
			if a <= 0 || c <= 0 {
				continue
			}
			e := erect{b: a * bp, l: c * lp, kb: a, kl: c, bsym: "B", lsym: "L", n: 1}
			if math.IsInf(lp, 1) {
				e.l = lp
			}
			if !math.IsInf(e.l, 1) && e.l < e.b {
				e.b, e.l, e.kb, e.kl, e.bsym, e.lsym = e.l, e.b, e.kl, e.kb, "L", "B"
			}
			merged := false
			for i := range rs {
				if rs[i].b == e.b && rs[i].l == e.l {
					rs[i].n++
					merged = true
				}
			}
			if !merged {
				rs = append(rs, e)
			}
		}
	}
	return bp, lp, rs
}

// modulus picks the stiffness of layer i for immediate settlement.
func (k *calc) modulus(i int, combined bool) (E, nu float64, kind string, ok bool) {
	l := k.g.Layers[i]
	if l.Fine() && l.Eu.Set {
		return l.Eu.V, 0.5, "E_u", true
	}
	if l.E.Set {
		if l.Fine() && combined && hasConsol(l) {
			return 0, 0, "", false
		}
		return l.E.V, l.Nu.Or(DefaultNu), "E'", true
	}
	return 0, 0, "", false
}

func hasConsol(l site.Layer) bool { return l.Mv.Set || (l.Cc.Set && l.E0.Set) }

// elastic computes the immediate settlement of each layer in the zone by
// Steinbrenner's factors with superposition over layers and rectangles.
func (k *calc) elastic(combined bool) {
	f := k.f
	D := f.D
	bp, lp, rs := k.elasticRects()
	noted := false
	for _, lr := range k.layerRanges() {
		i := lr.layer
		l := k.g.Layers[i]
		cs := ""
		if k.full {
			cs = k.layerName(i) + ": immediate (Steinbrenner)"
		}
		E, nu, kind, ok := k.modulus(i, combined)
		if !ok {
			var code, msg string
			sev := trace.SevWarning
			switch {
			case l.Fine() && combined && hasConsol(l):
				code, msg, sev = "no-eu", fmt.Sprintf("%s: no E_u given, so its immediate (undrained) settlement is not included", k.layerName(i)), trace.SevNote
			case l.Fine() && combined:
				code, msg = "no-stiffness", fmt.Sprintf("%s: no E_u, E′, m_v or C_c given: the layer adds no settlement", k.layerName(i))
				k.unverified(fmt.Sprintf("%s has no E_u, E′, m_v or C_c", k.layerName(i)))
			default:
				code, msg = "no-stiffness", fmt.Sprintf("%s: no stiffness (E_u or E′) given: the layer adds no immediate settlement", k.layerName(i))
				k.unverified(fmt.Sprintf("%s has no stiffness (E_u or E′)", k.layerName(i)))
			}
			k.take(cs, ix("s_i,", i), trace.Given, 0, "mm", trace.Ref{}, "no immediate settlement computed for this layer")
			k.warn(cs, code, sev, trace.Ref{}, msg)
			continue
		}
		var pending []func()
		if kind == "E'" && !l.Nu.Set && !noted {
			pending = append(pending, func() {
				k.take(cs, "nu'", trace.Given, DefaultNu, "", trace.Ref{}, "Poisson's ratio: assumed, default (common practice); give nu in the layer table to change it")
				k.noteAtStep(cs, "nu-default", fmt.Sprintf("Poisson's ratio ν′ = %g assumed where not given (common practice)", DefaultNu))
			})
			noted = true
		}
		if kind == "E_u" && l.Nu.Set && l.Nu.V != 0.5 {
			pending = append(pending, func() {
				k.warn(cs, "nu-undrained", trace.SevNote, trace.Ref{}, fmt.Sprintf("%s: ν = 0.5 used with E_u (undrained), not the ν given", k.layerName(i)))
			})
		}
		if kind == "E'" && l.Fine() {
			pending = append(pending, func() {
				k.warn(cs, "elastic-drained", trace.SevNote, trace.Ref{}, fmt.Sprintf("%s: fine-grained layer with drained E′ only: its elastic settlement is the long-term (drained) settlement", k.layerName(i)))
			})
		}
		k.imm[i] = kind
		c1, c2 := 1-nu*nu, 1-nu-2*nu*nu
		// sublayer values
		fat := func(zb float64) float64 {
			var s float64
			for _, r := range rs {
				M := r.l / r.b
				a, b := stein(M, zb/r.b)
				s += float64(r.n) * r.b * (c1*a + c2*b)
			}
			return s
		}
		prev := fat(lr.top - D)
		for j := lr.first; j < lr.end; j++ {
			s := &k.r.Sub[j]
			next := fat(s.Bot - D)
			s.Si = k.qn / E * (next - prev)
			s.Case, s.E = kind, E
			prev = next
		}
		if !k.full {
			continue
		}
		k.explainElastic(cs, i, lr, rs, bp, lp, E, nu, kind)
		for _, w := range pending {
			w()
		}
	}
}

// Formulas of the Steinbrenner working, built once for the symbols of up
// to four corner rectangles (index 0: a single rectangle, unnumbered).
var (
	fxBq     = trace.Mul(trace.Div(trace.Fn("sqrt", trace.S("pi")), trace.N(2)), trace.S("B"))
	fxHt     = trace.Sub(trace.S("z_top"), trace.S("D"))
	fxHb     = trace.Sub(trace.S("z_bot"), trace.S("D"))
	steinFx  [5]steinSyms
	steinRef = trace.Ref{Source: Steinbrenner1934, Clause: "F1, F2 (as Bowles 1996, eq. 5-16a, Table 5-2)"}
)

// steinSyms are the symbols and formulas of one corner rectangle's working.
type steinSyms struct {
	b, l, m, nb, nt, f1b, f2b, f1t, f2t, is string
	nbx, ntx, mx                            trace.Expr // N_b = H_b/b, N_t = H_t/b, M = l/b
	f1bx, f2bx, f1tx, f2tx                  trace.Expr // Steinbrenner's F1, F2 at the bottom and top
	s1bx, s2bx, s1tx, s2tx                  trace.Expr // the strip limits
	isx, isTopx                             trace.Expr // I_s without and with a top
}

func init() {
	for r := range steinFx {
		name := func(base, sub string) string {
			switch {
			case r > 0 && sub != "":
				return fmt.Sprintf("%s_%s,%d", base, sub, r)
			case r > 0:
				return fmt.Sprintf("%s_%d", base, r)
			case sub != "":
				return base + "_" + sub
			}
			return base
		}
		s := steinSyms{b: name("b", ""), l: name("l", ""), m: name("M", ""), nb: name("N", "b"), nt: name("N", "t"),
			f1b: name("F", "1b"), f2b: name("F", "2b"), f1t: name("F", "1t"), f2t: name("F", "2t"), is: name("I", "s")}
		s.nbx = trace.Div(trace.S("H_b"), trace.S(s.b))
		s.ntx = trace.Div(trace.S("H_t"), trace.S(s.b))
		s.mx = trace.Div(trace.S(s.l), trace.S(s.b))
		s.f1bx, s.f2bx = f1Expr(s.m, s.nb), f2Expr(s.m, s.nb)
		s.f1tx, s.f2tx = f1Expr(s.m, s.nt), f2Expr(s.m, s.nt)
		s.s1bx, s.s2bx = f1Strip(s.nb), f2Strip(s.nb)
		s.s1tx, s.s2tx = f1Strip(s.nt), f2Strip(s.nt)
		nu := trace.S("nu")
		is := func(d1, d2 trace.Expr) trace.Expr {
			return trace.Add(trace.Mul(trace.Sub(trace.N(1), trace.Pow(nu, trace.N(2))), d1),
				trace.Mul(trace.Sub(trace.Sub(trace.N(1), nu), trace.Mul(trace.N(2), trace.Pow(nu, trace.N(2)))), d2))
		}
		s.isx = is(trace.S(s.f1b), trace.S(s.f2b))
		s.isTopx = is(trace.Sub(trace.S(s.f1b), trace.S(s.f1t)), trace.Sub(trace.S(s.f2b), trace.S(s.f2t)))
		steinFx[r] = s
	}
}

// f1Strip and f2Strip are Steinbrenner's factors in the strip limit.
func f1Strip(n string) trace.Expr {
	return trace.Div(trace.Fn("ln", trace.Add(trace.N(1), trace.Pow(trace.S(n), trace.N(2)))), trace.Mul(trace.N(2), trace.S("pi")))
}

func f2Strip(n string) trace.Expr {
	return trace.Mul(trace.Div(trace.S(n), trace.Mul(trace.N(2), trace.S("pi"))), trace.Fn("atan", trace.Div(trace.N(1), trace.S(n))))
}

// explainElastic writes the working of layer i's immediate settlement:
// Steinbrenner's factors at the top and bottom of the layer for each
// corner rectangle, superposed. Every value is its formula's; the layer's
// settlement in the stress table is the sum over its sublayers of the same
// factors (stein), which agrees to rounding.
func (k *calc) explainElastic(cs string, i int, lr layerRange, rs []erect, bp, lp, E, nu float64, kind string) {
	f := k.f
	D := f.D
	strip := math.IsInf(lp, 1)
	if f.Shape == site.Circle {
		bp = k.eval(cs, "B'", fxBq, []trace.Value{val("B", f.B, "m")}, "m", trace.Ref{}, "side of the square of equal area (common practice)")
		k.warn(cs, "circle-square", trace.SevNote, trace.Ref{}, "the circle is taken as the square of equal area for Steinbrenner's factors")
	}
	top := lr.top > D
	var ht float64
	if top {
		ht = k.eval(cs, "H_t", fxHt, []trace.Value{val("z_top", lr.top, "m"), val("D", D, "m")}, "m", trace.Ref{}, "depth of the top of the layer below the base")
	}
	hb := k.eval(cs, "H_b", fxHb, []trace.Value{val("z_bot", lr.bot, "m"), val("D", D, "m")}, "m", trace.Ref{}, "depth of the bottom of the layer (within the zone) below the base")
	ksym := "E_u"
	if kind == "E'" {
		ksym = "E'"
	}
	var sum trace.Expr
	sumIn := []trace.Value{val("q_net", k.qn, "kPa"), val(ksym, E, "MPa")}
	for ri, r := range rs {
		sy := steinFx[0]
		if len(rs) > 1 {
			sy = steinFx[ri+1]
		}
		side := func(kk float64, sym string) (trace.Expr, []trace.Value) {
			ref, v := "B", bp
			switch {
			case f.Shape == site.Circle:
				ref = "B'"
			case sym == "L" && f.Shape == site.Rectangle:
				ref, v = "L", lp
			}
			in := []trace.Value{val(ref, v, "m")}
			if kk == 1 {
				return trace.S(ref), in
			}
			return trace.Mul(trace.N(kk), trace.S(ref)), in
		}
		bx, bin := side(r.kb, r.bsym)
		b := k.eval(cs, sy.b, bx, bin, "m", trace.Ref{}, fmt.Sprintf("short side of the corner rectangle (%d of them)", r.n))
		var f1b, f2b, f1t, f2t float64
		if strip {
			nb := k.eval(cs, sy.nb, sy.nbx, []trace.Value{val("H_b", hb, "m"), val(sy.b, b, "m")}, "", trace.Ref{}, "")
			f1b = k.eval(cs, sy.f1b, sy.s1bx, []trace.Value{val(sy.nb, nb, "")}, "", steinRef, "strip limit (L → ∞)")
			f2b = k.eval(cs, sy.f2b, sy.s2bx, []trace.Value{val(sy.nb, nb, "")}, "", steinRef, "strip limit (L → ∞)")
			if top {
				nt := k.eval(cs, sy.nt, sy.ntx, []trace.Value{val("H_t", ht, "m"), val(sy.b, b, "m")}, "", trace.Ref{}, "")
				f1t = k.eval(cs, sy.f1t, sy.s1tx, []trace.Value{val(sy.nt, nt, "")}, "", steinRef, "strip limit (L → ∞)")
				f2t = k.eval(cs, sy.f2t, sy.s2tx, []trace.Value{val(sy.nt, nt, "")}, "", steinRef, "strip limit (L → ∞)")
			}
		} else {
			lx, lin := side(r.kl, r.lsym)
			l := k.eval(cs, sy.l, lx, lin, "m", trace.Ref{}, "long side of the corner rectangle")
			M := k.eval(cs, sy.m, sy.mx, []trace.Value{val(sy.l, l, "m"), val(sy.b, b, "m")}, "", trace.Ref{}, "")
			nb := k.eval(cs, sy.nb, sy.nbx, []trace.Value{val("H_b", hb, "m"), val(sy.b, b, "m")}, "", trace.Ref{}, "")
			bin := []trace.Value{val(sy.m, M, ""), val(sy.nb, nb, "")}
			f1b = k.eval(cs, sy.f1b, sy.f1bx, bin, "", steinRef, "Steinbrenner factor at the bottom")
			f2b = k.eval(cs, sy.f2b, sy.f2bx, bin, "", steinRef, "Steinbrenner factor at the bottom")
			if top {
				nt := k.eval(cs, sy.nt, sy.ntx, []trace.Value{val("H_t", ht, "m"), val(sy.b, b, "m")}, "", trace.Ref{}, "")
				tin := []trace.Value{val(sy.m, M, ""), val(sy.nt, nt, "")}
				f1t = k.eval(cs, sy.f1t, sy.f1tx, tin, "", steinRef, "Steinbrenner factor at the top")
				f2t = k.eval(cs, sy.f2t, sy.f2tx, tin, "", steinRef, "Steinbrenner factor at the top")
			}
		}
		iin := []trace.Value{val("nu", nu, ""), val(sy.f1b, f1b, ""), val(sy.f2b, f2b, "")}
		ie := sy.isx
		if top {
			ie = sy.isTopx
			iin = append(iin, val(sy.f1t, f1t, ""), val(sy.f2t, f2t, ""))
		}
		iv := k.eval(cs, sy.is, ie, iin, "", steinRef, "(1 − ν²)ΔF1 + (1 − ν − 2ν²)ΔF2")
		term := trace.Mul(trace.S(sy.b), trace.S(sy.is))
		if r.n != 1 {
			term = trace.Mul(trace.N(float64(r.n)), term)
		}
		if sum == nil {
			sum = term
		} else {
			sum = trace.Add(sum, term)
		}
		sumIn = append(sumIn, val(sy.b, b, "m"), val(sy.is, iv, ""))
	}
	k.eval(cs, ix("s_i,", i), trace.Mul(trace.Div(trace.S("q_net"), trace.S(ksym)), sum), sumIn, "mm", steinRef, fmt.Sprintf("immediate settlement of %s (superposition of corner rectangles)", k.layerName(i)))
}

// layerRange is the part of layer `layer` in the table: sublayers
// [first, end) from depth top to bot.
type layerRange struct {
	layer      int
	first, end int
	top, bot   float64
}

func (k *calc) layerRanges() []layerRange {
	var out []layerRange
	sub := k.r.Sub
	for j := 0; j < len(sub); {
		e := j
		for e < len(sub) && sub[e].Layer == sub[j].Layer {
			e++
		}
		out = append(out, layerRange{layer: sub[j].Layer, first: j, end: e, top: sub[j].Top, bot: sub[e-1].Bot})
		j = e
	}
	return out
}
