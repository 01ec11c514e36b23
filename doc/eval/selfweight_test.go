package eval_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestSelfWeightWorking: an analysis of a footing with self_weight = auto
// records the working of the weight it adds, which replays (trace.Verify)
// and marks the defaults as assumed. Hand calculation: a 2 m × 3 m pad,
// D = 1 m, on ground of γ = 18 kN/m³: with h given as 0.5 m and γ_c
// assumed 24 kN/m³, W = 24 × 6 × 0.5 + 6 × (18 × 0.5) = 72 + 54 = 126 kN;
// with h not given (h = D, no backfill), W = 24 × 6 × 1 = 144 kN.
func TestSelfWeightWorking(t *testing.T) {
	for _, tc := range []struct {
		name, h string
		want    float64 // N
		assumed int     // steps noted as assumed
	}{
		{"h given", "h = 0.5 m\n", 126e3, 1},
		{"h assumed", "", 144e3, 2},
	} {
		t.Run(tc.name, func(t *testing.T) {
			src := "# T\n\n```ground g\n| layer | top (m) | gamma (kN/m3) | phi' (deg) | c' (kPa) |\n| --- | --- | --- | --- | --- |\n| Sand | 0 | 18 | 32 | 0 |\n```\n\n" +
				"```footing F\nshape = rectangle\nB = 2 m\nL = 3 m\nD = 1 m\n" + tc.h + "self_weight = auto\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 500 |\n```\n\n```bearing F on g\n```\n"
			f := source.NewFile("p.md", []byte(src))
			s, pd := parse.Sheet(f)
			if pd.HasErrors() {
				t.Fatal(pd)
			}
			res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{})
			if d.HasErrors() {
				t.Fatal(d)
			}
			var b *eval.Block
			for _, x := range res.Sheets[0].Blocks() {
				if x.Bearing != nil {
					b = x
				}
			}
			if b == nil || len(b.SelfWeight.Steps) == 0 {
				t.Fatal("no self-weight working on the bearing block")
			}
			if err := trace.Verify(b.SelfWeight, 1e-12); err != nil {
				t.Error(err)
			}
			w := b.SelfWeight.Steps[len(b.SelfWeight.Steps)-1]
			if w.Symbol != "W" || math.Abs(w.Value-tc.want) > 1e-6*tc.want {
				t.Errorf("last step %s = %g, want W = %g", w.Symbol, w.Value, tc.want)
			}
			if got := b.Of.SelfWeightOn(b.On); math.Abs(got-w.Value) > 1e-9 {
				t.Errorf("SelfWeightOn %g, working %g", got, w.Value)
			}
			n := 0
			for _, st := range b.SelfWeight.Steps {
				if strings.Contains(st.Note, "assumed") {
					n++
				}
			}
			if n != tc.assumed {
				t.Errorf("%d steps noted as assumed, want %d", n, tc.assumed)
			}
			if b.Stratum() != "Sand" {
				t.Errorf("stratum %q, want Sand", b.Stratum())
			}
		})
	}
}
