package platform_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

func checkMat(t *testing.T, in platform.MatInput) *platform.MatResult {
	t.Helper()
	r, err := platform.Mat(in)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(r.Trace, 1e-9); err != nil {
		t.Fatalf("trace does not verify: %v", err)
	}
	return r
}

// Sizing a square timber mat by hand: F = 400 kN, q_a = 150 kPa, t = 0.2
// m, γ_m = 8 kN/m³. (F + γ_m t B²)/B² = q_a gives B² = F/(q_a − γ_m t) =
// 400/148.4 = 2.6954 m², B_req = 1.6418 m; on a 0.1 m increment B = 1.7 m,
// W_m = 8 × 0.2 × 2.89 = 4.624 kN, q = 404.624/2.89 = 140.0 kPa, util =
// 0.9334. Tolerance: the closed form to 1e-9 m; the hand figures to their
// last digit.
func TestMatSizeSquare(t *testing.T) {
	r := checkMat(t, platform.MatInput{F: 400 * kN, QAllow: 150 * kPa, T: 0.2, Gamma: 8 * kNm3, Step: 0.1})
	if b := math.Sqrt(400 * kN / (150*kPa - 8*kNm3*0.2)); math.Abs(r.BReq-b) > 1e-9 {
		t.Errorf("B_req = %.10f, closed form %.10f", r.BReq, b)
	}
	if math.Abs(r.B-1.7) > 1e-12 || r.L != r.B || math.Abs(r.Weight-4.624*kN) > 1e-6 || math.Abs(r.Q-140.0*kPa) > 0.05*kPa || math.Abs(r.Util-0.9334) > 0.00005 || !r.OK {
		t.Errorf("B = %v, L = %v, W_m = %v, q = %v, util = %v", r.B, r.L, r.Weight, r.Q, r.Util)
	}
	// Without the increment the mat is B_req and the utilisation 1.
	r = checkMat(t, platform.MatInput{F: 400 * kN, QAllow: 150 * kPa, T: 0.2, Gamma: 8 * kNm3})
	if math.Abs(r.Util-1) > 1e-8 || r.Util > 1+1e-12 {
		t.Errorf("util at B_req = %.12f", r.Util)
	}
}

// A rectangle at L/B = 2 and one of fixed L = 3 m, no self-weight: B =
// √(F/(2 q_a)) and F/(3 q_a); a check of a given mat; a fixed L too short
// is an error naming L.
func TestMatPlans(t *testing.T) {
	r := checkMat(t, platform.MatInput{F: 600 * kN, QAllow: 100 * kPa, Plan: platform.MatRatio, Ratio: 2})
	if b := math.Sqrt(600.0 / 200); math.Abs(r.B-b) > 1e-9 || math.Abs(r.L-2*b) > 1e-9 {
		t.Errorf("ratio: B = %v, L = %v", r.B, r.L)
	}
	r = checkMat(t, platform.MatInput{F: 600 * kN, QAllow: 100 * kPa, Plan: platform.MatFixedL, L: 3})
	if math.Abs(r.B-2) > 1e-9 || r.L != 3 {
		t.Errorf("fixed L: B = %v, L = %v", r.B, r.L)
	}
	r = checkMat(t, platform.MatInput{F: 600 * kN, QAllow: 100 * kPa, Plan: platform.MatFixedL, B: 1.5, L: 3})
	if math.Abs(r.Q-600.0/4.5*kPa) > 1e-6 || r.OK || r.Sized {
		t.Errorf("check: q = %v, ok %v", r.Q, r.OK)
	}
	_, err := platform.Mat(platform.MatInput{F: 600 * kN, QAllow: 100 * kPa, Plan: platform.MatFixedL, L: 2})
	if err == nil || !strings.Contains(err.Error(), "too short") {
		t.Errorf("short L: %v", err)
	}
}

// The stress at the subgrade below a 1.7 m square mat at z = 0.6 m: load
// spread 2:1, Δσ = q B²/(B + z)² (Holtz & Kovacs 1981); Boussinesq under
// the centre, Δσ = q·4·I(B/2z, B/2z) (Newmark 1935), both as calc/stress
// gives them (stress.Influence), to 1e-12.
func TestMatStress(t *testing.T) {
	r := checkMat(t, platform.MatInput{F: 400 * kN, QAllow: 150 * kPa, T: 0.2, Gamma: 8 * kNm3, Step: 0.1, Z: site.Some(0.6)})
	f := site.Footing{Shape: site.Square, B: 1.7}
	sp, _ := stress.Influence(f, stress.Options{Method: stress.Spread}, 0.6)
	ce, _ := stress.Influence(f, stress.Options{}, 0.6)
	if !near(r.Spread, r.Q*sp, 1e-12) || !near(r.Spread, r.Q*1.7*1.7/(2.3*2.3), 1e-12) || !near(r.Centre, r.Q*ce, 1e-12) {
		t.Errorf("spread %v (%v), centre %v (%v)", r.Spread, r.Q*sp, r.Centre, r.Q*ce)
	}
	if !(r.Centre > r.Spread && r.Spread < r.Q) {
		t.Errorf("the centre stress should exceed the average and both be below q: %v %v %v", r.Centre, r.Spread, r.Q)
	}
	if _, ok := func() (trace.Value, bool) {
		for _, v := range r.Values {
			if v.Symbol == "Delta_sigma_s" {
				return v, true
			}
		}
		return trace.Value{}, false
	}(); !ok {
		t.Error("no Delta_sigma_s value")
	}
}

// The mat as a loading case of the platform method: its pressure on its
// B × L.
func TestMatAsCase(t *testing.T) {
	m := checkMat(t, platform.MatInput{F: 400 * kN, QAllow: 150 * kPa, B: 1.5})
	in := clay()
	in.Cases = []platform.Case{m.Case("Outrigger", platform.Case1)}
	r := design(t, "mat case", in)
	if k := r.Cases[0]; k.W != 1.5 || k.L != 1.5 || !near(k.Q, 400*kN/2.25, 1e-12) {
		t.Errorf("case %+v", k)
	}
}

func TestMatBadInput(t *testing.T) {
	for _, c := range []struct {
		in   platform.MatInput
		want string
	}{
		{platform.MatInput{F: 0, QAllow: 100 * kPa}, "F = 0 kN: must be greater than 0 kN"},
		{platform.MatInput{F: 100 * kN}, "q_a = 0 kPa: must be greater than 0 kPa"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, Plan: platform.MatRatio}, "L/B = 0: must be at least 1"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, B: 0.05}, "B = 0.05 m: must be at least 0.1 m"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, Plan: platform.MatFixedL, B: 2, L: 1}, "B is the shorter side"},
		{platform.MatInput{F: 100 * kN, QAllow: 10 * kPa, T: 1, Gamma: 20 * kNm3}, "no size carries any load"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, T: 0.2}, "gamma_m = 0 kN/m3: must be at least 1 kN/m3"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, Z: site.Some(-1)}, "z = -1 m: must be at least 0 m"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, Angle: 70 * deg}, "spread angle = 70 deg"},
		{platform.MatInput{F: 100 * kN, QAllow: 100 * kPa, Plan: 9}, "expected square, a ratio L/B or a fixed L"},
	} {
		r, err := platform.Mat(c.in)
		if err == nil || r != nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("want %q, got %v", c.want, err)
			continue
		}
		var re *site.RangeError
		var ie *site.InputError
		if !errors.As(err, &re) && !errors.As(err, &ie) {
			t.Errorf("%q: %T", c.want, err)
		}
	}
}

func BenchmarkMat(b *testing.B) {
	in := platform.MatInput{F: 400 * kN, QAllow: 150 * kPa, T: 0.2, Gamma: 8 * kNm3, Step: 0.1, Z: site.Some(0.6)}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := platform.Mat(in); err != nil {
			b.Fatal(err)
		}
	}
}
