package parse_test

import (
	"os"
	"path/filepath"
	"testing"

	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// FuzzSheet parses arbitrary bytes as a sheet: no panic, and every
// diagnostic and every node span lies inside the file. Seeds: the sheets
// under testdata (here and at the repository root) and examples.
func FuzzSheet(f *testing.F) {
	for _, pattern := range []string{"testdata/*/*/*.md", "../../testdata/bad/*.md",
		"../../testdata/bad/*/*.md", "../../examples/*/*.md", "../../examples/*.md"} {
		files, _ := filepath.Glob(pattern)
		for _, name := range files {
			if text, err := os.ReadFile(name); err == nil {
				f.Add(text)
			}
		}
	}
	f.Add([]byte("---\ntitle: x\n---\n```calc\nq = 1 kPa\n```\n"))
	f.Add([]byte("```ground g\n| a (m) |\n| --- |\n| 1 |\n```\n"))
	f.Fuzz(func(t *testing.T, text []byte) {
		file := source.NewFile("fuzz.md", text)
		s, diags := parse.Sheet(file)
		for _, d := range diags {
			if !inside(d.Span, file) {
				t.Fatalf("diagnostic span %d-%d outside the file (%d bytes): %s", d.Span.Start, d.Span.End, len(text), d.Error())
			}
		}
		check := func(n sheet.Node) {
			if sp := n.Where(); sp.File != nil && !inside(sp, file) {
				t.Fatalf("%T span %d-%d outside the file (%d bytes)", n, sp.Start, sp.End, len(text))
			}
		}
		walk(s.Body, check)
		for _, k := range s.Meta.Keys {
			check(k)
		}
	})
}

func inside(sp source.Span, f *source.File) bool {
	if sp.File == nil {
		return true
	}
	return sp.File == f && 0 <= sp.Start && sp.Start <= sp.End && sp.End <= len(f.Text)
}

// walk calls fn for every node of the tree.
func walk(blocks []sheet.Block, fn func(sheet.Node)) {
	var inl func([]sheet.Inline)
	inl = func(xs []sheet.Inline) {
		for _, x := range xs {
			fn(x)
			if l, ok := x.(*sheet.Link); ok {
				inl(l.Text)
			}
		}
	}
	for _, b := range blocks {
		fn(b)
		switch b := b.(type) {
		case *sheet.Heading:
			inl(b.Text)
		case *sheet.Paragraph:
			inl(b.Text)
		case *sheet.List:
			for _, it := range b.Items {
				fn(it)
				walk(it.Blocks, fn)
			}
		case *sheet.Table:
			for _, c := range b.Header {
				inl(c.Text)
			}
			for _, r := range b.Rows {
				for _, c := range r {
					inl(c.Text)
				}
			}
		case *sheet.Image:
			fn(b.Path)
			inl(b.Caption)
		case *sheet.Caution:
			walk(b.Body, fn)
		case *sheet.Quote:
			walk(b.Body, fn)
		case *sheet.Calc:
			for _, l := range b.Lines {
				fn(l)
			}
		case *sheet.Ground:
			lines(b.Lines, b.Table, fn)
		case *sheet.Footing:
			lines(b.Lines, b.Table, fn)
		case *sheet.Analysis:
			lines(b.Lines, nil, fn)
		}
	}
}

func lines(ls []sheet.Line, g *sheet.Grid, fn func(sheet.Node)) {
	for _, l := range ls {
		fn(l)
		if o, ok := l.(*sheet.Option); ok {
			fn(o.Name)
			fn(o.Value)
		}
	}
	if g == nil {
		return
	}
	fn(g)
	for _, c := range g.Columns {
		fn(c.Name)
		fn(c.Unit)
	}
	for _, r := range g.Rows {
		for _, c := range r.Cells {
			fn(c)
		}
	}
}
