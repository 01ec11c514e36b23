package capacity

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/settle"
)

// Spec declares the capacity block: its own options, the bearing and
// settlement options Table passes on (taken from bearing.Spec and
// settle.Spec, the methods renamed bearing_method and
// settlement_method), and the values at the footing's own width
// (Result.Values).
var Spec = kind.Spec{
	Word:   "capacity",
	Header: kind.On,
	Doc:    "allowable bearing pressure against footing width, the lower of the bearing- and settlement-limited pressures",
	Options: kind.Join(
		[]kind.Option{{Name: "widths", Value: kind.List, Form: "a list of lengths (1.0 m, 1.5 m, 2.0 m)", Default: "none: required",
			Doc: "the footing widths of the table"}},
		settle.Spec.Pick(nil, "limit"),
		bearing.Spec.Pick(nil, "drainage"),
		[]kind.Option{{Name: "approach", Value: kind.Special, Form: "FS(factor), e.g. FS(3.0): allowable pressures need an allowable-stress approach", Default: "FS(3.0)",
			Doc: "the global factor on the bearing resistance"}},
		bearing.Spec.Pick(nil, "local_shear", "two_layer", "fs_on", "spread"),
		bearing.Spec.Pick(map[string]string{"method": "bearing_method"}, "method"),
		settle.Spec.Pick(map[string]string{"method": "settlement_method"}, "method"),
		settle.Spec.Pick(nil, "stress", "at", "sublayers", "life", "schmertmann", "drainage_paths", "depth", "skempton_bjerrum", "fluctuating", "grain"),
	),
	Results: []kind.Result{
		{Symbol: "q_allow", Unit: "kPa", Meaning: "allowable bearing pressure at the footing's width"},
		{Symbol: "q_a_b", Unit: "kPa", Meaning: "bearing-limited allowable pressure"},
		{Symbol: "q_a_s", Unit: "kPa", Meaning: "settlement-limited pressure"},
	},
}

// The capacity block takes the sensitivity option too: what it varies is
// the allowable pressure at the footing's own width (a table has no
// verdict to flip).
func init() {
	Spec.Options = append(Spec.Options, kind.Vary)
	Spec.Results = append(Spec.Results,
		kind.Result{Symbol: "q_allow_at_min", Unit: "kPa", Meaning: "allowable pressure at the footing's width at the least value of the input varied", When: "vary"},
		kind.Result{Symbol: "q_allow_at_max", Unit: "kPa", Meaning: "allowable pressure at the footing's width at the greatest value of the input varied", When: "vary"})
}
