package main

import (
	"encoding/json"
	"fmt"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/compose"
	"io"
	"os"
	"sort"
	"strings"
	"text/tabwriter"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/source"
)

// check implements "plinth check".
func check(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs("check", args, "set", "json", "layout", "verbose")
	if err == errHelp {
		fmt.Fprint(stdout, helps["check"])
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	res, diags := evaluate(o.path, o.sets)
	if res != nil {
		// What render would refuse before laying out pages (page
		// template, logo, fonts, dates) check refuses too; --layout also
		// lays the pages out, without writing a PDF.
		diags = documentErrors(res, diags, o.layout)
		if diags.HasErrors() {
			res = nil
		}
	}
	if o.json {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		if err := enc.Encode(report(res, diags)); err != nil {
			fmt.Fprintf(stderr, "plinth: %v\n", err)
			return exitErrors
		}
	} else {
		if !diags.HasErrors() {
			printTables(stdout, res)
			printCautions(stdout, res, o.verbose)
		}
		printDiags(stderr, diags)
	}
	return status(res, diags)
}

// documentErrors adds to diags the problems the document stages find in
// res: compose always (page template, logo, the document date), layout
// too when pages is set.
func documentErrors(res *eval.Result, diags source.List, pages bool) source.List {
	if pages {
		_, cd := layOut(res, compose.Options{}, nil, nil)
		diags.Append(cd)
	} else {
		_, cd := compose.Document(res, compose.Options{})
		diags.Append(cd)
	}
	_, dd := compose.Created(res, os.Getenv("SOURCE_DATE_EPOCH"))
	diags.Append(dd)
	diags.Sort()
	return diags
}

// status is the exit status for a run.
func status(res *eval.Result, diags source.List) int {
	if diags.HasErrors() {
		return exitErrors
	}
	for _, c := range res.Checks {
		if !c.OK {
			return exitNotOK
		}
	}
	return exitOK
}

// printTables writes every symbol and every check as readable tables.
func printTables(w io.Writer, res *eval.Result) {
	if res.Variant() {
		var sets []string
		for _, o := range res.Overrides {
			sets = append(sets, o.Arg)
		}
		fmt.Fprintf(w, "VARIANT: %s\n\n", strings.Join(sets, ", "))
	}
	if len(res.Context) > 0 {
		var names []string
		for _, t := range res.Context {
			names = append(names, t.Name())
		}
		fmt.Fprintf(w, "context (used, not listed): %s\n\n", strings.Join(names, ", "))
	}
	for _, s := range res.Sheets {
		title := s.Meta.Title.Value
		if title != "" {
			title = " — " + title
		}
		fmt.Fprintf(w, "%s%s\n", s.Src.File.Path, title)
		if len(s.Symbols) == 0 {
			fmt.Fprintln(w, "  (no symbols)")
		} else {
			tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
			fmt.Fprintln(tw, "  symbol\tvalue\tunit\tnote\twhere")
			for _, y := range s.Symbols {
				note := y.Note.Value
				if y.Override != nil {
					note = "[--set] " + note
				}
				fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\t%s\n", y.Name, y.Number(y.Unit, y.Decimals), y.Unit.Name, note, where(y.Span))
			}
			tw.Flush()
		}
		fmt.Fprintln(w)
	}
	if len(res.Checks) == 0 {
		fmt.Fprintln(w, "no checks")
		return
	}
	fmt.Fprintln(w, "checks")
	tw := tabwriter.NewWriter(w, 0, 0, 2, ' ', 0)
	fmt.Fprintln(tw, "  check\tleft\t\tright\tutilisation\tverdict\twhere")
	nok := 0
	for _, c := range res.Checks {
		util := "—"
		if c.HasUtil() {
			util = c.UtilText()
		}
		if !c.OK {
			nok++
		}
		l, r := c.Values() // never rounded onto or across each other; a failing check shows the relation that holds
		unit := ""
		if c.Unit.Name != "" {
			unit = " " + c.Unit.Name
		}
		fmt.Fprintf(tw, "  %s\t%s\t%s\t%s\t%s\t%s\t%s\n", c.Text, l+unit, c.Relation(), r+unit, util, c.Verdict(), where(c.Span))
	}
	tw.Flush()
	for _, c := range res.Checks {
		if c.Unverified != "" {
			fmt.Fprintf(w, "  NOT OK %s (%s): %s\n", c.Text, where(c.Span), c.Unverified)
		}
	}
	fmt.Fprintf(w, "\n%d check%s: %d OK, %d NOT OK\n", len(res.Checks), plural(len(res.Checks)), len(res.Checks)-nok, nok)
}

// printCautions lists the engine's cautions after the checks, most severe
// first and in document order within a severity: CAUTION and WARNING
// always, NOTE only when verbose. Each names its block and file:line; a
// caution raised in one case only names the case.
func printCautions(w io.Writer, res *eval.Result, verbose bool) {
	type row struct {
		sev  trace.Severity
		text string
	}
	var rows []row
	notes := 0
	for _, s := range res.Sheets {
		for _, b := range s.Blocks() {
			for _, c := range b.Cautions {
				if c.Severity == trace.SevNote && !verbose {
					notes++
					continue
				}
				msg := c.Message
				if c.Case != "" {
					msg += " [" + c.Case + "]"
				}
				rows = append(rows, row{c.Severity, fmt.Sprintf("  %-8s %s %s (%s): %s", c.Severity, b.Kind, b.Name, where(b.Span), msg)})
			}
		}
	}
	sort.SliceStable(rows, func(i, j int) bool { return rows[i].sev > rows[j].sev })
	if len(rows) == 0 && notes == 0 {
		return
	}
	fmt.Fprintln(w, "\ncautions")
	for _, r := range rows {
		fmt.Fprintln(w, r.text)
	}
	if notes > 0 {
		fmt.Fprintf(w, "  (%d NOTE%s not shown: plinth check -v lists them)\n", notes, plural(notes))
	}
}

func where(sp source.Span) string {
	p := sp.Pos()
	return fmt.Sprintf("%s:%d", p.Path, p.Line)
}
