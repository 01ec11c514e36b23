package compose

import (
	"fmt"
	"github.com/plinth-calc/plinth/calc/trace"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// blockLines prints the statements and word options of a ground or
// footing block: statements as inputs or calculation lines, options as a
// sentence.
func (c *composer) blockLines(s *eval.Sheet, lines []sheet.Line) (out []layout.Block, opts []string) {
	for _, ln := range lines {
		switch l := ln.(type) {
		case *sheet.Stmt:
			if a, ok := l.X.(*expr.Assign); ok {
				if y := s.Symbol(l); y != nil {
					out = append(out, c.assign(s, l, a, y))
				}
			}
		case *sheet.Option:
			opts = append(opts, l.Name.Value+" = "+l.Value.Value)
		case *sheet.Comment:
			if l.Text != "" {
				out = append(out, &layout.Para{Pos: l.Span, Runs: c.citedText(s, sheet.Str{Value: l.Text}, layout.Italic)})
			}
		}
	}
	return runsOfLines(out), opts
}

// gridTable prints the pipe table of a ground or footing block as the
// evaluator read it: each column's symbol over its header unit, numbers
// in that unit, a cell computed from other symbols as its expression and
// value, text cells (names, types, sources) with their citations.
func (c *composer) gridTable(s *eval.Sheet, g *sheet.Grid, cols []string, us []units.Unit, cells [][]*eval.Symbol, anchor string) *layout.Table {
	t := &layout.Table{Pos: g.Span, Compact: true}
	numeric := make([]bool, len(cols))
	for j, name := range cols {
		for _, row := range cells {
			if j < len(row) && row[j] != nil {
				numeric[j] = true
			}
		}
		if numeric[j] {
			u := ""
			if j < len(us) {
				u = us[j].Name
			}
			t.Header = append(t.Header, unitHeader(name, u))
			t.Align = append(t.Align, layout.AlignRight)
		} else {
			t.Header = append(t.Header, layout.Cell{txt(wordHeader(name))})
			t.Align = append(t.Align, layout.AlignLeft)
		}
	}
	for i, r := range g.Rows {
		row := layout.Row{Pos: r.Span}
		for j := range cols {
			var y *eval.Symbol
			if i < len(cells) && j < len(cells[i]) {
				y = cells[i][j]
			}
			var text sheet.Str
			if j < len(r.Cells) {
				text = r.Cells[j]
			}
			row.Cells = append(row.Cells, c.gridCell(s, y, text, anchor))
			row.CellPos = append(row.CellPos, text.Span)
		}
		t.Rows = append(t.Rows, row)
	}
	return t
}

// gridCell prints one cell of a block table.
func (c *composer) gridCell(s *eval.Sheet, y *eval.Symbol, text sheet.Str, anchor string) layout.Cell {
	if y == nil {
		return layout.Cell(c.citedText(s, text, layout.Regular))
	}
	if y.Input && anchor != "" {
		c.inputs[y] = anchor
	}
	val := numberNode(y.Number(y.Unit, y.Decimals))
	if y.Override != nil {
		return layout.Cell{{Math: val}, bold(" (VARIANT)")}
	}
	if len(y.Uses) == 0 || y.Expr == nil {
		return layout.Cell{{Math: val}}
	}
	f := newFormula(y.Expr, y.Uses)
	return layout.Cell{{Math: eqn.Row{f.symbolic(), eqn.Op{Text: "="}, val}}}
}

// wordHeader capitalises a text column's name for its header.
func wordHeader(name string) string {
	switch name {
	case "psi_0", "psi_2":
		return name
	}
	if name == "" {
		return ""
	}
	return strings.ToUpper(name[:1]) + name[1:]
}

// ground prints a ground model: its statements (groundwater), then the
// layer table with every parameter given, units in the header.
func (c *composer) ground(s *eval.Sheet, b *eval.Block, src *sheet.Ground) []layout.Block {
	if b == nil || b.Ground == nil {
		return nil
	}
	g := b.Ground
	o := c.engineOut(s, b)
	o.label("Ground model " + g.Name + ": characteristic values; depths below ground level")
	lines, _ := c.blockLines(s, src.Lines)
	o.add(lines...)
	if g.Water == nil {
		o.para(txt("No groundwater is given: the ground is taken as dry to the depth considered."))
	}
	if t, ok := g.Model.PlatformDepth(); ok {
		o.para(txt(fmt.Sprintf("The first layer, %s, is a granular working platform %s m thick on the layer below (platform = yes).", g.Model.Layers[0].Name, f(t, mU))))
	}
	if src.Table != nil {
		a := c.anchor("ground")
		o.add(&layout.Anchor{Pos: src.Table.Span, Name: a})
		cells := make([][]*eval.Symbol, len(g.Layers))
		for i, l := range g.Layers {
			cells[i] = l.Cells
		}
		o.add(c.gridTable(s, src.Table, g.Columns, g.Units, cells, a))
	}
	return o.blocks
}

// footing prints a footing: shape and dimensions, the characteristic
// actions, and a section sketch.
func (c *composer) footing(s *eval.Sheet, b *eval.Block, src *sheet.Footing) []layout.Block {
	if b == nil || b.Footing == nil {
		return nil
	}
	f := b.Footing
	o := c.engineOut(s, b)
	if f.NoB {
		o.label(fmt.Sprintf("Footing %s: %s, width to be chosen by its size block", f.Name, toSize(f.Model)))
	} else {
		o.label(fmt.Sprintf("Footing %s: %s", f.Name, shapeWords(f.Model)))
	}
	lines, _ := c.blockLines(s, src.Lines)
	o.add(lines...)
	if f.SelfWeight {
		o.para(txt("Self-weight: each analysis adds the footing's own weight ("),
			layout.Run{Math: eqn.Row{eqn.Sym{Name: "gamma_c"}, eqn.Op{Text: "="}, valueNode(units.Quantity{V: f.GammaC, Dim: units.UnitWeight}, units.MustParse("kN/m3"), -1)}},
			txt(" over its thickness "),
			layout.Run{Math: eqn.Row{eqn.Sym{Name: "h"}, eqn.Op{Text: "="}, valueNode(units.Quantity{V: f.H, Dim: units.Length}, units.MustParse("m"), -1)}},
			txt(") and the backfill over it, from the ground model's total vertical stress, as a permanent action."))
	} else {
		o.para(txt("The actions below include the footing's own weight and any backfill on it; plinth adds nothing."))
	}
	if src.Table != nil {
		a := c.anchor("footing")
		o.add(&layout.Anchor{Pos: src.Table.Span, Name: a})
		t := c.gridTable(s, src.Table, f.Columns, f.Units, f.Rows, a)
		per := ""
		if f.Model.Shape == site.Strip {
			per = " per metre run"
		}
		t.Caption = []layout.Run{txt(fmt.Sprintf("Characteristic actions on footing %s at its underside%s.", f.Name, per))}
		o.add(t)
	}
	o.add(c.sketch(s, b)...)
	// the plan and depth are stated here: the analyses below list them
	// by value rather than print them again (detail = governing)
	for _, d := range []struct {
		sym string
		v   float64
	}{{"B", f.Model.B}, {"L", f.Model.L}, {"D", f.Model.D}} {
		c.printed[stepKey(trace.Step{Symbol: d.sym, Value: d.v, Unit: "m"})] = true
	}
	return o.blocks
}

// toSize describes a footing a size block sizes: its shape, the fixed L
// of a rectangle that gives one, and its depth.
func toSize(f site.Footing) string {
	l := metres
	plan := f.Shape.String()
	if f.Shape == site.Rectangle && f.L > 0 {
		plan += " of fixed length " + l(f.L)
	}
	return plan + ", underside " + l(f.D) + " below ground level"
}

// shapeWords describes a footing's plan: "rectangle 2.7 m × 3.2 m,
// underside 1 m below ground level".
func shapeWords(f site.Footing) string {
	l := metres
	var plan string
	switch f.Shape {
	case site.Strip:
		plan = "strip " + l(f.B) + " wide"
	case site.Circle:
		plan = "circle " + l(f.B) + " in diameter"
	case site.Square:
		plan = "square " + l(f.B) + " × " + l(f.B)
	default:
		plan = "rectangle " + l(f.B) + " × " + l(f.L)
	}
	return plan + ", underside " + l(f.D) + " below ground level"
}
