package main

import (
	"bytes"
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"time"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/pdf"
)

// render implements "plinth render PATH [-o FILE] [--set name=value]...".
//
// The PDF goes to FILE, or by default beside PATH: a package folder
// "site/calcs" renders to "site/calcs.pdf", a single sheet "calcs/03-pad.md"
// to "calcs/03-pad.pdf". It is written to a temporary file in the target
// folder, flushed to disk and renamed into place only when complete, so a
// failed run leaves an earlier PDF as it was. Input errors (and problems
// found while laying out the pages) print as path:line:col: message, exit
// status 2, and no PDF is written. On success the output path, the page
// count and the checks' tally print on stdout; the exit status is 1 when a
// check is NOT OK (the PDF is written all the same), else 0.
//
// The document date is the latest revision date in package.yaml, or
// SOURCE_DATE_EPOCH when set; the same inputs give the same bytes.
func render(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs("render", args, "set", "output", "since")
	if err == errHelp {
		fmt.Fprint(stdout, helps["render"])
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	res, diags, rec := evaluateRecorded(o.path, o.sets)
	if diags.HasErrors() {
		printDiags(stderr, diags)
		return exitErrors
	}
	prog := newProgress(stderr) // a line on a terminal for a long render
	var copt compose.Options
	if o.since != "" {
		ch, ok := sinceChanges(o.since, o.path, res, stderr)
		if !ok {
			return exitErrors
		}
		copt.Changes = ch
	}
	bodies := pdf.NewBodies()
	pages, cd := layOut(res, copt, prog.sheetFunc(), bodies)
	diags.Append(cd)
	created, dd := compose.Created(res, os.Getenv("SOURCE_DATE_EPOCH"))
	diags.Append(dd)
	diags.Sort()
	if diags.HasErrors() {
		prog.done()
		printDiags(stderr, diags)
		return exitErrors
	}
	files, err := inputFiles(res, rec, o.path)
	if err != nil {
		printDiags(stderr, diags)
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	var buf bytes.Buffer
	err = pdf.Write(&buf, pages, pdf.Options{Time: created, Creator: "plinth " + Version(), Progress: prog.pageFunc(), Release: true, Files: files, Bodies: bodies})
	prog.done()
	if err != nil {
		printDiags(stderr, diags)
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	out := o.output
	if out == "" {
		out = defaultOutput(o.path)
	}
	if err := writeAtomic(out, buf.Bytes()); err != nil {
		printDiags(stderr, diags)
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	printDiags(stderr, diags) // warnings only by now
	nok := 0
	for _, c := range res.Checks {
		if !c.OK {
			nok++
		}
	}
	tally := "no checks"
	if n := len(res.Checks); n > 0 {
		tally = fmt.Sprintf("%d check%s: %d OK, %d NOT OK", n, plural(n), n-nok, nok)
	}
	variant := ""
	if res.Variant() {
		variant = ", VARIANT"
	}
	n := len(pages.Pages)
	fmt.Fprintf(stdout, "%s: %d page%s, %s%s\n", out, n, plural(n), tally, variant)
	return status(res, diags)
}

// defaultOutput is the PDF path for PATH: "<folder>.pdf" beside a package
// folder, "<sheet>.pdf" beside a single sheet.
func defaultOutput(path string) string {
	clean := filepath.Clean(path)
	if strings.EqualFold(filepath.Ext(clean), ".md") {
		return strings.TrimSuffix(clean, filepath.Ext(clean)) + ".pdf"
	}
	if b := filepath.Base(clean); b == "." || b == ".." || b == string(filepath.Separator) {
		if abs, err := filepath.Abs(clean); err == nil {
			clean = abs
		}
	}
	return clean + ".pdf"
}

// staleAge is how old a temporary file of an earlier render must be for
// removeStale to take it for the leftover of a killed run rather than a
// render still under way.
const staleAge = time.Minute

// removeStale removes the temporary files that a killed render of the
// same output left in dir (".NAME.pdf.*.tmp", older than staleAge).
func removeStale(dir, base string) {
	names, _ := filepath.Glob(filepath.Join(dir, "."+globEscape(base)+".*.tmp"))
	for _, n := range names {
		if fi, err := os.Lstat(n); err == nil && fi.Mode().IsRegular() && time.Since(fi.ModTime()) > staleAge {
			os.Remove(n)
		}
	}
}

// globEscape quotes the characters filepath.Match treats specially.
func globEscape(s string) string {
	var b strings.Builder
	for _, r := range s {
		if strings.ContainsRune(`*?[\`, r) {
			b.WriteByte('\\')
		}
		b.WriteRune(r)
	}
	return b.String()
}

// writeAtomic writes data to path through a temporary file in the same
// folder: written, flushed to disk, closed, then renamed over path. On
// any failure the temporary file is removed and path is left as it was.
func writeAtomic(path string, data []byte) (err error) {
	dir, base := filepath.Split(path)
	if dir == "" {
		dir = "."
	}
	if fi, e := os.Stat(path); e == nil && fi.IsDir() {
		return fmt.Errorf("cannot write %s: it is a folder", path)
	}
	removeStale(dir, base)
	tmp, err := os.CreateTemp(dir, "."+base+".*.tmp")
	if err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	name := tmp.Name()
	defer func() {
		if err != nil {
			tmp.Close()
			os.Remove(name)
		}
	}()
	mode := os.FileMode(0o644)
	if fi, e := os.Stat(path); e == nil {
		mode = fi.Mode().Perm()
	}
	if _, err = tmp.Write(data); err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	if err = tmp.Sync(); err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	if err = tmp.Chmod(mode); err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	if err = tmp.Close(); err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	if err = os.Rename(name, path); err != nil {
		return fmt.Errorf("cannot write %s: %v", path, describe(err))
	}
	return nil
}

// describe shortens an OS error to its cause ("permission denied").
func describe(err error) string {
	if pe, ok := err.(*os.PathError); ok {
		return pe.Err.Error()
	}
	if le, ok := err.(*os.LinkError); ok {
		return le.Err.Error()
	}
	return err.Error()
}
