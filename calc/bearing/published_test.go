package bearing_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// Worked examples from named textbooks, run through the engine with the
// book's inputs. Each row says whether the statement and the printed answer
// were read from a public copy ("confirmed") or recalled ("from memory"),
// and why its tolerance is what it is. examples_test.go holds the earlier
// rows (Das Ex. 3.1 and 3.2, Das's eccentric example, Prandtl, Skempton)
// and the hand calculations.

// Two layers, stronger over weaker (Meyerhof & Hanna 1978, rectangular form
// as in Das). Both published examples are clay over clay, so they exercise
// q_b (lower layer with shape factor, no depth factor), the adhesion term
// 2c_aH/B′·(1 + B′/L′), −γ_1H and the cap q_t; K_s is not involved. The
// books read c_a/c_1 from Meyerhof & Hanna's chart; each example is run
// twice: with the book's c_a/c_1 (Options.CaRatio), which must reproduce
// the printed answer, and with plinth's default straight-line reading,
// which must come out below it (conservative) and within the stated band.
func TestPublishedTwoLayer(t *testing.T) {
	// Murthy, V. N. S. (2002) Geotechnical Engineering: Principles and
	// Practices of Soil Mechanics and Foundation Engineering, Marcel Dekker,
	// Example 12.17 (statement and answer confirmed from the publisher's
	// online chapter excerpt, CRC reissue doi:10.1201/9781482275858):
	// 3 m × 2 m footing at D_f = 1.5 m in very stiff clay, c_1 = 175 kPa,
	// γ_1 = 17.5 kN/m³; medium clay c_2 = 40 kPa, γ_2 = 17.0 kN/m³ from
	// H = 1.5 m below the base. Printed: "q_u < q_t", q_u = 623 kPa,
	// q_a = 623/3 = 208 kPa.
	murthy := func(ca site.Opt) bearing.Input {
		return bearing.Input{
			Ground: site.Ground{Layers: []site.Layer{
				{Name: "Very stiff clay", Top: 0, Gamma: 17.5e3, Cu: site.Some(175e3)},
				{Name: "Medium clay", Top: 3.0, Gamma: 17e3, Cu: site.Some(40e3)},
			}},
			Footing: site.Footing{Shape: site.Rectangle, B: 2, L: 3, D: 1.5},
			Actions: []site.Action{{Name: "G", V: 1000e3}},
			Options: bearing.Options{Approach: design.FS(3), Drainage: bearing.Undrained, LocalShear: bearing.No, CaRatio: ca},
		}
	}
	// Das, B. M. (2011) Principles of Foundation Engineering, 7th ed.,
	// Cengage, §4.4 worked example, stronger clay over weaker clay
	// (statement, chart reading and answer FROM MEMORY; the example number
	// is not recalled): 1.5 m × 1 m footing at D_f = 1 m, c_u1 = 120 kPa,
	// γ_1 = 16.8 kN/m³; c_u2 = 48 kPa, γ_2 = 16.2 kN/m³ from H = 1 m below
	// the base; q_2/q_1 = 0.4, c_a/c_1 ≈ 0.9 from Das's figure, c_a = 108 kPa:
	// q_u = 1.1333·5.14·48 + 1.6667·2·108·1/1 + 16.8 = 279.6 + 360 + 16.8 =
	// 656.4 kPa < q_t = 1.1333·5.14·120 + 16.8 = 715.8 kPa; Q_all = 328 kN.
	das := func(ca site.Opt) bearing.Input {
		return bearing.Input{
			Ground: site.Ground{Layers: []site.Layer{
				{Name: "Stronger clay", Top: 0, Gamma: 16.8e3, Cu: site.Some(120e3)},
				{Name: "Softer clay", Top: 2.0, Gamma: 16.2e3, Cu: site.Some(48e3)},
			}},
			Footing: site.Footing{Shape: site.Rectangle, B: 1, L: 1.5, D: 1},
			Actions: []site.Action{{Name: "G", V: 300e3}},
			Options: bearing.Options{Approach: design.FS(3), Drainage: bearing.Undrained, LocalShear: bearing.No, CaRatio: ca},
		}
	}
	const caseName = "FS(3) · permanent only · G sup · undrained"
	rows := []struct {
		name, source string
		in           bearing.Input
		want         float64 // published q_u (kPa)
		lo, hi       float64 // accepted band got/want
		qt           float64 // published q_t (kPa), 0 = not printed
	}{
		{
			name: "Murthy Ex. 12.17, book's c_a/c_1",
			source: "c_a/c_1 = 0.8314 back-calculated from the printed q_u with Murthy's own form (the chart reading is not in the excerpt), so this row checks " +
				"the rest of the formula: q_b = 1.1333·5.14·40 + 17.5·3.0, s_p = 1 + 2/3, −γ_1H. Band ±0.2 %: answer printed to 3 figures, 5.14 against π + 2 (0.03 %)",
			in: murthy(site.Some(0.8314)), want: 623, lo: 0.998, hi: 1.002,
		},
		{
			name: "Murthy Ex. 12.17, plinth's c_a/c_1",
			source: "plinth reads c_a/c_1 = 0.6 + 0.4·q_2/q_1 = 0.691 at q_2/q_1 = 0.229 against the book's 0.83: q_u = 561.8 kPa, 9.8 % below the book; " +
				"accepted between 12 % below and equal (the straight line is meant to be on the safe side of the chart)",
			in: murthy(site.Opt{}), want: 623, lo: 0.88, hi: 1.0,
		},
		{
			name: "Das §4.4, book's c_a/c_1 (from memory)",
			source: "c_a/c_1 = 0.9 as read by Das from Meyerhof & Hanna's chart at q_2/q_1 = 0.4 (from memory); q_t printed 715.8. " +
				"Band ±0.2 %: 5.14 against π + 2 and rounding to 0.1 kPa",
			in: das(site.Some(0.9)), want: 656.4, lo: 0.998, hi: 1.002, qt: 715.84,
		},
		{
			name:   "Das §4.4, plinth's c_a/c_1 (from memory)",
			source: "plinth's straight line gives c_a/c_1 = 0.76 against Das's 0.9: q_u = 600.5 kPa, 8.5 % below; accepted between 12 % below and equal",
			in:     das(site.Opt{}), want: 656.4, lo: 0.88, hi: 1.0,
		},
	}
	for _, r := range rows {
		res := check(t, r.name, r.in)
		c := caseNamed(t, res, caseName)
		tl := c.TwoLayer
		if tl == nil {
			t.Errorf("%s: no two-layer check (the lower clay lies within 2B below the base)", r.name)
			continue
		}
		got := c.QUlt / kPa
		if f := got / r.want; f < r.lo || f > r.hi {
			t.Errorf("%s: q_ult = %.2f kPa, published %.1f (ratio %.4f outside [%.3f, %.3f])\n\tsource: %s", r.name, got, r.want, f, r.lo, r.hi, r.source)
		}
		if !tl.Governs {
			t.Errorf("%s: punching should govern (the book finds q_u < q_t), q_u %.1f, q_t %.1f", r.name, tl.QU/kPa, tl.QT/kPa)
		}
		if r.qt > 0 && !within(tl.QT/kPa, r.qt, 0.002, 0) {
			t.Errorf("%s: q_t = %.2f kPa, published %.2f ± 0.2 %%", r.name, tl.QT/kPa, r.qt)
		}
	}
}

// Groundwater at the ground surface, checked through the ratio of two
// published answers so that the book's factor set (which no plinth method
// reproduces: N_q = 49, N_γ = 67 read from a chart, 0.4γBN_γ with no shape
// factor on the q term) drops out.
//
// Craig, R. F. (2004) Craig's Soil Mechanics, 7th ed., Spon, Example 8.1
// (statement and answers FROM MEMORY): 2.25 m square footing at D = 1.5 m
// in sand, c′ = 0, φ′ = 38°, γ = 18, γ_sat = 20 kN/m³, γ_w = 9.8 kN/m³;
// (a) water table well below the base: q_f = 1085 + 1323 = 2408 kPa;
// (b) water table at the surface, γ′ = 10.2 kN/m³: q_f = 615 + 750 =
// 1365 kPa. With c′ = 0 and a vertical load both terms scale with the unit
// weight, so (b)/(a) = γ′/γ = 0.5667 in the book's arithmetic and in every
// method of the engine (Das's water-table case I: q′ and γ′ both
// submerged). Published ratio 1365/2408 = 0.56686; tolerance 0.1 % (each
// answer is rounded to 1 kPa: 0.04 % and 0.02 %).
func TestPublishedGroundwaterCraig(t *testing.T) {
	in := func(m bearing.Method, zw float64) bearing.Input {
		return bearing.Input{
			Ground: site.Ground{Water: site.Some(zw), GammaW: 9.8e3, Layers: []site.Layer{
				{Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), Phi: site.Some(38 * deg)},
			}},
			Footing: site.Footing{Shape: site.Square, B: 2.25, D: 1.5},
			Actions: []site.Action{{Name: "G", V: 1000e3}},
			Options: bearing.Options{Method: m, Approach: design.FS(3), LocalShear: bearing.No},
		}
	}
	const want = 1365.0 / 2408.0
	for _, m := range []bearing.Method{bearing.EC7, bearing.Vesic, bearing.Meyerhof, bearing.Hansen, bearing.Terzaghi} {
		dry := check(t, m.String()+" dry", in(m, 50)).Cases[0].QUlt
		wet := check(t, m.String()+" wet", in(m, 0)).Cases[0].QUlt
		if got := wet / dry; !within(got, want, 0.001, 0) {
			t.Errorf("%v: q_ult(water at surface)/q_ult(dry) = %.5f, Craig (2004) Example 8.1 gives 1365/2408 = %.5f ± 0.1 %%", m, got, want)
		}
	}
}

// Design approaches on a published example.
//
// Bond, A. & Harris, A. (2008) Decoding Eurocode 7, Taylor & Francis,
// Example 10.1, "Pad footing on dry sand" (§10.10.1; EN 1997-1 Annex D):
// 2.5 m × 1.5 m pad founded at 0.5 m on dry sand, φ′_k = 35°, c′_k = 0,
// γ = 18 kN/m³; V_Gk = 800 kN plus the footing's weight 2.5·1.5·0.5·25 =
// 46.9 kN, V_Qk = 450 kN. The statement is confirmed by two independent
// public reproductions of the example's data (an open-source verification
// test and a tutorial question that reuses it for DA2); the book's printed
// utilisations could NOT be read, so the expected values below are worked
// by hand to Annex D from the book's data (independent arithmetic, Python):
//
//	DA1-C1  φ′_d 35°      N_q 33.296  N_γ 45.228  s_q 1.3441  s_γ 0.82  q_ult 903.47  V_d 1818.28  util 0.5367
//	DA1-C2  φ′_d 29.256°  N_q 16.921  N_γ 17.837  s_q 1.2932  s_γ 0.82  q_ult 394.40  V_d 1431.88  util 0.9681
//	DA2     as DA1-C1, γ_R;v = 1.4: R_d 2420.0                                         util 0.7514
//	DA3     as DA1-C2 with A1 actions: V_d 1818.28                                     util 1.2294
//
// The open-source reproduction computes 0.752 for DA2 (0.07 % from this).
// Tolerance 1e-4 relative on the hand values. The rows also check which
// case governs (DA1: combination 2) and that DA3, the most onerous here,
// fails (util > 1).
func TestPublishedDesignApproachesBondHarris(t *testing.T) {
	in := func(ap design.Approach) bearing.Input {
		return bearing.Input{
			Ground:  oneLayer(site.Layer{Name: "Dry sand", Top: 0, Gamma: 18e3, Phi: site.Some(35 * deg)}),
			Footing: site.Footing{Name: "Pad", Shape: site.Rectangle, B: 1.5, L: 2.5, D: 0.5},
			Actions: []site.Action{
				{Name: "G", V: 800e3 + 2.5*1.5*0.5*25e3},
				{Name: "Q", Kind: site.Variable, V: 450e3},
			},
			Options: bearing.Options{Approach: ap},
		}
	}
	rows := []struct {
		ap             design.Approach
		caseName       string
		qult, vd, util float64
		governs, ok    bool
	}{
		{design.DA1(), "DA1-C1 · Q leading · G sup · drained", 903.47, 1818.28, 0.5367, false, true},
		{design.DA1(), "DA1-C2 · Q leading · G sup · drained", 394.40, 1431.88, 0.9681, true, true},
		{design.DA2(), "DA2 · Q leading · G sup · drained", 903.47, 1818.28, 0.7514, true, true},
		{design.DA3(), "DA3 · Q leading · G sup · drained", 394.40, 1818.28, 1.2294, true, false},
	}
	for _, r := range rows {
		res := check(t, r.ap.Name, in(r.ap))
		c := caseNamed(t, res, r.caseName)
		for _, x := range []struct {
			what      string
			got, want float64
		}{{"q_ult", c.QUlt / kPa, r.qult}, {"V_d", c.V / kN, r.vd}, {"util", c.Util, r.util}} {
			if !within(x.got, x.want, 1e-4, 0) {
				t.Errorf("%s: %s = %.4f, want %.4f (Bond & Harris 2008 Ex. 10.1 data, hand calculation to Annex D)", r.caseName, x.what, x.got, x.want)
			}
		}
		if got := res.Cases[res.Governing].Name == r.caseName; got != r.governs {
			t.Errorf("%s: governs = %v, want %v", r.caseName, got, r.governs)
		}
		if c.OK != r.ok {
			t.Errorf("%s: OK = %v, want %v", r.caseName, c.OK, r.ok)
		}
	}
}
