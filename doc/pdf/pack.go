package pdf

import (
	"bytes"
	"errors"
	"fmt"
	"strconv"

	"github.com/klauspost/compress/flate"
	"github.com/klauspost/compress/zlib"

	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// zipper compresses page streams with one reused compressor (opening a
// compressor costs more than compressing a page). The compressor is
// klauspost/compress's zlib at BestSpeed: on plinth's page streams it
// takes about half the time of the standard library's at the same level
// and writes smaller streams; its output, like the standard library's,
// depends only on the input.
type zipper struct {
	z   *zlib.Writer
	raw *flate.Writer // for join (bodies.go)
	buf bytes.Buffer
}

func newZipper() *zipper {
	z := &zipper{}
	z.z, _ = zlib.NewWriterLevel(&z.buf, zlib.BestSpeed)
	return z
}

// compress returns data compressed, in a slice of its own.
func (z *zipper) compress(data []byte) ([]byte, error) {
	z.buf.Reset()
	z.z.Reset(&z.buf)
	if _, err := z.z.Write(data); err != nil {
		return nil, err
	}
	if err := z.z.Close(); err != nil {
		return nil, err
	}
	return bytes.Clone(z.buf.Bytes()), nil
}

// pack finishes the PDF gopdf wrote without compression: each page's
// content stream is replaced by the one the painter wrote and compressed
// (pages[i] for the i-th page object; gopdf's own stream there holds only
// a placeholder), every other uncompressed stream is compressed, and the
// cross-reference table is rebuilt.
//
// It relies on the simple layout gopdf writes: objects 1..n in order, each
// starting "n 0 obj", a classic xref table, then the trailer. An
// uncompressed stream is exactly "<<\n/Length L\n>>\nstream\n"; a page
// object starts "<<\n  /Type /Page\n" and names its content object in
// "/Contents  n 0 R".
//
// The painter names each face's font resource by the face (/F<face+1>,
// so a body painted ahead need not know which faces the document uses);
// gopdf numbers them in the order they were added, faces[k-1] as /F<k>,
// and pack renames them in the resources gopdf writes.
func pack(in []byte, pages [][]byte, faces []fonts.Face) ([]byte, error) {
	offs, xref, trailer, err := xrefTable(in)
	if err != nil {
		return nil, err
	}
	count := len(offs)
	size := xref
	for _, p := range pages {
		size += len(p)
	}
	out := bytes.NewBuffer(make([]byte, 0, size+len(in)-xref+1<<10)) // at most: the other streams only shrink
	out.Write(in[:offs[1]])
	newOffs := make([]int, count)
	z := newZipper()
	page := 0
	contents := map[int][]byte{} // content object number → its stream
	const head = "<<\n/Length "
	const pageHead = "<<\n  /Type /Page\n"
	for i := 1; i < count; i++ {
		end := xref
		if i+1 < count {
			end = offs[i+1]
		}
		obj := in[offs[i]:end]
		newOffs[i] = out.Len()
		nl := bytes.IndexByte(obj, '\n') + 1
		body := obj[nl:]
		if bytes.HasPrefix(body, []byte(pageHead)) {
			if page >= len(pages) {
				return nil, errors.New("pdf: more pages written than drawn")
			}
			if c, ok := contentsOf(body); ok {
				contents[c] = pages[page]
			}
			page++
		}
		if bytes.HasPrefix(body, []byte(procSet)) {
			out.Write(renameFonts(obj, faces))
			continue
		}
		if !bytes.HasPrefix(body, []byte(head)) {
			out.Write(obj)
			continue
		}
		rest := body[len(head):]
		eol := bytes.IndexByte(rest, '\n')
		n, err := strconv.Atoi(string(rest[:eol]))
		const open = "\n>>\nstream\n"
		if err != nil || !bytes.HasPrefix(rest[eol:], []byte(open)) || eol+len(open)+n > len(rest) {
			out.Write(obj)
			continue
		}
		data, ok := contents[i]
		if ok {
			if data == nil {
				return nil, fmt.Errorf("pdf: no stream drawn for content object %d", i)
			}
		} else if data, err = z.compress(rest[eol+len(open) : eol+len(open)+n]); err != nil {
			return nil, err
		}
		out.Write(obj[:nl])
		out.WriteString("<<\n/Filter/FlateDecode/Length ")
		out.WriteString(strconv.Itoa(len(data)))
		out.WriteString("\n>>\nstream\n")
		out.Write(data)
		out.Write(rest[eol+len(open)+n:])
	}
	if page != len(pages) {
		return nil, fmt.Errorf("pdf: %d pages drawn, %d written", len(pages), page)
	}
	start := out.Len()
	fmt.Fprintf(out, "xref\n0 %d\n0000000000 65535 f \n", count)
	var line []byte
	for i := 1; i < count; i++ {
		line = strconv.AppendInt(line[:0], int64(newOffs[i]), 10)
		for range 10 - len(line) {
			out.WriteByte('0')
		}
		out.Write(line)
		out.WriteString(" 00000 n \n")
	}
	t := in[trailer:]
	sx := bytes.LastIndex(t, []byte("startxref\n"))
	if sx < 0 {
		return nil, errors.New("pdf: no startxref")
	}
	out.Write(t[:sx])
	fmt.Fprintf(out, "startxref\n%d\n%%%%EOF\n", start)
	return out.Bytes(), nil
}

// procSet begins gopdf's resource dictionary, shared by every page.
const procSet = "<<\n\t/ProcSet "

// renameFonts renames the font resources of gopdf's resource dictionary
// obj ("\t\t/F<k> n 0 R") to the painter's names, /F<face+1> for
// faces[k-1].
func renameFonts(obj []byte, faces []fonts.Face) []byte {
	const key = "\t\t/F"
	out := make([]byte, 0, len(obj)+8)
	for len(obj) > 0 {
		nl := bytes.IndexByte(obj, '\n') + 1
		if nl == 0 {
			nl = len(obj)
		}
		line := obj[:nl]
		obj = obj[nl:]
		if bytes.HasPrefix(line, []byte(key)) {
			rest := line[len(key):]
			sp := bytes.IndexByte(rest, ' ')
			if k, err := strconv.Atoi(string(rest[:max(sp, 0)])); err == nil && k >= 1 && k <= len(faces) {
				out = append(out, key...)
				out = strconv.AppendInt(out, int64(faces[k-1])+1, 10)
				out = append(out, rest[sp:]...)
				continue
			}
		}
		out = append(out, line...)
	}
	return out
}

// contentsOf reads the content object number of a page object gopdf
// wrote ("  /Contents  12 0 R \n").
func contentsOf(page []byte) (int, bool) {
	const key = "/Contents "
	at := bytes.Index(page, []byte(key))
	if at < 0 {
		return 0, false
	}
	f := bytes.Fields(page[at+len(key):])
	if len(f) < 3 || string(f[1]) != "0" || string(f[2]) != "R" {
		return 0, false
	}
	n, err := strconv.Atoi(string(f[0]))
	return n, err == nil
}

// xrefTable reads the classic cross-reference table of a PDF laid out as
// gopdf writes it: offs[i] is the offset of object i (offs[0] unused),
// xref the offset of the table and trailer that of its trailer.
func xrefTable(in []byte) (offs []int, xref, trailer int, err error) {
	xref = bytes.LastIndex(in, []byte("\nxref\n"))
	if xref < 0 {
		return nil, 0, 0, errors.New("pdf: no cross-reference table")
	}
	xref++
	trailer = bytes.Index(in[xref:], []byte("trailer\n"))
	if trailer < 0 {
		return nil, 0, 0, errors.New("pdf: no trailer")
	}
	trailer += xref
	// read the object offsets
	lines := bytes.Split(in[xref:trailer], []byte("\n"))
	if len(lines) < 3 {
		return nil, 0, 0, errors.New("pdf: short cross-reference table")
	}
	hdr := bytes.Fields(lines[1])
	if len(hdr) != 2 {
		return nil, 0, 0, errors.New("pdf: bad cross-reference header")
	}
	count, err := strconv.Atoi(string(hdr[1]))
	if err != nil || count < 1 || len(lines) < count+2 {
		return nil, 0, 0, errors.New("pdf: bad cross-reference count")
	}
	offs = make([]int, count) // offs[0] is the free entry
	for i := 1; i < count; i++ {
		f := bytes.Fields(lines[2+i])
		if len(f) != 3 {
			return nil, 0, 0, fmt.Errorf("pdf: bad cross-reference entry %d", i)
		}
		if offs[i], err = strconv.Atoi(string(f[0])); err != nil || offs[i] <= offs[i-1] || offs[i] >= xref {
			return nil, 0, 0, fmt.Errorf("pdf: bad offset for object %d", i)
		}
	}
	return offs, xref, trailer, nil
}
