package pdf

import (
	"bytes"
	"errors"
	"slices"

	"github.com/klauspost/compress/flate"
	"github.com/signintech/gopdf"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// painter draws items into the page's content stream, setting graphics
// and text state only when it changes. It writes the stream itself
// (stream.go); gopdf is asked only for what lives outside the stream: the
// page's content object (opened on the first operator), images, links,
// anchors and, at the end, the characters each font subset needs.
type painter struct {
	gp      *gopdf.GoPdf
	c       content
	opened  bool // gopdf has made the page's content object
	inText  bool // a text object is open
	glyphs  [fonts.NumFaces]*glyphs
	images  map[string]int // image ID → gopdf object index
	scratch []glyphKern    // one text's glyphs

	size   float64 // size of the last text drawn (anchors are placed by it)
	font   *glyphs // the font set, at fontSize
	fontSz float64
	stroke draw.Color
	fill   draw.Color // the fill colour, text's included
	width  float64
	dash   []float64
	// which of the above hold on the current page (a new page's content
	// stream starts from the default graphics state)
	hasFont, hasStroke, hasFill bool

	// ahead: a body painted before Write (bodies.go), with no gopdf: its
	// calls on gopdf are recorded in events, and its faces are read as
	// they are met.
	ahead  bool
	events []event
	zw     *flate.Writer
	zbuf   bytes.Buffer
}

// glyphKern is a glyph and the kerning before it.
type glyphKern struct {
	g    uint
	kern int
}

// page starts a page h points high, its stream written into buf.
func (p *painter) page(h float64, buf []byte) {
	p.hasFont, p.hasStroke, p.hasFill, p.inText = false, false, false, false
	p.c.b, p.c.h, p.opened = buf[:0], h, false
}

// finish ends the page's stream: it closes the open text object.
func (p *painter) finish() {
	if p.inText {
		p.c.textEnd()
		p.inText = false
	}
}

// open makes sure gopdf has the page's content object, so the objects of
// the file keep the order gopdf gives them when it draws the page itself
// (pack puts this stream in the object's place).
func (p *painter) open() {
	if !p.opened {
		if p.ahead {
			p.events = append(p.events, event{kind: evOpen})
		} else {
			p.gp.SetStrokeColor(0, 0, 0)
		}
		p.opened = true
	}
}

// shapes makes ready for a path or image: the page's stream open and no
// text object.
func (p *painter) shapes() {
	p.open()
	if p.inText {
		p.c.textEnd()
		p.inText = false
	}
}

func (p *painter) box(b *layout.Box) error {
	for _, it := range b.Items {
		if err := p.item(it, b.X, b.Y); err != nil {
			return err
		}
	}
	for _, k := range b.Kids {
		if err := p.box(k); err != nil {
			return err
		}
	}
	return nil
}

func (p *painter) setStroke(pt draw.Paint) {
	fresh := !p.hasStroke
	p.hasStroke = true
	if fresh || pt.Stroke != p.stroke {
		p.c.color(pt.Stroke.R, pt.Stroke.G, pt.Stroke.B, "RG")
		p.stroke = pt.Stroke
	}
	if fresh || pt.Width != p.width {
		p.c.lineWidth(pt.Width)
		p.width = pt.Width
	}
	if fresh || !slices.Equal(pt.Dash, p.dash) {
		if len(pt.Dash) == 0 {
			p.c.solid()
		} else {
			p.c.dash(pt.Dash)
		}
		p.dash = append(p.dash[:0], pt.Dash...)
	}
}

func (p *painter) setFill(c draw.Color) {
	if !p.hasFill || c != p.fill {
		p.c.color(c.R, c.G, c.B, "rg")
		p.fill, p.hasFill = c, true
	}
}

// style sets the paint for a shape and returns its style letters (F fill,
// D stroke).
func (p *painter) style(pt draw.Paint) string {
	s := ""
	if pt.Filled {
		s += "F"
	}
	if pt.Width > 0 {
		s += "D"
	}
	if s == "" {
		return s
	}
	p.shapes()
	if pt.Filled {
		p.setFill(pt.Fill)
	}
	if pt.Width > 0 {
		p.setStroke(pt)
	}
	return s
}

// drawText writes a text item: in the open text object (or a new one),
// its font and colour if they changed, its position, then the glyphs with
// gopdf's kerning adjustments between them (TJ when there are any).
func (p *painter) drawText(v draw.Text, x, y float64) error {
	g, err := p.face(v.Face)
	if err != nil {
		return err
	}
	p.size = v.Size
	gs := p.scratch[:0]
	kerned := false
	var prev uint
	for i, r := range v.Text {
		_, gi, err := g.glyph(r)
		if err != nil {
			return err
		}
		k := 0
		if i > 0 {
			k = g.kern(prev, gi)
			kerned = kerned || k != 0
		}
		gs = append(gs, glyphKern{gi, k})
		prev = gi
	}
	p.scratch = gs
	p.open()
	if !p.inText {
		p.c.textBegin()
		p.inText = true
	}
	if !p.hasFont || g != p.font || v.Size != p.fontSz {
		p.c.font(g.number+1, v.Size)
		p.font, p.fontSz, p.hasFont = g, v.Size, true
	}
	p.setFill(v.Color)
	p.c.textAt(x, y)
	if kerned {
		p.c.s("[<")
	} else {
		p.c.s("<")
	}
	for _, gk := range gs {
		if gk.kern != 0 {
			p.c.kern(-gk.kern)
		}
		p.c.glyph(gk.g)
	}
	if kerned {
		p.c.s(">] TJ\n")
	} else {
		p.c.s("> Tj\n")
	}
	return nil
}

// face is the glyphs of face f: those Write made for the faces the pages
// use, or for a body painted ahead the face's own, made when first met.
func (p *painter) face(f fonts.Face) (*glyphs, error) {
	var g *glyphs
	if f.Valid() {
		g = p.glyphs[f]
		if g == nil && p.ahead {
			var err error
			if g, err = newGlyphs(f); err != nil {
				return nil, err
			}
			p.glyphs[f] = g
		}
	}
	if g == nil {
		return nil, gopdf.ErrMissingFontFamily
	}
	return g, nil
}

// errImageAhead: a body with an image is painted by Write (bodies.go).
var errImageAhead = errors.New("pdf: an image in a body painted ahead")

// item draws it moved by (dx, dy) (its box's corner).
func (p *painter) item(it draw.Item, dx, dy float64) error {
	switch v := it.(type) {
	case draw.Text:
		if v.Text == "" {
			if p.ahead && v.Face.Valid() {
				_, err := p.face(v.Face) // the face is embedded all the same
				return err
			}
			return nil
		}
		return p.drawText(v, v.Start()+dx, v.Y+dy)
	case draw.Line:
		if v.Width <= 0 {
			return nil
		}
		p.shapes()
		p.setStroke(v.Paint)
		p.c.line(v.X1+dx, v.Y1+dy, v.X2+dx, v.Y2+dy)
	case draw.Rect:
		if s := p.style(v.Paint); s != "" {
			p.c.rect(v.X+dx, v.Y+dy, v.W, v.H, s)
		}
	case draw.Poly:
		if len(v.Points) < 2 {
			return nil
		}
		if v.Closed || v.Filled {
			s := p.style(v.Paint)
			if s == "" {
				return nil
			}
			for i, q := range v.Points {
				p.c.polygonPoint(q.X+dx, q.Y+dy, i == 0)
			}
			p.c.polygonEnd(s)
			return nil
		}
		if v.Width <= 0 {
			return nil
		}
		p.shapes()
		p.setStroke(v.Paint)
		for i := 1; i < len(v.Points); i++ {
			a, b := v.Points[i-1], v.Points[i]
			p.c.line(a.X+dx, a.Y+dy, b.X+dx, b.Y+dy)
		}
	case draw.Image:
		if p.ahead {
			return errImageAhead
		}
		h, err := gopdf.ImageHolderByBytes(v.Data)
		if err != nil {
			return err
		}
		// gopdf adds a new image's object before it opens the page's
		// content object
		index, seen := p.images[h.ID()]
		if !seen {
			index = p.gp.GetNextObjectID() - 1
		}
		if err := p.gp.ImageByHolder(h, v.X+dx, v.Y+dy, &gopdf.Rect{W: v.W, H: v.H}); err != nil {
			return err
		}
		if !seen {
			p.images[h.ID()] = index
		}
		p.opened = true
		p.shapes()
		p.c.image(index, v.X+dx, v.Y+dy, v.W, v.H)
	case draw.Link:
		if p.ahead {
			p.events = append(p.events, event{kind: evLink, name: v.Target, x: v.X + dx, y: v.Y + dy, w: v.W, h: v.H})
			return nil
		}
		p.gp.AddInternalLink(v.Target, v.X+dx, v.Y+dy, v.W, v.H)
	case draw.Anchor:
		if p.ahead {
			p.events = append(p.events, event{kind: evAnchor, name: v.Name, y: v.Y + dy, size: p.size})
			return nil
		}
		p.anchor(v.Name, v.Y+dy, p.size)
	}
	return nil
}

// anchor places anchor name at y on the page, after text of the given
// size. gopdf places an anchor at (page height − y + font size): aim a
// little above the anchored line.
func (p *painter) anchor(name string, y, size float64) {
	p.gp.SetFontSize(size)
	p.gp.SetY(y - 8 + size)
	p.gp.SetAnchor(name)
}

// replay makes the gopdf calls of a body painted ahead, in the order it
// made them, on the page being written (after its furniture), and leaves
// the painter as the body left it.
func (p *painter) replay(b *bodyStream) {
	for _, ev := range b.events {
		switch ev.kind {
		case evOpen:
			p.open()
		case evLink:
			p.gp.AddInternalLink(ev.name, ev.x, ev.y, ev.w, ev.h)
		case evAnchor:
			size := ev.size
			if size < 0 { // no text before it in the body: the furniture's
				size = p.size
			}
			p.anchor(ev.name, ev.y, size)
		}
	}
	if b.lastSize >= 0 {
		p.size = b.lastSize
	}
}

// subsetFonts tells gopdf the characters each face drew (with those of
// the bodies painted ahead), in character order, so its font subsets hold
// those glyphs.
func (p *painter) subsetFonts(ahead *Bodies) error {
	for f := fonts.Face(0); f < fonts.NumFaces; f++ {
		g := p.glyphs[f]
		if g == nil {
			continue
		}
		rs := append(slices.Clone(g.used), ahead.runes(f)...)
		if len(rs) == 0 {
			continue
		}
		slices.Sort(rs)
		rs = slices.Compact(rs)
		if err := p.gp.SetFont(f.PDFName(), "", 10); err != nil {
			return err
		}
		if _, err := p.gp.MeasureTextWidth(string(rs)); err != nil {
			return err
		}
	}
	return nil
}
