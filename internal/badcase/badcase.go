// Package badcase runs bad-input test cases: input files with the
// diagnostics they must produce written beside the input (see
// testdata/bad/README.md). Each stage's test calls Run with the folder of
// its cases and a function taking a case's path through that stage.
package badcase

import (
	"bufio"
	"bytes"
	"fmt"
	"os"
	"path/filepath"
	"regexp"
	"sort"
	"strconv"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/load"
	"github.com/plinth-calc/plinth/doc/source"
)

// annotation matches an expected diagnostic written in a case file:
// <!-- ERROR 12:1 message --> in prose, # ERROR 12:1 message in YAML and
// inside plinth blocks; WARNING in place of ERROR for a warning.
var annotation = regexp.MustCompile(`(?:<!--|#)\s*(ERROR|WARNING) (\d+):(\d+) (.*?)\s*(?:-->)?\s*$`)

// Expect is one expected (or produced) diagnostic.
type Expect struct {
	Path      string
	Line, Col int
	Sev       string
	Msg       string
}

func (e Expect) String() string {
	return fmt.Sprintf("%s:%d:%d: %s %s", filepath.Base(e.Path), e.Line, e.Col, e.Sev, e.Msg)
}

// Expectations reads the annotations of a file, and of its sidecar
// NAME.want (one "ERROR 1:1 message" per line) for files that cannot hold
// them (an empty file).
func Expectations(path string) []Expect {
	var out []Expect
	read := func(file string, bare bool) {
		text, err := os.ReadFile(file)
		if err != nil {
			return
		}
		sc := bufio.NewScanner(bytes.NewReader(text))
		for sc.Scan() {
			line := sc.Text()
			if bare {
				line = "# " + line
			}
			if g := annotation.FindStringSubmatch(line); g != nil {
				l, _ := strconv.Atoi(g[2])
				c, _ := strconv.Atoi(g[3])
				out = append(out, Expect{path, l, c, g[1], g[4]})
			}
		}
	}
	read(path, false)
	read(path+".want", true)
	return out
}

// Got converts a produced diagnostic for comparison.
func Got(d source.Diagnostic) Expect {
	p := d.Pos()
	sev := "ERROR"
	if d.Severity == source.Warning {
		sev = "WARNING"
	}
	msg := d.Msg
	if d.Hint != "" {
		msg += "; " + d.Hint
	}
	path := p.Path
	if path == "" {
		path = d.Path
	}
	return Expect{path, p.Line, p.Col, sev, msg}
}

// Run runs every case in dir: each top-level sheet (.md) is a single-sheet
// case and each pkg-* folder a package case. run takes the case's path and
// returns the diagnostics; they must equal the annotations exactly. It
// returns the number of cases run.
func Run(t *testing.T, dir string, run func(path string) source.List) int {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, e := range entries {
		name := e.Name()
		path := filepath.Join(dir, name)
		var files []string
		switch {
		case e.IsDir() && strings.HasPrefix(name, "pkg-"):
			files = append(files, filepath.Join(path, "package.yaml"))
			m, _ := filepath.Glob(filepath.Join(path, "*.md"))
			files = append(files, m...)
		case !e.IsDir() && load.IsSheet(name):
			files = []string{path}
		default:
			continue
		}
		n++
		t.Run(name, func(t *testing.T) {
			var want []Expect
			for _, f := range files {
				want = append(want, Expectations(f)...)
			}
			if len(want) == 0 {
				t.Fatalf("%s: a bad-input case without expected diagnostics", path)
			}
			var have []Expect
			for _, d := range run(path) {
				have = append(have, Got(d))
			}
			Compare(t, want, have)
		})
	}
	return n
}

// Compare reports every expected diagnostic missing from have and every
// one in have that was not expected.
func Compare(t *testing.T, want, have []Expect) {
	t.Helper()
	key := func(e Expect) string { return e.String() }
	sort.Slice(want, func(i, j int) bool { return key(want[i]) < key(want[j]) })
	sort.Slice(have, func(i, j int) bool { return key(have[i]) < key(have[j]) })
	used := make([]bool, len(have))
	for _, w := range want {
		found := false
		for i, h := range have {
			if !used[i] && key(h) == key(w) {
				used[i], found = true, true
				break
			}
		}
		if !found {
			t.Errorf("missing:    %s", w)
		}
	}
	for i, h := range have {
		if !used[i] {
			t.Errorf("unexpected: %s", h)
		}
	}
}
