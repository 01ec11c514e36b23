package compose

import (
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/source"
)

// Changes is what changed since an earlier revision of the package, as
// the caller found it (plinth render --since compares two evaluated
// packages); compose prints it, on a page of its own after the summary,
// and computes nothing.
type Changes struct {
	Since    string // the earlier revision as named on the page ("P1", "rev-A:calcs")
	Sections []ChangeSection
	Empty    string // printed when there are no sections ("No changes.")
	// Lines are the source lines whose printed values changed; they get
	// change bars (layout.Bars), labelled Letter (the current revision).
	Lines  []ChangeLine
	Letter string
}

// ChangeLine is a source line (Pos, its column unused) whose values
// changed, and those values as now printed, without their units ("19.75").
type ChangeLine struct {
	Pos    source.Position
	Values []string
}

// ChangeSection is one list of changes: checks whose verdict changed,
// checks added or removed, results, inputs, package fields.
type ChangeSection struct {
	Title  string
	Header []string
	Rows   [][]string
}

// changesSheet is the page "Changes since revision X".
func (c *composer) changesSheet() layout.Sheet {
	ch := c.opt.Changes
	title := "Changes since revision " + ch.Since
	out := c.matterSheet(title, "changes")
	p := out.Pos
	out.Blocks = append(out.Blocks, heading(p, 1, title),
		&layout.Para{Pos: p, Runs: []layout.Run{txt("What differs from revision "), user(ch.Since), txt(", as plinth diff prints it: checks whose verdict changed (OK → NOT OK first), checks added or removed, results whose displayed value changed, inputs changed (with their places in both revisions) and package fields changed. Values equal at display precision are not changes.")}})
	if len(ch.Sections) == 0 {
		out.Blocks = append(out.Blocks, &layout.Para{Pos: p, Runs: []layout.Run{txt(ch.Empty)}})
	}
	for _, s := range ch.Sections {
		out.Blocks = append(out.Blocks, heading(p, 2, s.Title))
		t := &layout.Table{Pos: p}
		for _, h := range s.Header {
			t.Header = append(t.Header, cell(txt(h)))
			t.Align = append(t.Align, layout.AlignLeft)
		}
		for _, r := range s.Rows {
			row := layout.Row{Pos: p}
			for _, v := range r {
				row.Cells = append(row.Cells, cell(user(v)))
			}
			t.Rows = append(t.Rows, row)
		}
		out.Blocks = append(out.Blocks, t)
	}
	return out
}

// bars are the change bars of the changed lines (layout.Bars): each
// line's path matched to the package file it names. A line in no file of
// the package (the file was removed) has nothing printed to bar.
func (c *composer) bars() *layout.Bars {
	ch := c.opt.Changes
	if ch == nil || len(ch.Lines) == 0 {
		return nil
	}
	files := map[string]*source.File{}
	for _, f := range c.res.Src.Files {
		files[f.Path] = f
	}
	b := &layout.Bars{Letter: ch.Letter}
	for _, l := range ch.Lines {
		if f := files[l.Pos.Path]; f != nil {
			b.Lines = append(b.Lines, layout.BarLine{Line: source.Line{File: f, Line: l.Pos.Line}, Values: l.Values})
		}
	}
	return b
}
