package main

import (
	"bytes"
	"github.com/plinth-calc/plinth/internal/tools"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// copyPackage copies the example package into a fresh folder and returns
// the copy's path (dir/brackenfield), so default outputs land in dir.
func copyPackage(t *testing.T) string {
	t.Helper()
	dst := filepath.Join(t.TempDir(), "brackenfield")
	if err := os.MkdirAll(dst, 0o755); err != nil {
		t.Fatal(err)
	}
	ents, err := os.ReadDir(example)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range ents {
		if e.IsDir() {
			continue
		}
		b, err := os.ReadFile(filepath.Join(example, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dst, e.Name()), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return dst
}

// leftovers lists files in dir other than want (temporary files).
func leftovers(t *testing.T, dir string, want ...string) []string {
	t.Helper()
	ents, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range ents {
		keep := false
		for _, w := range want {
			keep = keep || e.Name() == w
		}
		if !keep {
			out = append(out, e.Name())
		}
	}
	return out
}

func TestRenderDefaultOutput(t *testing.T) {
	pkg := copyPackage(t)
	out, errs, code := runCmd("render", pkg)
	if code != exitOK {
		t.Fatalf("status %d\nstdout:\n%s\nstderr:\n%s", code, out, errs)
	}
	pdf := pkg + ".pdf"
	data, err := os.ReadFile(pdf)
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.HasPrefix(data, []byte("%PDF-")) || !bytes.Contains(data, []byte("%%EOF")) {
		t.Errorf("%s is not a complete PDF", pdf)
	}
	if !strings.Contains(out, pdf+": ") || !strings.Contains(out, " pages, 13 checks: 13 OK, 0 NOT OK") {
		t.Errorf("stdout: %q", out)
	}
	if l := leftovers(t, filepath.Dir(pkg), "brackenfield", "brackenfield.pdf"); len(l) > 0 {
		t.Errorf("files left behind: %v", l)
	}
}

func TestDefaultOutputNames(t *testing.T) {
	for _, c := range []struct{ in, want string }{
		{"site/calcs", "site/calcs.pdf"},
		{"site/calcs/", "site/calcs.pdf"},
		{"calcs/03-pad.md", "calcs/03-pad.pdf"},
		{"03-pad.MD", "03-pad.pdf"},
	} {
		if got := defaultOutput(filepath.FromSlash(c.in)); got != filepath.FromSlash(c.want) {
			t.Errorf("defaultOutput(%q) = %q, want %q", c.in, got, c.want)
		}
	}
	if got := defaultOutput("."); !strings.HasSuffix(got, ".pdf") || got == "..pdf" || !filepath.IsAbs(got) {
		t.Errorf(`defaultOutput(".") = %q, want the folder's name beside it`, got)
	}
}

// TestRenderBytesStable renders twice to two files: the same bytes; with
// SOURCE_DATE_EPOCH the date changes and the bytes are again stable.
func TestRenderBytesStable(t *testing.T) {
	dir := t.TempDir()
	a, b := filepath.Join(dir, "a.pdf"), filepath.Join(dir, "b.pdf")
	for _, o := range []string{a, b} {
		if _, errs, code := runCmd("render", example, "-o", o); code != exitOK {
			t.Fatalf("status %d: %s", code, errs)
		}
	}
	da, _ := os.ReadFile(a)
	db, _ := os.ReadFile(b)
	if !bytes.Equal(da, db) {
		t.Fatal("two renders of the same input differ")
	}
	if !bytes.Contains(da, []byte("D:20261123")) {
		t.Error("creation date is not the latest revision date 2026-11-23")
	}
	t.Setenv("SOURCE_DATE_EPOCH", "1767225600") // 2026-01-01T00:00:00Z
	c := filepath.Join(dir, "c.pdf")
	if _, errs, code := runCmd("render", example, "-o", c); code != exitOK {
		t.Fatalf("status %d: %s", code, errs)
	}
	dc, _ := os.ReadFile(c)
	if !bytes.Contains(dc, []byte("D:20260101")) {
		t.Error("SOURCE_DATE_EPOCH did not set the creation date")
	}
	t.Setenv("SOURCE_DATE_EPOCH", "yesterday")
	if _, errs, code := runCmd("render", example, "-o", c); code != exitErrors || !strings.Contains(errs, "SOURCE_DATE_EPOCH") {
		t.Errorf("bad SOURCE_DATE_EPOCH: status %d, stderr %q", code, errs)
	}
	if dc2, _ := os.ReadFile(c); !bytes.Equal(dc, dc2) {
		t.Error("a failed render changed the earlier PDF")
	}
}

// TestRenderFailureKeepsPDF breaks an input after a good render: the
// errors print as path:line:col, the status is 2 and the PDF is untouched.
func TestRenderFailureKeepsPDF(t *testing.T) {
	pkg := copyPackage(t)
	out := filepath.Join(filepath.Dir(pkg), "issue.pdf")
	if _, errs, code := runCmd("render", pkg, "-o", out); code != exitOK {
		t.Fatalf("status %d: %s", code, errs)
	}
	before, _ := os.ReadFile(out)
	sheet := filepath.Join(pkg, "02-loads.md")
	src, _ := os.ReadFile(sheet)
	bad := strings.Replace(string(src), "G_C4 = 640 kN", "G_C4 = 640 kNx", 1)
	if err := os.WriteFile(sheet, []byte(bad), 0o644); err != nil {
		t.Fatal(err)
	}
	stdout, errs, code := runCmd("render", pkg, "-o", out)
	if code != exitErrors {
		t.Fatalf("status %d, want 2\n%s%s", code, stdout, errs)
	}
	if !strings.Contains(errs, filepath.Join(pkg, "02-loads.md")+":") || !strings.Contains(errs, `unknown unit "kNx"`) {
		t.Errorf("stderr: %s", errs)
	}
	after, _ := os.ReadFile(out)
	if !bytes.Equal(before, after) {
		t.Error("the failed render changed the earlier PDF")
	}
	if l := leftovers(t, filepath.Dir(pkg), "brackenfield", "issue.pdf"); len(l) > 0 {
		t.Errorf("files left behind: %v", l)
	}
}

func TestRenderNotOKAndVariant(t *testing.T) {
	dir := t.TempDir()
	o := filepath.Join(dir, "v.pdf")
	out, errs, code := runCmd("render", example, "-o", o, "--set", "P1.B=1.6m")
	if code != exitNotOK {
		t.Fatalf("status %d, want 1\n%s%s", code, out, errs)
	}
	if !strings.Contains(out, "NOT OK") || !strings.Contains(out, "VARIANT") {
		t.Errorf("stdout: %q", out)
	}
	if _, err := os.Stat(o); err != nil {
		t.Fatalf("a NOT OK render must still write the PDF: %v", err)
	}
	if p := tools.Need(t, "pdftotext"); p != "" {
		text, err := exec.Command(p, o, "-").Output()
		if err != nil {
			t.Fatal(err)
		}
		if n := strings.Count(string(text), "VARIANT"); n < 2 {
			t.Errorf("VARIANT printed %d times", n)
		}
		if !strings.Contains(string(text), "P1.B = 1.6 m") {
			t.Error("the overridden input is not listed")
		}
	}
}

func TestRenderWriteErrors(t *testing.T) {
	dir := t.TempDir()
	for _, c := range []struct{ name, out, msg string }{
		{"no folder", filepath.Join(dir, "missing", "x.pdf"), "cannot write"},
		{"a folder", dir, "it is a folder"},
	} {
		t.Run(c.name, func(t *testing.T) {
			_, errs, code := runCmd("render", example, "-o", c.out)
			if code != exitErrors || !strings.Contains(errs, c.msg) {
				t.Errorf("status %d, stderr %q", code, errs)
			}
		})
	}
	if l := leftovers(t, dir); len(l) > 0 {
		t.Errorf("files left behind: %v", l)
	}
	_, errs, code := runCmd("render", example, "--json")
	if code != exitErrors || !strings.Contains(errs, "unknown flag --json") {
		t.Errorf("render --json: status %d, %q", code, errs)
	}
}

// TestRenderRemovesStaleTemp: the temporary file a killed render left
// beside the output is removed by the next render of the same output; a
// fresh one (a render under way) is left alone.
func TestRenderRemovesStaleTemp(t *testing.T) {
	dir := t.TempDir()
	o := filepath.Join(dir, "out.pdf")
	stale := filepath.Join(dir, ".out.pdf.123.tmp")
	fresh := filepath.Join(dir, ".out.pdf.456.tmp")
	other := filepath.Join(dir, ".other.pdf.789.tmp")
	for _, p := range []string{stale, fresh, other} {
		if err := os.WriteFile(p, []byte("%PDF-half"), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	old := time.Now().Add(-time.Hour)
	for _, p := range []string{stale, other} {
		if err := os.Chtimes(p, old, old); err != nil {
			t.Fatal(err)
		}
	}
	if _, errs, code := runCmd("render", example, "-o", o); code != exitOK {
		t.Fatalf("status %d\n%s", code, errs)
	}
	if l := leftovers(t, dir, "out.pdf", ".out.pdf.456.tmp", ".other.pdf.789.tmp"); len(l) > 0 {
		t.Errorf("left behind: %v", l)
	}
	for _, p := range []string{fresh, other} {
		if _, err := os.Stat(p); err != nil {
			t.Errorf("%s was removed: %v", filepath.Base(p), err)
		}
	}
}

// TestRenderUplift: a bearing check not verified (every combination lifts
// the footing) has no utilisation and still renders, NOT OK, exit 1.
func TestRenderUplift(t *testing.T) {
	out := filepath.Join(t.TempDir(), "uplift.pdf")
	_, errs, code := runCmd("render", "testdata/notverified", "-o", out)
	if code != 1 {
		t.Fatalf("status %d, want 1: %s", code, errs)
	}
	if _, err := os.Stat(out); err != nil {
		t.Fatal(err)
	}
}
