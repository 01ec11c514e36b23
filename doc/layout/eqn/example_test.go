package eqn_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// The bearing capacity factor N_q of EN 1997-1 Annex D (D.4), built by
// hand (compose converts the engine's formulas into such trees): the
// power of a function call prints as tan², the division inside it as a
// stacked fraction.
func ExampleString() {
	phi := eqn.Sym{Name: "phi'_d"}
	nq := eqn.Row{
		eqn.Script{Base: eqn.Sym{Name: "e"}, Sup: eqn.Row{eqn.Sym{Name: "pi"}, eqn.Op{Text: "·"}, eqn.Func{Name: "tan", Args: []eqn.Node{phi}}}},
		eqn.Op{Text: "·"},
		eqn.Func{Name: "tan", Sup: eqn.Num{Text: "2"}, Args: []eqn.Node{eqn.Row{eqn.Num{Text: "45°"}, eqn.Op{Text: "+"}, eqn.Frac{Num: phi, Den: eqn.Num{Text: "2"}}}}},
	}
	fmt.Println(eqn.String(nq))
	// Output: e^{π · tan(φ′_{d})} · tan^{2}(45° + {φ′_{d}}/{2})
}
