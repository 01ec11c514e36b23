package parse

import (
	"errors"
	"github.com/plinth-calc/plinth/doc/media"
	"io/fs"
	"net/url"
	"path/filepath"
	"strings"
	"time"

	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// Package parses a loaded package: package.yaml, then every sheet in
// order. It then checks what needs the whole package: every uses entry
// names another sheet of the package, and every image, page template and
// partial-factor file named lies inside the package folder (asked of
// doc/load, so this package itself does no I/O).
func Package(p *load.Package) (*sheet.Package, source.List) {
	var diags source.List
	pkg := &sheet.Package{Dir: p.Dir, Files: p.Files(), Inside: p}
	if p.Config != nil {
		m, d := config(p.Config)
		pkg.Meta = m
		diags.Append(d)
	}
	for _, f := range p.Sheets {
		s, d := Sheet(f)
		pkg.Sheets = append(pkg.Sheets, s)
		diags.Append(d)
	}
	if p.Single {
		diags.Append(pullContext(p, pkg))
	}
	ck := checker{p: p, pkg: pkg, diags: &diags}
	ck.meta(&pkg.Meta)
	calcs := map[string]sheet.Str{}
	for _, s := range pkg.Sheets {
		ck.meta(&s.Meta)
		ck.uses(s)
		ck.images(s.Body)
		if c := s.Meta.Calc; strings.TrimSpace(c.Value) != "" {
			v := strings.TrimSpace(c.Value)
			if first, dup := calcs[v]; dup {
				ck.diags.AddHint(c.Span, "give each sheet its own calculation number",
					"calc %q is already the number of %s (line %d)", v, filepath.Base(first.Span.File.Path), first.Span.Pos().Line)
			} else {
				calcs[v] = c
			}
		}
	}
	diags.Sort()
	return pkg, diags
}

// pullContext adds to a single-sheet package the sheets of its folder that
// it uses, directly or through another used sheet, marked as context
// (evaluated, not printed), and their files to pkg.Files so they enter
// the fingerprint. A uses entry naming no sheet of the folder is left for
// the uses check to report.
func pullContext(p *load.Package, pkg *sheet.Package) source.List {
	var diags source.List
	byName := map[string]*source.File{}
	for _, f := range p.Context {
		byName[(&sheet.Sheet{File: f}).Name()] = f
	}
	have := map[string]bool{}
	for _, s := range pkg.Sheets {
		have[s.Name()] = true
	}
	for i := 0; i < len(pkg.Sheets); i++ {
		for _, u := range pkg.Sheets[i].Meta.Uses {
			f := byName[u.Value]
			if f == nil || have[u.Value] {
				continue
			}
			have[u.Value] = true
			s, d := Sheet(f)
			s.Context = true
			pkg.Sheets = append(pkg.Sheets, s)
			pkg.Files = append(pkg.Files, f)
			diags.Append(d)
		}
	}
	return diags
}

type checker struct {
	p     *load.Package
	pkg   *sheet.Package
	diags *source.List
}

// meta checks the file paths a settings block names.
func (ck *checker) meta(m *sheet.Meta) {
	if t := m.Template; t.IsSet() && !contains(sheet.Templates, t.Value) {
		hint := "a built-in template (" + strings.Join(sheet.Templates, ", ") + ") or a file inside the package folder"
		if near, ok := suggest.Nearest(t.Value, sheet.Templates); ok {
			hint = "did you mean " + quote(near) + "?"
		}
		ck.file(t, "template", hint)
	}
	if f := m.Factors; f.IsSet() {
		ck.file(f, "factors file", "")
	}
	if d := m.Detail; d.IsSet() && !contains(sheet.Details, d.Value) {
		ck.diags.AddHint(d.Span, "write detail: governing (the default) or detail: full", "detail %s is not governing or full", quote(d.Value))
	}
	ck.date(m.Date, "date")
	ck.date(m.CheckedDate, "checked_date")
	for _, r := range m.Revisions {
		ck.date(r.Date, "revision date")
	}
}

// date checks that a date field, when written and not blank, is a real
// calendar date written YYYY-MM-DD (ISO 8601), so check refuses what
// render would: 2026-13-45 and 2026-02-30 are errors.
func (ck *checker) date(s sheet.Str, what string) {
	v := strings.TrimSpace(s.Value)
	if !s.IsSet() || v == "" {
		return
	}
	if _, err := time.Parse("2006-01-02", v); err != nil {
		msg := "is not a date"
		if len(v) == 10 && v[4] == '-' && v[7] == '-' {
			msg = "is not a calendar date"
		}
		ck.diags.AddHint(s.Span, "write dates as YYYY-MM-DD (ISO 8601), e.g. 2026-11-23", "%s %q %s", what, v, msg)
	}
}

// image reads a figure the sheet names and checks it is a whole PNG or
// JPEG of a size plinth accepts (doc/media), so check refuses what render
// would.
func (ck *checker) image(s sheet.Str) {
	data, err := ck.p.ReadInside(unescapePath(s.Value))
	if err != nil {
		ck.diags.Add(s.Span, "image %q: %v", s.Value, err)
		return
	}
	if _, err := media.Check(data); err != nil {
		ck.diags.Add(s.Span, "image %q %v", s.Value, err)
	}
}

// unescapePath decodes %-escapes in a path written as a Markdown link target.
func unescapePath(rel string) string {
	if strings.Contains(rel, "%") {
		if u, err := url.PathUnescape(rel); err == nil {
			return u
		}
	}
	return rel
}

// file checks that s names a file inside the package folder, and reports
// whether it does.
func (ck *checker) file(s sheet.Str, what, hint string) bool {
	if s.Value == "" {
		ck.diags.Add(s.Span, "%s: expected a path inside the package folder", what)
		return false
	}
	if strings.Contains(s.Value, "://") || strings.HasPrefix(s.Value, "data:") {
		ck.diags.AddHint(s.Span, "copy the file into the package folder and name it by its path there",
			"%s %q: files load from inside the package folder, not from the web", what, s.Value)
		return false
	}
	_, err := ck.p.Resolve(unescapePath(s.Value))
	switch {
	case err == nil:
		return true
	case errors.Is(err, load.ErrOutside):
		ck.diags.AddHint(s.Span, "files a sheet names must lie inside the package folder",
			"%s %q lies outside the package folder", what, s.Value)
	case errors.Is(err, fs.ErrNotExist):
		if hint == "" {
			hint = "paths are relative to the package folder"
		}
		ck.diags.AddHint(s.Span, hint, "%s %q not found in the package folder", what, s.Value)
	default:
		ck.diags.Add(s.Span, "%s %q: %v", what, s.Value, err)
	}
	return false
}

// uses checks that each uses entry names another sheet of the package.
func (ck *checker) uses(s *sheet.Sheet) {
	var names, others []string
	for _, o := range ck.pkg.Sheets {
		names = append(names, o.Name())
		if o != s {
			others = append(others, o.Name())
		}
	}
	seen := map[string]int{}
	for _, u := range s.Meta.Uses {
		switch {
		case u.Value == s.Name():
			ck.diags.Add(u.Span, "a sheet cannot use itself")
		case seen[u.Value] > 0:
			ck.diags.Add(u.Span, "%q is listed twice in uses (first at line %d)", u.Value, seen[u.Value])
		case contains(names, u.Value):
		case ck.p.Single:
			hint := "uses lists file names of the other sheets in this sheet's folder"
			if near, ok := suggest.Nearest(u.Value, contextNames(ck.p)); ok {
				hint = "did you mean " + quote(near) + "?"
			}
			ck.diags.AddHint(u.Span, hint, "no sheet %q in this sheet's folder", u.Value)
		default:
			hint := "uses lists file names of the package's other sheets: " + strings.Join(others, ", ")
			if contains(others, u.Value+".md") {
				hint = "did you mean " + quote(u.Value+".md") + "?"
			} else if near, ok := suggest.Nearest(u.Value, others); ok {
				hint = "did you mean " + quote(near) + "?"
			}
			ck.diags.AddHint(u.Span, hint, "no sheet %q in this package", u.Value)
		}
		if seen[u.Value] == 0 {
			seen[u.Value] = u.Span.Pos().Line
		}
	}
}

func contextNames(p *load.Package) []string {
	var out []string
	for _, f := range p.Context {
		out = append(out, (&sheet.Sheet{File: f}).Name())
	}
	return out
}

// images checks every figure's path, in nested blocks too.
func (ck *checker) images(blocks []sheet.Block) {
	for _, b := range blocks {
		switch b := b.(type) {
		case *sheet.Image:
			if ck.file(b.Path, "image", "") {
				ck.image(b.Path)
			}
		case *sheet.List:
			for _, it := range b.Items {
				ck.images(it.Blocks)
			}
		case *sheet.Quote:
			ck.images(b.Body)
		case *sheet.Caution:
			ck.images(b.Body)
		}
	}
}
