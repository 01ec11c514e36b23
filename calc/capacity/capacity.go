package capacity

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Input is one capacity table.
type Input struct {
	Bearing bearing.Input // footing, ground and bearing options; Approach must be FS(x)
	Settle  settle.Input  // settlement options (Ground and Footing are taken from Bearing)
	Widths  []float64     // m, each (0, 100], at most 50
	Limit   float64       // settlement limit, m, (0, 1]
}

// Row is the table row of one width. Pressures are gross, Pa.
type Row struct {
	B, L     float64 // width and length (L = 0 for a strip)
	QBearing float64 // bearing-limited allowable pressure q_a,b
	QSettle  float64 // pressure giving the settlement limit q_a,s
	QAllow   float64 // the lower of the two
	Governs  string  // "bearing" or "settlement"
	Drainage string  // the drainage condition governing bearing
	Iter     int     // Brent iterations of the settlement solve
	Own      bool    // the footing's own width
}

// Result is the capacity table.
type Result struct {
	Approach string
	Limit    float64
	Rows     []Row // the widths asked for, in order, then the footing's own width if not among them
	Own      int   // index of the footing's own width in Rows
	// Crossings are the widths, in increasing order, between two rows
	// where the governing limit changes (rows taken in order of width):
	// there q_a_b = q_a_s.
	Crossings []Crossing
	Trace     trace.Trace
	Values    []trace.Value // q_allow, q_a_b, q_a_s at the footing's own width
}

// fAllow is the allowable pressure of a row: the lower of the two.
var fAllow = trace.Fn("min", trace.S("q_a_b"), trace.S("q_a_s"))

// Crossing is a width where the bearing- and settlement-limited
// pressures are equal, found by Brent's method (Brent 1973, ch. 4) on
// q_a_b(B) − q_a_s(B) = 0 between the two rows that bracket it, to
// CrossTol.
type Crossing struct {
	B       float64 // width, m
	Q       float64 // the pressure there, Pa (q_a_b = q_a_s to the tolerance)
	Below   string  // the limit governing at narrower widths: "bearing" or "settlement"
	Above   string  // at wider widths
	Iter    int     // Brent iterations
	QB, QS  float64 // q_a_b and q_a_s at B
	Between [2]int  // the indices in Rows of the rows bracketing it
}

// CrossTol is the tolerance on a crossing width, m.
const CrossTol = 1e-4

var refMin = trace.Ref{Source: Source, Clause: "allowable pressure = lower of bearing and settlement"}

// Source names the practice the table follows.
var Source = trace.Source{Key: "Tomlinson2001", Citation: "Tomlinson, M. J. (2001). Foundation Design and Construction, 7th ed. Prentice Hall, Harlow (allowable bearing pressure as the lower of the pressures limited by shear failure and by settlement; edition from memory)."}

// Assumes is the load every row of the table assumes: the bearing-limited
// pressures are for a vertical load at the centre of the base (no
// inclination or eccentricity factors, the full area).
const Assumes = "vertical, central load"

// loadCaution warns when the footing's own characteristic actions are
// inclined or eccentric, which the table does not allow for: its
// pressures are then higher than the footing can carry, and the bearing
// block's check of the footing (which applies the inclination factors and
// the effective area) governs. The ratios are of the characteristic
// resultant, Σ over the actions (common practice).
func loadCaution(t *trace.Trace, in bearing.Input) {
	sum := site.Sum(in.Actions)
	V, HB, HL, MB, ML := sum.V, sum.HB, sum.HL, sum.MB, sum.ML
	H := math.Hypot(HB, HL)
	if H == 0 && MB == 0 && ML == 0 {
		return
	}
	f := in.Footing
	var parts []string
	vals := []trace.Value{}
	if V > 0 && H > 0 {
		parts = append(parts, fmt.Sprintf("inclined (H/V = %.3f)", H/V))
		vals = append(vals, trace.Value{Symbol: "H/V", V: H / V})
	}
	if V > 0 && (MB != 0 || ML != 0) {
		e := fmt.Sprintf("e_B/B = %.3f", math.Abs(MB)/V/f.B)
		vals = append(vals, trace.Value{Symbol: "e_B/B", V: math.Abs(MB) / V / f.B})
		if f.Shape != site.Strip && ML != 0 && f.L > 0 {
			e += fmt.Sprintf(", e_L/L = %.3f", math.Abs(ML)/V/f.L)
		}
		parts = append(parts, "eccentric ("+e+")")
	}
	if len(parts) == 0 {
		parts = append(parts, "not a downward central load")
	}
	t.Warn(trace.Caution{Code: "capacity-load", Severity: trace.SevCaution, Step: -1, Values: vals,
		Message: "The allowable pressures assume a " + Assumes + "; the footing's own characteristic actions are " + strings.Join(parts, " and ") +
			", so the footing cannot use the pressures tabulated: its bearing block, which applies the inclination factors and the effective area, governs."})
}

// Table computes the allowable pressure for every width.
func Table(in Input) (*Result, error) {
	ap := in.Bearing.Options.Approach
	if !ap.Allowable() {
		return nil, &site.InputError{Param: "approach", Msg: fmt.Sprintf("a capacity table compares service pressures: use an allowable-stress approach FS(x), not %s", ap.Name)}
	}
	if len(in.Widths) == 0 || len(in.Widths) > 50 {
		return nil, &site.InputError{Param: "widths", Msg: fmt.Sprintf("give 1 to 50 widths, not %d", len(in.Widths))}
	}
	for _, b := range in.Widths {
		if !(b >= site.MinWidth) || b > 100 {
			return nil, &site.RangeError{Param: "widths", Value: b, Min: site.MinWidth, Max: 100, Unit: "m"}
		}
	}
	if !(in.Limit > 0) || in.Limit > 1 {
		return nil, &site.RangeError{Param: "limit", Value: in.Limit * 1e3, Min: 0, Max: 1000, Unit: "mm", OpenMin: true}
	}
	r := &Result{Approach: ap.Name, Limit: in.Limit, Own: -1}
	f := in.Bearing.Footing
	widths := append([]float64(nil), in.Widths...)
	for i, b := range widths {
		if b == f.B {
			r.Own = i
		}
	}
	if r.Own < 0 {
		widths = append(widths, f.B)
		r.Own = len(widths) - 1
	}
	r.Trace.Take(trace.Step{Symbol: "s_lim", Kind: trace.Given, Value: in.Limit, Unit: "mm", Note: "settlement limit"})
	for i, b := range widths {
		cp, al, err := pressures(in, b)
		if err != nil {
			return nil, err
		}
		row := Row{B: b, L: cp.L, QBearing: cp.QRd, QSettle: al.Q, Drainage: cp.Drainage.String(), Iter: al.Iter, Own: i == r.Own}
		row.Governs = "bearing"
		if row.QSettle < row.QBearing {
			row.Governs = "settlement"
		}
		cas := fmt.Sprintf("B = %.3g m", b)
		if al.Result != nil && len(al.Result.Unverified) > 0 {
			r.Trace.Warn(trace.Caution{Code: "not-verified", Severity: trace.SevWarning, Step: -1, Case: cas,
				Message: cas + ": the settlement-limited pressure is not verified: " + strings.Join(al.Result.Unverified, "; ") + "; q_a_s leaves that layer out, so the allowable pressure may be unsafe."})
		}
		// q_a_b is the bearing check's result at this width (its working is
		// the bearing block's), q_a_s the root of s(q) = s_lim
		qb := r.Trace.Take(trace.Step{Symbol: "q_a_b", Kind: trace.Given, Value: row.QBearing, Unit: "kPa", Case: cas,
			Note: fmt.Sprintf("bearing-limited allowable pressure (%s, %s governs)", ap.Name, row.Drainage)})
		qs := r.Trace.Take(trace.Step{Symbol: "q_a_s", Kind: trace.Solved, Value: row.QSettle, Unit: "kPa", Case: cas,
			Note: fmt.Sprintf("pressure giving s = s_lim (Brent, %d iterations, tolerance %.2g Pa)", al.Iter, al.Tol)})
		row.QAllow = r.Trace.Eval(trace.Step{Symbol: "q_allow", Formula: fAllow,
			Inputs: []trace.Value{{Symbol: "q_a_b", V: qb, Unit: "kPa"}, {Symbol: "q_a_s", V: qs, Unit: "kPa"}},
			Unit:   "kPa", Case: cas, Ref: refMin, Note: row.Governs + " governs"})
		if err := r.Trace.Err(); err != nil {
			return nil, fmt.Errorf("capacity: no finite allowable pressure at B = %g m: %w", b, err)
		}
		for _, s := range cp.Trace.Sources {
			r.Trace.Cite(s)
		}
		for _, s := range al.Trace.Sources {
			r.Trace.Cite(s)
		}
		r.Rows = append(r.Rows, row)
	}
	loadCaution(&r.Trace, in.Bearing)
	if err := r.crossings(in); err != nil {
		return nil, err
	}
	own := r.Rows[r.Own]
	r.Values = []trace.Value{
		{Symbol: "q_allow", V: own.QAllow, Unit: "kPa"},
		{Symbol: "q_a_b", V: own.QBearing, Unit: "kPa"},
		{Symbol: "q_a_s", V: own.QSettle, Unit: "kPa"},
	}
	return r, nil
}

// pressures computes the bearing-limited and the settlement-limited
// pressure at width b (a rectangle keeps its L/B).
func pressures(in Input, b float64) (*bearing.Capacity, *settle.Allow, error) {
	f := in.Bearing.Footing
	cp, err := bearing.CapacityAt(in.Bearing, b)
	if err != nil {
		return nil, nil, err
	}
	sin := in.Settle
	sin.Ground = in.Bearing.Ground
	sin.Footing = f
	if f.Shape == site.Rectangle && f.B > 0 {
		sin.Footing.L = f.L / f.B * b
	}
	sin.Footing.B = b
	al, err := settle.Allowable(sin, in.Limit)
	if err != nil {
		return nil, nil, err
	}
	return cp, al, nil
}

// crossings finds the widths where the governing limit changes between
// rows next to each other in width.
func (r *Result) crossings(in Input) error {
	idx := make([]int, len(r.Rows))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(a, b int) bool { return r.Rows[idx[a]].B < r.Rows[idx[b]].B })
	for k := 1; k < len(idx); k++ {
		lo, hi := r.Rows[idx[k-1]], r.Rows[idx[k]]
		if lo.B == hi.B || lo.Governs == hi.Governs {
			continue
		}
		c := Crossing{Below: lo.Governs, Above: hi.Governs, Between: [2]int{idx[k-1], idx[k]}}
		diff := func(b float64) (float64, error) {
			cp, al, err := pressures(in, b)
			if err != nil {
				return 0, err
			}
			c.QB, c.QS = cp.QRd, al.Q
			return cp.QRd - al.Q, nil
		}
		root, err := solve.Brent(diff, lo.B, hi.B, solve.Options{Tol: CrossTol})
		if err != nil {
			return fmt.Errorf("capacity: the crossing of bearing and settlement between B = %g m and %g m: %w", lo.B, hi.B, err)
		}
		if _, err := diff(root.X); err != nil { // the pressures at the root itself
			return err
		}
		c.B, c.Iter = root.X, root.Iter
		c.Q, err = trace.Eval(fAllow, []trace.Value{{Symbol: "q_a_b", V: c.QB}, {Symbol: "q_a_s", V: c.QS}})
		if err != nil || math.IsNaN(c.Q) || math.IsInf(c.Q, 0) {
			return fmt.Errorf("capacity: no finite pressure at the crossing B = %g m (%v)", c.B, err)
		}
		r.Crossings = append(r.Crossings, c)
	}
	return nil
}
