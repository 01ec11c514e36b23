// Package golden compares test output with golden files. Each test
// package keeps its own -update flag and passes its value in.
package golden

import (
	"bytes"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// Compare fails t unless got equals the file at path, naming the first
// line that differs. With update set it writes got to path instead
// (creating the folder).
func Compare(t testing.TB, path string, got []byte, update bool) {
	t.Helper()
	if update {
		if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
		return
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run the test with -update to create it)", err)
	}
	if bytes.Equal(got, want) {
		return
	}
	g, w := strings.Split(string(got), "\n"), strings.Split(string(want), "\n")
	for i := 0; i < len(g) && i < len(w); i++ {
		if g[i] != w[i] {
			t.Fatalf("%s differs at line %d:\n got: %q\nwant: %q\n(run with -update to accept, and read the diff)", path, i+1, g[i], w[i])
		}
	}
	t.Fatalf("%s differs in length: got %d lines, want %d (run with -update to accept)", path, len(g), len(w))
}
