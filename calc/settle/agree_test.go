package settle_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// The stress table is computed sublayer by sublayer in Go (ccSettle,
// izAt, stein: the tree walk would cost about seven times as much for 200
// sublayers), the working of the representative sublayers and of each
// layer's Steinbrenner factors by the recorder from the printed formulas.
// The two agree to 1e-9: a representative's Δs is its table row's, and a
// layer's s_i from corner rectangles is the sum of its rows.
func TestTableAgreesWithWorking(t *testing.T) {
	sand := site.Ground{Water: site.Some(3), Layers: []site.Layer{
		{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), E: site.Some(30e6), Qc: site.Some(8e6), N: site.Some(18)},
		{Name: "Gravel", Top: 4, Gamma: 20e3, GammaSat: site.Some(21e3), E: site.Some(80e6), Qc: site.Some(20e6), N: site.Some(40)},
	}}
	footings := []site.Footing{
		{Name: "R", Shape: site.Rectangle, B: 2, L: 5, D: 1},
		{Name: "Q", Shape: site.Square, B: 2.5, D: 0.8},
		{Name: "S", Shape: site.Strip, B: 1.2, D: 0.6},
		{Name: "C", Shape: site.Circle, B: 3, D: 1.5},
	}
	n := 0
	for _, g := range []site.Ground{fourLayers(), sand} {
		for _, f := range footings {
			for _, m := range []settle.Method{settle.Auto, settle.Elastic, settle.Consolidation, settle.Schmertmann} {
				for _, p := range []stress.Point{stress.Centre, stress.Corner, stress.Characteristic} {
					r := mustCompute(t, settle.Input{Ground: g, Footing: f, Q: site.Some(180 * kPa), Method: m, At: p})
					for _, st := range r.Trace.Steps {
						var want float64
						var j int
						switch {
						case st.Symbol == "Delta_s" && strings.HasSuffix(st.Case, "(representative)"):
							if _, err := fmt.Sscanf(st.Case[strings.LastIndex(st.Case, "sublayer "):], "sublayer %d", &j); err != nil {
								t.Fatal(err)
							}
							s := r.Sub[j-1]
							want = s.Sc
							if s.Case == "I_z" {
								want = s.Si
							}
						case strings.HasPrefix(st.Symbol, "s_i,") && strings.HasSuffix(st.Case, "immediate (Steinbrenner)"):
							fmt.Sscanf(st.Symbol, "s_i,%d", &j)
							for _, L := range r.Layers {
								if L.Layer == j-1 {
									want = L.Si
								}
							}
						default:
							continue
						}
						n++
						if math.Abs(st.Value-want) > 1e-9*math.Abs(want)+1e-15 {
							t.Errorf("%v %v %v: %s (%s) = %.12g in the working, %.12g in the table", f.Shape, m, p, st.Symbol, st.Case, st.Value, want)
						}
					}
				}
			}
		}
	}
	if n < 50 {
		t.Errorf("only %d steps compared", n)
	}
}

// Each value that no formula gives says how it was reached, and every
// formula step is one: the zone's depth is Brent's root, a layer's
// consolidation the sum of its table column, the design life given,
// Schmertmann's I_z0 read from his diagram; T_50 is the engine function
// T_v(U) evaluated (0.197 for U = 0.5: Terzaghi 1943, the value quoted
// in soil mechanics texts such as Craig's Soil Mechanics; from memory).
func TestStepKinds(t *testing.T) {
	kinds := func(r *settle.Result) map[string]trace.Step {
		m := map[string]trace.Step{}
		for _, s := range r.Trace.Steps {
			if (s.Formula != nil) != (s.Kind == trace.ByFormula) {
				t.Errorf("%s (%s): kind %v with formula %v", s.Symbol, s.Case, s.Kind, s.Formula)
			}
			if _, ok := m[s.Symbol]; !ok {
				m[s.Symbol] = s
			}
		}
		return m
	}
	r := mustCompute(t, fourLayerInput(40))
	m := kinds(r)
	for sym, want := range map[string]trace.Kind{"z_inf": trace.Solved, "s_c,1": trace.Summed, "t_life": trace.Given, "q": trace.Given, "q_net": trace.ByFormula, "T_50": trace.ByFormula} {
		if got := m[sym].Kind; got != want {
			t.Errorf("%s: kind %v, want %v", sym, got, want)
		}
	}
	near(t, "T_50", m["T_50"].Value, 0.1967, 5e-5, "Terzaghi 1943")
	sand := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(30e6)}}}
	r = mustCompute(t, settle.Input{Ground: sand, Footing: site.Footing{Name: "Q", Shape: site.Square, B: 2, D: 1}, Q: site.Some(150 * kPa), Method: settle.Schmertmann})
	m = kinds(r)
	for sym, want := range map[string]trace.Kind{"I_z0": trace.Tabulated, "Sigma_Iz": trace.Summed, "C_1": trace.ByFormula, "E_s": trace.Given} {
		if got := m[sym].Kind; got != want {
			t.Errorf("Schmertmann %s: kind %v, want %v", sym, got, want)
		}
	}
}
