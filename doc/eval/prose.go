package eval

import (
	"fmt"

	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// cites checks the [KEY] references in a note and returns their keys.
func (e *evaluator) cites(s *Sheet, note sheet.Str) []string {
	var keys []string
	for _, c := range sheet.CitesIn(note) {
		if e.cite(s, c) {
			keys = append(keys, c.Key.Value)
		}
	}
	return keys
}

// cite reports an unknown reference key.
func (e *evaluator) cite(s *Sheet, c *sheet.Cite) bool {
	if _, ok := s.Meta.Reference(c.Key.Value); ok {
		return true
	}
	var keys []string
	for _, r := range s.Meta.References {
		keys = append(keys, r.Key.Value)
	}
	hint := "references are listed under references: in package.yaml or the sheet's front matter"
	if n, ok := suggest.Nearest(c.Key.Value, keys); ok {
		hint = fmt.Sprintf("did you mean [%s]?", n)
	}
	e.errs.AddHint(c.Key.Span, hint, "unknown reference [%s]", c.Key.Value)
	return false
}

// prose resolves interpolations and checks citations in a sheet's prose
// and in the notes of its block lines.
func (e *evaluator) prose(s *Sheet) {
	sc := scope{e: e, s: s, all: true}
	var blocks func([]sheet.Block)
	var inlines func([]sheet.Inline)
	inlines = func(in []sheet.Inline) {
		for _, x := range in {
			switch x := x.(type) {
			case *sheet.Interp:
				e.interp(sc, x)
			case *sheet.Cite:
				e.cite(s, x)
			case *sheet.Link:
				inlines(x.Text)
			}
		}
	}
	blocks = func(bs []sheet.Block) {
		for _, b := range bs {
			switch b := b.(type) {
			case *sheet.Heading:
				inlines(b.Text)
			case *sheet.Paragraph:
				inlines(b.Text)
			case *sheet.List:
				for _, it := range b.Items {
					blocks(it.Blocks)
				}
			case *sheet.Table:
				for _, c := range b.Header {
					inlines(c.Text)
				}
				for _, r := range b.Rows {
					for _, c := range r {
						inlines(c.Text)
					}
				}
			case *sheet.Image:
				inlines(b.Caption)
			case *sheet.Caution:
				blocks(b.Body)
			case *sheet.Quote:
				blocks(b.Body)
			}
		}
	}
	blocks(s.Src.Body)
	for _, b := range s.Src.Body {
		for _, o := range lineNotes(b) {
			e.cites(s, o)
		}
	}
}

// lineNotes are the notes of a block's options and comments (statement
// notes are checked when the statement is evaluated).
func lineNotes(b sheet.Block) []sheet.Str {
	var out []sheet.Str
	for _, l := range blockLines(b) {
		switch l := l.(type) {
		case *sheet.Option:
			out = append(out, l.Note)
		case *sheet.Comment:
			out = append(out, sheet.Str{Value: l.Text, Span: l.Span})
		}
	}
	return out
}

// interp resolves {symbol} or {symbol -> unit}.
func (e *evaluator) interp(sc scope, in *sheet.Interp) {
	if in.Ref == nil {
		return
	}
	f := in.Span.File
	y := sc.find(in.Ref.Sym.Name)
	if y == nil {
		sc.unresolvedProse(in)
		return
	}
	u, dec := y.Unit, y.Decimals
	if d := in.Ref.Display; d != nil {
		if d.Unit.Dim != y.Q.Dim {
			e.errs.Add(spanOf(f, d.Pos, d.End), "cannot show %s (%s) in %s", y.Name, y.Unit.Name, d.Text)
			return
		}
		u, dec = d.Unit, d.Decimals
	}
	sc.s.interps[in] = &Interp{Symbol: y, Unit: u, Text: y.In(u, dec)}
}

// unresolvedProse reports an interpolation of an unknown symbol; prose may
// quote symbols defined anywhere on the sheet, so "used above" does not
// apply.
func (sc scope) unresolvedProse(in *sheet.Interp) {
	name := in.Ref.Sym.Name
	for _, full := range sc.candidates(name) {
		if sc.e.failed[sc.s.Name()+"\x00"+full] {
			return
		}
	}
	sc.unresolved(name, spanOf(in.Span.File, in.Ref.Sym.Pos, in.Ref.Sym.End))
}
