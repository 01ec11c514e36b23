package eval_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestSymbolExpr: a symbol keeps the expression it was evaluated from
// with its place in the file — a statement's right side and a table
// cell's (so compose prints the cell's formula without parsing it again).
func TestSymbolExpr(t *testing.T) {
	src := "# T\n\n```calc\nG = 100 kN/m\nQ = G * 2\n```\n\n```footing F1\nshape = strip\nB = 1 m\nD = 1 m\n\n" +
		"| action | type      | V (kN/m) | source |\n| ---    | ---       | ---      | ---    |\n| Dead   | permanent | G + Q    | frame  |\n```\n"
	f := source.NewFile("p.md", []byte(src))
	s, pd := parse.Sheet(f)
	res, ed := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{})
	if pd.HasErrors() || ed.HasErrors() {
		t.Fatal(pd, ed)
	}
	for name, want := range map[string]string{"Q": "G * 2", "F1.dead.V": "G + Q"} {
		y := res.Sheets[0].Lookup(name)
		if y == nil || y.Expr == nil {
			t.Fatalf("%s: no symbol or no expression", name)
		}
		pos, end := y.Expr.Span()
		if got := src[pos:end]; got != want {
			t.Errorf("%s: expression at [%d,%d) reads %q, want %q", name, pos, end, got, want)
		}
	}
}
