package compose

import (
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
		got := eqn.String(fromExpr(tt.e, exprOptions{}))
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
	opt := exprOptions{Subst: func(n string) (eqn.Node, bool) { v, ok := vals[n]; return v, ok }}
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
		if got := eqn.String(fromExpr(tt.e, opt)); got != tt.want {
			t.Errorf("got %q, want %q", got, tt.want)
		}
	}
}

// The bearing capacity factor N_q of EN 1997-1 Annex D (D.4), converted
// for typesetting: the power of a function call prints as tan², the
// division inside it as a stacked fraction; substituted values multiply
// with ×, a value with a unit is bracketed under a power.
func TestFromExprShapes(t *testing.T) {
	nq := trace.Mul(
		trace.Pow(S("e"), trace.Mul(S("pi"), trace.Fn("tan", S("phi'_d")))),
		trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(S("phi'_d"), N(2)))), N(2)))
	if got, want := eqn.String(fromExpr(nq, exprOptions{})), "e^{π · tan(φ′_{d})} · tan^{2}(45° + {φ′_{d}}/{2})"; got != want {
		t.Errorf("N_q: got %q, want %q", got, want)
	}
	e := trace.Mul(N(0.5), S("gamma'"), trace.Pow(S("B'"), N(2)))
	vals := map[string]eqn.Node{"gamma'": eqn.Quantity("9.2", "kN/m3"), "B'": eqn.Quantity("2.2", "m")}
	n := fromExpr(e, exprOptions{Subst: func(name string) (eqn.Node, bool) { v, ok := vals[name]; return v, ok }})
	if got, want := eqn.String(n), "0.5 × 9.2 kN/m^{3} × (2.2 m)^{2}"; got != want {
		t.Errorf("substituted: got %q, want %q", got, want)
	}
}
