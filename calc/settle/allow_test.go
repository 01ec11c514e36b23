package settle_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

func TestAllowable(t *testing.T) {
	in := fourLayerInput(40)
	a, err := settle.Allowable(in, 0.025)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(a.Trace, 1e-9); err != nil {
		t.Fatal(err)
	}
	// s(q_allow) = s_lim within what the q tolerance allows.
	near(t, "s(q_allow)", a.S, 0.025, 1e-6, "Brent to 1 Pa")
	if a.Iter < 1 || a.Iter > 60 || a.Tol <= 0 || a.Tol > 2 {
		t.Errorf("iterations %d, tolerance %g", a.Iter, a.Tol)
	}
	if !(a.Lo < a.Q && a.Q < a.Hi) {
		t.Errorf("q_allow %g outside [%g, %g]", a.Q, a.Lo, a.Hi)
	}
	if len(a.Tries) != a.Iter+2+countBracket(a) {
		t.Logf("tries %d, iterations %d", len(a.Tries), a.Iter)
	}
	near(t, "q_net_allow", a.QNet, a.Q-a.Result.SigmaV0, 1e-9, "q − σ_v0")
	if a.Symbols[0].Symbol != "q_allow" || a.Symbols[0].V != a.Q {
		t.Errorf("symbols %v", a.Symbols)
	}
	if a.Result.Util > 1+1e-4 {
		t.Errorf("util at q_allow %g", a.Result.Util)
	}
}

func countBracket(a *settle.Allow) int { return len(a.Tries) - a.Iter - 2 }

// Elastic settlement on a fixed zone is linear in q_net, so q_allow is
// known in closed form: σ_v0 + q_net·s_lim/s(q_net).
func TestAllowableLinear(t *testing.T) {
	in := settle.Input{Ground: deepClay(20e6), Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1},
		Q: site.Some(118 * kPa), Method: settle.Elastic, Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(12)}}
	r := mustCompute(t, in)
	want := 18*kPa + 100*kPa*0.02/r.Total
	a, err := settle.Allowable(in, 0.02)
	if err != nil {
		t.Fatal(err)
	}
	near(t, "q_allow", a.Q, want, 1.0, "linear elasticity, tolerance 1 Pa")
	// The capacity table: q_allow falls as the footing widens (s ∝ q B).
	prev := math.Inf(1)
	for _, b := range []float64{1, 1.5, 2, 3, 4} {
		in.Footing.B = b
		a, err := settle.Allowable(in, 0.025)
		if err != nil {
			t.Fatal(err)
		}
		if !(a.Q < prev) {
			t.Errorf("B = %g: q_allow %g not below %g", b, a.Q, prev)
		}
		prev = a.Q
	}
}

func TestAllowableErrors(t *testing.T) {
	in := fourLayerInput(40)
	var re *site.RangeError
	if _, err := settle.Allowable(in, 0); !errors.As(err, &re) {
		t.Errorf("s_lim = 0: %v", err)
	}
	// A very stiff ground never reaches 25 mm below 20 MPa.
	rock := settle.Input{Ground: site.Ground{Layers: []site.Layer{{Name: "Rock", Top: 0, Gamma: 24e3, E: site.Some(9000e6)}}},
		Footing: site.Footing{Name: "F", Shape: site.Square, B: 1, D: 0.5}, Method: settle.Elastic}
	var ie *site.InputError
	if _, err := settle.Allowable(rock, 0.025); !errors.As(err, &ie) {
		t.Errorf("unreachable limit: %v", err)
	}
	// Input errors come through.
	bad := in
	bad.Sublayers = -1
	if _, err := settle.Allowable(bad, 0.025); err == nil {
		t.Error("bad input accepted")
	}
}

// Differential settlement: β = δ/L against published limits.
func TestDifferential(t *testing.T) {
	rows := []struct {
		sa, sb, l float64
		code      string
		ok        bool
	}{
		{0.020, 0.012, 6, "", true},                // 1/750
		{0.025, 0.010, 6, "beta-safe", false},      // 1/400 > 1/500 (Bjerrum 1963)
		{0.030, 0.005, 6, "beta-cracking", false},  // 1/240 > 1/300 (Skempton & MacDonald 1956)
		{0.060, 0.010, 6, "beta-structure", false}, // 1/120 > 1/150 (Skempton & MacDonald 1956)
	}
	for _, r := range rows {
		d, err := settle.Differential(settle.DiffInput{A: "P1", B: "P2", SA: r.sa, SB: r.sb, Spacing: r.l})
		if err != nil {
			t.Fatal(err)
		}
		if err := trace.Verify(d.Trace, 1e-9); err != nil {
			t.Error(err)
		}
		near(t, "β", d.Beta, math.Abs(r.sa-r.sb)/r.l, 1e-15, "δ/L")
		code := ""
		for _, c := range d.Trace.Cautions {
			code = c.Code
		}
		if code != r.code || d.OK != r.ok {
			t.Errorf("β = 1/%.0f: caution %q ok %v, want %q %v", 1/d.Beta, code, d.OK, r.code, r.ok)
		}
	}
	// Just past 1/150 (hand calculation: δ = 0.0401 m over 6 m, 1/β = 149.63):
	// the message never reads "1/150 exceeds 1/150".
	d, err := settle.Differential(settle.DiffInput{A: "P1", B: "P2", SA: 0.0501, SB: 0.010, Spacing: 6})
	if err != nil {
		t.Fatal(err)
	}
	if len(d.Trace.Cautions) == 0 || !strings.Contains(d.Trace.Cautions[0].Message, "1/149.6 exceeds 1/150") {
		t.Errorf("cautions %+v, want 1/149.6 exceeds 1/150", d.Trace.Cautions)
	}
	var re *site.RangeError
	if _, err := settle.Differential(settle.DiffInput{SA: 0.01, SB: 0.02, Spacing: 0}); !errors.As(err, &re) {
		t.Errorf("zero spacing: %v", err)
	}
	d, _ = settle.Differential(settle.DiffInput{SA: 0.01, SB: 0.02, Spacing: 10, Limit: site.Some(1.0 / 1000)})
	near(t, "util", d.Util, 1, 1e-12, "β/β_lim")
}
