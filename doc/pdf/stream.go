package pdf

import (
	"math"
	"strconv"
)

// content is one page's content stream, written operator by operator
// with strconv into a reused buffer: no fmt, no value boxed in an
// interface, nothing kept once the page is compressed. Each operator is
// spelt exactly as gopdf's own content writer spells it (its formats are
// quoted beside each method), so the page streams are the bytes gopdf
// would write; gopdf still writes everything else (fonts, pages,
// outlines, links, images, the cross-reference table).
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

// lineWidth: "%.2f w\n".
func (c *content) lineWidth(w float64) {
	c.f2(w)
	c.s(" w\n")
}

// solid: gopdf's line type "solid", "[] 0 d\n".
func (c *content) solid() { c.s("[] 0 d\n") }

// dash: "%0.2f %0.2f d\n" of the dash array and phase, fmt printing the
// array as "[a b]".
func (c *content) dash(a []float64, phase float64) {
	c.b = append(c.b, '[')
	for i, x := range a {
		if i > 0 {
			c.sp()
		}
		c.f2(x)
	}
	c.s("] ")
	c.f2(phase)
	c.s(" d\n")
}

// line: "q\n", "%0.2f %0.2f m %0.2f %0.2f l S\n", "Q\n".
func (c *content) line(x1, y1, x2, y2 float64) {
	c.s("q\n")
	c.f2(x1)
	c.sp()
	c.f2(c.h - y1)
	c.s(" m ")
	c.f2(x2)
	c.sp()
	c.f2(c.h - y2)
	c.s(" l S\nQ\n")
}

// rect from the upper-left corner: "q\n%0.2f %0.2f %0.2f %0.2f re %s\nQ\n"
// with gopdf's paint style for style (F → f, DF or FD → B, else S).
func (c *content) rect(x, y, w, h float64, style string) {
	op := "S"
	switch style {
	case "F":
		op = "f"
	case "FD", "DF":
		op = "B"
	}
	c.s("q\n")
	c.f2(x)
	c.sp()
	c.f2(c.h - (y + h))
	c.sp()
	c.f2(w)
	c.sp()
	c.f2(h)
	c.s(" re ")
	c.s(op)
	c.s("\nQ\n")
}

// polygonStart opens a polygon: "q\n".
func (c *content) polygonStart() { c.s("q\n") }

// polygonPoint: "%.2f %.2f" then " m " for the first point, " l " after.
func (c *content) polygonPoint(x, y float64, first bool) {
	c.f2(x)
	c.sp()
	c.f2(c.h - y)
	if first {
		c.s(" m ")
	} else {
		c.s(" l ")
	}
}

// polygonEnd closes it: " f\n" (F), " b\n" (FD, DF) or " s\n", "Q\n".
func (c *content) polygonEnd(style string) {
	switch style {
	case "F":
		c.s(" f\n")
	case "FD", "DF":
		c.s(" b\n")
	default:
		c.s(" s\n")
	}
	c.s("Q\n")
}

// textStart opens a text object at (x, y) with font number font at size
// and the fill colour col: "BT\n", "%0.2f %0.2f TD\n",
// "/F%d %s Tf %s Tc %s Ts\n" (sizes trimmed to three decimals, no
// character spacing, no rise), the colour as "rg", then "[<".
func (c *content) textStart(x, y float64, font int, size float64, r, g, b uint8) {
	c.s("BT\n")
	c.f2(x)
	c.sp()
	c.f2(c.h - y)
	c.s(" TD\n/F")
	c.b = strconv.AppendInt(c.b, int64(font), 10)
	c.sp()
	if size != c.size || c.sizeText == nil {
		c.size = size
		c.sizeText = strconv.AppendFloat(c.sizeText[:0], math.Round(1000*size)/1000, 'f', -1, 64)
	}
	c.b = append(c.b, c.sizeText...)
	c.s(" Tf 0 Tc 0 Ts\n")
	c.color(r, g, b, "rg")
	c.s("[<")
}

const hexDigits = "0123456789ABCDEF"

// glyph: "%04X" of the glyph index.
func (c *content) glyph(g uint) {
	if g > 0xFFFF {
		c.b = append(c.b, []byte(strconv.FormatUint(uint64(g), 16))...)
		return
	}
	c.b = append(c.b, hexDigits[g>>12&15], hexDigits[g>>8&15], hexDigits[g>>4&15], hexDigits[g&15])
}

// kern: ">%d<" of the adjustment.
func (c *content) kern(n int) {
	c.b = append(c.b, '>')
	c.b = strconv.AppendInt(c.b, int64(n), 10)
	c.b = append(c.b, '<')
}

// textEnd: ">] TJ\n", "ET\n".
func (c *content) textEnd() { c.s(">] TJ\nET\n") }

// image draws image object index (0-based) with its top-left corner at
// (x, y), w by h, as gopdf does for an unrotated, unmasked image: a
// rotation by 0° about its centre around "q\n", "q\n %s %0.2f 0 0\n
// %0.2f %0.2f %0.2f cm /I%d Do \nQ\n", "Q\n".
func (c *content) image(index int, x, y, w, h float64) {
	cx, cy := x+w/2, y+h/2
	rad := 0 * (math.Pi / 180)
	cos, sin := math.Cos(rad), math.Sin(rad)
	py := c.h - cy
	// "q\n %.5f %.5f %.5f\n %.5f %.2f %.2f cm\n 1 0 0\n 1 %.2f %.2f cm\n"
	c.s("q\n ")
	c.b = strconv.AppendFloat(c.b, cos, 'f', 5, 64)
	c.sp()
	c.b = strconv.AppendFloat(c.b, sin, 'f', 5, 64)
	c.sp()
	c.b = strconv.AppendFloat(c.b, -sin, 'f', 5, 64)
	c.s("\n ")
	c.b = strconv.AppendFloat(c.b, cos, 'f', 5, 64)
	c.sp()
	c.f2(cx)
	c.sp()
	c.f2(py)
	c.s(" cm\n 1 0 0\n 1 ")
	c.f2(-cx)
	c.sp()
	c.f2(-py)
	c.s(" cm\n")
	c.s("q\nq\n  ")
	c.f2(w)
	c.s(" 0 0\n ")
	c.f2(h)
	c.sp()
	c.f2(x)
	c.sp()
	c.f2(c.h - y - h)
	c.s(" cm /I")
	c.b = strconv.AppendInt(c.b, int64(index+1), 10)
	c.s(" Do \nQ\nQ\nQ\n")
}
