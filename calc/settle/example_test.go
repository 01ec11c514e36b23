package settle_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// A pad on the invented Riverside Yard site: fill over firm clay over sand.
func riverside() site.Ground {
	return site.Ground{Name: "Riverside Yard", Water: site.Some(2), Layers: []site.Layer{
		{Name: "Fill", Top: 0, Gamma: 18e3, E: site.Some(10e6)},
		{Name: "Firm clay", Top: 0.6, Gamma: 19e3, GammaSat: site.Some(20e3), Cu: site.Some(60e3), Eu: site.Some(30e6),
			Mv: site.Some(0.12e-6), Cv: site.Some(3 / settle.Year)},
		{Name: "Dense sand", Top: 5, Gamma: 20e3, GammaSat: site.Some(21e3), E: site.Some(60e6)},
	}}
}

func ExampleCompute() {
	in := settle.Input{
		Ground:  riverside(),
		Footing: site.Footing{Name: "P1", Shape: site.Rectangle, B: 2.4, L: 3, D: 1},
		V:       site.Some(1350e3), // SLS vertical load, N
		Times:   []float64{0.25 * settle.Year, settle.Year},
	}
	r, err := settle.Compute(in)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("method:", r.Method)
	for _, v := range r.Symbols {
		switch v.Unit {
		case "mm":
			fmt.Printf("%-8s %6.1f mm\n", v.Symbol, v.V*1e3)
		case "kPa":
			fmt.Printf("%-8s %6.1f kPa\n", v.Symbol, v.V/1e3)
		case "yr":
			fmt.Printf("%-8s %6.2f yr\n", v.Symbol, v.V/settle.Year)
		case "":
			fmt.Printf("%-8s %6.2f\n", v.Symbol, v.V)
		default:
			fmt.Printf("%-8s %6.2f %s\n", v.Symbol, v.V, v.Unit)
		}
	}
	for _, p := range r.Curve {
		fmt.Printf("t = %.2f yr: U = %.2f, s = %.1f mm\n", p.T/settle.Year, p.U, p.S*1e3)
	}
	fmt.Println("verifies:", trace.Verify(r.Trace, 1e-9) == nil)
	// Output:
	// method: elastic+consolidation
	// q_SLS     187.5 kPa
	// q_net     169.1 kPa
	// z_inf      8.25 m
	// s_i         9.2 mm
	// s_c        44.4 mm
	// s_sec       0.0 mm
	// s_total    53.6 mm
	// s_lim      25.0 mm
	// util_s     2.14
	// t_50       0.26 yr
	// t_90       1.13 yr
	// t = 0.25 yr: U = 0.49, s = 30.9 mm
	// t = 1.00 yr: U = 0.87, s = 47.9 mm
	// verifies: true
}

func ExampleAllowable() {
	in := settle.Input{Ground: riverside(), Footing: site.Footing{Name: "P1", Shape: site.Rectangle, B: 2.4, L: 3, D: 1}}
	a, err := settle.Allowable(in, 0.025)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("q_allow = %.1f kPa (net %.1f kPa), s = %.2f mm\n", a.Q/1e3, a.QNet/1e3, a.S*1e3)
	// Output: q_allow = 97.9 kPa (net 79.5 kPa), s = 25.00 mm
}

func ExampleDifferential() {
	d, _ := settle.Differential(settle.DiffInput{A: "P1", B: "P2", SA: 0.028, SB: 0.011, Spacing: 6})
	fmt.Printf("β = 1/%.0f, util %.2f, OK %v\n", 1/d.Beta, d.Util, d.OK)
	for _, c := range d.Trace.Cautions {
		fmt.Println(c.Severity, c.Code)
	}
	// Output:
	// β = 1/353, util 1.42, OK false
	// NOTE beta-safe
}

func ExampleU() {
	for _, tv := range []float64{0.05, 0.197, 0.848} {
		u, _ := settle.U(tv)
		fmt.Printf("T_v = %.3f: U = %.3f\n", tv, u)
	}
	// Output:
	// T_v = 0.050: U = 0.252
	// T_v = 0.197: U = 0.500
	// T_v = 0.848: U = 0.900
}

func ExampleTv() {
	t50, _ := settle.Tv(0.5)
	t90, _ := settle.Tv(0.9)
	fmt.Printf("T_50 = %.4f, T_90 = %.4f\n", t50, t90)
	// Output: T_50 = 0.1967, T_90 = 0.8481
}

func ExampleSteinbrenner() {
	f1, f2, _ := settle.Steinbrenner(1, 1) // corner of a square, H = B
	fmt.Printf("F1 = %.3f, F2 = %.3f\n", f1, f2)
	// Output: F1 = 0.142, F2 = 0.083
}

func ExampleParseMethod() {
	m, ok := settle.ParseMethod("burland-burbidge")
	fmt.Println(m, ok)
	// Output: burland-burbidge true
}
