package main

import (
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/badcase"
)

// badCases lists every bad-input case: single sheets and package folders
// under testdata/bad and its stage folders.
func badCases(t *testing.T) []string {
	t.Helper()
	var out []string
	for _, dir := range []string{"../../testdata/bad", "../../testdata/bad/eval", "../../testdata/bad/render"} {
		ents, err := os.ReadDir(dir)
		if err != nil {
			t.Fatal(err)
		}
		for _, e := range ents {
			p := filepath.Join(dir, e.Name())
			switch {
			case e.IsDir() && strings.HasPrefix(e.Name(), "pkg-"):
				out = append(out, p)
			case !e.IsDir() && strings.HasSuffix(e.Name(), ".md") && e.Name() != "README.md":
				out = append(out, p)
			}
		}
	}
	sort.Strings(out)
	if len(out) < 30 {
		t.Fatalf("only %d bad-input cases found", len(out))
	}
	return out
}

// errorLines are the diagnostics of a run (path:line:col: message), sorted.
func errorLines(stderr string) []string {
	var out []string
	for _, l := range strings.Split(stderr, "\n") {
		if l == "" || strings.HasSuffix(l, " error") || strings.HasSuffix(l, " errors") {
			continue
		}
		out = append(out, l)
	}
	sort.Strings(out)
	return out
}

// TestCheckEquivRender: over every bad-input case, check refuses exactly
// what render refuses, with the same diagnostics and status, so CI can
// rely on check; check --layout likewise.
func TestCheckEquivRender(t *testing.T) {
	out := filepath.Join(t.TempDir(), "x.pdf")
	for _, c := range badCases(t) {
		_, rerr, rcode := runCmd("render", c, "-o", out)
		os.Remove(out)
		for _, args := range [][]string{{"check", c}, {"check", "--layout", c}} {
			_, cerr, ccode := runCmd(args...)
			if (rcode == exitErrors) != (ccode == exitErrors) {
				t.Errorf("%s: render status %d, %s status %d\nrender: %s\ncheck: %s", c, rcode, strings.Join(args[:len(args)-1], " "), ccode, rerr, cerr)
				continue
			}
			if rcode == exitErrors && strings.Join(errorLines(rerr), "\n") != strings.Join(errorLines(cerr), "\n") {
				t.Errorf("%s: diagnostics differ\nrender:\n%s\n%s:\n%s", c, rerr, strings.Join(args, " "), cerr)
			}
		}
	}
}

// TestBadDocument runs the cases of testdata/bad/render (see
// testdata/bad/README.md): problems found by the document stages (page
// templates, logos), which check must report as render does.
func TestBadDocument(t *testing.T) {
	n := badcase.Run(t, "../../testdata/bad/render", func(path string) source.List {
		res, diags := evaluate(path, nil)
		if res == nil {
			return diags
		}
		return documentErrors(res, diags, true)
	})
	if n < 1 {
		t.Errorf("only %d cases", n)
	}
}

// TestBadLayout runs the cases of testdata/bad/layout: problems only the
// layout finds (characters the fonts lack), which check --layout and
// render report at the line and column of the text, as the annotations
// say.
func TestBadLayout(t *testing.T) {
	dir := "../../testdata/bad/layout"
	n := badcase.Run(t, dir, func(path string) source.List {
		res, diags := evaluate(path, nil)
		if res == nil {
			return diags
		}
		return documentErrors(res, diags, true)
	})
	if n < 1 {
		t.Errorf("only %d cases", n)
	}
	out := filepath.Join(t.TempDir(), "x.pdf")
	ents, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range ents {
		c := filepath.Join(dir, e.Name())
		_, rerr, rcode := runCmd("render", c, "-o", out)
		_, cerr, ccode := runCmd("check", "--layout", c)
		if rcode != exitErrors || ccode != exitErrors || strings.Join(errorLines(rerr), "\n") != strings.Join(errorLines(cerr), "\n") {
			t.Errorf("%s: render (status %d) and check --layout (status %d) differ:\n%s\n%s", c, rcode, ccode, rerr, cerr)
		}
	}
}
