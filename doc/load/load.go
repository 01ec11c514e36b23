package load

import (
	"errors"
	"fmt"
	"io/fs"
	"os"
	"path"
	"path/filepath"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/doc/source"
)

// configName is the name of the package settings file.
const configName = "package.yaml"

// Package is a package's source files as read from disk.
type Package struct {
	Dir    string         // the package folder as the user wrote it ("." for the working folder)
	Root   string         // the folder's absolute path, symbolic links resolved ("" in memory)
	Config *source.File   // package.yaml; nil when absent
	Sheets []*source.File // in file-name order
	Single bool           // a single sheet was named rather than a folder
	// Context holds, for a single-sheet run, the folder's other sheets in
	// file-name order: doc/parse pulls in those the sheet uses (directly or
	// through another used sheet) as context, evaluated but not printed.
	Context []*source.File
}

// Files returns every source file: package.yaml first when present, then
// the sheets in order.
func (p *Package) Files() []*source.File {
	var out []*source.File
	if p.Config != nil {
		out = append(out, p.Config)
	}
	return append(out, p.Sheets...)
}

// IsSheet reports whether a file name in a package folder is a sheet: it
// ends in ".md" (any case), does not start with "_" or ".", and is not
// README.md (any case).
func IsSheet(name string) bool {
	if len(name) < 4 || !strings.EqualFold(name[len(name)-3:], ".md") {
		return false
	}
	if name[0] == '_' || name[0] == '.' || strings.EqualFold(name, "README.md") {
		return false
	}
	return true
}

// Path loads the package at p: a folder, or a single .md sheet. Problems
// (a missing path, a folder without sheets, an unreadable file) are
// returned as diagnostics naming the path; the package is nil only when
// nothing could be loaded.
func Path(p string) (*Package, source.List) {
	var diags source.List
	fail := func(where, format string, args ...any) {
		diags = append(diags, source.Diagnostic{Path: where, Msg: fmt.Sprintf(format, args...)})
	}
	info, err := os.Stat(p)
	if err != nil {
		fail(p, "cannot read: %s", describe(err))
		return nil, diags
	}
	pkg := &Package{Dir: filepath.Clean(p)}
	var names, others []string
	if info.IsDir() {
		entries, err := os.ReadDir(p)
		if err != nil {
			fail(p, "cannot read folder: %s", describe(err))
			return nil, diags
		}
		for _, e := range entries {
			if !IsSheet(e.Name()) {
				continue
			}
			if t := e.Type(); t.IsDir() || !(t.IsRegular() || t&fs.ModeSymlink != 0) {
				continue
			}
			names = append(names, e.Name())
		}
		sort.Strings(names)
		if len(names) == 0 {
			fail(p, "no sheets in this folder: expected .md files (README.md and names starting with _ are not sheets)")
		}
	} else {
		if !strings.EqualFold(filepath.Ext(p), ".md") {
			fail(p, "not a sheet: expected a .md file or a package folder")
			return nil, diags
		}
		pkg.Dir = filepath.Dir(pkg.Dir)
		pkg.Single = true
		names = []string{filepath.Base(p)}
		others = siblings(pkg.Dir, names[0])
	}
	if root, err := filepath.Abs(pkg.Dir); err == nil {
		if real, err := filepath.EvalSymlinks(root); err == nil {
			pkg.Root = real
		}
	}
	if pkg.Root == "" {
		fail(pkg.Dir, "cannot resolve the package folder")
		return nil, diags
	}

	join := func(name string) string {
		if pkg.Dir == "." {
			return name
		}
		return filepath.Join(pkg.Dir, name)
	}
	// Every file is read through ReadInside: a sheet or package.yaml that
	// is a symbolic link to a file outside the package folder is refused.
	if text, err := pkg.ReadInside(configName); err == nil {
		pkg.Config = source.NewFile(join(configName), text)
	} else if !errors.Is(err, fs.ErrNotExist) {
		fail(join(configName), "cannot read: %s", describe(err))
	}
	if _, err := os.Stat(join("package.yml")); err == nil {
		diags = append(diags, source.Diagnostic{Severity: source.Warning, Path: join("package.yml"),
			Msg: "package.yml is not read: the package settings file is named package.yaml"})
	}
	for _, name := range names {
		text, err := pkg.ReadInside(name)
		if err != nil {
			fail(join(name), "cannot read: %s", describe(err))
			continue
		}
		pkg.Sheets = append(pkg.Sheets, source.NewFile(join(name), text))
	}
	for _, name := range others {
		// A sibling that cannot be read is reported only if the sheet uses
		// it (doc/parse finds it missing from Context).
		if text, err := pkg.ReadInside(name); err == nil {
			pkg.Context = append(pkg.Context, source.NewFile(join(name), text))
		}
	}
	diags.Sort()
	return pkg, diags
}

// siblings lists the other sheets of dir (see IsSheet), in file-name
// order, leaving out the sheet named self.
func siblings(dir, self string) []string {
	entries, err := os.ReadDir(dir)
	if err != nil {
		return nil
	}
	var out []string
	for _, e := range entries {
		if !IsSheet(e.Name()) || e.Name() == self {
			continue
		}
		if t := e.Type(); t.IsDir() || !(t.IsRegular() || t&fs.ModeSymlink != 0) {
			continue
		}
		out = append(out, e.Name())
	}
	sort.Strings(out)
	return out
}

// ErrOutside is the error (wrapped) for a path that is absolute or leads
// outside the package folder.
var ErrOutside = errors.New("the path leads outside the package folder")

// Resolve checks that rel, a slash-separated path relative to the package
// folder, names an existing file inside it, and returns its real path.
// Absolute paths, paths climbing out with "..", and symbolic links whose
// target lies outside the folder give an error wrapping ErrOutside; a
// missing file gives one satisfying errors.Is(err, fs.ErrNotExist).
func (p *Package) Resolve(rel string) (string, error) {
	if p.Root == "" {
		return "", errors.New("no package folder to read from")
	}
	if rel == "" {
		return "", errors.New("empty path")
	}
	slashed := filepath.ToSlash(rel)
	if filepath.IsAbs(rel) || strings.HasPrefix(slashed, "/") || filepath.VolumeName(rel) != "" {
		return "", fmt.Errorf("%s is an absolute path: %w", rel, ErrOutside)
	}
	clean := path.Clean(slashed)
	if clean == ".." || strings.HasPrefix(clean, "../") {
		return "", fmt.Errorf("%s climbs out with ..: %w", rel, ErrOutside)
	}
	real, err := filepath.EvalSymlinks(filepath.Join(p.Root, filepath.FromSlash(clean)))
	if err != nil {
		return "", err
	}
	if r, err := filepath.Rel(p.Root, real); err != nil || r == ".." || strings.HasPrefix(r, ".."+string(filepath.Separator)) {
		return "", fmt.Errorf("%s is a link to %s: %w", rel, real, ErrOutside)
	}
	info, err := os.Stat(real)
	if err != nil {
		return "", err
	}
	if !info.Mode().IsRegular() {
		return "", fmt.Errorf("%s is not a file", rel)
	}
	return real, nil
}

// ReadInside reads the file rel inside the package folder (see Resolve).
func (p *Package) ReadInside(rel string) ([]byte, error) {
	real, err := p.Resolve(rel)
	if err != nil {
		return nil, err
	}
	return os.ReadFile(real)
}

// describe shortens an os error to its cause ("no such file or directory").
func describe(err error) string {
	if errors.Is(err, ErrOutside) {
		return err.Error() + "; plinth reads only files inside the package folder"
	}
	var pe *fs.PathError
	if errors.As(err, &pe) {
		return pe.Err.Error()
	}
	return err.Error()
}
