package pdf

import (
	"math"
	"strconv"
)

// content is one page's content stream, written operator by operator
// with strconv into a reused buffer: no fmt, no value boxed in an
// interface, nothing kept once the page is compressed. It is lean: text
// items that follow one another share one text object, and the font and
// colours are written only when they change (the painter keeps the state).
// gopdf writes everything else (fonts, pages, outlines, links, images,
// the cross-reference table).
type content struct {
	b []byte
	h float64 // page height: PDF y runs up from the bottom
	// the last font size written, and its text
	size     float64
	sizeText []byte
}

// f2 appends x as "%.2f".
func (c *content) f2(x float64) { c.b = appendF2(c.b, x) }

// appendF2 appends x as strconv formats it with two decimals, through
// integers when that is certainly the same: x·100 is rounded to the
// nearest integer (ties to even, as strconv rounds an exact half), unless
// it lies so near a half that the error of the product could decide, or
// x is too large for the product to be that close; strconv does those.
func appendF2(b []byte, x float64) []byte {
	a := math.Abs(x)
	if !(a < 1e7) { // also NaN; below 1e7, x·100 is within 1e-7 of exact
		return strconv.AppendFloat(b, x, 'f', 2, 64)
	}
	y := a * 100
	r := math.RoundToEven(y)
	if d := math.Abs(y - math.Trunc(y) - 0.5); d < 1e-6 {
		return strconv.AppendFloat(b, x, 'f', 2, 64)
	}
	n := uint64(r)
	if math.Signbit(x) {
		b = append(b, '-')
	}
	b = strconv.AppendUint(b, n/100, 10)
	f := n % 100
	return append(b, '.', byte('0'+f/10), byte('0'+f%10))
}

func (c *content) s(s string) { c.b = append(c.b, s...) }

func (c *content) sp() { c.b = append(c.b, ' ') }

// rgb is "%.3f" of each level over 255, for levels 0…255.
var rgb = func() (t [256]string) {
	for i := range t {
		t[i] = strconv.FormatFloat(float64(i)/255, 'f', 3, 64)
	}
	return t
}()

// color: "%.3f %.3f %.3f %s\n" (op RG or rg).
func (c *content) color(r, g, b uint8, op string) {
	c.s(rgb[r])
	c.sp()
	c.s(rgb[g])
	c.sp()
	c.s(rgb[b])
	c.sp()
	c.s(op)
	c.b = append(c.b, '\n')
}

// lineWidth: "w".
func (c *content) lineWidth(w float64) {
	c.f2(w)
	c.s(" w\n")
}

// solid: an empty dash array.
func (c *content) solid() { c.s("[] 0 d\n") }

// dash: the dash array a, phase 0.
func (c *content) dash(a []float64) {
	c.b = append(c.b, '[')
	for i, x := range a {
		if i > 0 {
			c.sp()
		}
		c.f2(x)
	}
	c.s("] 0 d\n")
}

// point appends a point, y turned up from the bottom, and the operator.
func (c *content) point(x, y float64, op string) {
	c.f2(x)
	c.sp()
	c.f2(c.h - y)
	c.sp()
	c.s(op)
}

// line strokes a segment.
func (c *content) line(x1, y1, x2, y2 float64) {
	c.point(x1, y1, "m ")
	c.point(x2, y2, "l S\n")
}

// paintOp is the operator painting a closed shape with style letters F
// (fill) and D (stroke): f, B (both) or S; closing ones for a polygon.
func paintOp(style string, closing bool) string {
	switch {
	case style == "F":
		return "f"
	case style == "FD" || style == "DF":
		if closing {
			return "b"
		}
		return "B"
	case closing:
		return "s"
	}
	return "S"
}

// rect paints a rectangle from its upper-left corner.
func (c *content) rect(x, y, w, h float64, style string) {
	c.f2(x)
	c.sp()
	c.f2(c.h - (y + h))
	c.sp()
	c.f2(w)
	c.sp()
	c.f2(h)
	c.s(" re ")
	c.s(paintOp(style, false))
	c.b = append(c.b, '\n')
}

// polygonPoint adds a vertex: the first moves to it, the rest draw to it.
func (c *content) polygonPoint(x, y float64, first bool) {
	if first {
		c.point(x, y, "m ")
	} else {
		c.point(x, y, "l ")
	}
}

// polygonEnd closes and paints the polygon.
func (c *content) polygonEnd(style string) {
	c.s(paintOp(style, true))
	c.b = append(c.b, '\n')
}

// textBegin opens a text object.
func (c *content) textBegin() { c.s("BT\n") }

// textEnd closes it.
func (c *content) textEnd() { c.s("ET\n") }

// font selects font resource /F<font> at size (trimmed to three
// decimals).
func (c *content) font(font int, size float64) {
	c.s("/F")
	c.b = strconv.AppendInt(c.b, int64(font), 10)
	c.sp()
	if size != c.size || c.sizeText == nil {
		c.size = size
		c.sizeText = strconv.AppendFloat(c.sizeText[:0], math.Round(1000*size)/1000, 'f', -1, 64)
	}
	c.b = append(c.b, c.sizeText...)
	c.s(" Tf\n")
}

// textAt places the next text's baseline start at (x, y).
func (c *content) textAt(x, y float64) {
	c.s("1 0 0 1 ")
	c.point(x, y, "Tm\n")
}

const hexDigits = "0123456789ABCDEF"

// glyph appends a glyph index as four hex digits (more above 0xFFFF).
func (c *content) glyph(g uint) {
	if g > 0xFFFF {
		c.b = append(c.b, []byte(strconv.FormatUint(uint64(g), 16))...)
		return
	}
	c.b = append(c.b, hexDigits[g>>12&15], hexDigits[g>>8&15], hexDigits[g>>4&15], hexDigits[g&15])
}

// kern appends a kerning adjustment inside a TJ array: ">n<".
func (c *content) kern(n int) {
	c.b = append(c.b, '>')
	c.b = strconv.AppendInt(c.b, int64(n), 10)
	c.b = append(c.b, '<')
}

// image draws image object index (0-based) with its top-left corner at
// (x, y), w by h.
func (c *content) image(index int, x, y, w, h float64) {
	c.s("q ")
	c.f2(w)
	c.s(" 0 0 ")
	c.f2(h)
	c.sp()
	c.f2(x)
	c.sp()
	c.f2(c.h - y - h)
	c.s(" cm /I")
	c.b = strconv.AppendInt(c.b, int64(index+1), 10)
	c.s(" Do Q\n")
}
