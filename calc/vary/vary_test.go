package vary_test

import (
	"errors"
	"math"
	"slices"
	"sort"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/vary"
)

func table(t *testing.T, f vary.Func, lo, hi float64, n int, o vary.Options) *vary.Result {
	t.Helper()
	r, err := vary.Table(f, lo, hi, n, o)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(r.Trace, 1e-12); err != nil {
		t.Fatal(err)
	}
	return r
}

// Functions with known crossings (hand): p/2 = 1 at p = 2 (rising);
// (p − 3)² + 0.5 = 1 at p = 3 ± √0.5 (falling, then rising); 3/p = 1 at
// p = 3, which the 9-row table from 1 to 5 hits exactly (a row).
func TestCrossings(t *testing.T) {
	for _, c := range []struct {
		name   string
		f      vary.Func
		lo, hi float64
		n      int
		want   []float64
		rising []bool
	}{
		{"linear", func(p float64) (float64, error) { return p / 2, nil }, 0, 4, 5 + 2, []float64{2}, []bool{true}},
		{"parabola", func(p float64) (float64, error) { return (p-3)*(p-3) + 0.5, nil }, 0, 6, 7, []float64{3 - math.Sqrt(0.5), 3 + math.Sqrt(0.5)}, []bool{false, true}},
		{"on a row", func(p float64) (float64, error) { return 3 / p, nil }, 1, 5, 9, []float64{3}, []bool{false}},
		{"none", func(p float64) (float64, error) { return 0.5 + p/100, nil }, 0, 10, 11, nil, nil},
	} {
		r := table(t, c.f, c.lo, c.hi, c.n, vary.Options{Symbol: "x"})
		if len(r.Rows) != c.n || r.Rows[0].P != c.lo || r.Rows[c.n-1].P != c.hi {
			t.Errorf("%s: rows %v", c.name, r.Rows)
		}
		if len(r.Crossings) != len(c.want) || len(r.Trace.Steps) != len(c.want) {
			t.Errorf("%s: crossings %v, want %v", c.name, r.Crossings, c.want)
			continue
		}
		for i, x := range r.Crossings {
			if math.Abs(x.P-c.want[i]) > 1e-8 || x.Rising != c.rising[i] {
				t.Errorf("%s: crossing %v, want %v rising %v", c.name, x, c.want[i], c.rising[i])
			}
			if s := r.Trace.Steps[i]; s.Symbol != "x" || s.Kind != trace.Solved || s.Value != x.P {
				t.Errorf("%s: step %+v", c.name, s)
			}
		}
	}
}

// The helper on the platform engine: the utilisation of the invented
// clay site at a fixed D = 0.5 m against c_u from 20 to 60 kPa. By hand,
// case 1 passes when c_u N_c s_c + γ_p D² K_p tanδ s_p/W ≥ q_d:
// c_u = (240 − 20 × 0.25 × 5.5 × 1.2/0.6)/(5.1416 × 1.04) = 34.60 kPa;
// case 2: (240 − 20 × 0.25 × 5.5 × 1.3/0.6)/(5.1416 × 1.06) = 33.10 kPa.
// The governing utilisation falls through 1 at the larger, 34.60 kPa
// (tolerance 0.01 kPa).
func TestPlatformSensitivity(t *testing.T) {
	in := platform.Input{
		Platform: platform.Platform{Phi: 40 * math.Pi / 180, Gamma: 20e3},
		Subgrade: platform.Subgrade{Kind: platform.Cohesive, Cu: 30e3},
		Cases:    []platform.Case{{Kind: platform.Case1, Q: 150e3, W: 0.6, L: 3}, {Kind: platform.Case2, Q: 200e3, W: 0.6, L: 2}},
		D:        site.Some(0.5),
		Options:  platform.Options{EC7: platform.EC7{Off: true}},
	}
	f := func(cu float64) (float64, error) {
		in := in
		in.Subgrade.Cu = cu
		r, err := platform.Design(in)
		if err != nil {
			return 0, err
		}
		return r.Cases[r.Governing].Util, nil
	}
	r := table(t, f, 20e3, 60e3, 9, vary.Options{Symbol: "c_u", Unit: "kPa"})
	hand := (240e3 - 20e3*0.25*5.5*1.2/0.6) / ((math.Pi + 2) * 1.04)
	if len(r.Crossings) != 1 || math.Abs(r.Crossings[0].P-hand) > 10 || r.Crossings[0].Rising {
		t.Fatalf("crossings %v, hand %.2f kPa", r.Crossings, hand/1e3)
	}
	if math.Abs(hand-34.60e3) > 5 {
		t.Errorf("hand figure %.2f kPa", hand/1e3)
	}
}

// Errors: a bad range, too few or too many rows, an engine error (returned
// with the parameter value it came from) and a NaN utilisation.
func TestBadInput(t *testing.T) {
	ok := func(p float64) (float64, error) { return p, nil }
	boom := errors.New("boom")
	for _, c := range []struct {
		f      vary.Func
		lo, hi float64
		n      int
		want   string
	}{
		{ok, 1, 1, 5, "the range must increase"},
		{ok, math.NaN(), 1, 5, "from = NaN"},
		{ok, 0, math.Inf(1), 5, "to = +Inf"},
		{ok, 0, 1, 1, "steps = 1: must be at least 2"},
		{ok, 0, 1, 5000, "steps = 5000: must be at most 1001"},
		{func(p float64) (float64, error) { return 0, boom }, 0, 1, 3, "at p = 0: boom"},
		{func(p float64) (float64, error) { return math.NaN(), nil }, 0, 1, 3, "the utilisation is NaN"},
	} {
		r, err := vary.Table(c.f, c.lo, c.hi, c.n, vary.Options{})
		if err == nil || r != nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("want %q, got %v", c.want, err)
		}
	}
	_, err := vary.Table(func(p float64) (float64, error) { return 0, boom }, 0, 1, 3, vary.Options{})
	if !errors.Is(err, boom) {
		t.Error("the engine's error is not wrapped")
	}
}

func BenchmarkTable(b *testing.B) {
	f := func(p float64) (float64, error) { return (p-3)*(p-3) + 0.5, nil }
	b.ReportAllocs()
	for b.Loop() {
		if _, err := vary.Table(f, 0, 6, 21, vary.Options{}); err != nil {
			b.Fatal(err)
		}
	}
}

// Values: the table at the caller's values. The parabola (p − 3)² + 0.5
// at 0, 1, 2.5, 4, 6 (by hand: 9.5, 4.5, 0.75, 1.5, 9.5) crosses 1 at
// 3 ∓ √0.5 = 2.2929 (between 1 and 2.5, falling) and 3.7071 (between 2.5
// and 4, rising); each crossing lies between two rows of opposite verdict.
func TestValues(t *testing.T) {
	f := func(p float64) (float64, error) { return (p-3)*(p-3) + 0.5, nil }
	ps := []float64{0, 1, 2.5, 4, 6}
	r, err := vary.Values(f, ps, vary.Options{Symbol: "x"})
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(r.Trace, 1e-12); err != nil {
		t.Fatal(err)
	}
	for i, row := range r.Rows {
		if u, _ := f(ps[i]); row.P != ps[i] || row.Util != u {
			t.Errorf("row %d: %+v", i, row)
		}
	}
	want := []float64{3 - math.Sqrt(0.5), 3 + math.Sqrt(0.5)}
	if len(r.Crossings) != 2 {
		t.Fatalf("crossings %+v", r.Crossings)
	}
	for i, c := range r.Crossings {
		if math.Abs(c.P-want[i]) > 1e-8 || c.Rising != (i == 1) || c.Iter == 0 {
			t.Errorf("crossing %+v, want %v", c, want[i])
		}
		k := sort.Search(len(ps), func(j int) bool { return ps[j] > c.P })
		if k == 0 || k == len(ps) || (r.Rows[k-1].Util > 1) == (r.Rows[k].Util > 1) {
			t.Errorf("crossing %v not between rows of opposite verdict", c.P)
		}
	}
}

// Values refuses fewer than two values, values that do not rise and a
// non-finite one; f's error at a row is a *RowError naming the row.
func TestValuesBad(t *testing.T) {
	ok := func(p float64) (float64, error) { return p, nil }
	for _, c := range []struct {
		ps   []float64
		want string
	}{
		{[]float64{1}, "values = 1: must be at least 2"},
		{[]float64{1, 3, 2}, "the values must rise: 2 after 3"},
		{[]float64{1, 1}, "the values must rise: 1 after 1"},
		{[]float64{1, math.NaN()}, "value 2 = NaN"},
	} {
		if r, err := vary.Values(ok, c.ps, vary.Options{}); err == nil || r != nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%v: want %q, got %v", c.ps, c.want, err)
		}
	}
	boom := errors.New("boom")
	_, err := vary.Values(func(p float64) (float64, error) {
		if p > 2 {
			return 0, boom
		}
		return p, nil
	}, []float64{1, 2, 3}, vary.Options{Symbol: "c_u", Unit: "kPa"})
	var re *vary.RowError
	if !errors.As(err, &re) || re.Row != 2 || re.P != 3 || !errors.Is(err, boom) || err.Error() != "vary: at c_u = 0.003 kPa: boom" {
		t.Errorf("got %v (%+v)", err, re)
	}
}

// Rank: the widest spread of utilisation first (spreads 0.25, 0.5, 0.5,
// 0, exact in binary: the tie keeps its order).
func TestRank(t *testing.T) {
	mk := func(us ...float64) *vary.Result {
		r := &vary.Result{}
		for i, u := range us {
			r.Rows = append(r.Rows, vary.Row{P: float64(i), Util: u})
		}
		return r
	}
	rs := []*vary.Result{mk(0.875, 1.125), mk(1, 0.5, 0.75), mk(0.25, 0.75), mk(0.7, 0.7)}
	got := vary.Rank(rs)
	if want := []int{1, 2, 0, 3}; !slices.Equal(got, want) {
		t.Errorf("rank %v, want %v", got, want)
	}
	if lo, hi := rs[1].Spread(); lo != 0.5 || hi != 1 {
		t.Errorf("spread %v %v", lo, hi)
	}
}
