package settle_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestWideFill: a fill or embankment of large extent is given as a square
// or strip footing of its width (B up to 1000 m) at D = 0. Below its
// middle the loading is one-dimensional, Δσ = q through the clay, so the
// consolidation settlement is the oedometer value m_v·q·H (Craig's Soil
// Mechanics, 8th ed. 2012, §7.2: one-dimensional consolidation). Hand
// calculation: m_v = 0.3 m²/MN, q = 50 kPa, H = 10 m: s_c = 0.3 × 0.05
// × 10 = 0.150 m. Tolerance 0.1 % (the Boussinesq stress of a 500 m area
// 10 m down differs from q by about 1e-5).
func TestWideFill(t *testing.T) {
	g := site.Ground{Water: site.Some(0), Layers: []site.Layer{
		{Name: "Clay", Top: 0, Gamma: 18e3, GammaSat: site.Some(18e3), Cu: site.Some(30e3), Mv: site.Some(0.3e-6), Cv: site.Some(2 / settle.Year)},
		{Name: "Gravel", Top: 10, Gamma: 20e3, GammaSat: site.Some(20e3), E: site.Some(200e6)},
	}}
	for _, f := range []site.Footing{{Name: "Fill", Shape: site.Square, B: 500}, {Name: "Bank", Shape: site.Strip, B: 300}} {
		for _, d := range []settle.Depth{{}, {Rule: settle.DepthFixed, Z: site.Some(10)}} {
			r := mustCompute(t, settle.Input{Ground: g, Footing: f, Q: site.Some(50e3), Method: settle.Consolidation, Depth: d})
			near(t, f.Name+" s_c (mm)", r.Sc*1e3, 150, 0.15, "one-dimensional m_v q H")
		}
	}
}
