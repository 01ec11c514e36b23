package eqn

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// fence sets X between delimiters. Content no taller than ordinary text
// gets the font's own glyphs; taller content gets drawn delimiters,
// symmetric about the math axis like TeX's, grown to cover it.
func (c *ctx) fence(f Fence) *Box {
	x := c.layout(f.X)
	b := &Box{}
	reg := fonts.Get(fonts.Regular)
	ga, gd := reg.Ink("(", c.size)
	if x.Ascent <= ga+c.em(0.12) && x.Descent <= gd+c.em(0.18) {
		pad := c.em(0.03)
		if f.Open != "" {
			b.place(c.text(f.Open, c.face(false)), 0, 0)
		}
		b.place(x, b.W+pad, 0)
		if f.Close != "" {
			b.place(c.text(f.Close, c.face(false)), b.W+pad, 0)
		}
		return b
	}
	a := c.axis()
	ext := math.Max(x.Ascent-a, x.Descent+a) + c.em(0.1)
	top, bottom := -a-ext, -a+ext
	open := c.delim(f.Open, top, bottom, false)
	b.place(open, 0, 0)
	b.place(x, b.W+c.em(0.06), 0)
	close := c.delim(f.Close, top, bottom, true)
	b.place(close, b.W+c.em(0.06), 0)
	return b
}

// delim draws one delimiter spanning top to bottom (y down).
func (c *ctx) delim(kind string, top, bottom float64, right bool) *Box {
	h := bottom - top
	var items []draw.Item
	var w float64
	mirror := func(ps []draw.Point) {
		if right {
			for i := range ps {
				ps[i].X = w - ps[i].X
			}
		}
	}
	switch kind {
	case "(", ")":
		w = c.em(0.3) + 0.05*h
		bulge := w * 0.72
		thick := math.Max(c.em(0.075), 0.6)
		thin := thick * 0.3
		const n = 16
		var ps []draw.Point
		for i := 0; i <= n; i++ { // outer edge, top to bottom
			t := float64(i) / n
			s := math.Sin(math.Pi * t)
			ps = append(ps, draw.Point{X: w*0.9 - bulge*s, Y: top + t*h})
		}
		for i := n; i >= 0; i-- { // inner edge, bottom to top
			t := float64(i) / n
			s := math.Sin(math.Pi * t)
			ps = append(ps, draw.Point{X: w*0.9 - bulge*s + thin + (thick-thin)*s, Y: top + t*h})
		}
		mirror(ps)
		items = append(items, draw.Poly{Points: ps, Closed: true, Paint: draw.Fill(c.color)})
	case "[", "]":
		w = c.em(0.3)
		t := c.rule() * 1.3
		ps := []draw.Point{draw.Pt(w*0.85, top), draw.Pt(w*0.2, top), draw.Pt(w*0.2, bottom), draw.Pt(w*0.85, bottom),
			draw.Pt(w*0.85, bottom-t), draw.Pt(w*0.2+t, bottom-t), draw.Pt(w*0.2+t, top+t), draw.Pt(w*0.85, top+t)}
		mirror(ps)
		items = append(items, draw.Poly{Points: ps, Closed: true, Paint: draw.Fill(c.color)})
	case "|":
		w = c.em(0.22)
		t := c.rule() * 1.2
		items = append(items, draw.Rect{X: w/2 - t/2, Y: top, W: t, H: h, Paint: draw.Fill(c.color)})
	case "":
		w = 0
	default: // any other delimiter: the glyph at its own size
		return c.text(kind, c.face(false))
	}
	return &Box{W: w, Ascent: -top, Descent: bottom, items: items}
}
