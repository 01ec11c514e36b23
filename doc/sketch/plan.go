package sketch

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// planView draws the pad in plan beside the section: its outline (B
// across, L up the page), the column, centre lines and the B and L
// dimensions.
func (k *sk) planView() []draw.Item {
	f := k.f
	var it []draw.Item
	wm, hm := f.B, f.B
	right := ""
	switch f.Shape {
	case "rectangle":
		hm, right = f.L, "L = "+metres(f.L)
	case "square":
		right = "B = " + metres(f.B)
	}
	top := k.yGL - colAbove - loadRoomIf(k.loads()) // level with the top of the section's drawing
	if k.titleY > 0 {
		it = append(it, draw.Text{X: k.planX, Y: k.titleY, Face: fonts.Bold, Size: sizeTitle, Color: inkText, Text: "Plan"})
		top = math.Min(top, k.titleY+descent(sizeTitle)+6)
	}
	rw := 0.0
	if right != "" {
		rw = 8 + 3 + textW(fonts.Regular, sizeText, right)
	}
	bottomRoom := 12 + 2.5 + ascent(sizeText) + descent(sizeText)
	sp := math.Min((k.planW-rw-6)/wm, (k.h-pad-top-bottomRoom-6)/hm)
	sp = math.Min(sp, k.s) // no larger than the section
	w, h := wm*sp, hm*sp
	x0, y0 := k.planX+3, top+3
	cx, cy := x0+w/2, y0+h/2
	conc := draw.Paint{Stroke: inkLine, Width: 0.8, Fill: fillConcr, Filled: true}
	if f.Shape == "circle" {
		it = append(it, draw.Poly{Points: arcPts(draw.Pt(cx, cy), w/2, 0, 2*math.Pi*47/48, 47), Closed: true, Paint: conc})
	} else {
		it = append(it, draw.Rect{X: x0, Y: y0, W: w, H: h, Paint: conc})
	}
	c := k.cw * sp
	it = append(it, draw.Rect{X: cx - c/2, Y: cy - c/2, W: c, H: c, Paint: draw.Paint{Stroke: inkLine, Width: 0.6, Fill: draw.Gray(235), Filled: true}})
	cl := draw.Paint{Stroke: draw.Gray(90), Width: 0.35, Dash: []float64{6, 1.5, 1, 1.5}}
	it = append(it, draw.Line{X1: x0 - 4, Y1: cy, X2: x0 + w + 4, Y2: cy, Paint: cl}, draw.Line{X1: cx, Y1: y0 - 4, X2: cx, Y2: y0 + h + 4, Paint: cl})
	ext := draw.Stroke(inkDim, 0.4)
	yb := y0 + h + 10
	it = append(it, draw.Line{X1: x0, Y1: y0 + h + 2, X2: x0, Y2: yb + 3, Paint: ext}, draw.Line{X1: x0 + w, Y1: y0 + h + 2, X2: x0 + w, Y2: yb + 3, Paint: ext})
	it = append(it, dim(draw.Pt(x0, yb), draw.Pt(x0+w, yb), nil)...)
	it = append(it, masked(txt(cx, yb+2.5+ascent(sizeText), draw.Center, "B = "+metres(f.B)))...)
	if right != "" {
		xr := x0 + w + 8
		it = append(it, draw.Line{X1: x0 + w + 2, Y1: y0, X2: xr + 3, Y2: y0, Paint: ext}, draw.Line{X1: x0 + w + 2, Y1: y0 + h, X2: xr + 3, Y2: y0 + h, Paint: ext})
		it = append(it, dim(draw.Pt(xr, y0), draw.Pt(xr, y0+h), nil)...)
		it = append(it, masked(txt(xr+3, cy+capMid(sizeText), draw.Left, right))...)
	}
	return it
}
