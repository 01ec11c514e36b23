package expr

// The tree walker is for tests: they visit every node of what the
// parser built.

// Visitor is called by Walk for each node; when Visit returns w != nil,
// Walk visits the node's children with w and then calls w.Visit(nil).
type Visitor interface {
	Visit(n Node) (w Visitor)
}

// Walk traverses the tree in source order, as go/ast.Walk does.
func Walk(v Visitor, n Node) {
	if n == nil {
		return
	}
	if v = v.Visit(n); v == nil {
		return
	}
	switch n := n.(type) {
	case *Unary:
		Walk(v, n.X)
	case *Binary:
		Walk(v, n.L)
		Walk(v, n.R)
	case *Paren:
		Walk(v, n.X)
	case *Call:
		for _, a := range n.Args {
			Walk(v, a)
		}
	}
	v.Visit(nil)
}

type inspector func(Node) bool

func (f inspector) Visit(n Node) Visitor {
	if n != nil && f(n) {
		return f
	}
	return nil
}

// Inspect calls f for each node in source order; f returning false skips
// the node's children.
func Inspect(n Node, f func(Node) bool) { Walk(inspector(f), n) }
