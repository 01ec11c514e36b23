package compose_test

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
)

// pkg writes files into a fresh folder and evaluates it.
func pkg(t *testing.T, files map[string]string) (*eval.Result, string) {
	t.Helper()
	dir := t.TempDir()
	for name, text := range files {
		p := filepath.Join(dir, filepath.FromSlash(name))
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return evaluate(t, dir), dir
}

const sheetA = "---\ntitle: A\ncalc: \"X-01\"\n---\n\n# A\n\nSee [LATE] then [EARLY].\n\n```calc\nx = 2 m # a length [EARLY]\n```\n"

// TestReferenceOrder: numbered by first citation across the package, then
// the uncited ones in the order written.
func TestReferenceOrder(t *testing.T) {
	res, _ := pkg(t, map[string]string{
		"package.yaml": "project: P\nreferences:\n  EARLY: Early report\n  UNUSED: Unused report\n  LATE: Late report\n",
		"01-a.md":      sheetA,
	})
	doc, d := compose.Document(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	var refs *layout.Sheet
	for i := range doc.Sheets {
		if doc.Sheets[i].Bookmark == "Registers, references and cautions" {
			refs = &doc.Sheets[i]
		}
	}
	if refs == nil {
		t.Fatal("no references sheet")
	}
	var got []string
	for _, b := range refs.Blocks {
		if p, ok := b.(*layout.Para); ok && len(p.Runs) > 1 && strings.HasPrefix(p.Runs[0].Text, "[") {
			got = append(got, p.Runs[0].Text+p.Runs[1].Text)
		}
	}
	want := []string{"[1]  Late report", "[2]  Early report", "[3]  Unused report"}
	if strings.Join(got, "|") != strings.Join(want, "|") {
		t.Errorf("references %q, want %q", got, want)
	}
	// the citation in the prose is [1], linked to the list
	sh := doc.Sheets[2] // after the cover and the summary
	found := false
	for _, b := range sh.Blocks {
		if p, ok := b.(*layout.Para); ok {
			for _, r := range p.Runs {
				if r.Text == "[1]" && r.Link == "ref-1" {
					found = true
				}
			}
		}
	}
	if !found {
		t.Error("the first citation does not print as [1] linked to ref-1")
	}
}

// TestCreated: the latest revision date, or SOURCE_DATE_EPOCH.
func TestCreated(t *testing.T) {
	res, _ := pkg(t, map[string]string{
		"package.yaml": "project: P\nrevisions:\n  - {rev: B, date: 2026-03-01}\n  - {rev: A, date: 2026-02-01}\n  - {rev: C}\n",
		"01-a.md":      "---\ntitle: A\n---\n\nText.\n",
	})
	got, d := compose.Created(res, "")
	if want := time.Date(2026, 3, 1, 0, 0, 0, 0, time.UTC); !got.Equal(want) {
		t.Errorf("Created = %v, want %v", got, want)
	}
	if len(d) != 0 { // a date that does not read is refused by doc/parse (testdata/bad/dates.md)
		t.Errorf("diagnostics %v", d)
	}
	if got, _ := compose.Created(res, "86400"); !got.Equal(time.Unix(86400, 0).UTC()) {
		t.Errorf("epoch: %v", got)
	}
	if _, d := compose.Created(res, "-3"); !d.HasErrors() {
		t.Error("a negative epoch is not an error")
	}
	// the title block takes the revision with the latest date
	doc, _ := compose.Document(res, compose.Options{})
	if f := doc.Sheets[1].Fields; f.Rev != "B" || f.Date != "2026-03-01" {
		t.Errorf("title block rev %q date %q, want B 2026-03-01", f.Rev, f.Date)
	}
}

// TestFileErrors: a page template or an image that cannot be used is an
// error at the span that names it.
func TestFileErrors(t *testing.T) {
	for _, c := range []struct {
		name  string
		files map[string]string
		want  string
	}{
		{"template", map[string]string{
			"package.yaml": "project: P\ntemplate: page.yaml\n",
			"page.yaml":    "name: Broken\npage: {width: 10mm, height: 10mm}\n",
			"01-a.md":      "---\ntitle: A\n---\n\nText.\n",
		}, "package.yaml:2:11: template \"page.yaml\": page template Broken: page size 28.3 × 28.3 pt is too small; margins"},
		// An image that is not a whole PNG or JPEG is refused earlier, by
		// doc/parse (testdata/bad/pkg-images), so check finds it too.
	} {
		t.Run(c.name, func(t *testing.T) {
			res, _ := pkg(t, c.files)
			pages, d := pagesOf(res, compose.Options{})
			if pages != nil || !strings.Contains(d.Error(), c.want) {
				t.Errorf("diagnostics lack %q:\n%s", c.want, d.Error())
			}
		})
	}
}

// TestBare leaves out the cover and the end matter.
func TestBare(t *testing.T) {
	res, _ := pkg(t, map[string]string{"01-a.md": sheetA, "package.yaml": "references:\n  EARLY: E\n  LATE: L\n"})
	doc, d := compose.Document(res, compose.Options{Bare: true})
	if d.HasErrors() {
		t.Fatal(d)
	}
	if len(doc.Sheets) != 1 || doc.Sheets[0].Fields.Calc != "X-01" {
		t.Errorf("bare document has %d sheets", len(doc.Sheets))
	}
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags) // citations are not linked: no dangling links
	}
	if len(pages.Pages) != 1 {
		t.Errorf("%d pages", len(pages.Pages))
	}
}

// TestVariantInfo: a --set run lists the overridden inputs for every page.
func TestVariantInfo(t *testing.T) {
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "01-a.md"), []byte(sheetA), 0o644); err != nil {
		t.Fatal(err)
	}
	os.WriteFile(filepath.Join(dir, "package.yaml"), []byte("references:\n  EARLY: E\n  LATE: L\n"), 0o644)
	lp, _ := load.Path(dir)
	p, _ := parse.Package(lp)
	res, d := eval.Package(p, eval.Options{Set: []string{"x=3m"}})
	if d.HasErrors() {
		t.Fatal(d)
	}
	doc, _ := compose.Document(res, compose.Options{})
	if got := strings.Join(doc.Info.Variant, ";"); got != "x = 3 m" {
		t.Errorf("Info.Variant = %q", got)
	}
	if doc.Info.Fingerprint != res.Fingerprint() {
		t.Error("fingerprint not passed on")
	}
}

// TestTemplateFile reads a page template from inside the package.
func TestTemplateFile(t *testing.T) {
	yaml, err := os.ReadFile("../../templates/page-letter.yaml")
	if err != nil {
		t.Fatal(err)
	}
	res, _ := pkg(t, map[string]string{
		"package.yaml":   "project: P\ntemplate: firm/page.yaml\n",
		"firm/page.yaml": strings.Replace(string(yaml), "name: Letter", "name: Firm letter", 1),
		"01-a.md":        "---\ntitle: A\n---\n\nText.\n",
	})
	doc, d := compose.Document(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	if doc.Template == nil || doc.Template.Name != "Firm letter" {
		t.Fatalf("template %+v", doc.Template)
	}
	if _, d := pagesOf(res, compose.Options{}); d.HasErrors() {
		t.Fatal(d)
	}
}

func ExampleDocument() {
	lp, _ := load.Path("../../testdata/render/mini")
	p, _ := parse.Package(lp)
	res, _ := eval.Package(p, eval.Options{})
	doc, diags := compose.Document(res, compose.Options{})
	fmt.Println(len(diags), "problems")
	for _, s := range doc.Sheets {
		fmt.Printf("%-14s %-8s %s\n", s.Bookmark, s.Fields.Calc, s.Fields.Title)
	}
	// Output:
	// 0 problems
	// Cover sheet    0917     Cover sheet
	// Summary of results 0917     Summary of results
	//                0917-01  Garden room pad
	// Registers, references and cautions 0917     Registers, references and cautions
}
