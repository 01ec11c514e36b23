package main

import (
	"bytes"
	"os"
	"path/filepath"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/pdf"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// FuzzPipeline runs the bytes of one sheet through every stage in
// process — parse, evaluate, compose and lay out, write the PDF — and
// requires no panic, diagnostics inside the file, and a PDF whenever no
// stage reported an error. Seeded from the examples and testdata/bad:
//
//	go test -fuzz FuzzPipeline -fuzztime 10m -fuzzminimizetime 2s ./cmd/plinth
func FuzzPipeline(f *testing.F) {
	for _, glob := range []string{"../../examples/*/*.md", "../../testdata/bad/*.md", "../../testdata/bad/eval/*.md", "../../testdata/fuzz/pipeline/*.md"} {
		paths, _ := filepath.Glob(glob)
		for _, p := range paths {
			if data, err := os.ReadFile(p); err == nil {
				f.Add(data)
			}
		}
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		if len(data) > 1<<16 {
			return
		}
		file := source.NewFile("f.md", data)
		s, diags := parse.Sheet(file)
		if s == nil {
			t.Fatal("parse.Sheet returned no sheet")
		}
		pkg := &sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{file}}
		res, ed := eval.Package(pkg, eval.Options{Prior: diags})
		diags.Append(ed)
		for _, d := range diags {
			if d.Span.File == file && (d.Span.Start < 0 || d.Span.End > len(data) || d.Span.Start > d.Span.End) {
				t.Fatalf("diagnostic %q at [%d,%d) outside the file of %d bytes", d.Msg, d.Span.Start, d.Span.End, len(data))
			}
		}
		if diags.HasErrors() || res == nil {
			return
		}
		pages, cd := layOut(res, compose.Options{}, nil, nil)
		if cd.HasErrors() {
			return
		}
		if pages == nil {
			t.Fatal("no pages and no error")
		}
		var buf bytes.Buffer
		if err := pdf.Write(&buf, pages, pdf.Options{Creator: "plinth"}); err != nil {
			t.Fatalf("PDF: %v", err)
		}
		if !bytes.HasPrefix(buf.Bytes(), []byte("%PDF-")) || !bytes.Contains(buf.Bytes(), []byte("%%EOF")) {
			t.Fatal("a half-written PDF")
		}
	})
}
