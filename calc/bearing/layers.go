package bearing

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// undrainedIn reports whether layer l acts undrained in a case of
// drainage d: a fine-grained layer with c_u, in the short term.
func undrainedIn(l site.Layer, d Drainage) bool {
	return d == Undrained && l.Fine() && l.Cu.Set
}

// stripQ returns a layer's surface strip capacity with characteristic
// parameters, the measure Meyerhof & Hanna (1978) compare layers by:
// q = c N_c + ½ γ B N_γ (undrained: N_c c_u), by the formulas of the
// two-layer check's q_1. ok is false when the layer lacks the parameter
// the case needs.
func (c *calc) stripQ(i int, d Drainage) (float64, bool) {
	l := c.g.Layers[i]
	m := c.opt.Method
	if undrainedIn(l, d) {
		return c.compute("q", fQ1U[b2i(m == Terzaghi)], val("c_u_d", l.Cu.V, "kPa")), true
	}
	if !l.Phi.Set {
		return 0, false
	}
	fa := Factors(m, l.Phi.V)
	gam := l.Gamma
	if c.zw <= l.Top {
		gam = c.compute("gamma'", wFormsBy[[4]string{"gamma", "gamma_sat", "D", "B"}].sub, val("gamma_sat", l.GammaSatOr(), "kN/m3"), val("gamma_w", c.g.Gw(), "kN/m3"))
	}
	return c.compute("q", fQ1, val("c'_d", l.C.Or(0), "kPa"), val("N_c", fa.Nc, ""), val("gamma_1", gam, "kN/m3"), val("B'", c.f.B, "m"), val("N_gamma", fa.Ngamma, "")), true
}

// layers applies plinth's governing-layer rule to the zone from the base
// to 2B below it: the founding layer supplies the parameters; a lower
// layer starting in the zone whose strip capacity q_2 is below the
// founding layer's q_1 (Meyerhof & Hanna 1978) is checked as the lower
// layer of a two-layer system (the weakest one, if several); stronger
// layers are ignored, which is conservative.
func (c *calc) layers() {
	g, f := c.g, c.f
	z1 := f.D + 2*f.B
	var zone []int
	for i := c.fi + 1; i < len(g.Layers) && g.Layers[i].Top < z1; i++ {
		zone = append(zone, i)
	}
	if len(zone) == 0 {
		return
	}
	var ns []string
	for _, i := range zone {
		ns = append(ns, fmt.Sprintf("%s (top %.2f m)", layerName(g, i), g.Layers[i].Top))
	}
	verb := "starts"
	if len(ns) > 1 {
		verb = "start"
	}
	c.warn("layers-in-zone", trace.SevNote, refMH, fmt.Sprintf("%s %s within 2B = %.2f m below the base. Rule: the founding layer's parameters are used; a lower layer weaker than it (strip capacity q_2 < q_1, Meyerhof & Hanna 1978) is checked as a two-layer system (the weakest if several); stronger layers are ignored (conservative).",
		strings.Join(ns, ", "), verb, 2*f.B), val("z_2B", z1, "m"))
	// weakest per drainage (characteristic values); the case uses its own
	// design values for q_2/q_1
	best, bestR := -1, math.Inf(1)
	for _, d := range []Drainage{Undrained, Drained} {
		q1, ok1 := c.stripQ(c.fi, d)
		if !ok1 || q1 <= 0 {
			continue
		}
		for _, i := range zone {
			q2, ok := c.stripQ(i, d)
			if !ok {
				continue
			}
			if r := c.compute("r_q", fRq, val("q_2", q2, "kPa"), val("q_1", q1, "kPa")); r < 1 && r < bestR {
				best, bestR = i, r
			}
		}
	}
	for _, i := range zone {
		l := g.Layers[i]
		if !l.Phi.Set && !(l.Fine() && l.Cu.Set) {
			c.warn("layer-no-strength", trace.SevWarning, trace.Ref{}, fmt.Sprintf("%s lies within 2B below the base but has neither φ′ nor c_u: it cannot be checked.", layerName(g, i)))
		}
	}
	if best < 0 {
		return
	}
	c.weak = best
	if c.opt.TwoLayer == No {
		c.weak = -1
		c.warn("weaker-layer", trace.SevWarning, refMH, fmt.Sprintf("%s within 2B below the base is weaker than the founding layer (q_2/q_1 = %.2f) but two_layer = no: it is not checked and the resistance may be unsafe.", layerName(g, best), bestR),
			val("r_q", bestR, ""))
		return
	}
	// The message is completed in summarise with the ratio r_q the
	// governing case's working shows (design values), so the caution
	// quotes the number printed beside it.
	c.weakCaution = len(c.t.Cautions)
	c.weakName = fmt.Sprintf("%s (top %.2f m)", layerName(g, best), g.Layers[best].Top)
	c.warn("weaker-layer", trace.SevCaution, refMH, fmt.Sprintf("%s within 2B below the base is weaker than the founding layer: checked by Meyerhof & Hanna (1978) punching shear, capped by the upper layer's own resistance, with a load-spread check beside it.", c.weakName),
		val("r_q", bestR, ""))
}

// localShear decides whether Terzaghi's (1943) local-shear strengths
// c* = 2/3 c, tan φ* = 2/3 tan φ apply to the founding layer.
//
// local_shear = yes applies them with any method (the method line then
// names the reduction); no never does, with a caution where the ground is
// loose or soft. auto keeps a named method's own result: for sand the
// criterion is relative density, Vesić's (1973) failure-mode chart, whose
// local and punching shear region at any embedment holds loose sand
// (density index I_D < 0.35, EN ISO 14688-2 Table 4; without I_D, SPT
// N < 10, Terzaghi & Peck 1948); there auto raises a warning that
// recommends the local-shear check, and medium-dense sand (0.35 ≤ I_D <
// 0.65, 10 ≤ N < 30) a transitional warning. Vesić's chart does not
// classify clay: soft clay (c_u < 40 kPa, EN ISO 14688-2 Table 5), which
// Terzaghi (1943) treats as failing in local shear, gets the same warning.
// Only method = terzaghi applies the reduction under auto, to loose
// sand and soft clay, as Terzaghi (1943) does for soils that fail in local
// shear (the c_u and N boundaries are the engine's reading of "loose" and
// "soft", stated in the caution).
func (c *calc) localShear() {
	l := c.g.Layers[c.fi]
	ln := layerName(c.g, c.fi)
	loose, trans := false, false
	var why string
	looseWord, transWord := "loose", "medium dense"
	var vals []trace.Value
	ref := trace.Ref{Source: SrcISO14688, Clause: "Table 4"}
	clay := false
	switch {
	case l.Fine() && l.Cu.Set:
		ref.Clause = "Table 5"
		vals = append(vals, val("c_u_k", l.Cu.V, "kPa"))
		loose = l.Cu.V < 40*kPa
		clay = true
		looseWord = "of low strength (soft)"
		why = fmt.Sprintf("c_u = %.0f kPa", l.Cu.V/kPa)
	case l.Dr.Set:
		vals = append(vals, val("I_D", l.Dr.V, ""))
		loose = l.Dr.V < 0.35
		trans = !loose && l.Dr.V < 0.65
		why = fmt.Sprintf("I_D = %.2f", l.Dr.V)
	case l.N.Set:
		ref = trace.Ref{Source: SrcTerzaghiPeck, Clause: "SPT N and density of sands"}
		vals = append(vals, val("N", l.N.V, ""))
		loose = l.N.V < 10
		trans = !loose && l.N.V < 30
		why = fmt.Sprintf("N = %.0f", l.N.V)
	}
	mw := c.opt.Method.Title()
	switch c.opt.LocalShear {
	case Yes:
		c.local = true
		c.warn("local-shear", trace.SevCaution, refLocal, "local_shear = yes: Terzaghi's (1943) reduced strengths c* = 2/3 c, tan φ* = 2/3 tan φ are used for "+ln+": the result is "+mw+" with Terzaghi's local-shear reduction.")
	case No:
		if loose {
			c.warn("local-shear-off", trace.SevWarning, refMode, fmt.Sprintf("local_shear = no, but %s shows %s is %s, where local or punching shear may govern (Vesić 1973 for sand; Terzaghi 1943); general-shear resistance may be unsafe.", why, ln, looseWord), vals...)
			c.t.Cite(ref.Source)
		}
	default:
		switch {
		case loose && c.opt.Method == Terzaghi:
			c.local = true
			c.warn("local-shear", trace.SevCaution, refLocal, fmt.Sprintf("local_shear = auto, method = terzaghi: %s shows %s is %s (EN ISO 14688-2), and Terzaghi (1943) gives local-shear strengths for such ground, so his reduced strengths c* = 2/3 c, tan φ* = 2/3 tan φ are used.", why, ln, looseWord), vals...)
			c.t.Cite(ref.Source)
		case loose && !clay:
			c.warn("local-shear-advised", trace.SevCaution, refMode, fmt.Sprintf("local_shear = auto: %s shows %s is %s (EN ISO 14688-2), in the local or punching shear region of Vesić's (1973) failure-mode chart (relative density against relative depth). The result is %s in general shear and may overstate the resistance; check local shear (local_shear = yes applies Terzaghi's reduction c* = 2/3 c, tan φ* = 2/3 tan φ).", why, ln, looseWord, mw), vals...)
			c.t.Cite(ref.Source)
		case loose:
			// Terzaghi (1943) treats soft clay as failing in local shear;
			// the named method keeps its result and the check is advised.
			c.warn("local-shear-advised", trace.SevCaution, refLocal, fmt.Sprintf("local_shear = auto: %s shows %s is %s (EN ISO 14688-2), which Terzaghi (1943) treats as failing in local shear (Vesić's 1973 chart is by relative density and does not classify clay). The result is %s in general shear and may overstate the resistance; check local shear (local_shear = yes applies Terzaghi's reduction c* = 2/3 c, tan φ* = 2/3 tan φ).", why, ln, looseWord, mw), vals...)
			c.t.Cite(ref.Source)
		case trans && !l.Fine():
			c.warn("local-shear-transitional", trace.SevCaution, refMode, fmt.Sprintf("%s shows %s is %s (EN ISO 14688-2): Vesić (1973) places such ground between general and local shear, more so with embedment. General shear is assumed; consider local_shear = yes.", why, ln, transWord), vals...)
			c.t.Cite(ref.Source)
		case why == "" && !l.Fine():
			c.warn("density-unknown", trace.SevNote, refMode, "local_shear = auto: no density (I_D or N) is given for "+ln+", so general shear is assumed.")
		}
	}
}

// drainages returns the drainage cases to check and raises the cautions
// about them.
func (c *calc) drainages() []Drainage {
	fl := c.g.Layers[c.fi]
	fineZone := false
	for i := c.fi + 1; i < len(c.g.Layers) && c.g.Layers[i].Top < c.f.D+2*c.f.B; i++ {
		if l := c.g.Layers[i]; l.Fine() && l.Cu.Set {
			fineZone = true
		}
	}
	fine := fl.Fine()
	switch c.opt.Drainage {
	case Undrained:
		if !fine {
			c.warn("undrained-coarse", trace.SevNote, trace.Ref{}, layerName(c.g, c.fi)+" is coarse-grained: it acts drained in the undrained (short-term) case.")
		}
		if fine && fl.Phi.Set {
			c.warn("drained-missing", trace.SevCaution, trace.Ref{}, "drainage = undrained: the long-term (drained) check of "+layerName(c.g, c.fi)+" is not made.")
		}
		return []Drainage{Undrained}
	case Drained:
		if fine || fineZone {
			c.warn("undrained-missing", trace.SevWarning, trace.Ref{}, "drainage = drained: the short-term (undrained) check of the fine-grained ground is not made; for saturated clay it usually governs.")
		}
		return []Drainage{Drained}
	case Both:
		return []Drainage{Undrained, Drained}
	}
	if fine && fl.Cu.Set {
		if !fl.Phi.Set {
			c.warn("drained-missing", trace.SevCaution, trace.Ref{}, "No φ′ for the fine-grained "+layerName(c.g, c.fi)+": only the undrained (short-term) check is made.")
			return []Drainage{Undrained}
		}
		return []Drainage{Undrained, Drained}
	}
	if fine {
		c.warn("undrained-missing", trace.SevWarning, trace.Ref{}, "No c_u for the fine-grained "+layerName(c.g, c.fi)+": the short-term (undrained) check of the founding layer cannot be made.")
	}
	if fineZone && fl.Phi.Set {
		return []Drainage{Undrained, Drained}
	}
	return []Drainage{Drained}
}
