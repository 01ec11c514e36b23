package layout

import (
	"fmt"
	"io"
	"strconv"
	"strings"

	"plinth/doc/layout/draw"
)

// Dump writes the box tree as text, one item per line, positions rounded
// to 0.01 pt: the form golden tests compare.
func (p *Pages) Dump(w io.Writer) error {
	d := &dumper{w: w}
	d.printf("pages %d\n", len(p.Pages))
	for _, o := range p.Outline {
		d.printf("bookmark %q page %d y %s\n", o.Title, o.Page+1, num(o.Y))
	}
	for i, pg := range p.Pages {
		d.printf("page %d sheet %d page %d size %s×%s\n", i+1, pg.Sheet+1, pg.Number, num(pg.W), num(pg.H))
		for _, b := range pg.Boxes {
			d.box(b, "  ")
		}
	}
	return d.err
}

type dumper struct {
	w   io.Writer
	err error
}

func (d *dumper) printf(format string, args ...any) {
	if d.err == nil {
		_, d.err = fmt.Fprintf(d.w, format, args...)
	}
}

func (d *dumper) box(b *Box, indent string) {
	d.printf("%sbox %s %s [%s %s %s %s]\n", indent, b.Kind, b.Pos, num(b.X), num(b.Y), num(b.W), num(b.H))
	in := indent + "  "
	for _, it := range b.Items {
		d.printf("%s%s\n", in, ItemString(it))
	}
	for _, k := range b.Kids {
		d.box(k, in)
	}
}

// ItemString describes one primitive on a line, positions rounded to
// 0.01 pt.
func ItemString(it draw.Item) string {
	switch v := it.(type) {
	case draw.Text:
		al := ""
		if v.Align != draw.Left {
			al = []string{"", " center", " right"}[v.Align]
		}
		return fmt.Sprintf("text %s %s %q %s %s%s %q", num(v.X), num(v.Y), v.Face.String(), num(v.Size), v.Color, al, v.Text)
	case draw.Line:
		return fmt.Sprintf("line %s %s %s %s%s", num(v.X1), num(v.Y1), num(v.X2), num(v.Y2), paint(v.Paint))
	case draw.Poly:
		var b strings.Builder
		for i, p := range v.Points {
			if i > 0 {
				b.WriteByte(' ')
			}
			b.WriteString(num(p.X) + "," + num(p.Y))
		}
		kind := "polyline"
		if v.Closed || v.Filled {
			kind = "polygon"
		}
		return fmt.Sprintf("%s [%s]%s", kind, b.String(), paint(v.Paint))
	case draw.Rect:
		return fmt.Sprintf("rect %s %s %s %s%s", num(v.X), num(v.Y), num(v.W), num(v.H), paint(v.Paint))
	case draw.Image:
		return fmt.Sprintf("image %s %s %s %s (%d bytes)", num(v.X), num(v.Y), num(v.W), num(v.H), len(v.Data))
	case draw.Link:
		return fmt.Sprintf("link %s %s %s %s -> %q", num(v.X), num(v.Y), num(v.W), num(v.H), v.Target)
	case draw.Anchor:
		return fmt.Sprintf("anchor %q %s %s", v.Name, num(v.X), num(v.Y))
	}
	return fmt.Sprintf("%T", it)
}

func paint(p draw.Paint) string {
	s := ""
	if p.Width > 0 {
		s += " stroke " + p.Stroke.String() + " " + num(p.Width)
		if len(p.Dash) > 0 {
			ds := make([]string, len(p.Dash))
			for i, x := range p.Dash {
				ds[i] = num(x)
			}
			s += " dash " + strings.Join(ds, ",")
		}
	}
	if p.Filled {
		s += " fill " + p.Fill.String()
	}
	return s
}

// num prints x to 0.01, without a negative zero.
func num(x float64) string {
	s := strconv.FormatFloat(x, 'f', 2, 64)
	if s == "-0.00" {
		return "0.00"
	}
	return s
}
