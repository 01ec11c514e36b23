package eqn

import (
	"strings"

	"github.com/plinth-calc/plinth/doc/notation"
)

// String writes n in a compact linear form, for tests and diagnostics:
// symbols as typeset (φ′_{d}), fractions {a}/{b}, powers x^{2}, roots
// √{x}, rows with single spaces around operators.
func String(n Node) string {
	var b strings.Builder
	write(&b, n)
	return b.String()
}

func write(b *strings.Builder, n Node) {
	switch n := n.(type) {
	case Row:
		for i, x := range flatten(n, nil) {
			if op, ok := x.(Op); ok && classOf(op.Text) != ordinary && i > 0 {
				if classOf(op.Text) == punct {
					b.WriteString(op.Text + " ")
				} else {
					b.WriteString(" " + op.Text + " ")
				}
				continue
			}
			write(b, x)
		}
	case Sym:
		p := notation.Split(n.Name)
		if p.Prefix != "" {
			b.WriteString(p.Prefix + ".")
		}
		b.WriteString(p.Base + strings.Repeat("′", p.Primes))
		if p.Sub != "" {
			b.WriteString("_{" + p.Sub + "}")
		}
	case Num:
		b.WriteString(n.Text)
	case Text:
		b.WriteString(n.Text)
	case Op:
		b.WriteString(n.Text)
	case Space:
		if n.Em > 0 {
			b.WriteString(" ")
		}
	case Strong:
		b.WriteString("*")
		write(b, n.X)
		b.WriteString("*")
	case Script:
		write(b, n.Base)
		if n.Sub != nil {
			b.WriteString("_{")
			write(b, n.Sub)
			b.WriteString("}")
		}
		if n.Sup != nil {
			b.WriteString("^{")
			write(b, n.Sup)
			b.WriteString("}")
		}
	case Frac:
		b.WriteString("{")
		write(b, n.Num)
		b.WriteString("}/{")
		write(b, n.Den)
		b.WriteString("}")
	case Sqrt:
		b.WriteString("√{")
		write(b, n.X)
		b.WriteString("}")
	case Fence:
		b.WriteString(n.Open)
		write(b, n.X)
		b.WriteString(n.Close)
	case Func:
		b.WriteString(n.Name)
		if n.Sup != nil {
			b.WriteString("^{")
			write(b, n.Sup)
			b.WriteString("}")
		}
		b.WriteString("(")
		for i, a := range n.Args {
			if i > 0 {
				b.WriteString(", ")
			}
			write(b, a)
		}
		b.WriteString(")")
	}
}
