package sheet

import "github.com/plinth-calc/plinth/doc/source"

// Node is any node of the tree. Where returns the span it was read from.
type Node interface {
	Where() source.Span
}

// Str is a piece of source text with its span: a front-matter value, a
// block name, an option value, a table cell. Value is the text as written
// (YAML scalars decoded; surrounding spaces trimmed elsewhere).
type Str struct {
	Value string
	Span  source.Span // zero when the value was not given
}

// IsSet reports whether the value was written (it may still be blank, as
// in "checked:" with nothing after it).
func (s Str) IsSet() bool { return s.Span.File != nil }

// Where returns the span of the text.
func (s Str) Where() source.Span { return s.Span }

// Sheet is one parsed Markdown file.
type Sheet struct {
	File *source.File
	Meta Meta    // the front matter (zero Span when there is none)
	Body []Block // prose and plinth blocks in order
	// Context marks a sheet pulled in by uses for a single-sheet run: it is
	// evaluated, so the sheet that uses it can read its symbols, but it is
	// not printed and its checks do not enter the register.
	Context bool
}

// Name is the sheet's file name without its folder ("01-ground.md"), the
// name other sheets list in their uses.
func (s *Sheet) Name() string {
	p := s.File.Path
	for i := len(p) - 1; i >= 0; i-- {
		if p[i] == '/' || p[i] == '\\' {
			return p[i+1:]
		}
	}
	return p
}

// Reader gives read access to files inside a package folder (images,
// page templates, partial-factor files). ReadInside refuses a path that
// is absolute or leads outside the folder. *load.Package implements it.
type Reader interface {
	ReadInside(rel string) ([]byte, error)
}

// Package is a parsed package: its shared settings, its sheets in file-name
// order, and every source file read (package.yaml first when present, then
// the sheets), for fingerprinting.
type Package struct {
	Dir    string   // the package folder as given by the user
	Meta   Meta     // package.yaml (zero when absent)
	Sheets []*Sheet // in file-name order
	Files  []*source.File
	Inside Reader // reads images and templates; nil for an in-memory package
}

// Effective returns the settings in force for sheet s: its own front
// matter over the package's (see merge).
func (p *Package) Effective(s *Sheet) Meta { return merge(&p.Meta, &s.Meta) }
