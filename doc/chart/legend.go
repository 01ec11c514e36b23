package chart

import (
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

const (
	swatch   = 22.0 // legend line sample
	legPad   = 4.0  // inside the legend box
	legInset = 4.0  // legend box to the plot's edge
	legSpace = 14.0 // between entries set in a row below the chart
)

// legendSize measures the legend: its box inside the plot, and the rows
// it takes set below the chart.
type legendSize struct {
	entries []int // series with names
	n       int
	w, h    float64 // the box
	rows    [][]int // entries per row below the chart
	rowW    []float64
	hBelow  float64
}

func rowH() float64 { return lineH(sizeText) + 1.5 }

func (c *Chart) legendSize() legendSize {
	var l legendSize
	tw := 0.0
	for i, s := range c.Series {
		if s.Name != "" {
			l.entries = append(l.entries, i)
			tw = max(tw, textW(fonts.Regular, sizeText, s.Name))
		}
	}
	l.n = len(l.entries)
	if l.n == 0 {
		return l
	}
	l.w = legPad + swatch + 4 + tw + legPad
	l.h = legPad + rowH()*float64(l.n) + legPad - 1.5
	var row []int
	rw := 0.0
	for _, i := range l.entries {
		w := swatch + 4 + textW(fonts.Regular, sizeText, c.Series[i].Name)
		if len(row) > 0 && rw+legSpace+w > c.W-2*pad {
			l.rows, l.rowW = append(l.rows, row), append(l.rowW, rw)
			row, rw = nil, 0
		}
		if len(row) > 0 {
			rw += legSpace
		}
		row, rw = append(row, i), rw+w
	}
	l.rows, l.rowW = append(l.rows, row), append(l.rowW, rw)
	l.hBelow = rowH() * float64(len(l.rows))
	return l
}

// placedLegend is the legend laid out: each entry's swatch start and
// baseline row middle.
type placedLegend struct {
	frame   *box // the box round an inside legend; nil below the chart
	entries []legendEntry
}

type legendEntry struct {
	series int
	x, y   float64 // swatch start, row middle
}

// placeLegendInside puts the legend in the corner (or edge middle) of the
// plot where it covers nothing — of several, the one with most room round
// it. It reports false when every place would cover something.
func (f *frame) placeLegendInside(l legendSize) bool {
	p := f.plot
	w, h := l.w, l.h
	xl, xr, xc := p.x0+legInset, p.x1-legInset-w, (p.x0+p.x1-w)/2
	yt, yb, ym := p.y0+legInset, p.y1-legInset-h, (p.y0+p.y1-h)/2
	spots := [][2]float64{{xr, yt}, {xl, yt}, {xr, yb}, {xl, yb}, {xc, yt}, {xc, yb}, {xr, ym}, {xl, ym}}
	found, bestRoom := -1, 0.0
	for i, s := range spots {
		b := box{s[0], s[1], s[0] + w, s[1] + h}
		if !b.within(p) || f.cost(b) > 0 {
			continue
		}
		room := 0.0 // how much lies just round it
		for _, g := range []float64{4, 8, 14} {
			room += f.cost(b.grow(g)) - 1000*boolf(!b.grow(g).within(p.grow(-1)))
		}
		if found < 0 || room < bestRoom {
			found, bestRoom = i, room
		}
	}
	if found < 0 {
		return false
	}
	s := spots[found]
	b := box{s[0], s[1], s[0] + w, s[1] + h}
	pl := &placedLegend{frame: &b}
	for r, i := range l.entries {
		pl.entries = append(pl.entries, legendEntry{series: i, x: b.x0 + legPad, y: b.y0 + legPad + rowH()*(float64(r)+0.5) - 0.75})
	}
	f.legend = pl
	return true
}

func boolf(b bool) float64 {
	if b {
		return 1
	}
	return 0
}

// placeLegendBelow sets the legend in centred rows under the chart.
func (f *frame) placeLegendBelow(l legendSize) {
	pl := &placedLegend{}
	for r, row := range l.rows {
		x := (f.c.W - l.rowW[r]) / 2
		y := f.legendY + rowH()*(float64(r)+0.5)
		for _, i := range row {
			pl.entries = append(pl.entries, legendEntry{series: i, x: x, y: y})
			x += swatch + 4 + textW(fonts.Regular, sizeText, f.c.Series[i].Name) + legSpace
		}
	}
	f.legend = pl
}

// paintLegend draws the legend: box, line samples with markers, names.
func (f *frame) paintLegend(items []draw.Item) []draw.Item {
	if f.legend == nil {
		return items
	}
	if b := f.legend.frame; b != nil {
		items = append(items, draw.Rect{X: b.x0, Y: b.y0, W: b.w(), H: b.h(),
			Paint: draw.Paint{Stroke: draw.Gray(150), Width: 0.5, Fill: draw.Gray(255), Filled: true}})
	}
	for _, e := range f.legend.entries {
		l := f.looks[e.series]
		s := f.c.Series[e.series]
		a, b := draw.Pt(e.x, e.y), draw.Pt(e.x+swatch, e.y)
		if s.Style != Markers {
			items = line([]draw.Point{a, b}, l, items)
		}
		if l.marker != NoMarker && s.Style != Band {
			items = append(items, marker(draw.Pt(e.x+swatch/2, e.y), l.marker, l.color, l.filled)...)
		}
		t := text{x: e.x + swatch + 4, y: e.y + capMid(sizeText), face: fonts.Regular, size: sizeText, s: s.Name, color: inkText}
		items = append(items, t.item())
	}
	return items
}
