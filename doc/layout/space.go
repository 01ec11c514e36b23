package layout

import "github.com/plinth-calc/plinth/doc/layout/eqn"

// space hands out the word and frag slices of words() from shared chunks,
// so cutting a table's hundreds of short cells into words costs a few
// allocations rather than two a cell. Each chunk holds the words of
// many calls; a call gets the free end of the current chunk and takes
// what it used, so no two slices overlap. A chunk is dropped by the
// collector with the last word cut from it.
type space struct {
	owner *engine // the engine the chunks belong to
	ws    []word
	fs    []frag
	texts *eqn.Texts // the boxes of the formulas' texts, for eqn to reuse
}

// chunk is the least a new chunk holds, in elements.
const chunk = 256

// space is e's chunks. Every sheet is laid out by its own copy of the
// engine (on its own goroutine): a copy starts chunks of its own rather
// than share the original's.
func (e *engine) space() *space {
	if e.sp.owner != e {
		e.sp = space{owner: e}
	}
	return &e.sp
}

// texts is the engine's store of formula texts (eqn.Style.Texts): a
// sheet sets the same symbols, numbers and units over and over.
func (e *engine) texts() *eqn.Texts {
	sp := e.space()
	if sp.texts == nil {
		sp.texts = eqn.NewTexts()
	}
	return sp.texts
}

// words is an empty slice with room for at least n words.
func (s *space) words(n int) []word {
	if cap(s.ws)-len(s.ws) < n {
		s.ws = make([]word, 0, max(n, chunk))
	}
	return s.ws[len(s.ws):len(s.ws)]
}

// frags is an empty slice with room for at least n frags.
func (s *space) frags(n int) []frag {
	if cap(s.fs)-len(s.fs) < n {
		s.fs = make([]frag, 0, max(n, chunk))
	}
	return s.fs[len(s.fs):len(s.fs)]
}

// used takes what a call made of the slices words and frags gave it. A
// slice that outgrew its room moved out of the chunk: a moved word slice
// leaves nothing behind that is still used, but the words cut before a
// frag slice moved hold parts of the chunk, so the chunk is then full.
func (s *space) used(ws []word, fs []frag) {
	if n := len(s.ws); len(ws) > 0 && cap(s.ws) > n && &s.ws[:n+1][n] == &ws[0] {
		s.ws = s.ws[:n+len(ws)]
	}
	if n := len(s.fs); len(fs) > 0 {
		if cap(s.fs) > n && &s.fs[:n+1][n] == &fs[0] {
			s.fs = s.fs[:n+len(fs)]
		} else {
			s.fs = s.fs[:cap(s.fs)]
		}
	}
}
