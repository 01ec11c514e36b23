package main

import (
	"encoding/json"
	"github.com/plinth-calc/plinth/internal/tools"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestSingleSheetWithUses reissues one calculation of the example by
// itself: the sheets it uses are pulled in as context (evaluated, not
// printed), so its results equal those of the whole package.
func TestSingleSheetWithUses(t *testing.T) {
	sheet := filepath.Join(example, "03-pad-p1.md")
	out, errs, code := runCmd("check", "--json", sheet)
	if code != exitOK {
		t.Fatalf("status %d\n%s", code, errs)
	}
	var alone jsonReport
	if err := json.Unmarshal([]byte(out), &alone); err != nil {
		t.Fatal(err)
	}
	if got := strings.Join(alone.Context, ","); got != "01-ground.md,02-loads.md" {
		t.Errorf("context = %q, want the two used sheets", got)
	}
	out, _, _ = runCmd("check", "--json", example)
	var whole jsonReport
	if err := json.Unmarshal([]byte(out), &whole); err != nil {
		t.Fatal(err)
	}
	want := map[string]float64{}
	for _, y := range whole.Symbols {
		if y.File == sheet {
			want[y.Name] = y.ValueSI
		}
	}
	if len(alone.Symbols) != len(want) {
		t.Errorf("%d symbols alone, %d for the sheet in the package", len(alone.Symbols), len(want))
	}
	for _, y := range alone.Symbols {
		if y.File != sheet {
			t.Errorf("symbol %s of %s listed: context sheets are not listed", y.Name, y.File)
		} else if w, ok := want[y.Name]; !ok || w != y.ValueSI {
			t.Errorf("%s = %g alone, %g in the package", y.Name, y.ValueSI, w)
		}
	}
	o := filepath.Join(t.TempDir(), "p1.pdf")
	if _, errs, code := runCmd("render", sheet, "-o", o); code != exitOK {
		t.Fatalf("render: status %d\n%s", code, errs)
	}
	text, err := exec.Command(tools.Need(t, "pdftotext"), o, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	s := string(text)
	if !strings.Contains(s, "01-ground.md, 02-loads.md: used by this sheet") {
		t.Error("the cover does not name the context sheets")
	}
	if strings.Contains(s, "Ground model") {
		t.Error("a context sheet was printed")
	}
}
