package bearing_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// The K_s extrapolation warning quotes the φ′_d the governing case's
// working shows (not the first case's), and names that case. Invented
// platform (common practice shape): granular mat φ′ = 34° over soft clay,
// undrained clay (the mat acts drained), DA1: C1 φ′_d = 34°, C2 φ′_d = atan(tan 34°/1.25) = 28.35°, both outside
// BR 470 Table A2's 35°–45°.
func TestKsCautionQuotesGoverning(t *testing.T) {
	in := bearing.Input{
		Ground: site.Ground{Layers: []site.Layer{
			{Name: "Mat", Top: 0, Gamma: 20e3, Phi: site.Some(34 * deg), Type: site.Coarse},
			{Name: "Soft clay", Top: 0.6, Gamma: 17e3, Cu: site.Some(20e3)},
		}},
		Footing: site.Footing{Shape: site.Square, B: 1.5, D: 0},
		Actions: []site.Action{{Name: "G", Kind: site.Permanent, V: 150e3}},
		Options: bearing.Options{Approach: design.DA1(), Sliding: bearing.No, LocalShear: bearing.No, Drainage: bearing.Undrained},
	}
	r := check(t, "ks", in)
	gov := r.Cases[r.Governing].Name
	n := 0
	for _, c := range r.Trace.Cautions {
		if c.Code != "ks-extrapolated" {
			continue
		}
		n++
		if c.Case != gov || !strings.Contains(c.Message, " in "+gov) {
			t.Errorf("caution names %q, governing case is %q: %s", c.Case, gov, c.Message)
		}
		found := false
		for _, s := range r.Trace.Steps {
			if s.Case == gov && s.Symbol == "K_s" {
				for _, v := range s.Inputs {
					if v.Symbol == "phi'_d" && within(v.V, c.Values[0].V, 1e-12, 0) {
						found = true
					}
				}
			}
		}
		if !found {
			t.Errorf("caution φ′_d = %g rad is not the φ′_d of the governing case's K_s step", c.Values[0].V)
		}
	}
	if n != 1 {
		t.Errorf("%d ks-extrapolated cautions, want 1", n)
	}
}
