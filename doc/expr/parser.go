package expr

import (
	"sort"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
)

// maxDepth bounds nesting so that hostile input cannot exhaust the stack.
const maxDepth = 200

type parser struct {
	sc      scanner
	tok     token
	lastEnd int // end of the last consumed token
	depth   int
	errs    []Error
}

func newParser(src string, base int) *parser {
	p := &parser{lastEnd: base}
	p.sc = scanner{src: src, base: base, errs: &p.errs}
	p.tok = p.sc.next()
	return p
}

func (p *parser) next() {
	p.lastEnd = p.tok.end
	p.tok = p.sc.next()
}

// peek returns the token after the current one without consuming it.
func (p *parser) peek() token {
	i, n := p.sc.i, len(p.errs)
	t := p.sc.next()
	p.sc.i, p.errs = i, p.errs[:n]
	return t
}

// result returns the errors sorted by position (stable).
func (p *parser) result() []Error {
	sort.SliceStable(p.errs, func(i, j int) bool { return p.errs[i].Pos < p.errs[j].Pos })
	return p.errs
}

func (p *parser) errorf(pos, end int, format string, args ...any) {
	if n := len(p.errs); n > 0 && p.errs[n-1].Pos == pos && p.errs[n-1].Kind == KindSyntax {
		return // one syntax error per place
	}
	addError(&p.errs, pos, end, KindSyntax, format, args...)
}

// endish reports whether the current token ends an expression region.
func (p *parser) endish() bool {
	switch p.tok.kind {
	case tEOF, tHash, tArrow, tCmp:
		return true
	}
	return false
}

// ParseLine reads one statement line of a plinth block. base is the file
// offset of line[0]; every offset in the result and the errors is a file
// offset. A blank line gives (nil, nil), a line holding only "# text" a
// *Comment; otherwise an *Assign or *Check, partly filled (with *Bad nodes)
// when there are errors.
func ParseLine(line string, base int) (Stmt, []Error) {
	p := newParser(line, base)
	switch {
	case p.tok.kind == tEOF:
		return nil, p.result()
	case p.tok.kind == tHash:
		text, pos := note(p.tok)
		return &Comment{Pos: p.tok.pos, End: pos + len(text), Text: text, TextPos: pos}, p.result()
	case p.tok.kind == tIdent && p.tok.text == "check" && p.peek().kind != tAssign:
		return p.check(), p.result()
	}
	return p.assign(), p.result()
}

func (p *parser) assign() *Assign {
	a := &Assign{Pos: p.tok.pos, NotePos: -1}
	if p.tok.kind == tIdent {
		a.Sym = Ident{Pos: p.tok.pos, End: p.tok.end, Name: p.tok.text}
		p.checkName(a.Sym)
		p.next()
	} else {
		a.Sym = Ident{Pos: p.tok.pos, End: p.tok.pos}
		p.errorf(p.tok.pos, p.tok.end, "expected a symbol to start the statement (symbol = expression, or check a <= b), found %s", p.tok.describe())
	}
	if p.tok.kind == tAssign {
		p.next()
		a.X = p.expr()
		p.leftover("an operator, \"->\", \"#\" or the end of the line")
	} else {
		if a.Sym.Name != "" {
			p.errorf(p.tok.pos, p.tok.end, "expected \"=\" after %s, found %s", a.Sym.Name, p.tok.describe())
		}
		a.X = &Bad{Pos: p.tok.pos, End: p.tok.pos}
		p.skip()
	}
	if p.tok.kind == tArrow {
		a.Display = p.display()
		p.leftover("\"#\" or the end of the line")
	}
	a.End = p.lastEnd
	if p.tok.kind == tHash {
		a.Note, a.NotePos = note(p.tok)
		a.End = a.NotePos + len(a.Note)
	}
	return a
}

// checkName reports a name that cannot be given a value.
func (p *parser) checkName(id Ident) {
	switch {
	case id.Name == "pi":
		p.errorf(id.Pos, id.End, "pi is the constant π; choose another name")
	case id.Name == "g":
		p.errorf(id.Pos, id.End, "g is the standard acceleration of gravity, 9.80665 m/s2; choose another name")
	case id.Name == "check":
		p.errorf(id.Pos, id.End, "check is a keyword; choose another name")
	case isFunction(id.Name):
		p.errorf(id.Pos, id.End, "%s is a function; choose another name", id.Name)
	case strings.Contains(id.Name, "."):
		p.errorf(id.Pos, id.End, "%s is a block result name (NAME.result); choose a name without \".\"", id.Name)
	}
}

func (p *parser) check() *Check {
	c := &Check{Pos: p.tok.pos, NotePos: -1}
	p.next()
	c.L = p.expr()
	if p.tok.kind != tCmp {
		p.errorf(p.tok.pos, p.tok.end, "expected a comparison (<=, <, >=, > or ==) after the left side, found %s", p.tok.describe())
		for p.tok.kind != tCmp && p.tok.kind != tHash && p.tok.kind != tEOF {
			p.next()
		}
	}
	if p.tok.kind == tCmp {
		c.Op, c.OpPos, c.OpEnd = p.tok.op, p.tok.pos, p.tok.end
		p.next()
		c.R = p.expr()
		if p.tok.kind == tArrow {
			p.errorf(p.tok.pos, p.tok.end, "a check line takes no display unit (\"->\")")
		}
		p.leftover("an operator, \"#\" or the end of the line")
		if p.tok.kind == tArrow {
			p.next()
			for p.tok.kind != tHash && p.tok.kind != tEOF {
				p.next()
			}
		}
	} else {
		c.OpPos, c.OpEnd = p.tok.pos, p.tok.pos
		c.R = &Bad{Pos: p.tok.pos, End: p.tok.pos}
	}
	c.End = p.lastEnd
	if p.tok.kind == tHash {
		c.Note, c.NotePos = note(p.tok)
		c.End = c.NotePos + len(c.Note)
	}
	return c
}

// note returns the trimmed text after "#" and its file offset.
func note(t token) (string, int) {
	raw := t.text[1:]
	trimmed := strings.TrimLeft(raw, " \t")
	pos := t.pos + 1 + len(raw) - len(trimmed)
	return strings.TrimRight(trimmed, " \t\r\n"), pos
}

// leftover reports tokens after a complete expression and skips to the
// next "->", "#" or the end of the line.
func (p *parser) leftover(expected string) {
	t := p.tok
	switch t.kind {
	case tEOF, tHash, tArrow:
		return
	case tRparen:
		p.errorf(t.pos, t.end, "unmatched \")\"")
	case tAssign:
		p.errorf(t.pos, t.end, "unexpected \"=\": a statement has one \"=\" (compare with == in a check line)")
	case tCmp:
		p.errorf(t.pos, t.end, "unexpected %q: comparisons belong in check lines (check a %s b)", t.text, t.op)
	case tIdent, tNum, tLparen:
		p.errorf(t.pos, t.end, "unexpected %s; expected %s (there is no implied multiplication: write *)", t.describe(), expected)
	case tIllegal:
		// already reported by the scanner
	default:
		p.errorf(t.pos, t.end, "unexpected %s; expected %s", t.describe(), expected)
	}
	p.skip()
}

// skip advances to the next "->", "#" or the end of the line.
func (p *parser) skip() {
	for p.tok.kind != tEOF && p.tok.kind != tHash && p.tok.kind != tArrow {
		p.next()
	}
}

// display reads "unit[:decimals]" after the current "->" token.
func (p *parser) display() *DisplayUnit {
	arrow := p.tok
	sc := &p.sc
	sc.skipSpace()
	at := sc.i
	end := at
	for end < len(sc.src) {
		r, n := sc.peekRune(end)
		if r == ':' || r == '#' || r == ' ' || r == '\t' || r == '\r' || r == '\n' {
			break
		}
		end += n
	}
	d := &DisplayUnit{Pos: sc.base + at, End: sc.base + end, Text: sc.src[at:end], Decimals: -1, Unit: units.Dimensionless}
	if d.Text == "" {
		p.errorf(arrow.pos, arrow.end, "expected a unit after \"->\"")
	} else if u, err := units.Parse(d.Text); err != nil {
		pe := err.(*units.ParseError)
		addError(&p.errs, d.Pos+pe.Off, d.Pos+max(pe.End, pe.Off), KindUnit, "display unit %q: %s", d.Text, pe.Msg)
	} else {
		d.Unit = u
	}
	sc.i = end
	if end < len(sc.src) && sc.src[end] == ':' {
		sc.i++
		d0 := sc.i
		for sc.i < len(sc.src) && isDigit(sc.src[sc.i]) {
			sc.i++
		}
		digits := sc.src[d0:sc.i]
		d.End = sc.base + sc.i
		switch n, err := strconv.Atoi(digits); {
		case digits == "":
			p.errorf(sc.base+d0-1, sc.base+d0, "expected the number of decimal places after \":\"")
		case err != nil || n > 12:
			p.errorf(sc.base+d0, d.End, "at most 12 decimal places, not %s", digits)
		default:
			d.Decimals = n
		}
	}
	p.lastEnd = d.End
	p.tok = sc.next()
	return d
}

// ParseExpr reads a whole string as one expression; base is the file
// offset of src[0].
func ParseExpr(src string, base int) (Node, []Error) {
	p := newParser(src, base)
	x := p.expr()
	if p.tok.kind != tEOF {
		if p.tok.kind == tRparen {
			p.errorf(p.tok.pos, p.tok.end, "unmatched \")\"")
		} else if p.tok.kind != tIllegal {
			p.errorf(p.tok.pos, p.tok.end, "unexpected %s; expected an operator or the end of the expression", p.tok.describe())
		}
	}
	return x, p.result()
}

// ParseList reads comma-separated expressions ("1 week, 1 yr, 10 yr").
func ParseList(src string, base int) ([]Node, []Error) {
	p := newParser(src, base)
	var xs []Node
	for {
		xs = append(xs, p.expr())
		if p.tok.kind != tComma {
			break
		}
		p.next()
	}
	if p.tok.kind != tEOF && p.tok.kind != tIllegal {
		p.errorf(p.tok.pos, p.tok.end, "unexpected %s; expected \",\", an operator or the end of the list", p.tok.describe())
	}
	return xs, p.result()
}

// ParseRef reads the text inside a prose interpolation's braces:
// "symbol" or "symbol -> unit[:decimals]"; base is the offset of text[0].
func ParseRef(text string, base int) (*Ref, []Error) {
	p := newParser(text, base)
	r := &Ref{Pos: p.tok.pos}
	if p.tok.kind != tIdent || reserved(p.tok.text) {
		p.errorf(p.tok.pos, p.tok.end, "expected a symbol inside {…}, found %s", p.tok.describe())
		r.End = base + len(text)
		return r, p.result()
	}
	r.Sym = Ident{Pos: p.tok.pos, End: p.tok.end, Name: p.tok.text}
	p.next()
	if p.tok.kind == tArrow {
		r.Display = p.display()
	}
	if p.tok.kind != tEOF && p.tok.kind != tIllegal {
		p.errorf(p.tok.pos, p.tok.end, "unexpected %s inside {…}; expected \"->\" and a unit, or \"}\"", p.tok.describe())
	}
	r.End = p.lastEnd
	return r, p.result()
}

// Option is a "key = value" line of an option block (bearing, settlement
// ...), the value kept as text for the block to read.
type Option struct {
	Pos, End           int
	Key                Ident
	Value              string // trimmed text between "=" and "#"
	ValuePos, ValueEnd int
	Note               string
	NotePos            int // -1 when there is no note
}

// ParseOption reads "key = value [# note]" without parsing the value. Blank
// and note-only lines give (nil, nil).
func ParseOption(line string, base int) (*Option, []Error) {
	p := newParser(line, base)
	if p.tok.kind == tEOF || p.tok.kind == tHash {
		return nil, p.result()
	}
	o := &Option{Pos: p.tok.pos, NotePos: -1}
	if p.tok.kind != tIdent {
		p.errorf(p.tok.pos, p.tok.end, "expected an option name (name = value), found %s", p.tok.describe())
		o.End = base + len(line)
		return o, p.result()
	}
	o.Key = Ident{Pos: p.tok.pos, End: p.tok.end, Name: p.tok.text}
	p.next()
	if p.tok.kind != tAssign {
		p.errorf(p.tok.pos, p.tok.end, "expected \"=\" after %s, found %s", o.Key.Name, p.tok.describe())
		o.End = base + len(line)
		return o, p.result()
	}
	rest := line[p.tok.end-base:]
	at := p.tok.end
	value := rest
	if h := strings.IndexByte(rest, '#'); h >= 0 {
		value = rest[:h]
		o.Note, o.NotePos = note(token{pos: at + h, text: rest[h:]})
	}
	trimmed := strings.TrimLeft(value, " \t")
	o.ValuePos = at + len(value) - len(trimmed)
	o.Value = strings.TrimRight(trimmed, " \t\r\n")
	o.ValueEnd = o.ValuePos + len(o.Value)
	if o.Value == "" {
		p.errorf(p.tok.pos, p.tok.end, "expected a value after \"=\"")
	}
	o.End = o.ValueEnd
	if o.NotePos >= 0 {
		o.End = o.NotePos + len(o.Note)
	}
	return o, p.result()
}
