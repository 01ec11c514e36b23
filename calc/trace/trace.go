package trace

import (
	"errors"
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/severity"
)

// Value is one number used in or produced by a step: SI value, and the
// unit to display it in ("" for a pure number; any name calc/units parses).
type Value struct {
	Symbol string
	V      float64
	Unit   string
}

// Find returns the value named sym in vs (an engine's summary values).
func Find(vs []Value, sym string) (Value, bool) {
	for _, v := range vs {
		if v.Symbol == sym {
			return v, true
		}
	}
	return Value{}, false
}

// Source is a publication an engine method comes from. Key is short and
// unique across the engine ("EN1997-1", "Vesic1973"); Citation is the full
// reference as printed in the references list.
type Source struct {
	Key      string
	Citation string
}

// Ref points at a place in a Source: Clause is a clause, equation, table
// or page ("Annex D, D.4", "eq. (4.7)", "Table 4.1").
type Ref struct {
	Source Source
	Clause string
}

// Kind says how a step's value was reached. The document prints a formula
// step as formula = substituted values = result, and names the others'
// origin instead ("from Table 4.1", "solved by Brent's method").
type Kind uint8

const (
	// ByFormula: the value is Formula evaluated with Inputs, by Eval.
	ByFormula Kind = iota
	// Given: an input, a default or a value the method states (a factor
	// taken as 1 for a strip); the note says which.
	Given
	// Tabulated: read from the published table that Ref names.
	Tabulated
	// Interpolated: interpolated in a table or between computed values.
	Interpolated
	// Solved: the root of an equation, found numerically (calc/solve);
	// Formula, if set, is the equation printed, not evaluated.
	Solved
	// Summed: a numerical integral or a sum over sublayers or terms whose
	// parts are steps of their own.
	Summed
)

func (k Kind) String() string {
	switch k {
	case Given:
		return "given"
	case Tabulated:
		return "tabulated"
	case Interpolated:
		return "interpolated"
	case Solved:
		return "solved"
	case Summed:
		return "summed"
	}
	return "formula"
}

// Step is one computed (or taken) value, in the order of computation.
type Step struct {
	Symbol  string  // sheet notation: "N_q", "phi'_d", "B'"
	Kind    Kind    // how Value was reached
	Formula Expr    // ByFormula: what Value is computed from; nil otherwise (Solved: the equation, optional)
	Inputs  []Value // every symbol in Formula with the value substituted
	Value   float64 // SI
	Unit    string  // display unit ("" = dimensionless)
	Ref     Ref     // where the formula comes from (zero if none applies)
	Note    string  // a few words: "bearing capacity factor"
	Case    string  // the case it belongs to ("" = common to all)
}

// Severity ranks a caution, lowest first: NOTE, CAUTION, WARNING. It is
// severity.Level (the one definition of the order, the words and what
// each means); the constants are the engine's names for its levels.
type Severity = severity.Level

const (
	SevNote    = severity.Note    // information: a choice made, a value assumed
	SevCaution = severity.Caution // a method used near its limits, or an assumption the engineer must confirm
	SevWarning = severity.Warning // a result that may be unsafe or is missing
)

// Caution records a method near or past its limits, or an input that needs
// the engineer's attention. Step is the index of the step that raised it
// (-1 for the calculation as a whole).
type Caution struct {
	Code     string // stable identifier, e.g. "ecc-b6"
	Severity Severity
	Message  string
	Values   []Value // the values that triggered it
	Step     int
	Ref      Ref
	Case     string
	// Restates marks a caution that says only what its check's verdict
	// line says ("Bearing governed by …"): a document that prints the
	// line leaves the caution out.
	Restates bool
	// AtStep marks a caution that says what the note and reference of the
	// step it was raised at say: printed beside that step in full, it is
	// not boxed again (the cautions summary still lists it).
	AtStep bool
}

// Trace is the ordered working of one calculation.
type Trace struct {
	Steps    []Step
	Cautions []Caution
	Sources  []Source
	err      error // the first step that could not be evaluated
}

// Eval is the recorder of formula steps: it evaluates s.Formula with
// s.Inputs (the one evaluator, Eval), sets s.Value and s.Kind = ByFormula,
// appends s, cites its source and returns the value, so calculations read
// as v := t.Eval(trace.Step{...}) and the printed formula is the number's
// only definition. A formula that cannot be evaluated (an input missing, an
// unknown function) or whose value is NaN or infinite is recorded as the
// trace's error (Err) and its value returned as NaN: the engine returns
// Err, never the number.
func (t *Trace) Eval(s Step) float64 {
	s.Value = t.Compute(s)
	s.Kind = ByFormula
	t.Steps = append(t.Steps, s)
	t.Cite(s.Ref.Source)
	return s.Value
}

// Compute evaluates s's formula as Eval records it, without appending: for
// callers that need a value whose working is not printed this time (a
// settlement profile solved for a limit without its trace). Errors go to t
// as for Eval.
func (t *Trace) Compute(s Step) float64 {
	if s.Formula == nil {
		t.fail(fmt.Errorf("trace: step %s has no formula", s.Symbol))
		return math.NaN()
	}
	v, err := Eval(s.Formula, s.Inputs)
	if err == nil && (math.IsNaN(v) || math.IsInf(v, 0)) {
		err = &DomainError{Symbol: s.Symbol, Value: v, Inputs: s.Inputs}
	}
	if err != nil {
		t.fail(err)
		return math.NaN()
	}
	return v
}

// Take appends a step whose value was not computed by a formula (a given
// value, a table, a numerical solution or sum: s.Kind says which; the zero
// Kind is taken as Given) and returns its value. A NaN or infinite value is
// recorded as the trace's error.
func (t *Trace) Take(s Step) float64 {
	if s.Kind == ByFormula {
		s.Kind = Given
	}
	if math.IsNaN(s.Value) || math.IsInf(s.Value, 0) {
		t.fail(&DomainError{Symbol: s.Symbol, Value: s.Value, Inputs: s.Inputs})
	}
	t.Steps = append(t.Steps, s)
	t.Cite(s.Ref.Source)
	return s.Value
}

// Err returns the first step the recorder could not evaluate, or nil.
func (t *Trace) Err() error { return t.err }

func (t *Trace) fail(err error) {
	if t.err == nil {
		t.err = err
	}
}

// DomainError is a step whose value is NaN or infinite: an input outside
// the range its formula holds for.
type DomainError struct {
	Symbol string
	Value  float64
	Inputs []Value
}

func (e *DomainError) Error() string {
	msg := fmt.Sprintf("%s evaluates to %v", e.Symbol, e.Value)
	for i, in := range e.Inputs {
		if i == 0 {
			msg += " with "
		} else {
			msg += ", "
		}
		msg += fmt.Sprintf("%s = %.6g", in.Symbol, in.V)
	}
	return msg + ": an input is outside the range the formula holds for"
}

// Cite adds src to the sources list unless it is empty or already there.
func (t *Trace) Cite(src Source) {
	if src.Key == "" {
		return
	}
	for _, s := range t.Sources {
		if s.Key == src.Key {
			return
		}
	}
	t.Sources = append(t.Sources, src)
}

// Warn records a caution raised by the latest step (Step is set to the
// index of the last step unless c.Step is already positive).
func (t *Trace) Warn(c Caution) {
	if c.Step <= 0 {
		c.Step = len(t.Steps) - 1
	}
	t.Cite(c.Ref.Source)
	t.Cautions = append(t.Cautions, c)
}

// WarnAll records a caution about the calculation as a whole (Step -1).
func (t *Trace) WarnAll(c Caution) {
	c.Step = -1
	t.Cite(c.Ref.Source)
	t.Cautions = append(t.Cautions, c)
}

// Append adds all of u to t, shifting u's step indices. A non-empty
// caseName labels every appended step and caution that has no case yet.
func (t *Trace) Append(u Trace, caseName string) {
	off := len(t.Steps)
	for _, s := range u.Steps {
		if s.Case == "" {
			s.Case = caseName
		}
		t.Steps = append(t.Steps, s)
	}
	for _, c := range u.Cautions {
		if c.Step >= 0 {
			c.Step += off
		}
		if c.Case == "" {
			c.Case = caseName
		}
		t.Cautions = append(t.Cautions, c)
	}
	for _, s := range u.Sources {
		t.Cite(s)
	}
	if u.err != nil {
		t.fail(u.err)
	}
}

// Verify replays every step: each symbol of a formula has an input, each
// formula reproduces its step's value to within rel (relative, with an
// absolute floor of rel for values near zero), no value is NaN or Inf, and
// every source cited by a step or caution is in Sources. Steps with opaque
// functions are checked for inputs only.
func Verify(t Trace, rel float64) error {
	var errs []error
	cited := map[string]bool{}
	for _, s := range t.Sources {
		cited[s.Key] = true
	}
	for i, s := range t.Steps {
		if math.IsNaN(s.Value) || math.IsInf(s.Value, 0) {
			errs = append(errs, fmt.Errorf("step %d %s: value %v", i, s.Symbol, s.Value))
		}
		if k := s.Ref.Source.Key; k != "" && !cited[k] {
			errs = append(errs, fmt.Errorf("step %d %s: source %s not in Sources", i, s.Symbol, k))
		}
		if s.Formula == nil {
			if s.Kind == ByFormula {
				errs = append(errs, fmt.Errorf("step %d %s: a formula step with no formula", i, s.Symbol))
			}
			continue
		}
		if s.Kind == Solved {
			continue // the equation solved, printed, not evaluated
		}
		have := map[string]bool{"pi": true}
		for _, in := range s.Inputs {
			have[in.Symbol] = true
		}
		for _, name := range Symbols(s.Formula) {
			if !have[name] {
				errs = append(errs, fmt.Errorf("step %d %s: formula uses %s with no input value", i, s.Symbol, name))
			}
		}
		v, err := Eval(s.Formula, s.Inputs)
		var op ErrOpaque
		if errors.As(err, &op) {
			continue
		}
		if err != nil {
			errs = append(errs, fmt.Errorf("step %d %s: %v", i, s.Symbol, err))
			continue
		}
		if d := math.Abs(v - s.Value); d > rel*math.Max(math.Abs(s.Value), 1) && d > rel*math.Abs(v) {
			errs = append(errs, fmt.Errorf("step %d %s: formula gives %.10g, step says %.10g", i, s.Symbol, v, s.Value))
		}
	}
	for i, c := range t.Cautions {
		if k := c.Ref.Source.Key; k != "" && !cited[k] {
			errs = append(errs, fmt.Errorf("caution %d %s: source %s not in Sources", i, c.Code, k))
		}
		if c.Step >= len(t.Steps) {
			errs = append(errs, fmt.Errorf("caution %d %s: step %d out of range", i, c.Code, c.Step))
		}
	}
	return errors.Join(errs...)
}
