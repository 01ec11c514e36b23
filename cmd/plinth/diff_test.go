package main

import (
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// gitRepo makes a repository in a temporary folder with revision A of the
// example package in calcs/ (tagged rev-A), then revision B with the
// oedometer m_v of the firm clay raised from 0.08 to 0.09 m2/MN (the pad's
// settlement check goes from 0.98 to 1.07 utilised). It returns the
// repository's folder, which the test makes its working folder.
func gitRepo(t *testing.T) string {
	t.Helper()
	git, err := exec.LookPath("git")
	if err != nil {
		t.Skip("git not found")
	}
	dir := t.TempDir()
	calcs := filepath.Join(dir, "calcs")
	pkg := copyPackage(t)
	if err := os.Rename(pkg, calcs); err != nil {
		t.Fatal(err)
	}
	g := func(args ...string) {
		t.Helper()
		cmd := exec.Command(git, append([]string{"-c", "user.name=t", "-c", "user.email=t@example.invalid", "-c", "commit.gpgsign=false"}, args...)...)
		cmd.Dir = dir
		if out, err := cmd.CombinedOutput(); err != nil {
			t.Fatalf("git %v: %v\n%s", args, err, out)
		}
	}
	g("init", "-q")
	g("add", ".")
	g("commit", "-q", "-m", "A")
	g("tag", "rev-A")
	ground := filepath.Join(calcs, "01-ground.md")
	b, _ := os.ReadFile(ground)
	old := "| 0.08        | 2.5         | [GIR] Table 4"
	if !strings.Contains(string(b), old) {
		t.Fatal("the example's clay row changed: update the test")
	}
	os.WriteFile(ground, []byte(strings.Replace(string(b), old, "| 0.09        | 2.5         | [GIR] Table 4", 1)), 0o644)
	g("commit", "-q", "-a", "-m", "B")
	t.Chdir(dir)
	return dir
}

func diffJSON(t *testing.T, args ...string) (*changes, int, string) {
	t.Helper()
	out, errs, code := runCmd(append([]string{"diff", "--json"}, args...)...)
	var c changes
	if err := json.Unmarshal([]byte(out), &c); err != nil {
		t.Fatalf("diff --json: %v\n%s\n%s", err, out, errs)
	}
	return &c, code, errs
}

// TestDiffGit: between the revisions diff lists exactly the changed input,
// the results that depend on it and the checks that flipped, and exits 1.
func TestDiffGit(t *testing.T) {
	gitRepo(t)
	c, code, errs := diffJSON(t, "rev-A:calcs", "HEAD:calcs")
	if code != exitNotOK {
		t.Fatalf("status %d, want 1 (a check became NOT OK): %s", code, errs)
	}
	if len(c.Inputs) != 1 || c.Inputs[0].Name != "site.firm_to_stiff_sandy_clay.m_v" || c.Inputs[0].Old != "0.08 m2/MN" || c.Inputs[0].New != "0.09 m2/MN" {
		t.Errorf("inputs changed: %+v, want only the clay's m_v 0.08 → 0.09", c.Inputs)
	} else if in := c.Inputs[0]; in.OldFile != "rev-A:calcs/01-ground.md" || in.NewFile != "HEAD:calcs/01-ground.md" || in.OldLine != 42 || in.NewLine != 42 {
		t.Errorf("input places: %s:%d → %s:%d", in.OldFile, in.OldLine, in.NewFile, in.NewLine)
	}
	names := map[string]bool{}
	for _, r := range c.Results {
		names[r.Name] = true
		if !strings.HasPrefix(r.Name, "P1.") && !strings.HasPrefix(r.Name, "T1.") && !strings.HasPrefix(r.Name, "P2.") && !strings.HasPrefix(r.Name, "P1_P2.") {
			t.Errorf("result %s changed: only the pads, their differential settlement and the tank on the clay depend on m_v", r.Name)
		}
		if r.Percent == nil || *r.Percent == 0 {
			t.Errorf("result %s: no change in %%", r.Name)
		}
	}
	for _, want := range []string{"P1.s_c", "P1.s_total", "T1.s_total"} {
		if !names[want] {
			t.Errorf("result %s not listed as changed", want)
		}
	}
	if len(c.Flipped) == 0 || c.Flipped[0].Expr != "P1 settlement: s_total <= s_lim" || c.Flipped[0].Old != "OK" || c.Flipped[0].New != "NOT OK" {
		t.Errorf("flipped checks: %+v, want P1's settlement OK → NOT OK first", c.Flipped)
	}
	if len(c.Added)+len(c.Removed)+len(c.Fields) != 0 {
		t.Errorf("added %v, removed %v, fields %v: want none", c.Added, c.Removed, c.Fields)
	}
	// the same two sides as text, and the working tree against rev-A
	out, _, code := runCmd("diff", "rev-A:calcs", "calcs")
	if code != exitNotOK || !strings.Contains(out, "OK (0.98) → NOT OK (1.07)  P1 settlement") ||
		!strings.Contains(out, "site.firm_to_stiff_sandy_clay.m_v: 0.08 m2/MN → 0.09 m2/MN (+12.5 %)  rev-A:calcs/01-ground.md:42 → calcs/01-ground.md:42") {
		t.Errorf("text diff (status %d):\n%s", code, out)
	}
	// nothing changed: exit 0
	if out, _, code := runCmd("diff", "HEAD:calcs", "calcs"); code != exitOK || !strings.Contains(out, "no changes") {
		t.Errorf("HEAD against the working tree: status %d\n%s", code, out)
	}
	// back again: checks become OK, which is not an exit 1
	if c, code, _ := diffJSON(t, "HEAD:calcs", "rev-A:calcs"); code != exitOK || len(c.Flipped) == 0 || c.Flipped[0].New != "OK" {
		t.Errorf("B → A: status %d, flipped %+v", code, c.Flipped)
	}
}

// TestDiffRenamed renames the pad's sheet and changes its revision: it is
// matched by its calc number and the field change is listed.
func TestDiffRenamed(t *testing.T) {
	dir := gitRepo(t)
	calcs := filepath.Join(dir, "calcs")
	os.Rename(filepath.Join(calcs, "03-pad-p1.md"), filepath.Join(calcs, "03-pad.md"))
	p2 := filepath.Join(calcs, "07-pad-p2.md") // the sheet that uses the renamed one follows it
	if b, err := os.ReadFile(p2); err == nil {
		os.WriteFile(p2, []byte(strings.ReplaceAll(string(b), "03-pad-p1.md", "03-pad.md")), 0o644)
	}
	b, _ := os.ReadFile(filepath.Join(calcs, "package.yaml"))
	os.WriteFile(filepath.Join(calcs, "package.yaml"), []byte(strings.Replace(string(b), "revision: P2", "revision: P3", 1)), 0o644)
	c, code, errs := diffJSON(t, "HEAD:calcs", "calcs")
	if code != exitOK {
		t.Fatalf("status %d: %s", code, errs)
	}
	found := false
	for _, m := range c.Sheets {
		if m.Old == "03-pad-p1.md" {
			found = m.New == "03-pad.md" && m.By == "calc"
		}
	}
	if !found {
		t.Errorf("sheets: %+v, want 03-pad-p1.md matched to 03-pad.md by calc", c.Sheets)
	}
	if len(c.Added)+len(c.Removed)+len(c.Inputs)+len(c.Results) != 0 {
		t.Errorf("a rename alone changed values: %+v", c)
	}
	if len(c.Fields) != 1 || c.Fields[0].Field != "revision" || c.Fields[0].Old != "P2" || c.Fields[0].New != "P3" {
		t.Errorf("fields: %+v, want revision P2 → P3", c.Fields)
	}
}

// TestDiffBad: each bad side is a clear error naming it, status 2.
func TestDiffBad(t *testing.T) {
	dir := gitRepo(t)
	broken := filepath.Join(dir, "broken")
	os.MkdirAll(broken, 0o755)
	os.WriteFile(filepath.Join(broken, "01-a.md"), []byte("---\ntitle: A\n---\n\n```calc\nx = 2 kpa\n```\n"), 0o644)
	notPDF := filepath.Join(dir, "x.pdf")
	os.WriteFile(notPDF, []byte("%PDF-1.4\nnothing\n%%EOF\n"), 0o644)
	for _, c := range []struct {
		old, new string
		want     string
	}{
		{"no-such-rev:calcs", "calcs", `old (no-such-rev:calcs): no-such-rev:calcs: git revision "no-such-rev" does not exist`},
		{"rev-A:nowhere", "calcs", "old (rev-A:nowhere): rev-A:nowhere: nowhere is missing at revision rev-A"},
		{"calcs", "missing-folder", "new (missing-folder): missing-folder: no such file or directory"},
		{"calcs", "broken", "new (broken): broken/01-a.md:6:"},
		{"calcs", notPDF, "new (" + notPDF + "): " + notPDF + ": not a PDF plinth wrote"},
	} {
		_, errs, code := runCmd("diff", c.old, c.new)
		if code != exitErrors || !strings.Contains(errs, c.want) {
			t.Errorf("diff %s %s: status %d, stderr %q, want %q", c.old, c.new, code, errs, c.want)
		}
	}
}
