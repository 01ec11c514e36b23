package chart_test

import (
	"errors"
	"flag"
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/drawtest"
	"github.com/plinth-calc/plinth/internal/golden"

	"github.com/plinth-calc/plinth/doc/chart"
	"github.com/plinth-calc/plinth/doc/layout/draw"
)

var update = flag.Bool("update", false, "rewrite golden files")

var demos = []struct {
	name string
	c    func() chart.Chart
}{
	{"stress-depth", stressDepth}, {"settlement-time", settlementTime}, {"capacity", capacity},
	{"many", many}, {"single", single}, {"opposite", opposite},
}

// TestGolden draws the demo charts and compares text dumps of the items.
func TestGolden(t *testing.T) {
	for _, d := range demos {
		c := d.c()
		items, err := c.Draw()
		if err != nil {
			t.Fatalf("%s: %v", d.name, err)
		}
		golden.Compare(t, filepath.Join("testdata", d.name+".golden"), []byte(draw.Dump(items)), *update)
	}
}

// TestInside checks every item of every demo lies within W × H, with no
// NaN anywhere, and that drawing twice gives the same items.
func TestInside(t *testing.T) {
	for _, d := range demos {
		c := d.c()
		items, _ := c.Draw()
		again, _ := c.Draw()
		if draw.Dump(items) != draw.Dump(again) {
			t.Errorf("%s: two draws differ", d.name)
		}
		for _, it := range items {
			r := it.Bounds()
			for _, v := range []float64{r.X, r.Y, r.W, r.H} {
				if math.IsNaN(v) || math.IsInf(v, 0) {
					t.Fatalf("%s: %#v has a non-finite coordinate", d.name, it)
				}
			}
			if r.X < -1e-9 || r.Y < -1e-9 || r.X+r.W > c.W+1e-9 || r.Y+r.H > c.H+1e-9 {
				t.Errorf("%s: %T at %.2f,%.2f %.2f×%.2f leaves the %g × %g chart", d.name, it, r.X, r.Y, r.W, r.H, c.W, c.H)
			}
		}
	}
}

// TestTextsApart checks no two texts of a demo chart overlap.
func TestTextsApart(t *testing.T) {
	for _, d := range demos {
		c := d.c()
		items, _ := c.Draw()
		drawtest.Overlaps(t, d.name, items)
	}
}

func TestErrors(t *testing.T) {
	pts := []float64{1, 2}
	ok := chart.Series{X: pts, Y: pts}
	for _, c := range []struct {
		name string
		c    chart.Chart
		want string
	}{
		{"no size", chart.Chart{Series: []chart.Series{ok}}, "W × H = 0 × 0 must be positive"},
		{"no data", chart.Chart{W: 300, H: 200}, "X axis: data is empty"},
		{"lengths differ", chart.Chart{W: 300, H: 200, Series: []chart.Series{{X: pts, Y: []float64{1}}}}, "series 1: len(X), len(Y) = 2, 1 must be equal"},
		{"no points", chart.Chart{W: 300, H: 200, Series: []chart.Series{{Name: "s"}}}, `series 1 "s": X, Y has no points`},
		{"NaN", chart.Chart{W: 300, H: 200, Series: []chart.Series{{X: pts, Y: []float64{1, math.NaN()}}}}, "Y[1] = NaN must be a finite number"},
		{"zero on a log axis", chart.Chart{W: 300, H: 200, X: chart.Axis{Log: true}, Series: []chart.Series{{X: []float64{0, 1}, Y: pts}}}, "X[0] = 0 must be > 0 on a log axis"},
		{"negative on a log axis", chart.Chart{W: 300, H: 200, Y: chart.Axis{Log: true}, Series: []chart.Series{{X: pts, Y: []float64{3, -1}}}}, "Y[1] = -1 must be > 0 on a log axis"},
		{"log reference line at zero", chart.Chart{W: 300, H: 200, Y: chart.Axis{Log: true}, Series: []chart.Series{ok}, Guides: []chart.Guide{{OnY: true, Value: 0}}}, `guide 1 "": Value = 0 must be > 0`},
		{"Min above Max", chart.Chart{W: 300, H: 200, Y: chart.Axis{Min: chart.At(3), Max: chart.At(1)}, Series: []chart.Series{ok}}, "Y axis: Min = 3 must be less than Max = 1"},
		{"region backwards", chart.Chart{W: 300, H: 200, Series: []chart.Series{ok}, Regions: []chart.Region{{From: 2, To: 1}}}, "From = 2 must be less than To = 1"},
		{"too small", chart.Chart{W: 60, H: 200, Series: []chart.Series{ok}}, "too small for its labels"},
		{"missing glyph", chart.Chart{W: 300, H: 200, Title: "a 漢 b", Series: []chart.Series{ok}}, "which the fonts lack"},
		{"label too long", chart.Chart{W: 120, H: 100, X: chart.Axis{Title: strings.Repeat("long ", 10)}, Series: []chart.Series{ok}}, "is 1"},
		{"bad style", chart.Chart{W: 300, H: 200, Series: []chart.Series{{X: pts, Y: pts, Style: 9}}}, "must be one of the package's constants"},
	} {
		items, err := c.c.Draw()
		var e *chart.Error
		if !errors.As(err, &e) {
			t.Errorf("%s: got %v (%d items), want a *chart.Error", c.name, err, len(items))
			continue
		}
		if !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %q does not say %q", c.name, err, c.want)
		}
	}
}

// TestDegenerate draws charts with little in them: each must draw.
func TestDegenerate(t *testing.T) {
	for _, c := range []chart.Chart{
		{W: 200, H: 140, Series: []chart.Series{{X: []float64{2}, Y: []float64{3}}}},
		{W: 200, H: 140, Series: []chart.Series{{X: []float64{1, 2, 3}, Y: []float64{4, 4, 4}}}},
		{W: 200, H: 140, Series: []chart.Series{{X: []float64{0, 0}, Y: []float64{0, 0}}}},
		{W: 200, H: 140, X: chart.Axis{Log: true}, Y: chart.Axis{Log: true}, Series: []chart.Series{{X: []float64{7, 7}, Y: []float64{1e-9, 1e-9}}}},
		{W: 200, H: 140, X: chart.Axis{Min: chart.At(0), Max: chart.At(1)}, Y: chart.Axis{Min: chart.At(0), Max: chart.At(1)}},
		{W: 200, H: 140, Y: chart.Axis{Min: chart.At(0), Max: chart.At(1)}, Series: []chart.Series{{X: []float64{0, 1, 2}, Y: []float64{-5, 0.5, 9}}}},
	} {
		items, err := c.Draw()
		if err != nil {
			t.Errorf("%+v: %v", c.Series, err)
			continue
		}
		for _, it := range items {
			r := it.Bounds()
			if math.IsNaN(r.X+r.Y+r.W+r.H) || r.Y < 0 || r.Y+r.H > c.H+1e-9 {
				t.Errorf("%+v: item %#v", c.Series, it)
			}
		}
	}
}

// TestLegendClear checks the inside legend covers no curve.
func TestLegendClear(t *testing.T) {
	c := capacity()
	items, _ := c.Draw()
	var legend *draw.Rect
	for _, it := range items {
		if r, ok := it.(draw.Rect); ok && r.Filled {
			legend = &r
		}
	}
	if legend == nil {
		t.Fatal("no legend box")
	}
	for _, it := range items {
		p, ok := it.(draw.Poly)
		if !ok || p.Closed {
			continue
		}
		for _, q := range p.Points {
			if q.X > legend.X && q.X < legend.X+legend.W && q.Y > legend.Y && q.Y < legend.Y+legend.H {
				// the legend's own line samples are inside it
				if q.Y > legend.Y+2 && q.X < legend.X+30 {
					continue
				}
				t.Errorf("curve point %v under the legend %+v", q, legend.Bounds())
			}
		}
	}
}

func BenchmarkDraw(b *testing.B) {
	c := stressDepth()
	for b.Loop() {
		if _, err := c.Draw(); err != nil {
			b.Fatal(err)
		}
	}
}
