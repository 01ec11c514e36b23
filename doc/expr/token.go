package expr

import (
	"fmt"
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/plinth-calc/plinth/calc/units"
)

// Kind classifies an Error.
type Kind uint8

const (
	KindSyntax    Kind = iota // a line or expression that cannot be read
	KindUnit                  // an unknown or malformed unit
	KindDim                   // dimensions that do not fit (2 m + 3 kPa)
	KindUndefined             // a symbol with no value in the Env
	KindDomain                // division by zero, sqrt of a negative, overflow
	KindInternal              // the two evaluators disagree (a bug in plinth)
)

// Error is one problem with a line, at byte offsets [Pos, End) of the file.
type Error struct {
	Pos, End int
	Msg      string
	Kind     Kind
}

func (e Error) Error() string { return e.Msg }

// tokKind is the kind of a lexical token.
type tokKind uint8

const (
	tEOF     tokKind = iota
	tIdent           // symbol, function name, pi, check
	tNum             // number with an optional unit
	tOp              // + - * / ^ (× · ⋅ → *, − → -, ÷ → /)
	tLparen          // (
	tRparen          // )
	tComma           // ,
	tAssign          // =
	tCmp             // <= < >= > == ≤ ≥
	tArrow           // -> →
	tColon           // :
	tHash            // # and the note after it
	tIllegal         // a character that starts no token
)

// token is one lexical token; pos and end are file offsets.
type token struct {
	kind     tokKind
	pos, end int
	text     string // as written
	op       string // normalised operator or comparison
	num      *Num   // for tNum
	bad      bool   // a number whose unit could not be read
}

func (t token) describe() string {
	switch t.kind {
	case tEOF:
		return "the end of the line"
	case tHash:
		return "the note (#)"
	case tNum:
		return "number " + t.text
	}
	return fmt.Sprintf("%q", t.text)
}

// scanner splits one line into tokens. Offsets in tokens and errors are
// file offsets: base + offset in src.
type scanner struct {
	src  string
	base int
	i    int
	errs *[]Error
}

func (s *scanner) errorf(pos, end int, kind Kind, format string, args ...any) {
	addError(s.errs, pos, end, kind, format, args...)
}

// maxErrors bounds the errors reported for one line: a line of rubbish
// gets a few messages, not one per byte.
const maxErrors = 10

func addError(errs *[]Error, pos, end int, kind Kind, format string, args ...any) {
	if len(*errs) < maxErrors {
		*errs = append(*errs, Error{Pos: pos, End: end, Kind: kind, Msg: fmt.Sprintf(format, args...)})
	}
}

func (s *scanner) peekRune(i int) (rune, int) {
	if i >= len(s.src) {
		return -1, 0
	}
	return utf8.DecodeRuneInString(s.src[i:])
}

func (s *scanner) skipSpace() {
	for s.i < len(s.src) {
		r, n := s.peekRune(s.i)
		if r != utf8.RuneError && unicode.IsSpace(r) {
			s.i += n
			continue
		}
		return
	}
}

func isIdentStart(r rune) bool { return r != utf8.RuneError && unicode.IsLetter(r) }

func isIdentPart(r rune) bool {
	return isIdentStart(r) || r == '_' || r == '\'' || (r >= '0' && r <= '9')
}

func isDigit(c byte) bool { return c >= '0' && c <= '9' }

// next returns the next token.
func (s *scanner) next() token {
	s.skipSpace()
	at := s.i
	pos := s.base + at
	if at >= len(s.src) {
		return token{kind: tEOF, pos: pos, end: pos}
	}
	r, n := s.peekRune(at)
	tok := func(k tokKind, width int, op string) token {
		s.i = at + width
		return token{kind: k, pos: pos, end: pos + width, text: s.src[at : at+width], op: op}
	}
	two := ""
	if at+2 <= len(s.src) {
		two = s.src[at : at+2]
	}
	switch {
	case (r < utf8.RuneSelf && isDigit(byte(r))) || (r == '.' && at+1 < len(s.src) && isDigit(s.src[at+1])):
		return s.number()
	case isIdentStart(r):
		s.i = at + n
		s.identRest()
		return token{kind: tIdent, pos: pos, end: s.base + s.i, text: s.src[at:s.i]}
	case two == "->":
		return tok(tArrow, 2, "->")
	case two == "<=" || two == ">=" || two == "==":
		return tok(tCmp, 2, two)
	case two == "!=":
		s.i = at + 2
		s.errorf(pos, pos+2, KindSyntax, "\"!=\" is not a check operator; use <=, <, >=, > or ==")
		return token{kind: tCmp, pos: pos, end: pos + 2, text: two, op: "=="}
	}
	switch r {
	case '+', '-', '*', '/', '^':
		return tok(tOp, n, string(r))
	case '×', '·', '⋅':
		return tok(tOp, n, "*")
	case '−':
		return tok(tOp, n, "-")
	case '÷':
		return tok(tOp, n, "/")
	case '→':
		return tok(tArrow, n, "->")
	case '≤':
		return tok(tCmp, n, "<=")
	case '≥':
		return tok(tCmp, n, ">=")
	case '<', '>':
		return tok(tCmp, n, string(r))
	case '=':
		return tok(tAssign, n, "=")
	case '(':
		return tok(tLparen, n, "(")
	case ')':
		return tok(tRparen, n, ")")
	case ',':
		return tok(tComma, n, ",")
	case ':':
		return tok(tColon, n, ":")
	case '#':
		s.i = len(s.src)
		return token{kind: tHash, pos: pos, end: s.base + len(s.src), text: s.src[at:]}
	}
	s.i = at + n
	t := token{kind: tIllegal, pos: pos, end: pos + n, text: s.src[at : at+n]}
	if r == utf8.RuneError {
		s.errorf(pos, pos+n, KindSyntax, "invalid UTF-8 byte")
	} else {
		s.errorf(pos, pos+n, KindSyntax, "unexpected character %q; expected a number, a symbol or an operator", string(r))
	}
	return t
}

// identRest reads the rest of a symbol: letters, digits, "_", primes and
// ".name" parts for block results (F1.R_d).
func (s *scanner) identRest() {
	for s.i < len(s.src) {
		r, n := s.peekRune(s.i)
		if isIdentPart(r) {
			s.i += n
			continue
		}
		if r == '.' {
			if r2, _ := s.peekRune(s.i + 1); isIdentStart(r2) {
				s.i++
				continue
			}
		}
		return
	}
}

// number reads digits [ "." digits ] [ exponent ] and an optional unit.
func (s *scanner) number() token {
	at := s.i
	for s.i < len(s.src) && isDigit(s.src[s.i]) {
		s.i++
	}
	if s.i < len(s.src) && s.src[s.i] == '.' {
		s.i++
		for s.i < len(s.src) && isDigit(s.src[s.i]) {
			s.i++
		}
	}
	if s.i < len(s.src) && (s.src[s.i] == 'e' || s.src[s.i] == 'E') {
		j := s.i + 1
		if j < len(s.src) && (s.src[j] == '+' || s.src[j] == '-') {
			j++
		}
		if j < len(s.src) && isDigit(s.src[j]) {
			for j < len(s.src) && isDigit(s.src[j]) {
				j++
			}
			s.i = j
		}
	}
	num := &Num{Pos: s.base + at, End: s.base + s.i, Text: s.src[at:s.i], Unit: units.Dimensionless}
	num.V = parseFloat(num.Text)
	if isInfinite(num.V) {
		s.errorf(num.Pos, num.End, KindSyntax, "number %s is too large", num.Text)
		num.V = 0
	}
	// An optional unit: one run without spaces, right after the number.
	save := s.i
	bad := false
	s.skipSpace()
	if r, _ := s.peekRune(s.i); isIdentStart(r) || r == '°' || r == '%' {
		bad = !s.unit(num)
	} else {
		s.i = save
	}
	return token{kind: tNum, pos: num.Pos, end: num.End, text: s.src[at : num.End-s.base], num: num, bad: bad}
}

// unitRun returns the end of the unit run starting at i: unit characters
// and symbol characters (so a misplaced symbol is reported whole), "^" with
// an optional sign, and "*", "/", "·" when a unit name follows them.
func (s *scanner) unitRun(i int) int {
	for i < len(s.src) {
		r, n := s.peekRune(i)
		switch {
		case isIdentPart(r), r == '°', r == '%', r == '²', r == '³':
			i += n
		case r == '.':
			if r2, _ := s.peekRune(i + 1); !isIdentStart(r2) {
				return i
			}
			i += n
		case r == '^':
			i += n
			if r2, _ := s.peekRune(i); r2 == '-' || r2 == '+' {
				i++
			}
		case r == '*' || r == '/' || r == '·':
			r2, _ := s.peekRune(i + n)
			if !isIdentStart(r2) && r2 != '°' && r2 != '%' {
				return i
			}
			i += n
		default:
			return i
		}
	}
	return i
}

// unit reads the unit after a number into num; false when it is not a unit.
func (s *scanner) unit(num *Num) bool {
	at := s.i
	s.i = s.unitRun(at)
	text := s.src[at:s.i]
	num.UnitText, num.UnitPos, num.HasUnit = text, s.base+at, true
	num.End = s.base + s.i
	u, err := units.Parse(text)
	if err == nil {
		num.Unit = u
		return true
	}
	pe := err.(*units.ParseError)
	pos, end := num.UnitPos+pe.Off, num.UnitPos+pe.End
	bad := strings.ContainsAny(text, "_'.")
	dotted := strings.ReplaceAll(text, ".", "*")
	switch {
	case dotted != text && parses(dotted):
		s.errorf(num.UnitPos, num.End, KindUnit, "bad unit %q after %s: write %q for a product of units", text, num.Text, dotted)
	case bad || (pe.Unknown != "" && pe.Off == 0 && pe.Suggestion == ""):
		s.errorf(num.UnitPos, num.End, KindUnit, "%q after %s is not a unit (to multiply, write \"%s * %s\")", text, num.Text, num.Text, text)
	case pe.Unknown != "" && pe.Off > 0 && pe.Suggestion == "":
		s.errorf(pos, end, KindUnit, "unknown unit %q in %q after %s; to multiply by %s, put spaces around the operator", pe.Unknown, text, num.Text, pe.Unknown)
	case pe.Unknown != "":
		s.errorf(pos, end, KindUnit, "unknown unit %q after %s; did you mean %q?", pe.Unknown, num.Text, pe.Suggestion)
	default:
		if pos == end && end == num.End && pos > num.UnitPos {
			pos--
		}
		s.errorf(pos, max(end, pos), KindUnit, "bad unit %q after %s: %s", text, num.Text, pe.Msg)
	}
	return false
}

func parses(unit string) bool { _, err := units.Parse(unit); return err == nil }
