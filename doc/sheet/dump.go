package sheet

import (
	"fmt"
	"io"
	"strings"

	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/source"
)

// Dump writes a readable outline of the sheet tree, one node per line with
// its span as line:col-line:col, for golden tests and debugging.
func Dump(w io.Writer, s *Sheet) {
	d := &dumper{w: w}
	d.p(0, "Sheet %s", s.File.Path)
	d.meta(1, &s.Meta)
	for _, b := range s.Body {
		d.block(1, b)
	}
}

// DumpMeta writes an outline of settings (package.yaml or front matter).
func DumpMeta(w io.Writer, m *Meta) {
	(&dumper{w: w}).meta(0, m)
}

type dumper struct{ w io.Writer }

func (d *dumper) p(depth int, format string, args ...any) {
	fmt.Fprintf(d.w, "%s%s\n", strings.Repeat("  ", depth), fmt.Sprintf(format, args...))
}

func at(sp source.Span) string {
	if sp.File == nil {
		return "-"
	}
	a, b := sp.File.Position(sp.Start), sp.File.Position(sp.End)
	return fmt.Sprintf("%d:%d-%d:%d", a.Line, a.Col, b.Line, b.Col)
}

func str(s Str) string { return fmt.Sprintf("%q@%s", s.Value, at(s.Span)) }

func (d *dumper) meta(n int, m *Meta) {
	if !m.Span.IsZero() || len(m.Keys) > 0 {
		d.p(n, "Meta %s", at(m.Span))
	}
	for _, k := range m.Keys {
		switch k.Value {
		case "uses":
			for _, u := range m.Uses {
				d.p(n+1, "uses %s", str(u))
			}
		case "revisions":
			for _, r := range m.Revisions {
				d.p(n+1, "revision %s rev=%s date=%s by=%s checked=%s note=%s", at(r.Span), str(r.Rev), str(r.Date), str(r.By), str(r.Checked), str(r.Note))
			}
		case "references":
			for _, r := range m.References {
				d.p(n+1, "reference %s %s", str(r.Key), str(r.Text))
			}
		default:
			d.p(n+1, "%s %s", k.Value, str(*m.Field(k.Value)))
		}
	}
}

func (d *dumper) blocks(n int, bs []Block) {
	for _, b := range bs {
		d.block(n, b)
	}
}

func (d *dumper) block(n int, b Block) {
	switch b := b.(type) {
	case *Heading:
		d.p(n, "Heading %s level=%d", at(b.Span), b.Level)
		d.inlines(n+1, b.Text)
	case *Paragraph:
		d.p(n, "Paragraph %s", at(b.Span))
		d.inlines(n+1, b.Text)
	case *List:
		d.p(n, "List %s ordered=%v start=%d tight=%v", at(b.Span), b.Ordered, b.Start, b.Tight)
		for _, it := range b.Items {
			d.p(n+1, "Item %s", at(it.Span))
			d.blocks(n+2, it.Blocks)
		}
	case *Table:
		d.p(n, "Table %s align=%v", at(b.Span), b.Align)
		d.p(n+1, "Header")
		for _, c := range b.Header {
			d.p(n+2, "Cell %s", at(c.Span))
			d.inlines(n+3, c.Text)
		}
		for _, r := range b.Rows {
			d.p(n+1, "Row")
			for _, c := range r {
				d.p(n+2, "Cell %s", at(c.Span))
				d.inlines(n+3, c.Text)
			}
		}
	case *Image:
		d.p(n, "Image %s path=%s title=%q", at(b.Span), str(b.Path), b.Title)
		d.inlines(n+1, b.Caption)
	case *CodeBlock:
		d.p(n, "CodeBlock %s lang=%q text=%q", at(b.Span), b.Lang, b.Text)
	case *Caution:
		d.p(n, "Caution %s kind=%s mark=%s", at(b.Span), b.Kind, at(b.KindSpan))
		d.blocks(n+1, b.Body)
	case *Quote:
		d.p(n, "Quote %s", at(b.Span))
		d.blocks(n+1, b.Body)
	case *ThematicBreak:
		d.p(n, "ThematicBreak %s", at(b.Span))
	case *Calc:
		d.p(n, "Calc %s", at(b.Span))
		d.lines(n+1, b.Lines)
	case *Ground:
		d.p(n, "Ground %s name=%s", at(b.Span), str(b.Name))
		d.lines(n+1, b.Lines)
		d.grid(n+1, b.Table)
	case *Footing:
		d.p(n, "Footing %s name=%s", at(b.Span), str(b.Name))
		d.lines(n+1, b.Lines)
		d.grid(n+1, b.Table)
	case *Analysis:
		if b.To.IsSet() {
			d.p(n, "Analysis %s kind=%s footing=%s to=%s prefix=%s", at(b.Span), b.Kind, str(b.Footing), str(b.To), str(b.Prefix))
		} else {
			d.p(n, "Analysis %s kind=%s footing=%s ground=%s prefix=%s", at(b.Span), b.Kind, str(b.Footing), str(b.Ground), str(b.Prefix))
		}
		d.lines(n+1, b.Lines)
	default:
		d.p(n, "%T", b)
	}
}

func (d *dumper) lines(n int, ls []Line) {
	for _, l := range ls {
		switch l := l.(type) {
		case *Comment:
			d.p(n, "Comment %s %q", at(l.Span), l.Text)
		case *Option:
			d.p(n, "Option %s name=%s value=%s note=%s", at(l.Span), str(l.Name), str(l.Value), str(l.Note))
		case *Stmt:
			kind := fmt.Sprintf("%T", l.X)
			switch x := l.X.(type) {
			case *expr.Assign:
				kind = "assign " + x.Sym.Name
				if x.Display != nil {
					kind += fmt.Sprintf(" -> %q:%d", x.Display.Text, x.Display.Decimals)
				}
				if x.NotePos >= 0 {
					kind += fmt.Sprintf(" note=%q", x.Note)
				}
			case *expr.Check:
				kind = "check " + x.Op
			}
			d.p(n, "Stmt %s %s %q", at(l.Span), kind, l.Span.Text())
		}
	}
}

func (d *dumper) grid(n int, g *Grid) {
	if g == nil {
		return
	}
	d.p(n, "Grid %s", at(g.Span))
	for _, c := range g.Columns {
		d.p(n+1, "Column %s name=%s unit=%s", at(c.Span), str(c.Name), str(c.Unit))
	}
	for _, r := range g.Rows {
		cells := make([]string, len(r.Cells))
		for i, c := range r.Cells {
			cells[i] = str(c)
		}
		d.p(n+1, "Row %s %s", at(r.Span), strings.Join(cells, " "))
	}
}

func (d *dumper) inlines(n int, in []Inline) {
	for _, x := range in {
		switch x := x.(type) {
		case *Text:
			d.p(n, "Text %s %q %s", at(x.Span), x.Value, x.Style)
		case *Link:
			d.p(n, "Link %s url=%q title=%q", at(x.Span), x.URL, x.Title)
			d.inlines(n+1, x.Text)
		case *Interp:
			ref := "nil"
			if x.Ref != nil {
				ref = x.Ref.Sym.Name
				if x.Ref.Display != nil {
					ref += fmt.Sprintf(" -> %q:%d", x.Ref.Display.Text, x.Ref.Display.Decimals)
				}
			}
			d.p(n, "Interp %s src=%s ref=%s %s", at(x.Span), str(x.Src), ref, x.Style)
		case *Cite:
			d.p(n, "Cite %s key=%s", at(x.Span), str(x.Key))
		case *Break:
			d.p(n, "Break %s hard=%v", at(x.Span), x.Hard)
		}
	}
}
