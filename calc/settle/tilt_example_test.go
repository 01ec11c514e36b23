package settle_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// A 2.2 m square pad on clay (E′ = 12 MPa) under a 42 kNm permanent
// moment tilts by about 1 in 830.
func ExampleTiltOf() {
	g := site.Ground{Layers: []site.Layer{{Name: "Clay", Top: 0, Gamma: 19.5e3, E: site.Some(12e6)}}}
	t, err := settle.TiltOf(settle.TiltInput{Ground: g, Footing: site.Footing{Name: "P2", Shape: site.Square, B: 2.2, D: 1},
		Actions: []site.Action{{Name: "Dead", Kind: site.Permanent, V: 420e3, MB: 42e3}}, Factors: []float64{1}, LongTerm: true})
	if err != nil {
		fmt.Println(err)
		return
	}
	a := t.Axes[0]
	fmt.Printf("%s, R = %.3f m, tan θ = %.5f (1 in %.0f), edges %.2f mm apart\n", t.Kind, a.R, a.Tan, 1/a.Tan, a.Delta*1e3)
	// Output: E', R = 1.256 m, tan θ = 0.00121 (1 in 829), edges 2.65 mm apart
}

// The centre of a flexible square on a deep elastic layer settles about
// twice its corner.
func ExampleWithinFooting() {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(10e6), Nu: site.Some(0.3)}}}
	w, err := settle.WithinFooting(settle.Input{Ground: g, Footing: site.Footing{Shape: site.Square, B: 2, D: 0}, Q: site.Some(100e3),
		Method: settle.Elastic, Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(20)}})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("centre %.1f mm, corner %.1f mm, mid-side %.1f mm, β = 1/%.0f\n", w.Centre*1e3, w.Corner*1e3, w.MidB*1e3, 1/w.Beta)
	// Output: centre 19.4 mm, corner 9.2 mm, mid-side 12.9 mm, β = 1/139
}
