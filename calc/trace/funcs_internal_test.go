package trace

import (
	"math"
	"testing"
)

// The fast one-argument path agrees with the function table everywhere it
// answers (same math functions, so bit for bit).
func TestCall1AgreesWithTable(t *testing.T) {
	for name, f := range functions {
		for _, x := range []float64{-2, -0.5, 0, 0.3, 1, 2.5, 100} {
			v, ok := call1(name, x)
			if !ok {
				continue
			}
			if f.Min != 1 {
				t.Fatalf("%s: fast path for a function of %d arguments", name, f.Min)
			}
			w := f.F([]float64{x})
			if v != w && !(math.IsNaN(v) && math.IsNaN(w)) {
				t.Errorf("%s(%v): fast %v, table %v", name, x, v, w)
			}
		}
	}
}
