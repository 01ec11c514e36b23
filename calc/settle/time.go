package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
)

var refU = trace.Ref{Source: Terzaghi1943, Clause: "one-dimensional consolidation, uniform initial excess pore pressure"}

// U returns Terzaghi's average degree of consolidation for the time factor
// T_v ≥ 0 with a uniform initial excess pore pressure (Terzaghi 1943):
//
//	U = 1 − Σ_{m≥0} (2/M²) exp(−M² T_v),  M = π(2m + 1)/2,
//
// summed until the terms fall below 1e-17. For T_v < 0.25 the equivalent
// image (error-function) series U = 2√T_v [1/√π + 2 Σ_{n≥1} (−1)ⁿ
// ierfc(n/√T_v)] is summed instead, which converges in a few terms where
// the Fourier series needs thousands; the two agree to 1e-15.
func U(Tv float64) (float64, error) {
	if !(Tv >= 0) || math.IsInf(Tv, 0) {
		return 0, &site.RangeError{Param: "T_v", Value: Tv, Min: 0, Max: math.Inf(1)}
	}
	return degree(Tv), nil
}

func ierfc(x float64) float64 { return math.Exp(-x*x)/math.SqrtPi - x*math.Erfc(x) }

func degree(T float64) float64 {
	switch {
	case T <= 0:
		return 0
	case T < 0.25:
		sq := math.Sqrt(T)
		s := 1 / math.SqrtPi
		sign := -1.0
		for n := 1; n < 100; n++ {
			t := 2 * sign * ierfc(float64(n)/sq)
			s += t
			if math.Abs(t) < 1e-17 {
				break
			}
			sign = -sign
		}
		return 2 * sq * s
	}
	var s float64
	for m := 0; m < 1000; m++ {
		M := math.Pi * (2*float64(m) + 1) / 2
		t := 2 / (M * M) * math.Exp(-M*M*T)
		s += t
		if t < 1e-17 {
			break
		}
	}
	return 1 - s
}

// Tv returns the time factor at which the average degree of consolidation
// is U, 0 ≤ U < 1: the inverse of U, found by Brent's method (Brent 1973,
// ch. 4) to 1e-14 (U = 0.5 → 0.1967, U = 0.9 → 0.8481).
func Tv(U float64) (float64, error) {
	if !(U >= 0) || !(U < 1) {
		return 0, &site.RangeError{Param: "U", Value: U, Min: 0, Max: 1, Reason: "U = 1 is reached only after infinite time"}
	}
	return timeFactor(U), nil
}

// Time factors used on every calculation, found once.
var tv50, tv90, tv95 = solveTv(0.5), solveTv(0.9), solveTv(0.95)

func timeFactor(u float64) float64 {
	switch u {
	case 0.5:
		return tv50
	case 0.9:
		return tv90
	case 0.95:
		return tv95
	}
	return solveTv(u)
}

func solveTv(u float64) float64 {
	if u == 0 {
		return 0
	}
	// U(T) is increasing; U(40) = 1 − 8/π² e^(−π²·10) rounds to 1.
	hi := -4 / (math.Pi * math.Pi) * math.Log((1-u)*math.Pi*math.Pi/8)
	hi = math.Max(hi, math.Pi*u*u/4) * 1.5
	if hi > 40 || hi <= 0 {
		hi = 40
	}
	r, err := solve.Brent(func(t float64) (float64, error) { return degree(t) - u, nil }, 0, hi, solve.Options{Tol: 1e-15})
	if err != nil {
		return hi
	}
	return r.X
}

// timed is a consolidating layer with a time scale.
type timed struct {
	li  int // index in r.Layers
	cv  float64
	hdr float64
	sc  float64
}

// timing computes the drainage paths, t_50 and t_90 per layer and for the
// whole, secondary compression and the settlement–time curve.
func (k *calc) timing() {
	r := k.r
	g := k.g
	var tl []timed
	for li := range r.Layers {
		lr := &r.Layers[li]
		if lr.Sc <= 0 {
			continue
		}
		i := lr.Layer
		l := g.Layers[i]
		name := lr.Name
		cs := name + ": time"
		if !l.Cv.Set {
			if len(k.c.Times) > 0 {
				k.unverified(fmt.Sprintf("%s has no c_v for the time curve asked for", name))
			}
			k.warn(cs, "no-cv", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no c_v given: its consolidation settlement is shown as complete at every time, and it has no t_50 or t_90", name))
			continue
		}
		top := math.Max(l.Top, k.f.D)
		bot := g.Bottom(i)
		unbounded := math.IsInf(bot, 1)
		if unbounded {
			bot = math.Max(r.ZInf, top+1e-6)
		}
		H := bot - top
		topDrains := i == 0 || !g.Layers[i-1].Fine()
		botDrains := !unbounded && i+1 < len(g.Layers) && !g.Layers[i+1].Fine()
		two := topDrains && botDrains
		switch k.c.Drainage {
		case DrainOneWay:
			two = false
		case DrainTwoWay:
			two = true
		}
		hdr := H
		lr.Drainage = "one-way"
		if two {
			hdr = H / 2
			lr.Drainage = "two-way"
		}
		lr.H, lr.Hdr, lr.Cv = H, hdr, l.Cv.V
		if k.full {
			if unbounded {
				k.add(cs, ix("H_", i), fSub(fS("z_inf"), fS("z_top")), []trace.Value{val("z_inf", bot, "m"), val("z_top", top, "m")}, H, "m", trace.Ref{}, "drainage thickness: the layer has no base in the ground model, taken to the bottom of the zone")
				k.warn(cs, "unbounded-layer", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no base given, so its drainage thickness is taken to the bottom of the zone of influence; give the layer below to fix the drainage path", name))
			} else {
				k.add(cs, ix("H_", i), fSub(fS("z_bot"), fS("z_top")), []trace.Value{val("z_bot", bot, "m"), val("z_top", top, "m")}, H, "m", trace.Ref{}, "thickness of the consolidating layer below the base")
			}
			how := "one-way drainage: H_dr = H"
			var hx trace.Expr = fS(ix("H_", i))
			if two {
				how = "two-way drainage: H_dr = H/2"
				hx = fDiv(hx, fN(2))
			}
			switch {
			case k.c.Drainage != DrainAuto:
				how += " (as given)"
			case two:
				how += " (free-draining layers above and below)"
			case topDrains:
				how += " (drains upward only)"
			case botDrains:
				how += " (drains downward only)"
			default:
				how += " (no free-draining boundary found)"
			}
			k.add(cs, ix("H_dr,", i), hx, []trace.Value{val(ix("H_", i), H, "m")}, hdr, "m", refU, how)
			if k.c.Drainage == DrainAuto && !topDrains && !botDrains {
				k.warn(cs, "no-drain", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no free-draining boundary identified: one-way drainage over its thickness assumed", name))
			}
		}
		for _, p := range []struct {
			u   float64
			sym string
			dst *site.Opt
		}{{0.5, "50", &lr.T50}, {0.9, "90", &lr.T90}} {
			T := timeFactor(p.u)
			t := T * hdr * hdr / l.Cv.V
			*p.dst = site.Some(t)
			if k.full {
				k.add(cs, "T_"+p.sym, fFn("T_v", fS("U")), []trace.Value{val("U", p.u, "")}, T, "", refU, "time factor, inverse of U(T_v) by Brent's method")
				k.add(cs, ix("t_"+p.sym+",", i), fDiv(fMul(fS("T_"+p.sym), fPow(fS(ix("H_dr,", i)), fN(2))), fS(ix("c_v,", i))),
					[]trace.Value{val("T_"+p.sym, T, ""), val(ix("H_dr,", i), hdr, "m"), val(ix("c_v,", i), l.Cv.V, "m2/yr")}, t, "yr", refU, "")
			}
		}
		tl = append(tl, timed{li: li, cv: l.Cv.V, hdr: hdr, sc: lr.Sc})
	}
	k.composite(tl)
	k.secondary()
	k.curve(tl)
}

// composite finds t_50 and t_90 of the consolidation settlement of all
// timed layers together.
func (k *calc) composite(tl []timed) {
	if len(tl) == 0 {
		return
	}
	r := k.r
	cs := "time"
	for _, p := range []struct {
		u   float64
		sym string
		dst *site.Opt
	}{{0.5, "50", &r.T50}, {0.9, "90", &r.T90}} {
		if len(tl) == 1 {
			lr := r.Layers[tl[0].li]
			v := lr.T50.V
			if p.u == 0.9 {
				v = lr.T90.V
			}
			*p.dst = site.Some(v)
			if !k.full {
				continue
			}
			src := ix("t_"+p.sym+",", lr.Layer)
			k.add(cs, "t_"+p.sym, fS(src), []trace.Value{val(src, v, "yr")}, v, "yr", refU, "the only consolidating layer with c_v")
			continue
		}
		var total, hi float64
		for _, t := range tl {
			total += t.sc
			hi = math.Max(hi, timeFactor(p.u)*t.hdr*t.hdr/t.cv)
		}
		f := func(t float64) (float64, error) {
			var s float64
			for _, x := range tl {
				s += degree(x.cv*t/(x.hdr*x.hdr)) * x.sc
			}
			return s - p.u*total, nil
		}
		root, err := solve.Brent(f, 0, hi, solve.Options{Tol: 1e-10 * hi})
		if err != nil {
			continue
		}
		*p.dst = site.Some(root.X)
		if !k.full {
			continue
		}
		k.add(cs, "t_"+p.sym, nil, nil, root.X, "yr", trace.Ref{Source: Brent1973, Clause: "ch. 4, zero"},
			fmt.Sprintf("time at which Σ U(c_v t/H_dr²)·s_c of the consolidating layers reaches %g%% of their total (Brent's method, %d iterations, tolerance %.2g s)", p.u*100, root.Iter, root.Tol))
	}
}

// secondary computes secondary compression at the design life for layers
// with C_α, after the end of primary consolidation t_p (t_95 by default).
func (k *calc) secondary() {
	r := k.r
	life := k.c.life
	for li := range r.Layers {
		lr := &r.Layers[li]
		l := k.g.Layers[lr.Layer]
		if !l.Calpha.Set || lr.Sc <= 0 {
			continue
		}
		name := lr.Name
		cs := name + ": secondary compression"
		if !l.E0.Set {
			k.warn(cs, "secondary-no-e0", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: C_α is given without e_0: secondary compression not computed", name))
			continue
		}
		i := lr.Layer
		var tp float64
		switch {
		case k.c.Tp.Set:
			tp = k.add(cs, ix("t_p,", i), nil, nil, k.c.Tp.V, "yr", trace.Ref{}, "end of primary consolidation, given")
		case lr.Cv > 0:
			T := timeFactor(0.95)
			tp = T * lr.Hdr * lr.Hdr / lr.Cv
			if k.full {
				k.add(cs, "T_95", fFn("T_v", fS("U")), []trace.Value{val("U", 0.95, "")}, T, "", refU, "")
				k.add(cs, ix("t_p,", i), fDiv(fMul(fS("T_95"), fPow(fS(ix("H_dr,", i)), fN(2))), fS(ix("c_v,", i))),
					[]trace.Value{val("T_95", T, ""), val(ix("H_dr,", i), lr.Hdr, "m"), val(ix("c_v,", i), lr.Cv, "m2/yr")}, tp, "yr", refU, "end of primary consolidation taken at U = 95 % (common practice)")
			}
		default:
			k.warn(cs, "secondary-no-tp", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no c_v and no t_p given: secondary compression not computed", name))
			continue
		}
		lr.Tp = site.Some(tp)
		hc := lr.Bot - lr.Top
		ep := l.E0.V - (1+l.E0.V)*lr.Sc/hc
		lr.Ep = site.Some(ep)
		ssym := ix("s_c,", i)
		k.add(cs, ix("H_c,", i), fSub(fS("z_bot"), fS("z_top")), []trace.Value{val("z_bot", lr.Bot, "m"), val("z_top", lr.Top, "m")}, hc, "m", trace.Ref{}, "compressing thickness within the zone of influence")
		k.add(cs, ix("e_p,", i), fSub(fS("e_0"), fMul(fAdd(fN(1), fS("e_0")), fDiv(fS(ssym), fS(ix("H_c,", i))))),
			[]trace.Value{val("e_0", l.E0.V, ""), val(ssym, lr.Sc, "mm"), val(ix("H_c,", i), hc, "m")}, ep, "", refCc, "void ratio at the end of primary consolidation (average strain of the layer)")
		k.life(cs)
		if life <= tp {
			k.add(cs, ix("s_sec,", i), nil, nil, 0, "mm", trace.Ref{}, "the design life ends before primary consolidation")
			continue
		}
		v := l.Calpha.V * hc / (1 + ep) * math.Log10(life/tp)
		lr.Ssec = v
		k.add(cs, ix("s_sec,", i), fMul(fDiv(fMul(fS("C_alpha"), fS(ix("H_c,", i))), fAdd(fN(1), fS(ix("e_p,", i)))), fFn("log10", fDiv(fS("t_life"), fS(ix("t_p,", i))))),
			[]trace.Value{val("C_alpha", l.Calpha.V, ""), val(ix("H_c,", i), hc, "m"), val(ix("e_p,", i), ep, ""), val("t_life", life, "yr"), val(ix("t_p,", i), tp, "yr")},
			v, "mm", trace.Ref{Source: TPM1996, Clause: "secondary compression, C_α/(1 + e_p) per log cycle of time"}, "secondary compression at the design life t_life")
	}
}

// secAt is the secondary compression of all layers at time t.
func (k *calc) secAt(t float64) float64 {
	var s float64
	for _, lr := range k.r.Layers {
		if lr.Ssec > 0 && lr.Tp.Set && t > lr.Tp.V {
			l := k.g.Layers[lr.Layer]
			s += l.Calpha.V * (lr.Bot - lr.Top) / (1 + lr.Ep.V) * math.Log10(t/lr.Tp.V)
		}
	}
	return s
}

// curve fills the settlement–time points for the times asked for.
func (k *calc) curve(tl []timed) {
	r := k.r
	for _, t := range k.c.Times {
		cs := ""
		if k.full {
			cs = fmt.Sprintf("t = %.4g yr", t/Year)
		}
		var sc float64
		in := []trace.Value{val("s_i", r.Si, "mm")}
		var fx trace.Expr = fS("s_i")
		timedSet := map[int]bool{}
		for _, x := range tl {
			lr := r.Layers[x.li]
			timedSet[x.li] = true
			i := lr.Layer
			T := x.cv * t / (x.hdr * x.hdr)
			u := degree(T)
			sc += u * lr.Sc
			if k.full {
				k.add(cs, ix("T_v,", i), fDiv(fMul(fS(ix("c_v,", i)), fS("t")), fPow(fS(ix("H_dr,", i)), fN(2))),
					[]trace.Value{val(ix("c_v,", i), x.cv, "m2/yr"), val("t", t, "yr"), val(ix("H_dr,", i), x.hdr, "m")}, T, "", refU, "")
				k.add(cs, ix("U_", i), fFn("U", fS(ix("T_v,", i))), []trace.Value{val(ix("T_v,", i), T, "")}, u, "", refU, "Terzaghi's series, converged")
				fx = fAdd(fx, fMul(fS(ix("U_", i)), fS(ix("s_c,", i))))
				in = append(in, val(ix("U_", i), u, ""), val(ix("s_c,", i), lr.Sc, "mm"))
			}
		}
		for li, lr := range r.Layers {
			if lr.Sc > 0 && !timedSet[li] {
				sc += lr.Sc
				if k.full {
					fx = fAdd(fx, fS(ix("s_c,", lr.Layer)))
					in = append(in, val(ix("s_c,", lr.Layer), lr.Sc, "mm"))
				}
			}
		}
		sec := k.secAt(t) + k.creepAt(t)
		if sec > 0 && k.full {
			k.add(cs, "s_sec,t", nil, nil, sec, "mm", trace.Ref{}, "secondary compression and creep at t (formulas as at the design life)")
			fx = fAdd(fx, fS("s_sec,t"))
			in = append(in, val("s_sec,t", sec, "mm"))
		}
		s := r.Si + sc + sec
		k.add(cs, "s_t", fx, in, s, "mm", trace.Ref{}, "settlement at time t")
		u := 1.0
		if r.Sc > 0 {
			u = sc / r.Sc
		}
		r.Curve = append(r.Curve, CurvePoint{T: t, U: u, S: s, Si: r.Si, Sc: sc, Ssec: sec})
	}
}
