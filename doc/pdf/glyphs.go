package pdf

import (
	"errors"
	"fmt"
	"sync"

	"github.com/signintech/gopdf"
	"github.com/signintech/gopdf/fontmaker/core"

	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// ttfOption is how every face is embedded.
var ttfOption = gopdf.TtfOption{UseKerning: true}

// parsed holds, per face, gopdf's own reading of the font (parsed once per
// process and then only read), so glyph indices and kerning in the page
// streams are the ones gopdf embeds.
var (
	parseOnce [fonts.NumFaces]sync.Once
	parsed    [fonts.NumFaces]*gopdf.SubsetFontObj
	parseErr  [fonts.NumFaces]error
)

func parsedFace(f fonts.Face) (*gopdf.SubsetFontObj, error) {
	parseOnce[f].Do(func() {
		s := &gopdf.SubsetFontObj{CharacterToGlyphIndex: gopdf.NewMapOfCharacterToGlyphIndex()}
		s.SetTtfFontOption(ttfOption)
		s.SetFamily(f.PDFName())
		if err := s.SetTTFData(f.TTF()); err != nil {
			parseErr[f] = fmt.Errorf("pdf: reading %s: %w", f, err)
			return
		}
		parsed[f] = s
	})
	return parsed[f], parseErr[f]
}

// glyphs maps one face's characters to glyphs for one Write (or for one
// painter of bodies ahead, bodies.go), and keeps the characters used:
// gopdf is told them at the end (subsetFonts), in character order, so its
// subset does not depend on which painter met a character first.
type glyphs struct {
	font   *gopdf.SubsetFontObj
	kerns  core.KernMap // gopdf's kerning pairs, left glyph → right glyph → TTF units (nil: none)
	lefts  []bool       // lefts[g]: glyph g begins a pair in kerns (most begin none)
	number int          // the face's font resource, /F<number+1>: the face's own number (pack renames gopdf's)
	upem   int
	low    []uint32 // rune → glyph+1 for runes below len(low); 0 = not looked up
	high   map[rune]uint32
	used   []rune
}

const lowRunes = 0x3000

func newGlyphs(f fonts.Face) (*glyphs, error) {
	number := int(f)
	font, err := parsedFace(f)
	if err != nil {
		return nil, err
	}
	g := &glyphs{font: font, number: number, upem: int(font.GetTTFParser().UnitsPerEm()),
		low: make([]uint32, lowRunes), high: map[rune]uint32{}}
	if k := font.GetTTFParser().Kern(); k != nil && ttfOption.UseKerning {
		g.kerns = k.Kerning
		for l := range g.kerns {
			if l < 1<<16 {
				if int(l) >= len(g.lefts) {
					g.lefts = append(g.lefts, make([]bool, int(l)+1-len(g.lefts))...)
				}
				g.lefts[l] = true
			}
		}
	}
	return g, nil
}

// glyph is the glyph r is drawn with and the character gopdf writes for
// it: r itself, or a space when the face lacks r (gopdf's default
// substitute).
func (g *glyphs) glyph(r rune) (rune, uint, error) {
	var v uint32
	if r >= 0 && r < lowRunes {
		v = g.low[r]
	} else {
		v = g.high[r]
	}
	if v == 0 {
		gi, err := g.lookup(r)
		if err != nil {
			return 0, 0, err
		}
		v = uint32(gi) + 1
		if r >= 0 && r < lowRunes {
			g.low[r] = v
		} else {
			g.high[r] = v
		}
		g.used = append(g.used, r)
	}
	gi := uint(v - 1)
	if gi&missing != 0 {
		return ' ', gi &^ missing, nil
	}
	return r, gi, nil
}

// missing marks a looked-up glyph that stands in for a missing character.
const missing = 1 << 30

// lookup follows gopdf's SubsetFontObj.AddChars: the character's glyph,
// or, when the face has none, the glyph of the substitute (a space; glyph
// 0 when even that is missing).
func (g *glyphs) lookup(r rune) (uint, error) {
	gi, err := g.font.CharCodeToGlyphIndex(r)
	if err == nil {
		return gi, nil
	}
	if !errors.Is(err, gopdf.ErrGlyphNotFound) {
		return 0, err
	}
	sub := gopdf.DefaultOnGlyphNotFoundSubstitute(r)
	gi, err = g.font.CharCodeToGlyphIndex(sub)
	if err != nil {
		gi = 0
	}
	return gi | missing, nil
}

// kern is gopdf's kerning adjustment between two glyphs in thousandths of
// an em (TTF units converted as gopdf converts them): its table read as
// SubsetFontObj.KernValueByLeft reads it, without the copy that makes.
func (g *glyphs) kern(left, right uint) int {
	if left < uint(len(g.lefts)) && !g.lefts[left] {
		return 0
	}
	v, ok := g.kerns[left][right]
	if !ok {
		return 0
	}
	return ttfToPDF(int(v), g.upem)
}

// ttfToPDF is gopdf's convertTTFUnit2PDFUnit (unexported there), kept
// operation for operation so the kerning written is gopdf's.
func ttfToPDF(n, upem int) int {
	if n < 0 {
		rest1 := n % upem
		storrest := 1000 * rest1
		ledd2 := 0
		if storrest != 0 {
			ledd2 = rest1 / storrest
		}
		return -((-1000*n)/upem - int(ledd2))
	}
	return (n/upem)*1000 + ((n%upem)*1000)/upem
}
