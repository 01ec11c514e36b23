// Package drawtest holds the test helpers the drawing packages (doc/chart,
// doc/sketch) share: the check that no two labels of a drawing overlap,
// and the demo PDF a drawing package writes of its own drawings.
package drawtest

import (
	"bytes"
	"os"
	"testing"
	"time"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/pdf"
)

// Overlaps reports every pair of texts among items whose boxes overlap,
// naming the drawing in each error.
func Overlaps(t testing.TB, name string, items []draw.Item) {
	t.Helper()
	var ts []draw.Text
	for _, it := range items {
		if x, ok := it.(draw.Text); ok {
			ts = append(ts, x)
		}
	}
	for i := range ts {
		for j := i + 1; j < len(ts); j++ {
			a, b := ts[i].Bounds(), ts[j].Bounds()
			if a.X < b.X+b.W && b.X < a.X+a.W && a.Y < b.Y+b.H && b.Y < a.Y+a.H {
				t.Errorf("%s: %q and %q overlap", name, ts[i].Text, ts[j].Text)
			}
		}
	}
}

// DemoPDF lays doc out and writes it as a PDF (fixed time, so the bytes
// are the same each run); with path not empty it keeps the file there for
// looking at.
func DemoPDF(t testing.TB, doc layout.Doc, path string) {
	t.Helper()
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	if err := pdf.Write(&b, pages, pdf.Options{Time: time.Date(2026, 1, 2, 3, 4, 5, 0, time.UTC)}); err != nil {
		t.Fatal(err)
	}
	if path != "" {
		if err := os.WriteFile(path, b.Bytes(), 0o644); err != nil {
			t.Fatal(err)
		}
	}
}
