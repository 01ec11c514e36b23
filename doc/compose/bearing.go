package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// maxCaseCols is the most case columns a compact table holds before it
// is split: four, so that a table of many rows folds into two bands.
const maxCaseCols = 4

// bearing prints a bearing block: a summary of every case with the
// governing one marked and the governing check, the working common to
// all cases, the governing case in full, the other cases compactly (every
// value, symbol by symbol), then sliding the same way.
func (c *composer) bearing(s *eval.Sheet, b *eval.Block) []layout.Block {
	r := b.Bearing
	o := c.engineOut(s, b)
	tr := &r.Trace
	fu := units.MustParse(b.Of.Model.ForceUnit())
	names, steps := groups(tr)

	o.head(fmt.Sprintf("Bearing resistance of %s on %s", b.Of.Name, b.On.Name))
	intro := fmt.Sprintf("Method: %s. Design approach %s", r.MethodLine, r.Approach)
	if r.Source != "" {
		intro += " (" + r.Source + ")"
	}
	intro += fmt.Sprintf(". %s checked", plural(len(r.Cases), "case"))
	if len(b.Options) > 0 {
		intro += "; options: " + strings.Join(b.Options, ", ")
	}
	o.para(txt(intro + "."))
	o.selfWeight()

	// Summary of the cases and the governing check.
	if len(r.Cases) > 0 {
		t := &layout.Table{Pos: o.p, Compact: true, Header: []layout.Cell{{txt("Case")}, {txt("Combination")}, {txt("Drainage")},
			unitHeader("V_d", fu.Name), unitHeader("H_d", fu.Name), unitHeader("R_d", fu.Name), {txt("Utilisation")}, {txt("Verdict")}},
			Align:   []layout.Align{layout.AlignRight, layout.AlignLeft, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft},
			Caption: []layout.Run{txt("Bearing: every design combination and drainage condition; the governing case (highest utilisation) is in bold.")}}
		for i, cs := range r.Cases {
			t.Rows = append(t.Rows, caseRow(i, r.Governing, cs.Combination, cs.Drainage.String(), cs.V, cs.H, cs.R, cs.Util, cs.OK, fu.Name))
		}
		o.add(t)
	}
	if ch := findCheck(b, "bearing"); ch != nil {
		o.add(c.checkBlock(o.p, ch, "V_d", "R_d"))
	}
	o.rest(tr, "summary", func(ca trace.Caution) bool { return ca.Step < 0 && !isSliding(ca) })

	// Working common to every case.
	if idx := steps[""]; len(idx) > 0 {
		o.head("Values common to every case")
		o.steps(tr, idx, "common values")
	}

	// The governing case in full, the others compactly.
	var bear []string
	for _, cs := range r.Cases {
		bear = append(bear, cs.Name)
	}
	if r.Governing >= 0 {
		cs := r.Cases[r.Governing]
		o.head(fmt.Sprintf("Governing case %d: %s", r.Governing+1, cs.Name))
		o.steps(tr, steps[cs.Name], fmt.Sprintf("case %d (governing)", r.Governing+1))
		if cs.TwoLayer != nil {
			o.para(twoLayerWords(cs.TwoLayer)...)
		}
	}
	o.compactCases("Other bearing cases", tr, bear, r.Governing, steps, "", func(i int) string { return r.Cases[i].Drainage.String() },
		func(i int) float64 { return r.Cases[i].Util }, "V_d", "H_d", "R_d")

	// Sliding.
	if len(r.Sliding) > 0 {
		o.head(fmt.Sprintf("Sliding resistance of %s", b.Of.Name))
		t := &layout.Table{Pos: o.p, Compact: true, Header: []layout.Cell{{txt("Case")}, {txt("Combination")}, {txt("Drainage")},
			unitHeader("H_d", fu.Name), unitHeader("V_d", fu.Name), unitHeader("R_h_d", fu.Name), {txt("Utilisation")}, {txt("Verdict")}},
			Align:   []layout.Align{layout.AlignRight, layout.AlignLeft, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft},
			Caption: richText("Sliding (EN 1997-1 6.5.3): every design combination; V_d is V′_d in drained cases; the governing case is in bold.", layout.Regular)}
		for i, sc := range r.Sliding {
			row := caseRow(i, r.GoverningSliding, sc.Combination, sc.Drainage.String(), sc.H, sc.V, sc.R, sc.Util, sc.OK, fu.Name)
			row.Cells[0] = layout.Cell{txt(fmt.Sprintf("S%d", i+1))}
			if i == r.GoverningSliding {
				row.Cells[0] = layout.Cell{bold(fmt.Sprintf("S%d", i+1))}
			}
			t.Rows = append(t.Rows, row)
		}
		o.add(t)
		if ch := findCheck(b, "sliding"); ch != nil {
			o.add(c.checkBlock(o.p, ch, "H_d", "R_h_d"))
		}
		o.rest(tr, "sliding summary", func(ca trace.Caution) bool { return ca.Step < 0 && isSliding(ca) })
		var slide []string
		for _, sc := range r.Sliding {
			slide = append(slide, sc.Name)
		}
		if g := r.GoverningSliding; g >= 0 {
			o.head(fmt.Sprintf("Governing sliding case S%d: %s", g+1, r.Sliding[g].Name))
			if r.Governing >= 0 { // the load and geometry by the governing bearing case's formulas
				o.asCase = map[string]bool{}
				for _, i := range steps[r.Cases[r.Governing].Name] {
					if st := tr.Steps[i]; st.Formula != nil {
						o.asCase[st.Symbol] = true
					}
				}
			}
			o.steps(tr, steps[slide[g]], fmt.Sprintf("sliding case S%d (governing)", g+1))
			o.asCase = nil
		}
		o.compactCases("Other sliding cases", tr, slide, r.GoverningSliding, steps, "S", func(i int) string { return r.Sliding[i].Drainage.String() },
			func(i int) float64 { return r.Sliding[i].Util }, "H_d", "R_h_d")
	}

	// Any case the engine traced that is neither (none expected).
	known := map[string]bool{"": true}
	for _, n := range bear {
		known[n] = true
	}
	for _, sc := range r.Sliding {
		known[sc.Name] = true
	}
	for _, n := range names {
		if !known[n] {
			o.head(n)
			o.steps(tr, steps[n], n)
		}
	}
	o.rest(tr, "bearing", nil)
	c.sources(b)
	return o.done()
}

// nearShare is how close to the governing utilisation a case must be to
// be tabulated beside it in the main flow (detail = governing): within
// 10 %.
const nearShare = 0.9

// isSliding reports whether a caution concerns sliding.
func isSliding(ca trace.Caution) bool {
	return strings.Contains(ca.Case, "sliding") || strings.HasPrefix(ca.Message, "Sliding")
}

// caseRow is one row of a case summary; the governing row is in bold.
func caseRow(i, gov int, comb, drainage string, a, b, r, util float64, ok bool, unit string) layout.Row {
	verdict := verdictOf(ok)
	mark := func(s string) layout.Run {
		if i == gov {
			return bold(s)
		}
		return txt(s)
	}
	no := mark(fmt.Sprint(i + 1))
	u, err := units.Parse(unit)
	if err != nil {
		u = units.Dimensionless
	}
	as, rs := units.Apart(a, r, u, -1, -1) // the demand and its resistance, never rounded onto each other
	as, rs = units.Minus(as), units.Minus(rs)
	cells := []layout.Cell{{no}, {txt(comb)}, {txt(drainage)}, {txt(as)}, {txt(num(b, unit))}, {txt(rs)},
		{mark(units.Utilisation(util))}, {verdict}}
	if i == gov {
		cells[1] = layout.Cell{bold(comb)}
		if ok {
			cells[7] = layout.Cell{bold("OK")}
		}
	}
	return layout.Row{Cells: cells}
}

// compactCases prints the cases other than the governing one as tables,
// one row per symbol and one column per case, grouped by drainage, so
// every value of every case is on the page; the formulas are those of
// the governing case's working. Cautions raised in these cases follow
// the table. With detail = governing only the cases within 10 % of the
// governing utilisation stay in the main flow; the others go to the
// appendix.
//
// With detail = governing the values the case summary on the sheet
// gives (summarised: the demand and the resistance) are not tabulated
// again.
func (o *engineOut) compactCases(title string, tr *trace.Trace, cases []string, gov int, steps map[string][]int, prefix string, drainage func(int) string, util func(int) float64, summarised ...string) {
	if !o.c.governingOnly() {
		summarised = nil // detail = full prints every value in place
	}
	o.inSummary = map[string]bool{}
	for _, sym := range summarised {
		o.inSummary[sym] = true
	}
	defer func() { o.inSummary = nil }()
	var inSummary []layout.Run
	for i, sym := range summarised {
		sep := ", "
		switch i {
		case 0:
			sep = " "
		case len(summarised) - 1:
			sep = " and "
		}
		inSummary = append(inSummary, txt(sep), layout.Run{Math: eqn.Sym{Name: sym}, Own: true})
	}
	if len(inSummary) > 0 {
		inSummary = append(inSummary, txt(" of each case are in the case summary."))
	}
	var near, far []int
	for i := range cases {
		switch {
		case i == gov:
		case gov < 0 || !o.c.governingOnly() || util(i) >= nearShare*util(gov):
			near = append(near, i)
		default:
			far = append(far, i)
		}
	}
	if len(near)+len(far) == 0 {
		return
	}
	o.head(title)
	if len(near) > 0 {
		what := "By the governing case's formulas, a column per case as numbered above, values in the order computed; values common to every case are in this caption."
		if o.c.governingOnly() {
			what = "Cases within 10 % of the governing utilisation, by its formulas, a column per case as numbered above, values in the order computed; values common to every case are in this caption."
		}
		o.blocks = o.caseTables(o.blocks, tr, cases, near, steps, prefix, drainage, append([]layout.Run{txt(what)}, inSummary...))
	}
	if len(far) > 0 {
		what := fmt.Sprintf("Cases %s (below 90 %% of the governing utilisation) are tabulated in the", caseList(prefix, far))
		if len(far) == 1 {
			what = fmt.Sprintf("Case %s (below 90 %% of the governing utilisation) is tabulated in the", caseList(prefix, far))
		}
		o.toAppendix(what)
		o.apx = o.caseTables(o.apx, tr, cases, far, steps, prefix, drainage, append([]layout.Run{txt(title + ": " + caseList(prefix, far) + ", numbered as in the summary on the sheet; formulas as for the governing case there.")}, inSummary...))
	}
}

// caseTables adds the compact tables of the cases idx to out, one per
// drainage condition (split at maxCaseCols), each followed by the
// cautions raised in its cases.
func (o *engineOut) caseTables(out []layout.Block, tr *trace.Trace, cases []string, idx []int, steps map[string][]int, prefix string, drainage func(int) string, lead []layout.Run) []layout.Block {
	var order []string
	byDrain := map[string][]int{}
	for _, i := range idx {
		d := drainage(i)
		if _, ok := byDrain[d]; !ok {
			order = append(order, d)
		}
		byDrain[d] = append(byDrain[d], i)
	}
	keep := o.blocks
	for _, d := range order {
		idx := byDrain[d]
		for start := 0; start < len(idx); start += maxCaseCols {
			chunk := idx[start:min(start+maxCaseCols, len(idx))]
			cap := []layout.Run{txt(fmt.Sprintf("%s cases (%s).", capital(d), caseList(prefix, chunk)))}
			if len(lead) > 0 {
				cap = append(append(lead, txt(" ")), cap...)
				lead = nil
			}
			out = append(out, o.caseTable(tr, cases, chunk, steps, prefix, cap))
		}
		o.blocks = nil
		for _, i := range idx {
			for j, ca := range tr.Cautions {
				if ca.Step >= 0 && ca.Case == cases[i] {
					o.cautionOf(tr, j, fmt.Sprintf("case %s%d", prefix, i+1))
				}
			}
		}
		out = append(out, o.blocks...)
		o.blocks = keep
	}
	return out
}

// caseTable is one compact table: symbols down, cases across.
func (o *engineOut) caseTable(tr *trace.Trace, cases []string, idx []int, steps map[string][]int, prefix string, caption []layout.Run) *layout.Table {
	type rowKey struct {
		sym string
		n   int
	}
	var keys []rowKey
	units := map[rowKey]string{}
	vals := map[rowKey]map[int]float64{}
	for _, i := range idx {
		seen := map[string]int{}
		at := 0 // where a symbol new to the table goes: after the last one of this case
		for _, si := range steps[cases[i]] {
			st := tr.Steps[si]
			k := rowKey{st.Symbol, seen[st.Symbol]}
			seen[st.Symbol]++
			if vals[k] == nil {
				vals[k] = map[int]float64{}
				keys = append(keys[:at], append([]rowKey{k}, keys[at:]...)...)
				units[k] = st.Unit
			}
			for p, q := range keys {
				if q == k {
					at = p + 1
					break
				}
			}
			vals[k][i] = st.Value
		}
	}
	t := &layout.Table{Pos: o.p, Compact: true, Header: []layout.Cell{{txt("Symbol")}, {txt("Unit")}},
		Align:   []layout.Align{layout.AlignLeft, layout.AlignLeft},
		Caption: caption}
	for _, i := range idx {
		t.Header = append(t.Header, layout.Cell{txt(fmt.Sprintf("%s%d", prefix, i+1))})
		t.Align = append(t.Align, layout.AlignRight)
	}
	var same []layout.Run
	for _, k := range keys {
		if k.n == 0 && o.inSummary[k.sym] {
			continue // in the case summary on the sheet
		}
		if v, ok := constantRow(vals[k], idx); ok {
			if len(same) > 0 {
				same = append(same, txt(", "))
			}
			same = append(same, layout.Run{Math: eqn.Row{eqn.Sym{Name: k.sym}, eqn.Op{Text: "="}, siNode(v, units[k])}, Own: true})
			continue
		}
		row := layout.Row{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: k.sym}}}, {txt(unitText(units[k]))}}}
		for _, i := range idx {
			v, ok := vals[k][i]
			if !ok {
				row.Cells = append(row.Cells, layout.Cell{txt("—")})
				continue
			}
			row.Cells = append(row.Cells, layout.Cell{txt(num(v, units[k]))})
		}
		t.Rows = append(t.Rows, row)
	}
	o.c.foldToWidth(t, 2+len(idx))
	if len(same) > 0 {
		t.Caption = append(t.Caption, txt(" The same in every case of this table: "))
		t.Caption = append(t.Caption, same...)
		t.Caption = append(t.Caption, txt("."))
	}
	return t
}

// foldToWidth sets a narrow table of w columns and many rows in as
// many side-by-side bands as the text column holds with the header
// cells broken at their spaces and no value broken (at most four; read
// down the first band, then the next), so a table of a few cases does
// not run down several pages.
func (c *composer) foldToWidth(t *layout.Table, w int) {
	if len(t.Rows) < 8 {
		return
	}
	nat := layout.BandWidth(t)
	if nat <= 0 {
		return
	}
	foldBands(t, w, min(4, int((c.width+2)/nat), len(t.Rows)/4))
}

// foldBands sets a table of w columns in the given number of bands.
func foldBands(t *layout.Table, w, bands int) {
	if bands < 2 || len(t.Rows) < 2*bands {
		return
	}
	n := (len(t.Rows) + bands - 1) / bands
	rows := make([]layout.Row, n)
	head, align := t.Header, t.Align
	for b := 0; b < bands; b++ {
		if b > 0 {
			t.Header = append(t.Header, head...)
			t.Align = append(t.Align, align...)
		}
		for r := 0; r < n; r++ {
			k := b*n + r
			if k < len(t.Rows) {
				rows[r].Pos = t.Rows[k].Pos
				rows[r].Cells = append(rows[r].Cells, t.Rows[k].Cells...)
			} else {
				rows[r].Cells = append(rows[r].Cells, make([]layout.Cell, w)...)
			}
		}
	}
	t.Rows = rows
}

// constantRow reports whether a row of a compact table has one value in
// every one of at least two cases.
func constantRow(vals map[int]float64, idx []int) (float64, bool) {
	if len(idx) < 2 {
		return 0, false
	}
	v, ok := vals[idx[0]]
	if !ok {
		return 0, false
	}
	for _, i := range idx[1:] {
		if w, ok := vals[i]; !ok || w != v {
			return 0, false
		}
	}
	return v, true
}

func caseList(prefix string, idx []int) string {
	var s []string
	for _, i := range idx {
		s = append(s, fmt.Sprintf("%s%d", prefix, i+1))
	}
	return strings.Join(s, ", ")
}

// twoLayerWords describes the stronger-over-weaker check of a case.
func twoLayerWords(tl *bearing.TwoLayer) []layout.Run {
	kpa := units.MustParse("kPa")
	p := func(v float64) string { return valueText(units.Quantity{V: v, Dim: units.Pressure}, kpa, -1) }
	s := fmt.Sprintf("Two-layer check (Meyerhof & Hanna 1978): upper layer %s thick below the base; q_t = %s (upper layer alone), q_b = %s (lower layer), punching q_u = %s",
		valueText(units.Quantity{V: tl.H, Dim: units.Length}, units.MustParse("m"), -1), p(tl.QT), p(tl.QB), p(tl.QU))
	if tl.Governs {
		s += "; punching governs."
	} else {
		s += "; the upper layer's own resistance governs."
	}
	verdict := "OK"
	if !tl.SpreadOK {
		verdict = "NOT OK"
	}
	qs, qr := units.Apart(tl.SpreadQEd, tl.SpreadQRd, kpa, -1, -1)
	s += fmt.Sprintf(" Load spread to the lower layer: %s kPa against %s kPa (utilisation %s, %s).", qs, qr, units.Utilisation(tl.SpreadUtil), verdict)
	return richText(s, layout.Regular)
}
