package parse

import (
	"regexp"
	"strings"

	"github.com/yuin/goldmark/ast"

	spec "github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// word is a word of a fence's info string, at body offsets [start, end).
type word struct {
	text       string
	start, end int
}

// fields splits src[start:end] at spaces and tabs.
func fields(src []byte, start, end int) []word {
	var out []word
	i := start
	for i < end {
		for i < end && (src[i] == ' ' || src[i] == '\t') {
			i++
		}
		j := i
		for j < end && src[j] != ' ' && src[j] != '\t' {
			j++
		}
		if j > i {
			out = append(out, word{string(src[i:j]), i, j})
		}
		i = j
	}
	return out
}

// fenced converts a fenced code block: a plinth block, or code.
func (c *conv) fenced(n *ast.FencedCodeBlock) sheet.Block {
	start := max(n.Pos(), 0)
	fl := 0
	for start+fl < len(c.src) && c.src[start+fl] == c.src[start] {
		fl++
	}
	end := c.lineEnd(start)
	if l := n.Lines(); l.Len() > 0 {
		end = c.trimNL(l.At(l.Len() - 1).Stop)
	}
	v, closed := n.AttributeString(string(closeAttr))
	if closed {
		end = max(end, c.trimNL(v.(int)))
	}
	sp := c.span(start, end)
	var ws []word
	if n.Info != nil {
		ws = fields(c.src, n.Info.Segment.Start, n.Info.Segment.Stop)
	}
	if !closed {
		fence := string(c.src[start : start+fl])
		c.diags.AddHint(c.span(start, start+fl), "close it with a line holding only "+fence,
			"unclosed code fence: no closing %s line, so the block runs to the end of the %s", fence, c.container())
	}
	lang := ""
	if len(ws) > 0 {
		lang = ws[0].text
	}
	kind, plinth := sheet.LookupKind(lang)
	if !plinth {
		if near := nearKind(lang); near != "" {
			c.diags.AddHint(c.span(ws[0].start, ws[0].end), "did you mean "+quote(near)+"?",
				"unknown block %q", lang)
		} else if lang == "" && looksPlinth(c.linesText(n)) {
			c.diags.AddHint(c.span(start, start+fl), "name it ```calc to evaluate it, or give it a language (```text) to keep it as code",
				"this unnamed code block holds plinth statements, which would be printed as code and not evaluated")
		}
		return &sheet.CodeBlock{Span: sp, Lang: lang, Text: c.linesText(n)}
	}
	if c.depth > 0 {
		c.diags.Add(c.span(ws[0].start, ws[0].end), "a %s block must stand at the top level of the sheet, not inside a list or quote", lang)
		return nil
	}
	if !closed {
		return nil // its lines would be the rest of the file
	}
	h := c.header(kind, ws)
	lines := n.Lines()
	b := &blockLines{c: c, kind: kind, opts: map[string]int{}}
	for i := 0; i < lines.Len(); i++ {
		seg := lines.At(i)
		raw := c.src[seg.Start:max(seg.Start, c.trimNL(seg.Stop))]
		b.line(string(raw), c.base+seg.Start)
	}
	b.endTable()
	switch kind {
	case sheet.KindCalc:
		return &sheet.Calc{Span: sp, Lines: b.lines}
	case sheet.KindGround:
		return &sheet.Ground{Span: sp, Name: h.name, Lines: b.lines, Table: b.table}
	case sheet.KindFooting:
		return &sheet.Footing{Span: sp, Name: h.name, Lines: b.lines, Table: b.table}
	}
	return &sheet.Analysis{Span: sp, Kind: kind, KindSpan: c.span(ws[0].start, ws[0].end),
		Footing: h.footing, Ground: h.ground, Prefix: h.prefix, To: h.to, Lines: b.lines, Table: b.table}
}

// container names what an unclosed fence runs to the end of.
func (c *conv) container() string {
	if c.depth > 0 {
		return "list item or quote"
	}
	return "file"
}

// nearKind returns the block word nearest to w (internal/suggest), or "".
func nearKind(w string) string {
	k, _ := suggest.Nearest(w, sheet.Kinds)
	return k
}

// looksPlinth reports whether the text of an unnamed code block reads as
// plinth statements: every line that is not blank or a # comment parses
// as a statement, and there is at least one.
func looksPlinth(text string) bool {
	n := 0
	for _, line := range strings.Split(text, "\n") {
		t := strings.TrimSpace(line)
		if t == "" || strings.HasPrefix(t, "#") {
			continue
		}
		if st, errs := expr.ParseLine(t, 0); st == nil || len(errs) > 0 {
			return false
		}
		n++
	}
	return n > 0
}

func quote(s string) string { return `"` + s + `"` }

var nameRE = regexp.MustCompile(`^[A-Za-z][A-Za-z0-9_]*$`)

// header holds the names from a plinth block's info string.
type header struct {
	name, footing, ground, prefix, to sheet.Str
}

// header reads the info string after the block word:
//
//	calc
//	ground NAME | footing NAME
//	bearing|settlement|capacity FOOTING on GROUND [as PREFIX]
//	differential FOOTING to FOOTING [as PREFIX]
func (c *conv) header(kind sheet.Kind, ws []word) header {
	var h header
	i := 1
	after := func() source.Span { e := ws[i-1].end; return c.span(e, e) }
	take := func(what, after0 string) (sheet.Str, bool) {
		if i >= len(ws) {
			c.diags.Add(after(), "expected %s after %q", what, after0)
			return sheet.Str{}, false
		}
		w := ws[i]
		i++
		sp := c.span(w.start, w.end)
		if !nameRE.MatchString(w.text) {
			c.diags.Add(sp, "expected %s, found %q: a name starts with a letter and holds letters, digits and _", what, w.text)
			return sheet.Str{Span: sp}, false
		}
		return sheet.Str{Value: w.text, Span: sp}, true
	}
	keyword := func(kw, want string) bool {
		if i >= len(ws) {
			c.diags.Add(after(), "expected %q after %q (%s)", kw, ws[i-1].text, want)
			return false
		}
		if ws[i].text != kw {
			c.diags.AddHint(c.span(ws[i].start, ws[i].end), want, "expected %q, found %q", kw, ws[i].text)
			return false
		}
		i++
		return true
	}
	switch kind.Spec().Header {
	case spec.Bare:
	case spec.Named:
		what := "a " + kind.String() + " name"
		if kind == sheet.KindGround {
			what = "a ground model name"
		}
		h.name, _ = take(what, kind.String())
	default:
		form := "write " + kind.String() + " FOOTING on GROUND [as PREFIX]"
		kw, second, dst := "on", "a ground model name", &h.ground
		if kind.Spec().Header == spec.To {
			form = "write " + kind.String() + " FOOTING to FOOTING [as PREFIX]"
			kw, second, dst = "to", "a footing name", &h.to
		}
		var ok bool
		first := "a footing name"
		if kind.Spec().Header == spec.NamedOn {
			form = "write " + kind.String() + " NAME on GROUND [as PREFIX]"
			first = "a " + kind.String() + " name"
		}
		if h.footing, ok = take(first, kind.String()); !ok {
			return h
		}
		if !keyword(kw, form) {
			return h
		}
		if *dst, ok = take(second, kw); !ok {
			return h
		}
		if i < len(ws) {
			if ws[i].text != "as" {
				c.diags.AddHint(c.span(ws[i].start, ws[i].end), form, "expected \"as\" or the end of the line, found %q", ws[i].text)
				return h
			}
			i++
			if h.prefix, ok = take("a result name", "as"); !ok {
				return h
			}
		}
	}
	if i < len(ws) {
		c.diags.Add(c.span(ws[i].start, ws[i].end), "unexpected %q after %q: the line ends there", ws[i].text, ws[i-1].text)
	}
	return h
}

// trimSpan returns the offsets of s without surrounding spaces, s starting
// at file offset off.
func trimSpan(s string, off int) (string, int, int) {
	t := strings.TrimLeft(s, " \t")
	lead := len(s) - len(t)
	t = strings.TrimRight(t, " \t\r")
	return t, off + lead, off + lead + len(t)
}
