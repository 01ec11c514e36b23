package compose

import (
	"fmt"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/notation"
)

// varyBlocks prints a block's sensitivity. One input: the governing
// utilisation (a capacity table's allowable pressure) at each of its
// values, where the verdict flips, and a chart beside the table. Several,
// each varied on its own: a summary row per input, the input whose
// utilisation spreads widest first (the checker's view of which doubt
// matters most), then each input's table and chart.
func (c *composer) varyBlocks(b *eval.Block) []layout.Block {
	sens := b.Vary
	p := b.Span
	capacity := b.Capacity != nil
	what := "the block's governing utilisation"
	if capacity {
		what = "the allowable pressure at the footing's own width"
	}
	head := []layout.Run{txt("Sensitivity of " + b.Name)}
	if len(sens.Inputs) == 1 {
		head = append(head, txt(" to "), sym(sens.Inputs[0].Symbol))
	}
	out := []layout.Block{&layout.Heading{Pos: p, Level: min(c.level+1, 3), NoNumber: true, Runs: head}}
	if len(sens.Inputs) == 1 {
		v := sens.Inputs[0]
		intro := fmt.Sprintf("The package evaluated again for each value of %s (its value here %s), the rest unchanged (as --set would), and %s read off each run.", v.Symbol, varyVal(v, v.Base), what)
		if !capacity {
			intro += " " + flipText(v)
		}
		out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(intro)}})
		return append(out, c.varyInput(b, v)...)
	}
	intro := fmt.Sprintf("The package evaluated again for each value of each input below, one input at a time with the others at their values here (as --set would), and %s read off each run.", what)
	out = append(out, &layout.Para{Pos: p, Runs: []layout.Run{txt(intro)}}, c.varySummary(b))
	if d := c.varyTornado(b); d != nil {
		out = append(out, d)
	}
	for _, v := range sens.Inputs {
		out = append(out, c.varyInput(b, v)...)
	}
	return out
}

// sym is a symbol in the sheet notation, as plinth's own text.
func sym(name string) layout.Run { return layout.Run{Math: eqn.Sym{Name: name}, Own: true} }

// varyVal prints a value of the input v varies in its unit.
func varyVal(v *eval.VaryResult, x float64) string {
	return valueText(units.Quantity{V: x, Dim: v.Unit.Dim}, v.Unit, -1)
}

// flipText says where the verdict flips over v's values, or that it does
// not.
func flipText(v *eval.VaryResult) string {
	if len(v.Crossings) == 0 {
		if v.List {
			return "The verdict is the same at every value listed."
		}
		return "The verdict is the same over the whole range."
	}
	var parts []string
	for _, x := range v.Crossings {
		dir := "NOT OK below, OK above"
		if x.Rising {
			dir = "OK below, NOT OK above"
		}
		parts = append(parts, fmt.Sprintf("%s (%s)", varyVal(v, x.P), dir))
	}
	return "The verdict flips at " + strings.Join(parts, "; ") + "."
}

// varySummary is the row-per-input table of a block that varies several:
// the values, the result at the least and the greatest, and the flips,
// in the order of eval.Sensitivity.Ranked.
func (c *composer) varySummary(b *eval.Block) *layout.Table {
	capacity := b.Capacity != nil
	kPa := units.MustParse("kPa")
	t := &layout.Table{Pos: b.Span, Header: []layout.Cell{{txt("Input")}, {txt("Value here")}, {txt("Values")}},
		Align: []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignLeft}}
	if capacity {
		t.Header = append(t.Header, layout.Cell{txt("At the least\nkPa")}, layout.Cell{txt("At the greatest\nkPa")})
		t.Caption = []layout.Run{txt("Allowable pressure of " + b.Name + " at the footing's own width at the least and the greatest value of each input, the input whose allowable pressure spreads widest first.")}
	} else {
		t.Header = append(t.Header, layout.Cell{txt("At the least")}, layout.Cell{txt("At the greatest")}, layout.Cell{txt("Verdict flips at")})
		t.Caption = []layout.Run{txt("Governing utilisation of " + b.Name + " at the least and the greatest value of each input, the input whose utilisation spreads widest first.")}
	}
	for _, i := range b.Vary.Ranked {
		v := b.Vary.Inputs[i]
		first, last := v.Rows[0], v.Rows[len(v.Rows)-1]
		var values string
		if v.List {
			var xs []string
			for _, r := range v.Rows {
				xs = append(xs, varyVal(v, r.P))
			}
			values = strings.Join(xs, ", ")
		} else {
			values = fmt.Sprintf("%s to %s, %d values", varyVal(v, first.P), varyVal(v, last.P), len(v.Rows))
		}
		cells := []layout.Cell{{sym(v.Symbol)}, {txt(varyVal(v, v.Base))}, {txt(values)}}
		if capacity {
			cells = append(cells, layout.Cell{txt(units.Printed(first.Util, kPa, -1))}, layout.Cell{txt(units.Printed(last.Util, kPa, -1))})
		} else {
			flips := "none"
			if len(v.Crossings) > 0 {
				var xs []string
				for _, x := range v.Crossings {
					xs = append(xs, varyVal(v, x.P))
				}
				flips = strings.Join(xs, "; ")
			}
			cells = append(cells, layout.Cell{txt(units.Utilisation(first.Util))}, layout.Cell{txt(units.Utilisation(last.Util))}, layout.Cell{txt(flips)})
		}
		t.Rows = append(t.Rows, layout.Row{Pos: v.Span, Cells: cells})
	}
	return t
}

// varyInput is one input's table of values with its chart beside it.
func (c *composer) varyInput(b *eval.Block, v *eval.VaryResult) []layout.Block {
	p := v.Span
	u := v.Unit
	kPa := units.MustParse("kPa")
	capacity := b.Capacity != nil
	// the input's own symbol heads the column and titles the axis (the
	// captions name it in full: pf.soft_clay.c_u)
	short := v.Symbol[strings.LastIndexByte(v.Symbol, '.')+1:]
	head := layout.Cell{sym(short)}
	if u.Name != "" {
		head = append(head, txt("\n"+unitText(u.Name)))
	}
	t := &layout.Table{Pos: p, Header: []layout.Cell{head, {txt("Utilisation")}, {txt("Verdict")}},
		Align: []layout.Align{layout.AlignRight, layout.AlignRight, layout.AlignLeft}}
	title := []layout.Run{txt("Governing utilisation of " + b.Name + " against "), sym(v.Symbol), txt(".")}
	if capacity {
		t.Header = []layout.Cell{head, unitHeader("q_allow", "kPa")}
		title = []layout.Run{txt("Allowable pressure of " + b.Name + " at the footing's own width against "), sym(v.Symbol), txt(".")}
	}
	var xs, ys []float64
	for _, r := range v.Rows {
		cells := []layout.Cell{{txt(units.Printed(r.P, u, -1))}}
		if capacity {
			cells = append(cells, layout.Cell{txt(units.Printed(r.Util, kPa, -1))})
			ys = append(ys, r.Util/kPa.SIFactor())
		} else {
			cells = append(cells, layout.Cell{txt(units.Utilisation(r.Util))}, layout.Cell{verdictOf(!(r.Util > 1))})
			ys = append(ys, r.Util)
		}
		t.Rows = append(t.Rows, layout.Row{Pos: p, Cells: cells})
		xs = append(xs, r.P/u.SIFactor())
	}
	xTitle := plainSym(short)
	if u.Name != "" {
		xTitle += " (" + unitText(u.Name) + ")"
	}
	share := math.Min(0.5, (layout.NaturalWidth(t)+4)/(c.width-chartGap))
	ch := chart.Chart{W: (c.width - chartGap) * (1 - share), H: 170,
		X:      chart.Axis{Title: xTitle, Min: chart.At(xs[0]), Max: chart.At(xs[len(xs)-1])},
		Y:      chart.Axis{Title: "Governing utilisation", Min: chart.At(0)},
		Series: []chart.Series{{Name: "utilisation", X: xs, Y: ys, Emphasis: true}},
		Guides: []chart.Guide{{Value: 1, OnY: true, Label: "utilisation 1"}}}
	if capacity {
		ch.Y.Title = "Allowable pressure (kPa)"
		ch.Series[0].Name = "q_allow"
		ch.Guides = nil
	} else {
		for _, x := range v.Crossings {
			ch.Notes = append(ch.Notes, chart.Annotation{X: x.P / u.SIFactor(), Y: 1, Text: "flips at " + varyVal(v, x.P), Guides: true})
		}
	}
	if v.Base >= v.Rows[0].P && v.Base <= v.Rows[len(v.Rows)-1].P {
		ch.Guides = append(ch.Guides, chart.Guide{Value: v.Base / u.SIFactor(), Label: "value here", Faint: true})
	}
	// the table's caption names the input; the chart's says what it shows
	// and, with several inputs, where the verdict flips: both inside the
	// Beside, which never splits from its input's text
	t.Caption = []layout.Run{txt(b.Name + " against "), sym(v.Symbol)}
	if len(b.Vary.Inputs) > 1 && !capacity {
		title = append(title, txt(" "+flipText(v)))
	}
	d, err := ch.Drawing(p, title)
	if err != nil {
		c.diags.Warn(p, "no sensitivity chart: %v", err)
		t.Caption = title
		return []layout.Block{t}
	}
	return []layout.Block{&layout.Beside{Pos: p, Left: []layout.Block{t}, Right: []layout.Block{d}, Share: share}}
}

// varyTornado draws the summary as a tornado diagram: a bar per input
// over the spread of the block's utilisation (a capacity table's
// allowable pressure) across its values, the widest at the top, with the
// values at the least and the greatest input marked, and utilisation 1.
// Nil (with a warning) when it cannot be drawn.
func (c *composer) varyTornado(b *eval.Block) *layout.Drawing {
	sens := b.Vary
	capacity := b.Capacity != nil
	scale := 1.0
	if capacity {
		scale = units.MustParse("kPa").SIFactor()
	}
	n := len(sens.Ranked)
	shorts := map[string]int{}
	for _, v := range sens.Inputs {
		shorts[v.Symbol[strings.LastIndexByte(v.Symbol, '.')+1:]]++
	}
	least := chart.Series{Name: "at the least value", Style: chart.Markers, Marker: chart.Circle}
	most := chart.Series{Name: "at the greatest value", Style: chart.Markers, Marker: chart.Square}
	var bars []chart.Series
	var ticks []chart.Tick
	for i, k := range sens.Ranked {
		v := sens.Inputs[k]
		y := float64(n - i)
		lo, hi := v.Spread()
		bars = append(bars, chart.Series{X: []float64{lo / scale, hi / scale}, Y: []float64{y, y}, Style: chart.Band})
		least.X, least.Y = append(least.X, v.Rows[0].Util/scale), append(least.Y, y)
		most.X, most.Y = append(most.X, v.Rows[len(v.Rows)-1].Util/scale), append(most.Y, y)
		label := v.Symbol
		if short := v.Symbol[strings.LastIndexByte(v.Symbol, '.')+1:]; shorts[short] == 1 {
			label = plainSym(short)
		}
		ticks = append(ticks, chart.Tick{V: y, Label: label})
	}
	ch := chart.Chart{W: min(c.width, 400), H: 50 + 28*float64(n),
		X:      chart.Axis{Title: "Governing utilisation"},
		Y:      chart.Axis{Min: chart.At(0.4), Max: chart.At(float64(n) + 0.6), Ticks: ticks},
		Series: append(bars, least, most),
		Guides: []chart.Guide{{Value: 1, Label: "utilisation 1"}}}
	caption := "Spread of the governing utilisation of " + b.Name + " over each input's values, the widest first."
	if capacity {
		ch.X.Title = "Allowable pressure (kPa)"
		ch.Guides = nil
		caption = "Spread of the allowable pressure of " + b.Name + " over each input's values, the widest first."
	}
	d, err := ch.Drawing(b.Span, []layout.Run{txt(caption)})
	if err != nil {
		c.diags.Warn(b.Span, "no sensitivity summary chart: %v", err)
		return nil
	}
	return d
}

// plainSym is a symbol in plain text, for a chart's labels (which set
// one face, no math): the Greek letter and primes as the notation prints
// them, the subscript in the font's subscript characters (c_u → cᵤ,
// σ′_v0 → σ′ᵥ₀); a subscript with a letter that has no subscript form
// (N_q) keeps the sheet's underscore.
func plainSym(name string) string {
	n := notation.Split(name)
	out := n.Base + strings.Repeat("′", n.Primes)
	if n.Sub == "" {
		return out
	}
	var sub strings.Builder
	body := fonts.Get(fonts.Regular)
	for _, r := range n.Sub {
		s, ok := subscripts[r]
		if !ok || !body.Has(s) {
			return out + "_" + n.Sub
		}
		sub.WriteRune(s)
	}
	return out + sub.String()
}

// subscripts are the Unicode subscript forms of the characters that have
// one.
var subscripts = map[rune]rune{
	'0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉',
	'a': 'ₐ', 'e': 'ₑ', 'o': 'ₒ', 'x': 'ₓ', 'h': 'ₕ', 'k': 'ₖ', 'l': 'ₗ', 'm': 'ₘ', 'n': 'ₙ', 'p': 'ₚ',
	's': 'ₛ', 't': 'ₜ', 'i': 'ᵢ', 'r': 'ᵣ', 'u': 'ᵤ', 'v': 'ᵥ', 'j': 'ⱼ',
}
