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

// evalOne evaluates a one-sheet package and returns its analysis blocks.
func evalOne(t *testing.T, src string) []*eval.Block {
	t.Helper()
	f := source.NewFile("p.md", []byte(src))
	s, pd := parse.Sheet(f)
	if pd.HasErrors() {
		t.Fatal(pd)
	}
	res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	var out []*eval.Block
	for _, b := range res.Sheets[0].Blocks() {
		if b.Settle != nil || b.Bearing != nil {
			out = append(out, b)
		}
	}
	return out
}

func stepOf(tr trace.Trace, sym string) (trace.Step, bool) {
	for _, s := range tr.Steps {
		if s.Symbol == sym {
			return s, true
		}
	}
	return trace.Step{}, false
}

// TestSettleOptions: each settlement option of the sheet reaches the
// engine. Hand calculations, tolerance 1e-9:
//   - Schmertmann et al. (1978): C_2 = 1 + 0.2 log10(t/0.1 yr); at the
//     default life of 50 yr (EN 1990 Table 2.1, category 4) 1 + 0.2
//     log10 500 = 1.539794; at life = 100 yr 1 + 0.2 × 3 = 1.6.
//   - Burland & Burbidge (1985) f_t = 1 + R_3 + R log10(t/3 yr): static
//     R_3 = 0.3, R = 0.2; fluctuating 0.7, 0.8; at 50 yr fluctuating
//     1.7 + 0.8 log10(50/3) = 2.677484.
//   - depth = width(3): z_inf = D + 3B = 1 + 6 = 7 m; depth = 6 m: 6 m.
func TestSettleOptions(t *testing.T) {
	ground := "```ground g\n| layer | top (m) | gamma (kN/m3) | phi' (deg) | c' (kPa) | E' (MPa) | N |\n| --- | --- | --- | --- | --- | --- | --- |\n| Sand | 0 | 18 | 32 | 0 | 20 | 15 |\n```\n\n" +
		"```footing F\nshape = square\nB = 2 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 600 |\n```\n\n"
	for _, tc := range []struct {
		name, opts string
		sym        string
		want       float64
		assumed    bool // the design life is printed as assumed
	}{
		{"default life", "method = schmertmann\n", "C_2", 1 + 0.2*math.Log10(500), true},
		{"life 100 yr", "method = schmertmann\nlife = 100 yr\n", "C_2", 1.6, false},
		{"fluctuating", "method = burland-burbidge\nfluctuating = yes\n", "f_t", 1.7 + 0.8*math.Log10(50.0/3), true},
		{"static", "method = burland-burbidge\n", "f_t", 1.3 + 0.2*math.Log10(50.0/3), true},
		{"width rule", "method = elastic\ndepth = width(3)\n", "z_inf", 7, false},
		{"fixed depth", "method = elastic\ndepth = 6 m\n", "z_inf", 6, false},
	} {
		t.Run(tc.name, func(t *testing.T) {
			bs := evalOne(t, "# T\n\n"+ground+"```settlement F on g\n"+tc.opts+"```\n")
			if len(bs) != 1 {
				t.Fatalf("%d blocks", len(bs))
			}
			tr := bs[0].Settle.Trace
			if err := trace.Verify(tr, 1e-9); err != nil {
				t.Error(err)
			}
			st, ok := stepOf(tr, tc.sym)
			if !ok || math.Abs(st.Value-tc.want) > 1e-9*math.Abs(tc.want) {
				t.Errorf("%s = %v (found %v), want %v", tc.sym, st.Value, ok, tc.want)
			}
			life, ok := stepOf(tr, "t_life")
			if tc.sym != "z_inf" {
				if !ok || strings.Contains(life.Note, "assumed, default") != tc.assumed {
					t.Errorf("design life step %v: %q, want assumed %v", ok, life.Note, tc.assumed)
				}
			}
		})
	}
}
