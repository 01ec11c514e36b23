package eqn_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

func TestNumber(t *testing.T) {
	tests := []struct {
		v    float64
		sig  int
		want string
	}{
		{0, 6, "0"}, {1.5, 6, "1.5"}, {0.1 + 0.2, 6, "0.3"}, {-2.25, 3, "−2.25"},
		{123456, 3, "123000"}, {2.5e6, 3, "2.5 × 10^{6}"}, {1.2e-5, 3, "1.2 × 10^{−5}"},
		{math.Pi, 4, "3.142"},
	}
	for _, tt := range tests {
		if got := eqn.String(eqn.Number(tt.v, tt.sig)); got != tt.want {
			t.Errorf("Number(%v, %d) = %q, want %q", tt.v, tt.sig, got, tt.want)
		}
	}
}

func TestUnit(t *testing.T) {
	for in, want := range map[string]string{
		"kN/m3": "kN/m^{3}", "m^2/yr": "m^{2}/yr", "kN*m": "kN·m", "deg": "°", "kPa": "kPa",
		"m2/MN": "m^{2}/MN", "s^-1": "s^{−1}",
	} {
		if got := eqn.String(eqn.Unit(in)); got != want {
			t.Errorf("Unit(%q) = %q, want %q", in, got, want)
		}
	}
}

func TestLayout(t *testing.T) {
	st := eqn.Style{Size: 10}
	sym := func(n string) eqn.Sym { return eqn.Sym{Name: n} }
	e := eqn.Frac{Num: eqn.Row{sym("a"), eqn.Op{Text: "+"}, sym("b")}, Den: eqn.Sqrt{X: eqn.Script{Base: sym("c"), Sup: eqn.Num{Text: "2"}}}}
	b, err := eqn.Layout(e, st)
	if err != nil {
		t.Fatal(err)
	}
	if b.Ascent < 8 || b.Descent < 8 || b.W < 15 {
		t.Errorf("fraction box %+v", *b)
	}
	_, err = eqn.Layout(eqn.Text{Text: "x\U0001F600"}, st)
	if err == nil || !strings.Contains(err.Error(), "U+1F600") {
		t.Errorf("missing glyph error = %v", err)
	}
}

func TestBreak(t *testing.T) {
	st := eqn.Style{Size: 10}
	var sum eqn.Row
	for i, s := range []string{"a_1", "a_2", "a_3", "a_4", "a_5", "a_6", "a_7", "a_8"} {
		if i > 0 {
			sum = append(sum, eqn.Op{Text: "+"})
		}
		sum = append(sum, eqn.Row{eqn.Sym{Name: s}, eqn.Op{Text: "·"}, eqn.Sym{Name: "gamma_w"}})
	}
	row := eqn.Row{eqn.Sym{Name: "x"}, eqn.Op{Text: "="}, sum, eqn.Op{Text: "="}, eqn.Num{Text: "12.5"}}
	lines, err := eqn.Break(row, 120, st)
	if err != nil {
		t.Fatal(err)
	}
	if len(lines) < 3 {
		t.Fatalf("got %d lines", len(lines))
	}
	for i, l := range lines {
		if l.W > 120 {
			t.Errorf("line %d width %.1f", i, l.W)
		}
	}
	one, _ := eqn.Break(row, 1000, st)
	if len(one) != 1 {
		t.Errorf("wide column: %d lines", len(one))
	}
}
