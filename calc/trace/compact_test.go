package trace_test

import (
	"reflect"
	"testing"

	"github.com/plinth-calc/plinth/calc/trace"
)

// TestCompact: the steps and inputs are the same after, held in storage
// of their exact size.
func TestCompact(t *testing.T) {
	arena := make([]trace.Value, 0, 64)
	var tr trace.Trace
	tr.Steps = make([]trace.Step, 0, 32)
	for i := 0; i < 5; i++ {
		n := len(arena)
		arena = append(arena, trace.Value{Symbol: "x", V: float64(i), Unit: "m"}, trace.Value{Symbol: "y", V: 2})
		tr.Take(trace.Step{Symbol: "s", Inputs: arena[n:len(arena):len(arena)], Value: float64(i)})
	}
	tr.Take(trace.Step{Symbol: "given", Value: 7})
	want := append([]trace.Step(nil), tr.Steps...)
	tr.Compact()
	if !reflect.DeepEqual(tr.Steps, want) {
		t.Fatalf("steps changed:\n%v\nwant\n%v", tr.Steps, want)
	}
	if cap(tr.Steps) != len(tr.Steps) {
		t.Errorf("steps cap %d, len %d", cap(tr.Steps), len(tr.Steps))
	}
	for i, s := range tr.Steps {
		if cap(s.Inputs) != len(s.Inputs) {
			t.Errorf("step %d inputs cap %d, len %d", i, cap(s.Inputs), len(s.Inputs))
		}
		if len(s.Inputs) > 0 && &s.Inputs[0] == &want[i].Inputs[0] {
			t.Errorf("step %d still points into the old array", i)
		}
	}
}
