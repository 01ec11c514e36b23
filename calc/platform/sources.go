package platform

import (
	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Sources. BR 470 itself is the source the bearing package already cites
// (key "BR470"); the method's equations are cited to its Appendix A.
//
// What was read, and where from (the report itself was not available to
// read; see doc.go):
//
//   - The cohesive-subgrade equation R_d = c_u N_c s_c + γ_p D² K_p tanδ
//     s_p/W, its thickness form D = √(W(q_d − c_u N_c s_c)/(γ_p K_p tanδ
//     s_p)), N_c = π + 2, and the shape factors s_c = 1 + 0.2W/L, s_p = 1 +
//     W/L, s_γ = 1 − 0.3W/L: from memory, confirmed against two
//     independent public reproductions of BR 470 Appendix A (source files
//     of working-platform design aids in public repositories). They are
//     Meyerhof's (1974) punching equation for a footing at the surface of
//     a sand layer over clay, with BR 470's shape factors.
//   - The granular-subgrade equation R_d = 0.5 γ_s W N_γs s_γ + γ_p D² K_p
//     tanδ s_p/W: as printed in one public reproduction; the factor
//     (1 + 2D/W) on its punching term was recalled from memory and is not
//     in that reproduction, so it is an option (Options.DepthTerm), off.
//   - K_p tanδ against φ′_p: BR 470 Table A2 (35°: 3.1, 40°: 5.5, 45°:
//     10.0), read through bearing.KpTanDelta (see calc/bearing/tables.go).
//   - N_γ: BR 470 Table A1 as reproduced publicly (25°: 10.9, 30°: 22.4,
//     35°: 48, 40°: 109, 45°: 272, 50°: 763) agrees at every printed figure
//     with Vesić's N_γ = 2(N_q + 1) tanφ′, which plinth evaluates.
//   - Load factors: 1.6 (case 1) and 1.2 (case 2) with a platform, 2.0
//     and 1.5 for the subgrade alone: the first pair from memory, both
//     pairs confirmed against one public reproduction of the method's
//     factor table; a published letter on the method (Ground
//     Engineering, 2006, printed by New Civil Engineer, letter 539870)
//     states that its factors range from 1.2 to 2.0 by loading case and
//     by whether a platform is present, and are its only partial factors
//     other than 1.0 (so φ′ and c_u enter unfactored). BR 470's lower factors where the track pressures are
//     well known were recalled from memory without their values: enter
//     them as Case.Factor.
//   - Limits: 0.3 m least thickness (from memory, and in one public
//     reproduction); D ≤ 1.5W (from memory, and as coded in one public
//     reproduction; 2W has also been recalled); c_u from 20 to 80 kPa
//     (from memory, and as quoted in a public design calculation: below 20
//     kPa special measures are needed, above 80 kPa the subgrade in many
//     cases carries the plant unaided); platform φ′ from 35° to 45° (the
//     range of Table A2; material below 35° is unsuitable, as one public
//     reproduction of Table B3 prints).
var (
	SrcBR470 = bearing.SrcBR470
	// SrcMeyerhof1974 is the punching-shear model of a sand layer over
	// clay the method is built on (citation from memory).
	SrcMeyerhof1974 = trace.Source{Key: "Meyerhof1974", Citation: "Meyerhof, G. G. (1974) Ultimate bearing capacity of footings on sand layer overlying clay. Canadian Geotechnical Journal, 11(2), 223–229 (volume and pages from memory)."}
	// SrcLook2016 states that the method does not apply for thick
	// platforms or soft subgrades.
	SrcLook2016 = trace.Source{Key: "LookHoneyfield2016", Citation: "Look, B. & Honeyfield, N. (2016) Working platforms – to BRE or not to BRE is the question. Australian Geomechanics, March 2016 (abstract: the BRE design method does not apply for thick platforms or for soft subgrades)."}
	SrcVesic    = bearing.SrcVesic1973
	SrcBrent    = trace.Brent1973
)

var (
	refCoh     = trace.Ref{Source: SrcBR470, Clause: "Appendix A, cohesive subgrade (after Meyerhof 1974)"}
	refGran    = trace.Ref{Source: SrcBR470, Clause: "Appendix A, granular subgrade"}
	refShape   = trace.Ref{Source: SrcBR470, Clause: "Appendix A, shape factors"}
	refFactors = trace.Ref{Source: SrcBR470, Clause: "Appendix A, load cases 1 and 2 and their factors"}
	refLimit   = trace.Ref{Source: SrcBR470, Clause: "Appendix A, bearing resistance of the platform material"}
	refKp      = trace.Ref{Source: SrcBR470, Clause: "Table A2, K_p·tanδ against φ′_p"}
	refNg      = trace.Ref{Source: SrcVesic, Clause: "N_γ = 2(N_q + 1) tanφ′ (the values of BR 470 Table A1)"}
	refNc      = trace.Ref{Source: SrcBR470, Clause: "Appendix A, N_c = π + 2"}
	refDMin    = trace.Ref{Source: SrcBR470, Clause: "Appendix A, least platform thickness 0.3 m (from memory)"}
	refDMax    = trace.Ref{Source: SrcBR470, Clause: "Appendix A, range of the method: D ≤ 1.5W (from memory)"}
	refCu      = trace.Ref{Source: SrcBR470, Clause: "Appendix A, range of the method: 20 kPa ≤ c_u ≤ 80 kPa (from memory)"}
	refThick   = trace.Ref{Source: SrcLook2016, Clause: "abstract"}
	refSolve   = trace.Ref{Source: SrcBrent, Clause: "ch. 4, procedure zero"}
)
