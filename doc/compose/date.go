package compose

import (
	"strconv"
	"strings"
	"time"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// dateLayout is the one date form plinth reads: YYYY-MM-DD.
const dateLayout = "2006-01-02"

// parseDate reads a revision date written YYYY-MM-DD.
func parseDate(s string) (time.Time, bool) {
	t, err := time.Parse(dateLayout, strings.TrimSpace(s))
	return t, err == nil
}

// latest returns the current revision: the entry with the latest date
// (the later entry on a tie; entries whose date does not read count as
// older than any dated one, in list order).
func latest(revs []sheet.Revision) (sheet.Revision, bool) {
	best, found := -1, false
	var bestT time.Time
	for i, r := range revs {
		t, ok := parseDate(r.Date.Value)
		switch {
		case best < 0:
			best, bestT, found = i, t, ok
		case ok && (!found || !t.Before(bestT)):
			best, bestT, found = i, t, true
		case !ok && !found:
			best = i
		}
	}
	if best < 0 {
		return sheet.Revision{}, false
	}
	return revs[best], true
}

// Created is the document's creation date: SOURCE_DATE_EPOCH when epoch
// (its value) is not empty, else the latest revision date of package.yaml
// (or, when it has none, of the sheets' own revisions), at midnight UTC.
// It is zero when neither is given: the PDF then carries no date. A date
// that does not read as YYYY-MM-DD is reported as a warning and skipped;
// an epoch that is not a whole number of seconds is an error.
func Created(res *eval.Result, epoch string) (time.Time, source.List) {
	var diags source.List
	if epoch = strings.TrimSpace(epoch); epoch != "" {
		n, err := strconv.ParseInt(epoch, 10, 64)
		if err != nil || n < 0 || n > 253402300799 {
			diags = append(diags, source.Diagnostic{Path: "SOURCE_DATE_EPOCH",
				Msg: "expected a whole number of seconds since 1970-01-01 UTC, got " + strconv.Quote(epoch)})
			return time.Time{}, diags
		}
		return time.Unix(n, 0).UTC(), diags
	}
	lists := [][]sheet.Revision{res.Src.Meta.Revisions}
	if len(res.Src.Meta.Revisions) == 0 {
		for _, s := range res.Src.Sheets {
			lists = append(lists, s.Meta.Revisions)
		}
	}
	var out time.Time
	for _, revs := range lists {
		for _, r := range revs {
			if !r.Date.IsSet() || r.Date.Value == "" {
				continue
			}
			t, ok := parseDate(r.Date.Value)
			if !ok {
				diags.Warn(r.Date.Span, "revision date %q is not YYYY-MM-DD: not used for the document date", r.Date.Value)
				continue
			}
			if t.After(out) {
				out = t
			}
		}
	}
	return out, diags
}

// template reads the page template the package names: a built-in one
// (a4, letter) or a YAML file inside the package folder. The template is
// the package's (package.yaml, or the first sheet that names one when
// package.yaml does not); a sheet naming another is warned about.
func (c *composer) template() *layout.Template {
	src := c.res.Src
	field := src.Meta.Template
	if !field.IsSet() {
		for _, s := range src.Sheets {
			if s.Meta.Template.IsSet() {
				field = s.Meta.Template
				break
			}
		}
	}
	for _, s := range src.Sheets {
		if t := s.Meta.Template; t.IsSet() && t.Value != field.Value {
			c.diags.Warn(t.Span, "the page template is chosen for the whole package (%s): this sheet's template %q is not used", orDefault(field.Value, "a4"), t.Value)
		}
	}
	fallback := func() *layout.Template {
		t, _ := layout.BuiltinTemplate("a4")
		return t
	}
	name := strings.TrimSpace(field.Value)
	if name == "" {
		return fallback()
	}
	for _, b := range sheet.Templates {
		if name == b {
			t, err := layout.BuiltinTemplate(name)
			if err != nil {
				c.diags.Add(field.Span, "%v", err)
				return fallback()
			}
			return t
		}
	}
	if src.Inside == nil {
		c.diags.Add(field.Span, "template %q: no package folder to read it from", name)
		return fallback()
	}
	data, err := src.Inside.ReadInside(name)
	if err != nil {
		c.diags.Add(field.Span, "template %q: %v", name, err)
		return fallback()
	}
	t, err := layout.LoadTemplate(data, src.Inside.ReadInside)
	if err != nil {
		c.diags.Add(field.Span, "template %q: %s", name, strings.ReplaceAll(err.Error(), "\n", "; "))
		return fallback()
	}
	return t
}

func orDefault(s, def string) string {
	if s == "" {
		return def
	}
	return s
}
