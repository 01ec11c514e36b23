package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

var (
	refMv  = trace.Ref{Source: Craig2012, Clause: "one-dimensional consolidation settlement, s = m_v Δσ′ H"}
	refCc  = trace.Ref{Source: TPM1996, Clause: "consolidation settlement from the e–log σ′ curve (C_c, C_r, σ′_p)"}
	refSB  = trace.Ref{Source: SB1957, Clause: "μ = A + α(1 − A)"}
	noteE0 = "e_0 is not updated between the recompression and virgin stages: H·Δe/(1 + e_0), both Δe measured from e_0, is exact for the bilinear e–log σ′ line"
)

// consolidation computes the one-dimensional consolidation settlement of
// every layer in the zone that has m_v, or C_c with e_0.
func (k *calc) consolidation(mode Method) error {
	for _, lr := range k.layerRanges() {
		i := lr.layer
		l := k.g.Layers[i]
		name := k.layerName(i)
		cs := name + ": consolidation"
		useCc := l.Cc.Set && l.E0.Set
		if !useCc && !l.Mv.Set {
			if l.Cc.Set {
				return &site.InputError{Where: fmt.Sprintf("layer %q", name), Param: "e_0", Msg: "C_c is given without the initial void ratio e_0 (and there is no m_v)"}
			}
			if l.Fine() || mode == Consolidation {
				k.take(cs, ix("s_c,", i), trace.Given, 0, "mm", trace.Ref{}, "no consolidation settlement computed for this layer")
			}
			switch {
			case l.Fine():
				k.warn(cs, "no-consolidation", trace.SevWarning, trace.Ref{}, fmt.Sprintf("%s: fine-grained but no m_v or C_c given: its consolidation settlement is not computed", name))
				k.unverified(fmt.Sprintf("%s is fine-grained with no m_v or C_c", name))
			case mode == Consolidation:
				k.warn(cs, "incompressible", trace.SevNote, trace.Ref{}, fmt.Sprintf("%s: coarse-grained with no m_v: taken as incompressible in the consolidation method", name))
			}
			continue
		}
		if !l.Fine() && mode == Combined {
			continue // a coarse layer settles at once: the elastic part covers it
		}
		k.con[i] = "m_v"
		if useCc {
			k.con[i] = "C_c"
		}
		low := false
		for j := lr.first; j < lr.end; j++ {
			s := &k.r.Sub[j]
			if useCc {
				sp := s.SigmaV0Eff
				switch {
				case l.SigmaP.Set:
					sp = l.SigmaP.V
				case l.OCR.Set:
					sp = l.OCR.V * s.SigmaV0Eff
				}
				if sp < s.SigmaV0Eff {
					sp, low = s.SigmaV0Eff, true
				}
				s.SigmaP = sp
				c := ccCase(s.SigmaV0Eff, s.SigmaF, sp)
				if c != "NC" && !l.Cr.Set {
					return &site.InputError{Where: fmt.Sprintf("layer %q", name), Param: "C_r", Msg: fmt.Sprintf("the clay is over-consolidated at %.2f m (σ′_p = %.1f kPa > σ′_v0 = %.1f kPa): give the recompression index C_r", s.Z, sp/1e3, s.SigmaV0Eff/1e3)}
				}
				s.Case = join(s.Case, c)
				s.Sc = ccSettle(c, s.H, l.E0.V, l.Cc.V, l.Cr.Or(0), s.SigmaV0Eff, s.SigmaF, sp)
			} else {
				s.Case = join(s.Case, "m_v")
				s.Sc = l.Mv.V * s.DSigma * s.H
			}
		}
		if !k.full {
			continue
		}
		// Representative sublayers: the largest contribution, and the first
		// of each other case present.
		reps := []int{}
		best := lr.first
		for j := lr.first; j < lr.end; j++ {
			if k.r.Sub[j].Sc > k.r.Sub[best].Sc {
				best = j
			}
		}
		reps = append(reps, best)
		seen := map[string]bool{k.r.Sub[best].Case: true}
		for j := lr.first; j < lr.end; j++ {
			if c := k.r.Sub[j].Case; !seen[c] {
				seen[c] = true
				reps = append(reps, j)
			}
		}
		for _, j := range reps {
			k.explainConsol(fmt.Sprintf("%s: sublayer %d (representative)", name, j+1), j, l, useCc)
		}
		var sum float64
		for j := lr.first; j < lr.end; j++ {
			sum += k.r.Sub[j].Sc
		}
		ref := refMv
		if useCc {
			ref = refCc
		}
		sym := ix("s_c,", i)
		if k.c.SkemptonBjerrum.Set {
			sym = ix("s_oed,", i)
		}
		k.take(cs, sym, trace.Summed, sum, "mm", ref,
			fmt.Sprintf("consolidation settlement of %s: sum of the Δs column over its %d sublayers, %d to %d (stress table)", name, lr.end-lr.first, lr.first+1, lr.end))
		if oc := (l.OCR.Set && l.OCR.V > 1) || (l.SigmaP.Set && l.SigmaP.V > k.r.Sub[lr.first].SigmaV0Eff); oc && mode == Combined && !k.c.SkemptonBjerrum.Set && k.imm[i] != "" {
			k.warn(cs, "oc-sum", trace.SevCaution, refSB, fmt.Sprintf("%s: over-consolidated clay: the immediate settlement and the oedometer settlement are simply added, which overstates the total (the oedometer value holds part of the immediate movement); set skempton_bjerrum = A (about 0.2 to 0.5 for over-consolidated clay) to apply the Skempton–Bjerrum correction", name))
		}
		if l.Cc.Set && !useCc {
			k.warn(cs, "cc-no-e0", trace.SevNote, trace.Ref{}, fmt.Sprintf("%s: C_c given without e_0, so m_v is used", name))
		}
		if low {
			k.warn(cs, "sigma-p-low", trace.SevCaution, trace.Ref{}, fmt.Sprintf("%s: σ′_p is below σ′_v0 in part of the layer (under-consolidated as given); σ′_p = σ′_v0 used there", name))
		}
	}
	return nil
}

// ccCase names where σ′_v0 and σ′_f sit relative to σ′_p.
func ccCase(s0, sf, sp float64) string {
	switch {
	case s0 >= sp:
		return "NC"
	case sf <= sp:
		return "OC"
	}
	return "OC-NC"
}

// ccSettle is the settlement of a sublayer of thickness h by the C_c/C_r
// form (Terzaghi, Peck & Mesri 1996): h/(1 + e_0)·Δe with Δe from the
// recompression line up to σ′_p and the virgin line beyond it.
func ccSettle(c string, h, e0, cc, cr, s0, sf, sp float64) float64 {
	switch c {
	case "NC":
		return cc * h / (1 + e0) * math.Log10(sf/s0)
	case "OC":
		return cr * h / (1 + e0) * math.Log10(sf/s0)
	}
	return h / (1 + e0) * (cr*math.Log10(sp/s0) + cc*math.Log10(sf/sp))
}

var (
	fxMv   = trace.Mul(trace.S("m_v"), trace.S("Delta_sigma"), trace.S("h"))
	fxNC   = trace.Mul(trace.Div(trace.Mul(trace.S("C_c"), trace.S("h")), trace.Add(trace.N(1), trace.S("e_0"))), trace.Fn("log10", trace.Div(trace.S("sigma'_f"), trace.S("sigma'_v0"))))
	fxOC   = trace.Mul(trace.Div(trace.Mul(trace.S("C_r"), trace.S("h")), trace.Add(trace.N(1), trace.S("e_0"))), trace.Fn("log10", trace.Div(trace.S("sigma'_f"), trace.S("sigma'_v0"))))
	fxOCNC = trace.Mul(trace.Div(trace.S("h"), trace.Add(trace.N(1), trace.S("e_0"))), trace.Add(trace.Mul(trace.S("C_r"), trace.Fn("log10", trace.Div(trace.S("sigma'_p"), trace.S("sigma'_v0")))), trace.Mul(trace.S("C_c"), trace.Fn("log10", trace.Div(trace.S("sigma'_f"), trace.S("sigma'_p"))))))
	fxOCRp = trace.Mul(trace.S("OCR"), trace.S("sigma'_v0"))
	fxSe   = trace.S("sigma'_v0")
)

func (k *calc) explainConsol(cs string, j int, l site.Layer, useCc bool) {
	se, ds, sf := k.explainSub(cs, j)
	s := k.r.Sub[j]
	h := val("h", s.H, "m")
	if !useCc {
		k.eval(cs, "Delta_s", fxMv, []trace.Value{val("m_v", l.Mv.V, "m2/MN"), val("Delta_sigma", ds, "kPa"), h}, "mm", refMv, "settlement of the sublayer")
		return
	}
	var sp float64
	switch {
	case l.SigmaP.Set && l.SigmaP.V >= se:
		sp = k.take(cs, "sigma'_p", trace.Given, l.SigmaP.V, "kPa", trace.Ref{}, "preconsolidation pressure, given")
	case l.SigmaP.Set:
		sp = k.eval(cs, "sigma'_p", fxSe, []trace.Value{val("sigma'_v0", se, "kPa")}, "kPa", trace.Ref{}, "σ′_p given is below σ′_v0: σ′_p = σ′_v0 used")
	case l.OCR.Set:
		sp = k.eval(cs, "sigma'_p", fxOCRp, []trace.Value{val("OCR", l.OCR.V, ""), val("sigma'_v0", se, "kPa")}, "kPa", trace.Ref{}, "preconsolidation pressure from OCR")
	default:
		sp = k.eval(cs, "sigma'_p", fxSe, []trace.Value{val("sigma'_v0", se, "kPa")}, "kPa", trace.Ref{}, "normally consolidated: σ′_p = σ′_v0")
	}
	e0 := val("e_0", l.E0.V, "")
	switch ccCase(se, sf, sp) {
	case "NC":
		k.eval(cs, "Delta_s", fxNC,
			[]trace.Value{val("C_c", l.Cc.V, ""), h, e0, val("sigma'_f", sf, "kPa"), val("sigma'_v0", se, "kPa")}, "mm", refCc, "normally consolidated: σ′_v0 ≥ σ′_p")
	case "OC":
		k.eval(cs, "Delta_s", fxOC,
			[]trace.Value{val("C_r", l.Cr.V, ""), h, e0, val("sigma'_f", sf, "kPa"), val("sigma'_v0", se, "kPa")}, "mm", refCc, "over-consolidated, σ′_f ≤ σ′_p: recompression only")
	default:
		k.eval(cs, "Delta_s", fxOCNC,
			[]trace.Value{h, e0, val("C_r", l.Cr.V, ""), val("C_c", l.Cc.V, ""), val("sigma'_p", sp, "kPa"), val("sigma'_v0", se, "kPa"), val("sigma'_f", sf, "kPa")}, "mm", refCc,
			"over-consolidated, σ′_f crosses σ′_p: recompression to σ′_p then virgin compression; "+noteE0)
	}
}

// skemptonBjerrum applies μ = A + α(1 − A) to each consolidating layer,
// α = ∫Δσ_3 dz / ∫Δσ_1 dz over the layer from the elastic stresses on the
// centre line (ν = 0.5): a circle of equal area for a rectangle or square,
// the strip solution for a strip (Skempton & Bjerrum 1957), with A replaced
// by 0.866A + 0.211 for a strip (plane strain; Scott 1963).
func (k *calc) skemptonBjerrum(A float64) {
	f := k.f
	stripShape := f.Shape == site.Strip
	R := math.Sqrt(f.Area() / math.Pi)
	noted := false
	for li := range k.r.Layers {
		lr := &k.r.Layers[li]
		if lr.SOed <= 0 {
			continue
		}
		var s1, s3 float64
		for _, s := range k.r.Sub {
			if s.Layer != lr.Layer || s.Sc == 0 {
				continue
			}
			z := s.Z - f.D
			var d1, d3 float64
			if stripShape {
				a := 2 * math.Atan(f.B/(2*z))
				d1, d3 = (a+math.Sin(a))/math.Pi, (a-math.Sin(a))/math.Pi
			} else {
				c := z / math.Hypot(R, z)
				d1 = 1 - c*c*c
				d3 = 0.5 * (2 - 3*c + c*c*c)
			}
			s1 += d1 * s.H
			s3 += d3 * s.H
		}
		alpha := s3 / s1
		cs := ""
		if k.full {
			cs = lr.Name + ": Skempton–Bjerrum"
		}
		geom := "a circle of equal area, R = √(A/π)"
		if stripShape {
			geom = "the strip"
		}
		k.take(cs, "alpha_SB", trace.Summed, alpha, "", refSB, "α = ∫Δσ_3 dz / ∫Δσ_1 dz over the layer, elastic stresses on the centre line of "+geom+", ν = 0.5")
		if !noted && !stripShape && f.Shape != site.Circle {
			k.warn(cs, "sb-circle", trace.SevNote, refSB, "the Skempton–Bjerrum factor α is taken for a circle of equal area")
			noted = true
		}
		var mu float64
		if stripShape {
			a := k.eval(cs, "A_ps", fxAps, []trace.Value{val("A", A, "")}, "", trace.Ref{Source: Scott1963, Clause: "plane strain: Δu = Δσ_3 + (0.866A + 0.211)(Δσ_1 − Δσ_3)"}, "pore-pressure coefficient for plane strain")
			mu = k.eval(cs, "mu", fxMuPs, []trace.Value{val("A_ps", a, ""), val("alpha_SB", alpha, "")}, "", refSB, "Skempton–Bjerrum settlement coefficient (strip)")
		} else {
			mu = k.eval(cs, "mu", fxMu, []trace.Value{val("A", A, ""), val("alpha_SB", alpha, "")}, "", refSB, "Skempton–Bjerrum settlement coefficient")
		}
		oed := ix("s_oed,", lr.Layer)
		lr.Mu = mu
		lr.Sc = k.eval(cs, ix("s_c,", lr.Layer), trace.Mul(trace.S("mu"), trace.S(oed)), []trace.Value{val("mu", mu, ""), val(oed, lr.SOed, "mm")}, "mm", refSB, "consolidation settlement corrected for pore pressures under three-dimensional loading")
		for j := range k.r.Sub {
			if k.r.Sub[j].Layer == lr.Layer {
				k.r.Sub[j].Sc *= mu
			}
		}
	}
}

var (
	fxAps  = trace.Add(trace.Mul(trace.N(0.866), trace.S("A")), trace.N(0.211))
	fxMuPs = trace.Add(trace.S("A_ps"), trace.Mul(trace.S("alpha_SB"), trace.Sub(trace.N(1), trace.S("A_ps"))))
	fxMu   = trace.Add(trace.S("A"), trace.Mul(trace.S("alpha_SB"), trace.Sub(trace.N(1), trace.S("A"))))
)

func join(a, b string) string {
	if a == "" {
		return b
	}
	return a + "+" + b
}
