package layout

// Pagination. Pieces are stacked down the text column; a piece kept with
// the next (keep) moves to a new page with it, and a table row starting a
// page repeats its header (head). The stacking is planned first, without
// touching the boxes, so that a sheet whose last page holds only a short
// tail can be planned again with the space between pieces reduced, as a
// typesetter shrinks vertical glue: if that saves the page, the whole
// sheet is set with the reduced spacing (never less than minShrink of it,
// so every piece stays where it was in reading order and no line
// touches another).

// shrinks are the factors tried, in turn, on the space between pieces when
// a sheet's last page is short; the first that removes a page is used.
var shrinks = [...]float64{0.8, 0.65, 0.5, minShrink}

// minShrink is the least share of its space kept above a piece.
const minShrink = 0.4

// shortTail is the share of the text height below which a sheet's last
// page counts as short (worth trying to take back onto the page before).
const shortTail = 0.3

// slot is one piece's place in a plan: its page (from 0) and the top of
// its box; head marks a table header repeated above the piece.
type slot struct {
	p    *piece
	page int
	y    float64
	head bool
}

// plan stacks ps into pages with the space above each piece scaled by
// shrink, and reports the pages used and the height taken on the last.
func (e *engine) plan(ps []*piece, shrink float64) (out []slot, pages int, last float64) {
	bottom := e.bodyY + e.bodyH
	page, y, empty := 0, e.bodyY, true
	newPage := func() { page, y, empty = page+1, e.bodyY, true }
	put := func(p *piece, gap float64, head bool) {
		if empty {
			gap = 0
		}
		out = append(out, slot{p: p, page: page, y: y + gap, head: head})
		y += gap + p.box.H
		empty = false
	}
	for i := 0; i < len(ps); i++ {
		p := ps[i]
		if p.brk {
			if !empty {
				newPage()
			}
			continue
		}
		gap := p.before * shrink
		if empty {
			gap = 0
		}
		need := gap + p.box.H
		chain := need
		for j := i; ps[j].keep && j+1 < len(ps) && !ps[j+1].brk; j++ {
			chain += ps[j+1].before*shrink + ps[j+1].box.H
		}
		if chain <= e.bodyH {
			need = chain
		}
		if y+need > bottom+1e-6 && !empty {
			newPage()
			if p.head != nil {
				put(p.head, 0, true)
			}
		}
		put(p, p.before*shrink, false)
	}
	return out, page + 1, y - e.bodyY
}

// paginate stacks pieces into pages for sheet si, numbered from 1, and
// says where each box went.
func (e *engine) paginate(si int, ps []*piece) (pages []*Page, at []placed) {
	plan, n, last := e.plan(ps, 1)
	if n > 1 && last < shortTail*e.bodyH {
		for _, f := range shrinks {
			if p, m, _ := e.plan(ps, f); m < n {
				plan = p
				break
			}
		}
	}
	newPage := func() {
		pages = append(pages, &Page{W: float64(e.tpl.Page.Width), H: float64(e.tpl.Page.Height), Sheet: si, Number: len(pages) + 1})
	}
	for i, pl := range plan {
		for len(pages) <= pl.page {
			newPage()
		}
		b := pl.p.box
		of := pl.p
		if pl.head {
			b = cloneBox(b)
			of = plan[i+1].p // the header goes above the row that needs it
		} else if b.H > e.bodyH+1e-6 {
			e.diags.Add(b.Pos, "%s is %.0f pt tall and cannot fit on a page (%.0f pt of text height)", kindName(b.Kind), b.H, e.bodyH)
		}
		b.move(e.bodyX, pl.y)
		pg := pages[pl.page]
		at = append(at, placed{page: pl.page, seq: len(pg.Boxes), block: of.block, idx: of.idx, head: pl.head, dx: e.bodyX, dy: pl.y})
		pg.Boxes = append(pg.Boxes, b)
	}
	if len(pages) == 0 {
		newPage()
	}
	return pages, at
}
