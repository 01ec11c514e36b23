package eval_test

import (
	"os"
	"path/filepath"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// FuzzEval parses and evaluates one arbitrary sheet: no panic, and every
// diagnostic points inside the file. Seeded from the examples and the
// evaluation bad-input cases.
func FuzzEval(f *testing.F) {
	for _, glob := range []string{"../../examples/*/*.md", "../../testdata/bad/eval/*.md", "../../testdata/bad/eval/*/*.md"} {
		paths, _ := filepath.Glob(glob)
		for _, p := range paths {
			data, err := os.ReadFile(p)
			if err != nil {
				f.Fatal(err)
			}
			f.Add(data)
		}
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		file := source.NewFile("f.md", data)
		s, prior := parse.Sheet(file)
		if s == nil {
			return
		}
		// Evaluated after parse errors too, as plinth does.
		_, diags := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{file}}, eval.Options{Set: []string{"B=2m"}, Prior: prior})
		for _, d := range diags {
			if d.Span.File == nil {
				continue
			}
			if d.Span.File == file && (d.Span.Start < 0 || d.Span.End > len(data) || d.Span.Start > d.Span.End) {
				t.Fatalf("diagnostic %q at [%d,%d) outside the file of %d bytes", d.Msg, d.Span.Start, d.Span.End, len(data))
			}
		}
	})
}
