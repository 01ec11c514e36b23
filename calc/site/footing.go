package site

import (
	"fmt"
	"math"
)

// Shape is a footing's plan shape.
type Shape int

const (
	Strip Shape = iota // long footing: B is its width, actions per metre run
	Square
	Rectangle
	Circle // B is the diameter
)

var shapeNames = [...]string{"strip", "square", "rectangle", "circle"}

func (s Shape) String() string {
	if int(s) < len(shapeNames) {
		return shapeNames[s]
	}
	return fmt.Sprintf("Shape(%d)", int(s))
}

// ParseShape reads a shape name as written in a sheet.
func ParseShape(s string) (Shape, bool) {
	for i, n := range shapeNames {
		if n == s {
			return Shape(i), true
		}
	}
	return 0, false
}

// Footing is a shallow foundation. For a rectangle B ≤ L (B is the shorter
// side); a square has L = B; a strip and a circle ignore L.
type Footing struct {
	Name  string
	Shape Shape
	B     float64 // width (diameter of a circle), m, (0, 1000] (a wide fill or embankment: hundreds of metres)
	L     float64 // length, m, B ≤ L ≤ 10000 (rectangle only)
	D     float64 // depth of the underside below ground level, m, 0–50
	Alpha float64 // inclination of the base to the horizontal, rad, [0, 45) deg
}

// Length returns L for a rectangle, B for a square or circle and +Inf for
// a strip.
func (f Footing) Length() float64 {
	switch f.Shape {
	case Rectangle:
		return f.L
	case Strip:
		return math.Inf(1)
	}
	return f.B
}

// Area returns the plan area (m²; per metre run for a strip, so m²/m).
func (f Footing) Area() float64 {
	switch f.Shape {
	case Strip:
		return f.B
	case Circle:
		return math.Pi * f.B * f.B / 4
	case Rectangle:
		return f.B * f.L
	}
	return f.B * f.B
}

// ForceUnit is the unit a footing's forces are given and printed in: kN,
// or kN/m for a strip (per metre run).
func (f Footing) ForceUnit() string {
	if f.Shape == Strip {
		return "kN/m"
	}
	return "kN"
}

// MomentUnit is the unit of a footing's moments: kNm, or kNm/m for a
// strip.
func (f Footing) MomentUnit() string {
	if f.Shape == Strip {
		return "kNm/m"
	}
	return "kNm"
}

// MinWidth is the smallest footing width or length accepted, m.
const MinWidth = 0.1

// Validate checks the footing's dimensions.
func (f Footing) Validate() error {
	var errs Errors
	w := f.Name
	if f.Shape < Strip || f.Shape > Circle {
		errs = append(errs, &InputError{Where: w, Param: "shape", Msg: "expected strip, square, rectangle or circle"})
	}
	// 0.1 m is a practical lower bound: no shallow foundation is
	// narrower, and below it the effective-area and stress formulas lose
	// meaning (common practice).
	errs.check(w, "B", f.B, 1, MinWidth, 1000, false, "m")
	if f.Shape == Rectangle {
		errs.check(w, "L", f.L, 1, MinWidth, 10000, false, "m")
		if f.L < f.B {
			errs = append(errs, &InputError{Where: w, Param: "L", Msg: fmt.Sprintf("L = %g m is less than B = %g m: B is the shorter side", f.L, f.B)})
		}
	}
	errs.check(w, "D", f.D, 1, 0, 50, false, "m")
	if f.Alpha < 0 || f.Alpha >= 45*deg {
		errs = append(errs, &RangeError{Where: w, Param: "alpha", Value: f.Alpha / deg, Min: 0, Max: 45, Unit: "deg", Reason: "base inclination must be below 45 deg"})
	}
	return errs.Err()
}

// Kind classifies an action (EN 1990).
type Kind int

const (
	Permanent Kind = iota
	Variable
)

func (k Kind) String() string {
	if k == Variable {
		return "variable"
	}
	return "permanent"
}

// Action is one characteristic action at the underside of the footing
// (forces N, moments N·m; per metre run for a strip). HB acts parallel to
// B, HL parallel to L; MB moves the resultant along B (e_B = M_B/V), ML
// along L.
type Action struct {
	Name       string
	Kind       Kind
	V          float64 // vertical, downward positive
	HB, HL     float64
	MB, ML     float64
	Psi0       Opt  // combination factor ψ0 (variable actions), 0–1; EN 1990 Table A1.1
	Psi2       Opt  // quasi-permanent factor ψ2 (variable actions), 0–1, for long-term settlement
	Favourable bool // a permanent action that always helps (e.g. a counterweight): γ_G,inf applies
}

// Sum adds the characteristic actions as given, each component
// unfactored (ΣV, ΣH_B, ΣH_L, ΣM_B, ΣM_L; per metre run for a strip): the
// resultant a section of the footing shows and the capacity table's
// load check reads. The sum has no name and counts as permanent.
func Sum(acts []Action) Action {
	var s Action
	for _, a := range acts {
		s.V, s.HB, s.HL, s.MB, s.ML = s.V+a.V, s.HB+a.HB, s.HL+a.HL, s.MB+a.MB, s.ML+a.ML
	}
	return s
}

// ValidateActions checks ψ factors and that there is at least one action.
func ValidateActions(where string, acts []Action) error {
	var errs Errors
	if len(acts) == 0 {
		errs = append(errs, &InputError{Where: where, Msg: "no actions given"})
	}
	for _, a := range acts {
		w := where + ": action " + fmt.Sprintf("%q", a.Name)
		for _, p := range []struct {
			n string
			o Opt
		}{{"psi_0", a.Psi0}, {"psi_2", a.Psi2}} {
			if p.o.Set {
				errs.check(w, p.n, p.o.V, 1, 0, 1, false, "")
			}
		}
	}
	return errs.Err()
}
