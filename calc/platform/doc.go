// Package platform designs granular working platforms for tracked plant by
// the method of BRE report BR 470 (2004), Appendix A, and checks outrigger
// mats and crane pads, with the full working as a trace the document
// prints.
//
// # Entry points
//
//	Design(in Input) (*Result, error)      the platform block: thickness solved for or checked
//	Mat(in MatInput) (*MatResult, error)   an outrigger mat or crane pad: sized or checked, stress at the subgrade
//	ComparisonInput, GroundModel, TrackFooting   the EN 1997-1 two-layer check of the same case (calc/bearing)
//
// # The method
//
// A loaded area W × L (a track's width and bearing length, or a mat) at
// the surface of a platform of thickness D punches through it into the
// subgrade (Meyerhof 1974). Over a cohesive subgrade
//
//	R_d = c_u N_c s_c + γ_p D² K_p tanδ s_p / W
//
// and over a granular one
//
//	R_d = 0.5 γ_s W N_γs s_γ + γ_p D² K_p tanδ s_p / W
//
// (Options.DepthTerm multiplies the punching term by (1 + 2D/W), a form
// recalled from memory, not confirmed), with N_c = π + 2, s_c = 1 + 0.2W/L,
// s_p = 1 + W/L, s_γ = 1 − 0.3W/L, K_p tanδ from BR 470 Table A2 against
// the platform's φ′_p (bearing.KpTanDelta) and N_γ = 2(N_q + 1) tanφ′
// (Vesić 1973; it gives the values of BR 470 Table A1). R_d is at most the
// platform material's own resistance R_p = 0.5 γ_p W N_γp s_γ.
//
// Each loading case (case 1: the operator cannot help recovery from a
// failure; case 2: the operator can control the load) has its pressure
// q_k, its W and L, and two load factors: γ_q with a platform (1.6 and
// 1.2) and γ_q0 for the subgrade alone (2.0 and 1.5). For each case the
// engine records the subgrade alone (R_s, and util_0 = γ_q0 q_k/R_s: above
// 1 a platform is needed), the platform material alone (R_p: if q_d = γ_q
// q_k exceeds it no thickness carries the case, a warning), and the
// thickness D_req at which R_d = q_d, found by Brent's method (calc/solve)
// on the printed formula. The design thickness is the largest D_req and
// D_min = 0.3 m, rounded up to Options.Step if given; a given thickness
// is checked instead. At it every case is checked: R_d = min(R_pu, R_p),
// util = q_d/R_d.
//
// Cautions: c_u below 20 kPa (outside the method: a warning) or above 80
// kPa (a note); φ′_p outside the 35°–45° of Table A2 (K_p tanδ
// extrapolated; material below 35° unsuitable); D above D_max = 1.5W
// (the method does not apply for thick platforms); a given D below
// D_min; a case the material cannot carry; the subgrade as strong as the
// platform; no platform needed; the granular form used.
//
// Which values were read from the method's public reproductions and
// which are from memory is set out in sources.go; BR 470 itself was not
// available to read.
//
// # EN 1997-1 comparison
//
// Beside the method, each case is checked as a footing W × L on the
// platform-over-subgrade ground at the design thickness by calc/bearing
// (EN 1997-1 Annex D with Meyerhof & Hanna's two-layer check), the
// action V = q_k·W·L characteristic. Its result is CaseResult.EC7 with
// its own trace; Options.EC7 sets the action's kind and the bearing
// options, and Off leaves it out.
//
// # Summary values (Result.Values, in this order)
//
//	D                design thickness (m)
//	D_req            largest thickness the cases need (m; 0 when none)
//	D_min            least thickness (m)
//	D_max            largest thickness the method is used for, the least over the cases (m)
//	platform_needed  1 when some case needs a platform, else 0
//	util             governing utilisation at D
//	then for each case n = 1, 2:
//	q_dn, R_sn, R_pn, R_dn (kPa), util_n, util_0_n, and util_EC7_n when the comparison was made
//
// # Mats
//
// Mat takes an outrigger (or crane pad) load F on a mat B × L (square, a
// fixed L/B, or a fixed L) with its own weight, and either checks the
// bearing pressure q = (F + W_m)/(B L) against an allowable pressure or
// sizes the mat for it (Brent's method), then gives the stress at the
// subgrade below the platform: the average by load spread (2:1 unless an
// angle is given) and the Boussinesq stress under the centre (Newmark's
// rectangle), both by calc/stress. MatResult.Case turns the mat into a
// loading case of Design.
package platform
