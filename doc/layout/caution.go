package layout

import (
	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// caution lays out a caution in the house style (cautionStyle): a panel
// with a bar at its left, heavier as the severity rises, the severity
// word and title, then the body blocks. It is made of the body's pieces,
// each on its own strip of panel, so a long caution can continue on the
// next page.
func (e *engine) caution(c *Caution, width float64) []*piece {
	sev := c.Severity
	if !sev.Valid() {
		e.diags.Add(c.Pos, "caution severity %d: want NOTE, CAUTION or WARNING", int(sev))
		sev = severity.Warning
	}
	const bar, padL, padR, padV = 3.0, 9.0, 8.0, 3.5
	inner := width - bar - padL - padR
	// heading line: the word, then the title
	word := sev.String()
	sty := cautionStyles[sev]
	wf := fonts.Get(fonts.Bold)
	mark := 0.0 // room for the WARNING triangle
	if sty.triangle {
		mark = 11
	}
	wordW := mark + wf.Width(word, bodySize) + 7
	var ps []*piece
	if para, ok := soleParagraph(c); ok {
		// no title and one paragraph: the word heads the paragraph's
		// first line, the paragraph hanging beside it
		if sev == severity.Note { // information: in the note size
			small := *para
			small.Small = true
			para = &small
		}
		ps = e.para(para, inner-wordW)
		for _, p := range ps {
			p.box.W = inner
			for i := range p.box.Items {
				p.box.Items[i] = draw.Offset(p.box.Items[i], wordW, 0)
			}
		}
		first := ps[0].box
		if sty.triangle {
			first.Items = append(first.Items, warnTriangle(ps[0].base)...)
		}
		first.Items = append(first.Items, draw.Text{X: mark, Y: ps[0].base, Face: fonts.Bold, Size: bodySize, Color: sty.word, Text: word})
		ps[0].before = 0
	} else {
		head := &Box{Kind: "caution-head", Pos: c.Pos, W: inner}
		st := bodyStyle
		st.bold = true
		var lines []line
		if len(c.Title) > 0 {
			lines = e.setText(c.Title, inner-wordW, st, c.Pos)
		} else {
			lines = []line{setLine(nil, st)}
		}
		if sty.triangle {
			head.Items = append(head.Items, warnTriangle(lines[0].base)...)
		}
		head.Items = append(head.Items, draw.Text{X: mark, Y: lines[0].base, Face: fonts.Bold, Size: bodySize, Color: sty.word, Text: word})
		y := 0.0
		for _, ln := range lines {
			head.Items = ln.appendItems(head.Items, wordW, y)
			y += ln.h
		}
		head.H = y
		ps = []*piece{{box: head, keep: true, base: lines[0].base}}
		body := e.blocks(c.Body, inner)
		if len(body) > 0 {
			body[0].before = 2
		}
		ps = append(ps, body...)
	}
	// wrap each piece in its strip of panel
	wrap := func(p *piece, top, bottom float64, first, last bool) *piece {
		h := top + p.box.H + bottom
		p.box.move(bar+padL, top)
		var items []draw.Item
		if sty.fill {
			items = append(items, draw.Rect{W: width, H: h, Paint: draw.Fill(shade)})
		}
		if sty.frame > 0 { // a frame all round, drawn a strip at a time
			fr := draw.Stroke(sty.bar, sty.frame)
			in := sty.frame / 2
			items = append(items, draw.Line{X1: width - in, Y1: 0, X2: width - in, Y2: h, Paint: fr})
			if first {
				items = append(items, draw.Line{X1: 0, Y1: in, X2: width, Y2: in, Paint: fr})
			}
			if last {
				items = append(items, draw.Line{X1: 0, Y1: h - in, X2: width, Y2: h - in, Paint: fr})
			}
		}
		items = append(items, draw.Rect{W: sty.barW, H: h, Paint: draw.Fill(sty.bar)})
		w := &Box{Kind: "caution", Pos: c.Pos, W: width, H: h, Kids: []*Box{p.box}, Items: items}
		return &piece{box: w, keep: p.keep, brk: p.brk, base: top + p.base}
	}
	out := make([]*piece, len(ps))
	for i, p := range ps {
		top, bottom := p.before, 0.0
		if i == 0 {
			top = padV
		}
		if i == len(ps)-1 {
			bottom = padV
		}
		out[i] = wrap(p, top, bottom, i == 0, i == len(ps)-1)
		if p.head != nil { // a table's repeated header, on its own strip
			out[i].head = wrap(clonePiece(p.head), 0, 0, false, false)
		}
	}
	out[0].before = paraGap + 3
	return out
}

// soleParagraph is the body of a caution with no title and one
// non-empty paragraph.
func soleParagraph(c *Caution) (*Para, bool) {
	if len(c.Title) > 0 || len(c.Body) != 1 {
		return nil, false
	}
	p, ok := c.Body[0].(*Para)
	return p, ok && len(p.Runs) > 0
}

// cautionStyle is how a severity is drawn. The house has one accent and
// keeps red and green for NOT OK and OK, so severity shows in the word
// first and in weight second: NOTE a thin accent bar on white; CAUTION a
// heavy ink bar on the light panel; WARNING the same inside an ink frame,
// with a warning triangle before the word.
type cautionStyle struct {
	word, bar draw.Color
	barW      float64 // width of the left bar
	fill      bool    // the light panel behind
	frame     float64 // stroke of a frame all round; 0 = none
	triangle  bool
}

var cautionStyles = [3]cautionStyle{
	severity.Note:    {word: accent, bar: accent, barW: 1.2},
	severity.Caution: {word: ink, bar: ink, barW: 3, fill: true},
	severity.Warning: {word: ink, bar: ink, barW: 3, fill: true, frame: 0.8, triangle: true},
}

// warnTriangle is the warning sign before the word WARNING: an ink
// triangle with a white bar and dot, its base on the baseline.
func warnTriangle(base float64) []draw.Item {
	const w, h = 9.0, 8.0
	return []draw.Item{
		draw.Poly{Closed: true, Paint: draw.Fill(ink), Points: []draw.Point{draw.Pt(0, base), draw.Pt(w, base), draw.Pt(w/2, base-h)}},
		draw.Rect{X: w/2 - 0.55, Y: base - h + 2.6, W: 1.1, H: 3, Paint: draw.Fill(draw.Gray(255))},
		draw.Rect{X: w/2 - 0.55, Y: base - 1.8, W: 1.1, H: 1.1, Paint: draw.Fill(draw.Gray(255))},
	}
}
