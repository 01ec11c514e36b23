package site_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// TestOverburden checks the formula the bearing and settlement engines
// print for σ_v0 against hand calculations (common practice: Σγh, γ_sat
// below the water table, the standing water's weight γ_w·h_w0 above
// ground) and against SigmaV at every depth. Made ground γ = 18 kN/m³ to
// 0.7 m over clay γ = 19.5, γ_sat = 20 kN/m³, water at 1.5 m:
//
//	z = 0.8 m: 18×0.7 + 19.5×0.1            = 14.55 kPa (the tank raft's base)
//	z = 3 m:   18×0.7 + 19.5×0.8 + 20×1.5   = 58.2 kPa
//
// and with the water 1 m above ground, z = 0.5 m: 9.81×1 + 20×0.5 = 19.81
// kPa (γ_sat of the made ground defaults to γ). Tolerance 1e-9 kPa.
func TestOverburden(t *testing.T) {
	layers := []site.Layer{
		{Name: "Made ground", Top: 0, Gamma: 18 * kN},
		{Name: "Clay", Top: 0.7, Gamma: 19.5 * kN, GammaSat: site.Some(20 * kN)},
	}
	g := site.Ground{Name: "site", Water: site.Some(1.5), Layers: layers}
	flood := site.Ground{Name: "flood", Water: site.Some(-1), Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18 * kN, GammaSat: site.Some(20 * kN)}}}
	for _, c := range []struct {
		g          site.Ground
		z, want    float64 // m, kPa
		syms       string
		wet, flood bool
		layers     []int
	}{
		{g, 0.8, 14.55, "gamma_1 h_1 gamma_2 h_2", false, false, []int{0, 1}},
		{g, 3, 58.2, "gamma_1 h_1 gamma_2 h_2 gamma_sat,2 h_w,2", true, false, []int{0, 1}},
		{g, 0.5, 9, "gamma_1 h_1", false, false, []int{0}},
		{flood, 0.5, 9.81*1 + 20*0.5, "gamma_w h_w0 gamma_sat,1 h_w,1", true, true, []int{0}},
	} {
		o := c.g.Overburden(c.z)
		got, err := trace.Eval(o.F, o.In)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(got/kN-c.want) > 1e-9 || math.Abs(got-c.g.SigmaV(c.z)) > 1e-9 {
			t.Errorf("%s z = %g m: σ_v0 = %.6g kPa, want %g (SigmaV %g)", c.g.Name, c.z, got/kN, c.want, c.g.SigmaV(c.z)/kN)
		}
		var syms []string
		for _, v := range o.In {
			syms = append(syms, v.Symbol)
		}
		if s := strings.Join(syms, " "); s != c.syms || o.Wet != c.wet || o.Flood != c.flood || len(o.Layers) != len(c.layers) {
			t.Errorf("%s z = %g m: inputs %q wet %v flood %v layers %v; want %q %v %v %v", c.g.Name, c.z, s, o.Wet, o.Flood, o.Layers, c.syms, c.wet, c.flood, c.layers)
		}
	}
	if o := g.Overburden(0); o.F != nil || o.Note() != "" {
		t.Errorf("at ground level: %v %q", o.F, o.Note())
	}
}
