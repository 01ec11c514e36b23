package size_test

import "github.com/plinth-calc/plinth/calc/trace"

type traceT struct{ t trace.Trace }
