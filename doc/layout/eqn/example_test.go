package eqn_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// The bearing capacity factor N_q of EN 1997-1 Annex D (D.4), converted
// for typesetting: the power of a function call prints as tan², the
// division inside it as a stacked fraction.
func ExampleFromExpr() {
	S, N := trace.S, trace.N
	nq := trace.Mul(
		trace.Pow(S("e"), trace.Mul(S("pi"), trace.Fn("tan", S("phi'_d")))),
		trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(S("phi'_d"), N(2)))), N(2)))
	fmt.Println(eqn.String(eqn.FromExpr(nq, eqn.Options{})))
	// Output: e^{π · tan(φ′_{d})} · tan^{2}(45° + {φ′_{d}}/{2})
}

// Substituting values: numbers multiply with ×, a value with a unit is
// bracketed under a power.
func ExampleOptions_subst() {
	S, N := trace.S, trace.N
	e := trace.Mul(N(0.5), S("gamma'"), trace.Pow(S("B'"), N(2)))
	vals := map[string]eqn.Node{"gamma'": eqn.Quantity("9.2", "kN/m3"), "B'": eqn.Quantity("2.2", "m")}
	n := eqn.FromExpr(e, eqn.Options{Subst: func(name string) (eqn.Node, bool) { v, ok := vals[name]; return v, ok }})
	fmt.Println(eqn.String(n))
	// Output: 0.5 × 9.2 kN/m^{3} × (2.2 m)^{2}
}

func ExampleSplit() {
	for _, name := range []string{"q_ult_net", "phi'_d", "gamma_sat", "F1.R_d", "sigma_v'", "gamma_phi'", "Delta_sigma'_v"} {
		p := eqn.Split(name)
		fmt.Printf("%s: prefix %q base %q primes %d sub %q\n", name, p.Prefix, p.Base, p.Primes, p.Sub)
	}
	// Output:
	// q_ult_net: prefix "" base "q" primes 0 sub "ult,net"
	// phi'_d: prefix "" base "φ" primes 1 sub "d"
	// gamma_sat: prefix "" base "γ" primes 0 sub "sat"
	// F1.R_d: prefix "F1" base "R" primes 0 sub "d"
	// sigma_v': prefix "" base "σ" primes 0 sub "v′"
	// gamma_phi': prefix "" base "γ" primes 0 sub "φ′"
	// Delta_sigma'_v: prefix "" base "Δσ" primes 1 sub "v"
}
