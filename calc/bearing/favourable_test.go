package bearing_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// Governing cases with an uplifting variable action (EN 1990:2002
// 6.4.3.2(3): a variable action only where unfavourable). Pad 2 m × 2 m,
// D 1 m, on sand φ′ 32°, DA2. Hand calculation of the design loads:
// greatest V without the uplift 1.35·500 = 675 kN; least V with it
// 500 − 1.5·80 = 380 kN. Vertical load only: bearing is governed by
// 675 kN, the uplift left out. With a horizontal wind of 40 kN sliding is
// governed by the least V, the uplift in (500 − 1.5·0.6·80 = 428 kN with
// wind leading; 500 − 120 = 380 kN with the uplift leading, H 1.5·0.6·40
// = 36 kN: H/V 60/428 = 0.140 against 36/380 = 0.095). Exact on V_d.
func TestUpliftGoverning(t *testing.T) {
	in := bearing.Input{
		Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(32 * math.Pi / 180)}),
		Footing: site.Footing{Shape: site.Square, B: 2, D: 1},
		Actions: []site.Action{{Name: "Dead", V: 500e3}, {Name: "Uplift", Kind: site.Variable, V: -80e3, Psi0: site.Some(0.6)}},
		Options: bearing.Options{Drainage: bearing.Drained, Approach: design.DA2()},
	}
	r := check(t, "uplift", in)
	g := r.Cases[r.Governing]
	if g.V != 675e3 || g.Name != "DA2 · permanent only · G sup · left out as favourable: Uplift · drained" {
		t.Errorf("bearing governed by %s, V_d %g kN; want the uplift left out, 675 kN", g.Name, g.V/kN)
	}
	caseNamed(t, r, "DA2 · Uplift leading · G inf · drained")

	in.Actions = append(in.Actions, site.Action{Name: "Wind", Kind: site.Variable, HB: 40e3, Psi0: site.Some(0.6)})
	r = check(t, "uplift and wind", in)
	if r.GoverningSliding < 0 {
		t.Fatal("no sliding case")
	}
	s := r.Sliding[r.GoverningSliding]
	if s.Name != "DA2 · Wind leading · G inf · sliding drained" || math.Abs(s.V-428e3) > 1e-6 {
		t.Errorf("sliding governed by %s, V'_d %g kN; want wind leading with the uplift in, 428 kN", s.Name, s.V/kN)
	}
}

// TestAllUpliftNotVerified: when every design load lifts the base
// (V_d ≤ 0), bearing is not verified: the result is NOT OK with the
// reason, not "no checks, OK". Pad loaded by a net uplift of 100 kN
// (invented); DA1: the least upward load is 1.0·(−100) = −100 kN (C1 and
// C2, γ_G,inf = 1.0 on the upward permanent action in the G sup family;
// hand calculation).
func TestAllUpliftNotVerified(t *testing.T) {
	in := bearing.Input{
		Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(32 * math.Pi / 180)}),
		Footing: site.Footing{Shape: site.Square, B: 2, D: 1},
		Actions: []site.Action{{Name: "Net uplift", V: -100e3}},
		Options: bearing.Options{Drainage: bearing.Drained, Approach: design.DA1()},
	}
	r, err := bearing.Check(in)
	if err != nil {
		t.Fatal(err)
	}
	if r.OK || len(r.Cases) != 0 || r.Uplift == 0 || r.Unverified == "" {
		t.Fatalf("OK %v, %d cases, %d uplift loads, unverified %q", r.OK, len(r.Cases), r.Uplift, r.Unverified)
	}
	if r.UpliftV != -100e3 {
		t.Errorf("largest V_d %g kN, want -100", r.UpliftV/kN)
	}
}
