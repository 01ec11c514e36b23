package trace

// Expr is a structured formula. Values inside are SI; the document layer
// chooses how to typeset each node (fractions, powers, radicals).
type Expr interface{ isExpr() }

// Sym is a symbol, written in sheet notation ("N_q", "phi'_d", "B'",
// "gamma_w"). Its value comes from the step's Inputs, except "pi".
type Sym struct{ Name string }

// Num is a constant written into a formula (the 2 in ½γB′N_γ, the 45° in
// tan²(45° + φ′/2)). V is SI; Unit is how to print it ("" = plain number,
// "deg" = print V converted to degrees).
type Num struct {
	V    float64
	Unit string
}

// Op is a binary operation: '+', '-', '*', '/' or '^'.
type Op struct {
	Op   byte
	L, R Expr
}

// Neg is unary minus.
type Neg struct{ X Expr }

// Call applies a function: a built-in one (FunctionNames, evaluated from
// the table in funcs.go), or an engine function with its own Go
// implementation in Impl (a series solution such as U(T_v), an influence
// factor integrated numerically), printed by name as written. A name that is
// neither is opaque: Eval reports ErrOpaque and the recorder refuses it.
type Call struct {
	Fn   string
	Args []Expr
	Impl func(a []float64) float64
}

func (Sym) isExpr()  {}
func (Num) isExpr()  {}
func (Op) isExpr()   {}
func (Neg) isExpr()  {}
func (Call) isExpr() {}

// S returns the symbol named name.
func S(name string) Expr { return Sym{Name: name} }

// N returns a plain numeric constant.
func N(v float64) Expr { return Num{V: v} }

// Deg returns an angle constant given in degrees (stored in radians).
func Deg(d float64) Expr { return Num{V: d * pi / 180, Unit: "deg"} }

// Add returns a + b + ... (left to right).
func Add(a Expr, more ...Expr) Expr { return fold('+', a, more) }

// Sub returns a − b.
func Sub(a, b Expr) Expr { return Op{'-', a, b} }

// Mul returns a · b · ... (left to right).
func Mul(a Expr, more ...Expr) Expr { return fold('*', a, more) }

// Div returns a / b.
func Div(a, b Expr) Expr { return Op{'/', a, b} }

// Pow returns a^b.
func Pow(a, b Expr) Expr { return Op{'^', a, b} }

// Negate returns −x.
func Negate(x Expr) Expr { return Neg{x} }

// Fn returns fn(args...) for a built-in function.
func Fn(fn string, args ...Expr) Expr { return Call{Fn: fn, Args: args} }

// Named returns fn(args...) for an engine function evaluated by impl: the
// document prints the call by name, and the step's value is impl's. The
// function's doc comment names its source.
func Named(fn string, impl func(a []float64) float64, args ...Expr) Expr {
	return Call{Fn: fn, Args: args, Impl: impl}
}

func fold(op byte, a Expr, more []Expr) Expr {
	for _, b := range more {
		a = Op{op, a, b}
	}
	return a
}

// Symbols lists the symbol names in e, each once, in order of first use.
func Symbols(e Expr) []string {
	var out []string
	seen := map[string]bool{}
	var walk func(Expr)
	walk = func(e Expr) {
		switch e := e.(type) {
		case Sym:
			if !seen[e.Name] {
				seen[e.Name] = true
				out = append(out, e.Name)
			}
		case Op:
			walk(e.L)
			walk(e.R)
		case Neg:
			walk(e.X)
		case Call:
			for _, a := range e.Args {
				walk(a)
			}
		}
	}
	walk(e)
	return out
}
