package expr

import (
	"math"
)

// function is one built-in function: its arity and its value on SI
// float64 arguments (angles in radians). Domain checks live in the direct
// evaluator (eval.go); dimension rules in dims.go.
type function struct {
	min, max int // max < 0: no upper limit
	f        func(a []float64) float64
}

var functions = map[string]function{
	"sqrt":  {1, 1, func(a []float64) float64 { return math.Sqrt(a[0]) }},
	"abs":   {1, 1, func(a []float64) float64 { return math.Abs(a[0]) }},
	"min":   {2, -1, fold(math.Min)},
	"max":   {2, -1, fold(math.Max)},
	"exp":   {1, 1, func(a []float64) float64 { return math.Exp(a[0]) }},
	"ln":    {1, 1, func(a []float64) float64 { return math.Log(a[0]) }},
	"log10": {1, 1, func(a []float64) float64 { return math.Log10(a[0]) }},
	"sin":   {1, 1, func(a []float64) float64 { return math.Sin(a[0]) }},
	"cos":   {1, 1, func(a []float64) float64 { return math.Cos(a[0]) }},
	"tan":   {1, 1, func(a []float64) float64 { return math.Tan(a[0]) }},
	"asin":  {1, 1, func(a []float64) float64 { return math.Asin(a[0]) }},
	"acos":  {1, 1, func(a []float64) float64 { return math.Acos(a[0]) }},
	"atan":  {1, 1, func(a []float64) float64 { return math.Atan(a[0]) }},
	"atan2": {2, 2, func(a []float64) float64 { return math.Atan2(a[0], a[1]) }},
	"floor": {1, 1, func(a []float64) float64 { return math.Floor(a[0]) }},
	"ceil":  {1, 1, func(a []float64) float64 { return math.Ceil(a[0]) }},
	"round": {1, 1, func(a []float64) float64 { return math.Round(a[0]) }},
}

// functionList is the names for messages, in the order of doc.go.
const functionList = "sqrt abs min max exp ln log10 sin cos tan asin acos atan atan2 floor ceil round"

func fold(op func(x, y float64) float64) func(a []float64) float64 {
	return func(a []float64) float64 {
		r := a[0]
		for _, x := range a[1:] {
			r = op(r, x)
		}
		return r
	}
}

// isFunction reports whether name is a built-in function.
func isFunction(name string) bool { _, ok := functions[name]; return ok }

// reserved reports whether name cannot be a symbol: a function name, the
// constants pi and g, or the keyword check.
func reserved(name string) bool {
	return isFunction(name) || name == "pi" || name == "g" || name == "check"
}

func arity(f function) string {
	switch {
	case f.max < 0:
		return itoa(f.min) + " or more arguments"
	case f.min == 1:
		return "1 argument"
	}
	return itoa(f.min) + " arguments"
}
