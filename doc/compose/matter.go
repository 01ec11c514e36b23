package compose

import (
	"fmt"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/source"
)

// registersTitle is the title of the end-matter sheet; with an appendix,
// appendixRegistersTitle.
const (
	registersTitle         = "Registers, references and cautions"
	appendixRegistersTitle = "Appendix, registers, references and cautions"
)

// endMatter is one sheet: the appendix (when any working was moved
// there), the check register, the input register, the references list
// and the cautions, each a section under its own anchor, run on without
// a page break between them.
func (c *composer) endMatter() []layout.Sheet {
	title := registersTitle
	if len(c.appendix) > 0 {
		title = appendixRegistersTitle
	}
	out := c.matterSheet(title, "registers")
	if len(c.appendix) > 0 {
		out.Blocks = append(out.Blocks, c.appendixBlocks()...)
	}
	for _, part := range [][]layout.Block{c.checkRegister(), c.inputRegister(), c.references(), c.cautionSheet()} {
		out.Blocks = append(out.Blocks, part...)
	}
	return []layout.Sheet{out}
}

// section starts a part of the end matter: its anchor and heading.
func (c *composer) section(title, anchor string) []layout.Block {
	p := c.matterPos()
	return []layout.Block{&layout.Anchor{Pos: p, Name: anchor}, heading(p, 1, title)}
}

// where prints a source place as "01-ground.md:16".
func where(sp source.Span) string {
	if sp.File == nil {
		return ""
	}
	p := sp.Pos()
	name := p.Path
	if i := strings.LastIndexAny(name, `/\`); i >= 0 {
		name = name[i+1:]
	}
	return fmt.Sprintf("%s:%d", name, p.Line)
}

// checkRegister lists every check of the package, linked to its line.
func (c *composer) checkRegister() []layout.Block {
	p := c.matterPos()
	out := c.section("Check register", "check-register")
	out = append(out, &layout.Para{Pos: p, Runs: c.checkTotals(false)})
	if len(c.res.Checks) == 0 {
		return out
	}
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt("Each check (its condition, its description, and the sheet and file:line that locate it in the source) links to the line that states it, on the page given. Demand is the left side and capacity the right (the other way round for ≥); utilisation is the demand over the capacity.")}})
	t := &layout.Table{Pos: p, Compact: true,
		Header: []layout.Cell{cell(txt("No.")), cell(txt("Check; description; sheet, line")), cell(txt("Demand")), cell(txt("Capacity")),
			cell(txt("Utilisation")), cell(txt("Verdict")), cell(txt("Page"))},
		Align: []layout.Align{layout.AlignRight, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft, layout.AlignRight}}
	for i, ch := range c.res.Checks {
		util := "—"
		if ch.HasUtil() {
			util = ch.UtilText()
		}
		verdict := verdictOf(ch.OK)
		demand, capacity := ch.L, ch.R
		if ch.Op == ">=" || ch.Op == ">" {
			demand, capacity = ch.R, ch.L
		}
		page := cell(pageOf(ch.Anchor, ""))
		what := append(c.checkMath(ch), txt("; "))
		if ch.Stmt == nil { // an engine check: its note is plinth's, typeset as in the body
			what = append(what, richText(ch.Note.Value, layout.Regular)...)
		} else {
			what = append(what, c.noteRuns(ch.Sheet, ch.Note)...)
		}
		what = append(what, txt("; "), layout.Run{Text: sheetLabel(ch.Sheet) + ", " + where(ch.Span), Link: ch.Anchor})
		t.Rows = append(t.Rows, layout.Row{Pos: ch.Span, Cells: []layout.Cell{
			cell(txt(fmt.Sprint(i + 1))),
			cell(what...),
			cell(layout.Run{Math: valueNode(demand, ch.Unit, -1), Own: true}),
			cell(layout.Run{Math: valueNode(capacity, ch.Unit, -1), Own: true}),
			cell(txt(util)), cell(verdict), page,
		}})
	}
	return append(out, t)
}

// checkMath prints a check's condition, linked to where it is stated.
func (c *composer) checkMath(ch *eval.Check) []layout.Run {
	if ch.Stmt == nil {
		// an engine check: "P1 bearing: V_d <= R_d"
		head, cond, ok := strings.Cut(ch.Text, ": ")
		f := strings.Fields(cond)
		if !ok || len(f) != 3 || relText[f[1]] == "" {
			return []layout.Run{{Text: checkLabel(ch), Link: ch.Anchor}}
		}
		return []layout.Run{{Text: head + ": ", Link: ch.Anchor},
			{Math: eqn.Row{eqn.Sym{Name: f[0]}, eqn.Op{Text: relText[f[1]]}, eqn.Sym{Name: f[2]}}, Link: ch.Anchor}}
	}
	l := newFormula(ch.Stmt.L, ch.Uses).symbolic()
	r := newFormula(ch.Stmt.R, ch.Uses).symbolic()
	return []layout.Run{{Math: eqn.Row{l, eqn.Op{Text: relText[ch.Op]}, r}, Link: ch.Anchor}}
}

// inputRegister lists every input with its value, note and place.
func (c *composer) inputRegister() []layout.Block {
	p := c.matterPos()
	out := c.section("Input register", "input-register")
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{
		txt("Every value the engineer gave (a number with its unit, not computed from other symbols), sheet by sheet, with its description and source, and the place it is defined (linked). The cells of ground and footing tables are not repeated: a row points to each table. Values plinth assumed are listed at the end."),
	}})
	reg := &layout.Table{Pos: p, Compact: true,
		Header: []layout.Cell{cell(txt("Symbol")), cell(txt("Value")), cell(txt("Description and source")), cell(txt("Defined at"))},
		Align:  []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignLeft, layout.AlignLeft}}
	for _, s := range c.res.Sheets {
		var rows []layout.Row
		tables := map[string]int{} // anchor of a ground or footing table → its inputs
		var order []string
		first := map[string]*eval.Symbol{}
		for _, y := range s.Symbols {
			if !y.Input {
				continue
			}
			if a := c.inputs[y]; y.Stmt == nil && y.Override == nil && a != "" {
				// a cell of a ground or footing table: the register points to the table
				if tables[a] == 0 {
					order = append(order, a)
					first[a] = y
				}
				tables[a]++
				continue
			}
			val := layout.Run{Math: symbolNode(y, y.Unit, y.Decimals)}
			note := c.noteRuns(s, y.Note)
			if y.Override != nil {
				note = append([]layout.Run{bold("VARIANT (--set " + y.Override.Arg + ") ")}, note...)
			}
			at := layout.Run{Text: where(y.Span)}
			if a := c.inputs[y]; a != "" {
				at.Link = a
			}
			rows = append(rows, layout.Row{Pos: y.Span, Cells: []layout.Cell{
				cell(layout.Run{Math: eqn.Sym{Name: y.Name}}), cell(val), cell(note...), cell(at),
			}})
		}
		for _, a := range order {
			y := first[a]
			block, _, _ := strings.Cut(y.Name, ".")
			rows = append(rows, layout.Row{Pos: y.Span, Cells: []layout.Cell{
				cell(user(block + ".*")), cell(txt(plural(tables[a], "value"))),
				cell(txt("every cell of the table of " + block + ", with the source given in its row; see the table")),
				cell(layout.Run{Text: where(y.Span), Link: a, Own: true}),
			}})
		}
		if len(rows) == 0 {
			continue
		}
		title := strings.TrimSpace(s.Meta.Calc.Value + "  " + s.Meta.Title.Value)
		if title == "" {
			title = s.Name()
		}
		// the sheet's rows under a row naming it, in one table for the package
		reg.Rows = append(reg.Rows, layout.Row{Pos: p, Cells: []layout.Cell{nil, nil, cell(layout.Run{Text: title, Style: layout.Bold, Link: sheetAnchor(s.Index)}), nil}})
		reg.Rows = append(reg.Rows, rows...)
	}
	if len(reg.Rows) > 0 {
		out = append(out, reg)
	}
	return append(out, c.assumedValues()...)
}

// assumedValues lists the values plinth assumed or added: the
// self-weight of each analysis with self_weight = auto (and its defaults),
// and the engine's notes of values assumed where not given. A value
// assumed the same way in several blocks is one row naming every block.
func (c *composer) assumedValues() []layout.Block {
	p := c.matterPos()
	type use struct {
		s      *eval.Sheet
		b      *eval.Block
		where  string // the case or step, for a caution
		anchor string
	}
	type entry struct {
		sym, note string
		val       float64
		unit      string
		uses      []use
	}
	var list []*entry
	byKey := map[string]*entry{}
	add := func(sym string, v float64, unit, note string, u use) {
		k := fmt.Sprintf("%s\x00%v\x00%s\x00%s", sym, v, unit, note)
		e := byKey[k]
		if e == nil {
			e = &entry{sym: sym, note: note, val: v, unit: unit}
			byKey[k] = e
			list = append(list, e)
		}
		e.uses = append(e.uses, u)
	}
	for _, s := range c.res.Sheets {
		for _, b := range s.Blocks() {
			for _, st := range b.SelfWeight.Steps {
				if st.Symbol == "W" || strings.Contains(st.Note, "assumed") {
					add(st.Symbol, st.Value, st.Unit, st.Note, use{s: s, b: b, anchor: blockAnchor(b)})
				}
			}
			for _, st := range assumedSteps(b) {
				add(st.Symbol, st.Value, st.Unit, st.Note, use{s: s, b: b, anchor: blockAnchor(b)})
			}
		}
	}
	for _, r := range c.cautions {
		if !strings.Contains(strings.ToLower(r.text), "assumed") || r.sev >= severity.Warning || r.atStep { // its step is listed above
			continue
		}
		add("", 0, "", r.text, use{s: r.sheet, b: r.block, where: r.where, anchor: r.anchor})
	}
	out := []layout.Block{&layout.Heading{Pos: p, Level: 2, NoNumber: true, Runs: []layout.Run{txt("Assumed values")}}}
	if len(list) == 0 {
		return append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt("plinth assumed no values for this package.")}})
	}
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt("Values plinth added or assumed because the sheets do not give them, each printed with its working where it is used; confirm each. A value assumed alike in several blocks is listed once, with every block that uses it.")}})
	t := &layout.Table{Pos: p, Compact: true,
		Header: []layout.Cell{cell(txt("Symbol")), cell(txt("Value")), cell(txt("What and why; where used"))},
		Align:  []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignLeft}}
	for _, e := range list {
		sym, val := cell(txt("—")), cell(txt("—"))
		if e.sym != "" {
			sym, val = cell(layout.Run{Math: eqn.Sym{Name: e.sym}, Own: true}), cell(layout.Run{Math: siNode(e.val, e.unit), Own: true})
		}
		note := cell(richText(e.note, layout.Regular)...)
		for from := 0; from < len(e.uses); from += maxUses {
			at := append(append(layout.Cell(nil), note...), txt("\nUsed at "))
			for i := from; i < min(from+maxUses, len(e.uses)); i++ {
				u := e.uses[i]
				if i > from {
					at = append(at, txt("; "))
				}
				if i == from || u.s != e.uses[i-1].s {
					at = append(at, txt(sheetLabel(u.s)+": "))
				}
				name := strings.TrimSpace(u.b.Kind.String() + " " + u.b.Name)
				if u.where != "" {
					name = u.where
				}
				at = append(at, layout.Run{Text: name + " (" + where(u.b.Span) + ")", Link: u.anchor, Own: true})
			}
			if from > 0 {
				note = cell(txt("as the row above, in more blocks"))
			}
			t.Rows = append(t.Rows, layout.Row{Pos: e.uses[from].b.Span, Cells: []layout.Cell{sym, val, at}})
		}
	}
	return append(out, t)
}

// maxUses is the most places a row of the assumed values or the cautions
// lists; more continue on the next row, so no row outgrows a page.
const maxUses = 8

// assumedSteps are the steps of a block's engine working that record a
// value the engine assumed because the sheet does not give it (their
// note says "assumed, default"), each symbol and note once.
func assumedSteps(b *eval.Block) []trace.Step {
	var trs []*trace.Trace
	switch {
	case b.Bearing != nil:
		trs = append(trs, &b.Bearing.Trace)
	case b.Settle != nil:
		trs = append(trs, &b.Settle.Load, &b.Settle.Trace)
	case b.Capacity != nil:
		trs = append(trs, &b.Capacity.Trace)
	}
	seen := map[string]bool{}
	var out []trace.Step
	for _, tr := range trs {
		for _, st := range tr.Steps {
			if !strings.Contains(st.Note, "assumed, default") || seen[st.Symbol+"\x00"+st.Note] {
				continue
			}
			seen[st.Symbol+"\x00"+st.Note] = true
			out = append(out, st)
		}
	}
	return out
}

// references prints the references list, numbered as cited.
func (c *composer) references() []layout.Block {
	c.uncited()
	p := c.matterPos()
	out := c.section("References", "references")
	cited, pkgUncited := 0, 0
	for _, r := range c.refs.list {
		if r.cited {
			cited++
		} else {
			pkgUncited++
		}
	}
	intro := "References are numbered in the order they are first cited in this package"
	if pkgUncited > 0 {
		intro += fmt.Sprintf("; [%d]–[%d] are listed in the package settings but not cited", cited+1, len(c.refs.list))
		if pkgUncited == 1 {
			intro = fmt.Sprintf("References are numbered in the order they are first cited in this package; [%d] is listed in the package settings but not cited", cited+1)
		}
	}
	intro += "."
	for _, r := range c.refs.list {
		if r.engine {
			intro += " Entries marked “method” are the publications of the methods the engine used."
			break
		}
	}
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(intro)}})
	if len(c.refs.list) == 0 {
		out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt("No references are cited or listed.")}})
	}
	for _, r := range c.refs.list {
		text := user("  " + r.text) // the package's own references are the user's text
		if r.engine {
			text = txt(text.Text)
		}
		runs := []layout.Run{bold(fmt.Sprintf("[%d]", r.n)), text}
		if r.engine {
			runs = append(runs, layout.Run{Text: "  (method)", Style: layout.Italic})
		} else {
			runs = append(runs, layout.Run{Text: "  [" + r.key + "]", Style: layout.Italic})
		}
		out = append(out, &layout.Anchor{Pos: p, Name: r.anchor()}, &layout.Para{Pos: p, Runs: runs, Small: true})
	}
	return out
}

// standing are the cautions every package carries.
var standing = []string{
	"This package supports, and does not replace, the judgement of a qualified engineer. The designer remains responsible for the ground model, the parameters chosen and whether each method applies to the case in hand.",
	"Local codes of practice and national annexes govern. Partial factors, model factors and limits are those stated in each calculation (the recommended values of EN 1997-1 unless a national annex or factors file is named) and must be confirmed for the project.",
	"Results are only as good as the inputs. Every input is listed in the input register with its source; check each against the ground investigation and the structural analysis it comes from.",
	"The input fingerprint in every page footer identifies the inputs of this print. A print showing a different fingerprint was made from different inputs.",
}

// severityOrder states the order of the caution words and what each
// means (calc/severity), highest first.
func severityOrder() string {
	var parts []string
	for l := severity.Warning; l >= severity.Note; l-- {
		parts = append(parts, l.String()+", "+l.Meaning())
	}
	return "Severity, highest first (the order of ANSI Z535.4 and ISO 3864-2): " + strings.Join(parts, "; ") + "."
}

// cautionSheet lists every engine caution with where it was raised, then
// the standing cautions. A caution raised in the same words in several
// places is one row naming every place.
func (c *composer) cautionSheet() []layout.Block {
	p := c.matterPos()
	out := c.section("Cautions", "cautions")
	out = append(out, heading(p, 2, "Cautions raised by the engine"))
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(severityOrder())}})
	if len(c.cautions) == 0 {
		out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt("The engine raised no cautions for this package.")}})
	} else {
		t := &layout.Table{Pos: p, Compact: true, Header: []layout.Cell{cell(txt("No.")), cell(txt("Severity")), cell(txt("Caution; where raised"))},
			Align: []layout.Align{layout.AlignRight}}
		list := append([]raised(nil), c.cautions...)
		sort.SliceStable(list, func(i, j int) bool { return list[i].sev > list[j].sev }) // most severe first
		rowOf := map[string]int{}                                                        // the row a caution's places go in
		var uses []int                                                                   // places in each row
		for _, r := range list {
			at := layout.Run{Text: strings.TrimSpace(sheetLabel(r.sheet) + ", " + r.where), Link: r.anchor}
			k := r.sev.String() + "\x00" + r.text
			if i, ok := rowOf[k]; ok && uses[i] < maxUses {
				t.Rows[i].Cells[2] = append(t.Rows[i].Cells[2], txt("; "), at)
				uses[i]++
				continue
			}
			uses = append(uses, 1)
			rowOf[k] = len(t.Rows)
			t.Rows = append(t.Rows, layout.Row{Pos: r.block.Span, Cells: []layout.Cell{
				cell(txt(fmt.Sprint(len(t.Rows) + 1))), cell(bold(r.sev.String())), append(richText(r.text, layout.Regular), txt("\nRaised at "), at),
			}})
		}
		out = append(out, t)
	}
	var items [][]layout.Block
	for _, s := range standing {
		items = append(items, []layout.Block{&layout.Para{Pos: p, Runs: []layout.Run{txt(s)}}})
	}
	return append(out, &layout.Caution{Pos: p, Severity: severity.Caution, Title: []layout.Run{txt("Standing cautions")},
		Body: []layout.Block{&layout.List{Pos: p, Items: items}}})
}
