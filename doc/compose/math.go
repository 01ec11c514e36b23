package compose

import (
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// formula typesets a sheet expression twice: in symbols, and with every
// symbol replaced by its value. Numbers print as written ("2.4 m") in
// both. The expression is converted to the engine's formula form
// (trace.Expr) so the one converter (fromExpr) serves sheets and
// engine alike; numbers travel as placeholder symbols so their text as
// written survives.
type formula struct {
	x    trace.Expr
	nums []eqn.Node              // placeholder "#i" → the number as written
	syms map[string]*eval.Symbol // symbol as written → the symbol it reads
}

// newFormula converts n; uses are the symbols n reads (eval's Uses).
func newFormula(n expr.Node, uses []*eval.Symbol) *formula {
	f := &formula{syms: map[string]*eval.Symbol{}}
	f.x = f.conv(n)
	for _, name := range trace.Symbols(f.x) {
		if strings.HasPrefix(name, "#") || name == "pi" || name == "g" {
			continue
		}
		for _, y := range uses {
			if y.Name == name || strings.HasSuffix(y.Name, "."+name) {
				f.syms[name] = y
				break
			}
		}
	}
	return f
}

func (f *formula) conv(n expr.Node) trace.Expr {
	switch n := n.(type) {
	case *expr.Num:
		node := eqn.Node(numberNode(n.Text))
		if n.HasUnit {
			node = withUnit(node, n.UnitText)
		}
		f.nums = append(f.nums, node)
		return trace.Sym{Name: "#" + strconv.Itoa(len(f.nums)-1)}
	case *expr.Ident:
		return trace.Sym{Name: n.Name}
	case *expr.Const:
		return trace.Sym{Name: n.Name}
	case *expr.Unary:
		if n.Op == "-" {
			return trace.Neg{X: f.conv(n.X)}
		}
		return f.conv(n.X)
	case *expr.Paren:
		return f.conv(n.X)
	case *expr.Binary:
		op := n.Op
		if op == "" {
			op = "?"
		}
		return trace.Op{Op: op[0], L: f.conv(n.L), R: f.conv(n.R)}
	case *expr.Call:
		args := make([]trace.Expr, len(n.Args))
		for i, a := range n.Args {
			args[i] = f.conv(a)
		}
		return trace.Call{Fn: n.Fn, Args: args}
	}
	return trace.Sym{Name: "?"}
}

// number returns the number a placeholder stands for.
func (f *formula) number(name string) (eqn.Node, bool) {
	if !strings.HasPrefix(name, "#") {
		return nil, false
	}
	i, err := strconv.Atoi(name[1:])
	if err != nil || i < 0 || i >= len(f.nums) {
		return nil, false
	}
	return f.nums[i], true
}

// symbolic is the formula in symbols.
func (f *formula) symbolic() eqn.Node {
	return fromExpr(f.x, exprOptions{Subst: f.number})
}

// substituted is the formula with each symbol's value as its own line
// prints it.
func (f *formula) substituted() eqn.Node {
	return fromExpr(f.x, exprOptions{Subst: func(name string) (eqn.Node, bool) {
		if n, ok := f.number(name); ok {
			return n, true
		}
		if y := f.syms[name]; y != nil {
			return symbolNode(y, y.Unit, y.Decimals), true
		}
		if name == "g" { // printed where used: the constant is an assumed value
			return withUnit(numberNode("9.80665"), "m/s2"), true
		}
		return nil, false
	}})
}

// lone reports whether the formula is a single symbol or number.
func (f *formula) lone() bool {
	_, ok := f.x.(trace.Sym)
	return ok
}

// hasSymbols reports whether the formula reads any symbol other than π.
func (f *formula) hasSymbols() bool { return len(f.syms) > 0 }

// valueNode prints a quantity in unit u with the given decimals (< 0:
// automatic significant figures), as the sheet's own lines print it.
func valueNode(q units.Quantity, u units.Unit, decimals int) eqn.Node {
	return withUnit(numberNode(units.Format(q.V, u, decimals)), u.Name)
}

// symbolNode prints a symbol's value in u with the given decimals, with
// the digits its bounds need (eval.Symbol.Number).
func symbolNode(y *eval.Symbol, u units.Unit, decimals int) eqn.Node {
	return withUnit(numberNode(y.Number(u, decimals)), u.Name)
}

// siNode prints an SI value in the unit named unit ("" = a pure number).
func siNode(v float64, unit string) eqn.Node {
	u, err := units.Parse(unit)
	if unit == "" || err != nil {
		return numberNode(units.Format(v, units.Dimensionless, -1))
	}
	return valueNode(units.Quantity{V: v, Dim: u.Dim}, u, -1)
}

// withUnit glues a unit to a number: a thin space, or none for degrees.
func withUnit(num eqn.Node, unit string) eqn.Node {
	switch u := strings.TrimSpace(unit); u {
	case "":
		return num
	case "deg", "°":
		if n, ok := num.(eqn.Num); ok {
			return eqn.Num{Text: n.Text + "°"}
		}
		return eqn.Row{num, eqn.Text{Text: "°"}}
	default:
		return eqn.Row{num, eqn.Space{Em: 0.2}, eqn.Unit(u)}
	}
}

// numberNode prints a number as written or formatted: "-" as "−", an
// exponent ("1.2e-5", "2.5E4") as × 10ⁿ.
func numberNode(s string) eqn.Node {
	s = strings.TrimSpace(s)
	neg := strings.HasPrefix(s, "-")
	if neg {
		s = s[1:]
	}
	sign := ""
	if neg {
		sign = "−"
	}
	if i := strings.IndexAny(s, "eE"); i > 0 {
		mant, exp := s[:i], strings.TrimPrefix(s[i+1:], "+")
		exp = strings.Replace(exp, "-", "−", 1)
		return eqn.Row{eqn.Num{Text: sign + mant}, eqn.Op{Text: "×"}, eqn.Script{Base: eqn.Num{Text: "10"}, Sup: eqn.Num{Text: exp}}}
	}
	return eqn.Num{Text: sign + s}
}

// valueText prints a quantity as plain text ("245.7 kPa", "30°").
func valueText(q units.Quantity, u units.Unit, decimals int) string {
	s := units.Printed(q.V, u, decimals)
	switch u.Name {
	case "":
		return s
	case "deg", "°":
		return s + "°"
	}
	return s + " " + unitText(u.Name)
}

// unitText writes a unit for running text: powers as superscript digits
// ("kN/m3" → "kN/m³").
func unitText(u string) string {
	if u == "deg" {
		return "°"
	}
	var b strings.Builder
	rs := []rune(u)
	for i := 0; i < len(rs); i++ {
		r := rs[i]
		switch {
		case r == '^':
			continue
		case (r >= '0' && r <= '9' || r == '-') && i > 0 && (isLetter(rs[i-1]) || rs[i-1] == '^' || rs[i-1] == '-'):
			b.WriteRune(superscript(r))
		case r == '*':
			b.WriteRune('·')
		default:
			b.WriteRune(r)
		}
	}
	return b.String()
}

func isLetter(r rune) bool { return r >= 'a' && r <= 'z' || r >= 'A' && r <= 'Z' || r == 'µ' }

func superscript(r rune) rune {
	switch r {
	case '-':
		return '⁻'
	case '1':
		return '¹'
	case '2':
		return '²'
	case '3':
		return '³'
	}
	return []rune("⁰¹²³⁴⁵⁶⁷⁸⁹")[r-'0']
}
