package site

import "github.com/plinth-calc/plinth/calc/kind"

// GroundSpec declares the ground block: the statements and the option
// that fill a Ground beside its layer table.
var GroundSpec = kind.Spec{
	Word:   "ground",
	Header: kind.Named,
	Doc:    "a ground model: layers from ground level down, and groundwater",
	Options: []kind.Option{
		{Name: "platform", Words: []string{"no", "yes"}, Default: "no",
			Doc: "yes: the first layer is a granular working platform laid on the layer below it (Ground.Platform)"},
	},
	Statements: []kind.Option{
		{Name: "water", Value: kind.Quantity, Form: "a length", Default: "none: no groundwater",
			Doc: "depth of the water table below ground level; negative for free water above it, down to −50 m"},
		{Name: "gamma_w", Value: kind.Quantity, Form: "a unit weight", Default: "9.81 kN/m3",
			Doc: "unit weight of water, with water"},
	},
}

// FootingSpec declares the footing block: the word options and the
// statements that fill a Footing beside its table of actions.
var FootingSpec = kind.Spec{
	Word:   "footing",
	Header: kind.Named,
	Doc:    "a shallow footing: shape, size, depth and its characteristic actions",
	Options: []kind.Option{
		{Name: "shape", Words: []string{"strip", "square", "rectangle", "circle"}, Default: "none: required",
			Doc: "the plan shape"},
		{Name: "self_weight", Words: []string{"auto", "no"}, Default: "no (the actions include it)",
			Doc: "auto: the engine adds the weight of the footing and the backfill over it as a permanent action"},
	},
	Statements: []kind.Option{
		{Name: "B", Value: kind.Quantity, Form: "a length", Default: "none: required", Doc: "width (diameter of a circle)"},
		{Name: "L", Value: kind.Quantity, Form: "a length", Default: "none: required for a rectangle (B on a square)", Doc: "length of a rectangle"},
		{Name: "D", Value: kind.Quantity, Form: "a length", Default: "none: required", Doc: "depth of the underside below ground level"},
		{Name: "alpha", Value: kind.Quantity, Form: "an angle", Default: "0", Doc: "inclination of the base"},
		{Name: "h", Value: kind.Quantity, Form: "a length", Default: "D", Doc: "thickness of the footing, for its self-weight"},
		{Name: "gamma_c", Value: kind.Quantity, Form: "a unit weight", Default: "24 kN/m3", Doc: "unit weight of the footing, with self_weight = auto"},
	},
}
