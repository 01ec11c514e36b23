package stress

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
)

// Strip returns Δσ_z/q at depth z and horizontal offset x from the centre
// line of a uniformly loaded strip of width b:
//
//	Δσ_z/q = (1/π)[α + sin α cos(α + 2δ)]
//
// with α = atan((x + b/2)/z) − atan((x − b/2)/z) the angle the strip
// subtends at the point and δ = atan((x − b/2)/z) (Boussinesq's solution
// for a plane-strain strip load; Poulos & Davis 1974, strip loading).
func Strip(b, x, z float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "B", b)
	errs = checkDepth(errs, z)
	errs = checkFinite(errs, "x", x)
	if err := one(errs); err != nil {
		return 0, err
	}
	return strip(b, x, z), nil
}

func strip(b, x, z float64) float64 {
	if z == 0 {
		switch ax := math.Abs(x); {
		case ax < b/2:
			return 1
		case ax == b/2:
			return 0.5
		}
		return 0
	}
	t1 := math.Atan((x + b/2) / z)
	d := math.Atan((x - b/2) / z)
	a := t1 - d
	return (a + math.Sin(a)*math.Cos(a+2*d)) / math.Pi
}
