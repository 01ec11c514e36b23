package design_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

type wantLoad struct {
	name      string
	v, hb, mb float64 // kN, kNm (per metre for the wall)
}

func checkLoads(t *testing.T, what string, acts []site.Action, ap design.Approach, want []wantLoad) {
	t.Helper()
	loads := design.Loads(acts, ap)
	if len(loads) != len(want) {
		var ns []string
		for _, l := range loads {
			ns = append(ns, l.Name)
		}
		t.Fatalf("%s: got %d loads %q, want %d", what, len(loads), ns, len(want))
	}
	for i, w := range want {
		l := loads[i]
		if l.Name != w.name || math.Abs(l.V/1e3-w.v) > 1e-9 || math.Abs(l.HB/1e3-w.hb) > 1e-9 || math.Abs(l.MB/1e3-w.mb) > 1e-9 {
			t.Errorf("%s load %d: %s V %.3f H_B %.3f M_B %.3f, want %v", what, i, l.Name, l.V/1e3, l.HB/1e3, l.MB/1e3, w)
		}
		var tr trace.Trace
		l.Record(&tr, acts, l.Name, "kN/m", "kNm/m")
		tr.Cite(trace.EN1990)
		tr.Cite(trace.EN1997)
		if err := trace.Verify(tr, 1e-12); err != nil {
			t.Errorf("%s: %s: %v", what, l.Name, err)
		}
		// The working's sums (the recorder's) are the load's (Loads').
		for _, st := range tr.Steps {
			want, ok := map[string]float64{"V_d": l.V, "H_B_d": l.HB, "H_L_d": l.HL, "M_B_d": l.MB, "M_L_d": l.ML}[st.Symbol]
			if ok && math.Abs(st.Value-want) > 1e-9*math.Max(1, math.Abs(want)) {
				t.Errorf("%s: %s: %s = %v in the working, %v in the load", what, l.Name, st.Symbol, st.Value, want)
			}
		}
	}
}

// A cantilever retaining wall's base (strip, per metre run), DA1. Hand
// calculation after EN 1990:2002 eq. (6.10), 6.4.3.2(3) and Table
// A1.2(B) note 3 (unfavourable permanent effects at γ_G,sup, favourable
// at γ_G,inf; variable effects at γ_Q where unfavourable, 0 where
// favourable) with the factors of EN 1997-1:2004 Table A.3 (A1: 1.35,
// 1.0, 1.5, as EN 1990 Table A1.2(B); A2: 1.0, 1.0, 1.3, as Table
// A1.2(C)); DA2 and DA3 use A1 and give the C1 values. Invented characteristic actions at the
// centre of the base: wall and base G_w: V 150; soil over the heel G_s:
// V 200; earth thrust G_t: H_B 80, M_B 120 (at 1.5 m); surcharge of
// 10 kPa on the 3 m heel Q_s (ψ0 0.7): V 30 on the heel and its thrust
// H_B 20 in one row (moment left out for a clear check); uplift on a
// barrier on the wall Q_u (ψ0 0.6): V −40. Exact (tolerance 1e-9 kN).
//
// Greatest V ("G sup"): every downward V and the thrust unfavourable;
// Q_u is favourable and left out; only Q_s can lead.
//
//	C1: V = 1.35(150 + 200) + 1.5·30 = 517.5; H = 1.35·80 + 1.5·20 = 138;
//	    M = 1.35·120 = 162.
//	C2: V = 350 + 1.3·30 = 389; H = 80 + 1.3·20 = 106; M = 120.
//
// Least V ("G inf"): G_w and G_s favourable (γ_G,inf), the thrust
// unfavourable (γ_G,sup), Q_s split — its V (resisting sliding) left out,
// its H (driving it) at γ_Q — and Q_u unfavourable.
//
//	C1, Q_s leading: V = 350 − 1.5·0.6·40 = 314; H = 108 + 1.5·20 = 138.
//	C1, Q_u leading: V = 350 − 1.5·40 = 290; H = 108 + 1.5·0.7·20 = 129.
//	C2, Q_s leading: V = 350 − 1.3·0.6·40 = 318.8; H = 80 + 26 = 106.
//	C2, Q_u leading: V = 350 − 1.3·40 = 298; H = 80 + 1.3·0.7·20 = 98.2.
//
// Bearing is governed by the greatest V, which leaves the uplift out;
// sliding (H/V 129/290 = 0.445 against 138/314 = 0.439) by the uplift
// leading with the surcharge's V left out.
func TestLoadsWall(t *testing.T) {
	acts := []site.Action{
		{Name: "Wall", V: 150e3},
		{Name: "Heel soil", V: 200e3},
		{Name: "Thrust", HB: 80e3, MB: 120e3},
		{Name: "Surcharge", Kind: site.Variable, V: 30e3, HB: 20e3, Psi0: site.Some(0.7)},
		{Name: "Uplift", Kind: site.Variable, V: -40e3, Psi0: site.Some(0.6)},
	}
	checkLoads(t, "wall", acts, design.DA1(), []wantLoad{
		{"DA1-C1 · Surcharge leading · G sup · left out as favourable: Uplift", 517.5, 138, 162},
		{"DA1-C1 · Surcharge leading · G inf on V · left out as favourable: Surcharge V", 314, 138, 162},
		{"DA1-C1 · Uplift leading · G inf on V · left out as favourable: Surcharge V", 290, 129, 162},
		{"DA1-C2 · Surcharge leading · G sup · left out as favourable: Uplift", 389, 106, 120},
		{"DA1-C2 · Surcharge leading · G inf · left out as favourable: Surcharge V", 318.8, 106, 120},
		{"DA1-C2 · Uplift leading · G inf · left out as favourable: Surcharge V", 298, 98.2, 120},
	})
	for _, ap := range []design.Approach{design.DA2(), design.DA3()} {
		n := ap.CombinationName(0)
		checkLoads(t, "wall "+n, acts, ap, []wantLoad{
			{n + " · Surcharge leading · G sup · left out as favourable: Uplift", 517.5, 138, 162},
			{n + " · Surcharge leading · G inf on V · left out as favourable: Surcharge V", 314, 138, 162},
			{n + " · Uplift leading · G inf on V · left out as favourable: Surcharge V", 290, 129, 162},
		})
	}
	// the split is printed in the working of the case
	l := design.Loads(acts, design.DA1())[1]
	var tr trace.Trace
	l.Record(&tr, acts, l.Name, "kN/m", "kNm/m")
	found := false
	for _, s := range tr.Steps {
		if s.Symbol == "gamma_Q_inf" {
			found = s.Value == 0 && strings.Contains(s.Note, "Surcharge V (split: its H_B at γ_Q)")
		}
	}
	if !found {
		t.Errorf("no gamma_Q_inf step printing the split of Surcharge: %+v", tr.Steps)
	}
}

// Table of smaller cases, each a hand calculation by the rules above
// (EN 1990:2002 6.4.3.2(3), Table A1.2(B); factors EN 1997-1 Table A.3,
// DA2 = A1). Exact.
func TestLoadsFavourable(t *testing.T) {
	cases := []struct {
		what string
		acts []site.Action
		want []wantLoad
	}{{
		// an uplifting variable action on a pad with vertical loads only:
		// left out of the greatest-V case (1.35·500 = 675), in the least
		// (500 − 1.5·80 = 380)
		"uplift", []site.Action{{Name: "Dead", V: 500e3}, {Name: "Uplift", Kind: site.Variable, V: -80e3}},
		[]wantLoad{
			{"DA2 · permanent only · G sup · left out as favourable: Uplift", 675, 0, 0},
			{"DA2 · Uplift leading · G inf", 380, 0, 0},
		},
	}, {
		// a variable action marked favourable is always left out
		"marked", []site.Action{{Name: "Dead", V: 500e3}, {Name: "Imposed", Kind: site.Variable, V: 100e3, Favourable: true}},
		[]wantLoad{{"DA2 · permanent only · G sup · left out as favourable: Imposed", 675, 0, 0}},
	}, {
		// a horizontal variable action against the net H is favourable:
		// W2 (H_B −10 against +30 net) is left out; W1 leads (1.5·40)
		"opposing H", []site.Action{{Name: "Dead", V: 500e3}, {Name: "W1", Kind: site.Variable, HB: 40e3}, {Name: "W2", Kind: site.Variable, HB: -10e3}},
		[]wantLoad{
			{"DA2 · W1 leading · G sup · left out as favourable: W2", 675, 60, 0},
			{"DA2 · W1 leading · G inf · left out as favourable: W2", 500, 60, 0},
		},
	}, {
		// a permanent upward action (buoyancy) is favourable in the
		// greatest-V case (γ_G,inf: 1.35·500 − 100 = 575) and unfavourable
		// in the least (500 − 1.35·100 = 365)
		"buoyancy", []site.Action{{Name: "Dead", V: 500e3}, {Name: "Buoyancy", V: -100e3}},
		[]wantLoad{
			{"DA2 · permanent only · G sup", 575, 0, 0},
			{"DA2 · permanent only · G inf", 365, 0, 0},
		},
	}, {
		// a permanent action marked favourable is at γ_G,inf in both
		"counterweight", []site.Action{{Name: "Dead", V: 500e3, MB: 50e3}, {Name: "Block", V: 100e3, Favourable: true}},
		[]wantLoad{
			{"DA2 · permanent only · G sup", 775, 0, 67.5},
			{"DA2 · permanent only · G inf on V", 600, 0, 67.5},
		},
	}}
	for _, c := range cases {
		checkLoads(t, c.what, c.acts, design.DA2(), c.want)
	}
}

// However many variable actions, a combination has at most two cases per
// variable action (each leading in each family), not 2^n.
func TestLoadsBounded(t *testing.T) {
	acts := []site.Action{{Name: "Dead", V: 1000e3, HB: 10e3}}
	for i := range 12 {
		acts = append(acts, site.Action{Name: "Q" + string(rune('a'+i)), Kind: site.Variable, V: float64(i+1) * 10e3, HB: float64(i%3-1) * 5e3})
	}
	loads := design.Loads(acts, design.DA1())
	if len(loads) > 2*2*12 {
		t.Errorf("%d loads for 12 variable actions in DA1", len(loads))
	}
	for _, l := range loads {
		if l.V <= 0 || math.IsNaN(l.V) {
			t.Errorf("%s: V %g", l.Name, l.V)
		}
	}
}

// A variable action marked favourable is never in a load, so its missing
// ψ0 is not reported as defaulted (common practice).
func TestPsiDefaultedFavourable(t *testing.T) {
	acts := []site.Action{
		{Name: "Dead", V: 100e3},
		{Name: "Imposed", Kind: site.Variable, V: 50e3},
		{Name: "Ballast", Kind: site.Variable, V: 10e3, Favourable: true},
	}
	if got := design.PsiDefaulted(acts); len(got) != 0 {
		t.Errorf("PsiDefaulted = %q, want none (one variable action in the loads)", got)
	}
}
