package main

import (
	"fmt"
	"io"
	"strings"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/source"
)

// sinceChanges compares the package being rendered with the earlier
// revision spec (as diff reads it) and prepares the page of changes. On
// an error it prints it (the side named) and returns false.
func sinceChanges(spec, path string, res *eval.Result, stderr io.Writer) (*compose.Changes, bool) {
	old, err := openSide(spec)
	if err != nil {
		fmt.Fprintf(stderr, "plinth: --since %s: %v\n", spec, err)
		return nil, false
	}
	defer old.close()
	n := 0
	for _, d := range old.diags {
		if d.Severity == source.Error {
			fmt.Fprintf(stderr, "--since %s: %s%s\n", spec, old.display(d.Pos().Path), strings.TrimPrefix(d.Error(), d.Pos().Path))
			n++
		}
	}
	if n > 0 || old.res == nil {
		fmt.Fprintf(stderr, "%d error%s in the revision to compare with\n", n, plural(n))
		return nil, false
	}
	c := compare(old, &side{spec: path, res: res})
	return changesPage(c, old.res, res), true
}

// changesPage lays the changes out as the sections of the changes page,
// in diff's order.
func changesPage(c *changes, a, b *eval.Result) *compose.Changes {
	since := a.Src.Meta.Revision.Value
	if since == "" {
		since = c.Old.Spec
	} else if since == b.Src.Meta.Revision.Value {
		since += " (" + c.Old.Spec + ")"
	}
	ch := &compose.Changes{Since: since, Empty: "No changes: every check, result, input and package field is as in revision " + since + "."}
	ch.Letter = b.Src.Meta.Revision.Value
	if !printable(ch.Letter) {
		ch.Letter = ""
	}
	mark := func(file string, line int, value string) {
		if file != "" && line > 0 {
			num, _, _ := strings.Cut(value, " ")
			ch.Lines = append(ch.Lines, compose.ChangeLine{Pos: source.Position{Path: file, Line: line}, Values: []string{num}})
		}
	}
	for _, f := range c.Flipped {
		mark(f.File, f.Line, "")
	}
	for _, f := range c.Added {
		mark(f.File, f.Line, "")
	}
	for _, v := range c.Results {
		mark(v.NewFile, v.NewLine, v.New)
	}
	for _, v := range c.Inputs {
		mark(v.NewFile, v.NewLine, v.New)
	}
	util := func(v string, u *float64) string {
		if u != nil {
			return fmt.Sprintf("%s (%.2f)", v, *u)
		}
		return v
	}
	place := func(f string, l int) string { return fmt.Sprintf("%s:%d", f, l) }
	if len(c.Flipped) > 0 {
		s := compose.ChangeSection{Title: "Checks whose verdict changed", Header: []string{"Check", "Was", "Now", "Where"}}
		for _, f := range c.Flipped {
			s.Rows = append(s.Rows, []string{f.Expr, util(f.Old, f.OldUtil), util(f.New, f.NewUtil), place(f.File, f.Line)})
		}
		ch.Sections = append(ch.Sections, s)
	}
	if len(c.Added)+len(c.Removed) > 0 {
		s := compose.ChangeSection{Title: "Checks added or removed", Header: []string{"Check", "", "Verdict", "Where"}}
		for _, f := range c.Added {
			s.Rows = append(s.Rows, []string{f.Expr, "added", util(f.New, f.NewUtil), place(f.File, f.Line)})
		}
		for _, f := range c.Removed {
			s.Rows = append(s.Rows, []string{f.Expr, "removed", util(f.Old, f.OldUtil), place(f.File, f.Line)})
		}
		ch.Sections = append(ch.Sections, s)
	}
	values := func(title string, vs []valueChange, both bool) {
		if len(vs) == 0 {
			return
		}
		s := compose.ChangeSection{Title: title, Header: []string{"Symbol", "Was", "Now", "Change", "Where"}}
		for _, v := range vs {
			pct := ""
			switch {
			case v.Old == "":
				pct = "added"
			case v.New == "":
				pct = "removed"
			case v.Percent != nil:
				pct = fmt.Sprintf("%+.1f %%", *v.Percent)
			}
			where := place(v.NewFile, v.NewLine)
			if v.New == "" {
				where = place(v.OldFile, v.OldLine)
			} else if both && v.Old != "" {
				where = place(v.OldFile, v.OldLine) + " → " + where
			}
			nb := func(s string) string { return strings.ReplaceAll(s, " ", "\u00a0") }
			s.Rows = append(s.Rows, []string{v.Name, nb(v.Old), nb(v.New), nb(pct), where})
		}
		ch.Sections = append(ch.Sections, s)
	}
	values("Results changed", c.Results, false)
	values("Inputs changed", c.Inputs, true)
	if len(c.Fields) > 0 {
		s := compose.ChangeSection{Title: "Package fields changed", Header: []string{"Where", "Field", "Was", "Now"}}
		for _, f := range c.Fields {
			where := "package.yaml"
			if f.Sheet != "" {
				where = f.Sheet
			}
			s.Rows = append(s.Rows, []string{where, f.Field, f.Old, f.New})
		}
		ch.Sections = append(ch.Sections, s)
	}
	return ch
}

// printable reports whether s is plain ASCII text (a revision letter the
// margin can print in plinth's own face).
func printable(s string) bool {
	for _, r := range s {
		if r < 0x20 || r > 0x7e {
			return false
		}
	}
	return true
}
