package settle_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
)

// Consolidation of a four-layer clay profile in 200 sublayers below a
// 3 m × 4 m pad, Boussinesq stresses at the centre, full trace.
// Target: under 100 µs.
func BenchmarkConsolidation200(b *testing.B) {
	in := fourLayerInput(200)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := settle.Compute(in); err != nil {
			b.Fatal(err)
		}
	}
}

// Allowable pressure for a 25 mm limit on the same pad and profile (40
// sublayers per trial, full trace at the answer). Target: under 5 ms.
func BenchmarkAllowable25mm(b *testing.B) {
	in := fourLayerInput(40)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := settle.Allowable(in, 0.025); err != nil {
			b.Fatal(err)
		}
	}
}

// The same solve with 200 sublayers per trial.
func BenchmarkAllowable25mm200(b *testing.B) {
	in := fourLayerInput(200)
	b.ReportAllocs()
	for b.Loop() {
		if _, err := settle.Allowable(in, 0.025); err != nil {
			b.Fatal(err)
		}
	}
}
