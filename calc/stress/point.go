package stress

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/site"
)

// Method is the stress solution used below a footing.
type Method int

const (
	Boussinesq Method = iota // elastic half-space (Boussinesq 1885)
	Spread                   // load spread at an angle (2:1 by default)
)

func (m Method) String() string {
	switch m {
	case Boussinesq:
		return "boussinesq"
	case Spread:
		return "spread"
	}
	return fmt.Sprintf("Method(%d)", int(m))
}

// ParseMethod reads a method as written in a sheet: "boussinesq", "2:1"
// or "spread".
func ParseMethod(s string) (Method, bool) {
	switch s {
	case "boussinesq":
		return Boussinesq, true
	case "2:1", "spread":
		return Spread, true
	}
	return 0, false
}

// Point is where below the footing the stress is taken.
type Point int

const (
	Centre         Point = iota
	Corner               // a corner (the edge of a strip or circle)
	Characteristic       // where a flexible footing settles as a rigid one (Graßhoff 1955)
	MidB                 // the middle of a long side, B/2 from the centre (the edge of a strip or circle)
	MidL                 // the middle of a short side, L/2 from the centre (a rectangle or square)
)

func (p Point) String() string {
	switch p {
	case Centre:
		return "centre"
	case Corner:
		return "corner"
	case Characteristic:
		return "characteristic"
	case MidB:
		return "middle of a long side"
	case MidL:
		return "middle of a short side"
	}
	return fmt.Sprintf("Point(%d)", int(p))
}

// ParsePoint reads a point as written in a sheet: "centre" (or "center"),
// "corner", "characteristic".
func ParsePoint(s string) (Point, bool) {
	switch s {
	case "centre", "center":
		return Centre, true
	case "corner", "edge":
		return Corner, true
	case "characteristic":
		return Characteristic, true
	}
	return 0, false
}

// Characteristic-point positions: 0.74 of the half-width (and half-length)
// from the centre of a rectangle or strip, 0.845 of the radius from the
// centre of a circle (Graßhoff 1955; both values from memory of the
// literature). The circle value is confirmed by elasticity: on a
// half-space a flexible circle settles (4/π)E(r/R)·qR(1 − ν²)/E at radius r
// (E the complete elliptic integral of the second kind) and a rigid one
// (π/2)·qR(1 − ν²)/E, equal at r/R = 0.8446 (stress_test
// TestCharacteristicCircle). For a square on a half-space the flexible
// settlement at (0.37B, 0.37B) is I = 0.859 against about 0.88 for the
// rigid square (equality near 0.355B): the 0.37 rule is an approximation
// that holds within about 3 % there.
const (
	CharRect   = 0.37  // x/B and y/L
	CharCircle = 0.845 // r/R
)

// Options selects the stress solution below a footing.
type Options struct {
	Method Method
	Point  Point
	Angle  float64 // spread angle to the vertical, rad, (0, 60°); 0 means DefaultAngle (2:1)
}

func (o Options) angle() float64 {
	if o.Angle == 0 {
		return DefaultAngle
	}
	return o.Angle
}

// Offset returns the plan position of point p relative to the centre of
// footing f: x along B and y along L for a rectangle, square or strip
// (y = 0 for a strip); for a circle x is the radial distance and y = 0.
func Offset(f site.Footing, p Point) (x, y float64) {
	switch p {
	case Corner:
		switch f.Shape {
		case site.Strip, site.Circle:
			return f.B / 2, 0
		}
		return f.B / 2, f.Length() / 2
	case MidB:
		return f.B / 2, 0
	case MidL:
		switch f.Shape {
		case site.Strip, site.Circle:
			return f.B / 2, 0
		}
		return 0, f.Length() / 2
	case Characteristic:
		switch f.Shape {
		case site.Strip:
			return CharRect * f.B, 0
		case site.Circle:
			return CharCircle * f.B / 2, 0
		}
		return CharRect * f.B, CharRect * f.Length()
	}
	return 0, 0
}

// Influence returns Δσ_z/q_net at depth zb below the underside of footing
// f, at the point and by the method in o. The spread method gives the
// average stress over the spread area whatever the point.
func Influence(f site.Footing, o Options, zb float64) (float64, error) {
	if err := validPoint(f, o, zb); err != nil {
		return 0, err
	}
	return influence(f, o, zb), nil
}

// validPoint checks the footing, the depth below it and the spread angle.
func validPoint(f site.Footing, o Options, zb float64) error {
	if err := f.Validate(); err != nil {
		return err
	}
	var errs site.Errors
	errs = checkDepth(errs, zb)
	if o.Method == Spread {
		errs = checkAngle(errs, o.angle())
	}
	return one(errs)
}

// influence assumes valid input.
func influence(f site.Footing, o Options, zb float64) float64 {
	if o.Method == Spread {
		k := 2 * zb * math.Tan(o.angle())
		switch f.Shape {
		case site.Strip:
			return f.B / (f.B + k)
		case site.Circle:
			return f.B * f.B / ((f.B + k) * (f.B + k))
		}
		l := f.Length()
		return f.B * l / ((f.B + k) * (l + k))
	}
	x, y := Offset(f, o.Point)
	switch f.Shape {
	case site.Strip:
		return strip(f.B, x, zb)
	case site.Circle:
		return circle(f.B/2, x, zb)
	}
	if o.Point == Centre && zb > 0 {
		return 4 * newmark(f.B/(2*zb), f.Length()/(2*zb))
	}
	return rect(f.B, f.Length(), x, y, zb)
}

// Func returns a function giving Δσ_z/q_net at depth below the base, for
// repeated use once the footing and options are known valid. It is what
// the settlement engine calls for every sublayer.
func Func(f site.Footing, o Options) (func(zb float64) float64, error) {
	if err := f.Validate(); err != nil {
		return nil, err
	}
	if o.Method == Spread {
		if err := one(checkAngle(nil, o.angle())); err != nil {
			return nil, err
		}
	}
	return func(zb float64) float64 { return influence(f, o, zb) }, nil
}
