package parse_test

import (
	"testing"

	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/badcase"
)

// badDir holds the bad-input cases shared by every stage: see its README.
const badDir = "../../testdata/bad"

// TestBad runs every case of testdata/bad through load and parse and
// compares the diagnostics with the annotations: each top-level .md file
// is a single-sheet case, each pkg-* folder a package case.
func TestBad(t *testing.T) {
	n := badcase.Run(t, badDir, func(path string) source.List {
		p, diags := load.Path(path)
		if p != nil {
			_, d := parse.Package(p)
			diags.Append(d)
		}
		return diags
	})
	if n < 10 {
		t.Errorf("only %d bad-input cases found in %s", n, badDir)
	}
}
