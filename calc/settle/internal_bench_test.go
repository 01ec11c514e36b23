package settle

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/site"
)

func benchInput() Input {
	yr := Year
	g := site.Ground{Water: site.Some(1.2), Layers: []site.Layer{
		{Name: "Clay crust", Top: 0, Gamma: 18.5e3, GammaSat: site.Some(19e3), Cu: site.Some(45e3), Cc: site.Some(0.22), Cr: site.Some(0.04), E0: site.Some(0.85), OCR: site.Some(3), Cv: site.Some(4 / yr)},
		{Name: "Soft clay", Top: 2.5, Gamma: 17e3, GammaSat: site.Some(17.5e3), Cu: site.Some(20e3), Cc: site.Some(0.45), Cr: site.Some(0.07), E0: site.Some(1.3), SigmaP: site.Some(60e3), Cv: site.Some(1.5 / yr)},
		{Name: "Firm clay", Top: 7, Gamma: 19e3, GammaSat: site.Some(19.5e3), Cu: site.Some(55e3), Mv: site.Some(0.12e-6), Cv: site.Some(3 / yr)},
		{Name: "Stiff clay", Top: 12, Gamma: 20e3, GammaSat: site.Some(20.5e3), Cu: site.Some(120e3), Mv: site.Some(0.05e-6), Cv: site.Some(8 / yr)},
	}}
	return Input{Ground: g, Footing: site.Footing{Name: "P4", Shape: site.Rectangle, B: 3, L: 4, D: 1.2}, Q: site.Some(150e3), Method: Consolidation, Sublayers: 200}
}

func BenchmarkQuiet200(b *testing.B) {
	in := benchInput()
	for b.Loop() {
		compute(in, false)
	}
}
