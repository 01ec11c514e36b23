package compose

import (
	"fmt"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// engineOut collects the blocks of one engine block's printout.
type engineOut struct {
	c         *composer
	s         *eval.Sheet
	b         *eval.Block
	p         source.Span
	blocks    []layout.Block
	apx       []layout.Block    // working moved to the appendix (detail = governing)
	shown     map[shownKey]bool // cautions already boxed
	asCase    map[string]bool   // symbols listed by value, by the governing case's formulas (steps)
	inSummary map[string]bool   // symbols the case summary gives, left out of the case tables
	beside    bool              // the caution being boxed follows its step, printed in full
}

type shownKey struct {
	tr *trace.Trace
	i  int
}

func (c *composer) engineOut(s *eval.Sheet, b *eval.Block) *engineOut {
	c.refSeen = map[trace.Ref]bool{} // each citation once per block
	o := &engineOut{c: c, s: s, b: b, p: b.Span, shown: map[shownKey]bool{}}
	o.add(&layout.Anchor{Pos: o.p, Name: blockAnchor(b)})
	return o
}

// blockAnchor names the place where a ground, footing or analysis block
// is printed.
func blockAnchor(b *eval.Block) string {
	return fmt.Sprintf("block-%d-%s-%s", b.Sheet.Index+1, b.Kind, b.Name)
}

// done closes the block's printout: working moved to the appendix goes
// there under a heading linked back to the block.
func (o *engineOut) done() []layout.Block {
	if len(o.apx) == 0 {
		return o.blocks
	}
	title := fmt.Sprintf("%s, %s %s on %s", sheetLabel(o.s), o.b.Kind, o.b.Name, o.b.On.Name)
	o.c.appendix = append(o.c.appendix, &layout.Anchor{Pos: o.p, Name: apxAnchor(o.b)},
		&layout.Heading{Pos: o.p, Level: 2, NoNumber: true, Runs: []layout.Run{{Text: title, Link: blockAnchor(o.b), Own: true}}})
	o.c.appendix = append(o.c.appendix, o.apx...)
	return o.blocks
}

func apxAnchor(b *eval.Block) string { return "apx-" + blockAnchor(b) }

// toAppendix says where working left out of the main flow is: a
// sentence linked to the block's part of the appendix, with its page.
func (o *engineOut) toAppendix(what string) {
	o.para(txt(what+" "), pageOf(apxAnchor(o.b), "appendix, page "), txt("."))
}

// governingOnly reports whether the package prints the governing working
// in the main flow and the rest in the appendix (detail = governing, the
// default).
func (c *composer) governingOnly() bool {
	return c.packageMeta().Detail.Value != "full" && !c.opt.Bare
}

func (o *engineOut) add(bs ...layout.Block) { o.blocks = append(o.blocks, bs...) }

// line adds a calculation line to the run of lines it follows (one
// layout.Steps, which sets short lines several to a row).
func (o *engineOut) line(b layout.Block) {
	if n := len(o.blocks); n > 0 {
		if s, ok := o.blocks[n-1].(*layout.Steps); ok {
			s.Lines = append(s.Lines, b)
			return
		}
	}
	o.add(&layout.Steps{Pos: o.p, Lines: []layout.Block{b}})
}

// para adds a paragraph.
func (o *engineOut) para(runs ...layout.Run) { o.add(&layout.Para{Pos: o.p, Runs: runs}) }

// head adds an unnumbered sub-heading one level below the sheet's
// current heading.
func (o *engineOut) head(text string) {
	o.add(&layout.Heading{Pos: o.p, Level: min(o.c.level+1, 3), NoNumber: true, Runs: []layout.Run{txt(text)}})
}

// label adds a small label line above a group of calculation lines.
func (o *engineOut) label(text string) {
	o.add(&layout.Para{Pos: o.p, Runs: []layout.Run{{Text: text, Style: layout.BoldItalic}}, Label: true})
}

// kindWords say how a step with no formula was reached (trace.Kind); a
// given value says so in its own note.
var kindWords = map[trace.Kind]string{
	trace.Tabulated:    "tabulated",
	trace.Interpolated: "interpolated",
	trace.Solved:       "solved numerically",
	trace.Summed:       "summed",
}

// stepLine prints one engine step: a value taken as given prints as an
// input; a computed one as symbol = formula = values substituted =
// result, the note and the reference beside it.
func (c *composer) stepLine(p source.Span, st trace.Step) layout.Block {
	sym := eqn.Sym{Name: st.Symbol}
	var note []layout.Run
	if w := kindWords[st.Kind]; w != "" {
		note = append(note, layout.Run{Text: w, Style: layout.Italic, Own: true})
		if st.Note != "" {
			note = append(note, txt(": "))
		}
	}
	if st.Note != "" {
		note = append(note, richText(st.Note, layout.Regular)...)
	}
	if ref := c.stepRefOnce(st.Ref); ref != nil {
		if len(note) > 0 {
			note = append(note, txt(" "))
		}
		note = append(note, ref...)
	}
	res := siNode(st.Value, st.Unit)
	if isUtil(st.Symbol, st.Unit) {
		res = numberNode(units.Utilisation(st.Value)) // two decimals, as in the check line and the register
	}
	if st.Formula == nil || st.Kind != trace.ByFormula {
		return &layout.Input{Pos: p, Symbol: sym, Value: res, Note: note, Own: true}
	}
	stmt := &layout.Statement{Pos: p, Symbol: sym, Expr: fromExpr(st.Formula, exprOptions{Number: constant}), Result: res, Note: note, Own: true}
	if _, lone := st.Formula.(trace.Sym); !lone && len(st.Inputs) > 0 {
		vals := map[string]trace.Value{}
		for _, in := range st.Inputs {
			vals[in.Symbol] = in
		}
		stmt.Subst = fromExpr(st.Formula, exprOptions{Number: constant, Subst: func(name string) (eqn.Node, bool) {
			v, ok := vals[name]
			if !ok {
				return nil, false
			}
			return siNode(v.V, v.Unit), true
		}})
		if !c.fits(stmt.Subst) {
			// Too wide to set even broken: list the values instead.
			stmt.Subst = nil
			stmt.Note = append(stmt.Note, txt("; with "))
			for i, in := range st.Inputs {
				if i > 0 {
					stmt.Note = append(stmt.Note, txt(", "))
				}
				stmt.Note = append(stmt.Note, layout.Run{Math: eqn.Row{eqn.Sym{Name: in.Symbol}, eqn.Op{Text: "="}, siNode(in.V, in.Unit)}, Own: true})
			}
		}
	}
	if !c.fits(stmt.Expr) {
		stmt.Expr, stmt.Subst = nil, nil
		stmt.Note = append(stmt.Note, txt(" (the formula is too long to set here: see the reference)"))
	}
	return stmt
}

// constant prints a number written into an engine formula: V is SI and
// unit says how to show it ("" a plain number, "deg" degrees, "yr" …).
func constant(v float64, unit string) eqn.Node {
	if unit == "" {
		return eqn.Number(v, 6)
	}
	return siNode(v, unit)
}

// fits reports whether a formula part can be set in the text column,
// broken at its top-level relations and signs as the layout breaks it.
func (c *composer) fits(n eqn.Node) bool {
	if n == nil {
		return true
	}
	lines, err := eqn.Break(eqn.Row{eqn.Op{Text: "="}, n}, c.width-12, eqn.Style{Size: layout.MathSize, Texts: c.texts})
	if err != nil {
		return true // the layout reports it
	}
	for _, l := range lines {
		if l.W > c.width-12 {
			return false
		}
	}
	return true
}

// raises reports whether step i of tr raised a caution.
func (o *engineOut) raises(tr *trace.Trace, i int) bool {
	for _, ca := range tr.Cautions {
		if ca.Step == i {
			return true
		}
	}
	return false
}

// cautionOf boxes caution j of tr unless it is already shown.
func (o *engineOut) cautionOf(tr *trace.Trace, j int, where string) {
	k := shownKey{tr, j}
	if o.shown[k] {
		return
	}
	o.shown[k] = true
	o.caution(tr.Cautions[j], where)
}

// sentence starts a caution's message with a capital letter unless its
// first word is a symbol or option name (φ′_d, local_shear).
func sentence(m string) string {
	w, _, _ := strings.Cut(m, " ")
	if m == "" || m[0] < 'a' || m[0] > 'z' || strings.ContainsAny(w, "_=′'()") {
		return m
	}
	return strings.ToUpper(m[:1]) + m[1:]
}

// cautionBeside is cautionOf for a caution raised at a step just printed
// in full, whose note may already say it (trace.Caution.AtStep).
func (o *engineOut) cautionBeside(tr *trace.Trace, j int, where string) {
	o.beside = true
	o.cautionOf(tr, j, where)
	o.beside = false
}

// rest boxes the cautions of tr not shown yet: those of the calculation
// as a whole, and those raised in steps not printed in full. where names
// the place; a caution with a case says its case.
func (o *engineOut) rest(tr *trace.Trace, where string, only func(trace.Caution) bool) {
	// highest severity first (WARNING, CAUTION, NOTE), in order raised within each
	idx := make([]int, 0, len(tr.Cautions))
	for j, ca := range tr.Cautions {
		if only == nil || only(ca) {
			idx = append(idx, j)
		}
	}
	sort.SliceStable(idx, func(a, b int) bool { return tr.Cautions[idx[a]].Severity > tr.Cautions[idx[b]].Severity })
	for _, j := range idx {
		ca := tr.Cautions[j]
		w := where
		if ca.Case != "" {
			w = ca.Case
		}
		o.cautionOf(tr, j, w)
	}
}

// listed enters caution code of tr (the first raised) in the cautions
// summary with a link to this point, unboxed: the caller prints what it
// says in its own words here. It reports the caution's message, or false
// when tr raised none with that code.
func (o *engineOut) listed(tr *trace.Trace, code, where string) (string, bool) {
	for j, ca := range tr.Cautions {
		if ca.Code == code {
			o.shown[shownKey{tr, j}] = true
			o.add(&layout.Anchor{Pos: o.p, Name: o.enter(ca, where)})
			return ca.Message, true
		}
	}
	return "", false
}

// enter enters an engine caution in the cautions summary and returns the
// anchor its entry links to.
func (o *engineOut) enter(ca trace.Caution, where string) string {
	a := o.c.anchor("caution")
	o.c.cautions = append(o.c.cautions, raised{sheet: o.s, block: o.b, sev: ca.Severity, code: ca.Code, atStep: ca.AtStep, text: sentence(ca.Message),
		where: strings.TrimSpace(o.b.Kind.String() + " " + o.b.Name + ", " + where), anchor: a})
	return a
}

// caution boxes an engine caution and enters it in the cautions summary.
func (o *engineOut) caution(ca trace.Caution, where string) {
	if ca.Restates { // the check line printed beside it says it
		return
	}
	a := o.enter(ca, where)
	sev := ca.Severity
	if ca.AtStep && o.beside { // printed in full beside its step, whose note says it: listed, not boxed
		o.add(&layout.Anchor{Pos: o.p, Name: a})
		return
	}
	body := richText(sentence(ca.Message), layout.Regular)
	if ref := o.c.stepRef(ca.Ref); ref != nil {
		body = append(body, txt(" "))
		body = append(body, ref...)
	}
	o.add(&layout.Anchor{Pos: o.p, Name: a},
		&layout.Caution{Pos: o.p, Severity: sev, Body: []layout.Block{&layout.Para{Pos: o.p, Runs: body}}})
}

// isUtil reports whether an engine step is a utilisation (util, util_s,
// util_h…): a pure number printed by units.Utilisation.
func isUtil(symbol, unit string) bool {
	return unit == "" && (symbol == "util" || strings.HasPrefix(symbol, "util_"))
}

// groups lists the case names of tr in order of first appearance, with
// the indices of their steps.
func groups(tr *trace.Trace) (names []string, steps map[string][]int) {
	steps = map[string][]int{}
	for i, st := range tr.Steps {
		if _, ok := steps[st.Case]; !ok {
			names = append(names, st.Case)
		}
		steps[st.Case] = append(steps[st.Case], i)
	}
	return names, steps
}

// sources cites every publication the block's engine used, so the list
// carries them even when no printed step cites one.
func (c *composer) sources(b *eval.Block) {
	for _, src := range b.Sources {
		c.engineRef(src)
	}
}

// checkBlock prints an engine check (one that entered the check register)
// with both sides, named by their symbols.
func (c *composer) checkBlock(p source.Span, ch *eval.Check, left, right string) layout.Block {
	if !ch.HasUtil() {
		// No utilisation (a check not verified, with no resistance): the
		// relation and the verdict on one line, as for a calc check.
		row := eqn.Row{eqn.Sym{Name: left}, eqn.Op{Text: "="}, valueNode(ch.L, ch.Unit, -1), eqn.Op{Text: relText[ch.Op]},
			eqn.Sym{Name: right}, eqn.Op{Text: "="}, valueNode(ch.R, ch.Unit, -1)}
		runs := []layout.Run{{Text: ch.Verdict(), Style: layout.Bold}, {Text: " (no utilisation) — "}}
		runs = append(runs, richText(ch.Note.Value, layout.Regular)...)
		return &layout.Statement{Pos: p, Symbol: row, Note: runs, Anchor: ch.Anchor}
	}
	lt, rt := ch.Values()
	return &layout.Check{Pos: p, Left: eqn.Sym{Name: left}, LeftValue: withUnit(numberNode(lt), ch.Unit.Name), Rel: relText[ch.Relation()],
		Right: eqn.Sym{Name: right}, RightValue: withUnit(numberNode(rt), ch.Unit.Name),
		Util: ch.Util, UtilText: ch.UtilText(), OK: ch.OK, Note: richText(ch.Note.Value, layout.Regular), Anchor: ch.Anchor}
}

// findCheck returns the block's check whose text starts with prefix.
func findCheck(b *eval.Block, kind string) *eval.Check {
	for _, ch := range b.Checks {
		if strings.HasPrefix(ch.Text, b.Name+" "+kind+":") {
			return ch
		}
	}
	return nil
}

// num formats an SI value in a unit, for table cells.
func num(v float64, unit string) string {
	u, err := units.Parse(unit)
	if unit == "" || err != nil {
		u = units.Dimensionless
	}
	return units.Printed(v, u, -1)
}

// unitHeader is a table header cell: a symbol over its unit.
func unitHeader(symbol, unit string) layout.Cell {
	c := layout.Cell{{Math: eqn.Sym{Name: symbol}}}
	if unit != "" {
		c = append(c, txt("\n"+unitText(unit)))
	}
	return c
}

// analysis dispatches a bearing, settlement or capacity block.
func (c *composer) analysis(s *eval.Sheet, a *sheet.Analysis, b *eval.Block) []layout.Block {
	if b == nil {
		return nil
	}
	c.sources(b)
	out := c.analysisBody(s, a, b)
	if b.Vary != nil {
		out = append(out, c.varyBlocks(b)...)
	}
	return out
}

// analysisBody prints the block itself.
func (c *composer) analysisBody(s *eval.Sheet, a *sheet.Analysis, b *eval.Block) []layout.Block {
	switch {
	case b.Bearing != nil:
		return c.bearing(s, b)
	case b.Settle != nil:
		return c.settlement(s, b)
	case b.Capacity != nil:
		return c.capacity(s, b)
	case b.Diff != nil:
		return c.differential(s, b)
	case b.Size != nil:
		return c.size(s, b)
	case b.Schedule != nil:
		return c.schedule(s, b)
	case b.Platform != nil:
		return c.platform(s, b)
	}
	o := c.engineOut(s, b)
	o.para(txt(fmt.Sprintf("The %s block %s has no result.", a.Kind, b.Name)))
	return o.blocks
}

// selfWeight prints the self-weight the evaluator added to the footing's
// actions (self_weight = auto) with its working, once per block.
func (o *engineOut) selfWeight() {
	tr := &o.b.SelfWeight
	if len(tr.Steps) == 0 {
		return
	}
	w := tr.Steps[len(tr.Steps)-1]
	if first, ok := o.c.selfShown[o.b.Of]; ok && o.c.governingOnly() {
		runs := []layout.Run{txt("Self-weight added by plinth (self_weight = auto): "),
			{Math: eqn.Row{eqn.Sym{Name: w.Symbol}, eqn.Op{Text: "="}, siNode(w.Value, w.Unit)}, Own: true},
			txt(", worked out in " + first.Kind.String() + " " + first.Name + ", "), pageOf(blockAnchor(first), "page "), txt(".")}
		o.add(&layout.Para{Pos: o.p, Runs: runs})
		return
	}
	if o.c.selfShown == nil {
		o.c.selfShown = map[*eval.Footing]*eval.Block{}
	}
	o.c.selfShown[o.b.Of] = o.b
	o.label("Self-weight added by plinth (self_weight = auto)")
	o.steps(tr, indices(len(tr.Steps)), "self-weight")
}
