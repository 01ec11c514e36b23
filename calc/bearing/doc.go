// Package bearing computes the bearing and sliding resistance of shallow
// foundations, with the full working as a trace the document prints.
//
// # Entry points
//
//	Check(in Input) (*Result, error)        the bearing block: every case, sliding, summary
//	CapacityAt(in Input, B float64) (*Capacity, error)  pressure a width can carry (capacity block)
//	Factors(m Method, phi float64) BearingFactors        N_c, N_q, N_γ of a method
//
// Input holds the ground (site.Ground), the footing (site.Footing), the
// characteristic actions ([]site.Action, at the underside of the footing,
// per metre run for a strip) and Options: Drainage (auto, undrained,
// drained, both), Method (ec7, vesic, meyerhof, hansen, terzaghi),
// Approach (a design.Approach: DA1, DA2, DA3 or FS(x), or one loaded from
// a national-annex file), LocalShear, Sliding and TwoLayer (auto, yes,
// no), Interface (base friction δ, and whether water or air can reach the
// interface), SpreadTan, and optional overrides Ks and CaRatio. All values
// are SI. Out-of-range input returns site.Errors of *site.RangeError and
// *site.InputError; the engine does no I/O and never returns NaN or Inf: a
// step whose formula cannot be evaluated with the values reached (an
// action so large that a pressure overflows) is the trace's
// *trace.DomainError, returned wrapped with the case it arose in.
//
// # Working
//
// Each step's value is its printed formula evaluated by the trace's
// recorder (trace.Trace.Eval): the formula trees of forms.go and the
// package-level trees beside each check are the only definition of the
// numbers, and Factors, CaRatio and the strip capacities that pick the
// weaker layer evaluate the same trees. A step no formula gives says its
// kind (trace.Trace.Take): given (an input, a default, a factor the method
// takes as 1), interpolated (Kumbhojkar's N_γ table, BR 470's K_p·tanδ).
// The two-layer check works its numbers dry (computed, not recorded)
// through the same steps to decide whether the lower layer is weaker,
// then records them.
//
// # Cases
//
// design.Loads combines the actions for each combination of the approach
// (each variable action leading in turn, each effect factored by whether
// it is unfavourable, a greatest-V and a least-V family; see its
// documentation). Bearing and sliding are each governed by their case of
// highest utilisation among all loads. Each load is checked under each
// drainage condition that applies: undrained (short term: fine-grained
// layers with c_u act undrained, in total stress; coarse layers drained)
// and drained (long term, effective stress). Auto gives both when the
// founding layer, or a layer starting within 2B below the base, is
// fine-grained, else drained. A case is named by its load and drainage —
// "DA1-C2 · Imposed leading · G sup · drained" — and every step it records
// carries that name in Step.Case; steps with Case "" (footing, overburden,
// unit weight) are common to all. Sliding cases are named "… · sliding
// drained". Result.Governing is the case of highest utilisation and
// Result.GoverningDrainage says whether the short or the long term
// governs; Result.GoverningSliding likewise for sliding.
//
// # Methods
//
// ec7: EN 1997-1:2004 Annex D, D.3 (undrained) and D.4 (drained), every
// b, s, i factor and the exponent m = m_L cos²θ + m_B sin²θ for H at θ to
// L′; no depth factors. vesic: Vesić (1973, 1975) with Hansen's depth
// factors, as tabulated by Bowles (1996). meyerhof: Meyerhof (1963) with
// his shape, depth and inclination factors. hansen: Brinch Hansen (1970)
// with exponents 5 on i_q and i_γ and the additive φ = 0 form. terzaghi:
// Terzaghi (1943), N_γ from Kumbhojkar's (1993) evaluation as tabulated
// by Das (2011) Table 3.1 (named in the trace), shape factors 1.3 and
// 0.8 (square) or 0.6 (circle), rectangles interpolated (common
// practice), Meyerhof's inclination factors for inclined loads (with a
// caution). Eccentric loads use Meyerhof's effective area B′ = B − 2e_B,
// L′ = L − 2e_L (B′ the shorter); a circle uses the circular segment inside
// the resultant's chord and its equivalent rectangle (API RP 2GEO, after
// API RP 2A), which for a central load is the square of equal area.
//
// Overburden is Σγh of the layers above the base (γ_sat below the water
// table): q in total stress, q′ = q − u_0 in effective stress. The unit
// weight of the N_γ term follows the three water-table cases of Das
// (2011): water at or above the base γ′ = γ_sat − γ_w; at d < B below it
// γ′ + (d/B)(γ − γ′); deeper, γ.
//
// Design values: φ′_d = atan(tan φ′_k/γ_φ′), c′_d = c′_k/γ_c′, c_u,d =
// c_u,k/γ_cu; R_d = R_k/γ_Rv; util = V_d/R_d. For an FS approach the
// actions and parameters are characteristic and R_d = A′[(q_ult −
// q0)/FS + q0] with q0 the overburden of the formula (q or q′).
//
// # Layers below the base (governing-layer rule)
//
// The founding layer (the layer at depth D) supplies the parameters.
// Layers starting within 2B below the base are compared by Meyerhof &
// Hanna's (1978) strip capacity q = cN_c + ½γBN_γ (undrained: N_c c_u):
// the weakest one with q_2 < q_1 is checked as the lower layer of a
// two-layer system and a caution says so; stronger layers are ignored
// (conservative). With two_layer = no a weaker layer raises a CAUTION and
// is not checked.
//
// Two layers, stronger over weaker: Meyerhof & Hanna (1978), in the
// rectangular form given by Das (2011),
//
//	q_u = q_b + (1 + B′/L′)[2c_a H_1/B′ + γ_1 H_1²(1 + 2D/H_1) K_s tanφ′_1/B′]·i_p − γ_1 H_1 ≤ q_t,
//
// with q_b the lower layer's resistance at its top (shape and inclination
// factors of the method, no depth factor) and q_t the upper layer's own.
// K_s is read as K_s tanφ′_1 = K_p tanδ from BR 470 (2004) Table A2
// (35°: 3.1, 40°: 5.5, 45°: 10.0, confirmed against public reproductions
// of the table; interpolated log-linearly in φ′, extrapolated with a
// warning outside 35°–45°); plinth takes these values to sit on the low,
// conservative side of Meyerhof & Hanna's chart (as for q_2/q_1 → 0).
// c_a/c_1 is read from Meyerhof & Hanna's chart as the straight line
// 0.6 + 0.4·(q_2/q_1): that reading is still from memory (a published
// worked example suggests it is on the low, safe side; see CaRatio). Both
// may be replaced by Options.Ks and Options.CaRatio. For inclined
// loads the punching terms are multiplied by i_p = (1 − β/90°)² (plinth's
// simplification, with a note). Beside it, the lower layer is checked
// under the load spread through the upper layer at SpreadTan (default
// 1H:2V, common practice) as a footing B_s × L_s at its top; a failing
// spread check raises a CAUTION but does not change R_d.
//
// # Water pressure and net pressure (one convention)
//
// Drained cases are effective-stress checks throughout: where the
// groundwater stands above the base, the water pressure on the base
// U = u_0·A_b (design groundwater level, unfactored) is deducted from the
// design vertical action, V_d = V_d,tot − U, before the eccentricity, the
// inclination factors and q_Ed = V_d/A′ are found, as it is for sliding
// (V′_d, 6.5.3); the trace records V_d,tot, U and V_d. Undrained cases are
// total-stress checks and compare the total V_d. "Net pressure" means the
// gross total pressure less the total overburden at founding level,
// q_net = q − σ_v0, which in effective terms is the same number
// q′ − σ′_v0; settlement uses it, the allowable-stress resistance is
// q_net,ult/FS plus the overburden (q′ drained, effective; q undrained),
// and the capacity table reports gross total pressures (a drained case's
// effective pressure plus u_0), so the table, the footing's own check and
// the settlement all compare like with like. With FSOnGross (fs_on =
// gross) an allowable-stress approach divides the gross ultimate pressure
// instead, q_a = q_ult/FS (drained: the gross total q′_ult + u_0 over FS,
// less u_0), as in the textbooks that do so (common practice); for FS > 1
// it gives the lower pressure.
//
// # Founding stratum and factor rules
//
// A founding layer named made ground, fill or topsoil raises a CAUTION
// (its nominal parameters do not assure the resistance), and so does a
// founding layer less than B/4 thick below the base with a layer under it
// (a two-layer mechanism through a skin of fill means little; the layer
// below governs). Meyerhof's (1963) s_q, s_γ, d_q, d_γ are given for
// φ′ > 10° and as 1 at φ′ = 0: plinth takes 1 for a case's φ′ ≤ 10° (no
// interpolation) and a NOTE says so. The depth factors of Meyerhof,
// Hansen and Vesić used with EN 1997-1 partial factors raise a NOTE:
// Annex D has none. Defaults the working takes (γ_w, δ/φ′, the load
// spread n_s, ψ0) are input steps whose note says "assumed, default".
//
// # Local shear
//
// A named method keeps its result. Terzaghi's (1943) c* = 2/3 c,
// tan φ* = 2/3 tan φ are applied to the founding layer when local_shear =
// yes, with any method; the result is then that method "with Terzaghi's
// local-shear reduction" (Result.LocalShear). With auto (the default) the
// criterion for sand is relative density, the local and punching shear
// region of Vesić's (1973) failure-mode chart at any embedment: loose or
// very loose sand (density index I_D < 0.35, EN ISO 14688-2:2004 Table 4;
// or, without I_D, SPT N < 10, Terzaghi & Peck 1948) raises a warning
// (local-shear-advised) that recommends the local-shear check and keeps
// the general-shear result; medium-dense sand (0.35 ≤ I_D < 0.65,
// 10 ≤ N < 30) a transitional warning. Vesić's chart does not classify
// clay: soft clay (c_u < 40 kPa, EN ISO 14688-2:2004 Table 5), which
// Terzaghi (1943) treats as failing in local shear, raises the same
// warning. Only method = terzaghi applies the reduction under
// auto, to loose sand and soft clay, as Terzaghi (1943) does for ground
// that fails in local shear; the caution says so.
//
// # Sliding
//
// EN 1997-1 6.5.3: drained R_d = V′_d tanδ_d/γ_Rh with V′_d = V_d − u_0 A
// and δ_d = k_δ φ′_cv,d (k_δ = 1 cast in situ, 2/3 smooth precast,
// 6.5.3(10), which bases δ_d on the design critical-state angle; the
// clause is quoted from memory), φ′_cv,d = atan(tan φ′_cv,k/γ_φ′) as for
// φ′. Without φ′_cv the peak φ′ is used and a warning (slide-phi-cv) says
// the resistance may be high by tan φ′_d/tan φ′_cv,d. A given δ is a
// characteristic δ_k, δ_d = atan(tan δ_k/γ_φ′); undrained R_d = A′c_u,d/γ_Rh, not more than 0.4 V_d unless
// Interface.Sealed (6.5.3(12)P). Passive resistance is ignored.
//
// # Summary values
//
// Result.Values holds the symbols of Spec.Results, in that order, with
// their units and meanings there: R_d and util of the governing case,
// its pressures, actions and effective geometry (no e_L, L' for a
// strip), util_u and util_dr when such cases were checked, and the _h
// values of the governing sliding case when sliding was checked.
//
// # Cautions (trace.Caution.Code)
//
// allowable, da3-actions, psi0-default, phi-high (φ′ > 40°), water-above-
// ground (free water above ground level), water-above-base, water-within-B,
// layers-in-zone, weaker-layer, layer-no-strength, local-shear,
// local-shear-advised, local-shear-off, local-shear-transitional,
// density-unknown,
// undrained-coarse, drained-missing, undrained-missing, base-tilt,
// terzaghi-incl, terzaghi-circle, circle-area, uplift (V_d ≤ 0), ecc-out
// (resultant outside the base), ecc-b6 (e > B/6: part of the base lifts),
// ecc-kern (rectangle: e_B/B + e_L/L > 1/6 with each ratio within 1/6,
// outside the rhombic kern; Gere & Timoshenko, Mechanics of Materials,
// core of a rectangular section), ecc-b3 (e > B/3, EN 1997-1 6.5.4), hv-large (H/V > 0.3), hc-limit
// (H > A′c_u), ks-extrapolated, two-layer-inclined, spread-fails,
// slide-04V, slide-phi-cv (no φ′_cv for drained sliding), governing,
// governing-sliding.
//
// # Symbols
//
// Every formula uses sheet notation: B, L, D, alpha, B', L', A', e_B, e_L,
// R, e, b_e, l_e (circle), H_d, V_d, H_B_d, M_B_d, beta (load inclination
// from vertical), theta (H to L′), k (depth ratio), sigma_v0, u_0,
// sigma'_v0, gamma_1, h_1, gamma_sat,1, h_w,1 … (the layers above the base,
// site.Ground.Overburden), gamma_w, h_w0, z_w,
// gamma, gamma_sat, gamma'_k, gamma', q, q', phi'_k, phi'_d, c'_k, c'_d,
// c_u_k, c_u_d, gamma_phi, gamma_c, gamma_cu, gamma_Rv, gamma_Rh, N_c,
// N_q, N_gamma, K_p, s_c, s_q, s_gamma, d_c, d_q, d_gamma, i_c, i_q,
// i_gamma, b_c, b_q, b_gamma, s'_c, d'_c, i'_c, b'_c (Hansen, φ = 0), m,
// m_B, m_L, q_ult, R_k, R_d, q_Ed, q_Rd, util; two-layer: H_1, z_2,
// gamma_1, phi'_2k, phi'_2, c'_2, c_u_2, gamma'_2, q_H, q'_H, N_c_2 … (the
// lower layer's factors), q_b, q_1, q_2, r_q (= q_2/q_1), K_p_tan_delta,
// K_s, r_a (= c_a/c_1), c_a, s_p, i_p, q_u, q_lim, n_s, B_s, L_s, A_s,
// q_Ed_s, q_ult_s (and its factors …_s), q_Rd_s, util_s; sliding:
// phi'_k, phi'_d, phi'_cv_k, phi'_cv_d, k_delta, delta_k, delta_d, A_b,
// U, V'_d, R_h_d, FS_s, util_h;
// actions (package design): V_k_TAG, H_B_k_TAG …, gamma_G_sup,
// gamma_G_inf, gamma_Q, psi_0_TAG.
package bearing
