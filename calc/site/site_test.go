package site_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/site"
)

const kN = 1e3

func clay() site.Ground {
	return site.Ground{
		Name:  "site",
		Water: site.Some(2.0),
		Layers: []site.Layer{
			{Name: "Made ground", Top: 0, Gamma: 18 * kN},
			{Name: "Firm clay", Top: 0.6, Gamma: 19 * kN, GammaSat: site.Some(20 * kN), Cu: site.Some(60e3)},
		},
	}
}

// Hand calculation (common practice): σ_v(3 m) = 0.6×18 + 1.4×19 + 1.0×20
// = 57.4 kPa; u = 1.0×9.81 = 9.81 kPa; σ′_v = 47.59 kPa.
func TestStresses(t *testing.T) {
	g := clay()
	for _, c := range []struct {
		name string
		got  float64
		want float64
	}{
		{"SigmaV(3)", g.SigmaV(3), 57.4e3},
		{"PoreP(3)", g.PoreP(3), 9.81e3},
		{"SigmaVEff(3)", g.SigmaVEff(3), 47.59e3},
		{"SigmaV(0.3)", g.SigmaV(0.3), 5.4e3},
		{"PoreP(1)", g.PoreP(1), 0},
	} {
		if math.Abs(c.got-c.want) > 1e-6 {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	if g.At(0.6) != 1 || g.At(0.59) != 0 || g.At(50) != 1 {
		t.Error("At: wrong layer")
	}
	if !g.Layers[1].Fine() || g.Layers[0].Fine() {
		t.Error("Fine: c_u given should mean fine-grained")
	}
}

func TestValidate(t *testing.T) {
	if err := clay().Validate(); err != nil {
		t.Fatal(err)
	}
	g := clay()
	g.Layers[0].Top = 0.5
	g.Layers[1].Phi = site.Some(52 * math.Pi / 180)
	g.Layers[1].GammaSat = site.Some(18 * kN)
	err := g.Validate()
	for _, want := range []string{
		"must start at ground level",
		"phi' = 52 deg: must be at most 50 deg",
		"gamma_sat = 18 kN/m3: must be at least 19 kN/m3",
	} {
		if err == nil || !strings.Contains(err.Error(), want) {
			t.Errorf("Validate() = %v, want it to contain %q", err, want)
		}
	}
	// φ′_cv: the range of φ′ and not above the peak (critical state is
	// the lower bound of the peak angle, common practice).
	g = clay()
	g.Layers[1].Phi = site.Some(24 * math.Pi / 180)
	g.Layers[1].PhiCv = site.Some(30 * math.Pi / 180)
	if err := g.Validate(); err == nil || !strings.Contains(err.Error(), "phi'_cv = 30 deg: must be at most 24 deg") {
		t.Errorf("φ′_cv above φ′: %v", err)
	}
	g.Layers[1].PhiCv = site.Some(22 * math.Pi / 180)
	if err := g.Validate(); err != nil {
		t.Errorf("φ′_cv below φ′: %v", err)
	}
	f := site.Footing{Name: "P1", Shape: site.Rectangle, B: 3, L: 2, D: -1}
	err = f.Validate()
	for _, want := range []string{"B is the shorter side", "D = -1 m: must be at least 0 m"} {
		if err == nil || !strings.Contains(err.Error(), want) {
			t.Errorf("Footing.Validate() = %v, want %q", err, want)
		}
	}
}

// Strata of the clay() ground down to 3 m (common practice): made ground
// 0–0.6 m dry, clay 0.6–2.0 m dry, clay 2.0–3.0 m below water.
func TestStrata(t *testing.T) {
	got := clay().Strata(3)
	want := []site.Stratum{
		{Layer: 0, Top: 0, Bot: 0.6, Gamma: 18 * kN},
		{Layer: 1, Top: 0.6, Bot: 2, Gamma: 19 * kN},
		{Layer: 1, Top: 2, Bot: 3, Wet: true, Gamma: 20 * kN},
	}
	if len(got) != len(want) {
		t.Fatalf("Strata = %+v", got)
	}
	for i := range want {
		if got[i] != want[i] {
			t.Errorf("stratum %d = %+v, want %+v", i, got[i], want[i])
		}
	}
}

// TestRangeWords: a range error reads the way an engineer reads a limit,
// and tiny widths are refused at the practical lower bound.
func TestRangeWords(t *testing.T) {
	for _, c := range []struct {
		f    site.Footing
		want string
	}{
		{site.Footing{Name: "F", Shape: site.Square, B: 0, D: 1}, "F: B = 0 m: must be at least 0.1 m"},
		{site.Footing{Name: "F", Shape: site.Square, B: 1e-300, D: 1}, "F: B = 1e-300 m: must be at least 0.1 m"},
		{site.Footing{Name: "F", Shape: site.Square, B: 2000, D: 1}, "F: B = 2000 m: must be at most 1000 m"},
		{site.Footing{Name: "F", Shape: site.Square, B: math.NaN(), D: 1}, "F: B = NaN m: not a number"},
	} {
		if err := c.f.Validate(); err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("B = %g: %v, want %q", c.f.B, err, c.want)
		}
	}
}

// Sum adds each component as given (hand-added, common practice); the
// units follow the shape.
func TestSumAndUnits(t *testing.T) {
	acts := []site.Action{
		{Name: "Dead", V: 500 * kN, HB: 10 * kN, MB: 20 * kN},
		{Name: "Wind", Kind: site.Variable, V: -40 * kN, HB: 30 * kN, HL: -5 * kN, ML: 7 * kN},
	}
	s := site.Sum(acts)
	if s.V != 460*kN || s.HB != 40*kN || s.HL != -5*kN || s.MB != 20*kN || s.ML != 7*kN {
		t.Errorf("Sum = %+v", s)
	}
	if z := site.Sum(nil); z != (site.Action{}) {
		t.Errorf("Sum(nil) = %+v", z)
	}
	for _, c := range []struct {
		shape  site.Shape
		fu, mu string
	}{{site.Strip, "kN/m", "kNm/m"}, {site.Square, "kN", "kNm"}, {site.Rectangle, "kN", "kNm"}, {site.Circle, "kN", "kNm"}} {
		f := site.Footing{Shape: c.shape}
		if f.ForceUnit() != c.fu || f.MomentUnit() != c.mu {
			t.Errorf("%v: %s, %s; want %s, %s", c.shape, f.ForceUnit(), f.MomentUnit(), c.fu, c.mu)
		}
	}
}

// A working platform is the first layer, granular, on a layer below it.
func TestPlatform(t *testing.T) {
	g := site.Ground{Name: "p", Platform: true, Layers: []site.Layer{
		{Name: "Crushed rock", Top: 0, Gamma: 20 * kN, Phi: site.Some(0.7)},
		{Name: "Soft clay", Top: 0.8, Gamma: 17 * kN, Cu: site.Some(25e3)},
	}}
	if err := g.Validate(); err != nil {
		t.Fatal(err)
	}
	if d, ok := g.PlatformDepth(); !ok || d != 0.8 {
		t.Errorf("PlatformDepth = %g, %v", d, ok)
	}
	g.Platform = false
	if _, ok := g.PlatformDepth(); ok {
		t.Error("no platform stated, one found")
	}
	one := site.Ground{Name: "p", Platform: true, Layers: g.Layers[:1]}
	if err := one.Validate(); err == nil || !strings.Contains(err.Error(), "second layer") {
		t.Errorf("one layer: %v", err)
	}
	fine := site.Ground{Name: "p", Platform: true, Layers: []site.Layer{g.Layers[1], {Name: "Sand", Top: 2, Gamma: 19 * kN}}}
	fine.Layers[0].Top = 0
	if err := fine.Validate(); err == nil || !strings.Contains(err.Error(), "granular") {
		t.Errorf("fine platform: %v", err)
	}
}
