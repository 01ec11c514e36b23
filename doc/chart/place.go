package chart

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// cost scores a label's box in the plot: curves and lines under it (by
// length), markers, other labels, and leaving the plot.
func (f *frame) cost(b box) float64 {
	c := 0.0
	if !b.within(f.plot.grow(-1)) {
		c += 1000
	}
	g := b.grow(1.5)
	for _, s := range f.segs {
		c += g.lenIn(s[0], s[1])
	}
	m := g.grow(markSize / 2)
	for _, ms := range f.marks {
		for _, p := range ms {
			if m.has(p) {
				c += 8
			}
		}
	}
	for _, t := range f.texts {
		if t.overlaps(g) {
			c += 300
		}
	}
	return c
}

// best returns the candidate of least cost (the first of equals).
func (f *frame) best(cands []text) (text, float64) {
	bi, bc := 0, math.Inf(1)
	for i, t := range cands {
		if c := f.cost(t.bounds()); c < bc {
			bi, bc = i, c
		}
	}
	return cands[bi], bc
}

// placeRefs labels each reference line at whichever end and side is
// clearest, then adds the line to what later labels avoid.
func (f *frame) placeRefs() {
	p := f.plot
	for _, r := range f.c.Guides {
		rl := r
		t := text{face: fonts.Italic, size: sizeText, s: r.Label, color: inkRef}
		if r.Faint {
			t.face, t.color = fonts.Regular, inkFaint
		}
		var a, b draw.Point
		var cands []text
		if !r.OnY {
			if !f.sx.contains(r.Value) {
				continue
			}
			x := f.px(r.Value)
			a, b = draw.Pt(x, p.y0), draw.Pt(x, p.y1)
			top, bot := p.y0+3+ascent(sizeText), p.y1-3-descent(sizeText)
			mid := (p.y0+p.y1)/2 + capMid(sizeText)
			for _, y := range []float64{top, bot, mid} {
				r, l := text{x: x + 3, y: y}, text{x: x - 3, y: y, align: draw.Right}
				if f.c.X.Reverse {
					r, l = l, r
				}
				cands = append(cands, r, l)
			}
		} else {
			if !f.sy.contains(r.Value) {
				continue
			}
			y := f.py(r.Value)
			a, b = draw.Pt(p.x0, y), draw.Pt(p.x1, y)
			above, below := y-2.5-descent(sizeText), y+2.5+ascent(sizeText)
			ys := []float64{above, below}
			switch { // a boundary is named on the side where its layer lies
			case r.Faint && f.c.Y.Reverse:
				ys = []float64{below}
			case r.Faint:
				ys = []float64{above}
			}
			for _, yy := range ys {
				r, l := text{x: p.x1 - 4, y: yy, align: draw.Right}, text{x: p.x0 + 4, y: yy}
				if rl.Faint {
					r, l = l, r
				}
				cands = append(cands, r, l, text{x: (p.x0 + p.x1) / 2, y: yy, align: draw.Center})
			}
		}
		if r.Label != "" {
			for i := range cands {
				cands[i].face, cands[i].size, cands[i].s, cands[i].color = t.face, t.size, t.s, t.color
			}
			t, _ = f.best(cands)
			f.texts = append(f.texts, t.bounds())
			f.refTexts = append(f.refTexts, t)
		}
		f.segs = append(f.segs, [2]draw.Point{a, b})
		f.refLines = append(f.refLines, refLine{a, b, r.Faint})
	}
}

// placedNote is an annotation laid out.
type placedNote struct {
	p      draw.Point
	lead   [2]draw.Point
	t      text
	guides [][2]draw.Point
}

// placeNotes sets each annotation's label in the clearest of sixteen
// places round its point (eight directions, two leader lengths).
func (f *frame) placeNotes() {
	pl := f.plot
	for _, n := range f.c.Notes {
		p := f.pt(n.X, n.Y)
		if !pl.has(p) {
			continue
		}
		pn := placedNote{p: p}
		if n.Guides {
			xe, ye := pl.y1, pl.x0
			if f.c.X.Opposite {
				xe = pl.y0
			}
			if f.c.Y.Opposite {
				ye = pl.x1
			}
			pn.guides = [][2]draw.Point{{p, draw.Pt(p.X, xe)}, {p, draw.Pt(ye, p.Y)}}
			f.segs = append(f.segs, pn.guides...)
		}
		var cands []text
		var ends []draw.Point
		for _, l := range []float64{12, 22} {
			for _, d := range [][2]float64{{1, -1}, {-1, -1}, {1, 1}, {-1, 1}, {1, 0}, {-1, 0}, {0, -1}, {0, 1}} {
				s := l
				if d[0] != 0 && d[1] != 0 {
					s = l * math.Sqrt2 / 2
				}
				e := draw.Pt(p.X+d[0]*s, p.Y+d[1]*s)
				t := text{face: fonts.Regular, size: sizeText, s: n.Text, color: inkText}
				switch {
				case d[0] > 0:
					t.x = e.X + 1
				case d[0] < 0:
					t.x, t.align = e.X-1, draw.Right
				default:
					t.x, t.align = e.X, draw.Center
				}
				switch {
				case d[1] < 0:
					t.y = e.Y - 1 - descent(sizeText)
				case d[1] > 0:
					t.y = e.Y + 1 + ascent(sizeText)
				default:
					t.y = e.Y + capMid(sizeText)
				}
				cands = append(cands, t)
				ends = append(ends, e)
			}
		}
		bi, bc := 0, math.Inf(1)
		for i, t := range cands {
			if c := f.cost(t.bounds()); c < bc {
				bi, bc = i, c
			}
		}
		pn.t = cands[bi]
		e := ends[bi]
		d := math.Hypot(e.X-p.X, e.Y-p.Y)
		pn.lead = [2]draw.Point{draw.Pt(p.X+(e.X-p.X)*2.5/d, p.Y+(e.Y-p.Y)*2.5/d), e}
		f.texts = append(f.texts, pn.t.bounds())
		f.segs = append(f.segs, pn.lead)
		f.notes = append(f.notes, pn)
	}
}
