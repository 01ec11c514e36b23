package compose

import (
	"fmt"
	"strings"

	"plinth/doc/eval"
	"plinth/doc/layout"
	"plinth/doc/sheet"
	"plinth/doc/source"
)

// Options control composition.
type Options struct {
	// Bare leaves out the cover sheet and the end matter (registers,
	// references, cautions): the sheets alone. Citations still print as
	// numbers, but the references list they point to is not printed, so
	// they are not linked.
	Bare bool
	// Progress is passed to the layout (layout.Doc.Progress): sheets laid
	// out, once per layout pass.
	Progress func(done, total int)
}

// composer carries the state of one Document call.
type composer struct {
	res   *eval.Result
	opt   Options
	diags source.List
	tpl   *layout.Template
	width float64 // text column

	refs      refList
	inputs    map[*eval.Symbol]string // anchor of the line or table that prints an input
	nAnchor   int
	cautions  []raised // engine cautions, for the cautions summary
	contents  *layout.Table
	sheetRows []int // index in contents rows of each layout sheet after the cover
	quote     int   // depth of block quotes being converted (their text is italic)
	level     int   // level of the sheet's latest heading (engine sub-headings go below it)
}

// raised is an engine caution with the place it was printed.
type raised struct {
	sheet  *eval.Sheet
	block  *eval.Block
	sev    layout.Severity
	text   string
	where  string // case or step
	anchor string
}

// Document converts an evaluated package into the layout input: the cover
// sheet, every sheet, and the end matter. Problems (a page template or an
// image that cannot be read) are returned as diagnostics at the span that
// names the file; the Doc is still filled as far as it could be.
func Document(res *eval.Result, opt Options) (doc layout.Doc, diags source.List) {
	c := newComposer(res, opt)
	defer c.recover(&diags)
	doc = c.document()
	c.diags.Sort()
	return doc, c.diags
}

// recover turns a defect of this package into a diagnostic rather than
// a panic crossing the package boundary.
func (c *composer) recover(diags *source.List) {
	if r := recover(); r != nil {
		*diags = append(c.diags, source.Diagnostic{Path: c.res.Src.Dir, Msg: fmt.Sprintf("compose: internal error: %v", r)})
	}
}

func newComposer(res *eval.Result, opt Options) *composer {
	c := &composer{res: res, opt: opt, inputs: map[*eval.Symbol]string{}}
	c.refs.linked = !opt.Bare
	return c
}

func (c *composer) document() layout.Doc {
	c.tpl = c.template()
	c.width = c.tpl.BodyWidth()
	doc := layout.Doc{Info: c.info(), Template: c.tpl}
	var sheets []layout.Sheet
	for _, s := range c.res.Sheets {
		sheets = append(sheets, c.sheet(s))
	}
	if c.opt.Bare {
		doc.Sheets = sheets
		return doc
	}
	doc.Sheets = append(doc.Sheets, c.cover())
	doc.Sheets = append(doc.Sheets, sheets...)
	doc.Sheets = append(doc.Sheets, c.endMatter()...)
	return doc
}

// sheet converts one evaluated sheet.
func (c *composer) sheet(s *eval.Sheet) layout.Sheet {
	out := layout.Sheet{
		Pos:    source.Position{Path: s.Src.File.Path, Line: 1, Col: 1},
		Fields: c.fields(s.Meta),
	}
	c.level = 0
	out.Blocks = append(out.Blocks, &layout.Anchor{Pos: out.Pos, Name: sheetAnchor(s.Index)})
	out.Blocks = append(out.Blocks, c.blocks(s, s.Src.Body)...)
	return out
}

func sheetAnchor(i int) string { return fmt.Sprintf("sheet-%d", i+1) }

// anchor returns a new unique anchor name with the given prefix.
func (c *composer) anchor(prefix string) string {
	c.nAnchor++
	return fmt.Sprintf("%s-%d", prefix, c.nAnchor)
}

// info is the PDF document information.
func (c *composer) info() layout.Info {
	m := c.res.Src.Meta
	if len(c.res.Sheets) > 0 && !m.Project.IsSet() {
		m = c.res.Sheets[0].Meta
	}
	title := "Calculation package"
	if p := m.Project.Value; p != "" {
		title = p + " — calculation package"
	}
	var subj []string
	if j := m.Job.Value; j != "" {
		subj = append(subj, "Job "+j)
	}
	if cl := m.Client.Value; cl != "" {
		subj = append(subj, "client "+cl)
	}
	subj = append(subj, plural(len(c.res.Sheets), "calculation sheet"))
	info := layout.Info{
		Title:       title,
		Author:      m.By.Value,
		Subject:     strings.Join(subj, ", "),
		Keywords:    strings.TrimSpace("plinth " + m.Job.Value),
		Fingerprint: c.res.Fingerprint(),
	}
	for _, o := range c.res.Overrides {
		info.Variant = append(info.Variant, overrideText(o))
	}
	return info
}

// overrideText prints an override as "c_u = 55 kPa" (with its sheet when
// the --set named one).
func overrideText(o *eval.Override) string {
	s := o.Name + " = " + eval.Format(o.Q, o.Unit, -1)
	if o.Sheet != "" {
		s = o.Sheet + ": " + s
	}
	return s
}

// fields fills a title block from a sheet's settings.
func (c *composer) fields(m sheet.Meta) layout.Fields {
	f := layout.Fields{
		Project: m.Project.Value, Job: m.Job.Value, Client: m.Client.Value,
		Title: m.Title.Value, Calc: m.Calc.Value,
		Rev: m.Revision.Value, By: m.By.Value, Date: m.Date.Value,
		Checked: m.Checked.Value, CheckedDate: m.CheckedDate.Value,
	}
	if r, ok := latest(m.Revisions); ok {
		if f.Rev == "" {
			f.Rev = r.Rev.Value
		}
		if f.Date == "" {
			f.Date = r.Date.Value
		}
	}
	return f
}

// pos is the position of a span (zero for an empty span).
func pos(sp source.Span) source.Position {
	if sp.File == nil {
		return source.Position{}
	}
	return sp.Pos()
}

func plural(n int, word string) string {
	if n == 1 {
		return fmt.Sprintf("%d %s", n, word)
	}
	return fmt.Sprintf("%d %ss", n, word)
}
