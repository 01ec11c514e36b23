package settle

import (
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/stress"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Sublayer is one row of the stress table. Depths are below ground level
// (m), stresses Pa, settlements m.
type Sublayer struct {
	Layer      int    // index into Ground.Layers
	Name       string // layer name
	Top, Bot   float64
	Z          float64 // mid-depth, where the stresses are taken (midpoint rule)
	H          float64 // thickness
	SigmaV0    float64 // total vertical stress σ_v0
	U0         float64 // hydrostatic pore pressure u_0
	SigmaV0Eff float64 // σ′_v0 = σ_v0 − u_0
	DSigma     float64 // Δσ from the net pressure at the chosen point
	SigmaF     float64 // σ′_f = σ′_v0 + Δσ
	SigmaP     float64 // σ′_p used by the C_c/C_r form (0 otherwise)
	Case       string  // how the sublayer settles: "m_v", "NC", "OC", "OC-NC", "E_u", "E'", "I_z", "" (none)
	Iz         float64 // Schmertmann strain influence factor (0 otherwise)
	E          float64 // modulus used (elastic: E_u or E′; Schmertmann: E_s), Pa
	Si, Sc     float64 // immediate and consolidation settlement of the sublayer
}

// LayerResult is the settlement of one layer within the zone of influence.
type LayerResult struct {
	Layer     int
	Name      string
	Top, Bot  float64 // the part of the layer within the zone, depth below ground, m
	Sublayers int
	Fine      bool
	Immediate string  // how s_i was found: "E_u", "E'", "I_z", "" (none)
	Consol    string  // "m_v", "C_c", "" (none)
	Si        float64 // immediate settlement, m
	SOed      float64 // one-dimensional consolidation settlement before any correction, m
	Mu        float64 // Skempton–Bjerrum factor μ (1 when not applied)
	Sc        float64 // consolidation settlement μ·s_oed, m
	Ssec      float64 // secondary compression at the design life, m

	// Time (consolidating layers with c_v).
	Drainage string   // "one-way" or "two-way"
	H, Hdr   float64  // drainage thickness and drainage path, m
	Cv       float64  // m²/s
	T50, T90 site.Opt // s
	Tp       site.Opt // end of primary consolidation used for secondary compression, s
	Ep       site.Opt // void ratio at the end of primary consolidation
}

// CurvePoint is one point of the settlement–time curve.
type CurvePoint struct {
	T    float64 // time after loading, s
	U    float64 // average degree of consolidation of the consolidation settlement (1 when there is none)
	S    float64 // total settlement at T, m
	Si   float64 // immediate settlement, with sand creep at T (Schmertmann C_2, Burland & Burbidge f_t), m
	Sc   float64 // consolidation settlement reached at T, m
	Ssec float64 // secondary compression at T, m
}

// Schm holds the factors of Schmertmann's method.
type Schm struct {
	Version  int     // 1970 or 1978
	LB       float64 // L/B used for the I_z diagram (≥ 1; 10 for a strip)
	C1, C2   float64 // embedment factor; creep factor at the design life
	Iz0, Izp float64 // I_z at the base and its peak
	Zp, Zmax float64 // depth of the peak and of the bottom of the diagram below the base, m
	SigmaVp  float64 // σ′_v0 at the depth of the peak, Pa
	Sum      float64 // Σ I_z Δz / E_s, m/Pa
}

// BB holds the factors of Burland & Burbidge's method.
type BB struct {
	NBar    float64 // average corrected N over z_I
	Ic      float64 // compressibility index, mm/(kPa·m^0.7)
	ZI      float64 // depth of influence below the base, m
	H       float64 // thickness of the granular stratum below the base, m (+Inf if unbounded)
	Fs, Fl  float64 // shape and thickness factors
	Ft      float64 // time factor at the design life (1 below 3 years)
	QEff    float64 // gross effective bearing pressure q′, Pa
	SigmaVo float64 // maximum previous effective overburden σ′_vo at the base, Pa
	OC      bool    // q′ ≤ σ′_vo (recompression only)
}

// Result is a settlement calculation. Every number printed from it is a
// field here; Trace holds the working (representative sublayers written out
// in full, the rest in Sub) and Symbols the summary for the sheet, named
// as Spec.Results names them.
type Result struct {
	Method  Method // the method used (Auto resolved)
	Stress  stress.Method
	Point   stress.Point
	Q       float64 // gross bearing pressure, Pa
	QNet    float64 // q − σ_v0 at the base, Pa
	SigmaV0 float64 // total vertical stress at the base, Pa
	U0      float64 // pore pressure at the base, Pa
	ZInf    float64 // bottom of the zone considered, depth below ground, m
	Depth   DepthRule

	Sub    []Sublayer
	Layers []LayerResult

	Si, Sc, Ssec, Total float64 // m
	T50, T90            site.Opt
	Curve               []CurvePoint

	Limit float64 // m
	Util  float64 // Total/Limit
	OK    bool    // Total ≤ Limit and nothing is Unverified
	// Unverified lists why the settlement cannot be verified: a layer in
	// the zone of influence without the data its method needs (no
	// stiffness, no m_v or C_c for a fine layer, no c_v for a time curve
	// asked for). Such a result is never OK: its total leaves that layer
	// out.
	Unverified []string

	Schm *Schm // set for Schmertmann's method
	BB   *BB   // set for Burland & Burbidge's method

	Trace   trace.Trace
	Symbols []trace.Value
}

func (r *Result) symbols() {
	v := func(s string, x float64, u string) {
		r.Symbols = append(r.Symbols, trace.Value{Symbol: s, V: x, Unit: u})
	}
	v("q_SLS", r.Q, "kPa")
	v("q_net", r.QNet, "kPa")
	v("z_inf", r.ZInf, "m")
	v("s_i", r.Si, "mm")
	v("s_c", r.Sc, "mm")
	v("s_sec", r.Ssec, "mm")
	v("s_total", r.Total, "mm")
	v("s_lim", r.Limit, "mm")
	v("util_s", r.Util, "")
	if r.T50.Set {
		v("t_50", r.T50.V, "yr")
	}
	if r.T90.Set {
		v("t_90", r.T90.V, "yr")
	}
	if s := r.Schm; s != nil {
		v("C_1", s.C1, "")
		v("C_2", s.C2, "")
		v("I_zp", s.Izp, "")
	}
	if b := r.BB; b != nil {
		v("N_bar", b.NBar, "")
		v("I_c", b.Ic, "")
		v("z_I", b.ZI, "m")
		v("f_s", b.Fs, "")
		v("f_l", b.Fl, "")
		v("f_t", b.Ft, "")
	}
}
