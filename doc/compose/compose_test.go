package compose_test

import (
	"bytes"
	"flag"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/pdf"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/golden"
	"github.com/plinth-calc/plinth/internal/memory"
	"github.com/plinth-calc/plinth/internal/tools"
)

var update = flag.Bool("update", false, "rewrite golden files")

// goldenDir is the folder of the render goldens (repository testdata).
const goldenDir = "../../testdata/render"

// evaluate loads, parses and evaluates a package, failing on any error.
func evaluate(t testing.TB, path string, sets ...string) *eval.Result {
	t.Helper()
	lp, d := load.Path(path)
	if lp == nil {
		t.Fatal(d)
	}
	pkg, pd := parse.Package(lp)
	d.Append(pd)
	if d.HasErrors() {
		t.Fatal(d)
	}
	res, ed := eval.Package(pkg, eval.Options{Set: sets})
	if ed.HasErrors() {
		t.Fatal(ed)
	}
	return res
}

// pagesOf composes and lays out a result, as plinth render does (with
// bodies set, the pages' bodies painted as they are final).
func pagesOf(res *eval.Result, opt compose.Options, bodies ...*pdf.Bodies) (*layout.Pages, source.List) {
	if len(bodies) > 0 {
		memory.SetPace() // as plinth render does (cmd/plinth layOut)
	}
	doc, d := compose.Document(res, opt)
	if d.HasErrors() {
		return nil, d
	}
	if len(bodies) > 0 {
		doc.Final = bodies[0].Sheet
		memory.Cap() // as plinth render does (cmd/plinth layOut)
	}
	pages, ld := layout.Document(doc)
	d.Append(ld)
	d.Sort()
	return pages, d
}

// render makes the PDF bytes of a result, as plinth render does.
func render(t testing.TB, res *eval.Result) ([]byte, *layout.Pages) {
	t.Helper()
	bodies := pdf.NewBodies()
	pages, d := pagesOf(res, compose.Options{}, bodies)
	if d.HasErrors() {
		t.Fatal(d)
	}
	created, cd := compose.Created(res, "")
	if cd.HasErrors() {
		t.Fatal(cd)
	}
	var buf bytes.Buffer
	if err := pdf.Write(&buf, pages, pdf.Options{Time: created, Creator: "plinth", Bodies: bodies}); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes(), pages
}

func tool(t *testing.T, name string) string {
	t.Helper()
	return tools.Need(t, name)
}

// examples lists the example packages.
func examples(t *testing.T) []string {
	ents, err := os.ReadDir("../../examples")
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range ents {
		if e.IsDir() {
			out = append(out, e.Name())
		}
	}
	if len(out) == 0 {
		t.Fatal("no examples")
	}
	return out
}

// TestExamples renders every example and the test package: qpdf finds the
// file sound, every font is embedded, and the text holds the title block
// fields, every page's "n of N", every symbol's value and every check's
// verdict; the text is compared with its golden file.
func TestExamples(t *testing.T) {
	qpdf, pdffonts, pdftotext := tool(t, "qpdf"), tool(t, "pdffonts"), tool(t, "pdftotext")
	dirs := map[string]string{}
	for _, name := range examples(t) {
		dirs[name] = filepath.Join("../../examples", name)
	}
	dirs["mini"] = filepath.Join(goldenDir, "mini")
	for name, dir := range dirs {
		t.Run(name, func(t *testing.T) {
			res := evaluate(t, dir)
			data, pages := render(t, res)
			file := filepath.Join(t.TempDir(), name+".pdf")
			if err := os.WriteFile(file, data, 0o644); err != nil {
				t.Fatal(err)
			}
			if out, err := exec.Command(qpdf, "--check", file).CombinedOutput(); err != nil {
				t.Errorf("qpdf --check: %v\n%s", err, out)
			}
			out, err := exec.Command(pdffonts, file).Output()
			if err != nil {
				t.Fatal(err)
			}
			lines := strings.Split(strings.TrimSpace(string(out)), "\n")
			if len(lines) < 3 {
				t.Errorf("pdffonts lists no fonts:\n%s", out)
			}
			for _, l := range lines[2:] {
				if f := strings.Fields(l); len(f) < 7 || f[len(f)-5] != "yes" {
					t.Errorf("font not embedded: %s", l)
				}
			}
			text, err := exec.Command(pdftotext, "-enc", "UTF-8", file, "-").Output()
			if err != nil {
				t.Fatal(err)
			}
			checkText(t, res, pages, string(text))
			golden.Compare(t, filepath.Join(goldenDir, name+".txt"), text, *update)
		})
	}
}

var space = regexp.MustCompile(`\s+`)

// norm makes extracted text comparable: one space for any run of white
// space, ASCII minus.
func norm(s string) string {
	return space.ReplaceAllString(strings.ReplaceAll(s, "−", "-"), " ")
}

// squash drops the digits, spaces and superscript digits of s.
func squash(s string) string {
	return strings.Map(func(r rune) rune {
		if r >= '0' && r <= '9' || r == ' ' || r == '²' || r == '³' {
			return -1
		}
		return r
	}, s)
}

// checkText checks what every calculation package must show.
func checkText(t *testing.T, res *eval.Result, pages *layout.Pages, text string) {
	t.Helper()
	per := strings.Split(text, "\f")
	n := len(pages.Pages)
	for i := 0; i < n; i++ {
		if i >= len(per) || !strings.Contains(norm(per[i]), fmt.Sprintf("%d of %d", i+1, n)) {
			t.Errorf("page %d does not say %d of %d", i+1, i+1, n)
		}
	}
	all := norm(text)
	m := res.Src.Meta
	for _, f := range []string{m.Project.Value, m.Job.Value, m.Client.Value} {
		if f != "" && !strings.Contains(all, norm(f)) {
			t.Errorf("title block field %q missing", f)
		}
	}
	for _, s := range res.Sheets {
		for _, f := range []string{s.Meta.Title.Value, s.Meta.Calc.Value} {
			if f != "" && !strings.Contains(all, norm(f)) {
				t.Errorf("%s: title block field %q missing", s.Name(), f)
			}
		}
		for _, y := range s.Symbols {
			v := norm(units.Format(y.Q.V, y.Unit, y.Decimals))
			if !strings.Contains(all, v) {
				t.Errorf("%s: %s = %s not printed", s.Name(), y.Name, v)
			}
			// a unit's exponents are set raised, which text extraction may
			// place apart from the unit: compare without digits and spaces
			if u := strings.TrimRight(y.Unit.Name, "0123456789"); u != "" && u != "deg" && !strings.Contains(all, u) && !strings.Contains(squash(all), squash(u)) {
				t.Errorf("%s: unit %s of %s not printed", s.Name(), y.Unit.Name, y.Name)
			}
		}
	}
	ok, bad := 0, 0
	for _, c := range res.Checks {
		if c.OK {
			ok++
		} else {
			bad++
		}
	}
	if got := strings.Count(all, "NOT OK"); got < 2*bad {
		t.Errorf("NOT OK printed %d times, want at least %d (line and register)", got, 2*bad)
	}
	if got := strings.Count(all, "OK") - strings.Count(all, "NOT OK"); got < 2*ok {
		t.Errorf("OK printed %d times, want at least %d (line and register)", got, 2*ok)
	}
	if strings.Contains(all, "page —") || strings.Contains(all, "page -") {
		t.Error("a page reference was left unfilled (page —)")
	}
	if fp := res.Fingerprint(); !strings.Contains(all, fp[:12]) {
		t.Errorf("fingerprint %s not in the footers", fp[:12])
	}
}

// TestDeterministic renders the example twice: the same bytes.
func TestDeterministic(t *testing.T) {
	for _, name := range examples(t) {
		dir := filepath.Join("../../examples", name)
		a, _ := render(t, evaluate(t, dir))
		b, _ := render(t, evaluate(t, dir))
		if !bytes.Equal(a, b) {
			t.Errorf("%s: two renders differ (%d and %d bytes)", name, len(a), len(b))
		}
		if !bytes.Contains(a, []byte("/CreationDate")) {
			t.Errorf("%s: no creation date (the latest revision date)", name)
		}
	}
}

// TestLayoutGolden dumps the laid-out pages of the test package's sheet
// and of its cover and check register.
func TestLayoutGolden(t *testing.T) {
	res := evaluate(t, filepath.Join(goldenDir, "mini"))
	pages, d := pagesOf(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	keep := &layout.Pages{Info: pages.Info, Outline: pages.Outline}
	for _, pg := range pages.Pages {
		if pg.Sheet <= 2 { // cover, the sheet, the check register
			keep.Pages = append(keep.Pages, pg)
		}
	}
	var b bytes.Buffer
	if err := keep.Dump(&b); err != nil {
		t.Fatal(err)
	}
	golden.Compare(t, filepath.Join(goldenDir, "mini.golden"), b.Bytes(), *update)
}
