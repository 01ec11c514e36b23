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
// from inputs is an error, except "pi".
func Eval(e Expr, inputs []Value) (float64, error) {
	env := make(map[string]float64, len(inputs))
	for _, in := range inputs {
		env[in.Symbol] = in.V
	}
	return eval(e, env)
}

func eval(e Expr, env map[string]float64) (float64, error) {
	switch e := e.(type) {
	case Sym:
		if v, ok := env[e.Name]; ok {
			return v, nil
		}
		if e.Name == "pi" {
			return math.Pi, nil
		}
		return 0, fmt.Errorf("trace: symbol %s has no input value", e.Name)
	case Num:
		return e.V, nil
	case Neg:
		x, err := eval(e.X, env)
		return -x, err
	case Op:
		a, err := eval(e.L, env)
		if err != nil {
			return 0, err
		}
		b, err := eval(e.R, env)
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
		args := make([]float64, len(e.Args))
		for i, a := range e.Args {
			v, err := eval(a, env)
			if err != nil {
				return 0, err
			}
			args[i] = v
		}
		return call(e.Fn, args)
	}
	return 0, fmt.Errorf("trace: unknown node %T", e)
}

func call(fn string, a []float64) (float64, error) {
	one := map[string]func(float64) float64{
		"sqrt": math.Sqrt, "abs": math.Abs, "exp": math.Exp, "ln": math.Log,
		"log10": math.Log10, "sin": math.Sin, "cos": math.Cos, "tan": math.Tan,
		"asin": math.Asin, "acos": math.Acos, "atan": math.Atan,
		"cot":   func(x float64) float64 { return 1 / math.Tan(x) },
		"floor": math.Floor, "ceil": math.Ceil, "round": math.Round,
	}
	if f, ok := one[fn]; ok {
		if len(a) != 1 {
			return 0, fmt.Errorf("trace: %s takes one argument, got %d", fn, len(a))
		}
		return f(a[0]), nil
	}
	switch fn {
	case "min", "max":
		if len(a) == 0 {
			return 0, fmt.Errorf("trace: %s needs arguments", fn)
		}
		v := a[0]
		for _, x := range a[1:] {
			if fn == "min" {
				v = math.Min(v, x)
			} else {
				v = math.Max(v, x)
			}
		}
		return v, nil
	case "atan2":
		if len(a) != 2 {
			return 0, fmt.Errorf("trace: atan2 takes two arguments")
		}
		return math.Atan2(a[0], a[1]), nil
	}
	return 0, ErrOpaque{fn}
}
