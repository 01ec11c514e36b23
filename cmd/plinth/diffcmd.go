package main

import (
	"encoding/json"
	"fmt"
	"io"
	"strings"

	"github.com/plinth-calc/plinth/doc/source"
)

// diffCmd implements "plinth diff OLD NEW [--json]". Exit status: 0 when
// no check became NOT OK, 1 when one did (a check that flipped, or a new
// check that is NOT OK), 2 when either side cannot be read or has input
// errors (each listed with its side named).
func diffCmd(args []string, stdout, stderr io.Writer) int {
	var specs []string
	asJSON := false
	for _, a := range args {
		switch {
		case a == "-h" || a == "--help":
			fmt.Fprint(stdout, helps["diff"])
			return exitOK
		case a == "--json" || a == "-json":
			asJSON = true
		case strings.HasPrefix(a, "-") && a != "-":
			fmt.Fprintf(stderr, "plinth: diff: unknown flag %s\n", a)
			return exitErrors
		default:
			specs = append(specs, a)
		}
	}
	if len(specs) != 2 {
		fmt.Fprintf(stderr, "plinth: diff needs OLD and NEW (each a folder, a sheet, REV:path or a PDF plinth wrote), got %d argument%s\n", len(specs), plural(len(specs)))
		return exitErrors
	}
	var sides [2]*side
	var errs []diffError
	for i, spec := range specs {
		name := [2]string{"old", "new"}[i]
		s, err := openSide(spec)
		if err != nil {
			errs = append(errs, diffError{Side: name, Message: err.Error()})
			continue
		}
		defer s.close()
		sides[i] = s
		for _, d := range s.diags {
			if d.Severity == source.Error {
				errs = append(errs, diffError{Side: name, Message: s.display(d.Pos().Path) + strings.TrimPrefix(d.Error(), d.Pos().Path)})
			}
		}
		if s.res == nil && len(errs) == 0 {
			errs = append(errs, diffError{Side: name, Message: spec + ": could not be evaluated"})
		}
	}
	if len(errs) > 0 {
		if asJSON {
			c := &changes{Sheets: []sheetMatch{}, Flipped: []checkChange{}, Added: []checkChange{}, Removed: []checkChange{},
				Results: []valueChange{}, Inputs: []valueChange{}, Fields: []fieldChange{}, Errors: errs, Version: Version()}
			c.Old.Spec, c.New.Spec = specs[0], specs[1]
			c.Old.Sets, c.New.Sets = []string{}, []string{}
			writeJSON(stdout, c)
		}
		for _, e := range errs {
			fmt.Fprintf(stderr, "%s (%s): %s\n", e.Side, specs[map[string]int{"old": 0, "new": 1}[e.Side]], e.Message)
		}
		fmt.Fprintf(stderr, "%d error%s\n", len(errs), plural(len(errs)))
		return exitErrors
	}
	c := compare(sides[0], sides[1])
	if asJSON {
		writeJSON(stdout, c)
	} else {
		printChanges(stdout, c)
	}
	if c.becameNotOK() {
		return exitNotOK
	}
	return exitOK
}

func writeJSON(w io.Writer, v any) {
	enc := json.NewEncoder(w)
	enc.SetIndent("", "  ")
	enc.SetEscapeHTML(false)
	enc.Encode(v)
}

// printChanges writes the changes as text, in the order of the changes
// type.
func printChanges(w io.Writer, c *changes) {
	fmt.Fprintf(w, "plinth diff %s → %s\n", c.Old.Spec, c.New.Spec)
	for _, m := range c.Sheets {
		switch {
		case m.Old == "":
			fmt.Fprintf(w, "  sheet %s added\n", m.New)
		case m.New == "":
			fmt.Fprintf(w, "  sheet %s removed\n", m.Old)
		case m.Old != m.New:
			fmt.Fprintf(w, "  sheet %s renamed %s (matched by calc number)\n", m.Old, m.New)
		}
	}
	n := len(c.Flipped) + len(c.Added) + len(c.Removed) + len(c.Results) + len(c.Inputs) + len(c.Fields)
	if n == 0 {
		fmt.Fprintln(w, "no changes")
		return
	}
	utl := func(u *float64) string {
		if u == nil {
			return ""
		}
		return fmt.Sprintf(" (%.2f)", *u)
	}
	if len(c.Flipped) > 0 {
		fmt.Fprintln(w, "\nchecks whose verdict changed")
		for _, f := range c.Flipped {
			fmt.Fprintf(w, "  %s%s → %s%s  %s  %s:%d\n", f.Old, utl(f.OldUtil), f.New, utl(f.NewUtil), f.Expr, f.File, f.Line)
		}
	}
	if len(c.Added)+len(c.Removed) > 0 {
		fmt.Fprintln(w, "\nchecks added or removed")
		for _, f := range c.Added {
			fmt.Fprintf(w, "  added    %s%s  %s  %s:%d\n", f.New, utl(f.NewUtil), f.Expr, f.File, f.Line)
		}
		for _, f := range c.Removed {
			fmt.Fprintf(w, "  removed  %s%s  %s  %s:%d\n", f.Old, utl(f.OldUtil), f.Expr, f.File, f.Line)
		}
	}
	values := func(title string, vs []valueChange, both bool) {
		if len(vs) == 0 {
			return
		}
		fmt.Fprintf(w, "\n%s\n", title)
		for _, v := range vs {
			switch {
			case v.Old == "":
				fmt.Fprintf(w, "  %s added: %s  %s:%d\n", v.Name, v.New, v.NewFile, v.NewLine)
			case v.New == "":
				fmt.Fprintf(w, "  %s removed (was %s)  %s:%d\n", v.Name, v.Old, v.OldFile, v.OldLine)
			default:
				pct := ""
				if v.Percent != nil {
					pct = fmt.Sprintf(" (%+.1f %%)", *v.Percent)
				}
				where := fmt.Sprintf("%s:%d", v.NewFile, v.NewLine)
				if both {
					where = fmt.Sprintf("%s:%d → %s:%d", v.OldFile, v.OldLine, v.NewFile, v.NewLine)
				}
				fmt.Fprintf(w, "  %s: %s → %s%s  %s\n", v.Name, v.Old, v.New, pct, where)
			}
		}
	}
	values("results changed", c.Results, false)
	values("inputs changed", c.Inputs, true)
	if len(c.Fields) > 0 {
		fmt.Fprintln(w, "\npackage fields changed")
		for _, f := range c.Fields {
			where := "package.yaml"
			if f.Sheet != "" {
				where = f.Sheet
			}
			fmt.Fprintf(w, "  %s %s: %q → %q\n", where, f.Field, f.Old, f.New)
		}
	}
}
