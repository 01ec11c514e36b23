package sketch

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Footing is what the sketch shows: a shallow footing, the ground round it
// and the actions on it. Lengths are metres, depths below ground level
// (GL) and positive downward; forces kN and moments kNm (per metre run for
// a strip).
type Footing struct {
	Shape string  // "strip", "square", "rectangle" or "circle"
	B     float64 // width (diameter of a circle), > 0
	L     float64 // length of a rectangle, > 0; ignored for other shapes
	D     float64 // depth of the underside below GL, ≥ 0
	// Thickness of the footing; 0 draws clamp(0.35 B, 0.25, 0.6) m, no
	// more than D when D ≥ 0.25 m.
	Thickness float64
	Water     *float64 // groundwater depth below GL (negative: free water above GL, drawn at GL); nil = none given
	Layers    []Layer  // top down; boundaries deeper than the sketch are left out
	// Characteristic actions as given: V down (negative: up), H to the
	// right (negative: to the left), M clockwise (negative: anticlockwise;
	// clockwise moves the resultant to the right). Zero draws no arrow.
	V, H, M float64
	// Labels replace the printed "V = 1270 kN" and so on when not empty.
	VLabel, HLabel, MLabel string
	BEff                   *float64  // effective width B′, 0 < B′ ≤ B; drawn against the side the resultant moves to
	Platform               *Platform // a working platform at the surface
}

// Layer is a soil layer by the depth of its top below GL.
type Layer struct {
	Name string
	Top  float64
}

// Platform is a granular working platform from GL down to Thickness,
// drawn with its own fill; the footing is cast through it.
type Platform struct {
	Name      string // "" = "Working platform"
	Thickness float64
}

// Error is a footing the sketch cannot draw: the parameter, its value and
// what is valid.
type Error struct {
	Param, Value, Want string
}

func (e *Error) Error() string {
	s := "sketch: " + e.Param
	if e.Value != "" {
		s += " = " + e.Value
	}
	return s + " " + e.Want
}

func num(v float64) string { return strconv.FormatFloat(v, 'g', 6, 64) }

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// check validates f and the drawing size.
func check(f Footing, w, h float64) error {
	if !finite(w) || !finite(h) || w < 160 || h < 110 {
		return &Error{Param: "w × h", Value: num(w) + " × " + num(h), Want: "must be at least 160 × 110 pt"}
	}
	switch f.Shape {
	case "strip", "square", "rectangle", "circle":
	default:
		return &Error{Param: "Shape", Value: strconv.Quote(f.Shape), Want: "must be strip, square, rectangle or circle"}
	}
	type rng struct {
		p      string
		v      float64
		lo, hi float64
		openLo bool
		unit   string
	}
	rs := []rng{{"B", f.B, 0, 200, true, "m"}, {"D", f.D, 0, 50, false, "m"}, {"Thickness", f.Thickness, 0, 10, false, "m"}}
	if f.Shape == "rectangle" {
		rs = append(rs, rng{"L", f.L, 0, 1000, true, "m"})
	}
	if f.Water != nil {
		rs = append(rs, rng{"Water", *f.Water, -50, 1000, false, "m"}) // negative: free water above GL
	}
	if f.BEff != nil {
		rs = append(rs, rng{"BEff", *f.BEff, 0, f.B, true, "m"})
	}
	if f.Platform != nil {
		rs = append(rs, rng{"Platform.Thickness", f.Platform.Thickness, 0, 20, true, "m"})
	}
	for i, l := range f.Layers {
		rs = append(rs, rng{fmt.Sprintf("Layers[%d].Top", i), l.Top, 0, 1000, false, "m"})
	}
	for _, r := range rs {
		if !finite(r.v) || r.v < r.lo || r.v > r.hi || (r.openLo && r.v == r.lo) {
			lo := "from " + num(r.lo)
			if r.openLo {
				lo = "above " + num(r.lo)
			}
			return &Error{Param: r.p, Value: num(r.v) + " " + r.unit, Want: "must be " + lo + " to " + num(r.hi) + " " + r.unit}
		}
	}
	for i := 1; i < len(f.Layers); i++ {
		if f.Layers[i].Top <= f.Layers[i-1].Top {
			return &Error{Param: fmt.Sprintf("Layers[%d].Top", i), Value: num(f.Layers[i].Top) + " m",
				Want: "must be deeper than the layer above (" + num(f.Layers[i-1].Top) + " m)"}
		}
	}
	for _, a := range []struct {
		p string
		v float64
	}{{"V", f.V}, {"H", f.H}, {"M", f.M}} {
		if !finite(a.v) {
			return &Error{Param: a.p, Value: num(a.v), Want: "must be a finite number"}
		}
	}
	reg := fonts.Get(fonts.Regular)
	texts := []string{f.VLabel, f.HLabel, f.MLabel}
	for _, l := range f.Layers {
		texts = append(texts, l.Name)
	}
	if f.Platform != nil {
		texts = append(texts, f.Platform.Name)
	}
	for _, s := range texts {
		if r, bad := reg.Missing(s); bad {
			return &Error{Param: "text", Value: strconv.Quote(s), Want: fmt.Sprintf("has %q (U+%04X), which the fonts lack", r, r)}
		}
	}
	return nil
}

// Draw sketches f within [0, w] × [0, h] points: a section through B, to
// scale, and for a pad a small plan beside it. Invalid input is an *Error.
func Draw(f Footing, w, h float64) ([]draw.Item, error) {
	if err := check(f, w, h); err != nil {
		return nil, err
	}
	s, err := arrange(f, w, h)
	if err != nil {
		return nil, err
	}
	return s.paint(), nil
}
