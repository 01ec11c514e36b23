package load_test

import (
	"errors"
	"io/fs"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/load"
)

// write creates files under dir; a name ending in "/" is a folder.
func write(t *testing.T, dir string, names ...string) {
	t.Helper()
	for _, n := range names {
		p := filepath.Join(dir, filepath.FromSlash(n))
		if strings.HasSuffix(n, "/") {
			if err := os.MkdirAll(p, 0o755); err != nil {
				t.Fatal(err)
			}
			continue
		}
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte("# "+n+"\n"), 0o644); err != nil {
			t.Fatal(err)
		}
	}
}

func names(p *load.Package) []string {
	var out []string
	for _, f := range p.Files() {
		out = append(out, filepath.Base(f.Path))
	}
	return out
}

func TestFolder(t *testing.T) {
	dir := t.TempDir()
	write(t, dir, "02-loads.md", "01-ground.md", "10-late.md", "README.md", "readme.MD", "_draft.md",
		".hidden.md", "notes.txt", "package.yaml", "sub/03-deep.md", "figures/", "dir.md/", "03-UPPER.MD")
	p, diags := load.Path(dir)
	if len(diags) != 0 {
		t.Fatalf("diagnostics: %v", diags)
	}
	got := strings.Join(names(p), " ")
	want := "package.yaml 01-ground.md 02-loads.md 03-UPPER.MD 10-late.md"
	if got != want {
		t.Errorf("files = %s, want %s", got, want)
	}
	if p.Single || p.Config == nil || p.Dir != filepath.Clean(dir) {
		t.Errorf("Single=%v Config=%v Dir=%q", p.Single, p.Config != nil, p.Dir)
	}
	if p.Sheets[0].Path != filepath.Join(dir, "01-ground.md") {
		t.Errorf("path = %q", p.Sheets[0].Path)
	}
}

func TestSingle(t *testing.T) {
	dir := t.TempDir()
	write(t, dir, "01-a.md", "02-b.md", "package.yaml")
	p, diags := load.Path(filepath.Join(dir, "02-b.md"))
	if len(diags) != 0 {
		t.Fatalf("diagnostics: %v", diags)
	}
	if got := strings.Join(names(p), " "); got != "package.yaml 02-b.md" || !p.Single {
		t.Errorf("files = %s, Single = %v", got, p.Single)
	}
}

func TestRelativeDot(t *testing.T) {
	dir := t.TempDir()
	write(t, dir, "01-a.md")
	t.Chdir(dir)
	p, diags := load.Path(".")
	if len(diags) != 0 || p.Sheets[0].Path != "01-a.md" {
		t.Fatalf("path %q, diagnostics %v", p.Sheets[0].Path, diags)
	}
}

func TestProblems(t *testing.T) {
	dir := t.TempDir()
	write(t, dir, "empty/", "notes.txt", "warn/01.md", "warn/package.yml")
	for _, c := range []struct {
		path, msg string
		nilPkg    bool
	}{
		{"missing", "cannot read: no such file or directory", true},
		{"empty", "no sheets in this folder: expected .md files (README.md and names starting with _ are not sheets)", false},
		{"notes.txt", "not a sheet: expected a .md file or a package folder", true},
		{"warn", "warning: package.yml is not read: the package settings file is named package.yaml", false},
	} {
		p, diags := load.Path(filepath.Join(dir, c.path))
		if len(diags) != 1 || !strings.HasSuffix(diags[0].Error(), ": "+c.msg) {
			t.Errorf("%s: diagnostics %v, want %q", c.path, diags, c.msg)
		}
		if (p == nil) != c.nilPkg {
			t.Errorf("%s: package nil = %v", c.path, p == nil)
		}
	}
}

func TestReadInside(t *testing.T) {
	base := t.TempDir()
	dir := filepath.Join(base, "pkg")
	write(t, base, "pkg/01.md", "pkg/figures/a.png", "secret.txt", "pkg/sub/")
	must := func(err error) {
		if err != nil {
			t.Fatal(err)
		}
	}
	must(os.Symlink(filepath.Join(base, "secret.txt"), filepath.Join(dir, "escape.png")))
	must(os.Symlink(filepath.Join(base), filepath.Join(dir, "up")))
	must(os.Symlink("figures/a.png", filepath.Join(dir, "inside.png")))
	p, diags := load.Path(dir)
	if p == nil {
		t.Fatal(diags)
	}
	for _, c := range []struct {
		rel  string
		want error // nil, load.ErrOutside or fs.ErrNotExist; other errors as "other"
		ok   bool
	}{
		{"figures/a.png", nil, true},
		{"./figures/../figures/a.png", nil, true},
		{"inside.png", nil, true},
		{"../secret.txt", load.ErrOutside, false},
		{"figures/../../secret.txt", load.ErrOutside, false},
		{"..", load.ErrOutside, false},
		{filepath.Join(base, "secret.txt"), load.ErrOutside, false},
		{"/etc/hostname", load.ErrOutside, false},
		{"escape.png", load.ErrOutside, false},
		{"up/secret.txt", load.ErrOutside, false},
		{"figures/b.png", fs.ErrNotExist, false},
		{"sub", nil, false},
		{"", nil, false},
	} {
		data, err := p.ReadInside(c.rel)
		switch {
		case c.ok:
			if err != nil || !strings.HasPrefix(string(data), "# pkg/figures/a.png") {
				t.Errorf("%q: %q, %v", c.rel, data, err)
			}
		case c.want != nil:
			if !errors.Is(err, c.want) {
				t.Errorf("%q: error %v, want %v", c.rel, err, c.want)
			}
		default:
			if err == nil || errors.Is(err, load.ErrOutside) || errors.Is(err, fs.ErrNotExist) {
				t.Errorf("%q: error %v, want another error", c.rel, err)
			}
		}
	}
	var mem load.Package
	if _, err := mem.ReadInside("a.png"); err == nil {
		t.Error("an in-memory package read a file")
	}
}

// TestLinkedSheetOutside: a sheet or package.yaml that is a symbolic link
// to a file outside the package folder is refused, naming the link; one
// pointing inside is read.
func TestLinkedSheetOutside(t *testing.T) {
	base := t.TempDir()
	dir := filepath.Join(base, "pkg")
	must := func(err error) {
		t.Helper()
		if err != nil {
			t.Fatal(err)
		}
	}
	must(os.MkdirAll(filepath.Join(dir, "drafts"), 0o755))
	must(os.WriteFile(filepath.Join(base, "outside.md"), []byte("# x\n"), 0o644))
	must(os.WriteFile(filepath.Join(base, "p.yaml"), []byte("project: X\n"), 0o644))
	must(os.WriteFile(filepath.Join(dir, "drafts", "in.md"), []byte("# y\n"), 0o644))
	must(os.Symlink("../outside.md", filepath.Join(dir, "01-out.md")))
	must(os.Symlink("drafts/in.md", filepath.Join(dir, "02-in.md")))
	must(os.Symlink("../p.yaml", filepath.Join(dir, "package.yaml")))
	p, diags := load.Path(dir)
	if p == nil || len(p.Sheets) != 1 || !strings.HasSuffix(p.Sheets[0].Path, "02-in.md") {
		t.Fatalf("sheets %v", p)
	}
	if p.Config != nil {
		t.Error("package.yaml outside the folder was read")
	}
	got := diags.Error()
	for _, want := range []string{"01-out.md: cannot read: 01-out.md is a link to", "package.yaml: cannot read: package.yaml is a link to", "outside the package folder"} {
		if !strings.Contains(got, want) {
			t.Errorf("diagnostics %q lack %q", got, want)
		}
	}
}
