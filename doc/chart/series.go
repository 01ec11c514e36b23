package chart

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
)

// look is how one series is drawn.
type look struct {
	style  Style
	dash   []float64
	marker Marker
	color  draw.Color
	width  float64
	filled bool
}

// dashes are the patterns in the order series without a Dash take them.
func dashes() [][]float64 { return [][]float64{Solid, Dashed, Dotted, DashDot, LongDash, DashDotDot} }

const (
	lineW     = 0.9
	lineWEmph = 1.7
	bandW     = 6.0
	markSize  = 4.6  // across
	markGap   = 14.0 // least distance between markers of one series
)

// looks gives each series its dash, marker and colour: explicit choices
// stand, the rest follow series order (bands take no turn).
func (c *Chart) looks() []look {
	ls := make([]look, len(c.Series))
	k := 0
	for i, s := range c.Series {
		l := look{style: s.Style, width: lineW, filled: s.Emphasis}
		if s.Emphasis {
			l.width = lineWEmph
		}
		if s.Style == Band {
			l.width, l.color = bandW, inkBand
			if s.Color != (draw.Color{}) {
				l.color = s.Color
			}
			ls[i] = l
			continue
		}
		l.dash = s.Dash
		if l.dash == nil {
			ds := dashes()
			l.dash = ds[k%len(ds)]
		}
		l.dash = append([]float64(nil), l.dash...)
		l.marker = s.Marker
		if l.marker == MarkerAuto {
			l.marker = Marker(2 + k%int(Plus-1))
		}
		if s.Style == Lines {
			l.marker = NoMarker
		}
		l.color = Palette[k%len(Palette)]
		if s.Color != (draw.Color{}) {
			l.color = s.Color
		}
		if s.Style == Markers && l.marker == NoMarker {
			l.marker = Circle
		}
		ls[i] = l
		k++
	}
	return ls
}

// series maps each series to the page, clips it to the plot and picks the
// points that get markers.
func (f *frame) series() {
	f.looks = f.c.looks()
	plot := f.plot
	for i, s := range f.c.Series {
		pts := make([]draw.Point, len(s.X))
		for j := range s.X {
			pts[j] = f.pt(s.X[j], s.Y[j])
		}
		var runs [][]draw.Point
		if s.Style != Markers {
			runs = plot.clipPath(pts)
		}
		f.runs = append(f.runs, runs)
		for _, r := range runs {
			for j := 1; j < len(r); j++ {
				f.segs = append(f.segs, [2]draw.Point{r[j-1], r[j]})
			}
		}
		var ms []draw.Point
		if l := f.looks[i]; l.marker != NoMarker && s.Style != Band {
			for _, p := range pts {
				if !plot.has(p) {
					continue
				}
				if n := len(ms); n > 0 && math.Hypot(p.X-ms[n-1].X, p.Y-ms[n-1].Y) < markGap {
					continue
				}
				ms = append(ms, p)
			}
		}
		f.marks = append(f.marks, ms)
	}
}

// dashed cuts a polyline into its dashes (each a solid run), so the pattern
// runs on unbroken through the points of a dense curve.
func dashed(pts []draw.Point, pat []float64) [][]draw.Point {
	if len(pat) == 0 {
		return [][]draw.Point{pts}
	}
	var out [][]draw.Point
	k, left, on := 0, pat[0], true
	cur := []draw.Point{pts[0]}
	for i := 1; i < len(pts); i++ {
		a, b := pts[i-1], pts[i]
		seg := math.Hypot(b.X-a.X, b.Y-a.Y)
		pos := 0.0
		for seg-pos > left {
			pos += left
			t := pos / seg
			p := draw.Pt(a.X+t*(b.X-a.X), a.Y+t*(b.Y-a.Y))
			if on {
				out = append(out, append(cur, p))
			}
			cur = []draw.Point{p}
			on = !on
			k = (k + 1) % len(pat)
			left = pat[k]
		}
		left -= seg - pos
		if on {
			cur = append(cur, b)
		} else {
			cur = []draw.Point{b}
		}
	}
	if on && len(cur) > 1 {
		out = append(out, cur)
	}
	return out
}

// line draws a polyline in a look, dashing it itself.
func line(pts []draw.Point, l look, items []draw.Item) []draw.Item {
	for _, d := range dashed(pts, l.dash) {
		items = append(items, draw.Poly{Points: d, Paint: draw.Stroke(l.color, l.width)})
	}
	return items
}

// marker draws one marker centred on p: open (white inside) unless the
// look is filled.
func marker(p draw.Point, m Marker, col draw.Color, filled bool) []draw.Item {
	r := markSize / 2
	paint := draw.Paint{Stroke: col, Width: 0.75, Fill: draw.Gray(255), Filled: true}
	if filled {
		paint.Fill = col
	}
	poly := func(pts ...draw.Point) []draw.Item {
		for i := range pts {
			pts[i] = draw.Pt(p.X+pts[i].X, p.Y+pts[i].Y)
		}
		return []draw.Item{draw.Poly{Points: pts, Closed: true, Paint: paint}}
	}
	switch m {
	case Circle:
		pts := make([]draw.Point, 16)
		for i := range pts {
			a := 2 * math.Pi * float64(i) / 16
			pts[i] = draw.Pt(r*math.Cos(a), r*math.Sin(a))
		}
		return poly(pts...)
	case Square:
		s := r * 0.85
		return poly(draw.Pt(-s, -s), draw.Pt(s, -s), draw.Pt(s, s), draw.Pt(-s, s))
	case Triangle:
		return poly(draw.Pt(0, -r*1.1), draw.Pt(r, r*0.75), draw.Pt(-r, r*0.75))
	case InvTriangle:
		return poly(draw.Pt(0, r*1.1), draw.Pt(-r, -r*0.75), draw.Pt(r, -r*0.75))
	case Diamond:
		s := r * 1.15
		return poly(draw.Pt(0, -s), draw.Pt(s, 0), draw.Pt(0, s), draw.Pt(-s, 0))
	case Cross, Plus:
		st := draw.Stroke(col, 0.9)
		if filled {
			st.Width = 1.3
		}
		s := r
		if m == Cross {
			s *= 0.8
			return []draw.Item{draw.Line{X1: p.X - s, Y1: p.Y - s, X2: p.X + s, Y2: p.Y + s, Paint: st},
				draw.Line{X1: p.X - s, Y1: p.Y + s, X2: p.X + s, Y2: p.Y - s, Paint: st}}
		}
		return []draw.Item{draw.Line{X1: p.X - s, Y1: p.Y, X2: p.X + s, Y2: p.Y, Paint: st},
			draw.Line{X1: p.X, Y1: p.Y - s, X2: p.X, Y2: p.Y + s, Paint: st}}
	}
	return nil
}

// dot is a small filled circle of radius r.
func dot(p draw.Point, r float64, col draw.Color) draw.Item {
	pts := make([]draw.Point, 12)
	for i := range pts {
		a := 2 * math.Pi * float64(i) / 12
		pts[i] = draw.Pt(p.X+r*math.Cos(a), p.Y+r*math.Sin(a))
	}
	return draw.Poly{Points: pts, Closed: true, Paint: draw.Fill(col)}
}
