// Package site holds the engine's shared inputs: the ground model (layers
// by depth, groundwater), the footing (shape, size, depth) and the
// characteristic actions on it. Every value is SI: metres, newtons, pascals,
// N/m³ for unit weights, radians for angles, m²/s for c_v, 1/Pa for m_v.
//
// Each field documents its valid range; Validate returns every value out of
// range as a *RangeError naming the parameter, its value and the range, in
// display units. Optional parameters use Opt so "not given" is never a NaN.
//
// Ground.Overburden is the one formula of the total vertical stress the
// engines print (σ_v0 = γ_w·h_w0 + Σ γ_i·h_i + Σ γ_sat,i·h_w,i), so the
// bearing and settlement working of a footing share one step for it.
package site
