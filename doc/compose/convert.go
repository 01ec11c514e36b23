package compose

import (
	"github.com/plinth-calc/plinth/calc/units"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// exprOptions control fromExpr.
type exprOptions struct {
	// Subst, when set, replaces a symbol by the node it returns — its
	// value and unit, for the substituted line of a statement. Symbols it
	// declines (false) print as symbols.
	Subst func(name string) (eqn.Node, bool)
	// Number prints a constant of the formula (trace.Num: V in SI, Unit
	// "" or "deg"). Nil prints up to six significant digits, "deg" as
	// degrees with °, any other unit after the number as written.
	Number func(v float64, unit string) eqn.Node
}

// precedence of what a converted node reads as, loosest first
const (
	precSum  = 1
	precProd = 2
	precNeg  = 3
	precFrac = 4 // a stacked fraction: a factor, but not a power's base
	precPow  = 5
	precAtom = 6
)

type conv struct {
	n          eqn.Node
	prec       int
	neg        bool // reads with a leading minus
	numL, numR bool // begins / ends with a number
}

// fromExpr converts an engine formula (or a sheet expression, through
// formula) into a formula to typeset: the one converter, so sheets and
// engine print alike.
// Parentheses appear only where precedence needs them (and around a
// negative operand after an operator); products print × between two
// numbers and · otherwise; a division prints as a stacked fraction, or
// inline a/b inside a superscript; powers as superscripts (tan²(x) for a
// power of a function call); sqrt as a radical with its bar; abs as |x|.
func fromExpr(e trace.Expr, opt exprOptions) eqn.Node {
	c := converter{opt: opt}
	return c.conv(e, false).n
}

type converter struct{ opt exprOptions }

func paren(x conv) eqn.Node { return eqn.Paren(x.n) }

func (c converter) conv(e trace.Expr, inSup bool) conv {
	switch e := e.(type) {
	case trace.Sym:
		if c.opt.Subst != nil {
			if n, ok := c.opt.Subst(e.Name); ok {
				return shape(n)
			}
		}
		return conv{n: eqn.Sym{Name: e.Name}, prec: precAtom}
	case trace.Num:
		var n eqn.Node
		if c.opt.Number != nil {
			n = c.opt.Number(e.V, e.Unit)
		} else {
			n = defaultNumber(e.V, e.Unit)
		}
		return shape(n)
	case trace.Neg:
		x := c.conv(e.X, inSup)
		xn := x.n
		if x.prec < precNeg || x.neg {
			xn = paren(x)
		}
		return conv{n: eqn.Row{eqn.Op{Text: "−"}, xn}, prec: precNeg, neg: true}
	case trace.Op:
		return c.op(e, inSup)
	case trace.Call:
		return c.call(e, inSup)
	}
	return conv{n: eqn.Text{Text: "?"}, prec: precAtom}
}

func (c converter) op(e trace.Op, inSup bool) conv {
	switch e.Op {
	case '+', '-':
		l, r := c.conv(e.L, inSup), c.conv(e.R, inSup)
		rn := r.n
		if r.neg || (e.Op == '-' && r.prec <= precSum) {
			rn = paren(r)
		}
		sign := "+"
		if e.Op == '-' {
			sign = "−"
		}
		return conv{n: eqn.Row{l.n, eqn.Op{Text: sign}, rn}, prec: precSum, neg: l.neg, numL: l.numL, numR: r.numR}
	case '*':
		l, r := c.conv(e.L, inSup), c.conv(e.R, inSup)
		ln, rn := l.n, r.n
		if l.prec < precProd {
			ln = paren(l)
		}
		if r.prec < precProd || r.neg {
			rn = paren(r)
		}
		sign := "·"
		if l.numR && r.numL {
			sign = "×"
		}
		return conv{n: eqn.Row{ln, eqn.Op{Text: sign}, rn}, prec: precProd, neg: l.neg && l.prec >= precProd, numL: l.numL, numR: r.numR}
	case '/':
		l, r := c.conv(e.L, inSup), c.conv(e.R, inSup)
		if !inSup {
			num := l.numL && l.numR && r.numL && r.numR
			return conv{n: eqn.Frac{Num: l.n, Den: r.n}, prec: precFrac, numL: num, numR: num}
		}
		ln, rn := l.n, r.n
		if l.prec < precProd {
			ln = paren(l)
		}
		if r.prec <= precFrac || r.neg {
			rn = paren(r)
		}
		return conv{n: eqn.Row{ln, eqn.Op{Text: "/"}, rn}, prec: precProd, neg: l.neg, numL: l.numL, numR: r.numR}
	case '^':
		exp := c.conv(e.R, true)
		if call, ok := e.L.(trace.Call); ok && isNamedFunc(call.Fn) {
			if num, ok := e.R.(trace.Num); ok && num.V > 0 && num.V == math.Trunc(num.V) {
				f := c.call(call, inSup).n.(eqn.Func)
				f.Sup = exp.n
				return conv{n: f, prec: precAtom}
			}
		}
		b := c.conv(e.L, inSup)
		bn := b.n
		if b.prec < precAtom || b.neg {
			bn = paren(b)
		}
		return conv{n: eqn.Script{Base: bn, Sup: exp.n}, prec: precPow, numL: b.numL && !b.neg}
	}
	return conv{n: eqn.Text{Text: string(e.Op)}, prec: precAtom}
}

func isNamedFunc(fn string) bool {
	switch fn {
	case "sqrt", "abs":
		return false
	}
	return true
}

func (c converter) call(e trace.Call, inSup bool) conv {
	args := make([]eqn.Node, len(e.Args))
	for i, a := range e.Args {
		args[i] = c.conv(a, inSup).n
	}
	switch {
	case e.Fn == "sqrt" && len(args) == 1:
		return conv{n: eqn.Sqrt{X: args[0]}, prec: precAtom}
	case e.Fn == "abs" && len(args) == 1:
		return conv{n: eqn.Fence{Open: "|", Close: "|", X: args[0]}, prec: precAtom}
	}
	return conv{n: eqn.Func{Name: e.Fn, Args: args}, prec: precAtom}
}

// shape works out how a ready-made node (a substituted value) reads.
func shape(n eqn.Node) conv {
	first, last := n, n
	r, isRow := n.(eqn.Row)
	if isRow {
		flat := flatten(r, nil)
		if len(flat) == 1 {
			return shape(flat[0])
		}
		if len(flat) > 0 {
			first, last = flat[0], flat[len(flat)-1]
		}
	}
	cv := conv{n: n, prec: precAtom}
	if isRow {
		cv.prec = precProd
	}
	if num, ok := first.(eqn.Num); ok {
		cv.numL = true
		if strings.HasPrefix(num.Text, "-") || strings.HasPrefix(num.Text, "−") {
			cv.neg, cv.prec = true, precNeg
		}
	}
	if op, ok := first.(eqn.Op); ok && (op.Text == "−" || op.Text == "-") {
		cv.neg, cv.prec = true, precNeg
	}
	switch last.(type) {
	case eqn.Num:
		cv.numR = true
	}
	if cv.numL {
		cv.numR = true // a value with its unit
	}
	return cv
}

func defaultNumber(v float64, unit string) eqn.Node {
	switch unit {
	case "":
		return eqn.Number(v, 6)
	case "deg":
		return eqn.Num{Text: units.Significant(v*180/math.Pi, 6) + "°"}
	}
	return eqn.Quantity(units.Significant(v, 6), unit)
}

// flatten lists the nodes of a row, nested rows opened.
func flatten(r eqn.Row, out []eqn.Node) []eqn.Node {
	for _, n := range r {
		if rr, ok := n.(eqn.Row); ok {
			out = flatten(rr, out)
		} else if n != nil {
			out = append(out, n)
		}
	}
	return out
}
