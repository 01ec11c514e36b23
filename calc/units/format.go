package units

import (
	"math"
	"strconv"
	"strings"
)

// Format writes the SI value v as a number of u. decimals ≥ 0 fixes the
// decimal places; decimals < 0 chooses them by the display-precision rules:
//
//	quantity                     automatic precision
//	millimetres (mm)             0.1 mm, the tenth kept ("24.6", "7.0", "25.0"); two
//	                             significant figures below 1 mm ("0.12")
//	forces, moments, stresses,   whole numbers from 100 up (2119, 246, 12346), three
//	unit weights (kN, kN/m, kNm, significant figures below (58.9, 9.81, 0.65)
//	kPa, MPa, kN/m3)
//	everything else              four significant figures from 1 up (12350, 1250, 245.7,
//	                             24.57, 2.457), three below 1 (0.246, 0.00123)
//
// A tie rounds away from zero (112.5 kPa prints 113). Trailing zeros are
// otherwise dropped (2.4, 18), and an exponent is used only
// outside [1e-4, 1e7): "1.235e8", "4.5e-6". Negative zero prints as "0";
// NaN and infinities as "NaN", "Inf", "-Inf". Utilisations are printed by
// Utilisation (two decimals), and a value printed against a value it is
// compared with by Apart and Beside, which add digits where these rules
// would round it onto or across the other.
func Format(v float64, u Unit, decimals int) string { return format(v, u, decimals, 0) }

// Printed is Format as the document prints it: a negative value with
// the minus sign U+2212 ("−12.5"), not a hyphen.
func Printed(v float64, u Unit, decimals int) string { return Minus(Format(v, u, decimals)) }

// Minus writes the leading hyphen-minus of a formatted number as the
// minus sign U+2212.
func Minus(s string) string {
	if strings.HasPrefix(s, "-") {
		return "−" + s[1:]
	}
	return s
}

// format is Format with extra digits: decimals+extra places when decimals
// are fixed, else extra more than the automatic rule gives.
func format(v float64, u Unit, decimals, extra int) string {
	x := v / u.factor()
	switch {
	case math.IsNaN(x):
		return "NaN"
	case math.IsInf(x, 1):
		return "Inf"
	case math.IsInf(x, -1):
		return "-Inf"
	}
	if decimals >= 0 {
		return clean(fixed(x, decimals+extra))
	}
	ax := math.Abs(x)
	if ax == 0 {
		return "0"
	}
	if u.Name == "mm" && ax >= 1 && ax < 1e7 {
		// to 0.1 mm, the tenth kept ("7.0"); digits added beyond it trimmed
		s := fixed(x, 1+extra)
		for extra > 0 && strings.HasSuffix(s, "0") {
			s, extra = s[:len(s)-1], extra-1
		}
		return clean(s)
	}
	if ax < 1e-4 || ax >= 1e7 {
		s := strconv.FormatFloat(x, 'e', 3+extra, 64)
		mant, exp, _ := strings.Cut(s, "e")
		mant = trimZeros(mant)
		n, _ := strconv.Atoi(exp)
		return mant + "e" + strconv.Itoa(n)
	}
	if forceLike(u) && ax >= 100 {
		return clean(fixed(x, extra)) // whole kN and kPa from 100 up
	}
	// Round to the significant figures first so 999.96 becomes 1000.
	sig := 4
	switch {
	case u.Name == "mm":
		sig = 2
	case ax < 1, forceLike(u):
		sig = 3
	}
	sig += extra
	mag := int(math.Floor(math.Log10(ax)))
	r := round(x, sig-1-mag)
	if m := int(math.Floor(math.Log10(math.Abs(r)))); m > mag { // 999.96 became 1000
		mag = m
	}
	return clean(trimZeros(fixed(r, max(sig-1-mag, 0))))
}

// round rounds x to d decimals (d < 0: to tens, hundreds…), a tie away
// from zero as in hand working (112.5 → 113, not 112).
func round(x float64, d int) float64 {
	if d >= 0 {
		p := math.Pow(10, float64(d))
		if y := x * p; math.Abs(y) < 1<<52 {
			return math.Round(y) / p
		}
		return x
	}
	q := math.Pow(10, float64(-d))
	return math.Round(x/q) * q
}

// fixed writes x with d decimals, rounded by round.
func fixed(x float64, d int) string { return strconv.FormatFloat(round(x, d), 'f', d, 64) }

// forceLike reports whether u measures a force or a force per power of
// length: kN, kN/m, kNm, kPa, MPa, kN/m3.
func forceLike(u Unit) bool { return u.Dim.M == 1 && u.Dim.T == -2 && u.Dim.A == 0 }

func trimZeros(s string) string {
	if !strings.Contains(s, ".") {
		return s
	}
	s = strings.TrimRight(s, "0")
	return strings.TrimSuffix(s, ".")
}

// clean turns "-0", "-0.00" and the like into their unsigned form.
func clean(s string) string {
	if strings.HasPrefix(s, "-") && strings.Trim(s[1:], "0.") == "" {
		return s[1:]
	}
	return s
}

// Significant prints v with at most sig significant digits, trailing zeros
// dropped, a negative value with the minus sign U+2212 and negative zero
// as "0": the constants inside formulas ("0.866", "45"), for magnitudes
// from 1e-4 to 1e6 (the typesetter writes others as m × 10ⁿ). It is the one
// rule for numbers the typesetter writes (doc/layout/eqn) beside Format's
// rules for quantities.
func Significant(v float64, sig int) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		if v == 0 {
			return "0"
		}
		return strconv.FormatFloat(v, 'g', -1, 64)
	}
	mag := int(math.Floor(math.Log10(math.Abs(v))))
	dec := sig - 1 - mag
	if dec < 0 {
		p := math.Pow(10, float64(-dec))
		v = math.Round(v/p) * p
		dec = 0
	}
	s := trimZeros(strconv.FormatFloat(v, 'f', dec, 64))
	if s == "-0" {
		return "0"
	}
	return Minus(s)
}
