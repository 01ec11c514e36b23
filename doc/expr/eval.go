package expr

import (
	"fmt"
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/calc/units"
)

// Eval evaluates n: the dimension from Dims, the value from govaluate on
// the canonical form, checked against the direct evaluator. Every domain problem
// (division by zero, sqrt of a negative, ln 0, asin 2, overflow, a
// negative base to a fractional power) is an Error at the node where it
// happens, found by the direct evaluator, which also catches an infinity
// that a later step would hide (1/(1/0)). If govaluate fails or the two
// values differ by more than 1e-9 relative, the Error has KindInternal.
// No panic escapes.
func Eval(n Node, env Env) (units.Quantity, []Error) {
	d, errs := Dims(n, env)
	if len(errs) > 0 {
		return units.Quantity{}, errs
	}
	return evalDim(n, env, d)
}

// evalDim is Eval for a tree whose dimension d is already known.
func evalDim(n Node, env Env, d units.Dim) (units.Quantity, []Error) {
	ev := evaluator{env: env}
	ref, err := ev.value(n)
	if err != nil {
		return units.Quantity{}, []Error{*err}
	}
	src, params := canonical(n, env)
	v, gerr := run(src, params)
	if gerr == nil && !agree(v, ref) {
		gerr = fmt.Errorf("govaluate gives %v, the direct evaluator %v", v, ref)
	}
	if gerr != nil {
		pos, end := n.Span()
		return units.Quantity{}, []Error{{Pos: pos, End: end, Kind: KindInternal,
			Msg: "internal error evaluating " + src + ": " + gerr.Error()}}
	}
	return units.Quantity{V: v, Dim: d}, nil
}

// EvalAssign evaluates an assignment: stmtDims (so a display unit that
// does not fit is an error) and then Eval of its expression.
func EvalAssign(a *Assign, env Env) (units.Quantity, []Error) {
	d, errs := stmtDims(a, env)
	if len(errs) > 0 {
		return units.Quantity{}, errs
	}
	return evalDim(a.X, env, d)
}

// CheckValue is an evaluated check line.
type CheckValue struct {
	L, R  units.Quantity
	Holds bool // L Op R; "==" holds within 1e-9 relative
}

// EvalCheck evaluates both sides of a check, whose dimensions must agree,
// and whether the comparison holds.
func EvalCheck(c *Check, env Env) (CheckValue, []Error) {
	d, errs := stmtDims(c, env)
	if len(errs) > 0 {
		return CheckValue{}, errs
	}
	l, errs := evalDim(c.L, env, d)
	r, rerrs := evalDim(c.R, env, d)
	if errs = append(errs, rerrs...); len(errs) > 0 {
		return CheckValue{}, errs
	}
	v := CheckValue{L: l, R: r}
	switch c.Op {
	case "<=":
		v.Holds = l.V <= r.V
	case "<":
		v.Holds = l.V < r.V
	case ">=":
		v.Holds = l.V >= r.V
	case ">":
		v.Holds = l.V > r.V
	case "==":
		v.Holds = agree(l.V, r.V)
	}
	return v, nil
}

// agree reports whether a and b match to 1e-9 relative.
func agree(a, b float64) bool {
	if a == b {
		return true
	}
	return math.Abs(a-b) <= 1e-9*math.Max(math.Abs(a), math.Abs(b))
}

// direct evaluates n by walking the tree, without govaluate: the
// independent reference for Eval. The error, if any, is an Error (the
// first dimension or domain problem).
func direct(n Node, env Env) (units.Quantity, error) {
	d, errs := Dims(n, env)
	if len(errs) > 0 {
		return units.Quantity{}, errs[0]
	}
	ev := evaluator{env: env}
	v, err := ev.value(n)
	if err != nil {
		return units.Quantity{}, *err
	}
	return units.Quantity{V: v, Dim: d}, nil
}

type evaluator struct{ env Env }

func domain(n Node, format string, args ...any) *Error {
	pos, end := n.Span()
	return &Error{Pos: pos, End: end, Kind: KindDomain, Msg: fmt.Sprintf(format, args...)}
}

func fmtNum(v float64) string { return strconv.FormatFloat(v, 'g', 6, 64) }

// value computes n in SI. Dimensions are assumed checked.
func (e *evaluator) value(n Node) (float64, *Error) {
	switch n := n.(type) {
	case *Num:
		return n.Quantity().V, nil
	case *Const:
		return n.V, nil
	case *Ident:
		if e.env != nil {
			if q, ok := e.env.Lookup(n.Name); ok {
				if math.IsNaN(q.V) || math.IsInf(q.V, 0) {
					return 0, domain(n, "%s has no finite value", n.Name)
				}
				return q.V, nil
			}
		}
		return 0, &Error{Pos: n.Pos, End: n.End, Kind: KindUndefined, Msg: "undefined symbol " + n.Name}
	case *Paren:
		return e.value(n.X)
	case *Unary:
		x, err := e.value(n.X)
		if n.Op == "-" {
			x = -x
		}
		return x, err
	case *Binary:
		return e.binary(n)
	case *Call:
		return e.call(n)
	}
	pos, end := n.Span()
	return 0, &Error{Pos: pos, End: end, Kind: KindSyntax, Msg: "cannot evaluate an expression with syntax errors"}
}

func (e *evaluator) binary(n *Binary) (float64, *Error) {
	l, err := e.value(n.L)
	if err != nil {
		return 0, err
	}
	r, err := e.value(n.R)
	if err != nil {
		return 0, err
	}
	var v float64
	switch n.Op {
	case "+":
		v = l + r
	case "-":
		v = l - r
	case "*":
		v = l * r
	case "/":
		if r == 0 {
			return 0, domain(n.R, "division by zero")
		}
		v = l / r
	case "^":
		if l == 0 && r < 0 {
			return 0, domain(n, "zero to a negative power (division by zero)")
		}
		v = math.Pow(l, r)
		if math.IsNaN(v) && l < 0 {
			return 0, domain(n, "a negative base (%s) to a fractional power (%s) has no real value", fmtNum(l), fmtNum(r))
		}
	}
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, domain(n, "the result of %q overflows", n.OpText)
	}
	return v, nil
}

func (e *evaluator) call(n *Call) (float64, *Error) {
	f, ok := functions[n.Fn]
	if !ok || len(n.Args) < f.min || (f.max >= 0 && len(n.Args) > f.max) {
		return 0, domain(n, "cannot evaluate %s with %d arguments", n.Fn, len(n.Args))
	}
	var buf [4]float64
	args := buf[:0]
	for _, a := range n.Args {
		v, err := e.value(a)
		if err != nil {
			return 0, err
		}
		args = append(args, v)
	}
	x := args[0]
	switch n.Fn {
	case "sqrt":
		if x < 0 {
			return 0, domain(n, "sqrt of a negative value (%s)", fmtNum(x))
		}
	case "ln", "log10":
		if x <= 0 {
			return 0, domain(n, "%s needs a positive value; got %s", n.Fn, fmtNum(x))
		}
	case "tan":
		// At an odd multiple of 90° the tangent is infinite; math.Tan
		// returns about 1.6e16 there because π/2 is not exact in binary.
		if math.Abs(math.Cos(x)) < 1e-12 {
			return 0, domain(n, "tan is infinite at an odd multiple of 90°; got %s°", fmtNum(x*180/math.Pi))
		}
	case "cot":
		// At a multiple of 180° the cotangent is infinite.
		if math.Abs(math.Sin(x)) < 1e-12 {
			return 0, domain(n, "cot is infinite at a multiple of 180°; got %s°", fmtNum(x*180/math.Pi))
		}
	case "asin", "acos":
		if x < -1 || x > 1 {
			return 0, domain(n, "%s needs a value from -1 to 1; got %s", n.Fn, fmtNum(x))
		}
	}
	v := f.f(args)
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, domain(n, "%s(%s) overflows", n.Fn, fmtNum(x))
	}
	return v, nil
}
