package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// packageMeta is the package's settings: package.yaml, or the first
// sheet's when the package has none.
func (c *composer) packageMeta() sheet.Meta {
	m := c.res.Src.Meta
	if !m.Span.IsZero() || len(c.res.Sheets) == 0 {
		return m
	}
	return c.res.Sheets[0].Meta
}

// matterPos is where matter sheets report problems: the start of
// package.yaml, else of the first sheet.
func (c *composer) matterPos() source.Span {
	if f := c.res.Src.Meta.Span.File; f != nil {
		return source.Span{File: f}
	}
	if len(c.res.Sheets) > 0 {
		return source.Span{File: c.res.Sheets[0].Src.File}
	}
	return source.Span{}
}

// matterSheet starts a sheet of package matter.
func (c *composer) matterSheet(title, anchor string) layout.Sheet {
	f := c.fields(c.packageMeta())
	f.Title, f.Calc = title, c.packageCalc()
	p := c.matterPos()
	return layout.Sheet{Pos: p, Fields: f, Bookmark: title,
		Blocks: []layout.Block{&layout.Anchor{Pos: p, Name: anchor}}}
}

// txt and bold are plinth's own wording (layout.Run.Own); user and
// userBold carry the user's text (titles, names, fields), whose
// characters are checked against the fonts at the user's line.
func txt(s string) layout.Run      { return layout.Run{Text: s, Own: true} }
func bold(s string) layout.Run     { return layout.Run{Text: s, Style: layout.Bold, Own: true} }
func user(s string) layout.Run     { return layout.Run{Text: s} }
func userBold(s string) layout.Run { return layout.Run{Text: s, Style: layout.Bold} }
func users(rs []layout.Run) []layout.Run {
	for i := range rs {
		rs[i].Own = false
	}
	return rs
}

// pageOf prints the page an anchor lands on after prefix ("page 12"),
// linked to it; the layout fills it in (layout.PageRef).
func pageOf(anchor, prefix string) layout.Run {
	return layout.Run{Page: layout.PageRef{Anchor: anchor, Prefix: prefix}, Link: anchor, Own: true}
}

// sheetPages prints the pages of the sheet an anchor opens ("3–5"), for
// the contents.
func sheetPages(anchor string) layout.Run {
	return layout.Run{Page: layout.PageRef{Anchor: anchor, Sheet: true}, Own: true}
}

func cell(runs ...layout.Run) layout.Cell {
	return layout.Cell(runs)
}

func heading(p source.Span, level int, text string) *layout.Heading {
	return &layout.Heading{Pos: p, Level: level, NoNumber: true, Runs: []layout.Run{txt(text)}}
}

// packageCalc is the calc number the package's own sheets (cover,
// registers) carry: what the sheets' numbers share ("2318-G" from
// 2318-G-01 … 2318-G-06), else the job number.
func (c *composer) packageCalc() string {
	var prefix string
	for i, s := range c.res.Sheets {
		n := s.Meta.Calc.Value
		if i == 0 {
			prefix = n
			continue
		}
		k := 0
		for k < len(prefix) && k < len(n) && prefix[k] == n[k] {
			k++
		}
		prefix = prefix[:k]
	}
	if i := strings.LastIndexAny(prefix, "-_./ "); i >= 0 {
		prefix = prefix[:i] // back to the last separator: "2318-G-0" → "2318-G"
	}
	prefix = strings.TrimRight(prefix, "-_./ ")
	if len(c.res.Sheets) < 2 || prefix == "" {
		return c.packageMeta().Job.Value
	}
	return prefix
}

// cover is the cover sheet: project data, contents, a summary of the
// checks, the revision history and the checker's sign-off.
func (c *composer) cover() layout.Sheet {
	m := c.packageMeta()
	out := c.matterSheet("Cover sheet", "cover")
	p := out.Pos
	add := func(b ...layout.Block) { out.Blocks = append(out.Blocks, b...) }

	title := "Calculation package"
	if m.Project.Value != "" {
		title = m.Project.Value
	}
	add(&layout.Heading{Pos: p, Level: 1, NoNumber: true, Runs: []layout.Run{user(title)}})
	data := &layout.Table{Pos: p, Header: []layout.Cell{cell(txt("Package")), nil}}
	row := func(k string, v ...layout.Run) {
		if len(v) == 0 || len(v) == 1 && v[0].Text == "" && v[0].Math == nil {
			return
		}
		k = strings.ReplaceAll(k, " ", "\u00a0") // keys do not wrap
		data.Rows = append(data.Rows, layout.Row{Pos: p, Cells: []layout.Cell{cell(txt(k)), cell(v...)}})
	}
	row("Project", userBold(m.Project.Value))
	row("Job no.", user(m.Job.Value))
	row("Client", user(m.Client.Value))
	row("Sheets", txt(fmt.Sprintf("%s; numbered across the whole package, this cover included", plural(len(c.res.Sheets), "calculation sheet"))))
	if len(c.res.Context) > 0 {
		var names []string
		for _, t := range c.res.Context {
			names = append(names, t.Name())
		}
		row("Context", txt(strings.Join(names, ", ")+": used by this sheet, evaluated as they stand in its folder but not printed here (their inputs enter the fingerprint); the package's own issue prints them"))
	}
	row("Designed by", user(m.By.Value))
	if strings.TrimSpace(m.Checked.Value) == "" {
		row("Checked by", bold("NOT CHECKED"))
	} else {
		row("Checked by", user(strings.TrimSpace(m.Checked.Value+"  "+m.CheckedDate.Value)))
	}
	if r, ok := latest(m.Revisions); ok {
		row("Current revision", user(strings.TrimSpace(r.Rev.Value+"  "+r.Date.Value+"  "+r.Note.Value)))
	}
	row("Page template", user(c.tpl.Name))
	row("Design basis", txt("standard, national annex, partial factors, Geotechnical Category, design life, consequence class and exclusions: see the "),
		layout.Run{Text: "summary of results", Link: "summary", Own: true})
	row("Input fingerprint", layout.Run{Text: c.res.Fingerprint(), Style: layout.Mono})
	if c.res.Variant() {
		var list []string
		for _, o := range c.res.Overrides {
			list = append(list, "--set "+o.Arg)
		}
		row("Variant", bold("VARIANT"), txt(": inputs overridden on the command line ("+strings.Join(list, ", ")+"). A study, not the design record; every page says so."))
	}
	add(data)

	add(heading(p, 2, "Contents"))
	contents := &layout.Table{Pos: p, Header: []layout.Cell{cell(txt("Pages")), cell(txt("Calc no.")), cell(txt("Title")), cell(txt("Rev")), cell(txt("Checks"))},
		Align: []layout.Align{layout.AlignLeft, layout.AlignLeft, layout.AlignLeft, layout.AlignLeft, layout.AlignLeft}}
	contents.Rows = append(contents.Rows, layout.Row{Pos: p, Cells: []layout.Cell{
		cell(sheetPages("summary")), nil, cell(layout.Run{Text: "Summary of results and design basis", Link: "summary", Own: true}), nil, nil,
	}})
	if ch := c.opt.Changes; ch != nil {
		contents.Rows = append(contents.Rows, layout.Row{Pos: p, Cells: []layout.Cell{
			cell(sheetPages("changes")), nil, cell(layout.Run{Text: "Changes since revision ", Link: "changes", Own: true}, layout.Run{Text: ch.Since, Link: "changes"}), nil, nil,
		}})
	}
	for _, s := range c.res.Sheets {
		f := c.fields(s.Meta)
		title := f.Title
		if title == "" {
			title = s.Name()
		}
		contents.Rows = append(contents.Rows, layout.Row{Pos: s.Src.Meta.Title.Span, Cells: []layout.Cell{
			cell(sheetPages(sheetAnchor(s.Index))), cell(txt(f.Calc)), cell(layout.Run{Text: title, Link: sheetAnchor(s.Index)}), cell(txt(f.Rev)), cell(checkSummary(s.Checks)...),
		}})
	}
	for _, mt := range c.matter {
		title := cell(layout.Run{Text: mt.title, Link: mt.anchor})
		if mt.anchor == "registers" {
			title = nil
			secs := matterSections
			if len(c.appendix) > 0 {
				secs = append([]matterTitle{{appendixTitle, "appendix"}}, secs...)
			}
			for i, sec := range secs {
				if i > 0 {
					title = append(title, txt(" · "))
				}
				title = append(title, layout.Run{Text: sec.title, Link: sec.anchor, Own: true})
			}
		}
		contents.Rows = append(contents.Rows, layout.Row{Pos: p, Cells: []layout.Cell{
			cell(sheetPages(mt.anchor)), nil, title, nil, nil,
		}})
	}
	add(contents)

	add(heading(p, 2, "Revision history"))
	if len(m.Revisions) == 0 {
		add(&layout.Para{Pos: p, Runs: []layout.Run{txt("No revisions are recorded in package.yaml.")}})
	} else {
		rh := &layout.Table{Pos: p, Header: []layout.Cell{cell(txt("Rev")), cell(txt("Date")), cell(txt("By")), cell(txt("Checked")), cell(txt("Description"))}}
		for _, r := range m.Revisions {
			rh.Rows = append(rh.Rows, layout.Row{Pos: r.Span, Cells: []layout.Cell{
				cell(user(r.Rev.Value)), cell(user(r.Date.Value)), cell(user(r.By.Value)), cell(user(r.Checked.Value)), cell(user(r.Note.Value)),
			}})
		}
		add(rh)
	}

	add(heading(p, 2, "Checker's sign-off"))
	rev := ""
	if r, ok := latest(m.Revisions); ok {
		rev = " revision " + r.Rev.Value + ","
	}
	fp := c.res.Fingerprint()
	add(&layout.Para{Pos: p, Runs: []layout.Run{txt("I have checked this calculation package," + rev + " printed from inputs "),
		{Text: fp[:12], Style: layout.Mono},
		txt(", and I agree with its design basis, inputs, calculations and conclusions except where noted below or marked on the sheets.")}})
	add(c.signOff(p))
	return out
}

// signOff is the checker's box: name, signature, date and comments.
func (c *composer) signOff(p source.Span) *layout.Drawing {
	w, h := c.width, 54.0
	d := &layout.Drawing{Pos: p, W: w, H: h}
	line := draw.Stroke(draw.Gray(120), 0.6)
	x := 0.0
	for _, col := range []struct {
		label string
		frac  float64
	}{{"Checker (name and initials)", 0.24}, {"Signature", 0.22}, {"Date", 0.14}, {"Comments and exceptions", 0.40}} {
		cw := w * col.frac
		d.Items = append(d.Items,
			draw.Rect{X: x, Y: 0, W: cw, H: h, Paint: line},
			draw.Text{X: x + 4, Y: 9, Face: fonts.Regular, Size: 6.5, Color: draw.Gray(90), Text: col.label})
		x += cw
	}
	return d
}

// matterTitle names a matter sheet and its anchor.
type matterTitle struct{ title, anchor string }

// matterTitles are the end-matter sheets in order: one sheet, its
// sections listed in its contents row.
var matterTitles = []matterTitle{{registersTitle, "registers"}}

// matterSections are the sections of the end-matter sheet.
var matterSections = []matterTitle{
	{"Check register", "check-register"},
	{"Input register", "input-register"},
	{"References", "references"},
	{"Cautions", "cautions"},
}

// checkSummary is a sheet's checks in a few words: "2 OK", "1 NOT OK of 3".
func checkSummary(checks []*eval.Check) []layout.Run {
	if len(checks) == 0 {
		return []layout.Run{txt("—")}
	}
	bad := 0
	for _, ch := range checks {
		if !ch.OK {
			bad++
		}
	}
	if bad == 0 {
		return []layout.Run{txt(fmt.Sprintf("%d OK", len(checks)))}
	}
	return []layout.Run{bold(fmt.Sprintf("%d NOT OK", bad)), txt(fmt.Sprintf(" of %d", len(checks)))}
}

// checkTotals sums up the check register in a sentence, pointing to the
// register when toRegister is set.
func (c *composer) checkTotals(toRegister bool) []layout.Run {
	n, bad := len(c.res.Checks), 0
	var worst *eval.Check
	for _, ch := range c.res.Checks {
		if !ch.OK {
			bad++
		}
		if ch.HasUtil() && (worst == nil || ch.Util > worst.Util) {
			worst = ch
		}
	}
	if n == 0 {
		return []layout.Run{txt("The package states no checks.")}
	}
	var out []layout.Run
	if bad == 0 {
		out = append(out, txt(plural(n, "check")+": "), bold("all OK"), txt("."))
	} else {
		out = append(out, txt(plural(n, "check")+": "), bold(fmt.Sprintf("%d NOT OK", bad)), txt(fmt.Sprintf(", %d OK.", n-bad)))
	}
	if worst != nil {
		out = append(out, txt(" Highest utilisation "+worst.UtilText()+": "))
		out = append(out, c.checkMath(worst)...)
		out = append(out, txt(" ("+sheetLabel(worst.Sheet)+")."))
	}
	if bad > 0 {
		out = append(out, txt(" NOT OK: "))
		k := 0
		for _, ch := range c.res.Checks {
			if ch.OK {
				continue
			}
			if k > 0 {
				out = append(out, txt("; "))
			}
			if k == 8 {
				out = append(out, txt(fmt.Sprintf("and %d more", bad-k)))
				break
			}
			out = append(out, c.checkMath(ch)...)
			out = append(out, txt(" ("+sheetLabel(ch.Sheet)+")"))
			k++
		}
		out = append(out, txt("."))
	}
	if toRegister {
		out = append(out, txt(" Every check is listed in the "), layout.Run{Text: "check register", Link: "check-register"}, txt("."))
	}
	return out
}

// checkLabel is a check's condition as written.
func checkLabel(ch *eval.Check) string {
	return strings.Join(strings.Fields(ch.Text), " ")
}

// sheetLabel names a sheet by its calc number, else its file name.
func sheetLabel(s *eval.Sheet) string {
	if s == nil {
		return ""
	}
	if v := s.Meta.Calc.Value; v != "" {
		return v
	}
	return s.Name()
}
