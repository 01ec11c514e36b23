package settle

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
)

// Published limits of angular distortion β = δ/L between two footings.
const (
	BetaSafe      = 1.0 / 500 // safe limit where cracking is not permissible (Bjerrum 1963); acceptable for many structures (EN 1997-1 Annex H)
	BetaCracking  = 1.0 / 300 // first cracking in panel walls (Skempton & MacDonald 1956)
	BetaStructure = 1.0 / 150 // structural damage (Skempton & MacDonald 1956); about the ultimate limit state (EN 1997-1 Annex H)
)

// DiffInput is a pair of footings for a differential settlement check.
type DiffInput struct {
	A, B    string   // footing names
	SA, SB  float64  // their settlements, m, [0, 1]
	Spacing float64  // distance between them, m, (0, 1000]
	Limit   site.Opt // limiting angular distortion, (0, 0.1]; default 1/500
}

// Diff is the differential settlement between two footings.
type Diff struct {
	Delta   float64 // |s_A − s_B|, m
	Beta    float64 // angular distortion δ/L
	Limit   float64
	Util    float64 // β/β_lim
	OK      bool
	Trace   trace.Trace
	Symbols []trace.Value // delta_s, beta, beta_lim, util
}

// Differential returns the angular distortion β = |s_A − s_B|/L between
// two footings and checks it against a limit (default 1/500), with
// cautions at the published limits: 1/500 (Bjerrum 1963; EN 1997-1
// Annex H), 1/300 for cracking of panel walls and 1/150 for structural
// damage (Skempton & MacDonald 1956; EN 1997-1 Annex H gives about 1/150
// for an ultimate limit state).
func Differential(in DiffInput) (*Diff, error) {
	var errs site.Errors
	errs = check(errs, in.A, "s", in.SA, 1e-3, 0, 1000, false, "mm")
	errs = check(errs, in.B, "s", in.SB, 1e-3, 0, 1000, false, "mm")
	errs = check(errs, "", "L", in.Spacing, 1, 0, 1000, true, "m")
	if in.Limit.Set {
		errs = check(errs, "", "beta_lim", in.Limit.V, 1, 0, 0.1, true, "")
	}
	if len(errs) > 0 {
		return nil, one(errs)
	}
	d := &Diff{Limit: in.Limit.Or(BetaSafe)}
	t := &d.Trace
	cs := fmt.Sprintf("%s–%s", in.A, in.B)
	refH := trace.Ref{Source: trace.EN1997, Clause: "Annex H"}
	eval := func(sym string, fx trace.Expr, vin []trace.Value, unit string, r trace.Ref, note string) float64 {
		return t.Eval(trace.Step{Symbol: sym, Formula: fx, Inputs: vin, Unit: unit, Ref: r, Note: note, Case: cs})
	}
	d.Delta = eval("delta_s", fxDelta, []trace.Value{val("s_A", in.SA, "mm"), val("s_B", in.SB, "mm")}, "mm", trace.Ref{}, "differential settlement")
	d.Beta = eval("beta", fxBeta, []trace.Value{val("delta_s", d.Delta, "mm"), val("L", in.Spacing, "m")}, "", refH, "angular distortion (relative rotation)")
	lref := refH
	if !in.Limit.Set {
		lref = trace.Ref{Source: Bjerrum1963, Clause: "1/500: safe limit where cracking is not permissible"}
		t.Cite(trace.EN1997)
	}
	t.Take(trace.Step{Symbol: "beta_lim", Kind: trace.Given, Value: d.Limit, Ref: lref, Note: "limiting angular distortion", Case: cs})
	d.Util = eval("util", fxBetaUtil, []trace.Value{val("beta", d.Beta, ""), val("beta_lim", d.Limit, "")}, "", trace.Ref{}, "")
	if err := t.Err(); err != nil {
		return nil, fmt.Errorf("differential settlement %s: %w", cs, err)
	}
	d.OK = d.Util <= 1
	vals := []trace.Value{val("beta", d.Beta, "")}
	switch {
	case d.Beta > BetaStructure:
		t.Warn(trace.Caution{Code: "beta-structure", Severity: trace.SevWarning, Case: cs, Values: vals, Ref: trace.Ref{Source: SM1956, Clause: "1/150: structural damage"},
			Message: fmt.Sprintf("angular distortion 1/%s exceeds 1/150, at which Skempton & MacDonald (1956) found structural damage (about the ultimate limit state in EN 1997-1 Annex H)", inverse(d.Beta, BetaStructure))})
	case d.Beta > BetaCracking:
		t.Warn(trace.Caution{Code: "beta-cracking", Severity: trace.SevCaution, Case: cs, Values: vals, Ref: trace.Ref{Source: SM1956, Clause: "1/300: cracking of panel walls"},
			Message: fmt.Sprintf("angular distortion 1/%s exceeds 1/300, at which Skempton & MacDonald (1956) found cracking in panel walls", inverse(d.Beta, BetaCracking))})
	case d.Beta > BetaSafe:
		t.Warn(trace.Caution{Code: "beta-safe", Severity: trace.SevNote, Case: cs, Values: vals, Ref: trace.Ref{Source: Bjerrum1963, Clause: "1/500"},
			Message: fmt.Sprintf("angular distortion 1/%s exceeds 1/500, the safe limit of Bjerrum (1963) for buildings where cracking is not permissible (EN 1997-1 Annex H: acceptable for many structures)", inverse(d.Beta, BetaSafe))})
	}
	t.Cite(SM1956)
	d.Symbols = []trace.Value{val("delta_s", d.Delta, "mm"), val("beta", d.Beta, ""), val("beta_lim", d.Limit, ""), val("util", d.Util, "")}
	return d, nil
}

var (
	fxDelta    = trace.Fn("abs", trace.Sub(trace.S("s_A"), trace.S("s_B")))
	fxBeta     = trace.Div(trace.S("delta_s"), trace.S("L"))
	fxBetaUtil = trace.Div(trace.S("beta"), trace.S("beta_lim"))
)

// inverse prints 1/beta as a whole number, with decimals where that would
// print it onto or past 1/limit (units.Beside): 1/149.6, not 1/150.
func inverse(beta, limit float64) string {
	return units.Beside(1/beta, []float64{1 / limit}, units.Dimensionless, 0)
}
