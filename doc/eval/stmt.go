package eval

import (
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// sheet evaluates the statements of one sheet in document order.
func (e *evaluator) sheet(s *Sheet) {
	for _, b := range s.Src.Body {
		prefix := blockPrefix(b)
		for _, st := range blockStmts(b) {
			e.at = st.Span
			e.stmt(s, prefix, st)
		}
		if sp := b.Where(); sp.File != nil {
			e.at = headerSpan(sp)
		}
		if testHook != nil {
			testHook(b)
		}
		if e.spoilt(b.Where()) {
			// The block's header has an earlier error: its names may be
			// wrong, so it is not evaluated and its results count as failed.
			if a, ok := b.(*sheet.Analysis); ok {
				for _, n := range a.Kind.Spec().ResultNames() {
					e.fail(s, a.ResultPrefix().Value+"."+n)
				}
			}
			continue
		}
		switch b := b.(type) {
		case *sheet.Ground:
			e.ground(s, b)
		case *sheet.Footing:
			e.footing(s, b)
		case *sheet.Analysis:
			e.analysis(s, b)
		}
	}
}

func (e *evaluator) stmt(s *Sheet, prefix string, st *sheet.Stmt) {
	sc := scope{e: e, s: s, prefix: prefix}
	if e.spoilt(st.Span) {
		if a, ok := st.X.(*expr.Assign); ok {
			e.fail(s, prefix+a.Sym.Name)
		}
		return
	}
	switch x := st.X.(type) {
	case *expr.Assign:
		name := prefix + x.Sym.Name
		if s.local[name] != nil {
			return // a redefinition, already reported
		}
		y := e.assign(sc, st, x, name)
		if y == nil {
			e.fail(s, name)
			return
		}
		s.local[name] = y
		s.Symbols = append(s.Symbols, y)
		s.stmts[st] = y
	case *expr.Check:
		if prefix != "" {
			e.errs.Add(st.Span, "check lines belong in calc blocks")
			return
		}
		if c := e.check(sc, st, x); c != nil {
			s.Checks = append(s.Checks, c)
			s.stmts[st] = c
		}
	}
}

// testHook, when set by a test, is called before each block is
// evaluated (to drive the internal-error path).
var testHook func(sheet.Block)

func (e *evaluator) fail(s *Sheet, name string) {
	if e.failed == nil {
		e.failed = map[string]bool{}
	}
	e.failed[s.Name()+"\x00"+name] = true
}

// assign evaluates "name = expression" (or takes its --set override).
func (e *evaluator) assign(sc scope, st *sheet.Stmt, a *expr.Assign, name string) *Symbol {
	s, f := sc.s, st.Span.File
	used, ok := sc.resolve(a.X, f)
	if !ok {
		return nil
	}
	q, errs := expr.EvalAssign(a, sc)
	if len(errs) > 0 {
		e.addErrs(f, errs)
		return nil
	}
	y := &Symbol{
		Name: name, Q: q, Decimals: -1, Note: st.Note(), Span: symSpan(st, a),
		Sheet: s, Stmt: a, Expr: a.X, Input: e.defs[s.Index][name].input, Uses: used,
	}
	if o := e.over[s][name]; o != nil {
		y.Q = o.Q
		y.Override = o
		o.Target = y
	}
	y.Unit = displayUnit(a.X, sc, q)
	if a.Display != nil {
		y.Unit, y.Decimals = a.Display.Unit, a.Display.Decimals
	}
	y.Cites = e.cites(s, y.Note)
	return y
}

// check evaluates "check L op R".
func (e *evaluator) check(sc scope, st *sheet.Stmt, c *expr.Check) *Check {
	f := st.Span.File
	usedL, okL := sc.resolve(c.L, f)
	usedR, okR := sc.resolve(c.R, f)
	if !okL || !okR {
		return nil
	}
	v, errs := expr.EvalCheck(c, sc)
	if len(errs) > 0 {
		e.addErrs(f, errs)
		return nil
	}
	lpos, _ := c.L.Span()
	_, rend := c.R.Span()
	out := &Check{
		Text: string(f.Text[lpos:rend]), Op: c.Op, L: v.L, R: v.R, OK: v.Holds,
		Util: utilisation(c.Op, v.L.V, v.R.V), Note: st.Note(),
		Span: spanOf(f, c.Pos, rend), Sheet: sc.s, Stmt: c,
		Uses:  append(usedL, usedR...),
		Sides: [2]*Symbol{lone(c.L, usedL), lone(c.R, usedR)},
	}
	out.Unit = displayUnit(c.L, sc, v.L)
	if out.Unit.Dim != v.L.Dim {
		out.Unit = displayUnit(c.R, sc, v.R)
	}
	out.Cites = e.cites(sc.s, out.Note)
	return out
}

// lone is the symbol n is when n is a single symbol (in parentheses or
// not), else nil.
func lone(n expr.Node, used []*Symbol) *Symbol {
	for {
		p, ok := n.(*expr.Paren)
		if !ok {
			break
		}
		n = p.X
	}
	if _, ok := n.(*expr.Ident); ok && len(used) == 1 {
		return used[0]
	}
	return nil
}

// displayUnit chooses how to show a value computed by n: the unit it was
// written in for a literal, the unit its operands agree on, else the
// standard unit for its dimension.
func displayUnit(n expr.Node, sc scope, q units.Quantity) units.Unit {
	if u, ok := inferUnit(n, sc); ok && u.Dim == q.Dim {
		return u
	}
	if q.Dim == units.Time {
		return units.DisplayFor(q)
	}
	return units.Display(q.Dim)
}

// inferUnit returns the display unit n's operands agree on.
func inferUnit(n expr.Node, sc scope) (units.Unit, bool) {
	switch n := n.(type) {
	case *expr.Num:
		if n.HasUnit {
			return n.Unit, true
		}
		return units.Dimensionless, true
	case *expr.Ident:
		if y := sc.find(n.Name); y != nil {
			return y.Unit, true
		}
	case *expr.Paren:
		return inferUnit(n.X, sc)
	case *expr.Unary:
		return inferUnit(n.X, sc)
	case *expr.Binary:
		l, lok := inferUnit(n.L, sc)
		r, rok := inferUnit(n.R, sc)
		if !lok || !rok {
			return units.Unit{}, false
		}
		switch n.Op {
		case "+", "-":
			if l.Name == r.Name {
				return l, true
			}
		case "*":
			if r.Dim.IsNone() && r.Name == "" {
				return l, true
			}
			if l.Dim.IsNone() && l.Name == "" {
				return r, true
			}
		case "/":
			if r.Dim.IsNone() && r.Name == "" {
				return l, true
			}
		}
	case *expr.Call:
		switch n.Fn {
		case "abs", "min", "max":
			var u units.Unit
			for i, a := range n.Args {
				au, ok := inferUnit(a, sc)
				if !ok || (i > 0 && au.Name != u.Name) {
					return units.Unit{}, false
				}
				u = au
			}
			return u, len(n.Args) > 0
		}
	}
	return units.Unit{}, false
}
