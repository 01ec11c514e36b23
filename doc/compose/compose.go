package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// Options control composition.
type Options struct {
	// Bare leaves out the cover sheet and the end matter (registers,
	// references, cautions): the sheets alone. Citations still print as
	// numbers, but the references list they point to is not printed, so
	// they are not linked.
	Bare bool
	// Changes, when set, prints a page "Changes since revision X" after
	// the summary (plinth render --since).
	Changes *Changes
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
	cautions  []raised                        // engine cautions, for the cautions summary
	matter    []matterTitle                   // the matter sheets after the calculation sheets, in order
	quote     int                             // depth of block quotes being converted (their text is italic)
	level     int                             // level of the sheet's latest heading (engine sub-headings go below it)
	refSeen   map[trace.Ref]bool              // citations printed in the current engine block
	appendix  []layout.Block                  // working left out of the main flow (detail = governing)
	selfShown map[*eval.Footing]*eval.Block   // the block that printed each footing's self-weight working
	uses      map[*eval.Footing][]*eval.Block // each footing's analyses (sketch.go)
	texts     *eqn.Texts                      // formula texts set by fits, reused
	printed   map[string]bool                 // engine steps printed on the current sheet (stepKey)
	shapes    map[string]string               // formulas printed in full on the current sheet (shapeKey) → the symbol
	written   map[string]writtenOut           // long settlement formulas written out in the package (shapeKey)
	firstAt   map[string]*firstLine           // the line that first printed each computed engine step (stepKey)
}

// writtenOut is a long formula written out in full: its symbol, its sheet
// and the anchor on its line.
type writtenOut struct {
	symbol, sheet, anchor string
}

// raised is an engine caution with the place it was printed.
type raised struct {
	sheet  *eval.Sheet
	block  *eval.Block
	sev    severity.Level
	code   string // the engine's code, for an engine caution
	atStep bool   // says what the step it was raised at says (trace.Caution.AtStep)
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
	c := &composer{res: res, opt: opt, inputs: map[*eval.Symbol]string{}, texts: eqn.NewTexts(),
		written: map[string]writtenOut{}, firstAt: map[string]*firstLine{}}
	c.refs.linked = !opt.Bare
	return c
}

func (c *composer) document() layout.Doc {
	c.tpl = c.template()
	c.width = c.tpl.BodyWidth()
	doc := layout.Doc{Info: c.info(), Template: c.tpl, Bars: c.bars()}
	var sheets []layout.Sheet
	for _, s := range c.res.Sheets {
		sheets = append(sheets, c.sheet(s))
	}
	if c.opt.Bare {
		doc.Sheets = sheets
		return doc
	}
	// Layout sheets: cover, summary, the changes, the sheets, the appendix
	// (when any working was moved there), the end matter. The cover's
	// contents give each one's pages (layout.PageRef on its anchor).
	c.matter = matterTitles
	doc.Sheets = append(doc.Sheets, c.cover(), c.summary())
	if c.opt.Changes != nil {
		doc.Sheets = append(doc.Sheets, c.changesSheet())
	}
	doc.Sheets = append(doc.Sheets, sheets...)
	doc.Sheets = append(doc.Sheets, c.endMatter()...) // the appendix opens it
	return doc
}

// appendixBlocks are the working left out of the main flow (detail =
// governing): per block, the other cases' tables and the sublayer
// tables, each headed by a link back to its block. They open the end
// matter's sheet.
func (c *composer) appendixBlocks() []layout.Block {
	p := c.matterPos()
	out := []layout.Block{&layout.Anchor{Pos: p, Name: "appendix"}, heading(p, 1, appendixTitle),
		&layout.Para{Pos: p, Runs: []layout.Run{txt("The working the sheets leave out of their main flow (detail = full in package.yaml prints it in place): the cases further than 10 % from the governing utilisation and the stresses by sublayer, block by block, each heading linked to its block.")}}}
	return append(out, c.appendix...)
}

// appendixTitle heads the appendix.
const appendixTitle = "Appendix: further working"

// sheet converts one evaluated sheet.
func (c *composer) sheet(s *eval.Sheet) layout.Sheet {
	out := layout.Sheet{
		Pos:    source.Span{File: s.Src.File},
		Fields: c.fields(s.Meta),
	}
	c.level = 0
	c.printed, c.shapes = map[string]bool{}, map[string]string{}
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

func plural(n int, word string) string {
	if n == 1 {
		return fmt.Sprintf("%d %s", n, word)
	}
	return fmt.Sprintf("%d %ss", n, word)
}
