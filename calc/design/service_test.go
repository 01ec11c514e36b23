package design_test

import (
	"errors"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

// Serviceability combinations worked by hand from EN 1990:2002 eqs.
// (6.14b) and (6.16b): G = 950 kN, imposed Q1 = 400 kN (ψ0 0.7, ψ2 0.3),
// snow Q2 = 120 kN (ψ0 0.5, ψ2 0). Characteristic, imposed leading:
// 950 + 400 + 0.5·120 = 1410 kN; snow leading: 950 + 120 + 0.7·400 =
// 1350 kN; the larger governs. Quasi-permanent: 950 + 0.3·400 + 0 = 1070
// kN. Tolerance 1e-9 relative.
func TestServiceLoad(t *testing.T) {
	acts := []site.Action{
		{Name: "Dead", Kind: site.Permanent, V: 950e3},
		{Name: "Imposed", Kind: site.Variable, V: 400e3, Psi0: site.Some(0.7), Psi2: site.Some(0.3)},
		{Name: "Snow", Kind: site.Variable, V: 120e3, Psi0: site.Some(0.5), Psi2: site.Some(0)},
	}
	for _, c := range []struct {
		kind design.ServiceKind
		want float64
		name string
	}{
		{design.Characteristic, 1410e3, "characteristic · Imposed leading"},
		{design.QuasiPermanent, 1070e3, "quasi-permanent"},
	} {
		var tr trace.Trace
		s, err := design.ServiceLoad(acts, c.kind, &tr, "kN")
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(s.V-c.want) > 1e-9*c.want || s.Name != c.name {
			t.Errorf("%v: V = %v (%s), want %v (%s)", c.kind, s.V, s.Name, c.want, c.name)
		}
		if err := trace.Verify(tr, 1e-9); err != nil {
			t.Error(err)
		}
	}
	// ψ2 not given: the whole variable action counts (conservative) with a caution.
	var tr trace.Trace
	s, err := design.ServiceLoad([]site.Action{{Name: "G", V: 100e3}, {Name: "Q", Kind: site.Variable, V: 50e3}}, design.QuasiPermanent, &tr, "kN")
	if err != nil || s.V != 150e3 || len(tr.Cautions) != 1 {
		t.Errorf("default ψ2: V = %v, cautions %v, err %v", s.V, tr.Cautions, err)
	}
	if _, err := design.ServiceLoad([]site.Action{{Name: "Uplift", V: -10e3}}, design.Characteristic, &tr, "kN"); err == nil {
		t.Error("an upward load gave no error")
	}
}

// An upward variable action and one marked favourable are left out of
// the serviceability load, with a note (hand calculation, EN 1990:2002
// eq. (6.14b) with 6.4.3.2(3)): G = 500 kN, Q = 100 kN, uplift −80 kN,
// a favourable 30 kN: characteristic 500 + 100 = 600 kN, not 520 kN.
// Exact.
func TestServiceLoadFavourable(t *testing.T) {
	acts := []site.Action{
		{Name: "Dead", V: 500e3},
		{Name: "Uplift", Kind: site.Variable, V: -80e3, Psi0: site.Some(0.6), Psi2: site.Some(0)},
		{Name: "Imposed", Kind: site.Variable, V: 100e3, Psi0: site.Some(0.7), Psi2: site.Some(0.3)},
		{Name: "Ballast", Kind: site.Variable, V: 30e3, Favourable: true, Psi0: site.Some(0.7), Psi2: site.Some(1)},
	}
	for _, c := range []struct {
		kind design.ServiceKind
		want float64
	}{{design.Characteristic, 600e3}, {design.QuasiPermanent, 530e3}} {
		var tr trace.Trace
		s, err := design.ServiceLoad(acts, c.kind, &tr, "kN")
		if err != nil || s.V != c.want {
			t.Errorf("%v: V = %v, want %v (%v)", c.kind, s.V, c.want, err)
		}
		if len(tr.Cautions) != 1 || tr.Cautions[0].Code != "sls-favourable" {
			t.Errorf("%v: cautions %+v", c.kind, tr.Cautions)
		}
		if err := trace.Verify(tr, 1e-9); err != nil {
			t.Error(err)
		}
	}
}

// A sum that overflows is an error, not an infinite load: two permanent
// actions of 1e308 N (nothing in ServiceLoad bounds an action) add to more
// than the largest float64, so V_SLS = V_k_1 + V_k_2 is infinite and the
// recorder refuses it.
func TestServiceLoadOverflow(t *testing.T) {
	var tr trace.Trace
	_, err := design.ServiceLoad([]site.Action{{Name: "A", V: 1e308}, {Name: "B", V: 1e308}}, design.Characteristic, &tr, "kN")
	var de *trace.DomainError
	if !errors.As(err, &de) || de.Symbol != "V_SLS" {
		t.Errorf("error %v, want the domain error of V_SLS", err)
	}
}
