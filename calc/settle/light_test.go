package settle_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// A light load on a wide pad: the net pressure at the base is already
// below 0.1 σ′_v0, so the zone of influence ends at the base and the
// minimum depth of B below it applies (regression: the depth solve used to
// report an unbracketed root). Common practice: the zone is at least B.
func TestLightLoadZone(t *testing.T) {
	g := site.Ground{Water: site.Some(1.5), Layers: []site.Layer{{Name: "Clay", Top: 0, Gamma: 19e3, GammaSat: site.Some(20e3), Mv: site.Some(0.1e-6), Eu: site.Some(30e6), Cu: site.Some(75e3)}}}
	f := site.Footing{Name: "P", Shape: site.Square, B: 5, L: 5, D: 1}
	r, err := settle.Compute(settle.Input{Ground: g, Footing: f, V: site.Some(520e3)})
	if err != nil {
		t.Fatal(err)
	}
	if r.Total < 0 || r.Total > 0.001 {
		t.Errorf("s_total = %v m under a net pressure near zero", r.Total)
	}
}
