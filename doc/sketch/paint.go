package sketch

import (
	"math"
	"slices"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// paint draws the sketch back to front: ground, water line, boundaries,
// footing, ground line, dimensions, water symbol, loads, labels, plan.
func (k *sk) paint() []draw.Item {
	f := k.f
	var it []draw.Item
	xL, xR := k.X(-k.half), k.X(k.half)
	band := func(z0, z1 float64, c draw.Color) {
		z0, z1 = math.Max(z0, 0), math.Min(z1, k.zBot)
		if z1 > z0 {
			it = append(it, draw.Rect{X: xL, Y: k.Y(z0), W: xR - xL, H: (z1 - z0) * k.s, Paint: draw.Fill(c)})
		}
	}
	// the ground: one tint per layer, the platform over it
	if len(f.Layers) == 0 || f.Layers[0].Top > 0 {
		top := k.zBot
		if len(f.Layers) > 0 {
			top = f.Layers[0].Top
		}
		band(0, top, fillSoil[1])
	}
	for i, l := range f.Layers {
		next := k.zBot
		if i+1 < len(f.Layers) {
			next = f.Layers[i+1].Top
		}
		band(l.Top, next, fillSoil[i%2])
	}
	plat := 0.0
	if p := f.Platform; p != nil {
		plat = math.Min(p.Thickness, k.zBot)
		band(0, plat, fillPlat)
		it = append(it, k.gravel(xL, xR, k.yGL, k.Y(plat))...)
	}
	water := f.Water != nil && *f.Water < k.zBot
	if water {
		y := k.Y(math.Max(*f.Water, 0)) // free water above GL: its label says how high
		it = append(it, draw.Line{X1: xL, Y1: y, X2: xR, Y2: y, Paint: draw.Paint{Stroke: inkWater, Width: 0.6, Dash: []float64{5, 2.5}}})
	}
	// boundaries, carried out to the label column
	bl := draw.Stroke(inkBoundary, boundaryWidth)
	ends := []float64{}
	if plat > 0 && plat < k.zBot {
		ends = append(ends, plat)
	}
	for _, l := range f.Layers {
		if l.Top > 0 && l.Top < k.zBot && math.Abs(l.Top-plat) > 1e-9 {
			ends = append(ends, l.Top)
		}
	}
	for _, z := range ends {
		y := k.Y(z)
		it = append(it, draw.Line{X1: xL, Y1: y, X2: k.labX - 2, Y2: y, Paint: bl})
	}
	// the footing and its column (or wall)
	conc := draw.Paint{Stroke: inkLine, Width: 0.8, Fill: fillConcr, Filled: true}
	fTop := k.Y(f.D - k.t)
	it = append(it,
		draw.Rect{X: k.X(-f.B / 2), Y: fTop, W: f.B * k.s, H: k.t * k.s, Paint: conc},
		draw.Rect{X: k.X(-k.cw / 2), Y: k.colTop, W: k.cw * k.s, H: fTop - k.colTop, Paint: conc})
	// ground line, broken where the concrete passes through it, hatched below
	gap0, gap1 := k.X(-k.cw/2), k.X(k.cw/2)
	if f.D-k.t <= 1e-9 { // the footing itself reaches GL
		gap0, gap1 = k.X(-f.B/2), k.X(f.B/2)
	}
	gl := draw.Stroke(inkLine, glWidth)
	it = append(it, draw.Line{X1: xL, Y1: k.yGL, X2: gap0, Y2: k.yGL, Paint: gl}, draw.Line{X1: gap1, Y1: k.yGL, X2: xR, Y2: k.yGL, Paint: gl})
	const hs, hl = 4.5, hatchReach // hatch spacing and reach
	for x := xL + hl; x <= xR+1e-9; x += hs {
		if x-hl < gap1 && x > gap0 {
			continue
		}
		it = append(it, draw.Line{X1: x, Y1: k.yGL, X2: x - hl, Y2: k.yGL + hl, Paint: draw.Stroke(inkHatch, 0.45)})
	}
	// labels at fixed places first, then those placed clear of them and
	// of the lines (place): D and the groundwater level
	it = append(it, k.loadArrows()...)
	it = append(it, k.labelColumn()...)
	if k.noteY > 0 {
		it = append(it, draw.Text{X: xL, Y: k.noteY, Face: fonts.Italic, Size: sizeText, Color: inkWater,
			Text: "Groundwater " + metres(*f.Water) + " below GL, below the sketch"})
	}
	if k.titleY > 0 {
		t := "Section"
		if f.Shape == "strip" {
			t = "Section (strip footing, per metre run)"
		}
		it = append(it, draw.Text{X: xL, Y: k.titleY, Face: fonts.Bold, Size: sizeTitle, Color: inkText, Text: t})
	}
	it = k.dims(it)
	if water {
		it = k.waterMark(it, *f.Water)
	}
	if k.plan {
		it = append(it, k.planView()...)
	}
	return it
}

// gravel sprinkles small open circles over the platform, staggered.
func (k *sk) gravel(x0, x1, y0, y1 float64) []draw.Item {
	var it []draw.Item
	row := 0
	for y := y0 + 2.5; y <= y1-1.5; y += 4 {
		off := 0.0
		if row%2 == 1 {
			off = 3.5
		}
		for x := x0 + 2 + off; x <= x1-1.5; x += 7 {
			it = append(it, draw.Poly{Points: arcPts(draw.Pt(x, y), 0.8, 0, 2*math.Pi*7/8, 7), Closed: true, Paint: draw.Stroke(draw.Gray(120), 0.35)})
		}
		row++
	}
	return it
}

// levelsBelow are the page heights of the water line and the layer
// boundaries below y, top down.
func (k *sk) levelsBelow(y float64) []float64 {
	var out []float64
	if k.f.Water != nil && *k.f.Water < k.zBot {
		out = append(out, k.Y(*k.f.Water))
	}
	for _, l := range k.f.Layers {
		if l.Top > 0 && l.Top < k.zBot {
			out = append(out, k.Y(l.Top))
		}
	}
	if p := k.f.Platform; p != nil && p.Thickness < k.zBot {
		out = append(out, k.Y(p.Thickness))
	}
	var below []float64
	for _, v := range out {
		if v > y {
			below = append(below, v)
		}
	}
	slices.Sort(below)
	return below
}

// dims draws B under the footing, B′ under that and D beside it, onto
// the items drawn so far; D's label takes the first place clear of them:
// beside its dimension line, under the base, under each level below it,
// or above GL.
func (k *sk) dims(it []draw.Item) []draw.Item {
	f := k.f
	ext := draw.Stroke(inkDim, 0.4)
	left, right, base := k.X(-f.B/2), k.X(f.B/2), k.Y(f.D)
	d := func() {
		xd := left - 12
		it = append(it, draw.Line{X1: left - 2, Y1: base, X2: xd - 3, Y2: base, Paint: ext})
		it = append(it, dim(draw.Pt(xd, k.yGL), draw.Pt(xd, base), nil)...)
		label := "D = " + metres(f.D)
		var cands []draw.Text
		if base-k.yGL >= ascent(sizeText)+descent(sizeText)+6 { // room beside the dimension line
			cands = append(cands, txt(xd-3, (k.yGL+base)/2+capMid(sizeText), draw.Right, label))
		}
		cands = append(cands, txt(xd-3, base+2+ascent(sizeText), draw.Right, label))
		for _, y := range k.levelsBelow(base) {
			cands = append(cands, txt(xd-3, y+2+ascent(sizeText), draw.Right, label))
		}
		cands = append(cands, txt(xd-3, k.yGL-3-descent(sizeText), draw.Right, label))
		it = append(it, masked(place(it, cands...))...)
	}
	yb, ye := k.dimLevels()
	it = append(it, draw.Line{X1: left, Y1: base + 2, X2: left, Y2: yb + 3, Paint: ext},
		draw.Line{X1: right, Y1: base + 2, X2: right, Y2: yb + 3, Paint: ext})
	it = append(it, dim(draw.Pt(left, yb), draw.Pt(right, yb), nil)...)
	it = append(it, masked(txt((left+right)/2, yb+2.5+ascent(sizeText), draw.Center, "B = "+metres(f.B)))...)
	if f.BEff != nil {
		be := *f.BEff
		a, b := -be/2, be/2
		switch {
		case f.M > 0:
			a, b = f.B/2-be, f.B/2
		case f.M < 0:
			a, b = -f.B/2, -f.B/2+be
		}
		xa, xb := k.X(a), k.X(b)
		it = append(it, draw.Line{X1: xa, Y1: ye - 4, X2: xa, Y2: ye + 3, Paint: draw.Paint{Stroke: inkDim, Width: 0.4, Dash: []float64{1.5, 1}}},
			draw.Line{X1: xb, Y1: ye - 4, X2: xb, Y2: ye + 3, Paint: draw.Paint{Stroke: inkDim, Width: 0.4, Dash: []float64{1.5, 1}}})
		it = append(it, dim(draw.Pt(xa, ye), draw.Pt(xb, ye), []float64{3, 2})...)
		it = append(it, masked(txt((xa+xb)/2, ye+2.5+ascent(sizeText), draw.Center, "B′ = "+metres(be)))...)
	}
	if f.D > 0 {
		d()
	}
	return it
}

// waterLabel names the water level: "GWL 1.50 m", or for free water above
// ground level "water 1.50 m above GL".
func waterLabel(z float64) string {
	if z < 0 {
		return "GWL " + metres(-z) + " above"
	}
	return "GWL " + metres(z)
}

// waterMark adds the groundwater symbol — an inverted triangle on the
// level with two short lines under it — and the level's label to the
// items drawn so far: the label above the water line, else under it, else
// under the next level down, wherever it first stands clear (place).
func (k *sk) waterMark(it []draw.Item, z float64) []draw.Item {
	l := waterLabel(z)
	// towards the section's right edge, clear of the footing's dimensions
	x, y := math.Max(k.X(k.f.B/2)+14, k.X(k.half)-4-textW(fonts.Regular, sizeText, l)-6), k.Y(math.Max(z, 0))
	p := draw.Paint{Stroke: inkWater, Width: 0.6, Fill: draw.Gray(255), Filled: true}
	it = append(it,
		draw.Poly{Closed: true, Paint: p, Points: []draw.Point{draw.Pt(x-3.5, y-6), draw.Pt(x+3.5, y-6), draw.Pt(x, y)}},
		draw.Line{X1: x - 3, Y1: y + 2, X2: x + 3, Y2: y + 2, Paint: draw.Stroke(inkWater, 0.6)},
		draw.Line{X1: x - 1.6, Y1: y + 4, X2: x + 1.6, Y2: y + 4, Paint: draw.Stroke(inkWater, 0.6)})
	at := func(y float64) draw.Text {
		return draw.Text{X: x + 6, Y: y, Face: fonts.Regular, Size: sizeText, Color: inkWater, Text: l}
	}
	cands := []draw.Text{at(y - 2.5), at(y + 2.5 + ascent(sizeText))}
	for _, v := range k.levelsBelow(y + 0.01) {
		cands = append(cands, at(v+2+ascent(sizeText)))
	}
	return append(it, place(it, cands...))
}

// loadArrows draws V onto the column top, H at the column's head and M
// as a curved arrow round the column top, each labelled.
func (k *sk) loadArrows() []draw.Item {
	f := k.f
	var it []draw.Item
	per := ""
	if f.Shape == "strip" {
		per = "/m"
	}
	label := func(given, sym string, v float64, unit string) string {
		if given != "" {
			return given
		}
		return sym + " = " + amount(v) + " " + unit + per
	}
	xc, yt := k.xc, k.colTop
	const vLen, r, hLen = 30.0, 13.0, 24.0
	if f.V != 0 {
		a, b := draw.Pt(xc, yt-vLen), draw.Pt(xc, yt-1)
		if f.V < 0 {
			a, b = b, a
		}
		it = append(it, arrow(a, b, inkLoad, 0.9)...)
		it = append(it, draw.Text{X: xc + 4, Y: yt - vLen + ascent(sizeText) - 1, Face: fonts.Regular, Size: sizeText, Color: inkLoad,
			Text: label(f.VLabel, "V", f.V, "kN")})
	}
	if f.M != 0 {
		a0, a1 := 160*math.Pi/180, 20*math.Pi/180 // over the top, left to right
		pts := arcPts(draw.Pt(xc, yt), r, a0, a1, 16)
		end, ux, uy := pts[len(pts)-1], math.Sin(a1), math.Cos(a1) // clockwise tangent at a1
		if f.M < 0 {
			end, ux, uy = pts[0], -math.Sin(a0), -math.Cos(a0)
		}
		// trim the arc where the head sits
		var shaft []draw.Point
		for _, p := range pts {
			if math.Hypot(p.X-end.X, p.Y-end.Y) >= headLen-0.5 {
				shaft = append(shaft, p)
			}
		}
		it = append(it, draw.Poly{Points: shaft, Paint: draw.Stroke(inkLoad, 0.8)}, head(end, ux, uy, inkLoad))
		it = append(it, draw.Text{X: xc - r - 3, Y: yt - r + 2, Face: fonts.Regular, Size: sizeText, Color: inkLoad, Align: draw.Right,
			Text: label(f.MLabel, "M", f.M, "kNm")})
	}
	if f.H != 0 {
		y := yt + 5
		face := k.X(-k.cw / 2)
		a, b := draw.Pt(face-hLen, y), draw.Pt(face-1, y)
		tx, al := face-hLen-3, draw.Right
		if f.H < 0 {
			face = k.X(k.cw / 2)
			a, b = draw.Pt(face+hLen, y), draw.Pt(face+1, y)
			tx, al = face+hLen+3, draw.Left
		}
		it = append(it, arrow(a, b, inkLoad, 0.9)...)
		it = append(it, draw.Text{X: tx, Y: y + capMid(sizeText), Face: fonts.Regular, Size: sizeText, Color: inkLoad, Align: al,
			Text: label(f.HLabel, "H", f.H, "kN")})
	}
	return it
}

// labelColumn names the platform and the layers beside the section, each
// just under its top, pushed down clear of the one before.
func (k *sk) labelColumn() []draw.Item {
	var it []draw.Item
	prev := math.Inf(-1)
	for _, l := range k.labels(k.zBot) {
		y := math.Max(k.Y(l.z)+1.5+ascent(sizeText), prev+1+ascent(sizeText))
		it = append(it, txt(k.labX, y, draw.Left, l.text))
		prev = y + descent(sizeText)
	}
	return it
}

// dimLevels are the heights of the B and B′ dimension lines under the
// base: 12 and 30 pt down, lowered in steps while either would lie along
// the water line or a layer boundary or their labels would cross one, as
// far as the sketch's bottom allows.
func (k *sk) dimLevels() (yb, ye float64) {
	var avoid []float64
	if k.f.Water != nil {
		avoid = append(avoid, k.Y(*k.f.Water))
	}
	for _, l := range k.f.Layers {
		avoid = append(avoid, k.Y(l.Top))
	}
	// a dimension line and the label under it, clear of lines by 3 pt
	near := func(y float64) bool {
		for _, a := range avoid {
			if a > y-3 && a < y+3+ascent(sizeText)+descent(sizeText)+3 {
				return true
			}
		}
		return false
	}
	base := k.Y(k.f.D)
	room := k.Y(k.zBot) - (base + 30 + 2.5 + ascent(sizeText) + descent(sizeText)) // how far B′'s label can go down
	if k.f.BEff == nil {
		room += 18
	}
	for off := 0.0; off <= math.Max(dimShift, room); off += 1 {
		yb, ye = base+12+off, base+30+off
		if !near(yb) && (k.f.BEff == nil || !near(ye)) {
			return
		}
	}
	return base + 12, base + 30
}
