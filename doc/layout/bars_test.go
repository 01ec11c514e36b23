package layout

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestMarkChanges: a statement's line is barred whole; of an engine
// block's many boxes only the first and those printing a changed value;
// title blocks and boxes of other lines never.
func TestMarkChanges(t *testing.T) {
	f := source.NewFile("a.md", []byte(strings.Repeat("    x = 1\n", 10)))
	at := func(line int, kind string, text ...string) *Box {
		b := &Box{Kind: kind, Pos: source.Span{File: f, Start: f.LineStart(line) + 2}, H: 12}
		for _, s := range text {
			b.Items = append(b.Items, draw.Text{Text: s})
		}
		return b
	}
	stmt, other, title := at(5, "statement", "B = 2.6 m"), at(6, "statement", "19.75"), at(5, "title-block")
	head, step1, step2, step3 := at(9, "heading", "Settlement"), at(9, "line", "s_c = 19.75 mm"), at(9, "line", "H = 5 m"), at(9, "line", "x = 119.75 mm")
	pages := &Pages{Pages: []*Page{{Boxes: []*Box{title, stmt, other, head, step1, step2, step3}}}}
	markChanges(pages, &Bars{Letter: "P3", Lines: []BarLine{
		{Line: source.Line{File: f, Line: 5}, Values: []string{"2.6"}},
		{Line: source.Line{File: f, Line: 9}, Values: []string{"19.75"}},
	}})
	barred := func(b *Box) bool {
		for _, it := range b.Items {
			if _, ok := it.(draw.Line); ok {
				return true
			}
		}
		return false
	}
	for _, c := range []struct {
		name string
		b    *Box
		want bool
	}{
		{"statement", stmt, true}, {"other line", other, false}, {"title block", title, false},
		{"block heading", head, true}, {"step with the value", step1, true}, {"step without", step2, false}, {"longer number", step3, false},
	} {
		if got := barred(c.b); got != c.want {
			t.Errorf("%s: barred %v, want %v", c.name, got, c.want)
		}
	}
	if n := len(stmt.Items); n != 3 {
		t.Errorf("statement: %d items, want its text, the bar and the letter", n)
	}
}
