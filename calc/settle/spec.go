package settle

import "github.com/plinth-calc/plinth/calc/kind"

// Spec declares the settlement block: the options Compute, TiltOf and
// WithinFooting read (through Input; load chooses the serviceability
// combination, package design) and the symbols they give (Result.Symbols,
// Tilt.Values, Within.Values; V_SLS is the serviceability load).
var Spec = kind.Spec{
	Word:   "settlement",
	Header: kind.On,
	Doc:    "settlement of the footing under the serviceability load: immediate, consolidation, secondary, with time",
	Options: []kind.Option{
		{Name: "method", Words: []string{"elastic", "consolidation", "schmertmann", "burland-burbidge"}, Default: "chosen from the layers' data",
			Doc: "the settlement method"},
		{Name: "stress", Words: []string{"boussinesq", "2:1"}, Default: "boussinesq",
			Doc: "the stress distribution below the footing"},
		{Name: "at", Words: []string{"centre", "corner", "characteristic"}, Default: "centre",
			Doc: "the point below which the stresses are taken"},
		{Name: "limit", Value: kind.Quantity, Form: "a length", Default: "25 mm",
			Doc: "the settlement limit s_lim"},
		{Name: "times", Value: kind.List, Form: "a list of durations (1 yr, 10 yr)", Default: "none",
			Doc: "the times of the settlement–time curve"},
		{Name: "sublayers", Value: kind.Count, Form: "a count of sublayers over the zone of influence", Default: "40",
			Doc: "how finely the zone of influence is divided"},
		{Name: "load", Words: []string{"characteristic", "quasi-permanent"}, Default: "characteristic (EN 1990 6.14b)",
			Doc: "the serviceability combination"},
		{Name: "rigid", Words: []string{"yes", "no"}, Default: "no (flexible, stresses at the point chosen by at)",
			Doc: "a rigid footing: the settlement at the characteristic point"},
		{Name: "life", Value: kind.Quantity, Form: "a duration: the design working life for creep and secondary compression", Default: "50 yr (EN 1990 Table 2.1, category 4)",
			Doc: "the design working life t_life"},
		{Name: "schmertmann", Words: []string{"1978", "1970"}, Default: "1978",
			Doc: "the version of Schmertmann's strain influence diagram"},
		{Name: "drainage_paths", Words: []string{"auto", "one-way", "two-way"}, Default: "auto (a boundary with a coarse layer or the surface drains)",
			Doc: "the drainage path H_dr of the consolidating layers"},
		{Name: "depth", Value: kind.Special, Form: "stress, stress(ratio), width, width(multiple of B) or a length below ground level", Default: "stress (0.1)",
			Doc: "where the zone of influence ends"},
		{Name: "skempton_bjerrum", Value: kind.Special, Words: []string{"no"}, Form: "the pore-pressure coefficient A, 0 to 1.5", Default: "no",
			Doc: "Skempton & Bjerrum's (1957) correction of the consolidation settlement"},
		{Name: "fluctuating", Words: []string{"no", "yes"}, Default: "no",
			Doc: "Burland & Burbidge's time factor for fluctuating loads"},
		{Name: "grain", Words: []string{"sand", "fine-silty", "gravel"}, Default: "sand",
			Doc: "Burland & Burbidge's correction of N"},
		{Name: "within", Words: []string{"yes", "no"}, Default: "no (yes: settlement at the centre and a corner, and the angular distortion between them)",
			Doc: "the differential settlement within the footing"},
		{Name: "tilt", Words: []string{"yes", "no"}, Default: "no (yes: tilt of the rigid footing under the SLS moment)",
			Doc: "the tilt of the rigid footing under the serviceability moment"},
	},
	Results: []kind.Result{
		{Symbol: "V_SLS", Unit: "kN", Meaning: "serviceability vertical load"},
		{Symbol: "q_SLS", Unit: "kPa", Meaning: "gross bearing pressure, serviceability load"},
		{Symbol: "q_net", Unit: "kPa", Meaning: "net bearing pressure q - sigma_v0 (gross less the total overburden at founding level)"},
		{Symbol: "z_inf", Unit: "m", Meaning: "depth of the zone of influence below ground level"},
		{Symbol: "s_i", Unit: "mm", Meaning: "immediate settlement"},
		{Symbol: "s_c", Unit: "mm", Meaning: "consolidation settlement"},
		{Symbol: "s_sec", Unit: "mm", Meaning: "secondary compression (creep) at the design life"},
		{Symbol: "s_total", Unit: "mm", Meaning: "total settlement"},
		{Symbol: "s_lim", Unit: "mm", Meaning: "settlement limit"},
		{Symbol: "util_s", Meaning: "settlement utilisation s_total/s_lim"},
		{Symbol: "t_50", Unit: "yr", Meaning: "time to 50 % consolidation", When: "consolidating layers with c_v"},
		{Symbol: "t_90", Unit: "yr", Meaning: "time to 90 % consolidation", When: "consolidating layers with c_v"},
		{Symbol: "C_1", Meaning: "Schmertmann embedment factor", When: "Schmertmann"},
		{Symbol: "C_2", Meaning: "Schmertmann creep factor", When: "Schmertmann"},
		{Symbol: "I_zp", Meaning: "Schmertmann peak strain influence factor", When: "Schmertmann"},
		{Symbol: "N_bar", Meaning: "Burland & Burbidge average SPT N over z_I", When: "Burland & Burbidge"},
		{Symbol: "I_c", Meaning: "Burland & Burbidge compressibility index", When: "Burland & Burbidge"},
		{Symbol: "z_I", Unit: "m", Meaning: "Burland & Burbidge depth of influence", When: "Burland & Burbidge"},
		{Symbol: "f_s", Meaning: "Burland & Burbidge shape factor", When: "Burland & Burbidge"},
		{Symbol: "f_l", Meaning: "Burland & Burbidge thickness factor", When: "Burland & Burbidge"},
		{Symbol: "f_t", Meaning: "Burland & Burbidge time factor", When: "Burland & Burbidge"},
		{Symbol: "theta_B", Unit: "deg", Meaning: "tilt under M_B (rigid footing, elastic half-space)", When: TiltOn},
		{Symbol: "omega_B", Meaning: "tilt under M_B as a slope, tan θ_B", When: TiltOn},
		{Symbol: "delta_s_B", Unit: "mm", Meaning: "settlement difference between the edges across B from the tilt", When: TiltOn},
		{Symbol: "theta_L", Unit: "deg", Meaning: "tilt under M_L (rigid footing, elastic half-space)", When: TiltOn},
		{Symbol: "omega_L", Meaning: "tilt under M_L as a slope, tan θ_L", When: TiltOn},
		{Symbol: "delta_s_L", Unit: "mm", Meaning: "settlement difference between the edges across L from the tilt", When: TiltOn},
		{Symbol: "s_centre", Unit: "mm", Meaning: "total settlement at the centre (flexible footing)", When: WithinOn},
		{Symbol: "s_corner", Unit: "mm", Meaning: "total settlement at a corner (flexible footing)", When: WithinOn},
		{Symbol: "s_edge", Unit: "mm", Meaning: "total settlement at the edge (flexible footing)", When: WithinOn},
		{Symbol: "delta_s_in", Unit: "mm", Meaning: "differential settlement within the footing, centre less corner", When: WithinOn},
		{Symbol: "beta_in", Meaning: "angular distortion within the footing, over the half-diagonal", When: WithinOn},
		{Symbol: "s_mid_B", Unit: "mm", Meaning: "total settlement at the middle of a long side (flexible footing)", When: WithinOn},
		{Symbol: "beta_B", Meaning: "angular distortion from the centre to the middle of a long side, over B/2", When: WithinOn},
		{Symbol: "s_mid_L", Unit: "mm", Meaning: "total settlement at the middle of a short side (flexible footing)", When: WithinOn},
		{Symbol: "beta_L", Meaning: "angular distortion from the centre to the middle of a short side, over L/2", When: WithinOn},
	},
}

// TiltOn and WithinOn are the options that bring the tilt and the
// within-footing results (Result.When).
const (
	TiltOn   = "tilt = yes"
	WithinOn = "within = yes"
)

// DiffSpec declares the differential block: the option Differential
// reads (DiffInput) and the symbols it gives (Diff.Symbols).
var DiffSpec = kind.Spec{
	Word:   "differential",
	Header: kind.To,
	Doc:    "angular distortion between two footings from their settlement blocks",
	Options: []kind.Option{
		{Name: "spacing", Value: kind.Quantity, Form: "a length: the centre-to-centre distance between the two footings", Default: "none: required",
			Doc: "the distance L between the footings' centres"},
		{Name: "limit", Value: kind.Number, Form: "a number from 0 to 0.1: the limiting angular distortion (1/500)", Default: "1/500 (Bjerrum 1963; EN 1997-1 Annex H)",
			Doc: "the limiting angular distortion β_lim"},
	},
	Results: []kind.Result{
		{Symbol: "delta_s", Unit: "mm", Meaning: "differential settlement |s_A − s_B| of the two footings"},
		{Symbol: "beta", Meaning: "angular distortion Δs/L"},
		{Symbol: "beta_lim", Meaning: "limiting angular distortion"},
		{Symbol: "util", Meaning: "angular distortion utilisation β/β_lim"},
	},
}
