package layout

import (
	"plinth/doc/layout/draw"
	"plinth/doc/layout/fonts"
)

// caution lays out a caution as a tinted panel with a coloured bar at its
// left: the severity word and title, then the body blocks. It is made of
// the body's pieces, each on its own strip of panel, so a long caution can
// continue on the next page.
func (e *engine) caution(c *Caution, width float64) []*piece {
	sev := c.Severity
	if sev > SevCaution {
		e.probs.add(c.Pos, "caution severity %d: want NOTE, WARNING or CAUTION", sev)
		sev = SevCaution
	}
	const bar, padL, padR, padV = 3.0, 9.0, 8.0, 5.0
	inner := width - bar - padL - padR
	// heading line: the word, then the title
	word := sev.String()
	wf := fonts.Get(fonts.Bold)
	wordW := wf.Width(word, bodySize) + 7
	head := &Box{Kind: "caution-head", Pos: c.Pos, W: inner}
	st := bodyStyle
	st.bold = true
	var lines []line
	if len(c.Title) > 0 {
		lines = e.setText(c.Title, inner-wordW, st, c.Pos)
	} else {
		lines = []line{setLine(nil, st)}
	}
	head.Items = append(head.Items, draw.Text{Y: lines[0].base, Face: fonts.Bold, Size: bodySize, Color: sevInk[sev], Text: word})
	y := 0.0
	for _, ln := range lines {
		head.Items = appendOffset(head.Items, ln.items, wordW, y)
		y += ln.h
	}
	head.H = y
	ps := []*piece{{box: head, keep: true, base: lines[0].base}}
	body := e.blocks(c.Body, inner)
	if len(body) > 0 {
		body[0].before = 2
	}
	ps = append(ps, body...)
	// wrap each piece in its strip of panel
	wrap := func(p *piece, top, bottom float64) *piece {
		h := top + p.box.H + bottom
		p.box.move(bar+padL, top)
		w := &Box{Kind: "caution", Pos: c.Pos, W: width, H: h, Kids: []*Box{p.box}, Items: []draw.Item{
			draw.Rect{W: width, H: h, Paint: draw.Fill(sevFill[sev])},
			draw.Rect{W: bar, H: h, Paint: draw.Fill(sevInk[sev])},
		}}
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
		out[i] = wrap(p, top, bottom)
		if p.head != nil { // a table's repeated header, on its own strip
			out[i].head = wrap(clonePiece(p.head), 0, 0)
		}
	}
	out[0].before = paraGap + 3
	return out
}
