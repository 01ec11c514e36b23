package settle_test

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"

	"github.com/plinth-calc/plinth/calc/settle"
)

// steinQuad evaluates Steinbrenner's F1 and F2 for the corner of a 1 × M
// rectangle on a layer of thickness N independently of Bowles's closed
// form, by integrating Boussinesq's point-load strains over the depth of
// the layer. For a point load P at horizontal distance ρ, with s² = ρ² + N²,
//
//	∫₀ᴺ σ_z dz = (P/2π)(2/ρ − 3/s + ρ²/s³),  ∫₀ᴺ Θ dz = (1 + ν)(P/π)(1/ρ − 1/s),
//
// Θ = σ_x + σ_y + σ_z; with ε_z = [(1 + ν)σ_z − νΘ]/E and s = q b
// [(1 − ν²)F1 + (1 − ν − 2ν²)F2]/E this gives
//
//	F2 = (N²/2π) ∬ dA/s³,  F1 = (1/π) ∬ (1/ρ − 1/s) dA − 2F2,
//
// integrated over the rectangle in polar coordinates about the corner with
// gonum's Gauss–Legendre rule (quad.Fixed). N = +Inf gives the half-space.
func steinQuad(M, N float64) (f1, f2 float64) {
	tc := math.Atan(M)
	outer := func(g func(rho float64) float64) float64 {
		in := func(th float64) float64 {
			rmax := 1 / math.Cos(th)
			if th > tc {
				rmax = M / math.Sin(th)
			}
			return quad.Fixed(g, 0, rmax, 200, nil, 0)
		}
		return quad.Fixed(in, 0, tc, 200, nil, 0) + quad.Fixed(in, tc, math.Pi/2, 200, nil, 0)
	}
	// integrands carry the polar Jacobian ρ
	a := outer(func(r float64) float64 {
		if math.IsInf(N, 1) {
			return 1
		}
		return 1 - r/math.Hypot(r, N)
	})
	if !math.IsInf(N, 1) {
		f2 = N * N / (2 * math.Pi) * outer(func(r float64) float64 { return r / math.Pow(math.Hypot(r, N), 3) })
	}
	return a/math.Pi - 2*f2, f2
}

// Steinbrenner's closed forms (Bowles 1996 eq. 5-16a) against the
// independent depth integration of Boussinesq's strains above, for square
// and long corners, thin and thick layers and the half-space. Tolerance
// 1e-9.
func TestSteinbrennerQuadrature(t *testing.T) {
	for _, c := range []struct{ M, N float64 }{
		{1, 0.2}, {1, 1}, {1, 3}, {1, 10}, {2, 0.5}, {2, 4}, {5, 1}, {5, 20}, {10, 2},
		{1, math.Inf(1)}, {2, math.Inf(1)}, {5, math.Inf(1)}, {10, math.Inf(1)},
	} {
		f1, f2, err := settle.Steinbrenner(c.M, c.N)
		if err != nil {
			t.Fatal(err)
		}
		q1, q2 := steinQuad(c.M, c.N)
		if math.Abs(f1-q1) > 1e-9 || math.Abs(f2-q2) > 1e-9 {
			t.Errorf("M = %g, N = %g: closed form F1 %.10f F2 %.10f, quadrature %.10f %.10f", c.M, c.N, f1, f2, q1, q2)
		}
	}
}
