package parse_test

import (
	"bytes"
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/golden"
)

var update = flag.Bool("update", false, "rewrite golden files")

// dumpPackage writes the settings, every sheet's tree and the diagnostics.
func dumpPackage(pkg *sheet.Package, diags source.List) []byte {
	var b bytes.Buffer
	fmt.Fprintf(&b, "Package %s\n", filepath.ToSlash(pkg.Dir))
	for _, f := range pkg.Files {
		fmt.Fprintf(&b, "File %s\n", filepath.ToSlash(f.Path))
	}
	sheet.DumpMeta(&b, &pkg.Meta)
	for _, s := range pkg.Sheets {
		sheet.Dump(&b, s)
	}
	for _, d := range diags {
		fmt.Fprintf(&b, "diagnostic %s\n", d.Error())
	}
	return b.Bytes()
}

// TestGolden parses each package under testdata/good and compares an
// outline of its tree with NAME.golden (go test -update rewrites them).
func TestGolden(t *testing.T) {
	dirs, _ := filepath.Glob("testdata/good/*")
	n := 0
	for _, dir := range dirs {
		if fi, err := os.Stat(dir); err != nil || !fi.IsDir() {
			continue
		}
		n++
		t.Run(filepath.Base(dir), func(t *testing.T) {
			p, diags := load.Path(dir)
			if p == nil {
				t.Fatal(diags)
			}
			pkg, d := parse.Package(p)
			diags.Append(d)
			if diags.HasErrors() {
				t.Errorf("a good package has errors:\n%v", diags)
			}
			got := dumpPackage(pkg, diags)
			golden.Compare(t, dir+".golden", got, *update)
		})
	}
	if n == 0 {
		t.Fatal("no packages in testdata/good")
	}
}

// diff lists the first differing lines of two trees.
func diff(want, got string) string {
	w, g := strings.Split(want, "\n"), strings.Split(got, "\n")
	var b strings.Builder
	shown := 0
	for i := 0; i < max(len(w), len(g)) && shown < 10; i++ {
		var a, c string
		if i < len(w) {
			a = w[i]
		}
		if i < len(g) {
			c = g[i]
		}
		if a != c {
			fmt.Fprintf(&b, "line %d\n  want: %s\n  got:  %s\n", i+1, a, c)
			shown++
		}
	}
	return b.String()
}

// TestCRLF checks that CRLF line endings give the same tree, positions
// included, as LF.
func TestCRLF(t *testing.T) {
	files, _ := filepath.Glob("testdata/good/*/*.md")
	if len(files) == 0 {
		t.Fatal("no sheets in testdata/good")
	}
	for _, name := range files {
		text, err := os.ReadFile(name)
		if err != nil {
			t.Fatal(err)
		}
		crlf := bytes.ReplaceAll(text, []byte("\n"), []byte("\r\n"))
		var a, b bytes.Buffer
		s1, d1 := parse.Sheet(source.NewFile(name, text))
		s2, d2 := parse.Sheet(source.NewFile(name, crlf))
		sheet.Dump(&a, s1)
		sheet.Dump(&b, s2)
		if a.String() != b.String() {
			t.Errorf("%s: CRLF tree differs:\n%s", name, diff(a.String(), b.String()))
		}
		if d1.Error() != d2.Error() {
			t.Errorf("%s: CRLF diagnostics differ:\n%v\n---\n%v", name, d1, d2)
		}
	}
}
