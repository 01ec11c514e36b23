package layout

import (
	"math"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// tableLook is the size and cell padding of a table.
type tableLook struct {
	cell, head textStyle
	padX, padY float64
}

var (
	plainLook = tableLook{
		cell: textStyle{size: tableSize, lead: 1.26, color: ink},
		head: textStyle{size: tableSize, lead: 1.26, color: ink, bold: true},
		padX: 4.5, padY: 2.3,
	}
	compactLook = tableLook{
		cell: textStyle{size: compactSize, lead: 1.22, color: ink},
		head: textStyle{size: compactSize, lead: 1.22, color: ink, bold: true},
		padX: 3.5, padY: 1.0,
	}
)

// cellWords is a table cell cut into words, in its style.
type cellWords struct {
	ws    []word
	style textStyle
}

// measured is a table cut into words and measured: the narrowest and
// the natural width of each column, and each number's shift onto its
// column's decimal point.
type measured struct {
	ncol       int
	look       tableLook
	rows       [][]cellWords // header first (nil when there is none)
	shift      func(ri, c int) float64
	minW, maxW []float64
	// bandW is each column's width with its header broken at spaces
	// and the body at its natural width
	bandW []float64
}

// NaturalWidth is the width t takes with no cell broken: its columns at
// their natural widths (for a caller choosing how to fold a table).
func NaturalWidth(t *Table) float64 {
	e := &engine{}
	m := e.measureTable(t)
	if m == nil {
		return 0
	}
	w := 0.0
	for _, x := range m.maxW {
		w += x
	}
	return w
}

// BandWidth is the width t takes with its header cells broken at their
// spaces and no body cell broken (for a caller folding a long table of
// short values into bands).
func BandWidth(t *Table) float64 {
	e := &engine{}
	m := e.measureTable(t)
	if m == nil {
		return 0
	}
	w := 0.0
	for _, x := range m.bandW {
		w += x
	}
	return w
}

// table lays out a table as one piece per row; the header row repeats at
// the top of every page the table continues onto.
func (e *engine) table(t *Table, width float64) []*piece {
	m := e.measureTable(t)
	if m == nil {
		return nil
	}
	look, rows, shift, minW, maxW := m.look, m.rows, m.shift, m.minW, m.maxW
	cellPadX, cellPadY := look.padX, look.padY
	// a word wider than half the table breaks rather than squeezing
	// the other columns to nothing
	share := math.Max(width/2, 4*cellPadX)
	for c := range minW {
		minW[c] = math.Min(minW[c], share)
		maxW[c] = math.Max(maxW[c], minW[c])
	}
	widths := columnWidths(minW, maxW, width)
	total := 0.0
	for _, w := range widths {
		total += w
	}
	var out []*piece
	var header, pristine *piece
	if capRuns := t.Caption; len(capRuns) > 0 {
		st := captionStyle
		if t.Compact {
			st.size = noteSize
		}
		// a caption may run wider than a narrow table, to the width of
		// the column (two thirds of it at least)
		cw := math.Max(total, math.Min(width, 2*width/3))
		lines := e.setText(capRuns, cw, st, t.Pos)
		ps := linePieces("caption", t.Pos, lines, cw, paraGap+2)
		for _, p := range ps {
			p.keep = true
		}
		out = append(out, ps...)
	}
	for ri, row := range rows {
		if row == nil {
			continue
		}
		pos := t.Pos
		kind := "table-header"
		if ri > 0 {
			kind = "row"
			if t.Rows[ri-1].Pos.File != nil {
				pos = t.Rows[ri-1].Pos
			}
		}
		b := &Box{Kind: kind, Pos: pos, W: total}
		var cells []draw.Item
		h := 0.0
		x := 0.0
		for c, cw := range row {
			inner := math.Max(widths[c]-2*cellPadX, 1)
			lines := breakLines(cw.ws, inner, cw.style)
			y := cellPadY
			for _, ln := range lines {
				dx := cellPadX
				align := AlignLeft
				if c < len(t.Align) {
					align = t.Align[c]
				}
				switch align {
				case AlignRight:
					dx += inner - ln.w
					if len(lines) == 1 {
						dx -= shift(ri, c)
					}
				case AlignCenter:
					dx += (inner - ln.w) / 2
				}
				cells = ln.appendItems(cells, x+dx, y)
				y += ln.h
			}
			h = math.Max(h, y+cellPadY)
			x += widths[c]
		}
		b.H = h
		if ri == 0 {
			b.Items = append(b.Items,
				draw.Rect{W: total, H: h, Paint: draw.Fill(headFill)},
				draw.Line{X1: 0, Y1: 0, X2: total, Y2: 0, Paint: draw.Stroke(ruleInk, 0.8)},
				draw.Line{X1: 0, Y1: h, X2: total, Y2: h, Paint: draw.Stroke(ruleInk, 0.8)})
		} else if ri == len(rows)-1 {
			b.Items = append(b.Items, draw.Line{X1: 0, Y1: h, X2: total, Y2: h, Paint: draw.Stroke(ruleInk, 0.8)})
		} else {
			b.Items = append(b.Items, draw.Line{X1: 0, Y1: h, X2: total, Y2: h, Paint: draw.Stroke(hairInk, 0.4)})
		}
		b.Items = append(b.Items, cells...)
		p := &piece{box: b}
		if ri == 0 {
			header = p
			p.keep = true
			if len(out) == 0 {
				p.before = paraGap + 2
			}
			pristine = clonePiece(p) // placing p moves it; repeats copy this
			pristine.before, pristine.keep = 0, false
		} else {
			p.head = pristine
		}
		out = append(out, p)
	}
	if len(out) > 0 && out[0].before == 0 {
		out[0].before = paraGap + 2
	}
	// keep the header with two rows, and the last two rows together
	n, body := len(out), len(t.Rows)
	if header != nil && body >= 3 {
		for i, p := range out {
			if p == header {
				out[i+1].keep = true
			}
		}
		out[n-2].keep = true
	}
	return out
}

// fraction reports whether a cell is one number ("245.7", "−0.12", "18")
// or a formula that is one number and its unit ("2.4 m", "18 kN/m³"), and
// the width from its decimal point to the cell's end (from the number's
// end for a whole number), so a column can align its numbers on the point.
// Exponents ("1.2e5") are not aligned.
func fraction(ws []word) (float64, bool) {
	if len(ws) != 1 || len(ws[0].frags) == 0 {
		return 0, false
	}
	fs := ws[0].frags
	var num string
	if fs[0].math != nil {
		if len(fs) != 1 || fs[0].text == "" {
			return 0, false // a formula, not a number
		}
		num = fs[0].text
	} else {
		var text strings.Builder
		for _, f := range fs {
			if f.math != nil {
				return 0, false
			}
			text.WriteString(f.text)
		}
		num = text.String()
	}
	s := strings.Replace(num, "−", "-", 1)
	if _, err := strconv.ParseFloat(s, 64); err != nil || strings.ContainsAny(s, "eEinIN") {
		return 0, false
	}
	whole := num
	if i := strings.IndexByte(num, '.'); i >= 0 {
		whole = num[:i]
	}
	return ws[0].w - fonts.Get(fs[0].face).Width(whole, fs[0].size), true
}

// measureWords is the narrowest a cell can be without splitting a word
// and its width set on one line.
func measureWords(ws []word) (lo, hi float64) {
	line := 0.0
	for i, w := range ws {
		lo = math.Max(lo, w.w)
		line += w.w
		if w.hard {
			hi = math.Max(hi, line)
			line = 0
		} else if i < len(ws)-1 {
			line += w.space
		}
	}
	return lo, math.Max(hi, line)
}

// columnWidths shares width among columns: natural widths when they fit
// (stretched to the full width when close to it), else each column its
// minimum plus a share of the rest in proportion to how much more it
// wants, else minimums scaled down (long words then break).
func columnWidths(minW, maxW []float64, width float64) []float64 {
	sumMin, sumMax := 0.0, 0.0
	for i := range minW {
		sumMin += minW[i]
		sumMax += maxW[i]
	}
	out := make([]float64, len(minW))
	switch {
	case sumMax <= width:
		f := 1.0
		if sumMax > 0.7*width {
			f = width / sumMax
		}
		for i := range out {
			out[i] = maxW[i] * f
		}
	case sumMin <= width:
		extra := width - sumMin
		for i := range out {
			out[i] = minW[i] + extra*(maxW[i]-minW[i])/(sumMax-sumMin)
		}
	default:
		for i := range out {
			out[i] = minW[i] * width / sumMin
		}
	}
	return out
}

func (e *engine) measureTable(t *Table) *measured {
	ncol := len(t.Header)
	for _, r := range t.Rows {
		ncol = max(ncol, len(r.Cells))
	}
	if ncol == 0 {
		return nil
	}
	look := plainLook
	if t.Compact {
		look = compactLook
	}
	cellPadX := look.padX
	// words of every cell, header first
	rows := make([][]cellWords, 0, len(t.Rows)+1)
	all := [][]Cell{t.Header}
	for _, r := range t.Rows {
		all = append(all, r.Cells)
	}
	for ri, cells := range all {
		if ri == 0 && len(cells) == 0 {
			rows = append(rows, nil)
			continue
		}
		pos := t.Pos
		if ri > 0 && t.Rows[ri-1].Pos.File != nil {
			pos = t.Rows[ri-1].Pos
		}
		st := look.cell
		if ri == 0 {
			st = look.head
		}
		row := make([]cellWords, ncol)
		for c := 0; c < ncol; c++ {
			if c < len(cells) {
				at := pos
				if ri > 0 && c < len(t.Rows[ri-1].CellPos) && t.Rows[ri-1].CellPos[c].File != nil {
					at = t.Rows[ri-1].CellPos[c]
				}
				row[c] = cellWords{e.words(cells[c], st, at), st}
			} else {
				row[c] = cellWords{style: st}
			}
		}
		rows = append(rows, row)
	}
	// numbers in right-aligned columns line up on the decimal point:
	// each is moved left by its column's longest fraction less its own
	tails := make([][]float64, len(rows))
	most := make([]float64, ncol)
	for ri, row := range rows {
		tails[ri] = make([]float64, len(row))
		for c, cw := range row {
			tails[ri][c] = -1
			if ri == 0 || c >= len(t.Align) || t.Align[c] != AlignRight {
				continue
			}
			if w, ok := fraction(cw.ws); ok {
				tails[ri][c] = w
				most[c] = math.Max(most[c], w)
			}
		}
	}
	shift := func(ri, c int) float64 {
		if tails[ri][c] < 0 {
			return 0
		}
		return most[c] - tails[ri][c]
	}
	// column widths from the content
	minW := make([]float64, ncol)
	maxW := make([]float64, ncol)
	bandW := make([]float64, ncol)
	for ri, row := range rows {
		for c, cw := range row {
			lo, hi := measureWords(cw.ws)
			minW[c] = math.Max(minW[c], lo+shift(ri, c)+2*cellPadX)
			maxW[c] = math.Max(maxW[c], hi+shift(ri, c)+2*cellPadX)
			if ri == 0 {
				hi = lo
			}
			bandW[c] = math.Max(bandW[c], hi+shift(ri, c)+2*cellPadX)
		}
	}
	return &measured{ncol: ncol, look: look, rows: rows, shift: shift, minW: minW, maxW: maxW, bandW: bandW}
}
