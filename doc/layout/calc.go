package layout

import (
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

var noteStyle = textStyle{size: noteSize, lead: 1.2, color: muted}

func (e *engine) statement(s *Statement, width float64) []*piece {
	row := eqn.Row{s.Symbol}
	for _, part := range []eqn.Node{s.Expr, s.Subst} {
		if part != nil {
			row = append(row, eqn.Op{Text: "="}, part)
		}
	}
	if s.Result != nil {
		row = append(row, eqn.Op{Text: "="}, eqn.Strong{X: s.Result})
	}
	if s.Symbol == nil {
		e.diags.Add(s.Pos, "statement has no symbol")
		return nil
	}
	return e.calcLine("statement", s.Pos, s.Own, row, e.presetFor(s), noteRuns(s.Note, s.Ref), s.Anchor, width)
}

func (e *engine) input(in *Input, width float64) []*piece {
	if in.Symbol == nil || in.Value == nil {
		e.diags.Add(in.Pos, "input needs a symbol and a value")
		return nil
	}
	row := eqn.Row{in.Symbol, eqn.Op{Text: "="}, in.Value}
	return e.calcLine("input", in.Pos, in.Own, row, e.presetFor(in), noteRuns(in.Note, in.Ref), in.Anchor, width)
}

// noteRuns appends a reference to a note, in brackets.
func noteRuns(note []Run, ref string) []Run {
	if ref = strings.TrimSpace(ref); ref == "" {
		return note
	}
	if !strings.HasPrefix(ref, "[") {
		ref = "[" + ref + "]"
	}
	out := append([]Run(nil), note...)
	if len(out) > 0 {
		ref = " " + ref
	}
	return append(out, Run{Text: ref, Style: Italic})
}

// mathStyle is how calculation lines set their formulas.
func (e *engine) mathStyle() eqn.Style {
	return eqn.Style{Size: mathSize, Color: ink, Texts: e.texts()}
}

// formula is a broken formula stacked into lines.
type formula struct {
	items []draw.Item
	h     float64
	base  float64 // first baseline
	w     float64
	lines int
}

// stackFormula breaks row to width and stacks the lines.
// The items are moved by (dx, dy); own marks plinth's own formula.
// stackFormula breaks row to width and stacks the lines; set, when not
// nil, is row set already (eqn.Prepare with mathStyle).
func (e *engine) stackFormula(row eqn.Node, set *eqn.Set, width, dx, dy float64, pos source.Span, own bool) (formula, bool) {
	if set == nil {
		var err error
		if set, err = eqn.Prepare(row, e.mathStyle()); err != nil {
			e.mathProblem(pos, own, err)
			return formula{}, false
		}
	}
	lines := set.Break(width)
	f := formula{lines: len(lines)}
	y := 0.0
	for i, b := range lines {
		asc := math.Max(b.Ascent, 0.78*mathSize) + 1
		desc := math.Max(b.Descent, 0.3*mathSize) + 1
		if i == 0 {
			f.base = y + asc
		}
		f.items = b.AppendItems(f.items, dx, dy+y+asc)
		f.w = math.Max(f.w, b.W)
		y += asc + desc
		if i < len(lines)-1 {
			y += 2
		}
	}
	f.h = y
	return f, true
}

// noteStops are where a note beside a formula may start, as shares of
// the width: the first that clears the formula, so a short formula leaves
// its note a wide column (one line where the fixed column wrapped it to
// three) and the notes of a run of lines still start at one of a few
// places.
var noteStops = [...]float64{0.3, 0.48, 0.64}

// calcLine lays out a formula with its note beside it (at the first note
// stop clear of the formula), or below it when the formula needs the
// whole width.
func (e *engine) calcLine(kind string, pos source.Span, own bool, row eqn.Row, set *eqn.Set, note []Run, anchor string, width float64) []*piece {
	const gap = 12.0
	last := noteStops[len(noteStops)-1] * width
	eqW := width
	if len(note) > 0 {
		eqW = last - gap
	}
	// The note goes beside a formula that is one line no wider than eqW;
	// such a formula is that same line at the full width, so one
	// breaking at the full width serves both cases.
	f, ok := e.stackFormula(row, set, width, 0, calcPad, pos, own)
	if !ok {
		return nil
	}
	beside := len(note) == 0 || f.lines == 1 && f.w <= eqW
	if f.w > width+float64(e.tpl.Margin.Right)-4 {
		e.diags.Add(pos, "formula is %.0f pt wide even when broken; the text column is %.0f pt", f.w, width)
	}
	b := &Box{Kind: kind, Pos: pos, W: width, Items: f.items}
	h := calcPad + f.h
	if len(note) > 0 {
		ws := e.words(note, noteStyle, pos)
		x := 18.0
		if beside {
			x = last
			for _, s := range noteStops {
				if f.w+gap <= s*width {
					x = s * width
					break
				}
			}
		} else if f.lines == 1 {
			// a long formula on one line: its note beside it still when
			// it fits there on one line
			if at := math.Max(last, f.w+gap); width-at >= 40 && noteLines(ws, width-at) == 1 {
				x, beside = at, true
			}
		}
		lines := breakLines(ws, width-x, noteStyle)
		y := h + 0.5
		if beside {
			y = calcPad + f.base - lines[0].base
		}
		for _, ln := range lines {
			b.Items = ln.appendItems(b.Items, x, y)
			y += ln.h
		}
		h = math.Max(h, y)
	}
	b.H = h + calcPad
	if anchor != "" {
		b.Items = append(b.Items, draw.Anchor{Name: anchor})
	}
	return []*piece{{box: b, before: calcGap, base: calcPad + f.base}}
}

var relations = map[string]string{"<=": "≤", "≤": "≤", ">=": "≥", "≥": "≥", "<": "<", ">": ">", "=": "=", "==": "=", "!=": "≠", "≠": "≠"}

func (e *engine) check(c *Check, width float64) []*piece {
	rel, ok := relations[strings.TrimSpace(c.Rel)]
	if !ok {
		e.diags.Add(c.Pos, "check relation %q: want ≤, ≥, <, > or =", c.Rel)
		return nil
	}
	if c.Left == nil || c.Right == nil {
		e.diags.Add(c.Pos, "check needs both sides")
		return nil
	}
	row := eqn.Row{c.Left}
	if c.LeftValue != nil {
		row = append(row, eqn.Op{Text: "="}, c.LeftValue)
	}
	row = append(row, eqn.Op{Text: rel}, c.Right)
	if c.RightValue != nil {
		row = append(row, eqn.Op{Text: "="}, c.RightValue)
	}
	const verdictW, pad = 128.0, 3.0
	f, ok := e.stackFormula(row, nil, width-verdictW-2*pad, pad, pad, c.Pos, false)
	if !ok {
		return nil
	}
	b := &Box{Kind: "check", Pos: c.Pos, W: width}
	fill, word, wordInk := shade, "OK", okInk
	if !c.OK {
		fill, word, wordInk = badFill, "NOT OK", badInk
	}
	h := pad + f.h
	var noteItems []draw.Item
	if len(c.Note) > 0 {
		ws := e.words(c.Note, noteStyle, c.Pos)
		room := width - verdictW - 2*pad
		if at := f.w + 14; f.lines == 1 && room-at >= 40 && noteLines(ws, room-at) == 1 {
			// a short note beside the relation, on its line
			ln := breakLines(ws, room-at, noteStyle)[0]
			noteItems = ln.appendItems(noteItems, pad+at, pad+f.base-ln.base)
		} else {
			y := h + 1
			for _, ln := range breakLines(ws, room, noteStyle) {
				noteItems = ln.appendItems(noteItems, pad, y)
				y += ln.h
			}
			h = y
		}
	}
	h += pad
	base := pad + f.base
	// the verdict: utilisation, then the word in a box
	util := fmt.Sprintf("utilisation %.2f", c.Util)
	if c.UtilText != "" {
		util = "utilisation " + c.UtilText
	}
	if math.IsNaN(c.Util) || math.IsInf(c.Util, 0) {
		e.diags.Add(c.Pos, "check utilisation is %v", c.Util)
		util = "utilisation —"
	}
	const wordSize = 8.6
	wf := fonts.Get(fonts.Bold)
	ww := wf.Width(word, wordSize) + 10
	wx := width - pad - ww
	cap := wf.CapHeight(wordSize)
	b.Items = append(b.Items, draw.Rect{W: width, H: h, Paint: draw.Fill(fill)},
		draw.Rect{W: 2, H: h, Paint: draw.Fill(wordInk)})
	b.Items = append(b.Items, f.items...)
	b.Items = append(b.Items, noteItems...)
	b.Items = append(b.Items,
		draw.Text{X: wx - 8, Y: base, Face: fonts.Regular, Size: noteSize, Color: muted, Align: draw.Right, Text: util},
		draw.Rect{X: wx, Y: base - cap - 3.2, W: ww, H: cap + 6.4, Paint: draw.Paint{Stroke: wordInk, Width: 0.8, Fill: draw.Color{R: 255, G: 255, B: 255}, Filled: true}},
		draw.Text{X: wx + 5, Y: base, Face: fonts.Bold, Size: wordSize, Color: wordInk, Text: word},
	)
	// resolve the right-aligned utilisation text
	for i, it := range b.Items {
		if t, ok := it.(draw.Text); ok && t.Align != draw.Left {
			t.X, t.Align = t.Start(), draw.Left
			b.Items[i] = t
		}
	}
	b.H = h
	if c.Anchor != "" {
		b.Items = append(b.Items, draw.Anchor{Name: c.Anchor})
	}
	return []*piece{{box: b, before: calcGap + 2, base: base}}
}
