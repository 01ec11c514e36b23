package expr_test

import (
	"fmt"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/expr"
)

// sexp writes a tree as an S-expression for the table tests.
func sexp(n expr.Node) string {
	switch n := n.(type) {
	case *expr.Num:
		if n.HasUnit {
			return n.Text + "[" + n.Unit.Name + "]"
		}
		return n.Text
	case *expr.Ident:
		return n.Name
	case *expr.Const:
		return n.Name
	case *expr.Unary:
		return "(" + n.Op + " " + sexp(n.X) + ")"
	case *expr.Binary:
		return "(" + n.Op + " " + sexp(n.L) + " " + sexp(n.R) + ")"
	case *expr.Paren:
		return "{" + sexp(n.X) + "}"
	case *expr.Call:
		parts := []string{n.Fn}
		for _, a := range n.Args {
			parts = append(parts, sexp(a))
		}
		return "(" + strings.Join(parts, " ") + ")"
	case *expr.Bad:
		return "BAD"
	}
	return fmt.Sprintf("%T", n)
}

// Grammar rows: our own grammar (doc.go); each row shows the tree.
func TestParseExpr(t *testing.T) {
	for _, r := range []struct{ in, want string }{
		{"-2^2", "(- (^ 2 2))"},
		{"-x^2", "(- (^ x 2))"},
		{"2^3^2", "(^ 2 (^ 3 2))"},
		{"2^-1", "(^ 2 (- 1))"},
		{"2^-x^2", "(^ 2 (- (^ x 2)))"},
		{"(-2)^2", "(^ {(- 2)} 2)"},
		{"a - b - c", "(- (- a b) c)"},
		{"a / b * c", "(* (/ a b) c)"},
		{"a + b * c ^ d", "(+ a (* b (^ c d)))"},
		{"a × b · c", "(* (* a b) c)"},
		{"a − b ÷ c", "(- a (/ b c))"},
		{"1e3", "1e3"},
		{"2.5E-4", "2.5E-4"},
		{".5", ".5"},
		{"12", "12"},
		{"18 kN/m3", "18[kN/m3]"},
		{"18 kN/m^3", "18[kN/m3]"},
		{"18 kN/m³", "18[kN/m3]"},
		{"3 m2/yr", "3[m2/yr]"},
		{"30deg", "30[deg]"},
		{"30 °", "30[°]"},
		{"30°", "30[°]"},
		{"1e3 kPa", "1e3[kPa]"},
		{"0.12 m2/MN", "0.12[m2/MN]"},
		{"2 kN*m", "2[kN*m]"},
		{"5%", "5[%]"},
		{"2 kN / h", "(/ 2[kN] h)"},
		{"2 kN/h", "2[kN/h]"},
		{"2 m ^ 2", "(^ 2[m] 2)"},
		{"2 m^2", "2[m2]"},
		{"2 m*3", "(* 2[m] 3)"},
		{"2 m-1 m", "(- 2[m] 1[m])"},
		{"phi'", "phi'"},
		{"phi'_d", "phi'_d"},
		{"gamma'_d + gamma_sat", "(+ gamma'_d gamma_sat)"},
		{"q_ult_net / B'", "(/ q_ult_net B')"},
		{"φ + γ", "(+ φ γ)"},
		{"F1.R_d * F2_vesic.util", "(* F1.R_d F2_vesic.util)"},
		{"pi * D^2 / 4", "(/ (* pi (^ D 2)) 4)"},
		{"min(a, b, c)", "(min a b c)"},
		{"atan2(y, x)", "(atan2 y x)"},
		{"sqrt(abs(-x))", "(sqrt (abs (- x)))"},
		{"exp(pi*tan(phi'))*tan(45 deg + phi'/2)^2", "(* (exp (* pi (tan phi'))) (^ (tan (+ 45[deg] (/ phi' 2))) 2))"},
		{"((a))", "{{a}}"},
		{"--a", "(- (- a))"},
		{"+a", "(+ a)"},
	} {
		n, errs := expr.ParseExpr(r.in, 0)
		if len(errs) > 0 {
			t.Errorf("ParseExpr(%q): %v", r.in, errs)
			continue
		}
		if got := sexp(n); got != r.want {
			t.Errorf("ParseExpr(%q) = %s, want %s", r.in, got, r.want)
		}
	}
}

// Every node's span, with a base offset: offsets are file offsets.
func TestPositions(t *testing.T) {
	const base = 1000
	line := "q_Ed = (V_d + 18 kN/m3 * B) / sqrt(A') -> kPa:1   # design pressure [S1]"
	s, errs := expr.ParseLine(line, base)
	if len(errs) > 0 {
		t.Fatal(errs)
	}
	a := s.(*expr.Assign)
	at := func(sub string) int { return base + strings.Index(line, sub) }
	check := func(what string, pos, end, wantPos, wantEnd int) {
		t.Helper()
		if pos != wantPos || end != wantEnd {
			t.Errorf("%s: [%d,%d), want [%d,%d)", what, pos, end, wantPos, wantEnd)
		}
	}
	check("statement", a.Pos, a.End, base, base+len(line))
	check("symbol", a.Sym.Pos, a.Sym.End, base, base+4)
	pos, end := a.X.Span()
	check("expression", pos, end, at("("), at(" ->"))
	div := a.X.(*expr.Binary)
	check("operator /", div.OpPos, div.OpEnd, at("/ sqrt"), at("/ sqrt")+1)
	par := div.L.(*expr.Paren)
	check("paren", par.Pos, par.End, at("("), at(") /")+1)
	num := par.X.(*expr.Binary).R.(*expr.Binary).L.(*expr.Num)
	check("number", num.Pos, num.End, at("18"), at(" * B"))
	if num.UnitPos != at("kN") || num.UnitText != "kN/m3" || num.V != 18 || num.Quantity().V != 18000 {
		t.Errorf("number: %+v", num)
	}
	call := div.R.(*expr.Call)
	check("call", call.Pos, call.End, at("sqrt"), at(" ->"))
	if call.Lparen != at("(A'") || call.Rparen != at(") ->") || call.FnEnd != at("(A'") {
		t.Errorf("call: %+v", call)
	}
	d := a.Display
	check("display", d.Pos, d.End, at("kPa"), at("kPa")+5)
	if d.Text != "kPa" || d.Decimals != 1 || d.Unit.Name != "kPa" {
		t.Errorf("display: %+v", d)
	}
	if a.Note != "design pressure [S1]" || a.NotePos != at("design") {
		t.Errorf("note %q at %d", a.Note, a.NotePos)
	}
	ids := expr.Idents(a.X)
	var names []string
	for _, id := range ids {
		names = append(names, fmt.Sprintf("%s@%d", id.Name, id.Pos-base))
	}
	if got := strings.Join(names, " "); got != "V_d@8 B@25 A'@35" {
		t.Errorf("Idents = %s", got)
	}
}

func TestParseLine(t *testing.T) {
	s, errs := expr.ParseLine("check q_Ed ≤ q_Rd   # bearing", 0)
	c, ok := s.(*expr.Check)
	if len(errs) > 0 || !ok || c.Op != "<=" || sexp(c.L) != "q_Ed" || sexp(c.R) != "q_Rd" || c.Note != "bearing" || c.OpPos != 11 || c.OpEnd != 14 {
		t.Errorf("check: %#v %v", s, errs)
	}
	for _, op := range []string{"<=", "<", ">=", ">", "=="} {
		s, errs := expr.ParseLine("check a "+op+" b", 0)
		if c, ok := s.(*expr.Check); !ok || len(errs) > 0 || c.Op != op {
			t.Errorf("check op %s: %#v %v", op, s, errs)
		}
	}
	if s, errs := expr.ParseLine("   ", 5); s != nil || errs != nil {
		t.Errorf("blank line: %#v %v", s, errs)
	}
	s, _ = expr.ParseLine("  # a remark", 5)
	if c, ok := s.(*expr.Comment); !ok || c.Text != "a remark" || c.TextPos != 9 || c.Pos != 7 || c.End != 17 {
		t.Errorf("comment: %#v", s)
	}
	s, errs = expr.ParseLine("x = 3 m", 0)
	if a := s.(*expr.Assign); len(errs) > 0 || a.Display != nil || a.NotePos != -1 || a.End != 7 {
		t.Errorf("plain assign: %#v %v", s, errs)
	}
	s, errs = expr.ParseLine("s = 0.0123 m -> mm # settlement", 0)
	if a := s.(*expr.Assign); len(errs) > 0 || a.Display.Decimals != -1 || a.Display.Unit.Name != "mm" {
		t.Errorf("display without decimals: %#v %v", s, errs)
	}
	s, errs = expr.ParseLine("r = a/b ->%", 0)
	if a := s.(*expr.Assign); len(errs) > 0 || a.Display.Unit.Name != "%" {
		t.Errorf("percent display: %#v %v", s, errs)
	}
}

// Error rows: every message says what was expected; offsets are file
// offsets (base 10 here); errors come sorted by position.
func TestParseErrors(t *testing.T) {
	const base = 10
	type e struct {
		at, end int // offsets in the line
		msg     string
	}
	for _, r := range []struct {
		line string
		want []e
	}{
		{"x = 60 kpa", []e{{7, 10, `unknown unit "kpa" after 60; did you mean "kPa"?`}}},
		{"x = 2 B", []e{{6, 7, `"B" after 2 is not a unit (to multiply, write "2 * B")`}}},
		{"x = 2 m*B", []e{{8, 9, `unknown unit "B" in "m*B" after 2; to multiply by B, put spaces around the operator`}}},
		{"x = 2 B_f", []e{{6, 9, `"B_f" after 2 is not a unit`}}},
		{"x = 2 kN.m", []e{{6, 10, `bad unit "kN.m" after 2: write "kN*m" for a product of units`}}},
		{"x = 2 kN/m^", []e{{10, 11, `bad unit "kN/m^" after 2: expected an integer power after "^"`}}},
		{"x = (1 + 2", []e{{4, 5, `unclosed "("; expected ")"`}}},
		{"x = 1 + 2)", []e{{9, 10, `unmatched ")"`}}},
		{"x = (a b) + 1", []e{{7, 8, `expected an operator or ")", found "b"`}}},
		{"x = sqrt(1 + 2", []e{{8, 9, `unclosed "(" of sqrt; expected ")"`}}},
		{"x = min(1 2)", []e{{10, 11, `expected "," or ")" of min, found number 2`}}},
		{"x = a b", []e{{6, 7, `unexpected "b"; expected an operator, "->", "#" or the end of the line (there is no implied multiplication: write *)`}}},
		{"x = 2 +", []e{{7, 7, `expected a number, a symbol or "(", at the end of the line`}}},
		{"x = * 3", []e{{4, 5, `expected a number, a symbol or "(", found "*"`}}},
		{"x = 1 $ 2", []e{{6, 7, `unexpected character "$"`}}},
		{"x 3", []e{{2, 3, `expected "=" after x, found number 3`}}},
		{"= 3", []e{{0, 1, `expected a symbol to start the statement`}}},
		{"3 = x", []e{{0, 1, `expected a symbol to start the statement`}}},
		{"pi = 3", []e{{0, 2, `pi is the constant π`}}},
		{"sqrt = 3", []e{{0, 4, `sqrt is a function; choose another name`}}},
		{"F1.R_d = 3", []e{{0, 6, `block result name`}}},
		{"x = sqrt", []e{{4, 8, `sqrt is a function; write sqrt(…)`}}},
		{"x = foo(1)", []e{{4, 7, `unknown function "foo"`}}},
		{"x = atan2(1)", []e{{4, 12, `atan2 takes 2 arguments, got 1`}}},
		{"x = min(1)", []e{{4, 10, `min takes 2 or more arguments, got 1`}}},
		{"x = sqrt()", []e{{4, 10, `sqrt takes 1 argument, got 0`}}},
		{"x = 3 ->", []e{{6, 8, `expected a unit after "->"`}}},
		{"x = 3 -> kpa", []e{{9, 12, `display unit "kpa": unknown unit "kpa"; did you mean "kPa"?`}}},
		{"x = 3 -> kPa:", []e{{12, 13, `expected the number of decimal places after ":"`}}},
		{"x = 3 -> kPa:99", []e{{13, 15, `at most 12 decimal places`}}},
		{"x = 3 -> kPa extra", []e{{13, 18, `unexpected "extra"; expected "#" or the end of the line`}}},
		{"x = 1 = 2", []e{{6, 7, `unexpected "=": a statement has one "="`}}},
		{"x = a <= b", []e{{6, 8, `comparisons belong in check lines`}}},
		{"check a b", []e{{8, 9, `expected a comparison (<=, <, >=, > or ==) after the left side, found "b"`}}},
		{"check a != b", []e{{8, 10, `"!=" is not a check operator`}}},
		{"check a <= b -> kPa", []e{{13, 15, `a check line takes no display unit`}}},
		{"x = 1e999", []e{{4, 9, `number 1e999 is too large`}}},
		// Several errors from one line.
		{"x = (a b + 60 kpa -> kpa", []e{
			{7, 8, `expected an operator or ")", found "b"`},
			{14, 17, `unknown unit "kpa" after 60`},
			{21, 24, `display unit "kpa"`},
		}},
	} {
		_, errs := expr.ParseLine(r.line, base)
		if len(errs) != len(r.want) {
			t.Errorf("ParseLine(%q): %d errors %v, want %d", r.line, len(errs), errs, len(r.want))
			continue
		}
		for i, w := range r.want {
			g := errs[i]
			if g.Pos != base+w.at || g.End != base+w.end || !strings.Contains(g.Msg, w.msg) {
				t.Errorf("ParseLine(%q) error %d = [%d,%d) %q, want [%d,%d) containing %q",
					r.line, i, g.Pos-base, g.End-base, g.Msg, w.at, w.end, w.msg)
			}
		}
	}
}

func TestErrorLimit(t *testing.T) {
	_, errs := expr.ParseLine("x = "+strings.Repeat("$", 100), 0)
	if len(errs) != 10 {
		t.Errorf("%d errors for a line of rubbish, want 10", len(errs))
	}
}

func TestParseRef(t *testing.T) {
	r, errs := expr.ParseRef(" s -> mm:1 ", 50)
	if len(errs) > 0 || r.Sym.Name != "s" || r.Sym.Pos != 51 || r.Display.Unit.Name != "mm" || r.Display.Decimals != 1 || r.Pos != 51 || r.End != 60 {
		t.Errorf("ParseRef: %+v %+v %v", r, r.Display, errs)
	}
	r, errs = expr.ParseRef("F2.util", 0)
	if len(errs) > 0 || r.Sym.Name != "F2.util" || r.Display != nil {
		t.Errorf("ParseRef dotted: %+v %v", r, errs)
	}
	for _, bad := range []string{"", "2 m", "a + b", "a -> ", "pi"} {
		if _, errs := expr.ParseRef(bad, 0); len(errs) == 0 {
			t.Errorf("ParseRef(%q): no error", bad)
		}
	}
}

func TestParseOption(t *testing.T) {
	o, errs := expr.ParseOption("approach = FS(3.0)   # global factor", 20)
	if len(errs) > 0 || o.Key.Name != "approach" || o.Value != "FS(3.0)" || o.ValuePos != 31 || o.ValueEnd != 38 || o.Note != "global factor" || o.End != 56 {
		t.Errorf("ParseOption: %+v %v", o, errs)
	}
	o, errs = expr.ParseOption("method = burland-burbidge", 0)
	if len(errs) > 0 || o.Value != "burland-burbidge" || o.NotePos != -1 {
		t.Errorf("ParseOption: %+v %v", o, errs)
	}
	if o, errs := expr.ParseOption("# only a note", 0); o != nil || errs != nil {
		t.Errorf("note line: %+v %v", o, errs)
	}
	if _, errs := expr.ParseOption("stress =", 0); len(errs) != 1 {
		t.Errorf("empty value: %v", errs)
	}
}

func TestParseList(t *testing.T) {
	xs, errs := expr.ParseList("1 week, 1 yr, 10 yr", 0)
	var got []string
	for _, x := range xs {
		got = append(got, sexp(x))
	}
	if len(errs) > 0 || strings.Join(got, " ") != "1[week] 1[yr] 10[yr]" {
		t.Errorf("ParseList: %v %v", got, errs)
	}
}

func TestWalk(t *testing.T) {
	n, _ := expr.ParseExpr("max(a, -b) + (c ^ 2)", 0)
	var kinds []string
	expr.Inspect(n, func(n expr.Node) bool {
		kinds = append(kinds, strings.TrimPrefix(fmt.Sprintf("%T", n), "*expr."))
		_, isCall := n.(*expr.Call)
		return !isCall
	})
	if got := strings.Join(kinds, " "); got != "Binary Call Paren Binary Ident Num" {
		t.Errorf("Inspect order: %s", got)
	}
}

func ExampleParseLine() {
	s, errs := expr.ParseLine("check q_Ed <= q_Rd   # bearing pressure within design resistance", 100)
	c := s.(*expr.Check)
	fmt.Println(sexp(c.L), c.Op, sexp(c.R), "|", c.Note, c.NotePos, errs)
	_, errs = expr.ParseLine("c_u = 60 kpa", 100)
	fmt.Println(errs[0].Pos, errs[0].End, errs[0].Msg)
	// Output:
	// q_Ed <= q_Rd | bearing pressure within design resistance 123 []
	// 109 112 unknown unit "kpa" after 60; did you mean "kPa"?
}
