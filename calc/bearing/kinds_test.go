package bearing_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Every step's value is its formula evaluated (bit for bit: the recorder
// computed it), or the step says which kind of value it is; the factors
// that Factors publishes are the N steps of the working, bit for bit, so
// the two have one definition. Invented ground: sand over soft clay (a
// two-layer check), every method.
func TestStepsAreTheirFormulas(t *testing.T) {
	ground := site.Ground{Water: site.Some(1.2), Layers: []site.Layer{
		{Name: "Sand", Top: 0, Gamma: 19e3, GammaSat: site.Some(20e3), Phi: site.Some(36 * deg), Dr: site.Some(0.6)},
		{Name: "Clay", Top: 1.6, Gamma: 17e3, GammaSat: site.Some(18e3), Cu: site.Some(25e3), Phi: site.Some(22 * deg), C: site.Some(2e3)},
	}}
	for _, m := range methods {
		in := bearing.Input{Ground: ground,
			Footing: site.Footing{Shape: site.Rectangle, B: 2, L: 3, D: 0.8, Alpha: 3 * deg},
			Actions: []site.Action{{Name: "G", V: 700e3, HB: 40e3, MB: 30e3}, {Name: "Q", Kind: site.Variable, V: 200e3, HL: 15e3}},
			Options: bearing.Options{Method: m, Approach: design.DA1(), Drainage: bearing.Both}}
		r := check(t, m.String(), in)
		kinds := map[trace.Kind]int{}
		phi := map[string]float64{}
		for i, s := range r.Trace.Steps {
			kinds[s.Kind]++
			if s.Symbol == "phi'_d" {
				phi[s.Case] = s.Value
			}
			switch {
			case s.Formula == nil && s.Kind == trace.ByFormula:
				t.Errorf("%v step %d %s: no formula, kind %v", m, i, s.Symbol, s.Kind)
			case s.Formula != nil && s.Kind == trace.ByFormula:
				v, err := trace.Eval(s.Formula, s.Inputs)
				if err != nil || v != s.Value {
					t.Errorf("%v step %d %s: formula gives %v (%v), step holds %v", m, i, s.Symbol, v, err, s.Value)
				}
			}
			switch s.Symbol {
			case "K_p_tan_delta":
				if s.Kind != trace.Interpolated {
					t.Errorf("%v %s: kind %v, want interpolated", m, s.Symbol, s.Kind)
				}
			case "N_gamma":
				if want := trace.ByFormula; m == bearing.Terzaghi && s.Kind != trace.Interpolated || m != bearing.Terzaghi && s.Kind != want {
					t.Errorf("%v %s: kind %v", m, s.Symbol, s.Kind)
				}
			}
		}
		t.Logf("%v: %d steps, kinds %v", m, len(r.Trace.Steps), kinds)
		if kinds[trace.ByFormula] == 0 || kinds[trace.Given] == 0 {
			t.Errorf("%v: kinds %v", m, kinds)
		}
		// Factors at each case's φ′_d reproduces the N steps of that case
		for _, s := range r.Trace.Steps {
			p, ok := phi[s.Case]
			if !ok {
				continue
			}
			fa := bearing.Factors(m, p)
			var want float64
			switch s.Symbol {
			case "N_q":
				want = fa.Nq
			case "N_c":
				want = fa.Nc
			case "N_gamma":
				want = fa.Ngamma
			default:
				continue
			}
			if s.Value != want || math.IsNaN(want) {
				t.Errorf("%v %s %s = %v, Factors gives %v", m, s.Case, s.Symbol, s.Value, want)
			}
		}
	}
}
