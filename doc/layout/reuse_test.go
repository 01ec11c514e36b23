package layout_test

import (
	"bytes"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout"
)

// TestRelayoutReusesBlocks: a sheet laid out again for a page reference
// (its other blocks' pieces taken from the first layout, reuse.go) comes
// out as the same sheet laid out once with the reference's final text in
// its place: the same boxes, heading numbers and all.
func TestRelayoutReusesBlocks(t *testing.T) {
	var long []layout.Block
	for i := 0; i < 60; i++ {
		long = append(long, para(10+i, strings.Repeat("Filler text to push the anchor onto a later page. ", 6)))
	}
	body := func(ref layout.Run) []layout.Block {
		return []layout.Block{
			&layout.Heading{Pos: at(2), Level: 1, Runs: []layout.Run{txt("First")}},
			para(3, "Before the reference, a paragraph of its own."),
			&layout.Heading{Pos: at(4), Level: 2, Runs: []layout.Run{txt("Second")}},
			&layout.Para{Pos: at(5), Runs: []layout.Run{txt("See "), ref, txt(" for the far place.")}},
			&layout.Heading{Pos: at(6), Level: 2, Runs: []layout.Run{txt("Third")}},
			&layout.Table{Pos: at(7), Header: []layout.Cell{{txt("a")}, {txt("b")}},
				Rows: []layout.Row{{Pos: at(8), Cells: []layout.Cell{{txt("1")}, {txt("2")}}}}},
			&layout.Heading{Pos: at(9), Level: 1, Runs: []layout.Run{txt("Fourth")}},
		}
	}
	far := func(first []layout.Block) layout.Doc {
		doc := sheet(first...)
		second := doc.Sheets[0]
		second.Blocks = append(append([]layout.Block(nil), long...), &layout.Anchor{Pos: at(90), Name: "far"}, para(91, "The far place."))
		doc.Sheets = append(doc.Sheets, second)
		return doc
	}
	withRef, d := layout.Document(far(body(layout.Run{Page: layout.PageRef{Anchor: "far", Prefix: "page "}, Own: true})))
	if d.HasErrors() {
		t.Fatal(d)
	}
	text := pageTexts(withRef)[0]
	f := strings.Fields(text[strings.Index(text, "See ")+4:])
	final := f[0] + " " + f[1] // "page 5"
	plain, d := layout.Document(far(body(layout.Run{Text: final, Own: true})))
	if d.HasErrors() {
		t.Fatal(d)
	}
	var a, b bytes.Buffer
	if err := withRef.Dump(&a); err != nil {
		t.Fatal(err)
	}
	if err := plain.Dump(&b); err != nil {
		t.Fatal(err)
	}
	if a.String() != b.String() {
		t.Errorf("laid out again with its reference filled, the sheet differs from one set with %q", final)
	}
	for _, w := range []string{"1.1 Second", "1.2 Third", "2 Fourth", "See page "} {
		if !strings.Contains(text, w) {
			t.Errorf("%q missing from the first sheet:\n%s", w, text)
		}
	}
}
