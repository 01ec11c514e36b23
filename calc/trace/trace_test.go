package trace_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/trace"
)

func TestEvalAndVerify(t *testing.T) {
	// N_q = e^(π tan φ′) tan²(45° + φ′/2), EN 1997-1:2004 Annex D, D.4.
	// For φ′ = 30°, N_q = 18.40 (EN 1997-1 formula evaluated independently:
	// 18.4011; Smith, Elements of Soil Mechanics, Annex D example prints
	// 18.4; that Bond & Harris, Decoding Eurocode 7, 2008, Table 13.3 lists
	// 18.40 is from memory).
	phi := 30 * math.Pi / 180
	f := trace.Mul(trace.Fn("exp", trace.Mul(trace.S("pi"), trace.Fn("tan", trace.S("phi'")))),
		trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(trace.S("phi'"), trace.N(2)))), trace.N(2)))
	in := []trace.Value{{Symbol: "phi'", V: phi, Unit: "deg"}}
	v, err := trace.Eval(f, in)
	if err != nil || math.Abs(v-18.401) > 0.001 {
		t.Fatalf("Eval = %v, %v; want 18.401", v, err)
	}
	var tr trace.Trace
	tr.Add(trace.Step{Symbol: "N_q", Formula: f, Inputs: in, Value: v, Ref: trace.Ref{Source: trace.EN1997, Clause: "Annex D, D.4"}})
	tr.Warn(trace.Caution{Code: "x", Message: "m"})
	if err := trace.Verify(tr, 1e-12); err != nil {
		t.Fatal(err)
	}
	if tr.Cautions[0].Step != 0 {
		t.Errorf("caution step = %d, want 0", tr.Cautions[0].Step)
	}
	// A wrong value, a missing input and an uncited source are all caught.
	bad := trace.Trace{Steps: []trace.Step{
		{Symbol: "a", Formula: trace.Mul(trace.S("b"), trace.N(2)), Inputs: []trace.Value{{Symbol: "b", V: 2}}, Value: 5},
		{Symbol: "c", Formula: trace.S("d"), Value: 1, Ref: trace.Ref{Source: trace.EN1990}},
	}}
	err = trace.Verify(bad, 1e-9)
	for _, want := range []string{"formula gives 4", "uses d with no input", "EN1990 not in Sources"} {
		if err == nil || !strings.Contains(err.Error(), want) {
			t.Errorf("Verify error %v lacks %q", err, want)
		}
	}
}

func TestAppendShiftsCautions(t *testing.T) {
	var a, b trace.Trace
	a.Add(trace.Step{Symbol: "x", Value: 1})
	b.Add(trace.Step{Symbol: "y", Value: 2})
	b.Warn(trace.Caution{Code: "c"})
	a.Append(b, "drained")
	if a.Cautions[0].Step != 1 || a.Steps[1].Case != "drained" || a.Cautions[0].Case != "drained" {
		t.Errorf("Append: %+v", a)
	}
	if got := trace.Symbols(trace.Add(trace.S("a"), trace.Mul(trace.S("b"), trace.S("a")))); strings.Join(got, ",") != "a,b" {
		t.Errorf("Symbols = %v", got)
	}
}
