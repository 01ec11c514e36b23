package eval

import (
	"math"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// Result is an evaluated package.
type Result struct {
	Src       *sheet.Package
	Sheets    []*Sheet    // the printed sheets, in file-name order (the printing order)
	Context   []*Sheet    // sheets evaluated only for the symbols a printed sheet uses (sheet.Sheet.Context)
	Checks    []*Check    // the check register, in printing order
	Overrides []*Override // the --set values in force (a variant run when any)

	byName map[string]*Sheet
}

// Variant reports whether inputs were overridden for this run.
func (r *Result) Variant() bool { return len(r.Overrides) > 0 }

// Sheet returns the evaluated sheet with file name name.
func (r *Result) Sheet(name string) *Sheet { return r.byName[name] }

// Inputs lists every input symbol in printing order (the input register).
func (r *Result) Inputs() []*Symbol {
	var out []*Symbol
	for _, s := range r.Sheets {
		for _, y := range s.Symbols {
			if y.Input {
				out = append(out, y)
			}
		}
	}
	return out
}

// Sheet is one evaluated sheet.
type Sheet struct {
	Src     *sheet.Sheet
	Meta    sheet.Meta // package settings with this sheet's front matter laid over
	Index   int        // position in the package, 0-based
	Symbols []*Symbol  // defined on this sheet, in document order
	Checks  []*Check   // on this sheet, in document order
	Uses    []*Sheet   // sheets whose symbols this sheet reads

	stmts    map[*sheet.Stmt]any // *Symbol or *Check
	interps  map[*sheet.Interp]*Interp
	local    map[string]*Symbol // by full name
	blocks   map[sheet.Block]*Block
	grounds  map[string]*Ground
	footings map[string]*Footing
}

// Name is the sheet's file name ("03-pad.md").
func (s *Sheet) Name() string { return s.Src.Name() }

// Symbol returns the symbol a statement defined (nil if it failed or is a
// check).
func (s *Sheet) Symbol(st *sheet.Stmt) *Symbol {
	y, _ := s.stmts[st].(*Symbol)
	return y
}

// Check returns the check a check statement evaluated to.
func (s *Sheet) Check(st *sheet.Stmt) *Check {
	c, _ := s.stmts[st].(*Check)
	return c
}

// Interp returns the resolved value of a prose interpolation.
func (s *Sheet) Interp(in *sheet.Interp) *Interp { return s.interps[in] }

// Lookup finds a symbol defined on this sheet by full name.
func (s *Sheet) Lookup(name string) *Symbol { return s.local[name] }

// Symbol is an evaluated symbol.
type Symbol struct {
	Name     string         // full name ("q_Ed", "P1.B", "P1.R_d")
	Q        units.Quantity // SI value and dimension (full precision)
	Unit     units.Unit     // display unit
	Decimals int            // -1 = automatic significant figures
	Note     sheet.Str      // the note after #, with its span
	Span     source.Span    // the defining statement or cell
	Sheet    *Sheet
	Stmt     *expr.Assign // nil for symbols not defined by a statement
	Expr     expr.Node    // the expression it was read from, with its file offsets (a statement's right side, a table cell); nil for engine results and --set values
	Input    bool         // its expression holds no symbol: a value the engineer gave
	Override *Override    // non-nil when --set replaced it
	Uses     []*Symbol    // symbols its expression reads, in order of first use
	Cites    []string     // reference keys cited in its note
	Bounds   []float64    // SI values it is compared with (the other side of each check it is a side of; 1 for a utilisation): it never prints onto or across one (units.Beside)
}

// Value is the value in the display unit.
func (y *Symbol) Value() float64 { return y.Q.In(y.Unit) }

// Text formats the value with its display unit ("245.7 kPa").
func (y *Symbol) Text() string { return y.In(y.Unit, y.Decimals) }

// Number formats the value as a number of u with the given decimals (< 0:
// automatic), with the digits its Bounds need: the one way every printing
// of a symbol's value is written.
func (y *Symbol) Number(u units.Unit, decimals int) string {
	return units.Beside(y.Q.V, y.Bounds, u, decimals)
}

// In is Number with the unit's name ("24.6 mm").
func (y *Symbol) In(u units.Unit, decimals int) string {
	s := y.Number(u, decimals)
	if u.Name != "" {
		s += " " + u.Name
	}
	return s
}

// Check is an evaluated check line.
type Check struct {
	Text   string // the condition as written ("q_Ed <= q_Rd")
	Op     string // <= < >= > ==
	L, R   units.Quantity
	Unit   units.Unit // display unit for both sides
	Util   float64    // utilisation; NaN when it has no meaning (see HasUtil)
	OK     bool
	Note   sheet.Str
	Span   source.Span
	Sheet  *Sheet
	Stmt   *expr.Check
	Anchor string     // a unique name for links ("check-3"), by register order
	Sides  [2]*Symbol // the symbol each side is, when it is a lone symbol (else nil)
	Uses   []*Symbol
	Cites  []string
	// Unverified says why an engine check cannot be verified ("not
	// verified: …": data its method needs are missing, or the base is in
	// tension); such a check is never OK and has no utilisation.
	Unverified string
}

// Relation is the relation the two sides stand in as printed: the one
// asked when the check holds, its negation when it fails ("<=" → ">").
func (c *Check) Relation() string { return units.Relation(c.Op, c.OK) }

// Values formats both sides in the check's unit so that they stand in the
// order of the values (units.Apart): never rounded onto or across each other.
func (c *Check) Values() (l, r string) { return units.Apart(c.L.V, c.R.V, c.Unit, -1, -1) }

// UtilText is the utilisation to two decimals (units.Utilisation), "" when
// it has no meaning.
func (c *Check) UtilText() string {
	if !c.HasUtil() {
		return ""
	}
	return units.Utilisation(c.Util)
}

// unverified marks an engine check that cannot be verified: NOT OK, with
// no utilisation, the reason kept and note printed beside it.
func (c *Check) unverified(reason, note string) {
	c.OK, c.Util, c.Unverified = false, math.NaN(), reason
	c.Note = sheet.Str{Value: note}
}

// HasUtil reports whether the utilisation is defined.
func (c *Check) HasUtil() bool { return !math.IsNaN(c.Util) && c.Unverified == "" }

// Verdict is "OK" or "NOT OK".
func (c *Check) Verdict() string {
	if c.OK {
		return "OK"
	}
	return "NOT OK"
}

// utilisation is demand over capacity: L/R for ≤ and <, R/L for ≥ and >.
// It is defined only when both sides are positive.
func utilisation(op string, l, r float64) float64 {
	if l <= 0 || r <= 0 {
		return math.NaN()
	}
	switch op {
	case "<=", "<":
		return l / r
	case ">=", ">":
		return r / l
	}
	return math.NaN()
}

// Interp is a resolved prose interpolation.
type Interp struct {
	Symbol *Symbol
	Unit   units.Unit
	Text   string // formatted value and unit
}

// Override is one --set value.
type Override struct {
	Arg    string // as given: "c_u=55kPa"
	Sheet  string // the sheet it applies to ("" when not given)
	Name   string
	Q      units.Quantity
	Unit   units.Unit
	Target *Symbol // the input it replaced
}

// Format formats q in u with its unit name ("245.7 kPa", "0.87");
// decimals < 0 means automatic significant figures.
func Format(q units.Quantity, u units.Unit, decimals int) string {
	s := units.Format(q.V, u, decimals)
	if u.Name != "" {
		s += " " + u.Name
	}
	return s
}
