package stress_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// The working of Δσ at the characteristic point of a rectangle (four
// corner rectangles) and off the axis of a circle (numerical integral).
func BenchmarkExplainRect(b *testing.B) {
	f := site.Footing{Shape: site.Rectangle, B: 3, L: 4, D: 1}
	o := stress.Options{Point: stress.Characteristic}
	b.ReportAllocs()
	for b.Loop() {
		var tr trace.Trace
		if _, err := stress.Explain(&tr, f, o, 1.3, 120e3, "b"); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkExplainCircle(b *testing.B) {
	f := site.Footing{Shape: site.Circle, B: 3, D: 1}
	o := stress.Options{Point: stress.Characteristic}
	b.ReportAllocs()
	for b.Loop() {
		var tr trace.Trace
		if _, err := stress.Explain(&tr, f, o, 1.3, 120e3, "b"); err != nil {
			b.Fatal(err)
		}
	}
}
