package bearing

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// calc carries one calculation: input, trace, and what the common steps
// found.
type calc struct {
	in    Input
	opt   Options
	ap    design.Approach
	g     site.Ground
	f     site.Footing
	acts  []site.Action
	t     *trace.Trace
	cas   string
	arena []trace.Value
	r     *Result

	uF, uM, uA string // display units of forces, moments, areas

	fi   int // founding layer
	weak int // weakest lower layer within 2B below the base (-1 none)
	// weakCaution is the index of the weaker-layer caution (-1 none),
	// completed with the governing case's r_q; weakName names the layer.
	weakCaution int
	weakName    string
	zw          float64 // water depth (+Inf when none)
	sv0         float64 // σ_v0 at the base
	u0          float64
	sv0e        float64
	gEffK       float64 // γ′ of the N_γ term, founding layer
	local       bool    // Terzaghi's local shear applies to the founding layer
	hcLim       bool    // the current undrained case has H_d > A′c_u,d
	pf          [4]bool // partial factors γ_φ′, γ_c′, γ_cu, γ_γ recorded in this case
	once        []string
	// ksOut: φ′_d of each case whose K_s was extrapolated beyond BR 470
	// Table A2, by case name, in case order (the caution quotes the
	// governing case's value, the one its working shows).
	ksOut []caseValue
	lname []string // layer names as printed
	// dry: steps are computed, not recorded (the two-layer check's
	// numbers, worked before it is known whether the check applies)
	dry   bool
	errAt string // where the trace's first error arose
}

// Check runs the bearing (and sliding) calculation of in: every design
// load of the approach under each drainage condition that applies, with
// the full working in Result.Trace. Input outside its valid range returns
// a site.Errors list of *site.RangeError and *site.InputError; a step
// whose formula cannot be evaluated with the values reached (NaN or Inf:
// an action so large that a pressure overflows) returns the trace's error
// (a *trace.DomainError) wrapped with the case it arose in, never a NaN
// result.
func Check(in Input) (*Result, error) {
	opt, err := validate(in)
	if err != nil {
		return nil, err
	}
	c := newCalc(in, opt)
	loads := design.Loads(in.Actions, opt.Approach)
	c.t.Steps = make([]trace.Step, 0, 32)
	c.arena = make([]trace.Value, 0, 96)
	c.common()
	c.mark()
	drains := c.drainages()
	sl := c.slidingDrainages(drains)
	// size the trace once: about 50 steps a bearing case (140 with a
	// two-layer check) and 30 a sliding case, 3 inputs a step
	per := 50
	if c.weak >= 0 {
		per = 140
	}
	need := len(c.t.Steps) + len(loads)*(len(drains)*per+len(sl)*30)
	steps := make([]trace.Step, len(c.t.Steps), need)
	copy(steps, c.t.Steps)
	c.t.Steps = steps
	c.arena = make([]trace.Value, 0, 3*need)
	for _, ld := range loads {
		for _, d := range drains {
			c.bearingCase(ld, d)
			c.mark()
		}
	}
	if len(sl) > 0 {
		for _, ld := range loads {
			for _, d := range sl {
				c.slideCase(ld, d)
				c.mark()
			}
		}
	}
	if err := c.t.Err(); err != nil {
		return nil, fmt.Errorf("bearing check of %s, %s: %w", footingName(in.Footing), c.errAt, err)
	}
	c.summarise()
	c.r.MethodLine = opt.Method.Title()
	if c.local {
		c.r.MethodLine += " with Terzaghi's (1943) local-shear reduction"
	}
	c.r.Trace.Compact() // the buffers above were sized generously
	return c.r, nil
}

func newCalc(in Input, opt Options) *calc {
	c := &calc{
		in: in, opt: opt, ap: opt.Approach, g: in.Ground, f: in.Footing, acts: in.Actions,
		uF: "kN", uM: "kNm", uA: "m2", weak: -1, weakCaution: -1,
	}
	if c.f.Shape == site.Strip {
		c.uF, c.uM, c.uA = "kN/m", "kNm/m", "m2/m"
	}
	if c.f.Shape == site.Square {
		c.f.L = c.f.B
	}
	c.r = &Result{Approach: opt.Approach.Name, Source: opt.Approach.Source, Method: opt.Method, Governing: -1, GoverningSliding: -1}
	c.t = &c.r.Trace
	c.lname = make([]string, len(c.g.Layers))
	for i := range c.g.Layers {
		c.lname[i] = layerName(c.g, i)
	}
	c.zw = math.Inf(1)
	if c.g.Water.Set {
		c.zw = c.g.Water.V
	}
	return c
}

func footingName(f site.Footing) string {
	if f.Name == "" {
		return "the footing"
	}
	return fmt.Sprintf("footing %q", f.Name)
}

func val(sym string, v float64, unit string) trace.Value {
	return trace.Value{Symbol: sym, V: v, Unit: unit}
}

// eval records a formula step of the current case and returns its value:
// f evaluated with the inputs by the trace's recorder (trace.Trace.Eval),
// so the printed formula is the value's only definition. The inputs are
// copied into an arena so a step costs no allocation of its own. In a dry
// run (c.dry) the value is computed the same way and nothing is recorded.
func (c *calc) eval(sym string, f trace.Expr, unit string, ref trace.Ref, note string, in ...trace.Value) float64 {
	n := len(c.arena)
	c.arena = append(c.arena, in...)
	s := trace.Step{Symbol: sym, Formula: f, Inputs: c.arena[n:len(c.arena):len(c.arena)], Unit: unit, Ref: ref, Note: note, Case: c.cas}
	if c.dry {
		v := c.t.Compute(s)
		if v == v { // a failed step's inputs stay with its error
			c.arena = c.arena[:n]
		}
		return v
	}
	return c.t.Eval(s)
}

// compute evaluates f with the inputs as eval would record it, without
// recording: for a value the engine decides on before its step is printed
// (which side is B′, whether φ′_d is clamped).
func (c *calc) compute(sym string, f trace.Expr, in ...trace.Value) float64 {
	dry := c.dry
	c.dry = true
	v := c.eval(sym, f, "", trace.Ref{}, "", in...)
	c.dry = dry
	return v
}

// took records a step of kind k (trace.Given, Tabulated, Interpolated,
// Solved, Summed) whose value v no formula gives, with the inputs it was
// read or solved at.
func (c *calc) took(k trace.Kind, sym string, v float64, unit string, ref trace.Ref, note string, in ...trace.Value) float64 {
	if c.dry {
		return v
	}
	n := len(c.arena)
	c.arena = append(c.arena, in...)
	return c.t.Take(trace.Step{Symbol: sym, Kind: k, Inputs: c.arena[n:len(c.arena):len(c.arena)], Value: v, Unit: unit, Ref: ref, Note: note, Case: c.cas})
}

// take records a given value (an input, a default, a value the method
// states).
func (c *calc) take(sym string, v float64, unit string, ref trace.Ref, note string) float64 {
	return c.took(trace.Given, sym, v, unit, ref, note)
}

// mark notes where the trace's first error arose (the case being worked,
// or the common steps), for the error Check returns.
func (c *calc) mark() {
	if c.errAt == "" && c.t.Err() != nil {
		c.errAt = c.cas
		if c.errAt == "" {
			c.errAt = "the common steps"
		}
	}
}

// warnOnce raises a caution once per calculation (the first case that
// meets it).
func (c *calc) warnOnce(code string, sev trace.Severity, ref trace.Ref, msg string, vals ...trace.Value) {
	for _, o := range c.once {
		if o == code {
			return
		}
	}
	c.once = append(c.once, code)
	c.warn(code, sev, ref, msg, vals...)
}

func (c *calc) warn(code string, sev trace.Severity, ref trace.Ref, msg string, vals ...trace.Value) {
	if c.dry {
		return
	}
	c.t.Warn(trace.Caution{Code: code, Severity: sev, Message: msg, Values: vals, Ref: ref, Case: c.cas})
}

// noteAtStep records a NOTE that says what the note and reference of the
// step just recorded say (trace.Caution.AtStep).
func (c *calc) noteAtStep(code string, ref trace.Ref, msg string, vals ...trace.Value) {
	if c.dry {
		return
	}
	c.t.Warn(trace.Caution{Code: code, Severity: trace.SevNote, Message: msg, Values: vals, Ref: ref, Case: c.cas, AtStep: true})
}

// common records the steps shared by every case: footing, overburden,
// groundwater, the layers below the base and the choices made.
func (c *calc) common() {
	c.cas = ""
	f, g := c.f, c.g
	c.take("B", f.B, "m", trace.Ref{}, "footing width ("+f.Shape.String()+")")
	if f.Shape == site.Rectangle || f.Shape == site.Square {
		c.take("L", f.L, "m", trace.Ref{}, "footing length")
	}
	c.take("D", f.D, "m", trace.Ref{}, "depth of the base below ground level")
	if f.Alpha != 0 {
		c.take("alpha", f.Alpha, "deg", trace.Ref{}, "inclination of the base")
	}
	if c.ap.Allowable() {
		on := "net ultimate bearing pressure (fs_on = net)"
		if c.opt.FSOnGross {
			on = "gross ultimate bearing pressure (fs_on = gross, as in the textbooks that divide the gross; for FS > 1 it gives a lower allowable pressure than the net convention)"
		}
		c.warn("allowable", trace.SevNote, trace.Ref{}, fmt.Sprintf("Allowable-stress design: characteristic actions and parameters, global factor %g on the %s and %g on sliding (common practice).", c.ap.FS, on, c.ap.SlidingFS()))
	} else if strings.HasPrefix(c.ap.Name, "DA3") {
		c.warn("da3-actions", trace.SevNote, trace.Ref{Source: trace.EN1997, Clause: "2.4.7.3.4.4"}, "DA3: all actions on the footing are taken as structural actions (set A1).")
	}
	if names := design.PsiDefaulted(c.acts); len(names) > 0 {
		c.warn("psi0-default", trace.SevCaution, trace.Ref{Source: trace.EN1990, Clause: "Annex A1, Table A1.1"},
			fmt.Sprintf("No ψ0 given for %s: ψ0 = %g taken when not leading (EN 1990 Table A1.1, imposed loads categories A–D). State ψ0 for wind, snow or storage loads.", strings.Join(names, ", "), c.ap.Psi0()),
			val("psi_0", c.ap.Psi0(), ""))
	}
	c.overburden()
	c.fi = g.At(f.D)
	l := g.Layers[c.fi]
	c.take("gamma", l.Gamma, "kN/m3", trace.Ref{}, "bulk unit weight of "+layerName(g, c.fi))
	if c.zw < f.D+f.B {
		c.take("gamma_sat", l.GammaSatOr(), "kN/m3", trace.Ref{}, "saturated unit weight of "+layerName(g, c.fi))
	}
	c.gEffK = c.unitWeight("gamma'_k", l, "gamma", "gamma_sat", f.D, "D", f.B, "B")
	if l.Phi.Set && l.Phi.V > 40*degr {
		c.warn("phi-high", trace.SevCaution, trace.Ref{}, fmt.Sprintf("φ′ = %.1f° of %s is above about 40°: the bearing factors grow very fast there and the resistance is sensitive to the value chosen.", l.Phi.V/degr, layerName(g, c.fi)),
			val("phi'_k", l.Phi.V, "deg"))
	}
	c.founding()
	c.factorNotes()
	c.layers()
	c.localShear()
	c.r.LocalShear = c.local
	if f.Alpha != 0 && (c.opt.Method == Meyerhof || c.opt.Method == Terzaghi) {
		c.warn("base-tilt", trace.SevCaution, trace.Ref{}, fmt.Sprintf("The %s method has no base-inclination factors: the inclination of the base is not taken into account. Use ec7, vesic or hansen.", c.opt.Method))
	}
	if c.opt.Method == Terzaghi && c.anyH() {
		c.warn("terzaghi-incl", trace.SevWarning, refMey63, "Terzaghi (1943) gives no inclination factors: Meyerhof's (1963) i_c = i_q = (1 − β/90°)², i_γ = (1 − β/φ′)² are applied to the inclined load.")
	}
	if c.opt.Method == Terzaghi && f.Shape == site.Circle {
		c.warn("terzaghi-circle", trace.SevNote, refTerz, "Terzaghi circle: with a central load the diameter is used with s_c = 1.3, s_γ = 0.6; with an eccentric load the equivalent rectangle of the effective area is used with the rectangular factors.")
	}
	if f.Shape == site.Circle && c.opt.Method != Terzaghi {
		c.warn("circle-area", trace.SevNote, refCircle, "Circle: the effective area is the circular segment within the resultant's chord, replaced by an equivalent rectangle B′ × L′ of the same area (API RP 2GEO); with a central load that is the square of equal area.")
	}
}

func (c *calc) anyH() bool {
	for _, a := range c.acts {
		if a.HB != 0 || a.HL != 0 {
			return true
		}
	}
	return false
}

// overburden records σ_v0, u_0 and σ′_v0 at the base from the layers above
// it (site.Ground.Overburden: Σγh, with γ_sat below the water table, in
// the notation the settlement engine prints too).
func (c *calc) overburden() {
	g, D := c.g, c.f.D
	o := g.Overburden(D)
	var parts []string
	if h0 := g.Flood(); h0 > 0 {
		c.warnOnce("water-above-ground", trace.SevCaution, trace.Ref{},
			"Free water stands above ground level: σ_v0 and u_0 include its weight γ_w·h_w0, σ′_v0 does not; the actions must account for the water on the footing and the uplift on its base.",
			val("h_w0", h0, "m"))
	}
	for _, i := range o.Layers {
		if n := g.Layers[i].Name; n != "" {
			parts = append(parts, fmt.Sprintf("%d %q", i+1, n))
		} else {
			parts = append(parts, strconv.Itoa(i+1))
		}
	}
	ref := trace.Ref{}
	note := "total vertical stress at the base (common practice)"
	if l := o.Note(); l != "" {
		note += "; " + l
	}
	if len(parts) > 0 {
		note += "; layers " + strings.Join(parts, ", ")
	}
	if o.F == nil {
		c.sv0 = c.take("sigma_v0", 0, "kPa", ref, note)
	} else {
		c.sv0 = c.eval("sigma_v0", o.F, "kPa", ref, note, o.In...)
	}
	if c.g.Water.Set {
		c.take("z_w", c.zw, "m", trace.Ref{}, "depth of the groundwater table")
		gwNote := "unit weight of water, given"
		if g.GammaW == 0 {
			gwNote = "unit weight of water: assumed, default (common practice); give gamma_w in the ground block to change it"
		}
		c.take("gamma_w", g.Gw(), "kN/m3", trace.Ref{}, gwNote)
	}
	if c.zw < D {
		c.u0 = c.eval("u_0", fU0, "kPa", trace.Ref{}, "pore pressure at the base",
			val("gamma_w", g.Gw(), "kN/m3"), val("D", D, "m"), val("z_w", c.zw, "m"))
	} else {
		c.u0 = c.take("u_0", 0, "kPa", trace.Ref{}, "pore pressure at the base (water table at or below it)")
	}
	c.sv0e = c.eval("sigma'_v0", fSv0e, "kPa", trace.Ref{}, "effective vertical stress at the base",
		val("sigma_v0", c.sv0, "kPa"), val("u_0", c.u0, "kPa"))
}

// unitWeight records the unit weight of the N_γ term of layer l for a
// base at depth z (symbol zs) of width b (symbol bs), by the three
// water-table cases (Das 2011): water at or above the base, γ′ = γ_sat −
// γ_w; within b below it, γ′ + (d/b)(γ − γ′); deeper, γ.
func (c *calc) unitWeight(name string, l site.Layer, gs, gss string, z float64, zs string, b float64, bs string) float64 {
	fw := waterForms(gs, gss, zs, bs)
	vg, vgs, vw := val(gs, l.Gamma, "kN/m3"), val(gss, l.GammaSatOr(), "kN/m3"), val("gamma_w", c.g.Gw(), "kN/m3")
	switch {
	case c.zw <= z:
		v := c.eval(name, fw.sub, "kN/m3", refWater, "submerged unit weight (water above the base)", vgs, vw)
		if c.cas == "" { // raised at the step that prints it
			c.noteAtStep("water-above-base", refWater, "Groundwater at or above the base: effective overburden q′ and submerged unit weight γ′ = γ_sat − γ_w in the N_γ term.", val("z_w", c.zw, "m"))
		}
		return v
	case c.zw < z+b:
		v := c.eval(name, fw.within, "kN/m3", refWater, "unit weight with the water table within B below the base", vg, vgs, vw, val("z_w", c.zw, "m"), val(zs, z, "m"), val(bs, b, "m"))
		if c.cas == "" { // raised at the step that prints it
			c.noteAtStep("water-within-B", refWater, "Groundwater within B below the base: the unit weight of the N_γ term is interpolated between γ′ and γ.", val("z_w", c.zw, "m"))
		}
		return v
	}
	return c.eval(name, fw.bulk, "kN/m3", refWater, "bulk unit weight (water table deeper than B below the base)", vg)
}

// Formulas of the overburden, built once.
var (
	fU0   = trace.Mul(trace.S("gamma_w"), trace.Sub(trace.S("D"), trace.S("z_w")))
	fSv0e = trace.Sub(trace.S("sigma_v0"), trace.S("u_0"))
)

// wForms are the three unit-weight formulas of unitWeight for one set of
// symbols (bulk γ, saturated γ, depth of the base, width).
type wForms struct{ sub, within, bulk trace.Expr }

// The two symbol sets unitWeight is called with: the founding layer at
// the base and the lower layer of a two-layer check at its top.
var wFormsBy = mkWaterForms()

func mkWaterForms() map[[4]string]*wForms {
	m := map[[4]string]*wForms{}
	for _, k := range [][4]string{{"gamma", "gamma_sat", "D", "B"}, {"gamma_l", "gamma_sat_l", "z_2", "B'"}} {
		gs, gss, zs, bs := k[0], k[1], k[2], k[3]
		sub := trace.Sub(trace.S(gss), trace.S("gamma_w"))
		m[k] = &wForms{
			sub:    sub,
			within: trace.Add(sub, trace.Mul(trace.Div(trace.Sub(trace.S("z_w"), trace.S(zs)), trace.S(bs)), trace.Sub(trace.S(gs), sub))),
			bulk:   trace.S(gs),
		}
	}
	return m
}

func waterForms(gs, gss, zs, bs string) *wForms { return wFormsBy[[4]string{gs, gss, zs, bs}] }

// caseValue is a value recorded for one case.
type caseValue struct {
	cas string
	v   float64
}
