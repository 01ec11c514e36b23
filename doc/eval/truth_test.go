package eval_test

import (
	"fmt"
	"strconv"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// evalSheet evaluates one sheet's text and fails on any diagnostic.
func evalSheet(t *testing.T, src string, set ...string) (*eval.Result, *sheet.Sheet) {
	t.Helper()
	f := source.NewFile("t.md", []byte(src))
	s, prior := parse.Sheet(f)
	res, diags := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{Prior: prior, Set: set})
	if len(prior) > 0 || len(diags) > 0 {
		t.Fatalf("%v %v in\n%s", prior, diags, src)
	}
	return res, s
}

// interps lists a sheet's prose interpolations in order.
func interps(s *sheet.Sheet) []*sheet.Interp {
	var out []*sheet.Interp
	for _, b := range s.Body {
		if p, ok := b.(*sheet.Paragraph); ok {
			for _, in := range p.Text {
				if x, ok := in.(*sheet.Interp); ok {
					out = append(out, x)
				}
			}
		}
	}
	return out
}

func order(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// number reads the number at the start of a printed value ("24.96 mm").
func number(t *testing.T, s string) float64 {
	t.Helper()
	f, _, _ := strings.Cut(s, " ")
	x, err := strconv.ParseFloat(f, 64)
	if err != nil {
		t.Fatalf("%q: %v", s, err)
	}
	return x
}

// TestNeverRoundsOntoLimit: no check line and no prose interpolation of a
// check's side prints onto or across the value it is compared with
// (README "Display precision"). Generated cases: settlements 24.950 to
// 25.050 mm against 25 mm and utilisations 0.995 to 1.005 against 1, in
// steps of 0.001, each interpolated at 0 and 1 decimals and automatically.
func TestNeverRoundsOntoLimit(t *testing.T) {
	for i := 0; i <= 100; i++ {
		s := 24.95 + float64(i)*0.001
		u := 0.995 + float64(i)*0.0001
		src := fmt.Sprintf("# T\n\n```calc\ns = %.3f mm\ns_lim = 25 mm\ncheck s <= s_lim\nu = %.4f\ncheck u <= 1\n```\n\n"+
			"It settles {s -> mm:0}, {s -> mm:1}, {s -> m:2} and {s}; it is {u} utilised.\n", s, u)
		res, sh := evalSheet(t, src)
		ev := res.Sheets[0]
		for _, c := range res.Checks {
			l, r := c.Values()
			if order(number(t, l), number(t, r)) != order(c.L.V, c.R.V) {
				t.Errorf("check %s printed %s %s %s", c.Text, l, c.Relation(), r)
			}
			if !c.OK && c.Relation() != ">" {
				t.Errorf("failing check %s printed with %s, want >", c.Text, c.Relation())
			}
		}
		limits := []float64{25, 25, 0.025, 25, 1}
		truth := []int{order(s, 25), order(s, 25), order(s, 25), order(s, 25), order(u, 1)}
		for k, in := range interps(sh) {
			got := ev.Interp(in)
			if got == nil {
				t.Fatalf("interpolation %d unresolved", k)
			}
			if x := number(t, got.Text); order(x, limits[k]) != truth[k] {
				t.Errorf("s = %.3f mm, u = %.4f: {%s} printed %q against %g", s, u, in.Src.Value, got.Text, limits[k])
			}
		}
	}
}

// A failing check prints the relation that holds.
func TestFailingRelation(t *testing.T) {
	res, _ := evalSheet(t, "# T\n\n```calc\ns = 29.04 mm\ncheck s <= 25 mm\ncheck s >= 30 mm\ncheck s < 29.04 mm\ncheck s <= 30 mm\n```\n")
	want := []string{">", "<", ">=", "<="}
	for i, c := range res.Checks {
		l, r := c.Values()
		if c.Relation() != want[i] {
			t.Errorf("%s: %s %s %s %s, want %s", c.Text, l, c.Relation(), r, c.Verdict(), want[i])
		}
	}
}

// TestExampleProseApart: in the example packages, every prose
// interpolation of a symbol that is compared with something (a side of a
// check, a utilisation) stands on the same side of each compared value as
// the symbol does (the pad's conclusion: 24.59 mm against 25 mm prints
// 24.6 mm at mm:0).
func TestExampleProseApart(t *testing.T) {
	n := 0
	for _, ex := range examples(t) {
		pkg, res := ex.pkg, ex.res
		for i, s := range res.Sheets {
			for _, in := range interps(pkg.Sheets[i]) {
				it := s.Interp(in)
				if it == nil || len(it.Symbol.Bounds) == 0 {
					continue
				}
				n++
				x, f := number(t, it.Text), it.Unit.Factor
				if f == 0 {
					f = 1
				}
				for _, b := range it.Symbol.Bounds {
					bu, _ := strconv.ParseFloat(strconv.FormatFloat(b/f, 'g', 12, 64), 64) // the bound in the printed unit
					if want := order(it.Symbol.Q.V, b); want != 0 && order(x, bu) != want {
						t.Errorf("%s: {%s} printed %q against %g (SI)", s.Name(), in.Src.Value, it.Text, b)
					}
				}
			}
		}
	}
	if n < 3 {
		t.Errorf("only %d interpolations of compared symbols found", n)
	}
}
