package bearing_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
)

// A pad on firm clay, EN 1997-1 Annex D, DA1: short and long term,
// sliding, the governing case and the summary symbols.
func ExampleCheck() {
	d := 3.141592653589793 / 180
	r, err := bearing.Check(bearing.Input{
		Ground: site.Ground{Water: site.Some(2.0), Layers: []site.Layer{
			{Name: "Made ground", Top: 0, Gamma: 18e3, Phi: site.Some(28 * d)},
			{Name: "Firm clay", Top: 0.6, Gamma: 19e3, GammaSat: site.Some(20e3), Cu: site.Some(75e3), Phi: site.Some(25 * d), C: site.Some(3e3)},
		}},
		Footing: site.Footing{Name: "P1", Shape: site.Rectangle, B: 2.4, L: 3.0, D: 1.0},
		Actions: []site.Action{
			{Name: "Dead", Kind: site.Permanent, V: 950e3, MB: 60e3},
			{Name: "Imposed", Kind: site.Variable, V: 400e3, Psi0: site.Some(0.7)},
			{Name: "Wind", Kind: site.Variable, HB: 35e3, MB: 90e3, Psi0: site.Some(0.5)},
		},
		Options: bearing.Options{Approach: design.DA1()},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	g := r.Cases[r.Governing]
	fmt.Printf("%d bearing cases, %d sliding\n", len(r.Cases), len(r.Sliding))
	fmt.Printf("governing: %s\n", g.Name)
	fmt.Printf("util %.3f, R_d %.0f kN, B' %.2f m\n", g.Util, g.R/1e3, g.B)
	for _, v := range r.Values[:4] {
		fmt.Printf("%s ", v.Symbol)
	}
	fmt.Println()
	// Output:
	// 12 bearing cases, 12 sliding
	// governing: DA1-C2 · Imposed leading · G sup · drained
	// util 0.884, R_d 1662 kN, B' 2.24 m
	// R_d util q_Ed q_Rd
}

// The design bearing pressure of a 2 m square pad on dense sand under a
// vertical central load, DA1: DA1-C2 governs.
func ExampleCapacityAt() {
	d := 3.141592653589793 / 180
	cp, err := bearing.CapacityAt(bearing.Input{
		Ground:  site.Ground{Layers: []site.Layer{{Top: 0, Gamma: 18e3, Phi: site.Some(35 * d)}}},
		Footing: site.Footing{Shape: site.Square, B: 1, D: 1},
	}, 2.0)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("B = %.1f m: q_Rd = %.1f kPa (%s)\n", cp.B, cp.QRd/1e3, cp.Case)
	// Output:
	// B = 2.0 m: q_Rd = 678.2 kPa (DA1-C2 · permanent only · G sup · drained)
}

func ExampleFactors() {
	for _, m := range []bearing.Method{bearing.EC7, bearing.Vesic, bearing.Meyerhof, bearing.Hansen, bearing.Terzaghi} {
		f := bearing.Factors(m, 30*3.141592653589793/180)
		fmt.Printf("%-8s N_c %6.2f  N_q %6.2f  N_gamma %6.2f\n", m, f.Nc, f.Nq, f.Ngamma)
	}
	// Output:
	// ec7      N_c  30.14  N_q  18.40  N_gamma  20.09
	// vesic    N_c  30.14  N_q  18.40  N_gamma  22.40
	// meyerhof N_c  30.14  N_q  18.40  N_gamma  15.67
	// hansen   N_c  30.14  N_q  18.40  N_gamma  15.07
	// terzaghi N_c  37.16  N_q  22.46  N_gamma  19.13
}

func ExampleTerzaghiNgamma() {
	fmt.Printf("%.2f %.2f\n", bearing.TerzaghiNgamma(30*3.141592653589793/180), bearing.TerzaghiNgamma(35.5*3.141592653589793/180))
	// Output: 19.13 49.88
}

func ExampleKpTanDelta() {
	fmt.Printf("%.2f %.2f\n", bearing.KpTanDelta(40*3.141592653589793/180), bearing.KpTanDelta(42*3.141592653589793/180))
	// Output: 5.50 6.99
}

func ExampleCaRatio() {
	fmt.Println(bearing.CaRatio(0.25))
	// Output: 0.7
}
