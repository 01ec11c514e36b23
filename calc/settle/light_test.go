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

// Quiet gives Compute's numbers without the working.
func TestQuietAgrees(t *testing.T) {
	in := fourLayerInput(40)
	a, err := settle.Compute(in)
	if err != nil {
		t.Fatal(err)
	}
	b, err := settle.Quiet(in)
	if err != nil {
		t.Fatal(err)
	}
	if a.Total != b.Total || a.Util != b.Util || a.OK != b.OK || len(b.Trace.Steps) != 0 {
		t.Errorf("Compute %v %v %v, Quiet %v %v %v (%d steps)", a.Total, a.Util, a.OK, b.Total, b.Util, b.OK, len(b.Trace.Steps))
	}
}
