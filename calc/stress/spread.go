package stress

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
)

// DefaultAngle is the 2:1 spread: the load spreads at one horizontal to
// two vertical, an angle atan(1/2) ≈ 26.6° to the vertical (common
// practice; e.g. Holtz & Kovacs 1981).
var DefaultAngle = math.Atan(0.5)

func checkAngle(errs site.Errors, angle float64) site.Errors {
	if !(angle > 0) || angle >= math.Pi/3 {
		errs = append(errs, &site.RangeError{Param: "spread angle", Value: angle * 180 / math.Pi, Min: 0, Max: 60, Unit: "deg", Reason: "angle of load spread to the vertical"})
	}
	return errs
}

// SpreadRect returns the average Δσ_z/q at depth z below a b × l rectangle
// by the load-spread method: bl / ((b + 2z tan θ)(l + 2z tan θ)). With
// tan θ = 1/2 this is the 2:1 method, bl/((b + z)(l + z)).
func SpreadRect(b, l, z, angle float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "B", b)
	errs = checkPos(errs, "L", l)
	errs = checkDepth(errs, z)
	errs = checkAngle(errs, angle)
	if err := one(errs); err != nil {
		return 0, err
	}
	k := 2 * z * math.Tan(angle)
	return b * l / ((b + k) * (l + k)), nil
}

// SpreadStrip returns the average Δσ_z/q at depth z below a strip of width
// b by the load-spread method: b / (b + 2z tan θ).
func SpreadStrip(b, z, angle float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "B", b)
	errs = checkDepth(errs, z)
	errs = checkAngle(errs, angle)
	if err := one(errs); err != nil {
		return 0, err
	}
	return b / (b + 2*z*math.Tan(angle)), nil
}

// SpreadCircle returns the average Δσ_z/q at depth z below a circle of
// diameter d by the load-spread method: d² / (d + 2z tan θ)².
func SpreadCircle(d, z, angle float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "B", d)
	errs = checkDepth(errs, z)
	errs = checkAngle(errs, angle)
	if err := one(errs); err != nil {
		return 0, err
	}
	k := d + 2*z*math.Tan(angle)
	return d * d / (k * k), nil
}

// Net returns the net bearing pressure q_net = q − σ_v0: the gross
// pressure at the underside of the footing less the total vertical stress
// the excavation removed there (common practice; the footing's own weight
// and backfill belong in q). A negative result means the load is less than
// the overburden removed.
func Net(q, sigmaV0 float64) float64 { return q - sigmaV0 }
