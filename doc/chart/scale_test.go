package chart_test

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/chart"
)

func labels(s chart.Scale) string {
	var ls []string
	for _, t := range s.Major {
		l := t.Label
		if l == "" {
			l = "·"
		}
		ls = append(ls, l)
	}
	return strings.Join(ls, " ")
}

// Tick steps and labels. Rows are the conventions of the trade for chart
// axes (common practice): steps of 1, 2, 2.5 or 5 × 10ⁿ, automatic ends
// widened to a tick or a decade, labels with the step's decimals only.
// Ranges and labels are exact (tolerance 1e-12 on Min and Max).
func TestScale(t *testing.T) {
	for _, c := range []struct {
		name     string
		ax       chart.Axis
		lo, hi   float64
		n        int
		min, max float64
		labels   string
		minor    int
	}{
		{"0–237 in about six", chart.Axis{}, 0, 237, 6, 0, 250, "0 50 100 150 200 250", 0},
		{"0–237 in about ten", chart.Axis{}, 0, 237, 10, 0, 250, "0 25 50 75 100 125 150 175 200 225 250", 0},
		{"tenths print exactly", chart.Axis{}, 0, 1, 5, 0, 1, "0.0 0.2 0.4 0.6 0.8 1.0", 0},
		{"tenths from zero", chart.Axis{}, 0.1, 0.3, 3, 0, 0.3, "0.0 0.1 0.2 0.3", 0},
		{"far from zero: not from zero", chart.Axis{}, 183, 331, 4, 150, 350, "150 200 250 300 350", 0},
		{"near zero: from zero", chart.Axis{}, 10.6, 24.5, 5, 0, 25, "0 5 10 15 20 25", 0},
		{"negative near zero: to zero", chart.Axis{}, -24.5, -10.6, 5, -25, 0, "−25 −20 −15 −10 −5 0", 0},
		{"quarters", chart.Axis{}, 0, 0.7, 3, 0, 0.75, "0.00 0.25 0.50 0.75", 0},
		{"negative with minus sign", chart.Axis{}, -3.7, 12.2, 5, -5, 15, "−5 0 5 10 15", 0},
		{"2.5 step", chart.Axis{}, 0, 9, 4, 0, 10, "0.0 2.5 5.0 7.5 10.0", 0},
		{"fixed ends kept", chart.Axis{Min: chart.At(0), Max: chart.At(9)}, 1, 8.2, 9, 0, 9, "0 1 2 3 4 5 6 7 8 9", 0},
		{"fixed ends off the step", chart.Axis{Min: chart.At(0.3), Max: chart.At(9.6)}, 1, 8.2, 5, 0.3, 9.6, "2 4 6 8", 0},
		{"fixed Max, automatic Min", chart.Axis{Max: chart.At(10)}, 3, 8, 5, 0, 10, "0 2 4 6 8 10", 0},
		{"fixed Min, automatic Max", chart.Axis{Min: chart.At(0)}, 42, 237, 6, 0, 250, "0 50 100 150 200 250", 0},
		{"large values", chart.Axis{}, 1200, 48000, 5, 0, 50000, "0 10000 20000 30000 40000 50000", 0},
		{"small values", chart.Axis{}, 0.0012, 0.0047, 5, 0, 0.005, "0.000 0.001 0.002 0.003 0.004 0.005", 0},
		{"single value", chart.Axis{}, 5, 5, 5, 2, 8, "2 4 6 8", 0},
		{"all zero", chart.Axis{}, 0, 0, 4, -1, 1, "−1.0 −0.5 0.0 0.5 1.0", 0},
		{"single value, fixed Min", chart.Axis{Min: chart.At(0)}, 0, 0, 4, 0, 2, "0.0 0.5 1.0 1.5 2.0", 0},
		{"log 0.1–1000 days: decades", chart.Axis{Log: true}, 0.1, 1000, 8, 0.1, 1000, "0.1 1 10 100 1000", 32},
		{"log widened to decades", chart.Axis{Log: true}, 0.03, 70, 8, 0.01, 100, "0.01 0.1 1 10 100", 32},
		{"log within a decade: 1, 2, 5", chart.Axis{Log: true}, 2, 8, 8, 1, 10, "1 2 5 10", 6},
		{"log, fixed inside a decade", chart.Axis{Log: true, Min: chart.At(2), Max: chart.At(9)}, 3, 4, 8, 2, 9, "2 5", 6},
		{"log, crowded decades thinned", chart.Axis{Log: true}, 1e-6, 0.5, 3, 1e-6, 1, "10⁻⁶ · · 0.001 · · 1", 48},
		{"log single value", chart.Axis{Log: true}, 50, 50, 6, 1, 1000, "1 10 100 1000", 24},
		{"log big", chart.Axis{Log: true}, 2e5, 3e6, 6, 1e5, 1e7, "100000 10⁶ 10⁷", 16},
	} {
		s, err := c.ax.Scale(c.lo, c.hi, c.n)
		if err != nil {
			t.Errorf("%s: %v", c.name, err)
			continue
		}
		if math.Abs(s.Min-c.min) > 1e-12*math.Max(1, math.Abs(c.min)) || math.Abs(s.Max-c.max) > 1e-12*math.Max(1, math.Abs(c.max)) {
			t.Errorf("%s: range %v…%v, want %v…%v", c.name, s.Min, s.Max, c.min, c.max)
		}
		if got := labels(s); got != c.labels {
			t.Errorf("%s: labels %q, want %q", c.name, got, c.labels)
		}
		if len(s.Minor) != c.minor {
			t.Errorf("%s: %d minor ticks, want %d", c.name, len(s.Minor), c.minor)
		}
	}
}

func TestScaleErrors(t *testing.T) {
	for _, c := range []struct {
		name   string
		ax     chart.Axis
		lo, hi float64
		want   string
	}{
		{"zero on a log axis", chart.Axis{Log: true}, 0, 10, "data = 0 must be > 0 on a log axis"},
		{"negative Min on a log axis", chart.Axis{Log: true, Min: chart.At(-1)}, 1, 10, "Min = -1 must be > 0 on a log axis"},
		{"Min above Max", chart.Axis{Min: chart.At(5), Max: chart.At(2)}, 1, 10, "Min = 5 must be less than Max = 2"},
		{"Min equal to Max", chart.Axis{Min: chart.At(2), Max: chart.At(2)}, 1, 10, "Min = 2 must be less than Max = 2"},
		{"NaN data", chart.Axis{}, math.NaN(), 1, "data range = NaN to 1 must be finite"},
		{"infinite Max", chart.Axis{Max: chart.At(math.Inf(1))}, 0, 1, "Max = +Inf must be a finite number"},
	} {
		_, err := c.ax.Scale(c.lo, c.hi, 5)
		var e *chart.Error
		if !errors.As(err, &e) {
			t.Errorf("%s: got %v, want a *chart.Error", c.name, err)
			continue
		}
		if !strings.Contains(err.Error(), c.want) {
			t.Errorf("%s: %q does not say %q", c.name, err, c.want)
		}
	}
}

func TestTimeTicks(t *testing.T) {
	var got []string
	for _, k := range chart.TimeTicks(1, 1e5) {
		got = append(got, fmt.Sprintf("%g=%s", k.V, k.Label))
	}
	want := "1=1 d 10=10 d 100=100 d 365.25=1 yr 3652.5=10 yr 36525=100 yr"
	if g := strings.Join(got, " "); g != want {
		t.Errorf("TimeTicks(1, 1e5)\n got %s\nwant %s", g, want)
	}
}

func ExampleAxis_Scale() {
	s, _ := chart.Axis{}.Scale(0, 237, 6)
	fmt.Println(labels(s))
	s, _ = chart.Axis{Log: true}.Scale(0.1, 1000, 8)
	fmt.Println(labels(s), "with", len(s.Minor), "minor ticks")
	// Output:
	// 0 50 100 150 200 250
	// 0.1 1 10 100 1000 with 32 minor ticks
}
