package settle_test

import (
	"errors"
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

func tiltGround(l site.Layer) site.Ground {
	l.Name, l.Top, l.Gamma = "Clay", 0, 19e3
	return site.Ground{Layers: []site.Layer{l}}
}

// TestTilt checks the rigid-footing tilt against hand calculations of
// tan θ = 3(1 − ν²)M/(4 E R³) (Borowicka 1943; Poulos & Davis 1974, ch. 7,
// from memory), R = (C A³/(3π))^¼ for a rectangle (Richart, Hall & Woods
// 1970, from memory). Tolerance 1e-9 relative (closed form).
func TestTilt(t *testing.T) {
	drained := tiltGround(site.Layer{E: site.Some(10e6), Nu: site.Some(0.3)})
	undrained := tiltGround(site.Layer{Eu: site.Some(30e6), Cu: site.Some(60e3)})
	act := func(mb, ml float64) []site.Action {
		return []site.Action{{Name: "G", Kind: site.Permanent, V: 500e3, MB: mb, ML: ml}, {Name: "Q", Kind: site.Variable, V: 200e3, MB: mb}}
	}
	cases := []struct {
		name    string
		g       site.Ground
		f       site.Footing
		acts    []site.Action
		fac     []float64
		dir     string
		wantTan float64
		wantR   float64
	}{
		// hand: M = 100 kNm, R = 1 m: 3 × 0.91 × 1e5/(4 × 1e7 × 1) = 0.006825
		{"circle, drained, hand", drained, site.Footing{Name: "C", Shape: site.Circle, B: 2, D: 1}, act(50e3, 0), []float64{1, 1}, "B", 0.006825, 1},
		// hand: M = 50 + 0.7·50 = 85 kNm, ν = 0.5, E_u = 30 MPa, R = 1.5 m:
		// 3 × 0.75 × 85e3/(4 × 30e6 × 3.375) = 4.7222e-4
		{"circle, undrained, psi", undrained, site.Footing{Name: "C", Shape: site.Circle, B: 3, D: 1}, act(50e3, 0), []float64{1, 0.7}, "B", 3 * 0.75 * 85e3 / (4 * 30e6 * 3.375), 1.5},
		// hand: square B = 2: R⁴ = 2·8/(3π) = 1.69765, R = 1.14146;
		// M = 100 kNm: 0.273e6/(4e7 R³)
		{"square, drained, hand", drained, site.Footing{Name: "S", Shape: site.Square, B: 2, D: 1}, act(50e3, 0), []float64{1, 1}, "B", 3 * 0.91 * 100e3 / (4 * 10e6 * math.Pow(16/(3*math.Pi), 0.75)), math.Pow(16/(3*math.Pi), 0.25)},
		// rectangle 2 × 4 m, M_L = 60 kNm about the short axis: A = L = 4,
		// C = B = 2, R⁴ = 2·64/(3π)
		{"rectangle, M_L", drained, site.Footing{Name: "R", Shape: site.Rectangle, B: 2, L: 4, D: 1}, act(0, 60e3), []float64{1, 1}, "L", 3 * 0.91 * 60e3 / (4 * 10e6 * math.Pow(128/(3*math.Pi), 0.75)), math.Pow(128/(3*math.Pi), 0.25)},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			r, err := settle.TiltOf(settle.TiltInput{Ground: c.g, Footing: c.f, Actions: c.acts, Factors: c.fac})
			if err != nil {
				t.Fatal(err)
			}
			if err := trace.Verify(r.Trace, 1e-9); err != nil {
				t.Fatal(err)
			}
			var ax *settle.TiltAxis
			for i := range r.Axes {
				if r.Axes[i].Dir == c.dir {
					ax = &r.Axes[i]
				}
			}
			if ax == nil {
				t.Fatalf("no tilt along %s: %+v", c.dir, r.Axes)
			}
			if math.Abs(ax.Tan/c.wantTan-1) > 1e-9 || math.Abs(ax.R/c.wantR-1) > 1e-9 {
				t.Errorf("tan θ = %.8g, R = %.8g; want %.8g, %.8g", ax.Tan, ax.R, c.wantTan, c.wantR)
			}
			if math.Abs(ax.Delta-ax.A*ax.Tan) > 1e-12 {
				t.Errorf("edge difference %g, want A tan θ = %g", ax.Delta, ax.A*ax.Tan)
			}
		})
	}
}

// TestTiltRockingStiffness checks the circle against the rocking stiffness
// of a rigid circle, K = 8 G R³/(3(1 − ν)) (Borowicka 1943, as tabulated by
// Whitman & Richart 1967), with G = E/(2(1 + ν)): M/θ → K for small θ.
// Tolerance 1e-6 (tan θ ≈ θ at θ ~ 1e-5).
func TestTiltRockingStiffness(t *testing.T) {
	E, nu, R := 20e6, 0.25, 1.2
	g := tiltGround(site.Layer{E: site.Some(E), Nu: site.Some(nu)})
	M := 10e3
	r, err := settle.TiltOf(settle.TiltInput{Ground: g, Footing: site.Footing{Shape: site.Circle, B: 2 * R, D: 0.5},
		Actions: []site.Action{{Kind: site.Permanent, V: 100e3, MB: M}}, Factors: []float64{1}})
	if err != nil {
		t.Fatal(err)
	}
	G := E / (2 * (1 + nu))
	K := 8 * G * R * R * R / (3 * (1 - nu))
	if got := M / r.Axes[0].Theta; math.Abs(got/K-1) > 1e-6 {
		t.Errorf("M/θ = %.6g, want K = %.6g", got, K)
	}
}

// TestTiltEquivalentRadius checks the rocking radius against the second
// moment of the rectangle integrated by gonum's Gauss–Legendre rule:
// π R⁴/4 = ∫ x² C dx over the side A. Tolerance 1e-9.
func TestTiltEquivalentRadius(t *testing.T) {
	g := tiltGround(site.Layer{E: site.Some(10e6)})
	for _, f := range []site.Footing{{Shape: site.Square, B: 3, D: 1}, {Shape: site.Rectangle, B: 2, L: 5, D: 1}} {
		r, err := settle.TiltOf(settle.TiltInput{Ground: g, Footing: f,
			Actions: []site.Action{{Kind: site.Permanent, V: 100e3, MB: 10e3, ML: 10e3}}, Factors: []float64{1}})
		if err != nil {
			t.Fatal(err)
		}
		for _, ax := range r.Axes {
			I := quad.Fixed(func(x float64) float64 { return ax.C * x * x }, -ax.A/2, ax.A/2, 20, nil, 0)
			if got := math.Pi * math.Pow(ax.R, 4) / 4; math.Abs(got/I-1) > 1e-9 {
				t.Errorf("%v %s: πR⁴/4 = %g, ∫x² dA = %g", f.Shape, ax.Dir, got, I)
			}
		}
	}
}

// TestTiltErrors checks the domain errors: a strip, no moment, no
// stiffness in the founding layer, a factor missing.
func TestTiltErrors(t *testing.T) {
	g := tiltGround(site.Layer{E: site.Some(10e6)})
	soft := tiltGround(site.Layer{Cu: site.Some(40e3)})
	pad := site.Footing{Name: "P", Shape: site.Square, B: 2, D: 1}
	m := []site.Action{{Kind: site.Permanent, V: 100e3, MB: 10e3}}
	for _, c := range []struct {
		name string
		in   settle.TiltInput
	}{
		{"strip", settle.TiltInput{Ground: g, Footing: site.Footing{Shape: site.Strip, B: 1, D: 1}, Actions: m, Factors: []float64{1}}},
		{"no moment", settle.TiltInput{Ground: g, Footing: pad, Actions: []site.Action{{Kind: site.Permanent, V: 100e3}}, Factors: []float64{1}}},
		{"no stiffness", settle.TiltInput{Ground: soft, Footing: pad, Actions: m, Factors: []float64{1}}},
		{"factors", settle.TiltInput{Ground: g, Footing: pad, Actions: m}},
	} {
		_, err := settle.TiltOf(c.in)
		var ie *site.InputError
		if !errors.As(err, &ie) {
			t.Errorf("%s: got %v, want an InputError", c.name, err)
		}
	}
}

// TestTiltLayered checks the half-space warning: a second layer within
// twice the side along the tilt below the base raises tilt-layered; a
// deep one does not (common practice).
func TestTiltLayered(t *testing.T) {
	two := func(top float64) site.Ground {
		return site.Ground{Layers: []site.Layer{{Name: "Clay", Top: 0, Gamma: 19e3, E: site.Some(10e6)}, {Name: "Gravel", Top: top, Gamma: 20e3, E: site.Some(80e6)}}}
	}
	f := site.Footing{Shape: site.Square, B: 2, D: 1}
	acts := []site.Action{{Kind: site.Permanent, V: 100e3, MB: 10e3}}
	for _, c := range []struct {
		top  float64
		want bool
	}{{3, true}, {6, false}} {
		r, err := settle.TiltOf(settle.TiltInput{Ground: two(c.top), Footing: f, Actions: acts, Factors: []float64{1}})
		if err != nil {
			t.Fatal(err)
		}
		got := false
		for _, ca := range r.Trace.Cautions {
			got = got || ca.Code == "tilt-layered"
		}
		if got != c.want {
			t.Errorf("second layer at %g m: tilt-layered %v, want %v", c.top, got, c.want)
		}
	}
}
