package bearing

import (
	"math"

	"github.com/plinth-calc/plinth/calc/trace"
)

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
//
// The values come from the formula trees the working prints (forms.go),
// evaluated by trace.Eval, so the factors have one definition; outside
// the range, or on an argument that is not a number, a factor is NaN.
func Factors(m Method, phi float64) BearingFactors {
	f := fMain
	n := &f.n
	ev := func(e trace.Expr, in ...trace.Value) float64 {
		v, err := trace.Eval(e, in)
		if err != nil {
			return math.NaN()
		}
		return v
	}
	vphi := trace.Value{Symbol: n.phi, V: phi}
	fNq := f.NqE
	if m == Terzaghi {
		fNq = f.NqT
	}
	nq := ev(fNq, vphi)
	vNq := trace.Value{Symbol: n.Nq, V: nq}
	var nc float64
	switch {
	case phi < 1e-9 && m == Terzaghi:
		nc = ev(f.NcT0)
	case phi < 1e-9:
		nc = ev(f.NcU)
	default:
		nc = ev(f.NcE, vNq, vphi)
	}
	var ng float64
	switch m {
	case EC7:
		ng = ev(f.NgE, vNq, vphi)
	case Vesic:
		ng = ev(f.NgV, vNq, vphi)
	case Meyerhof:
		ng = ev(f.NgM, vNq, vphi)
	case Hansen:
		ng = ev(f.NgH, vNq, vphi)
	case Terzaghi:
		ng = TerzaghiNgamma(phi)
	}
	return BearingFactors{Nc: nc, Nq: nq, Ngamma: ng}
}
