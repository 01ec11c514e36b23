package parse

import (
	"bytes"
	"regexp"
	"strings"
	"sync"

	"github.com/yuin/goldmark"
	"github.com/yuin/goldmark/ast"
	"github.com/yuin/goldmark/extension"
	east "github.com/yuin/goldmark/extension/ast"
	"github.com/yuin/goldmark/parser"
	"github.com/yuin/goldmark/text"
	"github.com/yuin/goldmark/util"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

var (
	mdOnce sync.Once
	md     goldmark.Markdown
)

// markdown returns the shared goldmark instance: CommonMark with GFM tables,
// the fenced-code parser wrapped to record closing fences, and plinth's
// inline parsers for {interpolations} and [KEY] citations.
func markdown() goldmark.Markdown {
	mdOnce.Do(func() {
		blocks := parser.DefaultBlockParsers()
		for i, b := range blocks {
			if _, ok := b.Value.(parser.BlockParser); ok && b.Priority == 700 {
				blocks[i] = util.Prioritized(fenceParser{parser.NewFencedCodeBlockParser()}, 700)
			}
		}
		inlines := append(parser.DefaultInlineParsers(),
			util.Prioritized(braceParser{}, 150),
			util.Prioritized(citeParser{}, 199))
		p := parser.NewParser(
			parser.WithBlockParsers(blocks...),
			parser.WithInlineParsers(inlines...),
			parser.WithParagraphTransformers(parser.DefaultParagraphTransformers()...),
		)
		md = goldmark.New(goldmark.WithParser(p), goldmark.WithExtensions(extension.Table))
	})
	return md
}

// conv converts goldmark's tree for the body text f.Text[base:] into sheet
// nodes. Goldmark offsets are into src; file offsets add base.
type conv struct {
	f     *source.File
	src   []byte
	base  int
	diags *source.List
	depth int // container nesting: plinth blocks only at depth 0
}

func parseBody(f *source.File, base int, diags *source.List) []sheet.Block {
	c := &conv{f: f, src: f.Text[base:], base: base, diags: diags}
	root := markdown().Parser().Parse(text.NewReader(c.src))
	return c.blocks(root)
}

// span returns the file span of body offsets [a, b).
func (c *conv) span(a, b int) source.Span {
	a = min(max(a, 0), len(c.src))
	b = min(max(b, a), len(c.src))
	return source.Span{File: c.f, Start: c.base + a, End: c.base + b}
}

// trimNL moves end back over one trailing line break (\n, \r\n or \r).
func (c *conv) trimNL(end int) int {
	end = min(end, len(c.src))
	if end > 0 && c.src[end-1] == '\n' {
		end--
	}
	if end > 0 && c.src[end-1] == '\r' {
		end--
	}
	return end
}

// lineEnd returns the end of the line holding offset off (before its break).
func (c *conv) lineEnd(off int) int {
	off = max(off, 0)
	if off >= len(c.src) {
		return len(c.src)
	}
	i := bytes.IndexByte(c.src[off:], '\n')
	if i < 0 {
		return len(c.src)
	}
	return c.trimNL(off + i + 1)
}

// blockRange returns a goldmark block's body offsets: from its position to
// the end of its last line or last child.
func (c *conv) blockRange(n ast.Node) (int, int) {
	s, e := c.nodeRange(n)
	return max(s, 0), max(e, s, 0)
}

// nodeRange is blockRange with -1 for an unknown start.
func (c *conv) nodeRange(n ast.Node) (int, int) {
	start := n.Pos()
	end := -1
	if n.Type() == ast.TypeBlock {
		if l := n.Lines(); l.Len() > 0 {
			if start < 0 {
				start = l.At(0).Start
			}
			end = c.trimNL(l.At(l.Len() - 1).Stop)
		}
	}
	for ch := n.FirstChild(); ch != nil; ch = ch.NextSibling() {
		s, e := c.nodeRange(ch)
		if start < 0 || (s >= 0 && s < start) {
			start = s
		}
		end = max(end, e)
	}
	if n.Type() == ast.TypeInline {
		if t, ok := n.(*ast.Text); ok {
			end = max(end, t.Segment.Stop)
		}
	}
	return start, end
}

func (c *conv) blockSpan(n ast.Node) source.Span { return c.span(c.blockRange(n)) }

// blocks converts the block children of n.
func (c *conv) blocks(n ast.Node) []sheet.Block {
	var out []sheet.Block
	for ch := n.FirstChild(); ch != nil; ch = ch.NextSibling() {
		out = append(out, c.block(ch)...)
	}
	return out
}

func (c *conv) block(n ast.Node) []sheet.Block {
	switch n := n.(type) {
	case *ast.Heading:
		s, _ := c.blockRange(n)
		return []sheet.Block{&sheet.Heading{Span: c.span(s, c.lineEnd(s)), Level: n.Level, Text: c.inlines(n, 0, nil)}}
	case *ast.Paragraph, *ast.TextBlock:
		return c.paragraph(n)
	case *ast.List:
		l := &sheet.List{Span: c.blockSpan(n), Ordered: n.IsOrdered(), Start: n.Start, Tight: n.IsTight}
		if !l.Ordered {
			l.Start = 0
		}
		c.depth++
		for it := n.FirstChild(); it != nil; it = it.NextSibling() {
			l.Items = append(l.Items, &sheet.Item{Span: c.blockSpan(it), Blocks: c.blocks(it)})
		}
		c.depth--
		return []sheet.Block{l}
	case *east.Table:
		return []sheet.Block{c.table(n)}
	case *ast.Blockquote:
		c.depth++
		defer func() { c.depth-- }()
		return []sheet.Block{c.quote(n)}
	case *ast.FencedCodeBlock:
		if b := c.fenced(n); b != nil {
			return []sheet.Block{b}
		}
		return nil
	case *ast.CodeBlock:
		return []sheet.Block{&sheet.CodeBlock{Span: c.blockSpan(n), Text: c.linesText(n)}}
	case *ast.ThematicBreak:
		s, _ := c.blockRange(n)
		return []sheet.Block{&sheet.ThematicBreak{Span: c.span(s, c.lineEnd(s))}}
	case *ast.HTMLBlock:
		s, e := c.blockRange(n)
		if n.ClosureLine.Len() > 0 {
			e = max(e, c.trimNL(n.ClosureLine.Stop))
		}
		if !bytes.HasPrefix(bytes.TrimLeft(c.src[s:], " \t"), []byte("<!--")) {
			c.diags.Warn(c.span(s, e), "raw HTML is not rendered: dropped")
		}
		return nil
	}
	return nil // link reference definitions and anything unknown
}

// linesText joins a code block's lines.
func (c *conv) linesText(n ast.Node) string {
	var b strings.Builder
	l := n.Lines()
	for i := 0; i < l.Len(); i++ {
		seg := l.At(i)
		b.WriteString(strings.Repeat(" ", seg.Padding))
		b.Write(bytes.ReplaceAll(seg.Value(c.src), []byte("\r\n"), []byte("\n")))
	}
	return b.String()
}

// paragraph converts a paragraph; an image at its top level becomes an
// Image block of its own, splitting the text around it.
func (c *conv) paragraph(n ast.Node) []sheet.Block {
	var out []sheet.Block
	var cur []sheet.Inline
	flush := func() {
		cur = trimBreaks(cur)
		if len(cur) > 0 {
			out = append(out, &sheet.Paragraph{Span: inlineSpan(cur), Text: cur})
		}
		cur = nil
	}
	for ch := n.FirstChild(); ch != nil; ch = ch.NextSibling() {
		if img, ok := ch.(*ast.Image); ok {
			flush()
			out = append(out, c.image(img))
			continue
		}
		cur = c.inline(ch, 0, cur)
	}
	flush()
	if len(out) == 1 {
		if p, ok := out[0].(*sheet.Paragraph); ok {
			p.Span = c.blockSpan(n)
		}
	}
	return out
}

// trimBreaks drops line breaks and blank text at either end, and the
// spaces at either end of the text left.
func trimBreaks(in []sheet.Inline) []sheet.Inline {
	blank := func(x sheet.Inline) bool {
		switch x := x.(type) {
		case *sheet.Break:
			return true
		case *sheet.Text:
			return strings.TrimSpace(x.Value) == "" && x.Style&sheet.Code == 0
		}
		return false
	}
	for len(in) > 0 && blank(in[0]) {
		in = in[1:]
	}
	for len(in) > 0 && blank(in[len(in)-1]) {
		in = in[:len(in)-1]
	}
	if len(in) > 0 {
		if t, ok := in[0].(*sheet.Text); ok && t.Style&sheet.Code == 0 {
			t.Value = strings.TrimLeft(t.Value, " \t")
		}
		if t, ok := in[len(in)-1].(*sheet.Text); ok && t.Style&sheet.Code == 0 {
			t.Value = strings.TrimRight(t.Value, " \t")
		}
	}
	return in
}

// inlineSpan covers a run of inlines.
func inlineSpan(in []sheet.Inline) source.Span {
	sp := in[0].Where()
	for _, x := range in[1:] {
		w := x.Where()
		sp.Start = min(sp.Start, w.Start)
		sp.End = max(sp.End, w.End)
	}
	return sp
}

func (c *conv) image(n *ast.Image) *sheet.Image {
	start := n.Pos()
	end, ds, de := c.linkTail(start + 1)
	img := &sheet.Image{Span: c.span(start, end), Title: string(n.Title), Caption: trimBreaks(c.inlines(n, 0, nil))}
	img.Path = sheet.Str{Value: string(n.Destination), Span: c.span(ds, de)}
	if ds < 0 {
		img.Path.Span = img.Span
	}
	return img
}

// table converts a prose GFM table.
func (c *conv) table(n *east.Table) *sheet.Table {
	t := &sheet.Table{Span: c.blockSpan(n)}
	for _, a := range n.Alignments {
		t.Align = append(t.Align, [...]sheet.Align{east.AlignLeft: sheet.AlignLeft, east.AlignRight: sheet.AlignRight,
			east.AlignCenter: sheet.AlignCenter, east.AlignNone: sheet.AlignNone}[a])
	}
	for row := n.FirstChild(); row != nil; row = row.NextSibling() {
		var cells []sheet.Cell
		for cell := row.FirstChild(); cell != nil; cell = cell.NextSibling() {
			cells = append(cells, sheet.Cell{Span: c.blockSpan(cell), Text: c.inlines(cell, 0, nil)})
		}
		if _, ok := row.(*east.TableHeader); ok {
			t.Header = cells
		} else {
			t.Rows = append(t.Rows, cells)
		}
	}
	return t
}

var alertLine = regexp.MustCompile(`^\[!([A-Za-z]+)\]$`)

// quote converts a blockquote: a caution when its first line is [!WORD].
func (c *conv) quote(n *ast.Blockquote) sheet.Block {
	sp := c.blockSpan(n)
	first, ok := n.FirstChild().(*ast.Paragraph)
	if !ok || first.Lines().Len() == 0 {
		return &sheet.Quote{Span: sp, Body: c.blocks(n)}
	}
	l0 := first.Lines().At(0)
	raw := l0.Value(c.src)
	g := alertLine.FindSubmatch(bytes.TrimSpace(raw))
	if g == nil {
		return &sheet.Quote{Span: sp, Body: c.blocks(n)}
	}
	ms := l0.Start + bytes.IndexByte(raw, '[')
	mark := c.span(ms, ms+len(g[0]))
	word := strings.ToUpper(string(g[1]))
	kind, known := severity.Parse(word)
	if !known {
		hint := "write > [!WARNING], > [!CAUTION] or > [!NOTE] (highest severity first)"
		if s, ok := suggest.Nearest(word, severity.Words); ok {
			hint = "did you mean [!" + s + "]?"
		}
		c.diags.AddHint(mark, hint, "unknown caution [!%s]", g[1])
		return &sheet.Quote{Span: sp, Body: c.blocks(n)}
	}
	body := c.blocks(n)
	cut := c.base + c.trimNL(l0.Stop)
	if len(body) > 0 {
		if p, ok := body[0].(*sheet.Paragraph); ok && p.Span.Start < cut {
			var rest []sheet.Inline
			for _, x := range p.Text {
				if x.Where().Start >= cut {
					rest = append(rest, x)
				}
			}
			rest = trimBreaks(rest)
			if len(rest) == 0 {
				body = body[1:]
			} else {
				p.Text = rest
				p.Span = inlineSpan(rest)
			}
		}
	}
	return &sheet.Caution{Span: sp, Kind: kind, KindSpan: mark, Body: body}
}
