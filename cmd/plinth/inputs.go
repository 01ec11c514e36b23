package main

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"errors"
	"fmt"
	"net/url"
	"os"
	"path"
	"path/filepath"
	"sort"
	"strings"
	"sync"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/pdf"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// manifestName is the embedded file that describes the others.
const manifestName = "plinth-manifest.json"

// manifestFormat names the manifest's layout; a reader refuses others.
const manifestFormat = "plinth-inputs/1"

// manifest is the JSON plinth embeds beside a package's source files. It
// is an interface: fields are added, never renamed or removed.
type manifest struct {
	Format  string `json:"format"`
	Version string `json:"version"` // the plinth that wrote the PDF
	// Sheet is the sheet rendered alone ("" when the folder was).
	Sheet string   `json:"sheet"`
	Sets  []string `json:"sets"` // --set overrides in force, in order
	// SourceDateEpoch is SOURCE_DATE_EPOCH as it was set ("" when not).
	SourceDateEpoch string `json:"source_date_epoch"`
	Fingerprint     string `json:"fingerprint"`
	// Fingerprinted names the files the fingerprint is made of, in order
	// (package.yaml, then the sheets).
	Fingerprinted []string       `json:"fingerprinted"`
	Files         []manifestFile `json:"files"` // in name order
}

type manifestFile struct {
	Name   string `json:"name"`
	SHA256 string `json:"sha256"`
	Size   int    `json:"size"`
}

// recorder reads files inside the package and keeps what it read, so a
// render can embed the templates, factor files and images it used.
type recorder struct {
	r     sheet.Reader
	mu    sync.Mutex
	files map[string][]byte
}

// ReadInside implements sheet.Reader.
func (rc *recorder) ReadInside(rel string) ([]byte, error) {
	data, err := rc.r.ReadInside(rel)
	if err == nil {
		rc.mu.Lock()
		rc.files[path.Clean(filepath.ToSlash(rel))] = data
		rc.mu.Unlock()
	}
	return data, err
}

// parsed reads what only doc/parse reads, so it is recorded too: the
// figures of every sheet (a context sheet's are checked, not printed) and
// the template and factor files named in package.yaml and front matter
// (unreadable ones are parse's to report).
func (rc *recorder) parsed(pkg *sheet.Package) {
	meta := func(m *sheet.Meta) {
		for _, f := range []sheet.Str{m.Template, m.Factors} {
			if v := f.Value; v != "" && v != "a4" && v != "letter" {
				rc.ReadInside(v)
			}
		}
	}
	var images func([]sheet.Block)
	images = func(blocks []sheet.Block) {
		for _, b := range blocks {
			switch b := b.(type) {
			case *sheet.Image:
				p := b.Path.Value
				if u, err := url.PathUnescape(p); err == nil && strings.Contains(p, "%") {
					p = u
				}
				if p != "" && !strings.Contains(p, "://") {
					rc.ReadInside(p)
				}
			case *sheet.List:
				for _, it := range b.Items {
					images(it.Blocks)
				}
			case *sheet.Quote:
				images(b.Body)
			case *sheet.Caution:
				images(b.Body)
			}
		}
	}
	meta(&pkg.Meta)
	for _, s := range pkg.Sheets {
		meta(&s.Meta)
		images(s.Body)
	}
}

// evaluateRecorded is evaluate, with the package's reads recorded.
func evaluateRecorded(p string, sets []string) (*eval.Result, source.List, *recorder) {
	var rec *recorder
	res, diags := evaluateWith(p, sets, func(pkg *sheet.Package) {
		if pkg.Inside != nil {
			rec = &recorder{r: pkg.Inside, files: map[string][]byte{}}
			pkg.Inside = rec
			rec.parsed(pkg)
		}
	})
	return res, diags, rec
}

// inputFiles are the files a render embeds: package.yaml, the sheets
// (context sheets too), every file read inside the package, and the
// manifest.
func inputFiles(res *eval.Result, rec *recorder, target string) ([]pdf.File, error) {
	m := manifest{Format: manifestFormat, Version: Version(), Sets: []string{}, SourceDateEpoch: os.Getenv("SOURCE_DATE_EPOCH"),
		Fingerprint: res.Fingerprint(), Fingerprinted: []string{}}
	for _, o := range res.Overrides {
		m.Sets = append(m.Sets, o.Arg)
	}
	if fi, err := os.Stat(target); err == nil && !fi.IsDir() {
		m.Sheet = filepath.Base(target)
	}
	files := map[string][]byte{}
	for _, f := range res.Src.Files {
		n := filepath.Base(f.Path)
		m.Fingerprinted = append(m.Fingerprinted, n)
		files[n] = f.Text
	}
	if rec != nil {
		for n, d := range rec.files {
			if old, ok := files[n]; ok && string(old) != string(d) {
				return nil, fmt.Errorf("%s was read twice with different contents", n)
			}
			files[n] = d
		}
	}
	if _, ok := files[manifestName]; ok {
		return nil, fmt.Errorf("a package file is named %s, the name plinth gives its manifest in the PDF; rename it", manifestName)
	}
	var out []pdf.File
	for n, d := range files {
		sum := sha256.Sum256(d)
		m.Files = append(m.Files, manifestFile{Name: n, SHA256: hex.EncodeToString(sum[:]), Size: len(d)})
		out = append(out, pdf.File{Name: n, Data: d, Desc: "SHA-256 " + hex.EncodeToString(sum[:])})
	}
	sort.Slice(m.Files, func(i, j int) bool { return m.Files[i].Name < m.Files[j].Name })
	js, err := json.MarshalIndent(m, "", "  ")
	if err != nil {
		return nil, err
	}
	out = append(out, pdf.File{Name: manifestName, Data: append(js, '\n'), Desc: "plinth: the inputs this PDF was made from"})
	return out, nil
}

// inputs is the package a PDF carries.
type inputs struct {
	man   manifest
	files map[string][]byte // by name, the manifest left out
}

// errNoInputs says a PDF carries no plinth inputs.
var errNoInputs = errors.New("the PDF carries no plinth inputs (not written by plinth, or by a plinth older than embedded inputs)")

// readInputs reads the embedded files and the manifest of a PDF and
// checks each name is a plain relative path.
func readInputs(data []byte) (*inputs, error) {
	fs, err := pdf.Files(data)
	if errors.Is(err, pdf.ErrNoFiles) {
		return nil, errNoInputs
	}
	if err != nil {
		return nil, err
	}
	in := &inputs{files: map[string][]byte{}}
	found := false
	for _, f := range fs {
		if f.Name == manifestName {
			if err := json.Unmarshal(f.Data, &in.man); err != nil {
				return nil, fmt.Errorf("the manifest of embedded inputs is damaged: %v", err)
			}
			found = true
			continue
		}
		if _, err := safeJoin(".", f.Name); err != nil {
			return nil, fmt.Errorf("embedded file: %v", err)
		}
		in.files[f.Name] = f.Data
	}
	if !found {
		return nil, errNoInputs
	}
	if in.man.Format != manifestFormat {
		return nil, fmt.Errorf("the embedded inputs are in format %q; this plinth reads %q", in.man.Format, manifestFormat)
	}
	if in.man.Sheet != "" {
		if _, err := safeJoin(".", in.man.Sheet); err != nil || strings.Contains(in.man.Sheet, "/") {
			return nil, fmt.Errorf("the manifest names an odd sheet %q", in.man.Sheet)
		}
	}
	return in, nil
}

// names lists the embedded files in name order.
func (in *inputs) names() []string {
	var out []string
	for n := range in.files {
		out = append(out, n)
	}
	sort.Strings(out)
	return out
}

// writeTo writes the files into dir, creating folders, never replacing a
// file that exists and never outside dir.
func (in *inputs) writeTo(dir string) error {
	names := in.names()
	for _, n := range names { // check everything before writing anything
		dst, err := safeJoin(dir, n)
		if err != nil {
			return err
		}
		if _, err := os.Lstat(dst); err == nil {
			return fmt.Errorf("%s exists: nothing written", dst)
		}
	}
	for _, n := range names {
		dst, _ := safeJoin(dir, n)
		if err := os.MkdirAll(filepath.Dir(dst), 0o755); err != nil {
			return err
		}
		f, err := os.OpenFile(dst, os.O_WRONLY|os.O_CREATE|os.O_EXCL, 0o644)
		if err != nil {
			return fmt.Errorf("cannot write %s: %v", dst, describe(err))
		}
		_, err = f.Write(in.files[n])
		if e := f.Close(); err == nil {
			err = e
		}
		if err != nil {
			return fmt.Errorf("cannot write %s: %v", dst, describe(err))
		}
	}
	return nil
}

// target is the path to evaluate once the files are in dir.
func (in *inputs) target(dir string) string {
	if in.man.Sheet != "" {
		return filepath.Join(dir, in.man.Sheet)
	}
	return dir
}

// fingerprint recomputes eval.Result.Fingerprint from the embedded files
// the manifest names, in its order, and the --set arguments.
func (in *inputs) fingerprint() (string, error) {
	var texts [][]byte
	for _, name := range in.man.Fingerprinted {
		d, ok := in.files[name]
		if !ok {
			return "", fmt.Errorf("%s, named in the manifest, is not embedded", name)
		}
		texts = append(texts, d)
	}
	return eval.Fingerprint(in.man.Fingerprinted, texts, in.man.Sets), nil
}
