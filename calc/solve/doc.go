// Package solve finds roots of one-variable functions for the engine:
// Brent's method inside a bracket, and a helper that grows a bracket until
// the function changes sign.
//
// Brent's method is the algorithm "zero" of R. P. Brent, Algorithms for
// Minimization without Derivatives, Prentice-Hall, 1973, chapter 4: it
// combines bisection, the secant rule and inverse quadratic interpolation,
// keeps the root bracketed at every step, and never needs more than about
// the square of the bisection count of evaluations. A Root reports the
// number of iterations and the tolerance reached so a calculation sheet can
// print them beside the answer.
//
// The function to solve returns an error so that domain errors from the
// engine (an input out of range at a trial value) stop the search and are
// returned unchanged. A NaN or infinite function value is an error too.
package solve
