package layout

import (
	"strconv"

	"github.com/plinth-calc/plinth/doc/source"
)

// Page references. A run with a PageRef prints the page an anchor lands
// on, which only the layout knows: the first pass sets each reference as
// its prefix and a dash ("page —"); once every sheet is paginated the
// pages of the anchors are read off, and a sheet in which a reference now
// reads differently is laid out again with the new text (the others stand
// as they are: a sheet's layout depends on nothing outside it). Filling in
// a number can move a page break and so a later anchor, so this repeats
// until nothing changes, at most maxPasses layouts of a sheet in all.

// maxPasses bounds the layouts of a sheet: the first, and at most two
// more with its page references filled in.
const maxPasses = 3

// refUse is a page reference as a sheet set it: the text it printed and
// where it came from.
type refUse struct {
	text string
	pos  source.Span
}

// pageText is the text a page-reference run prints in this pass: the
// pages found by the previous pass, else the prefix and a dash.
func (e *engine) pageText(r PageRef, pos source.Span) string {
	e.refCalls++
	t, ok := e.fills[r]
	if !ok {
		t = r.Prefix + "—"
	}
	if e.used != nil {
		if _, seen := e.used[r]; !seen {
			e.used[r] = refUse{text: t, pos: pos}
		}
	}
	return t
}

// passes lays out every sheet, then lays out again the sheets whose page
// references read differently once the pages are known, until none does
// or maxPasses is reached. A reference to an anchor that is nowhere in
// the document is a problem at its block.
func (e *engine) passes(doc Doc) ([]laidSheet, error) {
	laid := make([]laidSheet, len(doc.Sheets))
	all := make([]int, len(doc.Sheets))
	for i := range all {
		all[i] = i
	}
	done, total := 0, len(all)
	if err := e.sheets(doc, all, nil, laid, &done, total); err != nil {
		return nil, err
	}
	for pass := 1; pass < maxPasses; pass++ {
		if failed(laid) {
			return laid, nil // the problems stand; filling in pages would not mend them
		}
		fills := pageTexts(laid, anchorPlaces(laid))
		var redo []int
		for si, ls := range laid {
			for r, u := range ls.refs {
				if t, ok := fills[r]; ok && t != u.text {
					redo = append(redo, si)
					break
				}
			}
		}
		if len(redo) == 0 {
			break
		}
		total += len(redo)
		if err := e.sheets(doc, redo, fills, laid, &done, total); err != nil {
			return nil, err
		}
	}
	at := anchorPlaces(laid)
	for si := range laid {
		for r, u := range laid[si].refs {
			if _, ok := at[r.Anchor]; !ok {
				laid[si].diags.Add(u.pos, "page reference to %q, which is not an anchor in this document", r.Anchor)
			}
		}
	}
	return laid, nil
}

func failed(laid []laidSheet) bool {
	for _, ls := range laid {
		if ls.diags.HasErrors() {
			return true
		}
	}
	return false
}

// place is where an anchor landed: its page and the first and last page
// of its sheet, counted from 1 across the document.
type place struct{ page, first, last int }

// anchorPlaces finds the page of every anchor (its first definition).
func anchorPlaces(laid []laidSheet) map[string]place {
	at := map[string]place{}
	n := 0
	for _, ls := range laid {
		first, last := n+1, n+len(ls.pages)
		for _, m := range ls.marks {
			if _, seen := at[m.name]; !seen && !m.link {
				at[m.name] = place{page: first + m.page, first: first, last: last}
			}
		}
		n = last
	}
	return at
}

// pageTexts is the text of every page reference the sheets set whose
// anchor was found: the prefix, then the page ("page 12"), or for a
// sheet's pages the first and last ("3–5", or "3" for one page).
func pageTexts(laid []laidSheet, at map[string]place) map[PageRef]string {
	out := map[PageRef]string{}
	for _, ls := range laid {
		for r := range ls.refs {
			p, ok := at[r.Anchor]
			if !ok {
				continue
			}
			t := r.Prefix + strconv.Itoa(p.page)
			if r.Sheet {
				t = r.Prefix + strconv.Itoa(p.first)
				if p.last != p.first {
					t += "–" + strconv.Itoa(p.last)
				}
			}
			out[r] = t
		}
	}
	return out
}
