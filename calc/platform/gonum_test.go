package platform_test

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/floats"
	"gonum.org/v1/gonum/mat"

	"github.com/plinth-calc/plinth/calc/platform"
)

// resist is the method's R_d(D) written out independently of the engine
// (plain arithmetic from the equations in doc.go), for the numerical
// checks below.
func resist(in platform.Input, k platform.Case, D float64) float64 {
	p, s := in.Platform, in.Subgrade
	r := k.W / k.L
	var rs float64
	if s.Kind == platform.Cohesive {
		rs = s.Cu * (math.Pi + 2) * (1 + 0.2*r)
	} else {
		nq := math.Exp(math.Pi*math.Tan(s.Phi)) * math.Pow(math.Tan(math.Pi/4+s.Phi/2), 2)
		rs = 0.5 * s.Gamma * k.W * 2 * (nq + 1) * math.Tan(s.Phi) * (1 - 0.3*r)
	}
	pun := p.Gamma * D * D * 5.5 * (1 + r) / k.W // K_p tanδ = 5.5 at 40°
	if in.Options.DepthTerm {
		pun *= 1 + 2*D/k.W
	}
	return rs + pun
}

// Independent numerical solution: the equation R_d(D) = q_d is the
// polynomial k D² + c_3 D³ + (R_s − q_d) = 0 with k = γ_p K_p tanδ s_p/W
// and c_3 = 2k/W with the (1 + 2D/W) term (a cubic, solved nowhere in
// closed form), else 0. Its roots are the eigenvalues of the companion
// matrix, found by gonum's mat.Eigen; the one positive real root agrees
// with the engine's Brent root to 1e-9 m in every case.
func TestGonumRoots(t *testing.T) {
	for _, base := range []platform.Input{clay(), sand()} {
		for _, depth := range []bool{false, true} {
			if depth && base.Subgrade.Kind != platform.Granular {
				continue
			}
			in := base
			in.Options.DepthTerm = depth
			r := design(t, "gonum", in)
			for i, k := range in.Cases {
				kk := in.Platform.Gamma * 5.5 * (1 + k.W/k.L) / k.W
				c0 := resist(in, k, 0) - r.Cases[i].QD
				var comp *mat.Dense
				if depth {
					c3 := 2 * kk / k.W // monic: D³ + (k/c3) D² + 0 D + c0/c3
					comp = mat.NewDense(3, 3, []float64{0, 0, -c0 / c3, 1, 0, 0, 0, 1, -kk / c3})
				} else { // D² + 0 D + c0/k
					comp = mat.NewDense(2, 2, []float64{0, -c0 / kk, 1, 0})
				}
				var eig mat.Eigen
				if !eig.Factorize(comp, mat.EigenNone) {
					t.Fatal("eigen decomposition failed")
				}
				root := math.NaN()
				for _, v := range eig.Values(nil) {
					if math.Abs(imag(v)) < 1e-9 && real(v) > 0 {
						root = real(v)
					}
				}
				if math.Abs(root-r.Cases[i].DReq) > 1e-9 {
					t.Errorf("%v depth %v %s: Brent D_req = %.10f, eigenvalue %.10f", in.Subgrade.Kind, depth, k.Label(), r.Cases[i].DReq, root)
				}
			}
		}
	}
}

// Dense scan: on 200 001 thicknesses from 0 to 2 m (gonum floats.Span),
// the first D with R_d(D) ≥ q_d lies within one grid step (1e-5 m) above
// the engine's root.
func TestDenseScan(t *testing.T) {
	in := sand()
	in.Options.DepthTerm = true
	r := design(t, "scan", in)
	grid := floats.Span(make([]float64, 200001), 0, 2)
	for i, k := range in.Cases {
		first := math.NaN()
		for _, d := range grid {
			if resist(in, k, d) >= r.Cases[i].QD {
				first = d
				break
			}
		}
		if !(first >= r.Cases[i].DReq-1e-9 && first-r.Cases[i].DReq <= 1e-5+1e-12) {
			t.Errorf("%s: scan %.6f, Brent %.8f", k.Label(), first, r.Cases[i].DReq)
		}
	}
}
