package bearing

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// slidingDrainages returns the sliding checks to make: none when sliding
// = no, or auto with no horizontal action; drained sliding where the
// founding layer acts drained in some case, undrained where it acts
// undrained.
func (c *calc) slidingDrainages(drains []Drainage) []Drainage {
	if c.opt.Sliding == No || (c.opt.Sliding == Auto && !c.anyH()) {
		return nil
	}
	fl := c.g.Layers[c.fi]
	var out []Drainage
	for _, d := range drains {
		x := Drained
		if undrainedIn(fl, d) {
			x = Undrained
		}
		dup := false
		for _, o := range out {
			dup = dup || o == x
		}
		if !dup {
			out = append(out, x)
		}
	}
	return out
}

// slideCase checks sliding on the base (EN 1997-1 6.5.3): drained R_d =
// V′_d tanδ_d / γ_Rh (6.3a, 6.3b); undrained R_d = A′c_u,d / γ_Rh (6.4a,
// 6.4b), not more than 0.4 V_d where water or air can reach the interface
// (6.5). Passive resistance in front of the footing is ignored.
func (c *calc) slideCase(ld design.Load, d Drainage) {
	name := ld.Name + " · sliding " + d.String()
	c.cas = name
	c.pf = [4]bool{}
	ld.Record(c.t, c.acts, name, c.uF, c.uM)
	sc := SlideCase{Name: name, Combination: ld.Name, Drainage: d}
	if ld.V <= 0 {
		c.warn("uplift", trace.SevWarning, ref652, fmt.Sprintf("%s: V_d = %.1f %s: no downward load to resist sliding by friction.", name, ld.V/kN, c.uF), val("V_d", ld.V, c.uF))
		return
	}
	vV := val("V_d", ld.V, c.uF)
	fl := c.g.Layers[c.fi]
	mat := ld.Set.Material
	gRh := ld.Set.Resistance.GammaRh
	fs := c.ap.Allowable()
	var R float64
	if d == Drained {
		sc.H = c.eval("H_d", fHd, c.uF, trace.Ref{}, "resultant horizontal action", val("H_B_d", ld.HB, c.uF), val("H_L_d", ld.HL, c.uF))
		var dd float64
		ln := layerName(c.g, c.fi)
		if c.opt.Interface.Delta.Set {
			dk := c.take("delta_k", c.opt.Interface.Delta.V, "deg", refDelta, "characteristic base friction angle (given)")
			g := c.pfStep(0, gPhi, mat.GammaPhi, mat.Name)
			dd = c.eval("delta_d", fDeltaD, "deg", refMat, "design base friction angle",
				val("delta_k", dk, "deg"), val(gPhi, g, ""))
		} else {
			// EN 1997-1 6.5.3(10): δ_d = k_δ φ′_cv,d, with φ′_cv,d from
			// φ′_cv,k as φ′_d is from φ′_k (tan divided by γ_φ′).
			ks, ds, ak := "phi'_cv_k", "phi'_cv_d", fl.PhiCv.V
			if fl.PhiCv.Set {
				c.take(ks, ak, "deg", refDelta, "characteristic critical-state angle of shearing resistance of "+ln)
			} else {
				ks, ds, ak = "phi'_k", "phi'_d", fl.Phi.V
				c.take(ks, ak, "deg", trace.Ref{}, "characteristic peak angle of shearing resistance of "+ln+" (no φ′_cv given)")
				c.warnOnce("slide-phi-cv", trace.SevCaution, refDelta, fmt.Sprintf("No φ′_cv is given for %s: the base friction angle is taken from the peak φ′_k = %.1f°. EN 1997-1 6.5.3(10) bases δ_d on the design critical-state angle φ′_cv,d, so the drained sliding resistance may be high by the ratio tan φ′_d/tan φ′_cv,d (25 %% for 38° against 32°). Give phi'_cv in the ground table.", ln, ak/degr),
					val("phi'_k", ak, "deg"))
			}
			g := c.pfStep(0, gPhi, mat.GammaPhi, mat.Name)
			ad := c.eval(ds, soilForm(ks, gPhi, true, false, false), "deg", refMat, "design value", val(ks, ak, "deg"), val(gPhi, g, ""))
			kd := c.take("k_delta", c.opt.Interface.KDelta, "", refDelta, kDeltaNote(c.opt.kDeltaSet))
			dd = c.eval("delta_d", fDeltaK[ds], "deg", refDelta, "design base friction angle",
				val("k_delta", kd, ""), val(ds, ad, "deg"))
		}
		vp := ld.V
		if c.u0 > 0 {
			A := c.planArea()
			U := c.eval("U", fU, c.uF, trace.Ref{}, "water pressure on the base", val("u_0", c.u0, "kPa"), val("A_b", A, c.uA))
			vp = c.eval("V'_d", fVpU, c.uF, refSlide, "effective vertical action", vV, val("U", U, c.uF))
		} else {
			vp = c.eval("V'_d", fVp, c.uF, refSlide, "effective vertical action (no water pressure on the base)", vV)
		}
		sc.V = vp
		fsym, fv := "gamma_Rh", gRh
		if fs {
			fsym, fv = "FS_s", c.ap.SlidingFS()
			c.take(fsym, fv, "", trace.Ref{}, "global factor on sliding (common practice)")
		} else {
			c.take("gamma_Rh", gRh, "", refA5, "partial factor on sliding resistance ("+ld.Set.Resistance.Name+")")
		}
		vf := val(fsym, fv, "")
		R = c.eval("R_h_d", fRh[fsym].drained, c.uF, refSlide, "design sliding resistance",
			val("V'_d", vp, c.uF), val("delta_d", dd, "deg"), vf)
	} else {
		g, ok := c.geometry(ld, true)
		sc.H = g.H
		if !ok {
			c.finishSlide(&sc, 0)
			return
		}
		c.take("c_u_k", fl.Cu.V, "kPa", trace.Ref{}, "characteristic undrained strength of "+layerName(c.g, c.fi))
		gc := c.pfStep(2, gCu, mat.GammaCu, mat.Name)
		cu := c.eval("c_u_d", soilForm("c_u_k", gCu, false, false, false), "kPa", refMat, "design value", val("c_u_k", fl.Cu.V, "kPa"), val(gCu, gc, ""))
		fsym, fv := "gamma_Rh", gRh
		if fs {
			fsym, fv = "FS_s", c.ap.SlidingFS()
			c.take(fsym, fv, "", trace.Ref{}, "global factor on sliding (common practice)")
		} else {
			c.take("gamma_Rh", gRh, "", refA5, "partial factor on sliding resistance ("+ld.Set.Resistance.Name+")")
		}
		sc.V = ld.V
		vA, vcu, vf := val("A'", g.Ap, c.uA), val("c_u_d", cu, "kPa"), val(fsym, fv, "")
		if c.opt.Interface.Sealed {
			R = c.eval("R_h_d", fRh[fsym].undrained, c.uF, refSlideU, "design sliding resistance (water and air cannot reach the interface)",
				vA, vcu, vf)
		} else {
			R = c.eval("R_h_d", fRh[fsym].limited, c.uF, ref04V,
				"design sliding resistance, not more than 0.4 V_d (water or air can reach the interface)", vA, vcu, vf, vV)
			sc.Limit04 = R < c.compute("R_h_d", fRh[fsym].undrained, vA, vcu, vf)
			if sc.Limit04 {
				c.warn("slide-04V", trace.SevNote, ref04V, name+": the limit 0.4 V_d governs the undrained sliding resistance.", val("V_d", ld.V, c.uF))
			}
		}
	}
	c.finishSlide(&sc, R)
}

func (c *calc) finishSlide(sc *SlideCase, R float64) {
	sc.R = R
	switch {
	case sc.H == 0:
		sc.Util = c.take("util_h", 0, "", trace.Ref{}, "no horizontal action")
	case R <= 0:
		sc.Util = c.take("util_h", UtilCap, "", trace.Ref{}, "no sliding resistance: the check fails")
	default:
		sc.Util = math.Min(UtilCap, c.eval("util_h", fUtilH, "", refSlide, "sliding utilisation H_d/R_h,d",
			val("H_d", sc.H, c.uF), val("R_h_d", R, c.uF)))
	}
	sc.OK = sc.Util <= 1+1e-12
	c.r.Sliding = append(c.r.Sliding, *sc)
}

// Formulas of the sliding check, built once.
var (
	fDeltaD = soilForm("delta_k", gPhi, true, false, false)
	fDeltaK = map[string]trace.Expr{
		"phi'_cv_d": trace.Mul(trace.S("k_delta"), trace.S("phi'_cv_d")),
		"phi'_d":    trace.Mul(trace.S("k_delta"), trace.S("phi'_d")),
	}
	fVp    = trace.S("V_d")
	fVpU   = trace.Sub(trace.S("V_d"), trace.S("U"))
	fUtilH = trace.Div(trace.S("H_d"), trace.S("R_h_d"))
	fRh    = map[string]rhForms{"gamma_Rh": mkRhForms("gamma_Rh"), "FS_s": mkRhForms("FS_s")}
)

// rhForms are the sliding resistances with the factor symbol f: drained
// (6.3), undrained (6.4) and undrained not more than 0.4 V_d (6.5).
type rhForms struct{ drained, undrained, limited trace.Expr }

func mkRhForms(f string) rhForms {
	u := trace.Div(trace.Mul(trace.S("A'"), trace.S("c_u_d")), trace.S(f))
	return rhForms{
		drained:   trace.Div(trace.Mul(trace.Fn("max", trace.N(0), trace.S("V'_d")), trace.Fn("tan", trace.S("delta_d"))), trace.S(f)),
		undrained: u,
		limited:   trace.Fn("min", u, trace.Mul(trace.N(0.4), trace.S("V_d"))),
	}
}

// summarise marks the governing cases and builds the summary values.
func (c *calc) summarise() {
	r := c.r
	c.cas = ""
	r.OK = len(r.Cases) > 0
	if len(r.Cases) == 0 && r.Uplift > 0 {
		r.Unverified = fmt.Sprintf("bearing not verified: V_d ≤ 0 in every design load (at most %.1f %s): the base is in tension or lifts, so tension piles or anchorage are needed", r.UpliftV/kN, c.uF)
		c.t.Cautions = append(c.t.Cautions, trace.Caution{Code: "not-verified", Severity: trace.SevWarning, Message: r.Unverified, Values: []trace.Value{val("V_d", r.UpliftV, c.uF)}, Step: -1})
	}
	uu, ud := -1.0, -1.0
	for i, cs := range r.Cases {
		if r.Governing < 0 || cs.Util > r.Cases[r.Governing].Util {
			r.Governing = i
		}
		r.OK = r.OK && cs.OK
		if cs.Drainage == Undrained {
			uu = math.Max(uu, cs.Util)
		} else {
			ud = math.Max(ud, cs.Util)
		}
	}
	for i, sc := range r.Sliding {
		if r.GoverningSliding < 0 || sc.Util > r.Sliding[r.GoverningSliding].Util {
			r.GoverningSliding = i
		}
		r.OK = r.OK && sc.OK
	}
	if r.Governing >= 0 {
		g := r.Cases[r.Governing]
		r.GoverningDrainage = g.Drainage
		if g.Util >= UtilCap {
			// No effective area or no resistance: UtilCap is a placeholder,
			// not a utilisation, so the result is not verified.
			r.OK = false
			r.Unverified = "not verified: no bearing resistance in " + g.Name + " (the resultant lies at or outside the edge of the base, or the resistance is nil): the footing overturns or fails"
		}
		c.completeWeak(g.Name)
		c.whole("governing", fmt.Sprintf("Bearing governed by %s: utilisation %s; the %s case governs.", g.Name, units.Utilisation(g.Util), g.Drainage), val("util", g.Util, ""))
		strip := c.f.Shape == site.Strip
		r.Values = append(r.Values,
			val("R_d", g.R, c.uF), val("util", g.Util, ""), val("q_Ed", g.QEd, "kPa"), val("q_Rd", g.QRd, "kPa"), val("q_ult", g.QUlt, "kPa"),
			val("V_d", g.V, c.uF), val("H_d", g.H, c.uF), val("e_B", g.EB, "m"))
		if !strip {
			r.Values = append(r.Values, val("e_L", g.EL, "m"))
		}
		r.Values = append(r.Values, val("B'", g.B, "m"))
		if !strip {
			r.Values = append(r.Values, val("L'", g.L, "m"))
		}
		r.Values = append(r.Values, val("A'", g.A, c.uA))
	}
	c.ksCaution()
	if uu >= 0 {
		r.Values = append(r.Values, val("util_u", uu, ""))
	}
	if ud >= 0 {
		r.Values = append(r.Values, val("util_dr", ud, ""))
	}
	if r.GoverningSliding >= 0 {
		s := r.Sliding[r.GoverningSliding]
		r.Values = append(r.Values, val("H_d_h", s.H, c.uF), val("V_d_h", s.V, c.uF), val("R_h_d", s.R, c.uF), val("util_h", s.Util, ""))
		c.whole("governing-sliding", fmt.Sprintf("Sliding governed by %s: utilisation %s.", s.Name, units.Utilisation(s.Util)), val("util_h", s.Util, ""))
	}
}

// completeWeak rewrites the weaker-layer caution with the bearing capacity
// ratio r_q = q_2/q_1 of the governing case, as its working prints it,
// and the range over the cases.
func (c *calc) completeWeak(governing string) {
	if c.weakCaution < 0 || c.weakCaution >= len(c.t.Cautions) {
		return
	}
	gov, lo, hi, n := 0.0, math.Inf(1), math.Inf(-1), 0
	for _, s := range c.t.Steps {
		if s.Symbol != "r_q" {
			continue
		}
		if s.Case == governing {
			gov = s.Value
		}
		lo, hi, n = math.Min(lo, s.Value), math.Max(hi, s.Value), n+1
	}
	if n == 0 {
		return
	}
	ca := &c.t.Cautions[c.weakCaution]
	span := ""
	if hi-lo > 5e-4 {
		span = fmt.Sprintf("; %.3f to %.3f over the cases", lo, hi)
	}
	ca.Message = fmt.Sprintf("%s within 2B below the base is weaker than the founding layer (q_2/q_1 = r_q = %.3f in the governing case%s, design values): checked by Meyerhof & Hanna (1978) punching shear, capped by the upper layer's own resistance, with a load-spread check beside it.", c.weakName, gov, span)
	ca.Values = []trace.Value{val("r_q", gov, "")}
}

// whole records a note about the calculation as a whole (Step -1; Warn
// would attach it to the latest step) that restates a verdict line: the
// governing case of bearing or sliding (trace.Caution.Restates).
func (c *calc) whole(code, msg string, vals ...trace.Value) {
	c.t.Cautions = append(c.t.Cautions, trace.Caution{Code: code, Severity: trace.SevNote, Message: msg, Values: vals, Step: -1, Restates: true})
}
