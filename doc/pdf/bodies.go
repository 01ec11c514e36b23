package pdf

import (
	"bytes"
	"errors"
	"hash/adler32"
	"sync"

	"github.com/klauspost/compress/flate"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Bodies paints sheets' page bodies ahead of Write, while the layout is
// still working on other sheets: give Sheet to the layout as its
// layout.Doc.Final and the Bodies to Write in Options.Bodies. Each body
// is painted into its own content stream and compressed at once (a raw
// deflate stream), and the page's boxes are dropped, so a long document
// is never held as boxes whole. Write paints each page's title block and
// footer and puts them in front of the body in one content stream: the
// deflate streams are joined (the furniture's ends on a byte boundary
// with a sync flush, the body's is final) and the zlib checksum of the
// two is combined, so nothing is compressed twice.
//
// What a body needs from gopdf (the page's content object, links,
// anchors) is recorded as it is painted and done by Write in the same
// order, when the page is written. A sheet with an image on it is left to
// Write whole (gopdf numbers an image's object when it is first drawn,
// and the stream names it by that number).
type Bodies struct {
	mu     sync.Mutex
	sheets map[int][]*bodyStream
	free   []*painter // body painters not in use
	all    []*painter // every body painter made: their glyphs are merged
}

// bodyStream is one page's body painted ahead.
type bodyStream struct {
	z        []byte  // the content stream, raw deflate, final block
	adler    uint32  // adler-32 of the stream uncompressed
	n        int     // its length uncompressed
	events   []event // gopdf calls to make for it, in order
	lastSize float64 // the size of the last text drawn (<0: none)
}

// event is a call the painter makes on gopdf while it draws a page:
// opening the page's content object, a link or an anchor. A body painted
// ahead records them; Write makes them.
type event struct {
	kind       uint8
	name       string // link target or anchor name
	x, y, w, h float64
	size       float64 // anchor: the size of the last text before it on the page (<0: none yet)
}

const (
	evOpen uint8 = iota
	evLink
	evAnchor
)

// NewBodies returns an empty set of bodies.
func NewBodies() *Bodies { return &Bodies{sheets: map[int][]*bodyStream{}} }

// Sheet paints the bodies of one sheet's pages (numbered within the
// sheet from 1, as the layout gives them) and sets their Boxes to nil. It
// is safe for concurrent use. A sheet it cannot paint (an image on it, or
// an error, which Write then meets and reports at its page) keeps its
// boxes and is painted by Write.
func (bs *Bodies) Sheet(sheet int, pages []*layout.Page) {
	if hasImage(pages) {
		return
	}
	p := bs.painter()
	defer bs.release(p)
	out := make([]*bodyStream, len(pages))
	for i, pg := range pages {
		p.page(pg.H, p.c.b)
		p.size, p.events = -1, nil
		for _, b := range pg.Boxes {
			if err := p.box(b); err != nil {
				return
			}
		}
		p.finish()
		z, err := p.deflate(p.c.b)
		if err != nil {
			return
		}
		out[i] = &bodyStream{z: z, adler: adler32.Checksum(p.c.b), n: len(p.c.b), events: p.events, lastSize: p.size}
	}
	for _, pg := range pages {
		pg.Boxes = nil
	}
	bs.mu.Lock()
	bs.sheets[sheet] = out
	bs.mu.Unlock()
}

// body is the body of a sheet's page (number from 1) painted ahead, or nil.
func (bs *Bodies) body(sheet, number int) *bodyStream {
	if bs == nil {
		return nil
	}
	s := bs.sheets[sheet]
	if number < 1 || number > len(s) {
		return nil
	}
	return s[number-1]
}

func (bs *Bodies) painter() *painter {
	bs.mu.Lock()
	defer bs.mu.Unlock()
	if n := len(bs.free); n > 0 {
		p := bs.free[n-1]
		bs.free = bs.free[:n-1]
		return p
	}
	p := &painter{ahead: true}
	p.c.b = make([]byte, 0, 64<<10)
	bs.all = append(bs.all, p)
	return p
}

func (bs *Bodies) release(p *painter) {
	bs.mu.Lock()
	bs.free = append(bs.free, p)
	bs.mu.Unlock()
}

// faces are the faces the bodies' text is in.
func (bs *Bodies) faces() (used [fonts.NumFaces]bool) {
	if bs == nil {
		return used
	}
	for _, p := range bs.all {
		for f, g := range p.glyphs {
			used[f] = used[f] || g != nil
		}
	}
	return used
}

// runes are the characters the bodies drew in face f.
func (bs *Bodies) runes(f fonts.Face) []rune {
	if bs == nil {
		return nil
	}
	var out []rune
	for _, p := range bs.all {
		if g := p.glyphs[f]; g != nil {
			out = append(out, g.used...)
		}
	}
	return out
}

// marks calls fn for every anchor and link the bodies hold.
func (bs *Bodies) marks(fn func(link bool, name string)) {
	if bs == nil {
		return
	}
	for _, s := range bs.sheets {
		for _, b := range s {
			for _, ev := range b.events {
				if ev.kind != evOpen {
					fn(ev.kind == evLink, ev.name)
				}
			}
		}
	}
}

func hasImage(pages []*layout.Page) bool {
	found := false
	for _, pg := range pages {
		for _, b := range pg.Boxes {
			b.Walk(func(b *layout.Box) {
				for _, it := range b.Items {
					if _, ok := it.(draw.Image); ok {
						found = true
					}
				}
			})
		}
	}
	return found
}

// deflate compresses data as a raw deflate stream ending in a final
// block, with the painter's own reused compressor.
func (p *painter) deflate(data []byte) ([]byte, error) {
	if p.zw == nil {
		var err error
		if p.zw, err = flate.NewWriter(&p.zbuf, flate.BestSpeed); err != nil {
			return nil, err
		}
	}
	p.zbuf.Reset()
	p.zw.Reset(&p.zbuf)
	if _, err := p.zw.Write(data); err != nil {
		return nil, err
	}
	if err := p.zw.Close(); err != nil {
		return nil, err
	}
	return bytes.Clone(p.zbuf.Bytes()), nil
}

// join makes the zlib stream of head then b's body: head compressed and
// sync-flushed (so it ends on a byte boundary and is not final), the
// body's deflate stream after it, and the adler-32 of the two combined.
func (z *zipper) join(head []byte, b *bodyStream) ([]byte, error) {
	if b.z == nil {
		return nil, errors.New("a body painted ahead was written already (a Bodies serves one Write)")
	}
	if z.raw == nil {
		var err error
		if z.raw, err = flate.NewWriter(&z.buf, flate.BestSpeed); err != nil {
			return nil, err
		}
	}
	z.buf.Reset()
	z.buf.Write([]byte{0x78, 0x01}) // zlib header: deflate, 32 KB window, fastest
	z.raw.Reset(&z.buf)
	if _, err := z.raw.Write(head); err != nil {
		return nil, err
	}
	if err := z.raw.Flush(); err != nil {
		return nil, err
	}
	out := make([]byte, 0, z.buf.Len()+len(b.z)+4)
	out = append(out, z.buf.Bytes()...)
	out = append(out, b.z...)
	a := adler32Combine(adler32.Checksum(head), b.adler, b.n)
	return append(out, byte(a>>24), byte(a>>16), byte(a>>8), byte(a)), nil
}

// adler32Combine is the adler-32 of a then b from theirs and b's length
// (zlib's adler32_combine).
func adler32Combine(a, b uint32, lenB int) uint32 {
	const base = 65521
	rem := uint32(lenB % base)
	sum1 := a & 0xffff
	sum2 := (rem * sum1) % base
	sum1 += (b & 0xffff) + base - 1
	sum2 += (a >> 16) + (b >> 16) + base - rem
	if sum1 >= base {
		sum1 -= base
	}
	if sum1 >= base {
		sum1 -= base
	}
	if sum2 >= base<<1 {
		sum2 -= base << 1
	}
	if sum2 >= base {
		sum2 -= base
	}
	return sum2<<16 | sum1
}
