// Package stress computes the vertical stress increase below uniformly
// loaded areas at the underside of a footing: Boussinesq's elastic
// half-space solution for a rectangle (Newmark's corner formula with
// superposition, any point inside or outside), a circle (closed form on
// the axis, numerical integration of the point-load solution elsewhere)
// and a strip (any offset), and the load-spread approximations (2:1 and
// any angle). Net pressure is the gross bearing pressure less the total
// overburden removed.
//
// The low-level functions (Newmark, Rect, Circle, Strip, SpreadRect,
// SpreadStrip, SpreadCircle) return influence factors Δσ_z/q. Influence
// applies them to a site.Footing at a chosen point (centre, corner or the
// characteristic point), and Explain appends the same calculation to a
// trace.Trace with every formula written out in sheet notation, each
// value its formula's (trace.Trace.Eval; the circle's integral as the
// engine function I_circle).
//
// All lengths are metres, stresses pascals, angles radians. Invalid
// geometry returns a *site.RangeError; no function returns NaN.
package stress
