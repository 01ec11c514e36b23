package bearing

import "math"

// BearingFactors are the bearing capacity factors of one method at one φ′.
type BearingFactors struct {
	Nc, Nq, Ngamma float64
}

// Factors returns N_c, N_q and N_γ of method m at φ′ (radians, 0 ≤ φ′ <
// 50°). At φ′ = 0 N_c is its limit: π + 2 (Prandtl 1921) for every method
// but Terzaghi's, 1.5π + 1 (Terzaghi 1943).
//
//   - EC7: EN 1997-1:2004 Annex D, D.4: N_q = e^(π tanφ′) tan²(45° + φ′/2),
//     N_c = (N_q − 1) cot φ′, N_γ = 2(N_q − 1) tan φ′.
//   - Vesic: Vesić (1973) eq. (14): N_γ = 2(N_q + 1) tan φ′.
//   - Meyerhof: Meyerhof (1963): N_γ = (N_q − 1) tan(1.4φ′).
//   - Hansen: Brinch Hansen (1970): N_γ = 1.5(N_q − 1) tan φ′.
//   - Terzaghi: Terzaghi (1943): N_q = a²/(2cos²(45° + φ′/2)),
//     a = e^((3π/4 − φ′/2) tanφ′); N_γ of Kumbhojkar (1993) as tabulated
//     by Das (2011) Table 3.1, interpolated linearly.
func Factors(m Method, phi float64) BearingFactors {
	t := math.Tan(phi)
	var nq float64
	if m == Terzaghi {
		nq = math.Exp(2*(0.75*math.Pi-phi/2)*t) / (2 * math.Pow(math.Cos(math.Pi/4+phi/2), 2))
	} else {
		nq = math.Exp(math.Pi*t) * math.Pow(math.Tan(math.Pi/4+phi/2), 2)
	}
	var nc float64
	if phi < 1e-9 {
		nc = math.Pi + 2
		if m == Terzaghi {
			nc = 1.5*math.Pi + 1
		}
	} else {
		nc = (nq - 1) / t
	}
	var ng float64
	switch m {
	case EC7:
		ng = 2 * (nq - 1) * t
	case Vesic:
		ng = 2 * (nq + 1) * t
	case Meyerhof:
		ng = (nq - 1) * math.Tan(1.4*phi)
	case Hansen:
		ng = 1.5 * (nq - 1) * t
	case Terzaghi:
		ng = TerzaghiNgamma(phi)
	}
	return BearingFactors{Nc: nc, Nq: nq, Ngamma: ng}
}
