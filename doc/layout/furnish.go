package layout

import (
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// variantBanner is the band every page of a variant run carries under its
// title block, naming the overridden inputs.
func (e *engine) variantBanner(variant []string) *Box {
	if len(variant) == 0 {
		return nil
	}
	x, y, w, _ := e.tpl.body()
	const pad = 5.0
	st := textStyle{size: 9, lead: 1.3, color: badInk}
	runs := []Run{{Text: "VARIANT", Style: Bold}, {Text: "  inputs overridden: " + strings.Join(variant, "; ")}}
	lines := e.setText(runs, w-2*pad-4, st, source.Span{})
	b := &Box{Kind: "variant", X: x, Y: y, W: w}
	h := pad
	var text []draw.Item
	for _, ln := range lines {
		text = ln.appendItems(text, pad+4, h)
		h += ln.h
	}
	h += pad
	b.Items = append(b.Items,
		draw.Rect{W: w, H: h, Paint: draw.Paint{Stroke: badInk, Width: 1, Fill: badFill, Filled: true}},
		draw.Rect{W: 4, H: h, Paint: draw.Fill(badInk)})
	b.Items = append(b.Items, text...)
	b.H = h
	return b
}

// furnish adds the title block, variant banner and footer to every page.
func (e *engine) furnish(doc Doc, out *Pages, banner *Box) {
	perSheet := map[int]int{}
	for _, pg := range out.Pages {
		perSheet[pg.Sheet]++
	}
	fp := doc.Info.Fingerprint
	if len(fp) > 12 {
		fp = fp[:12]
	}
	if fp == "" {
		fp = "(none)"
	}
	for i, pg := range out.Pages {
		sh := &doc.Sheets[pg.Sheet]
		f := sh.Fields
		value := func(key string) (string, bool) {
			switch key {
			case "project":
				return f.Project, true
			case "job":
				return f.Job, true
			case "client":
				return f.Client, true
			case "title":
				return f.Title, true
			case "calc":
				return f.Calc, true
			case "rev":
				return f.Rev, true
			case "by":
				return f.By, true
			case "date":
				return f.Date, true
			case "checked":
				if strings.TrimSpace(f.Checked) == "" {
					return "NOT CHECKED", false
				}
				return f.Checked, true
			case "checked_date":
				return f.CheckedDate, true
			case "sheet":
				return strconv.Itoa(i + 1), true
			case "sheets":
				return strconv.Itoa(len(out.Pages)), true
			case "page":
				return strconv.Itoa(pg.Number), true
			case "pages":
				return strconv.Itoa(perSheet[pg.Sheet]), true
			case "fingerprint":
				return fp, true
			}
			return f.Extra[key], true
		}
		boxes := []*Box{e.titleBlock(value, sh.Pos)}
		if banner != nil {
			boxes = append(boxes, cloneBox(banner))
		}
		boxes = append(boxes, e.footer(value, sh.Pos))
		pg.Boxes = append(boxes, pg.Boxes...)
	}
}

// expand fills {field} placeholders; ok is false when a field printed a
// warning value (NOT CHECKED).
// It matches as the placeholder pattern does, scanned by hand: every page
// expands its title block and footer.
func expand(s string, value func(string) (string, bool)) (string, bool) {
	if strings.IndexByte(s, '{') < 0 {
		return strings.TrimSpace(s), true
	}
	ok := true
	var out strings.Builder
	out.Grow(len(s) + 16)
	for i := 0; i < len(s); {
		if s[i] == '{' {
			j := i + 1
			for j < len(s) && fieldChar(s[j]) {
				j++
			}
			if j < len(s) && s[j] == '}' {
				v, good := value(s[i+1 : j])
				ok = ok && good
				out.WriteString(v)
				i = j + 1
				continue
			}
		}
		out.WriteByte(s[i])
		i++
	}
	return strings.TrimSpace(out.String()), ok
}

// fieldChar reports whether c may be in a field name ([A-Za-z0-9_]).
func fieldChar(c byte) bool {
	return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c >= '0' && c <= '9' || c == '_'
}

func (e *engine) titleBlock(value func(string) (string, bool), pos source.Span) *Box {
	tb := &e.tpl.TitleBlock
	w := e.tpl.BodyWidth()
	b := &Box{Kind: "title-block", Pos: pos, X: float64(e.tpl.Margin.Left), Y: float64(e.tpl.Margin.Top), W: w, H: float64(tb.Height)}
	x0, y0 := 0.0, 0.0 // items are relative to the box
	line := float64(tb.Line)
	ls := float64(tb.LabelSize)
	lf := fonts.Get(fonts.Regular)
	for _, c := range tb.Cells {
		cx, cy, cw, ch := x0+float64(c.X), y0+float64(c.Y), float64(c.W), float64(c.H)
		b.Items = append(b.Items, draw.Rect{X: cx, Y: cy, W: cw, H: ch, Paint: draw.Stroke(ruleInk, line)})
		labelBase := cy + 1.8 + lf.CapHeight(ls)
		if c.Label != "" {
			lab := e.checkGlyphs(c.Label, fonts.Regular, pos)
			b.Items = append(b.Items, draw.Text{X: cx + 2.4, Y: labelBase, Face: fonts.Regular, Size: ls, Color: muted, Text: lab})
		}
		text, good := expand(c.Text, value)
		if text == "" {
			continue
		}
		face := fonts.Regular
		if c.Bold {
			face = fonts.Bold
		}
		color := ink
		if !good {
			face, color = fonts.Bold, badInk
		}
		text = e.checkGlyphs(text, face, pos)
		size := float64(c.Size)
		if size == 0 {
			size = float64(tb.ValueSize)
		}
		vf := fonts.Get(face)
		avail := cw - 4.8
		if tw := vf.Width(text, size); tw > avail {
			size = math.Max(size*avail/tw, size*0.7)
			text = clip(vf, text, size, avail)
		}
		top := labelBase + 1
		base := top + (cy+ch-top+vf.CapHeight(size))/2
		base = math.Min(base, cy+ch-2)
		t := draw.Text{X: cx + 2.4, Y: base, Face: face, Size: size, Color: color, Text: text}
		switch c.Align {
		case "center":
			t.X = cx + (cw-vf.Width(text, size))/2
		case "right":
			t.X = cx + cw - 2.4 - vf.Width(text, size)
		}
		b.Items = append(b.Items, t)
	}
	if lg := tb.Logo; lg != nil && len(e.tpl.Logo) > 0 {
		if iw, ih, ok := imageSize(e.tpl.Logo); ok {
			s := math.Min(float64(lg.W)/iw, float64(lg.H)/ih)
			w, h := iw*s, ih*s
			b.Items = append(b.Items, draw.Image{X: x0 + float64(lg.X) + (float64(lg.W)-w)/2, Y: y0 + float64(lg.Y) + (float64(lg.H)-h)/2, W: w, H: h, Data: e.tpl.Logo})
		}
	}
	b.Items = append(b.Items, draw.Rect{X: x0, Y: y0, W: w, H: float64(tb.Height), Paint: draw.Stroke(ink, line*1.6)})
	return b
}

func (e *engine) footer(value func(string) (string, bool), pos source.Span) *Box {
	ft := e.tpl.Footer
	w := e.tpl.BodyWidth()
	size := float64(ft.Size)
	b := &Box{Kind: "footer", Pos: pos, X: float64(e.tpl.Margin.Left), Y: float64(e.tpl.Page.Height - e.tpl.Margin.Bottom - ft.Height), W: w, H: float64(ft.Height)}
	x0, y0 := 0.0, 0.0 // items are relative to the box
	b.Items = append(b.Items, draw.Line{X1: x0, Y1: y0 + 1, X2: x0 + w, Y2: y0 + 1, Paint: draw.Stroke(hairInk, 0.5)})
	f := fonts.Get(fonts.Regular)
	base := y0 + 1 + (float64(ft.Height)-1+f.CapHeight(size))/2
	for i, s := range []string{ft.Left, ft.Center, ft.Right} {
		text, _ := expand(s, value)
		if text == "" {
			continue
		}
		text = e.checkGlyphs(text, fonts.Regular, pos)
		tw := f.Width(text, size)
		x := x0
		switch i {
		case 1:
			x = x0 + (w-tw)/2
		case 2:
			x = x0 + w - tw
		}
		b.Items = append(b.Items, draw.Text{X: x, Y: base, Face: fonts.Regular, Size: size, Color: muted, Text: text})
	}
	return b
}

// clip shortens text with an ellipsis until it fits avail at size: the
// prefix is found in one pass over the characters that fit, so a very long
// value costs no more than a short one.
func clip(f *fonts.Font, text string, size, avail float64) string {
	if f.Width(text, size) <= avail {
		return text
	}
	room := avail - f.Width("…", size)
	x, end := 0.0, 0
	for i, r := range text {
		x += float64(f.Advance(r)) * size / 1000
		if x > room && i > 0 {
			break
		}
		end = i + utf8.RuneLen(r)
	}
	rs := []rune(text[:end])
	for {
		out := strings.TrimSpace(string(rs)) + "…"
		if len(rs) <= 1 || f.Width(out, size) <= avail {
			return out
		}
		rs = rs[:len(rs)-1]
	}
}
