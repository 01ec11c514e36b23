package expr

import (
	"math"
	"strconv"
)

// expr = term { ("+" | "-") term } .
func (p *parser) expr() Node {
	x := p.term()
	for p.tok.kind == tOp && (p.tok.op == "+" || p.tok.op == "-") {
		op := p.tok
		p.next()
		x = binary(op, x, p.term())
	}
	return x
}

// term = unary { ("*" | "/") unary } .
func (p *parser) term() Node {
	x := p.unary()
	for p.tok.kind == tOp && (p.tok.op == "*" || p.tok.op == "/") {
		op := p.tok
		p.next()
		x = binary(op, x, p.unary())
	}
	return x
}

// unary = ("-" | "+") unary | power .
func (p *parser) unary() Node {
	if p.tok.kind == tOp && (p.tok.op == "-" || p.tok.op == "+") {
		op := p.tok
		if !p.enter() {
			return p.tooDeep()
		}
		p.next()
		x := p.unary()
		p.depth--
		_, end := x.Span()
		return &Unary{Pos: op.pos, End: end, Op: op.op, X: x}
	}
	return p.power()
}

// power = primary [ "^" exponent ] ; exponent = ("-" | "+") exponent | power .
// Right-associative: 2^3^2 is 2^(3^2).
func (p *parser) power() Node {
	x := p.primary()
	if p.tok.kind == tOp && p.tok.op == "^" {
		op := p.tok
		if !p.enter() {
			return p.tooDeep()
		}
		p.next()
		y := p.exponent()
		p.depth--
		x = binary(op, x, y)
	}
	return x
}

func (p *parser) exponent() Node {
	if p.tok.kind == tOp && (p.tok.op == "-" || p.tok.op == "+") {
		op := p.tok
		if !p.enter() {
			return p.tooDeep()
		}
		p.next()
		x := p.exponent()
		p.depth--
		_, end := x.Span()
		return &Unary{Pos: op.pos, End: end, Op: op.op, X: x}
	}
	return p.power()
}

func (p *parser) enter() bool {
	p.depth++
	return p.depth <= maxDepth
}

// tooDeep reports excessive nesting once and abandons the rest of the line.
func (p *parser) tooDeep() Node {
	p.errorf(p.tok.pos, p.tok.end, "expression nested too deeply (more than %d levels)", maxDepth)
	b := &Bad{Pos: p.tok.pos, End: p.tok.end}
	for p.tok.kind != tEOF {
		p.next()
	}
	b.End = p.lastEnd
	return b
}

func binary(op token, x, y Node) *Binary {
	pos, _ := x.Span()
	_, end := y.Span()
	return &Binary{Pos: pos, End: end, Op: op.op, OpText: op.text, OpPos: op.pos, OpEnd: op.end, L: x, R: y}
}

// primary = number | symbol | "pi" | "g" | function "(" args ")" | "(" expr ")" .
func (p *parser) primary() Node {
	for p.tok.kind == tIllegal { // reported by the scanner
		p.next()
	}
	t := p.tok
	switch t.kind {
	case tNum:
		p.next()
		if t.bad { // reported by the scanner; a Bad node keeps Dims quiet
			return &Bad{Pos: t.pos, End: t.end}
		}
		return t.num
	case tIdent:
		p.next()
		if t.text == "pi" {
			return &Const{Pos: t.pos, End: t.end, Name: "pi", V: math.Pi}
		}
		if t.text == "g" {
			return &Const{Pos: t.pos, End: t.end, Name: "g", V: gravity, Dim: gravityDim}
		}
		if f, ok := functions[t.text]; ok {
			if p.tok.kind != tLparen {
				p.errorf(t.pos, t.end, "%s is a function; write %s(…)", t.text, t.text)
				return &Bad{Pos: t.pos, End: t.end}
			}
			return p.call(t, f)
		}
		if p.tok.kind == tLparen {
			p.errorf(t.pos, t.end, "unknown function %q (functions: %s); to multiply, write %s * (…)", t.text, functionList, t.text)
			c := p.call(t, function{min: 0, max: -1})
			return &Bad{Pos: c.Pos, End: c.End}
		}
		if t.text == "check" {
			p.errorf(t.pos, t.end, "check starts a line: check a <= b")
		}
		return &Ident{Pos: t.pos, End: t.end, Name: t.text}
	case tLparen:
		if !p.enter() {
			return p.tooDeep()
		}
		p.next()
		x := p.expr()
		p.depth--
		par := &Paren{Pos: t.pos, X: x}
		_, par.End = x.Span()
		if p.tok.kind == tRparen {
			par.End = p.tok.end
			p.next()
		} else if _, empty := x.(*Bad); !empty || p.tok.kind != tEOF {
			p.unclosed(t, "") // "(" at the end of a line: one error is enough
		}
		return par
	}
	where := "found " + t.describe()
	if t.kind == tEOF {
		where = "at the end of the line"
	}
	p.errorf(t.pos, t.end, "expected a number, a symbol or \"(\", %s", where)
	return &Bad{Pos: t.pos, End: t.pos}
}

// unclosed reports a missing ")" for the "(" token open: at the "(" when
// the expression simply ends, else at the token that is in the way (and
// skips to the matching ")").
func (p *parser) unclosed(open token, fn string) {
	of := ""
	if fn != "" {
		of = " of " + fn
	}
	if p.endish() {
		p.errorf(open.pos, open.end, "unclosed \"(\"%s; expected \")\"", of)
		return
	}
	want := "an operator or \")\""
	if fn != "" {
		want = "\",\" or \")\""
	}
	p.errorf(p.tok.pos, p.tok.end, "expected %s%s, found %s", want, of, p.tok.describe())
	depth := 0
	for !p.endish() {
		switch p.tok.kind {
		case tLparen:
			depth++
		case tRparen:
			if depth == 0 {
				p.next()
				return
			}
			depth--
		}
		p.next()
	}
}

// call reads "(" args ")" after the function name t.
func (p *parser) call(t token, f function) *Call {
	lp := p.tok
	c := &Call{Pos: t.pos, Fn: t.text, FnEnd: t.end, Lparen: lp.pos, Rparen: -1, End: lp.end}
	if !p.enter() {
		p.tooDeep()
		c.End = p.lastEnd
		return c
	}
	p.next()
	if p.tok.kind != tRparen {
		for {
			a := p.expr()
			c.Args = append(c.Args, a)
			_, c.End = a.Span()
			if p.tok.kind != tComma {
				break
			}
			p.next()
		}
	}
	p.depth--
	if p.tok.kind != tRparen {
		p.unclosed(lp, t.text)
		c.End = max(c.End, p.lastEnd)
		return c
	}
	c.Rparen, c.End = p.tok.pos, p.tok.end
	p.next()
	if n := len(c.Args); n < f.min || (f.max >= 0 && n > f.max) {
		p.errorf(c.Pos, c.End, "%s takes %s, got %d", c.Fn, arity(f), n)
	}
	return c
}

func itoa(n int) string { return strconv.Itoa(n) }
