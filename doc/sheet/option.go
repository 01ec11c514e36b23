package sheet

// OptionSpec describes one option of a block: its name, the words it
// accepts, and what other value it takes. doc/parse rejects unknown option
// names; the evaluator checks values against Words and Form.
type OptionSpec struct {
	Name    string
	Words   []string // accepted words; nil when the value is not a word
	Form    string   // other accepted value, in words ("FS(factor)", "a length"); "" if none
	Default string   // the default, as the documentation states it
}

// Allows reports whether word is one of the option's words.
func (o OptionSpec) Allows(word string) bool {
	for _, w := range o.Words {
		if w == word {
			return true
		}
	}
	return false
}

// Options lists each block kind's options (SHEET-FORMAT §3). Ground
// blocks have none: their lines are statements. A footing's options are
// the word-valued lines; its dimensions and gamma_c are statements.
var Options = map[Kind][]OptionSpec{
	KindFooting: {
		{Name: "shape", Words: []string{"strip", "square", "rectangle", "circle"}, Default: "none: required"},
		{Name: "self_weight", Words: []string{"auto", "no"}, Default: "no (the actions include it)"},
	},
	KindBearing: {
		{Name: "drainage", Words: []string{"undrained", "drained", "both"}, Default: "both for a fine-grained founding layer, drained otherwise"},
		{Name: "method", Words: []string{"ec7", "vesic", "meyerhof", "hansen", "terzaghi"}, Default: "ec7"},
		{Name: "approach", Words: []string{"DA1", "DA2", "DA3"}, Form: "FS(factor), e.g. FS(3.0)", Default: "DA1"},
		{Name: "local_shear", Words: []string{"auto", "yes", "no"}, Default: "auto"},
		{Name: "sliding", Words: []string{"yes", "no"}, Default: "yes when horizontal load is present"},
		{Name: "two_layer", Words: []string{"auto", "no"}, Default: "auto"},
		{Name: "interface", Words: []string{"cast", "precast"}, Default: "cast (delta = phi'; precast: 2/3 phi')"},
		{Name: "delta", Form: "an angle (interface friction for sliding)", Default: "from interface"},
		{Name: "K_s", Form: "a number: the two-layer punching coefficient read from Meyerhof & Hanna's chart", Default: "from BR 470 Table A2"},
		{Name: "r_a", Form: "a number from 0 to 1: the two-layer adhesion ratio c_a/c_1", Default: "0.6 + 0.4 q_2/q_1"},
		{Name: "fs_on", Words: []string{"net", "gross"}, Default: "net (q_a = q_net,ult/FS + q; gross: q_ult/FS)"},
		{Name: "spread", Form: "a number from 0 to 1: the two-layer load-spread gradient, horizontal per vertical", Default: "0.5 (1H:2V)"},
	},
	KindSettlement: {
		{Name: "method", Words: []string{"elastic", "consolidation", "schmertmann", "burland-burbidge"}, Default: "chosen from the layers' data"},
		{Name: "stress", Words: []string{"boussinesq", "2:1"}, Default: "boussinesq"},
		{Name: "at", Words: []string{"centre", "corner", "characteristic"}, Default: "centre"},
		{Name: "limit", Form: "a length", Default: "25 mm"},
		{Name: "times", Form: "a list of durations (1 yr, 10 yr)", Default: "none"},
		{Name: "sublayers", Form: "a count of sublayers over the zone of influence", Default: "40"},
		{Name: "load", Words: []string{"characteristic", "quasi-permanent"}, Default: "characteristic (EN 1990 6.14b)"},
		{Name: "rigid", Words: []string{"yes", "no"}, Default: "no (flexible, stresses at the point chosen by at)"},
		{Name: "life", Form: "a duration: the design working life for creep and secondary compression", Default: "50 yr (EN 1990 Table 2.1, category 4)"},
		{Name: "schmertmann", Words: []string{"1978", "1970"}, Default: "1978"},
		{Name: "drainage_paths", Words: []string{"auto", "one-way", "two-way"}, Default: "auto (a boundary with a coarse layer or the surface drains)"},
		{Name: "depth", Form: "stress, stress(ratio), width, width(multiple of B) or a length below ground level", Default: "stress (0.1)"},
		{Name: "skempton_bjerrum", Words: []string{"no"}, Form: "the pore-pressure coefficient A, 0 to 1.5", Default: "no"},
		{Name: "fluctuating", Words: []string{"no", "yes"}, Default: "no"},
		{Name: "grain", Words: []string{"sand", "fine-silty", "gravel"}, Default: "sand"},
		{Name: "within", Words: []string{"yes", "no"}, Default: "no (yes: settlement at the centre and a corner, and the angular distortion between them)"},
		{Name: "tilt", Words: []string{"yes", "no"}, Default: "no (yes: tilt of the rigid footing under the SLS moment)"},
	},
	KindDifferential: {
		{Name: "spacing", Form: "a length: the centre-to-centre distance between the two footings", Default: "none: required"},
		{Name: "limit", Form: "a number from 0 to 0.1: the limiting angular distortion (1/500)", Default: "1/500 (Bjerrum 1963; EN 1997-1 Annex H)"},
	},
	KindCapacity: {
		{Name: "widths", Form: "a list of lengths (1.0 m, 1.5 m, 2.0 m)", Default: "none: required"},
		{Name: "limit", Form: "a length (settlement limit)", Default: "25 mm"},
		{Name: "drainage", Words: []string{"undrained", "drained", "both"}, Default: "as bearing"},
		{Name: "approach", Form: "FS(factor), e.g. FS(3.0): allowable pressures need an allowable-stress approach", Default: "FS(3.0)"},
		{Name: "local_shear", Words: []string{"auto", "yes", "no"}, Default: "auto"},
		{Name: "two_layer", Words: []string{"auto", "no"}, Default: "auto"},
		{Name: "fs_on", Words: []string{"net", "gross"}, Default: "net (q_a = q_net,ult/FS + q; gross: q_ult/FS)"},
		{Name: "spread", Form: "a number from 0 to 1: the two-layer load-spread gradient, horizontal per vertical", Default: "0.5 (1H:2V)"},
		{Name: "bearing_method", Words: []string{"ec7", "vesic", "meyerhof", "hansen", "terzaghi"}, Default: "ec7"},
		{Name: "settlement_method", Words: []string{"elastic", "consolidation", "schmertmann", "burland-burbidge"}, Default: "chosen from the layers' data"},
		{Name: "stress", Words: []string{"boussinesq", "2:1"}, Default: "boussinesq"},
		{Name: "at", Words: []string{"centre", "corner", "characteristic"}, Default: "centre"},
		{Name: "sublayers", Form: "a count of sublayers over the zone of influence", Default: "40"},
		{Name: "life", Form: "a duration: the design working life for creep and secondary compression", Default: "50 yr (EN 1990 Table 2.1, category 4)"},
		{Name: "schmertmann", Words: []string{"1978", "1970"}, Default: "1978"},
		{Name: "drainage_paths", Words: []string{"auto", "one-way", "two-way"}, Default: "auto (a boundary with a coarse layer or the surface drains)"},
		{Name: "depth", Form: "stress, stress(ratio), width, width(multiple of B) or a length below ground level", Default: "stress (0.1)"},
		{Name: "skempton_bjerrum", Words: []string{"no"}, Form: "the pore-pressure coefficient A, 0 to 1.5", Default: "no"},
		{Name: "fluctuating", Words: []string{"no", "yes"}, Default: "no"},
		{Name: "grain", Words: []string{"sand", "fine-silty", "gravel"}, Default: "sand"},
	},
}

// LookupOption returns the spec of option name in a block of kind k.
func LookupOption(k Kind, name string) (OptionSpec, bool) {
	for _, o := range Options[k] {
		if o.Name == name {
			return o, true
		}
	}
	return OptionSpec{}, false
}

// OptionNames returns the option names of kind k in documentation order.
func OptionNames(k Kind) []string {
	var out []string
	for _, o := range Options[k] {
		out = append(out, o.Name)
	}
	return out
}
