package bearing_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// benchInput is one drained EN 1997-1 rectangle with an inclined,
// eccentric load, checked by DA1 (both combinations).
func benchInput() bearing.Input {
	deg := 3.141592653589793 / 180
	return bearing.Input{
		Ground: site.Ground{Layers: []site.Layer{
			{Name: "Dense sand", Top: 0, Gamma: 19e3, Phi: site.Some(34 * deg), Dr: site.Some(0.7)},
		}},
		Footing: site.Footing{Name: "P1", Shape: site.Rectangle, B: 2.0, L: 3.0, D: 1.0},
		Actions: []site.Action{
			{Name: "Dead", Kind: site.Permanent, V: 800e3, HB: 40e3, MB: 80e3},
			{Name: "Imposed", Kind: site.Variable, V: 300e3, HL: 20e3, ML: 30e3},
		},
		Options: bearing.Options{Drainage: bearing.Drained, Approach: design.DA1(), Sliding: bearing.No},
	}
}

func BenchmarkCheckEC7DA1(b *testing.B) {
	in := benchInput()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := bearing.Check(in); err != nil {
			b.Fatal(err)
		}
	}
}
