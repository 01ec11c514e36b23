package bearing_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

const kPa, kN = 1e3, 1e3

// check runs bearing.Check, fails the test on an error, and replays the
// trace: every formula must reproduce its value (trace.Verify, 1e-9).
func check(t *testing.T, name string, in bearing.Input) *bearing.Result {
	t.Helper()
	r, err := bearing.Check(in)
	if err != nil {
		t.Fatalf("%s: %v", name, err)
	}
	if err := trace.Verify(r.Trace, 1e-9); err != nil {
		t.Fatalf("%s: trace does not verify: %v", name, err)
	}
	return r
}

// caseNamed returns the case whose name is name.
func caseNamed(t *testing.T, r *bearing.Result, name string) bearing.Case {
	t.Helper()
	for _, c := range r.Cases {
		if c.Name == name {
			return c
		}
	}
	var names []string
	for _, c := range r.Cases {
		names = append(names, c.Name)
	}
	t.Fatalf("no case %q; have %q", name, names)
	return bearing.Case{}
}

func hasCaution(r *bearing.Result, code string) bool {
	for _, c := range r.Trace.Cautions {
		if c.Code == code {
			return true
		}
	}
	return false
}

func oneLayer(l site.Layer) site.Ground { return site.Ground{Layers: []site.Layer{l}} }
