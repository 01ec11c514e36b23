package chart

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// Chart is an x–y chart W × H points in size.
type Chart struct {
	Title   string // optional, set above the plot
	X, Y    Axis
	Series  []Series
	Guides  []Guide      // labelled reference lines (a settlement limit, layer tops)
	Notes   []Annotation // labels at data points, with leaders
	Regions []Region     // labelled spans of x (which mechanism governs where)
	W, H    float64
}

// Axis is one axis of a chart.
type Axis struct {
	Title    string // with its unit: "Depth below ground level (m)"
	Log      bool   // log10 axis; every value on it must be > 0
	Reverse  bool   // values grow downward (y) or leftward (x)
	Opposite bool   // x axis along the top, y axis at the right
	// Min and Max fix the ends; nil takes them from the data, widened to
	// the next tick (linear) or decade (log).
	Min, Max *float64
	// Ticks replaces the major ticks when set (see TimeTicks); minor
	// ticks of a log axis stay.
	Ticks []Tick
}

// At returns a pointer to v, for Axis.Min and Axis.Max.
func At(v float64) *float64 { return &v }

// Style says how a series is drawn.
type Style uint8

const (
	LinesMarkers Style = iota // a line with markers at its points (the default)
	Lines                     // a line alone
	Markers                   // markers alone
	Band                      // a broad light band under the other series (an envelope)
)

// Dash patterns for Series.Dash: on and off lengths in points. Series
// with no Dash take them in this order (Solid first); Solid is empty but
// not nil, so it can be chosen.
var (
	Solid      = []float64{}
	Dashed     = []float64{5, 2.5}
	Dotted     = []float64{1.1, 1.9}
	DashDot    = []float64{7, 2, 1.3, 2}
	LongDash   = []float64{11, 3}
	DashDotDot = []float64{7, 2, 1.3, 2, 1.3, 2}
)

// Marker is a point marker's shape.
type Marker uint8

const (
	MarkerAuto  Marker = iota // the next shape in series order
	NoMarker                  // none
	Circle                    // ○
	Square                    // □
	Triangle                  // △
	Diamond                   // ◇
	InvTriangle               // ▽
	Cross                     // ×
	Plus                      // +
)

// Series is one curve. Series are told apart by dash pattern and marker
// shape, so a black-and-white print reads; colour only supports them.
type Series struct {
	Name     string // legend entry; "" = not in the legend
	X, Y     []float64
	Style    Style
	Emphasis bool       // heavier line and filled markers (the governing curve)
	Dash     []float64  // on/off lengths in points; nil = by series order
	Marker   Marker     // MarkerAuto = by series order
	Color    draw.Color // zero = by series order from Palette
}

// Guide is a labelled reference line across the plot: horizontal at
// y = Value when OnY, else vertical at x = Value. A limit is drawn
// dash-dot in dark red with its label above or below the line; a Faint
// line (a layer boundary) is thin and grey, its label set on the side
// where values grow (under a horizontal line on a reversed y axis: the
// name of the layer that starts there).
type Guide struct {
	Value float64
	OnY   bool
	Label string // "limit 25 mm"
	Faint bool
}

// Annotation labels the data point (X, Y) with Text, set clear of the
// curves with a short leader. Guides adds dotted lines from the point to
// both axes (a t₅₀ read off the time axis).
type Annotation struct {
	X, Y   float64
	Text   string
	Guides bool
}

// Region labels the span From…To of the x axis in a band beside the plot,
// with dividers across the plot between regions ("bearing governs").
type Region struct {
	From, To float64
	Label    string
}

// Palette is the series colours in order: dark, distinct, all reading as
// near-black in a grey print.
var Palette = []draw.Color{
	{R: 20, G: 20, B: 20}, {R: 24, G: 70, B: 140}, {R: 165, G: 35, B: 35},
	{R: 25, G: 110, B: 60}, {R: 110, G: 60, B: 140}, {R: 140, G: 90, B: 20},
}

// Error is input a chart cannot draw: Where names the part (`X axis`,
// `series 2 "Δσ"`), Param the field, Value the value given (may be empty)
// and Want what is valid.
type Error struct {
	Where, Param, Value, Want string
}

func (e *Error) Error() string {
	s := "chart: "
	if e.Where != "" {
		s += e.Where + ": "
	}
	s += e.Param
	if e.Value != "" {
		s += " = " + e.Value
	}
	return s + " " + e.Want
}

func seriesName(i int, s Series) string {
	if s.Name == "" {
		return "series " + strconv.Itoa(i+1)
	}
	return fmt.Sprintf("series %d %q", i+1, s.Name)
}

// extent gathers the values along one axis.
type extent struct {
	lo, hi float64
	any    bool
}

func (e *extent) add(v float64) {
	if !e.any {
		e.lo, e.hi, e.any = v, v, true
		return
	}
	e.lo, e.hi = math.Min(e.lo, v), math.Max(e.hi, v)
}

// check validates the chart and returns the data extents of x and y.
func (c *Chart) check() (ex, ey extent, err error) {
	if !finite(c.W) || !finite(c.H) || c.W <= 0 || c.H <= 0 {
		return ex, ey, &Error{Where: "chart", Param: "W × H", Value: num(c.W) + " × " + num(c.H), Want: "must be positive sizes in points"}
	}
	value := func(where, param string, v float64, log bool) error {
		if !finite(v) {
			return &Error{Where: where, Param: param, Value: num(v), Want: "must be a finite number"}
		}
		if log && v <= 0 {
			return &Error{Where: where, Param: param, Value: num(v), Want: "must be > 0 on a log axis"}
		}
		return nil
	}
	for i, s := range c.Series {
		w := seriesName(i, s)
		if len(s.X) != len(s.Y) {
			return ex, ey, &Error{Where: w, Param: "len(X), len(Y)", Value: fmt.Sprintf("%d, %d", len(s.X), len(s.Y)), Want: "must be equal"}
		}
		if len(s.X) == 0 {
			return ex, ey, &Error{Where: w, Param: "X, Y", Want: "has no points"}
		}
		if s.Style > Band || s.Marker > Plus {
			return ex, ey, &Error{Where: w, Param: "Style, Marker", Value: fmt.Sprintf("%d, %d", s.Style, s.Marker), Want: "must be one of the package's constants"}
		}
		for _, d := range s.Dash {
			if !finite(d) || d < 0 {
				return ex, ey, &Error{Where: w, Param: "Dash", Value: fmt.Sprint(s.Dash), Want: "must be lengths ≥ 0 in points"}
			}
		}
		if len(s.Dash) > 0 && sum(s.Dash) < 0.5 {
			return ex, ey, &Error{Where: w, Param: "Dash", Value: fmt.Sprint(s.Dash), Want: "must add up to 0.5 pt or more"}
		}
		for j := range s.X {
			if err := value(w, fmt.Sprintf("X[%d]", j), s.X[j], c.X.Log); err != nil {
				return ex, ey, err
			}
			if err := value(w, fmt.Sprintf("Y[%d]", j), s.Y[j], c.Y.Log); err != nil {
				return ex, ey, err
			}
			ex.add(s.X[j])
			ey.add(s.Y[j])
		}
	}
	for i, g := range c.Guides {
		w := fmt.Sprintf("guide %d %q", i+1, g.Label)
		log := c.X.Log
		if g.OnY {
			log = c.Y.Log
		}
		if err := value(w, "Value", g.Value, log); err != nil {
			return ex, ey, err
		}
		if g.OnY {
			ey.add(g.Value)
		} else {
			ex.add(g.Value)
		}
	}
	for i, n := range c.Notes {
		w := fmt.Sprintf("annotation %d %q", i+1, n.Text)
		if err := value(w, "X", n.X, c.X.Log); err != nil {
			return ex, ey, err
		}
		if err := value(w, "Y", n.Y, c.Y.Log); err != nil {
			return ex, ey, err
		}
		ex.add(n.X)
		ey.add(n.Y)
	}
	for i, r := range c.Regions {
		w := fmt.Sprintf("region %d %q", i+1, r.Label)
		if err := value(w, "From", r.From, c.X.Log); err != nil {
			return ex, ey, err
		}
		if err := value(w, "To", r.To, c.X.Log); err != nil {
			return ex, ey, err
		}
		if r.From >= r.To {
			return ex, ey, &Error{Where: w, Param: "From", Value: num(r.From), Want: "must be less than To = " + num(r.To)}
		}
	}
	for _, a := range []struct {
		name string
		ax   Axis
		e    *extent
	}{{"X axis", c.X, &ex}, {"Y axis", c.Y, &ey}} {
		if !a.e.any {
			if a.ax.Min == nil || a.ax.Max == nil {
				return ex, ey, &Error{Where: a.name, Param: "data", Want: "is empty: give a series, or both Min and Max"}
			}
			a.e.add(*a.ax.Min)
		}
	}
	if err := c.checkGlyphs(); err != nil {
		return ex, ey, err
	}
	return ex, ey, nil
}

// checkGlyphs reports text the fonts cannot set.
func (c *Chart) checkGlyphs() error {
	type t struct{ where, s string }
	ts := []t{{"title", c.Title}, {"X axis title", c.X.Title}, {"Y axis title", c.Y.Title}}
	for i, s := range c.Series {
		ts = append(ts, t{seriesName(i, s), s.Name})
	}
	for _, g := range c.Guides {
		ts = append(ts, t{"guide", g.Label})
	}
	for _, n := range c.Notes {
		ts = append(ts, t{"annotation", n.Text})
	}
	for _, r := range c.Regions {
		ts = append(ts, t{"region", r.Label})
	}
	for _, a := range []Axis{c.X, c.Y} {
		for _, k := range a.Ticks {
			ts = append(ts, t{"tick", k.Label})
		}
	}
	f := fonts.Get(fonts.Regular)
	for _, x := range ts {
		if r, bad := f.Missing(x.s); bad {
			return &Error{Where: x.where, Param: "text", Value: strconv.Quote(x.s), Want: fmt.Sprintf("has %q (U+%04X), which the fonts lack", r, r)}
		}
	}
	return nil
}

// Draw returns the chart's primitives within [0, W] × [0, H], relative to
// its top-left corner, y downward. The same chart gives the same items.
func (c *Chart) Draw() ([]draw.Item, error) {
	ex, ey, err := c.check()
	if err != nil {
		return nil, err
	}
	lg := c.legendSize()
	f, err := c.layout(ex, ey, lg, false)
	if err != nil {
		return nil, err
	}
	if lg.n > 0 && !f.placeLegendInside(lg) {
		if f, err = c.layout(ex, ey, lg, true); err != nil {
			return nil, err
		}
		f.placeLegendBelow(lg)
	}
	return f.paint(), nil
}

func sum(xs []float64) float64 {
	t := 0.0
	for _, x := range xs {
		t += x
	}
	return t
}

// Drawing draws the chart as a layout block W × H points, at pos, with an
// optional caption.
func (c *Chart) Drawing(pos source.Span, caption []layout.Run) (*layout.Drawing, error) {
	items, err := c.Draw()
	if err != nil {
		return nil, err
	}
	return &layout.Drawing{Pos: pos, W: c.W, H: c.H, Items: items, Caption: caption}, nil
}
