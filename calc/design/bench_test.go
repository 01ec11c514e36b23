package design_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

var benchActs = []site.Action{
	{Name: "Dead", Kind: site.Permanent, V: 950e3, HB: 20e3, MB: 40e3},
	{Name: "Imposed", Kind: site.Variable, V: 400e3, Psi0: site.Some(0.7), Psi2: site.Some(0.3)},
	{Name: "Wind", Kind: site.Variable, HB: 60e3, MB: 120e3, Psi0: site.Some(0.6)},
}

// The design loads of DA1 for three actions, each load's working recorded.
func BenchmarkLoadsRecord(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		var tr trace.Trace
		for _, l := range design.Loads(benchActs, design.DA1()) {
			l.Record(&tr, benchActs, l.Name, "kN", "kNm")
		}
	}
}

func BenchmarkServiceLoad(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		var tr trace.Trace
		if _, err := design.ServiceLoad(benchActs, design.Characteristic, &tr, "kN"); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkWeight(b *testing.B) {
	in := design.SelfWeight{Footing: site.Footing{Name: "F", Shape: site.Rectangle, B: 2, L: 3, D: 1.2},
		Ground: site.Ground{Layers: []site.Layer{{Name: "Sand", Gamma: 19e3}}}, H: site.Some(0.6)}
	b.ReportAllocs()
	for b.Loop() {
		var tr trace.Trace
		if _, err := design.Weight(in, &tr); err != nil {
			b.Fatal(err)
		}
	}
}
