package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/size"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// size prints a size block: the answer and why the next smaller size
// fails first, every check at both sizes, the sizing steps, then the full
// working at the chosen size as the bearing and settlement blocks print
// it.
func (c *composer) size(s *eval.Sheet, b *eval.Block) []layout.Block {
	return c.sizeWorking(s, b, true)
}

// sizeWorking prints a size block; with full false only its answer, the
// table of checks at both widths and the sizing steps (the bearing and
// settlement working left out): a schedule's rows other than the governing
// one under detail = governing.
func (c *composer) sizeWorking(s *eval.Sheet, b *eval.Block, full bool) []layout.Block {
	r := b.Size
	o := c.engineOut(s, b)
	width := metres
	dims := "B = " + width(r.B)
	if r.Footing.Shape == site.Strip {
		dims += " (strip)"
	} else if r.L != r.B {
		dims += " × L = " + width(r.L)
	}
	o.head(fmt.Sprintf("Size of %s on %s", b.Of.Name, b.On.Name))
	checks := []string{"bearing (short and long term as the drainage option gives)", "sliding where horizontal load is present"}
	if r.Ecc != size.NoEcc {
		checks = append(checks, "the eccentricity limit e ≤ "+r.Ecc.String()+" in every design case (EN 1997-1 6.5.4)")
	}
	if r.NoSettle {
		checks = append(checks, "no settlement check (settlement = no)")
	} else {
		checks = append(checks, "settlement against its limit")
	}
	intro := fmt.Sprintf("Chosen: %s, the smallest width that passes every check: %s. Search: %s; %s evaluated.",
		dims, strings.Join(checks, ", "), r.Search, plural(r.Trials, "width"))
	if len(b.Options) > 0 {
		intro += " Options: " + strings.Join(b.Options, ", ") + "."
	}
	o.para(txt(intro))

	// Every check at the chosen size and one increment smaller.
	head := []layout.Cell{{txt("Check")}, {txt("At B = " + width(r.B))}, {txt("Verdict")}}
	al := []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignLeft}
	if r.Below != nil {
		head = append(head, layout.Cell{txt("At B = " + width(r.Below.B))}, layout.Cell{txt("Verdict")})
		al = append(al, layout.AlignRight, layout.AlignLeft)
	}
	t := &layout.Table{Pos: o.p, Header: head, Align: al,
		Caption: []layout.Run{txt("Every check at the chosen width and one increment smaller (utilisation; the governing check in bold).")}}
	verdict := verdictOf
	cell := func(tr *size.Trial, name string) (layout.Cell, layout.Cell) {
		for i, ch := range tr.Checks {
			if ch.Name != name {
				continue
			}
			if strings.HasPrefix(ch.Detail, "not computed") {
				return layout.Cell{txt("—")}, layout.Cell{txt(ch.Detail)}
			}
			u := txt(units.Utilisation(ch.Util))
			if i == tr.Governing {
				u = bold(units.Utilisation(ch.Util))
			}
			return layout.Cell{u}, layout.Cell{verdict(ch.OK)}
		}
		return layout.Cell{txt("—")}, layout.Cell{txt("not checked")}
	}
	for _, ch := range r.At.Checks {
		row := []layout.Cell{{txt(ch.Name)}}
		u, v := cell(&r.At, ch.Name)
		row = append(row, u, v)
		if r.Below != nil {
			u, v := cell(r.Below, ch.Name)
			row = append(row, u, v)
		}
		t.Rows = append(t.Rows, layout.Row{Cells: row})
	}
	o.add(t)
	if ch := findCheck(b, "size"); ch != nil {
		o.add(c.checkBlock(o.p, ch, "u_gov", "u_lim"))
	}
	o.label("Sizing")
	o.steps(&r.Trace, indices(len(r.Trace.Steps)), "sizing")
	out := o.done()
	if !full {
		return out
	}

	// The working at the chosen size, as a bearing and a settlement block
	// print it: the footing as sized, the same ground and options.
	f := *b.Of
	f.Model = r.Footing
	f.NoB = false
	bb := &eval.Block{Kind: sheet.KindBearing, Name: b.Name, Span: b.Span, Sheet: b.Sheet, On: b.On, Of: &f,
		Bearing: r.Bearing, Options: b.Options, SelfWeight: r.WeightT}
	out = append(out, c.bearing(s, bb)...)
	if r.Settle != nil {
		sb := &eval.Block{Kind: sheet.KindSettlement, Name: b.Name, Span: b.Span, Sheet: b.Sheet, On: b.On, Of: &f,
			Settle: &eval.SettleResult{Service: r.Service, Load: r.Load, Result: r.Settle}, Options: b.Options, SelfWeight: r.WeightT}
		out = append(out, c.settlement(s, sb)...)
	}
	return out
}

// sizeCells are a size block's bearing, sliding and settlement cells in
// the summary of results: each check's utilisation and verdict at the
// chosen width, as the block's table prints them.
func sizeCells(a *eval.Block) (bear, slide, settl layout.Cell) {
	r := a.Size
	for i, ch := range r.At.Checks {
		if strings.HasPrefix(ch.Detail, "not computed") {
			continue
		}
		v := verdictOf(ch.OK)
		line := layout.Cell{txt(units.Utilisation(ch.Util) + "  "), v, txt("\n" + ch.Name)}
		if i == r.At.Governing {
			line = append(line, txt(" (governs the size)"))
		}
		switch {
		case strings.HasPrefix(ch.Name, "bearing"), strings.HasPrefix(ch.Name, "eccentricity"):
			if len(bear) > 0 {
				bear = append(bear, txt("\n"))
			}
			bear = append(bear, line...)
		case ch.Name == "sliding":
			slide = line
		case ch.Name == "settlement" && r.Settle != nil:
			mm := units.MustParse("mm")
			st, lt := units.Apart(r.Settle.Total, r.Settle.Limit, mm, -1, -1) // never rounded onto the limit
			rel := "≤"
			if r.Settle.Total > r.Settle.Limit {
				rel = ">"
			}
			settl = append(layout.Cell{txt(st + " mm " + rel + " " + lt + " mm  "), v}, line[2:]...)
		}
	}
	return bear, slide, settl
}
