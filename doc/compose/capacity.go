package compose

import (
	"fmt"
	"github.com/plinth-calc/plinth/calc/capacity"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
)

// capacity prints a capacity block: allowable pressure against width from
// bearing and from settlement, the governing mechanism for each width,
// the working at the footing's own width, and a chart.
func (c *composer) capacity(s *eval.Sheet, b *eval.Block) []layout.Block {
	r := b.Capacity
	o := c.engineOut(s, b)
	o.head(fmt.Sprintf("Allowable bearing pressure against width: %s on %s", b.Of.Name, b.On.Name))
	intro := fmt.Sprintf("Bearing-limited pressure by %s for a %s; settlement-limited pressure for a settlement of %s. The allowable pressure is the lower of the two.",
		r.Approach, capacity.Assumes, f(r.Limit, mm)+" mm")
	if len(b.Options) > 0 {
		intro += " Options: " + strings.Join(b.Options, ", ") + "."
	}
	o.para(txt(intro))
	tr := &r.Trace
	names, steps := groups(tr)
	if idx := steps[""]; len(idx) > 0 {
		o.steps(tr, idx, "capacity")
	}
	t := &layout.Table{Pos: o.p, Compact: true,
		Header:  []layout.Cell{unitHeader("B", "m"), unitHeader("L", "m"), unitHeader("q_a_b", "kPa"), unitHeader("q_a_s", "kPa"), unitHeader("q_allow", "kPa"), {txt("Governs")}, {txt("Bearing case")}},
		Align:   []layout.Align{layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft, layout.AlignLeft},
		Caption: []layout.Run{txt(fmt.Sprintf("Allowable pressure against width for %s, %s; the footing's own width is marked.", b.Of.Name, capacity.Assumes))}}
	var xs, qb, qs, qa []float64
	for i, row := range r.Rows {
		l := "—"
		if row.L > 0 {
			l = f(row.L, mU)
		}
		cells := []layout.Cell{{txt(f(row.B, mU))}, {txt(l)}, {txt(f(row.QBearing, kPa))}, {txt(f(row.QSettle, kPa))}, {bold(f(row.QAllow, kPa))}, {txt(row.Governs)}, {txt(row.Drainage)}}
		if i == r.Own {
			cells[0] = layout.Cell{bold(f(row.B, mU))}
			cells[5] = layout.Cell{txt(row.Governs), bold("  own width")}
		}
		t.Rows = append(t.Rows, layout.Row{Pos: o.p, Cells: cells})
		if !row.Own || !contains(xs, row.B) {
			xs = append(xs, row.B)
			qb = append(qb, row.QBearing/1e3)
			qs = append(qs, row.QSettle/1e3)
			qa = append(qa, row.QAllow/1e3)
		}
	}
	if len(xs) > 1 {
		// The engine's crossings join the rows: there both limits are the
		// allowable pressure, and the governing limit changes.
		governs := r.Rows[0].Governs
		for _, row := range r.Rows {
			if row.B == xs[0] {
				governs = row.Governs
			}
		}
		var regions []chart.Region
		from := xs[0]
		for _, cr := range r.Crossings {
			xs, qb, qs, qa = append(xs, cr.B), append(qb, cr.QB/1e3), append(qs, cr.QS/1e3), append(qa, cr.Q/1e3)
			regions = append(regions, chart.Region{From: from, To: cr.B, Label: cr.Below + " governs"})
			from, governs = cr.B, cr.Above
		}
		sortByX(xs, qb, qs, qa)
		regions = append(regions, chart.Region{From: from, To: xs[len(xs)-1], Label: governs + " governs"})
		bear := chart.Series{Name: "bearing", X: xs, Y: qb, Dash: chart.Dashed}
		sett := chart.Series{Name: "settlement", X: xs, Y: qs, Dash: chart.Dotted}
		low := chart.Series{Name: "allowable (the lower)", X: xs, Y: qa, Style: chart.Band}
		// the chart beside the table of its values
		share := math.Min(0.55, (layout.NaturalWidth(t)+4)/(c.width-chartGap))
		ch := chart.Chart{W: (c.width - chartGap) * (1 - share), H: 180,
			X:       chart.Axis{Title: "footing width B (m)", Min: chart.At(xs[0]), Max: chart.At(xs[len(xs)-1])},
			Y:       chart.Axis{Title: "allowable pressure (kPa)"},
			Series:  []chart.Series{low, bear, sett},
			Regions: regions}
		if r.Own >= 0 && r.Own < len(r.Rows) {
			ch.Guides = []chart.Guide{{Value: r.Rows[r.Own].B, Label: b.Of.Name + " B = " + f(r.Rows[r.Own].B, mU) + " m"}}
		}
		if d, err := ch.Drawing(o.p, []layout.Run{txt("Allowable bearing pressure against footing width.")}); err == nil {
			o.add(&layout.Beside{Pos: o.p, Left: []layout.Block{t}, Right: []layout.Block{d}, Share: share})
		} else {
			o.add(t)
			c.diags.Add(b.Span, "capacity chart: %v", err)
		}
	} else {
		o.add(t)
	}
	for _, n := range names {
		if r.Own >= 0 && r.Own < len(r.Rows) && strings.HasPrefix(n, "B = ") && n == "B = "+f(r.Rows[r.Own].B, mU)+" m" {
			o.label("Working at the footing's own width, " + n)
			o.steps(tr, steps[n], n)
		}
	}
	o.rest(tr, "capacity table", nil)
	c.sources(b)
	return o.done()
}

func contains(xs []float64, x float64) bool {
	for _, v := range xs {
		if v == x {
			return true
		}
	}
	return false
}

// sortByX sorts the series by x (insertion sort: a handful of widths).
func sortByX(x []float64, ys ...[]float64) {
	for i := 1; i < len(x); i++ {
		for j := i; j > 0 && x[j] < x[j-1]; j-- {
			x[j], x[j-1] = x[j-1], x[j]
			for _, y := range ys {
				y[j], y[j-1] = y[j-1], y[j]
			}
		}
	}
}
