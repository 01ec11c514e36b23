package draw_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

func TestOffsetScale(t *testing.T) {
	p := draw.Poly{Points: []draw.Point{draw.Pt(0, 0), draw.Pt(10, 5)}, Paint: draw.Paint{Width: 1, Dash: []float64{2, 1}}}
	q := draw.Offset(p, 3, 4).(draw.Poly)
	if q.Points[1] != draw.Pt(13, 9) || p.Points[1] != draw.Pt(10, 5) {
		t.Errorf("offset moved %v, original %v", q.Points, p.Points)
	}
	s := draw.Scale(p, 0.5).(draw.Poly)
	if s.Points[1] != draw.Pt(5, 2.5) || s.Width != 0.5 || s.Dash[0] != 1 || p.Dash[0] != 2 {
		t.Errorf("scale: %+v (original %+v)", s, p)
	}
	txt := draw.Text{X: 100, Y: 50, Face: fonts.Regular, Size: 10, Align: draw.Right, Text: "abc"}
	if b := txt.Bounds(); b.X+b.W != 100 || b.Y >= 50 || b.Y+b.H <= 50 {
		t.Errorf("right-aligned text bounds %+v", b)
	}
}
