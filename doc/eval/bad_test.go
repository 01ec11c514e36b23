package eval_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/badcase"
)

// TestBad runs the evaluation-stage cases of testdata/bad/eval (see
// testdata/bad/README.md): the input parses, and evaluation must report
// exactly the annotated diagnostics. Like plinth itself, it evaluates
// after parse errors too, so each case lists every error of the run.
func TestBad(t *testing.T) {
	n := badcase.Run(t, "../../testdata/bad/eval", func(path string) source.List {
		p, diags := load.Path(path)
		if p == nil {
			return diags
		}
		pkg, d := parse.Package(p)
		diags.Append(d)
		_, d = eval.Package(pkg, eval.Options{Prior: diags})
		return append(diags, d...)
	})
	if n < 2 {
		t.Errorf("only %d cases", n)
	}
}
