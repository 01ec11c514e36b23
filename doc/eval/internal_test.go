package eval_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestPanicBecomesError: a defect inside evaluation is reported as an
// internal error at the block being evaluated, never a panic.
func TestPanicBecomesError(t *testing.T) {
	src := "# T\n\n```calc\nx = 1 m\n```\n\n```calc\ny = 2 m\n```\n"
	f := source.NewFile("p.md", []byte(src))
	s, _ := parse.Sheet(f)
	n := 0
	eval.SetTestHook(func(b sheet.Block) {
		if _, ok := b.(*sheet.Calc); ok {
			if n++; n == 2 {
				panic("boom")
			}
		}
	})
	defer eval.SetTestHook(nil)
	_, diags := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{})
	if len(diags) != 1 {
		t.Fatalf("diagnostics %v, want one", diags)
	}
	got := diags[0].Error()
	if !strings.HasPrefix(got, "p.md:7:1: internal error") || !strings.Contains(got, "please report") || !strings.Contains(got, "boom") {
		t.Errorf("got %q", got)
	}
}
