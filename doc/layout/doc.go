// Package layout sets plinth's calculation packages on pages: plinth's own
// layout engine, in points, producing a tree of boxes with source spans
// before any PDF byte is written (doc/pdf draws the result).
//
// # Input: the contract
//
// A Doc is the whole package: Info (PDF title, author, subject, keywords,
// the input Fingerprint, and for a variant run the overridden inputs), an
// optional page Template (nil = built-in A4), and Sheets. Each Sheet starts
// on a new page; its Fields fill the title block (a blank Checked prints
// NOT CHECKED), its Bookmark names its one PDF bookmark, and its Blocks are
// the body. Every block carries the source.Span (Pos) that problems with
// it are reported at.
//
// Blocks (all used as pointers):
//
//	*Heading    numbered 1, 1.1, 1.1.1 (given or computed per sheet), kept
//	            with what follows; optional Anchor
//	*Para       runs of text
//	*List       bullets or numbers; items are block lists; lists nest
//	*Table      header row (repeated on each page), rows, per-column Align,
//	            optional caption; widths measured, cells wrap
//	*Image      PNG or JPEG bytes, scaled to fit, optional caption
//	*Code       monospaced, shaded
//	*Statement  Symbol = Expr = Subst = Result, with Note and Ref
//	*Input      Symbol = Value, with Note and Ref
//	*Check      Left = value  ≤  Right = value, utilisation, OK / NOT OK
//	*Caution    NOTE / CAUTION / WARNING panel (rising severity) with a title and body blocks
//	*Drawing    vector primitives (draw.Item), W × H points
//	*PageBreak  and *Anchor (a named place links can jump to)
//
// Text is a list of Runs, each in one Style (Regular, Bold, Italic,
// BoldItalic, Mono), optionally raised or lowered (Sup, Sub), optionally a
// link to a named anchor, or an inline formula (Math), or a page
// reference (Page: the page an anchor lands on, or the pages of the sheet
// holding it, which the layout fills in). Formulas are
// eqn.Nodes: build them with the eqn package (eqn.Quantity and eqn.Unit
// print values with units; compose converts the engine's formulas into
// them, so the layout knows no engine type).
//
// # Output
//
// Document returns Pages: each Page holds Boxes (kind, source span,
// rectangle on the page, draw.Items relative to the box's top-left corner,
// kids), and the Outline holds one bookmark per sheet. Pages.Dump writes
// the tree as text for golden tests. Problems — a character missing from
// the fonts, a link or page reference to an anchor that does not exist,
// an anchor defined twice, a calculation line taller than a page, an
// image that is not PNG or JPEG — are collected and returned together as
// a source.List, sorted, each at its span.
//
// # Passes
//
// Sheets are laid out in parallel, each on its own: a sheet's pages
// depend on nothing outside it. Page references print a dash in the
// first pass; then the anchors' pages are read off and each sheet whose
// references now read differently is laid out again (refs.go), until
// none does, at most three layouts of a sheet. Change bars (Doc.Bars,
// bars.go) are drawn on the final pages.
//
// # Rules of the page
//
// Lines break at spaces, measured with the fonts' advance widths; a word
// longer than the line breaks after a '/' or, failing that, between
// characters. Paragraphs keep their first two and last two lines together.
// Headings stay with the next piece. A statement, input or check line is
// never split: a formula too wide for its column wraps before a top-level
// relation, then before a top-level + or −. Table rows never split; the
// header row repeats on each new page. Each page gets the template's title
// block ("Sheet n of N" counts pages across the whole package), the variant
// banner when Info.Variant is set, and the footer with the short
// fingerprint and the page number within the sheet.
//
// Page templates are YAML data (see LoadTemplate and templates/page-a4.yaml).
package layout
