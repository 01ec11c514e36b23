package bearing_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestFoundingCautions: the cautions and notes about the founding
// stratum and the factor set (common practice; each row a rule of
// plinth's, stated in calc/bearing's documentation). Invented ground.
func TestFoundingCautions(t *testing.T) {
	deg := math.Pi / 180
	fill := site.Layer{Name: "Made ground", Top: 0, Gamma: 18e3, Phi: site.Some(28 * deg), C: site.Some(0)}
	clay := site.Layer{Name: "Firm clay", Top: 0.7, Gamma: 19.5e3, Cu: site.Some(65e3), Phi: site.Some(25 * deg), C: site.Some(3e3)}
	soft := site.Layer{Name: "Soft clay", Top: 0, Gamma: 17e3, Cu: site.Some(30e3), Phi: site.Some(11 * deg), C: site.Some(2e3)}
	g2 := site.Ground{Layers: []site.Layer{fill, clay}}
	sq := func(B, D float64) site.Footing { return site.Footing{Shape: site.Square, B: B, D: D} }
	dead := []site.Action{{Name: "Dead", V: 2000e3}}
	for _, tc := range []struct {
		name string
		in   bearing.Input
		code string
		want bool
	}{
		// in made ground (named so), 0.1 m above the clay: both cautions
		{"made ground", bearing.Input{Ground: g2, Footing: sq(3, 0.6), Actions: dead}, "made-ground", true},
		{"thin skin", bearing.Input{Ground: g2, Footing: sq(3, 0.6), Actions: dead}, "thin-founding-layer", true},
		// founded 0.1 m into the clay, which runs on: neither
		{"in the clay", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead}, "made-ground", false},
		{"in the clay, thick", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead}, "thin-founding-layer", false},
		// 0.5 m of fill below a 1 m pad: 0.5 ≥ 0.25 B, no thin-layer caution
		{"fill 0.5B", bearing.Input{Ground: site.Ground{Layers: []site.Layer{fill, func() site.Layer { l := clay; l.Top = 0.8; return l }()}}, Footing: sq(1, 0.3), Actions: dead}, "thin-founding-layer", false},
		// depth factors with EN 1997-1 partial factors: a NOTE; with FS or ec7, none
		{"meyerhof DA1", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead, Options: bearing.Options{Method: bearing.Meyerhof}}, "depth-factors-ec7", true},
		{"hansen DA1", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead, Options: bearing.Options{Method: bearing.Hansen}}, "depth-factors-ec7", true},
		{"meyerhof FS", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead, Options: bearing.Options{Method: bearing.Meyerhof, Approach: design.FS(3)}}, "depth-factors-ec7", false},
		{"ec7", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead}, "depth-factors-ec7", false},
		// Meyerhof with φ′_k = 11°: φ′_d = atan(tan 11°/1.25) = 8.9° ≤ 10°: the rule is stated
		{"meyerhof 0-10", bearing.Input{Ground: site.Ground{Layers: []site.Layer{soft}}, Footing: sq(2, 1), Actions: []site.Action{{Name: "Dead", V: 200e3}}, Options: bearing.Options{Method: bearing.Meyerhof}}, "meyerhof-0-10", true},
		{"meyerhof 25", bearing.Input{Ground: g2, Footing: sq(3, 0.8), Actions: dead, Options: bearing.Options{Method: bearing.Meyerhof}}, "meyerhof-0-10", false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			r := check(t, tc.name, tc.in)
			if got := hasCaution(r, tc.code); got != tc.want {
				t.Errorf("caution %s raised %v, want %v", tc.code, got, tc.want)
			}
		})
	}
}
