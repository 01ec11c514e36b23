package compose_test

import (
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"sort"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
)

// pageWords are the places a page number is printed (title block,
// footer, contents, page references): not data, and they move.
var pageWords = regexp.MustCompile(`(?i)\bpages? \d+([–-]\d+)?|\b\d+ of \d+\b|^\s*\d+([–-]\d+)?\s`)

// numberToken is a number as printed, with a minus sign.
var numberToken = regexp.MustCompile(`-?\d+(\.\d+)?`)

// numbers lists the numbers a PDF's text prints, page numbers left out
// (and, in loose, with them: a row number at the start of a line reads
// like the page column of the contents).
func numbers(t *testing.T, pdftotext, file string) (set, loose map[string]bool) {
	t.Helper()
	out, err := exec.Command(pdftotext, "-enc", "UTF-8", file, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	set, loose = map[string]bool{}, map[string]bool{}
	for _, line := range strings.Split(strings.ReplaceAll(string(out), "−", "-"), "\n") {
		for _, n := range numberToken.FindAllString(line, -1) {
			loose[n] = true
		}
		line = pageWords.ReplaceAllString(line, " ")
		for _, n := range numberToken.FindAllString(line, -1) {
			set[n] = true
		}
	}
	return set, loose
}

// TestNothingLeftOut renders the example with detail = full (every case
// and table in place, nothing compacted) and with the default (the
// governing working in the main flow, the rest in the appendix, repeated
// working listed by value) and checks that every number the full print
// shows is in the default one: what the main flow leaves out is in the
// appendix or a table. A number the full print shows only as the base of
// a power (the "1.185" of 1.185², extracted as "1.1852") counts when its
// base is printed.
func TestNothingLeftOut(t *testing.T) {
	pdftotext := tool(t, "pdftotext")
	res := evaluate(t, "../../examples/brackenfield")
	dir := t.TempDir()
	write := func(name string) string {
		data, _ := render(t, res)
		file := filepath.Join(dir, name)
		if err := os.WriteFile(file, data, 0o644); err != nil {
			t.Fatal(err)
		}
		return file
	}
	_, gov := numbers(t, pdftotext, write("governing.pdf"))
	res.Src.Meta.Detail.Value = "full"
	full, _ := numbers(t, pdftotext, write("full.pdf"))
	var lost []string
	for n := range full {
		if gov[n] { // page numbers too: a number may print at a line's start
			continue
		}
		if base := n[:len(n)-1]; strings.Contains(n, ".") && (strings.HasSuffix(n, "2") || strings.HasSuffix(n, "3")) && gov[base] {
			continue // a power's base and its exponent run together
		}
		lost = append(lost, n)
	}
	sort.Strings(lost)
	if len(lost) > 0 {
		t.Errorf("%d numbers of the full print are not in the default one: %s", len(lost), strings.Join(lost, " "))
	}
}

// TestExamplePages reports the example's length sheet by sheet (the
// issue's target is at most 35 pages with the default detail); it fails
// only if the example does not render. BenchmarkRenderDemo reports the
// total as a metric.
func TestExamplePages(t *testing.T) {
	res := evaluate(t, "../../examples/brackenfield")
	pages, d := pagesOf(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	doc, _ := compose.Document(res, compose.Options{})
	per := make([]int, len(doc.Sheets))
	for _, pg := range pages.Pages {
		per[pg.Sheet]++
	}
	for i, sh := range doc.Sheets {
		name := sh.Bookmark
		if name == "" {
			name = sh.Fields.Calc + " " + sh.Fields.Title
		}
		t.Logf("%3d  %s", per[i], name)
	}
	t.Logf("%3d  pages in all", len(pages.Pages))
}
