package site

import (
	"fmt"
	"math"
	"sort"
	"strings"
)

// Unit scales used for the ranges below: SI value = display value × scale.
const (
	kPa           = 1e3
	kNm3          = 1e3
	m2MN          = 1e-6
	m2yr          = 1.0 / (365.25 * 86400)
	MPa           = 1e6
	deg           = math.Pi / 180
	GammaWDefault = 9.81e3 // N/m³, unit weight of water (common practice)
)

// SoilType says how a layer drains under a footing load.
type SoilType int

const (
	// Auto: fine-grained if c_u is given, otherwise coarse-grained.
	Auto SoilType = iota
	Coarse
	Fine
)

// Layer is one stratum. Top is its depth below ground level; it extends to
// the next layer's top (the last layer extends without limit). Ranges are
// inclusive unless marked open.
type Layer struct {
	Name     string
	Type     SoilType
	Top      float64 // m, 0–200; the first layer's top is 0
	Gamma    float64 // bulk unit weight above the water table, N/m³, 5–30 kN/m³
	GammaSat Opt     // saturated unit weight, N/m³, ≥ Gamma, ≤ 30 kN/m³ (default Gamma)
	Cu       Opt     // undrained shear strength, Pa, (0, 2000] kPa
	Phi      Opt     // effective angle of shearing resistance φ′ (peak), rad, [0, 50) deg
	PhiCv    Opt     // critical-state angle φ′_cv, rad, [0, 50) deg, ≤ Phi; base friction (EN 1997-1 6.5.3(10))
	C        Opt     // effective cohesion c′, Pa, 0–500 kPa
	Eu       Opt     // undrained Young's modulus, Pa, (0, 10000] MPa
	E        Opt     // drained Young's modulus E′, Pa, (0, 10000] MPa
	Nu       Opt     // Poisson's ratio, 0–0.5
	Mv       Opt     // coefficient of volume compressibility, 1/Pa, (0, 10] m²/MN
	Cv       Opt     // coefficient of consolidation, m²/s, (0, 10000] m²/yr
	Cc       Opt     // compression index, (0, 10]
	Cr       Opt     // recompression (swelling) index, (0, 10], ≤ Cc
	E0       Opt     // initial void ratio, (0, 15]
	SigmaP   Opt     // preconsolidation pressure σ′_p, Pa, (0, 10000] kPa
	OCR      Opt     // overconsolidation ratio, 1–50 (alternative to SigmaP)
	Calpha   Opt     // secondary compression index C_α, 0–1
	N        Opt     // SPT blow count N (as measured), 0–300
	Qc       Opt     // CPT cone resistance, Pa, (0, 100] MPa
	Dr       Opt     // relative density (fraction), 0–1
}

// Fine reports whether the layer is treated as fine-grained (undrained in
// the short term): its Type if set, else whether c_u is given.
func (l Layer) Fine() bool {
	if l.Type == Auto {
		return l.Cu.Set
	}
	return l.Type == Fine
}

// GammaSatOr returns γ_sat, defaulting to γ.
func (l Layer) GammaSatOr() float64 { return l.GammaSat.Or(l.Gamma) }

// Ground is the ground model: layers from ground level down, groundwater.
type Ground struct {
	Name   string
	Layers []Layer
	Water  Opt     // depth of the groundwater table below ground level, m, −50 to 200 (negative: free water above ground level, a flooded or tidal site); not set = no groundwater in the depth of interest
	GammaW float64 // unit weight of water, N/m³, 9–10.5 kN/m³; 0 means GammaWDefault
	// Platform says the first layer is a granular working platform laid
	// on the layer below it (BR 470), as the user states it (platform =
	// yes): it needs a layer below and must be coarse-grained.
	Platform bool
}

// PlatformDepth is the thickness of the working platform (the top of the
// second layer), and false when the ground model has none.
func (g Ground) PlatformDepth() (float64, bool) {
	if !g.Platform || len(g.Layers) < 2 {
		return 0, false
	}
	return g.Layers[1].Top, true
}

// Gw returns the unit weight of water, applying the default.
func (g Ground) Gw() float64 {
	if g.GammaW == 0 {
		return GammaWDefault
	}
	return g.GammaW
}

// Validate checks every layer and the water level, returning all problems.
func (g Ground) Validate() error {
	var errs Errors
	if len(g.Layers) == 0 {
		errs = append(errs, &InputError{Where: g.Name, Msg: "the ground model has no layers"})
	}
	if g.Platform && len(g.Layers) == 1 {
		errs = append(errs, &InputError{Where: g.Name, Param: "platform", Msg: "a working platform lies on the ground below it: the ground model needs a second layer"})
	}
	if g.Platform && len(g.Layers) > 0 && g.Layers[0].Fine() {
		errs = append(errs, &InputError{Where: g.Name, Param: "platform", Msg: "the working platform (the first layer) must be granular: give it type coarse, or no c_u"})
	}
	seen := map[string]int{}
	for i, l := range g.Layers {
		w := fmt.Sprintf("layer %d", i+1)
		if l.Name != "" {
			w = fmt.Sprintf("layer %q", l.Name)
		}
		n := i + 1
		if key := strings.ToLower(strings.TrimSpace(l.Name)); key != "" {
			if first, dup := seen[key]; dup {
				errs = append(errs, &InputError{Where: w, Layer: n, Msg: fmt.Sprintf("its name is already that of layer %d: each layer of a ground model needs its own name (its cells are named by it)", first)})
			} else {
				seen[key] = n
			}
		}
		if i == 0 && l.Top != 0 {
			errs = append(errs, &InputError{Where: w, Layer: n, Param: "top", Msg: fmt.Sprintf("the first layer must start at ground level (top = 0 m), not %g m", l.Top)})
		}
		if i > 0 && l.Top <= g.Layers[i-1].Top {
			errs = append(errs, &InputError{Where: w, Layer: n, Param: "top", Msg: fmt.Sprintf("layers must be listed from the top down: top %g m is not below the layer above (%g m)", l.Top, g.Layers[i-1].Top)})
		}
		errs.checkLayer(w, n, "top", l.Top, 1, 0, 200, false, "m")
		errs.checkLayer(w, n, "gamma", l.Gamma, kNm3, 5, 30, false, "kN/m3")
		if l.GammaSat.Set {
			errs.checkLayer(w, n, "gamma_sat", l.GammaSat.V, kNm3, 5, 30, false, "kN/m3")
			if l.GammaSat.V < l.Gamma {
				errs = append(errs, &RangeError{Where: w, Layer: n, Param: "gamma_sat", Value: l.GammaSat.V / kNm3, Min: l.Gamma / kNm3, Max: 30, Unit: "kN/m3", Reason: "saturated unit weight cannot be less than the bulk unit weight"})
			}
		}
		opt := func(name string, o Opt, scale, min, max float64, open bool, unit string) {
			if o.Set {
				errs.checkLayer(w, n, name, o.V, scale, min, max, open, unit)
			}
		}
		// Practical lower bounds (common practice): the softest clays and
		// peats have c_u of a few kPa and moduli of a few hundred kPa;
		// below these the methods give numbers without physical sense.
		opt("c_u", l.Cu, kPa, 1, 2000, false, "kPa")
		if l.Phi.Set && l.Phi.V/deg >= 50 {
			errs = append(errs, &RangeError{Where: w, Layer: n, Param: "phi'", Value: l.Phi.V / deg, Min: 0, Max: 50, Unit: "deg", Reason: "50 deg excluded: no soil reaches it and the factors are meaningless there"})
		} else {
			opt("phi'", l.Phi, deg, 0, 50, false, "deg")
		}
		if l.PhiCv.Set && l.PhiCv.V/deg >= 50 {
			errs = append(errs, &RangeError{Where: w, Layer: n, Param: "phi'_cv", Value: l.PhiCv.V / deg, Min: 0, Max: 50, Unit: "deg", Reason: "50 deg excluded: no soil reaches it"})
		} else {
			opt("phi'_cv", l.PhiCv, deg, 0, 50, false, "deg")
			if l.PhiCv.Set && l.Phi.Set && l.PhiCv.V > l.Phi.V {
				errs = append(errs, &RangeError{Where: w, Layer: n, Param: "phi'_cv", Value: l.PhiCv.V / deg, Min: 0, Max: l.Phi.V / deg, Unit: "deg", Reason: "the critical-state angle cannot exceed the peak angle φ′"})
			}
		}
		opt("c'", l.C, kPa, 0, 500, false, "kPa")
		opt("E_u", l.Eu, MPa, 0.1, 10000, false, "MPa")
		opt("E'", l.E, MPa, 0.1, 10000, false, "MPa")
		opt("nu", l.Nu, 1, 0, 0.5, false, "")
		opt("m_v", l.Mv, m2MN, 0, 10, true, "m2/MN")
		opt("c_v", l.Cv, m2yr, 0, 10000, true, "m2/yr")
		opt("C_c", l.Cc, 1, 0, 10, true, "")
		opt("C_r", l.Cr, 1, 0, 10, true, "")
		if l.Cr.Set && l.Cc.Set && l.Cr.V > l.Cc.V {
			errs = append(errs, &RangeError{Where: w, Layer: n, Param: "C_r", Value: l.Cr.V, Min: 0, Max: l.Cc.V, Reason: "the recompression index cannot exceed the compression index"})
		}
		opt("e_0", l.E0, 1, 0, 15, true, "")
		opt("sigma'_p", l.SigmaP, kPa, 0, 10000, true, "kPa")
		opt("OCR", l.OCR, 1, 1, 50, false, "")
		opt("C_alpha", l.Calpha, 1, 0, 1, false, "")
		opt("N", l.N, 1, 0, 300, false, "")
		opt("q_c", l.Qc, MPa, 0.1, 100, false, "MPa")
		opt("D_r", l.Dr, 1, 0, 1, false, "")
	}
	if g.Water.Set {
		errs.check(g.Name, "water", g.Water.V, 1, -50, 200, false, "m")
	}
	if g.GammaW != 0 {
		errs.check(g.Name, "gamma_w", g.GammaW, kNm3, 9, 10.5, false, "kN/m3")
	}
	return errs.Err()
}

// At returns the index of the layer containing depth z (a depth exactly at
// a boundary belongs to the layer below it).
func (g Ground) At(z float64) int {
	i := sort.Search(len(g.Layers), func(i int) bool { return g.Layers[i].Top > z }) - 1
	if i < 0 {
		i = 0
	}
	return i
}

// Bottom returns the depth of the bottom of layer i (+Inf for the last).
func (g Ground) Bottom(i int) float64 {
	if i+1 < len(g.Layers) {
		return g.Layers[i+1].Top
	}
	return math.Inf(1)
}

// Stratum is a slice of ground of one unit weight: part of a layer above
// or below the water table.
type Stratum struct {
	Layer    int     // index into Layers
	Top, Bot float64 // depths below ground level, m
	Wet      bool    // below the water table (saturated unit weight)
	Gamma    float64 // unit weight used, N/m³: γ above the water table, γ_sat below
}

// H is the stratum's thickness.
func (s Stratum) H() float64 { return s.Bot - s.Top }

// Strata splits the ground from ground level down to depth z into strata
// of one unit weight each, in order: every layer above z, cut at the water
// table. Strata of no thickness are left out.
func (g Ground) Strata(z float64) []Stratum {
	w := math.Inf(1)
	if g.Water.Set {
		w = g.Water.V
	}
	var out []Stratum
	for i, l := range g.Layers {
		top, bot := l.Top, math.Min(g.Bottom(i), z)
		if top >= z {
			break
		}
		if cut := math.Min(bot, w); cut > top {
			out = append(out, Stratum{Layer: i, Top: top, Bot: cut, Gamma: l.Gamma})
		}
		if cut := math.Max(top, w); bot > cut {
			out = append(out, Stratum{Layer: i, Top: cut, Bot: bot, Wet: true, Gamma: l.GammaSatOr()})
		}
	}
	return out
}

// Flood returns the depth of free water standing above ground level (m):
// −Water when the water table is above ground level, else 0.
func (g Ground) Flood() float64 {
	if g.Water.Set && g.Water.V < 0 {
		return -g.Water.V
	}
	return 0
}

// SigmaV returns the total vertical stress at depth z (Pa): the weight of
// any free water above ground level, γ_w·h_w0, plus the sum of
// γ·thickness above the water table and γ_sat·thickness below it over the
// strata above z (common practice; the standing water adds total stress
// and, through u = γ_w (z − z_w), the same pore pressure, so no effective
// stress: Craig's Soil Mechanics, 8th ed., §3.4 (from memory)).
func (g Ground) SigmaV(z float64) float64 {
	s := g.Gw() * g.Flood()
	for _, st := range g.Strata(z) {
		s += st.Gamma * st.H()
	}
	return s
}

// PoreP returns the hydrostatic pore pressure at depth z (Pa).
func (g Ground) PoreP(z float64) float64 {
	if !g.Water.Set || z <= g.Water.V {
		return 0
	}
	return (z - g.Water.V) * g.Gw()
}

// SigmaVEff returns the vertical effective stress σ′_v = σ_v − u at z (Pa).
func (g Ground) SigmaVEff(z float64) float64 { return g.SigmaV(z) - g.PoreP(z) }
