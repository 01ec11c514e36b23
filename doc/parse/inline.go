package parse

import (
	"bytes"
	"strings"

	"github.com/yuin/goldmark/ast"
	"github.com/yuin/goldmark/util"

	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// inlines converts the inline children of n, appending to out.
func (c *conv) inlines(n ast.Node, style sheet.Style, out []sheet.Inline) []sheet.Inline {
	for ch := n.FirstChild(); ch != nil; ch = ch.NextSibling() {
		out = c.inline(ch, style, out)
	}
	return out
}

// text appends a run of text, merging it into a directly preceding run of
// the same style.
func (c *conv) text(out []sheet.Inline, start, end int, value string, style sheet.Style) []sheet.Inline {
	if value == "" {
		return out
	}
	sp := c.span(start, end)
	if len(out) > 0 {
		if t, ok := out[len(out)-1].(*sheet.Text); ok && t.Style == style && t.Span.End == sp.Start {
			t.Value += value
			t.Span.End = sp.End
			return out
		}
	}
	return append(out, &sheet.Text{Span: sp, Value: value, Style: style})
}

func (c *conv) inline(n ast.Node, style sheet.Style, out []sheet.Inline) []sheet.Inline {
	switch n := n.(type) {
	case *ast.Text:
		seg := n.Segment
		v := seg.Value(c.src)
		if n.IsRaw() || style&sheet.Code != 0 {
			out = c.text(out, seg.Start, seg.Stop, string(v), style)
		} else {
			out = c.text(out, seg.Start, seg.Stop, unescape(v), style)
		}
		if n.HardLineBreak() || n.SoftLineBreak() {
			e := c.lineEnd(seg.Stop)
			out = append(out, &sheet.Break{Span: c.span(seg.Stop, e), Hard: n.HardLineBreak()})
		}
	case *ast.String:
		p := max(n.Pos(), 0)
		out = c.text(out, p, p+len(n.Value), string(n.Value), style)
	case *ast.Emphasis:
		s := sheet.Italic
		if n.Level >= 2 {
			s = sheet.Bold
		}
		out = c.inlines(n, style|s, out)
	case *ast.CodeSpan:
		out = c.codeSpan(n, style, out)
	case *ast.Link:
		start := n.Pos()
		end, _, _ := c.linkTail(start)
		out = append(out, &sheet.Link{Span: c.span(start, end), URL: string(n.Destination),
			Title: string(n.Title), Text: c.inlines(n, style, nil)})
	case *ast.AutoLink:
		start := max(n.Pos(), 0)
		end := start + 1
		if i := bytes.IndexByte(c.src[start:], '>'); i >= 0 {
			end = start + i + 1
		}
		label := string(n.Label(c.src))
		out = append(out, &sheet.Link{Span: c.span(start, end), URL: string(n.URL(c.src)),
			Text: []sheet.Inline{&sheet.Text{Span: c.span(start+1, end-1), Value: label, Style: style}}})
	case *ast.Image:
		start := n.Pos()
		end, _, _ := c.linkTail(start + 1)
		c.diags.Warn(c.span(start, end), "an image inside a link or emphasis is not shown: only its caption is kept")
		out = c.inlines(n, style, out)
	case *ast.RawHTML:
		if n.Segments.Len() == 0 {
			break
		}
		s, e := n.Segments.At(0).Start, n.Segments.At(n.Segments.Len()-1).Stop
		if !bytes.HasPrefix(c.src[s:], []byte("<!--")) {
			c.diags.Warn(c.span(s, e), "raw HTML is not rendered: dropped")
		}
	case *braceNode:
		out = c.text(out, n.start, n.end, n.value, style)
	case *interpNode:
		out = c.interp(n, style, out)
	case *citeNode:
		out = append(out, &sheet.Cite{Span: c.span(n.start, n.end),
			Key: sheet.Str{Value: string(c.src[n.start+1 : n.end-1]), Span: c.span(n.start+1, n.end-1)}})
	default:
		out = c.inlines(n, style, out)
	}
	return out
}

// codeSpan converts `code`: one run, line breaks as spaces.
func (c *conv) codeSpan(n *ast.CodeSpan, style sheet.Style, out []sheet.Inline) []sheet.Inline {
	start := n.Pos()
	var b strings.Builder
	end := start
	for ch := n.FirstChild(); ch != nil; ch = ch.NextSibling() {
		if t, ok := ch.(*ast.Text); ok {
			v := t.Segment.Value(c.src)
			v = bytes.TrimRight(v, "\r\n")
			b.Write(v)
			if t.Segment.Stop > end {
				end = t.Segment.Stop
			}
			if ch.NextSibling() != nil && len(v) < t.Segment.Len() {
				b.WriteByte(' ')
			}
		} else if s, ok := ch.(*ast.String); ok {
			b.Write(s.Value)
		}
	}
	for end < len(c.src) && (c.src[end] == ' ' || c.src[end] == '\r' || c.src[end] == '\n') {
		end++
	}
	for end < len(c.src) && c.src[end] == '`' {
		end++
	}
	return append(out, &sheet.Text{Span: c.span(start, end), Value: b.String(), Style: style | sheet.Code})
}

// interp converts {…}: parse the inside with expr.ParseRef.
func (c *conv) interp(n *interpNode, style sheet.Style, out []sheet.Inline) []sheet.Inline {
	if n.unclosed {
		c.diags.AddHint(c.span(n.start, n.start+1), "close it with } on the same line, or write {{ for a literal brace",
			"unclosed { in text")
		return c.text(out, n.start, n.start+1, "{", style)
	}
	inner := string(c.src[n.start+1 : n.end-1])
	src := sheet.Str{Value: inner, Span: c.span(n.start+1, n.end-1)}
	it := &sheet.Interp{Span: c.span(n.start, n.end), Src: src, Style: style}
	ref, errs := expr.ParseRef(inner, src.Span.Start)
	for _, e := range errs {
		c.addExprError(e, src.Span.Start, src.Span.End)
	}
	if len(errs) == 0 {
		it.Ref = ref
	}
	return append(out, it)
}

// linkTail scans a link or image from its '[' at off: the label, then
// "(destination "title")", "[ref]" or nothing. It returns the end of the
// whole link and the destination's offsets (-1, -1 when it has none here).
func (c *conv) linkTail(off int) (end, ds, de int) {
	if off < 0 || off >= len(c.src) || c.src[off] != '[' {
		return c.lineEnd(max(off, 0)), -1, -1
	}
	k := util.FindClosure(c.src[off+1:], '[', ']', true, true)
	if k < 0 {
		return c.lineEnd(off), -1, -1
	}
	i := off + 1 + k + 1 // after ']'
	if i >= len(c.src) {
		return i, -1, -1
	}
	switch c.src[i] {
	case '(':
		j := i + 1
		for j < len(c.src) && (c.src[j] == ' ' || c.src[j] == '\t' || c.src[j] == '\n' || c.src[j] == '\r') {
			j++
		}
		ds = j
		if j < len(c.src) && c.src[j] == '<' {
			ds = j + 1
			de = ds
			for de < len(c.src) && c.src[de] != '>' && c.src[de] != '\n' {
				de++
			}
		} else {
			depth := 0
			for de = ds; de < len(c.src); de++ {
				ch := c.src[de]
				if ch == '\\' && de+1 < len(c.src) {
					de++
					continue
				}
				if ch == '(' {
					depth++
				} else if ch == ')' {
					if depth == 0 {
						break
					}
					depth--
				} else if ch <= ' ' {
					break
				}
			}
		}
		return c.closeParen(i), ds, de
	case '[':
		if k := util.FindClosure(c.src[i+1:], '[', ']', false, false); k >= 0 {
			return i + 1 + k + 1, -1, -1
		}
	}
	return i, -1, -1
}

// closeParen returns the offset after the ')' closing the '(' at i.
func (c *conv) closeParen(i int) int {
	if k := util.FindClosure(c.src[i+1:], '(', ')', false, true); k >= 0 {
		return i + 1 + k + 1
	}
	return c.lineEnd(i)
}

// unescape resolves backslash escapes and character references in text.
func unescape(v []byte) string {
	if bytes.IndexByte(v, '\\') < 0 && bytes.IndexByte(v, '&') < 0 {
		return string(v)
	}
	var b []byte
	for i := 0; i < len(v); i++ {
		ch := v[i]
		if ch == '\\' && i+1 < len(v) && util.IsPunct(v[i+1]) {
			b = append(b, v[i+1])
			i++
			continue
		}
		if ch == '&' {
			if j := bytes.IndexByte(v[i:min(len(v), i+40)], ';'); j > 0 {
				ref := v[i : i+j+1]
				r := util.ResolveEntityNames(util.ResolveNumericReferences(ref))
				if !bytes.Equal(r, ref) {
					b = append(b, r...)
					i += j
					continue
				}
			}
		}
		b = append(b, ch)
	}
	return string(b)
}
