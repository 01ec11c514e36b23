package chart

import (
	"fmt"
	"math"
	"sort"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Sizes in points.
const (
	pad      = 2.0  // clear margin round the whole chart
	tickLen  = 3.5  // major tick, outward
	minorLen = 2.0  // minor tick
	tickGap  = 2.5  // tick to its label
	labelGap = 3.5  // tick labels to the axis label
	bandH    = 13.0 // the region band
	minPlotW = 60.0
	minPlotH = 40.0

	sizeTitle = 9.5
	sizeAxis  = 8.5
	sizeTick  = 7.5
	sizeText  = 7.5 // legend, notes, reference and region labels
)

var (
	inkText  = draw.Gray(0)
	inkAxis  = draw.Gray(35)
	inkGrid  = draw.Gray(212)
	inkMinor = draw.Gray(232)
	inkLead  = draw.Gray(60)
	inkRef   = draw.Color{R: 150, G: 25, B: 25}
	inkBand  = draw.Gray(205)
	inkFaint = draw.Gray(110)
)

type refLine struct {
	a, b  draw.Point
	faint bool
}

// frame is a chart laid out: the plot area, the scales and where each
// piece of text goes, and what has been placed in the plot so far.
type frame struct {
	c              *Chart
	sx, sy         Scale
	plot           box
	titleY         float64 // baselines
	xLabelY        float64
	yLabelY        float64
	bandY          float64 // top of the region band
	legendY        float64 // top of a legend set below the chart
	looks          []look
	runs           [][][]draw.Point // each series' visible runs, page coordinates
	marks          [][]draw.Point   // each series' marker positions
	segs           [][2]draw.Point  // curves and lines for placement to avoid
	texts          []box            // placed labels
	refTexts       []text
	refLines       []refLine
	notes          []placedNote
	legend         *placedLegend
	xTicks, yTicks []text // labels kept after thinning
}

// px and py map data to the page.
func (f *frame) px(v float64) float64 {
	t := f.sx.frac(v)
	if f.c.X.Reverse {
		t = 1 - t
	}
	return f.plot.x0 + t*f.plot.w()
}

func (f *frame) py(v float64) float64 {
	t := f.sy.frac(v)
	if f.c.Y.Reverse {
		return f.plot.y0 + t*f.plot.h()
	}
	return f.plot.y1 - t*f.plot.h()
}

func (f *frame) pt(x, y float64) draw.Point { return draw.Pt(f.px(x), f.py(y)) }

// xAxisH is the height of the x axis's ticks, labels and title.
func (c *Chart) xAxisH() float64 {
	h := tickLen + tickGap + lineH(sizeTick)
	if c.X.Title != "" {
		h += labelGap + lineH(sizeAxis)
	}
	return h
}

// layout places everything but the legend; outside reserves room for the
// legend below the chart.
func (c *Chart) layout(ex, ey extent, lg legendSize, outside bool) (*frame, error) {
	f := &frame{c: c}
	top, bottom := pad, c.H-pad
	if c.Title != "" {
		f.titleY = top + ascent(sizeTitle)
		top += lineH(sizeTitle) + 4
	}
	// the end tick labels of the y axis reach this far past the plot
	yEnd := ascent(sizeTick) - capMid(sizeTick)
	if c.Y.Title != "" && !c.X.Opposite {
		f.yLabelY = top + ascent(sizeAxis)
		top += lineH(sizeAxis) + 2 + yEnd
	}
	if len(c.Regions) > 0 && !c.X.Opposite {
		f.bandY = top
		top += bandH
	}
	if c.X.Opposite {
		top += c.xAxisH()
	}
	if outside {
		f.legendY = bottom - lg.hBelow
		bottom = f.legendY - 5
	}
	if c.X.Opposite {
		if c.Y.Title != "" {
			f.yLabelY = bottom - descent(sizeAxis)
			bottom -= lineH(sizeAxis) + 2 + yEnd
		}
		if len(c.Regions) > 0 {
			bottom -= bandH
			f.bandY = bottom
		}
	} else {
		bottom -= c.xAxisH()
	}
	// the y axis's end labels stand out past the plot by yEnd
	f.plot.y0, f.plot.y1 = max(top, pad+yEnd), min(bottom, c.H-pad-yEnd)
	if f.plot.h() < minPlotH {
		return nil, c.tooSmall()
	}
	var err error
	if f.sy, err = chooseScale(c.Y, ey, f.plot.h(), false, "Y axis"); err != nil {
		return nil, err
	}
	yw := 0.0
	for _, t := range f.sy.Major {
		yw = math.Max(yw, textW(fonts.Regular, sizeTick, t.Label))
	}
	yAxisW := yw + tickGap + tickLen
	ovL, ovR := 0.0, 0.0
	for range 3 {
		f.plot.x0, f.plot.x1 = pad+ovL, c.W-pad-ovR
		if c.Y.Opposite {
			f.plot.x1 = math.Min(f.plot.x1, c.W-pad-yAxisW)
		} else {
			f.plot.x0 = math.Max(f.plot.x0, pad+yAxisW)
		}
		if f.plot.w() < minPlotW {
			return nil, c.tooSmall()
		}
		if f.sx, err = chooseScale(c.X, ex, f.plot.w(), true, "X axis"); err != nil {
			return nil, err
		}
		// x tick labels centred on ticks at the plot's ends overhang it
		l, r := 0.0, 0.0
		for _, t := range f.sx.Major {
			hw := textW(fonts.Regular, sizeTick, t.Label) / 2
			x := f.px(t.V)
			l = math.Max(l, hw-(x-pad))
			r = math.Max(r, x+hw-(c.W-pad))
		}
		if l <= 0.01 && r <= 0.01 {
			break
		}
		ovL, ovR = ovL+math.Max(l, 0), ovR+math.Max(r, 0)
	}
	// axis label rows
	if c.X.Opposite {
		f.xLabelY = f.plot.y0 - tickLen - tickGap - lineH(sizeTick) - labelGap - descent(sizeAxis)
	} else {
		f.xLabelY = f.plot.y1 + tickLen + tickGap + lineH(sizeTick) + labelGap + ascent(sizeAxis)
	}
	for _, l := range []struct {
		where, s string
		face     fonts.Face
		size     float64
	}{{"title", c.Title, fonts.Bold, sizeTitle}, {"X axis", c.X.Title, fonts.Regular, sizeAxis}, {"Y axis", c.Y.Title, fonts.Regular, sizeAxis}} {
		if w := textW(l.face, l.size, l.s); w > c.W-2*pad {
			return nil, &Error{Where: l.where, Param: "label", Value: fmt.Sprintf("%q", l.s), Want: fmt.Sprintf("is %.0f pt wide; the chart is %.0f pt", w, c.W)}
		}
	}
	f.series()
	f.thinTicks()
	f.placeRefs()
	f.placeNotes()
	return f, nil
}

func (c *Chart) tooSmall() error {
	return &Error{Where: "chart", Param: "W × H", Value: num(c.W) + " × " + num(c.H),
		Want: fmt.Sprintf("is too small for its labels (the plot needs at least %.0f × %.0f pt)", minPlotW, minPlotH)}
}

// chooseScale resolves an axis for a length in points: as many intervals
// as fit with labels apart (x: by their widths; y: about 26 pt).
func chooseScale(a Axis, e extent, length float64, horizontal bool, where string) (Scale, error) {
	n := int(length / 26)
	if horizontal {
		n = int(length / 42)
	}
	for n = max(n, 1); ; n-- {
		s, err := a.scale(e.lo, e.hi, n, where)
		if err != nil || n == 1 || labelsFit(s, length, horizontal) {
			return s, err
		}
	}
}

// labelsFit reports whether the labelled ticks of s clear each other on
// an axis length points long.
func labelsFit(s Scale, length float64, horizontal bool) bool {
	type lab struct{ at, half float64 }
	var ls []lab
	for _, t := range s.Major {
		if t.Label == "" {
			continue
		}
		h := lineH(sizeTick) / 2
		if horizontal {
			h = textW(fonts.Regular, sizeTick, t.Label) / 2
		}
		ls = append(ls, lab{s.frac(t.V) * length, h})
	}
	sort.Slice(ls, func(i, j int) bool { return ls[i].at < ls[j].at })
	for i := 1; i < len(ls); i++ {
		if ls[i].at-ls[i-1].at < ls[i].half+ls[i-1].half+6 {
			return false
		}
	}
	return true
}

// thinTicks sets the tick labels, dropping any that would touch the one
// before it (custom ticks can crowd).
func (f *frame) thinTicks() {
	for _, t := range f.sx.Major {
		if t.Label == "" {
			continue
		}
		tx := text{x: f.px(t.V), face: fonts.Regular, size: sizeTick, align: draw.Center, s: t.Label, color: inkText}
		if f.c.X.Opposite {
			tx.y = f.plot.y0 - tickLen - tickGap - descent(sizeTick)
		} else {
			tx.y = f.plot.y1 + tickLen + tickGap + ascent(sizeTick)
		}
		f.xTicks = keep(f.xTicks, tx, 5)
	}
	for _, t := range f.sy.Major {
		if t.Label == "" {
			continue
		}
		tx := text{y: f.py(t.V) + capMid(sizeTick), face: fonts.Regular, size: sizeTick, s: t.Label, color: inkText}
		if f.c.Y.Opposite {
			tx.x = f.plot.x1 + tickLen + tickGap
		} else {
			tx.x, tx.align = f.plot.x0-tickLen-tickGap, draw.Right
		}
		f.yTicks = keep(f.yTicks, tx, 1)
	}
}

// keep appends t unless it comes within gap of a label already kept.
func keep(ts []text, t text, gap float64) []text {
	b := t.bounds().grow(gap / 2)
	for _, o := range ts {
		if o.bounds().grow(gap / 2).overlaps(b) {
			return ts
		}
	}
	return append(ts, t)
}
