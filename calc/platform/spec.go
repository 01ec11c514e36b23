package platform

import "github.com/plinth-calc/plinth/calc/kind"

// Spec declares the platform block: a working platform designed by the
// BR 470 (2004) method for the ground model's platform (its first layer,
// platform = yes) over the layer below, and the values of Result.Values.
var Spec = kind.Spec{
	Word:   "platform",
	Header: kind.NamedOn,
	Doc:    "a working platform for tracked plant by BR 470 (2004) Appendix A: the stated thickness checked and the thickness required",
	Options: []kind.Option{
		{Name: "track_width", Value: kind.Quantity, Form: "a length: the width W of the loaded area (track or outrigger)", Default: "none: required for a track",
			Doc: "the track width W"},
		{Name: "track_length", Value: kind.Quantity, Form: "a length: the bearing length L of the loaded area, at least W", Default: "none: required for a track",
			Doc: "the track bearing length L"},
		{Name: "q1", Value: kind.Quantity, Form: "a pressure: the characteristic track pressure of loading case 1", Default: "none: required for a track",
			Doc: "loading case 1 (standing, travelling, lifting: the operator cannot help recovery)"},
		{Name: "q2", Value: kind.Quantity, Form: "a pressure: the characteristic track pressure of loading case 2", Default: "none: case 1 only",
			Doc: "loading case 2 (the operator can control the load: drilling, extracting)"},
		{Name: "factor1", Value: kind.Number, Form: "a number: the load factor of case 1 with a platform", Default: "1.6 (BR 470, from memory, as reproduced publicly)",
			Doc: "the load factor of case 1"},
		{Name: "factor2", Value: kind.Number, Form: "a number: the load factor of case 2 with a platform", Default: "1.2 (BR 470, from memory, as reproduced publicly)",
			Doc: "the load factor of case 2"},
		{Name: "kp_tan_delta", Value: kind.Number, Form: "a number: the punching coefficient K_p·tanδ read from the method's chart", Default: "from the chart (BR 470 Table A2) by φ′ of the platform",
			Doc: "the punching shear coefficient"},
		{Name: "outrigger", Value: kind.Quantity, Form: "a force: an outrigger's working load on a mat, in place of the track options", Default: "none: a track",
			Doc: "an outrigger load on a mat: the mat checked or sized, and its pressure as loading case 1"},
		{Name: "mat_width", Value: kind.Quantity, Form: "a length: the mat's width B", Default: "none: the mat is sized for the allowable pressure",
			Doc: "the mat's width"},
		{Name: "mat_length", Value: kind.Quantity, Form: "a length: the mat's length L, at least B", Default: "a square mat",
			Doc: "the mat's length"},
		{Name: "allowable", Value: kind.Quantity, Form: "a pressure: the allowable bearing pressure under the mat", Default: "none: required with outrigger",
			Doc: "the pressure the mat is checked or sized for"},
		{Name: "comparison", Words: []string{"yes", "no"}, Default: "yes",
			Doc: "the EN 1997-1 two-layer check of the same track printed beside the method"},
	},
	Results: []kind.Result{
		{Symbol: "D", Unit: "m", Meaning: "platform thickness checked (the ground model's)"},
		{Symbol: "D_req", Unit: "m", Meaning: "platform thickness the method requires"},
		{Symbol: "D_min", Unit: "m", Meaning: "least thickness the method states"},
		{Symbol: "D_max", Unit: "m", Meaning: "largest thickness for which the method is used"},
		{Symbol: "platform_needed", Meaning: "1 when the subgrade alone cannot carry a loading case, else 0"},
		{Symbol: "util", Meaning: "governing utilisation q_d/R_d at the thickness checked"},
		{Symbol: "q_d1", Unit: "kPa", Meaning: "design track pressure, case 1"},
		{Symbol: "R_s1", Unit: "kPa", Meaning: "resistance of the subgrade alone, case 1"},
		{Symbol: "R_p1", Unit: "kPa", Meaning: "resistance of the platform material alone, case 1"},
		{Symbol: "R_d1", Unit: "kPa", Meaning: "resistance with the platform, case 1"},
		{Symbol: "util_1", Meaning: "utilisation with the platform, case 1"},
		{Symbol: "util_0_1", Meaning: "utilisation of the subgrade alone, case 1"},
		{Symbol: "util_EC7_1", Meaning: "EN 1997-1 two-layer utilisation of the track, case 1", When: "comparison = yes"},
		{Symbol: "mat_B", Unit: "m", Meaning: "width of the mat", When: "outrigger"},
		{Symbol: "mat_L", Unit: "m", Meaning: "length of the mat", When: "outrigger"},
		{Symbol: "mat_q", Unit: "kPa", Meaning: "bearing pressure under the mat", When: "outrigger"},
		{Symbol: "util_mat", Meaning: "mat pressure against the allowable", When: "outrigger"},
		{Symbol: "mat_B_req", Unit: "m", Meaning: "width at which the mat pressure is the allowable", When: "outrigger, mat sized"},
		{Symbol: "mat_z", Unit: "m", Meaning: "depth of the subgrade below the mat (the platform thickness)", When: "outrigger"},
		{Symbol: "mat_Delta_sigma_s", Unit: "kPa", Meaning: "stress increase at the subgrade by load spread", When: "outrigger"},
		{Symbol: "mat_Delta_sigma_c", Unit: "kPa", Meaning: "stress increase at the subgrade under the centre (Boussinesq)", When: "outrigger"},
		{Symbol: "q_d2", Unit: "kPa", Meaning: "design track pressure, case 2", When: "q2"},
		{Symbol: "R_s2", Unit: "kPa", Meaning: "resistance of the subgrade alone, case 2", When: "q2"},
		{Symbol: "R_p2", Unit: "kPa", Meaning: "resistance of the platform material alone, case 2", When: "q2"},
		{Symbol: "R_d2", Unit: "kPa", Meaning: "resistance with the platform, case 2", When: "q2"},
		{Symbol: "util_2", Meaning: "utilisation with the platform, case 2", When: "q2"},
		{Symbol: "util_0_2", Meaning: "utilisation of the subgrade alone, case 2", When: "q2"},
		{Symbol: "util_EC7_2", Meaning: "EN 1997-1 two-layer utilisation of the track, case 2", When: "q2 and comparison = yes"},
	},
}

// The block takes the sensitivity option too (calc/kind.Vary): its
// results follow the block's own.
func init() {
	Spec.Options = append(Spec.Options, kind.Vary)
	Spec.Results = append(Spec.Results, kind.VaryResults...)
}
