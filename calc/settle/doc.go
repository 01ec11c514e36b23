// Package settle computes the settlement of shallow foundations: immediate
// (elastic) settlement, one-dimensional consolidation with time, secondary
// compression, the sand methods of Schmertmann and of Burland & Burbidge,
// the allowable bearing pressure for a settlement limit, and differential
// settlement between two footings. It shares site.Ground and site.Footing
// with the bearing engine, works in SI units, and returns every number with
// its working in a trace.Trace that trace.Verify replays.
//
// # Entry points
//
//	Compute(in Input) (*Result, error)              one settlement calculation
//	Allowable(in Input, sLim float64) (*Allow, error) q for s_total(q) = s_lim
//	Differential(in DiffInput) (*Diff, error)       angular distortion check
//	WithinFooting(in Input) (*Within, error)        centre against corner of one footing
//	TiltOf(in TiltInput) (*Tilt, error)             tilt of a rigid footing under moment
//	U(Tv), Tv(U), Steinbrenner(M, N)                 the underlying formulas
//
// # Input
//
// Input holds the ground and footing, the SLS load as the gross bearing
// pressure Q at the underside of the footing or the vertical load V
// (q = V/A, per metre run for a strip), and options:
//
//   - Method: Auto (default), Elastic, Consolidation, Schmertmann,
//     BurlandBurbidge (Combined is what Auto picks for ground with fine
//     layers). The Auto rule: find the zone of influence by the depth rule;
//     if any fine-grained layer (site.Layer.Fine) lies in it, use Combined
//     (immediate settlement of every layer by Steinbrenner, with E_u and
//     ν = 0.5 in fine layers and E′ elsewhere, plus consolidation of the
//     fine layers); otherwise, for granular ground, Schmertmann (1978) if
//     every layer within its strain-influence depth has E′ or q_c, else
//     Burland & Burbidge if every layer to max(2B, B^0.763) has SPT N, else
//     Elastic with the E′ given. The choice is stated in a NOTE.
//   - Stress: stress.Boussinesq (default) or stress.Spread (2:1, or any
//     angle in Spread). At: centre (default), corner, characteristic point.
//     Rigid moves a centre point to the characteristic point (Graßhoff
//     1955), where a flexible footing settles as a rigid one.
//   - Limit (default 25 mm), Times (durations after loading, s), Sublayers
//     (default 40, shared among the layers of the zone in proportion to
//     thickness, at least one each; stresses at mid-depth), Life (design
//     life for secondary compression and creep, default 50 years, EN 1990
//     Table 2.1), Tp (end of primary consolidation; default t_95 per layer).
//   - Depth (zone of influence for the elastic and consolidation methods):
//     DepthStress (default) to where Δσ = 0.1 σ′_v0 (Ratio), found by
//     Brent's method and not less than one width B below the base, capped
//     at 50 B; DepthWidth, k·B below the base (k = 2 for L/B = 1 rising
//     linearly to 4 at L/B ≥ 10 unless given); DepthFixed, to a given depth.
//     Schmertmann uses his diagram depth (2B to 4B), Burland & Burbidge
//     their z_I = B^0.763 (2B where N decreases with depth).
//   - Drainage: auto (a boundary drains at the ground surface and against a
//     coarse-grained layer; the base of the last layer and a boundary with a
//     fine layer do not), one-way, two-way.
//   - SkemptonBjerrum: pore-pressure coefficient A; applies
//     μ = A + α(1 − A) to each consolidating layer (Skempton & Bjerrum
//     1957), α from the elastic centre-line stresses (ν = 0.5) of a circle
//     of equal area, or of the strip for a strip with A replaced by
//     0.866A + 0.211 (plane strain, Scott 1963).
//   - Schmertmann1970, Fluctuating (Burland & Burbidge time factor), Grain
//     (Burland & Burbidge N corrections for silty sand or gravel).
//
// # Methods
//
// Stresses: package stress (Boussinesq by Newmark superposition, circle by
// integration, strip; load spread). Net pressure q_net = q − σ_v0 at the
// base drives all methods except the Burland & Burbidge pressure q′ = q − u.
//
// Immediate: Steinbrenner's (1934) F1, F2 (in the form of Bowles 1996,
// eq. 5-16a) for corner rectangles around the chosen point, layer by layer
// by superposition: s = q_net/E Σ b [(1 − ν²)ΔF1 + (1 − ν − 2ν²)ΔF2]. A
// circle is taken as the square of equal area.
//
// Consolidation: by sublayers, s = m_v Δσ h, or with C_c and e_0,
// h/(1 + e_0)[C_r log(σ′_p/σ′_v0) + C_c log(σ′_f/σ′_p)] in its normally
// consolidated, over-consolidated and crossing forms (σ′_p from sigma'_p,
// else OCR·σ′_v0, else σ′_v0). e_0 is not updated between the two stages:
// H·Δe/(1 + e_0) with both Δe measured from e_0 is exact for the bilinear
// e–log σ′ line. Time: Terzaghi's U(T_v) summed to convergence, T_v(U) by
// Brent's method, t_50 and t_90 per layer and for all layers together.
// Secondary: C_α H/(1 + e_p) log(t/t_p) at the design life.
//
// Sands: Schmertmann (1970; 1978 with the L/B interpolation, C_1, C_2 and
// E_s = 2.5 to 3.5 q_c); Burland & Burbidge (1985: I_c = 1.71/N̄^1.4,
// z_I, f_s, f_l, f_t, q′ ≤ σ′_vo recompression at one third, the N
// corrections they give). Creep (C_2, f_t) at the design life is reported
// as secondary settlement; a sand has no other time dependence.
//
// Net pressure not positive (a compensated raft, a basement): Burland &
// Burbidge's recompression branch applies, s = f_s f_l q′ B^0.7 I_c/3,
// which meets the normally consolidated branch f_s f_l (q′ − ⅔σ′_vo)
// B^0.7 I_c at q′ = σ′_vo, so s is continuous in q. The other methods work
// from q_net alone and have no recompression branch: they report no
// settlement and a note that says so (heave is not modelled). With
// method = auto the choice is made as usual (zone 2B or B^0.763 below the
// base, the deeper).
//
// # Result
//
// Result.Sub is the stress table by sublayer (depth, σ_v0, u_0, σ′_v0, Δσ,
// σ′_f, σ′_p, layer, case, I_z, E, s_i, s_c); Layers the settlement by
// layer with drainage and t_50, t_90; Si, Sc, Ssec, Total; Curve the
// settlement–time points (t, U, s); Limit, Util, OK. The trace writes the
// load, base stresses and zone in full; for each layer one representative
// sublayer (the largest contribution, plus the first of each other
// consolidation case) with every formula, and the layer total as the sum
// of the table column; then totals, time, secondary and the limit check.
// Step.Case names the layer, sublayer or time a step belongs to; cautions
// sit beside the step that raised them.
//
// Every step's value is its formula evaluated by the recorder
// (trace.Trace.Eval), and so is every number that has a step when a
// calculation runs without its working (the quiet trials of Allowable,
// the points of WithinFooting): the printed formula is the number's only
// definition. T_v(U) and U(T_v) are engine functions (trace.Named) printed
// by name and evaluated by Tv's and U's code. A value no formula gives
// says how it was reached (Step.Kind): Given for an input or a default,
// Tabulated for a value of a published diagram or rule (I_z0, I_zp in
// 1970, k), Solved for a root found by Brent's method (z_inf where
// Δσ = η σ′_v0, the composite t_50 and t_90, q_allow and its bracket),
// Summed for a sum over the stress table (a layer's s_c, Σ I_z Δz/E_s,
// α_SB, the secondary settlement at a time of the curve). The stress table
// itself is computed row by row in Go by the same formulas (ccSettle,
// izAt, stein); a representative sublayer's working agrees with its row.
//
// Result.Symbols holds, in this order, the symbols of Spec.Results that
// Compute gives (their units and meanings are there): q_SLS, q_net,
// z_inf, s_i, s_c, s_sec, s_total, s_lim, util_s; t_50, t_90 with
// consolidating layers having c_v; C_1, C_2, I_zp (Schmertmann) or
// N_bar, I_c, z_I, f_s, f_l, f_t (Burland & Burbidge).
//
// Allowable brackets q upward from σ_v0 at the base (no net load),
// doubling the trial net pressure from 100 kPa, and solves s_total(q) =
// s_lim by Brent's method (package solve) to 1 Pa, reporting the bracket,
// every pressure tried, the iterations and the tolerance, with the full
// calculation at q_allow appended to its trace (cases prefixed "at
// q_allow"). The quiet trial calculations keep no steps (their values
// still come from the formulas). Allow.Symbols:
// q_allow, q_net_allow, s_allow, s_lim.
//
// Differential checks β = |s_A − s_B|/L against 1/500 by default, with
// cautions at 1/500 (Bjerrum 1963; EN 1997-1 Annex H), 1/300 and 1/150
// (Skempton & MacDonald 1956). Diff.Symbols: the symbols of DiffSpec.
//
// WithinFooting runs Compute's calculation (without its working) at the
// centre and at a corner of a flexible footing and gives Δs and
// β = Δs/d over the half-diagonal. TiltOf gives the tilt of a rigid
// footing on an elastic half-space under the serviceability moment: the
// rigid circle tan θ = 3(1 − ν²)M/(4ER³) (Borowicka 1943; Poulos & Davis
// 1974), a rectangle as the circle of the same second moment of area
// about the axis of tilt (Richart, Hall & Woods 1970), with the founding
// layer's modulus and a warning for a layered profile.
//
// Invalid input returns *site.RangeError, *site.InputError or
// site.Errors; an input that drives a formula outside its domain (a NaN or
// infinite step) returns that step's *trace.DomainError, wrapped with the
// footing's name. No result holds NaN.
package settle
