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
	diags source.List
	fills map[PageRef]string // the text of each page reference known so far (refs.go)
	used  map[PageRef]refUse // the page references set in this sheet, with their text
	// the text column of every page
	bodyX, bodyY, bodyW, bodyH float64
	num                        [4]int // heading counters of the current sheet
	listDepth                  int
	refCalls                   int    // page references set so far (reuse.go)
	sp                         space  // word and frag chunks (space.go)
	pre                        preset // a formula shortLine set, for the line set alone (steps.go)
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
	// the top-level block of the sheet it comes from and its place among
	// that block's pieces (set by sheetBlocks)
	block, idx int
}

// Document lays out doc: every sheet's body into pages, the page
// references filled in (refs.go: a sheet whose filled text changes is laid
// out again, a bounded number of times), then the title block, variant
// banner and footer on each page. Problems come back as diagnostics at
// the source span of the block they concern, every one found, sorted; no
// pages are returned then.
func Document(doc Doc) (pages *Pages, diags source.List) {
	defer func() {
		if r := recover(); r != nil { // a defect here must not take the caller down
			pages, diags = nil, internal(doc, fmt.Sprintf("layout: internal error: %v", r))
		}
	}()
	if len(doc.Sheets) == 0 {
		return nil, internal(doc, "layout: no sheets to lay out")
	}
	tpl := doc.Template
	if tpl == nil {
		var err error
		if tpl, err = BuiltinTemplate("a4"); err != nil {
			return nil, internal(doc, err.Error())
		}
	}
	e := &engine{tpl: tpl}
	e.bodyX, e.bodyY, e.bodyW, e.bodyH = tpl.body()
	banner := e.variantBanner(doc.Info.Variant)
	if banner != nil {
		e.bodyY += banner.H + 8
		e.bodyH -= banner.H + 8
	}
	laid, err := e.passes(doc)
	if err != nil {
		return nil, internal(doc, err.Error())
	}
	for si := range laid {
		laid[si].compact()
	}
	out := &Pages{Info: doc.Info}
	for si := range doc.Sheets {
		sh := &doc.Sheets[si]
		title := sh.Bookmark
		if title == "" {
			title = joinNonEmpty(" ", sh.Fields.Calc, sh.Fields.Title)
		}
		if title == "" {
			title = fmt.Sprintf("Sheet %d", si+1)
		}
		out.Outline = append(out.Outline, Bookmark{Title: title, Page: len(out.Pages)})
		out.Pages = append(out.Pages, laid[si].pages...)
		e.diags = append(e.diags, laid[si].diags...)
	}
	e.furnish(doc, out, banner)
	markChanges(out, doc.Bars)
	e.checkLinks(laid)
	if e.diags.HasErrors() {
		e.diags.Sort()
		return nil, e.diags
	}
	return out, nil
}

// internal is a problem of the layout itself, not of a block: reported
// at the document's first file (its path only), so it still says where.
func internal(doc Doc, msg string) source.List {
	d := source.Diagnostic{Msg: msg}
	if len(doc.Sheets) > 0 && doc.Sheets[0].Pos.File != nil {
		d.Path = doc.Sheets[0].Pos.File.Path
	}
	return source.List{d}
}

// laidSheet is one sheet laid out and paginated: its pages (Sheet set,
// numbered within the sheet), the problems found, and the text each page
// reference in it was set with.
type laidSheet struct {
	pages []*Page
	diags source.List
	refs  map[PageRef]refUse
	marks []mark // its anchors and links, in the order drawn
	// when it may be laid out again (it set a page reference, reuse.go):
	// each top-level block's heading numbers, problems and, for those
	// that set a page reference, the shape of its pieces and where they
	// went; and the problems of the pagination
	blocks    []laidBlock
	pageDiags source.List
}

// mark is an anchor or a link as laid out: its name (or target), the
// page of its sheet it is on (from 0) and the span of its box. The
// anchors and links are read off the boxes once, when the sheet is
// paginated, so a sheet's boxes may go (doc.Final) before the anchors
// are counted and the links checked.
type mark struct {
	link      bool
	name      string
	page, seq int // the page of the sheet and the box's place on it
	pos       source.Span
}

// marksOf lists the anchors and links on pages, in the order drawn.
func marksOf(pages []*Page) []mark {
	var out []mark
	for pi, pg := range pages {
		for j, b := range pg.Boxes {
			out = appendMarks(out, b, pi, j)
		}
	}
	return out
}

// appendMarks adds the anchors and links of box b, the seq-th of page.
func appendMarks(out []mark, b *Box, page, seq int) []mark {
	b.Walk(func(b *Box) {
		for _, it := range b.Items {
			switch it := it.(type) {
			case draw.Anchor:
				out = append(out, mark{name: it.Name, page: page, seq: seq, pos: b.Pos})
			case draw.Link:
				out = append(out, mark{link: true, name: it.Target, page: page, seq: seq, pos: b.Pos})
			}
		}
	})
	return out
}

// streams reports whether final sheets go to doc.Final.
func streams(doc Doc) bool { return doc.Final != nil && doc.Bars == nil }

// sheets lays out and paginates the sheets numbered in which, in
// parallel: each is independent of the others (a page reference's text
// comes from fills, read only). Each sheet gets its own copy of the
// engine state. done counts the sheets finished for doc.Progress, out of
// total.
func (e *engine) sheets(doc Doc, which []int, fills map[PageRef]string, out []laidSheet, done *int, total int) error {
	fails := make([]error, len(doc.Sheets))
	workers := min(runtime.GOMAXPROCS(0), len(which))
	next := make(chan int)
	var wg sync.WaitGroup
	var mu sync.Mutex
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
					fresh := func() *engine {
						se := *e
						se.diags, se.num, se.listDepth = nil, [4]int{}, 0
						se.fills, se.used = fills, map[PageRef]refUse{}
						return &se
					}
					if out[si].blocks == nil || !fresh().again(doc, si, &out[si]) {
						out[si] = fresh().whole(doc, si)
					}
				}()
				if doc.Progress != nil {
					mu.Lock()
					*done++
					doc.Progress(*done, total)
					mu.Unlock()
				}
			}
		}()
	}
	for _, si := range which {
		next <- si
	}
	close(next)
	wg.Wait()
	for _, si := range which {
		if fails[si] != nil {
			return fails[si]
		}
	}
	return nil
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
			e.diags.Add(b.Pos, "anchor with no name")
		}
		return []*piece{{box: &Box{Kind: "anchor", Pos: b.Pos, W: width, Items: []draw.Item{draw.Anchor{Name: b.Name}}}, keep: true}}
	case nil:
		return nil
	}
	e.diags.Add(b.Where(), "layout: unknown block %T", b)
	return nil
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
func (e *engine) checkLinks(laid []laidSheet) {
	anchors := map[string]source.Span{}
	var links []mark
	for _, ls := range laid {
		for _, m := range ls.marks {
			if m.link {
				links = append(links, m)
			} else if prev, dup := anchors[m.name]; dup {
				e.diags.Add(m.pos, "anchor %q is defined twice (first at %s)", m.name, prev)
			} else {
				anchors[m.name] = m.pos
			}
		}
	}
	for _, l := range links {
		if _, ok := anchors[l.name]; !ok {
			e.diags.Add(l.pos, "link to %q, which is not an anchor in this document", l.name)
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
