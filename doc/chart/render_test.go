package chart_test

import (
	"flag"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/drawtest"

	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/source"
)

var demo = flag.String("demo", "", "write the demo charts as a PDF to this path (look at it)")

var demoFile = source.NewFile("demo.md", []byte(strings.Repeat("\n", 200)))

func at(line int) source.Span { return source.Span{File: demoFile, Start: demoFile.LineStart(line)} }

func cap(s string) []layout.Run { return []layout.Run{{Text: s}} }

// demoBlocks are the demo charts as layout blocks.
func demoBlocks(t testing.TB) []layout.Block {
	var bs []layout.Block
	for i, d := range []struct {
		c   chart.Chart
		cap string
	}{
		{stressDepth(), "Figure 1. Stress against depth, pad P1"},
		{settlementTime(), "Figure 2. Settlement against time"},
		{capacity(), "Figure 3. Allowable net pressure against footing width"},
		{many(), "Figure 4. Six series: dash patterns and markers"},
		{single(), "Figure 5. One point on a log axis"},
		{opposite(), "Figure 6. Axes on the far sides, x reversed"},
	} {
		items, err := d.c.Draw()
		if err != nil {
			t.Fatalf("%s: %v", d.cap, err)
		}
		bs = append(bs, &layout.Drawing{Pos: at(10 + i), W: d.c.W, H: d.c.H, Items: items, Caption: cap(d.cap)})
	}
	return bs
}

// TestDemoPDF lays the demo charts out on pages and writes them as a PDF;
// with -demo PATH it keeps the file for looking at.
func TestDemoPDF(t *testing.T) {
	doc := layout.Doc{
		Info: layout.Info{Title: "Chart demo", Fingerprint: "0123456789abcdef"},
		Sheets: []layout.Sheet{{Pos: at(1), Fields: layout.Fields{Project: "Larchfield Depot", Title: "Charts", Calc: "D-1", By: "XY"},
			Blocks: demoBlocks(t)}},
	}
	drawtest.DemoPDF(t, doc, *demo)
}
