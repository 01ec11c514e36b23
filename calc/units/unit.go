package units

import (
	"fmt"
	"math"
	"strconv"
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"
)

// Unit is a unit of measurement: SI value = number × Factor.
type Unit struct {
	Name   string  // canonical spelling, e.g. "kN/m3" ("" for a pure number)
	Factor float64 // SI value of one of this unit
	Dim    Dim
}

// Quantity is a value in coherent SI units with its dimension.
type Quantity struct {
	V   float64 // SI value
	Dim Dim
}

// Of returns the quantity x u (x written in u).
func (u Unit) Of(x float64) Quantity { return Quantity{V: x * u.factor(), Dim: u.Dim} }

// In returns q expressed as a number of u (no dimension check).
func (q Quantity) In(u Unit) float64 { return q.V / u.factor() }

// String formats q in its display unit with automatic precision, "245.7 kPa".
func (q Quantity) String() string {
	u := DisplayFor(q)
	s := Format(q.V, u, -1)
	if u.Name == "" {
		return s
	}
	return s + " " + u.Name
}

// SIFactor is the SI value of one u (1 for a pure number whose Factor is
// unset).
func (u Unit) SIFactor() float64 { return u.factor() }

func (u Unit) factor() float64 {
	if u.Factor == 0 {
		return 1
	}
	return u.Factor
}

// Dimensionless is the unit of a pure number (written "" or "-").
var Dimensionless = Unit{Name: "", Factor: 1}

// name is one entry in the table of known unit names. Only these names are
// known: there is no general SI prefix rule, so "min" is a minute and never
// a milli-inch, and "Mg" is a megagram only because the table says so.
type name struct {
	name   string
	factor float64
	dim    Dim
}

// names is the table of unit names, in the order Suggest prefers them.
// Every factor is checked in unit_test.go against NIST SP 811 (2008).
var names = []name{
	{"m", 1, Length},
	{"mm", 1e-3, Length},
	{"cm", 1e-2, Length},
	{"km", 1e3, Length},
	{"N", 1, Force},
	{"kN", 1e3, Force},
	{"MN", 1e6, Force},
	{"Pa", 1, Pressure},
	{"kPa", 1e3, Pressure},
	{"MPa", 1e6, Pressure},
	{"GPa", 1e9, Pressure},
	{"kNm", 1e3, Moment}, // kN·m written as one word, as on drawings
	{"MNm", 1e6, Moment},
	{"kg", 1, Mass},
	{"g", 1e-3, Mass},
	{"Mg", 1e3, Mass},
	{"t", 1e3, Mass}, // tonne
	{"rad", 1, Angle},
	{"deg", math.Pi / 180, Angle},
	{"°", math.Pi / 180, Angle},
	{"s", 1, Time},
	{"min", 60, Time},
	{"h", 3600, Time},
	{"day", 86400, Time},
	{"days", 86400, Time},
	{"week", 7 * 86400, Time},
	{"weeks", 7 * 86400, Time},
	{"month", 365.25 * 86400 / 12, Time}, // 1/12 Julian year = 30.4375 d
	{"months", 365.25 * 86400 / 12, Time},
	{"yr", 365.25 * 86400, Time}, // Julian year, 365.25 d
	{"year", 365.25 * 86400, Time},
	{"years", 365.25 * 86400, Time},
	{"%", 0.01, None},
}

var byName = func() map[string]int {
	m := make(map[string]int, len(names))
	for i, n := range names {
		m[n.name] = i
	}
	return m
}()

// Names returns the known unit names in table order.
func Names() []string {
	out := make([]string, len(names))
	for i, n := range names {
		out[i] = n.name
	}
	return out
}

// ParseError is a unit that cannot be read. Off and End are byte offsets
// in the string given to Parse.
type ParseError struct {
	Off, End   int
	Msg        string
	Unknown    string // the unknown unit name, when that is the problem
	Suggestion string // nearest known name to Unknown, or ""
}

func (e *ParseError) Error() string { return e.Msg }

const maxPower = 9

// Parse reads a unit expression (grammar in doc.go): names from the table,
// powers by "^n", trailing digits or ² ³, combined by "*", "·" and "/"
// strictly left to right, so "a/b*c" is (a/b)·c and "kN/m/s" is kN/(m·s).
// "" and "-" are dimensionless; "%" is 0.01. Surrounding spaces are ignored;
// spaces inside a unit are an error.
func Parse(s string) (Unit, error) {
	if u, ok := parsed.Load(s); ok {
		return u.(Unit), nil
	}
	p := uparser{s: s}
	u, err := p.parse()
	if err == nil && len(s) <= 32 {
		parsed.Store(s, u)
	}
	return u, err
}

// parsed caches the units read so far: a sheet writes the same few units
// many times. Units are values, so sharing them is safe.
var parsed sync.Map

// MustParse is Parse for tables and tests; it panics on a bad unit.
func MustParse(s string) Unit {
	u, err := Parse(s)
	if err != nil {
		panic("units.MustParse(" + strconv.Quote(s) + "): " + err.Error())
	}
	return u
}

type uparser struct {
	s    string
	i    int
	name strings.Builder
}

func (p *uparser) errf(off, end int, format string, args ...any) error {
	return &ParseError{Off: off, End: end, Msg: fmt.Sprintf(format, args...)}
}

func (p *uparser) parse() (Unit, error) {
	start, stop := 0, len(p.s)
	for start < stop && isSpace(p.s[start]) {
		start++
	}
	for stop > start && isSpace(p.s[stop-1]) {
		stop--
	}
	body := p.s[start:stop]
	if body == "" || body == "-" {
		return Dimensionless, nil
	}
	p.i = start
	p.s = p.s[:stop]
	factor, dim := 1.0, None
	op := byte('*')
	if strings.HasPrefix(body, "1/") {
		p.name.WriteString("1")
		p.i += 2
		op = '/'
	}
	for {
		f, d, err := p.factor(op)
		if err != nil {
			return Unit{}, err
		}
		var ok bool
		if op == '/' {
			factor /= f
			dim, ok = dim.DivOK(d)
		} else {
			factor *= f
			dim, ok = dim.MulOK(d)
		}
		if !ok || math.IsInf(factor, 0) || factor == 0 {
			return Unit{}, p.errf(start, stop, "unit %q is out of range", body)
		}
		if p.i >= len(p.s) {
			break
		}
		r, n := utf8.DecodeRuneInString(p.s[p.i:])
		switch r {
		case '*', '·':
			op = '*'
		case '/':
			op = '/'
		default:
			if isSpace(p.s[p.i]) {
				return Unit{}, p.errf(p.i, p.i+n, "space inside unit %q; write units without spaces (kN*m or kNm)", body)
			}
			return Unit{}, p.errf(p.i, p.i+n, "expected \"*\", \"/\" or the end of the unit, found %q", string(r))
		}
		p.i += n
	}
	return Unit{Name: p.name.String(), Factor: factor, Dim: dim}, nil
}

// factor reads name [power] and appends its canonical form to p.name.
func (p *uparser) factor(op byte) (float64, Dim, error) {
	at := p.i
	for p.i < len(p.s) {
		r, n := utf8.DecodeRuneInString(p.s[p.i:])
		if r == '°' || r == '%' {
			if p.i == at {
				p.i += n
			}
			break
		}
		if !unicode.IsLetter(r) {
			break
		}
		p.i += n
	}
	word := p.s[at:p.i]
	if word == "" {
		if p.i >= len(p.s) {
			return 0, None, p.errf(p.i, p.i, "expected a unit name at the end of %q", strings.TrimSpace(p.s))
		}
		r, n := utf8.DecodeRuneInString(p.s[p.i:])
		return 0, None, p.errf(p.i, p.i+n, "expected a unit name, found %q", string(r))
	}
	k, ok := byName[word]
	if !ok {
		e := &ParseError{Off: at, End: p.i, Unknown: word, Suggestion: Suggest(word)}
		e.Msg = fmt.Sprintf("unknown unit %q", word)
		if e.Suggestion != "" {
			e.Msg += fmt.Sprintf("; did you mean %q?", e.Suggestion)
		}
		return 0, None, e
	}
	pw, err := p.power()
	if err != nil {
		return 0, None, err
	}
	if p.name.Len() > 0 {
		p.name.WriteByte(op)
	}
	p.name.WriteString(word)
	switch {
	case pw < 0:
		p.name.WriteString("^" + strconv.Itoa(pw))
	case pw > 1:
		p.name.WriteString(strconv.Itoa(pw))
	}
	e := names[k]
	return math.Pow(e.factor, float64(pw)), e.dim.Pow(pw), nil
}

// power reads "^" [sign] digits, plain digits, or ² / ³; 1 when absent.
func (p *uparser) power() (int, error) {
	if p.i >= len(p.s) {
		return 1, nil
	}
	at := p.i
	if strings.HasPrefix(p.s[p.i:], "²") {
		p.i += len("²")
		return 2, nil
	}
	if strings.HasPrefix(p.s[p.i:], "³") {
		p.i += len("³")
		return 3, nil
	}
	caret := p.s[p.i] == '^'
	if caret {
		p.i++
	}
	neg := false
	if caret && p.i < len(p.s) && (p.s[p.i] == '-' || p.s[p.i] == '+') {
		neg = p.s[p.i] == '-'
		p.i++
	}
	d0 := p.i
	for p.i < len(p.s) && p.s[p.i] >= '0' && p.s[p.i] <= '9' {
		p.i++
	}
	if p.i == d0 {
		if caret {
			return 0, p.errf(at, p.i, "expected an integer power after \"^\"")
		}
		return 1, nil
	}
	n, err := strconv.Atoi(p.s[d0:p.i])
	if err != nil || n > maxPower {
		return 0, p.errf(at, p.i, "power %s is too large (at most %d)", p.s[d0:p.i], maxPower)
	}
	if n == 0 {
		return 0, p.errf(at, p.i, "power 0 cancels the unit; leave the unit out")
	}
	if neg {
		n = -n
	}
	return n, nil
}

func isSpace(c byte) bool { return c == ' ' || c == '\t' }
