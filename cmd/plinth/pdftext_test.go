package main

import (
	"encoding/json"
	"github.com/plinth-calc/plinth/internal/tools"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/units"
)

// TestPDFMatchesJSON renders the example and reads it back with
// pdftotext: every result of every engine block reported by check --json
// must be printed, in its display unit, on the pages of the sheet that
// holds the block, and every check's verdict must be in the register.
func TestPDFMatchesJSON(t *testing.T) {
	pdftotext := tools.Need(t, "pdftotext")
	out, errs, code := runCmd("check", "--json", example)
	if code != 0 {
		t.Fatalf("check: status %d: %s", code, errs)
	}
	var r jsonReport
	if err := json.Unmarshal([]byte(out), &r); err != nil {
		t.Fatal(err)
	}
	file := filepath.Join(t.TempDir(), "b.pdf")
	if _, errs, code := runCmd("render", example, "-o", file); code != 0 {
		t.Fatalf("render: status %d: %s", code, errs)
	}
	text, err := exec.Command(pdftotext, "-enc", "UTF-8", file, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	pages := strings.Split(string(text), "\f")
	// The pages of each sheet: those whose title block carries its calc number.
	calc := map[string]string{}
	sheetText := func(file string) string {
		no := calc[file]
		if no == "" {
			data := string(mustRead(t, file))
			i := strings.Index(data, "calc: \"")
			if i < 0 {
				t.Fatalf("%s has no calc number", file)
			}
			no = data[i+7 : i+7+strings.IndexByte(data[i+7:], '"')]
			calc[file] = no
		}
		var b strings.Builder
		for _, p := range pages {
			if strings.Contains(p, no) {
				b.WriteString(p)
			}
		}
		return strings.ReplaceAll(b.String(), "\n", " ")
	}
	symbols := map[string]jsonSymbol{}
	for _, y := range r.Symbols {
		symbols[y.Name] = y
	}
	n := 0
	for _, b := range r.Blocks {
		if b.Kind == "ground" || b.Kind == "footing" {
			continue
		}
		page := sheetText(b.File)
		for name := range b.Results {
			y, ok := symbols[b.Name+"."+name]
			if !ok {
				t.Errorf("%s %s: result %s is not a symbol", b.Kind, b.Name, name)
				continue
			}
			u, err := units.Parse(y.Unit)
			if err != nil {
				t.Fatal(err)
			}
			v := units.Format(y.ValueSI, u, -1)
			if strings.HasPrefix(name, "util") {
				v = units.Utilisation(y.ValueSI) // utilisations print to two decimals
			}
			if !strings.Contains(page, v) {
				t.Errorf("%s %s: %s = %s %s (from --json) is not printed on its sheet", b.Kind, b.Name, name, v, y.Unit)
			}
			n++
		}
	}
	if n < 40 {
		t.Errorf("only %d results compared", n)
	}
	all := string(text)
	for _, c := range r.Checks {
		if !strings.Contains(all, map[bool]string{true: "OK", false: "NOT OK"}[c.OK]) {
			t.Errorf("verdict of %s not printed", c.Expr)
		}
	}
}

func mustRead(t *testing.T, path string) []byte {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	return data
}
