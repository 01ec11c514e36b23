package parse

import (
	"strings"

	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// cell is one cell of a pipe-table row: its text (trimmed, "\|" read as
// "|") at file offsets [start, end).
type cell struct {
	text       string
	start, end int
}

// splitRow splits a table row at unescaped pipes. Leading and trailing
// pipes are optional, as in GFM.
func splitRow(l rawLine) []cell {
	s := l.text
	lo, hi := 0, len(s)
	for lo < hi && (s[lo] == ' ' || s[lo] == '\t') {
		lo++
	}
	for hi > lo && (s[hi-1] == ' ' || s[hi-1] == '\t' || s[hi-1] == '\r') {
		hi--
	}
	if lo < hi && s[lo] == '|' {
		lo++
	}
	if hi > lo && s[hi-1] == '|' && (hi-2 < lo || s[hi-2] != '\\') {
		hi--
	}
	var out []cell
	start := lo
	for i := lo; i <= hi; i++ {
		if i < hi && s[i] == '\\' && i+1 < hi {
			i++
			continue
		}
		if i == hi || s[i] == '|' {
			t, ts, te := trimSpan(s[start:i], l.off+start)
			if t == "" {
				ts, te = l.off+start, l.off+start
			}
			out = append(out, cell{strings.ReplaceAll(t, `\|`, "|"), ts, te})
			start = i + 1
		}
	}
	return out
}

// isDelimiterRow reports whether every cell is :?-+:?
func isDelimiterRow(cells []cell) bool {
	for _, c := range cells {
		t := strings.TrimSuffix(strings.TrimPrefix(c.text, ":"), ":")
		if t == "" || strings.Trim(t, "-") != "" {
			return false
		}
	}
	return len(cells) > 0
}

// grid reads a block's pipe table: header, delimiter row, body rows.
func (c *conv) grid(rows []rawLine) *sheet.Grid {
	span := func(l rawLine) source.Span {
		_, s, e := trimSpan(l.text, l.off)
		return source.Span{File: c.f, Start: s, End: e}
	}
	last := span(rows[len(rows)-1])
	g := &sheet.Grid{Span: span(rows[0])}
	g.Span.End = last.End
	header := splitRow(rows[0])
	seen := map[string]int{}
	for _, h := range header {
		col := c.column(h)
		if col.Name.Value != "" {
			if prev, dup := seen[col.Name.Value]; dup {
				c.diags.Add(col.Name.Span, "column %q appears twice (first as column %d)", col.Name.Value, prev)
			} else {
				seen[col.Name.Value] = len(g.Columns) + 1
			}
		}
		g.Columns = append(g.Columns, col)
	}
	body := rows[1:]
	if len(rows) < 2 {
		c.diags.AddHint(g.Span, "write | --- | --- | under the header, one --- per column",
			"the table has no delimiter row under its header")
	} else if d := splitRow(rows[1]); !isDelimiterRow(d) {
		c.diags.AddHint(span(rows[1]), "write | --- | --- | under the header, one --- per column",
			"expected a delimiter row under the table header")
	} else {
		body = rows[2:]
		if len(d) != len(header) {
			c.diags.Add(span(rows[1]), "the delimiter row has %d cells; the header has %d", len(d), len(header))
		}
	}
	for _, l := range body {
		cells := splitRow(l)
		if len(cells) != len(header) {
			c.diags.Add(span(l), "the row has %d cells; the header has %d", len(cells), len(header))
			continue
		}
		r := sheet.Row{Span: span(l)}
		for _, x := range cells {
			r.Cells = append(r.Cells, sheet.Str{Value: x.text, Span: source.Span{File: c.f, Start: x.start, End: x.end}})
		}
		g.Rows = append(g.Rows, r)
	}
	return g
}

// column splits a header cell "name (unit)".
func (c *conv) column(h cell) sheet.Column {
	sp := func(a, b int) source.Span { return source.Span{File: c.f, Start: a, End: b} }
	col := sheet.Column{Span: sp(h.start, h.end)}
	t := h.text
	open := strings.IndexByte(t, '(')
	if t == "" {
		c.diags.Add(col.Span, "empty column name in the table header")
		return col
	}
	if open < 0 {
		if i := strings.IndexByte(t, ')'); i >= 0 {
			c.diags.Add(sp(h.start+i, h.start+i+1), "unmatched \")\" in column header %q", t)
		}
		col.Name = sheet.Str{Value: t, Span: col.Span}
		return col
	}
	name, ns, ne := trimSpan(t[:open], h.start)
	if name == "" {
		c.diags.Add(col.Span, "expected a column name before the unit in %q", t)
	} else {
		col.Name = sheet.Str{Value: name, Span: sp(ns, ne)}
	}
	if !strings.HasSuffix(t, ")") {
		c.diags.AddHint(sp(h.start+open, h.start+open+1), "write the unit in parentheses at the end: gamma (kN/m3)",
			"unclosed \"(\" in column header %q", t)
		return col
	}
	unit, us, ue := trimSpan(t[open+1:len(t)-1], h.start+open+1)
	if unit == "" {
		c.diags.AddHint(sp(h.start+open, h.end), "leave out the parentheses for a pure number",
			"empty unit in column header %q", t)
		return col
	}
	col.Unit = sheet.Str{Value: unit, Span: sp(us, ue)}
	return col
}
