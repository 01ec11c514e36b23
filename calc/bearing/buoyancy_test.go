package bearing_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestBuoyancyConvention: plinth's one convention for water above the
// base. Hand calculation (invented pad; EN 1997-1 2.4.2(4): water
// pressures are actions; Bond & Harris, Decoding Eurocode 7, 2008,
// ch. 10, deduct the uplift for drained bearing as for sliding): square
// 2 m × 2 m, D = 1.5 m, water 0.5 m below ground level, γ_w = 9.81 kN/m³:
// u_0 = 9.81 × 1.0 = 9.81 kPa, U = u_0·A_b = 9.81 × 4 = 39.24 kN.
// DA1-C2 (γ_G = 1.0): V_d,tot = 500 kN, drained V_d = 500 − 39.24 =
// 460.76 kN; undrained V_d stays 500 kN (total stress). Exact to 1e-9.
// The capacity table gives gross total pressures: for FS(3) its
// drained allowable pressure equals the footing's own effective q_Rd
// plus u_0, i.e. (q_ult − q′)/3 + σ_v0.
func TestBuoyancyConvention(t *testing.T) {
	g := oneLayer(site.Layer{Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), Cu: site.Some(80e3), Phi: site.Some(30 * math.Pi / 180), C: site.Some(0)})
	g.Water = site.Some(0.5)
	in := bearing.Input{
		Ground:  g,
		Footing: site.Footing{Shape: site.Square, B: 2, D: 1.5},
		Actions: []site.Action{{Name: "Dead", V: 500e3}},
		Options: bearing.Options{Drainage: bearing.Both, Approach: design.DA1()},
	}
	r := check(t, "buoyancy", in)
	const U = 9.81e3 * 1.0 * 4
	for _, cs := range r.Cases {
		if cs.Combination[:6] != "DA1-C2" {
			continue
		}
		want, wantU := 500e3, 0.0
		if cs.Drainage == bearing.Drained {
			want, wantU = 500e3-U, U
		}
		if math.Abs(cs.V-want) > 1e-6 || math.Abs(cs.U-wantU) > 1e-6 {
			t.Errorf("%s: V_d %.3f kN, U %.3f kN; want %.3f, %.3f", cs.Name, cs.V/kN, cs.U/kN, want/kN, wantU/kN)
		}
	}
	in.Options.Approach = design.FS(3)
	in.Options.Drainage = bearing.Drained
	own := check(t, "FS", in)
	cp, err := bearing.CapacityAt(in, 2)
	if err != nil {
		t.Fatal(err)
	}
	c := own.Cases[own.Governing]
	if math.Abs(cp.QRd-(c.QRd+9.81e3)) > 1e-6 {
		t.Errorf("capacity q_a %.3f kPa, want the footing's q_Rd %.3f + u_0 9.81", cp.QRd/1e3, c.QRd/1e3)
	}
}
