package sketch

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
)

// Clash reports the first two labels that overlap, or a label a drawn
// level (ground line and its hatching, water line, layer boundary) runs
// through: "" when every label stands clear. Tests use it on every sketch drawn.
func Clash(items []draw.Item) string {
	ts, lines := obstacles(items)
	for i := range ts {
		a := ts[i].Bounds()
		for j := i + 1; j < len(ts); j++ {
			if meets(a, ts[j].Bounds()) {
				return fmt.Sprintf("%q and %q overlap", ts[i].Text, ts[j].Text)
			}
		}
		for _, l := range lines {
			if meets(a, l) {
				return fmt.Sprintf("%q lies on the line at y %.1f", ts[i].Text, l.Y)
			}
		}
	}
	return ""
}

// obstacles are the texts among items and the bands of their level lines.
func obstacles(items []draw.Item) (ts []draw.Text, lines []draw.Rect) {
	for _, it := range items {
		switch x := it.(type) {
		case draw.Text:
			ts = append(ts, x)
		case draw.Line:
			if x.Y1 != x.Y2 {
				continue
			}
			c, w := x.Paint.Stroke, x.Paint.Width
			switch {
			case c == inkLine && w == glWidth: // ground line, hatched below
				lines = append(lines, draw.Rect{X: math.Min(x.X1, x.X2), Y: x.Y1, W: math.Abs(x.X2 - x.X1), H: hatchReach})
			case c == inkWater, c == inkBoundary && w == boundaryWidth: // water line, layer boundary
				lines = append(lines, draw.Rect{X: math.Min(x.X1, x.X2), Y: x.Y1, W: math.Abs(x.X2 - x.X1)})
			}
		}
	}
	return ts, lines
}

func meets(a, b draw.Rect) bool {
	return a.X < b.X+b.W && b.X < a.X+a.W && a.Y < b.Y+b.H+1e-9 && b.Y < a.Y+a.H+1e-9
}

// place returns the first candidate that stands clear of the texts and
// level lines among items (by half a point), else the first: labels are
// placed with it so that Clash finds nothing.
func place(items []draw.Item, cands ...draw.Text) draw.Text {
	ts, lines := obstacles(items)
	grow := func(r draw.Rect) draw.Rect { return draw.Rect{X: r.X - 0.5, Y: r.Y - 0.5, W: r.W + 1, H: r.H + 1} }
next:
	for _, c := range cands {
		r := grow(c.Bounds())
		for _, t := range ts {
			if meets(r, t.Bounds()) {
				continue next
			}
		}
		for _, l := range lines {
			if meets(r, l) {
				continue next
			}
		}
		return c
	}
	return cands[0]
}
