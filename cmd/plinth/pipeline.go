package main

import (
	"fmt"
	"io"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/pdf"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/memory"
)

// evaluate runs load → parse → eval and returns the result with every
// diagnostic of the run, sorted.
func evaluate(path string, sets []string) (*eval.Result, source.List) {
	return evaluateWith(path, sets, nil)
}

// evaluateWith is evaluate with a hook called on the parsed package
// before it is evaluated (render records the files read through it).
func evaluateWith(path string, sets []string, hook func(*sheet.Package)) (*eval.Result, source.List) {
	lp, diags := load.Path(path)
	if lp == nil {
		diags.Sort()
		return nil, diags
	}
	pkg, pd := parse.Package(lp)
	diags.Append(pd)
	if pkg == nil {
		diags.Sort()
		return nil, diags
	}
	if hook != nil {
		hook(pkg)
	}
	// Evaluate even after parse errors, so every independent error of the
	// run is listed at once; eval leaves the lines parse reported alone.
	res, ed := eval.Package(pkg, eval.Options{Set: sets, Prior: diags})
	diags.Append(ed)
	diags.Sort()
	if diags.HasErrors() {
		return nil, diags
	}
	return res, diags
}

// layOut runs compose → layout: the pages of res with every diagnostic
// of both stages, sorted (no pages when compose or layout found an
// error). progress, when set, hears of the sheets laid out; bodies, when
// set, paints each sheet's page bodies as soon as they are final (render
// gives it to pdf.Write), so the document is never held as boxes whole.
func layOut(res *eval.Result, opt compose.Options, progress func(done, total int), bodies *pdf.Bodies) (*layout.Pages, source.List) {
	if bodies != nil {
		memory.SetPace() // a render: compose, layout and PDF at the pace of internal/memory
	}
	doc, diags := compose.Document(res, opt)
	if diags.HasErrors() {
		return nil, diags
	}
	doc.Progress = progress
	if bodies != nil {
		doc.Final = bodies.Sheet
		memory.Cap() // a soft limit for the layout and the PDF (internal/memory)
	}
	pages, ld := layout.Document(doc)
	diags.Append(ld)
	diags.Sort()
	return pages, diags
}

// printDiags writes each diagnostic on its own line, then a count.
func printDiags(w io.Writer, diags source.List) {
	n := 0
	for _, d := range diags {
		fmt.Fprintln(w, d.Error())
		if d.Severity == source.Error {
			n++
		}
	}
	if n > 0 {
		fmt.Fprintf(w, "%d error%s\n", n, plural(n))
	}
}

func plural(n int) string {
	if n == 1 {
		return ""
	}
	return "s"
}
