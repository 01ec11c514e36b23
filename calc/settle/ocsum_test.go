package settle_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
)

// TestOCSumCaution: where immediate (E_u) and oedometer settlement of an
// over-consolidated clay are added without the Skempton & Bjerrum (1957)
// correction, the engine says so (common practice: the oedometer value
// holds part of the undrained movement; Skempton & Bjerrum 1957 correct
// it with μ = A + α(1 − A)); with skempton_bjerrum given it does not.
// The profile is fourLayers (a crust with OCR 3, a soft clay with σ′_p).
func TestOCSumCaution(t *testing.T) {
	has := func(r *settle.Result) bool {
		for _, c := range r.Trace.Cautions {
			if c.Code == "oc-sum" {
				return true
			}
		}
		return false
	}
	in := fourLayerInput(40)
	in.Method = settle.Combined
	if r := mustCompute(t, in); !has(r) {
		t.Error("combined settlement of over-consolidated clay: no oc-sum caution")
	}
	in.SkemptonBjerrum = site.Some(0.4)
	if r := mustCompute(t, in); has(r) {
		t.Error("with the Skempton–Bjerrum correction: oc-sum caution raised")
	}
	in.SkemptonBjerrum = site.Opt{}
	in.Method = settle.Consolidation // no immediate part added
	if r := mustCompute(t, in); has(r) {
		t.Error("consolidation alone: oc-sum caution raised")
	}
}
