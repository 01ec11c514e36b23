package layout

import (
	"slices"

	"github.com/plinth-calc/plinth/doc/source"
)

// Laying a sheet out again for its page references (refs.go) redoes only
// the top-level blocks that set a page reference. A block's pieces depend
// on nothing but the block, the width and the heading numbers before it;
// when the blocks laid out again give pieces of the same shape as before
// (heights, spaces, keeps: all paginate reads), the pagination is the
// same, so their new boxes go where the old ones went and nothing else of
// the sheet is touched: its other boxes need not be kept as pieces, and
// with doc.Final they have been painted and dropped already. A block
// whose pieces change shape (a filled-in number that breaks a line
// differently) has the sheet laid out whole again.

// laidBlock is one top-level block as the last layout of its sheet left
// it: the heading numbers after it, the problems it raised, whether it
// set a page reference and, if it did, the shape of its pieces and where
// its boxes went.
type laidBlock struct {
	num    [4]int
	diags  source.List
	refs   bool
	shapes []shape
	at     []placed
}

// shape is what paginate reads of a piece.
type shape struct {
	kind              string
	h, before         float64
	keep, brk         bool
	head              bool
	headH, headBefore float64
}

func shapeOf(p *piece) shape {
	s := shape{kind: p.box.Kind, h: p.box.H, before: p.before, keep: p.keep, brk: p.brk, head: p.head != nil}
	if p.head != nil {
		s.headH, s.headBefore = p.head.box.H, p.head.before
	}
	return s
}

// placed is where paginate put a box: the page of the sheet (from 0) and
// its place among the page's boxes, the piece it is (block and index
// among the block's pieces, or that piece's repeated table header), and
// how far it was moved.
type placed struct {
	page, seq  int
	block, idx int
	head       bool
	dx, dy     float64
}

// sheetBlocks lays out a sheet's top-level blocks, each piece tagged with
// its block, and says what of each block to keep for laying the sheet out
// again.
func (e *engine) sheetBlocks(bs []Block) ([]*piece, []laidBlock) {
	var out []*piece
	kept := make([]laidBlock, len(bs))
	for i, b := range bs {
		d, r := len(e.diags), e.refCalls
		ps := e.block(b, e.bodyW)
		lb := laidBlock{num: e.num, diags: e.diags[d:len(e.diags):len(e.diags)], refs: e.refCalls != r}
		for j, p := range ps {
			p.block, p.idx = i, j
			if lb.refs {
				lb.shapes = append(lb.shapes, shapeOf(p))
			}
		}
		kept[i] = lb
		out = append(out, ps...)
	}
	return out, kept
}

// whole lays out and paginates sheet si whole. With doc.Final, the
// sheet's boxes are handed on to be painted, all but those of the blocks
// with a page reference, which stay on their pages (the rest of each
// page's boxes are nil until compact).
func (e *engine) whole(doc Doc, si int) laidSheet {
	pieces, blocks := e.sheetBlocks(doc.Sheets[si].Blocks)
	nb := len(e.diags)
	pages, at := e.paginate(si, pieces)
	ls := laidSheet{pages: pages, diags: e.diags, refs: e.used, marks: marksOf(pages)}
	if len(e.used) > 0 {
		for _, p := range at {
			if blocks[p.block].refs {
				blocks[p.block].at = append(blocks[p.block].at, p)
			}
		}
		ls.blocks, ls.pageDiags = blocks, e.diags[nb:len(e.diags):len(e.diags)]
	}
	if streams(doc) {
		ls.paint(doc, si)
	}
	return ls
}

// paint hands the sheet's boxes, but for those of blocks that set a page
// reference, to doc.Final; once it has painted them they are dropped. A
// sheet that sets no page reference is not laid out again: its blocks go
// too.
func (ls *laidSheet) paint(doc Doc, si int) {
	late := make([][]bool, len(ls.pages))
	for i, pg := range ls.pages {
		late[i] = make([]bool, len(pg.Boxes))
	}
	for _, lb := range ls.blocks {
		for _, p := range lb.at {
			late[p.page][p.seq] = true
		}
	}
	ahead := make([]*Page, len(ls.pages))
	for i, pg := range ls.pages {
		c := *pg
		c.Boxes = make([]*Box, 0, len(pg.Boxes))
		for j, b := range pg.Boxes {
			if !late[i][j] {
				c.Boxes = append(c.Boxes, b)
			}
		}
		ahead[i] = &c
	}
	doc.Final(si, ahead)
	for _, c := range ahead {
		if len(c.Boxes) > 0 {
			return // not painted: the sheet keeps its boxes
		}
	}
	for i, pg := range ls.pages {
		for j := range pg.Boxes {
			if !late[i][j] {
				pg.Boxes[j] = nil
			}
		}
	}
	if ls.blocks == nil {
		doc.Sheets[si].Blocks = nil
	}
}

// compact drops the places of boxes painted already.
func (ls *laidSheet) compact() {
	for _, pg := range ls.pages {
		pg.Boxes = slices.DeleteFunc(pg.Boxes, func(b *Box) bool { return b == nil })
		if len(pg.Boxes) == 0 {
			pg.Boxes = nil
		}
	}
}

// again lays out anew only the blocks of sheet si that set a page
// reference, and when their pieces keep their shapes puts the new boxes
// in the old ones' places in ls, reporting true; false leaves ls as it
// was, for the sheet to be laid out whole.
func (e *engine) again(doc Doc, si int, ls *laidSheet) bool {
	bs := doc.Sheets[si].Blocks
	if len(bs) != len(ls.blocks) {
		return false
	}
	redone := map[int][]*piece{}
	diags := make([]source.List, len(bs))
	for i, lb := range ls.blocks {
		if !lb.refs {
			e.diags = append(e.diags, lb.diags...)
			continue
		}
		e.num, e.listDepth = [4]int{}, 0
		if i > 0 {
			e.num = ls.blocks[i-1].num
		}
		d := len(e.diags)
		ps := e.block(bs[i], e.bodyW)
		if e.num != lb.num || len(ps) != len(lb.shapes) {
			return false
		}
		for j, p := range ps {
			if shapeOf(p) != lb.shapes[j] {
				return false
			}
		}
		redone[i] = ps
		diags[i] = e.diags[d:len(e.diags):len(e.diags)]
	}
	e.diags = append(e.diags, ls.pageDiags...)
	// the new boxes in the old places, and their anchors and links in
	// place of the old ones'
	gone := map[[2]int]bool{}
	var marks []mark
	for i, ps := range redone {
		ls.blocks[i].diags = diags[i]
		for _, p := range ls.blocks[i].at {
			b := ps[p.idx].box
			if p.head {
				b = cloneBox(ps[p.idx].head.box)
			}
			b.move(p.dx, p.dy)
			ls.pages[p.page].Boxes[p.seq] = b
			gone[[2]int{p.page, p.seq}] = true
			marks = appendMarks(marks, b, p.page, p.seq)
		}
	}
	for _, m := range ls.marks {
		if !gone[[2]int{m.page, m.seq}] {
			marks = append(marks, m)
		}
	}
	slices.SortStableFunc(marks, func(a, b mark) int {
		if a.page != b.page {
			return a.page - b.page
		}
		return a.seq - b.seq
	})
	ls.diags, ls.refs, ls.marks = e.diags, e.used, marks
	return true
}
