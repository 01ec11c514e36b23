package fonts_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

func TestCoverage(t *testing.T) {
	// Every character plinth's typesetting emits must be in every text face.
	const need = "αβγδεζηθικλμνξοπρστυφχψωΓΔΘΛΞΠΣΦΨΩ≤≥≠×·−√′″°²³µ•–—±≈…→"
	for f := fonts.Face(0); f < fonts.NumFaces; f++ {
		if f == fonts.Math {
			continue
		}
		if r, ok := fonts.Get(f).Missing(need); ok {
			t.Errorf("%s lacks %q (U+%04X)", f, r, r)
		}
	}
	// The math face sets the operators and relations of formulas.
	if r, ok := fonts.Get(fonts.Math).Missing("+−×·/=<>≤≥≠≈±√()[]"); ok {
		t.Errorf("%s lacks %q (U+%04X)", fonts.Math, r, r)
	}
}

func TestWidth(t *testing.T) {
	mono := fonts.Get(fonts.Mono)
	if a, b := mono.Units("iiii"), mono.Units("MMMM"); a != b || a == 0 {
		t.Errorf("mono widths %d %d", a, b)
	}
	reg := fonts.Get(fonts.Regular)
	if reg.Width("MM", 10) <= reg.Width("ii", 10) {
		t.Error("proportional widths")
	}
	if reg.Has('\U0001F600') {
		t.Error("unexpected glyph")
	}
	if reg.Ascent(10) <= 0 || reg.Descent(10) <= 0 || reg.CapHeight(10) <= reg.XHeight(10) {
		t.Errorf("metrics %v %v %v %v", reg.Ascent(10), reg.Descent(10), reg.CapHeight(10), reg.XHeight(10))
	}
}

func TestInk(t *testing.T) {
	f := fonts.Get(fonts.Regular)
	a, d := f.Ink("x", 10)
	if a < 4 || a > 6 || d > 0.2 {
		t.Errorf("x ink %v %v", a, d)
	}
	a, d = f.Ink("(", 10)
	if a < 7 || d < 1.2 {
		t.Errorf("( ink %v %v", a, d)
	}
	t.Logf("asc %.2f desc %.2f cap %.2f x %.2f", f.Ascent(10), f.Descent(10), f.CapHeight(10), f.XHeight(10))
}

func TestSpell(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"c* = ⅔c", "c* = 2/3c"}, // vulgar fractions always, every face has them or not
		{"½ and ¾", "1/2 and 3/4"},
		{"σ′ ≤ 3 m²", "σ′ ≤ 3 m²"}, // in the face: kept
		{"漢", "漢"},                 // no spelling: left for the caller to report
	} {
		if got := fonts.Spell(c.in, fonts.Regular); got != c.want {
			t.Errorf("Spell(%q) = %q, want %q", c.in, got, c.want)
		}
	}
	if got := fonts.Spell("x′²", fonts.Math); got != "x′^2" {
		t.Errorf("Spell in the math face = %q", got)
	}
}

// TestMeasure: Measure gives what Width, Ink and Missing give apart.
func TestMeasure(t *testing.T) {
	for f := fonts.Face(0); f < fonts.NumFaces; f++ {
		fo := fonts.Get(f)
		for _, s := range []string{"", "AVAWAY To", "q_Ed = 1 883 kN", "γ′ N_γ ≤ ∑", "x\u2603y", "\xff", "WAVE ...."} {
			w, a, d, r, lacks := fo.Measure(s, 9.5)
			wa, wd := fo.Ink(s, 9.5)
			wr, wl := fo.Missing(s)
			if w != fo.Width(s, 9.5) || a != wa || d != wd || r != wr || lacks != wl {
				t.Errorf("%s %q: Measure %v %v %v %q %v; apart %v %v %v %q %v", f, s, w, a, d, r, lacks, fo.Width(s, 9.5), wa, wd, wr, wl)
			}
		}
	}
}
