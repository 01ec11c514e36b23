package trace_test

import (
	"errors"
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
	tr.Eval(trace.Step{Symbol: "N_q", Formula: f, Inputs: in, Ref: trace.Ref{Source: trace.EN1997, Clause: "Annex D, D.4"}})
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
	a.Take(trace.Step{Symbol: "x", Value: 1})
	b.Take(trace.Step{Symbol: "y", Value: 2})
	b.Warn(trace.Caution{Code: "c"})
	a.Append(b, "drained")
	if a.Cautions[0].Step != 1 || a.Steps[1].Case != "drained" || a.Cautions[0].Case != "drained" {
		t.Errorf("Append: %+v", a)
	}
	if got := trace.Symbols(trace.Add(trace.S("a"), trace.Mul(trace.S("b"), trace.S("a")))); strings.Join(got, ",") != "a,b" {
		t.Errorf("Symbols = %v", got)
	}
}

func TestRecorderComputesFromFormula(t *testing.T) {
	// s_q = 1 + (B′/L′) sin φ′, EN 1997-1:2004 Annex D, D.4: for B′/L′ = 0.5
	// and φ′ = 30°, 1 + 0.5 × 0.5 = 1.25 (hand calculation).
	var tr trace.Trace
	f := trace.Add(trace.N(1), trace.Mul(trace.Div(trace.S("B'"), trace.S("L'")), trace.Fn("sin", trace.S("phi'"))))
	v := tr.Eval(trace.Step{Symbol: "s_q", Formula: f, Inputs: []trace.Value{
		{Symbol: "B'", V: 1}, {Symbol: "L'", V: 2}, {Symbol: "phi'", V: math.Pi / 6}}})
	if math.Abs(v-1.25) > 1e-12 || tr.Steps[0].Value != v || tr.Steps[0].Kind != trace.ByFormula || tr.Err() != nil {
		t.Fatalf("Eval = %v, step %+v, err %v", v, tr.Steps[0], tr.Err())
	}
	// An engine function prints by name and is evaluated by its own code.
	twice := trace.Named("twice", func(a []float64) float64 { return 2 * a[0] }, trace.S("x"))
	if v := tr.Eval(trace.Step{Symbol: "y", Formula: twice, Inputs: []trace.Value{{Symbol: "x", V: 3}}}); v != 6 {
		t.Errorf("Named = %v, want 6", v)
	}
	// Take keeps a value with its kind; the zero kind becomes Given.
	tr.Take(trace.Step{Symbol: "N_gamma", Value: 20.1, Kind: trace.Tabulated})
	tr.Take(trace.Step{Symbol: "s_c", Value: 1})
	if tr.Steps[2].Kind != trace.Tabulated || tr.Steps[3].Kind != trace.Given {
		t.Errorf("kinds %v %v", tr.Steps[2].Kind, tr.Steps[3].Kind)
	}
	if err := trace.Verify(tr, 1e-12); err != nil || tr.Err() != nil {
		t.Fatal(err, tr.Err())
	}
	// A missing input, an unknown function and a NaN are the trace's error,
	// the first one kept.
	var bad trace.Trace
	bad.Eval(trace.Step{Symbol: "a", Formula: trace.S("b")})
	bad.Eval(trace.Step{Symbol: "c", Formula: trace.Fn("sqrt", trace.N(-1))})
	if err := bad.Err(); err == nil || !strings.Contains(err.Error(), "b has no input") {
		t.Errorf("Err = %v", err)
	}
	var nan trace.Trace
	nan.Eval(trace.Step{Symbol: "c", Formula: trace.Fn("ln", trace.S("x")), Inputs: []trace.Value{{Symbol: "x", V: 0}}})
	var de *trace.DomainError
	if err := nan.Err(); !errors.As(err, &de) || de.Symbol != "c" || !strings.Contains(err.Error(), "x = 0") {
		t.Errorf("Err = %v", err)
	}
	var opaque trace.Trace
	opaque.Eval(trace.Step{Symbol: "u", Formula: trace.Fn("nosuch", trace.N(1))})
	if opaque.Err() == nil {
		t.Error("unknown function accepted")
	}
	// Errors carry through Append.
	var all trace.Trace
	all.Append(nan, "x")
	if all.Err() == nil {
		t.Error("Append dropped the error")
	}
}

func TestOneFunctionTable(t *testing.T) {
	for _, name := range strings.Fields(trace.FunctionNames) {
		f, ok := trace.Lookup(name)
		if !ok || f.F == nil || f.Min < 1 {
			t.Errorf("%s: %+v %v", name, f, ok)
		}
	}
	// cot(45°) = 1.
	if f, _ := trace.Lookup("cot"); math.Abs(f.F([]float64{math.Pi / 4})-1) > 1e-12 {
		t.Error("cot(45°) != 1")
	}
}

func BenchmarkEval(b *testing.B) {
	f := trace.Mul(trace.Fn("exp", trace.Mul(trace.S("pi"), trace.Fn("tan", trace.S("phi'")))),
		trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(trace.S("phi'"), trace.N(2)))), trace.N(2)))
	in := []trace.Value{{Symbol: "phi'", V: 0.5}}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := trace.Eval(f, in); err != nil {
			b.Fatal(err)
		}
	}
}
