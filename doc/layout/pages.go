package layout

import (
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/source"
)

var _ draw.Item // Box.Items

// Pages is a laid-out document, ready to be written: every page with its
// boxes in points, and the bookmarks, one per sheet.
type Pages struct {
	Info    Info
	Pages   []*Page
	Outline []Bookmark
}

// Bookmark is a PDF outline entry pointing at a place on a page.
type Bookmark struct {
	Title string
	Page  int     // index into Pages.Pages
	Y     float64 // from the top of the page
}

// Page is one page: its size, which sheet it belongs to, and its boxes.
type Page struct {
	W, H   float64
	Sheet  int // index into Doc.Sheets
	Number int // page within the sheet, from 1
	Boxes  []*Box
}

// Box is a laid-out piece of content: a line of a paragraph, a table row,
// a statement, the title block. X, Y, W, H place it on the page (top-left
// origin, y down); Items hold its primitives relative to the box's top-left
// corner (X, Y), and Kids any boxes inside it (placed on the page in their
// own right). Pos is the source span it came from.
type Box struct {
	Kind       string
	Pos        source.Span
	X, Y, W, H float64
	Items      []draw.Item
	Kids       []*Box
}

// move shifts b and its kids by (dx, dy); items move with their box.
func (b *Box) move(dx, dy float64) {
	b.X += dx
	b.Y += dy
	for _, k := range b.Kids {
		k.move(dx, dy)
	}
}

// Walk calls fn for b and every box inside it, depth first.
func (b *Box) Walk(fn func(*Box)) {
	fn(b)
	for _, k := range b.Kids {
		k.Walk(fn)
	}
}
