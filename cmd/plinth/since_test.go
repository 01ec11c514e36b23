package main

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/internal/tools"
)

// TestRenderSince: --since adds the changes page after the summary (and a
// contents row), with the flipped check and the changed input; a bad
// revision writes nothing.
func TestRenderSince(t *testing.T) {
	dir := gitRepo(t)
	out := filepath.Join(dir, "c.pdf")
	if _, errs, code := runCmd("render", "calcs", "--since", "rev-A:calcs", "-o", out); code != exitNotOK {
		t.Fatalf("status %d: %s", code, errs)
	}
	b, err := exec.Command(tools.Need(t, "pdftotext"), "-layout", out, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	text := string(b)
	for _, want := range []string{"Changes since revision P2 (rev-A:calcs)", "Checks whose verdict changed", "P1 settlement: s_total <= s_lim", "OK (0.98)", "NOT OK (1.07)",
		"site.firm_to_stiff_sandy_clay.m_v", "rev-A:calcs/01-ground.md:42"} {
		if !strings.Contains(text, want) {
			t.Errorf("the PDF lacks %q", want)
		}
	}
	if s, c := strings.Index(text, "Summary of results\n"), strings.Index(text, "Checks whose verdict changed"); s < 0 || c < s {
		t.Error("the changes page is not after the summary")
	}
	if b, err := exec.Command(tools.Need(t, "qpdf"), "--check", out).CombinedOutput(); err != nil {
		t.Errorf("qpdf --check: %v\n%s", err, b)
	}
	// without --since, the output is what it was
	plain := filepath.Join(dir, "p.pdf")
	runCmd("render", "calcs", "-o", plain)
	pb, _ := os.ReadFile(plain)
	if bytes.Contains(pb, []byte("changes")) {
		t.Error("a render without --since has a changes anchor")
	}
	bad := filepath.Join(dir, "bad.pdf")
	if _, errs, code := runCmd("render", "calcs", "--since", "no-such:calcs", "-o", bad); code != exitErrors || !strings.Contains(errs, `git revision "no-such" does not exist`) {
		t.Errorf("bad --since: status %d, %q", code, errs)
	}
	if _, err := os.Stat(bad); err == nil {
		t.Error("a render with a bad --since wrote a PDF")
	}
}
