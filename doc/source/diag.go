package source

import (
	"fmt"
	"sort"
	"strings"
)

// Severity ranks a diagnostic.
type Severity int

const (
	Error Severity = iota
	Warning
)

func (s Severity) String() string {
	if s == Warning {
		return "warning"
	}
	return "error"
}

// Diagnostic is one problem found in the input, with the span it concerns.
// Msg says what was found and what was expected; Hint, if set, suggests a
// fix ("did you mean kPa?"). A diagnostic with no file concerns the run as a
// whole (a bad --set flag, say) and carries Path for display.
type Diagnostic struct {
	Severity Severity
	Span     Span
	Path     string // used when Span.File is nil
	Msg      string
	Hint     string
}

// Pos is the position the diagnostic points at.
func (d Diagnostic) Pos() Position {
	if d.Span.File == nil {
		return Position{Path: d.Path}
	}
	return d.Span.Pos()
}

// Error formats the diagnostic as "path:line:col: message (hint)".
func (d Diagnostic) Error() string {
	var b strings.Builder
	p := d.Pos()
	if s := p.String(); s != "" {
		b.WriteString(s)
		b.WriteString(": ")
	}
	if d.Severity == Warning {
		b.WriteString("warning: ")
	}
	b.WriteString(d.Msg)
	if d.Hint != "" {
		b.WriteString("; ")
		b.WriteString(d.Hint)
	}
	return b.String()
}

// List collects diagnostics. The zero value is ready to use.
type List []Diagnostic

// Add appends an error at span.
func (l *List) Add(sp Span, format string, args ...any) {
	*l = append(*l, Diagnostic{Span: sp, Msg: fmt.Sprintf(format, args...)})
}

// AddHint appends an error with a hint.
func (l *List) AddHint(sp Span, hint, format string, args ...any) {
	*l = append(*l, Diagnostic{Span: sp, Msg: fmt.Sprintf(format, args...), Hint: hint})
}

// Warn appends a warning at span.
func (l *List) Warn(sp Span, format string, args ...any) {
	*l = append(*l, Diagnostic{Severity: Warning, Span: sp, Msg: fmt.Sprintf(format, args...)})
}

// Append adds all of m to l.
func (l *List) Append(m List) { *l = append(*l, m...) }

// HasErrors reports whether the list holds an error (not just warnings).
func (l List) HasErrors() bool {
	for _, d := range l {
		if d.Severity == Error {
			return true
		}
	}
	return false
}

// Sort orders the list by path, then offset, then message, and removes exact
// duplicates.
func (l *List) Sort() {
	s := *l
	sort.SliceStable(s, func(i, j int) bool {
		a, b := s[i], s[j]
		pa, pb := a.Pos(), b.Pos()
		if pa.Path != pb.Path {
			return pa.Path < pb.Path
		}
		if a.Span.Start != b.Span.Start {
			return a.Span.Start < b.Span.Start
		}
		return a.Msg < b.Msg
	})
	out := s[:0]
	for i, d := range s {
		if i > 0 && d.Error() == s[i-1].Error() {
			continue
		}
		out = append(out, d)
	}
	*l = out
}

// Error joins every diagnostic on its own line, so a List can be returned
// as an error.
func (l List) Error() string {
	var b strings.Builder
	for i, d := range l {
		if i > 0 {
			b.WriteByte('\n')
		}
		b.WriteString(d.Error())
	}
	return b.String()
}

// Line names one line of one file, for matching diagnostics by line.
type Line struct {
	File *File
	Line int
}

// LineOf is the line a span starts on.
func LineOf(sp Span) Line { return Line{File: sp.File, Line: sp.Pos().Line} }

// Lines is the set of lines holding an error of l.
func (l List) Lines() map[Line]bool {
	out := map[Line]bool{}
	for _, d := range l {
		if d.Severity == Error && d.Span.File != nil {
			out[LineOf(d.Span)] = true
		}
	}
	return out
}

// OffLines returns the diagnostics of l that lie on none of the lines in
// bad (a set from Lines): a later stage's diagnostics where an earlier
// stage has already reported the line would only repeat it in other words.
func (l List) OffLines(bad map[Line]bool) List {
	if len(bad) == 0 {
		return l
	}
	var out List
	for _, d := range l {
		if d.Span.File != nil && bad[LineOf(d.Span)] {
			continue
		}
		out = append(out, d)
	}
	return out
}
