package sheet

import (
	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/source"
)

// Kind names a plinth block: the first word of a fenced block's info string.
type Kind int

const (
	KindCalc Kind = iota
	KindGround
	KindFooting
	KindBearing
	KindSettlement
	KindCapacity
	KindDifferential
	KindSize
	KindSchedule
	KindPlatform
)

// Kinds are the block words in Kind order (from Specs).
var Kinds = func() []string {
	out := make([]string, len(Specs))
	for i, s := range Specs {
		out[i] = s.Word
	}
	return out
}()

func (k Kind) String() string { return Kinds[k] }

// LookupKind returns the Kind a block word names.
func LookupKind(word string) (Kind, bool) {
	for i, w := range Kinds {
		if w == word {
			return Kind(i), true
		}
	}
	return 0, false
}

// Calc is a ```calc block: statements and checks, in order.
type Calc struct {
	Span  source.Span // opening fence to closing fence
	Lines []Line      // *Stmt and *Comment
}

// Ground is a ```ground NAME block: statements (water = 2.0 m) and one
// table of layers.
type Ground struct {
	Span  source.Span
	Name  Str
	Lines []Line // *Stmt, *Option and *Comment
	Table *Grid  // nil when the block has none
}

// Footing is a ```footing NAME block: statements (B = 2.4 m), word options
// (shape = rectangle, self_weight = auto) and one table of actions.
type Footing struct {
	Span  source.Span
	Name  Str
	Lines []Line // *Stmt, *Option and *Comment
	Table *Grid
}

// Analysis is a bearing, settlement or capacity block:
// ```KIND FOOTING on GROUND [as PREFIX], holding options; or a
// differential block, ```differential FOOTING to FOOTING [as PREFIX].
type Analysis struct {
	Span     source.Span
	Kind     Kind // KindBearing, KindSettlement or KindCapacity
	KindSpan source.Span
	Footing  Str
	Ground   Str
	Prefix   Str    // the "as" name; zero when absent (results go under Footing)
	To       Str    // differential blocks: the second footing (Ground is then zero)
	Lines    []Line // *Option and *Comment
	Table    *Grid  // schedule blocks: the table of footings (nil otherwise)
}

// ResultPrefix is the name the block's results are published under:
// Prefix when given, else the footing's name.
func (a *Analysis) ResultPrefix() Str {
	if a.Prefix.IsSet() {
		return a.Prefix
	}
	if a.Kind.Spec().Header == kind.To {
		return Str{Value: a.Footing.Value + "_" + a.To.Value, Span: a.Footing.Span}
	}
	return a.Footing
}

// Options returns the block's option lines in order.
func (a *Analysis) Options() []*Option { return options(a.Lines) }

// Options returns the block's option lines in order.
func (g *Ground) Options() []*Option { return options(g.Lines) }

// Options returns the block's option lines in order.
func (f *Footing) Options() []*Option { return options(f.Lines) }

func options(lines []Line) []*Option {
	var out []*Option
	for _, l := range lines {
		if o, ok := l.(*Option); ok {
			out = append(out, o)
		}
	}
	return out
}

// Line is one line of a plinth block: *Stmt, *Option or *Comment.
type Line interface {
	Node
	line()
}

// Stmt is a statement line, parsed by doc/expr: an *expr.Assign
// ("symbol = expression [-> unit[:decimals]] [# note]") or, in calc
// blocks, an *expr.Check ("check a <= b [# note]"). Offsets inside X are
// byte offsets into the sheet's file. X is whatever the parser recovered
// when the line has errors (they are reported), nil if nothing.
type Stmt struct {
	Span source.Span
	X    expr.Stmt
}

// Note returns the statement's note (the text after '#') with its span;
// zero when it has none.
func (s *Stmt) Note() Str {
	var note string
	pos := -1
	switch x := s.X.(type) {
	case *expr.Assign:
		note, pos = x.Note, x.NotePos
	case *expr.Check:
		note, pos = x.Note, x.NotePos
	}
	if pos < 0 {
		return Str{}
	}
	return Str{Value: note, Span: source.Span{File: s.Span.File, Start: pos, End: pos + len(note)}}
}

// Comment is a "# ..." line. Text follows the '#', trimmed.
type Comment struct {
	Span source.Span
	Text string
}

// Option is a "name = value [# note]" line of an analysis block, or a
// word-valued line of a ground or footing block. Value is the raw text
// (trimmed), checked by the evaluator against Options.
type Option struct {
	Span  source.Span
	Name  Str
	Value Str
	Note  Str // after '#', trimmed; zero when absent
}

// Grid is the pipe table of a ground or footing block, read by plinth
// itself: a header row (each cell a column name and an optional unit in
// parentheses), a delimiter row, and body rows with one cell per column.
type Grid struct {
	Span    source.Span
	Columns []Column
	Rows    []Row
}

// Column is a header cell: "gamma (kN/m3)" has Name gamma and Unit kN/m3.
type Column struct {
	Span source.Span // the whole header cell
	Name Str
	Unit Str // zero when the header gives none
}

// Row is a body row; Cells has one entry per column, trimmed (an empty
// cell has an empty Value and a zero-width span where it stands).
type Row struct {
	Span  source.Span
	Cells []Str
}

func (n *Calc) Where() source.Span     { return n.Span }
func (n *Ground) Where() source.Span   { return n.Span }
func (n *Footing) Where() source.Span  { return n.Span }
func (n *Analysis) Where() source.Span { return n.Span }
func (n *Comment) Where() source.Span  { return n.Span }
func (n *Option) Where() source.Span   { return n.Span }
func (n *Stmt) Where() source.Span     { return n.Span }
func (n *Grid) Where() source.Span     { return n.Span }

func (*Calc) block()     {}
func (*Ground) block()   {}
func (*Footing) block()  {}
func (*Analysis) block() {}

func (*Comment) line() {}
func (*Option) line()  {}
func (*Stmt) line()    {}
