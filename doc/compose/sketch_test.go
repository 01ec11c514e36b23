package compose_test

import (
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sketch"
)

// TestExampleSketchesClear: in every footing sketch of every example no
// label overlaps another or sits on the ground, water or boundary line
// (sketch.Clash).
func TestExampleSketchesClear(t *testing.T) {
	n := 0
	for _, name := range examples(t) {
		doc, d := compose.Document(evaluate(t, filepath.Join("../../examples", name)), compose.Options{})
		if d.HasErrors() {
			t.Fatal(d)
		}
		for _, s := range doc.Sheets {
			for _, b := range s.Blocks {
				dr, ok := b.(*layout.Drawing)
				if !ok || len(dr.Caption) == 0 || !strings.HasPrefix(dr.Caption[0].Text, "Footing ") {
					continue
				}
				n++
				if c := sketch.Clash(dr.Items); c != "" {
					t.Errorf("%s: %s: %s", name, dr.Caption[0].Text, c)
				}
			}
		}
	}
	if n < 4 {
		t.Errorf("found %d footing sketches, want the example's four at least", n)
	}
}
