package expr

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"strings"
	"sync"

	"github.com/Knetic/govaluate"
)

// canonical writes n in govaluate's syntax, fully parenthesised, with its
// parameters: each distinct symbol as an escaped positional parameter
// "[$0]", "[$1]" ... in order of first use, valued from env (SI float64),
// so a name such as phi' or F1.R_d never reaches govaluate's lexer; every
// number and pi as a parameter "[#0]", "[#1]" ... in source order (govaluate cannot read 1e3, and formatting floats into the
// text would round them), unary minus as "(-(x))", powers as "(a ** b)"
// (govaluate's ** is left-associative and binds looser than its prefix
// minus; full parentheses make that irrelevant), functions by their own
// names, registered with govaluate and working on SI values (angles in
// radians). The map is never nil. Because numbers and symbols are parameters,
// lines of the same shape share one canonical string, so compiled
// expressions are cached by it.
func canonical(n Node, env Env) (string, map[string]interface{}) {
	c := canon{env: env, params: make(map[string]interface{}, 8)}
	c.b.Grow(64)
	c.write(n)
	return c.b.String(), c.params
}

type canon struct {
	b      strings.Builder
	env    Env
	params map[string]interface{}
	nums   int
	syms   map[string]string // symbol name → its parameter name "$k"
}

var numNames = func() []string {
	s := make([]string, 64)
	for i := range s {
		s[i] = "#" + strconv.Itoa(i)
	}
	return s
}()

func (c *canon) number(v float64) {
	name := ""
	if c.nums < len(numNames) {
		name = numNames[c.nums]
	} else {
		name = "#" + strconv.Itoa(c.nums)
	}
	c.nums++
	c.params[name] = v
	c.b.WriteByte('[')
	c.b.WriteString(name)
	c.b.WriteByte(']')
}

func (c *canon) write(n Node) {
	switch n := n.(type) {
	case *Num:
		c.number(n.Quantity().V)
	case *Const:
		c.number(n.V)
	case *Ident:
		name, ok := c.syms[n.Name]
		if !ok {
			if c.syms == nil {
				c.syms = make(map[string]string, 4)
			}
			name = "$" + strconv.Itoa(len(c.syms))
			c.syms[n.Name] = name
			if c.env != nil {
				if q, ok := c.env.Lookup(n.Name); ok {
					c.params[name] = q.V
				}
			}
		}
		c.b.WriteByte('[')
		c.b.WriteString(name)
		c.b.WriteByte(']')
	case *Paren:
		c.write(n.X)
	case *Unary:
		if n.Op == "-" {
			c.b.WriteString("(-(")
			c.write(n.X)
			c.b.WriteString("))")
		} else {
			c.write(n.X)
		}
	case *Binary:
		op := n.Op
		if op == "^" {
			op = "**"
		}
		c.b.WriteByte('(')
		c.write(n.L)
		c.b.WriteByte(' ')
		c.b.WriteString(op)
		c.b.WriteByte(' ')
		c.write(n.R)
		c.b.WriteByte(')')
	case *Call:
		c.b.WriteString(n.Fn)
		c.b.WriteByte('(')
		for i, a := range n.Args {
			if i > 0 {
				c.b.WriteString(", ")
			}
			c.write(a)
		}
		c.b.WriteByte(')')
	default:
		c.b.WriteString("(1 / 0)") // *Bad: never evaluated by Eval
	}
}

// govaluateFunctions registers the built-in functions with govaluate.
var govaluateFunctions = func() map[string]govaluate.ExpressionFunction {
	m := make(map[string]govaluate.ExpressionFunction, len(functions))
	for name, f := range functions {
		m[name] = func(args ...interface{}) (interface{}, error) {
			if len(args) < f.min || (f.max >= 0 && len(args) > f.max) {
				return nil, fmt.Errorf("%s takes %s, got %d", name, arity(f), len(args))
			}
			var buf [4]float64
			xs := buf[:0]
			for _, a := range args {
				x, ok := a.(float64)
				if !ok || math.IsNaN(x) || math.IsInf(x, 0) {
					return nil, fmt.Errorf("%s: argument %v is not a finite number", name, a)
				}
				xs = append(xs, x)
			}
			return f.f(xs), nil
		}
	}
	return m
}()

// The compiled-expression cache, keyed by canonical string. It is emptied
// when it reaches cacheMax entries, which bounds memory in a long run.
const cacheMax = 4096

var cache = struct {
	sync.RWMutex
	m map[string]*govaluate.EvaluableExpression
}{m: make(map[string]*govaluate.EvaluableExpression)}

func compile(src string) (*govaluate.EvaluableExpression, error) {
	cache.RLock()
	e := cache.m[src]
	cache.RUnlock()
	if e != nil {
		return e, nil
	}
	e, err := govaluate.NewEvaluableExpressionWithFunctions(src, govaluateFunctions)
	if err != nil {
		return nil, err
	}
	cache.Lock()
	if len(cache.m) >= cacheMax {
		clear(cache.m)
	}
	cache.m[src] = e
	cache.Unlock()
	return e, nil
}

// run compiles (or fetches) src and evaluates it; a govaluate panic
// becomes an error.
func run(src string, params map[string]interface{}) (v float64, err error) {
	defer func() {
		if r := recover(); r != nil {
			err = fmt.Errorf("govaluate panicked: %v", r)
		}
	}()
	if params == nil {
		params = map[string]interface{}{}
	}
	e, err := compile(src)
	if err != nil {
		return 0, err
	}
	res, err := e.Evaluate(params)
	if err != nil {
		return 0, err
	}
	v, ok := res.(float64)
	if !ok {
		return 0, fmt.Errorf("govaluate returned %T, not a number", res)
	}
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return 0, errors.New("govaluate returned a non-finite number")
	}
	return v, nil
}
