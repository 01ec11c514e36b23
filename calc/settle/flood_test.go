package settle_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Water above ground level: the effective stresses, and so the
// consolidation settlement under the same net pressure, are as with the
// water table at ground level. Hand calculation (common practice) at the
// base, D = 1 m, γ_sat = 19 kN/m³, γ_w = 9.81 kN/m³, water 1 m above
// ground: σ_v0 = 9.81 + 19 = 28.81 kPa, u_0 = 19.62 kPa, σ′_v0 = 9.19 kPa.
// The flooded case is loaded with q + γ_w·h_w0 (the water on the footing),
// so q_net is the same. Tolerance 1e-9 relative.
func TestFlooded(t *testing.T) {
	in := func(zw, q float64) settle.Input {
		return settle.Input{
			Ground: site.Ground{Water: site.Some(zw), Layers: []site.Layer{
				{Name: "Clay", Top: 0, Gamma: 18e3, GammaSat: site.Some(19e3), Cu: site.Some(40e3), Mv: site.Some(0.2e-6), Eu: site.Some(10e6)},
			}},
			Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1},
			Q:       site.Some(q), Method: settle.Consolidation,
		}
	}
	run := func(name string, x settle.Input) *settle.Result {
		r, err := settle.Compute(x)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if err := trace.Verify(r.Trace, 1e-9); err != nil {
			t.Fatalf("%s: trace does not verify: %v", name, err)
		}
		return r
	}
	const q = 120e3
	flood := run("flooded", in(-1, q+9.81e3))
	level := run("water at ground level", in(0, q))
	near := func(a, b float64) bool { return math.Abs(a-b) <= 1e-9*math.Abs(b) }
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"sigma_v0", flood.SigmaV0, 28.81e3},
		{"u_0", flood.U0, 19.62e3},
		{"q_net", flood.QNet, level.QNet},
		{"s_c", flood.Sc, level.Sc},
	} {
		if !near(c.got, c.want) {
			t.Errorf("%s = %.9g, want %.9g", c.name, c.got, c.want)
		}
	}
	found := false
	for _, c := range flood.Trace.Cautions {
		found = found || c.Code == "water-above-ground"
	}
	if !found {
		t.Error("no water-above-ground caution")
	}
}
