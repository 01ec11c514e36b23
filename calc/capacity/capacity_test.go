package capacity_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/capacity"
	"github.com/plinth-calc/plinth/calc/design"
	"github.com/plinth-calc/plinth/calc/settle"
	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/trace"
)

const deg = math.Pi / 180

func input() capacity.Input {
	g := site.Ground{Water: site.Some(1.5), Layers: []site.Layer{
		{Name: "Clay", Top: 0, Gamma: 19e3, GammaSat: site.Some(20e3), Cu: site.Some(75e3), Phi: site.Some(25 * deg),
			C: site.Some(5e3), Mv: site.Some(0.1e-6), Cv: site.Some(3.0 / settle.Year), Eu: site.Some(30e6)},
	}}
	f := site.Footing{Name: "F", Shape: site.Square, B: 2, D: 1}
	return capacity.Input{
		Bearing: bearing.Input{Ground: g, Footing: f, Options: bearing.Options{Approach: design.FS(3)}},
		Widths:  []float64{1, 2, 3, 4},
		Limit:   0.025,
	}
}

// Invariants (common practice): the allowable pressure is the lower of
// the two limits; on a uniform clay the settlement-limited pressure falls
// as the footing widens (a wider footing stresses deeper ground); the
// footing's own width is in the table. Round trip: at q_a,s the settlement
// engine gives s_lim to 0.1 % (the Brent tolerance is 1 Pa).
func TestTable(t *testing.T) {
	in := input()
	r, err := capacity.Table(in)
	if err != nil {
		t.Fatal(err)
	}
	if err := trace.Verify(r.Trace, 1e-9); err != nil {
		t.Error(err)
	}
	// each step says how its value was reached: the settlement-limited
	// pressure is a Brent root, q_allow its formula evaluated
	for _, s := range r.Trace.Steps {
		want := map[string]trace.Kind{"s_lim": trace.Given, "q_a_b": trace.Given, "q_a_s": trace.Solved, "q_allow": trace.ByFormula}[s.Symbol]
		if s.Kind != want {
			t.Errorf("%s %s: kind %v, want %v", s.Case, s.Symbol, s.Kind, want)
		}
	}
	if len(r.Rows) != 4 || !r.Rows[r.Own].Own || r.Rows[r.Own].B != 2 {
		t.Fatalf("rows %+v own %d", r.Rows, r.Own)
	}
	for i, row := range r.Rows {
		if row.QAllow != math.Min(row.QBearing, row.QSettle) {
			t.Errorf("B = %g: q_allow %v is not the lower of %v and %v", row.B, row.QAllow, row.QBearing, row.QSettle)
		}
		if i > 0 && row.QSettle >= r.Rows[i-1].QSettle {
			t.Errorf("q_a,s does not fall with width: %v then %v", r.Rows[i-1].QSettle, row.QSettle)
		}
		sin := in.Settle
		sin.Ground, sin.Footing = in.Bearing.Ground, in.Bearing.Footing
		sin.Footing.B = row.B
		sin.Q = site.Some(row.QSettle)
		s, err := settle.Compute(sin)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(s.Total-0.025) > 0.025e-3 {
			t.Errorf("B = %g: s(q_a,s) = %v m, want 0.025", row.B, s.Total)
		}
	}
	if v := r.Values[0]; v.Symbol != "q_allow" || v.V != r.Rows[r.Own].QAllow {
		t.Errorf("values %+v", r.Values)
	}
}

func TestErrors(t *testing.T) {
	in := input()
	in.Bearing.Options.Approach = design.DA1()
	if _, err := capacity.Table(in); err == nil || !strings.Contains(err.Error(), "allowable-stress approach") {
		t.Errorf("DA1: %v", err)
	}
	in = input()
	in.Widths = []float64{-1}
	if _, err := capacity.Table(in); err == nil {
		t.Error("negative width accepted")
	}
	in = input()
	in.Limit = 0
	if _, err := capacity.Table(in); err == nil {
		t.Error("zero limit accepted")
	}
}

// Undrained bearing at the footing's width, by hand from EN 1997-1:2004
// Annex D (D.3) with the FS approach: q_ult,net = (π + 2)·c_u·s_c with
// s_c = 1.2 (square) = 5.1416 × 75 × 1.2 = 462.7 kPa; q_a = 462.7/3 +
// σ_v0 (1 m × 19 kPa) = 173.2 kPa. Tolerance 0.1 kPa.
func TestUndrainedHand(t *testing.T) {
	r, err := capacity.Table(input())
	if err != nil {
		t.Fatal(err)
	}
	want := (math.Pi+2)*75e3*1.2/3 + 19e3
	if got := r.Rows[r.Own].QBearing; math.Abs(got-want) > 100 {
		t.Errorf("q_a,b = %.1f kPa, want %.1f kPa", got/1e3, want/1e3)
	}
}

// TestLoadAssumption: the table assumes a vertical, central load; when
// the footing's own characteristic actions are inclined or eccentric a
// warning says so with their ratios (hand calculation: H/V = 40/800 =
// 0.050, e_B/B = (80/800)/B).
func TestLoadAssumption(t *testing.T) {
	in := input()
	r, err := capacity.Table(in)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range r.Trace.Cautions {
		if c.Code == "capacity-load" {
			t.Fatalf("vertical central actions: unexpected %q", c.Message)
		}
	}
	in.Bearing.Actions = []site.Action{{Name: "G", V: 800e3, HB: 40e3, MB: 80e3}}
	r, err = capacity.Table(in)
	if err != nil {
		t.Fatal(err)
	}
	found := false
	want := fmt.Sprintf("inclined (H/V = 0.050) and eccentric (e_B/B = %.3f)", 0.1/in.Bearing.Footing.B)
	for _, c := range r.Trace.Cautions {
		if c.Code == "capacity-load" {
			found = true
			if !strings.Contains(c.Message, want) || !strings.Contains(c.Message, capacity.Assumes) {
				t.Errorf("message %q lacks %q", c.Message, want)
			}
		}
	}
	if !found {
		t.Error("no capacity-load warning for inclined, eccentric actions")
	}
}

// TestSettleNotVerified: a layer without stiffness under the table makes
// each width's settlement-limited pressure "not verified" (a CAUTION),
// never a silent pass.
func TestSettleNotVerified(t *testing.T) {
	in := input()
	in.Bearing.Ground.Layers = append(in.Bearing.Ground.Layers, site.Layer{Name: "Silt", Top: 2.5, Gamma: 19e3, Cu: site.Some(60e3), Phi: site.Some(25 * deg)})
	r, err := capacity.Table(in)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, c := range r.Trace.Cautions {
		if c.Code == "not-verified" && strings.Contains(c.Message, "Silt") {
			n++
		}
	}
	if n != len(r.Rows) {
		t.Errorf("%d not-verified cautions for %d widths", n, len(r.Rows))
	}
}

// TestCrossings: where the governing limit changes between two widths
// the engine gives the width at which q_a_b = q_a_s, checked against an
// independent bisection of the same two limits (60 halvings, so exact
// to far below the 0.1 mm tolerance) and against the rows on either
// side.
func TestCrossings(t *testing.T) {
	in := input()
	in.Widths = []float64{4, 1, 3} // out of order: rows are taken by width
	r, err := capacity.Table(in)
	if err != nil {
		t.Fatal(err)
	}
	changes := 0
	byB := map[float64]capacity.Row{}
	for _, row := range r.Rows {
		byB[row.B] = row
	}
	ws := []float64{1, 2, 3, 4}
	for i := 1; i < len(ws); i++ {
		if byB[ws[i-1]].Governs != byB[ws[i]].Governs {
			changes++
		}
	}
	if changes == 0 || len(r.Crossings) != changes {
		t.Fatalf("%d changes of the governing limit, %d crossings: %+v", changes, len(r.Crossings), r.Rows)
	}
	diff := func(b float64) float64 {
		cp, err := bearing.CapacityAt(in.Bearing, b)
		if err != nil {
			t.Fatal(err)
		}
		sin := in.Settle
		sin.Ground, sin.Footing = in.Bearing.Ground, in.Bearing.Footing
		sin.Footing.B = b
		al, err := settle.Allowable(sin, in.Limit)
		if err != nil {
			t.Fatal(err)
		}
		return cp.QRd - al.Q
	}
	for _, c := range r.Crossings {
		lo, hi := r.Rows[c.Between[0]], r.Rows[c.Between[1]]
		if !(lo.B < c.B && c.B < hi.B) || c.Below != lo.Governs || c.Above != hi.Governs {
			t.Errorf("crossing %+v between %+v and %+v", c, lo, hi)
		}
		a, b := lo.B, hi.B
		fa := diff(a)
		for range 60 {
			m := (a + b) / 2
			if fm := diff(m); (fm < 0) == (fa < 0) {
				a, fa = m, fm
			} else {
				b = m
			}
		}
		if math.Abs(c.B-(a+b)/2) > 2*capacity.CrossTol {
			t.Errorf("crossing at %.6f m, bisection %.6f m", c.B, (a+b)/2)
		}
		if math.Abs(c.QB-c.QS) > 1e-3*c.Q || c.Q != math.Min(c.QB, c.QS) {
			t.Errorf("at the crossing q_a_b = %v, q_a_s = %v, Q = %v", c.QB, c.QS, c.Q)
		}
	}
}
