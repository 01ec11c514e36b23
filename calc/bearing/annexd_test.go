package bearing_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// EN 1997-1:2004 Annex D factor formulas on spot values. Expected values
// worked by hand from the formulas of D.3 and D.4 (independent arithmetic,
// 6 figures); tolerance 1e-5 relative. Footing 2 m × 4 m (B′/L′ = 0.5),
// φ′ = 30°, c′ = 0, base inclined at α = 10°, H_B = H_L = 100 kN (θ = 45°),
// V = 1000 kN, characteristic values (FS approach).
func TestAnnexDSpotValues(t *testing.T) {
	in := bearing.Input{
		Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(30 * deg)}),
		Footing: site.Footing{Shape: site.Rectangle, B: 2, L: 4, D: 1, Alpha: 10 * deg},
		Actions: []site.Action{{Name: "G", V: 1000e3, HB: 100e3, HL: 100e3}},
		Options: bearing.Options{Approach: design.FS(3), Sliding: bearing.No},
	}
	c := check(t, "D.4 spot", in).Cases[0]
	rows := []struct {
		sym  string
		want float64
		src  string
	}{
		{"N_q", 18.401122, "D.4 N_q = e^(π tanφ′) tan²(45° + φ′/2)"},
		{"N_c", 30.139628, "D.4 N_c = (N_q − 1) cot φ′"},
		{"N_gamma", 20.093085, "D.4 N_γ = 2(N_q − 1) tan φ′"},
		{"s_q", 1.25, "D.4 s_q = 1 + (B′/L′) sin φ′"},
		{"s_gamma", 0.85, "D.4 s_γ = 1 − 0.3 B′/L′"},
		{"s_c", 1.264367, "D.4 s_c = (s_q N_q − 1)/(N_q − 1)"},
		{"m_B", 1.666667, "D.4 m_B = (2 + B′/L′)/(1 + B′/L′)"},
		{"m_L", 1.333333, "D.4 m_L = (2 + L′/B′)/(1 + L′/B′)"},
		{"m", 1.5, "D.4 m = m_L cos²θ + m_B sin²θ, θ = 45°"},
		{"i_q", 0.795555, "D.4 i_q = [1 − H/(V + A′c′cot φ′)]^m"},
		{"i_gamma", 0.683046, "D.4 i_γ = [1 − H/(V + A′c′cot φ′)]^(m+1)"},
		{"i_c", 0.783806, "D.4 i_c = i_q − (1 − i_q)/(N_c tan φ′)"},
		{"b_q", 0.808621, "D.4 b_q = (1 − α tan φ′)²"},
		{"b_gamma", 0.808621, "D.4 b_γ = b_q"},
		{"b_c", 0.797623, "D.4 b_c = b_q − (1 − b_q)/(N_c tan φ′)"},
	}
	for _, r := range rows {
		if got := c.Factors[r.sym]; !within(got, r.want, 1e-5, 0) {
			t.Errorf("%s = %.6f, want %.6f (%s)", r.sym, got, r.want, r.src)
		}
	}
	// D.3 on the same footing on clay, c_u = 50 kPa, H_B = 100 kN only:
	in.Ground = oneLayer(site.Layer{Top: 0, Gamma: 18e3, Cu: site.Some(50e3)})
	in.Actions = []site.Action{{Name: "G", V: 1000e3, HB: 100e3}}
	in.Options.LocalShear = bearing.No
	u := check(t, "D.3 spot", in).Cases[0]
	for _, r := range []struct {
		sym  string
		want float64
		src  string
	}{
		{"b_c", 0.932109, "D.3 b_c = 1 − 2α/(π + 2)"},
		{"s_c", 1.1, "D.3 s_c = 1 + 0.2 B′/L′"},
		{"i_c", 0.933013, "D.3 i_c = ½[1 + √(1 − H/(A′c_u))]"},
	} {
		if got := u.Factors[r.sym]; !within(got, r.want, 1e-5, 0) {
			t.Errorf("%s = %.6f, want %.6f (%s)", r.sym, got, r.want, r.src)
		}
	}
}
