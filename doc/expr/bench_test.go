package expr_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
)

var benchEnv = expr.MapEnv{
	"phi'_d": units.MustParse("deg").Of(25),
	"V_d":    units.MustParse("kN").Of(1350),
	"B":      units.MustParse("m").Of(2.4),
	"L":      units.MustParse("m").Of(3.0),
	"e_B":    units.MustParse("m").Of(0.1),
}

// A typical statement line, parsed and evaluated (Dims, direct value,
// canonical form, cached govaluate expression). Target: well under 10 µs
// (100 sheets × 50 statements in < 50 ms).
func BenchmarkParseEval(b *testing.B) {
	const line = "q_Ed = V_d / ((B - 2 * e_B) * L) + 0.5 * 18 kN/m3 * B * tan(phi'_d)^2 -> kPa:1   # design pressure"
	b.ReportAllocs()
	for b.Loop() {
		s, errs := expr.ParseLine(line, 0)
		if len(errs) > 0 {
			b.Fatal(errs)
		}
		if _, errs := expr.Eval(s.(*expr.Assign).X, benchEnv); len(errs) > 0 {
			b.Fatal(errs)
		}
	}
}

func BenchmarkParse(b *testing.B) {
	const line = "q_Ed = V_d / ((B - 2 * e_B) * L) + 0.5 * 18 kN/m3 * B * tan(phi'_d)^2 -> kPa:1   # design pressure"
	b.ReportAllocs()
	for b.Loop() {
		expr.ParseLine(line, 0)
	}
}

func BenchmarkEval(b *testing.B) {
	n, _ := expr.ParseExpr("V_d / ((B - 2 * e_B) * L) + 0.5 * 18 kN/m3 * B * tan(phi'_d)^2", 0)
	b.ReportAllocs()
	for b.Loop() {
		expr.Eval(n, benchEnv)
	}
}

func BenchmarkDirect(b *testing.B) {
	n, _ := expr.ParseExpr("V_d / ((B - 2 * e_B) * L) + 0.5 * 18 kN/m3 * B * tan(phi'_d)^2", 0)
	b.ReportAllocs()
	for b.Loop() {
		expr.Direct(n, benchEnv)
	}
}
