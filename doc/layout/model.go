package layout

import (
	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// Doc is a whole calculation package to lay out: one or more sheets, each
// starting on a new page, under one page template.
type Doc struct {
	Info     Info
	Template *Template // nil = the built-in A4 template
	Sheets   []Sheet
	// Bars, when set, are change bars beside what the given source lines
	// print (bars.go).
	Bars *Bars
	// Progress, when set, is called after each sheet is laid out with the
	// sheet layouts done and the total, which grows when sheets are laid
	// out again with their page references filled in (it does not change
	// the pages).
	Progress func(done, total int)
	// Final, when set, is handed each sheet's pages as soon as the sheet
	// is laid out whole, before the title block and footer are added,
	// less the boxes of the blocks that set a page reference (those stay
	// on the pages, to be filled in). It is called from several goroutines
	// at once, in no set order, and may paint the boxes and set each
	// page's Boxes to nil (pdf.Bodies does); the layout keeps what it
	// needs of them (anchors and links) and, once they are painted, drops
	// them from its pages. A sheet laid out whole again (a filled-in page
	// number changed the shape of a block) is handed on again, and the
	// later pages replace the earlier. A sheet that sets no page reference
	// has its Blocks dropped once painted, so the Doc is used up. Final is
	// not called when Bars are set (the change bars are drawn on the
	// bodies at the end).
	Final func(sheet int, pages []*Page)
}

// Info describes the package as a whole.
type Info struct {
	Title    string // PDF document title
	Author   string // PDF author (the designer)
	Subject  string // PDF subject
	Keywords string // PDF keywords (the fingerprint is added)
	// Fingerprint identifies the inputs (a hex digest, say). Every page
	// footer prints its first 12 characters; the PDF information carries
	// it whole.
	Fingerprint string
	// Variant lists the inputs a variant run overrode, as printed
	// ("c_u = 55 kPa"). When set, every page says VARIANT and lists them.
	Variant []string
}

// Fields fill a sheet's title block. A blank Checked prints NOT CHECKED.
type Fields struct {
	Project, Job, Client string
	Title                string // sheet title
	Calc                 string // calculation number
	Rev                  string
	By, Date             string // designer's initials and date
	Checked, CheckedDate string // checker's initials and date
	// Extra holds values for a firm template's own field names.
	Extra map[string]string
}

// Sheet is one calc sheet: its title block fields and its body.
type Sheet struct {
	Pos      source.Span
	Fields   Fields
	Bookmark string // the sheet's PDF bookmark; "" = Calc and Title
	Blocks   []Block
}

// Block is one piece of a sheet's body. Every block carries the source
// span (Pos) problems are reported at; Where returns it.
type Block interface {
	Where() source.Span
	isBlock()
}

// Style is a text face: Regular, Bold, Italic, BoldItalic or Mono.
type Style = fonts.Face

// The text styles of a Run.
const (
	Regular    = fonts.Regular
	Bold       = fonts.Bold
	Italic     = fonts.Italic
	BoldItalic = fonts.BoldItalic
	Mono       = fonts.Mono
)

// Shift raises or lowers a run.
type Shift uint8

const (
	Baseline Shift = iota
	Sup            // superscript
	Sub            // subscript
)

// Run is a stretch of inline content in one style: text, or inline math
// when Math is set. Line breaks fall at spaces; "\n" forces one.
type Run struct {
	Text  string
	Style Style
	Shift Shift
	Link  string   // name of the anchor this run links to; "" = none
	Math  eqn.Node // inline formula; replaces Text
	// Page, when its Anchor is set, makes the run print where that anchor
	// lands, filled in by the layout; it replaces Text.
	Page PageRef
	// Own marks text plinth wrote (engine notes, cautions, references,
	// fixed wording) rather than the user. It is spelled with
	// fonts.Spell (⅔ as 2/3); a character still missing from the fonts
	// is plinth's defect, reported as an internal error that names
	// plinth, never at the user's line.
	Own bool
}

// PageRef is a page number the layout fills in once it knows where an
// anchor lands: Prefix then the page, counted from 1 across the document
// ("page 12", "appendix, page 40"), or with Sheet the pages of the sheet
// holding the anchor ("3" or "3–5"). Until then (the first pass) it
// prints Prefix and a dash ("page —"). A reference to an anchor the
// document does not have is a problem.
type PageRef struct {
	Anchor string
	Prefix string
	Sheet  bool
}

// Align is a table column's alignment.
type Align uint8

const (
	AlignDefault Align = iota // left
	AlignLeft
	AlignCenter
	AlignRight
)

// Heading is a numbered section heading, level 1 to 3. Number "" gets the
// next number in the sheet (1, 1.1, 1.1.1); NoNumber prints none. A
// heading is kept on the page with what follows it.
type Heading struct {
	Pos      source.Span
	Level    int
	Number   string
	NoNumber bool
	Anchor   string // optional anchor name at the heading
	Runs     []Run
}

// Para is a paragraph of text. A Small one is set in the note size, with
// a smaller gap above it (lists of entries: references).
type Para struct {
	Pos   source.Span
	Runs  []Run
	Small bool
	Label bool // a run-in heading over what follows: never left alone at the foot of a page
}

// List is a bullet list, or a numbered one from Start (0 means 1). Each
// item is a list of blocks; lists nest.
type List struct {
	Pos     source.Span
	Ordered bool
	Start   int
	Items   [][]Block
}

// Cell is a table cell's content.
type Cell = []Run

// Row is a table body row. CellPos, when given, holds each cell's span,
// where a problem in that cell is reported (else at the row's).
type Row struct {
	Pos     source.Span
	Cells   []Cell
	CellPos []source.Span
}

// Table is a table with one header row, which repeats at the top of each
// page the table runs onto. Column widths follow the content; cell text
// wraps. Align gives each column's alignment (missing = left).
type Table struct {
	Pos     source.Span
	Header  []Cell
	Rows    []Row
	Align   []Align
	Caption []Run // printed above the table; optional
	// Compact sets the table in a smaller size with tighter cells (long
	// tables of working and registers).
	Compact bool
}

// Image is a PNG or JPEG picture, scaled to fit the text width (and at
// most Width points wide when Width > 0), with an optional caption below.
type Image struct {
	Pos     source.Span
	Data    []byte
	Width   float64
	Caption []Run
}

// Code is preformatted text in the monospaced face on a shaded ground.
type Code struct {
	Pos  source.Span
	Text string
}

// Statement is a calculation line:
//
//	Symbol = Expr = Subst = Result        Note  [Ref]
//
// Expr and Subst are optional (nil); the note sits to the right, or below
// when the formula leaves no room. A statement never splits across pages;
// a formula too wide for the column wraps at its top-level = or +.
type Statement struct {
	Pos    source.Span
	Symbol eqn.Node
	Expr   eqn.Node // the formula in symbols
	Subst  eqn.Node // the formula with values substituted
	Result eqn.Node // the value with its unit
	Note   []Run
	Ref    string // a reference, printed after the note
	Anchor string // optional anchor name
	Own    bool   // plinth's own line (an engine step): see Run.Own
}

// Input is a given value: Symbol = Value, with its note and reference.
type Input struct {
	Pos    source.Span
	Symbol eqn.Node
	Value  eqn.Node
	Note   []Run
	Ref    string
	Anchor string
	Own    bool // plinth's own line (an engine step): see Run.Own
}

// Check is a design check: both sides with values, the comparison, the
// utilisation and the verdict OK or NOT OK (in words; colour only
// supports them). Rel is one of ≤ ≥ < > = ≠ (or <= >= !=): the relation
// the printed sides stand in, so a failing ≤ check is given as >.
type Check struct {
	Pos        source.Span
	Left       eqn.Node // the left symbol, e.g. q_Ed
	LeftValue  eqn.Node // its value with unit
	Rel        string
	Right      eqn.Node
	RightValue eqn.Node
	Util       float64 // utilisation, left over right for ≤
	UtilText   string  // the utilisation as printed everywhere ("0.57"); "" prints Util to two decimals
	OK         bool
	Note       []Run
	Anchor     string // the check register links here
}

// Caution is a boxed caution: the word of its Severity (NOTE, CAUTION or
// WARNING, calc/severity), an optional title, and body blocks. A long one
// may run onto the next page.
type Caution struct {
	Pos      source.Span
	Severity severity.Level
	Title    []Run
	Body     []Block
}

// Drawing is a picture made of vector primitives (a chart, a sketch), W by
// H points, items relative to its top-left corner. A drawing wider than
// the text column is scaled down to fit (Template.BodyWidth tells a
// component the width to draw at). It never splits across pages.
type Drawing struct {
	Pos     source.Span
	W, H    float64
	Items   []draw.Item
	Caption []Run
}

// PageBreak starts a new page.
type PageBreak struct{ Pos source.Span }

// Anchor names the current place, for links.
type Anchor struct {
	Pos  source.Span
	Name string
}

func (b *Heading) Where() source.Span   { return b.Pos }
func (b *Para) Where() source.Span      { return b.Pos }
func (b *List) Where() source.Span      { return b.Pos }
func (b *Table) Where() source.Span     { return b.Pos }
func (b *Image) Where() source.Span     { return b.Pos }
func (b *Code) Where() source.Span      { return b.Pos }
func (b *Statement) Where() source.Span { return b.Pos }
func (b *Input) Where() source.Span     { return b.Pos }
func (b *Check) Where() source.Span     { return b.Pos }
func (b *Caution) Where() source.Span   { return b.Pos }
func (b *Drawing) Where() source.Span   { return b.Pos }
func (b *PageBreak) Where() source.Span { return b.Pos }
func (b *Anchor) Where() source.Span    { return b.Pos }

func (*Heading) isBlock()   {}
func (*Para) isBlock()      {}
func (*List) isBlock()      {}
func (*Table) isBlock()     {}
func (*Image) isBlock()     {}
func (*Code) isBlock()      {}
func (*Statement) isBlock() {}
func (*Input) isBlock()     {}
func (*Check) isBlock()     {}
func (*Caution) isBlock()   {}
func (*Drawing) isBlock()   {}
func (*PageBreak) isBlock() {}
func (*Anchor) isBlock()    {}
