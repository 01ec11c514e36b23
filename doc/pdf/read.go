package pdf

import (
	"bytes"
	"errors"
	"fmt"
	"regexp"
	"strconv"
	"strings"
)

// reader reads objects of a PDF laid out as Write makes it.
type reader struct {
	data                []byte
	offs                []int
	xref, trailer, root int
}

func newReader(data []byte) (*reader, error) {
	if !bytes.HasPrefix(data, []byte("%PDF-")) {
		return nil, errors.New("not a PDF")
	}
	if !bytes.HasSuffix(bytes.TrimRight(data, "\r\n"), []byte("%%EOF")) {
		return nil, errors.New("the PDF is truncated (no %EOF at its end)")
	}
	offs, xref, trailer, err := xrefTable(data)
	if err != nil {
		return nil, fmt.Errorf("not a PDF plinth wrote, or damaged: %v", err)
	}
	r := &reader{data: data, offs: offs, xref: xref, trailer: trailer}
	if r.root, err = ref(rootRe, data[trailer:], "document catalog in the trailer"); err != nil {
		return nil, err
	}
	return r, nil
}

// obj is object n, from "n 0 obj" to the next object.
func (r *reader) obj(n int) ([]byte, error) {
	if n < 1 || n >= len(r.offs) {
		return nil, fmt.Errorf("object %d is not in the cross-reference table", n)
	}
	end := r.xref
	if n+1 < len(r.offs) {
		end = r.offs[n+1]
	}
	o := r.data[r.offs[n]:end]
	if !bytes.HasPrefix(o, []byte(strconv.Itoa(n)+" 0 obj\n")) {
		return nil, fmt.Errorf("object %d is not where the cross-reference table says", n)
	}
	return o, nil
}

// ref reads the object number the first submatch of re gives in b.
func ref(re *regexp.Regexp, b []byte, what string) (int, error) {
	m := re.FindSubmatch(b)
	if m == nil {
		return 0, fmt.Errorf("no %s", what)
	}
	n, err := strconv.Atoi(string(m[1]))
	if err != nil {
		return 0, fmt.Errorf("bad %s", what)
	}
	return n, nil
}

var (
	pagesRe     = regexp.MustCompile(`/Pages (\d+) 0 R`)
	kidsRe      = regexp.MustCompile(`/Kids \[([0-9 R]*)\]`)
	refRe       = regexp.MustCompile(`(\d+) 0 R`)
	resRe       = regexp.MustCompile(`/Resources (\d+) 0 R`)
	fontRe      = regexp.MustCompile(`/(F\d+) (\d+) 0 R`)
	toUniRe     = regexp.MustCompile(`/ToUnicode (\d+) 0 R`)
	contentsRe  = regexp.MustCompile(`/Contents\s+(\d+) 0 R`)
	bfrangeRe   = regexp.MustCompile(`<([0-9A-Fa-f]{4})>\s*<([0-9A-Fa-f]{4})>\s*<([0-9A-Fa-f]{4,8})>`)
	textTokenRe = regexp.MustCompile(`/(F\d+) [\d.]+ Tf|<([0-9A-Fa-f]*)>|\] TJ| Tj\n`)
)

// PageTexts returns the text set on each page of a PDF Write made, in
// page order: each font's glyph codes decoded through its ToUnicode map,
// the strings of one text operation joined, operations separated by a
// newline. It reads only Write's own layout and refuses others.
func PageTexts(data []byte) ([]string, error) {
	r, err := newReader(data)
	if err != nil {
		return nil, err
	}
	cat, err := r.obj(r.root)
	if err != nil {
		return nil, err
	}
	pn, err := ref(pagesRe, cat, "page tree")
	if err != nil {
		return nil, err
	}
	pages, err := r.obj(pn)
	if err != nil {
		return nil, err
	}
	kids := kidsRe.FindSubmatch(pages)
	if kids == nil {
		return nil, errors.New("no pages")
	}
	maps := map[int]map[int]string{} // font object → glyph code → text
	fontMap := func(n int) (map[int]string, error) {
		if m, ok := maps[n]; ok {
			return m, nil
		}
		f, err := r.obj(n)
		if err != nil {
			return nil, err
		}
		m := map[int]string{}
		if tn, err := ref(toUniRe, f, "ToUnicode"); err == nil {
			o, err := r.obj(tn)
			if err != nil {
				return nil, err
			}
			cmap, err := streamData(o, MaxFileSize)
			if err != nil {
				return nil, fmt.Errorf("font %d: %v", n, err)
			}
			for _, g := range bfrangeRe.FindAllSubmatch(cmap, -1) {
				lo, _ := strconv.ParseUint(string(g[1]), 16, 16)
				hi, _ := strconv.ParseUint(string(g[2]), 16, 16)
				u := fromUTF16hex(string(g[3]))
				if hi < lo || hi-lo > 0xffff || len([]rune(u)) != 1 {
					continue
				}
				base := []rune(u)[0]
				for c := lo; c <= hi; c++ {
					m[int(c)] = string(base + rune(c-lo))
				}
			}
		}
		maps[n] = m
		return m, nil
	}
	var out []string
	for _, k := range refRe.FindAllSubmatch(kids[1], -1) {
		pg, err := strconv.Atoi(string(k[1]))
		if err != nil {
			return nil, errors.New("bad page reference")
		}
		po, err := r.obj(pg)
		if err != nil {
			return nil, err
		}
		fonts := map[string]int{}
		if rn, err := ref(resRe, po, "resources"); err == nil {
			res, err := r.obj(rn)
			if err != nil {
				return nil, err
			}
			for _, f := range fontRe.FindAllSubmatch(res, -1) {
				n, _ := strconv.Atoi(string(f[2]))
				fonts[string(f[1])] = n
			}
		}
		cn, err := ref(contentsRe, po, "page contents")
		if err != nil {
			return nil, fmt.Errorf("page %d: %v", len(out)+1, err)
		}
		co, err := r.obj(cn)
		if err != nil {
			return nil, err
		}
		content, err := streamData(co, 64*MaxFileSize)
		if err != nil {
			return nil, fmt.Errorf("page %d: %v", len(out)+1, err)
		}
		var b strings.Builder
		var cur map[int]string
		for _, t := range textTokenRe.FindAllSubmatch(content, -1) {
			switch {
			case t[1] != nil:
				cur = nil
				if n, ok := fonts[string(t[1])]; ok {
					if cur, err = fontMap(n); err != nil {
						return nil, err
					}
				}
			case t[0][0] == '<':
				h := t[2]
				for i := 0; i+4 <= len(h) && cur != nil; i += 4 {
					c, _ := strconv.ParseUint(string(h[i:i+4]), 16, 16)
					b.WriteString(cur[int(c)])
				}
			default:
				b.WriteByte('\n')
			}
		}
		out = append(out, b.String())
	}
	return out, nil
}
