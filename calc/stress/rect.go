package stress

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
)

const big = 1e60 // m, n beyond this give I to within 1e-60 of the limit

// Newmark returns the influence factor I = Δσ_z/q below the corner of a
// uniformly loaded rectangle at depth z, with m = B/z and n = L/z (either
// may be +Inf; the formula is symmetric in m and n). The arctangent is
// taken with atan2, which adds π where m²n² > m² + n² + 1, so the formula
// holds for every m, n.
//
// Newmark (1935), Circular No. 24, eq. for the corner of a rectangle; the
// values are those of Fadum's (1948) chart (m = n = 1: 0.1752; m, n → ∞:
// 0.25).
func Newmark(m, n float64) (float64, error) {
	var errs site.Errors
	if !(m >= 0) {
		errs = append(errs, &site.RangeError{Param: "m", Value: m, Min: 0, Max: math.Inf(1)})
	}
	if !(n >= 0) {
		errs = append(errs, &site.RangeError{Param: "n", Value: n, Min: 0, Max: math.Inf(1)})
	}
	if err := one(errs); err != nil {
		return 0, err
	}
	return newmark(m, n), nil
}

func newmark(m, n float64) float64 {
	if m == 0 || n == 0 {
		return 0
	}
	if m > big {
		m = big
	}
	if n > big {
		n = big
	}
	m2, n2 := m*m, n*n
	v := m2 + n2 + 1
	mn := m * n
	sv := math.Sqrt(v)
	return (2*mn*sv/(v+m2*n2)*(v+1)/v + math.Atan2(2*mn*sv, v-m2*n2)) / (4 * math.Pi)
}

// Rect returns Δσ_z/q at depth z below the point (x, y) of the loaded
// surface, for a uniformly loaded b × l rectangle centred on the origin
// with b along x and l along y. The point may lie inside, on the edge of
// or outside the rectangle: the four rectangles that share the point as a
// corner are added with the signs of their sides (superposition of
// Newmark's corner solution). z = 0 gives the surface limit.
func Rect(b, l, x, y, z float64) (float64, error) {
	var errs site.Errors
	errs = checkPos(errs, "B", b)
	errs = checkPos(errs, "L", l)
	errs = checkDepth(errs, z)
	errs = checkFinite(errs, "x", x)
	errs = checkFinite(errs, "y", y)
	if err := one(errs); err != nil {
		return 0, err
	}
	return rect(b, l, x, y, z), nil
}

func rect(b, l, x, y, z float64) float64 {
	xs := [2]float64{b/2 + x, b/2 - x}
	ys := [2]float64{l/2 + y, l/2 - y}
	var s float64
	for _, a := range xs {
		for _, c := range ys {
			if a == 0 || c == 0 {
				continue
			}
			sign := 1.0
			if (a < 0) != (c < 0) {
				sign = -1
			}
			s += sign * newmark(math.Abs(a)/z, math.Abs(c)/z)
		}
	}
	return s
}

func checkPos(errs site.Errors, name string, v float64) site.Errors {
	if !(v > 0) || math.IsInf(v, 0) {
		errs = append(errs, &site.RangeError{Param: name, Value: v, Min: 0, Max: math.Inf(1), Unit: "m", Reason: "must be positive and finite"})
	}
	return errs
}

func checkDepth(errs site.Errors, z float64) site.Errors {
	if !(z >= 0) || math.IsInf(z, 0) {
		errs = append(errs, &site.RangeError{Param: "z", Value: z, Min: 0, Max: math.Inf(1), Unit: "m", Reason: "depth below the loaded surface"})
	}
	return errs
}

func checkFinite(errs site.Errors, name string, v float64) site.Errors {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		errs = append(errs, &site.RangeError{Param: name, Value: v, Min: math.Inf(-1), Max: math.Inf(1), Unit: "m", Reason: "must be finite"})
	}
	return errs
}

// one returns nil for no errors, the error itself for one, else the list,
// so that errors.As finds a single *site.RangeError directly.
func one(errs site.Errors) error {
	switch len(errs) {
	case 0:
		return nil
	case 1:
		return errs[0]
	}
	return errs
}
