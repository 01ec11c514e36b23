package layout

import "github.com/plinth-calc/plinth/doc/source"

// Laying a sheet out again for its page references (refs.go) redoes only
// the top-level blocks that set a page reference; every other block
// gives the pieces it gave before, so a sheet that mentions one page
// number costs one block's layout, not the sheet's. A block's pieces
// depend on nothing but the block, the width and the heading numbers
// before it; the numbers after it and the problems it raised are kept
// with its pieces and restored.

// laidBlock is one top-level block as the last layout of its sheet left
// it: its pieces unplaced (paginate moves pieces, so these are copies),
// the heading numbers after it, the problems it raised, and whether it
// set a page reference (then it is laid out again).
type laidBlock struct {
	pieces []*piece
	num    [4]int
	diags  source.List
	refs   bool
}

// sheetBlocks lays out a sheet's top-level blocks, taking the pieces of
// those with no page reference from before (nil: none kept). It returns
// the pieces, and what to keep for the next layout when the sheet set a
// page reference (nil otherwise: it will not be laid out again).
func (e *engine) sheetBlocks(bs []Block, before []laidBlock) ([]*piece, []laidBlock) {
	var out []*piece
	kept := make([]laidBlock, len(bs))
	anyRef := false
	for i, b := range bs {
		if i < len(before) && !before[i].refs && len(before) == len(bs) {
			lb := before[i]
			for _, p := range lb.pieces {
				out = append(out, clonePiece(p))
			}
			e.num = lb.num
			e.diags = append(e.diags, lb.diags...)
			kept[i] = lb
			continue
		}
		d, r := len(e.diags), e.refCalls
		ps := e.block(b, e.bodyW)
		lb := laidBlock{num: e.num, diags: e.diags[d:len(e.diags):len(e.diags)], refs: e.refCalls != r}
		lb.pieces = make([]*piece, len(ps))
		for j, p := range ps {
			lb.pieces[j] = clonePiece(p)
		}
		anyRef = anyRef || lb.refs
		kept[i] = lb
		out = append(out, ps...)
	}
	if !anyRef {
		return out, nil
	}
	return out, kept
}
