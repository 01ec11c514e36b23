package settle_test

import (
	"errors"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// TestWithinHalfSpace checks the centre against the corner of a flexible
// rectangle on a deep elastic layer. On a half-space the corner of a
// B × L rectangle settles as the centre of one of B/2 × L/2 scaled by 2,
// so s_centre = 4 s_corner(B/2, L/2) = 2 s_corner(B, L) (superposition,
// Bowles 1996 §5-6; hand argument). The layer is 400 B deep, so the
// finite thickness changes the ratio by less than 1 % (tolerance 1 %).
func TestWithinHalfSpace(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(10e6), Nu: site.Some(0.3)}}}
	for _, f := range []site.Footing{
		{Name: "S", Shape: site.Square, B: 1, D: 0},
		{Name: "R", Shape: site.Rectangle, B: 1, L: 3, D: 0},
	} {
		in := settle.Input{Ground: g, Footing: f, Q: site.Some(100e3), Method: settle.Elastic,
			Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(400)}}
		w, err := settle.WithinFooting(in)
		if err != nil {
			t.Fatal(err)
		}
		if err := trace.Verify(w.Trace, 1e-9); err != nil {
			t.Fatal(err)
		}
		if r := w.Centre / w.Corner; math.Abs(r/2-1) > 0.01 {
			t.Errorf("%v: s_centre/s_corner = %.4f, want 2", f.Shape, r)
		}
		if d := math.Hypot(f.B, f.Length()) / 2; math.Abs(w.Beta-w.Delta/d) > 1e-15 {
			t.Errorf("beta = %g, want %g", w.Beta, w.Delta/d)
		}
		// the centre is what Compute gives at the centre
		r, err := settle.Compute(in)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(r.Total-w.Centre) > 1e-12 {
			t.Errorf("centre %g, Compute %g", w.Centre, r.Total)
		}
	}
}

// TestWithinRefused checks the inputs with no settlement at a point: a
// rigid footing, the load-spread stress, the sand methods.
func TestWithinRefused(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(10e6), Qc: site.Some(5e6), N: site.Some(20)}}}
	base := settle.Input{Ground: g, Footing: site.Footing{Shape: site.Square, B: 1, D: 0.5}, Q: site.Some(100e3)}
	rigid, spread, schm, bb := base, base, base, base
	rigid.Rigid = true
	spread.Stress = stress.Spread
	schm.Method = settle.Schmertmann
	bb.Method = settle.BurlandBurbidge
	for name, in := range map[string]settle.Input{"rigid": rigid, "spread": spread, "schmertmann": schm, "burland-burbidge": bb} {
		_, err := settle.WithinFooting(in)
		var ie *site.InputError
		if !errors.As(err, &ie) || (name != "rigid" && ie.Param != "within") {
			t.Errorf("%s: got %v, want an InputError on within", name, err)
		}
	}
}

// TestWithinMidSides checks the middles of the sides of a flexible square
// on a deep elastic layer against the half-space corner factors of
// Steinbrenner (N → ∞, settle.Steinbrenner): s_centre = 4·(B/2)F1(1),
// s_mid = 2·(B/2)F1(2), so s_mid/s_centre = F1(2)/(2F1(1)) = 0.6825
// (the familiar 0.76/1.12 of Bowles 1996 Table 5-2, from memory). The
// layer is 400 B deep (tolerance 1 %).
func TestWithinMidSides(t *testing.T) {
	g := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(10e6), Nu: site.Some(0.3)}}}
	in := settle.Input{Ground: g, Footing: site.Footing{Name: "S", Shape: site.Square, B: 1, D: 0}, Q: site.Some(100e3), Method: settle.Elastic,
		Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(400)}}
	w, err := settle.WithinFooting(in)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(w.Trace, 1e-9); err != nil {
		t.Fatal(err)
	}
	f11, _, _ := settle.Steinbrenner(1, math.Inf(1))
	f12, _, _ := settle.Steinbrenner(2, math.Inf(1))
	want := f12 / (2 * f11)
	for _, got := range []float64{w.MidB / w.Centre, w.MidL / w.Centre} {
		if math.Abs(got/want-1) > 0.01 {
			t.Errorf("s_mid/s_centre = %.4f, want %.4f", got, want)
		}
	}
	if math.Abs(w.BetaB-(w.Centre-w.MidB)/0.5) > 1e-15 || w.MidB != w.MidL {
		t.Errorf("beta_B = %g, s_mid B %g L %g", w.BetaB, w.MidB, w.MidL)
	}
	// on a square the short side's values are the long side's, taken
	// once: a calculation at the middle of the other side agrees
	at := in
	at.At = stress.MidL
	r, err := settle.Compute(at)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Total/w.MidL-1) > 1e-9 {
		t.Errorf("square: s at the middle of the other side %g, s_mid_L %g", r.Total, w.MidL)
	}
}
