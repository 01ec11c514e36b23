package expr

import (
	"math"
	"strconv"

	"github.com/plinth-calc/plinth/calc/units"
)

// Node is an expression node. Every node knows its byte span [pos, end)
// in the file.
type Node interface {
	Span() (pos, end int)
	node()
}

// Num is a number with an optional unit: "18 kN/m3", "30°", "5%", "1e3".
type Num struct {
	Pos, End int        // the number and its unit
	Text     string     // the number as written, "2.5E-4"
	V        float64    // the number as written, as a float (not SI)
	Unit     units.Unit // units.Dimensionless when HasUnit is false
	UnitText string     // the unit as written, "kN/m^3"
	UnitPos  int        // file offset of UnitText
	HasUnit  bool
}

// Quantity returns the number in SI with its dimension.
func (n *Num) Quantity() units.Quantity { return n.Unit.Of(n.V) }

// Ident is a symbol: "gamma_sat", "phi'_d", "B'", "φ", "F1.R_d".
type Ident struct {
	Pos, End int
	Name     string
}

// Const is a named constant: pi, or g, the standard acceleration of
// gravity (9.80665 m/s², the constant gravity).
type Const struct {
	Pos, End int
	Name     string    // "pi" or "g"
	V        float64   // math.Pi; gravity
	Dim      units.Dim // None; units.Accel
}

// gravity is g, the standard acceleration of free fall, 9.80665 m/s²
// (3rd CGPM, 1901; NIST SP 811 (2008) §8.2 and B.8), so that a density
// becomes a unit weight: 1.9 t/m3 * g.
const gravity = 9.80665

// Unary is a sign: -x or +x.
type Unary struct {
	Pos, End int
	Op       string // "-" or "+"
	X        Node
}

// Binary is L Op R with Op one of + - * / ^.
type Binary struct {
	Pos, End     int
	Op           string // normalised: "*" for × and ·, "-" for −, "/" for ÷
	OpText       string // as written
	OpPos, OpEnd int
	L, R         Node
}

// Paren is a parenthesised expression, kept for the typesetter.
type Paren struct {
	Pos, End int // the parentheses included
	X        Node
}

// Call is a function call, fn(args).
type Call struct {
	Pos, End int // from the name to after ")"
	Fn       string
	FnEnd    int // end of the name
	Lparen   int
	Rparen   int // offset of ")", or -1 when it is missing
	Args     []Node
}

// Bad stands where an expression could not be read; an Error says why.
type Bad struct{ Pos, End int }

func (n *Num) Span() (int, int)    { return n.Pos, n.End }
func (n *Ident) Span() (int, int)  { return n.Pos, n.End }
func (n *Const) Span() (int, int)  { return n.Pos, n.End }
func (n *Unary) Span() (int, int)  { return n.Pos, n.End }
func (n *Binary) Span() (int, int) { return n.Pos, n.End }
func (n *Paren) Span() (int, int)  { return n.Pos, n.End }
func (n *Call) Span() (int, int)   { return n.Pos, n.End }
func (n *Bad) Span() (int, int)    { return n.Pos, n.End }

func (*Num) node()    {}
func (*Ident) node()  {}
func (*Const) node()  {}
func (*Unary) node()  {}
func (*Binary) node() {}
func (*Paren) node()  {}
func (*Call) node()   {}
func (*Bad) node()    {}

// Stmt is one line of a plinth block.
type Stmt interface {
	Span() (pos, end int)
	stmt()
}

// DisplayUnit is "-> unit[:decimals]" after an expression or in a prose
// reference.
type DisplayUnit struct {
	Pos, End int // the unit and decimals, "kPa:1"
	Unit     units.Unit
	Text     string // the unit as written
	Decimals int    // -1 when not given
}

// Assign is "symbol = expression [-> unit[:decimals]] [# note]".
type Assign struct {
	Pos, End int // the whole statement, note included
	Sym      Ident
	X        Node
	Display  *DisplayUnit // nil when absent
	Note     string       // trimmed text after "#"
	NotePos  int          // file offset of Note, -1 when there is no "#"
}

// Check is "check L op R [# note]" with op one of <= < >= > ==.
type Check struct {
	Pos, End     int
	L            Node
	Op           string // normalised: "<=" for ≤, ">=" for ≥
	OpPos, OpEnd int
	R            Node
	Note         string
	NotePos      int
}

// Comment is a line holding only a note, "# text".
type Comment struct {
	Pos, End int
	Text     string
	TextPos  int
}

func (s *Assign) Span() (int, int)  { return s.Pos, s.End }
func (s *Check) Span() (int, int)   { return s.Pos, s.End }
func (s *Comment) Span() (int, int) { return s.Pos, s.End }

func (*Assign) stmt()  {}
func (*Check) stmt()   {}
func (*Comment) stmt() {}

// Ref is the inside of a prose interpolation: "{symbol}" or
// "{symbol -> unit[:decimals]}".
type Ref struct {
	Pos, End int
	Sym      Ident
	Display  *DisplayUnit
}

// Idents returns every symbol occurrence in n in source order (repeats
// included, pi excluded).
func Idents(n Node) []Ident { return appendIdents(nil, n) }

func appendIdents(out []Ident, n Node) []Ident {
	switch n := n.(type) {
	case *Ident:
		out = append(out, *n)
	case *Unary:
		out = appendIdents(out, n.X)
	case *Binary:
		out = appendIdents(appendIdents(out, n.L), n.R)
	case *Paren:
		out = appendIdents(out, n.X)
	case *Call:
		for _, a := range n.Args {
			out = appendIdents(out, a)
		}
	}
	return out
}

func parseFloat(s string) float64 {
	v, _ := strconv.ParseFloat(s, 64)
	return v
}

func isInfinite(v float64) bool { return math.IsInf(v, 0) }

// gravityDim is g's dimension (the parser file does not import units).
var gravityDim = units.Accel
