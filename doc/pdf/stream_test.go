package pdf

import (
	"math"
	"math/rand/v2"
	"strconv"
	"testing"
)

// TestAppendF2 checks the integer path of "%.2f" against strconv on
// random, near-tie and edge values.
func TestAppendF2(t *testing.T) {
	check := func(x float64) {
		t.Helper()
		if got, want := string(appendF2(nil, x)), strconv.FormatFloat(x, 'f', 2, 64); got != want {
			t.Fatalf("appendF2(%v) = %q, strconv %q", x, got, want)
		}
	}
	for _, x := range []float64{0, math.Copysign(0, -1), 0.005, -0.005, 0.015, 0.125, 0.375, 1.005, 2.675, -0.001,
		1e12 + 0.005, 9.999999, 99.995, 1e7 - 0.005, 9999999.995, 1e13, -1e13, 1e300, math.Inf(1), math.Inf(-1), math.NaN(), 841.89, 595.28} {
		check(x)
	}
	r := rand.New(rand.NewPCG(1, 2))
	for i := 0; i < 200000; i++ {
		scale := math.Pow(10, float64(r.IntN(12)-2))
		x := (r.Float64()*2 - 1) * scale
		check(x)
		check(math.Round(x*1000) / 1000) // three decimals: the ties
		check(float64(r.IntN(200000)-100000)/200 + 0.005)
	}
}
