package units

import (
	"math"
	"strconv"
	"strings"
)

// display is the table behind Display: the unit an engineer expects to read
// for each common dimension.
var display = map[Dim]Unit{
	None:        Dimensionless,
	Length:      MustParse("m"),
	Area:        MustParse("m2"),
	Volume:      MustParse("m3"),
	Mass:        MustParse("kg"),
	Time:        MustParse("s"),
	Angle:       MustParse("deg"),
	Force:       MustParse("kN"), // also moment per length, kNm/m: same dimension
	Pressure:    MustParse("kPa"),
	UnitWeight:  MustParse("kN/m3"),
	LineLoad:    MustParse("kN/m"),
	Moment:      MustParse("kNm"),
	Compliance:  MustParse("m2/MN"),
	Diffusivity: MustParse("m2/yr"),
	Velocity:    MustParse("m/s"),
	Accel:       MustParse("m/s2"),
}

// Display returns the unit a value of dimension d is shown in when the
// sheet names none: kPa for stresses, kN for forces, kN/m3 for unit
// weights, kN/m for line loads, kNm for moments, m2/MN for m_v, m2/yr for
// c_v, deg for angles, s for times (see DisplayFor), "" for pure numbers.
// A moment per length (kNm/m) has the dimension of a force and so displays
// as kN; sheets write "-> kNm/m" where they mean it. Other forces per power
// of length are kN·m^k; anything else is the coherent SI composition.
func Display(d Dim) Unit {
	if u, ok := display[d]; ok {
		return u
	}
	if d.M == 1 && d.T == -2 && d.A == 0 {
		return Unit{Name: "kN" + lengthPower(int(d.L)-1), Factor: 1e3, Dim: d}
	}
	return SI(d)
}

// DisplayFor is Display with one refinement by magnitude: a time is shown
// in s below 2 min, min below 2 h, h below 2 days, day below 1 yr, else yr.
func DisplayFor(q Quantity) Unit {
	if q.Dim != Time {
		return Display(q.Dim)
	}
	t := math.Abs(q.V)
	for _, c := range timeSteps {
		if t < c.below {
			return c.u
		}
	}
	return year
}

var (
	year      = MustParse("yr")
	timeSteps = []struct {
		below float64 // SI seconds
		u     Unit
	}{
		{120, MustParse("s")},
		{7200, MustParse("min")},
		{2 * 86400, MustParse("h")},
		{year.Factor, MustParse("day")},
	}
)

// SI returns the coherent SI unit (factor 1) of dimension d, as written in
// JSON "si_unit": "Pa", "N", "N/m3", "N/m", "N*m", "1/Pa", "m2/s", "rad",
// "" for a pure number. Forces per power of length use N and Pa; the rest
// is kg, m, s and rad with the positive powers first, then each negative
// one after its own "/" (left-to-right reading, so "kg/m/s2" is kg/(m·s²)).
func SI(d Dim) Unit {
	u := Unit{Factor: 1, Dim: d}
	var b strings.Builder
	switch {
	case d.M == 1 && d.T == -2:
		if d.L == -1 {
			b.WriteString("Pa")
		} else {
			b.WriteString("N" + lengthPower(int(d.L)-1))
		}
		writeFactor(&b, "rad", int(d.A))
	case d.M == -1 && d.T == 2 && d.L == 1 && d.A == 0:
		b.WriteString("1/Pa")
	default:
		exps := [4]int{int(d.M), int(d.L), int(d.T), int(d.A)}
		syms := [4]string{"kg", "m", "s", "rad"}
		for i, e := range exps {
			if e > 0 {
				writeFactor(&b, syms[i], e)
			}
		}
		if b.Len() == 0 && d != None {
			b.WriteString("1")
		}
		for i, e := range exps {
			if e < 0 {
				writeFactor(&b, syms[i], e)
			}
		}
	}
	u.Name = b.String()
	return u
}

// lengthPower writes m^k as a suffix: "" for 0, "*m2" for 2, "/m3" for -3.
func lengthPower(k int) string {
	switch {
	case k == 0:
		return ""
	case k == 1:
		return "*m"
	case k == -1:
		return "/m"
	case k > 0:
		return "*m" + strconv.Itoa(k)
	}
	return "/m" + strconv.Itoa(-k)
}

// writeFactor appends sym^e with "*" (e > 0) or "/" (e < 0) when b is not empty.
func writeFactor(b *strings.Builder, sym string, e int) {
	if e == 0 {
		return
	}
	switch {
	case e < 0:
		b.WriteByte('/')
	case b.Len() > 0:
		b.WriteByte('*')
	}
	b.WriteString(sym)
	if a := abs(e); a != 1 {
		b.WriteString(strconv.Itoa(a))
	}
}

func abs(x int) int {
	if x < 0 {
		return -x
	}
	return x
}
