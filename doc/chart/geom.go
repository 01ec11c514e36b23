package chart

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// box is an axis-aligned rectangle by its corners.
type box struct{ x0, y0, x1, y1 float64 }

func (b box) grow(d float64) box { return box{b.x0 - d, b.y0 - d, b.x1 + d, b.y1 + d} }

func (b box) w() float64 { return b.x1 - b.x0 }
func (b box) h() float64 { return b.y1 - b.y0 }

func (b box) overlaps(o box) bool {
	return b.x0 < o.x1 && o.x0 < b.x1 && b.y0 < o.y1 && o.y0 < b.y1
}

// within reports whether b lies inside o.
func (b box) within(o box) bool {
	return b.x0 >= o.x0-1e-9 && b.y0 >= o.y0-1e-9 && b.x1 <= o.x1+1e-9 && b.y1 <= o.y1+1e-9
}

func (b box) has(p draw.Point) bool {
	return p.X >= b.x0-1e-9 && p.X <= b.x1+1e-9 && p.Y >= b.y0-1e-9 && p.Y <= b.y1+1e-9
}

// clipSeg cuts the segment a–b to b (Liang–Barsky); ok is false when none
// of it is inside.
func (b box) clipSeg(p, q draw.Point) (draw.Point, draw.Point, bool) {
	t0, t1 := 0.0, 1.0
	dx, dy := q.X-p.X, q.Y-p.Y
	for _, e := range [4][2]float64{{-dx, p.X - b.x0}, {dx, b.x1 - p.X}, {-dy, p.Y - b.y0}, {dy, b.y1 - p.Y}} {
		if e[0] == 0 {
			if e[1] < 0 {
				return p, q, false
			}
			continue
		}
		t := e[1] / e[0]
		if e[0] < 0 {
			t0 = math.Max(t0, t)
		} else {
			t1 = math.Min(t1, t)
		}
		if t0 > t1 {
			return p, q, false
		}
	}
	return draw.Pt(p.X+t0*dx, p.Y+t0*dy), draw.Pt(p.X+t1*dx, p.Y+t1*dy), true
}

// clipPath cuts a polyline to b, returning the visible runs (a lone point
// inside gives no run).
func (b box) clipPath(pts []draw.Point) [][]draw.Point {
	var runs [][]draw.Point
	var cur []draw.Point
	flush := func() {
		if len(cur) > 1 {
			runs = append(runs, cur)
		}
		cur = nil
	}
	for i := 1; i < len(pts); i++ {
		p, q, ok := b.clipSeg(pts[i-1], pts[i])
		if !ok {
			flush()
			continue
		}
		if len(cur) == 0 || cur[len(cur)-1] != p {
			flush()
			cur = []draw.Point{p}
		}
		cur = append(cur, q)
		if q != pts[i] { // left the box
			flush()
		}
	}
	flush()
	return runs
}

// lenIn is the length of the segment p–q inside b.
func (b box) lenIn(p, q draw.Point) float64 {
	p, q, ok := b.clipSeg(p, q)
	if !ok {
		return 0
	}
	return math.Hypot(q.X-p.X, q.Y-p.Y)
}

// text is a string to set, with its measured box.
type text struct {
	x, y  float64 // anchor and baseline
	face  fonts.Face
	size  float64
	align draw.Align
	s     string
	color draw.Color
}

func (t text) item() draw.Text {
	return draw.Text{X: t.x, Y: t.y, Face: t.face, Size: t.size, Color: t.color, Align: t.align, Text: t.s}
}

// bounds is the text's box from the font's ascent to its descent.
func (t text) bounds() box {
	r := t.item().Bounds()
	return box{r.X, r.Y, r.X + r.W, r.Y + r.H}
}

func textW(face fonts.Face, size float64, s string) float64 { return fonts.Get(face).Width(s, size) }

func ascent(size float64) float64  { return fonts.Get(fonts.Regular).Ascent(size) }
func descent(size float64) float64 { return fonts.Get(fonts.Regular).Descent(size) }
func lineH(size float64) float64   { return ascent(size) + descent(size) }

// capMid is how far below a line's middle the baseline of figures sits.
func capMid(size float64) float64 { return fonts.Get(fonts.Regular).CapHeight(size) / 2 }
