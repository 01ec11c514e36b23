package eqn

import (
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// Texts keeps the boxes of the texts formulas have set, keyed by text,
// face, size and colour. A box never changes once made (a formula's boxes
// hold their parts, never the other way round), so one box serves every
// formula that sets the same text alike. Not for concurrent use.
type Texts struct {
	m    map[textKey]textBox
	syms map[symKey]*Box // symbols with no superscript, set without error
}

// NewTexts returns an empty store.
func NewTexts() *Texts { return &Texts{m: map[textKey]textBox{}, syms: map[symKey]*Box{}} }

// symKey is what a symbol's box depends on.
type symKey struct {
	name       string
	size, base float64
	level      int
	bold       bool
	color      draw.Color
}

// symbol is sym(s, nil), kept in c.texts when there is one.
func (c *ctx) symbol(s Sym) *Box {
	if c.texts == nil {
		return c.sym(s, nil)
	}
	k := symKey{s.Name, c.size, c.base, c.level, c.bold, c.color}
	if b, ok := c.texts.syms[k]; ok {
		return b
	}
	if c.err != nil { // a glyph error of this symbol would not show
		return c.sym(s, nil)
	}
	b := c.sym(s, nil)
	if c.err == nil {
		c.texts.syms[k] = b
	}
	return b
}

type textKey struct {
	s     string
	face  fonts.Face
	size  float64
	color draw.Color
}

type textBox struct {
	box *Box
	err error // the text's missing glyph, raised again each time it is set
}
