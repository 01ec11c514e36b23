// Package pdf writes laid-out pages (layout.Pages) as a PDF. It is the only
// package in plinth that imports the PDF library (github.com/signintech/gopdf).
//
// Output is deterministic: the same pages and options give the same bytes.
// The creation and modification dates come from Options.Time, never the
// clock; no document ID is written; fonts are embedded subsets of the Go
// fonts under fixed names; images are keyed by a hash of their bytes.
// Bookmarks are one level, one per sheet. Links are checked against the
// anchors before anything is drawn, so a dangling link is an error rather
// than a broken object. The document information carries the title,
// author, subject, keywords and the full input fingerprint (in Keywords).
//
// Options.Files are embedded as attachments: an EmbeddedFile stream and a
// Filespec per file, listed in the catalog's EmbeddedFiles name tree in
// name order (embed.go, after pack); Files reads them back from a PDF
// Write made, and refuses anything else with an error.
//
// The page content streams are plinth's own (stream.go, paint.go): each
// page is painted with strconv into a reused buffer, with the font and
// colours set only when they change and consecutive text in one text
// object, and compressed at once on another core (zip.go, with
// klauspost/compress at its fastest level); only the compressed bytes are
// kept, and with Options.Release the page's boxes are dropped as soon as
// it is painted. Bodies paints the bodies of a sheet's pages while the
// layout is still at work on other sheets (layout.Doc.Final), on the
// layout's goroutines, and drops their boxes; Write then paints only each
// page's furniture (title block, footer, and the boxes the layout kept
// for their page references) and joins its compressed stream to the body's
// (bodies.go), so a long document is never held as boxes whole. The
// painter names each face's font resource after the face, and pack
// renames gopdf's to match. Glyph indices and kerning are gopdf's own
// (glyphs.go reads the faces with gopdf's parser), and gopdf writes
// everything else: the font subsets (told the characters used, in
// character order), pages, outlines, links, anchors, images and the
// cross-reference table; what a body painted ahead asks of gopdf (its
// content object, links, anchors) is recorded and asked in the same order
// when its page is written. gopdf opens each page's content object where
// the painter starts drawing, and pack puts the painted stream in its
// place.
//
// Write draws into memory and copies the finished file to the writer; the
// caller writes to a temporary file and renames it into place.
package pdf
