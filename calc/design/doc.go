// Package design holds partial-factor sets and design approaches as data,
// and combines characteristic actions into design loads.
//
// The sets of EN 1997-1:2004 Annex A (A1, A2 on actions, Table A.3; M1, M2
// on soil parameters, Table A.4; R1, R2, R3 on the resistances of spread
// foundations, Table A.5) and the design approaches of 2.4.7.3.4 (DA1 with
// combinations C1 = A1+M1+R1 and C2 = A2+M2+R1; DA2 = A1+M1+R2; DA3 =
// A1 (structural actions) + M2 + R3) are returned by Recommended. An
// allowable-stress approach with a global factor of safety is the Approach
// returned by FS. Every type carries yaml and json tags, so the document
// layer can load a national annex or a firm's own sets from a file into an
// Annex and hand the chosen Approach to the engine unchanged; every result
// names the approach and combination it used.
//
// Loads combines the characteristic actions of a footing for one approach
// by EN 1990:2002 eq. (6.10): permanent actions at γ_G,sup (γ_G,inf for an
// action marked favourable), each variable action leading in turn at γ_Q,
// the others at γ_Q·ψ0. Where a lower vertical load is more onerous
// (horizontal load or moments present: eccentricity, inclination,
// sliding) it adds combinations with the permanent actions at γ_G,inf and
// the purely vertical variable actions left out as favourable (γ_Q = 0).
// A variable action that gives no ψ0 takes the approach's Psi0Default
// (DefaultPsi0 = 0.7 when that is zero), and the calculation should say so
// with a caution (see PsiDefaulted).
//
// Each load is named "DA1-C2 · Imposed leading · G sup" — approach and
// combination, leading variable action, and which permanent factor — and
// Load.Record writes its working (the factors used and V_d, H_B_d, H_L_d,
// M_B_d, M_L_d as sums of factored characteristic values) to a trace.
// Characteristic values appear in formulas as V_k_TAG, H_B_k_TAG, ...
// where TAG is the action's name reduced to letters and digits (Tags).
package design
