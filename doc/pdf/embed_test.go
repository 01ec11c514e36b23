package pdf_test

import (
	"bytes"
	"errors"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/pdf"
	"github.com/plinth-calc/plinth/internal/tools"
)

func withFiles(t testing.TB, files []pdf.File) []byte {
	t.Helper()
	pages, diags := layout.Document(demoDoc(3))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	if err := pdf.Write(&b, pages, pdf.Options{Time: when, Creator: "plinth test", Files: files}); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

var sample = []pdf.File{
	{Name: "package.yaml", Data: []byte("project: X\n"), Desc: "SHA-256 1"},
	{Name: "01-ground.md", Data: bytes.Repeat([]byte("ground (a) \\ b\n"), 500), Desc: "SHA-256 2"},
	{Name: "figures/ü (1).png", Data: []byte{0, 1, 2, 255}, Desc: "bild ü"},
	{Name: "empty.md", Data: nil},
}

// TestEmbedRoundTrip embeds files, reads them back in name order, and
// checks the file is deterministic and clean for qpdf, which lists them.
func TestEmbedRoundTrip(t *testing.T) {
	out := withFiles(t, sample)
	if again := withFiles(t, sample); !bytes.Equal(out, again) {
		t.Fatal("two writes with the same files differ")
	}
	got, err := pdf.Files(out)
	if err != nil {
		t.Fatal(err)
	}
	want := map[string]pdf.File{}
	for _, f := range sample {
		want[f.Name] = f
	}
	if len(got) != len(sample) {
		t.Fatalf("got %d files, want %d", len(got), len(sample))
	}
	for i, f := range got {
		if i > 0 && got[i-1].Name >= f.Name {
			t.Errorf("not in name order: %q before %q", got[i-1].Name, f.Name)
		}
		w := want[f.Name]
		if !bytes.Equal(f.Data, w.Data) || f.Desc != w.Desc {
			t.Errorf("%q: got %d bytes %q, want %d bytes %q", f.Name, len(f.Data), f.Desc, len(w.Data), w.Desc)
		}
	}
	path := filepath.Join(t.TempDir(), "e.pdf")
	os.WriteFile(path, out, 0o644)
	if b, err := exec.Command(tools.Need(t, "qpdf"), "--check", path).CombinedOutput(); err != nil {
		t.Errorf("qpdf --check: %v\n%s", err, b)
	}
	b, err := exec.Command(tools.Need(t, "qpdf"), "--list-attachments", path).CombinedOutput()
	if err != nil || !bytes.Contains(b, []byte("01-ground.md")) {
		t.Errorf("qpdf --list-attachments: %v\n%s", err, b)
	}
}

// TestFilesBad: a PDF without files, a truncated one, one not a PDF, one
// with a damaged stream are each an error, never a panic.
func TestFilesBad(t *testing.T) {
	plain := withFiles(t, nil)
	if _, err := pdf.Files(plain); !errors.Is(err, pdf.ErrNoFiles) {
		t.Errorf("no files: %v, want ErrNoFiles", err)
	}
	good := withFiles(t, sample)
	for name, data := range map[string][]byte{
		"truncated": good[:len(good)/2],
		"not a PDF": []byte("hello"),
		"empty":     nil,
		"no xref":   append([]byte("%PDF-1.4\n"), []byte("%%EOF\n")...),
		"damaged":   bytes.Replace(good, []byte("/Length "), []byte("/Length 9"), 3),
	} {
		if _, err := pdf.Files(data); err == nil {
			t.Errorf("%s: no error", name)
		}
	}
	if err := pdf.Write(&bytes.Buffer{}, mustPages(t), pdf.Options{Files: []pdf.File{{Name: "a"}, {Name: "a"}}}); err == nil {
		t.Error("two files of one name: no error")
	}
}

func mustPages(t testing.TB) *layout.Pages {
	pages, diags := layout.Document(demoDoc(1))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	return pages
}

// FuzzFiles feeds the embedded-file reader damaged PDFs: it must return
// files or an error, never panic or hang.
func FuzzFiles(f *testing.F) {
	// seeds without text (no fonts), so they stay small enough to mutate
	small := func(files []pdf.File) []byte {
		var b bytes.Buffer
		pages := &layout.Pages{Info: layout.Info{Fingerprint: "ab12"}, Pages: []*layout.Page{{W: 200, H: 100}}}
		if err := pdf.Write(&b, pages, pdf.Options{Time: when, Files: files}); err != nil {
			f.Fatal(err)
		}
		return b.Bytes()
	}
	good := small(sample[:1])
	f.Add(good)
	f.Add(small([]pdf.File{{Name: "a (b)\\c\351.md", Data: []byte("x")}, {Name: "z", Data: bytes.Repeat([]byte("ab"), 300)}}))
	f.Add(small(nil))
	f.Add(good[:len(good)-50])
	f.Add([]byte("%PDF-1.4\nxref\n0 2\n0000000000 65535 f \n0000000009 00000 n \ntrailer\n<< /Root 1 0 R >>\nstartxref\n0\n%%EOF\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		pdf.PageTexts(data)
		files, err := pdf.Files(data)
		if err == nil {
			for _, fl := range files {
				if len(fl.Data) > pdf.MaxFileSize {
					t.Fatalf("%q: %d bytes, more than the limit", fl.Name, len(fl.Data))
				}
			}
		}
	})
}

func BenchmarkFiles(b *testing.B) {
	good := withFiles(b, sample)
	b.SetBytes(int64(len(good)))
	for b.Loop() {
		if _, err := pdf.Files(good); err != nil {
			b.Fatal(err)
		}
	}
}

// TestPageTexts: the text of every page is read back through the fonts'
// ToUnicode maps, the fingerprint in the footer included.
func TestPageTexts(t *testing.T) {
	doc := demoDoc(3)
	doc.Info.Fingerprint = "0123456789abcdef"
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	if err := pdf.Write(&b, pages, pdf.Options{Time: when}); err != nil {
		t.Fatal(err)
	}
	texts, err := pdf.PageTexts(b.Bytes())
	if err != nil {
		t.Fatal(err)
	}
	if len(texts) != len(pages.Pages) {
		t.Fatalf("%d page texts, %d pages", len(texts), len(pages.Pages))
	}
	for i, s := range texts {
		if !strings.Contains(s, "0123456789ab") {
			t.Errorf("page %d does not show the fingerprint: %q", i+1, s)
		}
	}
	if _, err := pdf.PageTexts(b.Bytes()[:b.Len()/2]); err == nil {
		t.Error("a truncated PDF: no error")
	}
}
