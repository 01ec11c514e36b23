package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// ref is one entry of the references list.
type ref struct {
	n      int
	key    string // the sheet's key ("GIR") or the engine's ("EN1997-1")
	text   string
	engine bool // a publication an engine method comes from
	cited  bool // cited somewhere in the document (else listed at the end)
}

func (r *ref) anchor() string { return fmt.Sprintf("ref-%d", r.n) }

// refList numbers references in order of first citation.
type refList struct {
	list   []*ref
	by     map[string]*ref
	linked bool // the list is printed, so citations link to it
}

func (l *refList) get(id, key, text string, engine, cite bool) *ref {
	if l.by == nil {
		l.by = map[string]*ref{}
	}
	r := l.by[id]
	if r == nil {
		r = &ref{n: len(l.list) + 1, key: key, text: text, engine: engine}
		l.by[id] = r
		l.list = append(l.list, r)
	}
	r.cited = r.cited || cite
	return r
}

// sheetRef is the reference a sheet's [KEY] stands for (nil if the key
// is unknown there).
func (c *composer) sheetRef(s *eval.Sheet, key string, cite bool) *ref {
	r, ok := s.Meta.Reference(key)
	if !ok {
		return nil
	}
	return c.refs.get("pkg\x00"+key+"\x00"+r.Text.Value, key, r.Text.Value, false, cite)
}

// engineRef is the list entry of an engine source.
func (c *composer) engineRef(src trace.Source) *ref {
	return c.refs.get("eng\x00"+src.Key, src.Key, src.Citation, true, true)
}

// citeRun prints a citation of r: "[n]", linked to the list.
func (c *composer) citeRun(r *ref) layout.Run {
	return c.cite(r, "")[0]
}

// cite prints a citation of r, "[n]" or "[n, clause]", linked to the
// list; symbols in the clause (C_1, m_v) are typeset as in formulas.
func (c *composer) cite(r *ref, clause string) []layout.Run {
	out := []layout.Run{txt(fmt.Sprintf("[%d]", r.n))}
	if clause != "" {
		out = append([]layout.Run{txt(fmt.Sprintf("[%d, ", r.n))}, richText(clause, layout.Regular)...)
		out = append(out, txt("]"))
	}
	if c.refs.linked {
		for i := range out {
			out[i].Link = r.anchor()
		}
	}
	return out
}

// noteRuns prints a note, its [KEY] citations as numbered references.
func (c *composer) noteRuns(s *eval.Sheet, note sheet.Str) []layout.Run {
	return c.citedText(s, note, layout.Regular)
}

// citedText splits text at its citations.
func (c *composer) citedText(s *eval.Sheet, note sheet.Str, style layout.Style) []layout.Run {
	v := note.Value
	if strings.TrimSpace(v) == "" {
		return nil
	}
	var out []layout.Run
	at := 0
	for _, ci := range sheet.CitesIn(note) {
		i, j := ci.Span.Start-note.Span.Start, ci.Span.End-note.Span.Start
		if i < at || j > len(v) {
			continue
		}
		r := c.sheetRef(s, ci.Key.Value, true)
		if r == nil {
			continue
		}
		if i > at {
			out = append(out, layout.Run{Text: v[at:i], Style: style})
		}
		out = append(out, c.citeRun(r))
		at = j
	}
	if at < len(v) {
		out = append(out, layout.Run{Text: v[at:], Style: style})
	}
	return out
}

// stepRef prints an engine step's reference, "[n, clause]".
// stepRefOnce is stepRef for a step of an engine block: a citation
// already printed in the block (same source and clause) is not repeated.
func (c *composer) stepRefOnce(r trace.Ref) []layout.Run {
	if r.Source.Key == "" || c.refSeen[r] {
		return nil
	}
	if c.refSeen != nil {
		c.refSeen[r] = true
	}
	return c.stepRef(r)
}

func (c *composer) stepRef(r trace.Ref) []layout.Run {
	if r.Source.Key == "" {
		return nil
	}
	return c.cite(c.engineRef(r.Source), r.Clause)
}

// uncited adds the package's references never cited, in the order
// written (package.yaml first, then each sheet's own).
func (c *composer) uncited() {
	for _, s := range c.res.Sheets {
		for _, r := range s.Meta.References {
			c.sheetRef(s, r.Key.Value, false)
		}
	}
}
