package expr

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/calc/units"
)

// Env gives the values of symbols: SI value and dimension.
type Env interface {
	Lookup(name string) (units.Quantity, bool)
}

// MapEnv is an Env backed by a map.
type MapEnv map[string]units.Quantity

// Lookup implements Env.
func (m MapEnv) Lookup(name string) (units.Quantity, bool) { q, ok := m[name]; return q, ok }

// Dims works out the dimension of n, reporting every mismatch it can find:
// sums and differences of unlike dimensions, trigonometric functions of
// anything but an angle, exp/ln/log10/asin/acos/atan/floor/ceil/round of
// anything but a pure number, powers of a dimensioned base with anything
// but a constant exponent giving whole powers, square roots of odd powers,
// and undefined symbols (KindUndefined). Rules in doc.go. A tree with
// syntax errors may be checked too: its *Bad nodes are skipped silently, so
// a line's other mistakes can be reported at once.
func Dims(n Node, env Env) (units.Dim, []Error) {
	a := analyzer{env: env}
	d, _ := a.dim(n)
	return d, a.errs
}

// stmtDims is Dims for a statement: for an *Assign the dimension of its
// expression, which its display unit must share; for a *Check the common
// dimension of both sides, which must agree. A *Comment has none.
func stmtDims(s Stmt, env Env) (units.Dim, []Error) {
	a := analyzer{env: env}
	switch s := s.(type) {
	case *Assign:
		d, ok := a.dim(s.X)
		if ok && s.Display != nil && s.Display.Unit.Dim != d {
			a.errorf(s.Display.Pos, s.Display.End, KindDim, "the result is in %s; it cannot be shown in %s", unitName(d), unitName(s.Display.Unit.Dim))
		}
		return d, a.errs
	case *Check:
		l, lok := a.dim(s.L)
		r, rok := a.dim(s.R)
		if lok && rok && l != r {
			a.errorf(s.OpPos, s.OpEnd, KindDim, "cannot compare %s with %s", unitName(l), unitName(r))
		}
		return l, a.errs
	}
	return units.None, nil
}

type analyzer struct {
	env  Env
	errs []Error
}

func (a *analyzer) errorf(pos, end int, kind Kind, format string, args ...any) {
	a.errs = append(a.errs, Error{Pos: pos, End: end, Kind: kind, Msg: fmt.Sprintf(format, args...)})
}

// unitName names a dimension by its display unit for messages.
func unitName(d units.Dim) string {
	u := units.Display(d)
	if u.Name == "" {
		return "a pure number"
	}
	return u.Name
}

// dim returns n's dimension; false when it is unknown because of an error
// already reported (so that one mistake is reported once).
func (a *analyzer) dim(n Node) (units.Dim, bool) {
	switch n := n.(type) {
	case *Num:
		return n.Unit.Dim, true
	case *Const:
		return n.Dim, true
	case *Ident:
		if a.env != nil {
			if q, ok := a.env.Lookup(n.Name); ok {
				return q.Dim, true
			}
		}
		a.errorf(n.Pos, n.End, KindUndefined, "undefined symbol %s", n.Name)
		return units.None, false
	case *Paren:
		return a.dim(n.X)
	case *Unary:
		return a.dim(n.X)
	case *Binary:
		return a.binary(n)
	case *Call:
		return a.call(n)
	}
	return units.None, false // *Bad: the parser has reported it
}

func (a *analyzer) binary(n *Binary) (units.Dim, bool) {
	l, lok := a.dim(n.L)
	r, rok := a.dim(n.R)
	if n.Op == "^" {
		return a.power(n, l, lok, r, rok)
	}
	if !lok || !rok {
		return units.None, false
	}
	var d units.Dim
	ok := true
	switch n.Op {
	case "+", "-":
		if l != r {
			if n.Op == "+" {
				a.errorf(n.OpPos, n.OpEnd, KindDim, "cannot add %s and %s", unitName(l), unitName(r))
			} else {
				a.errorf(n.OpPos, n.OpEnd, KindDim, "cannot subtract %s from %s", unitName(r), unitName(l))
			}
			return units.None, false
		}
		return l, true
	case "*":
		d, ok = l.MulOK(r)
	case "/":
		d, ok = l.DivOK(r)
	}
	if !ok {
		a.errorf(n.OpPos, n.OpEnd, KindDim, "unit powers out of range")
	}
	return d, ok
}

// power: the exponent is a pure number; a dimensioned base needs a
// constant exponent that gives whole powers ((m2)^0.5 is m, m^0.5 fails).
func (a *analyzer) power(n *Binary, l units.Dim, lok bool, r units.Dim, rok bool) (units.Dim, bool) {
	if rok && r != units.None {
		a.errorf(n.OpPos, n.OpEnd, KindDim, "an exponent must be a pure number; got %s", unitName(r))
		return units.None, false
	}
	if !lok || !rok {
		return units.None, false
	}
	if l == units.None {
		return units.None, true
	}
	if len(Idents(n.R)) > 0 {
		a.errorf(n.OpPos, n.OpEnd, KindDim, "a power of %s needs a constant exponent (numbers only, no symbols)", unitName(l))
		return units.None, false
	}
	ev := evaluator{}
	p, err := ev.value(n.R)
	if err != nil {
		a.errs = append(a.errs, *err)
		return units.None, false
	}
	exps := [4]int8{l.L, l.M, l.T, l.A}
	var out [4]int
	for i, e := range exps {
		x := float64(e) * p
		r := math.Round(x)
		if math.Abs(x-r) > 1e-9 || math.Abs(r) > 127 {
			a.errorf(n.OpPos, n.OpEnd, KindDim, "%s to the power %s has no whole unit", unitName(l), fmtNum(p))
			return units.None, false
		}
		out[i] = int(r)
	}
	return units.Dim{L: int8(out[0]), M: int8(out[1]), T: int8(out[2]), A: int8(out[3])}, true
}

func (a *analyzer) call(n *Call) (units.Dim, bool) {
	ds := make([]units.Dim, len(n.Args))
	ok := true
	for i, x := range n.Args {
		var k bool
		ds[i], k = a.dim(x)
		ok = ok && k
	}
	f, known := functions[n.Fn]
	if !ok || !known || len(ds) < f.min || (f.max >= 0 && len(ds) > f.max) {
		return units.None, false // reported already (arity by the parser)
	}
	argErr := func(i int, format string, args ...any) (units.Dim, bool) {
		pos, end := n.Args[i].Span()
		a.errorf(pos, end, KindDim, format, args...)
		return units.None, false
	}
	switch n.Fn {
	case "sqrt":
		d, ok := ds[0].Root(2)
		if !ok {
			return argErr(0, "sqrt of %s has no whole unit", unitName(ds[0]))
		}
		return d, true
	case "abs":
		return ds[0], true
	case "min", "max", "atan2":
		for i := 1; i < len(ds); i++ {
			if ds[i] != ds[0] {
				return argErr(i, "%s arguments must share a unit: %s and %s", n.Fn, unitName(ds[0]), unitName(ds[i]))
			}
		}
		if n.Fn == "atan2" {
			return units.Angle, true
		}
		return ds[0], true
	case "sin", "cos", "tan", "cot":
		if ds[0] == units.Angle {
			return units.None, true
		}
		if num, isNum := n.Args[0].(*Num); isNum && !num.HasUnit {
			return argErr(0, "%s needs an angle: write %s deg", n.Fn, num.Text)
		}
		return argErr(0, "%s needs an angle (deg or rad); got %s", n.Fn, unitName(ds[0]))
	case "asin", "acos", "atan":
		if ds[0] != units.None {
			return argErr(0, "%s needs a pure number; got %s", n.Fn, unitName(ds[0]))
		}
		return units.Angle, true
	default: // exp ln log10 floor ceil round
		if ds[0] != units.None {
			u := units.Display(ds[0]).Name
			return argErr(0, "%s needs a pure number; got %s (divide by a unit first: x / 1 %s)", n.Fn, unitName(ds[0]), u)
		}
		return units.None, true
	}
}
