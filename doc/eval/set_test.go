package eval_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// setSheet is the README's tutorial ground model with a calc input.
const setSheet = "---\ntitle: Set\n---\n\n```calc\nc_u = 60 kPa\n```\n\n```ground site\nwater = 1.5 m\n\n" +
	"| layer     | top (m) | gamma (kN/m3) | gamma_sat (kN/m3) | c_u (kPa) | phi' (deg) | c' (kPa) |\n" +
	"| ---       | ---     | ---           | ---               | ---       | ---        | ---      |\n" +
	"| Fill      | 0.0     | 18            | 19                |           | 28         | 0        |\n" +
	"| Firm clay | 0.6     | 19            | 20                | 60        | 24         | 3        |\n```\n"

// TestSetReadme runs the README's --set examples and the "did you mean"
// for a misspelt table cell.
func TestSetReadme(t *testing.T) {
	f := source.NewFile("01-ground.md", []byte(setSheet))
	s, d := parse.Sheet(f)
	if d.HasErrors() {
		t.Fatal(d)
	}
	pkg := &sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}
	for _, tt := range []struct{ set, want string }{
		{"c_u=55kPa", ""},
		{"site.firm_clay.c_u=55kPa", ""},
		{"01-ground.md:c_u=55kPa", ""},
		{"site.firm_clay.cu=55kPa", "did you mean site.firm_clay.c_u?"},
	} {
		_, d := eval.Package(pkg, eval.Options{Set: []string{tt.set}})
		got := ""
		if len(d) > 0 {
			got = d.Error()
		}
		if (tt.want == "") != (got == "") || !strings.Contains(got, tt.want) {
			t.Errorf("--set %s: %q, want %q", tt.set, got, tt.want)
		}
	}
}
