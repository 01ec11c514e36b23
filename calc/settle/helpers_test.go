package settle_test

import (
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

const kPa = 1e3

// oneD loads the ground at depth d with a uniform net pressure qn over a
// footing so wide and a spread angle so small that Δσ = qn at every depth
// to 1e-9: the one-dimensional loading of textbook examples.
func oneD(g site.Ground, d, qn, zbot float64, n int) settle.Input {
	return settle.Input{
		Ground:    g,
		Footing:   site.Footing{Name: "T", Shape: site.Rectangle, B: 100, L: 1000, D: d},
		Q:         site.Some(g.SigmaV(d) + qn),
		Method:    settle.Consolidation,
		Stress:    stress.Spread,
		Spread:    site.Some(1e-12),
		Depth:     settle.Depth{Rule: settle.DepthFixed, Z: site.Some(zbot)},
		Sublayers: n,
	}
}

func mustCompute(t *testing.T, in settle.Input) *settle.Result {
	t.Helper()
	r, err := settle.Compute(in)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(r.Trace, 1e-9); err != nil {
		t.Fatalf("trace does not verify: %v", err)
	}
	finite(t, r)
	return r
}

// finite fails on any NaN or Inf in the numbers of a result.
func finite(t *testing.T, r *settle.Result) {
	t.Helper()
	bad := func(name string, v float64) {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Errorf("%s = %v", name, v)
		}
	}
	for _, v := range []float64{r.Q, r.QNet, r.SigmaV0, r.ZInf, r.Si, r.Sc, r.Ssec, r.Total, r.Util} {
		bad("result", v)
	}
	for _, s := range r.Sub {
		for _, v := range []float64{s.Z, s.H, s.SigmaV0, s.SigmaV0Eff, s.DSigma, s.SigmaF, s.Si, s.Sc, s.Iz, s.E} {
			bad("sublayer "+s.Name, v)
		}
	}
	for _, v := range r.Symbols {
		bad(v.Symbol, v.V)
	}
	for _, p := range r.Curve {
		bad("curve", p.S)
		bad("curve U", p.U)
	}
}

func near(t *testing.T, what string, got, want, tol float64, src string) {
	t.Helper()
	if math.Abs(got-want) > tol {
		t.Errorf("%s = %.6g, want %.6g ± %g (%s)", what, got, want, tol, src)
	}
}
