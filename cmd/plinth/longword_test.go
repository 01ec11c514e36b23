package main

import (
	"os"
	"path/filepath"
	"regexp"
	"runtime"
	"runtime/debug"
	"strings"
	"testing"
)

// TestLongWord renders sheets holding one 100,000-character word in a
// title, a calc number, a table cell, a reference and a paragraph, under a
// soft memory limit. Each must give a PDF (the word broken) or errors at
// their path:line:col, never a panic, an internal error or runaway memory.
func TestLongWord(t *testing.T) {
	w := strings.Repeat("a", 100000)
	digits := "1" + strings.Repeat("0", 99999)
	cases := []struct {
		name, sheet string
		pdf         bool // a PDF is expected (the word is broken)
	}{
		{"title", "---\ntitle: T" + w + "\ncalc: \"1\"\n---\n\nText.\n", false},
		{"number", "---\ntitle: T\ncalc: \"1\"\n---\n\n```calc\nx = " + digits + " m # long\n```\n", false},
		{"cell", "---\ntitle: T\ncalc: \"1\"\n---\n\n| a | b |\n| --- | --- |\n| " + w + " | 1 |\n", false},
		{"reference", "---\ntitle: T\ncalc: \"1\"\nreferences:\n  LONG: https://example.com/" + w + "\n---\n\nSee [LONG].\n", true},
		{"prose", "---\ntitle: T\ncalc: \"1\"\n---\n\nA " + w + " word.\n", true},
		{"url", "---\ntitle: T\ncalc: \"1\"\n---\n\nAt https://example.com/" + strings.Repeat("ab/", 30000) + " now.\n", true},
	}
	old := debug.SetMemoryLimit(1 << 30)
	defer debug.SetMemoryLimit(old)
	at := regexp.MustCompile(`01-a\.md:\d+:\d+: `)
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			dir := filepath.Join(t.TempDir(), "pkg")
			if err := os.MkdirAll(dir, 0o755); err != nil {
				t.Fatal(err)
			}
			if err := os.WriteFile(filepath.Join(dir, "01-a.md"), []byte(c.sheet), 0o644); err != nil {
				t.Fatal(err)
			}
			runtime.GC()
			var before, after runtime.MemStats
			runtime.ReadMemStats(&before)
			_, errs, code := runCmd("render", dir)
			runtime.ReadMemStats(&after)
			if strings.Contains(errs, "internal error") || strings.Contains(errs, "panic") {
				t.Fatalf("stderr: %.400s", errs)
			}
			if grown := after.TotalAlloc - before.TotalAlloc; grown > 1<<30 {
				t.Errorf("allocated %d MB", grown>>20)
			}
			if after.HeapSys > 1<<30 {
				t.Errorf("heap grew to %d MB", after.HeapSys>>20)
			}
			_, statErr := os.Stat(dir + ".pdf")
			switch {
			case code == exitOK || code == exitNotOK:
				if statErr != nil {
					t.Fatalf("status %d and no PDF: %v", code, statErr)
				}
				if !c.pdf {
					t.Logf("rendered (the word broken)")
				}
			case code == exitErrors:
				if c.pdf {
					t.Errorf("want a PDF, got errors: %.400s", errs)
				}
				for _, l := range strings.Split(strings.TrimSpace(errs), "\n") {
					if !at.MatchString(l) && !regexp.MustCompile(`^\d+ errors?$`).MatchString(l) {
						t.Errorf("error without its position: %.200s", l)
					}
				}
			default:
				t.Fatalf("status %d: %.400s", code, errs)
			}
		})
	}
}
