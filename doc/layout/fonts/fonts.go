package fonts

import (
	"fmt"
	"sync"
	"unicode/utf8"

	"github.com/go-fonts/dejavu/dejavumathtexgyre"
	"github.com/go-fonts/dejavu/dejavuserif"
	"github.com/go-fonts/dejavu/dejavuserifbold"
	"github.com/go-fonts/dejavu/dejavuserifbolditalic"
	"github.com/go-fonts/dejavu/dejavuserifitalic"
	"golang.org/x/image/font/gofont/gomono"
	"golang.org/x/image/font/gofont/gomonobold"
)

// Face is one of the embedded typefaces.
type Face uint8

const (
	Regular Face = iota
	Bold
	Italic
	BoldItalic
	Mono
	MonoBold
	Math     // the math face: operators and relations in formulas
	NumFaces // number of faces; not a face
)

var faceNames = [NumFaces]string{"DejaVu Serif", "DejaVu Serif Bold", "DejaVu Serif Italic",
	"DejaVu Serif Bold Italic", "Go Mono", "Go Mono Bold", "DejaVu Math TeX Gyre"}

// String is the face's human name ("DejaVu Serif Bold Italic").
func (f Face) String() string {
	if f < NumFaces {
		return faceNames[f]
	}
	return fmt.Sprintf("Face(%d)", int(f))
}

// Valid reports whether f names an embedded face.
func (f Face) Valid() bool { return f < NumFaces }

// TTF returns the face's TrueType bytes (shared; do not modify).
func (f Face) TTF() []byte {
	switch f {
	case Bold:
		return dejavuserifbold.TTF
	case Italic:
		return dejavuserifitalic.TTF
	case BoldItalic:
		return dejavuserifbolditalic.TTF
	case Mono:
		return gomono.TTF
	case MonoBold:
		return gomonobold.TTF
	case Math:
		return dejavumathtexgyre.TTF
	}
	return dejavuserif.TTF
}

// PDFName is the face's PostScript-style name in the PDF, with a fixed
// six-letter subset tag (only the glyphs used are embedded).
func (f Face) PDFName() string {
	return [NumFaces]string{"PLNTAA+DejaVuSerif", "PLNTAB+DejaVuSerif-Bold", "PLNTAC+DejaVuSerif-Italic",
		"PLNTAD+DejaVuSerif-BoldItalic", "PLNTAE+GoMono", "PLNTAF+GoMonoBold", "PLNTAG+DejaVuMathTeXGyre"}[f%NumFaces]
}

// Font is a parsed face ready for measuring. Metrics are in thousandths of
// an em unless a method says otherwise.
type Font struct {
	face Face
	t    *ttf
	adv  []int32 // per glyph advance, 1/1000 em, as the PDF width array
	// kerns[g] says glyph g begins a kerning pair: most glyphs begin
	// none, and for them the pair table is not consulted
	kerns []bool
}

var (
	once   [NumFaces]sync.Once
	loaded [NumFaces]*Font
)

// Get returns the parsed font for f. The embedded fonts are known to parse;
// a failure would be a build defect, so Get panics on it.
func Get(f Face) *Font {
	if !f.Valid() {
		f = Regular
	}
	once[f].Do(func() {
		t, err := parseTTF(f.TTF())
		if err != nil {
			panic(fmt.Sprintf("fonts: embedded %s: %v", f, err))
		}
		fo := &Font{face: f, t: t, adv: make([]int32, len(t.advances)), kerns: make([]bool, t.glyphCount)}
		for g, a := range t.advances {
			fo.adv[g] = int32(int(a) * 1000 / t.upem)
		}
		for pair := range t.kern {
			if l := int(pair >> 16); l < len(fo.kerns) {
				fo.kerns[l] = true
			}
		}
		loaded[f] = fo
	})
	return loaded[f]
}

// Face is the face this font was loaded from.
func (f *Font) Face() Face { return f.face }

func (f *Font) glyph(r rune) int {
	if r >= 0 && r < lowLimit {
		return int(f.t.low[r])
	}
	return int(f.t.high[r])
}

// Has reports whether the font has a glyph for r.
func (f *Font) Has(r rune) bool { return f.glyph(r) != 0 }

// Missing returns the first rune of s the font has no glyph for.
func (f *Font) Missing(s string) (rune, bool) {
	for _, r := range s {
		if f.glyph(r) == 0 {
			return r, true
		}
	}
	return 0, false
}

// Advance is r's advance width in thousandths of an em (0 if missing).
func (f *Font) Advance(r rune) int {
	g := f.glyph(r)
	if g == 0 {
		return 0
	}
	return int(f.adv[g])
}

// Kern is the kerning between l and r in thousandths of an em, truncated
// toward zero as the PDF writer does; 0 when the font has no kern table.
func (f *Font) Kern(l, r rune) int {
	if len(f.t.kern) == 0 {
		return 0
	}
	gl, gr := f.glyph(l), f.glyph(r)
	return f.kern(gl, gr)
}

// kern is the kerning of the glyph pair (l, r) in thousandths of an em.
func (f *Font) kern(l, r int) int {
	if l >= len(f.kerns) || !f.kerns[l] {
		return 0
	}
	return int(f.t.kern[uint32(l)<<16|uint32(r)]) * 1000 / f.t.upem
}

// Units is the width of s in thousandths of an em, kerning included.
// Runes the font lacks count as zero (check with Missing first).
func (f *Font) Units(s string) int {
	w := 0
	kern := len(f.t.kern) > 0
	var prev int
	for i := 0; i < len(s); {
		r, n := rune(s[i]), 1
		if r >= utf8.RuneSelf {
			r, n = utf8.DecodeRuneInString(s[i:])
		}
		g := f.glyph(r)
		if g != 0 {
			w += int(f.adv[g])
			if kern && i > 0 {
				w += f.kern(prev, g)
			}
			prev = g
		}
		i += n
	}
	return w
}

// Measure is, in one pass over s, its Width and Ink at size and the first
// rune the font lacks (Missing).
func (f *Font) Measure(s string, size float64) (width, above, below float64, missing rune, lacks bool) {
	w, top, bottom := 0, 0, 0
	kern := len(f.t.kern) > 0
	var prev int
	for i := 0; i < len(s); {
		r, n := rune(s[i]), 1
		if r >= utf8.RuneSelf {
			r, n = utf8.DecodeRuneInString(s[i:])
		}
		g := f.glyph(r)
		if g != 0 {
			w += int(f.adv[g])
			if kern && i > 0 {
				w += f.kern(prev, g)
			}
			prev = g
			top = max(top, int(f.t.yMax[g]))
			bottom = min(bottom, int(f.t.yMin[g]))
		} else if !lacks {
			missing, lacks = r, true
		}
		i += n
	}
	return float64(w) * size / 1000, f.em(top, size), f.em(-bottom, size), missing, lacks
}

// Width is the width of s set at size points, in points.
func (f *Font) Width(s string, size float64) float64 {
	return float64(f.Units(s)) * size / 1000
}

// Ink is how far the glyphs of s reach above and below the baseline, in
// points at size (both positive when the ink crosses the baseline). A
// string with no visible ink reports (0, 0).
func (f *Font) Ink(s string, size float64) (above, below float64) {
	top, bottom := 0, 0
	for _, r := range s {
		if g := f.glyph(r); g != 0 {
			top = max(top, int(f.t.yMax[g]))
			bottom = min(bottom, int(f.t.yMin[g]))
		}
	}
	return f.em(top, size), f.em(-bottom, size)
}

// Ascent is the distance from baseline to the top of the tallest glyphs,
// in points at size (hhea ascender).
func (f *Font) Ascent(size float64) float64 { return f.em(f.t.ascent, size) }

// Descent is the distance below the baseline, positive, in points at size.
func (f *Font) Descent(size float64) float64 { return -f.em(f.t.descent, size) }

// CapHeight is the height of capital letters in points at size.
func (f *Font) CapHeight(size float64) float64 { return f.em(f.t.capHeight, size) }

// XHeight is the height of lower-case x in points at size.
func (f *Font) XHeight(size float64) float64 { return f.em(f.t.xHeight, size) }

func (f *Font) em(units int, size float64) float64 {
	return float64(units) * size / float64(f.t.upem)
}
