package compose

import (
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
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
	// change bars (see MarkChanges), labelled Letter (the current
	// revision).
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

// MarkChanges draws a change bar in the left margin beside the boxes of
// the sheets printed from one of ch.Lines, with ch.Letter beside the bar
// in small type. A line printed as one or two boxes (a statement, a table
// row, a check) is marked whole; a line printed as many (an engine block
// and its working) is marked at its first box and at each box that prints
// one of the line's changed values. A box inside a marked box is not
// marked again.
func MarkChanges(pages *layout.Pages, ch *Changes) {
	if pages == nil || ch == nil || len(ch.Lines) == 0 {
		return
	}
	type key struct {
		path string
		line int
	}
	values := map[key][]string{}
	for _, l := range ch.Lines {
		k := key{l.Pos.Path, l.Pos.Line}
		values[k] = append(values[k], l.Values...)
	}
	skip := func(b *layout.Box) bool {
		return b.Kind == "title-block" || b.Kind == "footer" || b.Kind == "anchor" || b.H <= 0
	}
	count := map[key]int{}
	var walk func(b *layout.Box, fn func(*layout.Box) bool)
	walk = func(b *layout.Box, fn func(*layout.Box) bool) {
		if skip(b) {
			return
		}
		if fn(b) {
			return
		}
		for _, k := range b.Kids {
			walk(k, fn)
		}
	}
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			walk(b, func(b *layout.Box) bool {
				p := b.Pos.Pos()
				k := key{p.Path, p.Line}
				if _, ok := values[k]; ok {
					count[k]++
					return true
				}
				return false
			})
		}
	}
	seen := map[key]bool{}
	prints := func(b *layout.Box, vs []string) bool {
		found := false
		b.Walk(func(x *layout.Box) {
			for _, it := range x.Items {
				if t, ok := it.(draw.Text); ok {
					for _, v := range vs {
						if v != "" && containsNumber(t.Text, v) {
							found = true
						}
					}
				}
			}
		})
		return found
	}
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			walk(b, func(b *layout.Box) bool {
				p := b.Pos.Pos()
				k := key{p.Path, p.Line}
				vs, ok := values[k]
				if !ok {
					return false
				}
				if count[k] <= 2 || !seen[k] || prints(b, vs) {
					b.Items = append(b.Items, draw.Line{X1: -7, Y1: 0, X2: -7, Y2: b.H, Paint: draw.Stroke(draw.Gray(0), 1.2)})
					if ch.Letter != "" {
						b.Items = append(b.Items, draw.Text{X: -10, Y: min(b.H, 9) - 2, Face: fonts.Regular, Size: 6, Align: draw.Right, Text: ch.Letter})
					}
				}
				seen[k] = true
				return true
			})
		}
	}
}

// containsNumber reports whether s holds the number v, not as part of a
// longer number ("19.75" in "= 19.75 mm", not in "119.75" or "19.755").
func containsNumber(s, v string) bool {
	digit := func(c byte) bool { return c >= '0' && c <= '9' || c == '.' }
	for i := 0; i+len(v) <= len(s); i++ {
		if s[i:i+len(v)] != v {
			continue
		}
		if (i == 0 || !digit(s[i-1])) && (i+len(v) == len(s) || !digit(s[i+len(v)])) {
			return true
		}
	}
	return false
}
