package draw

import (
	"fmt"
	"strconv"
	"strings"
)

// String describes one primitive on a line, positions rounded to 0.01 pt
// (for golden dumps).
func String(it Item) string {
	switch v := it.(type) {
	case Text:
		al := ""
		if v.Align != Left {
			al = []string{"", " center", " right"}[v.Align]
		}
		return fmt.Sprintf("text %s %s %q %s %s%s %q", num(v.X), num(v.Y), v.Face.String(), num(v.Size), v.Color, al, v.Text)
	case Line:
		return fmt.Sprintf("line %s %s %s %s%s", num(v.X1), num(v.Y1), num(v.X2), num(v.Y2), paint(v.Paint))
	case Poly:
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
	case Rect:
		return fmt.Sprintf("rect %s %s %s %s%s", num(v.X), num(v.Y), num(v.W), num(v.H), paint(v.Paint))
	case Image:
		return fmt.Sprintf("image %s %s %s %s (%d bytes)", num(v.X), num(v.Y), num(v.W), num(v.H), len(v.Data))
	case Link:
		return fmt.Sprintf("link %s %s %s %s -> %q", num(v.X), num(v.Y), num(v.W), num(v.H), v.Target)
	case Anchor:
		return fmt.Sprintf("anchor %q %s %s", v.Name, num(v.X), num(v.Y))
	}
	return fmt.Sprintf("%T", it)
}

func paint(p Paint) string {
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

// Dump describes items one a line (see String).
func Dump(items []Item) string {
	var b strings.Builder
	for _, it := range items {
		b.WriteString(String(it))
		b.WriteByte('\n')
	}
	return b.String()
}

// num prints x to 0.01, without a negative zero.
func num(x float64) string {
	s := strconv.FormatFloat(x, 'f', 2, 64)
	if s == "-0.00" {
		return "0.00"
	}
	return s
}
