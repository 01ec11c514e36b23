package layout

import (
	"fmt"
	"io"
	"strconv"

	"github.com/plinth-calc/plinth/doc/layout/draw"
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
		d.printf("%s%s\n", in, draw.String(it))
	}
	for _, k := range b.Kids {
		d.box(k, in)
	}
}

// num prints x to 0.01, without a negative zero.
func num(x float64) string {
	s := strconv.FormatFloat(x, 'f', 2, 64)
	if s == "-0.00" {
		return "0.00"
	}
	return s
}
