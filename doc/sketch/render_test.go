package sketch_test

import (
	"bytes"
	"flag"
	"os"
	"strings"
	"testing"
	"time"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/pdf"
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
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	if err := pdf.Write(&b, pages, pdf.Options{Time: time.Date(2026, 1, 2, 3, 4, 5, 0, time.UTC)}); err != nil {
		t.Fatal(err)
	}
	if *demo != "" {
		if err := os.WriteFile(*demo, b.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
	}
}
