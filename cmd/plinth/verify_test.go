package main

import (
	"bytes"
	"image"
	"image/png"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/tools"
)

// renderCopy renders a copy of the example and returns the package folder
// and the PDF.
func renderCopy(t *testing.T, extra ...string) (string, string) {
	t.Helper()
	pkg := copyPackage(t)
	out := pkg + ".pdf"
	if _, errs, code := runCmd(append([]string{"render", pkg, "-o", out}, extra...)...); code == exitErrors {
		t.Fatalf("render: %s", errs)
	}
	return pkg, out
}

// TestEmbeddedInputs: the PDF carries every source file, qpdf finds it
// clean, verify passes (with --render byte for byte), extract restores
// the files byte for byte and refuses to overwrite.
func TestEmbeddedInputs(t *testing.T) {
	pkg, file := renderCopy(t)
	if b, err := exec.Command(tools.Need(t, "qpdf"), "--check", file).CombinedOutput(); err != nil {
		t.Errorf("qpdf --check: %v\n%s", err, b)
	}
	out, errs, code := runCmd("verify", file, pkg, "--render")
	if code != exitOK || !strings.Contains(out, "byte for byte") || !strings.Contains(out, "the files are those the PDF was made from") {
		t.Fatalf("verify: status %d\n%s%s", code, out, errs)
	}
	dst := filepath.Join(t.TempDir(), "x")
	if _, errs, code := runCmd("extract", file, dst); code != exitOK {
		t.Fatalf("extract: status %d: %s", code, errs)
	}
	ents, _ := os.ReadDir(pkg)
	for _, e := range ents {
		want, _ := os.ReadFile(filepath.Join(pkg, e.Name()))
		got, err := os.ReadFile(filepath.Join(dst, e.Name()))
		if err != nil || !bytes.Equal(got, want) {
			t.Errorf("extract: %s differs from the source (%v)", e.Name(), err)
		}
	}
	got, _ := os.ReadDir(dst)
	if len(got) != len(ents) {
		t.Errorf("extract wrote %d files, the package has %d", len(got), len(ents))
	}
	// extract again: nothing overwritten
	os.WriteFile(filepath.Join(dst, "02-loads.md"), []byte("mine"), 0o644)
	if _, errs, code := runCmd("extract", file, dst); code != exitErrors || !strings.Contains(errs, "exists") {
		t.Errorf("extract over files: status %d, %q", code, errs)
	}
	if b, _ := os.ReadFile(filepath.Join(dst, "02-loads.md")); string(b) != "mine" {
		t.Error("extract overwrote a file")
	}
	// one byte of a working source changes: verify PATH says which file
	src := filepath.Join(pkg, "03-pad-p1.md")
	b, _ := os.ReadFile(src)
	b[100] ^= 1
	os.WriteFile(src, b, 0o644)
	out, _, code = runCmd("verify", file, pkg)
	if code != exitNotOK || !strings.Contains(out, "changed  03-pad-p1.md (+1 -1 lines)") {
		t.Errorf("verify after a change: status %d\n%s", code, out)
	}
	os.WriteFile(filepath.Join(pkg, "07-new.md"), []byte("x"), 0o644)
	os.Remove(filepath.Join(pkg, "02-loads.md"))
	out, _, _ = runCmd("verify", file, pkg)
	if !strings.Contains(out, "added    07-new.md") || !strings.Contains(out, "removed  02-loads.md") {
		t.Errorf("verify: added and removed files not listed\n%s", out)
	}
}

// TestVerifyTampered: a PDF whose fingerprint or embedded file was changed
// fails; a PDF that is not plinth's, or truncated, is unreadable.
func TestVerifyTampered(t *testing.T) {
	_, file := renderCopy(t)
	data, _ := os.ReadFile(file)
	dir := t.TempDir()
	write := func(name string, b []byte) string {
		p := filepath.Join(dir, name)
		os.WriteFile(p, b, 0o644)
		return p
	}
	// the fingerprint in the document information, one digit changed
	kw := []byte("0069006E0070007500740073003A") // "inputs:" in UTF-16BE hex
	i := bytes.LastIndex(data, kw)
	if i < 0 {
		t.Fatal("no fingerprint in the document information")
	}
	fp := append([]byte(nil), data...)
	j := i + len(kw) + 3
	if fp[j] == '0' {
		fp[j] = '1'
	} else {
		fp[j] = '0'
	}
	if out, _, code := runCmd("verify", write("fp.pdf", fp)); code != exitNotOK || !strings.Contains(out, "the document information says") {
		t.Errorf("changed fingerprint: status %d\n%s", code, out)
	}
	// an embedded source, one byte changed: different SHA-256 (the stream
	// is compressed, so the PDF is rewritten through its own writer)
	in, err := readInputs(data)
	if err != nil {
		t.Fatal(err)
	}
	in.files["02-loads.md"][10] ^= 1
	if fp2, _ := in.fingerprint(); fp2 == in.man.Fingerprint {
		t.Error("a changed byte did not change the fingerprint")
	}
	for name, c := range map[string]struct {
		data []byte
		want string
	}{
		"truncated": {data[:len(data)-1000], "truncated"},
		"plain":     {[]byte("%PDF-1.4\n1 0 obj\n<<>>\nendobj\n%%EOF\n"), "not a PDF plinth wrote"},
		"text":      {[]byte("hello"), "not a PDF"},
	} {
		p := write(name+".pdf", c.data)
		for _, cmd := range [][]string{{"verify", p}, {"extract", p, filepath.Join(dir, name)}} {
			if _, errs, code := runCmd(cmd...); code != exitErrors || !strings.Contains(errs, c.want) {
				t.Errorf("%s %s: status %d, %q, want %q", cmd[0], name, code, errs, c.want)
			}
		}
		if _, err := os.Stat(filepath.Join(dir, name)); err == nil {
			t.Errorf("extract %s created its folder", name)
		}
	}
}

// TestExtractRefusesPaths: embedded names with .. or an absolute path are
// refused and nothing is written.
func TestExtractRefusesPaths(t *testing.T) {
	_, file := renderCopy(t)
	data, _ := os.ReadFile(file)
	dir := t.TempDir()
	for _, bad := range []string{"../ground.md", "/1-ground.md", "./../grou.md"} {
		if len(bad) != len("01-ground.md") {
			t.Fatalf("%q: the replacement must keep the length", bad)
		}
		b := bytes.ReplaceAll(data, []byte("(01-ground.md)"), []byte("("+bad+")"))
		p := filepath.Join(dir, "bad.pdf")
		os.WriteFile(p, b, 0o644)
		dst := filepath.Join(dir, "out")
		if _, errs, code := runCmd("extract", p, dst); code != exitErrors || !strings.Contains(errs, "refusing file name") {
			t.Errorf("%q: status %d, %q", bad, code, errs)
		}
		if _, err := os.Stat(dst); err == nil {
			t.Errorf("%q: extract wrote something", bad)
		}
		if _, _, code := runCmd("verify", p); code != exitErrors {
			t.Errorf("verify %q: status %d, want 2", bad, code)
		}
	}
}

// TestVariantPDF: a variant's --set values travel in the PDF: verify
// recomputes its fingerprint with them and diff evaluates it with them.
func TestVariantPDF(t *testing.T) {
	pkg, file := renderCopy(t, "--set", "site.firm_to_stiff_sandy_clay.m_v=0.09m2/MN")
	if out, errs, code := runCmd("verify", file, "--render"); code != exitOK || !strings.Contains(out, "variant: --set site.firm_to_stiff_sandy_clay.m_v=0.09m2/MN") {
		t.Fatalf("verify variant: status %d\n%s%s", code, out, errs)
	}
	c, code, errs := diffJSON(t, pkg, file)
	if code != exitNotOK || len(c.Flipped) == 0 || len(c.New.Sets) != 1 {
		t.Errorf("diff folder → variant PDF: status %d %s, %+v", code, errs, c)
	}
	if len(c.Inputs) != 1 || c.Inputs[0].NewFile != file+":01-ground.md" {
		t.Errorf("inputs: %+v", c.Inputs)
	}
}

// TestSingleSheetPDF: a sheet rendered alone carries the sheets it uses
// and verifies against its own folder, where the other sheets are not
// its inputs; diff finds nothing between it and the sheet.
func TestSingleSheetPDF(t *testing.T) {
	pkg := copyPackage(t)
	sheet := filepath.Join(pkg, "03-pad-p1.md")
	file := filepath.Join(t.TempDir(), "p1.pdf")
	if _, errs, code := runCmd("render", sheet, "-o", file); code != exitOK {
		t.Fatalf("render: %s", errs)
	}
	if out, errs, code := runCmd("verify", file, sheet, "--render"); code != exitOK {
		t.Errorf("verify: status %d\n%s%s", code, out, errs)
	}
	if out, errs, code := runCmd("diff", file, sheet); code != exitOK || !strings.Contains(out, "no changes") {
		t.Errorf("diff: status %d\n%s%s", code, out, errs)
	}
}

// TestEmbedsFigures: a figure of a context sheet (checked by the parser,
// not printed) and one of a printed sheet are embedded, so the sheet
// rendered alone re-renders from its PDF.
func TestEmbedsFigures(t *testing.T) {
	dir := t.TempDir()
	img := image.NewGray(image.Rect(0, 0, 4, 4))
	var png1 bytes.Buffer
	png.Encode(&png1, img)
	os.MkdirAll(filepath.Join(dir, "figures"), 0o755)
	os.WriteFile(filepath.Join(dir, "figures", "a b.png"), png1.Bytes(), 0o644)
	os.WriteFile(filepath.Join(dir, "figures", "c.png"), png1.Bytes(), 0o644)
	os.WriteFile(filepath.Join(dir, "01-a.md"), []byte("---\ntitle: A\ncalc: \"1\"\n---\n\n![Plan](figures/a%20b.png)\n\n```calc\nx = 2 m\n```\n"), 0o644)
	os.WriteFile(filepath.Join(dir, "02-b.md"), []byte("---\ntitle: B\ncalc: \"2\"\nuses: [01-a.md]\n---\n\n![Section](figures/c.png)\n\n```calc\ny = 2 * x\n```\n"), 0o644)
	out := filepath.Join(t.TempDir(), "b.pdf")
	if _, errs, code := runCmd("render", filepath.Join(dir, "02-b.md"), "-o", out); code != exitOK {
		t.Fatalf("render: %s", errs)
	}
	data, _ := os.ReadFile(out)
	in, err := readInputs(data)
	if err != nil {
		t.Fatal(err)
	}
	if got := strings.Join(in.names(), ", "); got != "01-a.md, 02-b.md, figures/a b.png, figures/c.png" {
		t.Errorf("embedded: %s", got)
	}
	if o, errs, code := runCmd("verify", out, "--render"); code != exitOK {
		t.Errorf("verify --render: status %d\n%s%s", code, o, errs)
	}
}
