package eqn_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

var S, N = trace.S, trace.N

func TestFromExpr(t *testing.T) {
	tests := []struct {
		name string
		e    trace.Expr
		want string
	}{
		{"sum", trace.Add(S("a"), S("b"), S("c")), "a + b + c"},
		{"difference of sum", trace.Sub(S("a"), trace.Add(S("b"), S("c"))), "a − (b + c)"},
		{"product of sum", trace.Mul(trace.Add(S("a"), S("b")), S("c")), "(a + b) · c"},
		{"numbers use ×", trace.Mul(N(2), N(3.5)), "2 × 3.5"},
		{"number then symbol uses ·", trace.Mul(N(2), S("gamma")), "2 · γ"},
		{"half gamma B N", trace.Mul(trace.Div(N(1), N(2)), S("gamma'"), S("B'"), S("N_gamma")), "{1}/{2} · γ′ · B′ · N_{γ}"},
		{"power", trace.Pow(S("x"), N(2)), "x^{2}"},
		{"neg power binds tighter", trace.Negate(trace.Pow(S("x"), N(2))), "−x^{2}"},
		{"power of sum", trace.Pow(trace.Add(S("a"), S("b")), N(2)), "(a + b)^{2}"},
		{"power of neg", trace.Pow(trace.Negate(S("a")), N(2)), "(−a)^{2}"},
		{"fraction base", trace.Pow(trace.Div(S("a"), S("b")), N(2)), "({a}/{b})^{2}"},
		{"inline fraction in exponent", trace.Pow(S("e"), trace.Div(S("pi"), trace.Mul(N(2), S("x")))), "e^{π/(2 · x)}"},
		{"negative right operand", trace.Add(S("a"), trace.Negate(S("b"))), "a + (−b)"},
		{"sqrt", trace.Fn("sqrt", trace.Add(S("a"), S("b"))), "√{a + b}"},
		{"tan squared", trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(S("phi'"), N(2)))), N(2)), "tan^{2}(45° + {φ′}/{2})"},
		{"abs", trace.Fn("abs", S("e_B")), "|e_{B}|"},
		{"min", trace.Fn("min", S("a"), S("b")), "min(a, b)"},
		{"subscripts", trace.Mul(S("q_ult_net"), S("phi'_d"), S("F1.R_d"), S("gamma_sat")), "q_{ult,net} · φ′_{d} · F1.R_{d} · γ_{sat}"},
		{"capital greek", S("Gamma_R"), "Γ_{R}"},
		{"pi", trace.Mul(S("pi"), S("D")), "π · D"},
	}
	for _, tt := range tests {
		got := eqn.String(eqn.FromExpr(tt.e, eqn.Options{}))
		if got != tt.want {
			t.Errorf("%s: got %q, want %q", tt.name, got, tt.want)
		}
	}
}

func TestSubst(t *testing.T) {
	vals := map[string]eqn.Node{
		"gamma": eqn.Quantity("18", "kN/m3"),
		"B":     eqn.Quantity("2.4", "m"),
		"x":     eqn.Num{Text: "-3.5"},
	}
	opt := eqn.Options{Subst: func(n string) (eqn.Node, bool) { v, ok := vals[n]; return v, ok }}
	tests := []struct {
		e    trace.Expr
		want string
	}{
		{trace.Mul(N(0.5), S("gamma"), S("B")), "0.5 × 18 kN/m^{3} × 2.4 m"},
		{trace.Pow(S("B"), N(2)), "(2.4 m)^{2}"},
		{trace.Mul(N(2), S("x")), "2 × (-3.5)"},
		{trace.Sub(S("B"), S("x")), "2.4 m − (-3.5)"},
	}
	for _, tt := range tests {
		if got := eqn.String(eqn.FromExpr(tt.e, opt)); got != tt.want {
			t.Errorf("got %q, want %q", got, tt.want)
		}
	}
}

func TestNumber(t *testing.T) {
	tests := []struct {
		v    float64
		sig  int
		want string
	}{
		{0, 6, "0"}, {1.5, 6, "1.5"}, {0.1 + 0.2, 6, "0.3"}, {-2.25, 3, "−2.25"},
		{123456, 3, "123000"}, {2.5e6, 3, "2.5 × 10^{6}"}, {1.2e-5, 3, "1.2 × 10^{−5}"},
		{math.Pi, 4, "3.142"},
	}
	for _, tt := range tests {
		if got := eqn.String(eqn.Number(tt.v, tt.sig)); got != tt.want {
			t.Errorf("Number(%v, %d) = %q, want %q", tt.v, tt.sig, got, tt.want)
		}
	}
}

func TestUnit(t *testing.T) {
	for in, want := range map[string]string{
		"kN/m3": "kN/m^{3}", "m^2/yr": "m^{2}/yr", "kN*m": "kN·m", "deg": "°", "kPa": "kPa",
		"m2/MN": "m^{2}/MN", "s^-1": "s^{−1}",
	} {
		if got := eqn.String(eqn.Unit(in)); got != want {
			t.Errorf("Unit(%q) = %q, want %q", in, got, want)
		}
	}
}

func TestLayout(t *testing.T) {
	st := eqn.Style{Size: 10}
	e := eqn.FromExpr(trace.Div(trace.Add(S("a"), S("b")), trace.Fn("sqrt", trace.Pow(S("c"), N(2)))), eqn.Options{})
	b, err := eqn.Layout(e, st)
	if err != nil {
		t.Fatal(err)
	}
	if b.Ascent < 8 || b.Descent < 8 || b.W < 15 {
		t.Errorf("fraction box %+v", *b)
	}
	_, err = eqn.Layout(eqn.Text{Text: "x\U0001F600"}, st)
	if err == nil || !strings.Contains(err.Error(), "U+1F600") {
		t.Errorf("missing glyph error = %v", err)
	}
}

func TestBreak(t *testing.T) {
	st := eqn.Style{Size: 10}
	var terms []trace.Expr
	for _, s := range []string{"a_1", "a_2", "a_3", "a_4", "a_5", "a_6", "a_7", "a_8"} {
		terms = append(terms, trace.Mul(S(s), S("gamma_w")))
	}
	sum := trace.Add(terms[0], terms[1:]...)
	row := eqn.Row{eqn.Sym{Name: "x"}, eqn.Op{Text: "="}, eqn.FromExpr(sum, eqn.Options{}), eqn.Op{Text: "="}, eqn.Num{Text: "12.5"}}
	lines, err := eqn.Break(row, 120, st)
	if err != nil {
		t.Fatal(err)
	}
	if len(lines) < 3 {
		t.Fatalf("got %d lines", len(lines))
	}
	for i, l := range lines {
		if l.W > 120 {
			t.Errorf("line %d width %.1f", i, l.W)
		}
	}
	one, _ := eqn.Break(row, 1000, st)
	if len(one) != 1 {
		t.Errorf("wide column: %d lines", len(one))
	}
}
