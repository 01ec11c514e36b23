package size

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/settle"
)

// Spec declares the size block: its own options, the bearing and
// settlement options it passes on (from bearing.Spec and settle.Spec, the
// methods renamed bearing_method and settlement_method), and the values
// of Result.Values.
var Spec = kind.Spec{
	Word:   "size",
	Header: kind.On,
	Doc:    "the smallest footing on an increment that passes bearing (short and long term), sliding, the eccentricity limit and settlement",
	Options: kind.Join(
		[]kind.Option{
			{Name: "step", Value: kind.Quantity, Form: "a length: the size increment", Default: "0.05 m",
				Doc: "the increment of B"},
			{Name: "max", Value: kind.Quantity, Form: "a length: the largest width tried", Default: "10 m (the fixed L, if smaller)",
				Doc: "the largest width tried"},
			{Name: "sizes", Value: kind.List, Form: "a list of lengths: the standard sizes allowed, ascending", Default: "none: every step",
				Doc: "standard widths in place of the increment"},
			{Name: "ratio", Value: kind.Number, Form: "a number from 1 to 20: L/B of a rectangle", Default: "the footing's own L, or required for a rectangle without L",
				Doc: "a rectangle of fixed L/B"},
			{Name: "eccentricity", Words: []string{"B/3", "B/6", "none"}, Default: "B/3 (EN 1997-1 6.5.4)",
				Doc: "the limit on e_B/B and e_L/L in every design case"},
			{Name: "settlement", Words: []string{"yes", "no"}, Default: "yes",
				Doc: "the settlement check (no: bearing, sliding and eccentricity only, said in the output)"},
		},
		bearing.Spec.Pick(nil, "drainage", "approach", "local_shear", "sliding", "two_layer", "interface", "delta", "K_s", "r_a", "fs_on", "spread"),
		bearing.Spec.Pick(map[string]string{"method": "bearing_method"}, "method"),
		settle.Spec.Pick(map[string]string{"method": "settlement_method"}, "method"),
		settle.Spec.Pick(nil, "limit", "load", "stress", "at", "rigid", "sublayers", "life", "schmertmann", "drainage_paths", "depth", "skempton_bjerrum", "fluctuating", "grain"),
	),
	Results: []kind.Result{
		{Symbol: "B", Unit: "m", Meaning: "width chosen: the smallest on the increment that passes every check"},
		{Symbol: "L", Unit: "m", Meaning: "length at the chosen width", When: "not a strip or a fixed L"},
		{Symbol: "util", Meaning: "governing utilisation at the chosen width"},
		{Symbol: "util_below", Meaning: "governing utilisation one increment smaller (above 1: it fails)", When: "a smaller width was tried"},
		{Symbol: "B_req", Unit: "m", Meaning: "width at which the governing utilisation reaches 1 (Brent's method)", When: "the solver's answer"},
		{Symbol: "s_total", Unit: "mm", Meaning: "total settlement at the chosen width", When: "settlement = yes"},
	},
}

// ScheduleSpec declares the schedule block: a table of footings sized on
// one ground model with one set of options (SizeSchedule). Its own options
// say the footings' shape and depth; the rest are the size block's. Each
// row's results are NAME.ROW.B, NAME.ROW.util, … (ROW the row's footing
// name in the sheet's symbol form, lower case); the block's are below.
var ScheduleSpec = kind.Spec{
	Word:   "schedule",
	Header: kind.NamedOn,
	Doc:    "a table of footings, each sized as a size block sizes one, with the angular distortion between neighbours",
	Options: kind.Join(
		[]kind.Option{
			{Name: "shape", Words: []string{"square", "circle", "rectangle"}, Default: "none: required",
				Doc: "the plan shape of every footing (a rectangle with ratio)"},
			{Name: "D", Value: kind.Quantity, Form: "a length: the depth of the underside below ground level", Default: "none: required (a row's D column overrides it)",
				Doc: "the depth of every footing"},
			{Name: "beta_limit", Value: kind.Number, Form: "a number in (0, 0.1]: the limiting angular distortion", Default: "1/500 (Bjerrum 1963; EN 1997-1 Annex H)",
				Doc: "the angular distortion allowed between neighbouring footings"},
		},
		Spec.Pick(nil, "step", "max", "sizes", "ratio", "eccentricity", "settlement"),
		Spec.Options[6:],
	),
	Results: []kind.Result{
		{Symbol: "util_max", Meaning: "the highest governing utilisation of any footing at its chosen size"},
		{Symbol: "beta_max", Meaning: "the largest angular distortion between neighbouring footings", When: "settlement = yes"},
		{Symbol: "beta_lim", Meaning: "the limiting angular distortion", When: "settlement = yes"},
	},
	RowResults: RowResults,
}

// RowResults are the results each row of a schedule gives, under
// NAME.ROW.
var RowResults = []kind.Result{
	{Symbol: "B", Unit: "m", Meaning: "width chosen"},
	{Symbol: "L", Unit: "m", Meaning: "length at the chosen width", When: "a rectangle"},
	{Symbol: "util", Meaning: "governing utilisation at the chosen width"},
	{Symbol: "s_total", Unit: "mm", Meaning: "total settlement at the chosen width", When: "settlement = yes"},
}
