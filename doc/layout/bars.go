package layout

import (
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// Bars are change bars (plinth render --since): a bar in the left margin
// beside the boxes printed from each of Lines, Letter (the current
// revision) beside it in small type.
type Bars struct {
	Letter string
	Lines  []BarLine
}

// BarLine is a source line whose printed values changed, with those
// values as now printed, without their units ("19.75").
type BarLine struct {
	Line   source.Line
	Values []string
}

// markChanges draws the change bars on the laid-out pages. A line printed
// as one or two boxes (a statement, a table row, a check) is marked
// whole; a line printed as many (an engine block and its working) is
// marked at its first box and at each box that prints one of the line's
// changed values. A box inside a marked box is not marked again; title
// blocks, footers and anchors never are.
func markChanges(pages *Pages, bars *Bars) {
	if bars == nil || len(bars.Lines) == 0 {
		return
	}
	values := map[source.Line][]string{}
	for _, l := range bars.Lines {
		values[l.Line] = append(values[l.Line], l.Values...)
	}
	skip := func(b *Box) bool {
		return b.Kind == "title-block" || b.Kind == "footer" || b.Kind == "anchor" || b.H <= 0
	}
	var walk func(b *Box, fn func(*Box) bool)
	walk = func(b *Box, fn func(*Box) bool) {
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
	count := map[source.Line]int{}
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			walk(b, func(b *Box) bool {
				k := source.LineOf(b.Pos)
				if _, ok := values[k]; ok {
					count[k]++
					return true
				}
				return false
			})
		}
	}
	prints := func(b *Box, vs []string) bool {
		found := false
		b.Walk(func(x *Box) {
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
	seen := map[source.Line]bool{}
	for _, pg := range pages.Pages {
		for _, b := range pg.Boxes {
			walk(b, func(b *Box) bool {
				k := source.LineOf(b.Pos)
				vs, ok := values[k]
				if !ok {
					return false
				}
				if count[k] <= 2 || !seen[k] || prints(b, vs) {
					b.Items = append(b.Items, draw.Line{X1: -7, Y1: 0, X2: -7, Y2: b.H, Paint: draw.Stroke(draw.Gray(0), 1.2)})
					if bars.Letter != "" {
						b.Items = append(b.Items, draw.Text{X: -10, Y: min(b.H, 9) - 2, Face: fonts.Regular, Size: 6, Align: draw.Right, Text: bars.Letter})
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
