// Package fonts holds the typefaces plinth embeds in every PDF — the Go
// fonts from golang.org/x/image/font/gofont — and measures text set in them.
//
// Widths are computed exactly as the PDF will place the glyphs: each glyph
// advance is converted to thousandths of an em the way the PDF writer's
// width array is written (truncated), and kerning pairs from a TrueType
// 'kern' table (format 0) are applied when the font has one (the Go fonts
// have none; the code is there for a firm's own fonts later). So a width
// measured here is the width the reader draws, to the last thousandth of an
// em.
//
// Fonts are parsed once, on first use, from the embedded TrueType bytes by a
// small reader of the head, hhea, hmtx, cmap (formats 4 and 12), OS/2 and
// kern tables; nothing is read from the system.
package fonts
