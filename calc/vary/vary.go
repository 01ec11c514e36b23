package vary

import (
	"errors"
	"fmt"
	"math"
	"sort"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// Func is a check's utilisation as a function of one parameter (SI).
type Func func(p float64) (float64, error)

// MaxRows bounds a table.
const MaxRows = 1001

// Options name the parameter and set the tolerance of the crossings.
type Options struct {
	Symbol string  // the parameter in sheet notation ("c_u", "phi'_p"); "" means "p"
	Unit   string  // its display unit ("kPa", "deg"; "" for a pure number)
	Tol    float64 // absolute tolerance on a crossing, SI; 0 means 1e-9·(hi − lo)
}

// Row is one line of the table.
type Row struct {
	P, Util float64
}

// Crossing is a value of the parameter at which the utilisation is 1.
type Crossing struct {
	P      float64
	Rising bool // the utilisation rises through 1 as p increases
	Iter   int  // Brent's evaluations (0 when a row fell on it)
}

// Result is the table and its crossings, in increasing p.
type Result struct {
	Rows      []Row
	Crossings []Crossing
	Trace     trace.Trace
}

// RowError is f's error at a row of the table (Row is its index) or, with
// Row −1, at a value Brent's method tried between two rows.
type RowError struct {
	Row int
	P   float64
	Err error
	at  string // "c_u = 20 kPa"
}

func (e *RowError) Error() string { return "vary: at " + e.at + ": " + e.Err.Error() }
func (e *RowError) Unwrap() error { return e.Err }

var srcBrent = trace.Brent1973

// Table evaluates f at n evenly spaced values from lo to hi and solves for
// every crossing of utilisation 1 between neighbouring rows.
func Table(f Func, lo, hi float64, n int, o Options) (*Result, error) {
	var errs site.Errors
	finite := func(name string, v float64) {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			errs = append(errs, &site.RangeError{Where: "vary", Param: name, Value: v, Min: math.Inf(-1), Max: math.Inf(1), Reason: "must be finite"})
		}
	}
	finite("from", lo)
	finite("to", hi)
	if len(errs) == 0 && !(hi > lo) {
		errs = append(errs, &site.InputError{Where: "vary", Param: "to", Msg: fmt.Sprintf("the range must increase: from %g to %g", lo, hi)})
	}
	if n < 2 || n > MaxRows {
		errs = append(errs, &site.RangeError{Where: "vary", Param: "steps", Value: float64(n), Min: 2, Max: MaxRows, Reason: "rows of the table"})
	}
	if err := errs.Err(); err != nil {
		return nil, err
	}
	ps := make([]float64, n)
	for i := range ps {
		ps[i] = lo + (hi-lo)*float64(i)/float64(n-1)
	}
	ps[n-1] = hi
	return Values(f, ps, o)
}

// Values evaluates f at each of ps, which must rise, and solves for every
// crossing of utilisation 1 between neighbouring values: a table of
// values chosen by the caller (a list of the values a parameter may take)
// in place of Table's even steps.
func Values(f Func, ps []float64, o Options) (*Result, error) {
	var errs site.Errors
	if len(ps) < 2 || len(ps) > MaxRows {
		errs = append(errs, &site.RangeError{Where: "vary", Param: "values", Value: float64(len(ps)), Min: 2, Max: MaxRows, Reason: "rows of the table"})
	}
	for i, p := range ps {
		if math.IsNaN(p) || math.IsInf(p, 0) {
			errs = append(errs, &site.RangeError{Where: "vary", Param: fmt.Sprintf("value %d", i+1), Value: p, Min: math.Inf(-1), Max: math.Inf(1), Reason: "must be finite"})
		} else if i > 0 && !(p > ps[i-1]) {
			errs = append(errs, &site.InputError{Where: "vary", Param: "values", Msg: fmt.Sprintf("the values must rise: %g after %g", p, ps[i-1])})
		}
	}
	if o.Tol < 0 || math.IsNaN(o.Tol) {
		errs = append(errs, &site.RangeError{Where: "vary", Param: "tolerance", Value: o.Tol, Min: 0, Max: math.Inf(1)})
	}
	if err := errs.Err(); err != nil {
		return nil, err
	}
	n := len(ps)
	sym := o.Symbol
	if sym == "" {
		sym = "p"
	}
	tol := o.Tol
	if tol == 0 {
		tol = 1e-9 * (ps[n-1] - ps[0])
	}
	row := -1
	eval := func(p float64) (float64, error) {
		at := func() string {
			if u, uerr := units.Parse(o.Unit); uerr == nil && o.Unit != "" {
				return sym + " = " + units.Format(p, u, -1) + " " + u.Name // in the unit it is read in
			}
			return fmt.Sprintf("%s = %g", sym, p)
		}
		u, err := f(p)
		if err != nil {
			return 0, &RowError{Row: row, P: p, Err: err, at: at()}
		}
		if math.IsNaN(u) || math.IsInf(u, 0) {
			return 0, &RowError{Row: row, P: p, Err: fmt.Errorf("the utilisation is %v", u), at: at()}
		}
		return u, nil
	}
	r := &Result{Rows: make([]Row, n)}
	for i, p := range ps {
		row = i
		u, err := eval(p)
		if err != nil {
			return nil, err
		}
		r.Rows[i] = Row{P: p, Util: u}
	}
	row = -1
	g := func(p float64) (float64, error) {
		u, err := eval(p)
		return u - 1, err
	}
	for i, x := range r.Rows {
		g0 := x.Util - 1
		if g0 == 0 {
			rising := i+1 < n && r.Rows[i+1].Util > 1 || i > 0 && r.Rows[i-1].Util < 1
			r.Crossings = append(r.Crossings, Crossing{P: x.P, Rising: rising})
			continue
		}
		if i+1 == n {
			break
		}
		g1 := r.Rows[i+1].Util - 1
		if g1 == 0 || (g0 > 0) == (g1 > 0) {
			continue
		}
		root, err := solve.Brent(g, x.P, r.Rows[i+1].P, solve.Options{Tol: tol})
		if err != nil {
			var re *RowError
			if errors.As(err, &re) {
				return nil, re
			}
			return nil, err
		}
		r.Crossings = append(r.Crossings, Crossing{P: root.X, Rising: g1 > g0, Iter: root.Iter})
	}
	ref := trace.Ref{Source: srcBrent, Clause: "ch. 4, procedure zero"}
	for _, c := range r.Crossings {
		dir := "falls"
		if c.Rising {
			dir = "rises"
		}
		note := fmt.Sprintf("value at which the utilisation %s through 1", dir)
		rf := trace.Ref{}
		if c.Iter > 0 {
			rf = ref
			note += fmt.Sprintf(", solved by Brent's method between rows of the table (%d evaluations)", c.Iter)
		} else {
			note += ", a row of the table"
		}
		r.Trace.Take(trace.Step{Symbol: sym, Kind: trace.Solved, Value: c.P, Unit: o.Unit, Ref: rf, Note: note})
	}
	return r, r.Trace.Err()
}

// Spread is the least and the greatest utilisation of the table's rows.
func (r *Result) Spread() (least, greatest float64) {
	least, greatest = math.Inf(1), math.Inf(-1)
	for _, x := range r.Rows {
		least, greatest = math.Min(least, x.Util), math.Max(greatest, x.Util)
	}
	return least, greatest
}

// Rank orders tables of several parameters, each varied on its own, by
// the spread of their utilisation (greatest less least over the rows),
// the widest first: the parameter whose doubt moves the verdict most
// heads the list (the order of a tornado diagram). Ties keep their
// order. It returns the indexes of rs in that order.
func Rank(rs []*Result) []int {
	idx := make([]int, len(rs))
	spread := make([]float64, len(rs))
	for i, r := range rs {
		idx[i] = i
		lo, hi := r.Spread()
		spread[i] = hi - lo
	}
	sort.SliceStable(idx, func(a, b int) bool { return spread[idx[a]] > spread[idx[b]] })
	return idx
}
