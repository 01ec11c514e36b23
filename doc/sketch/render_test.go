package sketch_test

import (
	"flag"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/drawtest"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sketch"
	"github.com/plinth-calc/plinth/doc/source"
)

var demo = flag.String("demo", "", "write the test sketches as a PDF to this path (look at it)")

// TestDemoPDF lays the test sketches out on pages through layout and pdf;
// with -demo PATH it keeps the file.
func TestDemoPDF(t *testing.T) {
	src := source.NewFile("demo.md", []byte(strings.Repeat("\n", len(cases)+1)))
	var blocks []layout.Block
	for i, c := range cases {
		items, err := sketch.Draw(c.f, c.w, c.h)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		blocks = append(blocks, &layout.Drawing{Pos: source.Span{File: src, Start: src.LineStart(i + 1)}, W: c.w, H: c.h,
			Items: items, Caption: []layout.Run{{Text: "Sketch: " + c.name}}})
	}
	doc := layout.Doc{Info: layout.Info{Title: "Footing sketches", Fingerprint: "0123456789abcdef"},
		Sheets: []layout.Sheet{{Pos: source.Span{File: src},
			Fields: layout.Fields{Project: "Larchfield Depot", Title: "Sketches", Calc: "D-2", By: "XY"}, Blocks: blocks}}}
	drawtest.DemoPDF(t, doc, *demo)
}
