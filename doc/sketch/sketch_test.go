package sketch_test

import (
	"errors"
	"flag"
	"fmt"
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/drawtest"
	"github.com/plinth-calc/plinth/internal/golden"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/sketch"
)

var update = flag.Bool("update", false, "rewrite golden files")

func ptr(v float64) *float64 { return &v }

// Invented footings covering the shapes and options.
var cases = []struct {
	name string
	f    sketch.Footing
	w, h float64
}{
	{"pad", sketch.Footing{Shape: "rectangle", B: 2.4, L: 3.0, D: 1.0, Water: ptr(2.0),
		Layers: []sketch.Layer{{Name: "Made ground", Top: 0}, {Name: "Firm clay", Top: 0.6}, {Name: "Dense sand", Top: 5.0}},
		V:      1270, H: 35, M: 90, BEff: ptr(2.4 - 2*90.0/1270)}, 480, 250},
	{"strip", sketch.Footing{Shape: "strip", B: 0.9, D: 0.8,
		Layers: []sketch.Layer{{Name: "Topsoil", Top: 0}, {Name: "Stiff clay", Top: 0.3}}, V: 180, H: -12}, 420, 220},
	{"circle-platform", sketch.Footing{Shape: "circle", B: 3.0, D: 0.5, Water: ptr(9.0),
		Platform: &sketch.Platform{Thickness: 0.45}, Layers: []sketch.Layer{{Name: "Soft clay", Top: 0}, {Name: "Gravel", Top: 2.2}},
		V: 900, M: -150, BEff: ptr(3.0 - 2*150.0/900)}, 480, 260},
	{"square-bare", sketch.Footing{Shape: "square", B: 1.5, D: 0.6, Water: ptr(0.4),
		Layers: []sketch.Layer{{Name: "Firm clay", Top: 0}}}, 360, 200},
	{"flooded", sketch.Footing{Shape: "square", B: 2.0, D: 1.0, Water: ptr(-1.5),
		Layers: []sketch.Layer{{Name: "Estuarine silt", Top: 0}}, V: 400}, 480, 250},
	{"surface-uplift", sketch.Footing{Shape: "square", B: 1.2, D: 0, Thickness: 0.4, V: -40, H: 15, M: 5,
		VLabel: "uplift 40 kN", Layers: []sketch.Layer{{Name: "Chalk", Top: 1.5}}}, 360, 200},
	{"raft", sketch.Footing{Shape: "rectangle", B: 18, L: 40, D: 1.5, Water: ptr(3.5),
		Layers: []sketch.Layer{{Name: "Alluvium", Top: 0}, {Name: "Terrace gravel", Top: 6}, {Name: "London-type clay", Top: 14}},
		V:      250000, M: 40000, BEff: ptr(17.7)}, 480, 280},
}

func TestGolden(t *testing.T) {
	for _, c := range cases {
		items, err := sketch.Draw(c.f, c.w, c.h)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		got := draw.Dump(items)
		golden.Compare(t, filepath.Join("testdata", c.name+".golden"), []byte(got), *update)
	}
}

// TestInside checks every item lies in w × h with finite coordinates, no
// two texts overlap, and drawing twice gives the same items.
func TestInside(t *testing.T) {
	for _, c := range cases {
		items, _ := sketch.Draw(c.f, c.w, c.h)
		again, _ := sketch.Draw(c.f, c.w, c.h)
		if draw.Dump(items) != draw.Dump(again) {
			t.Errorf("%s: two draws differ", c.name)
		}
		for _, it := range items {
			r := it.Bounds()
			if math.IsNaN(r.X+r.Y+r.W+r.H) || math.IsInf(r.X+r.Y+r.W+r.H, 0) {
				t.Fatalf("%s: %#v is not finite", c.name, it)
			}
			if r.X < -1e-9 || r.Y < -1e-9 || r.X+r.W > c.w+1e-9 || r.Y+r.H > c.h+1e-9 {
				t.Errorf("%s: %T %+v leaves the %g × %g sketch", c.name, it, r, c.w, c.h)
			}
		}
		drawtest.Overlaps(t, c.name, items)
	}
}

func TestLabels(t *testing.T) {
	items, err := sketch.Draw(cases[0].f, cases[0].w, cases[0].h)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, it := range items {
		if x, ok := it.(draw.Text); ok {
			got = append(got, x.Text)
		}
	}
	// fixed labels first, then those placed clear of them (D, GWL)
	// lengths by the document's display rules (units.Format), as in the working
	want := "V = 1270 kN|M = 90 kNm|H = 35 kN|Made ground from GL|Firm clay from 0.6 m|Dense sand from 5 m|Section|" +
		"B = 2.4 m|B′ = 2.258 m|D = 1 m|GWL 2 m|Plan|B = 2.4 m|L = 3 m"
	if g := strings.Join(got, "|"); g != want {
		t.Errorf("labels\n got %s\nwant %s", g, want)
	}
}

func TestErrors(t *testing.T) {
	ok := sketch.Footing{Shape: "square", B: 2, D: 1}
	mod := func(fn func(*sketch.Footing)) sketch.Footing { f := ok; fn(&f); return f }
	for _, c := range []struct {
		name string
		f    sketch.Footing
		w, h float64
		want string
	}{
		{"shape", mod(func(f *sketch.Footing) { f.Shape = "hexagon" }), 400, 200, `Shape = "hexagon" must be strip, square, rectangle or circle`},
		{"zero width", mod(func(f *sketch.Footing) { f.B = 0 }), 400, 200, "B = 0 m must be above 0 to 200 m"},
		{"NaN depth", mod(func(f *sketch.Footing) { f.D = math.NaN() }), 400, 200, "D = NaN m must be from 0 to 50 m"},
		{"negative depth", mod(func(f *sketch.Footing) { f.D = -1 }), 400, 200, "D = -1 m must be from 0 to 50 m"},
		{"rectangle without L", mod(func(f *sketch.Footing) { f.Shape = "rectangle" }), 400, 200, "L = 0 m must be above 0"},
		{"water far above GL", mod(func(f *sketch.Footing) { f.Water = ptr(-60) }), 400, 200, "Water = -60 m must be from -50"},
		{"B′ wider than B", mod(func(f *sketch.Footing) { f.BEff = ptr(2.5) }), 400, 200, "BEff = 2.5 m must be above 0 to 2 m"},
		{"layers out of order", mod(func(f *sketch.Footing) {
			f.Layers = []sketch.Layer{{Name: "a", Top: 0}, {Name: "b", Top: 3}, {Name: "c", Top: 2}}
		}), 400, 200, "Layers[2].Top = 2 m must be deeper than the layer above (3 m)"},
		{"infinite load", mod(func(f *sketch.Footing) { f.M = math.Inf(-1) }), 400, 200, "M = -Inf must be a finite number"},
		{"platform of no thickness", mod(func(f *sketch.Footing) { f.Platform = &sketch.Platform{} }), 400, 200, "Platform.Thickness = 0 m must be above 0"},
		{"missing glyph", mod(func(f *sketch.Footing) { f.Layers = []sketch.Layer{{Name: "clay 漢"}} }), 400, 200, "which the fonts lack"},
		{"too small", ok, 100, 60, "w × h = 100 × 60 must be at least 160 × 110 pt"},
		{"no room", mod(func(f *sketch.Footing) {
			f.Shape = "rectangle"
			f.L = 3
			f.Layers = []sketch.Layer{{Name: strings.Repeat("very long layer name ", 6)}}
		}), 400, 200, "leaves too little room"},
	} {
		_, err := sketch.Draw(c.f, c.w, c.h)
		var e *sketch.Error
		if !errors.As(err, &e) {
			t.Errorf("%s: got %v, want a *sketch.Error", c.name, err)
			continue
		}
		if !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %q does not say %q", c.name, err, c.want)
		}
	}
}

func ExampleDraw() {
	f := sketch.Footing{Shape: "rectangle", B: 2.4, L: 3.0, D: 1.0, Water: ptr(2.0),
		Layers: []sketch.Layer{{Name: "Made ground", Top: 0}, {Name: "Firm clay", Top: 0.6}},
		V:      1270, H: 35, M: 90}
	items, err := sketch.Draw(f, 480, 240)
	fmt.Println(len(items) > 0, err)
	// Output: true <nil>
}

func BenchmarkDraw(b *testing.B) {
	c := cases[0]
	for b.Loop() {
		if _, err := sketch.Draw(c.f, c.w, c.h); err != nil {
			b.Fatal(err)
		}
	}
}
