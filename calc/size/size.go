package size

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/solve"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Plan fixes L as B changes.
type Plan int

const (
	// Own keeps the footing's shape: a square stays square (L = B), a
	// circle a circle, a strip a strip.
	Own Plan = iota
	// FixedL: a rectangle of the given length, B ≤ L.
	FixedL
	// Ratio: a rectangle with L = Ratio·B.
	Ratio
)

// Ecc is the eccentricity limit a sized footing must meet in every design
// case.
type Ecc int

const (
	// Third: e_B ≤ B/3 and e_L ≤ L/3 (EN 1997-1:2004 6.5.4(1)P: beyond
	// it special precautions are needed; the default).
	Third Ecc = iota
	// Sixth: the resultant within the middle third, e ≤ B/6 (no tension
	// under the base with a linear pressure distribution; common practice).
	Sixth
	// NoEcc: no limit beyond the bearing check's own effective area.
	NoEcc
)

func (e Ecc) String() string {
	switch e {
	case Sixth:
		return "B/6"
	case NoEcc:
		return "none"
	}
	return "B/3"
}

// Defaults.
const (
	DefaultStep = 0.05 // m
	DefaultMax  = 10.0 // m
	MaxTrials   = 2000 // widths a fallback scan may try
)

// Input is one sizing.
type Input struct {
	// Bearing holds the ground, the footing (its shape, D, alpha; B and L
	// are the engine's to choose and are ignored), the characteristic
	// actions without self-weight, and the bearing options.
	Bearing bearing.Input
	// Settle, when set, adds the settlement check: its options and limit
	// (Ground, Footing, Q and V are set per trial; V is the serviceability
	// load of kind Service from the actions with the self-weight).
	Settle  *settle.Input
	Service design.ServiceKind
	// SelfWeight, when set, adds the footing's weight and the backfill
	// over it (design.Weight) to the actions at each trial width, so the
	// load grows with the footing.
	SelfWeight *design.SelfWeight
	Plan       Plan
	L          float64 // FixedL: the length, m
	Ratio      float64 // Ratio: L/B, [1, 20]
	Step       float64 // increment, m, (0, 1]; 0 means DefaultStep
	Min, Max   float64 // widths tried, m; 0 means the larger of site.MinWidth and Step, and DefaultMax
	// Sizes, when given, are the only widths allowed (a list of standard
	// sizes, m, ascending); Step, Min and Max are then not used.
	Sizes []float64
	Ecc   Ecc
}

// Check is one check at one width.
type Check struct {
	Name   string  // "bearing (undrained)", "bearing (drained)", "sliding", "eccentricity", "settlement"
	Util   float64 // demand over capacity
	OK     bool
	Detail string // the governing case, or what the ratio is of
}

// Trial is every check at one width.
type Trial struct {
	B, L      float64 // L = B for a square or circle, 0 for a strip
	Checks    []Check
	OK        bool
	Governing int // index in Checks of the highest utilisation
}

// Util is the governing utilisation.
func (t *Trial) Util() float64 { return t.Checks[t.Governing].Util }

// Result is the chosen size with its full working.
type Result struct {
	B, L    float64 // chosen
	At      Trial   // every check at the chosen size
	Below   *Trial  // the same one increment smaller (nil at B_min)
	BReq    float64 // the root of g found by the solver (NaN when the scan gave the answer)
	Search  string  // "bracketed" or "scan: …why"
	Trials  int     // widths evaluated
	Footing site.Footing
	Bearing *bearing.Result // at the chosen size
	Settle  *settle.Result  // at the chosen size; nil without a settlement check
	Service design.Service
	Load    trace.Trace // the serviceability load's working at the chosen size
	Weight  float64     // self-weight and backfill at the chosen size (0 without)
	WeightT trace.Trace // its working
	Trace   trace.Trace // the sizing steps
	Values  []trace.Value
}

// NoSize is returned when no width on the grid up to Max passes.
type NoSize struct {
	Max    float64
	FixedL bool    // Max is the fixed length
	Failed []Check // the checks failing at Max
}

func (e *NoSize) Error() string {
	var parts []string
	for _, c := range e.Failed {
		parts = append(parts, fmt.Sprintf("%s (utilisation %.2f)", c.Name, c.Util))
	}
	verb := "fails"
	if len(parts) > 1 {
		verb = "fail"
	}
	if e.FixedL {
		return fmt.Sprintf("the fixed L = %.3g m is smaller than the width the checks need: at B = L, %s %s", e.Max, strings.Join(parts, ", "), verb)
	}
	return fmt.Sprintf("no width up to %.3g m passes: at %.3g m, %s %s", e.Max, e.Max, strings.Join(parts, ", "), verb)
}

func (z *sizer) noSize() error {
	return &NoSize{Max: z.width(z.kmax), FixedL: z.in.Plan == FixedL && z.width(z.kmax) >= z.in.L-1e-9, Failed: failed(z.at(z.kmax).Checks)}
}

type sizer struct {
	in     Input
	step   float64   // 0 with a list of sizes
	widths []float64 // the grid, ascending
	kmin   int       // 0
	kmax   int       // len(widths) − 1
	seen   map[int]*trial
	evals  int
}

type trial struct {
	Trial
	err  error
	b    *bearing.Result
	s    *settle.Result
	svc  design.Service
	load trace.Trace
	w    float64
	wt   trace.Trace
	f    site.Footing
	sin  settle.Input // the settlement input of the trial
}

// Size finds the smallest width on the increment that passes every check.
func Size(in Input) (*Result, error) {
	z, err := newSizer(in)
	if err != nil {
		return nil, err
	}
	top := z.at(z.kmax)
	if top.err != nil {
		return nil, top.err
	}
	if !top.OK {
		return nil, z.noSize()
	}
	k, breq, search, err := z.search()
	if err != nil {
		return nil, err
	}
	return z.result(k, breq, search)
}

func newSizer(in Input) (*sizer, error) {
	var errs site.Errors
	if len(in.Sizes) > 0 {
		return listSizer(in)
	}
	step := in.Step
	if step == 0 {
		step = DefaultStep
	}
	errs.Range("size", "step", step, 1, 0, 1, true, "m")
	if in.Plan == Ratio {
		errs.Range("size", "ratio", in.Ratio, 1, 1, 20, false, "")
	}
	f := in.Bearing.Footing
	if in.Plan != Own && (f.Shape == site.Strip || f.Shape == site.Circle) {
		errs = append(errs, &site.InputError{Where: "size", Param: "plan", Msg: fmt.Sprintf("a fixed L or L/B needs a rectangle, not a %s", f.Shape)})
	}
	lo, hi := in.Min, in.Max
	if lo == 0 {
		lo = math.Max(site.MinWidth, step)
	}
	if hi == 0 {
		hi = DefaultMax
		if in.Plan == FixedL && in.L > 0 {
			hi = math.Min(hi, in.L)
		}
	}
	if in.Plan == FixedL {
		errs.Range("size", "L", in.L, 1, site.MinWidth, 10000, false, "m")
		if in.L > 0 && hi > in.L {
			errs = append(errs, &site.InputError{Where: "size", Param: "max", Msg: fmt.Sprintf("the largest width %.3g m exceeds the fixed L = %.3g m (B ≤ L)", hi, in.L)})
		}
	}
	errs.Range("size", "min", lo, 1, site.MinWidth, 1000, false, "m")
	errs.Range("size", "max", hi, 1, site.MinWidth, 1000, false, "m")
	if len(errs) > 0 {
		return nil, errs
	}
	if step > hi {
		return nil, &site.InputError{Where: "size", Param: "step", Msg: fmt.Sprintf("the increment %.3g m is larger than the largest width %.3g m", step, hi)}
	}
	kmin, kmax := int(math.Ceil(lo/step-1e-9)), int(math.Floor(hi/step+1e-9))
	if kmin > kmax {
		return nil, &site.InputError{Where: "size", Param: "min", Msg: fmt.Sprintf("no width on the %.3g m increment lies between %.3g m and %.3g m", step, lo, hi)}
	}
	if kmax-kmin+1 > MaxTrials {
		return nil, &site.InputError{Where: "size", Param: "step", Msg: fmt.Sprintf("%d widths between %.3g m and %.3g m on a %.3g m increment: at most %d (use a larger increment)", kmax-kmin+1, lo, hi, step, MaxTrials)}
	}
	ws := make([]float64, 0, kmax-kmin+1)
	for k := kmin; k <= kmax; k++ {
		ws = append(ws, math.Round(float64(k)*step*1e6)/1e6) // to the micrometre: 2.3, not 2.3000000000000003
	}
	return &sizer{in: in, step: step, widths: ws, kmax: len(ws) - 1, seen: map[int]*trial{}}, nil
}

// listSizer is a sizer over a list of standard sizes.
func listSizer(in Input) (*sizer, error) {
	var errs site.Errors
	if len(in.Sizes) > MaxTrials {
		return nil, &site.InputError{Where: "size", Param: "sizes", Msg: fmt.Sprintf("%d sizes: at most %d", len(in.Sizes), MaxTrials)}
	}
	for i, w := range in.Sizes {
		errs.Range("size", "sizes", w, 1, site.MinWidth, 1000, false, "m")
		if i > 0 && w <= in.Sizes[i-1] {
			errs = append(errs, &site.InputError{Where: "size", Param: "sizes", Msg: fmt.Sprintf("the sizes must rise: %.3g m after %.3g m", w, in.Sizes[i-1])})
		}
		if in.Plan == FixedL && w > in.L {
			errs = append(errs, &site.InputError{Where: "size", Param: "sizes", Msg: fmt.Sprintf("the size %.3g m exceeds the fixed L = %.3g m (B ≤ L)", w, in.L)})
		}
	}
	if len(errs) > 0 {
		return nil, errs
	}
	return &sizer{in: in, widths: append([]float64(nil), in.Sizes...), kmax: len(in.Sizes) - 1, seen: map[int]*trial{}}, nil
}

func (z *sizer) width(k int) float64 { return z.widths[k] }

// above is the index of the first grid width at or above B (kmax if none).
func (z *sizer) above(B float64) int {
	for k, w := range z.widths {
		if w >= B-1e-9 {
			return k
		}
	}
	return z.kmax
}

// footing is the footing at width B.
func (z *sizer) footing(B float64) site.Footing {
	f := z.in.Bearing.Footing
	f.B = B
	switch {
	case f.Shape == site.Square || f.Shape == site.Circle:
		f.L = B
	case f.Shape == site.Strip:
		f.L = 0
	case z.in.Plan == FixedL:
		f.L = z.in.L
	case z.in.Plan == Ratio:
		f.L = z.in.Ratio * B
	default: // a rectangle keeps its L/B
		r := 1.0
		if g := z.in.Bearing.Footing; g.B > 0 && g.L >= g.B {
			r = g.L / g.B
		}
		f.L = r * B
	}
	return f
}

func failed(cs []Check) []Check {
	var out []Check
	for _, c := range cs {
		if !c.OK {
			out = append(out, c)
		}
	}
	return out
}

// search returns the grid index chosen, the solver's root and how it was
// found.
func (z *sizer) search() (int, float64, string, error) {
	first := z.at(z.kmin)
	if first.err != nil {
		return 0, 0, "", first.err
	}
	if first.OK {
		return z.kmin, math.NaN(), "bracketed: the smallest width tried passes", nil
	}
	var evalErr error
	g := func(B float64) (float64, error) {
		var t *trial
		if k := z.above(B); math.Abs(z.width(k)-B) < 1e-12 {
			t = z.at(k) // a grid width (the bracket's ends): evaluated once
		} else {
			t = z.eval(B)
		}
		if t.err != nil {
			evalErr = t.err
			return 0, t.err
		}
		return t.Util() - 1, nil
	}
	tol := 0.001 // 1 mm on the root: B_req is printed to the millimetre
	root, err := solve.Brent(g, z.width(z.kmin), z.width(z.kmax), solve.Options{Tol: tol})
	if evalErr != nil {
		return 0, 0, "", evalErr
	}
	why := ""
	if err == nil {
		k := z.above(root.X)
		// the grid width at or above the root passes and the one below fails
		for tries := 0; tries < 3 && k <= z.kmax; tries++ {
			t := z.at(k)
			if t.err != nil {
				return 0, 0, "", t.err
			}
			if !t.OK {
				k++ // the root sits on the grid point; the next one up
				continue
			}
			b := z.at(k - 1)
			if b.err != nil {
				return 0, 0, "", b.err
			}
			if !b.OK {
				return k, root.X, "bracketed", nil
			}
			why = "the width below the solver's answer passes too"
			break
		}
		if why == "" {
			why = "the widths at the solver's answer fail"
		}
	} else {
		var be *solve.BracketError
		if !errors.As(err, &be) {
			why = "the solver did not converge"
		} else {
			why = "the governing utilisation does not cross 1 on the bracket"
		}
	}
	for k := z.kmin; k <= z.kmax; k++ {
		t := z.at(k)
		if t.err != nil {
			return 0, 0, "", t.err
		}
		if t.OK {
			return k, math.NaN(), "scan: " + why, nil
		}
	}
	return 0, 0, "", z.noSize()
}

// at evaluates the grid width k once.
func (z *sizer) at(k int) *trial {
	if t, ok := z.seen[k]; ok {
		return t
	}
	t := z.eval(z.width(k))
	z.seen[k] = t
	return t
}

func (z *sizer) result(k int, breq float64, search string) (*Result, error) {
	t := z.at(k)
	if t.s != nil {
		full, err := settle.Compute(t.sin) // the same numbers, with the working
		if err != nil {
			return nil, err
		}
		t.s = full
	}
	r := &Result{B: t.B, L: t.L, At: t.Trial, BReq: breq, Search: search, Trials: z.evals,
		Footing: t.f, Bearing: t.b, Settle: t.s, Service: t.svc, Load: t.load, Weight: t.w, WeightT: t.wt}
	if k > z.kmin {
		b := z.at(k - 1)
		r.Below = &b.Trial
	}
	z.record(r)
	return r, r.Trace.Err()
}
