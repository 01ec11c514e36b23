package units_test

import (
	"fmt"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
)

// Display units are our own choice (doc comment of Display): the units of
// everyday geotechnical practice in SI countries (common practice).
func TestDisplay(t *testing.T) {
	for _, r := range []struct {
		dim  units.Dim
		want string
	}{
		{units.None, ""},
		{units.Length, "m"},
		{units.Area, "m2"},
		{units.Volume, "m3"},
		{units.Pressure, "kPa"},
		{units.Force, "kN"},
		{units.UnitWeight, "kN/m3"},
		{units.LineLoad, "kN/m"},
		{units.Moment, "kNm"},
		{units.MustParse("kNm/m").Dim, "kN"}, // same dimension as a force
		{units.Compliance, "m2/MN"},
		{units.Diffusivity, "m2/yr"},
		{units.Time, "s"},
		{units.Angle, "deg"},
		{units.Velocity, "m/s"},
		{units.Mass, "kg"},
		{units.Dim{L: -3, M: 1}, "kg/m3"},
		{units.Dim{L: 3, M: 1, T: -2}, "kN*m2"},
		{units.Dim{L: -3, M: 1, T: -2}, "kN/m4"},
		{units.Dim{T: -1}, "1/s"},
	} {
		u := units.Display(r.dim)
		if u.Name != r.want || u.Dim != r.dim {
			t.Errorf("Display(%v) = %+v, want %q", r.dim, u, r.want)
			continue
		}
		// The display unit is itself a parseable unit with the same factor.
		p, err := units.Parse(u.Name)
		if err != nil || p.Dim != u.Dim || math.Abs(p.Factor-u.Factor) > 1e-12*u.Factor {
			t.Errorf("Display(%v) = %+v does not read back: %+v, %v", r.dim, u, p, err)
		}
	}
}

func TestDisplayForTime(t *testing.T) {
	for _, r := range []struct {
		v    float64
		want string
	}{{30, "s"}, {600, "min"}, {36000, "h"}, {30 * 86400, "day"}, {3 * 3.15576e7, "yr"}, {-600, "min"}} {
		if got := units.DisplayFor(units.Quantity{V: r.v, Dim: units.Time}).Name; got != r.want {
			t.Errorf("DisplayFor(%g s) = %q, want %q", r.v, got, r.want)
		}
	}
}

func TestSI(t *testing.T) {
	for _, r := range []struct {
		dim  units.Dim
		want string
	}{
		{units.None, ""},
		{units.Pressure, "Pa"},
		{units.Force, "N"},
		{units.UnitWeight, "N/m3"},
		{units.LineLoad, "N/m"},
		{units.Moment, "N*m"},
		{units.Compliance, "1/Pa"},
		{units.Diffusivity, "m2/s"},
		{units.Angle, "rad"},
		{units.Length, "m"},
		{units.Dim{L: -3, M: 1}, "kg/m3"},
		{units.Dim{L: -1, M: 1, T: -2, A: 1}, "Pa*rad"},
		{units.Dim{L: 1, M: 1, T: -1}, "kg*m/s"},
		{units.Dim{T: -1}, "1/s"},
		{units.Dim{L: -1, T: -2}, "1/m/s2"},
	} {
		u := units.SI(r.dim)
		if u.Name != r.want || u.Factor != 1 {
			t.Errorf("SI(%v) = %+v, want %q", r.dim, u, r.want)
			continue
		}
		if p, err := units.Parse(u.Name); err != nil || p.Dim != r.dim || p.Factor != 1 {
			t.Errorf("SI(%v) = %q does not read back: %+v, %v", r.dim, u.Name, p, err)
		}
	}
}

// Formatting rules are our own (doc comment of Format).
func TestFormat(t *testing.T) {
	kPa, m, mm := units.MustParse("kPa"), units.MustParse("m"), units.MustParse("mm")
	for _, r := range []struct {
		v    float64
		u    units.Unit
		dec  int
		want string
	}{
		{245.66e3, kPa, -1, "246"},  // kN and kPa: whole from 100 up
		{24.567e3, kPa, -1, "24.6"}, // three significant figures below
		{2.4567e3, kPa, -1, "2.46"},
		{99.96e3, kPa, -1, "100"},
		{0.65e3, kPa, -1, "0.65"},
		{9.81e3, units.MustParse("kN/m3"), -1, "9.81"},
		{58.89e3, units.MustParse("kN/m"), -1, "58.9"},
		{2.4, m, -1, "2.4"},
		{18e3, kPa, -1, "18"},
		{1250e3, kPa, -1, "1250"},
		{12345.6e3, kPa, -1, "12346"},
		{999.96e3, kPa, -1, "1000"},
		{12345.6, m, -1, "12350"}, // four significant figures for the rest
		{999.96, m, -1, "1000"},
		{245.66, m, -1, "245.7"},
		{112.5e3, kPa, -1, "113"}, // a tie rounds away from zero
		{-112.5e3, kPa, -1, "-113"},
		{0.125, m, -1, "0.125"},
		{2.4565, m, -1, "2.457"},
		{0.0245, m, 2, "0.02"}, // 0.0245 is below the tie in binary
		{0.24567, m, -1, "0.246"},
		{0.0012345, m, -1, "0.00123"},
		{0.000045, m, -1, "4.5e-5"},
		{1.23456e8, m, -1, "1.235e8"},
		{-3.14159, m, -1, "-3.142"},
		{0, m, -1, "0"},
		{math.Copysign(0, -1), m, -1, "0"},
		{-0.0001, m, 2, "0.00"},
		{0.0254, mm, 1, "25.4"},
		{0.02459, mm, -1, "24.6"},   // mm: to 0.1 mm
		{0.024, mm, -1, "24.0"},     // the tenth kept
		{1.23456, mm, -1, "1234.6"}, // 0.1 mm whatever the size
		{0.000123, mm, -1, "0.12"},  // two significant figures below 1 mm
		{2.4, m, 2, "2.40"},
		{math.NaN(), m, -1, "NaN"},
		{math.Inf(-1), m, 2, "-Inf"},
		{0.05, units.MustParse("%"), -1, "5"},
	} {
		if got := units.Format(r.v, r.u, r.dec); got != r.want {
			t.Errorf("Format(%g, %q, %d) = %q, want %q", r.v, r.u.Name, r.dec, got, r.want)
		}
	}
}

func TestDimAlgebra(t *testing.T) {
	if got := units.Force.Div(units.Area); got != units.Pressure {
		t.Errorf("N/m2 = %v", got)
	}
	if got := units.Length.Mul(units.Force); got != units.Moment {
		t.Errorf("m·N = %v", got)
	}
	if got := units.Length.Pow(3); got != units.Volume {
		t.Errorf("m^3 = %v", got)
	}
	if got, ok := units.Area.Root(2); !ok || got != units.Length {
		t.Errorf("sqrt(m2) = %v, %v", got, ok)
	}
	if _, ok := units.Volume.Root(2); ok {
		t.Errorf("sqrt(m3) should fail")
	}
	if _, ok := (units.Dim{L: 100}).MulOK(units.Dim{L: 100}); ok {
		t.Errorf("L^200 should overflow")
	}
	for _, r := range []struct {
		d    units.Dim
		want string
	}{{units.Pressure, "L^-1 M T^-2"}, {units.None, "1"}, {units.Angle, "A"}, {units.Diffusivity, "L^2 T^-1"}} {
		if got := r.d.String(); got != r.want {
			t.Errorf("%#v.String() = %q, want %q", r.d, got, r.want)
		}
	}
}

func ExampleParse() {
	u, err := units.Parse("kN/m^3")
	fmt.Println(u.Name, u.Factor, u.Dim, err)
	_, err = units.Parse("kpa")
	fmt.Println(err)
	// Output:
	// kN/m3 1000 L^-2 M T^-2 <nil>
	// unknown unit "kpa"; did you mean "kPa"?
}

func ExampleFormat() {
	q := units.MustParse("kN").Of(950).V / units.MustParse("m2").Of(2.4*3.0).V
	fmt.Println(units.Format(q, units.Display(units.Pressure), -1), units.Display(units.Pressure).Name)
	fmt.Println(units.Quantity{V: 3.15576e7 * 2.5, Dim: units.Time})
	// Output:
	// 132 kPa
	// 2.5 yr
}

func ExampleDisplay() {
	for _, d := range []units.Dim{units.Pressure, units.UnitWeight, units.Compliance, units.Diffusivity, units.Moment} {
		fmt.Printf("%s -> %q (SI %q)\n", d, units.Display(d).Name, units.SI(d).Name)
	}
	// Output:
	// L^-1 M T^-2 -> "kPa" (SI "Pa")
	// L^-2 M T^-2 -> "kN/m3" (SI "N/m3")
	// L M^-1 T^2 -> "m2/MN" (SI "1/Pa")
	// L^2 T^-1 -> "m2/yr" (SI "m2/s")
	// L^2 M T^-2 -> "kNm" (SI "N*m")
}

// Printed is Format with the minus sign U+2212, and no "−0".
func TestPrinted(t *testing.T) {
	kPa := units.MustParse("kPa")
	for _, c := range []struct {
		v    float64
		dec  int
		want string
	}{{-12.5e3, -1, "−12.5"}, {245.7e3, -1, "246"}, {-0.0001, 1, "0.0"}, {-1e3, 2, "−1.00"}} {
		if got := units.Printed(c.v, kPa, c.dec); got != c.want {
			t.Errorf("Printed(%g, kPa, %d) = %q, want %q", c.v, c.dec, got, c.want)
		}
	}
}
