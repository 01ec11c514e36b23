package chart_test

import (
	"testing"

	"plinth/doc/layout"
	"plinth/doc/sketch"
)

// The demo footings (invented), drawn after the charts in the demo PDF.

func ptr(v float64) *float64 { return &v }

var demoFootings = []struct {
	name string
	f    sketch.Footing
	w, h float64
}{
	{"Pad P1, Larchfield Depot", sketch.Footing{Shape: "rectangle", B: 2.4, L: 3.0, D: 1.0, Water: ptr(2.0),
		Layers: []sketch.Layer{{Name: "Made ground", Top: 0}, {Name: "Firm clay", Top: 0.6}, {Name: "Dense sand", Top: 5.0}},
		V:      1270, H: 35, M: 90, BEff: ptr(2.4 - 2*90.0/1270)}, 480, 250},
	{"Strip S1, wall line A", sketch.Footing{Shape: "strip", B: 0.9, D: 0.8,
		Layers: []sketch.Layer{{Name: "Topsoil", Top: 0}, {Name: "Stiff clay", Top: 0.3}}, V: 180, H: -12}, 420, 220},
	{"Base C1 on a working platform", sketch.Footing{Shape: "circle", B: 3.0, D: 0.5, Water: ptr(9.0),
		Platform: &sketch.Platform{Thickness: 0.45}, Layers: []sketch.Layer{{Name: "Soft clay", Top: 0}, {Name: "Gravel", Top: 2.2}},
		V: 900, M: -150, BEff: ptr(3.0 - 2*150.0/900)}, 480, 260},
	{"Square pad P4, no actions given", sketch.Footing{Shape: "square", B: 1.5, D: 0.6, Water: ptr(0.4),
		Layers: []sketch.Layer{{Name: "Firm clay", Top: 0}}}, 360, 200},
	{"Surface base T2 under uplift", sketch.Footing{Shape: "square", B: 1.2, D: 0, Thickness: 0.4, V: -40, H: 15, M: 5,
		VLabel: "uplift 40 kN", Layers: []sketch.Layer{{Name: "Chalk", Top: 1.5}}}, 320, 200},
	{"Raft R1", sketch.Footing{Shape: "rectangle", B: 18, L: 40, D: 1.5, Water: ptr(3.5),
		Layers: []sketch.Layer{{Name: "Alluvium", Top: 0}, {Name: "Terrace gravel", Top: 6}, {Name: "London-type clay", Top: 14}},
		V:      250000, M: 40000, BEff: ptr(17.7)}, 480, 280},
}

func init() {
	extraBlocks = func(t testing.TB) []layout.Block {
		var bs []layout.Block
		for i, d := range demoFootings {
			items, err := sketch.Draw(d.f, d.w, d.h)
			if err != nil {
				t.Fatalf("%s: %v", d.name, err)
			}
			bs = append(bs, &layout.Drawing{Pos: at(40 + i), W: d.w, H: d.h, Items: items, Caption: cap("Figure S" + string(rune('1'+i)) + ". " + d.name)})
		}
		return bs
	}
}
