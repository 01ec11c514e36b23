package vary

import (
	"fmt"
	"math"

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
	if o.Tol < 0 || math.IsNaN(o.Tol) {
		errs = append(errs, &site.RangeError{Where: "vary", Param: "tolerance", Value: o.Tol, Min: 0, Max: math.Inf(1)})
	}
	if err := errs.Err(); err != nil {
		return nil, err
	}
	sym := o.Symbol
	if sym == "" {
		sym = "p"
	}
	tol := o.Tol
	if tol == 0 {
		tol = 1e-9 * (hi - lo)
	}
	eval := func(p float64) (float64, error) {
		u, err := f(p)
		if err != nil {
			at := fmt.Sprintf("%g", p)
			if u, uerr := units.Parse(o.Unit); uerr == nil && o.Unit != "" {
				at = units.Format(p, u, -1) + " " + u.Name // in the unit it is read in
			}
			return 0, fmt.Errorf("vary: at %s = %s: %w", sym, at, err)
		}
		if math.IsNaN(u) || math.IsInf(u, 0) {
			return 0, fmt.Errorf("vary: at %s = %g: the utilisation is %v", sym, p, u)
		}
		return u, nil
	}
	r := &Result{Rows: make([]Row, n)}
	for i := range r.Rows {
		p := lo + (hi-lo)*float64(i)/float64(n-1)
		if i == n-1 {
			p = hi
		}
		u, err := eval(p)
		if err != nil {
			return nil, err
		}
		r.Rows[i] = Row{P: p, Util: u}
	}
	g := func(p float64) (float64, error) {
		u, err := eval(p)
		return u - 1, err
	}
	for i, row := range r.Rows {
		g0 := row.Util - 1
		if g0 == 0 {
			rising := i+1 < n && r.Rows[i+1].Util > 1 || i > 0 && r.Rows[i-1].Util < 1
			r.Crossings = append(r.Crossings, Crossing{P: row.P, Rising: rising})
			continue
		}
		if i+1 == n {
			break
		}
		g1 := r.Rows[i+1].Util - 1
		if g1 == 0 || (g0 > 0) == (g1 > 0) {
			continue
		}
		root, err := solve.Brent(g, row.P, r.Rows[i+1].P, solve.Options{Tol: tol})
		if err != nil {
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
