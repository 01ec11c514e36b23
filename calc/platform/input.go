package platform

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/site"
)

// SubgradeKind says which branch of the method applies.
type SubgradeKind int

const (
	// Cohesive: the subgrade acts undrained with c_u (clays and silts).
	Cohesive SubgradeKind = iota
	// Granular: the subgrade acts drained with φ′ (sands and gravels).
	Granular
)

func (k SubgradeKind) String() string {
	if k == Granular {
		return "granular"
	}
	return "cohesive"
}

// CaseKind is one of the method's two loading cases.
type CaseKind int

const (
	// Case1: the operator is unlikely to be able to help recovery from an
	// imminent failure (standing, travelling, lifting; BR 470's case 1).
	Case1 CaseKind = iota
	// Case2: the operator can control the load safely (drilling,
	// extracting; BR 470's case 2).
	Case2
)

func (k CaseKind) String() string {
	if k == Case2 {
		return "case 2"
	}
	return "case 1"
}

// Default load factors (BR 470 Appendix A; see sources.go for how each
// was confirmed). With a platform: 1.6 (case 1) and 1.2 (case 2); on the
// subgrade alone, the check whether a platform is needed: 2.0 and 1.5.
const (
	Factor1     = 1.6
	Factor2     = 1.2
	FactorNone1 = 2.0
	FactorNone2 = 1.5
)

// Defaults of the thickness limits.
const (
	DefaultDMin      = 0.3 // m, the method's least platform thickness
	DefaultDMaxRatio = 1.5 // D_max = 1.5 W, the thickness beyond which the method is not used
)

// Platform is the granular platform material.
type Platform struct {
	Phi   float64 // φ′_p, rad, [25°, 50°) (the method's chart covers 35°–45°: a caution outside)
	Gamma float64 // γ_p, N/m³, 10–30 kN/m³
}

// Subgrade is the natural ground below the platform.
type Subgrade struct {
	Kind  SubgradeKind
	Cu    float64 // c_u, Pa, cohesive: 1–1000 kPa (the method's range 20–80 kPa: a caution outside)
	Phi   float64 // φ′_s, rad, granular: [15°, 50°)
	Gamma float64 // γ_s, N/m³, 10–30 kN/m³: the N_γ term of a granular subgrade and the EN 1997-1 comparison (refused when neither uses it)
}

// Case is one loading case: the characteristic track (or outrigger)
// bearing pressure on a loaded area W × L, W the width (the shorter side).
type Case struct {
	Name string   // printed; "" means "Case 1" or "Case 2" by Kind
	Kind CaseKind // which default factors apply
	Q    float64  // q_k, characteristic bearing pressure, Pa, (0, 5000] kPa
	W    float64  // width of the loaded area (track width), m, [0.1, 10]
	L    float64  // length of the loaded area (track bearing length), m, W ≤ L ≤ 100
	// Factor is the load factor with a platform; 0 means Factor1 or
	// Factor2 by Kind. (0, 5].
	Factor float64
	// FactorNone is the load factor of the check on the subgrade alone;
	// 0 means FactorNone1 or FactorNone2 by Kind. (0, 5].
	FactorNone float64
}

// Label is the case's printed name.
func (c Case) Label() string {
	if c.Name != "" {
		return c.Name
	}
	if c.Kind == Case2 {
		return "Case 2"
	}
	return "Case 1"
}

func (c Case) factor() float64 {
	switch {
	case c.Factor != 0:
		return c.Factor
	case c.Kind == Case2:
		return Factor2
	}
	return Factor1
}

func (c Case) factorNone() float64 {
	switch {
	case c.FactorNone != 0:
		return c.FactorNone
	case c.Kind == Case2:
		return FactorNone2
	}
	return FactorNone1
}

// EC7 sets up the EN 1997-1 two-layer check printed beside the method
// for comparison (calc/bearing, a footing of the case's W × L on the
// platform over the subgrade).
type EC7 struct {
	// Off leaves the comparison out.
	Off bool
	// Kind of the characteristic action V = q_k·W·L (the zero value is
	// permanent).
	Kind site.Kind
	// Options of the bearing check. Zero values are set for the
	// comparison: drainage undrained over a cohesive subgrade and drained
	// over a granular one, sliding no, local shear no; the approach is
	// DA1 unless given.
	Options bearing.Options
}

// Options are the block's options.
type Options struct {
	// KpTanDelta replaces the punching coefficient K_p·tanδ read from the
	// method's chart (bearing.KpTanDelta), (0, 50].
	KpTanDelta site.Opt
	// DepthTerm multiplies the punching term over a granular subgrade by
	// (1 + 2D/W). Off by default: the public reproductions of the method
	// found print the granular equation without it; the factor was
	// recalled from memory and is not confirmed (see sources.go).
	DepthTerm bool
	// DMin is the least thickness, m; 0 means DefaultDMin. [0.1, 2].
	DMin float64
	// DMaxRatio sets D_max = DMaxRatio·W, the thickness beyond which the
	// method is not used; 0 means DefaultDMaxRatio. [0.5, 5].
	DMaxRatio float64
	// Step rounds a solved thickness up to a multiple of Step, m; 0 means
	// no rounding. [0.005, 0.5].
	Step float64
	// EC7 is the comparison with the EN 1997-1 two-layer check.
	EC7 EC7
}

// Input is one platform design.
type Input struct {
	Platform Platform
	Subgrade Subgrade
	Cases    []Case // one or two
	// D is the platform thickness to check, m, [0.1, 20]; not set: the
	// thickness is solved for.
	D       site.Opt
	Options Options
}

const (
	kPa  = 1e3
	kN   = 1e3
	kNm3 = 1e3
	deg  = math.Pi / 180
)

func (o Options) dMin() float64 {
	if o.DMin == 0 {
		return DefaultDMin
	}
	return o.DMin
}

func (o Options) dMaxRatio() float64 {
	if o.DMaxRatio == 0 {
		return DefaultDMaxRatio
	}
	return o.DMaxRatio
}

// validate checks every input and returns them all as site.Errors.
func validate(in Input) error {
	var errs site.Errors
	const w = "platform"
	rng := func(where, p string, v, scale, lo, hi float64, unit string, open bool) {
		errs.Range(where, p, v, scale, lo, hi, open, unit)
	}
	below := func(where, p string, v, lo, hi float64, why string) {
		d := v / deg
		if !(d >= lo && d < hi) {
			errs = append(errs, &site.RangeError{Where: where, Param: p, Value: d, Min: lo, Max: hi, Unit: "deg", Reason: why})
		}
	}
	below(w, "phi'_p", in.Platform.Phi, 25, 50, "a platform material weaker than 25 deg is not a granular platform; 50 deg excluded")
	rng(w, "gamma_p", in.Platform.Gamma, kNm3, 10, 30, "kN/m3", false)
	s := in.Subgrade
	switch s.Kind {
	case Cohesive:
		rng(w+": subgrade", "c_u", s.Cu, kPa, 1, 1000, "kPa", false)
	case Granular:
		below(w+": subgrade", "phi'_s", s.Phi, 15, 50, "50 deg excluded")
	default:
		errs = append(errs, &site.InputError{Where: w + ": subgrade", Param: "kind", Msg: "expected cohesive or granular"})
	}
	switch {
	case s.Kind == Granular || !in.Options.EC7.Off:
		rng(w+": subgrade", "gamma_s", s.Gamma, kNm3, 10, 30, "kN/m3", false)
	case s.Gamma != 0:
		errs = append(errs, &site.InputError{Where: w + ": subgrade", Param: "gamma_s", Msg: "the unit weight of a cohesive subgrade is used only by the EN 1997-1 comparison, which is off"})
	}
	if n := len(in.Cases); n < 1 || n > 2 {
		errs = append(errs, &site.InputError{Where: w, Param: "cases", Msg: fmt.Sprintf("the method has one or two loading cases; %d given", n)})
	}
	seen := map[string]bool{}
	for _, c := range in.Cases {
		cw := w + ": " + c.Label()
		key := strings.ToLower(c.Label())
		if seen[key] {
			errs = append(errs, &site.InputError{Where: cw, Param: "name", Msg: "each loading case needs its own name"})
		}
		seen[key] = true
		if c.Kind != Case1 && c.Kind != Case2 {
			errs = append(errs, &site.InputError{Where: cw, Param: "kind", Msg: "expected case 1 or case 2"})
		}
		rng(cw, "q_k", c.Q, kPa, 0, 5000, "kPa", true)
		rng(cw, "W", c.W, 1, 0.1, 10, "m", false)
		rng(cw, "L", c.L, 1, 0.1, 100, "m", false)
		if c.L < c.W {
			errs = append(errs, &site.InputError{Where: cw, Param: "L", Msg: fmt.Sprintf("L = %g m is less than W = %g m: W is the width, the shorter side", c.L, c.W)})
		}
		if c.Factor != 0 {
			rng(cw, "gamma_q", c.Factor, 1, 0, 5, "", true)
		}
		if c.FactorNone != 0 {
			rng(cw, "gamma_q0", c.FactorNone, 1, 0, 5, "", true)
		}
	}
	if in.D.Set {
		rng(w, "D", in.D.V, 1, 0.1, 20, "m", false)
	}
	o := in.Options
	if o.KpTanDelta.Set {
		rng(w, "K_p tan(delta)", o.KpTanDelta.V, 1, 0, 50, "", true)
	}
	if o.DMin != 0 {
		rng(w, "D_min", o.DMin, 1, 0.1, 2, "m", false)
	}
	if o.DMaxRatio != 0 {
		rng(w, "D_max/W", o.DMaxRatio, 1, 0.5, 5, "", false)
	}
	if o.Step != 0 {
		rng(w, "Delta_D", o.Step, 1, 0.005, 0.5, "m", false)
	}
	if o.DepthTerm && s.Kind != Granular {
		errs = append(errs, &site.InputError{Where: w, Param: "depth_term", Msg: "the (1 + 2D/W) term belongs to the granular-subgrade equation; the subgrade is cohesive"})
	}
	if k := o.EC7.Kind; k != site.Permanent && k != site.Variable {
		errs = append(errs, &site.InputError{Where: w, Param: "EN 1997-1 action kind", Msg: "expected permanent or variable"})
	}
	return errs.Err()
}
