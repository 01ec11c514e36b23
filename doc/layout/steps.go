package layout

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/source"
)

// Steps is a run of calculation lines (Statement, Input) set compactly:
// consecutive lines whose formula is one short line and whose note is
// short share a row, two or three to a row, read across and then down,
// and in a group of such rows the notes of a column start at one place.
// Any other line (or any other block in Lines) is set as it would be
// alone, across the whole width.
type Steps struct {
	Pos   source.Span
	Lines []Block
}

func (b *Steps) Where() source.Span { return b.Pos }
func (*Steps) isBlock()             {}

const (
	stepColGap  = 14.0 // between the columns of a row of short lines
	stepNoteGap = 8.0  // between a short line's formula and its note
)

// cellLine is a calculation line measured for a row of short lines.
type cellLine struct {
	kind   string
	pos    source.Span
	anchor string
	line   *eqn.Box // the formula on one line
	note   []word
	below  bool // its note goes below the formula
}

func (e *engine) steps(s *Steps, width float64) []*piece {
	var out []*piece
	var run []cellLine
	var runBlocks []Block
	flush := func() {
		out = append(out, e.packLines(run, runBlocks, width)...)
		run, runBlocks = nil, nil
	}
	for _, b := range s.Lines {
		if c, ok := e.shortLine(b, width); ok {
			run = append(run, c)
			runBlocks = append(runBlocks, b)
			continue
		}
		flush()
		out = append(out, e.block(b, width)...)
	}
	flush()
	return out
}

// shortLine measures a statement or input whose formula is one line no
// wider than half the width; other blocks are not short.
func (e *engine) shortLine(b Block, width float64) (cellLine, bool) {
	var row eqn.Row
	var note []Run
	c := cellLine{}
	switch b := b.(type) {
	case *Statement:
		if b.Symbol == nil {
			return c, false
		}
		row = eqn.Row{b.Symbol}
		for _, part := range []eqn.Node{b.Expr, b.Subst} {
			if part != nil {
				row = append(row, eqn.Op{Text: "="}, part)
			}
		}
		if b.Result != nil {
			row = append(row, eqn.Op{Text: "="}, eqn.Strong{X: b.Result})
		}
		note = noteRuns(b.Note, b.Ref)
		c.kind, c.pos, c.anchor = "statement", b.Pos, b.Anchor
	case *Input:
		if b.Symbol == nil || b.Value == nil {
			return c, false
		}
		row = eqn.Row{b.Symbol, eqn.Op{Text: "="}, b.Value}
		note = noteRuns(b.Note, b.Ref)
		c.kind, c.pos, c.anchor = "input", b.Pos, b.Anchor
	default:
		return c, false
	}
	half := (width - stepColGap) / 2
	set, err := eqn.Prepare(row, e.mathStyle())
	if err != nil {
		return c, false // the line alone reports any problem
	}
	if set.Width() > half {
		e.pre = preset{b, set} // for the line set alone, next
		return c, false
	}
	lines := set.Break(half)
	if len(lines) != 1 || lines[0].W > half {
		return c, false
	}
	c.line = lines[0]
	c.note = e.words(note, noteStyle, c.pos)
	return c, true
}

// preset is a calculation line's formula set by shortLine, too wide for
// a row of short lines: the line set alone takes it rather than set the
// formula again.
type preset struct {
	b   Block
	set *eqn.Set
}

// presetFor takes the formula set for b, if shortLine set it.
func (e *engine) presetFor(b Block) *eqn.Set {
	if e.pre.b != b {
		return nil
	}
	s := e.pre.set
	e.pre = preset{}
	return s
}

// noteLines is how many lines a note takes at width.
func noteLines(ws []word, width float64) int {
	if len(ws) == 0 {
		return 0
	}
	return len(breakLines(ws, width, noteStyle))
}

// packLines sets a run of short lines in rows of three (each note beside
// its formula) or two (each note beside its formula or, when it does not
// fit there, below it), every note in at most two lines; a line that
// fits neither is set alone.
func (e *engine) packLines(run []cellLine, blocks []Block, width float64) []*piece {
	colW := func(n int) float64 { return (width - float64(n-1)*stepColGap) / float64(n) }
	fits := func(cs []cellLine, n int) bool {
		w := colW(n)
		for _, c := range cs {
			if !besideFits(c, w) && (n != 2 || !belowFits(c, w)) {
				return false
			}
		}
		return true
	}
	var out []*piece
	type group struct {
		n     int
		cells []cellLine
	}
	var groups []group
	for i := 0; i < len(run); {
		n := 1
		for _, k := range []int{3, 2} {
			if i+k <= len(run) && fits(run[i:i+k], k) {
				n = k
				break
			}
		}
		if n == 1 {
			groups = append(groups, group{1, run[i : i+1]})
			i++
			continue
		}
		if g := len(groups) - 1; g >= 0 && groups[g].n == n && (n == 2 || aligned(append(groups[g].cells[:len(groups[g].cells):len(groups[g].cells)], run[i:i+n]...), n, colW(n))) {
			groups[g].cells = append(groups[g].cells, run[i:i+n]...)
		} else {
			groups = append(groups, group{n, run[i : i+n : i+n]})
		}
		i += n
	}
	at := 0
	for _, g := range groups {
		if g.n == 1 {
			out = append(out, e.block(blocks[at], width)...)
			at++
			continue
		}
		at += len(g.cells)
		w := colW(g.n)
		noteX := columnNotes(g.cells, g.n, w)
		for i, c := range g.cells { // in two columns a note that does not fit beside goes below
			g.cells[i].below = g.n == 2 && (!besideFits(c, w) || noteLines(c.note, w-noteX[i%g.n]) > 2)
		}
		for r := 0; g.n == 2 && r < len(g.cells); r += 2 { // and then both notes of its row
			below := g.cells[r].below || g.cells[r+1].below
			g.cells[r].below, g.cells[r+1].below = below, below
		}
		for r := 0; r < len(g.cells); r += g.n {
			out = append(out, e.cellRow(g.cells[r:r+g.n], noteX, w, width))
		}
	}
	return out
}

// stepIndent is the indent of a note set below its formula in a row.
const stepIndent = 10.0

// besideFits reports whether a short line's note fits beside its formula
// in a column of width w, in at most two lines.
func besideFits(c cellLine, w float64) bool {
	room := w - c.line.W - stepNoteGap
	return c.line.W <= 0.6*w && room >= 40 && noteLines(c.note, room) <= 2
}

// belowFits reports whether a short line's formula fits a column of width
// w with its note below it, in at most two lines.
func belowFits(c cellLine, w float64) bool {
	return c.line.W <= w && noteLines(c.note, w-stepIndent) <= 2
}

// columnNotes is where the notes of each column of a group of rows of n
// short lines start: clear of the widest formula in the column whose
// note goes beside it.
func columnNotes(cs []cellLine, n int, w float64) []float64 {
	x := make([]float64, n)
	for i, c := range cs {
		if besideFits(c, w) {
			x[i%n] = math.Max(x[i%n], c.line.W+stepNoteGap)
		}
	}
	return x
}

// aligned reports whether rows of n short lines can share their note
// columns, every note then taking at most two lines.
func aligned(cs []cellLine, n int, colW float64) bool {
	x := columnNotes(cs, n, colW)
	for i, c := range cs {
		if noteLines(c.note, colW-x[i%n]) > 2 {
			return false
		}
	}
	return true
}

// cellRow is one row of short lines, their first baselines level.
func (e *engine) cellRow(cs []cellLine, noteX []float64, colW, width float64) *piece {
	base := 0.0
	for _, c := range cs {
		base = math.Max(base, math.Max(c.line.Ascent, 0.78*mathSize)+1)
	}
	base += calcPad
	// each line is a box of its own inside the row, at its source position
	b := &Box{Kind: "steps", Pos: cs[0].pos, W: width}
	h := 0.0
	for j, c := range cs {
		x := float64(j) * (colW + stepColGap)
		k := &Box{Kind: c.kind, Pos: c.pos, X: x, W: colW}
		k.Items = c.line.AppendItems(k.Items, 0, base)
		bottom := base + math.Max(c.line.Descent, 0.3*mathSize) + 1
		kh := bottom
		if len(c.note) > 0 {
			nx, nw := noteX[j], colW-noteX[j]
			if c.below {
				nx, nw = stepIndent, colW-stepIndent
			}
			lines := breakLines(c.note, nw, noteStyle)
			y := base - lines[0].base
			if c.below {
				y = bottom + 0.5
			}
			for _, ln := range lines {
				k.Items = ln.appendItems(k.Items, nx, y)
				y += ln.h
			}
			kh = math.Max(kh, y)
		}
		if c.anchor != "" {
			k.Items = append(k.Items, draw.Anchor{Name: c.anchor})
		}
		k.H = kh + calcPad
		h = math.Max(h, kh)
		b.Kids = append(b.Kids, k)
	}
	b.H = h + calcPad
	return &piece{box: b, before: calcGap, base: base}
}
