package settle_test

import (
	"errors"
	"fmt"
	"math"
	"reflect"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// fourLayers is an invented profile (Marsh Lane depot): crust, soft clay,
// firm clay, stiff clay, all with consolidation data.
func fourLayers() site.Ground {
	yr := settle.Year
	return site.Ground{Name: "Marsh Lane", Water: site.Some(1.2), Layers: []site.Layer{
		{Name: "Clay crust", Top: 0, Gamma: 18.5e3, GammaSat: site.Some(19e3), Cu: site.Some(45e3), Eu: site.Some(12e6),
			Cc: site.Some(0.22), Cr: site.Some(0.04), E0: site.Some(0.85), OCR: site.Some(3), Cv: site.Some(4 / yr), Calpha: site.Some(0.006)},
		{Name: "Soft clay", Top: 2.5, Gamma: 17e3, GammaSat: site.Some(17.5e3), Cu: site.Some(20e3), Eu: site.Some(5e6),
			Cc: site.Some(0.45), Cr: site.Some(0.07), E0: site.Some(1.3), SigmaP: site.Some(60e3), Cv: site.Some(1.5 / yr), Calpha: site.Some(0.015)},
		{Name: "Firm clay", Top: 7, Gamma: 19e3, GammaSat: site.Some(19.5e3), Cu: site.Some(55e3), Eu: site.Some(20e6),
			Mv: site.Some(0.12e-6), Cv: site.Some(3 / yr)},
		{Name: "Stiff clay", Top: 12, Gamma: 20e3, GammaSat: site.Some(20.5e3), Cu: site.Some(120e3), Eu: site.Some(60e6),
			Mv: site.Some(0.05e-6), Cv: site.Some(8 / yr)},
	}}
}

func fourLayerInput(n int) settle.Input {
	return settle.Input{Ground: fourLayers(), Footing: site.Footing{Name: "P4", Shape: site.Rectangle, B: 3, L: 4, D: 1.2},
		Q: site.Some(150 * kPa), Method: settle.Consolidation, Sublayers: n}
}

func TestVerifyEverywhere(t *testing.T) {
	g := fourLayers()
	sand := site.Ground{Water: site.Some(3), Layers: []site.Layer{
		{Name: "Sand", Top: 0, Gamma: 18e3, GammaSat: site.Some(20e3), E: site.Some(30e6), Qc: site.Some(8e6), N: site.Some(18)},
		{Name: "Gravel", Top: 4, Gamma: 20e3, GammaSat: site.Some(21e3), E: site.Some(80e6), Qc: site.Some(20e6), N: site.Some(40)},
	}}
	footings := []site.Footing{
		{Name: "R", Shape: site.Rectangle, B: 2, L: 5, D: 1},
		{Name: "Q", Shape: site.Square, B: 2.5, D: 0.8},
		{Name: "S", Shape: site.Strip, B: 1.2, D: 0.6},
		{Name: "C", Shape: site.Circle, B: 3, D: 1.5},
	}
	times := []float64{0.5 * settle.Year, 5 * settle.Year}
	count := 0
	for _, gr := range []site.Ground{g, sand} {
		for _, f := range footings {
			for _, m := range []settle.Method{settle.Auto, settle.Elastic, settle.Consolidation, settle.Schmertmann, settle.BurlandBurbidge} {
				if gr.Name == "Marsh Lane" && m == settle.BurlandBurbidge {
					continue // no N in the clay profile
				}
				for _, p := range []stress.Point{stress.Centre, stress.Corner, stress.Characteristic} {
					for _, sm := range []stress.Method{stress.Boussinesq, stress.Spread} {
						in := settle.Input{Ground: gr, Footing: f, Q: site.Some(180 * kPa), Method: m, At: p, Stress: sm, Times: times, SkemptonBjerrum: site.Some(0.7)}
						r := mustCompute(t, in)
						count++
						if r.Total < 0 || r.Util != r.Total/r.Limit {
							t.Errorf("%v %v %v: total %g util %g", f.Shape, m, p, r.Total, r.Util)
						}
						var si, sc float64
						for _, L := range r.Layers {
							si += L.Si
							sc += L.Sc
						}
						if m != settle.BurlandBurbidge && math.Abs(si-r.Si) > 1e-12 {
							t.Errorf("%v %v: Σ layer s_i %g ≠ s_i %g", f.Shape, m, si, r.Si)
						}
						if math.Abs(sc-r.Sc) > 1e-12 {
							t.Errorf("%v %v: Σ layer s_c %g ≠ s_c %g", f.Shape, m, sc, r.Sc)
						}
						if len(r.Trace.Sources) == 0 {
							t.Error("no sources")
						}
					}
				}
			}
		}
	}
	if count < 200 {
		t.Errorf("only %d configurations", count)
	}
}

// 200 sublayers: the trace stays checker-readable (representative
// sublayers written out, the rest in the table), and every sublayer
// settlement adds up to the layer totals.
func TestTwoHundredSublayers(t *testing.T) {
	in := fourLayerInput(200)
	in.Times = []float64{1 * settle.Year, 10 * settle.Year}
	r := mustCompute(t, in)
	if len(r.Sub) != 200 {
		t.Errorf("%d sublayers", len(r.Sub))
	}
	if n := len(r.Trace.Steps); n > 250 {
		t.Errorf("%d trace steps for 200 sublayers", n)
	}
	var sum float64
	for i, s := range r.Sub {
		sum += s.Sc
		if i > 0 && math.Abs(s.Top-r.Sub[i-1].Bot) > 1e-12 {
			t.Errorf("gap at sublayer %d", i)
		}
	}
	near(t, "Σ Δs", sum, r.Sc, 1e-15, "table sums to s_c")
	if r.Sub[0].Top != 1.2 || math.Abs(r.Sub[199].Bot-r.ZInf) > 1e-12 {
		t.Errorf("table spans %g–%g, zone %g", r.Sub[0].Top, r.Sub[199].Bot, r.ZInf)
	}
	// the crust is OC (C_r), the soft clay crosses σ′_p: both cases shown
	cases := map[string]bool{}
	for _, s := range r.Trace.Steps {
		if s.Symbol == "Delta_s" {
			cases[s.Note[:8]] = true
		}
	}
	if len(cases) < 2 {
		t.Errorf("representative cases %v", cases)
	}
	// Δσ falls to 0.1 σ′_v0 at the bottom of the zone.
	bot := r.ZInf
	f, _ := stress.Func(in.Footing, stress.Options{})
	near(t, "Δσ/σ′_v0 at z_inf", (r.QNet*f(bot-1.2))/in.Ground.SigmaVEff(bot), 0.1, 1e-6, "depth rule")
}

func TestAutoMethod(t *testing.T) {
	clay := mustCompute(t, settle.Input{Ground: fourLayers(), Footing: site.Footing{Name: "A", Shape: site.Square, B: 2, D: 1}, Q: site.Some(120 * kPa)})
	if clay.Method != settle.Combined || clay.Si <= 0 || clay.Sc <= 0 {
		t.Errorf("clay: %v s_i %g s_c %g", clay.Method, clay.Si, clay.Sc)
	}
	sandQc := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, Qc: site.Some(10e6), N: site.Some(20)}}}
	sandN := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, N: site.Some(20)}}}
	sandE := site.Ground{Layers: []site.Layer{{Name: "Sand", Top: 0, Gamma: 18e3, E: site.Some(40e6)}}}
	f := site.Footing{Name: "A", Shape: site.Square, B: 2, D: 1}
	for _, c := range []struct {
		g    site.Ground
		want settle.Method
	}{{sandQc, settle.Schmertmann}, {sandN, settle.BurlandBurbidge}, {sandE, settle.Schmertmann}} {
		r := mustCompute(t, settle.Input{Ground: c.g, Footing: f, Q: site.Some(150 * kPa)})
		if r.Method != c.want {
			t.Errorf("%s: auto chose %v, want %v", c.g.Layers[0].Name, r.Method, c.want)
		}
		noted := false
		for _, cn := range r.Trace.Cautions {
			noted = noted || cn.Code == "auto-method"
		}
		if !noted {
			t.Error("auto choice not stated")
		}
	}
}

func TestSymbols(t *testing.T) {
	in := fourLayerInput(40)
	r := mustCompute(t, in)
	want := []string{"q_SLS", "q_net", "z_inf", "s_i", "s_c", "s_sec", "s_total", "s_lim", "util_s", "t_50", "t_90"}
	var got []string
	for _, v := range r.Symbols {
		got = append(got, v.Symbol)
	}
	if !reflect.DeepEqual(got, want) {
		t.Errorf("symbols %v", got)
	}
	if r.Symbols[6].V != r.Total || r.Symbols[8].V != r.Util || r.Symbols[10].V != r.T90.V {
		t.Error("symbol values differ from the result")
	}
	// Every symbol but util and z_inf, t_* appears as a trace step with the same value.
	steps := map[string]float64{}
	for _, s := range r.Trace.Steps {
		steps[s.Symbol] = s.Value
	}
	step := map[string]string{"q_SLS": "q", "util_s": "util"} // the sheet's names of the steps q and util
	for _, v := range r.Symbols {
		name := v.Symbol
		if n, ok := step[name]; ok {
			name = n
		}
		if sv, ok := steps[name]; ok && sv != v.V && v.Symbol != "sigma'_v0" {
			t.Errorf("symbol %s = %g, last step %g", v.Symbol, v.V, sv)
		}
	}
}

func TestDeterministic(t *testing.T) {
	in := fourLayerInput(120)
	in.Times = []float64{settle.Year, 3 * settle.Year}
	in.SkemptonBjerrum = site.Some(0.6)
	a, _ := settle.Compute(in)
	b, _ := settle.Compute(in)
	// An engine function's formula holds its implementation, a func that
	// reflect.DeepEqual never finds equal: compare formulas as printed.
	fa, fb := formulas(a), formulas(b)
	if !reflect.DeepEqual(a, b) || !reflect.DeepEqual(fa, fb) {
		t.Error("two runs differ")
	}
}

// formulas moves each step's formula out of r, as text.
func formulas(r *settle.Result) []string {
	var out []string
	for i := range r.Trace.Steps {
		out = append(out, fmt.Sprintf("%#v", r.Trace.Steps[i].Formula))
		r.Trace.Steps[i].Formula = nil
	}
	return out
}

func TestEdgeCases(t *testing.T) {
	// Net pressure ≤ 0: no settlement, a note.
	in := fourLayerInput(40)
	in.Q = site.Some(10 * kPa)
	r := mustCompute(t, in)
	if r.Total != 0 || r.QNet >= 0 {
		t.Errorf("q_net %g gives %g", r.QNet, r.Total)
	}
	// V instead of Q: q = V/A.
	in = fourLayerInput(40)
	in.Q = site.Opt{}
	in.V = site.Some(1800e3)
	r = mustCompute(t, in)
	near(t, "q = V/A", r.Q, 1800e3/12, 1e-9, "")
	// Rigid: characteristic point, between corner and centre.
	in = fourLayerInput(40)
	in.Rigid = true
	rg := mustCompute(t, in)
	if rg.Point != stress.Characteristic {
		t.Errorf("rigid at %v", rg.Point)
	}
	// Fine layer reached by the zone but without consolidation data: caution.
	g := site.Ground{Layers: []site.Layer{{Name: "Clay", Top: 0, Gamma: 18e3, Cu: site.Some(40e3), Eu: site.Some(15e6)}}}
	r = mustCompute(t, settle.Input{Ground: g, Footing: site.Footing{Name: "F", Shape: site.Square, B: 2}, Q: site.Some(100 * kPa)})
	found := false
	for _, c := range r.Trace.Cautions {
		found = found || c.Code == "no-consolidation"
	}
	if !found || r.Si <= 0 {
		t.Errorf("no caution for missing consolidation data (s_i %g)", r.Si)
	}
	// Depth rules.
	in = fourLayerInput(40)
	in.Depth = settle.Depth{Rule: settle.DepthWidth}
	r = mustCompute(t, in)
	near(t, "width rule", r.ZInf, 1.2+3*(2+2*(4.0/3-1)/9), 1e-12, "2B (square) to 4B (strip)")
	in.Depth = settle.Depth{Rule: settle.DepthStress, Ratio: site.Some(0.2)}
	r2 := mustCompute(t, in)
	in.Depth = settle.Depth{}
	r1 := mustCompute(t, in)
	if !(r2.ZInf < r1.ZInf) {
		t.Errorf("ratio 0.2 zone %g not above ratio 0.1 zone %g", r2.ZInf, r1.ZInf)
	}
}

func TestInputErrors(t *testing.T) {
	base := fourLayerInput(40)
	var re *site.RangeError
	var ie *site.InputError
	cases := []struct {
		name string
		mod  func(*settle.Input)
		want string // parameter named
	}{
		{"no load", func(in *settle.Input) { in.Q = site.Opt{} }, "q"},
		{"both loads", func(in *settle.Input) { in.V = site.Some(1e6) }, "q"},
		{"negative q", func(in *settle.Input) { in.Q = site.Some(-5) }, "q"},
		{"limit", func(in *settle.Input) { in.Limit = site.Some(-0.01) }, "limit"},
		{"time", func(in *settle.Input) { in.Times = []float64{-1} }, "time"},
		{"sublayers", func(in *settle.Input) { in.Sublayers = -3 }, "sublayers"},
		{"fixed depth above base", func(in *settle.Input) { in.Depth = settle.Depth{Rule: settle.DepthFixed, Z: site.Some(0.5)} }, "depth"},
		{"A", func(in *settle.Input) { in.SkemptonBjerrum = site.Some(3) }, "Skempton–Bjerrum A"},
		{"method", func(in *settle.Input) { in.Method = 42 }, "method"},
		{"ground", func(in *settle.Input) { in.Ground.Layers[1].Cc = site.Some(-1) }, "C_c"},
	}
	for _, c := range cases {
		in := base
		in.Ground.Layers = append([]site.Layer(nil), base.Ground.Layers...)
		c.mod(&in)
		_, err := settle.Compute(in)
		if err == nil {
			t.Errorf("%s: accepted", c.name)
			continue
		}
		named := false
		var walk func(error)
		walk = func(e error) {
			switch {
			case errors.As(e, &re) && re.Param == c.want, errors.As(e, &ie) && ie.Param == c.want:
				named = true
			}
			if l, ok := e.(site.Errors); ok {
				for _, x := range l {
					walk(x)
				}
			}
		}
		walk(err)
		if !named {
			t.Errorf("%s: error %q does not name %s", c.name, err, c.want)
		}
	}
	_ = trace.SevNote
}
