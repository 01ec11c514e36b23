package platform

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/trace"
)

// cautions raises the method's stated limits: the subgrade strength range,
// the platform φ′ range of the chart, thickness against track width, a
// given thickness below the least one, a case no thickness carries, and
// the granular-subgrade form used.
func (c *calc) cautions() {
	t, r, in := c.t, c.r, c.in
	s := in.Subgrade
	if s.Kind == Cohesive {
		vc := []trace.Value{val("c_u", s.Cu, "kPa")}
		switch {
		case s.Cu < 20*kPa:
			t.WarnAll(trace.Caution{Code: "platform-cu-low", Severity: trace.SevWarning, Ref: refCu, Values: vc,
				Message: fmt.Sprintf("c_u = %s is below 20 kPa, outside the range of the method: the ground is so soft that special measures are needed to build a platform, and a more thorough design than this one.", kpa(s.Cu))})
		case s.Cu > 80*kPa:
			t.WarnAll(trace.Caution{Code: "platform-cu-high", Severity: trace.SevNote, Ref: refCu, Values: vc,
				Message: fmt.Sprintf("c_u = %s is above 80 kPa, beyond the range the method was set up for: the subgrade alone will in many cases carry the plant (see the check without a platform).", kpa(s.Cu))})
		}
	}
	if phi := in.Platform.Phi; phi < 35*deg-1e-9 || phi > 45*deg+1e-9 {
		msg := fmt.Sprintf("φ′_p = %.1f° lies outside the 35°–45° of the table of K_p·tanδ", phi/deg)
		switch {
		case c.o.KpTanDelta.Set:
			msg += "; the K_p·tanδ given is used."
		default:
			msg += "; K_p·tanδ is extrapolated from it. Enter a value read from the chart (K_p·tanδ) to replace it."
		}
		if phi < 35*deg {
			msg += " A platform material below 35° is rated unsuitable for a working platform."
		}
		t.WarnAll(trace.Caution{Code: "platform-phi-range", Severity: trace.SevCaution, Ref: refKp, Values: []trace.Value{val("phi'_p", phi, "deg")}, Message: msg})
	}
	for _, k := range r.Cases {
		switch {
		case !k.Solvable:
			t.WarnAll(trace.Caution{Code: "platform-material", Severity: trace.SevWarning, Ref: refLimit, Case: k.Name,
				Values:  []trace.Value{val("q_d", k.QD, "kPa"), val("R_p", k.Rp, "kPa")},
				Message: fmt.Sprintf("%s: q_d = %s exceeds R_p = %s, the bearing resistance of the platform material itself: no thickness of it carries this case. A stronger material or a wider loaded area is needed.", k.Name, kpa(k.QD), kpa(k.Rp))})
		case k.Rs >= k.Rp:
			t.WarnAll(trace.Caution{Code: "platform-weaker", Severity: trace.SevNote, Ref: refLimit, Case: k.Name,
				Values:  []trace.Value{val("R_s", k.Rs, "kPa"), val("R_p", k.Rp, "kPa")},
				Message: fmt.Sprintf("%s: the subgrade alone (R_s = %s) is at least as strong as the platform material (R_p = %s); the platform adds nothing to the bearing resistance.", k.Name, kpa(k.Rs), kpa(k.Rp))})
		}
		if r.D > k.DMax+1e-9 {
			t.WarnAll(trace.Caution{Code: "platform-thick", Severity: trace.SevCaution, Ref: refThick, Case: k.Name,
				Values:  []trace.Value{val("D", r.D, "m"), val("D_max", k.DMax, "m"), val("W", k.W, "m")},
				Message: fmt.Sprintf("%s: D = %.3g m exceeds D_max = %.3g m (%.3g W; 1.5 W from memory): the method is not used for platforms this thick against the track width; check the design by another method.", k.Name, r.D, k.DMax, c.o.dMaxRatio())})
		}
	}
	if r.Given && r.D < r.DMin-1e-9 {
		t.WarnAll(trace.Caution{Code: "platform-thin", Severity: trace.SevWarning, Ref: refDMin, Values: []trace.Value{val("D", r.D, "m"), val("D_min", r.DMin, "m")},
			Message: fmt.Sprintf("D = %.3g m is less than the least thickness of the method, %.3g m.", r.D, r.DMin)})
	}
	if !r.Needed {
		t.WarnAll(trace.Caution{Code: "platform-not-needed", Severity: trace.SevNote, Ref: refFactors,
			Message: "The subgrade alone carries every case with the factors of the check without a platform: by the method no platform is needed for bearing. A running surface of at least the least thickness is still good practice (common practice)."})
	}
	if s.Kind == Granular {
		msg := "Granular subgrade: R_d = 0.5 γ_s W N_γs s_γ + γ_p D² K_p tanδ s_p/W, the form of the method's public reproductions; the (1 + 2D/W) factor on the punching term, recalled from memory, is not applied (option depth_term)."
		if c.o.DepthTerm {
			msg = "Granular subgrade: the punching term is multiplied by (1 + 2D/W), a form recalled from memory and not confirmed against the method's text; without it the thickness is larger."
		}
		t.WarnAll(trace.Caution{Code: "platform-granular-form", Severity: trace.SevNote, Ref: refGran, Message: msg})
	}
}
