package settle

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
)

// Year is the length of a year in seconds (365.25 days); times are SI.
const Year = 365.25 * 86400

// Defaults.
const (
	DefaultLimit     = 0.025     // m: the 25 mm limit (common practice)
	DefaultSublayers = 40        // sublayers over the zone of influence
	DefaultRatio     = 0.1       // Δσ = 0.1 σ′_v0 at the bottom of the zone (common practice)
	DefaultLife      = 50 * Year // design working life, EN 1990 Table 2.1, category 4
	DefaultNu        = 0.3       // drained Poisson's ratio when not given (common practice)
	maxSublayers     = 5000
	maxTime          = 1000 * Year
)

// Method is a settlement method.
type Method int

const (
	// Auto chooses from the layers' data: see the package documentation.
	Auto Method = iota
	// Elastic: Steinbrenner's influence factors with layer superposition.
	Elastic
	// Consolidation: one-dimensional consolidation by sublayers (m_v or
	// C_c/C_r/σ′_p), Terzaghi's theory for time, secondary compression.
	Consolidation
	// Schmertmann: strain influence factors for sand (1978, or 1970).
	Schmertmann
	// BurlandBurbidge: the SPT method for sand and gravel (1985).
	BurlandBurbidge
	// Combined: immediate settlement by Elastic plus consolidation of the
	// fine-grained layers; what Auto chooses where fine layers are present.
	Combined
)

var methodNames = [...]string{"auto", "elastic", "consolidation", "schmertmann", "burland-burbidge", "elastic+consolidation"}

func (m Method) String() string {
	if m >= 0 && int(m) < len(methodNames) {
		return methodNames[m]
	}
	return fmt.Sprintf("Method(%d)", int(m))
}

// ParseMethod reads a method as written in a sheet.
func ParseMethod(s string) (Method, bool) {
	for i, n := range methodNames {
		if n == s {
			return Method(i), true
		}
	}
	return 0, false
}

// DepthRule fixes the bottom of the zone of influence for the elastic and
// consolidation methods (Schmertmann and Burland & Burbidge use their own).
type DepthRule int

const (
	// DepthStress: down to where Δσ falls to Ratio·σ′_v0 (default 0.1),
	// but at least one footing width below the base (common practice).
	DepthStress DepthRule = iota
	// DepthWidth: Widths·B below the base (default 2 for a square or
	// circle rising linearly in L/B to 4 for L/B ≥ 10, as Schmertmann et
	// al. 1978 for strain influence).
	DepthWidth
	// DepthFixed: to the depth Z below ground level.
	DepthFixed
)

func (d DepthRule) String() string {
	switch d {
	case DepthStress:
		return "stress-ratio"
	case DepthWidth:
		return "width"
	case DepthFixed:
		return "fixed"
	}
	return fmt.Sprintf("DepthRule(%d)", int(d))
}

// Depth is the depth-of-influence rule with its parameter.
type Depth struct {
	Rule   DepthRule
	Ratio  site.Opt // DepthStress: Δσ/σ′_v0 at the bottom, (0, 1]; default 0.1
	Widths site.Opt // DepthWidth: multiple of B below the base, (0, 50]
	Z      site.Opt // DepthFixed: depth below ground level, m, > D, ≤ 400
}

// Drainage is how a consolidating layer drains.
type Drainage int

const (
	// DrainAuto: a boundary drains where the layer meets a coarse-grained
	// layer or the ground surface (or an excavation for the footing); the
	// base of the last layer and a boundary with a fine layer do not.
	DrainAuto Drainage = iota
	DrainOneWay
	DrainTwoWay
)

func (d Drainage) String() string {
	switch d {
	case DrainOneWay:
		return "one-way"
	case DrainTwoWay:
		return "two-way"
	}
	return "auto"
}

// Grain is the soil description Burland & Burbidge correct N for.
type Grain int

const (
	Sand      Grain = iota // no correction
	FineSilty              // very fine or silty sand below the water table: N′ = 15 + (N − 15)/2 for N > 15
	Gravel                 // gravel or sandy gravel: N′ = 1.25 N
)

// Input is one settlement calculation.
type Input struct {
	Ground  site.Ground
	Footing site.Footing

	// Exactly one of Q and V: the gross bearing pressure at the underside
	// of the footing for the serviceability combination (Pa, (0, 20] MPa),
	// or the SLS vertical load (N, or N/m for a strip), q = V/A.
	Q, V site.Opt

	Method Method
	Stress stress.Method // Boussinesq (default) or Spread
	Spread site.Opt      // spread angle to the vertical, rad; default atan(1/2) (2:1)
	At     stress.Point  // centre (default), corner, characteristic; MidB, MidL (middle of a long, short side)
	Rigid  bool          // rigid footing: stresses and settlement at the characteristic point when At is Centre

	Limit     site.Opt  // settlement limit, m, (0, 1]; default 25 mm
	Times     []float64 // times after loading for the settlement–time curve, s, [0, 1000 yr]
	Sublayers int       // total sublayers over the zone, 1–5000; 0 means 40
	Depth     Depth
	Drainage  Drainage
	Life      site.Opt // time for secondary compression and creep, s, [0.1, 1000] yr; default 50 yr
	Tp        site.Opt // end of primary consolidation, s; default t_95 of each layer

	// SkemptonBjerrum applies the Skempton & Bjerrum (1957) correction to
	// consolidation settlement with this pore-pressure coefficient A, 0–1.5.
	SkemptonBjerrum site.Opt

	Schmertmann1970 bool  // the 1970 strain influence diagram and E = 2 q_c
	Fluctuating     bool  // Burland & Burbidge time factor for fluctuating loads
	Grain           Grain // Burland & Burbidge N correction for the granular layers
}

// config is an Input with its defaults applied and validated.
type config struct {
	Input
	q        float64
	area     float64
	limit    float64
	life     float64
	n        int
	angle    float64
	point    stress.Point
	rigidSet bool // the point was moved to the characteristic point for a rigid footing
}

func (in Input) validate() (*config, error) {
	var errs site.Errors
	if err := in.Ground.Validate(); err != nil {
		errs = append(errs, err)
	}
	if err := in.Footing.Validate(); err != nil {
		errs = append(errs, err)
	}
	w := in.Footing.Name
	c := &config{Input: in}
	c.area = in.Footing.Area()
	switch {
	case in.Q.Set && in.V.Set:
		errs = append(errs, &site.InputError{Where: w, Param: "q", Msg: "give the bearing pressure q or the vertical load V, not both"})
	case in.Q.Set:
		errs = check(errs, w, "q", in.Q.V, 1e3, 0, 20000, true, "kPa")
		c.q = in.Q.V
	case in.V.Set:
		unit := "kN"
		if in.Footing.Shape == site.Strip {
			unit = "kN/m"
		}
		errs = check(errs, w, "V", in.V.V, 1e3, 0, 1e7, true, unit)
		if c.area > 0 {
			c.q = in.V.V / c.area
			errs = check(errs, w, "q = V/A", c.q, 1e3, 0, 20000, true, "kPa")
		}
	default:
		errs = append(errs, &site.InputError{Where: w, Param: "q", Msg: "no load: give the SLS bearing pressure q or the SLS vertical load V"})
	}
	if in.Method < Auto || in.Method > Combined {
		errs = append(errs, &site.InputError{Where: w, Param: "method", Msg: "expected auto, elastic, consolidation, schmertmann or burland-burbidge"})
	}
	if in.Stress != stress.Boussinesq && in.Stress != stress.Spread {
		errs = append(errs, &site.InputError{Where: w, Param: "stress", Msg: "expected boussinesq or 2:1"})
	}
	c.angle = stress.DefaultAngle
	if in.Spread.Set {
		errs = check(errs, w, "spread angle", in.Spread.V, math.Pi/180, 0, 60, true, "deg")
		c.angle = in.Spread.V
	}
	if in.At < stress.Centre || in.At > stress.MidL {
		errs = append(errs, &site.InputError{Where: w, Param: "at", Msg: "expected centre, corner or characteristic"})
	}
	c.point = in.At
	if in.Rigid && in.At == stress.Centre {
		c.point, c.rigidSet = stress.Characteristic, true
	}
	c.limit = in.Limit.Or(DefaultLimit)
	if in.Limit.Set {
		errs = check(errs, w, "limit", in.Limit.V, 1e-3, 0, 1000, true, "mm")
	}
	for _, t := range in.Times {
		errs = check(errs, w, "time", t, Year, 0, 1000, false, "yr")
	}
	c.n = in.Sublayers
	if c.n == 0 {
		c.n = DefaultSublayers
	}
	if c.n < 1 || c.n > maxSublayers {
		errs = append(errs, &site.RangeError{Where: w, Param: "sublayers", Value: float64(in.Sublayers), Min: 1, Max: maxSublayers})
	}
	switch in.Depth.Rule {
	case DepthStress:
		if in.Depth.Ratio.Set {
			errs = check(errs, w, "depth ratio", in.Depth.Ratio.V, 1, 0, 1, true, "")
		}
	case DepthWidth:
		if in.Depth.Widths.Set {
			errs = check(errs, w, "depth widths", in.Depth.Widths.V, 1, 0, 50, true, "")
		}
	case DepthFixed:
		if !in.Depth.Z.Set {
			errs = append(errs, &site.InputError{Where: w, Param: "depth", Msg: "a fixed depth of influence needs its depth below ground level"})
		} else if d := in.Footing.D; !(in.Depth.Z.V > d) || in.Depth.Z.V > 400 {
			errs = append(errs, &site.RangeError{Where: w, Param: "depth", Value: in.Depth.Z.V, Min: d, Max: 400, Unit: "m", Reason: "must lie below the underside of the footing"})
		}
	default:
		errs = append(errs, &site.InputError{Where: w, Param: "depth", Msg: "unknown depth-of-influence rule"})
	}
	if in.Drainage < DrainAuto || in.Drainage > DrainTwoWay {
		errs = append(errs, &site.InputError{Where: w, Param: "drainage", Msg: "expected auto, one-way or two-way"})
	}
	c.life = in.Life.Or(DefaultLife)
	if in.Life.Set {
		errs = check(errs, w, "life", in.Life.V, Year, 0.1, 1000, false, "yr")
	}
	if in.Tp.Set {
		errs = check(errs, w, "t_p", in.Tp.V, Year, 0, 1000, true, "yr")
	}
	if in.SkemptonBjerrum.Set {
		errs = check(errs, w, "Skempton–Bjerrum A", in.SkemptonBjerrum.V, 1, 0, 1.5, false, "")
	}
	if in.Grain < Sand || in.Grain > Gravel {
		errs = append(errs, &site.InputError{Where: w, Param: "grain", Msg: "expected sand, fine-silty or gravel"})
	}
	if len(errs) > 0 {
		return nil, one(errs)
	}
	return c, nil
}

// check appends a RangeError when v (SI) / scale lies outside [min, max].
func check(errs site.Errors, where, param string, v, scale, min, max float64, openMin bool, unit string) site.Errors {
	errs.Range(where, param, v, scale, min, max, openMin, unit)
	return errs
}
