package compose

import (
	"fmt"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// footingRow is one row of the summary of results: a footing and the
// analyses made of it, anywhere in the package.
type footingRow struct {
	footing  *eval.Block
	analyses []*eval.Block
}

// summaryRows lists every footing block of the printed sheets, in order,
// with its analyses.
func (c *composer) summaryRows() []footingRow {
	var rows []footingRow
	at := map[*eval.Footing]int{}
	for _, s := range c.res.Sheets {
		for _, b := range s.Blocks() {
			if b.Footing != nil {
				at[b.Footing] = len(rows)
				rows = append(rows, footingRow{footing: b})
			}
		}
	}
	for _, s := range c.res.Sheets {
		for _, b := range s.Blocks() {
			if i, ok := at[b.Of]; ok && b.Of != nil {
				rows[i].analyses = append(rows[i].analyses, b)
			}
		}
	}
	return rows
}

// result finds an analysis' result symbol by its short name ("util_u").
func result(b *eval.Block, name string) *eval.Symbol {
	for _, y := range b.Results {
		if strings.HasSuffix(y.Name, "."+name) {
			return y
		}
	}
	return nil
}

// basisItem is one entry of the design basis.
type basisItem struct {
	label string
	field sheet.Str
	def   string // what prints when the field is not set ("" = not stated, an open item)
}

// designBasis lists the design-basis entries from package.yaml.
func (c *composer) designBasis() []basisItem {
	m := c.packageMeta()
	factors := ""
	for _, s := range c.res.Sheets {
		for _, b := range s.Blocks() {
			if b.Bearing != nil && factors == "" && b.Bearing.Source != "" {
				factors = b.Bearing.Source
			}
		}
	}
	if m.Factors.Value != "" {
		factors = "" // the file named prints
	}
	detail := "governing (the governing working in full, the rest in the appendix)"
	return []basisItem{
		{"Standard", m.Standard, ""},
		{"National annex", m.NationalAnnex, ""},
		{"Partial factors", m.Factors, factors},
		{"Geotechnical Category", m.GeoCategory, ""},
		{"Design working life", m.DesignLife, ""},
		{"Consequence class", m.Consequence, ""},
		{"Scope exclusions", m.Exclusions, ""},
		{"Detail printed", m.Detail, detail},
	}
}

// summary is the summary of results and the design basis: one row per
// footing with the governing verdicts and where they are, and the open
// items a checker should settle.
func (c *composer) summary() layout.Sheet {
	out := c.matterSheet("Summary of results", "summary")
	p := out.Pos
	add := func(b ...layout.Block) { out.Blocks = append(out.Blocks, b...) }
	add(heading(p, 1, "Summary of results"))

	var open [][]layout.Run
	basis := &layout.Table{Pos: p, Compact: true, Header: []layout.Cell{cell(txt("Design basis")), cell(txt("As stated in package.yaml"))}}
	for _, it := range c.designBasis() {
		v := cell(user(it.field.Value))
		switch {
		case strings.TrimSpace(it.field.Value) != "":
		case it.def != "":
			v = cell(txt(it.def))
		default:
			v = cell(bold("not stated"))
			open = append(open, []layout.Run{txt(it.label + " is not stated in package.yaml.")})
		}
		basis.Rows = append(basis.Rows, layout.Row{Pos: p, Cells: []layout.Cell{cell(txt(strings.ReplaceAll(it.label, " ", "\u00a0"))), v}})
	}
	add(basis)

	add(heading(p, 2, "Checks and results by foundation"))
	add(&layout.Para{Pos: p, Runs: c.checkTotals(true)})
	rows := c.summaryRows()
	if len(rows) == 0 {
		add(&layout.Para{Pos: p, Runs: []layout.Run{txt("The package has no footing blocks.")}})
	} else {
		add(c.resultsTable(rows))
	}

	// Open items.
	if strings.TrimSpace(c.packageMeta().Checked.Value) == "" {
		open = append(open, []layout.Run{bold("NOT CHECKED"), txt(": the package has no checker's name; the sign-off on the cover is open.")})
	}
	type assumption struct {
		st     trace.Step
		blocks []*eval.Block
	}
	var assumed []*assumption // an assumed value made alike in several blocks is one item
	byKey := map[string]*assumption{}
	for _, fr := range rows {
		for _, b := range fr.analyses {
			for _, st := range b.SelfWeight.Steps {
				if !strings.Contains(st.Note, "assumed") {
					continue
				}
				k := fmt.Sprintf("%s\x00%s\x00%v\x00%s", st.Note, st.Symbol, st.Value, st.Unit)
				if a := byKey[k]; a != nil {
					a.blocks = append(a.blocks, b)
					continue
				}
				byKey[k] = &assumption{st: st, blocks: []*eval.Block{b}}
				assumed = append(assumed, byKey[k])
			}
			if len(b.SelfWeight.Steps) > 0 {
				break // the footing's assumptions once
			}
		}
	}
	for _, a := range assumed {
		open = append(open, c.openAt(a.blocks, a.st))
	}
	seen := map[string]bool{}
	item := map[string]int{} // a caution's item, by severity and words: its places are listed together
	list := append([]raised(nil), c.cautions...)
	sort.SliceStable(list, func(i, j int) bool { return list[i].sev > list[j].sev }) // most severe first
	for _, r := range list {
		if !openCaution(r) || seen[r.where+r.text] {
			continue
		}
		seen[r.where+r.text] = true
		place := []layout.Run{txt(sheetLabel(r.sheet) + ", " + r.where + ", "), pageOf(r.anchor, "page ")}
		k := r.sev.String() + "\x00" + r.text
		if i, ok := item[k]; ok {
			last := open[i][len(open[i])-1]
			open[i] = append(append(open[i][:len(open[i])-1], txt("; ")), place...)
			open[i] = append(open[i], last)
			continue
		}
		item[k] = len(open)
		runs := []layout.Run{bold(r.sev.String()), txt(" ")}
		runs = append(runs, richText(r.text, layout.Regular)...)
		runs = append(runs, txt(" ("))
		runs = append(runs, place...)
		runs = append(runs, txt(")"))
		open = append(open, runs)
	}
	add(heading(p, 2, "Open items"))
	if len(open) == 0 {
		add(&layout.Para{Pos: p, Runs: []layout.Run{txt("None.")}})
		return out
	}
	add(&layout.Para{Pos: p, Runs: []layout.Run{txt("For the checker to settle: design-basis entries not stated, the sign-off, values plinth assumed, and cautions that a value was assumed or extrapolated or something not computed or verified (all cautions: "),
		{Text: "cautions", Link: "cautions", Own: true}, txt(", by severity).")}})
	var items [][]layout.Block
	for _, runs := range open {
		items = append(items, []layout.Block{&layout.Para{Pos: p, Runs: runs, Small: true}})
	}
	add(&layout.List{Pos: p, Items: items})
	return out
}

// openAt is an open item about a value assumed alike in the given
// blocks, linked to each.
func (c *composer) openAt(bs []*eval.Block, st trace.Step) []layout.Run {
	var names []string
	for _, b := range bs {
		names = append(names, b.Kind.String()+" "+b.Name)
	}
	runs := richText(strings.Join(names, ", ")+": "+st.Note, layout.Regular)
	runs = append(runs, txt(" ("), layout.Run{Math: rowEq(st.Symbol, st.Value, st.Unit), Own: true})
	for i, b := range bs {
		sep := "; "
		if i > 0 {
			sep = ", "
		}
		runs = append(runs, txt(sep), pageOf(blockAnchor(b), "page "))
	}
	return append(runs, txt(")."))
}

// openCaution reports whether an engine caution is an open item: one
// that says a value was assumed, a chart or table read beyond its range,
// φ′_cv is missing, or something was not computed, checked or verified
// (the others are counted in the results table and listed in the
// cautions sheet).
func openCaution(r raised) bool {
	t := strings.ToLower(r.text)
	for _, w := range []string{"assumed", "extrapolat", "phi'_cv", "φ′_cv", "not computed", "not checked", "not verified", "confirm"} {
		if strings.Contains(t, w) {
			return true
		}
	}
	return false
}

// resultsTable is the table of results: a row per footing.
func (c *composer) resultsTable(rows []footingRow) *layout.Table {
	p := c.matterPos()
	t := &layout.Table{Pos: p, Compact: true,
		Header: []layout.Cell{cell(txt("Foundation")), cell(txt("Bearing (ULS)")), cell(txt("Sliding (ULS)")),
			cell(txt("Settlement (SLS); allowable pressure"))},
		Caption: []layout.Run{txt("Governing utilisation, verdict and case of each check, short and long term where both apply; under each foundation (linked to its page) the WARNINGs and CAUTIONs raised.")}}
	for _, fr := range rows {
		b := fr.footing
		f := b.Footing
		page := pageOf(blockAnchor(b), "page ")
		name := layout.Cell{userBold(f.Name), txt("  " + sheetLabel(b.Sheet) + ", "), page}
		size := layout.Cell{txt(shortShape(f.Model))}
		strata := map[string]bool{}
		var bear, slide, settl, allow layout.Cell
		warn := 0
		gov := governingAnalyses(fr.analyses)
		for _, a := range fr.analyses {
			for _, ca := range a.Cautions {
				if ca.Severity >= trace.SevWarning && !ca.Restates {
					warn++
				}
			}
		}
		for _, a := range gov {
			if st := a.Stratum(); st != "" && !strata[st] {
				strata[st] = true
				size = append(size, txt(" on "), user(st))
			}
			switch {
			case a.Bearing != nil:
				bear = append(bear, c.verdictCell(a, "bearing", a.Bearing.Governing >= 0, func() string { return a.Bearing.Cases[a.Bearing.Governing].Name })...)
				if u, d := result(a, "util_u"), result(a, "util_dr"); u != nil && d != nil {
					bear = append(bear, txt("\nshort term "+units.Utilisation(u.Q.V)+", long term "+units.Utilisation(d.Q.V)))
				}
				slide = append(slide, c.verdictCell(a, "sliding", a.Bearing.GoverningSliding >= 0, func() string { return a.Bearing.Sliding[a.Bearing.GoverningSliding].Name })...)
			case a.Settle != nil:
				if ch := findCheck(a, "settlement"); ch != nil {
					// the same digits and the relation that holds, as the check line prints them
					lt, rt := ch.Values()
					settl = append(settl, txt(lt+" "+ch.Unit.Name+" "+relText[ch.Relation()]+" "+rt+" "+ch.Unit.Name+"  "), verdictRun(ch))
				}
				if y := result(a, "t_90"); y != nil {
					settl = append(settl, layout.Run{Text: "\n", Own: true}, layout.Run{Math: rowEq("t_90", y.Q.V, "yr"), Own: true})
				}
			case a.Capacity != nil:
				if y := result(a, "q_allow"); y != nil {
					allow = append(allow, layout.Run{Math: rowEq("q_allow", y.Q.V, "kPa"), Own: true})
				}
			case a.Size != nil:
				size = layout.Cell{txt("sized: " + shortShape(a.Size.Footing))}
				bear, slide, settl = sizeCells(a)
			}
		}
		dash := func(c layout.Cell) layout.Cell {
			if len(c) == 0 {
				return layout.Cell{txt("—")}
			}
			return c
		}
		if n := len(fr.analyses) - len(gov); n > 0 {
			more := fmt.Sprintf("\n%d other analyses on its sheets", n)
			if n == 1 {
				more = "\n1 other analysis on its sheet"
			}
			name = append(name, txt(more))
		}
		name = append(name, txt("\n"))
		name = append(name, size...)
		name = append(name, txt(fmt.Sprintf("\nWARNINGs and CAUTIONs: %d", warn)))
		if len(allow) > 0 {
			if len(settl) > 0 {
				settl = append(settl, txt("\n"))
			}
			settl = append(settl, allow...)
		}
		t.Rows = append(t.Rows, layout.Row{Pos: b.Span, Cells: []layout.Cell{name, dash(bear), dash(slide), dash(settl)}})
	}
	return t
}

// verdictCell is "0.57 OK" and the governing case of an engine check.
func (c *composer) verdictCell(a *eval.Block, kind string, has bool, gov func() string) layout.Cell {
	ch := findCheck(a, kind)
	if ch == nil || !has {
		return nil
	}
	cl := layout.Cell{txt(units.Utilisation(ch.Util) + "  "), verdictRun(ch), txt("\n" + gov())}
	return cl
}

// verdictOf is a table's verdict cell: OK, or NOT OK in bold.
func verdictOf(ok bool) layout.Run {
	if ok {
		return txt("OK")
	}
	return bold("NOT OK")
}

// metres is a length as printed, in metres ("2.4 m").
func metres(v float64) string {
	return valueText(units.Quantity{V: v, Dim: units.Length}, units.MustParse("m"), -1)
}

func verdictRun(ch *eval.Check) layout.Run {
	if ch.OK {
		return bold("OK")
	}
	return bold("NOT OK")
}

// rowEq is "sym = value unit" as math.
func rowEq(sym string, v float64, unit string) eqn.Node {
	return eqn.Row{eqn.Sym{Name: sym}, eqn.Op{Text: "="}, siNode(v, unit)}
}

// shortShape is a footing's plan and depth in a few words: "2.7 m × 3.2 m,
// D = 1 m".
func shortShape(f site.Footing) string {
	l := metres
	var plan string
	switch f.Shape {
	case site.Strip:
		plan = "strip " + l(f.B)
	case site.Circle:
		plan = "circle diameter " + l(f.B)
	case site.Square:
		plan = l(f.B) + " × " + l(f.B)
	default:
		plan = l(f.B) + " × " + l(f.L)
	}
	return plan + ", at " + l(f.D)
}

// governingAnalyses keeps, of a footing's analyses, the one of each kind
// with the highest utilisation of its governing check (bearing by its
// bearing check; the first capacity block), in their order.
func governingAnalyses(as []*eval.Block) []*eval.Block {
	best := map[string]*eval.Block{}
	util := func(b *eval.Block, kind string) float64 {
		if ch := findCheck(b, kind); ch != nil && ch.HasUtil() {
			return ch.Util
		}
		return -1
	}
	for _, a := range as {
		var kind string
		switch {
		case a.Bearing != nil:
			kind = "bearing"
		case a.Settle != nil:
			kind = "settlement"
		case a.Capacity != nil:
			kind = "capacity"
		case a.Size != nil:
			kind = "size"
		default:
			continue
		}
		if b, ok := best[kind]; !ok || kind != "capacity" && util(a, kind) > util(b, kind) {
			best[kind] = a
		}
	}
	var out []*eval.Block
	for _, a := range as {
		for _, b := range best {
			if a == b {
				out = append(out, a)
			}
		}
	}
	return out
}
