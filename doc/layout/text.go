package layout

import (
	"math"
	"strings"
	"unicode"
	"unicode/utf8"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// leadNum is the digits of a formula that is a number, alone or with its
// unit (eqn.Num, a degree sign after it, or a Row of a Num, a space and a
// Unit).
func leadNum(n eqn.Node) (string, bool) {
	switch n := n.(type) {
	case eqn.Num:
		return strings.TrimSuffix(n.Text, "°"), true // 26°: degrees are glued to their number
	case eqn.Row:
		if len(n) == 3 {
			num, ok := n[0].(eqn.Num)
			_, sp := n[1].(eqn.Space)
			if ok && sp {
				return num.Text, true
			}
		}
	}
	return "", false
}

// textStyle is how a run of text is set in a block.
type textStyle struct {
	size  float64
	lead  float64 // line height over size
	color draw.Color
	bold  bool // set Regular as Bold and Italic as BoldItalic (headings)
	face  fonts.Face
}

// frag is a stretch of one word in one face, or one inline formula.
type frag struct {
	text  string
	link  string
	size  float64
	rise  float64 // baseline shift, up
	w     float64
	math  *eqn.Box // an inline formula (text then holds a lone number's digits, else "")
	face  fonts.Face
	color draw.Color
}

// word is what the line breaker moves: frags with no break opportunity
// between them.
type word struct {
	frags []frag
	w     float64
	space float64 // width of the space after it; 0 = none
	hard  bool    // a forced line break follows
}

// line is a set line: its words, measured; appendItems draws them.
type line struct {
	w, h, base float64 // width, height, baseline from the top
	ws         []word
	st         textStyle
}

func (st textStyle) faceOf(s Style) fonts.Face {
	f := s
	if !f.Valid() || f == fonts.MonoBold {
		f = st.face
	}
	if f == Regular {
		f = st.face
	}
	if st.bold {
		switch f {
		case Regular:
			f = Bold
		case Italic:
			f = BoldItalic
		case Mono:
			f = fonts.MonoBold
		}
	}
	return f
}

// words cuts runs into words, checking every character against its font.
func (e *engine) words(runs []Run, st textStyle, pos source.Span) []word {
	// at most one word and one frag a run and a separator (the room
	// asked of the chunks; more only if spelling adds spaces)
	n := 0
	for _, r := range runs {
		n++
		for i := 0; i < len(r.Text); i++ {
			switch r.Text[i] {
			case ' ', '\t', '\r', '\n':
				n++
			}
		}
	}
	sp := e.space()
	ws := sp.words(n)
	// the frags of every word, each word's a full slice of its own part
	frags := sp.frags(n)
	var cur word
	from := 0 // where cur's frags begin in frags
	open := false
	end := func(space float64, hard bool) {
		if open || hard {
			cur.frags = frags[from:len(frags):len(frags)]
			cur.space, cur.hard = space, hard
			if !open && len(ws) > 0 && hard { // a break right after a space
				ws[len(ws)-1].hard = true
			} else {
				ws = append(ws, cur)
			}
		} else if space > 0 && len(ws) > 0 {
			ws[len(ws)-1].space = space
		}
		cur, open = word{}, false
		from = len(frags)
	}
	for _, r := range runs {
		color := st.color
		if r.Link != "" {
			color = linkInk
		}
		if r.Math != nil {
			b, err := eqn.Layout(r.Math, eqn.Style{Size: st.size, Color: color, Texts: e.texts()})
			if err != nil {
				e.mathProblem(pos, r.Own, err)
				continue
			}
			fr := frag{math: b, w: b.W, size: st.size, link: r.Link, color: color}
			if n, ok := leadNum(r.Math); ok {
				fr.text, fr.face = n, fonts.Regular // a number (with its unit): its digits, for decimal alignment
			}
			frags = append(frags, fr)
			cur.w += b.W
			open = true
			continue
		}
		face := st.faceOf(r.Style)
		size, rise := st.size, 0.0
		if face == Mono || face == fonts.MonoBold {
			size *= 0.94
		}
		switch r.Shift {
		case Sup:
			size, rise = size*0.7, st.size*0.36
		case Sub:
			size, rise = size*0.7, -st.size*0.16
		}
		f := fonts.Get(face)
		text := r.Text
		if r.Page.Anchor != "" {
			text = e.pageText(r.Page, pos)
		}
		if r.Own {
			text = e.ownGlyphs(text, face, pos)
		} else {
			text = e.checkGlyphs(text, face, pos)
		}
		spaceW := f.Width(" ", size)
		start := 0
		flush := func(i int) {
			if i > start {
				s := text[start:i]
				w := f.Width(s, size)
				frags = append(frags, frag{text: s, face: face, size: size, rise: rise, color: color, link: r.Link, w: w})
				cur.w += w
				open = true
			}
		}
		for i, c := range text {
			switch c {
			case ' ', '\t', '\r':
				flush(i)
				end(spaceW, false)
				start = i + 1
			case '\n':
				flush(i)
				end(0, true)
				start = i + 1
			}
		}
		flush(len(text))
	}
	if open {
		end(0, false)
	}
	sp.used(ws, frags)
	return ws[:len(ws):len(ws)]
}

// checkGlyphs reports each character the face lacks and drops it.
func (e *engine) checkGlyphs(s string, face fonts.Face, pos source.Span) string {
	f := fonts.Get(face)
	r, bad := f.Missing(strings.Map(func(r rune) rune {
		if r == '\n' || r == '\t' || r == '\r' {
			return ' '
		}
		return r
	}, s))
	if !bad {
		return s
	}
	e.diags.Add(pos, "character %q (U+%04X) in %q is not in font %s", r, r, excerpt(s, r), face)
	return strings.Map(func(c rune) rune {
		if c == '\n' || c == '\t' || c == '\r' || f.Has(c) {
			return c
		}
		return -1
	}, s)
}

// ownGlyphs spells plinth's own text for the face (fonts.Spell) and
// reports any character still missing as an internal error of plinth,
// naming the block only as the place it was printed for.
func (e *engine) ownGlyphs(s string, face fonts.Face, pos source.Span) string {
	s = fonts.Spell(s, face)
	f := fonts.Get(face)
	r, bad := f.Missing(strings.Map(func(r rune) rune {
		if r == '\n' || r == '\t' || r == '\r' {
			return ' '
		}
		return r
	}, s))
	if !bad {
		return s
	}
	where := ""
	if p := pos.String(); p != "" {
		where = " (in the printout of " + p + ")"
	}
	e.diags.Add(source.Span{}, "internal error in plinth: plinth's own text %q has character %q (U+%04X), which font %s lacks%s; this is a defect of plinth, not of the input", excerpt(s, r), r, r, face, where)
	return strings.Map(func(c rune) rune {
		if c == '\n' || c == '\t' || c == '\r' || f.Has(c) {
			return c
		}
		return -1
	}, s)
}

// mathProblem reports a formula that cannot be set: at pos, or, for
// plinth's own formula, as an internal error of plinth.
func (e *engine) mathProblem(pos source.Span, own bool, err error) {
	if !own {
		e.diags.Add(pos, "%v", err)
		return
	}
	where := ""
	if p := pos.String(); p != "" {
		where = " (in the printout of " + p + ")"
	}
	e.diags.Add(source.Span{}, "internal error in plinth: its own formula cannot be set: %v%s; this is a defect of plinth, not of the input", err, where)
}

// excerpt is up to 40 characters of s around the first r.
func excerpt(s string, r rune) string {
	i := strings.IndexRune(s, r)
	start := max(0, i-20)
	for start > 0 && !utf8.RuneStart(s[start]) {
		start--
	}
	end := min(len(s), i+20)
	for end < len(s) && !utf8.RuneStart(s[end]) {
		end++
	}
	out := s[start:end]
	if start > 0 {
		out = "…" + out
	}
	if end < len(s) {
		out += "…"
	}
	return out
}

// breakLines sets words into lines no wider than width: greedy, breaking
// at spaces; a word longer than a line breaks after a '/' if it can, else
// between characters (with a hyphen between two letters). Every step sets
// a word or a non-empty part of one, so the work is bounded by the
// characters of the text.
func breakLines(ws []word, width float64, st textStyle) []line {
	var lines []line
	// The line being filled: lead (the rest of a word split at the end of
	// the line before) when leadIn, then the whole words ws[from:to]. A
	// line of whole words only is set from ws itself, not a copy.
	from, to := 0, 0
	var lead, pend word // pend: the rest of a split word, still to place
	leadIn, hasPend := false, false
	x := 0.0
	flush := func(head *word) {
		lw := ws[from:to:to]
		if leadIn || head != nil {
			lw = make([]word, 0, to-from+2)
			if leadIn {
				lw = append(lw, lead)
			}
			lw = append(lw, ws[from:to]...)
			if head != nil {
				lw = append(lw, *head)
			}
		}
		lines = append(lines, setLine(lw, st))
		from, x, leadIn = to, 0, false
	}
	place := func(w word, isPend bool) {
		if isPend {
			lead, leadIn, hasPend = w, true, false
		} else {
			to++
		}
	}
	for hasPend || to < len(ws) {
		w, isPend := pend, hasPend
		if !isPend {
			w = ws[to]
		}
		gap := 0.0
		if to > from {
			gap = ws[to-1].space
		} else if leadIn {
			gap = lead.space
		}
		empty := to == from && !leadIn
		switch {
		case x+gap+w.w <= width+1e-9:
			place(w, isPend)
			x += gap + w.w
		case !empty:
			flush(nil)
			continue
		default: // alone and too long: split it
			head, tail, ok := splitWord(w, width)
			if !ok { // nothing to split: set it as it is
				place(w, isPend)
				x += w.w
				break
			}
			flush(&head)
			if !isPend {
				to++ // its head is set, its tail comes next
				from = to
			}
			pend, hasPend = tail, true
			continue
		}
		if w.hard {
			flush(nil)
		}
	}
	if to > from || leadIn || len(lines) == 0 {
		flush(nil)
	}
	return lines
}

// splitWord cuts w so the head fits width: after the last '/' that fits,
// else after the last character that fits (at least one character), with
// a hyphen when the cut falls between two letters. ok is false when w
// cannot be cut (a single character or formula). The work is in
// proportion to the head, not the whole word.
func splitWord(w word, width float64) (head, tail word, ok bool) {
	type cut struct {
		frag, off int
		hyph      bool
	}
	var best, slash cut
	found, foundSlash := false, false
	x := 0.0
	for fi, f := range w.frags {
		if f.math != nil {
			if x+f.w > width && found {
				break
			}
			x += f.w
			best, found = cut{fi + 1, 0, false}, true
			continue
		}
		fo := fonts.Get(f.face)
		hyW := float64(fo.Advance('-')) * f.size / 1000
		for off, r := range f.text {
			cw := float64(fo.Advance(r)) * f.size / 1000
			if x+cw > width && found {
				goto done
			}
			x += cw
			end := off + utf8.RuneLen(r)
			next, _ := utf8.DecodeRuneInString(f.text[end:])
			letters := unicode.IsLetter(r) && unicode.IsLetter(next)
			if !letters || x+hyW <= width || !found {
				best, found = cut{fi, end, letters && x+hyW <= width}, true
				if r == '/' {
					slash, foundSlash = best, true
				}
			}
		}
	}
done:
	if foundSlash {
		best = slash
	}
	if best.frag < len(w.frags) && w.frags[best.frag].math == nil && best.off >= len(w.frags[best.frag].text) {
		best = cut{best.frag + 1, 0, false}
	}
	if best.frag >= len(w.frags) || (best.frag == 0 && best.off == 0) {
		return w, word{}, false // nothing before or after the cut
	}
	head.frags = make([]frag, 0, best.frag+1)
	head.frags = append(head.frags, w.frags[:best.frag]...)
	if best.frag < len(w.frags) {
		f := w.frags[best.frag]
		if best.off > 0 {
			fo := fonts.Get(f.face)
			h := f
			h.text = f.text[:best.off]
			hu := fo.Units(h.text)
			l, _ := utf8.DecodeLastRuneInString(h.text)
			r, _ := utf8.DecodeRuneInString(f.text[best.off:])
			// the tail's width from the whole's, exactly as Width would give it
			all := int(math.Round(f.w * 1000 / f.size))
			tu := all - hu - fo.Kern(l, r)
			if best.hyph {
				h.text += "-"
				hu = fo.Units(h.text)
			}
			h.w = float64(hu) * f.size / 1000
			head.frags = append(head.frags, h)
			t := f
			t.text = f.text[best.off:]
			t.w = float64(tu) * f.size / 1000
			tail.frags = append(tail.frags, t)
		} else {
			tail.frags = append(tail.frags, f)
		}
		tail.frags = append(tail.frags, w.frags[best.frag+1:]...)
	}
	if len(head.frags) == 0 || len(tail.frags) == 0 {
		return w, word{}, false
	}
	for _, f := range head.frags {
		head.w += f.w
	}
	for _, f := range tail.frags {
		tail.w += f.w
	}
	tail.space, tail.hard = w.space, w.hard
	return head, tail, true
}

// setLine measures a line of words; appendItems places them.
func setLine(ws []word, st textStyle) line {
	f := fonts.Get(st.face)
	asc, desc := f.Ascent(st.size), f.Descent(st.size)
	leading := st.lead*st.size - asc - desc
	for _, w := range ws { // inline formulas may make the line taller
		for _, fr := range w.frags {
			if fr.math != nil {
				asc = math.Max(asc, fr.math.Ascent+0.12*st.size)
				desc = math.Max(desc, fr.math.Descent+0.12*st.size)
			}
		}
	}
	ln := line{ws: ws, st: st}
	ln.h = math.Max(st.lead*st.size, asc+desc+leading)
	ln.base = leading/2 + asc
	x := 0.0
	for i, w := range ws {
		for _, fr := range w.frags {
			x += fr.w
		}
		if i < len(ws)-1 {
			x += w.space
		}
	}
	ln.w = x
	return ln
}

// appendItems appends the line's primitives to dst with the top-left of
// the line at (dx, dy), and returns the extended slice. Consecutive words
// in one face, size, colour and baseline, a space apart, are one text
// item.
func (ln *line) appendItems(dst []draw.Item, dx, dy float64) []draw.Item {
	st := ln.st
	f := fonts.Get(st.face)
	textAsc := f.Ascent(st.size)
	base := ln.base
	x := 0.0
	var linkTarget string
	var linkX float64
	closeLink := func(at float64) {
		if linkTarget != "" {
			dst = append(dst, draw.Link{X: linkX + dx, Y: base - textAsc + dy, W: at - linkX, H: textAsc + f.Descent(st.size), Target: linkTarget})
		}
		linkTarget = ""
	}
	lastText := -1 // index in dst of the text item the next frag may extend (cur)
	var cur draw.Text
	var curY float64  // cur's baseline before the move by dy
	var joined []byte // cur's text once words are joined to it
	closeText := func() {
		if lastText >= 0 {
			if joined != nil {
				cur.Text = string(joined)
			}
			dst[lastText] = cur
		}
		lastText, joined = -1, nil
	}
	pending := false // a space between cur and the next frag
	for i, w := range ln.ws {
		for _, fr := range w.frags {
			if fr.link != linkTarget {
				closeLink(x)
				if fr.link != "" {
					linkTarget, linkX = fr.link, x
				}
			}
			if fr.math != nil {
				closeText()
				dst = fr.math.AppendItemsThen(dst, x, base, dx, dy)
			} else {
				y := base - fr.rise
				t := draw.Text{X: x + dx, Y: y + dy, Face: fr.face, Size: fr.size, Color: fr.color, Text: fr.text}
				if lastText >= 0 && cur.Face == t.Face && cur.Size == t.Size && cur.Color == t.Color && curY == y {
					if joined == nil {
						joined = append(make([]byte, 0, 2*len(cur.Text)+len(t.Text)+8), cur.Text...)
					}
					if pending {
						joined = append(joined, ' ')
					}
					joined = append(joined, t.Text...)
				} else if t.Text != "" {
					closeText()
					cur, curY, lastText = t, y, len(dst)
					dst = append(dst, nil) // cur's place, filled when it closes
				}
				pending = false
			}
			x += fr.w
		}
		if i < len(ln.ws)-1 {
			x += w.space
			// a gap of exactly one space of the last face keeps the text
			// item open; any other gap closes it
			if lastText >= 0 {
				if sp := fonts.Get(cur.Face).Width(" ", cur.Size); math.Abs(sp-w.space) < 1e-9 {
					pending = true
				} else {
					closeText()
				}
			}
		}
	}
	closeText()
	closeLink(x)
	return dst
}

// setText breaks runs into lines of at most width.
func (e *engine) setText(runs []Run, width float64, st textStyle, pos source.Span) []line {
	return breakLines(e.words(runs, st, pos), width, st)
}

// plain is a single run of regular text.
func plain(s string) []Run { return []Run{{Text: s}} }
