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

// Engine functions of the time working, printed by name and evaluated by
// their own code: the inverse of U found by Brent's method, and
// Terzaghi's series. A value outside their domain gives NaN, which the
// recorder refuses.
var (
	fnTv = func(a []float64) float64 {
		if !(a[0] >= 0 && a[0] < 1) {
			return math.NaN()
		}
		return timeFactor(a[0])
	}
	fnU = func(a []float64) float64 {
		if !(a[0] >= 0) || math.IsInf(a[0], 0) {
			return math.NaN()
		}
		return degree(a[0])
	}
	fxTvU    = trace.Named("T_v", fnTv, trace.S("U"))
	fxHThick = trace.Sub(trace.S("z_bot"), trace.S("z_top"))
	fxHInf   = trace.Sub(trace.S("z_inf"), trace.S("z_top"))
)

// tsym holds the symbols and formulas of layer i's time working (i
// numbered from 1 in the symbols).
type tsym struct {
	h, hdr, cv, t50, t90, tp, hc, ep, sc, ssec, tv, u string
	hdr1, hdr2, t50x, t90x, tpx, epx, ssecx, tvx, ux  trace.Expr
}

var tsyms [64]*tsym

func init() {
	for i := range tsyms {
		tsyms[i] = newTsym(i)
	}
}

func layerTime(i int) *tsym {
	if i < len(tsyms) {
		return tsyms[i]
	}
	return newTsym(i)
}

func newTsym(i int) *tsym {
	s := &tsym{h: ix("H_", i), hdr: ix("H_dr,", i), cv: ix("c_v,", i), t50: ix("t_50,", i), t90: ix("t_90,", i), tp: ix("t_p,", i),
		hc: ix("H_c,", i), ep: ix("e_p,", i), sc: ix("s_c,", i), ssec: ix("s_sec,", i), tv: ix("T_v,", i), u: ix("U_", i)}
	S := trace.S
	s.hdr1 = S(s.h)
	s.hdr2 = trace.Div(S(s.h), trace.N(2))
	tOf := func(T string) trace.Expr { return trace.Div(trace.Mul(S(T), trace.Pow(S(s.hdr), trace.N(2))), S(s.cv)) }
	s.t50x, s.t90x, s.tpx = tOf("T_50"), tOf("T_90"), tOf("T_95")
	s.epx = trace.Sub(S("e_0"), trace.Mul(trace.Add(trace.N(1), S("e_0")), trace.Div(S(s.sc), S(s.hc))))
	s.ssecx = trace.Mul(trace.Div(trace.Mul(S("C_alpha"), S(s.hc)), trace.Add(trace.N(1), S(s.ep))), trace.Fn("log10", trace.Div(S("t_life"), S(s.tp))))
	s.tvx = trace.Div(trace.Mul(S(s.cv), S("t")), trace.Pow(S(s.hdr), trace.N(2)))
	s.ux = trace.Named("U", fnU, S(s.tv))
	return s
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
		cs := ""
		if k.full {
			cs = name + ": time"
		}
		if !l.Cv.Set {
			if len(k.c.Times) > 0 {
				k.unverified(fmt.Sprintf("%s has no c_v for the time curve asked for", name))
			}
			k.warn(cs, "no-cv", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no c_v given: its consolidation settlement is shown as complete at every time, and it has no t_50 or t_90", name))
			continue
		}
		ts := layerTime(i)
		top := math.Max(l.Top, k.f.D)
		bot := g.Bottom(i)
		unbounded := math.IsInf(bot, 1)
		if unbounded {
			bot = math.Max(r.ZInf, top+1e-6)
		}
		var H float64
		if unbounded {
			H = k.eval(cs, ts.h, fxHInf, []trace.Value{val("z_inf", bot, "m"), val("z_top", top, "m")}, "m", trace.Ref{}, "drainage thickness: the layer has no base in the ground model, taken to the bottom of the zone")
			k.warn(cs, "unbounded-layer", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no base given, so its drainage thickness is taken to the bottom of the zone of influence; give the layer below to fix the drainage path", name))
		} else {
			H = k.eval(cs, ts.h, fxHThick, []trace.Value{val("z_bot", bot, "m"), val("z_top", top, "m")}, "m", trace.Ref{}, "thickness of the consolidating layer below the base")
		}
		topDrains := i == 0 || !g.Layers[i-1].Fine()
		botDrains := !unbounded && i+1 < len(g.Layers) && !g.Layers[i+1].Fine()
		two := topDrains && botDrains
		switch k.c.Drainage {
		case DrainOneWay:
			two = false
		case DrainTwoWay:
			two = true
		}
		lr.Drainage = "one-way"
		hx := ts.hdr1
		if two {
			lr.Drainage = "two-way"
			hx = ts.hdr2
		}
		how := ""
		if k.full {
			how = "one-way drainage: H_dr = H"
			if two {
				how = "two-way drainage: H_dr = H/2"
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
		}
		hdr := k.eval(cs, ts.hdr, hx, []trace.Value{val(ts.h, H, "m")}, "m", refU, how)
		if k.c.Drainage == DrainAuto && !topDrains && !botDrains {
			k.warn(cs, "no-drain", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no free-draining boundary identified: one-way drainage over its thickness assumed", name))
		}
		lr.H, lr.Hdr, lr.Cv = H, hdr, l.Cv.V
		for _, p := range [...]struct {
			u      float64
			T, sym string
			fx     trace.Expr
			dst    *site.Opt
		}{{0.5, "T_50", ts.t50, ts.t50x, &lr.T50}, {0.9, "T_90", ts.t90, ts.t90x, &lr.T90}} {
			T := k.eval(cs, p.T, fxTvU, []trace.Value{val("U", p.u, "")}, "", refU, "time factor, inverse of U(T_v) by Brent's method")
			t := k.eval(cs, p.sym, p.fx, []trace.Value{val(p.T, T, ""), val(ts.hdr, hdr, "m"), val(ts.cv, l.Cv.V, "m2/yr")}, "yr", refU, "")
			*p.dst = site.Some(t)
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
	for _, p := range [...]struct {
		u   float64
		sym string
		dst *site.Opt
	}{{0.5, "t_50", &r.T50}, {0.9, "t_90", &r.T90}} {
		if len(tl) == 1 {
			lr := r.Layers[tl[0].li]
			ts := layerTime(lr.Layer)
			src, v := ts.t50, lr.T50.V
			if p.u == 0.9 {
				src, v = ts.t90, lr.T90.V
			}
			*p.dst = site.Some(k.eval(cs, p.sym, trace.S(src), []trace.Value{val(src, v, "yr")}, "yr", refU, "the only consolidating layer with c_v"))
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
		k.take(cs, p.sym, trace.Solved, root.X, "yr", trace.Ref{Source: Brent1973, Clause: "ch. 4, zero"},
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
		ts := layerTime(i)
		var tp float64
		switch {
		case k.c.Tp.Set:
			tp = k.take(cs, ts.tp, trace.Given, k.c.Tp.V, "yr", trace.Ref{}, "end of primary consolidation, given")
		case lr.Cv > 0:
			T := k.eval(cs, "T_95", fxTvU, []trace.Value{val("U", 0.95, "")}, "", refU, "")
			tp = k.eval(cs, ts.tp, ts.tpx, []trace.Value{val("T_95", T, ""), val(ts.hdr, lr.Hdr, "m"), val(ts.cv, lr.Cv, "m2/yr")}, "yr", refU, "end of primary consolidation taken at U = 95 % (common practice)")
		default:
			k.warn(cs, "secondary-no-tp", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: no c_v and no t_p given: secondary compression not computed", name))
			continue
		}
		lr.Tp = site.Some(tp)
		hc := k.eval(cs, ts.hc, fxHThick, []trace.Value{val("z_bot", lr.Bot, "m"), val("z_top", lr.Top, "m")}, "m", trace.Ref{}, "compressing thickness within the zone of influence")
		ep := k.eval(cs, ts.ep, ts.epx, []trace.Value{val("e_0", l.E0.V, ""), val(ts.sc, lr.Sc, "mm"), val(ts.hc, hc, "m")}, "", refCc, "void ratio at the end of primary consolidation (average strain of the layer)")
		lr.Ep = site.Some(ep)
		k.life(cs)
		if life <= tp {
			k.take(cs, ts.ssec, trace.Given, 0, "mm", trace.Ref{}, "the design life ends before primary consolidation")
			continue
		}
		lr.Ssec = k.eval(cs, ts.ssec, ts.ssecx, k.secIn(lr, l, life), "mm", trace.Ref{Source: TPM1996, Clause: "secondary compression, C_α/(1 + e_p) per log cycle of time"}, "secondary compression at the design life t_life")
	}
}

// secIn returns the inputs of layer lr's secondary compression at time t.
func (k *calc) secIn(lr *LayerResult, l site.Layer, t float64) []trace.Value {
	ts := layerTime(lr.Layer)
	return []trace.Value{val("C_alpha", l.Calpha.V, ""), val(ts.hc, lr.Bot-lr.Top, "m"), val(ts.ep, lr.Ep.V, ""), val("t_life", t, "yr"), val(ts.tp, lr.Tp.V, "yr")}
}

// secAt is the secondary compression of all layers at time t, each by the
// formula of its working with t for t_life.
func (k *calc) secAt(t float64) float64 {
	var s float64
	for i := range k.r.Layers {
		lr := &k.r.Layers[i]
		if lr.Ssec > 0 && lr.Tp.Set && t > lr.Tp.V {
			v, _ := trace.Eval(layerTime(lr.Layer).ssecx, k.secIn(lr, k.g.Layers[lr.Layer], t))
			s += v
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
		var fx trace.Expr = trace.S("s_i")
		timedSet := map[int]bool{}
		for _, x := range tl {
			lr := r.Layers[x.li]
			timedSet[x.li] = true
			ts := layerTime(lr.Layer)
			T := k.eval(cs, ts.tv, ts.tvx, []trace.Value{val(ts.cv, x.cv, "m2/yr"), val("t", t, "yr"), val(ts.hdr, x.hdr, "m")}, "", refU, "")
			u := k.eval(cs, ts.u, ts.ux, []trace.Value{val(ts.tv, T, "")}, "", refU, "Terzaghi's series, converged")
			sc += u * lr.Sc
			fx = trace.Add(fx, trace.Mul(trace.S(ts.u), trace.S(ts.sc)))
			in = append(in, val(ts.u, u, ""), val(ts.sc, lr.Sc, "mm"))
		}
		for li, lr := range r.Layers {
			if lr.Sc > 0 && !timedSet[li] {
				sc += lr.Sc
				fx = trace.Add(fx, trace.S(layerTime(lr.Layer).sc))
				in = append(in, val(layerTime(lr.Layer).sc, lr.Sc, "mm"))
			}
		}
		sec := k.secAt(t) + k.creepAt(t)
		if sec > 0 {
			sec = k.take(cs, "s_sec,t", trace.Summed, sec, "mm", trace.Ref{}, "secondary compression and creep at t (formulas as at the design life)")
			fx = trace.Add(fx, trace.S("s_sec,t"))
			in = append(in, val("s_sec,t", sec, "mm"))
		}
		s := k.eval(cs, "s_t", fx, in, "mm", trace.Ref{}, "settlement at time t")
		u := 1.0
		if r.Sc > 0 {
			u = sc / r.Sc
		}
		r.Curve = append(r.Curve, CurvePoint{T: t, U: u, S: s, Si: r.Si, Sc: sc, Ssec: sec})
	}
}
