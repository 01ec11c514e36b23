package bearing_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
)

const deg = math.Pi / 180

// within reports whether got is within rel (relative) or abs (absolute)
// of want.
func within(got, want, rel, abs float64) bool {
	d := math.Abs(got - want)
	return d <= abs || d <= rel*math.Abs(want)
}

// Terzaghi (1943) factors. Source: Das, B. M., Principles of Foundation
// Engineering, 7th ed. (2011), Table 3.1 (N_γ after Kumbhojkar 1993); the
// rows were written from memory of that table and are now confirmed: N_c
// and N_q are Terzaghi's closed forms, evaluated independently for this
// check (Python, double precision) to the printed digits; N_γ against an
// independent log-spiral evaluation of Kumbhojkar's mechanism
// (TestKumbhojkarLogSpiral); the 25° row (25.13, 12.72, 8.34) is the one
// Das's Example 3.1 uses (problem statement reproduced at unipeppa.com).
// Terzaghi's own chart values of N_γ, reproduced e.g. at
// geotechnicalinfo.com (9.7 at 25°, 19.7 at 30°, 42.4 at 35°, 100.4 at
// 40°), are a different published set; plinth uses Kumbhojkar's.
// Tolerance 0.3 % or 0.01 (the table prints two decimals). φ = 18° is left
// out of the N_c check: the printed 15.12 does not follow from the table's
// own N_q (6.04 → 15.51, the closed form gives 15.52).
func TestTerzaghiFactors(t *testing.T) {
	rows := []struct{ phi, nc, nq, ng float64 }{
		{0, 5.70, 1.00, 0.00}, {5, 7.34, 1.64, 0.14}, {10, 9.61, 2.69, 0.56},
		{15, 12.86, 4.45, 1.52}, {20, 17.69, 7.44, 3.64}, {25, 25.13, 12.72, 8.34},
		{30, 37.16, 22.46, 19.13}, {32, 44.04, 28.52, 26.87}, {35, 57.75, 41.44, 45.41},
		{38, 77.50, 61.55, 78.61}, {40, 95.66, 81.27, 115.31}, {42, 119.67, 108.75, 171.99},
		{45, 172.28, 173.28, 325.34},
	}
	for _, r := range rows {
		f := bearing.Factors(bearing.Terzaghi, r.phi*deg)
		if !within(f.Nc, r.nc, 3e-3, 0.01) || !within(f.Nq, r.nq, 3e-3, 0.01) || !within(f.Ngamma, r.ng, 1e-9, 0.005) {
			t.Errorf("Das (2011) Table 3.1, φ = %g°: got N_c %.2f N_q %.2f N_γ %.2f, want %.2f %.2f %.2f", r.phi, f.Nc, f.Nq, f.Ngamma, r.nc, r.nq, r.ng)
		}
	}
	// interpolation between tabulated degrees is linear
	if got, want := bearing.TerzaghiNgamma(30.5*deg), (19.13+22.65)/2; math.Abs(got-want) > 1e-9 {
		t.Errorf("N_γ(30.5°) = %v, want %v", got, want)
	}
}

// N_c, N_q (common to EC7, Vesić, Meyerhof, Hansen) and N_γ of Hansen
// (1970), Meyerhof (1963) and Vesić (1973). Source: Bowles, J. E.,
// Foundation Analysis and Design, 5th ed. (1996), Table 4-4 (values of the
// closed forms of its Table 4-1). The rows were first written from memory;
// each is now checked against an independent evaluation of the closed
// forms (Python, double precision) and, for 0°–40°, against the Meyerhof,
// Hansen and Vesić tables reproduced at geotechnicalinfo.com ("bearing
// capacity factors", e.g. 40°: N_c 75.3, N_q 64.2, N_γ 79.54 Hansen, 93.7
// Meyerhof, 109.4 Vesić). Corrected: the 40° and 45° rows recalled 0.1–0.2
// % low (N_c 75.25, 133.73; N_q 64.1, 134.7; N_γ 79.4/93.6/109.3 and
// 200.5/262.3/271.3) now carry the formula values. Tolerance 0.5 % or 0.06
// absolute (Bowles prints N_q and the N_γ to one decimal).
func TestClassicFactors(t *testing.T) {
	rows := []struct{ phi, nc, nq, ngH, ngM, ngV float64 }{
		{0, 5.14, 1.0, 0.0, 0.0, 0.0},
		{5, 6.49, 1.6, 0.1, 0.1, 0.4},
		{10, 8.34, 2.5, 0.4, 0.4, 1.2},
		{15, 10.97, 3.9, 1.2, 1.1, 2.6},
		{20, 14.83, 6.4, 2.9, 2.9, 5.4},
		{25, 20.71, 10.7, 6.8, 6.8, 10.9},
		{30, 30.13, 18.4, 15.1, 15.7, 22.4},
		{35, 46.12, 33.3, 33.9, 37.1, 48.0},
		{40, 75.31, 64.2, 79.54, 93.69, 109.41},
		{45, 133.87, 134.87, 200.81, 262.74, 271.75},
	}
	for _, r := range rows {
		h := bearing.Factors(bearing.Hansen, r.phi*deg)
		m := bearing.Factors(bearing.Meyerhof, r.phi*deg)
		v := bearing.Factors(bearing.Vesic, r.phi*deg)
		ok := within(h.Nc, r.nc, 5e-3, 0.06) && within(h.Nq, r.nq, 5e-3, 0.06) &&
			within(h.Ngamma, r.ngH, 5e-3, 0.06) && within(m.Ngamma, r.ngM, 5e-3, 0.06) && within(v.Ngamma, r.ngV, 5e-3, 0.06)
		if !ok {
			t.Errorf("Bowles (1996) Table 4-4, φ = %g°: got N_c %.2f N_q %.2f N_γ H %.2f M %.2f V %.2f; want %v", r.phi, h.Nc, h.Nq, h.Ngamma, m.Ngamma, v.Ngamma, r)
		}
	}
}

// EN 1997-1:2004 Annex D, D.4: N_γ = 2(N_q − 1) tan φ′. Values as
// commonly tabulated for EN 1997-1 (first written from memory), two
// decimals; confirmed by an independent evaluation of the D.4 formulas
// (Python, double precision) at every row, and at 30° by the Annex D worked
// example in Smith, Elements of Soil Mechanics (reproduced at
// what-when-how.com: N_q = 18.4, N_γ = 20.1). Tolerance 0.01.
func TestEC7Factors(t *testing.T) {
	rows := []struct{ phi, nq, ng float64 }{
		{5, 1.57, 0.10}, {10, 2.47, 0.52}, {15, 3.94, 1.58}, {20, 6.40, 3.93}, {25, 10.66, 9.01},
		{30, 18.40, 20.09}, {35, 33.30, 45.23}, {40, 64.20, 106.05}, {45, 134.87, 267.75},
	}
	for _, r := range rows {
		f := bearing.Factors(bearing.EC7, r.phi*deg)
		if !within(f.Nq, r.nq, 0, 0.01) || !within(f.Ngamma, r.ng, 0, 0.01) {
			t.Errorf("EN 1997-1 D.4, φ′ = %g°: got N_q %.3f N_γ %.3f, want %.2f %.2f", r.phi, f.Nq, f.Ngamma, r.nq, r.ng)
		}
	}
}

// Prandtl (1921): N_c → π + 2 as φ → 0, for every method but Terzaghi's
// (1.5π + 1, Terzaghi 1943). Tolerance 1e-5 (N_c rises by about 13·φ near 0).
func TestPrandtl(t *testing.T) {
	for _, m := range []bearing.Method{bearing.EC7, bearing.Vesic, bearing.Meyerhof, bearing.Hansen} {
		for _, phi := range []float64{0, 1e-7} {
			if got := bearing.Factors(m, phi).Nc; math.Abs(got-(math.Pi+2)) > 1e-5 {
				t.Errorf("%v: N_c(%g) = %.9f, want π + 2", m, phi, got)
			}
		}
	}
	if got := bearing.Factors(bearing.Terzaghi, 0).Nc; math.Abs(got-(1.5*math.Pi+1)) > 1e-9 {
		t.Errorf("Terzaghi N_c(0) = %v, want 1.5π + 1", got)
	}
}

// BR 470 (2004) Table A2, K_p·tanδ of the platform material: 35°: 3.1,
// 40°: 5.5, 45°: 10.0. First written from memory; confirmed against two
// independent public reproductions of the table (web pages of working-
// platform design aids in public repositories, both "Table A2 — punching
// shear coefficient Kp·tanδ": 3.1, 5.5, 10.0). Exact at the table's
// angles; between them plinth interpolates ln(K_p·tanδ) linearly (those
// reproductions interpolate linearly, which is higher between the nodes:
// 4.30 against 4.13 at 37.5°; plinth's reading is the lower, safe one).
// c_a/c_1 = 0.6 + 0.4·q_2/q_1 is plinth's straight-line reading of Meyerhof
// & Hanna's (1978) chart, still from memory (see tables.go).
func TestKpTanDelta(t *testing.T) {
	for _, r := range []struct{ phi, want float64 }{{35, 3.1}, {40, 5.5}, {45, 10.0}, {37.5, math.Sqrt(3.1 * 5.5)}} {
		if got := bearing.KpTanDelta(r.phi * deg); math.Abs(got-r.want) > 1e-9 {
			t.Errorf("Kp·tanδ(%g°) = %v, want %v", r.phi, got, r.want)
		}
	}
	if bearing.CaRatio(0) != 0.6 || bearing.CaRatio(1) != 1 || bearing.CaRatio(2) != 1 {
		t.Error("c_a/c_1 end points")
	}
}
