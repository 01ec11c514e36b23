package compose

import (
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// calc converts a calc block: comments print as small group labels,
// statements as inputs or calculation lines, checks as checks.
func (c *composer) calc(s *eval.Sheet, b *sheet.Calc) []layout.Block {
	var out []layout.Block
	for _, ln := range b.Lines {
		switch l := ln.(type) {
		case *sheet.Comment:
			if l.Text == "" {
				continue
			}
			runs := c.citedText(s, sheet.Str{Value: l.Text}, layout.Italic)
			out = append(out, &layout.Para{Pos: l.Span, Runs: runs})
		case *sheet.Stmt:
			switch x := l.X.(type) {
			case *expr.Assign:
				if y := s.Symbol(l); y != nil {
					out = append(out, c.assign(s, l, x, y))
				}
			case *expr.Check:
				if ch := s.Check(l); ch != nil {
					out = append(out, c.check(s, ch))
				}
			}
		}
	}
	return runsOfLines(out)
}

// runsOfLines gathers consecutive calculation lines (inputs and
// statements) into runs the layout may set several to a row.
func runsOfLines(bs []layout.Block) []layout.Block {
	var out []layout.Block
	for _, b := range bs {
		switch b.(type) {
		case *layout.Statement, *layout.Input:
			if n := len(out); n > 0 {
				if s, ok := out[n-1].(*layout.Steps); ok {
					s.Lines = append(s.Lines, b)
					continue
				}
			}
			out = append(out, &layout.Steps{Pos: b.Where(), Lines: []layout.Block{b}})
		default:
			out = append(out, b)
		}
	}
	return out
}

// literal reports whether n is a number as written (with its sign).
func literal(n expr.Node) (*expr.Num, bool) {
	switch n := n.(type) {
	case *expr.Num:
		return n, true
	case *expr.Paren:
		return literal(n.X)
	}
	return nil, false
}

// assign converts one statement.
func (c *composer) assign(s *eval.Sheet, st *sheet.Stmt, a *expr.Assign, y *eval.Symbol) layout.Block {
	p := st.Span
	sym := eqn.Sym{Name: a.Sym.Name}
	note := c.noteRuns(s, y.Note)
	f := newFormula(a.X, y.Uses)
	result := symbolNode(y, y.Unit, y.Decimals)
	if y.Override != nil {
		o := y.Override
		note = append(note, layout.Run{Text: "  VARIANT: set by --set " + o.Arg + "; the sheet gives ", Style: layout.Bold})
		note = append(note, layout.Run{Math: f.symbolic()})
		in := &layout.Input{Pos: p, Symbol: sym, Value: valueNode(y.Q, o.Unit, -1), Note: note}
		in.Anchor = c.inputAnchor(y)
		return in
	}
	if y.Input {
		if num, ok := literal(a.X); ok && (a.Display == nil || a.Display.Unit.Name == num.UnitText) {
			in := &layout.Input{Pos: p, Symbol: sym, Value: f.symbolic(), Note: note}
			in.Anchor = c.inputAnchor(y)
			return in
		}
		if u, ok := a.X.(*expr.Unary); ok && u.Op == "-" {
			if num, ok := literal(u.X); ok && a.Display == nil {
				in := &layout.Input{Pos: p, Symbol: sym, Value: withUnit(numberNode("-"+num.Text), num.UnitText), Note: note}
				in.Anchor = c.inputAnchor(y)
				return in
			}
		}
		stmt := &layout.Statement{Pos: p, Symbol: sym, Expr: f.symbolic(), Result: result, Note: note}
		stmt.Anchor = c.inputAnchor(y)
		return stmt
	}
	stmt := &layout.Statement{Pos: p, Symbol: sym, Expr: f.symbolic(), Result: result, Note: note}
	if !f.lone() && f.hasSymbols() {
		stmt.Subst = f.substituted()
		if !c.fits(stmt.Subst) {
			stmt.Subst = nil
		}
	}
	return stmt
}

// inputAnchor gives an input's line an anchor the input register links to.
func (c *composer) inputAnchor(y *eval.Symbol) string {
	a := c.anchor("input")
	c.inputs[y] = a
	return a
}

var relText = map[string]string{"<=": "≤", ">=": "≥", "<": "<", ">": ">", "==": "=", "!=": "≠"}

// check converts a check line.
func (c *composer) check(s *eval.Sheet, ch *eval.Check) layout.Block {
	p := ch.Span
	note := c.noteRuns(s, ch.Note)
	lt, rt := ch.Values()
	side := func(n expr.Node, text string) (eqn.Node, eqn.Node) {
		f := newFormula(n, ch.Uses)
		if !f.hasSymbols() {
			return f.symbolic(), nil // a number as written is its own value
		}
		val := withUnit(numberNode(text), ch.Unit.Name)
		if !f.lone() {
			val = eqn.Row{f.substituted(), eqn.Op{Text: "="}, val}
		}
		return f.symbolic(), val
	}
	l, lv := side(ch.Stmt.L, lt)
	r, rv := side(ch.Stmt.R, rt)
	if !ch.HasUtil() {
		// No utilisation (an equality, or a side that is not positive):
		// the relation and the verdict on one calculation line.
		row := eqn.Row{l}
		if lv != nil {
			row = append(row, eqn.Op{Text: "="}, lv)
		}
		row = append(row, eqn.Op{Text: relText[ch.Relation()]}, r)
		if rv != nil {
			row = append(row, eqn.Op{Text: "="}, rv)
		}
		verdict := layout.Run{Text: "OK", Style: layout.Bold}
		if !ch.OK {
			verdict.Text = "NOT OK"
		}
		runs := append([]layout.Run{verdict}, layout.Run{Text: " (no utilisation)"})
		if len(note) > 0 {
			runs = append(runs, layout.Run{Text: " — "})
			runs = append(runs, note...)
		}
		return &layout.Statement{Pos: p, Symbol: row, Note: runs, Anchor: ch.Anchor}
	}
	return &layout.Check{Pos: p, Left: l, LeftValue: lv, Rel: relText[ch.Relation()], Right: r, RightValue: rv,
		Util: ch.Util, UtilText: ch.UtilText(), OK: ch.OK, Note: note, Anchor: ch.Anchor}
}
