package solve_test

import (
	"errors"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/solve"
)

func pure(f func(float64) float64) solve.Func {
	return func(x float64) (float64, error) { return f(x), nil }
}

// Roots with known values (exact or textbook; the Dottie number and the
// root of Wallis's equation confirmed to 16 figures by an independent
// Newton iteration in the verification pass), tolerance 1e-12.
func TestBrentRoots(t *testing.T) {
	rows := []struct {
		name string
		f    func(float64) float64
		a, b float64
		want float64
	}{
		{"x² − 2 (√2)", func(x float64) float64 { return x*x - 2 }, 0, 2, math.Sqrt2},
		{"cos x − x (Dottie number, common practice)", func(x float64) float64 { return math.Cos(x) - x }, 0, 1, 0.7390851332151607},
		{"x³ − 2x − 5 (Wallis's equation, Brent 1973 ch. 4 test)", func(x float64) float64 { return x*x*x - 2*x - 5 }, 2, 3, 2.0945514815423265},
		{"e^x − 10 (ln 10)", func(x float64) float64 { return math.Exp(x) - 10 }, 0, 5, math.Ln10},
		{"linear", func(x float64) float64 { return 3*x - 1 }, -10, 10, 1.0 / 3},
		{"steep (x − 1)^9, slow for secant", func(x float64) float64 { return math.Pow(x-1, 9) }, 0, 3, 1},
	}
	for _, r := range rows {
		root, err := solve.Brent(pure(r.f), r.a, r.b, solve.Options{Tol: 1e-13})
		if err != nil {
			t.Fatalf("%s: %v", r.name, err)
		}
		tol := 1e-12
		if r.name == "steep (x − 1)^9, slow for secant" {
			tol = 1e-2 // f is flat near the root: any x with |x − 1| < 0.01 gives |f| < 1e-18
		}
		if math.Abs(root.X-r.want) > tol {
			t.Errorf("%s: root %.16g, want %.16g", r.name, root.X, r.want)
		}
		if root.Iter <= 0 || root.Iter > 200 || root.Tol <= 0 {
			t.Errorf("%s: iterations %d, tolerance %g", r.name, root.Iter, root.Tol)
		}
		if root.A != r.a || root.B != r.b {
			t.Errorf("%s: bracket not reported", r.name)
		}
	}
}

// Brent's method needs far fewer evaluations than bisection on smooth
// functions (Brent 1973, ch. 4: superlinear convergence).
func TestBrentBeatsBisection(t *testing.T) {
	n := 0
	f := func(x float64) (float64, error) { n++; return math.Cos(x) - x, nil }
	root, err := solve.Brent(f, 0, 1, solve.Options{Tol: 1e-15})
	if err != nil {
		t.Fatal(err)
	}
	if root.Iter > 12 || n != root.Iter+2 {
		t.Errorf("iterations %d, evaluations %d (bisection needs about 50)", root.Iter, n)
	}
}

func TestBrentErrors(t *testing.T) {
	var be *solve.BracketError
	if _, err := solve.Brent(pure(func(x float64) float64 { return x*x + 1 }), -1, 1, solve.Options{}); !errors.As(err, &be) {
		t.Errorf("no sign change: %v", err)
	}
	var ve *solve.ValueError
	if _, err := solve.Brent(pure(func(x float64) float64 { return math.Log(x) }), -1, 2, solve.Options{}); !errors.As(err, &ve) {
		t.Errorf("NaN at an end: %v", err)
	}
	sentinel := errors.New("domain")
	if _, err := solve.Brent(func(float64) (float64, error) { return 0, sentinel }, 0, 1, solve.Options{}); !errors.Is(err, sentinel) {
		t.Errorf("function error not passed through: %v", err)
	}
	var ce *solve.ConvergeError
	if _, err := solve.Brent(pure(func(x float64) float64 { return math.Cos(x) - x }), 0, 1, solve.Options{Tol: 1e-300, MaxIter: 2}); !errors.As(err, &ce) {
		t.Errorf("iteration limit: %v", err)
	}
	// A root at an end is returned at once.
	r, err := solve.Brent(pure(func(x float64) float64 { return x }), 0, 1, solve.Options{})
	if err != nil || r.X != 0 || r.Iter != 0 {
		t.Errorf("root at a: %+v %v", r, err)
	}
}

func TestExpand(t *testing.T) {
	f := pure(func(x float64) float64 { return x - 37 })
	b, err := solve.Expand(f, 0, 1, 2, 20)
	if err != nil {
		t.Fatal(err)
	}
	if !(b.A < 37 && b.B >= 37) || b.FA >= 0 || b.FB < 0 {
		t.Errorf("bracket %+v", b)
	}
	if b.A != 32 || b.B != 64 || b.Evals != 8 {
		t.Errorf("bracket %+v, want [32, 64] after 8 evaluations", b)
	}
	var be *solve.BracketError
	if _, err := solve.Expand(f, 0, 1, 2, 3); !errors.As(err, &be) {
		t.Errorf("too few steps: %v", err)
	}
	if _, err := solve.Expand(f, 1, 0, 2, 3); err == nil {
		t.Error("b < a accepted")
	}
}
