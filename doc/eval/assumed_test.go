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

const assumedSrc = "# T\n\n```ground g\nwater = 0.5 m\n\n| layer | top (m) | gamma (kN/m3) | gamma_sat (kN/m3) | phi' (deg) | c' (kPa) | E' (MPa) |\n| --- | --- | --- | --- | --- | --- | --- |\n| Sand | 0 | 18 | 20 | 32 | 0 | 20 |\n```\n\n" +
	"```footing F\nshape = square\nB = 2 m\nD = 1 m\nself_weight = auto\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 500 |\n| Imposed | variable | 200 |\n| Wind | variable | 100 |\n```\n\n```bearing F on g\nsliding = yes\n```\n\n```settlement F on g\nmethod = elastic\n```\n"

func evalSet(t *testing.T, src string, set ...string) []*eval.Block {
	t.Helper()
	f := source.NewFile("p.md", []byte(src))
	s, pd := parse.Sheet(f)
	if pd.HasErrors() {
		t.Fatal(pd)
	}
	res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{Set: set})
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

// TestAssumedDefaults: every value the engine assumes where the sheet is
// silent is an input step of its working marked "assumed, default", and
// --set gives it (then the step says "given"). The defaults: γ_w = 9.81
// kN/m³, γ_c = 24 kN/m³ (common practice), ψ0 = 0.7 (EN 1990 Table
// A1.1, imposed loads), ν′ = 0.3 (common practice), 40 sublayers
// (plinth's default). Exact (the values are taken, not computed).
func TestAssumedDefaults(t *testing.T) {
	type want struct {
		sym string
		v   float64
	}
	find := func(tr trace.Trace, sym string) (trace.Step, bool) {
		for _, st := range tr.Steps {
			if st.Symbol == sym || strings.HasPrefix(st.Symbol, sym+"_") {
				return st, true
			}
		}
		return trace.Step{}, false
	}
	bs := evalSet(t, assumedSrc)
	if len(bs) != 2 {
		t.Fatalf("%d blocks", len(bs))
	}
	b, s := bs[0], bs[1]
	for _, x := range []struct {
		tr   trace.Trace
		w    want
		name string
	}{
		{b.Bearing.Trace, want{"gamma_w", 9.81e3}, "bearing"},
		{b.Bearing.Trace, want{"psi_0", 0.7}, "bearing"},
		{b.Bearing.Trace, want{"k_delta", 1}, "sliding"},
		{b.SelfWeight, want{"gamma_c", 24e3}, "self-weight"},
		{s.Settle.Trace, want{"gamma_w", 9.81e3}, "settlement"},
		{s.Settle.Trace, want{"nu'", 0.3}, "settlement"},
		{s.Settle.Trace, want{"n_sub", 40}, "settlement"},
	} {
		st, ok := find(x.tr, x.w.sym)
		if !ok || st.Value != x.w.v || !strings.Contains(st.Note, "assumed, default") {
			t.Errorf("%s: %s = %v (found %v), note %q: want %v, assumed, default", x.name, x.w.sym, st.Value, ok, st.Note, x.w.v)
		}
	}
	bs = evalSet(t, assumedSrc, "g.gamma_w=10kN/m3", "F.gamma_c=25kN/m3")
	b, s = bs[0], bs[1]
	for _, x := range []struct {
		tr trace.Trace
		w  want
	}{{b.Bearing.Trace, want{"gamma_w", 10e3}}, {s.Settle.Trace, want{"gamma_w", 10e3}}, {b.SelfWeight, want{"gamma_c", 25e3}}} {
		st, ok := find(x.tr, x.w.sym)
		if !ok || math.Abs(st.Value-x.w.v) > 1e-9 || strings.Contains(st.Note, "assumed") {
			t.Errorf("--set %s: %v (found %v), note %q", x.w.sym, st.Value, ok, st.Note)
		}
		if err := trace.Verify(x.tr, 1e-9); err != nil {
			t.Error(err)
		}
	}
	// W = 25 × 4 × 1 = 100 kN with h = D (hand calculation)
	if w := b.SelfWeight.Steps[len(b.SelfWeight.Steps)-1]; math.Abs(w.Value-100e3) > 1e-6 {
		t.Errorf("W = %g, want 100 kN", w.Value)
	}
}
