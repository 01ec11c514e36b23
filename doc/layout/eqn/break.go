package eqn

// Break sets n in lines no wider than width where it can. A formula that
// fits is one line. Otherwise it breaks before top-level relations
// (=, ≤ …), continuation lines starting with the relation and aligned
// under the first one (or indented 2 em when the left side is long); a
// piece still too wide breaks before a top-level + or −, indented a
// further 1 em. Continuation boxes include their indent. A single piece
// wider than width (a long fraction, say) is left to overflow.
func Break(n Node, width float64, st Style) ([]*Box, error) {
	s, err := Prepare(n, st)
	if err != nil {
		return nil, err
	}
	return s.Break(width), nil
}

// Set is a formula's parts set once, to be broken at any width (a
// caller that tries a narrow column first, then the full width, sets the
// formula once).
type Set struct {
	c     *ctx
	nodes []Node
	boxes []*Box
	st    Style
	w     float64 // on one line
}

// Prepare sets n's parts for Break.
func Prepare(n Node, st Style) (*Set, error) {
	c := &ctx{size: st.Size, base: st.Size, color: st.Color, texts: st.Texts}
	var nodes []Node
	if r, ok := n.(Row); ok {
		nodes = flat(r)
	} else {
		nodes = flatten(Row{n}, nil)
	}
	boxes := c.boxes(nodes)
	if c.err != nil {
		return nil, c.err
	}
	return &Set{c: c, nodes: nodes, boxes: boxes, st: st, w: c.width(nodes, boxes, false)}, nil
}

// Width is the formula's width on one line.
func (s *Set) Width() float64 { return s.w }

// Break is Break of the formula at width.
func (s *Set) Break(width float64) []*Box {
	c, nodes, boxes, st := s.c, s.nodes, s.boxes, s.st
	if s.w <= width {
		return []*Box{c.assemble(nodes, boxes, false)}
	}
	// segments: [lhs...], [rel, ...], [rel, ...] as index ranges
	type span struct{ from, to int }
	var segs []span
	start := 0
	for i, x := range nodes {
		if op, ok := x.(Op); ok && classOf(op.Text) == relation && i > 0 {
			segs = append(segs, span{start, i})
			start = i
		}
	}
	segs = append(segs, span{start, len(nodes)})
	w := func(from, to int, cont bool) float64 { return c.width(nodes[from:to], boxes[from:to], cont) }
	indent := 2 * st.Size
	if len(segs) > 1 {
		if lw := w(segs[0].from, segs[0].to, false) + c.em(0.28); lw < 0.4*width {
			indent = lw
		}
	}
	type lineSpan struct {
		from, to int
		indent   float64
		cont     bool // begins with a binary operator of a broken sum
	}
	var lines []lineSpan
	cur := lineSpan{from: -1}
	emit := func() {
		if cur.from >= 0 && cur.to > cur.from {
			lines = append(lines, cur)
		}
		cur = lineSpan{from: -1}
	}
	fits := func(from, to int, ind float64, cont bool) bool { return ind+w(from, to, cont) <= width }
	for si, seg := range segs {
		if cur.from >= 0 && fits(cur.from, seg.to, cur.indent, cur.cont) {
			cur.to = seg.to
			continue
		}
		emit()
		ind := 0.0
		if si > 0 {
			ind = indent
		}
		if fits(seg.from, seg.to, ind, false) {
			cur = lineSpan{from: seg.from, to: seg.to, indent: ind}
			continue
		}
		// break the segment before top-level + and −
		for _, part := range splitSum(nodes, seg.from, seg.to) {
			if cur.from >= 0 && fits(cur.from, part.to, cur.indent, cur.cont) {
				cur.to = part.to
				continue
			}
			if cur.from >= 0 {
				emit()
				more := indent + st.Size
				if si == 0 {
					more = st.Size
				}
				cur = lineSpan{from: part.from, to: part.to, indent: more, cont: true}
				continue
			}
			cur = lineSpan{from: part.from, to: part.to, indent: ind}
		}
	}
	emit()
	out := make([]*Box, len(lines))
	for i, ln := range lines {
		b := c.assemble(nodes[ln.from:ln.to], boxes[ln.from:ln.to], ln.cont)
		if ln.indent > 0 {
			shifted := &Box{}
			shifted.place(b, ln.indent, 0)
			b = shifted
		}
		out[i] = b
	}
	return out
}

type part struct{ from, to int }

// splitSum cuts nodes[from:to] before each binary + or − that follows an
// operand (not a sign).
func splitSum(nodes []Node, from, to int) []part {
	var out []part
	start := from
	for i := from + 1; i < to; i++ {
		op, ok := nodes[i].(Op)
		if !ok || (op.Text != "+" && op.Text != "−" && op.Text != "-") || isOpNode(nodes[i-1]) {
			continue
		}
		out = append(out, part{start, i})
		start = i
	}
	return append(out, part{start, to})
}
