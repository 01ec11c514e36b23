package pdf

import (
	"slices"

	"github.com/signintech/gopdf"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// painter draws items, setting graphics state only when it changes.
type painter struct {
	gp     *gopdf.GoPdf
	face   fonts.Face
	size   float64
	text   draw.Color
	stroke draw.Color
	fill   draw.Color
	width  float64
	dash   []float64
	// which of the above hold on the current page (a new page's content
	// stream starts from the default graphics state)
	hasFont, hasText, hasStroke, hasFill bool
}

func (p *painter) reset() { p.hasFont, p.hasText, p.hasStroke, p.hasFill = false, false, false, false }

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

func (p *painter) setFont(f fonts.Face, size float64) error {
	if p.hasFont && f == p.face && size == p.size {
		return nil
	}
	if err := p.gp.SetFont(f.PDFName(), "", size); err != nil {
		return err
	}
	p.face, p.size, p.hasFont = f, size, true
	return nil
}

func (p *painter) setText(c draw.Color) {
	if !p.hasText || c != p.text {
		p.gp.SetTextColor(c.R, c.G, c.B)
		p.text, p.hasText = c, true
	}
}

func (p *painter) setStroke(pt draw.Paint) {
	fresh := !p.hasStroke
	p.hasStroke = true
	if fresh || pt.Stroke != p.stroke {
		p.gp.SetStrokeColor(pt.Stroke.R, pt.Stroke.G, pt.Stroke.B)
		p.stroke = pt.Stroke
	}
	if fresh || pt.Width != p.width {
		p.gp.SetLineWidth(pt.Width)
		p.width = pt.Width
	}
	if fresh || !slices.Equal(pt.Dash, p.dash) {
		if len(pt.Dash) == 0 {
			p.gp.SetLineType("solid")
		} else {
			p.gp.SetCustomLineType(append([]float64(nil), pt.Dash...), 0)
		}
		p.dash = append(p.dash[:0], pt.Dash...)
	}
}

func (p *painter) setFill(c draw.Color) {
	if !p.hasFill || c != p.fill {
		p.gp.SetFillColor(c.R, c.G, c.B)
		p.fill, p.hasFill = c, true
	}
}

// style sets the paint for a shape and returns gopdf's style letters.
func (p *painter) style(pt draw.Paint) string {
	s := ""
	if pt.Filled {
		p.setFill(pt.Fill)
		s += "F"
	}
	if pt.Width > 0 {
		p.setStroke(pt)
		s += "D"
	}
	return s
}

// item draws it moved by (dx, dy) (its box's corner).
func (p *painter) item(it draw.Item, dx, dy float64) error {
	switch v := it.(type) {
	case draw.Text:
		if v.Text == "" {
			return nil
		}
		if err := p.setFont(v.Face, v.Size); err != nil {
			return err
		}
		p.setText(v.Color)
		p.gp.SetXY(v.Start()+dx, v.Y+dy)
		// gopdf writes the text colour as the fill colour ("rg") inside
		// the text object, so the fill we last set no longer holds.
		p.hasFill = false
		return p.gp.Text(v.Text)
	case draw.Line:
		if v.Width <= 0 {
			return nil
		}
		p.setStroke(v.Paint)
		p.gp.Line(v.X1+dx, v.Y1+dy, v.X2+dx, v.Y2+dy)
	case draw.Rect:
		s := p.style(v.Paint)
		if s == "" {
			return nil
		}
		p.gp.RectFromUpperLeftWithStyle(v.X+dx, v.Y+dy, v.W, v.H, s)
	case draw.Poly:
		if len(v.Points) < 2 {
			return nil
		}
		if v.Closed || v.Filled {
			s := p.style(v.Paint)
			if s == "" {
				return nil
			}
			if s == "FD" {
				s = "DF"
			}
			pts := make([]gopdf.Point, len(v.Points))
			for i, q := range v.Points {
				pts[i] = gopdf.Point{X: q.X + dx, Y: q.Y + dy}
			}
			p.gp.Polygon(pts, s)
			return nil
		}
		if v.Width <= 0 {
			return nil
		}
		p.setStroke(v.Paint)
		for i := 1; i < len(v.Points); i++ {
			a, b := v.Points[i-1], v.Points[i]
			p.gp.Line(a.X+dx, a.Y+dy, b.X+dx, b.Y+dy)
		}
	case draw.Image:
		h, err := gopdf.ImageHolderByBytes(v.Data)
		if err != nil {
			return err
		}
		return p.gp.ImageByHolder(h, v.X+dx, v.Y+dy, &gopdf.Rect{W: v.W, H: v.H})
	case draw.Link:
		p.gp.AddInternalLink(v.Target, v.X+dx, v.Y+dy, v.W, v.H)
	case draw.Anchor:
		// gopdf places an anchor at (page height − y + font size): aim a
		// little above the anchored line.
		p.gp.SetY(v.Y + dy - 8 + p.size)
		p.gp.SetAnchor(v.Name)
	}
	return nil
}
