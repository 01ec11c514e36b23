package layout

import (
	"bytes"
	"github.com/plinth-calc/plinth/doc/media"
	"image"
	_ "image/jpeg" // image formats accepted
	_ "image/png"
	"math"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

var bodyStyle = textStyle{size: bodySize, lead: bodyLead, color: ink}

// linePieces turns set lines into one piece each, keeping the first two
// and the last two lines of a paragraph together.
func linePieces(kind string, pos source.Span, lines []line, width, before float64) []*piece {
	ps := make([]*piece, len(lines))
	for i, ln := range lines {
		b := &Box{Kind: kind, Pos: pos, W: width, H: ln.h, Items: ln.appendItems(nil, 0, 0)}
		ps[i] = &piece{box: b, base: ln.base}
	}
	if n := len(ps); n > 1 {
		ps[0].keep = true
		ps[n-2].keep = true
	}
	if len(ps) > 0 {
		ps[0].before = before
	}
	return ps
}

// smallStyle is the text of a Small paragraph.
var smallStyle = textStyle{size: noteSize, lead: 1.3, color: ink}

func (e *engine) para(p *Para, width float64) []*piece {
	if p.Small {
		return linePieces("line", p.Pos, e.setText(p.Runs, width, smallStyle, p.Pos), width, paraGap/2)
	}
	lines := e.setText(p.Runs, width, bodyStyle, p.Pos)
	ps := linePieces("line", p.Pos, lines, width, paraGap)
	if n := len(ps); p.Label && n > 0 {
		ps[n-1].keep = true
	}
	return ps
}

func (e *engine) heading(h *Heading, width float64) []*piece {
	lvl := h.Level
	if lvl < 1 || lvl > 3 {
		e.diags.Add(h.Pos, "heading level %d: want 1, 2 or 3", h.Level)
		lvl = min(max(lvl, 1), 3)
	}
	number := h.Number
	switch {
	case h.NoNumber:
		number = ""
	case number == "":
		e.num[lvl]++
		for l := lvl + 1; l < len(e.num); l++ {
			e.num[l] = 0
		}
		parts := make([]string, lvl)
		for l := 1; l <= lvl; l++ {
			parts[l-1] = strconv.Itoa(max(e.num[l], 1))
		}
		number = strings.Join(parts, ".")
	default: // follow a given number so later headings continue from it
		for i, f := range strings.Split(number, ".") {
			if n, err := strconv.Atoi(f); err == nil && i+1 < len(e.num) {
				e.num[i+1] = n
			}
		}
	}
	size := headingSize[lvl]
	st := textStyle{size: size, lead: 1.28, color: ink, bold: true}
	numW := 0.0
	if number != "" {
		numW = math.Max(fonts.Get(fonts.Bold).Width(number, size)+0.9*size, []float64{0, 26, 32, 38}[lvl])
	}
	lines := e.setText(h.Runs, width-numW, st, h.Pos)
	b := &Box{Kind: "heading", Pos: h.Pos, W: width}
	y := 0.0
	for i, ln := range lines {
		if i == 0 && number != "" {
			e.checkGlyphs(number, fonts.Bold, h.Pos)
			b.Items = append(b.Items, draw.Text{X: 0, Y: ln.base, Face: fonts.Bold, Size: size, Color: accent, Text: number})
		}
		b.Items = ln.appendItems(b.Items, numW, y)
		y += ln.h
	}
	if lvl == 1 {
		y += 2.5
		b.Items = append(b.Items, draw.Line{X1: 0, Y1: y, X2: width, Y2: y, Paint: draw.Stroke(ruleInk, 0.6)})
		y += 3
	} else {
		y += 1.5
	}
	b.H = y
	if h.Anchor != "" {
		b.Items = append(b.Items, draw.Anchor{Name: h.Anchor})
	}
	base := 0.0
	if len(lines) > 0 {
		base = lines[0].base
	}
	return []*piece{{box: b, before: headingGap[lvl], keep: true, base: base}}
}

var bullets = []string{"•", "–", "◦"}

func (e *engine) list(l *List, width float64, _ int) []*piece {
	depth := e.listDepth
	e.listDepth++
	defer func() { e.listDepth-- }()
	f := fonts.Get(fonts.Regular)
	start := l.Start
	if start == 0 {
		start = 1
	}
	markers := make([]string, len(l.Items))
	indent := 14.0
	for i := range l.Items {
		if l.Ordered {
			markers[i] = strconv.Itoa(start+i) + "."
		} else {
			markers[i] = bullets[depth%len(bullets)]
		}
		indent = math.Max(indent, f.Width(markers[i], bodySize)+6)
	}
	var out []*piece
	for i, item := range l.Items {
		ps := e.blocks(item, width-indent)
		if len(ps) == 0 {
			continue
		}
		shift(ps, indent)
		m := markers[i]
		first := ps[0]
		mw := f.Width(m, bodySize)
		first.box.Items = append(first.box.Items, draw.Text{X: -5 - mw, Y: first.base,
			Face: fonts.Regular, Size: bodySize, Color: muted, Text: m})
		first.before = 2
		if i == 0 {
			first.before = paraGap
			if depth > 0 {
				first.before = 2
			}
		}
		out = append(out, ps...)
	}
	return out
}

func (e *engine) code(c *Code, width float64) []*piece {
	const pad = 6.0
	f := fonts.Get(fonts.Mono)
	text := e.checkGlyphs(strings.TrimRight(strings.ReplaceAll(c.Text, "\t", "    "), "\n"), fonts.Mono, c.Pos)
	charW := float64(f.Advance(' ')) * codeSize / 1000
	perLine := max(1, int((width-2*pad)/charW))
	var rows []string
	for _, ln := range strings.Split(text, "\n") {
		ln = strings.TrimRight(ln, " \r")
		rs := []rune(ln)
		for len(rs) > perLine {
			rows = append(rows, string(rs[:perLine]))
			rs = rs[perLine:]
		}
		rows = append(rows, string(rs))
	}
	lh := codeSize * 1.32
	asc := f.Ascent(codeSize)
	base := (lh-asc-f.Descent(codeSize))/2 + asc
	ps := make([]*piece, len(rows))
	for i, r := range rows {
		top, bot := 0.0, 0.0
		if i == 0 {
			top = pad - 2
		}
		if i == len(rows)-1 {
			bot = pad - 2
		}
		h := top + lh + bot
		b := &Box{Kind: "code", Pos: c.Pos, W: width, H: h, Items: []draw.Item{
			draw.Rect{W: width, H: h, Paint: draw.Fill(shade)},
			draw.Rect{W: 1.6, H: h, Paint: draw.Fill(hairInk)},
		}}
		if r != "" {
			b.Items = append(b.Items, draw.Text{X: pad, Y: top + base, Face: fonts.Mono, Size: codeSize, Color: ink, Text: r})
		}
		ps[i] = &piece{box: b, base: top + base}
	}
	if n := len(ps); n > 1 {
		ps[0].keep, ps[n-2].keep = true, true
	}
	ps[0].before = paraGap + 1
	return ps
}

// captionStyle is how every caption is set, a figure's or a table's:
// small, italic, muted.
var captionStyle = textStyle{size: captionSize, lead: 1.3, color: muted, face: fonts.Italic}

// captionUnder sets a figure's caption centred under it, in nine tenths
// of the width, the figure being h tall in b; it returns the height with
// the caption.
func (e *engine) captionUnder(b *Box, runs []Run, width, h float64) float64 {
	if len(runs) == 0 {
		return h
	}
	var items []draw.Item
	capH := 0.0
	for _, ln := range e.setText(runs, width*0.9, captionStyle, b.Pos) {
		items = ln.appendItems(items, (width-ln.w)/2, capH)
		capH += ln.h
	}
	if capH == 0 {
		return h
	}
	draw.OffsetAll(items, 0, h+4)
	b.Items = append(b.Items, items...)
	return h + 4 + capH
}

func (e *engine) image(im *Image, width float64) []*piece {
	// doc/parse decoded the figure in full (media.Check); the header is
	// enough here.
	cfg, err := media.Header(im.Data)
	if err != nil {
		e.diags.Add(im.Pos, "image %v", err)
		return nil
	}
	w := float64(cfg.Width) * 0.75 // 96 px per inch
	if im.Width > 0 {
		w = im.Width
	}
	w = math.Min(w, width)
	h := w * float64(cfg.Height) / float64(cfg.Width)
	if maxH := 0.6 * e.bodyH; h > maxH {
		w, h = w*maxH/h, maxH
	}
	b := &Box{Kind: "image", Pos: im.Pos, W: width}
	b.Items = append(b.Items, draw.Image{X: (width - w) / 2, Y: 0, W: w, H: h, Data: im.Data})
	b.H = e.captionUnder(b, im.Caption, width, h)
	return []*piece{{box: b, before: paraGap + 3}}
}

func (e *engine) drawing(d *Drawing, width float64) []*piece {
	if d.W <= 0 || d.H <= 0 {
		e.diags.Add(d.Pos, "drawing has no size (%.1f × %.1f pt)", d.W, d.H)
		return nil
	}
	s := math.Min(1, width/d.W)
	w, h := d.W*s, d.H*s
	dx := (width - w) / 2
	b := &Box{Kind: "drawing", Pos: d.Pos, W: width}
	for _, it := range d.Items {
		if s != 1 {
			it = draw.Scale(it, s)
		}
		if t, ok := it.(draw.Text); ok {
			if !t.Face.Valid() {
				e.diags.Add(d.Pos, "drawing text %q has no valid face", t.Text)
				continue
			}
			t.Text = e.checkGlyphs(t.Text, t.Face, d.Pos)
			t.X, t.Align = t.Start(), draw.Left
			it = t
		}
		b.Items = append(b.Items, draw.Offset(it, dx, 0))
	}
	b.H = e.captionUnder(b, d.Caption, width, h)
	return []*piece{{box: b, before: paraGap + 3}}
}

// imageSize is an image's pixel size.
func imageSize(data []byte) (w, h float64, ok bool) {
	cfg, _, err := image.DecodeConfig(bytes.NewReader(data))
	if err != nil || cfg.Width == 0 || cfg.Height == 0 {
		return 0, 0, false
	}
	return float64(cfg.Width), float64(cfg.Height), true
}
