package compose

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// varyBlocks prints a block's sensitivity: the governing utilisation at
// each value of the input varied, the values where the verdict flips, and
// a chart of the two.
func (c *composer) varyBlocks(b *eval.Block) []layout.Block {
	v := b.Vary
	p := b.Span
	u := v.Unit
	val := func(x float64) string { return valueText(units.Quantity{V: x, Dim: u.Dim}, u, -1) }
	if b.Capacity != nil {
		return c.varyCapacity(b)
	}
	out := []layout.Block{&layout.Heading{Pos: p, Level: min(c.level+1, 3), NoNumber: true, Runs: []layout.Run{txt("Sensitivity of " + b.Name + " to "), {Math: eqn.Sym{Name: v.Symbol}, Own: true}}}}
	intro := fmt.Sprintf("The package evaluated again for each value of %s (its value here %s), the rest unchanged (as --set would), and the block's governing utilisation read off each run. ", v.Symbol, val(v.Base))
	if len(v.Crossings) == 0 {
		intro += "The verdict is the same over the whole range."
	} else {
		for i, x := range v.Crossings {
			if i > 0 {
				intro += "; "
			}
			dir := "NOT OK below, OK above"
			if x.Rising {
				dir = "OK below, NOT OK above"
			}
			intro += fmt.Sprintf("The verdict flips at %s (%s)", val(x.P), dir)
		}
		intro += "."
	}
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(intro)}})
	t := &layout.Table{Pos: p, Header: []layout.Cell{{txt(v.Symbol + " (" + u.Name + ")")}, {txt("Utilisation")}, {txt("Verdict")}},
		Align:   []layout.Align{layout.AlignRight, layout.AlignRight, layout.AlignLeft},
		Caption: []layout.Run{txt("Governing utilisation of " + b.Name + " against " + v.Symbol + ".")}}
	var xs, ys []float64
	for _, r := range v.Rows {
		verdict := verdictOf(!(r.Util > 1))
		t.Rows = append(t.Rows, layout.Row{Pos: p, Cells: []layout.Cell{{txt(units.Printed(r.P, u, -1))}, {txt(units.Utilisation(r.Util))}, {verdict}}})
		xs, ys = append(xs, r.P/u.SIFactor()), append(ys, r.Util)
	}
	out = append(out, t)
	ch := chart.Chart{W: min(c.width, 360), H: 170,
		X:      chart.Axis{Title: v.Symbol + " (" + u.Name + ")"},
		Y:      chart.Axis{Title: "Governing utilisation", Min: chart.At(0)},
		Series: []chart.Series{{Name: "utilisation", X: xs, Y: ys, Emphasis: true}},
		Guides: []chart.Guide{{Value: 1, OnY: true, Label: "utilisation 1"}}}
	if d, err := ch.Drawing(p, []layout.Run{txt("Governing utilisation of " + b.Name + " against " + v.Symbol + ".")}); err == nil {
		out = append(out, d)
	} else {
		c.diags.Warn(p, "no sensitivity chart: %v", err)
	}
	return out
}

// varyCapacity prints a capacity table's sensitivity: the allowable
// pressure at the footing's own width at each value of the input.
func (c *composer) varyCapacity(b *eval.Block) []layout.Block {
	v := b.Vary
	p := b.Span
	u := v.Unit
	kPa := units.MustParse("kPa")
	out := []layout.Block{&layout.Heading{Pos: p, Level: min(c.level+1, 3), NoNumber: true, Runs: []layout.Run{txt("Sensitivity of " + b.Name + " to "), {Math: eqn.Sym{Name: v.Symbol}, Own: true}}}}
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(fmt.Sprintf("The package evaluated again for each value of %s (its value here %s), the rest unchanged (as --set would), and the allowable pressure at the footing's own width read off each run.",
		v.Symbol, valueText(units.Quantity{V: v.Base, Dim: u.Dim}, u, -1)))}})
	t := &layout.Table{Pos: p, Header: []layout.Cell{{txt(v.Symbol + " (" + u.Name + ")")}, unitHeader("q_allow", "kPa")},
		Align:   []layout.Align{layout.AlignRight, layout.AlignRight},
		Caption: []layout.Run{txt("Allowable pressure of " + b.Name + " at the footing's own width against " + v.Symbol + ".")}}
	var xs, ys []float64
	for _, r := range v.Rows {
		t.Rows = append(t.Rows, layout.Row{Pos: p, Cells: []layout.Cell{{txt(units.Printed(r.P, u, -1))}, {txt(units.Printed(r.Util, kPa, -1))}}})
		xs, ys = append(xs, r.P/u.SIFactor()), append(ys, r.Util/1e3)
	}
	out = append(out, t)
	ch := chart.Chart{W: min(c.width, 360), H: 170, X: chart.Axis{Title: v.Symbol + " (" + u.Name + ")"}, Y: chart.Axis{Title: "Allowable pressure (kPa)", Min: chart.At(0)},
		Series: []chart.Series{{Name: "q_allow", X: xs, Y: ys, Emphasis: true}}}
	if d, err := ch.Drawing(p, []layout.Run{txt("Allowable pressure of " + b.Name + " against " + v.Symbol + ".")}); err == nil {
		out = append(out, d)
	}
	return out
}
