package units_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
)

// Conversion factors. Each row names its source. NIST SP 811 is B. N.
// Taylor and A. Thompson, "Guide for the Use of the International System
// of Units (SI)", NIST Special Publication 811, 2008 edition: Table 1 (SI
// base units), Table 3 (derived units with special names), Table 5 (SI
// prefixes), Table 6 (units accepted for use with the SI), §7.10.2
// (percent) and Appendix B.8 (factors for units listed alphabetically).
// The B.8 factors below are as recalled from that table (from memory: the
// document itself could not be opened while these tests were written, nor
// in the verification pass, which found only its title page); the exact
// ones (day, hour, minute, metric ton, stokes) are printed in bold there,
// degree is given to seven figures. Their values are in any case the
// definitions of these units accepted for use with the SI (min = 60 s,
// h = 3600 s, d = 86 400 s, t = 1000 kg, ° = (π/180) rad = 0.017 453 29 rad;
// St = cm²/s = 1E-04 m²/s by the CGS definition), checked independently.
//
// Tolerance: 1e-12 relative unless the row says otherwise.
var factorRows = []struct {
	unit   string
	factor float64 // SI value of one unit
	dim    units.Dim
	tol    float64
	source string
}{
	{"m", 1, units.Length, 1e-12, "NIST SP 811 (2008) Table 1: metre, SI base unit"},
	{"mm", 1e-3, units.Length, 1e-12, "NIST SP 811 (2008) Table 5: milli = 1E-03"},
	{"cm", 1e-2, units.Length, 1e-12, "NIST SP 811 (2008) Table 5: centi = 1E-02"},
	{"km", 1e3, units.Length, 1e-12, "NIST SP 811 (2008) Table 5: kilo = 1E+03"},
	{"N", 1, units.Force, 1e-12, "NIST SP 811 (2008) Table 3: newton = m·kg·s^-2"},
	{"kN", 1e3, units.Force, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN = 1E+03 N"},
	{"MN", 1e6, units.Force, 1e-12, "NIST SP 811 (2008) Tables 3, 5: mega = 1E+06"},
	{"Pa", 1, units.Pressure, 1e-12, "NIST SP 811 (2008) Table 3: pascal = N/m^2"},
	{"kPa", 1e3, units.Pressure, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kPa = 1E+03 Pa"},
	{"MPa", 1e6, units.Pressure, 1e-12, "NIST SP 811 (2008) Tables 3, 5: MPa = 1E+06 Pa"},
	{"GPa", 1e9, units.Pressure, 1e-12, "NIST SP 811 (2008) Tables 3, 5: giga = 1E+09"},
	{"kN/m2", 1e3, units.Pressure, 1e-12, "NIST SP 811 (2008) Table 3: N/m^2 = Pa, so kN/m2 = 1E+03 Pa"},
	{"kN/m3", 1e3, units.UnitWeight, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN/m^3 = 1E+03 N/m^3"},
	{"kN/m^3", 1e3, units.UnitWeight, 1e-12, "NIST SP 811 (2008) Tables 3, 5: as kN/m3"},
	{"kN/m³", 1e3, units.UnitWeight, 1e-12, "NIST SP 811 (2008) Tables 3, 5: as kN/m3"},
	{"m2", 1, units.Area, 1e-12, "NIST SP 811 (2008) Table 1: m^2 coherent"},
	{"m^2", 1, units.Area, 1e-12, "NIST SP 811 (2008) Table 1: m^2 coherent"},
	{"m²", 1, units.Area, 1e-12, "NIST SP 811 (2008) Table 1: m^2 coherent"},
	{"m3", 1, units.Volume, 1e-12, "NIST SP 811 (2008) Table 1: m^3 coherent"},
	{"mm2", 1e-6, units.Area, 1e-12, "NIST SP 811 (2008) Table 5 and §6.2.6: mm^2 = (1E-03 m)^2"},
	{"kg", 1, units.Mass, 1e-12, "NIST SP 811 (2008) Table 1: kilogram, SI base unit"},
	{"g", 1e-3, units.Mass, 1e-12, "NIST SP 811 (2008) Table 5 and §6.2.7: g = 1E-03 kg"},
	{"Mg", 1e3, units.Mass, 1e-12, "NIST SP 811 (2008) Table 5 and §6.2.7: Mg = 1E+06 g = 1E+03 kg"},
	{"t", 1.0e3, units.Mass, 1e-12, "NIST SP 811 (2008) B.8: ton, metric (t) = 1.0E+03 kg"},
	{"rad", 1, units.Angle, 1e-12, "NIST SP 811 (2008) Table 3: radian = m/m"},
	{"deg", math.Pi / 180, units.Angle, 1e-12, "NIST SP 811 (2008) Table 6: 1° = (π/180) rad"},
	{"deg", 1.745329e-2, units.Angle, 5e-7, "NIST SP 811 (2008) B.8: degree (°) = 1.745 329 E-02 rad (7 figures, tolerance 5e-7 relative)"},
	{"°", 1.745329e-2, units.Angle, 5e-7, "NIST SP 811 (2008) B.8: degree (°) = 1.745 329 E-02 rad (7 figures, tolerance 5e-7 relative)"},
	{"s", 1, units.Time, 1e-12, "NIST SP 811 (2008) Table 1: second, SI base unit"},
	{"min", 6.0e1, units.Time, 1e-12, "NIST SP 811 (2008) B.8: minute (min) = 6.0 E+01 s"},
	{"h", 3.6e3, units.Time, 1e-12, "NIST SP 811 (2008) B.8: hour (h) = 3.6 E+03 s"},
	{"day", 8.64e4, units.Time, 1e-12, "NIST SP 811 (2008) B.8: day (d) = 8.64 E+04 s"},
	{"days", 8.64e4, units.Time, 1e-12, "NIST SP 811 (2008) B.8: day (d) = 8.64 E+04 s"},
	{"week", 7 * 8.64e4, units.Time, 1e-12, "NIST SP 811 (2008) B.8: day = 8.64 E+04 s; week = 7 d (common practice, not in B.8)"},
	{"yr", 365.25 * 8.64e4, units.Time, 1e-12, "NIST SP 811 (2008) B.8: day = 8.64 E+04 s; Julian year = 365.25 d = 3.155 76 E+07 s (common practice in astronomy; B.8's year (365 days) = 3.1536 E+07 s is the calendar year and is not used)"},
	{"weeks", 6.048e5, units.Time, 1e-12, "NIST SP 811 (2008) B.8: day = 8.64 E+04 s; week = 7 d (common practice, not in B.8)"},
	{"month", 2.6298e6, units.Time, 1e-12, "1/12 of the Julian year (yr): 30.4375 × 8.64 E+04 s = 2.6298 E+06 s (plinth's definition; NIST SP 811 B.8 lists no month)"},
	{"months", 2.6298e6, units.Time, 1e-12, "as month"},
	{"years", 3.15576e7, units.Time, 1e-12, "as yr: 365.25 × 8.64 E+04 s"},
	{"year", 3.15576e7, units.Time, 1e-12, "as yr: 365.25 × 8.64 E+04 s"},
	{"m2/yr", 1 / 3.15576e7, units.Diffusivity, 1e-12, "NIST SP 811 (2008) B.8: day = 8.64 E+04 s; 1 m2/yr = 1/(365.25 × 8.64 E+04) m2/s"},
	{"m2/s", 1, units.Diffusivity, 1e-12, "NIST SP 811 (2008) Table 1: m^2/s coherent"},
	{"cm2/s", 1.0e-4, units.Diffusivity, 1e-12, "NIST SP 811 (2008) B.8: stokes (St) = cm^2/s = 1.0 E-04 m^2/s"},
	{"m2/MN", 1e-6, units.Compliance, 1e-12, "NIST SP 811 (2008) Tables 3, 5: m^2/MN = 1E-06 m^2/N = 1E-06 Pa^-1"},
	{"1/kPa", 1e-3, units.Compliance, 1e-12, "NIST SP 811 (2008) Tables 3, 5: 1/kPa = 1E-03 Pa^-1"},
	{"kNm", 1e3, units.Moment, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN·m = 1E+03 N·m"},
	{"kN*m", 1e3, units.Moment, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN·m = 1E+03 N·m"},
	{"kN·m", 1e3, units.Moment, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN·m = 1E+03 N·m"},
	{"MNm", 1e6, units.Moment, 1e-12, "NIST SP 811 (2008) Tables 3, 5: MN·m = 1E+06 N·m"},
	{"kN/m", 1e3, units.LineLoad, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN/m = 1E+03 N/m"},
	{"kNm/m", 1e3, units.Force, 1e-12, "NIST SP 811 (2008) Tables 3, 5: kN·m/m = 1E+03 N"},
	{"%", 0.01, units.None, 1e-12, "NIST SP 811 (2008) §7.10.2: % = 0.01"},
	{"", 1, units.None, 1e-12, "NIST SP 811 (2008) §7.10: the unit one, not written"},
	{"-", 1, units.None, 1e-12, "NIST SP 811 (2008) §7.10: the unit one (\"-\" in table headers, common practice)"},
	{"kN/m/s", 1e3, units.Dim{M: 1, T: -3}, 1e-12, "left-to-right reading: kN/(m·s) (our grammar, doc.go)"},
	{"kN/m*s", 1e3, units.Dim{M: 1, T: -1}, 1e-12, "left-to-right reading: (kN/m)·s (our grammar, doc.go)"},
	{"m^-1", 1, units.Dim{L: -1}, 1e-12, "negative power (our grammar, doc.go)"},
	{" kPa ", 1e3, units.Pressure, 1e-12, "surrounding spaces ignored (our grammar, doc.go)"},
}

func TestParseFactors(t *testing.T) {
	for _, r := range factorRows {
		u, err := units.Parse(r.unit)
		if err != nil {
			t.Errorf("Parse(%q): %v [%s]", r.unit, err, r.source)
			continue
		}
		if rel := math.Abs(u.Factor-r.factor) / r.factor; rel > r.tol {
			t.Errorf("Parse(%q).Factor = %.17g, want %.17g (rel %.2g > %.0g) [%s]", r.unit, u.Factor, r.factor, rel, r.tol, r.source)
		}
		if u.Dim != r.dim {
			t.Errorf("Parse(%q).Dim = %v, want %v [%s]", r.unit, u.Dim, r.dim, r.source)
		}
	}
}

// Every name in the table has at least one factor row above.
func TestEveryNameChecked(t *testing.T) {
	checked := map[string]bool{}
	for _, r := range factorRows {
		checked[strings.TrimSpace(r.unit)] = true
	}
	for _, n := range units.Names() {
		if !checked[n] {
			t.Errorf("unit %q has no NIST factor row", n)
		}
	}
}

func TestCanonicalName(t *testing.T) {
	for _, r := range []struct{ in, want string }{
		{"kN/m^3", "kN/m3"}, {"kN/m³", "kN/m3"}, {"kN·m", "kN*m"}, {"m^-1", "m^-1"},
		{"1/kPa", "1/kPa"}, {"m2/MN", "m2/MN"}, {"°", "°"}, {"-", ""}, {"m^+2", "m2"},
	} {
		if got := units.MustParse(r.in).Name; got != r.want {
			t.Errorf("Parse(%q).Name = %q, want %q", r.in, got, r.want)
		}
	}
}

func TestParseErrors(t *testing.T) {
	for _, r := range []struct {
		in       string
		off, end int
		msg      string
	}{
		{"kpa", 0, 3, `unknown unit "kpa"; did you mean "kPa"?`},
		{"kN/m4x", 5, 6, `expected "*", "/" or the end of the unit, found "x"`},
		{"kN/xm", 3, 5, `unknown unit "xm"`},
		{"kN/mm^", 5, 6, `expected an integer power after "^"`},
		{"kN m", 2, 3, `space inside unit`},
		{"kN//m", 3, 4, `expected a unit name, found "/"`},
		{"kN/", 3, 3, `expected a unit name at the end`},
		{"m^0", 1, 3, `power 0`},
		{"m^12", 1, 4, `too large`},
		{"m+", 1, 2, `expected "*", "/" or the end of the unit, found "+"`},
		{"KN", 0, 2, `did you mean "kN"?`},
		{"degs", 0, 4, `did you mean "deg"?`},
		{"1/", 2, 2, `expected a unit name`},
		{"m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9*m^-9", 0, 74, `out of range`},
	} {
		_, err := units.Parse(r.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) {
			t.Errorf("Parse(%q) = %v, want *ParseError", r.in, err)
			continue
		}
		if pe.Off != r.off || pe.End != r.end || !strings.Contains(pe.Msg, r.msg) {
			t.Errorf("Parse(%q) = [%d,%d) %q, want [%d,%d) containing %q", r.in, pe.Off, pe.End, pe.Msg, r.off, r.end, r.msg)
		}
	}
}

func TestSuggest(t *testing.T) {
	for _, r := range []struct{ in, want string }{
		{"kpa", "kPa"}, {"KN", "kN"}, {"mpa", "MPa"}, {"kNn", "kN"}, {"degs", "deg"},
		{"hr", "h"}, {"B", ""}, {"x", ""}, {"gamma", ""}, {"kPa", ""}, {"", ""},
	} {
		if got := units.Suggest(r.in); got != r.want {
			t.Errorf("Suggest(%q) = %q, want %q", r.in, got, r.want)
		}
	}
}

func FuzzParse(f *testing.F) {
	for _, r := range factorRows {
		f.Add(r.unit)
	}
	for _, s := range []string{"kpa", "1/", "m^", "m^-", "kN m", "°C", "m²³", "·", "kN/m^-99", "%%", "\xff"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		u, err := units.Parse(s)
		if err != nil {
			var pe *units.ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("Parse(%q) error %T, want *ParseError", s, err)
			}
			if pe.Off < 0 || pe.End < pe.Off || pe.End > len(s) {
				t.Fatalf("Parse(%q) error span [%d,%d) outside [0,%d]", s, pe.Off, pe.End, len(s))
			}
			return
		}
		if math.IsNaN(u.Factor) || math.IsInf(u.Factor, 0) || u.Factor == 0 {
			t.Fatalf("Parse(%q).Factor = %v", s, u.Factor)
		}
		// The canonical name reads back to the same unit.
		v, err := units.Parse(u.Name)
		if err != nil || v.Dim != u.Dim || math.Abs(v.Factor-u.Factor) > 1e-12*u.Factor || v.Name != u.Name {
			t.Fatalf("Parse(%q) = %+v; re-parse of %q = %+v, %v", s, u, u.Name, v, err)
		}
	})
}
