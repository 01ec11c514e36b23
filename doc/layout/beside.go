package layout

import (
	"math"

	"github.com/plinth-calc/plinth/doc/source"
)

// Beside sets two columns of blocks side by side: Left in Share of the
// width (0 < Share < 1), Right in the rest after a gap, their tops level
// (a table beside the chart of its values). It never splits across
// pages.
type Beside struct {
	Pos         source.Span
	Left, Right []Block
	Share       float64
}

func (b *Beside) Where() source.Span { return b.Pos }
func (*Beside) isBlock()             {}

// besideGap is the space between the columns of a Beside.
const besideGap = 16.0

func (e *engine) beside(b *Beside, width float64) []*piece {
	if b.Share <= 0 || b.Share >= 1 {
		e.diags.Add(b.Pos, "side-by-side blocks: share %.2f of the width, want between 0 and 1", b.Share)
		return nil
	}
	lw := (width - besideGap) * b.Share
	rw := width - besideGap - lw
	box := &Box{Kind: "beside", Pos: b.Pos, W: width}
	h := 0.0
	for i, col := range [][]Block{b.Left, b.Right} {
		w, x := lw, 0.0
		if i == 1 {
			w, x = rw, lw+besideGap
		}
		y := 0.0
		for j, p := range e.blocks(col, w) {
			if p.brk {
				continue
			}
			if j > 0 {
				y += p.before
			}
			p.box.move(x, y)
			box.Kids = append(box.Kids, p.box)
			y += p.box.H
		}
		h = math.Max(h, y)
	}
	box.H = h
	return []*piece{{box: box, before: paraGap + 2}}
}
