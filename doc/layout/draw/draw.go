package draw

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Color is an RGB colour.
type Color struct{ R, G, B uint8 }

// Gray returns a grey of level v (0 black … 255 white).
func Gray(v uint8) Color { return Color{v, v, v} }

func (c Color) String() string { return fmt.Sprintf("#%02x%02x%02x", c.R, c.G, c.B) }

// Point is a position on the page.
type Point struct{ X, Y float64 }

// Paint says how a shape is drawn: stroked when Width > 0, filled when
// Filled, both when both.
type Paint struct {
	Stroke Color
	Width  float64   // stroke width in points; 0 = no outline
	Dash   []float64 // alternating on/off lengths; nil = solid
	Fill   Color
	Filled bool
}

// Stroke returns a solid outline paint.
func Stroke(c Color, width float64) Paint { return Paint{Stroke: c, Width: width} }

// Fill returns a fill-only paint.
func Fill(c Color) Paint { return Paint{Fill: c, Filled: true} }

// Align places text relative to its X.
type Align uint8

const (
	Left   Align = iota // X is where the text starts
	Center              // X is the middle of the text
	Right               // X is where the text ends
)

// Item is one primitive.
type Item interface {
	// Bounds is the item's extent (for text, an approximation from the
	// font's ascent and descent).
	Bounds() Rect
	isItem()
}

// Text is a string set in one face at one size; Y is the baseline.
type Text struct {
	X, Y  float64
	Size  float64
	Text  string
	Face  fonts.Face // the small fields last: 48 bytes in all, not 56
	Color Color
	Align Align
}

// Line is a straight stroke.
type Line struct {
	X1, Y1, X2, Y2 float64
	Paint
}

// Poly is a polyline, or a polygon when Closed (filled polygons are
// always closed).
type Poly struct {
	Points []Point
	Closed bool
	Paint
}

// Rect is an axis-aligned rectangle from its top-left corner.
type Rect struct {
	X, Y, W, H float64
	Paint
}

// Image is a PNG or JPEG picture scaled into a box.
type Image struct {
	X, Y, W, H float64
	Data       []byte
}

// Link is a clickable area that jumps to the anchor named Target.
type Link struct {
	X, Y, W, H float64
	Target     string
}

// Anchor names a place on the page that links can jump to.
type Anchor struct {
	Name string
	X, Y float64
}

func (Text) isItem()   {}
func (Line) isItem()   {}
func (Poly) isItem()   {}
func (Rect) isItem()   {}
func (Image) isItem()  {}
func (Link) isItem()   {}
func (Anchor) isItem() {}

// Width is the advance width of the text.
func (t Text) Width() float64 { return fonts.Get(t.Face).Width(t.Text, t.Size) }

// Start is the x where the text begins once Align is applied.
func (t Text) Start() float64 {
	switch t.Align {
	case Center:
		return t.X - t.Width()/2
	case Right:
		return t.X - t.Width()
	}
	return t.X
}

func (t Text) Bounds() Rect {
	f := fonts.Get(t.Face)
	a := f.Ascent(t.Size)
	return Rect{X: t.Start(), Y: t.Y - a, W: t.Width(), H: a + f.Descent(t.Size)}
}

func (l Line) Bounds() Rect {
	return span([]Point{{l.X1, l.Y1}, {l.X2, l.Y2}})
}

func (p Poly) Bounds() Rect { return span(p.Points) }

func (r Rect) Bounds() Rect { return Rect{X: r.X, Y: r.Y, W: r.W, H: r.H} }

func (i Image) Bounds() Rect { return Rect{X: i.X, Y: i.Y, W: i.W, H: i.H} }

func (l Link) Bounds() Rect { return Rect{X: l.X, Y: l.Y, W: l.W, H: l.H} }

func (a Anchor) Bounds() Rect { return Rect{X: a.X, Y: a.Y} }

func span(ps []Point) Rect {
	if len(ps) == 0 {
		return Rect{}
	}
	x0, y0, x1, y1 := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, p := range ps {
		x0, y0 = math.Min(x0, p.X), math.Min(y0, p.Y)
		x1, y1 = math.Max(x1, p.X), math.Max(y1, p.Y)
	}
	return Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
}

// Offset returns it moved by (dx, dy). Points of a Poly are copied.
func Offset(it Item, dx, dy float64) Item {
	switch v := it.(type) {
	case Text:
		v.X += dx
		v.Y += dy
		return v
	case Line:
		v.X1 += dx
		v.X2 += dx
		v.Y1 += dy
		v.Y2 += dy
		return v
	case Poly:
		ps := make([]Point, len(v.Points))
		for i, p := range v.Points {
			ps[i] = Point{p.X + dx, p.Y + dy}
		}
		v.Points = ps
		return v
	case Rect:
		v.X += dx
		v.Y += dy
		return v
	case Image:
		v.X += dx
		v.Y += dy
		return v
	case Link:
		v.X += dx
		v.Y += dy
		return v
	case Anchor:
		v.X += dx
		v.Y += dy
		return v
	}
	return it
}

// OffsetThen returns it moved by (dx, dy) and then by (ex, ey): the same
// values as Offset(Offset(it, dx, dy), ex, ey), made with one copy.
func OffsetThen(it Item, dx, dy, ex, ey float64) Item {
	switch v := it.(type) {
	case Text:
		v.X += dx
		v.Y += dy
		v.X += ex
		v.Y += ey
		return v
	case Line:
		v.X1 += dx
		v.X2 += dx
		v.Y1 += dy
		v.Y2 += dy
		v.X1 += ex
		v.X2 += ex
		v.Y1 += ey
		v.Y2 += ey
		return v
	case Poly:
		ps := make([]Point, len(v.Points))
		for i, p := range v.Points {
			ps[i] = Point{p.X + dx + ex, p.Y + dy + ey}
		}
		v.Points = ps
		return v
	case Rect:
		v.X += dx
		v.Y += dy
		v.X += ex
		v.Y += ey
		return v
	}
	return Offset(Offset(it, dx, dy), ex, ey)
}

// OffsetAll moves every item of items by (dx, dy) in place.
func OffsetAll(items []Item, dx, dy float64) {
	for i, it := range items {
		items[i] = Offset(it, dx, dy)
	}
}

// Pt returns the point (x, y).
func Pt(x, y float64) Point { return Point{X: x, Y: y} }

// Scale returns it scaled by s about the origin: positions, sizes, text
// sizes, stroke widths and dashes.
func Scale(it Item, s float64) Item {
	switch v := it.(type) {
	case Text:
		v.X, v.Y, v.Size = v.X*s, v.Y*s, v.Size*s
		return v
	case Line:
		v.X1, v.Y1, v.X2, v.Y2 = v.X1*s, v.Y1*s, v.X2*s, v.Y2*s
		v.Paint = v.Paint.scaled(s)
		return v
	case Poly:
		ps := make([]Point, len(v.Points))
		for i, p := range v.Points {
			ps[i] = Point{p.X * s, p.Y * s}
		}
		v.Points = ps
		v.Paint = v.Paint.scaled(s)
		return v
	case Rect:
		v.X, v.Y, v.W, v.H = v.X*s, v.Y*s, v.W*s, v.H*s
		v.Paint = v.Paint.scaled(s)
		return v
	case Image:
		v.X, v.Y, v.W, v.H = v.X*s, v.Y*s, v.W*s, v.H*s
		return v
	case Link:
		v.X, v.Y, v.W, v.H = v.X*s, v.Y*s, v.W*s, v.H*s
		return v
	case Anchor:
		v.X, v.Y = v.X*s, v.Y*s
		return v
	}
	return it
}

func (p Paint) scaled(s float64) Paint {
	p.Width *= s
	if p.Dash != nil {
		d := make([]float64, len(p.Dash))
		for i, x := range p.Dash {
			d[i] = x * s
		}
		p.Dash = d
	}
	return p
}
