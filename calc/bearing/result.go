package bearing

import "github.com/plinth-calc/plinth/calc/trace"

// UtilCap is the utilisation reported when there is no resistance at all
// (resultant outside the base, resistance zero): the check fails and the
// number stays finite.
const UtilCap = 99.99

// Case is one bearing check: one design load under one drainage
// condition. Forces are N (N/m for a strip), pressures Pa, lengths m.
type Case struct {
	Name        string   // "DA1-C2 · Imposed leading · G sup · drained"; the trace's Step.Case
	Combination string   // the design load's name, "DA1-C2 · Imposed leading · G sup"
	Drainage    Drainage // Undrained or Drained
	V, H        float64  // V_d and resultant H_d; drained: V_d less the water pressure on the base (see U)
	U           float64  // drained: the water pressure on the base u_0·A_b deducted from V_d (0 when none)
	U0          float64  // drained: the pore pressure u_0 at the base, Pa (0 undrained or dry)
	EB, EL      float64  // eccentricities e_B, e_L
	B, L, A     float64  // effective B′, L′ (0 for a strip: unbounded), A′ (m² per m for a strip)
	QUlt        float64  // ultimate bearing pressure used (the lesser of single and two-layer values)
	R           float64  // R_d: design resistance as a force (allowable resistance for an FS approach)
	QEd, QRd    float64  // V_d/A′ and R_d/A′
	Util        float64  // V_d/R_d (UtilCap when there is no resistance)
	OK          bool
	// Factors holds every factor of the case by its sheet symbol (N_q,
	// s_c, i_gamma, m, K_s, …).
	Factors  map[string]float64
	TwoLayer *TwoLayer // nil unless a weaker layer within 2B was checked
}

// TwoLayer reports the stronger-over-weaker check of one case.
type TwoLayer struct {
	Layer      int     // index of the weaker lower layer
	H          float64 // thickness of the upper layer below the base
	Q1, Q2     float64 // strip capacities q_1, q_2 of the two layers (for q_2/q_1)
	Ks, CaC1   float64 // K_s and c_a/c_1 used
	QT, QB, QU float64 // q_t (upper layer alone), q_b (lower layer), q_u (punching)
	Governs    bool    // q_u < q_t
	// The load-spread check beside it: pressure on the lower layer and its
	// design resistance pressure.
	SpreadQEd, SpreadQRd, SpreadUtil float64
	SpreadOK                         bool
}

// SlideCase is one sliding check (EN 1997-1 6.5.3).
type SlideCase struct {
	Name        string // "DA1-C1 · Wind leading · G inf · sliding drained"
	Combination string
	Drainage    Drainage
	H, V        float64 // H_d, and V′_d (drained) or V_d (undrained)
	R           float64 // R_h,d
	Util        float64
	OK          bool
	Limit04     bool // undrained: 0.4 V_d governed
}

// Result is the full bearing calculation of one footing.
type Result struct {
	Approach string // design.Approach.Name
	Source   string // where its factors come from
	Method   Method
	// MethodLine names what was computed: the method's title, with
	// "with Terzaghi's (1943) local-shear reduction" when the reduced
	// strengths were used, so no result carries a method's name unless it
	// is that method.
	MethodLine string
	// LocalShear is true when Terzaghi's local-shear strengths were used
	// for the founding layer (local_shear = yes, or auto with method =
	// terzaghi on loose or soft ground): the method is then "Method with
	// Terzaghi's local-shear reduction".
	LocalShear bool
	Cases      []Case
	// Governing is the index in Cases of the highest utilisation (-1 if
	// no case could be checked); GoverningDrainage is its drainage.
	Governing         int
	GoverningDrainage Drainage
	Sliding           []SlideCase
	GoverningSliding  int // -1 when sliding was not checked
	OK                bool
	// Uplift counts the design loads with V_d ≤ 0 (the base in tension
	// or lifting), which bearing cannot check; UpliftV is the largest
	// V_d among them. When every load lifts (Cases is empty), or the
	// governing case has no resistance (utilisation UtilCap), Unverified
	// says so and OK is false: no bearing check passes for lack of a
	// downward load or of a resistance.
	Uplift     int
	UpliftV    float64
	Unverified string
	// Values are the summary symbols the sheet names F1.R_d, F1.util, …
	// in a fixed order (see the package documentation).
	Values []trace.Value
	Trace  trace.Trace
}

// Value returns the summary value named sym.
func (r *Result) Value(sym string) (trace.Value, bool) { return trace.Find(r.Values, sym) }
