package bearing_test

import (
	"errors"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestFSOn: the two conventions of allowable-stress design (common
// practice; the net one is plinth's default, the gross one is that of
// the textbooks that divide the gross ultimate pressure). Invented pad as
// TestBuoyancyConvention: square 2 m, D = 1.5 m, water 0.5 m below ground
// level, so u_0 = 9.81 kPa and q′ = σ′_v0 = 18 × 0.5 + (20 − 9.81) × 1.0
// = 19.19 kPa (hand calculation). For every case, with q_ult the
// case's ultimate pressure (effective when drained):
//
//	net:   q_Rd = (q_ult − q′)/FS + q′
//	gross: q_Rd = (q_ult + u_0)/FS − u_0 (drained), q_ult/FS (undrained)
//
// and the capacity table's gross pressure with fs_on = gross is the
// gross total q_ult over FS. Tolerance 1e-9 kPa.
func TestFSOn(t *testing.T) {
	g := oneLayer(site.Layer{Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), Cu: site.Some(80e3), Phi: site.Some(30 * math.Pi / 180), C: site.Some(0)})
	g.Water = site.Some(0.5)
	in := bearing.Input{
		Ground:  g,
		Footing: site.Footing{Shape: site.Square, B: 2, D: 1.5},
		Actions: []site.Action{{Name: "Dead", V: 500e3}},
		Options: bearing.Options{Drainage: bearing.Both, Approach: design.FS(3)},
	}
	const u0, qe, sv = 9.81e3, 19.19e3, 18e3*0.5 + 20e3*1.0
	net := check(t, "net", in)
	in.Options.FSOnGross = true
	gross := check(t, "gross", in)
	if len(net.Cases) != len(gross.Cases) || len(net.Cases) == 0 {
		t.Fatalf("%d net cases, %d gross", len(net.Cases), len(gross.Cases))
	}
	for i, n := range net.Cases {
		gc := gross.Cases[i]
		q0, wantG := sv, gc.QUlt/3
		if n.Drainage == bearing.Drained {
			q0, wantG = qe, (gc.QUlt+u0)/3-u0
		}
		if d := math.Abs(n.QRd - ((n.QUlt-q0)/3 + q0)); d > 1e-6 {
			t.Errorf("%s net: q_Rd %.4f kPa, want %.4f", n.Name, n.QRd/1e3, ((n.QUlt-q0)/3+q0)/1e3)
		}
		if d := math.Abs(gc.QRd - wantG); d > 1e-6 {
			t.Errorf("%s gross: q_Rd %.4f kPa, want %.4f", gc.Name, gc.QRd/1e3, wantG/1e3)
		}
		if !(gc.QRd < n.QRd) {
			t.Errorf("%s: gross q_Rd %.2f kPa not below net %.2f kPa (FS > 1)", gc.Name, gc.QRd/1e3, n.QRd/1e3)
		}
	}
	in.Options.Drainage = bearing.Drained
	cp, err := bearing.CapacityAt(in, 2)
	if err != nil {
		t.Fatal(err)
	}
	if want := (cp.QUlt + u0) / 3; math.Abs(cp.QRd-want) > 1e-6 {
		t.Errorf("capacity q_a %.4f kPa, want (q_ult + u_0)/3 = %.4f", cp.QRd/1e3, want/1e3)
	}
	in.Options.Approach = design.DA1()
	if _, err := bearing.Check(in); err == nil {
		t.Error("fs_on = gross with DA1: no error")
	} else {
		var ie *site.InputError
		if !errors.As(err, &ie) || ie.Param != "fs_on" {
			t.Errorf("fs_on = gross with DA1: %v, want an input error on fs_on", err)
		}
	}
}
