package expr

import (
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
)

// functions is the engine's function table (calc/trace): one table, so a
// function means the same in a sheet expression and in an engine formula.
// Domain checks live in the direct evaluator (eval.go); dimension rules in
// dims.go.
var functions = tableOf()

type function struct {
	min, max int // max < 0: no upper limit
	f        func(a []float64) float64
}

func tableOf() map[string]function {
	m := map[string]function{}
	for _, name := range strings.Fields(trace.FunctionNames) {
		f, _ := trace.Lookup(name)
		m[name] = function{f.Min, f.Max, f.F}
	}
	return m
}

// functionList is the names for messages, in the order of doc.go.
const functionList = trace.FunctionNames

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
