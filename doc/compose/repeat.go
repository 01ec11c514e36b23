package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/source"
)

// steps prints the steps of tr with the given indices, each caution boxed
// after the step that raised it. where names the place for the cautions
// summary ("case 7").
//
// With detail = governing no working is written out twice on a sheet:
//
//   - a step already printed on the sheet (the same symbol, formula and
//     value: a load combination the sliding case shares with the bearing
//     case, a footing dimension) is listed by value, all of a group's on
//     one line where the first of them would be ("As given or computed
//     above: …");
//   - a step whose formula is already written out in full on the sheet
//     with other values (the sliding case's eccentricity, Steinbrenner's
//     factor at the top of a layer after the one at its bottom), when its
//     working would be tall or wide, prints as its value with the values
//     that went into it, naming the step whose formula it uses;
//   - a long settlement formula (longFormula) is written out once in the
//     package: later sheets print its value and inputs and give the page
//     where it is written out.
//
// While asCase is set (the governing sliding case, after the governing
// bearing case), a step computed by a formula whose symbol the governing
// case's working printed is listed by value, all on one line.
//
// A computed step worked out alike on an earlier sheet, on the same
// ground model (the same depth and load), is listed by value with the page where it is worked
// out.
//
// A step that raised a caution is always printed in full.
func (o *engineOut) steps(tr *trace.Trace, idx []int, where string) {
	var again []trace.Step
	var byCase, there []layout.Run
	var at, byAt, elsewhere *layout.Para
	var from *firstLine
	gov := o.c.governingOnly()
	for _, i := range idx {
		st := tr.Steps[i]
		k := stepKey(st)
		if gov && st.Formula != nil && o.asCase[st.Symbol] && !o.c.printed[k] && !o.raises(tr, i) {
			if byAt == nil {
				byAt = &layout.Para{Pos: o.p, Small: true}
				o.line(byAt)
			}
			if len(byCase) > 0 {
				byCase = append(byCase, txt(", "))
			}
			byCase = append(byCase, valueRun(st))
			continue
		}
		if gov && o.c.printed[k] && !o.raises(tr, i) {
			if at == nil {
				at = &layout.Para{Pos: o.p, Small: true}
				o.line(at)
			}
			again = append(again, st)
			continue
		}
		// across sheets a step counts as the same only on the same ground
		gk := k
		if o.b.On != nil {
			gk = o.b.On.Name + "|" + k
		}
		if f, ok := o.c.firstAt[gk]; ok && gov && st.Formula != nil && !o.raises(tr, i) {
			// computed alike on an earlier sheet (the same ground, depth
			// and load): its value, with where it is worked out
			if elsewhere == nil {
				elsewhere = &layout.Para{Pos: o.p, Small: true}
				o.line(elsewhere)
				from = f
			}
			if len(there) > 0 {
				there = append(there, txt(", "))
			}
			there = append(there, valueRun(st))
			o.c.printed[k] = true
			continue
		}
		o.c.printed[k] = true
		line := o.c.stepLine(o.p, st)
		if _, ok := o.c.firstAt[gk]; !ok && st.Formula != nil {
			o.c.firstAt[gk] = &firstLine{sheet: sheetLabel(o.s), line: line}
		}
		if st.Formula != nil {
			sk := shapeKey(st.Formula)
			long := o.b.Settle != nil && weight(st.Formula) >= longFormula
			first, ok := o.c.shapes[sk]
			w, before := o.c.written[sk]
			switch {
			case !gov || o.raises(tr, i) || !o.c.tall(line):
			case ok && (first == st.Symbol || weight(st.Formula) >= 8):
				line = o.c.byFormula(o.p, st, first)
			case long && before:
				line = o.c.byFormula(o.p, st, w.symbol)
				o.c.writtenAt(line.(*layout.Input), w)
			case long:
				w = writtenOut{symbol: st.Symbol, sheet: sheetLabel(o.s), anchor: o.c.anchor("formula")}
				o.c.written[sk] = w
				if s, isStmt := line.(*layout.Statement); isStmt {
					s.Anchor = w.anchor
				}
			}
			if !ok {
				o.c.shapes[sk] = st.Symbol
			}
		}
		o.line(line)
		for j, ca := range tr.Cautions {
			if ca.Step == i {
				o.cautionBeside(tr, j, where)
			}
		}
	}
	o.closeAgain(at, again)
	if elsewhere != nil {
		page := pageOf(o.c.lineAnchor(from.line), "page ")
		page.Style = layout.Italic
		elsewhere.Runs = append([]layout.Run{{Text: "As computed in " + from.sheet + ", ", Style: layout.Italic, Own: true},
			page, {Text: ": ", Style: layout.Italic, Own: true}}, there...)
		elsewhere.Runs = append(elsewhere.Runs, txt("."))
	}
	if byAt != nil {
		byAt.Runs = append([]layout.Run{{Text: "By the formulas of the governing case above, with this case's factors: ", Style: layout.Italic, Own: true}}, byCase...)
		byAt.Runs = append(byAt.Runs, txt("."))
	}
}

// firstLine is the line that printed a computed step first in the
// package, and its sheet.
type firstLine struct {
	sheet string
	line  layout.Block
}

// lineAnchor is the anchor of a calculation line, given it if it has none.
func (c *composer) lineAnchor(b layout.Block) string {
	switch l := b.(type) {
	case *layout.Statement:
		if l.Anchor == "" {
			l.Anchor = c.anchor("line")
		}
		return l.Anchor
	case *layout.Input:
		if l.Anchor == "" {
			l.Anchor = c.anchor("line")
		}
		return l.Anchor
	}
	return ""
}

// valueRun is a step's symbol and value, for a list of values.
func valueRun(st trace.Step) layout.Run {
	return layout.Run{Math: eqn.Row{eqn.Sym{Name: st.Symbol}, eqn.Op{Text: "="}, siNode(st.Value, st.Unit)}, Own: true}
}

// closeAgain fills the line held for the steps printed above (at, in
// the run of calculation lines), in the note size.
func (o *engineOut) closeAgain(at *layout.Para, again []trace.Step) {
	if at == nil {
		return
	}
	at.Runs = []layout.Run{{Text: "As given or computed above: ", Style: layout.Italic, Own: true}}
	for i, st := range again {
		if i > 0 {
			at.Runs = append(at.Runs, txt(", "))
		}
		at.Runs = append(at.Runs, valueRun(st))
	}
	at.Runs = append(at.Runs, txt("."))
}

// longFormula is the weight from which a settlement formula (Steinbrenner's
// F₁ and F₂, Newmark's influence factor) is written out once in the
// package; later sheets give its value and inputs and point to it.
const longFormula = 10

// writtenAt makes a step printed by a formula written out on an earlier
// sheet say where: "… above" becomes "… in 2318-G-03, page 13".
func (c *composer) writtenAt(in *layout.Input, w writtenOut) {
	for i, r := range in.Note {
		if r.Text != " above" {
			continue
		}
		tail := append([]layout.Run{txt(" in " + w.sheet + ", "), pageOf(w.anchor, "page ")}, in.Note[i+1:]...)
		in.Note = append(in.Note[:i:i], tail...)
		return
	}
}

// byFormula prints a step by the formula of a step printed in full above
// (first, its symbol): the value, its note, and the values that went in.
func (c *composer) byFormula(p source.Span, st trace.Step, first string) layout.Block {
	var note []layout.Run
	if st.Note != "" {
		note = append(richText(st.Note, layout.Regular), txt("; "))
	}
	if first == st.Symbol {
		note = append(note, txt("by the formula"), txt(" above"))
	} else {
		note = append(note, txt("by the formula of "), layout.Run{Math: eqn.Sym{Name: first}, Own: true}, txt(" above"))
	}
	for i, in := range st.Inputs {
		if i == 0 {
			note = append(note, txt(", with "))
		} else {
			note = append(note, txt(", "))
		}
		note = append(note, layout.Run{Math: eqn.Row{eqn.Sym{Name: in.Symbol}, eqn.Op{Text: "="}, siNode(in.V, in.Unit)}, Own: true})
	}
	if ref := c.stepRefOnce(st.Ref); ref != nil {
		note = append(append(note, txt(" ")), ref...)
	}
	res := siNode(st.Value, st.Unit)
	if isUtil(st.Symbol, st.Unit) {
		res = numberNode(units.Utilisation(st.Value))
	}
	return &layout.Input{Pos: p, Symbol: eqn.Sym{Name: st.Symbol}, Value: res, Note: note, Own: true}
}

// tall reports whether a calculation line's working is taller than a line
// of text (a fraction, a root) or wider than the column beside its note.
func (c *composer) tall(b layout.Block) bool {
	s, ok := b.(*layout.Statement)
	if !ok || s.Expr == nil {
		return false
	}
	row := eqn.Row{s.Symbol, eqn.Op{Text: "="}, s.Expr}
	if s.Subst != nil {
		row = append(row, eqn.Op{Text: "="}, s.Subst)
	}
	box, err := eqn.Layout(row, eqn.Style{Size: layout.MathSize})
	if err != nil {
		return false // the line prints in full and the layout reports it
	}
	return box.Ascent+box.Descent > 1.6*layout.MathSize || box.W > 0.6*c.width
}

// stepKey identifies a step by its symbol, formula, inputs and value.
func stepKey(st trace.Step) string {
	return fmt.Sprintf("%s|%v|%v|%v|%s", st.Symbol, st.Formula, st.Inputs, st.Value, st.Unit)
}

// shapeKey identifies a formula up to the names of its symbols: F₁ at the
// bottom of a layer (in N_b) and at its top (in N_t) have one shape.
func shapeKey(e trace.Expr) string {
	idx := map[string]int{}
	var b strings.Builder
	var walk func(trace.Expr)
	walk = func(e trace.Expr) {
		switch e := e.(type) {
		case trace.Sym:
			if e.Name == "pi" {
				b.WriteString("pi")
				return
			}
			i, ok := idx[e.Name]
			if !ok {
				i = len(idx)
				idx[e.Name] = i
			}
			fmt.Fprintf(&b, "#%d", i)
		case trace.Num:
			fmt.Fprintf(&b, "%v%s", e.V, e.Unit)
		case trace.Op:
			b.WriteByte('(')
			walk(e.L)
			b.WriteByte(e.Op)
			walk(e.R)
			b.WriteByte(')')
		case trace.Neg:
			b.WriteString("-(")
			walk(e.X)
			b.WriteByte(')')
		case trace.Call:
			b.WriteString(e.Fn + "(")
			for i, a := range e.Args {
				if i > 0 {
					b.WriteByte(',')
				}
				walk(a)
			}
			b.WriteByte(')')
		default:
			fmt.Fprintf(&b, "%T", e)
		}
	}
	walk(e)
	return b.String()
}

// weight counts the operations and calls of a formula.
func weight(e trace.Expr) int {
	switch e := e.(type) {
	case trace.Op:
		return 1 + weight(e.L) + weight(e.R)
	case trace.Neg:
		return 1 + weight(e.X)
	case trace.Call:
		n := 1
		for _, a := range e.Args {
			n += weight(a)
		}
		return n
	}
	return 0
}
