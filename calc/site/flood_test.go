package site_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/site"
)

// Water above ground level (a flooded or tidal site): hand calculation
// (common practice: Σγh with the standing water's weight, u = γ_w (z − z_w)).
// One layer γ = 18, γ_sat = 20 kN/m³, γ_w = 9.81 kN/m³, water 1.5 m above
// ground (z_w = −1.5 m). At z = 2 m:
//
//	σ_v  = 9.81×1.5 + 20×2 = 14.715 + 40 = 54.715 kPa
//	u    = 9.81×(2 + 1.5) = 34.335 kPa
//	σ′_v = 54.715 − 34.335 = 20.38 kPa = (20 − 9.81)×2, as with z_w = 0:
//	       the standing water adds total stress and no effective stress.
//
// Tolerance 1e-6 Pa.
func TestFlooded(t *testing.T) {
	g := site.Ground{Name: "flood", Water: site.Some(-1.5), Layers: []site.Layer{
		{Name: "Sand", Top: 0, Gamma: 18 * kN, GammaSat: site.Some(20 * kN)},
	}}
	if err := g.Validate(); err != nil {
		t.Fatalf("water above ground refused: %v", err)
	}
	at0 := g
	at0.Water = site.Some(0)
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"Flood", g.Flood(), 1.5},
		{"SigmaV(2)", g.SigmaV(2), 54.715e3},
		{"PoreP(2)", g.PoreP(2), 34.335e3},
		{"SigmaVEff(2)", g.SigmaVEff(2), 20.38e3},
		{"SigmaVEff(2) with z_w = 0", at0.SigmaVEff(2), 20.38e3},
		{"SigmaV(0)", g.SigmaV(0), 14.715e3},
		{"SigmaVEff(0)", g.SigmaVEff(0), 0},
		{"Flood with z_w = 0", at0.Flood(), 0},
	} {
		if math.Abs(c.got-c.want) > 1e-6 {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	g.Water = site.Some(-60)
	if g.Validate() == nil {
		t.Error("water 60 m above ground accepted; the range is −50 to 200 m")
	}
}
