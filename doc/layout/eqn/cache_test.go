package eqn_test

import (
	"errors"
	"reflect"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// TestTexts: formulas set with a store of texts give the same boxes and
// items as without, however often the store is reused, and a text with a
// glyph the font lacks is an error every time it is set.
func TestTexts(t *testing.T) {
	f := eqn.Row{eqn.Sym{Name: "q_Ed"}, eqn.Op{Text: "="}, eqn.Frac{Num: eqn.Sym{Name: "V_d"}, Den: eqn.Sym{Name: "A'"}},
		eqn.Op{Text: "="}, eqn.Quantity("1 883", "kN"), eqn.Op{Text: "/"}, eqn.Sym{Name: "A'"}}
	plain := eqn.Style{Size: 9.5}
	store := eqn.Style{Size: 9.5, Texts: eqn.NewTexts()}
	want, err := eqn.Layout(f, plain)
	if err != nil {
		t.Fatal(err)
	}
	for i := 0; i < 3; i++ {
		got, err := eqn.Layout(f, store)
		if err != nil {
			t.Fatal(err)
		}
		if got.W != want.W || got.Ascent != want.Ascent || got.Descent != want.Descent || !reflect.DeepEqual(got.Items(), want.Items()) {
			t.Fatalf("set %d with the store differs", i+1)
		}
		lines, err := eqn.Break(f, 60, store)
		if err != nil {
			t.Fatal(err)
		}
		plainLines, _ := eqn.Break(f, 60, plain)
		var a, b []draw.Item
		for j := range lines {
			a, b = lines[j].AppendItems(a, 0, float64(j)), plainLines[j].AppendItems(b, 0, float64(j))
		}
		if !reflect.DeepEqual(a, b) {
			t.Fatalf("broken %d with the store differs", i+1)
		}
	}
	bad := eqn.Row{eqn.Text{Text: "x\u2603"}, eqn.Sym{Name: "y"}}
	for i := 0; i < 2; i++ {
		var ge *eqn.GlyphError
		if _, err := eqn.Layout(bad, store); !errors.As(err, &ge) {
			t.Fatalf("set %d: %v, want a glyph error", i+1, err)
		}
	}
}
