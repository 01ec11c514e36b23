package parse

import (
	"strings"

	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// blockLines collects the lines of one plinth block.
type blockLines struct {
	c     *conv
	kind  sheet.Kind
	lines []sheet.Line
	table *sheet.Grid
	run   []rawLine // the table rows being read
	extra bool      // reading a table after the first: rows are skipped
	opts  map[string]int
}

// rawLine is one line of a block without its line break, at file offset off.
type rawLine struct {
	text string
	off  int
}

func (b *blockLines) span(a, e int) source.Span { return source.Span{File: b.c.f, Start: a, End: e} }

func (b *blockLines) errorf(a, e int, format string, args ...any) {
	b.c.diags.Add(b.span(a, e), format, args...)
}

// line handles one line of the block.
func (b *blockLines) line(text string, off int) {
	t, ts, te := trimSpan(text, off)
	switch {
	case t == "":
		b.endTable()
	case t[0] == '|':
		b.tableLine(rawLine{text, off}, ts, te)
	case t[0] == '#':
		b.endTable()
		b.lines = append(b.lines, &sheet.Comment{Span: b.span(ts, te), Text: strings.TrimSpace(t[1:])})
	default:
		b.endTable()
		switch b.kind {
		case sheet.KindCalc:
			b.stmt(text, off)
		case sheet.KindGround, sheet.KindFooting:
			if !b.wordOption(text, off) {
				b.stmt(text, off)
			}
		default:
			b.option(text, off)
		}
	}
}

// tableLine takes a line starting with '|'.
func (b *blockLines) tableLine(l rawLine, ts, te int) {
	switch b.kind {
	case sheet.KindGround, sheet.KindFooting, sheet.KindSchedule:
	default:
		if len(b.run) == 0 {
			what := "statements and checks"
			if b.kind != sheet.KindCalc {
				what = "options (name = value)"
			}
			b.errorf(ts, te, "a %s block holds %s, not a table", b.kind, what)
		}
		b.run = append(b.run, l)
		b.extra = true
		return
	}
	if b.table != nil && len(b.run) == 0 {
		first := b.table.Span.Pos().Line
		b.errorf(ts, te, "a second table in one %s block (the first starts at line %d): a block holds one table", b.kind, first)
		b.extra = true
	}
	b.run = append(b.run, l)
}

// endTable ends a run of table rows.
func (b *blockLines) endTable() {
	if len(b.run) == 0 {
		return
	}
	if !b.extra {
		b.table = b.c.grid(b.run)
	}
	b.run, b.extra = nil, false
}

// stmt parses a statement line with doc/expr.
func (b *blockLines) stmt(text string, off int) {
	st, errs := expr.ParseLine(text, off)
	for _, e := range errs {
		b.c.addExprError(e, off, off+len(text))
	}
	if st == nil {
		return
	}
	if ch, ok := st.(*expr.Check); ok && b.kind != sheet.KindCalc {
		b.errorf(ch.Pos, ch.Pos+len("check"), "a check line belongs in a calc block, not a %s block", b.kind)
		return
	}
	p, e := st.Span()
	b.lines = append(b.lines, &sheet.Stmt{Span: b.span(p, e), X: st})
}

// optionName returns the word before '=' on a "name = value" line, with
// the value text, or ok false when the line has no such form.
func optionName(text string) (name, value string, ok bool) {
	i := strings.IndexByte(text, '=')
	if i < 0 || (i+1 < len(text) && text[i+1] == '=') {
		return "", "", false
	}
	name = strings.TrimSpace(text[:i])
	value = text[i+1:]
	if h := strings.IndexByte(value, '#'); h >= 0 {
		value = value[:h]
	}
	return name, strings.TrimSpace(value), nameRE.MatchString(name)
}

// wordOption handles a ground or footing line naming one of the block's
// options (shape = rectangle), or a bare-word line one edit from one
// (shap = rectangle), and reports whether it did.
func (b *blockLines) wordOption(text string, off int) bool {
	name, value, ok := optionName(text)
	if !ok {
		return false
	}
	if _, known := sheet.LookupOption(b.kind, name); known {
		b.option(text, off)
		return true
	}
	if nameRE.MatchString(value) {
		if near, ok := suggest.Nearest(name, sheet.OptionNames(b.kind)); ok {
			s := off + strings.Index(text, name)
			b.c.diags.AddHint(b.span(s, s+len(name)), "did you mean "+quote(near)+"?", "unknown %s option %q", b.kind, name)
			return true
		}
	}
	return false
}

// option parses a "name = value [# note]" line.
func (b *blockLines) option(text string, off int) {
	o, errs := expr.ParseOption(text, off)
	for _, e := range errs {
		b.c.addExprError(e, off, off+len(text))
	}
	if o == nil || len(errs) > 0 {
		return
	}
	name := o.Key.Name
	ks := b.span(o.Key.Pos, o.Key.End)
	spec, known := sheet.LookupOption(b.kind, name)
	if !known {
		names := sheet.OptionNames(b.kind)
		hint := "a " + b.kind.String() + " block takes " + strings.Join(names, ", ")
		if len(names) == 0 {
			hint = "a " + b.kind.String() + " block takes statements only"
		}
		if near, ok := suggest.Nearest(name, names); ok {
			hint = "did you mean " + quote(near) + "?"
		}
		b.c.diags.AddHint(ks, hint, "unknown %s option %q", b.kind, name)
		return
	}
	if line, dup := b.opts[name]; dup && !spec.Repeat { // a repeated option (vary) is one value a line
		b.c.diags.Add(ks, "option %s is already set at line %d", name, line)
		return
	}
	b.opts[name] = ks.Pos().Line
	opt := &sheet.Option{Span: b.span(o.Pos, o.End), Name: sheet.Str{Value: name, Span: ks},
		Value: sheet.Str{Value: o.Value, Span: b.span(o.ValuePos, o.ValueEnd)}}
	if o.NotePos >= 0 {
		opt.Note = sheet.Str{Value: o.Note, Span: b.span(o.NotePos, o.NotePos+len(o.Note))}
	}
	b.lines = append(b.lines, opt)
}

// addExprError reports an error from doc/expr, its offsets kept within
// [lo, hi] (the line or text it came from).
func (c *conv) addExprError(e expr.Error, lo, hi int) {
	p := min(max(e.Pos, lo), hi)
	q := min(max(e.End, p), hi)
	c.diags.Add(source.Span{File: c.f, Start: p, End: q}, "%s", e.Msg)
}
