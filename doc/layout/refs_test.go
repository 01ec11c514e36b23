package layout_test

import (
	"strconv"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
)

// pageTexts lists the text of every line box on every page.
func pageTexts(p *layout.Pages) []string {
	var out []string
	for _, pg := range p.Pages {
		var b strings.Builder
		for _, bx := range pg.Boxes {
			bx.Walk(func(bx *layout.Box) {
				for _, it := range bx.Items {
					if t, ok := it.(draw.Text); ok {
						b.WriteString(t.Text + " ")
					}
				}
			})
		}
		out = append(out, b.String())
	}
	return out
}

// TestPageRefs: the layout fills in page references once it knows where
// the anchors land, a sheet's pages as a range, and refuses a reference to
// an anchor the document does not have.
func TestPageRefs(t *testing.T) {
	var long []layout.Block
	for i := 0; i < 60; i++ {
		long = append(long, para(10+i, strings.Repeat("Filler text to push the anchor onto a later page. ", 6)))
	}
	first := sheet(&layout.Para{Pos: at(2), Runs: []layout.Run{
		txt("See "), {Page: layout.PageRef{Anchor: "far", Prefix: "page "}, Link: "far", Own: true},
		txt("; the second sheet is on pages "), {Page: layout.PageRef{Anchor: "two", Sheet: true}, Own: true}, txt("."),
	}})
	second := first.Sheets[0]
	second.Blocks = append([]layout.Block{&layout.Anchor{Pos: at(1), Name: "two"}}, long...)
	second.Blocks = append(second.Blocks, &layout.Anchor{Pos: at(90), Name: "far"}, para(91, "The far place."))
	doc := first
	doc.Sheets = append(doc.Sheets, second)
	var total int
	doc.Progress = func(_, n int) { total = n }
	p, d := layout.Document(doc)
	if d.HasErrors() {
		t.Fatal(d)
	}
	n := len(p.Pages)
	if n < 3 {
		t.Fatalf("%d pages: the second sheet should run onto a second page", n)
	}
	text := pageTexts(p)
	want := []string{"page " + strconv.Itoa(n), "pages 2–" + strconv.Itoa(n)}
	for _, w := range want {
		if !strings.Contains(text[0], w) {
			t.Errorf("first page lacks %q:\n%s", w, text[0])
		}
	}
	if strings.Contains(text[0], "—") {
		t.Errorf("a placeholder is left on the first page:\n%s", text[0])
	}
	if total != 3 {
		t.Errorf("%d sheet layouts, want 3 (both sheets, then the first again with its pages)", total)
	}

	bad := sheet(&layout.Para{Pos: at(4), Runs: []layout.Run{{Page: layout.PageRef{Anchor: "nowhere", Prefix: "page "}, Own: true}}})
	if _, d := layout.Document(bad); len(d) != 1 || d[0].Error() != `s.md:4:1: page reference to "nowhere", which is not an anchor in this document` {
		t.Errorf("missing anchor: %v", d)
	}
}
