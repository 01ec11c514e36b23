package compose

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// schedule prints a schedule block: the footings sized, one row each
// (linked to its working in the appendix), a plan to scale, the
// distortion between neighbours, and each footing's working in the
// appendix as a size block prints it.
func (c *composer) schedule(s *eval.Sheet, b *eval.Block) []layout.Block {
	r := b.Schedule
	o := c.engineOut(s, b)
	m := units.MustParse("m")
	mm := units.MustParse("mm")
	length := metres
	o.head(fmt.Sprintf("Schedule %s on %s", b.Name, b.On.Name))
	intro := fmt.Sprintf("%d %s footings, each sized as a size block sizes one: the smallest width that passes bearing, sliding, the eccentricity limit e ≤ %s",
		len(r.Rows), r.Footing.Shape, r.Ecc)
	if r.NoSettle {
		intro += " (no settlement check: settlement = no)"
	} else {
		intro += " and settlement"
	}
	intro += fmt.Sprintf(". Depth %s unless a row gives its own. Each footing's working is in the appendix", length(r.Footing.D))
	if c.governingOnly() {
		intro += " (for each footing its checks at the chosen width and one increment smaller and the sizing, and the bearing and settlement working in full for the footing of highest utilisation; with detail = full for every footing)"
	}
	intro += "."
	if len(b.Options) > 0 {
		intro += " Options: " + strings.Join(b.Options, ", ") + "."
	}
	o.para(txt(intro))
	o.rest(&r.Trace, "schedule", nil)

	head := []layout.Cell{{txt("Footing")}, unitHeader("x", "m"), unitHeader("y", "m"), {txt("Size")}, unitHeader("D", "m"),
		{txt("Governing check")}, {txt("Utilisation")}, unitHeader("s_total", "mm"), {txt("Verdict")}}
	al := []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignLeft, layout.AlignRight, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignLeft}
	t90 := func(i int) (float64, bool) {
		if st := r.Rows[i].Settle; st != nil {
			for _, v := range st.Symbols {
				if v.Symbol == "t_90" {
					return v.V, true
				}
			}
		}
		return 0, false
	}
	consol := false
	for i := range r.Rows {
		_, has := t90(i)
		consol = consol || has
	}
	if consol {
		head = append(head[:8:8], append([]layout.Cell{unitHeader("t_90", "yr")}, head[8:]...)...)
		al = append(al[:8:8], append([]layout.Align{layout.AlignRight}, al[8:]...)...)
	}
	sourced, grounds := false, false
	for i, src := range r.Sources {
		sourced = sourced || src != ""
		grounds = grounds || r.Grounds[i] != ""
	}
	if grounds {
		head = append(head[:5:5], append([]layout.Cell{{txt("Ground")}}, head[5:]...)...)
		al = append(al[:5:5], append([]layout.Align{layout.AlignLeft}, al[5:]...)...)
	}
	if sourced {
		head = append(head, layout.Cell{txt("Source")})
		al = append(al, layout.AlignLeft)
	}
	t := &layout.Table{Pos: o.p, Header: head, Align: al,
		Caption: []layout.Run{txt("Every footing at its chosen size; the highest utilisation in bold. Each name links to its working.")}}
	for i, row := range r.Rows {
		gov := row.At.Checks[row.At.Governing]
		sz := length(row.B)
		if r.Footing.Shape == site.Rectangle {
			sz += " × " + length(row.L)
		}
		st := "—"
		if row.Settle != nil {
			st = units.Printed(row.Settle.Total, mm, -1)
		}
		u := txt(units.Utilisation(row.At.Util()))
		if i == r.RowMax {
			u = bold(units.Utilisation(row.At.Util()))
		}
		verdict := verdictOf(row.At.OK)
		name := layout.Run{Text: r.Names[i], Link: rowAnchor(b, i), Own: false}
		cells := []layout.Cell{{name}, {txt(units.Printed(r.X[i], m, -1))}, {txt(units.Printed(r.Y[i], m, -1))},
			{txt(sz)}, {txt(units.Printed(row.Footing.D, m, -1))}, {txt(gov.Name)}, {u}, {txt(st)}, {verdict}}
		if consol {
			tc := "—"
			if v, has := t90(i); has {
				tc = units.Printed(v, units.MustParse("yr"), -1)
			}
			cells = append(cells[:8:8], append([]layout.Cell{{txt(tc)}}, cells[8:]...)...)
		}
		if grounds {
			g := r.Grounds[i]
			if g == "" {
				g = b.On.Name
			}
			cells = append(cells[:5:5], append([]layout.Cell{{txt(g)}}, cells[5:]...)...)
		}
		if sourced {
			cells = append(cells, richText(r.Sources[i], layout.Regular))
		}
		t.Rows = append(t.Rows, layout.Row{Pos: b.Span, Cells: cells})
	}
	o.add(t)
	o.add(c.planDrawing(b))
	if len(r.Pairs) > 0 {
		pt := &layout.Table{Pos: o.p,
			Header: []layout.Cell{{txt("Neighbours")}, unitHeader("L", "m"), unitHeader("delta_s", "mm"), {txt("β = δs/L")}, {txt("Verdict")}},
			Align:  []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft},
			Caption: []layout.Run{txt("Angular distortion between neighbouring footings against "), {Math: eqn.Sym{Name: "beta_lim"}, Own: true},
				txt(fmt.Sprintf(" = 1/%.0f; the largest in bold.", 1/r.Pairs[0].Diff.Limit))}}
		for i, p := range r.Pairs {
			beta := fmt.Sprintf("1/%.0f", 1/math.Max(p.Diff.Beta, 1e-12))
			if p.Diff.Beta == 0 {
				beta = "0"
			}
			bc := txt(beta)
			if i == r.PairMax {
				bc = bold(beta)
			}
			verdict := verdictOf(p.Diff.OK)
			pt.Rows = append(pt.Rows, layout.Row{Pos: b.Span, Cells: []layout.Cell{{txt(r.Names[p.A] + " – " + r.Names[p.B])}, {txt(units.Printed(p.Spacing, m, -1))},
				{txt(units.Printed(p.Diff.Delta, mm, -1))}, {bc}, {verdict}}})
		}
		o.add(pt)
		pm := r.Pairs[r.PairMax]
		o.para(txt(fmt.Sprintf("Largest distortion: %s to %s, ", r.Names[pm.A], r.Names[pm.B])), layout.Run{Math: eqn.Sym{Name: "beta_max"}, Own: true},
			txt(fmt.Sprintf(" = %s = 1/%.0f.", units.Printed(r.BetaMax, units.Dimensionless, -1), 1/math.Max(r.BetaMax, 1e-12))))
		if ch := findCheck(b, "differential"); ch != nil {
			o.add(c.checkBlock(o.p, ch, "beta_max", "beta_lim"))
		}
	}
	out := o.done()

	// Each footing's working, in the appendix.
	for i, row := range r.Rows {
		f := &eval.Footing{Name: r.Names[i], Span: b.Span, Sheet: b.Sheet, Model: row.Footing, OK: true}
		rb := &eval.Block{Kind: sheet.KindSize, Name: b.Name + " " + r.Names[i], Span: b.Span, Sheet: b.Sheet, On: b.On, Of: f,
			Size: &eval.SizeResult{Result: row, Ecc: r.Ecc, NoSettle: r.NoSettle}, Options: b.Options, Checks: b.Checks}
		c.appendix = append(c.appendix, &layout.Anchor{Pos: b.Span, Name: rowAnchor(b, i)})
		if j := likeRow(r, i); j >= 0 && c.governingOnly() {
			// the same inputs as an earlier row: its sizing is not printed again
			o := c.engineOut(s, rb)
			o.head(fmt.Sprintf("Size of %s on %s", f.Name, b.On.Name))
			o.para(txt(fmt.Sprintf("The same depth, ground and actions as %s, so the same sizing, B = %s; its working, cautions included, is ",
				r.Names[j], metres(row.B))), layout.Run{Text: r.Names[j] + "'s", Link: rowAnchor(b, j)}, txt(" (detail = full prints it again)."))
			if ch := findCheck(rb, "size"); ch != nil {
				o.add(c.checkBlock(o.p, ch, "u_gov", "u_lim"))
			}
			c.appendix = append(c.appendix, o.done()...)
			continue
		}
		// Under detail = governing only the governing row prints its
		// bearing and settlement working in full; the others their checks
		// at both widths and the sizing.
		c.appendix = append(c.appendix, c.sizeWorking(s, rb, !c.governingOnly() || i == r.RowMax)...)
	}
	return out
}

// likeRow is the earlier row row i has the inputs of (size.Schedule.Like),
// or −1.
func likeRow(r *eval.ScheduleResult, i int) int {
	if i < len(r.Like) {
		return r.Like[i]
	}
	return -1
}

func rowAnchor(b *eval.Block, i int) string { return fmt.Sprintf("%s-row-%d", blockAnchor(b), i+1) }

// planDrawing is the schedule's plan to scale: each footing at its centre
// with its chosen size, named.
func (c *composer) planDrawing(b *eval.Block) layout.Block {
	r := b.Schedule
	minX, minY, maxX, maxY := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for i, row := range r.Rows {
		hb, hl := row.B/2, row.L/2
		if row.L == 0 {
			hl = hb
		}
		minX, maxX = math.Min(minX, r.X[i]-hb), math.Max(maxX, r.X[i]+hb)
		minY, maxY = math.Min(minY, r.Y[i]-hl), math.Max(maxY, r.Y[i]+hl)
	}
	W := math.Min(c.width, 460)
	scale := (W - 20) / math.Max(maxX-minX, 1e-3)
	if h := (maxY - minY) * scale; h > 320 {
		scale = 320 / math.Max(maxY-minY, 1e-3)
	}
	H := (maxY-minY)*scale + 24
	var items []draw.Item
	ink := draw.Gray(60)
	for i, row := range r.Rows {
		hb, hl := row.B/2, row.L/2
		if row.L == 0 {
			hl = hb
		}
		x := 10 + (r.X[i]-hb-minX)*scale
		y := 10 + (maxY-(r.Y[i]+hl))*scale // y up on the plan
		w, h := 2*hb*scale, 2*hl*scale
		if r.Footing.Shape == site.Circle {
			var pts []draw.Point
			for k := 0; k < 32; k++ {
				a := 2 * math.Pi * float64(k) / 32
				pts = append(pts, draw.Pt(x+w/2+w/2*math.Cos(a), y+h/2+h/2*math.Sin(a)))
			}
			items = append(items, draw.Poly{Points: pts, Closed: true, Paint: draw.Paint{Stroke: ink, Width: 0.6, Fill: draw.Gray(225), Filled: true}})
		} else {
			items = append(items, draw.Rect{X: x, Y: y, W: w, H: h, Paint: draw.Paint{Stroke: ink, Width: 0.6, Fill: draw.Gray(225), Filled: true}})
		}
		items = append(items, draw.Text{X: x + w/2, Y: y + h/2 + 2, Face: fonts.Regular, Size: 6, Color: ink, Align: draw.Center, Text: r.Names[i]})
	}
	cap := fmt.Sprintf("Plan of schedule %s to scale (1 m = %.1f pt): each footing at its centre with its chosen size.", b.Name, scale)
	return &layout.Drawing{Pos: b.Span, W: W, H: H, Items: items, Caption: []layout.Run{txt(cap)}}
}
