package settle

import (
	"fmt"
	"math"
	"slices"
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

func val(sym string, v float64, unit string) trace.Value {
	return trace.Value{Symbol: sym, V: v, Unit: unit}
}

// eval is the recorder of a formula step: its value is f evaluated with
// in (trace.Eval, the one evaluator), appended to the working when that is
// written (k.full) and computed all the same when it is not, so every
// number with a step comes from its printed formula. An input missing or
// outside the formula's domain (a NaN or infinite value) is the trace's
// error, which compute returns. in is copied only when the step is kept,
// so a calculation run without its working allocates nothing here.
func (k *calc) eval(cs, sym string, f trace.Expr, in []trace.Value, unit string, ref trace.Ref, note string) float64 {
	if k.full {
		return k.t.Eval(trace.Step{Symbol: sym, Formula: f, Inputs: slices.Clone(in), Unit: unit, Ref: ref, Note: note, Case: cs})
	}
	v, err := trace.Eval(f, in)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		return k.t.Compute(trace.Step{Symbol: sym, Formula: f, Inputs: slices.Clone(in), Unit: unit, Ref: ref, Note: note, Case: cs})
	}
	return v
}

// take records a value that no formula gives, kind saying how it was
// reached (given or assumed, read from a table, solved, summed), when the
// working is written, and returns it. A NaN or infinite value is the
// trace's error either way.
func (k *calc) take(cs, sym string, kind trace.Kind, v float64, unit string, ref trace.Ref, note string) float64 {
	if k.full || math.IsNaN(v) || math.IsInf(v, 0) {
		k.t.Take(trace.Step{Symbol: sym, Kind: kind, Value: v, Unit: unit, Ref: ref, Note: note, Case: cs})
	}
	return v
}

// err returns the first step the calculation could not evaluate, with the
// footing it belongs to, or nil.
func (k *calc) err() error {
	if err := k.t.Err(); err != nil {
		return fmt.Errorf("settlement of %s: %w", k.f.Name, err)
	}
	return nil
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
	return k.take(cs, "t_life", trace.Given, k.c.life, "yr", ref, note)
}

// warn records a caution raised by the latest step.
func (k *calc) warn(cs, code string, sev trace.Severity, ref trace.Ref, msg string, vals ...trace.Value) {
	if !k.full {
		return
	}
	k.t.Warn(trace.Caution{Code: code, Severity: sev, Message: msg, Values: vals, Ref: ref, Case: cs})
}

// noteAtStep records a NOTE that says what the note of the step just
// recorded says (trace.Caution.AtStep).
func (k *calc) noteAtStep(cs, code, msg string) {
	if !k.full {
		return
	}
	k.t.Warn(trace.Caution{Code: code, Severity: trace.SevNote, Message: msg, Case: cs, AtStep: true})
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
	fxU0     = trace.Mul(trace.S("gamma_w"), trace.Sub(trace.S("z"), trace.S("z_w")))
	fxU0D    = trace.Mul(trace.S("gamma_w"), trace.Sub(trace.S("D"), trace.S("z_w"))) // at the base, as the bearing engine writes it
	fxSigEff = trace.Sub(trace.S("sigma_v0"), trace.S("u_0"))
	fxZmid   = trace.Add(trace.S("z_t"), trace.Div(trace.S("h"), trace.N(2)))
	fxZb     = trace.Sub(trace.S("z"), trace.S("D"))
	fxSigF   = trace.Add(trace.S("sigma'_v0"), trace.S("Delta_sigma"))
)

// ix returns prefix followed by the 1-based number of layer i.
func ix(prefix string, i int) string { return prefix + strconv.Itoa(i+1) }

// overburden appends σ_v0 (site.Ground.Overburden), u_0 and σ′_v0 at
// depth z (below ground; at the base when base is set, where z is D) and
// returns σ_v0, u_0 and σ′_v0 (Pa), each from its formula.
func (k *calc) overburden(cs string, z float64, base bool) (sv, u, se float64) {
	g := k.g
	if o := g.Overburden(z); o.F == nil {
		sv = k.take(cs, "sigma_v0", trace.Given, 0, "kPa", trace.Ref{}, "at ground level")
	} else {
		note := "total vertical stress from the ground model"
		if l := o.Note(); l != "" {
			note += " (" + l + ")"
		}
		sv = k.eval(cs, "sigma_v0", o.F, o.In, "kPa", trace.Ref{}, note)
	}
	wet := g.Water.Set && z > g.Water.V
	if wet && !k.gwShown {
		k.gwShown = true
		note := "unit weight of water, given"
		if g.GammaW == 0 {
			note = "unit weight of water: assumed, default (common practice); give gamma_w in the ground block to change it"
		}
		k.take(cs, "gamma_w", trace.Given, g.Gw(), "kN/m3", trace.Ref{}, note)
	}
	if wet {
		fu, zs := fxU0, "z"
		if base {
			fu, zs = fxU0D, "D"
		}
		u = k.eval(cs, "u_0", fu, []trace.Value{val("gamma_w", g.Gw(), "kN/m3"), val(zs, z, "m"), val("z_w", g.Water.V, "m")}, "kPa", trace.Ref{}, "hydrostatic pore pressure")
	} else {
		u = k.take(cs, "u_0", trace.Given, 0, "kPa", trace.Ref{}, "above the water table")
	}
	se = k.eval(cs, "sigma'_v0", fxSigEff, []trace.Value{val("sigma_v0", sv, "kPa"), val("u_0", u, "kPa")}, "kPa", trace.Ref{}, "vertical effective stress before loading")
	return sv, u, se
}

// Formulas of the load and the zone of influence.
var (
	fxAreaCircle = trace.Div(trace.Mul(trace.S("pi"), trace.Pow(trace.S("B"), trace.N(2))), trace.N(4))
	fxAreaSquare = trace.Pow(trace.S("B"), trace.N(2))
	fxAreaRect   = trace.Mul(trace.S("B"), trace.S("L"))
	fxQ          = trace.Div(trace.S("V"), trace.S("A"))
	fxQNet       = trace.Sub(trace.S("q"), trace.S("sigma_v0"))
	fxZkB        = trace.Add(trace.S("D"), trace.Mul(trace.S("k"), trace.S("B")))
	fxEta        = trace.Div(trace.S("Delta_sigma"), trace.S("sigma'_v0"))
	fxZB         = trace.Add(trace.S("D"), trace.S("B"))
)

// load appends q, the base stresses and q_net.
func (k *calc) load() {
	c, f := k.c, k.f
	cs := "load"
	if c.V.Set {
		var fa trace.Expr
		in := []trace.Value{val("B", f.B, "m"), val("L", f.L, "m")}
		switch f.Shape {
		case site.Strip:
			fa, in = trace.S("B"), in[:1]
		case site.Circle:
			fa, in = fxAreaCircle, in[:1]
		case site.Square:
			fa, in = fxAreaSquare, in[:1]
		default:
			fa = fxAreaRect
		}
		unit := "m2"
		if f.Shape == site.Strip {
			unit = "m2/m"
		}
		a := k.eval(cs, "A", fa, in, unit, trace.Ref{}, "plan area of the footing")
		c.q = k.eval(cs, "q", fxQ, []trace.Value{val("V", c.V.V, "kN"), val("A", a, unit)}, "kPa", trace.Ref{}, "gross bearing pressure (SLS)")
	} else {
		k.take(cs, "q", trace.Given, c.q, "kPa", trace.Ref{}, "gross bearing pressure (SLS), given")
	}
	k.sv, k.u, k.se = k.overburden(cs, f.D, true)
	k.qn = k.eval(cs, "q_net", fxQNet, []trace.Value{val("q", c.q, "kPa"), val("sigma_v0", k.sv, "kPa")}, "kPa",
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
		return k.take(cs, "z_inf", trace.Given, c.Depth.Z.V, "m", trace.Ref{}, "depth of influence, given"), nil
	case DepthWidth:
		kw := c.Depth.Widths.V
		if !c.Depth.Widths.Set {
			kw = k.widths(cs)
		}
		return k.eval(cs, "z_inf", fxZkB, []trace.Value{val("D", D, "m"), val("k", kw, ""), val("B", f.B, "m")}, "m",
			trace.Ref{Source: Schmertmann1978, Clause: "depth of the strain influence diagram (2B to 4B)"}, "depth of influence: k·B below the base"), nil
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
	z := D + root // the root is found below the base
	if k.full {
		// Δσ and σ′_v0 at the root, as the search evaluated them.
		ds := k.take(cs, "Delta_sigma", trace.Solved, k.qn*k.infl(root), "kPa", trace.Ref{}, "stress increase at the trial depth")
		se := k.take(cs, "sigma'_v0", trace.Solved, k.g.SigmaVEff(z), "kPa", trace.Ref{}, "effective overburden at the trial depth")
		k.eval(cs, "eta", fxEta, []trace.Value{val("Delta_sigma", ds, "kPa"), val("sigma'_v0", se, "kPa")}, "",
			trace.Ref{Source: Brent1973, Clause: "ch. 4, zero"}, fmt.Sprintf("solved for Δσ = %g σ′_v0 (common practice)", ratio))
	}
	switch {
	case !found:
		z = k.take(cs, "z_inf", trace.Given, z, "m", trace.Ref{}, "depth of influence: search limit reached")
		k.warn(cs, "depth-cap", trace.SevCaution, trace.Ref{}, fmt.Sprintf("Δσ did not fall to %g σ′_v0 within %g m below the base; the zone is cut there", ratio, capZ))
	case z < D+f.B:
		z = k.eval(cs, "z_inf", fxZB, []trace.Value{val("D", D, "m"), val("B", f.B, "m")}, "m", trace.Ref{}, "depth of influence: not less than one width below the base (common practice)")
	default:
		z = k.take(cs, "z_inf", trace.Solved, z, "m", trace.Ref{}, fmt.Sprintf("depth of influence: where Δσ = %g σ′_v0", ratio))
	}
	return z, nil
}

var fxWidths = trace.Add(trace.N(2), trace.Div(trace.Mul(trace.N(2), trace.Sub(trace.Div(trace.S("L"), trace.S("B")), trace.N(1))), trace.N(9)))

// widths records k, the default depth of influence in widths below the
// base: 2 for L/B = 1 rising linearly to 4 at L/B ≥ 10, the depth of
// Schmertmann's strain influence diagram (the interpolation is common
// practice).
func (k *calc) widths(cs string) float64 {
	f := k.f
	ref := trace.Ref{Source: Schmertmann1978, Clause: "depth of the strain influence diagram (2B to 4B)"}
	switch lb(f) {
	case 1:
		return k.take(cs, "k", trace.Tabulated, 2, "", ref, "depth of influence in widths: 2 for a square or circle; give widths to change it")
	case 10:
		return k.take(cs, "k", trace.Tabulated, 4, "", ref, "depth of influence in widths: 4 for a strip (L/B ≥ 10); give widths to change it")
	}
	return k.eval(cs, "k", fxWidths, []trace.Value{val("B", f.B, "m"), val("L", f.L, "m")}, "", ref, "depth of influence in widths: 2 for L/B = 1 rising linearly to 4 at L/B = 10 (common practice); give widths to change it")
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
	k.take("zone of influence", "n_sub", trace.Given, float64(k.c.n), "", trace.Ref{}, note)
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
	z := k.eval(cs, "z", fxZmid, []trace.Value{val("z_t", s.Top, "m"), val("h", s.H, "m")}, "m", trace.Ref{}, "mid-depth of sublayer "+strconv.Itoa(j+1)+" (midpoint rule)")
	_, _, se = k.overburden(cs, z, false)
	zb := k.eval(cs, "z_b", fxZb, []trace.Value{val("z", z, "m"), val("D", k.f.D, "m")}, "m", trace.Ref{}, "depth below the underside of the footing")
	ds = s.DSigma
	if k.full {
		ds, _ = stress.Explain(k.t, k.f, k.so, zb, k.qn, cs)
	}
	sf = k.eval(cs, "sigma'_f", fxSigF, []trace.Value{val("sigma'_v0", se, "kPa"), val("Delta_sigma", ds, "kPa")}, "kPa", trace.Ref{}, "final vertical effective stress")
	return se, ds, sf
}
