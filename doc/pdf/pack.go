package pdf

import (
	"bytes"
	"compress/zlib"
	"errors"
	"fmt"
	"strconv"
)

// pack compresses the page content streams of a PDF gopdf wrote without
// compression, and rebuilds the cross-reference table. gopdf opens a new
// compressor for every page, which costs more than drawing the page; one
// reused compressor does the same work in a fraction of the time.
//
// It relies on the simple layout gopdf writes: objects 1..n in order, each
// starting "n 0 obj", a classic xref table, then the trailer. An
// uncompressed content stream is exactly "<<\n/Length L\n>>\nstream\n".
func pack(in []byte) ([]byte, error) {
	offs, xref, trailer, err := xrefTable(in)
	if err != nil {
		return nil, err
	}
	count := len(offs)
	out := bytes.NewBuffer(make([]byte, 0, len(in)/3))
	out.Write(in[:offs[1]])
	newOffs := make([]int, count)
	var z *zlib.Writer
	var zbuf bytes.Buffer
	const head = "<<\n/Length "
	for i := 1; i < count; i++ {
		end := xref
		if i+1 < count {
			end = offs[i+1]
		}
		obj := in[offs[i]:end]
		newOffs[i] = out.Len()
		nl := bytes.IndexByte(obj, '\n') + 1
		body := obj[nl:]
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
		data := rest[eol+len(open) : eol+len(open)+n]
		zbuf.Reset()
		if z == nil {
			z, _ = zlib.NewWriterLevel(&zbuf, zlib.BestSpeed)
		} else {
			z.Reset(&zbuf)
		}
		z.Write(data)
		if err := z.Close(); err != nil {
			return nil, err
		}
		out.Write(obj[:nl])
		fmt.Fprintf(out, "<<\n/Filter/FlateDecode/Length %d\n>>\nstream\n", zbuf.Len())
		out.Write(zbuf.Bytes())
		out.Write(rest[eol+len(open)+n:])
	}
	start := out.Len()
	fmt.Fprintf(out, "xref\n0 %d\n0000000000 65535 f \n", count)
	for i := 1; i < count; i++ {
		fmt.Fprintf(out, "%010d 00000 n \n", newOffs[i])
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
