package source

import (
	"fmt"
	"sort"
	"unicode/utf8"
)

// File is one input file: its path as the user should see it (relative to
// where plinth was run, or to the package) and its bytes.
type File struct {
	Path  string
	Text  []byte
	lines []int // offset of the first byte of each line
}

// NewFile returns a File for path holding text.
func NewFile(path string, text []byte) *File {
	f := &File{Path: path, Text: text, lines: []int{0}}
	for i, b := range text {
		if b == '\n' {
			f.lines = append(f.lines, i+1)
		}
	}
	return f
}

// Position is a human position in a file: 1-based line and rune column.
type Position struct {
	Path string
	Line int
	Col  int
}

func (p Position) String() string {
	if p.Line == 0 {
		return p.Path
	}
	return fmt.Sprintf("%s:%d:%d", p.Path, p.Line, p.Col)
}

// Position converts a byte offset into a line and rune column. Offsets past
// the end clamp to the end of the file.
func (f *File) Position(off int) Position {
	if f == nil {
		return Position{}
	}
	if off < 0 {
		off = 0
	}
	if off > len(f.Text) {
		off = len(f.Text)
	}
	i := sort.Search(len(f.lines), func(i int) bool { return f.lines[i] > off }) - 1
	start := f.lines[i]
	col := utf8.RuneCount(f.Text[start:off]) + 1
	return Position{Path: f.Path, Line: i + 1, Col: col}
}

// LineStart is the byte offset of the first byte of 1-based line n.
func (f *File) LineStart(n int) int {
	if n < 1 {
		return 0
	}
	if n > len(f.lines) {
		return len(f.Text)
	}
	return f.lines[n-1]
}

// Span is a half-open byte range [Start, End) in a file.
type Span struct {
	File       *File
	Start, End int
}

// Pos is the human position of the start of the span.
func (s Span) Pos() Position { return s.File.Position(s.Start) }

// Text is the source text the span covers.
func (s Span) Text() string {
	if s.File == nil || s.Start < 0 || s.End > len(s.File.Text) || s.Start > s.End {
		return ""
	}
	return string(s.File.Text[s.Start:s.End])
}

// IsZero reports whether the span points nowhere.
func (s Span) IsZero() bool { return s.File == nil }

// String is the human position of the span's start ("calcs/03-pad.md:12:5"),
// "" for a span that points nowhere.
func (s Span) String() string { return s.Pos().String() }
