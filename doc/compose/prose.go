package compose

import (
	"net/url"
	"strings"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// blocks converts a sheet's body (or a nested list of blocks).
func (c *composer) blocks(s *eval.Sheet, bs []sheet.Block) []layout.Block {
	var out []layout.Block
	for _, b := range bs {
		out = append(out, c.block(s, b)...)
	}
	return out
}

func (c *composer) block(s *eval.Sheet, b sheet.Block) []layout.Block {
	p := b.Where()
	switch b := b.(type) {
	case *sheet.Heading:
		lvl := min(max(b.Level, 1), 3)
		c.level = lvl
		return []layout.Block{&layout.Heading{Pos: p, Level: lvl, Runs: c.inlines(s, b.Text)}}
	case *sheet.Paragraph:
		runs := c.inlines(s, b.Text)
		if len(runs) == 0 {
			return nil
		}
		return []layout.Block{&layout.Para{Pos: p, Runs: runs}}
	case *sheet.List:
		l := &layout.List{Pos: p, Ordered: b.Ordered, Start: b.Start}
		for _, it := range b.Items {
			l.Items = append(l.Items, c.blocks(s, it.Blocks))
		}
		return []layout.Block{l}
	case *sheet.Table:
		return []layout.Block{c.proseTable(s, b)}
	case *sheet.Image:
		return c.image(s, b)
	case *sheet.CodeBlock:
		return []layout.Block{&layout.Code{Pos: p, Text: b.Text}}
	case *sheet.Caution:
		return []layout.Block{&layout.Caution{Pos: p, Severity: b.Kind, Body: c.blocks(s, b.Body)}}
	case *sheet.Quote:
		c.quote++
		defer func() { c.quote-- }()
		return c.blocks(s, b.Body)
	case *sheet.ThematicBreak:
		return []layout.Block{&layout.Drawing{Pos: p, W: c.width, H: 10, Items: []draw.Item{
			draw.Line{X1: c.width * 0.3, Y1: 5, X2: c.width * 0.7, Y2: 5, Paint: draw.Stroke(draw.Gray(170), 0.6)},
		}}}
	case *sheet.Calc:
		return c.calc(s, b)
	case *sheet.Ground:
		return c.ground(s, s.Block(b), b)
	case *sheet.Footing:
		return c.footing(s, s.Block(b), b)
	case *sheet.Analysis:
		return c.analysis(s, b, s.Block(b))
	}
	return nil
}

// proseTable converts a GFM table.
func (c *composer) proseTable(s *eval.Sheet, b *sheet.Table) *layout.Table {
	t := &layout.Table{Pos: b.Span}
	for _, h := range b.Header {
		t.Header = append(t.Header, c.inlines(s, h.Text))
	}
	for _, a := range b.Align {
		t.Align = append(t.Align, [...]layout.Align{layout.AlignDefault, layout.AlignLeft, layout.AlignCenter, layout.AlignRight}[a])
	}
	for _, r := range b.Rows {
		row := layout.Row{}
		for i, cell := range r {
			if i == 0 {
				row.Pos = cell.Span
			}
			row.Cells = append(row.Cells, c.inlines(s, cell.Text))
			row.CellPos = append(row.CellPos, cell.Span)
		}
		t.Rows = append(t.Rows, row)
	}
	return t
}

// image reads a figure from inside the package folder.
func (c *composer) image(s *eval.Sheet, b *sheet.Image) []layout.Block {
	inside := c.res.Src.Inside
	if inside == nil {
		c.diags.Add(b.Path.Span, "image %q: no package folder to read it from", b.Path.Value)
		return nil
	}
	rel := b.Path.Value
	if strings.Contains(rel, "%") {
		if u, err := url.PathUnescape(rel); err == nil {
			rel = u
		}
	}
	data, err := inside.ReadInside(rel)
	if err != nil {
		c.diags.Add(b.Path.Span, "image %q: %v", b.Path.Value, err)
		return nil
	}
	return []layout.Block{&layout.Image{Pos: b.Span, Data: data, Caption: c.inlines(s, b.Caption)}}
}

// inlines converts a line of prose. Block quotes print in italic.
func (c *composer) inlines(s *eval.Sheet, in []sheet.Inline) []layout.Run {
	var out []layout.Run
	for _, x := range in {
		switch x := x.(type) {
		case *sheet.Text:
			if st := c.style(x.Style); st == layout.Mono {
				out = append(out, layout.Run{Text: x.Value, Style: st})
			} else {
				out = append(out, users(richText(x.Value, st))...)
			}
		case *sheet.Break:
			if x.Hard {
				out = append(out, layout.Run{Text: "\n"})
			} else {
				out = append(out, layout.Run{Text: " "})
			}
		case *sheet.Interp:
			it := s.Interp(x)
			if it == nil || it.Symbol == nil {
				out = append(out, layout.Run{Text: "{" + x.Src.Value + "}", Style: c.style(x.Style)})
				continue
			}
			y := it.Symbol
			dec := y.Decimals
			if x.Ref != nil && x.Ref.Display != nil {
				dec = x.Ref.Display.Decimals
			}
			out = append(out, layout.Run{Math: symbolNode(y, it.Unit, dec)})
		case *sheet.Cite:
			if r := c.sheetRef(s, x.Key.Value, true); r != nil {
				out = append(out, c.citeRun(r))
			} else {
				out = append(out, layout.Run{Text: "[" + x.Key.Value + "]"})
			}
		case *sheet.Link:
			text := c.inlines(s, x.Text)
			out = append(out, text...)
			if x.URL != "" && x.URL != plainText(x.Text) && !strings.HasPrefix(x.URL, "#") {
				out = append(out, layout.Run{Text: " <" + x.URL + ">", Style: layout.Mono})
			}
		}
	}
	return out
}

// style maps a prose style to a face.
func (c *composer) style(st sheet.Style) layout.Style {
	if st&sheet.Code != 0 {
		return layout.Mono
	}
	bold, italic := st&sheet.Bold != 0, st&sheet.Italic != 0 || c.quote > 0
	switch {
	case bold && italic:
		return layout.BoldItalic
	case bold:
		return layout.Bold
	case italic:
		return layout.Italic
	}
	return layout.Regular
}

// plainText is the text of inlines without styles.
func plainText(in []sheet.Inline) string {
	var b strings.Builder
	for _, x := range in {
		switch x := x.(type) {
		case *sheet.Text:
			b.WriteString(x.Value)
		case *sheet.Link:
			b.WriteString(plainText(x.Text))
		case *sheet.Interp:
			b.WriteString("{" + x.Src.Value + "}")
		case *sheet.Cite:
			b.WriteString("[" + x.Key.Value + "]")
		case *sheet.Break:
			b.WriteString(" ")
		}
	}
	return b.String()
}
