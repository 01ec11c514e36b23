package main

import (
	"encoding/json"
	"fmt"
	"math"
	"strings"
	"testing"
)

// TestSweepInputs sets every input of the example, one at a time, to
// tiny, huge and boundary values with --set: no panic, no NaN or Inf in
// any symbol, check or JSON number, and a clear status (0, 1 or 2).
func TestSweepInputs(t *testing.T) {
	if testing.Short() {
		t.Skip("hundreds of evaluations")
	}
	out, _, code := runCmd("check", "--json", example)
	if code != exitOK {
		t.Fatalf("status %d", code)
	}
	var base jsonReport
	if err := json.Unmarshal([]byte(out), &base); err != nil {
		t.Fatal(err)
	}
	values := []float64{0, 1e-300, 1e-20, 1e-6, -1e-6, 1e6, 1e20, 1e300}
	runs, fails := 0, 0
	for _, y := range base.Symbols {
		if !y.Input || strings.Contains(y.Name, "psi") {
			continue
		}
		for _, v := range values {
			arg := fmt.Sprintf("%s:%s=%g%s", strings.TrimPrefix(y.File, "../../examples/brackenfield/"), y.Name, v, siUnit(y.SIUnit))
			runs++
			func() {
				defer func() {
					if r := recover(); r != nil {
						t.Errorf("--set %s: panic %v", arg, r)
					}
				}()
				out, errs, code := runCmd("check", "--json", "--set", arg, example)
				if code < 0 || code > 2 {
					t.Errorf("--set %s: status %d", arg, code)
				}
				var r jsonReport
				if err := json.Unmarshal([]byte(out), &r); err != nil {
					t.Errorf("--set %s: JSON: %v\n%s", arg, err, errs)
					return
				}
				for _, s := range r.Symbols {
					if math.IsNaN(s.ValueSI) || math.IsInf(s.ValueSI, 0) {
						fails++
						if fails < 20 {
							t.Errorf("--set %s: %s = %v", arg, s.Name, s.ValueSI)
						}
					}
				}
				if code == exitErrors && len(r.Errors) == 0 {
					t.Errorf("--set %s: status 2 with no errors listed", arg)
				}
			}()
		}
	}
	t.Logf("%d runs", runs)
}

// siUnit writes an SI unit name as --set accepts it.
func siUnit(u string) string {
	switch u {
	case "", "1":
		return ""
	}
	return u
}
