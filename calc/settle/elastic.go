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
	M, Nn := fS(m), fS(n)
	m2, n2 := fPow(M, fN(2)), fPow(Nn, fN(2))
	s1 := fFn("sqrt", fAdd(m2, fN(1)))
	s2 := fFn("sqrt", fAdd(m2, n2))
	s3 := fFn("sqrt", fAdd(m2, n2, fN(1)))
	a0 := fMul(M, fFn("ln", fDiv(fMul(fAdd(fN(1), s1), s2), fMul(M, fAdd(fN(1), s3)))))
	a1 := fFn("ln", fDiv(fMul(fAdd(M, s1), fFn("sqrt", fAdd(fN(1), n2))), fAdd(M, s3)))
	return fMul(fDiv(fN(1), fS("pi")), fAdd(a0, a1))
}

func f2Expr(m, n string) trace.Expr {
	M, Nn := fS(m), fS(n)
	s3 := fFn("sqrt", fAdd(fPow(M, fN(2)), fPow(Nn, fN(2)), fN(1)))
	return fMul(fDiv(Nn, fMul(fN(2), fS("pi"))), fFn("atan", fDiv(M, fMul(Nn, s3))))
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
	strip := math.IsInf(lp, 1)
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
			k.add(cs, ix("s_i,", i), nil, nil, 0, "mm", trace.Ref{}, "no immediate settlement computed for this layer")
			k.warn(cs, code, sev, trace.Ref{}, msg)
			continue
		}
		var pending []func()
		if kind == "E'" && !l.Nu.Set && !noted {
			pending = append(pending, func() {
				k.add(cs, "nu'", nil, nil, DefaultNu, "", trace.Ref{}, "Poisson's ratio: assumed, default (common practice); give nu in the layer table to change it")
				k.warn(cs, "nu-default", trace.SevNote, trace.Ref{}, fmt.Sprintf("Poisson's ratio ν′ = %g assumed where not given (common practice)", DefaultNu))
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
		// working for the layer
		ht, hb := lr.top-D, lr.bot-D
		ref := trace.Ref{Source: Steinbrenner1934, Clause: "F1, F2 (as Bowles 1996, eq. 5-16a, Table 5-2)"}
		if f.Shape == site.Circle {
			k.add(cs, "B'", fMul(fDiv(fFn("sqrt", fS("pi")), fN(2)), fS("B")), []trace.Value{val("B", f.B, "m")}, bp, "m", trace.Ref{}, "side of the square of equal area (common practice)")
			k.warn(cs, "circle-square", trace.SevNote, trace.Ref{}, "the circle is taken as the square of equal area for Steinbrenner's factors")
		}
		if ht > 0 {
			k.add(cs, "H_t", fSub(fS("z_top"), fS("D")), []trace.Value{val("z_top", lr.top, "m"), val("D", D, "m")}, ht, "m", trace.Ref{}, "depth of the top of the layer below the base")
		}
		k.add(cs, "H_b", fSub(fS("z_bot"), fS("D")), []trace.Value{val("z_bot", lr.bot, "m"), val("D", D, "m")}, hb, "m", trace.Ref{}, "depth of the bottom of the layer (within the zone) below the base")
		multi := len(rs) > 1
		name := func(base, sub string, r int) string {
			switch {
			case multi && sub != "":
				return fmt.Sprintf("%s_%s,%d", base, sub, r+1)
			case multi:
				return fmt.Sprintf("%s_%d", base, r+1)
			case sub != "":
				return base + "_" + sub
			}
			return base
		}
		var sum trace.Expr
		sumIn := []trace.Value{val("q_net", k.qn, "kPa"), val("E", E, "MPa")}
		var total float64
		for ri, r := range rs {
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
					return fS(ref), in
				}
				return fMul(fN(kk), fS(ref)), in
			}
			bs := name("b", "", ri)
			bx, bin := side(r.kb, r.bsym)
			k.add(cs, bs, bx, bin, r.b, "m", trace.Ref{}, fmt.Sprintf("short side of the corner rectangle (%d of them)", r.n))
			var f1t, f2t float64
			var f1b, f2b float64
			if strip {
				nb := name("N", "b", ri)
				k.add(cs, nb, fDiv(fS("H_b"), fS(bs)), []trace.Value{val("H_b", hb, "m"), val(bs, r.b, "m")}, hb/r.b, "", trace.Ref{}, "")
				f1b, f2b = stein(math.Inf(1), hb/r.b)
				k.add(cs, name("F", "1b", ri), fDiv(fFn("ln", fAdd(fN(1), fPow(fS(nb), fN(2)))), fMul(fN(2), fS("pi"))), []trace.Value{val(nb, hb/r.b, "")}, f1b, "", ref, "strip limit (L → ∞)")
				k.add(cs, name("F", "2b", ri), fMul(fDiv(fS(nb), fMul(fN(2), fS("pi"))), fFn("atan", fDiv(fN(1), fS(nb)))), []trace.Value{val(nb, hb/r.b, "")}, f2b, "", ref, "strip limit (L → ∞)")
				if ht > 0 {
					nt := name("N", "t", ri)
					k.add(cs, nt, fDiv(fS("H_t"), fS(bs)), []trace.Value{val("H_t", ht, "m"), val(bs, r.b, "m")}, ht/r.b, "", trace.Ref{}, "")
					f1t, f2t = stein(math.Inf(1), ht/r.b)
					k.add(cs, name("F", "1t", ri), fDiv(fFn("ln", fAdd(fN(1), fPow(fS(nt), fN(2)))), fMul(fN(2), fS("pi"))), []trace.Value{val(nt, ht/r.b, "")}, f1t, "", ref, "strip limit (L → ∞)")
					k.add(cs, name("F", "2t", ri), fMul(fDiv(fS(nt), fMul(fN(2), fS("pi"))), fFn("atan", fDiv(fN(1), fS(nt)))), []trace.Value{val(nt, ht/r.b, "")}, f2t, "", ref, "strip limit (L → ∞)")
				}
			} else {
				ls := name("l", "", ri)
				lx, lin := side(r.kl, r.lsym)
				k.add(cs, ls, lx, lin, r.l, "m", trace.Ref{}, "long side of the corner rectangle")
				ms := name("M", "", ri)
				M := r.l / r.b
				k.add(cs, ms, fDiv(fS(ls), fS(bs)), []trace.Value{val(ls, r.l, "m"), val(bs, r.b, "m")}, M, "", trace.Ref{}, "")
				nb := name("N", "b", ri)
				k.add(cs, nb, fDiv(fS("H_b"), fS(bs)), []trace.Value{val("H_b", hb, "m"), val(bs, r.b, "m")}, hb/r.b, "", trace.Ref{}, "")
				f1b, f2b = stein(M, hb/r.b)
				min := []trace.Value{val(ms, M, ""), val(nb, hb/r.b, "")}
				k.add(cs, name("F", "1b", ri), f1Expr(ms, nb), min, f1b, "", ref, "Steinbrenner factor at the bottom")
				k.add(cs, name("F", "2b", ri), f2Expr(ms, nb), min, f2b, "", ref, "Steinbrenner factor at the bottom")
				if ht > 0 {
					nt := name("N", "t", ri)
					k.add(cs, nt, fDiv(fS("H_t"), fS(bs)), []trace.Value{val("H_t", ht, "m"), val(bs, r.b, "m")}, ht/r.b, "", trace.Ref{}, "")
					f1t, f2t = stein(M, ht/r.b)
					tin := []trace.Value{val(ms, M, ""), val(nt, ht/r.b, "")}
					k.add(cs, name("F", "1t", ri), f1Expr(ms, nt), tin, f1t, "", ref, "Steinbrenner factor at the top")
					k.add(cs, name("F", "2t", ri), f2Expr(ms, nt), tin, f2t, "", ref, "Steinbrenner factor at the top")
				}
			}
			is := name("I", "s", ri)
			var ie trace.Expr
			iin := []trace.Value{val("nu", nu, ""), val(name("F", "1b", ri), f1b, ""), val(name("F", "2b", ri), f2b, "")}
			d1 := fS(name("F", "1b", ri))
			d2 := fS(name("F", "2b", ri))
			if ht > 0 {
				d1 = fSub(d1, fS(name("F", "1t", ri)))
				d2 = fSub(d2, fS(name("F", "2t", ri)))
				iin = append(iin, val(name("F", "1t", ri), f1t, ""), val(name("F", "2t", ri), f2t, ""))
			}
			nuS := fS("nu")
			ie = fAdd(fMul(fSub(fN(1), fPow(nuS, fN(2))), d1), fMul(fSub(fSub(fN(1), nuS), fMul(fN(2), fPow(nuS, fN(2)))), d2))
			iv := c1*(f1b-f1t) + c2*(f2b-f2t)
			k.add(cs, is, ie, iin, iv, "", ref, "(1 − ν²)ΔF1 + (1 − ν − 2ν²)ΔF2")
			term := fMul(fS(bs), fS(is))
			if r.n != 1 {
				term = fMul(fN(float64(r.n)), term)
			}
			if sum == nil {
				sum = term
			} else {
				sum = fAdd(sum, term)
			}
			sumIn = append(sumIn, val(bs, r.b, "m"), val(is, iv, ""))
			total += float64(r.n) * r.b * iv
		}
		si := k.qn / E * total
		ksym := "E_u"
		if kind == "E'" {
			ksym = "E'"
		}
		sumIn[1].Symbol = ksym
		k.add(cs, ix("s_i,", i), fMul(fDiv(fS("q_net"), fS(ksym)), sum), sumIn, si, "mm", ref, fmt.Sprintf("immediate settlement of %s (superposition of corner rectangles)", k.layerName(i)))
		for _, w := range pending {
			w()
		}
	}
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
