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
// by EN 1990:2002 eq. (6.10), factoring each effect of each action — its
// V, H_B, H_L, M_B, M_L — by whether that effect is unfavourable (6.4.3.2(3)
// and Table A1.2(B) note 3, applied to each component of a row rather
// than one factor per row: plinth does not take the option of EN 1997-1
// 2.4.2(9) Note to factor favourable and unfavourable permanent effects
// of a single source alike; factoring them apart is the more onerous). Two
// families of loads per combination:
//
//   - greatest V ("G sup"): downward V unfavourable, upward V favourable;
//   - least V ("G inf", made where any action has H, M or an upward V):
//     downward V favourable, upward V unfavourable.
//
// In both, a horizontal action or moment with the sign of the net
// characteristic value (either sign where the net is zero) is
// unfavourable, one against it favourable. Unfavourable permanent effects
// take γ_G,sup and favourable ones γ_G,inf (always γ_G,inf for an action
// marked favourable), so in the least-V family a permanent thrust or
// moment stays at γ_G,sup while the weights take γ_G,inf ("G inf on V"
// where that makes a difference). Unfavourable variable effects take γ_Q
// (γ_Q·ψ0 when accompanying) and favourable ones are left out (γ_Q = 0);
// a variable action marked favourable is left out of every load. So an
// uplifting variable action is left out of the greatest-V loads (which
// govern bearing under vertical load) and in the least-V loads (which
// govern sliding and uplift; under a strongly inclined or eccentric load
// a least-V load can govern bearing too, and there the uplift is
// unfavourable, raising H/V and e/B), and a row whose components differ — a
// surcharge whose V on the heel resists sliding while its H drives it —
// is split: in the least-V family its V is left out while its H stays.
// A row's moment is one effect, factored by its own sign; a row holding
// both a vertical load with a restoring moment and a thrust with an
// overturning moment should be given as two rows. Every variable action
// with an unfavourable effect in a family leads in turn, so a combination
// has at most two loads per variable action however many there are (not
// every in/out subset: the in/out choice is fixed per effect and family);
// identical loads are listed once. A variable action that gives no ψ0
// takes the approach's Psi0Default (DefaultPsi0 = 0.7 when that is zero),
// and the calculation should say so with a caution (see PsiDefaulted).
//
// Each load is named "DA1-C1 · Wind leading · G inf on V · left out as
// favourable: Imposed; Surcharge V" — approach and combination, leading
// variable action, family, and what was left out as favourable (an
// action, or the components of a split one) — and Load.Record writes its
// working (the factors used, gamma_Q_inf = 0 with what was left out and
// what of a split action stayed, and V_d, H_B_d, H_L_d, M_B_d, M_L_d as
// sums of factored characteristic values, each evaluated from its printed
// sum by the recorder; factors are tabulated or given, trace.Kind) to a
// trace, whose error (t.Err) the caller returns. ServiceLoad leaves
// upward and favourable variable actions out of serviceability loads.
// Characteristic values appear in formulas as V_k_TAG, H_B_k_TAG, ...
// where TAG is the action's name reduced to letters and digits (Tags).
package design
