package source_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/source"
)

func TestPosition(t *testing.T) {
	f := source.NewFile("a.md", []byte("ab\nφ′ = 30°\r\nx"))
	for _, c := range []struct {
		off       int
		line, col int
	}{
		{0, 1, 1}, {2, 1, 3}, {3, 2, 1},
		{3 + len("φ′ = "), 2, 6}, // multibyte runes count as one column
		{len("ab\nφ′ = 30°\r\n"), 3, 1},
		{1000, 3, 2}, // clamps to the end
	} {
		p := f.Position(c.off)
		if p.Line != c.line || p.Col != c.col {
			t.Errorf("Position(%d) = %d:%d, want %d:%d", c.off, p.Line, p.Col, c.line, c.col)
		}
	}
}

func TestListSortAndDedupe(t *testing.T) {
	a := source.NewFile("a.md", []byte("one\ntwo\n"))
	b := source.NewFile("b.md", []byte("x\n"))
	var l source.List
	l.Add(source.Span{File: b, Start: 0, End: 1}, "third")
	l.Add(source.Span{File: a, Start: 4, End: 5}, "second")
	l.Add(source.Span{File: a, Start: 0, End: 1}, "first")
	l.Add(source.Span{File: a, Start: 0, End: 1}, "first")
	l.Sort()
	want := []string{"a.md:1:1: first", "a.md:2:1: second", "b.md:1:1: third"}
	if len(l) != len(want) {
		t.Fatalf("got %d diagnostics: %v", len(l), l)
	}
	for i, w := range want {
		if l[i].Error() != w {
			t.Errorf("[%d] = %q, want %q", i, l[i].Error(), w)
		}
	}
}
