package eqn

import (
	"fmt"
	"math"
	"slices"
	"strings"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/notation"
)

// Box is a measured formula: its width and how far its ink reaches above
// and below the baseline. Its primitives, relative to the left end of the
// baseline with y growing downward, come from Items or AppendItems.
type Box struct {
	W, Ascent, Descent float64
	items              []draw.Item // its own primitives
	kids               []kid       // boxes placed inside it
	// a box of text (ctx.text) holds its one primitive here, so it is
	// boxed into an Item only once, when placed
	text    draw.Text
	hasText bool
}

type kid struct {
	b    *Box
	x, y float64
}

// Items returns every primitive of the box.
func (b *Box) Items() []draw.Item { return b.AppendItems(nil, 0, 0) }

// AppendItems appends every primitive of the box to dst, moved by
// (dx, dy), and returns the extended slice.
func (b *Box) AppendItems(dst []draw.Item, dx, dy float64) []draw.Item {
	return b.appendItems(slices.Grow(dst, b.count()), dx, dy, 0, 0, false)
}

// count is the number of primitives appendItems appends.
func (b *Box) count() int {
	n := len(b.items)
	if b.hasText {
		n++
	}
	for _, k := range b.kids {
		n += k.b.count()
	}
	return n
}

// AppendItemsThen appends every primitive of the box to dst, moved by
// (dx, dy) and then by (ex, ey): the values AppendItems followed by
// draw.Offset gives, without the second copy.
func (b *Box) AppendItemsThen(dst []draw.Item, dx, dy, ex, ey float64) []draw.Item {
	return b.appendItems(slices.Grow(dst, b.count()), dx, dy, ex, ey, true)
}

func (b *Box) appendItems(dst []draw.Item, dx, dy, ex, ey float64, then bool) []draw.Item {
	if b.hasText {
		t := b.text
		if dx != 0 || dy != 0 {
			t.X += dx
			t.Y += dy
		}
		if then {
			t.X += ex
			t.Y += ey
		}
		dst = append(dst, t)
	}
	for _, it := range b.items {
		switch {
		case then && dx == 0 && dy == 0:
			dst = append(dst, draw.Offset(it, ex, ey))
		case then:
			dst = append(dst, draw.OffsetThen(it, dx, dy, ex, ey))
		case dx == 0 && dy == 0:
			dst = append(dst, it)
		default:
			dst = append(dst, draw.Offset(it, dx, dy))
		}
	}
	for _, k := range b.kids {
		dst = k.b.appendItems(dst, dx+k.x, dy+k.y, ex, ey, then)
	}
	return dst
}

// Style is how a formula is set.
type Style struct {
	Size  float64    // size of the main line in points
	Color draw.Color // ink colour
	// Texts, when set, keeps the box of every text set (cache.go), so a
	// caller setting many formulas measures each symbol, number and
	// operator once. One goroutine's at a time.
	Texts *Texts
}

// GlyphError reports a character the font cannot draw.
type GlyphError struct {
	Rune rune
	Face fonts.Face
	Text string // the text it appeared in
}

func (e *GlyphError) Error() string {
	return fmt.Sprintf("character %q (U+%04X) in %q is not in font %s", e.Rune, e.Rune, e.Text, e.Face)
}

// Layout measures n and returns its box.
func Layout(n Node, st Style) (*Box, error) {
	c := &ctx{size: st.Size, base: st.Size, color: st.Color, texts: st.Texts}
	b := c.layout(n)
	if c.err != nil {
		return nil, c.err
	}
	return b, nil
}

type ctx struct {
	size, base float64
	level      int // script level
	frac       int // fraction nesting
	bold       bool
	color      draw.Color
	err        error
	texts      *Texts // boxes of texts set before, when the caller keeps them
}

func (c *ctx) em(f float64) float64 { return f * c.size }

// with returns a copy of c one script level deeper.
func (c *ctx) script() *ctx {
	d := *c
	d.level++
	switch d.level {
	case 1:
		d.size = c.base * 0.7
	default:
		d.size = c.base * 0.55
	}
	return &d
}

func (c *ctx) sub(d *ctx) {
	if c.err == nil {
		c.err = d.err
	}
}

func (b *Box) place(c *Box, x, dy float64) {
	if b.kids == nil {
		b.kids = make([]kid, 0, 4)
	}
	b.kids = append(b.kids, kid{c, x, dy})
	b.Ascent = math.Max(b.Ascent, c.Ascent-dy)
	b.Descent = math.Max(b.Descent, c.Descent+dy)
	b.W = math.Max(b.W, x+c.W)
}

func (c *ctx) face(italic bool) fonts.Face {
	switch {
	case italic && c.bold:
		return fonts.BoldItalic
	case italic:
		return fonts.Italic
	case c.bold:
		return fonts.Bold
	}
	return fonts.Regular
}

// opFace is the face an operator is set in: the math face, drawn to
// match the text face, when it has the glyphs and the formula is not
// bold (the math face has no bold); else the text face.
func (c *ctx) opFace(s string) fonts.Face {
	if _, bad := fonts.Get(fonts.Math).Missing(s); !bad && !c.bold {
		return fonts.Math
	}
	return c.face(false)
}

// text sets s in one face at the current size.
func (c *ctx) text(s string, face fonts.Face) *Box {
	key := textKey{s, face, c.size, c.color}
	if c.texts != nil {
		if t, ok := c.texts.m[key]; ok {
			if t.err != nil && c.err == nil {
				c.err = t.err
			}
			return t.box
		}
	}
	w, a, d, r, bad := fonts.Get(face).Measure(s, c.size)
	var err error
	if bad {
		err = &GlyphError{Rune: r, Face: face, Text: s}
		if c.err == nil {
			c.err = err
		}
	}
	b := &Box{W: w, Ascent: a, Descent: d, hasText: true,
		text: draw.Text{Face: face, Size: c.size, Color: c.color, Text: s}}
	if c.texts != nil {
		c.texts.m[key] = textBox{b, err}
	}
	return b
}

func (c *ctx) axis() float64 { return fonts.Get(fonts.Regular).XHeight(c.size)/2 + 0.01*c.size }

func (c *ctx) rule() float64 { return math.Max(0.045*c.size, 0.4) }

func (c *ctx) layout(n Node) *Box {
	switch n := n.(type) {
	case nil:
		return &Box{}
	case Row:
		return c.row(n)
	case Sym:
		return c.symbol(n)
	case Num:
		s := n.Text
		if strings.HasPrefix(s, "-") {
			s = "−" + s[1:]
		}
		return c.text(s, c.face(false))
	case Text:
		return c.text(n.Text, c.face(false))
	case Op:
		return c.text(n.Text, c.face(false))
	case Space:
		return &Box{W: c.em(n.Em)}
	case Strong:
		d := *c
		d.bold = true
		b := d.layout(n.X)
		c.sub(&d)
		return b
	case Script:
		return c.script1(n)
	case Frac:
		return c.frac1(n)
	case Sqrt:
		return c.sqrt(n)
	case Fence:
		return c.fence(n)
	case Func:
		return c.fn(n)
	}
	if c.err == nil {
		c.err = fmt.Errorf("eqn: unknown node %T", n)
	}
	return &Box{}
}

// flat is r with its nested rows spliced in and nils dropped: r itself
// when it has neither (the nodes are only read).
func flat(r Row) []Node {
	for _, n := range r {
		if _, nested := n.(Row); nested || n == nil {
			return flatten(r, make([]Node, 0, len(r)+4))
		}
	}
	return r
}

func flatten(r Row, out []Node) []Node {
	for _, n := range r {
		if rr, ok := n.(Row); ok {
			out = flatten(rr, out)
		} else if n != nil {
			out = append(out, n)
		}
	}
	return out
}

type opClass int

const (
	ordinary opClass = iota
	relation
	binary
	punct
)

func classOf(op string) opClass {
	switch op {
	case "=", "≤", "≥", "<", ">", "≠", "≈", "→", "<=", ">=", "≡":
		return relation
	case "+", "−", "-", "×", "·", "±":
		return binary
	case ",", ";":
		return punct
	}
	return ordinary
}

// opSpace is the space on each side of an operator of class k.
func (c *ctx) opSpace(k opClass) (before, after float64) {
	if c.level > 0 {
		switch k {
		case relation, binary:
			return c.em(0.1), c.em(0.1)
		case punct:
			return 0, c.em(0.12)
		}
		return 0, 0
	}
	switch k {
	case relation:
		return c.em(0.28), c.em(0.28)
	case binary:
		return c.em(0.22), c.em(0.22)
	case punct:
		return 0, c.em(0.17)
	}
	return 0, 0
}

func (c *ctx) row(r Row) *Box {
	nodes := flat(r)
	return c.assemble(nodes, c.boxes(nodes), false)
}

// boxes lays out each node of a flattened row; operators as their glyphs.
func (c *ctx) boxes(nodes []Node) []*Box {
	out := make([]*Box, len(nodes))
	for i, n := range nodes {
		if op, ok := n.(Op); ok {
			out[i] = c.text(opGlyph(op.Text), c.opFace(opGlyph(op.Text)))
		} else {
			out[i] = c.layout(n)
		}
	}
	return out
}

func opGlyph(s string) string {
	switch s {
	case "-":
		return "−"
	case "<=":
		return "≤"
	case ">=":
		return "≥"
	case "*":
		return "·"
	}
	return s
}

// spacing is the space before and after the operator at nodes[i]. A
// binary operator that begins the row or follows another operator is a
// sign (no space) unless cont says the row continues a broken line.
func (c *ctx) spacing(nodes []Node, i int, cont bool) (before, after float64) {
	op, ok := nodes[i].(Op)
	if !ok {
		return 0, 0
	}
	k := classOf(op.Text)
	before, after = c.opSpace(k)
	if k == binary && ((i == 0 && !cont) || (i > 0 && isOpNode(nodes[i-1]))) {
		return 0, 0
	}
	if i == 0 {
		before = 0
	}
	return before, after
}

// assemble sets laid-out nodes side by side with operator spacing.
func (c *ctx) assemble(nodes []Node, boxes []*Box, cont bool) *Box {
	b := &Box{kids: make([]kid, 0, len(nodes))}
	x := 0.0
	for i := range nodes {
		before, after := c.spacing(nodes, i, cont)
		x += before
		b.place(boxes[i], x, 0)
		x = b.W + after
		b.W = x
	}
	return b
}

// width is what assemble would measure.
func (c *ctx) width(nodes []Node, boxes []*Box, cont bool) float64 {
	x := 0.0
	for i := range nodes {
		before, after := c.spacing(nodes, i, cont)
		x += before + boxes[i].W + after
	}
	return x
}

func isOpNode(n Node) bool {
	_, ok := n.(Op)
	return ok
}

// sym sets a sheet-notation symbol with an optional superscript stacked
// after its primes and above its subscript.
func (c *ctx) sym(s Sym, sup Node) *Box {
	p := notation.Split(s.Name)
	b := &Box{}
	x := 0.0
	if p.Prefix != "" {
		b.place(c.text(p.Prefix+".", c.face(false)), 0, 0)
		x = b.W + c.em(0.03)
	}
	italic := len([]rune(p.Base)) == 1 && p.Base != "π" && !isUpperGreek(p.Base)
	base := c.text(p.Base, c.face(italic))
	b.place(base, x, 0)
	x = b.W
	subX := x
	supX := x
	if italic {
		supX += c.em(0.06)
	}
	if p.Primes > 0 {
		px := x
		if italic {
			px += c.em(0.05)
		}
		b.place(c.text(strings.Repeat("′", p.Primes), c.face(false)), px, 0)
		supX = b.W + c.em(0.03)
	}
	sc := c.script()
	var subB, supB *Box
	if p.Sub != "" {
		subB = sc.text(p.Sub, sc.face(false))
		if italic {
			subX -= c.em(0.02)
		}
	}
	if sup != nil {
		supB = sc.layout(sup)
	}
	c.sub(sc)
	c.attach(b, subB, supB, subX, supX, base.Ascent, base.Descent)
	return b
}

func isUpperGreek(s string) bool {
	r := []rune(s)
	return len(r) == 1 && r[0] >= 'Α' && r[0] <= 'Ω'
}

// attach places sub and sup scripts (either may be nil) after a base whose
// ink reaches ascent above and descent below the baseline.
func (c *ctx) attach(b, sub, sup *Box, subX, supX, ascent, descent float64) {
	rise := math.Max(c.em(0.36), ascent-c.em(0.25))
	drop := math.Max(c.em(0.16), descent+c.em(0.05))
	if sub != nil && sup != nil {
		drop = math.Max(drop, c.em(0.22))
		// keep a gap between the bottom of sup and the top of sub
		if gap := (rise - sup.Descent) - (sub.Ascent - drop); gap < c.em(0.12) {
			drop += c.em(0.12) - gap
		}
	}
	if sub != nil {
		drop = math.Max(drop, sub.Ascent-c.em(0.55))
		b.place(sub, subX, drop)
	}
	if sup != nil {
		b.place(sup, supX, -rise)
	}
}

func (c *ctx) script1(s Script) *Box {
	if sym, ok := s.Base.(Sym); ok && s.Sub == nil {
		return c.sym(sym, s.Sup)
	}
	b := &Box{}
	base := c.layout(s.Base)
	b.place(base, 0, 0)
	sc := c.script()
	var sub, sup *Box
	if s.Sub != nil {
		sub = sc.layout(s.Sub)
	}
	if s.Sup != nil {
		sup = sc.layout(s.Sup)
	}
	c.sub(sc)
	x := base.W
	c.attach(b, sub, sup, x, x+c.em(0.02), base.Ascent, base.Descent)
	return b
}

func (c *ctx) frac1(f Frac) *Box {
	d := *c
	d.frac++
	if c.frac > 0 || c.level > 0 {
		d.size = math.Max(c.size*0.8, c.base*0.55)
	}
	num, den := d.layout(f.Num), d.layout(f.Den)
	c.sub(&d)
	pad := c.em(0.1)
	w := math.Max(num.W, den.W) + 2*pad
	a, t, gap := c.axis(), c.rule(), c.em(0.14)
	if c.level > 0 {
		gap = c.em(0.1)
	}
	b := &Box{W: w}
	b.place(num, (w-num.W)/2, -(a + t/2 + gap + num.Descent))
	b.place(den, (w-den.W)/2, -a+t/2+gap+den.Ascent)
	b.items = append(b.items, draw.Rect{X: pad / 2, Y: -a - t/2, W: w - pad, H: t, Paint: draw.Fill(c.color)})
	b.W = w
	return b
}

func (c *ctx) sqrt(s Sqrt) *Box {
	x := c.layout(s.X)
	t := c.rule()
	gap := c.em(0.12)
	top := -(x.Ascent + gap + t)                           // top edge of the bar
	bottom := math.Max(x.Descent, c.em(0.05)) + c.em(0.06) // foot of the sign
	h := bottom - top
	w := c.em(0.42) + 0.08*h
	b := &Box{}
	bar := w + x.W + c.em(0.08)
	mid := top + 0.58*h
	b.items = append(b.items,
		draw.Poly{Points: []draw.Point{
			draw.Pt(0, mid+0.04*h), draw.Pt(0.2*w, mid-0.03*h), // the short tick
			draw.Pt(0.5*w, bottom),
			draw.Pt(w, top+t/2), draw.Pt(bar, top+t/2),
		}, Paint: draw.Stroke(c.color, t)},
		// the heavy down-stroke
		draw.Line{X1: 0.2 * w, Y1: mid - 0.03*h, X2: 0.5 * w, Y2: bottom, Paint: draw.Stroke(c.color, 2.2*t)},
	)
	b.place(x, w+c.em(0.04), 0)
	b.W = bar + c.em(0.02)
	b.Ascent = math.Max(b.Ascent, -top+t/2)
	b.Descent = math.Max(b.Descent, bottom+t)
	return b
}

func (c *ctx) fn(f Func) *Box {
	b := &Box{}
	nm := f.Name
	var sub Node
	if nm == "log10" {
		nm, sub = "log", Num{"10"}
	}
	var name *Box
	if strings.ContainsAny(nm, "_'") && f.Sup == nil && sub == nil {
		// a function named in sheet notation (T_v, the time factor as a
		// function of U) is set as its symbol
		name = c.layout(Sym{Name: nm})
	} else {
		name = c.text(nm, c.face(false))
	}
	b.place(name, 0, 0)
	if f.Sup != nil || sub != nil {
		sc := c.script()
		var supB, subB *Box
		if f.Sup != nil {
			supB = sc.layout(f.Sup)
		}
		if sub != nil {
			subB = sc.layout(sub)
		}
		c.sub(sc)
		c.attach(b, subB, supB, name.W+c.em(0.02), name.W+c.em(0.02), name.Ascent, name.Descent)
	}
	if len(f.Args) == 0 {
		return b
	}
	var args Row
	for i, a := range f.Args {
		if i > 0 {
			args = append(args, Op{","})
		}
		args = append(args, a)
	}
	arg := c.fence(Fence{Open: "(", Close: ")", X: args})
	b.place(arg, b.W+c.em(0.03), 0)
	return b
}
