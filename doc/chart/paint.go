package chart

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// paint draws the laid-out chart, back to front: grid, region dividers,
// bands, reference lines, curves, markers, annotations, frame, ticks and
// labels, legend.
func (f *frame) paint() []draw.Item {
	var items []draw.Item
	p := f.plot
	c := f.c
	// grid
	for _, v := range f.sx.Minor {
		if f.decadePt(true) >= 24 {
			x := f.px(v)
			items = append(items, draw.Line{X1: x, Y1: p.y0, X2: x, Y2: p.y1, Paint: draw.Stroke(inkMinor, 0.3)})
		}
	}
	for _, v := range f.sy.Minor {
		if f.decadePt(false) >= 24 {
			y := f.py(v)
			items = append(items, draw.Line{X1: p.x0, Y1: y, X2: p.x1, Y2: y, Paint: draw.Stroke(inkMinor, 0.3)})
		}
	}
	for _, t := range f.sx.Major {
		if x := f.px(t.V); x > p.x0+0.5 && x < p.x1-0.5 {
			items = append(items, draw.Line{X1: x, Y1: p.y0, X2: x, Y2: p.y1, Paint: draw.Stroke(inkGrid, 0.4)})
		}
	}
	for _, t := range f.sy.Major {
		if y := f.py(t.V); y > p.y0+0.5 && y < p.y1-0.5 {
			items = append(items, draw.Line{X1: p.x0, Y1: y, X2: p.x1, Y2: y, Paint: draw.Stroke(inkGrid, 0.4)})
		}
	}
	items = f.paintRegions(items)
	// curves: bands first, then the rest in order, then all markers
	for i, runs := range f.runs {
		if f.looks[i].style == Band {
			for _, r := range runs {
				items = append(items, draw.Poly{Points: r, Paint: draw.Stroke(f.looks[i].color, f.looks[i].width)})
			}
		}
	}
	for _, r := range f.refLines {
		pt := draw.Paint{Stroke: inkRef, Width: 0.75, Dash: []float64{6, 2, 1.5, 2}}
		if r.faint {
			pt = draw.Stroke(draw.Gray(150), 0.5)
		}
		items = append(items, draw.Line{X1: r.a.X, Y1: r.a.Y, X2: r.b.X, Y2: r.b.Y, Paint: pt})
	}
	for i, runs := range f.runs {
		if f.looks[i].style != Band {
			for _, r := range runs {
				items = line(r, f.looks[i], items)
			}
		}
	}
	for i, ms := range f.marks {
		for _, m := range ms {
			items = append(items, marker(m, f.looks[i].marker, f.looks[i].color, f.looks[i].filled)...)
		}
	}
	for _, t := range f.refTexts {
		items = append(items, t.item())
	}
	for _, n := range f.notes {
		for _, g := range n.guides {
			items = append(items, draw.Line{X1: g[0].X, Y1: g[0].Y, X2: g[1].X, Y2: g[1].Y,
				Paint: draw.Paint{Stroke: inkLead, Width: 0.5, Dash: []float64{1, 1.5}}})
		}
		items = append(items, draw.Line{X1: n.lead[0].X, Y1: n.lead[0].Y, X2: n.lead[1].X, Y2: n.lead[1].Y, Paint: draw.Stroke(inkLead, 0.5)})
		items = append(items, dot(n.p, 1.6, inkText))
		items = append(items, n.t.item())
	}
	// frame, ticks, labels
	items = append(items, draw.Rect{X: p.x0, Y: p.y0, W: p.w(), H: p.h(), Paint: draw.Stroke(inkAxis, 0.7)})
	ax := draw.Stroke(inkAxis, 0.6)
	xTick := func(v, l float64) {
		x := f.px(v)
		y, d := p.y1, l
		if c.X.Opposite {
			y, d = p.y0, -l
		}
		items = append(items, draw.Line{X1: x, Y1: y, X2: x, Y2: y + d, Paint: ax})
	}
	yTick := func(v, l float64) {
		y := f.py(v)
		x, d := p.x0, -l
		if c.Y.Opposite {
			x, d = p.x1, l
		}
		items = append(items, draw.Line{X1: x, Y1: y, X2: x + d, Y2: y, Paint: ax})
	}
	for _, t := range f.sx.Major {
		xTick(t.V, tickLen)
	}
	for _, v := range f.sx.Minor {
		xTick(v, minorLen)
	}
	for _, t := range f.sy.Major {
		yTick(t.V, tickLen)
	}
	for _, v := range f.sy.Minor {
		yTick(v, minorLen)
	}
	for _, t := range f.xTicks {
		items = append(items, t.item())
	}
	for _, t := range f.yTicks {
		items = append(items, t.item())
	}
	if c.X.Title != "" {
		t := text{x: (p.x0 + p.x1) / 2, y: f.xLabelY, face: fonts.Regular, size: sizeAxis, align: draw.Center, s: c.X.Title, color: inkText}
		items = append(items, f.clampX(t).item())
	}
	if c.Y.Title != "" {
		t := text{x: pad, y: f.yLabelY, face: fonts.Regular, size: sizeAxis, s: c.Y.Title, color: inkText}
		if c.Y.Opposite {
			t.x, t.align = c.W-pad, draw.Right
		}
		items = append(items, t.item())
	}
	if c.Title != "" {
		t := text{x: (p.x0 + p.x1) / 2, y: f.titleY, face: fonts.Bold, size: sizeTitle, align: draw.Center, s: c.Title, color: inkText}
		items = append(items, f.clampX(t).item())
	}
	return f.paintLegend(items)
}

// clampX moves a centred text sideways to keep it inside the chart.
func (f *frame) clampX(t text) text {
	b := t.bounds()
	if b.x0 < pad {
		t.x += pad - b.x0
	} else if b.x1 > f.c.W-pad {
		t.x -= b.x1 - (f.c.W - pad)
	}
	return t
}

// decadePt is the length of one decade of a log axis in points (0 for a
// linear axis).
func (f *frame) decadePt(x bool) float64 {
	s, l := f.sy, f.plot.h()
	if x {
		s, l = f.sx, f.plot.w()
	}
	if !s.Log {
		return 0
	}
	return l / math.Log10(s.Max/s.Min)
}

// paintRegions draws the region band (a bracket and label per region)
// and dividers across the plot between regions.
func (f *frame) paintRegions(items []draw.Item) []draw.Item {
	p := f.plot
	if len(f.c.Regions) == 0 {
		return items
	}
	thin := draw.Stroke(inkAxis, 0.5)
	mid := f.bandY + bandH/2
	tip := 2.5 // bracket ends point toward the plot
	if f.c.X.Opposite {
		tip = -2.5
	}
	seen := map[float64]bool{}
	for _, r := range f.c.Regions {
		a, b := f.px(r.From), f.px(r.To)
		if a > b {
			a, b = b, a
		}
		a, b = max(a, p.x0), min(b, p.x1)
		if b-a < 4 {
			continue
		}
		a, b = a+1, b-1
		t := text{x: (a + b) / 2, y: mid + capMid(sizeText), face: fonts.Italic, size: sizeText, align: draw.Center, s: r.Label, color: inkText}
		tb := t.bounds()
		if r.Label != "" && tb.w()+8 <= b-a {
			items = append(items, draw.Line{X1: a, Y1: mid, X2: tb.x0 - 3, Y2: mid, Paint: thin},
				draw.Line{X1: tb.x1 + 3, Y1: mid, X2: b, Y2: mid, Paint: thin}, t.item())
		} else {
			items = append(items, draw.Line{X1: a, Y1: mid, X2: b, Y2: mid, Paint: thin})
		}
		items = append(items, draw.Line{X1: a, Y1: mid - tip, X2: a, Y2: mid + tip, Paint: thin},
			draw.Line{X1: b, Y1: mid - tip, X2: b, Y2: mid + tip, Paint: thin})
		for _, v := range []float64{r.From, r.To} {
			x := f.px(v)
			if x > p.x0+0.5 && x < p.x1-0.5 && !seen[v] {
				seen[v] = true
				items = append(items, draw.Line{X1: x, Y1: p.y0, X2: x, Y2: p.y1,
					Paint: draw.Paint{Stroke: draw.Gray(120), Width: 0.6, Dash: []float64{3, 2}}})
			}
		}
	}
	return items
}
