package eqn

// Node is a piece of a formula before it is measured.
type Node interface{ node() }

// Row sets its nodes side by side. Rows nested in rows are transparent.
type Row []Node

// Sym is a symbol in sheet notation ("N_q", "phi'_d", "F1.R_d", "pi").
type Sym struct{ Name string }

// Num is a number as printed: digits, decimal point, a leading "−", and
// optionally a trailing unit glued to it ("45°"). Upright.
type Num struct{ Text string }

// Text is upright text: a unit ("kN/m³"), a word, a label.
type Text struct{ Text string }

// Op is an operator or relation with the spacing of its class: relations
// (= ≤ ≥ < > ≠ ≈ →) get a thick space each side, binary operators
// (+ − × · ±) a medium one, "," a thin space after. An Op that begins a row
// (a continuation line) has no space before it.
type Op struct{ Text string }

// Script attaches a superscript and/or subscript to Base; either may be nil.
type Script struct{ Base, Sup, Sub Node }

// Frac is a stacked fraction with a bar.
type Frac struct{ Num, Den Node }

// Sqrt is a square root: the radical sign with its bar over X.
type Sqrt struct{ X Node }

// Fence sets X between delimiters — "(" ")", "[" "]" or "|" "|" — grown
// to the height of X.
type Fence struct {
	Open, Close string
	X           Node
}

// Func is a function applied to its arguments: an upright name (with an
// optional power on the name, as in tan²), then the arguments in
// parentheses separated by commas.
type Func struct {
	Name string
	Sup  Node
	Args []Node
}

// Space is horizontal space, in em of the current size.
type Space struct{ Em float64 }

// Strong sets X in bold (for a result the eye should find).
type Strong struct{ X Node }

func (Row) node()    {}
func (Sym) node()    {}
func (Num) node()    {}
func (Text) node()   {}
func (Op) node()     {}
func (Script) node() {}
func (Frac) node()   {}
func (Sqrt) node()   {}
func (Fence) node()  {}
func (Func) node()   {}
func (Space) node()  {}
func (Strong) node() {}

// Paren wraps x in round brackets.
func Paren(x Node) Node { return Fence{Open: "(", Close: ")", X: x} }
