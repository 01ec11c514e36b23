package platform

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/trace"
)

// CaseResult is one loading case. Pressures are Pa, lengths m.
type CaseResult struct {
	Name               string
	Kind               CaseKind
	Q, W, L            float64 // q_k and the loaded area
	Factor, FactorNone float64 // γ_q with a platform, γ_q0 on the subgrade alone
	QD, QD0            float64 // q_d = γ_q q_k and q_d0 = γ_q0 q_k
	Rs                 float64 // R_s: the subgrade alone (no platform)
	Rp                 float64 // R_p: the platform material alone, the upper limit of R_d
	UtilNone           float64 // q_d0/R_s
	Needed             bool    // q_d0 > R_s: this case needs a platform
	// DReq is the thickness at which R_d = q_d (0 when the subgrade
	// carries q_d alone). Solvable is false when q_d > R_p: no thickness
	// of the material carries the case, and DReq is 0.
	DReq     float64
	Solvable bool
	Iter     int     // Brent's evaluations for DReq
	DMax     float64 // the method's largest thickness for this W
	Rd, Util float64 // R_d at the design thickness and q_d/R_d
	OK       bool
	// EC7 is the EN 1997-1 two-layer check of a W × L footing on the
	// platform over the subgrade at the design thickness (nil when off
	// or when it could not be made: EC7Err says why).
	EC7    *bearing.Result
	EC7Err error

	sp float64 // s_p, for the check at D
}

// Result is the platform design: the thickness found (or checked) and
// every case at it, with the full working.
type Result struct {
	Subgrade SubgradeKind
	Cases    []CaseResult
	// D is the design thickness: the given one, or the largest of the
	// cases' DReq and DMin.
	D     float64
	Given bool
	// DReq is the largest DReq of the cases that can be solved.
	DReq       float64
	DMin, DMax float64 // DMax the least of the cases' DMax
	Needed     bool    // some case needs a platform
	OK         bool    // every case passes at D, and every case could be solved
	Governing  int     // the case of highest utilisation at D
	// Values are the summary symbols in a fixed order (see doc.go).
	Values []trace.Value
	Trace  trace.Trace
}

// Value returns the summary value named sym.
func (r *Result) Value(sym string) (trace.Value, bool) { return trace.Find(r.Values, sym) }
