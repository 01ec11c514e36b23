package bearing_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// Water above ground level: σ′ is as with the water table at ground level,
// so a drained check gives the same q_ult, while σ_v0 gains γ_w·h_w0.
// Hand calculation (common practice): 2 m square at D = 1 m, γ_sat = 20,
// γ_w = 9.81 kN/m³; water 2 m above ground: σ_v0 = 9.81×2 + 20×1 =
// 39.62 kPa, u_0 = 9.81×3 = 29.43 kPa, σ′_v0 = 10.19 kPa (z_w = 0: 20 −
// 9.81 = 10.19 kPa). Tolerance 1e-9 relative.
func TestFloodedDrained(t *testing.T) {
	in := func(zw float64) bearing.Input {
		return bearing.Input{
			Ground: site.Ground{Water: site.Some(zw), Layers: []site.Layer{
				{Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), Phi: site.Some(32 * deg), C: site.Some(0)},
			}},
			Footing: site.Footing{Shape: site.Square, B: 2, D: 1},
			Actions: []site.Action{{Name: "G", V: 500e3}},
			Options: bearing.Options{Method: bearing.EC7, Approach: design.FS(3), LocalShear: bearing.No},
		}
	}
	flood := check(t, "flooded", in(-2))
	level := check(t, "water at ground level", in(0))
	if a, b := flood.Cases[0].QUlt, level.Cases[0].QUlt; !within(a, b, 1e-9, 0) {
		t.Errorf("q_ult flooded %.6g, water at ground level %.6g: want equal", a, b)
	}
	want := map[string]float64{"sigma_v0": 39.62e3, "u_0": 29.43e3, "sigma'_v0": 10.19e3}
	for _, s := range flood.Trace.Steps {
		if w, ok := want[s.Symbol]; ok {
			if !within(s.Value, w, 1e-9, 0) {
				t.Errorf("%s = %.6g, want %.6g", s.Symbol, s.Value, w)
			}
			delete(want, s.Symbol)
		}
	}
	for s := range want {
		t.Errorf("no %s step", s)
	}
	found := false
	for _, c := range flood.Trace.Cautions {
		found = found || c.Code == "water-above-ground"
	}
	if !found {
		t.Error("no water-above-ground caution")
	}
}
