package settle_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// An input that drives a formula out of its domain is the calculation's
// error, never a NaN or infinite result. t_p = 1e-300 s lies in the open
// range (0, 1000] yr that validation accepts, but t_life/t_p overflows, so
// the secondary compression of the clay crust,
// s_sec = C_α H_c/(1 + e_p) log10(t_life/t_p), is infinite. The working
// (Compute), the quiet trials (Allowable) and the point calculations
// (WithinFooting) all refuse it.
func TestDomainErrorNotNaN(t *testing.T) {
	in := fourLayerInput(40)
	in.Tp = site.Some(1e-300)
	check := func(what string, err error) {
		t.Helper()
		var de *trace.DomainError
		if !errors.As(err, &de) || de.Symbol != "s_sec,1" || !math.IsInf(de.Value, 1) || !strings.Contains(err.Error(), "P4") {
			t.Errorf("%s: error %v, want the domain error of s_sec,1 naming the footing", what, err)
		}
	}
	r, err := settle.Compute(in)
	if r != nil {
		t.Errorf("Compute returned a result, total %v", r.Total)
	}
	check("Compute", err)
	_, err = settle.Allowable(in, 0.025)
	check("Allowable", err)
	_, err = settle.WithinFooting(in)
	check("WithinFooting", err)
	// The same input with a t_p that does not overflow is fine.
	in.Tp = site.Some(1e-3 * settle.Year)
	if r, err := settle.Compute(in); err != nil || math.IsInf(r.Ssec, 0) {
		t.Fatalf("t_p = 0.001 yr: %v", err)
	}
}
