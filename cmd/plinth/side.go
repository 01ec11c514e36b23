package main

import (
	"bufio"
	"bytes"
	"errors"
	"fmt"
	"io"
	"os"
	"os/exec"
	"path"
	"path/filepath"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/source"
)

// A side is one package that diff compares: a folder or sheet on disk, a
// git revision of one (REV:path), or a PDF plinth wrote (its embedded
// inputs). Files that are not on disk are written to a temporary folder,
// removed by close.
type side struct {
	spec  string // as the user wrote it
	dir   string // the temporary folder ("" for a path on disk)
	res   *eval.Result
	diags source.List
	sets  []string // --set overrides in force (from the PDF's manifest)
}

// close removes the side's temporary folder.
func (s *side) close() {
	if s.dir != "" {
		os.RemoveAll(s.dir)
	}
}

// display turns a path of the side's temporary folder into one the user
// can place ("rev-A:calcs/03-pad.md", "old.pdf:03-pad.md").
func (s *side) display(p string) string {
	if s.dir == "" {
		return p
	}
	if rel, err := filepath.Rel(s.dir, p); err == nil && !strings.HasPrefix(rel, "..") {
		rel = filepath.ToSlash(rel)
		if rev, sub, ok := gitSpec(s.spec); ok {
			return rev + ":" + path.Join(path.Dir(strings.TrimSuffix(sub, "/")+"/x"), rel)
		}
		return s.spec + ":" + rel
	}
	return p
}

// where is file:line of a span, as the user can place it.
func (s *side) where(sp source.Span) (string, int) {
	p := sp.Pos()
	return s.display(p.Path), p.Line
}

// gitSpec splits "REV:path"; ok is false when spec has no colon.
func gitSpec(spec string) (rev, p string, ok bool) {
	rev, p, ok = strings.Cut(spec, ":")
	if !ok || rev == "" {
		return "", "", false
	}
	if p == "" {
		p = "."
	}
	return rev, p, true
}

// openSide loads and evaluates spec. An error is returned for a spec
// that cannot be read at all (a missing revision or path, a PDF without
// plinth's inputs); input errors of the package are in s.diags.
func openSide(spec string) (*side, error) {
	s := &side{spec: spec}
	target := spec
	if fi, err := os.Stat(spec); err == nil {
		if !fi.IsDir() && strings.EqualFold(filepath.Ext(spec), ".pdf") {
			data, err := os.ReadFile(spec)
			if err != nil {
				return nil, fmt.Errorf("%s: %v", spec, describe(err))
			}
			in, err := readInputs(data)
			if err != nil {
				return nil, fmt.Errorf("%s: %v", spec, err)
			}
			if s.dir, err = os.MkdirTemp("", "plinth-diff-*"); err != nil {
				return nil, err
			}
			if err := in.writeTo(s.dir); err != nil {
				s.close()
				return nil, fmt.Errorf("%s: %v", spec, err)
			}
			target = in.target(s.dir)
			s.sets = in.man.Sets
		}
	} else if rev, p, ok := gitSpec(spec); ok {
		dir, err := os.MkdirTemp("", "plinth-diff-*")
		if err != nil {
			return nil, err
		}
		s.dir = dir
		if target, err = gitExport(rev, p, dir); err != nil {
			s.close()
			return nil, err
		}
	} else {
		return nil, fmt.Errorf("%s: %v (expected a package folder, a sheet, REV:path or a PDF plinth wrote)", spec, describe(err))
	}
	s.res, s.diags = evaluate(target, s.sets)
	return s, nil
}

// gitExport writes the package p at revision rev into dir and returns the
// path to evaluate there (dir, or the sheet in it). p is relative to the
// working folder, as git's own REV:./path is. It uses the git command:
// it reads every repository git can (packs, worktrees, alternates, partial
// clones) and needs no dependency; a package is a handful of blobs.
func gitExport(rev, p, dir string) (string, error) {
	g := func(args ...string) ([]byte, error) {
		var stderr bytes.Buffer
		cmd := exec.Command("git", args...)
		cmd.Stderr = &stderr
		out, err := cmd.Output()
		if err != nil {
			if msg := strings.TrimSpace(stderr.String()); msg != "" {
				return nil, errors.New(msg)
			}
			return nil, err
		}
		return out, nil
	}
	if _, err := exec.LookPath("git"); err != nil {
		return "", fmt.Errorf("%s:%s: reading a git revision needs the git command: %v", rev, p, err)
	}
	prefix, err := g("rev-parse", "--show-prefix")
	if err != nil {
		return "", fmt.Errorf("%s:%s: not in a git repository: %v", rev, p, err)
	}
	if _, err := g("rev-parse", "--verify", "--quiet", "--end-of-options", rev+"^{commit}"); err != nil {
		return "", fmt.Errorf("%s:%s: git revision %q does not exist", rev, p, rev)
	}
	rel := path.Clean(string(bytes.TrimSpace(prefix)) + filepath.ToSlash(p))
	if rel == ".." || strings.HasPrefix(rel, "../") || path.IsAbs(rel) {
		return "", fmt.Errorf("%s:%s: the path leads outside the repository", rev, p)
	}
	top, err := g("rev-parse", "--show-toplevel")
	if err != nil {
		return "", err
	}
	root := string(bytes.TrimSpace(top))
	list := func(what string) ([][4]string, error) {
		out, err := g("-C", root, "ls-tree", "-z", "--full-tree", rev, "--", what)
		if err != nil {
			return nil, err
		}
		var rows [][4]string
		for _, e := range bytes.Split(out, []byte{0}) {
			meta, name, ok := bytes.Cut(e, []byte{'\t'})
			f := strings.Fields(string(meta))
			if !ok || len(f) != 3 {
				continue
			}
			rows = append(rows, [4]string{f[0], f[1], f[2], string(name)})
		}
		return rows, nil
	}
	top1, err := list(rel)
	if err != nil {
		return "", fmt.Errorf("%s:%s: %v", rev, p, err)
	}
	if rel == "." {
		top1 = [][4]string{{"040000", "tree", "", "."}}
	}
	if len(top1) != 1 || top1[0][3] != rel {
		return "", fmt.Errorf("%s:%s: %s is missing at revision %s", rev, p, rel, rev)
	}
	base, target := rel, dir
	if top1[0][1] == "blob" {
		base = path.Dir(rel)
		target = filepath.Join(dir, path.Base(rel))
	}
	// every blob under base, recursively (images and templates too)
	var rows [][4]string
	out, err := g("-C", root, "ls-tree", "-r", "-z", "--full-tree", rev, "--", base+"/")
	if base == "." {
		out, err = g("-C", root, "ls-tree", "-r", "-z", "--full-tree", rev)
	}
	if err != nil {
		return "", fmt.Errorf("%s:%s: %v", rev, p, err)
	}
	for _, e := range bytes.Split(out, []byte{0}) {
		meta, name, ok := bytes.Cut(e, []byte{'\t'})
		f := strings.Fields(string(meta))
		if ok && len(f) == 3 && f[1] == "blob" && f[0] != "120000" {
			rows = append(rows, [4]string{f[0], f[1], f[2], string(name)})
		}
	}
	// read the blobs through one git cat-file --batch
	var in bytes.Buffer
	for _, r := range rows {
		in.WriteString(r[2] + "\n")
	}
	cmd := exec.Command("git", "-C", root, "cat-file", "--batch")
	cmd.Stdin = &in
	raw, err := cmd.Output()
	if err != nil {
		return "", fmt.Errorf("%s:%s: git cat-file: %v", rev, p, err)
	}
	br := bufio.NewReader(bytes.NewReader(raw))
	for _, r := range rows {
		hdr, err := br.ReadString('\n')
		f := strings.Fields(hdr)
		if err != nil || len(f) != 3 {
			return "", fmt.Errorf("%s:%s: git cat-file: unexpected output", rev, p)
		}
		n, err := strconv.Atoi(f[2])
		if err != nil || n < 0 {
			return "", fmt.Errorf("%s:%s: git cat-file: unexpected size", rev, p)
		}
		data := make([]byte, n+1)
		if _, err := io.ReadFull(br, data); err != nil {
			return "", fmt.Errorf("%s:%s: git cat-file: %v", rev, p, err)
		}
		name := strings.TrimPrefix(r[3], base+"/")
		if base == "." {
			name = r[3]
		}
		dst, err := safeJoin(dir, name)
		if err != nil {
			return "", fmt.Errorf("%s:%s: %v", rev, p, err)
		}
		if err := os.MkdirAll(filepath.Dir(dst), 0o755); err != nil {
			return "", err
		}
		if err := os.WriteFile(dst, data[:n], 0o644); err != nil {
			return "", err
		}
	}
	return target, nil
}

// safeJoin joins a slash-separated relative name to dir, refusing
// absolute names, names with "..", empty or odd elements.
func safeJoin(dir, name string) (string, error) {
	if name == "" || path.IsAbs(name) || strings.HasPrefix(name, "\\") || filepath.IsAbs(name) || filepath.VolumeName(name) != "" {
		return "", fmt.Errorf("refusing file name %q: absolute", name)
	}
	for _, el := range strings.Split(name, "/") {
		if el == "" || el == "." || el == ".." || strings.ContainsAny(el, "\\\x00:") {
			return "", fmt.Errorf("refusing file name %q: it must be a plain relative path without . or .. elements", name)
		}
	}
	return filepath.Join(dir, filepath.FromSlash(name)), nil
}
