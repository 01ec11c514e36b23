package chart

import (
	"math"
	"sort"
)

// Lower returns the lower envelope of a and b — the governing one of two
// limits, such as bearing resistance and settlement-limited pressure
// against footing width — as a Band series named name, with the Regions of
// x where each governs, labelled "<name of a> governs" and "<name of b>
// governs". Where the curves cross between samples the crossing is
// interpolated linearly. Both series need X strictly increasing and ranges
// of X that overlap; otherwise Lower returns an *Error.
func Lower(name string, a, b Series) (Series, []Region, error) {
	for i, s := range []Series{a, b} {
		w := seriesName(i, s)
		if len(s.X) != len(s.Y) || len(s.X) < 2 {
			return Series{}, nil, &Error{Where: w, Param: "X, Y", Value: "", Want: "need two or more points, as many of each"}
		}
		for j := range s.X {
			if !finite(s.X[j]) || !finite(s.Y[j]) {
				return Series{}, nil, &Error{Where: w, Param: "point", Value: num(s.X[j]) + ", " + num(s.Y[j]), Want: "must be finite"}
			}
			if j > 0 && s.X[j] <= s.X[j-1] {
				return Series{}, nil, &Error{Where: w, Param: "X", Value: num(s.X[j]), Want: "must increase (after " + num(s.X[j-1]) + ")"}
			}
		}
	}
	lo := math.Max(a.X[0], b.X[0])
	hi := math.Min(a.X[len(a.X)-1], b.X[len(b.X)-1])
	if lo >= hi {
		return Series{}, nil, &Error{Where: "Lower", Param: "X ranges", Value: num(lo) + " to " + num(hi), Want: "must overlap"}
	}
	var xs []float64
	for _, s := range []Series{a, b} {
		for _, x := range s.X {
			if x >= lo && x <= hi {
				xs = append(xs, x)
			}
		}
	}
	xs = append(xs, lo, hi)
	sort.Float64s(xs)
	xs = dedupe(xs)
	env := Series{Name: name, Style: Band}
	var regs []Region
	side := 0 // +1 where a governs, −1 where b does
	start := lo
	zero, touched := 0.0, false
	mark := func(x float64, s int) {
		if s == side {
			return
		}
		if side != 0 {
			regs = append(regs, region(start, x, side, a, b))
		}
		side, start = s, x
	}
	sideAt := func(da float64) int {
		if da <= 0 {
			return 1
		}
		return -1
	}
	for i, x := range xs {
		ya, yb := interp(a, x), interp(b, x)
		if i > 0 {
			xp := xs[i-1]
			dp, d := interp(a, xp)-interp(b, xp), ya-yb
			if dp*d < 0 { // they cross between samples
				xc := xp + (x-xp)*dp/(dp-d)
				env.X = append(env.X, xc)
				env.Y = append(env.Y, interp(a, xc))
				mark(xc, sideAt(d))
			}
		}
		env.X = append(env.X, x)
		env.Y = append(env.Y, math.Min(ya, yb))
		switch s := sideAt(ya - yb); {
		case side == 0:
			mark(x, s)
		case ya == yb: // touching: a change of side starts here
			zero, touched = x, true
		case touched && s != side:
			mark(zero, s)
			touched = false
		default:
			mark(x, s)
			touched = false
		}
	}
	regs = append(regs, region(start, hi, side, a, b))
	return env, regs, nil
}

func region(from, to float64, side int, a, b Series) Region {
	n := a.Name
	if side < 0 {
		n = b.Name
	}
	if n != "" {
		n += " governs"
	}
	return Region{From: from, To: to, Label: n}
}

// interp is s linearly interpolated at x (inside its range).
func interp(s Series, x float64) float64 {
	i := sort.SearchFloat64s(s.X, x)
	if i < len(s.X) && s.X[i] == x {
		return s.Y[i]
	}
	if i == 0 || i == len(s.X) {
		return math.NaN()
	}
	t := (x - s.X[i-1]) / (s.X[i] - s.X[i-1])
	return s.Y[i-1] + t*(s.Y[i]-s.Y[i-1])
}

func dedupe(xs []float64) []float64 {
	out := xs[:0]
	for i, x := range xs {
		if i == 0 || x != xs[i-1] {
			out = append(out, x)
		}
	}
	return out
}
