package design_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// TestWeight: the self-weight of a footing and its backfill,
// W = γ_c·A·h + A·σ_v(D − h). Every row is a hand calculation shown in
// its comment; tolerance 1e-9 relative.
func TestWeight(t *testing.T) {
	sand := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, Phi: site.Some(32 * math.Pi / 180)}}}
	wet := sand
	wet.Water = site.Some(0.2)
	wet.Layers = []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), Phi: site.Some(32 * math.Pi / 180)}}
	rect := site.Footing{Name: "F", Shape: site.Rectangle, B: 2, L: 3, D: 1}
	strip := site.Footing{Name: "S", Shape: site.Strip, B: 1.5, D: 0.8}
	circ := site.Footing{Name: "C", Shape: site.Circle, B: 2, D: 0.5}
	for _, tc := range []struct {
		name    string
		in      design.SelfWeight
		want    float64 // N or N/m
		assumed int
	}{
		// 24 × 6 × 0.5 + 6 × (18 × 0.5) = 72 + 54 = 126 kN (hand calculation)
		{"rect h given", design.SelfWeight{Footing: rect, Ground: sand, H: site.Some(0.5)}, 126e3, 1},
		// h = D: 24 × 6 × 1 = 144 kN (hand calculation)
		{"rect defaults", design.SelfWeight{Footing: rect, Ground: sand}, 144e3, 2},
		// 25 × 1.5 × 0.4 + 1.5 × (18 × 0.4) = 15 + 10.8 = 25.8 kN/m (hand calculation)
		{"strip given", design.SelfWeight{Footing: strip, Ground: sand, GammaC: site.Some(25e3), H: site.Some(0.4)}, 25.8e3, 0},
		// backfill over the water table: σ_v(0.3) = 18 × 0.2 + 20 × 0.1 = 5.6 kPa;
		// A = π; 24 × π × 0.2 + π × 5.6 = 10.4 π = 32.673 kN (hand calculation)
		{"circle wet backfill", design.SelfWeight{Footing: circ, Ground: wet, H: site.Some(0.2)}, 10.4e3 * math.Pi, 1},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var tr trace.Trace
			w, err := design.Weight(tc.in, &tr)
			if err != nil {
				t.Fatal(err)
			}
			if math.Abs(w-tc.want) > 1e-9*tc.want {
				t.Errorf("W = %g, want %g", w, tc.want)
			}
			if err := trace.Verify(tr, 1e-12); err != nil {
				t.Error(err)
			}
			last := tr.Steps[len(tr.Steps)-1]
			if last.Symbol != "W" || last.Value != w {
				t.Errorf("last step %s = %g, want W = %g", last.Symbol, last.Value, w)
			}
			n := 0
			for _, st := range tr.Steps {
				if strings.Contains(st.Note, "assumed, default") {
					n++
				}
			}
			if n != tc.assumed {
				t.Errorf("%d steps assumed, want %d", n, tc.assumed)
			}
		})
	}
}

// TestWeightErrors: out-of-range γ_c and h are typed errors naming the
// parameter, never a NaN.
func TestWeightErrors(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3}}}
	f := site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}
	for _, tc := range []struct {
		name  string
		in    design.SelfWeight
		param string
	}{
		{"gamma_c zero", design.SelfWeight{Footing: f, Ground: g, GammaC: site.Some(0)}, "gamma_c"},
		{"gamma_c huge", design.SelfWeight{Footing: f, Ground: g, GammaC: site.Some(200e3)}, "gamma_c"},
		{"h above D", design.SelfWeight{Footing: f, Ground: g, H: site.Some(1.5)}, "h"},
		{"h zero", design.SelfWeight{Footing: f, Ground: g, H: site.Some(0)}, "h"},
	} {
		t.Run(tc.name, func(t *testing.T) {
			var tr trace.Trace
			w, err := design.Weight(tc.in, &tr)
			var re *site.RangeError
			if !errors.As(err, &re) || re.Param != tc.param {
				t.Fatalf("W = %g, err %v: want a range error on %s", w, err, tc.param)
			}
		})
	}
}
