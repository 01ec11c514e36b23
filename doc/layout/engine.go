package layout

import (
	"fmt"
	"runtime"
	"sync"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/source"
)

// engine carries the state of one Document call.
type engine struct {
	tpl   *Template
	probs Problems
	// the text column of every page
	bodyX, bodyY, bodyW, bodyH float64
	num                        [4]int // heading counters of the current sheet
	listDepth                  int
}

// piece is an unbreakable strip of a sheet's body, stacked by the
// paginator. Its box is relative to the piece's top-left corner at the left
// of the text column.
type piece struct {
	box    *Box
	before float64 // space above it, dropped at the top of a page
	keep   bool    // keep on the same page as the next piece
	head   *piece  // repeat this above the piece when it starts a page
	brk    bool    // start a new page here
	base   float64 // first baseline below the top
}

// Document lays out doc: every sheet's body into pages, then the title
// block, variant banner and footer on each page. Problems (with their
// source positions) come back as a Problems error; no pages are returned
// then.
func Document(doc Doc) (pages *Pages, err error) {
	defer func() {
		if r := recover(); r != nil { // a defect here must not take the caller down
			pages, err = nil, fmt.Errorf("layout: internal error: %v", r)
		}
	}()
	if len(doc.Sheets) == 0 {
		return nil, Problems{{Msg: "layout: no sheets to lay out"}}
	}
	tpl := doc.Template
	if tpl == nil {
		var err error
		if tpl, err = BuiltinTemplate("a4"); err != nil {
			return nil, err
		}
	}
	e := &engine{tpl: tpl}
	e.bodyX, e.bodyY, e.bodyW, e.bodyH = tpl.body()
	banner := e.variantBanner(doc.Info.Variant)
	if banner != nil {
		e.bodyY += banner.H + 8
		e.bodyH -= banner.H + 8
	}
	out := &Pages{Info: doc.Info}
	laid, err := e.sheets(doc.Sheets)
	if err != nil {
		return nil, err
	}
	for si := range doc.Sheets {
		sh := &doc.Sheets[si]
		pieces := laid[si]
		laid[si] = nil
		first := len(out.Pages)
		e.paginate(si, sh.Pos, pieces, out)
		title := sh.Bookmark
		if title == "" {
			title = joinNonEmpty(" ", sh.Fields.Calc, sh.Fields.Title)
		}
		if title == "" {
			title = fmt.Sprintf("Sheet %d", si+1)
		}
		out.Outline = append(out.Outline, Bookmark{Title: title, Page: first})
		if doc.Progress != nil {
			doc.Progress(si+1, len(doc.Sheets))
		}
	}
	e.furnish(doc, out, banner)
	e.checkLinks(out)
	if len(e.probs) > 0 {
		return nil, e.probs.sorted()
	}
	return out, nil
}

// sheets lays out the body of every sheet into pieces, the sheets in
// parallel: each is independent until it is paginated. Each sheet gets its
// own copy of the engine state; the problems are gathered in sheet order.
func (e *engine) sheets(shs []Sheet) ([][]*piece, error) {
	laid := make([][]*piece, len(shs))
	probs := make([]Problems, len(shs))
	fails := make([]error, len(shs))
	workers := min(runtime.GOMAXPROCS(0), len(shs))
	next := make(chan int)
	var wg sync.WaitGroup
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for si := range next {
				func() {
					defer func() {
						if r := recover(); r != nil {
							fails[si] = fmt.Errorf("layout: internal error: %v", r)
						}
					}()
					se := *e
					se.probs, se.num, se.listDepth = nil, [4]int{}, 0
					laid[si] = se.blocks(shs[si].Blocks, se.bodyW)
					probs[si] = se.probs
				}()
			}
		}()
	}
	for si := range shs {
		next <- si
	}
	close(next)
	wg.Wait()
	for si := range shs {
		if fails[si] != nil {
			return nil, fails[si]
		}
		e.probs = append(e.probs, probs[si]...)
	}
	return laid, nil
}

// blocks lays out a list of blocks at width.
func (e *engine) blocks(bs []Block, width float64) []*piece {
	var out []*piece
	for _, b := range bs {
		out = append(out, e.block(b, width)...)
	}
	return out
}

func (e *engine) block(b Block, width float64) []*piece {
	switch b := b.(type) {
	case *Heading:
		return e.heading(b, width)
	case *Para:
		return e.para(b, width)
	case *List:
		return e.list(b, width, 0)
	case *Table:
		return e.table(b, width)
	case *Image:
		return e.image(b, width)
	case *Code:
		return e.code(b, width)
	case *Statement:
		return e.statement(b, width)
	case *Input:
		return e.input(b, width)
	case *Steps:
		return e.steps(b, width)
	case *Beside:
		return e.beside(b, width)
	case *Check:
		return e.check(b, width)
	case *Caution:
		return e.caution(b, width)
	case *Drawing:
		return e.drawing(b, width)
	case *PageBreak:
		return []*piece{{box: &Box{Kind: "page-break", Pos: b.Pos}, brk: true}}
	case *Anchor:
		if b.Name == "" {
			e.probs.add(b.Pos, "anchor with no name")
		}
		return []*piece{{box: &Box{Kind: "anchor", Pos: b.Pos, W: width, Items: []draw.Item{draw.Anchor{Name: b.Name}}}, keep: true}}
	case nil:
		return nil
	}
	e.probs.add(b.Position(), "layout: unknown block %T", b)
	return nil
}

// paginate stacks pieces into pages for sheet si.
func (e *engine) paginate(si int, pos source.Position, ps []*piece, out *Pages) {
	var page *Page
	y, empty := 0.0, true
	bottom := e.bodyY + e.bodyH
	newPage := func() {
		page = &Page{W: float64(e.tpl.Page.Width), H: float64(e.tpl.Page.Height), Sheet: si}
		if n := len(out.Pages); n > 0 && out.Pages[n-1].Sheet == si {
			page.Number = out.Pages[n-1].Number + 1
		} else {
			page.Number = 1
		}
		out.Pages = append(out.Pages, page)
		y, empty = e.bodyY, true
	}
	place := func(p *piece, gap float64) {
		b := p.box
		if empty {
			gap = 0
		}
		b.move(e.bodyX, y+gap)
		page.Boxes = append(page.Boxes, b)
		y += gap + b.H
		empty = false
	}
	newPage()
	for i := 0; i < len(ps); i++ {
		p := ps[i]
		if p.brk {
			if !empty {
				newPage()
			}
			continue
		}
		gap := p.before
		if empty {
			gap = 0
		}
		need := gap + p.box.H
		chain := need
		for j := i; ps[j].keep && j+1 < len(ps) && !ps[j+1].brk; j++ {
			chain += ps[j+1].before + ps[j+1].box.H
		}
		if chain <= e.bodyH {
			need = chain
		}
		if y+need > bottom+1e-6 && !empty {
			newPage()
			if p.head != nil {
				place(clonePiece(p.head), 0)
			}
		}
		if p.box.H > e.bodyH+1e-6 {
			e.probs.add(p.box.Pos, "%s is %.0f pt tall and cannot fit on a page (%.0f pt of text height)", kindName(p.box.Kind), p.box.H, e.bodyH)
		}
		place(p, p.before)
	}
}

func kindName(k string) string {
	switch k {
	case "statement", "input", "check", "steps":
		return "this calculation line"
	case "row":
		return "this table row"
	}
	return "this " + k
}

// clonePiece deep-copies a piece's box (a table header placed again).
func clonePiece(p *piece) *piece {
	c := *p
	c.box = cloneBox(p.box)
	return &c
}

func cloneBox(b *Box) *Box {
	c := *b
	c.Items = b.Items[:len(b.Items):len(b.Items)] // items never change once set
	c.Kids = make([]*Box, len(b.Kids))
	for i, k := range b.Kids {
		c.Kids[i] = cloneBox(k)
	}
	if len(b.Kids) == 0 {
		c.Kids = nil
	}
	return &c
}

// shift moves pieces right by dx.
func shift(ps []*piece, dx float64) {
	for _, p := range ps {
		p.box.move(dx, 0)
	}
}

// checkLinks reports duplicate anchors and links to anchors that do not
// exist (the PDF writer would otherwise write a dangling link).
func (e *engine) checkLinks(out *Pages) {
	anchors := map[string]source.Position{}
	type ref struct {
		target string
		pos    source.Position
	}
	var links []ref
	for _, pg := range out.Pages {
		for _, b := range pg.Boxes {
			b.Walk(func(b *Box) {
				for _, it := range b.Items {
					switch it := it.(type) {
					case draw.Anchor:
						if prev, dup := anchors[it.Name]; dup {
							e.probs.add(b.Pos, "anchor %q is defined twice (first at %s)", it.Name, prev)
						} else {
							anchors[it.Name] = b.Pos
						}
					case draw.Link:
						links = append(links, ref{it.Target, b.Pos})
					}
				}
			})
		}
	}
	for _, l := range links {
		if _, ok := anchors[l.target]; !ok {
			e.probs.add(l.pos, "link to %q, which is not an anchor in this document", l.target)
		}
	}
}

func joinNonEmpty(sep string, parts ...string) string {
	s := ""
	for _, p := range parts {
		if p == "" {
			continue
		}
		if s != "" {
			s += sep
		}
		s += p
	}
	return s
}
