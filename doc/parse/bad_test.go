package parse_test

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

	"plinth/doc/load"
	"plinth/doc/parse"
	"plinth/doc/source"
)

// badDir holds the bad-input cases shared by every stage: see its README.
const badDir = "../../testdata/bad"

// annotation matches an expected diagnostic written in a case file:
// <!-- ERROR 12:1 message --> in prose, # ERROR 12:1 message in YAML and
// inside plinth blocks; WARNING in place of ERROR for a warning.
var annotation = regexp.MustCompile(`(?:<!--|#)\s*(ERROR|WARNING) (\d+):(\d+) (.*?)\s*(?:-->)?\s*$`)

type expect struct {
	path      string
	line, col int
	sev       string
	msg       string
}

func (e expect) String() string {
	return fmt.Sprintf("%s:%d:%d: %s %s", filepath.Base(e.path), e.line, e.col, e.sev, e.msg)
}

// expectations reads the annotations of a file, and of its sidecar
// NAME.want (one "ERROR 1:1 message" per line) for files that cannot hold
// them (an empty file).
func expectations(t *testing.T, path string) []expect {
	var out []expect
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
				out = append(out, expect{path, l, c, g[1], g[4]})
			}
		}
	}
	read(path, false)
	read(path+".want", true)
	return out
}

func got(d source.Diagnostic) expect {
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
	return expect{path, p.Line, p.Col, sev, msg}
}

// TestBad runs every case of testdata/bad through load and parse and
// compares the diagnostics with the annotations: each top-level .md file
// is a single-sheet case, each pkg-* folder a package case.
func TestBad(t *testing.T) {
	entries, err := os.ReadDir(badDir)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, e := range entries {
		name := e.Name()
		path := filepath.Join(badDir, name)
		var files []string
		switch {
		case e.IsDir() && strings.HasPrefix(name, "pkg-"):
			for _, f := range []string{"package.yaml"} {
				files = append(files, filepath.Join(path, f))
			}
			m, _ := filepath.Glob(filepath.Join(path, "*.md"))
			files = append(files, m...)
		case !e.IsDir() && load.IsSheet(name):
			files = []string{path}
		default:
			continue
		}
		n++
		t.Run(name, func(t *testing.T) {
			var want []expect
			for _, f := range files {
				want = append(want, expectations(t, f)...)
			}
			if len(want) == 0 {
				t.Fatalf("%s: a bad-input case without expected diagnostics", path)
			}
			p, diags := load.Path(path)
			if p != nil {
				_, d := parse.Package(p)
				diags.Append(d)
			}
			var have []expect
			for _, d := range diags {
				have = append(have, got(d))
			}
			compare(t, want, have)
		})
	}
	if n < 10 {
		t.Errorf("only %d bad-input cases found in %s", n, badDir)
	}
}

func compare(t *testing.T, want, have []expect) {
	t.Helper()
	key := func(e expect) string { return e.String() }
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
