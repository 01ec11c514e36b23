package platform_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
)

// Hand calculation, cohesive subgrade (clay(): W = 0.6 m, φ′_p = 40°,
// γ_p = 20 kN/m³, c_u = 30 kPa), from the method's equations:
//
//	case 1: q_d = 1.6 × 150 = 240 kPa; s_c = 1 + 0.2 × 0.6/3 = 1.04;
//	        R_s = 30 × 5.1416 × 1.04 = 160.42 kPa; s_p = 1.2; K_p tanδ = 5.5;
//	        D = √(0.6 × (240 − 160.42)/(20 × 5.5 × 1.2)) = 0.6014 m
//	case 2: q_d = 1.2 × 200 = 240 kPa; s_c = 1.06; R_s = 163.50 kPa; s_p = 1.3;
//	        D = √(0.6 × (240 − 163.50)/(20 × 5.5 × 1.3)) = 0.5665 m
//	subgrade alone, case 1: q_d0 = 2.0 × 150 = 300 kPa, util_0 = 300/160.42 = 1.870
//	platform alone, case 1: R_p = 0.5 × 20 × 0.6 × 109.41 × 0.94 = 617.1 kPa
//
// Tolerance: the hand figures to their last digit; the closed form
// D = √(W(q_d − R_s)/(γ_p K_p tanδ s_p)) recomputed here to 1e-8.
func TestCohesiveHand(t *testing.T) {
	r := design(t, "clay", clay())
	hand := []struct{ rs, d float64 }{{160.42e3, 0.6014}, {163.50e3, 0.5665}}
	for i, k := range r.Cases {
		in := clay().Cases[i]
		rs := 30 * kPa * (math.Pi + 2) * (1 + 0.2*in.W/in.L)
		d := math.Sqrt(in.W * (k.QD - rs) / (20 * kNm3 * 5.5 * (1 + in.W/in.L)))
		if !near(k.Rs, rs, 1e-12) || !near(k.DReq, d, 1e-8) {
			t.Errorf("%s: R_s = %v, D_req = %v; closed form %v, %v", k.Name, k.Rs, k.DReq, rs, d)
		}
		if math.Abs(k.Rs-hand[i].rs) > 0.005e3 || math.Abs(k.DReq-hand[i].d) > 0.00005 {
			t.Errorf("%s: R_s = %.2f kPa, D_req = %.4f m; hand %.2f, %.4f", k.Name, k.Rs/kPa, k.DReq, hand[i].rs/kPa, hand[i].d)
		}
	}
	k := r.Cases[0]
	if math.Abs(k.UtilNone-1.870) > 0.0005 || !k.Needed || math.Abs(k.Rp-617.1e3) > 0.05e3 {
		t.Errorf("case 1: util_0 = %.4f, R_p = %.2f kPa; hand 1.870, 617.1", k.UtilNone, k.Rp/kPa)
	}
	if !near(r.D, r.Cases[0].DReq, 0) || r.Given || !r.Needed || !r.OK {
		t.Errorf("D = %v (given %v, needed %v, ok %v), want case 1's D_req", r.D, r.Given, r.Needed, r.OK)
	}
	for _, sym := range []string{"D", "D_req", "D_min", "D_max", "platform_needed", "util", "R_d1", "R_d2", "util_1", "util_2", "util_0_1", "util_EC7_1"} {
		if _, ok := r.Value(sym); !ok {
			t.Errorf("value %s missing", sym)
		}
	}
}

// Hand calculation, granular subgrade (sand(): φ′_s = 30°, γ_s = 17
// kN/m³; N_γs = 2(N_q + 1) tan 30° = 22.40):
//
//	case 1: R_s = 0.5 × 17 × 0.6 × 22.40 × 0.94 = 107.4 kPa;
//	        D = √(0.6 × (240 − 107.4)/132) = 0.7764 m
//	case 2: R_s = 0.5 × 17 × 0.6 × 22.40 × 0.91 = 104.0 kPa;
//	        D = √(0.6 × (240 − 104.0)/143) = 0.7555 m
//
// Tolerance as for the cohesive case.
func TestGranularHand(t *testing.T) {
	r := design(t, "sand", sand())
	hand := []struct{ rs, d float64 }{{107.4e3, 0.7764}, {104.0e3, 0.7555}}
	phi := 30 * deg
	nq := math.Exp(math.Pi*math.Tan(phi)) * math.Pow(math.Tan(math.Pi/4+phi/2), 2)
	ng := 2 * (nq + 1) * math.Tan(phi)
	for i, k := range r.Cases {
		in := sand().Cases[i]
		rs := 0.5 * 17 * kNm3 * in.W * ng * (1 - 0.3*in.W/in.L)
		d := math.Sqrt(in.W * (k.QD - rs) / (20 * kNm3 * 5.5 * (1 + in.W/in.L)))
		if !near(k.Rs, rs, 1e-12) || !near(k.DReq, d, 1e-8) {
			t.Errorf("%s: R_s = %v, D_req = %v; closed form %v, %v", k.Name, k.Rs, k.DReq, rs, d)
		}
		if math.Abs(k.Rs-hand[i].rs) > 0.05e3 || math.Abs(k.DReq-hand[i].d) > 0.00005 {
			t.Errorf("%s: R_s = %.2f kPa, D_req = %.4f m; hand %.1f, %.4f", k.Name, k.Rs/kPa, k.DReq, hand[i].rs/kPa, hand[i].d)
		}
	}
	if !hasCaution(r.Trace, "platform-granular-form") {
		t.Error("no note on the granular form")
	}
	if r.Cases[0].DReq <= 0.6014 {
		t.Error("a loose sand subgrade should need more platform than the c_u = 30 kPa clay")
	}
}

// Round trip: the thickness solved for, given back as the thickness to
// check, gives utilisation 1 in the case that set it (to 1e-8: Brent's
// tolerance on D is 1e-9 m), and no more than 1 anywhere.
func TestRoundTrip(t *testing.T) {
	for _, base := range []platform.Input{clay(), sand()} {
		for _, depth := range []bool{false, true} {
			in := base
			if depth && in.Subgrade.Kind != platform.Granular {
				continue
			}
			in.Options.DepthTerm = depth
			r := design(t, "solve", in)
			in.D = site.Some(r.D)
			c := design(t, "check", in)
			if !c.Given || !c.OK {
				t.Errorf("%v depth %v: the solved thickness fails when checked", in.Subgrade.Kind, depth)
			}
			g := c.Cases[c.Governing]
			if math.Abs(g.Util-1) > 1e-8 || g.Util > 1+1e-12 {
				t.Errorf("%v depth %v: util at D_req = %.12f, want 1 from below", in.Subgrade.Kind, depth, g.Util)
			}
		}
	}
}

// A given thickness is checked: thinner than required fails, thicker
// passes, and the utilisation falls as D grows (the punching term grows
// with D²).
func TestGivenThickness(t *testing.T) {
	prev := math.Inf(1)
	for _, d := range []float64{0.4, 0.5, 0.6, 0.7, 0.9} {
		in := clay()
		in.D = site.Some(d)
		r := design(t, "given", in)
		u := r.Cases[r.Governing].Util
		if u >= prev {
			t.Errorf("D = %g: util %v not below %v", d, u, prev)
		}
		prev = u
		if want := d >= 0.6015; r.OK != want {
			t.Errorf("D = %g: OK = %v, util %v", d, r.OK, u)
		}
	}
}

// A strong subgrade: c_u = 100 kPa carries case 1 unaided (R_s = 100 ×
// 5.1416 × 1.04 = 534.7 kPa ≥ q_d0 = 300 kPa): no platform needed, D is
// the least thickness, and a note says so, with the c_u above 80 kPa.
func TestNoPlatformNeeded(t *testing.T) {
	in := clay()
	in.Subgrade.Cu = 100 * kPa
	r := design(t, "strong", in)
	if r.Needed || r.D != 0.3 || r.DReq != 0 {
		t.Errorf("needed %v, D = %v, D_req = %v", r.Needed, r.D, r.DReq)
	}
	if v, _ := r.Value("platform_needed"); v.V != 0 {
		t.Errorf("platform_needed = %v", v.V)
	}
	for _, code := range []string{"platform-not-needed", "platform-cu-high"} {
		if !hasCaution(r.Trace, code) {
			t.Errorf("no caution %s", code)
		}
	}
}

// A platform material that cannot carry the pressure itself: φ′_p = 35°,
// q_k = 600 kPa on W = 0.6 m: q_d = 960 kPa > R_p = 0.5 × 20 × 0.6 × 48.03
// × 0.94 = 270.9 kPa. No thickness carries it: a warning, OK false, and
// the result still finite.
func TestPlatformTooWeak(t *testing.T) {
	in := clay()
	in.Platform.Phi = 35 * deg
	in.Cases[0].Q = 600 * kPa
	r := design(t, "weak", in)
	k := r.Cases[0]
	if k.Solvable || r.OK || !hasCaution(r.Trace, "platform-material") {
		t.Errorf("solvable %v, ok %v", k.Solvable, r.OK)
	}
	if math.Abs(k.Rp-270.9e3) > 0.05e3 {
		t.Errorf("R_p = %.2f kPa, hand 270.9", k.Rp/kPa)
	}
	if k.Rd > k.Rp || k.Util <= 1 {
		t.Errorf("R_d = %v above R_p = %v, util %v", k.Rd, k.Rp, k.Util)
	}
}

// The method's limits raise their cautions.
func TestLimits(t *testing.T) {
	soft := clay()
	soft.Subgrade.Cu = 15 * kPa
	weakFill := clay()
	weakFill.Platform.Phi = 33 * deg
	thick := clay()
	thick.Subgrade.Cu = 20 * kPa
	thick.Cases[0].Q = 250 * kPa
	thin := clay()
	thin.D = site.Some(0.2)
	for _, c := range []struct {
		name string
		in   platform.Input
		code string
	}{
		{"c_u below 20 kPa", soft, "platform-cu-low"},
		{"φ′_p below the chart", weakFill, "platform-phi-range"},
		{"D above 1.5 W", thick, "platform-thick"},
		{"D below D_min", thin, "platform-thin"},
	} {
		r := design(t, c.name, c.in)
		if !hasCaution(r.Trace, c.code) {
			t.Errorf("%s: no caution %s; D = %v", c.name, c.code, r.D)
		}
	}
}

// Rounding: with ΔD = 0.05 m the design thickness is 0.65 m (D_req =
// 0.6014 m); a D_req already on the increment is kept.
func TestStep(t *testing.T) {
	in := clay()
	in.Options.Step = 0.05
	if r := design(t, "step", in); math.Abs(r.D-0.65) > 1e-12 {
		t.Errorf("D = %v, want 0.65", r.D)
	}
	in = clay()
	in.Subgrade.Cu = 100 * kPa
	in.Options.Step = 0.1
	if r := design(t, "step", in); math.Abs(r.D-0.3) > 1e-12 {
		t.Errorf("D = %v, want D_min 0.3 kept", r.D)
	}
}

// Bad input: every error is a site.RangeError or InputError naming the
// parameter; nothing is NaN.
func TestBadInput(t *testing.T) {
	mod := func(f func(in *platform.Input)) platform.Input {
		in := clay()
		f(&in)
		return in
	}
	for _, c := range []struct {
		in   platform.Input
		want string
	}{
		{mod(func(in *platform.Input) { in.Platform.Phi = 20 * deg }), "phi'_p = 20 deg: must be at least 25 deg"},
		{mod(func(in *platform.Input) { in.Platform.Phi = math.NaN() }), "phi'_p"},
		{mod(func(in *platform.Input) { in.Platform.Gamma = 5 * kNm3 }), "gamma_p = 5 kN/m3: must be at least 10 kN/m3"},
		{mod(func(in *platform.Input) { in.Subgrade.Cu = 0 }), "c_u = 0 kPa: must be at least 1 kPa"},
		{mod(func(in *platform.Input) { in.Subgrade.Gamma = 0 }), "gamma_s"},
		{mod(func(in *platform.Input) { in.Subgrade.Kind = 7 }), "expected cohesive or granular"},
		{mod(func(in *platform.Input) { in.Cases = nil }), "one or two loading cases; 0 given"},
		{mod(func(in *platform.Input) { in.Cases = append(in.Cases, in.Cases[0]) }), "one or two loading cases; 3 given"},
		{mod(func(in *platform.Input) { in.Cases[1].Kind = platform.Case1 }), "each loading case needs its own name"},
		{mod(func(in *platform.Input) { in.Cases[0].Q = 0 }), "q_k = 0 kPa: must be greater than 0 kPa"},
		{mod(func(in *platform.Input) { in.Cases[0].W = 0.05 }), "W = 0.05 m: must be at least 0.1 m"},
		{mod(func(in *platform.Input) { in.Cases[0].L = 0.5 }), "W is the width, the shorter side"},
		{mod(func(in *platform.Input) { in.Cases[0].Factor = -1 }), "gamma_q = -1: must be greater than 0"},
		{mod(func(in *platform.Input) { in.D = site.Some(0.05) }), "D = 0.05 m: must be at least 0.1 m"},
		{mod(func(in *platform.Input) { in.Options.DepthTerm = true }), "the subgrade is cohesive"},
		{mod(func(in *platform.Input) { in.Options.KpTanDelta = site.Some(0) }), "K_p tan(delta) = 0: must be greater than 0"},
		{mod(func(in *platform.Input) { in.Options.Step = 1 }), "Delta_D = 1 m: must be at most 0.5 m"},
	} {
		r, err := platform.Design(c.in)
		if err == nil || r != nil {
			t.Errorf("%q: no error", c.want)
			continue
		}
		if !strings.Contains(err.Error(), c.want) {
			t.Errorf("error %q lacks %q", err, c.want)
		}
		var re *site.RangeError
		var ie *site.InputError
		if !errors.As(err, &re) && !errors.As(err, &ie) {
			t.Errorf("%q: error %T is neither a RangeError nor an InputError", c.want, err)
		}
	}
}

// Targets (2 shared cores): Design with the comparison under 2 ms and 400
// kB an op (two bearing.Check calls dominate); the method alone under 0.3
// ms and 40 kB.
func BenchmarkDesign(b *testing.B) {
	in := clay()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := platform.Design(in); err != nil {
			b.Fatal(err)
		}
	}
}

// Without the EN 1997-1 comparison: the method alone.
func BenchmarkDesignMethodOnly(b *testing.B) {
	in := clay()
	in.Options.EC7.Off, in.Subgrade.Gamma = true, 0
	b.ReportAllocs()
	for b.Loop() {
		if _, err := platform.Design(in); err != nil {
			b.Fatal(err)
		}
	}
}

// γ_s of a cohesive subgrade is used only by the EN 1997-1 comparison:
// with the comparison off it is refused, and not needed.
func TestGammaSOnlyWhenUsed(t *testing.T) {
	in := clay()
	in.Options.EC7.Off = true
	if _, err := platform.Design(in); err == nil || !strings.Contains(err.Error(), "used only by the EN 1997-1 comparison") {
		t.Errorf("unused γ_s accepted: %v", err)
	}
	in.Subgrade.Gamma = 0
	design(t, "no γ_s", in)
	in.Options.EC7.Off = false
	if _, err := platform.Design(in); err == nil || !strings.Contains(err.Error(), "gamma_s = 0 kN/m3") {
		t.Errorf("missing γ_s accepted for the comparison: %v", err)
	}
}
