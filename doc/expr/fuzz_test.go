package expr_test

import (
	"bufio"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
)

var fuzzEnv = expr.MapEnv{
	"x": {V: 2}, "B": units.MustParse("m").Of(2.4), "L": units.MustParse("m").Of(3),
	"phi'": units.MustParse("deg").Of(30), "q": units.MustParse("kPa").Of(100),
}

func seedLines(f *testing.F) {
	file, err := os.Open("testdata/lines.txt")
	if err != nil {
		f.Fatal(err)
	}
	defer file.Close()
	sc := bufio.NewScanner(file)
	for sc.Scan() {
		f.Add(sc.Text(), 0)
	}
	// Every line of the example sheets (statements, table rows, prose).
	sheets, _ := filepath.Glob("../../examples/*/*.md")
	for _, path := range sheets {
		data, err := os.ReadFile(path)
		if err != nil {
			f.Fatal(err)
		}
		for _, l := range strings.Split(string(data), "\n") {
			f.Add(l, 100)
		}
	}
	for _, s := range []string{"", "(", ")", "x = ((((", "check", "check =", "x = 2 m*", "x = 1e", "x = 3 -> :", "{", "x = φ′", "x = \xff", "x = 2^-^2", "x = min(,)"} {
		f.Add(s, 17)
	}
}

// FuzzLexParse: no panic on any line, and every offset reported (errors,
// nodes, display unit, note) lies within [base, base+len(line)].
func FuzzLexParse(f *testing.F) {
	seedLines(f)
	f.Fuzz(func(t *testing.T, line string, base int) {
		if base < 0 || base > 1<<30 {
			base = 0
		}
		lo, hi := base, base+len(line)
		in := func(what string, pos, end int) {
			if pos < lo || end > hi || pos > end {
				t.Fatalf("%q: %s span [%d,%d) outside [%d,%d]", line, what, pos, end, lo, hi)
			}
		}
		checkErrs := func(errs []expr.Error) {
			for _, e := range errs {
				in("error "+e.Msg, e.Pos, e.End)
			}
		}
		checkNode := func(n expr.Node) {
			expr.Inspect(n, func(n expr.Node) bool {
				p, e := n.Span()
				in("node", p, e)
				return true
			})
		}
		s, errs := expr.ParseLine(line, base)
		checkErrs(errs)
		if s == nil {
			return
		}
		p, e := s.Span()
		in("statement", p, e)
		var note string
		var notePos int
		switch s := s.(type) {
		case *expr.Assign:
			in("symbol", s.Sym.Pos, s.Sym.End)
			checkNode(s.X)
			if s.Display != nil {
				in("display", s.Display.Pos, s.Display.End)
			}
			note, notePos = s.Note, s.NotePos
		case *expr.Check:
			checkNode(s.L)
			checkNode(s.R)
			in("comparison", s.OpPos, s.OpEnd)
			note, notePos = s.Note, s.NotePos
		case *expr.Comment:
			note, notePos = s.Text, s.TextPos
		}
		if notePos >= 0 {
			in("note", notePos, notePos+len(note))
		}
		if len(errs) == 0 {
			_, derrs := expr.StmtDims(s, fuzzEnv)
			checkErrs(derrs)
			if a, ok := s.(*expr.Assign); ok {
				_, eerrs := expr.Eval(a.X, fuzzEnv)
				checkErrs(eerrs)
				for _, e := range eerrs {
					if e.Kind == expr.KindInternal {
						t.Fatalf("%q: %v", line, e)
					}
				}
			}
		}
	})
}

func TestSeedLinesParse(t *testing.T) {
	file, err := os.Open("testdata/lines.txt")
	if err != nil {
		t.Fatal(err)
	}
	defer file.Close()
	sc := bufio.NewScanner(file)
	for sc.Scan() {
		if _, errs := expr.ParseLine(sc.Text(), 0); len(errs) > 0 {
			t.Errorf("%q: %v", sc.Text(), errs)
		}
	}
}
