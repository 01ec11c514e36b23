package settle_test

import (
	"errors"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
)

// Steinbrenner's F1, F2 for L/B = 1 against Bowles (1996), Foundation
// Analysis and Design, 5th ed., Table 5-2 (I1, I2), 3 decimals: tolerance
// 6e-4. The rows were written from memory of that table; every one is now
// confirmed to the printed digits by an independent evaluation of the
// closed forms (Python, double precision) and the closed forms themselves
// by a depth integration of Boussinesq's strains (TestSteinbrennerQuadrature).
func TestSteinbrennerTable(t *testing.T) {
	rows := []struct{ n, f1, f2 float64 }{
		{0.2, 0.009, 0.041}, {0.4, 0.033, 0.066}, {0.6, 0.066, 0.079}, {0.8, 0.104, 0.083},
		{1, 0.142, 0.083}, {1.5, 0.224, 0.075}, {2, 0.285, 0.064}, {3, 0.363, 0.048},
		{4, 0.408, 0.037}, {5, 0.437, 0.031}, {6, 0.457, 0.026}, {8, 0.482, 0.020},
		{10, 0.498, 0.016}, {20, 0.529, 0.008}, {500, 0.560, 0.000},
	}
	for _, r := range rows {
		f1, f2, err := settle.Steinbrenner(1, r.n)
		if err != nil {
			t.Fatal(err)
		}
		near(t, "F1", f1, r.f1, 6e-4, "Bowles 1996 Table 5-2")
		near(t, "F2", f2, r.f2, 6e-4, "Bowles 1996 Table 5-2")
	}
	// M = N = 1 in closed form: F1 = (2/π) ln((1+√2)√2/(1+√3)), F2 = 1/12.
	f1, f2, _ := settle.Steinbrenner(1, 1)
	near(t, "F1(1,1)", f1, 2/math.Pi*math.Log((1+math.Sqrt2)*math.Sqrt2/(1+math.Sqrt(3))), 1e-15, "closed form")
	near(t, "F2(1,1)", f2, 1.0/12, 1e-15, "closed form")
}

// On an elastic half-space (N → ∞) the factors are the classical
// influence factors for a flexible rectangle: corner F1, centre 2F1, with
// s = q B (1 − ν²) I / E. Terzaghi (1943) / Bowles (1996) table of I for
// flexible footings, 2 decimals, first written from memory: square 0.56
// and 1.12, L/B = 2: 0.77 and 1.53, L/B = 5: 1.05 and 2.10, L/B = 10: 1.27
// and 2.54; confirmed by independent evaluation of the half-space corner
// integral (1/π)∬dA/ρ (0.5611, 0.7659, 1.0523, 1.2721; and by
// TestSteinbrennerQuadrature).
func TestHalfSpaceFactors(t *testing.T) {
	rows := []struct{ m, corner, centre float64 }{{1, 0.56, 1.12}, {2, 0.77, 1.53}, {5, 1.05, 2.10}, {10, 1.27, 2.54}}
	for _, r := range rows {
		f1, f2, _ := settle.Steinbrenner(r.m, math.Inf(1))
		near(t, "corner I", f1, r.corner, 6e-3, "Terzaghi 1943 / Bowles 1996")
		near(t, "centre I", 2*f1, r.centre, 6e-3, "Terzaghi 1943 / Bowles 1996")
		if f2 != 0 {
			t.Errorf("F2 on a half-space = %g", f2)
		}
		big, _, _ := settle.Steinbrenner(r.m, 1e12)
		near(t, "F1(N = 1e12)", big, f1, 1e-9, "limit")
	}
	// Strip limit: F1 = ln(1 + N²)/(2π), F2 = N atan(1/N)/(2π), and a long
	// rectangle tends to it.
	s1, s2, _ := settle.Steinbrenner(math.Inf(1), 3)
	l1, l2, _ := settle.Steinbrenner(1e5, 3)
	near(t, "strip F1", s1, math.Log(10)/(2*math.Pi), 1e-15, "limit L → ∞")
	near(t, "long rectangle F1", l1, s1, 1e-6, "limit L → ∞")
	near(t, "long rectangle F2", l2, s2, 1e-6, "limit L → ∞")
}

// b F(l/b, H/b) = l F(b/l, H/l): the settlement of a corner does not
// depend on which side is called B.
func TestSteinbrennerSymmetry(t *testing.T) {
	for _, c := range []struct{ b, l, h float64 }{{1, 2, 3}, {0.5, 4, 0.7}, {2, 2.5, 10}} {
		a1, a2, _ := settle.Steinbrenner(c.l/c.b, c.h/c.b)
		b1, b2, _ := settle.Steinbrenner(c.b/c.l, c.h/c.l)
		near(t, "b F1", c.b*a1, c.l*b1, 1e-13, "symmetry")
		near(t, "b F2", c.b*a2, c.l*b2, 1e-13, "symmetry")
	}
	var re *site.RangeError
	if _, _, err := settle.Steinbrenner(0, 1); !errors.As(err, &re) {
		t.Errorf("M = 0: %v", err)
	}
	if _, _, err := settle.Steinbrenner(math.Inf(1), math.Inf(1)); err == nil {
		t.Error("strip on a half-space accepted")
	}
}

func deepClay(eu float64) site.Ground {
	return site.Ground{Layers: []site.Layer{{Name: "Clay", Top: 0, Gamma: 18e3, Cu: site.Some(50e3), Eu: site.Some(eu)}}}
}

// Worked example (immediate, undrained clay): a flexible 2 m square
// carrying 100 kPa on deep clay with E_u = 20 MPa, ν = 0.5 settles
// q B (1 − ν²) I/E with I = 1.12 at the centre and 0.56 at a corner
// (Terzaghi 1943; Bowles 1996 influence factors, confirmed above): 8.40 mm and
// 4.20 mm. The layer is taken to 200 m (N = 200: 0.2 % below the
// half-space). Tolerance 0.05 mm (I to 2 decimals).
func TestImmediateExample(t *testing.T) {
	in := settle.Input{Ground: deepClay(20e6), Footing: site.Footing{Name: "F", Shape: site.Square, B: 2},
		Q: site.Some(100 * kPa), Method: settle.Elastic, Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(200)}}
	r := mustCompute(t, in)
	near(t, "s_i centre (mm)", r.Si*1e3, 8.40, 0.05, "I = 1.12, Terzaghi 1943 / Bowles 1996")
	in.At = stress.Corner
	r = mustCompute(t, in)
	near(t, "s_i corner (mm)", r.Si*1e3, 4.20, 0.05, "I = 0.56, Terzaghi 1943 / Bowles 1996")
	in.At = stress.Characteristic
	rc := mustCompute(t, in)
	if !(rc.Si < 8.4e-3 && rc.Si > 4.2e-3) {
		t.Errorf("characteristic point %g between corner and centre", rc.Si)
	}
	// Rigid footing on a half-space. Corrected reference: a rigid square
	// settles with I ≈ 0.88 — the rigidity factor 0.79 of the centre value
	// 1.12 (reproduced in an eng-tips.com thread on foundation rigidity:
	// 0.79 × 1.12 = 0.885) and Gazetas's (1991) vertical stiffness of a
	// rigid rectangle, 2GL/(1 − ν)·(0.73 + 1.54χ^0.75) with χ = 1 (from
	// memory), with G = E/2(1 + ν): I = 2/2.27 = 0.881. The value 0.82
	// written here before (from memory of an older table) is inconsistent
	// with the average flexible value 0.95 (0.946 by integration) and the
	// rigid/average ratio of about 0.93 of every other shape. The
	// characteristic point (Graßhoff 1955; 0.37B from the centre on both
	// axes) gives 0.852 with this 200 m layer (0.859 on the half-space):
	// 3 % below, so the tolerance is 4 %.
	near(t, "rigid I", rc.Si/(100*kPa*2*0.75/20e6), 0.88, 0.04*0.88, "rigid square I ≈ 0.88")
}

// Layer superposition: two layers with the same E and ν give the same as
// one; a strip uses the strip limit; a circle the square of equal area.
func TestElasticSuperposition(t *testing.T) {
	one := settle.Input{Ground: deepClay(25e6), Footing: site.Footing{Name: "F", Shape: site.Rectangle, B: 2, L: 3, D: 0.5},
		Q: site.Some(150 * kPa), Method: settle.Elastic, Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(10)}, Sublayers: 7}
	two := one
	two.Ground = site.Ground{Layers: []site.Layer{
		{Name: "Clay A", Top: 0, Gamma: 18e3, Cu: site.Some(50e3), Eu: site.Some(25e6)},
		{Name: "Clay B", Top: 3.7, Gamma: 18e3, Cu: site.Some(50e3), Eu: site.Some(25e6)},
	}}
	a := mustCompute(t, one)
	b := mustCompute(t, two)
	near(t, "two equal layers", b.Si, a.Si, 1e-15, "superposition")
	var sum float64
	for _, s := range a.Sub {
		sum += s.Si
	}
	near(t, "Σ sublayers", sum, a.Si, 1e-15, "telescoping")
	// Stiffer lower layer: less settlement; softer: more.
	stiff := two
	stiff.Ground.Layers[1].Eu = site.Some(100e6)
	if r := mustCompute(t, stiff); !(r.Si < a.Si) {
		t.Errorf("stiffer lower layer: %g ≥ %g", r.Si, a.Si)
	}
	// Strip: the centre of a strip on a layer of thickness H over a rigid
	// base settles q B(1 − ν²)/E · 2[F1 + (1 − 2ν)/(1 − ν)F2] with M = ∞.
	strip := one
	strip.Footing = site.Footing{Name: "S", Shape: site.Strip, B: 1.5, D: 0.5}
	r := mustCompute(t, strip)
	f1, f2, _ := settle.Steinbrenner(math.Inf(1), 9.5/0.75)
	want := (150*kPa - 9e3) * 0.75 * 0.75 / 25e6 * 4 * (f1 + 0*f2)
	near(t, "strip centre", r.Si, want, 1e-12, "Steinbrenner strip limit, ν = 0.5")
	circ := one
	circ.Footing = site.Footing{Name: "C", Shape: site.Circle, B: 2, D: 0.5}
	rc := mustCompute(t, circ)
	sq := one
	sq.Footing = site.Footing{Name: "Q", Shape: site.Square, B: math.Sqrt(math.Pi), D: 0.5}
	rs := mustCompute(t, sq)
	near(t, "circle = square of equal area", rc.Si, rs.Si, 1e-15, "common practice")
}

// Invariants: settlement rises with load and falls with stiffness.
func TestElasticInvariants(t *testing.T) {
	base := settle.Input{Ground: deepClay(20e6), Footing: site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1},
		Q: site.Some(120 * kPa), Method: settle.Elastic, Depth: settle.Depth{Rule: settle.DepthFixed, Z: site.Some(12)}}
	a := mustCompute(t, base)
	more := base
	more.Q = site.Some(240 * kPa)
	b := mustCompute(t, more)
	near(t, "s ∝ q_net", b.Si/a.Si, (240-18)/(120.0-18), 1e-12, "linear elasticity")
	stiffer := base
	stiffer.Ground = deepClay(40e6)
	c := mustCompute(t, stiffer)
	near(t, "s ∝ 1/E", c.Si/a.Si, 0.5, 1e-12, "linear elasticity")
}
