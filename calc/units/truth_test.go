package units_test

import (
	"math"
	"strconv"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
)

// factor is u's SI factor (1 for a pure number).
func factor(u units.Unit) float64 {
	if u.Factor == 0 {
		return 1
	}
	return u.Factor
}

// order is the relation of a and b: -1, 0 or 1.
func order(a, b float64) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}

// The rule is our own (doc comment of Apart): printed sides keep the
// order of the values. Cases run through 24.95..25.05 mm against 25 mm and
// 0.995..1.005 against 1, in steps of 0.001 of the unit, at automatic and
// at fixed decimals.
func TestApartAroundLimits(t *testing.T) {
	mm := units.MustParse("mm")
	type span struct {
		lim  float64 // in the unit
		u    units.Unit
		from float64 // in the unit
	}
	for _, sp := range []span{{25, mm, 24.95}, {1, units.Dimensionless, 0.995}, {250, units.MustParse("kPa"), 249.95}} {
		for i := 0; i <= 100; i++ {
			x := sp.from + float64(i)*0.001
			l, r := x*factor(sp.u), sp.lim*factor(sp.u)
			for _, dec := range []int{-1, 0, 1, 2} {
				ls, rs := units.Apart(l, r, sp.u, dec, -1)
				a, _ := strconv.ParseFloat(ls, 64)
				b, _ := strconv.ParseFloat(rs, 64)
				if order(a, b) != order(l, r) {
					t.Errorf("Apart(%v %s, %v, dec %d) = %q, %q: order lost", x, sp.u.Name, sp.lim, dec, ls, rs)
				}
				s := units.Beside(l, []float64{r}, sp.u, dec)
				a, _ = strconv.ParseFloat(s, 64)
				if order(a, sp.lim) != order(l, r) {
					t.Errorf("Beside(%v %s, %v, dec %d) = %q: order lost", x, sp.u.Name, sp.lim, dec, s)
				}
			}
		}
	}
}

func TestApart(t *testing.T) {
	mm := units.MustParse("mm")
	for _, r := range []struct {
		l, r   float64
		dl, dr int
		ls, rs string
	}{
		{0.02459, 0.025, -1, -1, "24.6", "25.0"},  // far enough apart: the rule's own digits
		{0.02496, 0.025, -1, -1, "24.96", "25.0"}, // 25.0 would read as the limit
		{0.025, 0.025, -1, -1, "25.0", "25.0"},    // equal prints equal
		{0.02504, 0.025, -1, -1, "25.04", "25.0"}, // just over
		{0.029043, 0.025, -1, -1, "29.0", "25.0"}, // failing, far over
		{0.02459, 0.025, 0, 0, "24.6", "25.0"},
	} {
		ls, rs := units.Apart(r.l, r.r, mm, r.dl, r.dr)
		if ls != r.ls || rs != r.rs {
			t.Errorf("Apart(%g, %g, %d, %d) = %q, %q; want %q, %q", r.l, r.r, r.dl, r.dr, ls, rs, r.ls, r.rs)
		}
	}
}

func TestUtilisation(t *testing.T) {
	for _, r := range []struct {
		u    float64
		want string
	}{
		{0.574, "0.57"}, {0.5, "0.50"}, {0.98, "0.98"}, {0.996, "0.996"}, {0.9999, "0.9999"},
		{1, "1.00"}, {1.004, "1.004"}, {1.006, "1.01"}, {1.16, "1.16"}, {math.NaN(), "NaN"},
	} {
		if got := units.Utilisation(r.u); got != r.want {
			t.Errorf("Utilisation(%g) = %q, want %q", r.u, got, r.want)
		}
	}
}

func TestRelation(t *testing.T) {
	for _, r := range []struct {
		op   string
		ok   bool
		want string
	}{{"<=", true, "<="}, {"<=", false, ">"}, {">=", false, "<"}, {"<", false, ">="}, {">", false, "<="}, {"==", false, "!="}} {
		if got := units.Relation(r.op, r.ok); got != r.want {
			t.Errorf("Relation(%q, %v) = %q, want %q", r.op, r.ok, got, r.want)
		}
	}
}

func TestBesideEqual(t *testing.T) {
	m := units.MustParse("m")
	for _, r := range []struct {
		v, b float64
		d    int
		want string
	}{
		{0.025, 0.025, 2, "0.025"},      // equal prints equal, not 0.03
		{1.0 / 3, 1.0 / 3, -1, "0.333"}, // equal: no digits added for a value equal to its bound
		{0.02459, 0.025, 2, "0.02"},
	} {
		if got := units.Beside(r.v, []float64{r.b}, m, r.d); got != r.want {
			t.Errorf("Beside(%g, %g, %d) = %q, want %q", r.v, r.b, r.d, got, r.want)
		}
	}
}

// Significant: the typesetter's rule for constants in formulas (common
// practice: six significant figures, trailing zeros dropped).
func TestSignificant(t *testing.T) {
	for _, c := range []struct {
		v    float64
		sig  int
		want string
	}{{0.866, 6, "0.866"}, {45, 6, "45"}, {-2.5, 3, "−2.5"}, {123456789, 3, "123000000"}, {-0.00001, 1, "−0.00001"}, {0, 3, "0"}} {
		if got := units.Significant(c.v, c.sig); got != c.want {
			t.Errorf("Significant(%v, %d) = %q, want %q", c.v, c.sig, got, c.want)
		}
	}
}
