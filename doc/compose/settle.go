package compose

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// settlement prints a settlement block: the serviceability load, the
// engine's working group by group (representative sublayers in full), the
// stress table by sublayer, the settlement by layer, the time curve with
// t_50 and t_90, the charts, and the limit check.
func (c *composer) settlement(s *eval.Sheet, b *eval.Block) []layout.Block {
	st := b.Settle
	r := st.Result
	o := c.engineOut(s, b)
	o.head(fmt.Sprintf("Settlement of %s on %s", b.Of.Name, b.On.Name))
	method := r.Method.String()
	// the engine's note of why it chose the method, said here
	if m, ok := o.listed(&r.Trace, "auto-method", "method"); ok {
		if _, why, cut := strings.Cut(m, "("); cut {
			method += ", chosen from the layers' data (" + why
		}
	}
	intro := fmt.Sprintf("Method: %s. Stress increase: %s, at the %s of the footing. Load: %s. Limit: %s.",
		method, r.Stress, r.Point, st.Service.Name, valueText(units.Quantity{V: r.Limit, Dim: units.Length}, mm, -1))
	// the options the sentence above already states in full are not
	// listed again
	if opts := optionsBut(b.Options, "method", "load", "limit", "stress", "at"); len(opts) > 0 {
		intro += " Options: " + strings.Join(opts, ", ") + "."
	}
	o.para(richText(intro, layout.Regular)...)
	o.selfWeight()

	if len(st.Load.Steps) > 0 {
		o.label("Serviceability load")
		o.steps(&st.Load, indices(len(st.Load.Steps)), "serviceability load")
	}
	o.rest(&st.Load, "serviceability load", func(ca trace.Caution) bool { return ca.Step < 0 })
	tr := &r.Trace
	o.rest(tr, "settlement", func(ca trace.Caution) bool { return ca.Step < 0 })
	names, steps := groups(tr)
	shownTime := false
	kinds := map[string]bool{} // kinds of layer working printed in full
	for gi, n := range names {
		if strings.HasPrefix(n, "t = ") {
			if shownTime {
				continue
			}
			shownTime = true
			at := strings.TrimPrefix(n, "t = ")
			if len(r.Curve) > 0 { // the first time's group comes first: printed as the time table prints it
				at = f(r.Curve[0].T, yr) + " yr"
			}
			o.label("Time " + at + " (the other times are in the time table below)")
			o.steps(tr, steps[n], n)
			continue
		}
		if kind := groupKind(n); kind != "" && o.c.governingOnly() {
			if kinds[kind] {
				continue // tabulated with the first of its kind
			}
			kinds[kind] = true
			if all := sameKind(names[gi:], kind); len(all) > 1 {
				full := all[0] // the one with the most steps, so every formula is shown
				for _, g := range all {
					if len(steps[g]) > len(steps[full]) {
						full = g
					}
				}
				o.label(capital(full))
				o.steps(tr, steps[full], full)
				o.layerCases(tr, all, steps, kind)
				continue
			}
		}
		o.label(capital(n))
		o.steps(tr, steps[n], orDefault(n, "settlement"))
	}
	o.rest(&st.Load, "serviceability load", nil)
	o.rest(tr, "settlement", nil) // cautions of the times not printed in full

	if o.c.governingOnly() && len(r.Sub) > 0 {
		o.toAppendix(fmt.Sprintf("The stresses in each of the %d sublayers are tabulated in the", len(r.Sub)))
		o.apx = append(o.apx, c.stressTable(o, r))
	} else {
		o.add(c.stressTable(o, r))
	}
	o.add(c.layerTable(o, r))
	if tt := c.timeTable(o, r); tt != nil {
		o.add(tt)
	}
	o.add(c.settleCharts(o, r)...)
	if ch := findCheck(b, "settlement"); ch != nil {
		o.add(c.checkBlock(o.p, ch, "s_total", "s_lim"))
	}
	c.tilt(o, st)
	c.within(o, st)
	c.sources(b)
	return o.done()
}

var (
	mm  = units.MustParse("mm")
	kPa = units.MustParse("kPa")
	mU  = units.MustParse("m")
	yr  = units.MustParse("yr")
)

// deltaHeader is the Δσ column header (Δ upright before σ).
func deltaHeader(unit string) layout.Cell {
	return layout.Cell{{Math: eqn.Row{eqn.Text{Text: "Δ"}, eqn.Sym{Name: "sigma"}}}, txt("\n" + unitText(unit))}
}

// niceCeil rounds v up to 1, 2 or 5 × 10ⁿ.
func niceCeil(v float64) float64 {
	if v <= 0 {
		return 1
	}
	p := math.Pow(10, math.Floor(math.Log10(v)))
	for _, m := range []float64{1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10} {
		if m*p >= v {
			return m * p
		}
	}
	return 10 * p
}

func indices(n int) []int {
	out := make([]int, n)
	for i := range out {
		out[i] = i
	}
	return out
}

func capital(s string) string {
	if s == "" {
		return "Settlement"
	}
	return strings.ToUpper(s[:1]) + s[1:]
}

func f(v float64, u units.Unit) string {
	return units.Printed(v, u, -1)
}

// stressTable lists every sublayer: depth, stresses, how it settles.
// The sublayers of one layer are consecutive; the caption names each
// layer's range of sublayers, with its thickness h and form when they
// are the same for all its sublayers (their columns are left out when
// that holds for every layer). Long tables fold into side-by-side bands.
func (c *composer) stressTable(o *engineOut, r *settle.Result) *layout.Table {
	type run struct{ from, to int }
	var runs []run
	for i, sl := range r.Sub {
		if n := len(runs); n > 0 && r.Sub[runs[n-1].from].Layer == sl.Layer {
			runs[n-1].to = i
		} else {
			runs = append(runs, run{i, i})
		}
	}
	sameH, sameForm := true, true
	for _, rn := range runs {
		for i := rn.from; i <= rn.to; i++ {
			sameH = sameH && f(r.Sub[i].H, mU) == f(r.Sub[rn.from].H, mU) // as printed
			sameForm = sameForm && r.Sub[i].Case == r.Sub[rn.from].Case
		}
	}
	capt := []layout.Run{txt(fmt.Sprintf("Stresses by sublayer: z is the mid-depth below ground level (midpoint rule); Δσ at the %s of the footing; form is how the sublayer settles. ", r.Point))}
	for k, rn := range runs {
		sl := r.Sub[rn.from]
		if k > 0 {
			capt = append(capt, txt("; "))
		}
		span := fmt.Sprintf("%d", rn.from+1)
		if rn.to > rn.from {
			span += fmt.Sprintf("–%d", rn.to+1)
		}
		capt = append(capt, txt(span+" "), user(sl.Name))
		var extra []layout.Run
		if sameH {
			extra = append(extra, layout.Run{Math: eqn.Row{eqn.Sym{Name: "h"}, eqn.Op{Text: "="}, siNode(sl.H, "m")}, Own: true})
		}
		if sameForm {
			if len(extra) > 0 {
				extra = append(extra, txt(", "))
			}
			extra = append(extra, txt("form "))
			extra = append(extra, richText(orDefault(sl.Case, "—"), layout.Regular)...)
		}
		if len(extra) > 0 {
			capt = append(capt, txt(" ("))
			capt = append(capt, extra...)
			capt = append(capt, txt(")"))
		}
	}
	capt = append(capt, txt("."))
	t := &layout.Table{Pos: o.p, Compact: true, Caption: capt,
		Header: []layout.Cell{{txt("No.")}, unitHeader("z", "m")}, Align: []layout.Align{layout.AlignRight, layout.AlignRight}}
	col := func(h layout.Cell, a layout.Align) {
		t.Header = append(t.Header, h)
		t.Align = append(t.Align, a)
	}
	if !sameH {
		col(unitHeader("h", "m"), layout.AlignRight)
	}
	col(unitHeader("sigma'_v0", "kPa"), layout.AlignRight)
	col(deltaHeader("kPa"), layout.AlignRight)
	col(unitHeader("sigma'_f", "kPa"), layout.AlignRight)
	if !sameForm {
		col(layout.Cell{txt("Form")}, layout.AlignLeft)
	}
	col(unitHeader("s_i", "mm"), layout.AlignRight)
	col(unitHeader("s_c", "mm"), layout.AlignRight)
	for i, sl := range r.Sub {
		cells := []layout.Cell{{txt(fmt.Sprint(i + 1))}, {txt(f(sl.Z, mU))}}
		if !sameH {
			cells = append(cells, layout.Cell{txt(f(sl.H, mU))})
		}
		cells = append(cells, layout.Cell{txt(f(sl.SigmaV0Eff, kPa))}, layout.Cell{txt(f(sl.DSigma, kPa))}, layout.Cell{txt(f(sl.SigmaF, kPa))})
		if !sameForm {
			cells = append(cells, richText(orDefault(sl.Case, "—"), layout.Regular))
		}
		cells = append(cells, layout.Cell{txt(f(sl.Si, mm))}, layout.Cell{txt(f(sl.Sc, mm))})
		t.Rows = append(t.Rows, layout.Row{Pos: o.p, Cells: cells})
	}
	c.foldToWidth(t, len(t.Header))
	return t
}

// layerTable gives the settlement of each layer and the total.
func (c *composer) layerTable(o *engineOut, r *settle.Result) *layout.Table {
	t := &layout.Table{Pos: o.p, Compact: true,
		Header: []layout.Cell{{txt("Layer")}, {txt("Within the zone"), txt("\n(m)")}, {txt("Sublayers")}, unitHeader("s_i", "mm"),
			unitHeader("s_oed", "mm"), unitHeader("mu", ""), unitHeader("s_c", "mm"), unitHeader("s_sec", "mm"), unitHeader("t_50", "yr"), unitHeader("t_90", "yr")},
		Align:   []layout.Align{layout.AlignLeft, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight},
		Caption: richText("Settlement by layer: immediate s_i, one-dimensional s_oed, consolidation s_c = μ s_oed, secondary s_sec; times to 50 % and 90 % consolidation.", layout.Regular)}
	opt := func(set bool, v float64, u units.Unit) string {
		if !set {
			return "—"
		}
		return f(v, u)
	}
	for _, l := range r.Layers {
		how := l.Immediate
		if l.Consol != "" {
			how = strings.TrimSpace(how + " " + l.Consol)
		}
		name := layout.Cell{user(l.Name)}
		if how != "" {
			name = append(name, richText(" ("+how+")", layout.Regular)...)
		}
		t.Rows = append(t.Rows, layout.Row{Pos: o.p, Cells: []layout.Cell{
			name, {txt(f(l.Top, mU) + "–" + f(l.Bot, mU))}, {txt(fmt.Sprint(l.Sublayers))}, {txt(f(l.Si, mm))},
			{txt(f(l.SOed, mm))}, {txt(f(l.Mu, units.Dimensionless))}, {txt(f(l.Sc, mm))}, {txt(f(l.Ssec, mm))},
			{txt(opt(l.T50.Set, l.T50.V, yr))}, {txt(opt(l.T90.Set, l.T90.V, yr))},
		}})
	}
	t.Rows = append(t.Rows, layout.Row{Pos: o.p, Cells: []layout.Cell{
		{bold("Total")}, nil, nil, {bold(f(r.Si, mm))}, nil, nil, {bold(f(r.Sc, mm))}, {bold(f(r.Ssec, mm))},
		{txt(opt(r.T50.Set, r.T50.V, yr))}, {txt(opt(r.T90.Set, r.T90.V, yr))},
	}})
	return t
}

// timeTable is the settlement–time curve as a table.
func (c *composer) timeTable(o *engineOut, r *settle.Result) *layout.Table {
	if len(r.Curve) == 0 {
		return nil
	}
	t := &layout.Table{Pos: o.p, Compact: true,
		Header:  []layout.Cell{unitHeader("t", "yr"), unitHeader("U", ""), unitHeader("s_i", "mm"), unitHeader("s_c", "mm"), unitHeader("s_sec", "mm"), unitHeader("s", "mm")},
		Align:   []layout.Align{layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight},
		Caption: richText(fmt.Sprintf("Settlement with time after loading: U is the average degree of consolidation; total s = s_i + s_c + s_sec (final %s).", valueText(units.Quantity{V: r.Total, Dim: units.Length}, mm, -1)), layout.Regular)}
	if len(r.Curve) <= maxTimeCols {
		// a row per quantity, a column per time: a few lines across the page
		t.Header = []layout.Cell{{{Math: eqn.Sym{Name: "t"}}}, {txt("yr")}}
		t.Align = []layout.Align{layout.AlignLeft, layout.AlignLeft}
		rows := []layout.Row{
			{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: "U"}}}, nil}},
			{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: "s_i"}}}, {txt("mm")}}},
			{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: "s_c"}}}, {txt("mm")}}},
			{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: "s_sec"}}}, {txt("mm")}}},
			{Pos: o.p, Cells: []layout.Cell{{{Math: eqn.Sym{Name: "s"}}}, {txt("mm")}}},
		}
		for _, p := range r.Curve {
			t.Header = append(t.Header, layout.Cell{txt(f(p.T, yr))})
			t.Align = append(t.Align, layout.AlignRight)
			for i, v := range []string{fmt.Sprintf("%.3f", p.U), f(p.Si, mm), f(p.Sc, mm), f(p.Ssec, mm)} {
				rows[i].Cells = append(rows[i].Cells, layout.Cell{txt(v)})
			}
			rows[4].Cells = append(rows[4].Cells, layout.Cell{bold(f(p.S, mm))})
		}
		t.Rows = rows
		return t
	}
	for _, p := range r.Curve {
		t.Rows = append(t.Rows, layout.Row{Pos: o.p, Cells: []layout.Cell{
			{txt(f(p.T, yr))}, {txt(units.Printed(p.U, units.Dimensionless, 3))}, {txt(f(p.Si, mm))}, {txt(f(p.Sc, mm))}, {txt(f(p.Ssec, mm))}, {bold(f(p.S, mm))},
		}})
	}
	return t
}

// maxTimeCols is the most times the time table sets across the page (a
// column each); more are set down it.
const maxTimeCols = 12

// settleCharts draws the stress–depth chart and, when there is a time
// curve, the settlement–time chart.
func (c *composer) settleCharts(o *engineOut, r *settle.Result) []layout.Block {
	var out []*layout.Drawing
	w := math.Min(c.width, 400)
	if len(r.Sub) > 1 && len(r.Curve) > 1 {
		w = (c.width - chartGap) / 2 // the two side by side
	}
	if len(r.Sub) > 1 {
		var z, s0, ds, sf []float64
		for _, sl := range r.Sub {
			z = append(z, sl.Z)
			s0 = append(s0, sl.SigmaV0Eff/1e3)
			ds = append(ds, sl.DSigma/1e3)
			sf = append(sf, sl.SigmaF/1e3)
		}
		ch := chart.Chart{W: w, H: settleChartH,
			X: chart.Axis{Title: "vertical stress (kPa)"}, Y: chart.Axis{Title: "depth below ground level (m)", Reverse: true},
			Series: []chart.Series{{Name: "effective stress before loading", X: s0, Y: z}, {Name: "stress increase from the footing", X: ds, Y: z, Dash: []float64{4, 2}}, {Name: "effective stress after loading", X: sf, Y: z}},
			Guides: []chart.Guide{{Value: r.ZInf, OnY: true, Label: "zone of influence " + f(r.ZInf, mU) + " m"}}}
		if d, err := ch.Drawing(o.p, []layout.Run{txt("Vertical stresses with depth below the footing.")}); err == nil {
			out = append(out, d)
		} else {
			c.diags.Add(o.b.Span, "stress chart: %v", err)
		}
	}
	if len(r.Curve) > 1 {
		var t, s []float64
		for _, p := range r.Curve {
			if p.T <= 0 {
				continue
			}
			t = append(t, p.T/yr.Factor)
			s = append(s, p.S*1e3)
		}
		top := r.Limit * 1e3
		for _, v := range s {
			top = math.Max(top, v)
		}
		ch := chart.Chart{W: w, H: settleChartH,
			X: chart.Axis{Title: "time after loading (yr)", Log: true}, Y: chart.Axis{Title: "settlement (mm)", Reverse: true, Min: chart.At(0), Max: chart.At(niceCeil(1.15 * top))},
			Series: []chart.Series{{Name: "total settlement", X: t, Y: s}},
			Guides: []chart.Guide{{Value: r.Limit * 1e3, OnY: true, Label: "limit " + f(r.Limit, mm) + " mm"}}}
		if r.T90.Set {
			ch.Guides = append(ch.Guides, chart.Guide{Value: r.T90.V / yr.Factor, Label: "90 % at " + f(r.T90.V, yr) + " yr"})
		}
		if d, err := ch.Drawing(o.p, []layout.Run{txt("Settlement against time after loading.")}); err == nil {
			out = append(out, d)
		} else {
			c.diags.Add(o.b.Span, "settlement–time chart: %v", err)
		}
	}
	if len(out) == 2 {
		return []layout.Block{beside(out[0], out[1], "Left: ", " Right: ")}
	}
	var bs []layout.Block
	for _, d := range out {
		bs = append(bs, d)
	}
	return bs
}

// chartGap is the space between two charts set side by side.
const chartGap = 16.0

// beside sets two drawings side by side, a's caption then b's, each
// after its word (Left: …, Right: …).
func beside(a, b *layout.Drawing, left, right string) *layout.Drawing {
	d := &layout.Drawing{Pos: a.Pos, W: a.W + chartGap + b.W, H: math.Max(a.H, b.H)}
	d.Items = append(d.Items, a.Items...)
	for _, it := range b.Items {
		d.Items = append(d.Items, draw.Offset(it, a.W+chartGap, 0))
	}
	d.Caption = append(append(d.Caption, txt(left)), a.Caption...)
	d.Caption = append(append(d.Caption, txt(right)), b.Caption...)
	return d
}

// groupKind is the kind of a settlement working group named
// "LAYER: KIND" ("immediate (Steinbrenner)"); "" for other groups.
func groupKind(name string) string {
	i := strings.LastIndex(name, ": ")
	if i < 0 || strings.Contains(name, "sublayer") {
		return ""
	}
	return name[i+2:]
}

// sameKind lists the groups of names of the given kind.
func sameKind(names []string, kind string) []string {
	var out []string
	for _, n := range names {
		if groupKind(n) == kind {
			out = append(out, n)
		}
	}
	return out
}

// layerCases tabulates the working of every layer of one kind, a column
// per layer, by the formulas printed for the first of them just above
// (detail = governing): the repeated expansions are not written out
// again, and every value is in the table.
func (o *engineOut) layerCases(tr *trace.Trace, groups []string, steps map[string][]int, kind string) {
	idx := indices(len(groups))
	cap := append([]layout.Run{txt(fmt.Sprintf("%s of every layer, by the formulas above, a column per layer (", capital(kind)))}, layerList(groups)...)
	cap = append(cap, txt(")."))
	t := o.caseTable(tr, groups, idx, steps, "L", nil)
	t.Caption = append(cap, t.Caption...) // then the values the same in every layer
	o.add(t)
	for _, g := range groups {
		for j, ca := range tr.Cautions {
			if ca.Case == g {
				o.cautionOf(tr, j, g)
			}
		}
	}
}

// layerList names the columns of a layer table: "L1: Made ground, L2: …".
func layerList(groups []string) []layout.Run {
	var out []layout.Run
	for i, g := range groups {
		if i > 0 {
			out = append(out, txt("; "))
		}
		name := g
		if j := strings.LastIndex(g, ": "); j >= 0 {
			name = g[:j]
		}
		out = append(out, txt(fmt.Sprintf("L%d ", i+1)), user(name))
	}
	return out
}

// settleChartH is the height in points of the stress and time charts
// set side by side under a settlement block.
const settleChartH = 165

// optionsBut is opts ("name = value", as eval prints them) without the
// options named.
func optionsBut(opts []string, names ...string) []string {
	var out []string
	for _, o := range opts {
		name, _, _ := strings.Cut(o, " =")
		if !slices.Contains(names, name) {
			out = append(out, o)
		}
	}
	return out
}
