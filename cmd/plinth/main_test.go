package main

import (
	"bytes"
	"encoding/json"
	"flag"
	"github.com/plinth-calc/plinth/internal/golden"
	"os"
	"path/filepath"
	"sort"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "rewrite golden files")

const example = "../../examples/brackenfield"

// runCmd runs plinth with args and returns stdout, stderr and the status.
func runCmd(args ...string) (string, string, int) {
	var out, errb bytes.Buffer
	code := run(args, &out, &errb)
	return out.String(), errb.String(), code
}

// TestCommands checks arguments against output and exit status.
func TestCommands(t *testing.T) {
	for _, c := range []struct {
		name   string
		args   []string
		status int
		stdout []string // substrings
		stderr []string
	}{
		{"no args", nil, 2, nil, []string{"Usage:"}},
		{"help", []string{"help"}, 0, []string{"plinth check PATH"}, nil},
		{"unknown command", []string{"draw"}, 2, nil, []string{`unknown command "draw"`}},
		{"check example", []string{"check", example}, 0,
			[]string{"01-ground.md — Ground models and design parameters", "site.firm_to_stiff_sandy_clay.c_u", "P1 bearing: V_d <= R_d", "13 checks: 13 OK, 0 NOT OK"}, nil},
		{"flags after path", []string{"check", example, "--set", "site.firm_to_stiff_sandy_clay.c_u=55kPa"}, 0,
			[]string{"VARIANT: site.firm_to_stiff_sandy_clay.c_u=55kPa"}, nil},
		{"check NOT OK exits 1", []string{"check", example, "--set=P1.B=1.6m"}, 1, []string{"NOT OK"}, nil},
		{"missing path", []string{"check"}, 2, nil, []string{"check needs a PATH"}},
		{"no such path", []string{"check", "no/such/dir"}, 2, nil, []string{"no/such/dir: cannot read"}},
		{"unknown flag", []string{"check", example, "--colour"}, 2, nil, []string{"unknown flag --colour"}},
		{"bad --set", []string{"check", example, "--set", "c_u=55kPx", "--set", "P1.B=2kPa", "--set", "q_SLS_P1=1kPa"}, 2, nil,
			[]string{`--set c_u=55kPx:1:7: unknown unit "kPx"`, "--set P1.B=2kPa:1:6: P1.B is a length (m) but the value given is a stress (kPa)",
				"q_SLS_P1 on 03-pad-p1.md is calculated", "3 errors"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			out, errs, code := runCmd(c.args...)
			if code != c.status {
				t.Errorf("status %d, want %d\nstdout:\n%s\nstderr:\n%s", code, c.status, out, errs)
			}
			for _, s := range c.stdout {
				if !strings.Contains(out, s) {
					t.Errorf("stdout lacks %q:\n%s", s, out)
				}
			}
			for _, s := range c.stderr {
				if !strings.Contains(errs, s) {
					t.Errorf("stderr lacks %q:\n%s", s, errs)
				}
			}
		})
	}
}

// TestJSONGolden compares "check --json" on the example, every block
// included, with testdata/brackenfield.json (-update rewrites it).
func TestJSONGolden(t *testing.T) {
	out, errs, code := runCmd("check", "--json", example)
	if code != 0 {
		t.Fatalf("status %d: %s", code, errs)
	}
	var r jsonReport
	if err := json.Unmarshal([]byte(out), &r); err != nil {
		t.Fatal(err)
	}
	kinds := map[string]int{}
	for _, b := range r.Blocks {
		kinds[b.Kind]++
	}
	for k, n := range map[string]int{"ground": 3, "footing": 5, "bearing": 4, "settlement": 4, "capacity": 1, "differential": 1} {
		if kinds[k] != n {
			t.Errorf("%d %s blocks, want %d", kinds[k], k, n)
		}
	}
	golden.Compare(t, filepath.Join("testdata", "brackenfield.json"), []byte(out), *update)
}

// TestSetChangesDependents changes one ground parameter with --set and
// requires exactly the dependent results to change: the cell itself and
// the results of blocks on that ground model; nothing on the other ground
// models or the loads sheet moves.
func TestSetChangesDependents(t *testing.T) {
	values := func(args ...string) map[string]float64 {
		out, errs, code := runCmd(append([]string{"check", "--json", example}, args...)...)
		if code > 1 {
			t.Fatalf("status %d: %s", code, errs)
		}
		var r jsonReport
		if err := json.Unmarshal([]byte(out), &r); err != nil {
			t.Fatal(err)
		}
		m := map[string]float64{}
		for _, y := range r.Symbols {
			m[y.Name] = y.ValueSI
		}
		return m
	}
	base := values()
	varied := values("--set", "site.firm_to_stiff_sandy_clay.c_u=50kPa")
	var changed []string
	for name, v := range base {
		if varied[name] != v {
			changed = append(changed, name)
		}
	}
	sort.Strings(changed)
	dependent := func(name string) bool {
		if name == "site.firm_to_stiff_sandy_clay.c_u" {
			return true
		}
		for _, p := range []string{"P1.", "T1."} { // blocks on ground "site"
			if strings.HasPrefix(name, p) && !strings.Contains(name[len(p):], ".") {
				return true
			}
		}
		return false
	}
	if len(changed) < 3 {
		t.Fatalf("only %v changed", changed)
	}
	for _, n := range changed {
		if !dependent(n) {
			t.Errorf("%s changed but does not depend on the clay's c_u", n)
		}
	}
	for _, must := range []string{"site.firm_to_stiff_sandy_clay.c_u", "P1.util_u", "T1.util_u"} {
		if base[must] == varied[must] {
			t.Errorf("%s did not change", must)
		}
	}
	// c_u does not enter drained bearing or consolidation settlement.
	for _, same := range []string{"P1.util_dr", "P1.s_c", "T1.s_c", "S1.R_d", "OR1.R_d", "G_C4"} {
		if base[same] != varied[same] {
			t.Errorf("%s changed: %v → %v", same, base[same], varied[same])
		}
	}
}

// TestReadmeTutorial evaluates the sheet the README's tutorial asks a
// newcomer to write: it must check clean.
func TestReadmeTutorial(t *testing.T) {
	readme, err := os.ReadFile("../../README.md")
	if err != nil {
		t.Fatal(err)
	}
	s := string(readme)
	i := strings.Index(s, "````markdown\n")
	j := strings.Index(s[i+13:], "````")
	if i < 0 || j < 0 {
		t.Fatal("README has no tutorial sheet")
	}
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "01-pad.md"), []byte(s[i+13:i+13+j]), 0o644); err != nil {
		t.Fatal(err)
	}
	out, errs, code := runCmd("check", dir)
	if code != 0 || !strings.Contains(out, "F1 bearing: V_d <= R_d") || !strings.Contains(out, "F1 settlement") {
		t.Errorf("status %d\n%s\n%s", code, out, errs)
	}
}

// TestCheckGolden compares the readable "check" output on the example
// with testdata/brackenfield.txt (-update rewrites it).
func TestCheckGolden(t *testing.T) {
	out, errs, code := runCmd("check", example)
	if code != 0 {
		t.Fatalf("status %d: %s", code, errs)
	}
	golden.Compare(t, filepath.Join("testdata", "brackenfield.txt"), []byte(out), *update)
}

// TestInit writes the starter package, which must check clean, and
// refuses to write over it a second time.
func TestInit(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "job")
	if out, errs, code := runCmd("init", dir); code != 0 || !strings.Contains(out, "02-pad.md") {
		t.Fatalf("init: status %d\n%s%s", code, out, errs)
	}
	if out, errs, code := runCmd("check", dir); code != 0 {
		t.Errorf("the starter package does not check clean: status %d\n%s%s", code, out, errs)
	}
	if _, errs, code := runCmd("init", dir); code != 2 || !strings.Contains(errs, "already exists") {
		t.Errorf("second init: status %d, %s", code, errs)
	}
}
