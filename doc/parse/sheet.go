package parse

import (
	"bytes"
	"fmt"
	"unicode/utf8"

	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// Sheet parses one sheet file. It always returns a sheet (possibly empty)
// and every problem found, sorted by position.
func Sheet(f *source.File) (s *sheet.Sheet, diags source.List) {
	s = &sheet.Sheet{File: f}
	defer func() {
		// A defect of plinth's own must not take the caller down.
		if r := recover(); r != nil {
			s = &sheet.Sheet{File: f}
			diags = append(diags, source.Diagnostic{Span: source.Span{File: f}, Msg: fmt.Sprintf("internal error while parsing this sheet (please report): %v", r)})
		}
	}()
	text := f.Text
	if !checkText(f, &diags) {
		return s, diags
	}
	start := 0
	if bytes.HasPrefix(text, bom) {
		start = len(bom)
	}
	body := start
	if fm, ok := splitFront(text, start); ok {
		if fm.end < 0 {
			diags.AddHint(source.Span{File: f, Start: start, End: start + 3},
				"end the front matter with a line holding only ---",
				"unclosed front matter: no closing --- line")
			return s, diags
		}
		s.Meta = decodeMeta(f, fm.start, fm.end, false, &diags)
		s.Meta.Span = source.Span{File: f, Start: start, End: fm.close}
		body = fm.close
	}
	s.Body = parseBody(f, body, &diags)
	diags.Sort()
	return s, diags
}

var bom = []byte("\xef\xbb\xbf")

// checkText reports an empty file (nothing but white space) or bytes that
// are not UTF-8, and returns false for either.
func checkText(f *source.File, diags *source.List) bool {
	text := f.Text
	if !utf8.Valid(text) {
		i := 0
		for i < len(text) {
			r, n := utf8.DecodeRune(text[i:])
			if r == utf8.RuneError && n <= 1 {
				break
			}
			i += n
		}
		diags.AddHint(source.Span{File: f, Start: i, End: i + 1},
			"save the file as UTF-8",
			"the file is not UTF-8 text: invalid byte 0x%02x", text[i])
		return false
	}
	if len(bytes.TrimSpace(bytes.TrimPrefix(text, bom))) == 0 {
		diags.AddHint(source.Span{File: f}, "start with front matter (---, title: ..., ---) and some text",
			"the file is empty")
		return false
	}
	return true
}

// front locates front matter: YAML in [start, end), the closing line ending
// at close (after its line break). end is -1 when no closing line exists.
type front struct{ start, end, close int }

// splitFront finds front matter opening at offset at: a first line holding
// only "---" (trailing spaces allowed) and a later line holding only "---".
func splitFront(text []byte, at int) (front, bool) {
	line, next := lineAt(text, at)
	if string(bytes.TrimRight(line, " \t\r")) != "---" {
		return front{}, false
	}
	for off := next; off < len(text); {
		l, n := lineAt(text, off)
		if string(bytes.TrimRight(l, " \t\r")) == "---" {
			return front{start: next, end: off, close: n}, true
		}
		off = n
	}
	return front{start: next, end: -1}, true
}

// lineAt returns the line starting at off without its '\n', and the offset
// of the next line.
func lineAt(text []byte, off int) ([]byte, int) {
	i := bytes.IndexByte(text[off:], '\n')
	if i < 0 {
		return text[off:], len(text)
	}
	return text[off : off+i], off + i + 1
}
