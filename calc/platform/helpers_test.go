package platform_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/trace"
)

const (
	deg  = math.Pi / 180
	kPa  = 1e3
	kN   = 1e3
	kNm3 = 1e3
)

// design runs platform.Design, fails the test on an error, and replays
// the trace (and every comparison's trace): each formula must reproduce
// its value (trace.Verify, 1e-9), and no summary value is NaN or Inf.
func design(t *testing.T, name string, in platform.Input) *platform.Result {
	t.Helper()
	r, err := platform.Design(in)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	if err := trace.Verify(r.Trace, 1e-9); err != nil {
		t.Fatalf("%s: trace does not verify: %v", name, err)
	}
	for _, k := range r.Cases {
		if k.EC7 != nil {
			if err := trace.Verify(k.EC7.Trace, 1e-9); err != nil {
				t.Fatalf("%s: %s comparison trace does not verify: %v", name, k.Name, err)
			}
		}
	}
	for _, v := range r.Values {
		if math.IsNaN(v.V) || math.IsInf(v.V, 0) {
			t.Fatalf("%s: value %s = %v", name, v.Symbol, v.V)
		}
	}
	return r
}

func hasCaution(tr trace.Trace, code string) bool {
	for _, c := range tr.Cautions {
		if c.Code == code {
			return true
		}
	}
	return false
}

func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Max(math.Abs(want), 1e-12)
}

// clay is the invented site of most tests: a 0.6 m wide track, 40°
// crushed-rock platform (20 kN/m³) on soft-to-firm clay c_u = 30 kPa.
func clay() platform.Input {
	return platform.Input{
		Platform: platform.Platform{Phi: 40 * deg, Gamma: 20 * kNm3},
		Subgrade: platform.Subgrade{Kind: platform.Cohesive, Cu: 30 * kPa, Gamma: 18 * kNm3},
		Cases: []platform.Case{
			{Kind: platform.Case1, Q: 150 * kPa, W: 0.6, L: 3},
			{Kind: platform.Case2, Q: 200 * kPa, W: 0.6, L: 2},
		},
	}
}

// sand is the same rig on a loose granular subgrade φ′ = 30°.
func sand() platform.Input {
	in := clay()
	in.Subgrade = platform.Subgrade{Kind: platform.Granular, Phi: 30 * deg, Gamma: 17 * kNm3}
	return in
}
