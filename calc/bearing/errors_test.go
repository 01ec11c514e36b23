package bearing_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// params lists the parameter named by each error in err.
func params(err error) []string {
	var out []string
	var list site.Errors
	if !errors.As(err, &list) {
		list = site.Errors{err}
	}
	for _, e := range list {
		var re *site.RangeError
		var ie *site.InputError
		switch {
		case errors.As(e, &re):
			out = append(out, re.Param)
		case errors.As(e, &ie):
			out = append(out, ie.Param)
		}
	}
	return out
}

// Every domain error is returned, typed, naming the parameter — never a
// NaN, an Inf or a panic.
func TestDomainErrors(t *testing.T) {
	good := func() bearing.Input {
		return bearing.Input{
			Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(30 * deg)}),
			Footing: site.Footing{Name: "F1", Shape: site.Rectangle, B: 2, L: 3, D: 1},
			Actions: []site.Action{{Name: "G", V: 500e3}},
		}
	}
	rows := []struct {
		name, param string
		mod         func(*bearing.Input)
	}{
		{"zero width", "B", func(in *bearing.Input) { in.Footing.B = 0 }},
		{"L shorter than B", "L", func(in *bearing.Input) { in.Footing.L = 1 }},
		{"negative depth", "D", func(in *bearing.Input) { in.Footing.D = -1 }},
		{"base inclination 50°", "alpha", func(in *bearing.Input) { in.Footing.Alpha = 50 * deg }},
		{"NaN width", "B", func(in *bearing.Input) { in.Footing.B = math.NaN() }},
		{"φ′ = 55°", "phi'", func(in *bearing.Input) { in.Ground.Layers[0].Phi = site.Some(55 * deg) }},
		{"unit weight 40", "gamma", func(in *bearing.Input) { in.Ground.Layers[0].Gamma = 40e3 }},
		{"negative c_u", "c_u", func(in *bearing.Input) { in.Ground.Layers[0].Cu = site.Some(-5e3) }},
		{"first layer below ground", "top", func(in *bearing.Input) { in.Ground.Layers[0].Top = 1 }},
		{"water 60 m above ground", "water", func(in *bearing.Input) { in.Ground.Water = site.Some(-60) }},
		{"no actions", "", func(in *bearing.Input) { in.Actions = nil }},
		{"ψ0 above 1", "psi_0", func(in *bearing.Input) { in.Actions[0].Psi0 = site.Some(1.5) }},
		{"no strength at the base", "phi'", func(in *bearing.Input) { in.Ground.Layers[0].Phi = site.Opt{} }},
		{"drained check without φ′", "phi'", func(in *bearing.Input) {
			in.Ground.Layers[0] = site.Layer{Top: 0, Gamma: 18e3, Cu: site.Some(40e3)}
			in.Options.Drainage = bearing.Drained
		}},
		{"undrained check of clay without c_u", "c_u", func(in *bearing.Input) {
			in.Ground.Layers[0].Type = site.Fine
			in.Options.Drainage = bearing.Undrained
		}},
		{"strip with load along its length", "H_L, M_L", func(in *bearing.Input) {
			in.Footing.Shape = site.Strip
			in.Actions[0].HL = 10e3
		}},
		{"K_s negative", "K_s", func(in *bearing.Input) { in.Options.Ks = site.Some(-1) }},
		{"c_a/c_1 above 1", "c_a/c_1", func(in *bearing.Input) { in.Options.CaRatio = site.Some(1.2) }},
		{"δ = 60°", "delta", func(in *bearing.Input) { in.Options.Interface.Delta = site.Some(60 * deg) }},
		{"k_δ above 1", "k_delta", func(in *bearing.Input) { in.Options.Interface.KDelta = 1.5 }},
		{"spread gradient 3", "spread", func(in *bearing.Input) { in.Options.SpreadTan = 3 }},
		{"FS below 1", "FS", func(in *bearing.Input) { in.Options.Approach = design.FS(0.8) }},
		{"γ_Rv below 1", "gamma_Rv", func(in *bearing.Input) {
			ap := design.DA2()
			ap.Combinations[0].Resistance.GammaRv = 0.5
			in.Options.Approach = ap
		}},
		{"unknown method", "method", func(in *bearing.Input) { in.Options.Method = 9 }},
		{"unknown drainage", "drainage", func(in *bearing.Input) { in.Options.Drainage = -1 }},
		{"unknown switch", "sliding", func(in *bearing.Input) { in.Options.Sliding = 7 }},
	}
	for _, r := range rows {
		in := good()
		r.mod(&in)
		res, err := bearing.Check(in)
		if err == nil {
			t.Errorf("%s: no error (result %v)", r.name, res != nil)
			continue
		}
		ps := params(err)
		found := false
		for _, p := range ps {
			found = found || p == r.param
		}
		if !found {
			t.Errorf("%s: error %q names %q, want %q", r.name, err, ps, r.param)
		}
		if strings.Contains(err.Error(), "NaN") && r.name != "NaN width" {
			t.Errorf("%s: message mentions NaN: %v", r.name, err)
		}
	}
	// the range error carries value, range and unit
	in := good()
	in.Ground.Layers[0].Phi = site.Some(55 * deg)
	_, err := bearing.Check(in)
	var re *site.RangeError
	if !errors.As(err.(site.Errors)[0], &re) || re.Unit != "deg" || math.Abs(re.Value-55) > 1e-9 || re.Max != 50 {
		t.Errorf("φ′ range error: %#v", re)
	}
	if _, err := bearing.CapacityAt(good(), -1); err == nil {
		t.Error("CapacityAt(-1 m): no error")
	}
}

// Uplift is a caution, not an error: no bearing case, no NaN.
func TestUplift(t *testing.T) {
	in := bearing.Input{
		Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(30 * deg)}),
		Footing: site.Footing{Shape: site.Square, B: 2, D: 1},
		Actions: []site.Action{{Name: "G", V: 100e3}, {Name: "Wind", Kind: site.Variable, V: -300e3, HB: 20e3}},
	}
	r := check(t, "uplift", in)
	if !hasCaution(r, "uplift") {
		t.Error("no uplift caution")
	}
}

// An action so large that a formula overflows (q_Ed = V_d/A′ = 1.35e308
// N/m over 0.5 m: +Inf) is the trace's domain error, returned with the
// case it arose in: never a result holding NaN or Inf.
func TestFormulaOutOfDomain(t *testing.T) {
	in := bearing.Input{
		Ground:  oneLayer(site.Layer{Top: 0, Gamma: 18e3, Phi: site.Some(30 * deg)}),
		Footing: site.Footing{Name: "S1", Shape: site.Strip, B: 0.5, D: 0.5},
		Actions: []site.Action{{Name: "G", V: 1e308}},
		Options: bearing.Options{Drainage: bearing.Drained, Sliding: bearing.No},
	}
	res, err := bearing.Check(in)
	if err == nil {
		t.Fatalf("no error; result %+v", res.Cases)
	}
	var de *trace.DomainError
	if !errors.As(err, &de) || de.Symbol != "q_Ed" || !math.IsInf(de.Value, 1) {
		t.Fatalf("error %v (%T), want a DomainError of q_Ed = +Inf", err, err)
	}
	for _, want := range []string{`footing "S1"`, "DA1-C1", "drained", "q_Ed"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error %q lacks %q", err, want)
		}
	}
	if res != nil {
		t.Errorf("a result beside the error: %+v", res)
	}
}
