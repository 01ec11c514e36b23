package solve

import (
	"fmt"
	"math"
)

// Func is a function of one variable whose root is sought. An error stops
// the search and is returned as is.
type Func func(x float64) (float64, error)

// Options controls Brent's method.
type Options struct {
	// Tol is the absolute tolerance on x (t in Brent 1973, ch. 4). The
	// search stops when the bracket half-width is at most 2·ε·|x| + Tol,
	// ε the machine epsilon. 0 means 1e-12·max(|a|, |b|, 1).
	Tol float64
	// MaxIter bounds the number of function evaluations after the two at
	// the ends of the bracket. 0 means 200.
	MaxIter int
}

// Root is a root found by Brent's method.
type Root struct {
	X    float64 // the root
	F    float64 // f(X)
	Iter int     // function evaluations after the two at the bracket ends
	Tol  float64 // the tolerance reached: |X − root| ≤ Tol (2·ε·|X| + Options.Tol)
	A, B float64 // the bracket given
}

// BracketError reports that f does not change sign on [A, B].
type BracketError struct {
	A, B   float64
	FA, FB float64
}

func (e *BracketError) Error() string {
	return fmt.Sprintf("solve: f(%g) = %g and f(%g) = %g have the same sign: no root is bracketed", e.A, e.FA, e.B, e.FB)
}

// ConvergeError reports that the iteration limit was reached; A and B are
// the last bracket.
type ConvergeError struct {
	Iter int
	A, B float64
}

func (e *ConvergeError) Error() string {
	return fmt.Sprintf("solve: no convergence after %d iterations (bracket [%g, %g])", e.Iter, e.A, e.B)
}

// ValueError reports a NaN or infinite function value.
type ValueError struct {
	X, F float64
}

func (e *ValueError) Error() string {
	return fmt.Sprintf("solve: f(%g) = %g is not a finite number", e.X, e.F)
}

func eval(f Func, x float64) (float64, error) {
	y, err := f(x)
	if err != nil {
		return 0, err
	}
	if math.IsNaN(y) || math.IsInf(y, 0) {
		return 0, &ValueError{X: x, F: y}
	}
	return y, nil
}

// Brent returns a root of f in [a, b], where f(a) and f(b) must differ in
// sign (or one be zero). It is procedure "zero" of Brent (1973),
// Algorithms for Minimization without Derivatives, ch. 4, section 4.6.
func Brent(f Func, a, b float64, o Options) (Root, error) {
	if math.IsNaN(a) || math.IsNaN(b) || math.IsInf(a, 0) || math.IsInf(b, 0) {
		return Root{}, &BracketError{A: a, B: b, FA: math.NaN(), FB: math.NaN()}
	}
	t := o.Tol
	if t <= 0 {
		t = 1e-12 * math.Max(1, math.Max(math.Abs(a), math.Abs(b)))
	}
	maxIter := o.MaxIter
	if maxIter <= 0 {
		maxIter = 200
	}
	a0, b0 := a, b
	fa, err := eval(f, a)
	if err != nil {
		return Root{}, err
	}
	fb, err := eval(f, b)
	if err != nil {
		return Root{}, err
	}
	const eps = 2.220446049250313e-16
	if fa == 0 {
		return Root{X: a, F: 0, Tol: 2*eps*math.Abs(a) + t, A: a0, B: b0}, nil
	}
	if fb == 0 {
		return Root{X: b, F: 0, Tol: 2*eps*math.Abs(b) + t, A: a0, B: b0}, nil
	}
	if (fa > 0) == (fb > 0) {
		return Root{}, &BracketError{A: a, B: b, FA: fa, FB: fb}
	}
	c, fc := a, fa
	d := b - a
	e := d
	for iter := 0; ; iter++ {
		if math.Abs(fc) < math.Abs(fb) {
			a, b, c = b, c, b
			fa, fb, fc = fb, fc, fb
		}
		tol := 2*eps*math.Abs(b) + t
		m := 0.5 * (c - b)
		if math.Abs(m) <= tol || fb == 0 {
			return Root{X: b, F: fb, Iter: iter, Tol: tol, A: a0, B: b0}, nil
		}
		if iter >= maxIter {
			return Root{}, &ConvergeError{Iter: iter, A: math.Min(b, c), B: math.Max(b, c)}
		}
		if math.Abs(e) < tol || math.Abs(fa) <= math.Abs(fb) {
			d, e = m, m // bisection
		} else {
			s := fb / fa
			var p, q float64
			if a == c { // linear interpolation
				p = 2 * m * s
				q = 1 - s
			} else { // inverse quadratic interpolation
				q = fa / fc
				r := fb / fc
				p = s * (2*m*q*(q-r) - (b-a)*(r-1))
				q = (q - 1) * (r - 1) * (s - 1)
			}
			if p > 0 {
				q = -q
			} else {
				p = -p
			}
			s = e
			e = d
			if 2*p < 3*m*q-math.Abs(tol*q) && p < math.Abs(0.5*s*q) {
				d = p / q
			} else {
				d, e = m, m
			}
		}
		a, fa = b, fb
		switch {
		case math.Abs(d) > tol:
			b += d
		case m > 0:
			b += tol
		default:
			b -= tol
		}
		fb, err = eval(f, b)
		if err != nil {
			return Root{}, err
		}
		if (fb > 0) == (fc > 0) {
			c, fc = a, fa
			d = b - a
			e = d
		}
	}
}

// Bracket is an interval on which a function changes sign.
type Bracket struct {
	A, B   float64
	FA, FB float64
	Evals  int // function evaluations used to find it
}

// Expand looks for a sign change of f going up from a: it evaluates f(a)
// and f(b), then replaces the interval [a, b] by [b, a + factor·(b − a)]
// until f changes sign, at most max times. factor must exceed 1; it is the
// usual geometric search for a bracket (common practice).
func Expand(f Func, a, b, factor float64, max int) (Bracket, error) {
	if !(b > a) || !(factor > 1) || max < 1 {
		return Bracket{}, fmt.Errorf("solve: Expand needs b > a, factor > 1 and max ≥ 1 (got a = %g, b = %g, factor = %g, max = %d)", a, b, factor, max)
	}
	fa, err := eval(f, a)
	if err != nil {
		return Bracket{}, err
	}
	n := 1
	lo, flo := a, fa
	hi := b
	for i := 0; i < max; i++ {
		fhi, err := eval(f, hi)
		n++
		if err != nil {
			return Bracket{}, err
		}
		if fhi == 0 || (fhi > 0) != (flo > 0) || flo == 0 {
			return Bracket{A: lo, B: hi, FA: flo, FB: fhi, Evals: n}, nil
		}
		next := a + factor*(hi-a)
		lo, flo = hi, fhi
		hi = next
	}
	return Bracket{}, &BracketError{A: a, B: lo, FA: fa, FB: flo}
}
