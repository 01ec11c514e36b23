package sheet

import (
	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/source"
)

// Block is a block-level node: prose (Heading, Paragraph, List, Table,
// Image, CodeBlock, Caution, Quote, ThematicBreak) or a plinth block
// (Calc, Ground, Footing, Analysis).
type Block interface {
	Node
	block()
}

// Inline is a node inside a line of prose: Text, Link, Interp, Cite, Break.
type Inline interface {
	Node
	inline()
}

// Heading is an ATX (# ...) or setext heading, Level 1 to 6.
type Heading struct {
	Span  source.Span
	Level int
	Text  []Inline
}

// Paragraph is a run of prose lines.
type Paragraph struct {
	Span source.Span
	Text []Inline
}

// List is a bullet or ordered list. Start is the first number of an
// ordered list. Tight lists have no blank lines between items.
type List struct {
	Span    source.Span
	Ordered bool
	Start   int
	Tight   bool
	Items   []*Item
}

// Item is one list item: blocks, possibly nested lists.
type Item struct {
	Span   source.Span
	Blocks []Block
}

// Align is a table column's alignment.
type Align int

const (
	AlignNone Align = iota
	AlignLeft
	AlignCenter
	AlignRight
)

func (a Align) String() string {
	return [...]string{"none", "left", "center", "right"}[a]
}

// Table is a prose GFM table. Every row has len(Align) cells.
type Table struct {
	Span   source.Span
	Header []Cell
	Align  []Align
	Rows   [][]Cell
}

// Cell is one prose table cell.
type Cell struct {
	Span source.Span
	Text []Inline
}

// Image is a figure: a Markdown image standing in its own paragraph (an
// image inside a paragraph of text is split out after the text before it).
// Path is the destination as written, a slash-separated path inside the
// package folder (checked by parse.Package through doc/load); Caption is
// the alt text.
type Image struct {
	Span    source.Span
	Path    Str
	Title   string
	Caption []Inline
}

// CodeBlock is fenced or indented code that is not a plinth block. Lang is
// the first word of the info string.
type CodeBlock struct {
	Span source.Span
	Lang string
	Text string
}

// Caution is a blockquote opened by "> [!CAUTION]", "> [!WARNING]" or
// "> [!NOTE]": Kind is its level (calc/severity). KindSpan covers the
// marker; Body holds the rest.
type Caution struct {
	Span     source.Span
	Kind     severity.Level
	KindSpan source.Span
	Body     []Block
}

// Quote is any other blockquote.
type Quote struct {
	Span source.Span
	Body []Block
}

// ThematicBreak is a horizontal rule.
type ThematicBreak struct {
	Span source.Span
}

// Style flags a run of text.
type Style uint8

const (
	Bold   Style = 1 << iota // **strong**
	Italic                   // *emphasis*
	Code                     // `code span`
)

func (s Style) String() string {
	out := ""
	for i, n := range []string{"bold", "italic", "code"} {
		if s&(1<<i) != 0 {
			if out != "" {
				out += "+"
			}
			out += n
		}
	}
	return out
}

// Text is a run of prose in one style. Value has Markdown escapes and
// entities resolved; Span covers the source text.
type Text struct {
	Span  source.Span
	Value string
	Style Style
}

// Link is a hyperlink (inline, reference or autolink).
type Link struct {
	Span  source.Span
	URL   string
	Title string
	Text  []Inline
}

// Interp is a value interpolated into prose: {symbol} or
// {symbol -> unit[:decimals]}. Src is the text between the braces; Ref is
// its parse by expr.ParseRef, offsets into the file (nil when it did not
// parse: the error is already reported). Style is the surrounding style.
type Interp struct {
	Span  source.Span
	Src   Str
	Ref   *expr.Ref
	Style Style
}

// Cite is a citation [KEY] of a reference (a key from references:, checked
// by the evaluator). Span covers the brackets; Key the key alone.
type Cite struct {
	Span source.Span
	Key  Str
}

// CitesIn finds the citations [KEY] in a note or comment, by the rule
// prose follows (KEY is a letter, then letters, digits, _, . or -), with
// spans inside s. Prose is searched by doc/parse; notes of statements,
// options and comments are searched with this.
func CitesIn(s Str) []*Cite {
	var out []*Cite
	v := s.Value
	for i := 0; i < len(v); i++ {
		if v[i] != '[' || i+2 >= len(v) || !letter(v[i+1]) {
			continue
		}
		j := i + 2
		for j < len(v) && (letter(v[j]) || v[j] >= '0' && v[j] <= '9' || v[j] == '_' || v[j] == '.' || v[j] == '-') {
			j++
		}
		if j < len(v) && v[j] == ']' {
			at := func(a, b int) source.Span {
				return source.Span{File: s.Span.File, Start: s.Span.Start + a, End: s.Span.Start + b}
			}
			out = append(out, &Cite{Span: at(i, j+1), Key: Str{Value: v[i+1 : j], Span: at(i+1, j)}})
			i = j
		}
	}
	return out
}

func letter(b byte) bool { return b >= 'a' && b <= 'z' || b >= 'A' && b <= 'Z' }

// Break is a line break inside a paragraph: soft (a newline in the source)
// or hard (two trailing spaces or a backslash).
type Break struct {
	Span source.Span
	Hard bool
}

func (n *Heading) Where() source.Span       { return n.Span }
func (n *Paragraph) Where() source.Span     { return n.Span }
func (n *List) Where() source.Span          { return n.Span }
func (n *Item) Where() source.Span          { return n.Span }
func (n *Table) Where() source.Span         { return n.Span }
func (n *Image) Where() source.Span         { return n.Span }
func (n *CodeBlock) Where() source.Span     { return n.Span }
func (n *Caution) Where() source.Span       { return n.Span }
func (n *Quote) Where() source.Span         { return n.Span }
func (n *ThematicBreak) Where() source.Span { return n.Span }
func (n *Text) Where() source.Span          { return n.Span }
func (n *Link) Where() source.Span          { return n.Span }
func (n *Interp) Where() source.Span        { return n.Span }
func (n *Cite) Where() source.Span          { return n.Span }
func (n *Break) Where() source.Span         { return n.Span }

func (*Heading) block()       {}
func (*Paragraph) block()     {}
func (*List) block()          {}
func (*Table) block()         {}
func (*Image) block()         {}
func (*CodeBlock) block()     {}
func (*Caution) block()       {}
func (*Quote) block()         {}
func (*ThematicBreak) block() {}

func (*Text) inline()   {}
func (*Link) inline()   {}
func (*Interp) inline() {}
func (*Cite) inline()   {}
func (*Break) inline()  {}
