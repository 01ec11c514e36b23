package trace

import "math"

// Function is one function a formula may call: its arity and its value on
// SI float64 arguments (angles in radians). The same table serves the
// engine's formulas and the sheet's expressions (doc/expr), so a function
// means one thing wherever plinth prints it. Domain checks (tan at 90°, ln
// of zero) belong to the caller that can report a position; here a value
// outside the domain gives NaN or Inf, which the recorder refuses.
type Function struct {
	Min, Max int // Max < 0: no upper limit
	F        func(a []float64) float64
}

var functions = map[string]Function{
	"sqrt":  {1, 1, func(a []float64) float64 { return math.Sqrt(a[0]) }},
	"abs":   {1, 1, func(a []float64) float64 { return math.Abs(a[0]) }},
	"min":   {2, -1, fold2(math.Min)},
	"max":   {2, -1, fold2(math.Max)},
	"exp":   {1, 1, func(a []float64) float64 { return math.Exp(a[0]) }},
	"ln":    {1, 1, func(a []float64) float64 { return math.Log(a[0]) }},
	"log10": {1, 1, func(a []float64) float64 { return math.Log10(a[0]) }},
	"sin":   {1, 1, func(a []float64) float64 { return math.Sin(a[0]) }},
	"cos":   {1, 1, func(a []float64) float64 { return math.Cos(a[0]) }},
	"tan":   {1, 1, func(a []float64) float64 { return math.Tan(a[0]) }},
	"cot":   {1, 1, func(a []float64) float64 { return 1 / math.Tan(a[0]) }},
	"asin":  {1, 1, func(a []float64) float64 { return math.Asin(a[0]) }},
	"acos":  {1, 1, func(a []float64) float64 { return math.Acos(a[0]) }},
	"atan":  {1, 1, func(a []float64) float64 { return math.Atan(a[0]) }},
	"atan2": {2, 2, func(a []float64) float64 { return math.Atan2(a[0], a[1]) }},
	"floor": {1, 1, func(a []float64) float64 { return math.Floor(a[0]) }},
	"ceil":  {1, 1, func(a []float64) float64 { return math.Ceil(a[0]) }},
	"round": {1, 1, func(a []float64) float64 { return math.Round(a[0]) }},
}

// FunctionNames lists the built-in functions in the order the README
// documents them.
const FunctionNames = "sqrt abs min max exp ln log10 sin cos tan cot asin acos atan atan2 floor ceil round"

// Lookup returns the built-in function called name.
func Lookup(name string) (Function, bool) {
	f, ok := functions[name]
	return f, ok
}

func fold2(op func(x, y float64) float64) func(a []float64) float64 {
	return func(a []float64) float64 {
		r := a[0]
		for _, x := range a[1:] {
			r = op(r, x)
		}
		return r
	}
}
