package pdf

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"strings"
	"time"

	"github.com/signintech/gopdf"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Options control the file written.
type Options struct {
	// Time is the creation and modification date written into the
	// document information; zero leaves both out.
	Time time.Time
	// Creator names the program that made the document ("plinth 0.3").
	Creator string
	// Progress, when set, is called after each page is drawn with the
	// pages done and the total.
	Progress func(done, total int)
	// Release drops each page's boxes once the page is drawn, so the
	// layout behind the written pages can be collected while the rest are
	// drawn (for a caller that needs only the page count afterwards).
	Release bool
	// Files are embedded as attachments (the package's inputs), listed in
	// the catalog's EmbeddedFiles name tree in name order.
	Files []File
	// Bodies holds the page bodies painted while the pages were laid out
	// (layout.Doc.Final = Bodies.Sheet); a page whose body is there has
	// only its furniture left in Boxes. A Bodies serves one Write: the
	// compressed bodies go once written.
	Bodies *Bodies
}

// Write draws pages as a PDF to w.
func Write(w io.Writer, pages *layout.Pages, opt Options) (err error) {
	defer func() {
		if r := recover(); r != nil { // the PDF library must not take the caller down
			err = fmt.Errorf("pdf: internal error: %v", r)
		}
	}()
	if pages == nil || len(pages.Pages) == 0 {
		return errors.New("pdf: no pages to write")
	}
	if err := checkLinks(pages, opt.Bodies); err != nil {
		return err
	}
	first := pages.Pages[0]
	gp := &gopdf.GoPdf{}
	gp.Start(gopdf.Config{Unit: gopdf.UnitPT, PageSize: gopdf.Rect{W: first.W, H: first.H}})
	gp.SetNoCompression() // content streams are compressed afterwards, by pack
	info := pages.Info
	gp.SetInfo(gopdf.PdfInfo{
		Title:        info.Title,
		Author:       info.Author,
		Subject:      info.Subject,
		Creator:      opt.Creator,
		Producer:     "plinth",
		CreationDate: opt.Time,
	})
	p := &painter{gp: gp, images: map[string]int{}}
	faces := usedFaces(pages)
	ahead := opt.Bodies.faces()
	var order []fonts.Face // the faces in gopdf's order: pack names the k-th /F<face+1>
	for f := fonts.Face(0); f < fonts.NumFaces; f++ {
		if !faces[f] && !ahead[f] {
			continue
		}
		if err := gp.AddTTFFontDataWithOption(f.PDFName(), f.TTF(), ttfOption); err != nil {
			return fmt.Errorf("pdf: embedding %s: %w", f, err)
		}
		g, err := newGlyphs(f)
		if err != nil {
			return err
		}
		p.glyphs[f] = g
		order = append(order, f)
	}
	marks := map[int][]layout.Bookmark{}
	for _, b := range pages.Outline {
		marks[b.Page] = append(marks[b.Page], b)
	}
	// Each page's stream is compressed as soon as it is drawn (on another
	// core); only the compressed bytes are kept (pack puts them in place),
	// and with Release the page's boxes go too.
	zp := newZipPool(len(pages.Pages))
	defer zp.close()
	for i, pg := range pages.Pages {
		gp.AddPageWithOption(gopdf.PageOption{PageSize: &gopdf.Rect{W: pg.W, H: pg.H}})
		p.page(pg.H, zp.buffer())
		for _, b := range marks[i] {
			gp.SetY(b.Y + 20)
			gp.AddOutlineWithPosition(b.Title)
		}
		for _, b := range pg.Boxes {
			if err := p.box(b); err != nil {
				return fmt.Errorf("pdf: page %d, %s at %s: %w", i+1, b.Kind, b.Pos, err)
			}
		}
		p.finish()
		body := opt.Bodies.body(pg.Sheet, pg.Number)
		if body != nil {
			p.replay(body)
		}
		if p.opened {
			zp.add(i, p.c.b, body)
			p.c.b = nil
		}
		if opt.Release {
			pg.Boxes = nil
		}
		if opt.Progress != nil {
			opt.Progress(i+1, len(pages.Pages))
		}
	}
	if err := p.subsetFonts(opt.Bodies); err != nil {
		return err
	}
	// gopdf's part is small now the page streams are apart: fonts, page
	// objects, links, outlines (about 1.6 kB a page); it is written while
	// the last pages are still being compressed
	var buf bytes.Buffer
	buf.Grow(256<<10 + 2<<10*len(pages.Pages))
	if _, err := gp.WriteTo(&buf); err != nil {
		return fmt.Errorf("pdf: %w", err)
	}
	streams, err := zp.streams()
	if err != nil {
		return fmt.Errorf("pdf: %w", err)
	}
	// the information is completed in gopdf's trailer, which pack copies
	// as it is, rather than in a copy of the finished file
	small, err := patchInfo(buf.Bytes(), info, opt.Time)
	if err != nil {
		return err
	}
	out, err := pack(small, streams, order)
	if err != nil {
		return err
	}
	if len(opt.Files) > 0 {
		if out, err = embed(out, opt.Files); err != nil {
			return err
		}
	}
	_, err = w.Write(out)
	return err
}

// checkLinks makes sure every link has its anchor.
func checkLinks(pages *layout.Pages, ahead *Bodies) error {
	anchors := map[string]bool{}
	var targets []string
	ahead.marks(func(link bool, name string) {
		if link {
			targets = append(targets, name)
		} else {
			anchors[name] = true
		}
	})
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			b.Walk(func(b *layout.Box) {
				for _, it := range b.Items {
					switch it := it.(type) {
					case draw.Anchor:
						anchors[it.Name] = true
					case draw.Link:
						targets = append(targets, it.Target)
					}
				}
			})
		}
	}
	var missing []string
	for _, t := range targets {
		if !anchors[t] {
			missing = append(missing, fmt.Sprintf("%q", t))
		}
	}
	if len(missing) > 0 {
		return fmt.Errorf("pdf: links to missing anchors: %s", strings.Join(missing, ", "))
	}
	return nil
}

func usedFaces(pages *layout.Pages) [fonts.NumFaces]bool {
	var used [fonts.NumFaces]bool
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			b.Walk(func(b *layout.Box) {
				for _, it := range b.Items {
					if t, ok := it.(draw.Text); ok && t.Face.Valid() {
						used[t.Face] = true
					}
				}
			})
		}
	}
	return used
}

// patchInfo adds Keywords (with the fingerprint) and ModDate to the
// information dictionary gopdf writes into the trailer. The trailer comes
// after the cross-reference table, so no offset moves.
func patchInfo(pdf []byte, info layout.Info, t time.Time) ([]byte, error) {
	kw := info.Keywords
	if info.Fingerprint != "" {
		kw = strings.TrimSpace(kw + " inputs:" + info.Fingerprint)
	}
	var add strings.Builder
	if kw != "" {
		fmt.Fprintf(&add, "/Keywords <FEFF%s>\n", utf16hex(kw))
	}
	if !t.IsZero() {
		fmt.Fprintf(&add, "/ModDate(D:%s)\n", t.Format("20060102150405-07'00'"))
	}
	if add.Len() == 0 {
		return pdf, nil
	}
	xref := bytes.LastIndex(pdf, []byte("\nxref\n"))
	at := bytes.LastIndex(pdf, []byte("/Info <<\n"))
	if xref < 0 || at < xref {
		return nil, errors.New("pdf: cannot find the document information to complete")
	}
	at += len("/Info <<\n")
	out := make([]byte, 0, len(pdf)+add.Len())
	out = append(out, pdf[:at]...)
	out = append(out, add.String()...)
	return append(out, pdf[at:]...), nil
}

// utf16hex encodes s as UTF-16BE hex digits.
func utf16hex(s string) string {
	var b strings.Builder
	for _, r := range s {
		if r >= 0x10000 {
			r -= 0x10000
			fmt.Fprintf(&b, "%04X%04X", 0xD800+(r>>10), 0xDC00+(r&0x3FF))
			continue
		}
		fmt.Fprintf(&b, "%04X", r)
	}
	return b.String()
}
