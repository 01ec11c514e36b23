package settle

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// calc carries one settlement calculation.
type calc struct {
	c    *config
	g    site.Ground
	f    site.Footing
	r    *Result
	full bool // write the working to r.Trace
	t    *trace.Trace
	infl func(zb float64) float64 // Δσ/q_net at depth zb below the base
	so   stress.Options
	qn   float64
	sv   float64 // σ_v0 at the base
	u    float64 // u_0 at the base
	se   float64 // σ′_v0 at the base

	imm map[int]string // how each layer's immediate settlement was found ("E_u", "E'")
	con map[int]string // how each layer's consolidation was found ("m_v", "C_c")

	prof *sprofile

	creep   func(t float64) float64 // sand creep at time t (Schmertmann C_2, Burland & Burbidge f_t)
	sandSec float64                 // sand creep at the design life

	lifeShown bool // the design life has been recorded as a step
	gwShown   bool // γ_w has been recorded as a step
}

// sigmaV is the total vertical stress at z from a piecewise-linear profile
// built once (the same sum as site.Ground.SigmaV, without looping over
// every layer for every sublayer).
func (k *calc) sigmaV(z float64) float64 {
	if k.prof == nil {
		g := k.g
		w := math.Inf(1)
		if g.Water.Set {
			w = g.Water.V
		}
		var zs, ss, gs []float64
		s := g.Gw() * g.Flood() // free water above ground level
		for i, l := range g.Layers {
			top, bot := l.Top, g.Bottom(i)
			if w > top && w < bot {
				zs, ss, gs = append(zs, top), append(ss, s), append(gs, l.Gamma)
				s += l.Gamma * (w - top)
				zs, ss, gs = append(zs, w), append(ss, s), append(gs, l.GammaSatOr())
				s += l.GammaSatOr() * (bot - w)
				continue
			}
			gm := l.Gamma
			if top >= w {
				gm = l.GammaSatOr()
			}
			zs, ss, gs = append(zs, top), append(ss, s), append(gs, gm)
			s += gm * (bot - top)
		}
		k.prof = &sprofile{z: zs, s: ss, g: gs}
	}
	p := k.prof
	i := len(p.z) - 1
	for i > 0 && p.z[i] > z {
		i--
	}
	return p.s[i] + p.g[i]*(z-p.z[i])
}

type sprofile struct{ z, s, g []float64 }

func (k *calc) creepAt(t float64) float64 {
	if k.creep == nil {
		return 0
	}
	return k.creep(t)
}

var (
	fS   = trace.S
	fN   = trace.N
	fAdd = trace.Add
	fSub = trace.Sub
	fMul = trace.Mul
	fDiv = trace.Div
	fPow = trace.Pow
	fFn  = trace.Fn
)

func val(sym string, v float64, unit string) trace.Value {
	return trace.Value{Symbol: sym, V: v, Unit: unit}
}

// add appends a step when the working is being written and returns v.
func (k *calc) add(cs, sym string, f trace.Expr, in []trace.Value, v float64, unit string, ref trace.Ref, note string) float64 {
	if k.full {
		k.t.Add(trace.Step{Symbol: sym, Formula: f, Inputs: in, Value: v, Unit: unit, Ref: ref, Note: note, Case: cs})
	}
	return v
}

// life returns the design working life for secondary compression and
// creep, recording it as a step the first time it is used: given (life),
// or assumed, default 50 years (EN 1990:2002 Table 2.1, category 4).
func (k *calc) life(cs string) float64 {
	if k.lifeShown {
		return k.c.life
	}
	k.lifeShown = true
	note := "design working life for creep and secondary compression, given"
	ref := trace.Ref{}
	if !k.c.Life.Set {
		note = "design working life for creep and secondary compression: assumed, default (category 4, building structures); give life to change it"
		ref = trace.Ref{Source: trace.EN1990, Clause: "Table 2.1, category 4"}
	}
	return k.add(cs, "t_life", nil, nil, k.c.life, "yr", ref, note)
}

// warn records a caution raised by the latest step.
func (k *calc) warn(cs, code string, sev trace.Severity, ref trace.Ref, msg string, vals ...trace.Value) {
	if !k.full {
		return
	}
	k.t.Warn(trace.Caution{Code: code, Severity: sev, Message: msg, Values: vals, Ref: ref, Case: cs})
}

// unverified records that a layer lacks the data its method needs, so the
// check cannot pass (Result.Unverified), whether or not the trace is kept.
func (k *calc) unverified(reason string) {
	for _, r := range k.r.Unverified {
		if r == reason {
			return
		}
	}
	k.r.Unverified = append(k.r.Unverified, reason)
}

func (k *calc) layerName(i int) string {
	if n := k.g.Layers[i].Name; n != "" {
		return n
	}
	return fmt.Sprintf("layer %d", i+1)
}

// Formulas shared by every calculation (an Expr is immutable).
var (
	fxU0     = fMul(fS("gamma_w"), fSub(fS("z"), fS("z_w")))
	fxSigEff = fSub(fS("sigma_v0"), fS("u_0"))
	fxZmid   = fAdd(fS("z_t"), fDiv(fS("h"), fN(2)))
	fxZb     = fSub(fS("z"), fS("D"))
	fxSigF   = fAdd(fS("sigma'_v0"), fS("Delta_sigma"))
	fxDry    [64]trace.Expr
	fxWet    [64]trace.Expr
	symGamma [64]string
	symH     [64]string
	symGsat  [64]string
	symHw    [64]string
)

func init() {
	for i := range fxDry {
		d := strconv.Itoa(i + 1)
		symGamma[i], symH[i] = "gamma_"+d, "h_"+d
		symGsat[i], symHw[i] = "gamma_sat,"+d, "h_w,"+d
		fxDry[i] = fMul(fS(symGamma[i]), fS(symH[i]))
		fxWet[i] = fMul(fS(symGsat[i]), fS(symHw[i]))
	}
}

// layerSyms returns the overburden symbols of layer i (0-based).
func layerSyms(i int) (dry, wet trace.Expr, g, h, gs, hw string) {
	if i < len(fxDry) {
		return fxDry[i], fxWet[i], symGamma[i], symH[i], symGsat[i], symHw[i]
	}
	d := strconv.Itoa(i + 1)
	g, h, gs, hw = "gamma_"+d, "h_"+d, "gamma_sat,"+d, "h_w,"+d
	return fMul(fS(g), fS(h)), fMul(fS(gs), fS(hw)), g, h, gs, hw
}

// ix returns prefix followed by the 1-based number of layer i.
func ix(prefix string, i int) string { return prefix + strconv.Itoa(i+1) }

// overburden appends σ_v0 = Σ γ h, u_0 and σ′_v0 at depth z (below ground)
// and returns σ_v0, u_0 and σ′_v0 (Pa). The table uses the same values.
func (k *calc) overburden(cs string, z float64) (sv, u, se float64) {
	g := k.g
	var terms []trace.Expr
	var in []trace.Value
	if h0 := g.Flood(); h0 > 0 {
		terms = append(terms, fMul(fS("gamma_w"), fS("h_w0")))
		in = append(in, val("gamma_w", g.Gw(), "kN/m3"), val("h_w0", h0, "m"))
		sv += g.Gw() * h0
	}
	for _, st := range g.Strata(z) {
		fd, fw, gsym, hsym, gssym, hwsym := layerSyms(st.Layer)
		if st.Wet {
			terms = append(terms, fw)
			in = append(in, val(gssym, st.Gamma, "kN/m3"), val(hwsym, st.H(), "m"))
		} else {
			terms = append(terms, fd)
			in = append(in, val(gsym, st.Gamma, "kN/m3"), val(hsym, st.H(), "m"))
		}
		sv += st.Gamma * st.H()
	}
	if k.full {
		if len(terms) == 0 {
			k.add(cs, "sigma_v0", nil, nil, 0, "kPa", trace.Ref{}, "at ground level")
		} else {
			note := "total vertical stress from the ground model (h_w: thickness below the water table)"
			if g.Flood() > 0 {
				note = "total vertical stress from the ground model (h_w0: free water above ground level; h_w: thickness below the water table)"
			}
			k.add(cs, "sigma_v0", fAdd(terms[0], terms[1:]...), in, sv, "kPa", trace.Ref{}, note)
		}
	}
	u = g.PoreP(z)
	if u > 0 && !k.gwShown {
		k.gwShown = true
		note := "unit weight of water, given"
		if g.GammaW == 0 {
			note = "unit weight of water: assumed, default (common practice); give gamma_w in the ground block to change it"
		}
		k.add(cs, "gamma_w", nil, nil, g.Gw(), "kN/m3", trace.Ref{}, note)
	}
	if u > 0 {
		k.add(cs, "u_0", fxU0, []trace.Value{val("gamma_w", g.Gw(), "kN/m3"), val("z", z, "m"), val("z_w", g.Water.V, "m")}, u, "kPa", trace.Ref{}, "hydrostatic pore pressure")
	} else {
		k.add(cs, "u_0", nil, nil, 0, "kPa", trace.Ref{}, "above the water table")
	}
	se = sv - u
	k.add(cs, "sigma'_v0", fxSigEff, []trace.Value{val("sigma_v0", sv, "kPa"), val("u_0", u, "kPa")}, se, "kPa", trace.Ref{}, "vertical effective stress before loading")
	return sv, u, se
}

// load appends q, the base stresses and q_net.
func (k *calc) load() {
	c, f := k.c, k.f
	cs := "load"
	if c.V.Set {
		var fa trace.Expr
		var in []trace.Value
		switch f.Shape {
		case site.Strip:
			fa, in = fS("B"), []trace.Value{val("B", f.B, "m")}
		case site.Circle:
			fa, in = fDiv(fMul(fS("pi"), fPow(fS("B"), fN(2))), fN(4)), []trace.Value{val("B", f.B, "m")}
		case site.Square:
			fa, in = fPow(fS("B"), fN(2)), []trace.Value{val("B", f.B, "m")}
		default:
			fa, in = fMul(fS("B"), fS("L")), []trace.Value{val("B", f.B, "m"), val("L", f.L, "m")}
		}
		unit := "m2"
		if f.Shape == site.Strip {
			unit = "m2/m"
		}
		k.add(cs, "A", fa, in, c.area, unit, trace.Ref{}, "plan area of the footing")
		k.add(cs, "q", fDiv(fS("V"), fS("A")), []trace.Value{val("V", c.V.V, "kN"), val("A", c.area, unit)}, c.q, "kPa", trace.Ref{}, "gross bearing pressure (SLS)")
	} else {
		k.add(cs, "q", nil, nil, c.q, "kPa", trace.Ref{}, "gross bearing pressure (SLS), given")
	}
	k.sv, k.u, k.se = k.overburden(cs, f.D)
	k.qn = stress.Net(c.q, k.sv)
	k.add(cs, "q_net", fSub(fS("q"), fS("sigma_v0")), []trace.Value{val("q", c.q, "kPa"), val("sigma_v0", k.sv, "kPa")}, k.qn, "kPa",
		trace.Ref{Source: Craig2012, Clause: "net foundation pressure"}, "net bearing pressure: gross less the overburden removed")
	if h0 := k.g.Flood(); h0 > 0 {
		k.warn(cs, "water-above-ground", trace.SevCaution, trace.Ref{},
			"Free water stands above ground level: σ_v0 and u_0 include its weight γ_w·h_w0, σ′_v0 does not; q_net = q − σ_v0 is right only when the SLS load includes the water on the footing.",
			val("h_w0", h0, "m"))
	}
	if f.Alpha != 0 {
		k.warn(cs, "inclined-base", trace.SevNote, trace.Ref{}, "the base inclination is ignored in the settlement calculation")
	}
}

// depth returns the bottom of the zone of influence (depth below ground)
// for the elastic and consolidation methods, writing the rule.
func (k *calc) depth() (float64, error) {
	c, f := k.c, k.f
	cs := "zone of influence"
	D := f.D
	switch c.Depth.Rule {
	case DepthFixed:
		return k.add(cs, "z_inf", nil, nil, c.Depth.Z.V, "m", trace.Ref{}, "depth of influence, given"), nil
	case DepthWidth:
		kw := c.Depth.Widths.Or(widthsDefault(f))
		z := D + kw*f.B
		k.add(cs, "z_inf", fAdd(fS("D"), fMul(fS("k"), fS("B"))), []trace.Value{val("D", D, "m"), val("k", kw, ""), val("B", f.B, "m")}, z, "m",
			trace.Ref{Source: Schmertmann1978, Clause: "depth of the strain influence diagram (2B to 4B)"}, "depth of influence: k·B below the base")
		return z, nil
	}
	ratio := c.Depth.Ratio.Or(DefaultRatio)
	gfun := func(zb float64) (float64, error) {
		return k.qn*k.infl(zb) - ratio*(k.sigmaV(D+zb)-k.g.PoreP(D+zb)), nil
	}
	capZ := math.Min(50*f.B, 300)
	step := f.B / 4
	lo := 1e-9 * f.B
	var root float64
	found := false
	prev := lo
	if v, _ := gfun(lo); v <= 0 {
		// the net pressure is already below the ratio at the base (a light
		// load, or none net of the overburden): the zone ends there, and the
		// minimum of B below the base applies
		root, found = lo, true
	}
	for zb := step; !found && zb <= capZ+step/2; zb += step {
		v, _ := gfun(zb)
		if v <= 0 {
			rt, err := solve.Brent(gfun, prev, zb, solve.Options{Tol: 1e-9 * f.B})
			if err != nil {
				return 0, err
			}
			root, found = rt.X, true
			break
		}
		prev = zb
	}
	if !found {
		root = capZ
	}
	z := D + root
	minZ := D + f.B
	if k.full {
		ds := k.qn * k.infl(root)
		se := k.g.SigmaVEff(z)
		k.add(cs, "Delta_sigma", nil, nil, ds, "kPa", trace.Ref{}, "stress increase at the trial depth")
		k.add(cs, "sigma'_v0", nil, nil, se, "kPa", trace.Ref{}, "effective overburden at the trial depth")
		k.add(cs, "eta", fDiv(fS("Delta_sigma"), fS("sigma'_v0")), []trace.Value{val("Delta_sigma", ds, "kPa"), val("sigma'_v0", se, "kPa")}, ds/se, "",
			trace.Ref{Source: Brent1973, Clause: "ch. 4, zero"}, fmt.Sprintf("solved for Δσ = %g σ′_v0 (common practice)", ratio))
	}
	switch {
	case !found:
		k.add(cs, "z_inf", nil, nil, z, "m", trace.Ref{}, "depth of influence: search limit reached")
		k.warn(cs, "depth-cap", trace.SevCaution, trace.Ref{}, fmt.Sprintf("Δσ did not fall to %g σ′_v0 within %g m below the base; the zone is cut there", ratio, capZ))
	case z < minZ:
		k.add(cs, "z_inf", fAdd(fS("D"), fS("B")), []trace.Value{val("D", D, "m"), val("B", f.B, "m")}, minZ, "m", trace.Ref{}, "depth of influence: not less than one width below the base (common practice)")
		z = minZ
	default:
		if k.full {
			k.add(cs, "z_inf", nil, nil, z, "m", trace.Ref{}, fmt.Sprintf("depth of influence: where Δσ = %g σ′_v0", ratio))
		}
	}
	return z, nil
}

// widthsDefault is 2 for L/B = 1 rising linearly to 4 at L/B = 10.
func widthsDefault(f site.Footing) float64 {
	return 2 + 2*(lb(f)-1)/9
}

// lb returns L/B capped to [1, 10] (a strip is 10).
func lb(f site.Footing) float64 {
	switch f.Shape {
	case site.Strip:
		return 10
	case site.Rectangle:
		return math.Min(10, math.Max(1, f.L/f.B))
	}
	return 1
}

// sublayers divides [top, bot] into c.n sublayers, split at the layer
// boundaries, the count in each layer in proportion to its thickness
// (largest remainder, at least one each), and fills the stress columns.
func (k *calc) sublayers(top, bot float64) error {
	note := "number of sublayers over the zone, given"
	if k.c.Sublayers == 0 {
		note = "number of sublayers over the zone: assumed, default; give sublayers to change it"
	}
	k.add("zone of influence", "n_sub", nil, nil, float64(k.c.n), "", trace.Ref{}, note)
	type seg struct {
		layer    int
		top, bot float64
		n        int
		rem      float64
	}
	var segs []seg
	for i := range k.g.Layers {
		a := math.Max(top, k.g.Layers[i].Top)
		b := math.Min(bot, k.g.Bottom(i))
		if b > a+1e-12 {
			segs = append(segs, seg{layer: i, top: a, bot: b})
		}
	}
	n := k.c.n
	if n < len(segs) {
		n = len(segs)
	}
	total := bot - top
	used := 0
	for i := range segs {
		x := float64(n) * (segs[i].bot - segs[i].top) / total
		segs[i].n = int(math.Floor(x))
		if segs[i].n < 1 {
			segs[i].n = 1
		}
		segs[i].rem = x - math.Floor(x)
		used += segs[i].n
	}
	for used < n {
		best := -1
		for i := range segs {
			if best < 0 || segs[i].rem > segs[best].rem {
				best = i
			}
		}
		segs[best].n++
		segs[best].rem = -1
		used++
	}
	for used > n { // minimum-one rule overshoot: take from the thickest
		best := -1
		for i := range segs {
			if segs[i].n > 1 && (best < 0 || segs[i].n > segs[best].n) {
				best = i
			}
		}
		if best < 0 {
			break
		}
		segs[best].n--
		used--
	}
	sub := make([]Sublayer, 0, used)
	D := k.f.D
	for _, s := range segs {
		h := (s.bot - s.top) / float64(s.n)
		name := k.layerName(s.layer)
		for j := 0; j < s.n; j++ {
			a := s.top + float64(j)*h
			b := a + h
			if j == s.n-1 {
				b = s.bot
			}
			z := (a + b) / 2
			sv := k.sigmaV(z)
			u := k.g.PoreP(z)
			if sv-u <= 0 {
				return &site.InputError{Where: fmt.Sprintf("layer %q", name), Param: "gamma_sat", Msg: fmt.Sprintf("the vertical effective stress at %.3g m is not positive: the saturated unit weight must exceed that of water", z)}
			}
			ds := k.qn * k.infl(z-D)
			sub = append(sub, Sublayer{Layer: s.layer, Name: name, Top: a, Bot: b, Z: z, H: b - a,
				SigmaV0: sv, U0: u, SigmaV0Eff: sv - u, DSigma: ds, SigmaF: sv - u + ds})
		}
	}
	k.r.Sub = sub
	k.r.ZInf = bot
	return nil
}

// explainSub writes the stresses of sublayer j in full and returns the
// values the step formulas use (σ′_v0, Δσ, σ′_f).
func (k *calc) explainSub(cs string, j int) (se, ds, sf float64) {
	s := k.r.Sub[j]
	k.add(cs, "z", fxZmid, []trace.Value{val("z_t", s.Top, "m"), val("h", s.H, "m")}, s.Z, "m", trace.Ref{}, "mid-depth of sublayer "+strconv.Itoa(j+1)+" (midpoint rule)")
	_, _, se = k.overburden(cs, s.Z)
	zb := s.Z - k.f.D
	k.add(cs, "z_b", fxZb, []trace.Value{val("z", s.Z, "m"), val("D", k.f.D, "m")}, zb, "m", trace.Ref{}, "depth below the underside of the footing")
	ds = s.DSigma
	if k.full {
		ds, _ = stress.Explain(k.t, k.f, k.so, zb, k.qn, cs)
	}
	sf = k.add(cs, "sigma'_f", fxSigF, []trace.Value{val("sigma'_v0", se, "kPa"), val("Delta_sigma", ds, "kPa")}, se+ds, "kPa", trace.Ref{}, "final vertical effective stress")
	return se, ds, sf
}
