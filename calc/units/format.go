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
//	everything else              four significant figures from 1 up (12350, 1250, 245.7,
//	                             24.57, 2.457), three below 1 (0.246, 0.00123)
//
// Trailing zeros are otherwise dropped (2.4, 18), and an exponent is used only
// outside [1e-4, 1e7): "1.235e8", "4.5e-6". Negative zero prints as "0";
// NaN and infinities as "NaN", "Inf", "-Inf". Utilisations are printed by
// Utilisation (two decimals), and a value printed against a value it is
// compared with by Apart and Beside, which add digits where these rules
// would round it onto or across the other.
func Format(v float64, u Unit, decimals int) string { return format(v, u, decimals, 0) }

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
		return clean(strconv.FormatFloat(x, 'f', decimals+extra, 64))
	}
	ax := math.Abs(x)
	if ax == 0 {
		return "0"
	}
	if u.Name == "mm" && ax >= 1 && ax < 1e7 {
		// to 0.1 mm, the tenth kept ("7.0"); digits added beyond it trimmed
		s := strconv.FormatFloat(x, 'f', 1+extra, 64)
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
	// Round to the significant figures first so 999.96 becomes 1000.
	sig := 4
	switch {
	case u.Name == "mm":
		sig = 2
	case ax < 1:
		sig = 3
	}
	sig += extra
	r, _ := strconv.ParseFloat(strconv.FormatFloat(x, 'e', sig-1, 64), 64)
	mag := int(math.Floor(math.Log10(math.Abs(r))))
	dec := max(sig-1-mag, 0)
	return clean(trimZeros(strconv.FormatFloat(r, 'f', dec, 64)))
}

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
