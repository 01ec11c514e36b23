package bearing

import "github.com/plinth-calc/plinth/calc/kind"

// Spec declares the bearing block: the options Check reads (through
// Input.Options) and the summary values it gives (Result.Values, in
// this order; forces, moments and areas of a strip per metre run).
var Spec = kind.Spec{
	Word:   "bearing",
	Header: kind.On,
	Doc:    "bearing resistance of the footing on the ground model (EN 1997-1 6.5.2, Annex D), and sliding (6.5.3)",
	Options: []kind.Option{
		{Name: "drainage", Words: []string{"undrained", "drained", "both"}, Default: "both for a fine-grained founding layer, drained otherwise",
			Doc: "the drainage conditions checked"},
		{Name: "method", Words: []string{"ec7", "vesic", "meyerhof", "hansen", "terzaghi"}, Default: "ec7",
			Doc: "the bearing capacity method (ec7: EN 1997-1 Annex D)"},
		{Name: "approach", Value: kind.Special, Words: []string{"DA1", "DA2", "DA3"}, Form: "FS(factor), e.g. FS(3.0)", Default: "DA1",
			Doc: "the design approach of EN 1997-1 2.4.7.3.4, or an allowable-stress global factor"},
		{Name: "local_shear", Words: []string{"auto", "yes", "no"}, Default: "auto",
			Doc: "Terzaghi's (1943) local-shear strengths c* = 2/3 c, tan φ* = 2/3 tan φ"},
		{Name: "sliding", Words: []string{"yes", "no"}, Default: "yes when horizontal load is present",
			Doc: "the sliding check of EN 1997-1 6.5.3"},
		{Name: "two_layer", Words: []string{"auto", "no"}, Default: "auto",
			Doc: "the stronger-over-weaker check of a weaker layer within 2B below the base (Meyerhof & Hanna 1978)"},
		{Name: "interface", Words: []string{"cast", "precast"}, Default: "cast (delta = phi'; precast: 2/3 phi')",
			Doc: "the base interface for sliding, EN 1997-1 6.5.3(10)"},
		{Name: "delta", Value: kind.Quantity, Form: "an angle (interface friction for sliding)", Default: "from interface",
			Doc: "the characteristic interface friction angle δ_k"},
		{Name: "K_s", Value: kind.Number, Form: "a number: the two-layer punching coefficient read from Meyerhof & Hanna's chart", Default: "from BR 470 Table A2",
			Doc: "the two-layer punching shear coefficient"},
		{Name: "r_a", Value: kind.Number, Form: "a number from 0 to 1: the two-layer adhesion ratio c_a/c_1", Default: "0.6 + 0.4 q_2/q_1",
			Doc: "the two-layer adhesion ratio"},
		{Name: "fs_on", Words: []string{"net", "gross"}, Default: "net (q_a = q_net,ult/FS + q; gross: q_ult/FS)",
			Doc: "what an FS(…) approach divides: the net or the gross ultimate pressure"},
		{Name: "spread", Value: kind.Number, Form: "a number from 0 to 1: the two-layer load-spread gradient, horizontal per vertical", Default: "0.5 (1H:2V)",
			Doc: "the load-spread gradient through the upper layer of a two-layer check"},
	},
	Results: []kind.Result{
		{Symbol: "R_d", Unit: "kN", Meaning: "design bearing resistance, governing case"},
		{Symbol: "util", Meaning: "bearing utilisation V_d/R_d, governing case"},
		{Symbol: "q_Ed", Unit: "kPa", Meaning: "design bearing pressure V_d/A'"},
		{Symbol: "q_Rd", Unit: "kPa", Meaning: "design resistance pressure R_d/A'"},
		{Symbol: "q_ult", Unit: "kPa", Meaning: "ultimate bearing pressure used"},
		{Symbol: "V_d", Unit: "kN", Meaning: "design vertical action, governing bearing case"},
		{Symbol: "H_d", Unit: "kN", Meaning: "design horizontal action, governing bearing case"},
		{Symbol: "e_B", Unit: "m", Meaning: "eccentricity along B"},
		{Symbol: "e_L", Unit: "m", Meaning: "eccentricity along L", When: "not a strip"},
		{Symbol: "B'", Unit: "m", Meaning: "effective width"},
		{Symbol: "L'", Unit: "m", Meaning: "effective length", When: "not a strip"},
		{Symbol: "A'", Unit: "m2", Meaning: "effective area"},
		{Symbol: "util_u", Meaning: "highest undrained (short-term) utilisation", When: "an undrained case"},
		{Symbol: "util_dr", Meaning: "highest drained (long-term) utilisation", When: "a drained case"},
		{Symbol: "H_d_h", Unit: "kN", Meaning: "design horizontal action, governing sliding case", When: "sliding"},
		{Symbol: "V_d_h", Unit: "kN", Meaning: "design vertical action of the governing sliding case (V'_d drained, V_d undrained)", When: "sliding"},
		{Symbol: "R_h_d", Unit: "kN", Meaning: "design sliding resistance, governing sliding case", When: "sliding"},
		{Symbol: "util_h", Meaning: "sliding utilisation, governing sliding case", When: "sliding"},
	},
}
