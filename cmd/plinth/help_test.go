package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestHelpFlags: every subcommand answers -h and --help with its own
// flags on stdout and status 0, and writes nothing (init -h once created
// a folder named -h).
func TestHelpFlags(t *testing.T) {
	dir := t.TempDir()
	wd, _ := os.Getwd()
	if err := os.Chdir(dir); err != nil {
		t.Fatal(err)
	}
	defer os.Chdir(wd)
	for _, cmd := range []string{"check", "render", "init"} {
		for _, flag := range []string{"-h", "--help"} {
			out, errs, code := runCmd(cmd, flag)
			if code != exitOK || !strings.HasPrefix(out, "Usage: plinth "+cmd) || errs != "" {
				t.Errorf("%s %s: status %d, stdout %q, stderr %q", cmd, flag, code, out, errs)
			}
		}
		out, _, code := runCmd("help", cmd)
		if code != exitOK || out != helps[cmd] {
			t.Errorf("help %s: status %d, %q", cmd, code, out)
		}
	}
	if ents, _ := os.ReadDir(dir); len(ents) != 0 {
		t.Errorf("help wrote files: %v", ents)
	}
	if _, errs, code := runCmd("init", "-x"); code != exitErrors || !strings.Contains(errs, "unknown flag -x") {
		t.Errorf("init -x: status %d, %q", code, errs)
	}
	if _, _, code := runCmd("help", "nope"); code != exitErrors {
		t.Errorf("help nope: status %d", code)
	}
	out, _, code := runCmd("version")
	if code != exitOK || !strings.HasPrefix(out, "plinth ") {
		t.Errorf("version: %d %q", code, out)
	}
}

// TestFlagsAnyOrder: flags are read before or after PATH.
func TestFlagsAnyOrder(t *testing.T) {
	a, _, ca := runCmd("check", "--json", "--set", "P1.B=2.8m", example)
	b, _, cb := runCmd("check", example, "--set=P1.B=2.8m", "--json")
	if ca != cb || a != b || ca == exitErrors {
		t.Errorf("statuses %d, %d; outputs equal: %v", ca, cb, a == b)
	}
	o := filepath.Join(t.TempDir(), "x.pdf")
	if _, errs, code := runCmd("render", "-o", o, example); code == exitErrors {
		t.Errorf("render -o FILE PATH: %s", errs)
	}
}

// TestCheckCautions: plinth check lists the engine's WARNINGs and
// CAUTIONs after the checks, each with its block and file:line; NOTEs
// only with -v.
func TestCheckCautions(t *testing.T) {
	out, _, code := runCmd("check", example)
	if code != exitOK {
		t.Fatalf("status %d", code)
	}
	i := strings.Index(out, "\ncautions\n")
	if i < 0 || i < strings.Index(out, "checks:") {
		t.Fatalf("no cautions section after the checks:\n%s", out)
	}
	tail := out[i:]
	if !strings.Contains(tail, "CAUTION  bearing OR1 (../../examples/brackenfield/05-crane-platform.md:") {
		t.Errorf("a warning lacks its block and position:\n%s", tail)
	}
	if strings.Contains(tail, "\n  NOTE ") || !strings.Contains(tail, "NOTEs not shown: plinth check -v lists them") {
		t.Errorf("NOTEs listed without -v:\n%s", tail)
	}
	out, _, _ = runCmd("check", "-v", example)
	if !strings.Contains(out, "\n  NOTE     settlement P1 (") {
		t.Errorf("-v does not list NOTEs")
	}
}

// TestNoPassWithoutData: settlement on a layer without stiffness,
// Schmertmann without E′ or q_c, and a footing that lifts in every load
// are NOT OK with "not verified" reasons, and the run exits 1.
func TestNoPassWithoutData(t *testing.T) {
	out, errs, code := runCmd("check", "testdata/notverified")
	if code != exitNotOK {
		t.Fatalf("status %d, want 1\n%s%s", code, out, errs)
	}
	for _, want := range []string{
		"0 OK, 3 NOT OK",
		"F settlement: s_total <= s_lim (testdata/notverified/01-no-data.md:32): not verified: Clay has no E_u, E′, m_v or C_c",
		"FS settlement: s_total <= s_lim (testdata/notverified/01-no-data.md:36): not verified: Sand has no E′ or q_c for Schmertmann's method",
		"U bearing: V_d > 0 (testdata/notverified/01-no-data.md:50): bearing not verified: V_d ≤ 0 in every design load",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q", want)
		}
	}
	js, _, _ := runCmd("check", "--json", "testdata/notverified")
	if !strings.Contains(js, `"reason": "not verified: Clay has no E_u`) || !strings.Contains(js, `"utilisation": null`) {
		t.Error("JSON lacks the reason or gives a utilisation")
	}
}
