package parse

import (
	"bytes"
	"regexp"
	"strconv"
	"strings"
	"unicode/utf8"

	"go.yaml.in/yaml/v3"

	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// config parses a package.yaml file into the package settings.
func config(f *source.File) (sheet.Meta, source.List) {
	var diags source.List
	if !utf8.Valid(f.Text) {
		checkText(f, &diags)
		return sheet.Meta{}, diags
	}
	start := 0
	if bytes.HasPrefix(f.Text, bom) {
		start = len(bom)
	}
	m := decodeMeta(f, start, len(f.Text), true, &diags)
	m.Span = source.Span{File: f, Start: start, End: len(f.Text)}
	diags.Sort()
	return m, diags
}

// yamlDoc decodes YAML text [start, end) of a file, mapping the YAML
// parser's lines and (rune) columns back to file offsets.
type yamlDoc struct {
	f          *source.File
	start, end int
	line0      int // file line of the YAML text's first line
	diags      *source.List
	pkg        bool // package.yaml rather than front matter
}

func (d *yamlDoc) where() string {
	if d.pkg {
		return "package.yaml"
	}
	return "front matter"
}

// offset converts a YAML line and column (1-based, runes) to a file offset.
func (d *yamlDoc) offset(line, col int) int {
	off := d.f.LineStart(d.line0 + line - 1)
	for ; col > 1 && off < d.end; col-- {
		_, n := utf8.DecodeRune(d.f.Text[off:])
		if d.f.Text[off] == '\n' {
			break
		}
		off += n
	}
	return min(max(off, d.start), d.end)
}

// span returns the span of a node's text: scalars as written (quotes
// included), collections from their first character to the end of that line.
func (d *yamlDoc) span(n *yaml.Node) source.Span {
	start := d.offset(n.Line, n.Column)
	text := d.f.Text[:d.end]
	end := start
	switch {
	case n.Kind == yaml.ScalarNode && n.Style&(yaml.DoubleQuotedStyle|yaml.SingleQuotedStyle) != 0:
		q := text[start]
		for i := start + 1; i < len(text); i++ {
			if q == '"' && text[i] == '\\' {
				i++
				continue
			}
			if text[i] == q {
				if q == '\'' && i+1 < len(text) && text[i+1] == '\'' {
					i++
					continue
				}
				end = i + 1
				break
			}
		}
	case n.Kind == yaml.ScalarNode && n.Style == 0 && n.Value != "" && bytes.HasPrefix(text[start:], []byte(n.Value)):
		end = start + len(n.Value)
	case n.Kind == yaml.ScalarNode && n.Tag == "!!null" && n.Value == "":
		end = start
	}
	if end == start && !(n.Tag == "!!null" && n.Value == "") {
		line, _ := lineAt(text, start)
		s := string(line)
		if i := strings.Index(s, " #"); i >= 0 {
			s = s[:i]
		}
		end = start + len(strings.TrimRight(s, " \t\r"))
	}
	return source.Span{File: d.f, Start: start, End: max(end, start)}
}

var yamlLine = regexp.MustCompile(`^yaml: line (\d+): (.*)$`)

// parserError reports whether a yaml v3 message comes from its parser
// (parserc.go) rather than its scanner: the parser's line is the 0-based
// line of the construct being read (a flow list's "[", a mapping's first
// key), the scanner's the 1-based line of the problem.
func parserError(msg string) bool {
	for _, p := range []string{"did not find expected", "found undefined tag handle",
		"found duplicate %YAML directive", "found incompatible YAML document", "found duplicate %TAG directive"} {
		if strings.HasPrefix(msg, p) {
			return true
		}
	}
	return false
}

// decodeMeta decodes YAML text [start, end) of f as sheet settings,
// reporting malformed YAML, repeated and unknown keys and ill-typed values.
func decodeMeta(f *source.File, start, end int, pkg bool, diags *source.List) sheet.Meta {
	d := &yamlDoc{f: f, start: start, end: end, line0: f.Position(start).Line, diags: diags, pkg: pkg}
	var m sheet.Meta
	var doc yaml.Node
	if err := yaml.Unmarshal(f.Text[start:end], &doc); err != nil {
		msg := strings.TrimPrefix(err.Error(), "yaml: ")
		off := start
		if g := yamlLine.FindStringSubmatch(err.Error()); g != nil {
			n, _ := strconv.Atoi(g[1])
			msg = g[2]
			if parserError(msg) {
				n++ // yaml v3 numbers lines from 0 for parser (not scanner) errors
			}
			off = d.offset(n, 1)
			line, _ := lineAt(f.Text[:end], off)
			off += len(line) - len(bytes.TrimLeft(line, " \t"))
		}
		hint := ""
		if strings.HasPrefix(msg, "mapping values are not allowed") {
			hint = `put the value in quotes when it holds ": " (title: "a: b")`
		}
		diags.AddHint(source.Span{File: f, Start: off, End: off}, hint, "malformed YAML in %s: %s", d.where(), msg)
		return m
	}
	if len(doc.Content) == 0 {
		return m // empty or only comments
	}
	root := doc.Content[0]
	if root.Kind != yaml.MappingNode {
		diags.Add(d.span(root), "%s must be a list of key: value lines", d.where())
		return m
	}
	seen := map[string]int{}
	for i := 0; i+1 < len(root.Content); i += 2 {
		k, v := root.Content[i], resolve(root.Content[i+1])
		ks := d.span(k)
		key := k.Value
		if line, dup := seen[key]; dup {
			diags.Add(ks, "duplicate key %q in %s: already set at line %d", key, d.where(), line)
			continue
		}
		seen[key] = ks.Pos().Line
		if !known(key) {
			keys := sheet.MetaKeys
			if pkg {
				keys = packageKeys()
			}
			hint := "known keys: " + strings.Join(keys, ", ")
			if s, ok := suggest.Nearest(key, keys); ok {
				hint = "did you mean " + strconv.Quote(s) + "?"
			}
			diags.AddHint(ks, hint, "unknown key %q in %s", key, d.where())
			continue
		}
		if pkg && contains(sheet.SheetOnly, key) {
			diags.Add(ks, "%q belongs in a sheet's front matter, not in package.yaml", key)
			continue
		}
		m.Keys = append(m.Keys, sheet.Str{Value: key, Span: ks})
		switch key {
		case "uses":
			m.Uses = d.list(key, v)
		case "revisions":
			m.Revisions = d.revisions(v)
		case "references":
			m.References = d.references(v)
		default:
			if f := m.Field(key); f != nil {
				*f = d.scalar(key, v)
			}
		}
	}
	return m
}

func known(key string) bool { return contains(sheet.MetaKeys, key) }

// packageKeys are the keys package.yaml takes.
func packageKeys() []string {
	var out []string
	for _, k := range sheet.MetaKeys {
		if !contains(sheet.SheetOnly, k) {
			out = append(out, k)
		}
	}
	return out
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

// resolve follows an alias to the node it names.
func resolve(n *yaml.Node) *yaml.Node {
	for n.Kind == yaml.AliasNode && n.Alias != nil {
		n = n.Alias
	}
	return n
}

// scalar reads a text value; null (a key with nothing after it) is blank.
func (d *yamlDoc) scalar(key string, n *yaml.Node) sheet.Str {
	sp := d.span(n)
	if n.Kind != yaml.ScalarNode {
		d.diags.Add(sp, "%q: expected text, found %s", key, kindName(n))
		return sheet.Str{Span: sp}
	}
	if n.Tag == "!!null" {
		return sheet.Str{Span: sp}
	}
	return sheet.Str{Value: n.Value, Span: sp}
}

func kindName(n *yaml.Node) string {
	switch n.Kind {
	case yaml.SequenceNode:
		return "a list"
	case yaml.MappingNode:
		return "a mapping of keys to values"
	}
	return "text"
}

// list reads a list of text values; a single value is a list of one.
func (d *yamlDoc) list(key string, n *yaml.Node) []sheet.Str {
	switch n.Kind {
	case yaml.ScalarNode:
		if n.Tag == "!!null" {
			return nil
		}
		return []sheet.Str{d.scalar(key, n)}
	case yaml.SequenceNode:
		var out []sheet.Str
		for _, c := range n.Content {
			if s := d.scalar(key, resolve(c)); s.Value != "" || resolve(c).Kind != yaml.ScalarNode {
				out = append(out, s)
			}
		}
		return out
	}
	d.diags.Add(d.span(n), "%q: expected a list of sheet file names, found %s", key, kindName(n))
	return nil
}

// revisions reads a list of {rev, date, by, checked, note} entries.
func (d *yamlDoc) revisions(n *yaml.Node) []sheet.Revision {
	if n.Kind == yaml.ScalarNode && n.Tag == "!!null" {
		return nil
	}
	if n.Kind != yaml.SequenceNode {
		d.diags.Add(d.span(n), "revisions: expected a list of entries like {rev: P1, date: 2026-10-12, note: First issue}, found %s", kindName(n))
		return nil
	}
	var out []sheet.Revision
	for _, c := range n.Content {
		c = resolve(c)
		if c.Kind != yaml.MappingNode {
			d.diags.Add(d.span(c), "revisions: expected an entry like {rev: P1, date: 2026-10-12, note: First issue}, found %s", kindName(c))
			continue
		}
		r := sheet.Revision{Span: d.span(c)}
		seen := map[string]int{}
		for i := 0; i+1 < len(c.Content); i += 2 {
			k, v := c.Content[i], resolve(c.Content[i+1])
			ks := d.span(k)
			if line, dup := seen[k.Value]; dup {
				d.diags.Add(ks, "duplicate key %q in a revision: already set at line %d", k.Value, line)
				continue
			}
			seen[k.Value] = ks.Pos().Line
			var dst *sheet.Str
			switch k.Value {
			case "rev":
				dst = &r.Rev
			case "date":
				dst = &r.Date
			case "by":
				dst = &r.By
			case "checked":
				dst = &r.Checked
			case "note":
				dst = &r.Note
			default:
				hint := "a revision has rev, date, by, checked and note"
				if s, ok := suggest.Nearest(k.Value, sheet.RevisionKeys); ok {
					hint = "did you mean " + strconv.Quote(s) + "?"
				}
				d.diags.AddHint(ks, hint, "unknown key %q in a revision", k.Value)
				continue
			}
			*dst = d.scalar(k.Value, v)
		}
		if !r.Rev.IsSet() || r.Rev.Value == "" {
			d.diags.Add(r.Span, "revision without rev: every entry needs a revision name (rev: P1)")
		}
		out = append(out, r)
	}
	return out
}

// citeKey is the form of a reference key: what [KEY] may cite.
var citeKey = regexp.MustCompile(`^[A-Za-z][A-Za-z0-9_.-]*$`)

// references reads the KEY: citation mapping in the order written.
func (d *yamlDoc) references(n *yaml.Node) []sheet.Reference {
	if n.Kind == yaml.ScalarNode && n.Tag == "!!null" {
		return nil
	}
	if n.Kind != yaml.MappingNode {
		d.diags.Add(d.span(n), "references: expected KEY: citation lines, found %s", kindName(n))
		return nil
	}
	var out []sheet.Reference
	seen := map[string]int{}
	for i := 0; i+1 < len(n.Content); i += 2 {
		k, v := n.Content[i], resolve(n.Content[i+1])
		ks := d.span(k)
		if line, dup := seen[k.Value]; dup {
			d.diags.Add(ks, "duplicate reference %q: already set at line %d", k.Value, line)
			continue
		}
		seen[k.Value] = ks.Pos().Line
		if !citeKey.MatchString(k.Value) {
			d.diags.Add(ks, "reference key %q: a key starts with a letter and holds letters, digits, _, . and -", k.Value)
			continue
		}
		txt := d.scalar(k.Value, v)
		if txt.Value == "" && v.Kind == yaml.ScalarNode {
			d.diags.Add(ks, "reference %q has no citation text", k.Value)
		}
		out = append(out, sheet.Reference{Key: sheet.Str{Value: k.Value, Span: ks}, Text: txt})
	}
	return out
}
