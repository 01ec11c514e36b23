package eval_test

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// TestResultsAsDeclared: every result an analysis defines is declared in
// its kind's spec (calc/kind) with the unit the engine gives it (per
// metre run for a strip) and the spec's meaning as its note. Runs over
// the examples (bearing, settlement with within and tilt, capacity,
// differential) and a Schmertmann and a Burland & Burbidge sheet.
func TestResultsAsDeclared(t *testing.T) {
	var blocks []*eval.Block
	for _, ex := range examples(t) {
		for _, s := range ex.res.Sheets {
			blocks = append(blocks, s.Blocks()...)
		}
	}
	ground := "```ground g\n| layer | top (m) | gamma (kN/m3) | phi' (deg) | c' (kPa) | E' (MPa) | N |\n| --- | --- | --- | --- | --- | --- | --- |\n| Sand | 0 | 18 | 32 | 0 | 20 | 15 |\n```\n\n" +
		"```footing F\nshape = square\nB = 2 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 600 |\n```\n\n"
	for _, m := range []string{"schmertmann", "burland-burbidge"} {
		blocks = append(blocks, evalOne(t, "# T\n\n"+ground+"```settlement F on g\nmethod = "+m+"\n```\n")...)
	}
	seen := map[string]bool{}
	for _, b := range blocks {
		spec := b.Kind.Spec()
		for _, y := range b.Results {
			sym := y.Name[len(b.Name)+1:]
			r, ok := spec.Result(sym)
			if in, ok := strings.CutPrefix(sym, "vary."); ok {
				// one of several inputs a block varies: vary.SYMBOL.result, the
				// input after the meaning
				i := strings.LastIndexByte(in, '.')
				vr, vok := spec.Result(in[i+1:])
				if !vok || vr.When != "vary" || i < 0 || sym != kind.VaryName(in[:i], in[i+1:]) || y.Unit.Name != vr.Unit || y.Note.Value != vr.Meaning+" ("+in[:i]+")" {
					t.Errorf("%s %s: vary result %s %q %q not as declared", b.Kind, b.Name, sym, y.Unit.Name, y.Note.Value)
				}
				seen[b.Kind.String()+" "+sym] = true
				continue
			}
			if _, rowSym, row := strings.Cut(sym, "."); row && len(spec.RowResults) > 0 {
				// a schedule row's result, NAME.ROW.sym: the row's name after the meaning
				rr, rok := spec.RowResult(rowSym)
				if !rok || y.Unit.Name != rr.Unit || !strings.HasPrefix(y.Note.Value, rr.Meaning+" (") {
					t.Errorf("%s %s: row result %s %q %q not as declared", b.Kind, b.Name, sym, y.Unit.Name, y.Note.Value)
				}
				seen[b.Kind.String()+" "+rowSym] = true
				continue
			}
			if !ok {
				t.Errorf("%s %s: %s is not in the spec", b.Kind, b.Name, sym)
				continue
			}
			seen[b.Kind.String()+" "+sym] = true
			want := r.Unit
			if b.Of != nil && b.Of.Model.Shape == site.Strip {
				want = kind.PerRun(want)
			}
			if y.Unit.Name != want {
				t.Errorf("%s %s: %s in %q, spec %q", b.Kind, b.Name, sym, y.Unit.Name, want)
			}
			if y.Note.Value != r.Meaning {
				t.Errorf("%s %s: note %q", b.Kind, b.Name, y.Note.Value)
			}
		}
	}
	if len(seen) < 40 {
		t.Errorf("only %d results seen", len(seen))
	}
}

type example struct {
	pkg *sheet.Package
	res *eval.Result
}

// examples parses and evaluates the packages in examples/, which must
// have no errors.
func examples(t *testing.T) []example {
	t.Helper()
	var out []example
	dirs, _ := filepath.Glob("../../examples/*")
	for _, dir := range dirs {
		if fi, err := os.Stat(dir); err != nil || !fi.IsDir() {
			continue // a package is a folder; the PDF the README's render command writes beside it is not
		}
		lp, d := load.Path(dir)
		if lp == nil {
			t.Fatal(d)
		}
		pkg, _ := parse.Package(lp)
		res, diags := eval.Package(pkg, eval.Options{})
		if diags.HasErrors() {
			t.Fatal(diags)
		}
		out = append(out, example{pkg, res})
	}
	return out
}
