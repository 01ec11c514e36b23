package sketch_test

import (
	"fmt"
	"testing"

	"github.com/plinth-calc/plinth/doc/sketch"
)

// generated are footings round the awkward cases: groundwater at GL, just
// above, at and just below the base, deep and below the sketch; shallow and
// surface footings; narrow and wide ones; a layer boundary near the base.
func generated() []sketch.Footing {
	var out []sketch.Footing
	for _, shape := range []string{"strip", "square", "rectangle"} {
		for _, B := range []float64{0.6, 1.5, 3, 9, 20} {
			for _, D := range []float64{0, 0.2, 0.5, 1, 2.5} {
				for _, wf := range []float64{-1, 0, 0.5, 0.95, 1, 1.05, 1.5, 4, 40} {
					f := sketch.Footing{Shape: shape, B: B, L: 1.3 * B, D: D, V: 500, H: 20, M: 30,
						Layers: []sketch.Layer{{Name: "Made ground", Top: 0}, {Name: "Firm clay", Top: D + 0.1}, {Name: "Dense sand", Top: D + 3}}}
					if D == 0 {
						f.Thickness = 0.3
					}
					if wf >= 0 {
						w := wf * max(D, 0.5)
						f.Water = &w
					}
					out = append(out, f)
				}
			}
		}
	}
	return out
}

// TestLabelsClear: no label of any sketch overlaps another or sits on a
// level line — the test cases and the generated ones (the example's
// sketches are tested in doc/compose).
func TestLabelsClear(t *testing.T) {
	for _, c := range cases {
		items, err := sketch.Draw(c.f, c.w, c.h)
		if err != nil {
			t.Fatal(err)
		}
		if s := sketch.Clash(items); s != "" {
			t.Errorf("%s: %s", c.name, s)
		}
	}
	bad := 0
	for _, f := range generated() {
		items, err := sketch.Draw(f, 481.9, 230)
		if err != nil {
			continue // too little room is an error, reported elsewhere
		}
		if s := sketch.Clash(items); s != "" {
			if bad++; bad <= 15 {
				w := "none"
				if f.Water != nil {
					w = fmt.Sprint(*f.Water)
				}
				t.Errorf("%s B %g D %g water %s: %s", f.Shape, f.B, f.D, w, s)
			}
		}
	}
	if bad > 0 {
		t.Errorf("%d of %d generated sketches have clashing labels", bad, len(generated()))
	}
}
