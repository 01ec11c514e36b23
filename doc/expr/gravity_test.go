package expr_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
)

// g is the standard acceleration of gravity, 9.80665 m/s² (3rd CGPM 1901;
// NIST SP 811 (2008) B.8, "standard acceleration of gravity"), so a density
// times g is a unit weight: 1.9 t/m3 × 9.80665 m/s² = 18.632635 kN/m³ (hand
// calculation; tolerance 1e-12 relative).
func TestGravity(t *testing.T) {
	for _, c := range []struct {
		in   string
		want float64
		dim  units.Dim
	}{
		{"g", 9.80665, units.Accel},
		{"1.9 t/m3 * g", 18632.635, units.UnitWeight},
		{"2.0 Mg/m3 * g", 19613.3, units.UnitWeight},
		{"1000 kg/m3 * g", 9806.65, units.UnitWeight},
	} {
		n, errs := expr.ParseExpr(c.in, 0)
		if len(errs) > 0 {
			t.Fatalf("%s: %v", c.in, errs)
		}
		q, errs := expr.Eval(n, expr.MapEnv{})
		if len(errs) > 0 {
			t.Fatalf("%s: %v", c.in, errs)
		}
		if q.Dim != c.dim || math.Abs(q.V-c.want) > 1e-12*c.want {
			t.Errorf("%s = %v %v, want %v %v", c.in, q.V, q.Dim, c.want, c.dim)
		}
	}
}
