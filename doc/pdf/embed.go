package pdf

import (
	"bytes"
	"compress/zlib"
	"crypto/md5"
	"errors"
	"fmt"
	"io"
	"regexp"
	"sort"
	"strconv"
)

// File is a file embedded in the PDF (an attachment a viewer lists).
type File struct {
	Name string // slash-separated path relative to the package folder
	Data []byte
	Desc string // shown by viewers ("SHA-256 …")
}

// MaxFileSize is the largest embedded file Files inflates.
const MaxFileSize = 64 << 20

// ErrNoFiles is returned by Files for a PDF without embedded files.
var ErrNoFiles = errors.New("the PDF has no embedded files")

// embed adds files to a PDF laid out as gopdf and pack write it: an
// EmbeddedFile stream and a Filespec per file, a name tree of them (the
// names sorted), and the catalog's /Names entry pointing to it. The
// objects are appended after the last one and the cross-reference table
// rebuilt, so the output is a plain single-section file, deterministic
// for the same input.
func embed(in []byte, files []File) ([]byte, error) {
	fs := append([]File(nil), files...)
	sort.Slice(fs, func(i, j int) bool { return fs[i].Name < fs[j].Name })
	for i := 1; i < len(fs); i++ {
		if fs[i].Name == fs[i-1].Name {
			return nil, fmt.Errorf("pdf: two embedded files named %q", fs[i].Name)
		}
	}
	offs, xref, trailer, err := xrefTable(in)
	if err != nil {
		return nil, err
	}
	count := len(offs)
	tree := count + 2*len(fs)
	out := bytes.NewBuffer(make([]byte, 0, len(in)+64<<10))
	out.Write(in[:offs[1]])
	newOffs := make([]int, tree+1)
	catalog := false
	for i := 1; i < count; i++ {
		end := xref
		if i+1 < count {
			end = offs[i+1]
		}
		obj := in[offs[i]:end]
		newOffs[i] = out.Len()
		const cat = "<<\n  /Type /Catalog\n"
		if at := bytes.Index(obj, []byte(cat)); !catalog && at >= 0 && at < 32 {
			catalog = true
			at += len(cat)
			out.Write(obj[:at])
			fmt.Fprintf(out, "  /Names << /EmbeddedFiles %d 0 R >>\n", tree)
			out.Write(obj[at:])
			continue
		}
		out.Write(obj)
	}
	if !catalog {
		return nil, errors.New("pdf: no catalog to add the embedded files to")
	}
	var z bytes.Buffer
	zw, _ := zlib.NewWriterLevel(&z, zlib.BestCompression)
	for k, f := range fs {
		n := count + 2*k
		z.Reset()
		zw.Reset(&z)
		zw.Write(f.Data)
		if err := zw.Close(); err != nil {
			return nil, err
		}
		newOffs[n] = out.Len()
		fmt.Fprintf(out, "%d 0 obj\n<<\n/Type /EmbeddedFile\n/Filter /FlateDecode\n/Length %d\n/Params << /Size %d /CheckSum <%x> >>\n>>\nstream\n",
			n, z.Len(), len(f.Data), md5.Sum(f.Data))
		out.Write(z.Bytes())
		out.WriteString("\nendstream\nendobj\n\n")
		newOffs[n+1] = out.Len()
		fmt.Fprintf(out, "%d 0 obj\n<<\n/Type /Filespec\n/F %s\n/UF <FEFF%s>\n/Desc <FEFF%s>\n/EF << /F %d 0 R /UF %d 0 R >>\n>>\nendobj\n\n",
			n+1, literal(f.Name), utf16hex(f.Name), utf16hex(f.Desc), n, n)
	}
	newOffs[tree] = out.Len()
	fmt.Fprintf(out, "%d 0 obj\n<<\n/Names [", tree)
	for k, f := range fs {
		fmt.Fprintf(out, "\n%s %d 0 R", literal(f.Name), count+2*k+1)
	}
	out.WriteString("\n]\n>>\nendobj\n\n")
	start := out.Len()
	size := tree + 1
	fmt.Fprintf(out, "xref\n0 %d\n0000000000 65535 f \n", size)
	for i := 1; i < size; i++ {
		fmt.Fprintf(out, "%010d 00000 n \n", newOffs[i])
	}
	t := in[trailer:]
	sx := bytes.LastIndex(t, []byte("startxref\n"))
	if sx < 0 {
		return nil, errors.New("pdf: no startxref")
	}
	t = sizeRe.ReplaceAll(t[:sx], []byte(fmt.Sprintf("/Size %d\n", size)))
	out.Write(t)
	fmt.Fprintf(out, "startxref\n%d\n%%%%EOF\n", start)
	return out.Bytes(), nil
}

var sizeRe = regexp.MustCompile(`/Size \d+\n`)

// literal writes b as a PDF literal string, escaping what needs it.
func literal(s string) string {
	var b bytes.Buffer
	b.WriteByte('(')
	for i := 0; i < len(s); i++ {
		c := s[i]
		switch {
		case c == '(' || c == ')' || c == '\\':
			b.WriteByte('\\')
			b.WriteByte(c)
		case c < 0x20 || c >= 0x7f:
			fmt.Fprintf(&b, "\\%03o", c)
		default:
			b.WriteByte(c)
		}
	}
	b.WriteByte(')')
	return b.String()
}

var (
	rootRe   = regexp.MustCompile(`/Root (\d+) 0 R`)
	namesRe  = regexp.MustCompile(`/Names << /EmbeddedFiles (\d+) 0 R >>`)
	efRe     = regexp.MustCompile(`/EF << /F (\d+) 0 R`)
	descRe   = regexp.MustCompile(`/Desc <FEFF([0-9A-Fa-f]*)>`)
	lengthRe = regexp.MustCompile(`/Length (\d+)\n`)
)

// Files reads the embedded files of a PDF that Write made, in name
// order. It reads only the layout Write produces (a classic
// cross-reference table, the catalog's /Names entry, one name-tree node)
// and refuses anything else with an error: a truncated or altered file,
// a PDF from another program (ErrNoFiles when it simply has none).
func Files(data []byte) ([]File, error) {
	r, err := newReader(data)
	if err != nil {
		return nil, err
	}
	obj := r.obj
	cat, err := obj(r.root)
	if err != nil {
		return nil, err
	}
	tn, err := ref(namesRe, cat, "embedded files")
	if err != nil {
		return nil, ErrNoFiles
	}
	tree, err := obj(tn)
	if err != nil {
		return nil, err
	}
	keys, refs, err := nameArray(tree)
	if err != nil {
		return nil, fmt.Errorf("embedded-file names: %v", err)
	}
	var out []File
	total := 0
	for i, name := range keys {
		spec, err := obj(refs[i])
		if err != nil {
			return nil, err
		}
		f := File{Name: name}
		if m := descRe.FindSubmatch(spec); m != nil {
			f.Desc = fromUTF16hex(string(m[1]))
		}
		sn, err := ref(efRe, spec, "stream for embedded file "+strconv.Quote(name))
		if err != nil {
			return nil, err
		}
		st, err := obj(sn)
		if err != nil {
			return nil, err
		}
		if f.Data, err = streamData(st, MaxFileSize); err != nil {
			return nil, fmt.Errorf("embedded file %q: %v", name, err)
		}
		if total += len(f.Data); total > 4*MaxFileSize {
			return nil, errors.New("embedded files too large")
		}
		out = append(out, f)
	}
	return out, nil
}

// streamData inflates the stream of an object Write made.
func streamData(o []byte, max int) ([]byte, error) {
	m := lengthRe.FindSubmatch(o)
	if m == nil {
		return nil, errors.New("stream without /Length")
	}
	n, err := strconv.Atoi(string(m[1]))
	at := bytes.Index(o, []byte(">>\nstream\n"))
	if err != nil || at < 0 || n < 0 || at+10+n > len(o) {
		return nil, errors.New("stream length does not fit the object")
	}
	raw := o[at+10 : at+10+n]
	if !bytes.Contains(o[:at], []byte("/Filter /FlateDecode")) && !bytes.Contains(o[:at], []byte("/Filter/FlateDecode")) {
		return append([]byte(nil), raw...), nil
	}
	zr, err := zlib.NewReader(bytes.NewReader(raw))
	if err != nil {
		return nil, fmt.Errorf("cannot inflate: %v", err)
	}
	data, err := io.ReadAll(io.LimitReader(zr, int64(max)+1))
	if err != nil {
		return nil, fmt.Errorf("cannot inflate: %v", err)
	}
	if len(data) > max {
		return nil, fmt.Errorf("larger than %d bytes", max)
	}
	return data, nil
}

// nameArray reads the /Names [ (key) n 0 R … ] array of a name-tree node.
func nameArray(o []byte) ([]string, []int, error) {
	at := bytes.Index(o, []byte("/Names ["))
	if at < 0 {
		return nil, nil, errors.New("no /Names array")
	}
	p := o[at+len("/Names ["):]
	var keys []string
	var refs []int
	for {
		p = bytes.TrimLeft(p, " \r\n\t")
		if len(p) == 0 {
			return nil, nil, errors.New("unterminated array")
		}
		if p[0] == ']' {
			break
		}
		if p[0] != '(' {
			return nil, nil, errors.New("expected a name string")
		}
		s, rest, err := readLiteral(p)
		if err != nil {
			return nil, nil, err
		}
		f := bytes.Fields(rest)
		if len(f) < 3 || string(f[1]) != "0" || !bytes.HasPrefix(f[2], []byte("R")) {
			return nil, nil, errors.New("expected an object reference")
		}
		n, err := strconv.Atoi(string(f[0]))
		if err != nil {
			return nil, nil, errors.New("bad object reference")
		}
		r := bytes.Index(rest, []byte("R"))
		p = rest[r+1:]
		if len(keys) > 0 && s <= keys[len(keys)-1] {
			return nil, nil, errors.New("names not in order")
		}
		keys = append(keys, s)
		refs = append(refs, n)
	}
	return keys, refs, nil
}

// readLiteral reads a literal string written by literal.
func readLiteral(p []byte) (string, []byte, error) {
	var b []byte
	for i := 1; i < len(p); i++ {
		c := p[i]
		switch c {
		case ')':
			return string(b), p[i+1:], nil
		case '(':
			return "", nil, errors.New("unescaped ( in a name")
		case '\\':
			if i+1 >= len(p) {
				return "", nil, errors.New("unterminated string")
			}
			i++
			if d := p[i]; d >= '0' && d <= '7' {
				if i+2 >= len(p) {
					return "", nil, errors.New("unterminated string")
				}
				v, err := strconv.ParseUint(string(p[i:i+3]), 8, 8)
				if err != nil {
					return "", nil, errors.New("bad octal escape")
				}
				b = append(b, byte(v))
				i += 2
				continue
			}
			b = append(b, p[i])
		default:
			b = append(b, c)
		}
	}
	return "", nil, errors.New("unterminated string")
}

// fromUTF16hex decodes UTF-16BE hex digits (utf16hex's output).
func fromUTF16hex(h string) string {
	var u []uint16
	for i := 0; i+4 <= len(h); i += 4 {
		v, err := strconv.ParseUint(h[i:i+4], 16, 16)
		if err != nil {
			return ""
		}
		u = append(u, uint16(v))
	}
	var rs []rune
	for i := 0; i < len(u); i++ {
		r := rune(u[i])
		if r >= 0xD800 && r < 0xDC00 && i+1 < len(u) {
			r = 0x10000 + (r-0xD800)<<10 + (rune(u[i+1]) - 0xDC00)
			i++
		}
		rs = append(rs, r)
	}
	return string(rs)
}
