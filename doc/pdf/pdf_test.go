package pdf_test

import (
	"bytes"
	"flag"
	"github.com/plinth-calc/plinth/internal/tools"
	"io"
	"os"
	"os/exec"
	"strings"
	"testing"
	"time"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/pdf"
)

var demo = flag.String("demo", "", "write the demo package PDF to this path")

var when = time.Date(2026, 12, 2, 9, 30, 0, 0, time.UTC)

func render(t testing.TB, doc layout.Doc) []byte {
	t.Helper()
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	if err := pdf.Write(&b, pages, pdf.Options{Time: when, Creator: "plinth test"}); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

func TestDemo(t *testing.T) {
	out := render(t, demoDoc(40))
	if *demo != "" {
		if err := os.WriteFile(*demo, out, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	path := t.TempDir() + "/demo.pdf"
	if err := os.WriteFile(path, out, 0o644); err != nil {
		t.Fatal(err)
	}
	if out, err := exec.Command(tools.Need(t, "qpdf"), "--check", path).CombinedOutput(); err != nil {
		t.Errorf("qpdf --check: %v\n%s", err, out)
	}
}

func TestDeterministic(t *testing.T) {
	a := render(t, demoDoc(40))
	for i := 0; i < 3; i++ {
		if b := render(t, demoDoc(40)); !bytes.Equal(a, b) {
			t.Fatalf("render %d differs from the first (%d vs %d bytes)", i+2, len(b), len(a))
		}
	}
}

func tool(t *testing.T, name string, args ...string) string {
	t.Helper()
	out, err := exec.Command(tools.Need(t, name), args...).CombinedOutput()
	if err != nil {
		t.Fatalf("%s %v: %v\n%s", name, args, err, out)
	}
	return string(out)
}

func TestToolsReadIt(t *testing.T) {
	path := t.TempDir() + "/demo.pdf"
	if err := os.WriteFile(path, render(t, demoDoc(40)), 0o644); err != nil {
		t.Fatal(err)
	}
	tool(t, "qpdf", "--check", path)
	fonts := tool(t, "pdffonts", path)
	for _, f := range []string{"PLNTAA+DejaVuSerif", "PLNTAB+DejaVuSerif-Bold", "PLNTAC+DejaVuSerif-Italic", "PLNTAE+GoMono"} {
		if !strings.Contains(fonts, f) {
			t.Errorf("pdffonts lacks %s:\n%s", f, fonts)
		}
	}
	for _, ln := range strings.Split(fonts, "\n")[2:] {
		if f := strings.Fields(ln); len(f) > 5 && f[len(f)-5] != "yes" {
			t.Errorf("font not embedded: %s", ln)
		}
	}
	info := tool(t, "pdfinfo", path)
	for _, s := range []string{"Title:           Kestrel Park: foundation calculations", "inputs:9f2c41d07be35a6e1c0d2b8f44a91e7d5c3b2a190f8e7d6c5b4a39281706f5e4",
		"CreationDate:    Wed Dec  2 09:30:00 2026 UTC", "ModDate:         Wed Dec  2 09:30:00 2026 UTC", "Pages:           4"} {
		if !strings.Contains(info, s) {
			t.Errorf("pdfinfo lacks %q:\n%s", s, info)
		}
	}
	text := tool(t, "pdftotext", "-layout", path, "-")
	for _, s := range []string{"Sheet", "1 of 4", "4 of 4", "NOT CHECKED", "inputs 9f2c41d07be3", "page 2 of 2",
		"utilisation 0.60", "NOT OK", "Hole", "BH07", "= 473 kPa", "WARNING", "CAUTION", "φ′"} {
		if !strings.Contains(text, s) {
			t.Errorf("pdftotext lacks %q", s)
		}
	}
	// the table header repeats on the second page
	pages := strings.Split(text, "\f")
	if !strings.Contains(pages[1], "Hole") || !strings.Contains(pages[1], "Description") {
		t.Errorf("page 2 lacks the repeated table header:\n%s", pages[1])
	}
	// bookmarks: one per sheet
	out := tool(t, "qpdf", "--json", "--json-key=outlines", path)
	if strings.Count(out, `"title"`) != 2 || !strings.Contains(out, "C-02 Pad footing P1: bearing resistance") {
		t.Errorf("outlines:\n%s", out)
	}
}

func TestMissingAnchor(t *testing.T) {
	pages, diags := layout.Document(demoDoc(3))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	// break a link by hand: the writer refuses rather than write a dangling link
	b := pages.Pages[0].Boxes[len(pages.Pages[0].Boxes)-1]
	b.Items = append(b.Items, draw.Link{X: 1, Y: 1, W: 1, H: 1, Target: "gone"})
	err := pdf.Write(io.Discard, pages, pdf.Options{})
	if err == nil || !strings.Contains(err.Error(), `"gone"`) {
		t.Errorf("err = %v", err)
	}
}
