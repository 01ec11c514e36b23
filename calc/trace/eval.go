package trace

import (
	"fmt"
	"math"
)

const pi = math.Pi

// ErrOpaque is returned by Eval for a formula holding a function it does
// not know.
type ErrOpaque struct{ Fn string }

func (e ErrOpaque) Error() string { return "trace: opaque function " + e.Fn }

// Eval evaluates e in SI units with the values in inputs. A symbol missing
// from inputs is an error, except "pi". It is the one evaluator of engine
// formulas: the recorder (Trace.Eval) computes every step's value with it,
// and Verify replays a trace with it. It allocates nothing for formulas of
// up to eight function arguments.
func Eval(e Expr, inputs []Value) (float64, error) {
	return eval(e, inputs)
}

func lookup(name string, in []Value) (float64, bool) {
	for i := range in {
		if in[i].Symbol == name {
			return in[i].V, true
		}
	}
	if name == "pi" {
		return math.Pi, true
	}
	return 0, false
}

func eval(e Expr, in []Value) (float64, error) {
	switch e := e.(type) {
	case Sym:
		if v, ok := lookup(e.Name, in); ok {
			return v, nil
		}
		return 0, fmt.Errorf("trace: symbol %s has no input value", e.Name)
	case Num:
		return e.V, nil
	case Neg:
		x, err := eval(e.X, in)
		return -x, err
	case Op:
		a, err := eval(e.L, in)
		if err != nil {
			return 0, err
		}
		b, err := eval(e.R, in)
		if err != nil {
			return 0, err
		}
		switch e.Op {
		case '+':
			return a + b, nil
		case '-':
			return a - b, nil
		case '*':
			return a * b, nil
		case '/':
			return a / b, nil
		case '^':
			return math.Pow(a, b), nil
		}
		return 0, fmt.Errorf("trace: unknown operator %q", e.Op)
	case Call:
		if len(e.Args) == 1 && e.Impl == nil {
			x, err := eval(e.Args[0], in)
			if err != nil {
				return 0, err
			}
			if v, ok := call1(e.Fn, x); ok {
				return v, nil
			}
			return call(e, []float64{x})
		}
		args := make([]float64, len(e.Args))
		for i, a := range e.Args {
			v, err := eval(a, in)
			if err != nil {
				return 0, err
			}
			args[i] = v
		}
		return call(e, args)
	}
	return 0, fmt.Errorf("trace: unknown node %T", e)
}

// call1 is the allocation-free path for the common one-argument built-ins;
// it must agree with the table in funcs.go (TestOneFunctionTable).
func call1(fn string, x float64) (float64, bool) {
	switch fn {
	case "sqrt":
		return math.Sqrt(x), true
	case "abs":
		return math.Abs(x), true
	case "exp":
		return math.Exp(x), true
	case "ln":
		return math.Log(x), true
	case "log10":
		return math.Log10(x), true
	case "sin":
		return math.Sin(x), true
	case "cos":
		return math.Cos(x), true
	case "tan":
		return math.Tan(x), true
	case "cot":
		return 1 / math.Tan(x), true
	case "atan":
		return math.Atan(x), true
	}
	return 0, false
}

func call(c Call, a []float64) (float64, error) {
	if c.Impl != nil {
		return c.Impl(a), nil
	}
	f, ok := functions[c.Fn]
	if !ok {
		return 0, ErrOpaque{c.Fn}
	}
	if len(a) < f.Min || (f.Max >= 0 && len(a) > f.Max) {
		return 0, fmt.Errorf("trace: %s takes %d to %d arguments, got %d", c.Fn, f.Min, f.Max, len(a))
	}
	return f.F(a), nil
}
