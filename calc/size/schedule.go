package size

import (
	"fmt"
	"math"
	"reflect"
	"runtime"
	"sync"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Row is one footing of a schedule: its name, its plan position and its
// characteristic actions; D and the ground model may override the
// schedule's.
type Row struct {
	Name    string
	X, Y    float64 // centre, m, on the plan
	D       site.Opt
	Ground  *site.Ground
	Actions []site.Action
}

// ScheduleInput sizes every row with one set of options.
type ScheduleInput struct {
	Base Input // ground, footing shape and D, options, plan rule, increment or sizes; its actions are not used
	Rows []Row
	// BetaLimit is the limiting angular distortion between neighbours,
	// (0, 0.1]; 0 means settle's default 1/500 (Bjerrum 1963; EN 1997-1
	// Annex H). Only with a settlement check.
	BetaLimit float64
}

// RowError is an error in one row of a schedule (Row is 0-based).
type RowError struct {
	Row   int
	Param string
	Err   error
}

func (e *RowError) Error() string { return fmt.Sprintf("row %d: %v", e.Row+1, e.Err) }
func (e *RowError) Unwrap() error { return e.Err }

// Pair is the differential settlement between two neighbouring footings.
type Pair struct {
	A, B    int     // row indices
	Spacing float64 // centre to centre, m
	Diff    *settle.Diff
}

// Schedule is every row sized, and the neighbours compared.
type Schedule struct {
	Rows    []*Result
	Pairs   []Pair
	UtilMax float64     // the highest governing utilisation of any row
	BetaMax float64     // the largest angular distortion between neighbours (0 without settlement)
	RowMax  int         // the row of UtilMax
	// Like is, for each row, the first earlier row with the same depth,
	// ground and actions (so the same sizing, under its own name), or −1.
	Like []int
	PairMax int         // the pair of BetaMax (−1 when none)
	Trace   trace.Trace // the schedule's own cautions and sources
}

var (
	// SrcGabriel is the neighbour rule's source.
	SrcGabriel = trace.Source{Key: "GabrielSokal1969", Citation: "Gabriel, K. R. & Sokal, R. R. (1969). A new statistical approach to geographic variation analysis. Systematic Zoology 18(3), 259–278 (the Gabriel graph of neighbouring points)."}
	refGabriel = trace.Ref{Source: SrcGabriel, Clause: "neighbours"}
)

// MaxRows bounds a schedule.
const MaxRows = 500

// SizeSchedule sizes every row (in parallel: rows are independent) and
// checks the angular distortion between neighbours. Neighbours are the
// pairs of the Gabriel graph of the centres: A and B are neighbours when
// no other footing lies inside the circle whose diameter is AB (Gabriel &
// Sokal 1969, Syst. Zool. 18(3): a standard definition of neighbouring
// points; on a regular column grid it links each column to the next along
// each grid line, not across the diagonals). Each footing's settlement is its own: the stress from
// its neighbours is not added (the schedule's caution says so).
func SizeSchedule(in ScheduleInput) (*Schedule, error) {
	var errs site.Errors
	if len(in.Rows) == 0 {
		return nil, &site.InputError{Where: "schedule", Param: "rows", Msg: "a schedule needs at least one footing"}
	}
	if len(in.Rows) > MaxRows {
		return nil, &site.InputError{Where: "schedule", Param: "rows", Msg: fmt.Sprintf("%d footings: at most %d", len(in.Rows), MaxRows)}
	}
	names := map[string]int{}
	at := map[[2]float64]int{}
	for i, r := range in.Rows {
		if j, dup := names[r.Name]; dup {
			errs = append(errs, &RowError{Row: i, Param: "name", Err: fmt.Errorf("%s is also the name of row %d", r.Name, j+1)})
		}
		names[r.Name] = i
		p := [2]float64{r.X, r.Y}
		if j, dup := at[p]; dup {
			errs = append(errs, &RowError{Row: i, Param: "x", Err: fmt.Errorf("%s is at the same position as %s (row %d)", r.Name, in.Rows[j].Name, j+1)})
		}
		at[p] = i
		perm := false
		for _, a := range r.Actions {
			perm = perm || (a.Kind == site.Permanent && a.V != 0)
		}
		if !perm {
			errs = append(errs, &RowError{Row: i, Param: "G", Err: fmt.Errorf("%s has no permanent vertical action", r.Name)})
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}
	out := &Schedule{Rows: make([]*Result, len(in.Rows)), PairMax: -1}
	rowErrs := make([]error, len(in.Rows))
	var wg sync.WaitGroup
	next := make(chan int)
	for w := 0; w < runtime.GOMAXPROCS(0); w++ {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for i := range next {
				out.Rows[i], rowErrs[i] = sizeRow(in.Base, in.Rows[i])
			}
		}()
	}
	for i := range in.Rows {
		next <- i
	}
	close(next)
	wg.Wait()
	for i, err := range rowErrs {
		if err != nil {
			errs = append(errs, &RowError{Row: i, Err: err})
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}
	for i, r := range out.Rows {
		if u := r.At.Util(); u > out.UtilMax {
			out.UtilMax, out.RowMax = u, i
		}
	}
	out.Like = likeRows(in.Rows)
	if in.Base.Settle == nil {
		return out, nil
	}
	out.Trace.WarnAll(trace.Caution{Code: "schedule-alone", Severity: trace.SevCaution, Ref: refGabriel,
		Message: "each footing's settlement is computed for that footing alone: the stress from its neighbours is not added, so where footings are closer than about three widths apart, centre to centre, their stress bulbs overlap and the settlements and distortions are underestimated (common practice); neighbours are the pairs no third footing lies between (the Gabriel graph of the centres)."})
	for _, p := range gabriel(in.Rows) {
		a, b := in.Rows[p[0]], in.Rows[p[1]]
		d := math.Hypot(a.X-b.X, a.Y-b.Y)
		lim := site.Opt{}
		if in.BetaLimit > 0 {
			lim = site.Some(in.BetaLimit)
		}
		df, err := settle.Differential(settle.DiffInput{A: a.Name, B: b.Name, SA: out.Rows[p[0]].Settle.Total, SB: out.Rows[p[1]].Settle.Total, Spacing: d, Limit: lim})
		if err != nil {
			return nil, err
		}
		out.Pairs = append(out.Pairs, Pair{A: p[0], B: p[1], Spacing: d, Diff: df})
		if df.Beta > out.BetaMax || out.PairMax < 0 {
			out.BetaMax, out.PairMax = df.Beta, len(out.Pairs)-1
		}
	}
	return out, nil
}

// likeRows returns, for each row, the first earlier row whose depth,
// ground and actions are those of the row (a row that is itself like
// another is not a model), or −1.
func likeRows(rows []Row) []int {
	like := make([]int, len(rows))
	for i, a := range rows {
		like[i] = -1
		for j := range i {
			b := rows[j]
			if like[j] < 0 && a.D == b.D && (a.Ground == b.Ground || a.Ground != nil && b.Ground != nil && reflect.DeepEqual(*a.Ground, *b.Ground)) && reflect.DeepEqual(a.Actions, b.Actions) {
				like[i] = j
				break
			}
		}
	}
	return like
}

func sizeRow(base Input, r Row) (*Result, error) {
	in := base
	in.Bearing.Footing.Name = r.Name
	if r.D.Set {
		in.Bearing.Footing.D = r.D.V
	}
	if r.Ground != nil {
		in.Bearing.Ground = *r.Ground
	}
	in.Bearing.Actions = r.Actions
	if base.SelfWeight != nil {
		sw := *base.SelfWeight
		sw.Ground = in.Bearing.Ground
		in.SelfWeight = &sw
	}
	if base.Settle != nil {
		s := *base.Settle
		in.Settle = &s
	}
	return Size(in)
}

// gabriel returns the neighbour pairs (i < j), in order: i and j are
// neighbours when no third centre k lies inside or on the circle on the
// diameter ij, that is when |ik|² + |jk|² > |ij|² for every k (the closed
// disc, so the diagonals of a square grid cell, whose other corners lie on
// the circle, are not neighbours).
func gabriel(rows []Row) [][2]int {
	var out [][2]int
	d2 := func(a, b Row) float64 { return (a.X-b.X)*(a.X-b.X) + (a.Y-b.Y)*(a.Y-b.Y) }
	for i := range rows {
		for j := i + 1; j < len(rows); j++ {
			dij := d2(rows[i], rows[j])
			ok := true
			for k := range rows {
				if k != i && k != j && d2(rows[i], rows[k])+d2(rows[j], rows[k]) <= dij*(1+1e-9) {
					ok = false
					break
				}
			}
			if ok {
				out = append(out, [2]int{i, j})
			}
		}
	}
	return out
}
