package eqn

import (
	"math"
	"strings"
	"unicode"

	"github.com/plinth-calc/plinth/calc/units"
)

// Number prints v with at most sig significant digits; magnitudes of a
// million and more, or below 0.0001, print as m × 10ⁿ.
func Number(v float64, sig int) Node {
	a := math.Abs(v)
	if a == 0 || (a >= 1e-4 && a < 1e6) {
		return Num{Text: units.Significant(v, sig)}
	}
	exp := int(math.Floor(math.Log10(a)))
	m := v / math.Pow(10, float64(exp))
	if math.Abs(math.Round(m*1e9)/1e9) >= 10 { // rounding carried
		m /= 10
		exp++
	}
	return Row{Num{Text: units.Significant(m, sig)}, Op{"×"}, Script{Base: Num{Text: "10"}, Sup: Num{Text: units.Significant(float64(exp), 3)}}}
}

// Quantity is a number followed by its unit, a thin space between
// ("18 kN/m³"), or glued for degrees ("30°").
func Quantity(num, unit string) Node {
	u := strings.TrimSpace(unit)
	switch u {
	case "":
		return Num{Text: num}
	case "deg", "°":
		return Num{Text: num + "°"}
	}
	return Row{Num{Text: num}, Space{Em: 0.2}, Unit(u)}
}

// Unit typesets a unit written the sheet way: "kN/m3" → kN/m³,
// "m^2/yr" → m²/yr, "kN*m" → kN·m, "deg" → °. Powers become superscripts
// on the unit they follow.
func Unit(u string) Node {
	u = strings.TrimSpace(u)
	if u == "deg" {
		return Text{"°"}
	}
	var out Row
	var text strings.Builder
	var word strings.Builder // the letters the next power would attach to
	flushWord := func() {
		text.WriteString(word.String())
		word.Reset()
	}
	flushText := func() {
		flushWord()
		if text.Len() > 0 {
			out = append(out, Text{text.String()})
			text.Reset()
		}
	}
	rs := []rune(u)
	for i := 0; i < len(rs); i++ {
		r := rs[i]
		switch {
		case unicode.IsLetter(r) || r == 'µ' || r == '°' || r == '%':
			word.WriteRune(r)
		case r == '^' || (unicode.IsDigit(r) || r == '-') && word.Len() > 0:
			if r == '^' {
				i++
			}
			j := i
			for j < len(rs) && (unicode.IsDigit(rs[j]) || rs[j] == '.' || (j == i && (rs[j] == '-' || rs[j] == '−'))) {
				j++
			}
			exp := string(rs[i:j])
			if exp == "" {
				text.WriteRune('^')
				i--
				continue
			}
			exp = strings.Replace(exp, "-", "−", 1)
			base := word.String()
			word.Reset()
			flushText()
			out = append(out, Script{Base: Text{base}, Sup: Num{Text: exp}})
			i = j - 1
		case r == '*' || r == '.' && word.Len() > 0:
			flushWord()
			text.WriteRune('·')
		default:
			flushWord()
			text.WriteRune(r)
		}
	}
	flushText()
	if len(out) == 1 {
		return out[0]
	}
	return out
}
