// Package fonts holds the typefaces plinth embeds in every PDF and
// measures text set in them: DejaVu Serif (regular, bold, italic, bold
// italic; github.com/go-fonts/dejavu, Bitstream Vera licence with DejaVu
// changes in the public domain) for text and the letters of formulas,
// DejaVu Math TeX Gyre (the same licence; its math extensions are in the
// public domain) for the operators and
// relations of formulas, and Go Mono (golang.org/x/image/font/gofont) for
// fingerprints and code. All are TrueType outlines, embedded as subsets.
//
// Widths are computed exactly as the PDF will place the glyphs: each glyph
// advance is converted to thousandths of an em the way the PDF writer's
// width array is written (truncated), and kerning pairs from a TrueType
// 'kern' table (format 0) are applied when the font has one (DejaVu
// Serif has one; Go Mono and the math face have none). So a width
// measured here is the width the reader draws, to the last thousandth of an
// em.
//
// Fonts are parsed once, on first use, from the embedded TrueType bytes by a
// small reader of the head, hhea, hmtx, cmap (formats 4 and 12), OS/2 and
// kern tables; nothing is read from the system.
package fonts
