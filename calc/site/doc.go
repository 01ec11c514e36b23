// Package site holds the engine's shared inputs: the ground model (layers
// by depth, groundwater), the footing (shape, size, depth) and the
// characteristic actions on it. Every value is SI: metres, newtons, pascals,
// N/m³ for unit weights, radians for angles, m²/s for c_v, 1/Pa for m_v.
//
// Each field documents its valid range; Validate returns every value out of
// range as a *RangeError naming the parameter, its value and the range, in
// display units. Optional parameters use Opt so "not given" is never a NaN.
package site
