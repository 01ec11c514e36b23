package eval_test

import (
	"fmt"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// genPackage builds n sheets of m statements each: a mix of inputs with
// units, arithmetic, powers, functions and a check, each sheet using the
// one before it.
func genPackage(n, m int) []*source.File {
	var files []*source.File
	for i := 0; i < n; i++ {
		var b strings.Builder
		fmt.Fprintf(&b, "---\ntitle: Sheet %d\n", i)
		if i > 0 {
			fmt.Fprintf(&b, "uses: [s%03d.md]\n", i-1)
		}
		fmt.Fprintf(&b, "---\n\n# Sheet %d\n\nSome prose with {a%d_0}.\n\n```calc\n", i, i)
		for j := 0; j < m; j++ {
			switch {
			case j == 0 && i > 0:
				fmt.Fprintf(&b, "a%d_0 = a%d_%d * 1.01 # carried over\n", i, i-1, m-2)
			case j < 5:
				fmt.Fprintf(&b, "a%d_%d = %d.5 kPa # input %d\n", i, j, j+10, j)
			case j == m-1:
				fmt.Fprintf(&b, "check a%d_%d <= 1e9 kPa # a check\n", i, j-1)
			default:
				fmt.Fprintf(&b, "a%d_%d = sqrt(a%d_%d^2 + (a%d_%d / 2)^2) + max(a%d_%d, 1 kPa) * tan(30 deg) -> kPa:1 # computed\n", i, j, i, j-1, i, j-2, i, j-3)
			}
		}
		b.WriteString("```\n")
		files = append(files, source.NewFile(fmt.Sprintf("s%03d.md", i), []byte(b.String())))
	}
	return files
}

func parsePackage(tb testing.TB, files []*source.File) *sheet.Package {
	p := &sheet.Package{Dir: "gen", Files: files}
	for _, f := range files {
		s, diags := parse.Sheet(f)
		if diags.HasErrors() {
			tb.Fatal(diags)
		}
		p.Sheets = append(p.Sheets, s)
	}
	return p
}

// BenchmarkPackage100x50 evaluates a generated package of 100 sheets × 50
// statements (parsing excluded). Target: under 50 ms on one core, parse
// and evaluation together (see BenchmarkParseEval100x50).
func BenchmarkPackage100x50(b *testing.B) {
	p := parsePackage(b, genPackage(100, 50))
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		if _, diags := eval.Package(p, eval.Options{}); diags.HasErrors() {
			b.Fatal(diags)
		}
	}
}

// BenchmarkParseEval100x50 parses and evaluates the same package.
func BenchmarkParseEval100x50(b *testing.B) {
	files := genPackage(100, 50)
	b.ReportAllocs()
	b.ResetTimer()
	for i := 0; i < b.N; i++ {
		p := parsePackage(b, files)
		if _, diags := eval.Package(p, eval.Options{}); diags.HasErrors() {
			b.Fatal(diags)
		}
	}
}
