package solve_test

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/solve"
)

func ExampleBrent() {
	f := func(x float64) (float64, error) { return x*x*x - 2*x - 5, nil }
	r, _ := solve.Brent(f, 2, 3, solve.Options{Tol: 1e-12})
	fmt.Printf("x = %.10f after %d iterations\n", r.X, r.Iter)
	// Output: x = 2.0945514815 after 6 iterations
}

func ExampleExpand() {
	f := func(x float64) (float64, error) { return math.Exp(x) - 1000, nil }
	b, _ := solve.Expand(f, 0, 1, 2, 10)
	fmt.Println(b.A, b.B)
	// Output: 4 8
}
