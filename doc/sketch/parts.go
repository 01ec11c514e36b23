package sketch

import (
	"math"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Sizes in points, inks.
const (
	pad       = 2.0
	sizeText  = 7.5
	sizeTitle = 8.0
	headLen   = 5.0 // arrowhead length
	headHalf  = 2.0 // arrowhead half-width

	glWidth       = 0.9 // the ground line's stroke
	hatchReach    = 4.0 // how far its hatching reaches below it
	boundaryWidth = 0.5 // a layer boundary's stroke
)

var (
	inkLine     = draw.Gray(20)
	inkDim      = draw.Gray(50)
	inkText     = draw.Gray(0)
	inkBoundary = draw.Gray(120)
	inkHatch    = draw.Gray(60)
	inkWater    = draw.Color{R: 25, G: 80, B: 170}
	inkLoad     = draw.Color{R: 150, G: 25, B: 25}
	fillConcr   = draw.Gray(212)
	fillPlat    = draw.Color{R: 236, G: 228, B: 208}
	fillSoil    = []draw.Color{{R: 248, G: 245, B: 239}, {R: 239, G: 235, B: 226}}
)

func textW(face fonts.Face, size float64, s string) float64 { return fonts.Get(face).Width(s, size) }
func ascent(size float64) float64                           { return fonts.Get(fonts.Regular).Ascent(size) }
func descent(size float64) float64                          { return fonts.Get(fonts.Regular).Descent(size) }
func capMid(size float64) float64                           { return fonts.Get(fonts.Regular).CapHeight(size) / 2 }

// txt is a text item in the sketch's regular size.
func txt(x, y float64, al draw.Align, s string) draw.Text {
	return draw.Text{X: x, Y: y, Face: fonts.Regular, Size: sizeText, Color: inkText, Align: al, Text: s}
}

// masked returns t with a white box behind it, so the lines it sits on
// do not run through it.
func masked(t draw.Text) []draw.Item {
	b := t.Bounds()
	return []draw.Item{draw.Rect{X: b.X - 1, Y: b.Y + 0.5, W: b.W + 2, H: b.H - 0.5, Paint: draw.Fill(draw.Gray(255))}, t}
}

// arrow is a shaft from a to b with a filled head at b.
func arrow(a, b draw.Point, col draw.Color, width float64) []draw.Item {
	dx, dy := b.X-a.X, b.Y-a.Y
	l := math.Hypot(dx, dy)
	if l == 0 {
		return nil
	}
	ux, uy := dx/l, dy/l
	base := draw.Pt(b.X-ux*headLen, b.Y-uy*headLen)
	return []draw.Item{
		draw.Line{X1: a.X, Y1: a.Y, X2: base.X, Y2: base.Y, Paint: draw.Stroke(col, width)},
		head(b, ux, uy, col),
	}
}

// head is a filled arrowhead with its tip at p pointing along (ux, uy).
func head(p draw.Point, ux, uy float64, col draw.Color) draw.Item {
	bx, by := p.X-ux*headLen, p.Y-uy*headLen
	return draw.Poly{Closed: true, Paint: draw.Fill(col), Points: []draw.Point{
		p, draw.Pt(bx-uy*headHalf, by+ux*headHalf), draw.Pt(bx+uy*headHalf, by-ux*headHalf)}}
}

// dim is a dimension line from a to b: arrowheads at both ends when it is
// long enough, else short oblique ticks.
func dim(a, b draw.Point, dash []float64) []draw.Item {
	p := draw.Paint{Stroke: inkDim, Width: 0.5, Dash: dash}
	dx, dy := b.X-a.X, b.Y-a.Y
	l := math.Hypot(dx, dy)
	if l == 0 {
		return nil
	}
	ux, uy := dx/l, dy/l
	if l >= 3*headLen {
		s := draw.Line{X1: a.X + ux*headLen, Y1: a.Y + uy*headLen, X2: b.X - ux*headLen, Y2: b.Y - uy*headLen, Paint: p}
		return []draw.Item{s, head(a, -ux, -uy, inkDim), head(b, ux, uy, inkDim)}
	}
	t := 2.2
	return []draw.Item{draw.Line{X1: a.X, Y1: a.Y, X2: b.X, Y2: b.Y, Paint: p},
		draw.Line{X1: a.X - t*(ux-uy), Y1: a.Y - t*(uy+ux), X2: a.X + t*(ux-uy), Y2: a.Y + t*(uy+ux), Paint: draw.Stroke(inkDim, 0.6)},
		draw.Line{X1: b.X - t*(ux-uy), Y1: b.Y - t*(uy+ux), X2: b.X + t*(ux-uy), Y2: b.Y + t*(uy+ux), Paint: draw.Stroke(inkDim, 0.6)}}
}

// metres prints a length by the display rules of the rest of the
// document (units.Format), so a sketch and the working give the same
// number: "2.4 m", "2.631 m".
func metres(v float64) string { return units.Format(v, metre, -1) + " m" }

var metre = units.MustParse("m")

// amount prints a load's size (kN, kNm) by the display rules of the rest
// of the document (units.Format): 1270, 35.5.
func amount(v float64) string { return units.Format(math.Abs(v)*1e3, kilonewton, -1) }

var kilonewton = units.MustParse("kN")

// arcPts approximates the arc of radius r round c from angle a0 to a1
// (radians, counterclockwise as seen, y up) by n segments.
func arcPts(c draw.Point, r, a0, a1 float64, n int) []draw.Point {
	ps := make([]draw.Point, n+1)
	for i := range ps {
		a := a0 + (a1-a0)*float64(i)/float64(n)
		ps[i] = draw.Pt(c.X+r*math.Cos(a), c.Y-r*math.Sin(a))
	}
	return ps
}
