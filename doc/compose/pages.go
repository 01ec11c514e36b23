package compose

import (
	"fmt"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/source"
)

// Pages composes the package and lays it out. The cover's contents list
// gives each sheet's page numbers, so the layout runs a second time once
// they are known (and again in the rare case that filling them in moves
// a page break). Layout problems come back as diagnostics at the source
// line they concern.
func Pages(res *eval.Result, opt Options) (pages *layout.Pages, diags source.List) {
	c := newComposer(res, opt)
	defer func() {
		if r := recover(); r != nil {
			pages = nil
			diags = append(c.diags, source.Diagnostic{Path: c.res.Src.Dir, Msg: fmt.Sprintf("compose: internal error: %v", r)})
		}
	}()
	doc := c.document()
	if c.diags.HasErrors() {
		c.diags.Sort()
		return nil, c.diags
	}
	doc.Progress = c.opt.Progress
	for pass := 0; pass < 3; pass++ {
		var ld source.List
		pages, ld = layout.Document(doc)
		if ld.HasErrors() {
			c.diags.Append(ld)
			c.diags.Sort()
			return nil, c.diags
		}
		changed := c.contents != nil && c.fillPages(pages)
		if c.fillRefs(pages) {
			changed = true
		}
		if !changed {
			break
		}
	}
	c.diags.Sort()
	return pages, c.diags
}

// fillPages writes each sheet's page range into the contents table and
// reports whether anything changed.
func (c *composer) fillPages(pages *layout.Pages) bool {
	first := map[int]int{}
	last := map[int]int{}
	for i, pg := range pages.Pages {
		if _, ok := first[pg.Sheet]; !ok {
			first[pg.Sheet] = i + 1
		}
		last[pg.Sheet] = i + 1
	}
	changed := false
	for ri := range c.contents.Rows {
		if ri >= len(c.sheetRows) {
			break
		}
		sh := c.sheetRows[ri]
		a, ok := first[sh]
		if !ok {
			continue
		}
		text := fmt.Sprint(a)
		if b := last[sh]; b != a {
			text = fmt.Sprintf("%d–%d", a, b)
		}
		cell := c.contents.Rows[ri].Cells[0]
		if len(cell) != 1 || cell[0].Text != text {
			c.contents.Rows[ri].Cells[0] = layout.Cell{txt(text)}
			changed = true
		}
	}
	return changed
}

// fillRefs writes the page of each referenced anchor into its run and
// reports whether anything changed.
func (c *composer) fillRefs(pages *layout.Pages) bool {
	at := map[string]int{}
	for i, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			b.Walk(func(b *layout.Box) {
				for _, it := range b.Items {
					if a, ok := it.(draw.Anchor); ok {
						if _, seen := at[a.Name]; !seen {
							at[a.Name] = i + 1
						}
					}
				}
			})
		}
	}
	changed := false
	for _, r := range c.pageRefs {
		n, ok := at[r.anchor]
		if !ok {
			continue
		}
		if t := fmt.Sprintf(r.format, n); r.run.Text != t {
			r.run.Text = t
			changed = true
		}
	}
	return changed
}
