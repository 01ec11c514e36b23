package design_test

import (
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"

	"go.yaml.in/yaml/v3"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// EN 1997-1:2004 Annex A recommended values: Table A.3 (A1, A2), Table
// A.4 (M1, M2), Table A.5 (R1, R2, R3 for spread foundations). Exact.
func TestRecommendedSets(t *testing.T) {
	da1, da2, da3 := design.DA1(), design.DA2(), design.DA3()
	c1, c2 := da1.Combinations[0], da1.Combinations[1]
	rows := []struct {
		name      string
		got, want float64
	}{
		{"A1 γ_G,sup", c1.Actions.GammaGSup, 1.35}, {"A1 γ_G,inf", c1.Actions.GammaGInf, 1.0}, {"A1 γ_Q", c1.Actions.GammaQ, 1.5},
		{"A2 γ_G,sup", c2.Actions.GammaGSup, 1.0}, {"A2 γ_G,inf", c2.Actions.GammaGInf, 1.0}, {"A2 γ_Q", c2.Actions.GammaQ, 1.3},
		{"M1 γ_φ′", c1.Material.GammaPhi, 1.0}, {"M1 γ_c′", c1.Material.GammaC, 1.0}, {"M1 γ_cu", c1.Material.GammaCu, 1.0}, {"M1 γ_γ", c1.Material.GammaGamma, 1.0},
		{"M2 γ_φ′", c2.Material.GammaPhi, 1.25}, {"M2 γ_c′", c2.Material.GammaC, 1.25}, {"M2 γ_cu", c2.Material.GammaCu, 1.4}, {"M2 γ_γ", c2.Material.GammaGamma, 1.0},
		{"R1 γ_Rv", c1.Resistance.GammaRv, 1.0}, {"R1 γ_Rh", c1.Resistance.GammaRh, 1.0},
		{"R2 γ_Rv", da2.Combinations[0].Resistance.GammaRv, 1.4}, {"R2 γ_Rh", da2.Combinations[0].Resistance.GammaRh, 1.1},
		{"R3 γ_Rv", da3.Combinations[0].Resistance.GammaRv, 1.0}, {"R3 γ_Rh", da3.Combinations[0].Resistance.GammaRh, 1.0},
		{"DA2 actions A1", da2.Combinations[0].Actions.GammaGSup, 1.35}, {"DA2 material M1", da2.Combinations[0].Material.GammaPhi, 1.0},
		{"DA3 actions A1", da3.Combinations[0].Actions.GammaQ, 1.5}, {"DA3 material M2", da3.Combinations[0].Material.GammaCu, 1.4},
	}
	for _, r := range rows {
		if r.got != r.want {
			t.Errorf("EN 1997-1 Annex A: %s = %v, want %v", r.name, r.got, r.want)
		}
	}
	for _, ap := range design.Recommended().Approaches {
		if err := ap.Validate(); err != nil {
			t.Errorf("%s: %v", ap.Name, err)
		}
	}
	if da1.CombinationName(1) != "DA1-C2" || da2.CombinationName(0) != "DA2" {
		t.Error("combination names")
	}
}

func TestParse(t *testing.T) {
	for _, r := range []struct {
		in, name string
		fs       float64
		ok       bool
	}{{"DA1", "DA1", 0, true}, {"da2", "DA2", 0, true}, {" DA3 ", "DA3", 0, true}, {"FS(3.0)", "FS(3)", 3, true}, {"FS(2.5)", "FS(2.5)", 2.5, true},
		{"FS(0.5)", "", 0, false}, {"FS(x)", "", 0, false}, {"DA4", "", 0, false}} {
		ap, err := design.Parse(r.in)
		if (err == nil) != r.ok || (r.ok && (ap.Name != r.name || ap.FS != r.fs)) {
			t.Errorf("Parse(%q) = %q %v, %v", r.in, ap.Name, ap.FS, err)
		}
	}
	_, err := design.Parse("DA4")
	var ie *site.InputError
	if !errors.As(err, &ie) || !strings.Contains(ie.Msg, "DA1, DA2, DA3, FS(x)") {
		t.Errorf("unknown approach error: %v", err)
	}
}

// A national annex replaces the sets as data: the yaml and json tags
// round-trip and a changed factor reaches the combinations.
func TestAnnexAsData(t *testing.T) {
	ann := design.Recommended()
	y, err := yaml.Marshal(ann)
	if err != nil {
		t.Fatal(err)
	}
	if !strings.Contains(string(y), "gamma_G_sup: 1.35") {
		t.Errorf("yaml lacks sheet-named keys:\n%s", y)
	}
	var back design.Annex
	if err := yaml.Unmarshal(y, &back); err != nil {
		t.Fatal(err)
	}
	j1, _ := json.Marshal(ann)
	j2, _ := json.Marshal(back)
	if string(j1) != string(j2) {
		t.Error("yaml round trip changed the annex")
	}
	na := `name: Example annex
approaches:
  - name: DA2*
    source: invented national annex for the test
    combinations:
      - actions: {name: A1, gamma_G_sup: 1.35, gamma_G_inf: 1.0, gamma_Q: 1.5}
        material: {name: M1, gamma_phi: 1.0, gamma_c: 1.0, gamma_cu: 1.0, gamma_gamma: 1.0}
        resistance: {name: R2, gamma_Rv: 1.4, gamma_Rh: 1.1}
    psi0_default: 0.6
`
	var a design.Annex
	if err := yaml.Unmarshal([]byte(na), &a); err != nil {
		t.Fatal(err)
	}
	ap, err := a.Lookup("da2*")
	if err != nil || ap.Validate() != nil || ap.Psi0() != 0.6 {
		t.Fatalf("annex approach: %+v %v", ap, err)
	}
}

func TestValidateRanges(t *testing.T) {
	ap := design.DA1()
	ap.Combinations[1].Material.GammaPhi = 0.9
	ap.Combinations[0].Actions.GammaGInf = 1.5
	err := ap.Validate()
	var list site.Errors
	if !errors.As(err, &list) || len(list) != 2 {
		t.Fatalf("want two errors, got %v", err)
	}
	var re *site.RangeError
	if !errors.As(list[0], &re) || re.Param != "gamma_G_inf" || re.Max != 1.35 {
		t.Errorf("first error: %v", list[0])
	}
	if err := (design.Approach{Name: "X"}).Validate(); err == nil {
		t.Error("an approach without combinations must not validate")
	}
}

// EN 1990 eq. (6.10) combinations. Actions: G (V 1000, H_B 50, M_B 100),
// Q imposed (V 400, ψ0 0.7), W wind (H_B 80, M_B 200, ψ0 not given →
// 0.7). Hand calculation of DA1-C1: Q leading, G sup: V = 1.35·1000 +
// 1.5·400 = 1950; H_B = 1.35·50 + 1.5·0.7·80 = 151.5; W leading, G sup:
// V = 1350 + 1.5·0.7·400 = 1770, H_B = 67.5 + 120 = 187.5; W leading,
// least V (Q left out as favourable, G's V at γ_G,inf, its H_B and M_B
// unfavourable at γ_G,sup): V = 1000, H_B = 67.5 + 120 = 187.5, M_B =
// 135 + 300 = 435. In DA1-C2 γ_G,sup = γ_G,inf = 1, so "G inf".
func TestLoads(t *testing.T) {
	acts := []site.Action{
		{Name: "G", V: 1000e3, HB: 50e3, MB: 100e3},
		{Name: "Imposed", Kind: site.Variable, V: 400e3, Psi0: site.Some(0.7)},
		{Name: "Wind", Kind: site.Variable, HB: 80e3, MB: 200e3},
	}
	loads := design.Loads(acts, design.DA1())
	want := []struct {
		name      string
		v, hb, mb float64
	}{
		{"DA1-C1 · Imposed leading · G sup", 1950, 151.5, 1.35*100 + 1.5*0.7*200},
		{"DA1-C1 · Wind leading · G sup", 1770, 187.5, 135 + 300},
		{"DA1-C1 · Wind leading · G inf on V · left out as favourable: Imposed", 1000, 187.5, 435},
		{"DA1-C2 · Imposed leading · G sup", 1000 + 1.3*400, 50 + 1.3*0.7*80, 100 + 1.3*0.7*200},
		{"DA1-C2 · Wind leading · G sup", 1000 + 1.3*0.7*400, 50 + 1.3*80, 100 + 1.3*200},
		{"DA1-C2 · Wind leading · G inf · left out as favourable: Imposed", 1000, 50 + 1.3*80, 100 + 1.3*200},
	}
	if len(loads) != len(want) {
		var ns []string
		for _, l := range loads {
			ns = append(ns, l.Name)
		}
		t.Fatalf("got %d loads %q, want %d", len(loads), ns, len(want))
	}
	for i, w := range want {
		l := loads[i]
		if l.Name != w.name || math.Abs(l.V/1e3-w.v) > 1e-9 || math.Abs(l.HB/1e3-w.hb) > 1e-9 || math.Abs(l.MB/1e3-w.mb) > 1e-9 {
			t.Errorf("load %d: %s V %.2f H_B %.2f M_B %.2f, want %v", i, l.Name, l.V/1e3, l.HB/1e3, l.MB/1e3, w)
		}
		var tr trace.Trace
		l.Record(&tr, acts, l.Name, "kN", "kNm")
		tr.Cite(trace.EN1990)
		tr.Cite(trace.EN1997)
		if err := trace.Verify(tr, 1e-12); err != nil {
			t.Errorf("%s: %v", l.Name, err)
		}
	}
	if got := design.PsiDefaulted(acts); len(got) != 1 || got[0] != "Wind" {
		t.Errorf("PsiDefaulted = %q", got)
	}
	if got := design.Tags([]site.Action{{Name: "Dead load"}, {Name: "Dead-load"}, {Name: ""}, {Name: "2nd", Kind: site.Variable}}); strings.Join(got, ",") != "Dead,Deadload,G3,Q4" {
		t.Errorf("Tags = %q", got)
	}
	// a single permanent action: one load per combination, no G inf
	one := design.Loads([]site.Action{{Name: "G", V: 1}}, design.DA1())
	if len(one) != 2 || one[0].Name != "DA1-C1 · permanent only · G sup" {
		t.Errorf("permanent only: %d loads, %q", len(one), one[0].Name)
	}
}
