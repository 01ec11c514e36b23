package eval

import (
	"fmt"
	"math"
	"regexp"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// VarySteps is the number of values a vary range is evaluated at.
const VarySteps = 5

// MaxVaryValues bounds the values the vary lines of one block ask for,
// in all (a range counts VarySteps, a list its values): each value is an
// evaluation of the whole package, and each flip found adds the
// evaluations Brent's method takes (commonly five to ten).
const MaxVaryValues = 40

// varyLine is one vary line read: the input and the values asked for.
type varyLine struct {
	opt  *sheet.Option
	name string
	y    *Symbol
	list bool
	ps   []float64     // the listed values, or the range's two ends (SI)
	at   []source.Span // each value's (or end's) text
}

// varyName is the input a vary line names (the text before its colon),
// "" when there is no colon.
func varyName(o *sheet.Option) string {
	name, _, ok := strings.Cut(o.Value.Value, ":")
	if !ok {
		return ""
	}
	return strings.TrimSpace(name)
}

// varyOptions are an analysis block's vary lines in order.
func varyOptions(a *sheet.Analysis) []*sheet.Option {
	var out []*sheet.Option
	for _, o := range a.Options() {
		if o.Name.Value == "vary" {
			out = append(out, o)
		}
	}
	return out
}

// readVary reads a vary line of sheet s: SYMBOL: FROM .. TO, or
// SYMBOL: V1, V2, …, each a number with a unit of the input's dimension
// or a percentage of its value. It reports what it cannot read.
func (e *evaluator) readVary(s *Sheet, x *sheet.Option) (varyLine, bool) {
	const how = "write vary = site.clay.c_u: 40 kPa .. 80 kPa, or site.clay.c_u: -20 % .. +20 %, or a list of values: site.clay.c_u: 40 kPa, 50 kPa, 60 kPa"
	text := x.Value.Value
	name, rest, ok := strings.Cut(text, ":")
	name = strings.TrimSpace(name)
	if !ok {
		e.errs.AddHint(x.Value.Span, how, "vary = %s: expected SYMBOL: FROM .. TO or SYMBOL: V1, V2, …", text)
		return varyLine{}, false
	}
	var y *Symbol
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		if z := t.local[name]; z != nil {
			y = z
			break
		}
	}
	if y == nil || y.Sheet == nil {
		e.errs.Add(x.Value.Span, "vary: %s is not a symbol of this sheet or a sheet it uses", name)
		return varyLine{}, false
	}
	if y.Expr == nil || len(expr.Idents(y.Expr)) > 0 {
		e.errs.AddHint(x.Value.Span, "vary one of the inputs it comes from", "vary: %s is not an input (it is computed), so it cannot be varied", name)
		return varyLine{}, false
	}
	// span of text[i:j]: the value's own columns when the option's text is
	// the file's, else the whole value
	sub := func(i, j int) source.Span {
		for i < j && text[i] == ' ' {
			i++
		}
		for j > i && text[j-1] == ' ' {
			j--
		}
		if x.Value.Span.Text() != text {
			return x.Value.Span
		}
		return source.Span{File: x.Value.Span.File, Start: x.Value.Span.Start + i, End: x.Value.Span.Start + j}
	}
	base := strings.Index(text, ":") + 1 // after the colon
	var pieces []string
	var at []source.Span
	list := !strings.Contains(rest, "..")
	if list {
		off := base
		for _, p := range strings.Split(rest, ",") {
			pieces, at = append(pieces, p), append(at, sub(off, off+len(p)))
			off += len(p) + 1
		}
		if len(pieces) < 2 {
			e.errs.AddHint(x.Value.Span, "give a range (site.clay.c_u: 40 kPa .. 80 kPa) or at least two values (site.clay.c_u: 40 kPa, 60 kPa)", "vary = %s: one value, so nothing is varied", text)
			return varyLine{}, false
		}
	} else {
		lo, hi, _ := strings.Cut(rest, "..")
		if strings.Contains(hi, "..") || strings.Contains(rest, ",") {
			e.errs.AddHint(x.Value.Span, how, "vary = %s: expected SYMBOL: FROM .. TO or SYMBOL: V1, V2, …", text)
			return varyLine{}, false
		}
		pieces = []string{lo, hi}
		at = []source.Span{sub(base, base+len(lo)), sub(base+len(lo)+2, len(text))}
	}
	ps := make([]float64, len(pieces))
	for i, p := range pieces {
		v, msg := varyValue(strings.TrimSpace(p), y)
		if msg != "" {
			e.errs.AddHint(at[i], "each value a number with the unit of "+name+" ("+y.Unit.Name+"), or a percentage of its value", "vary: %s", msg)
			return varyLine{}, false
		}
		ps[i] = v
	}
	if !list && ps[0] > ps[1] {
		ps[0], ps[1], at[0], at[1] = ps[1], ps[0], at[1], at[0]
	}
	if list {
		for i := 1; i < len(ps); i++ {
			if !(ps[i] > ps[i-1]) {
				e.errs.AddHint(at[i], "list the values from the least to the greatest, each once", "vary: the values must rise: %s after %s", strings.TrimSpace(pieces[i]), strings.TrimSpace(pieces[i-1]))
				return varyLine{}, false
			}
		}
	} else if ps[0] == ps[1] {
		e.errs.Add(x.Value.Span, "vary = %s: the range is empty: give two different ends", text)
		return varyLine{}, false
	}
	return varyLine{opt: x, name: name, y: y, list: list, ps: ps, at: at}, true
}

// numberRE is a vary value: a number, then its unit (with or without a
// space: 40 kPa, 35°).
var numberRE = regexp.MustCompile(`^([+-]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*(.*)$`)

// varyValue reads one value of a vary line: a number with a unit of y's
// dimension (SI returned), or a percentage of y's value. It returns a
// message when it cannot.
func varyValue(t string, y *Symbol) (float64, string) {
	if strings.HasSuffix(t, "%") {
		f, err := strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(t, "%")), 64)
		if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
			return 0, fmt.Sprintf("cannot read %q as a percentage", t)
		}
		return y.Q.V * (1 + f/100), ""
	}
	m := numberRE.FindStringSubmatch(t)
	if m == nil {
		return 0, fmt.Sprintf("cannot read %q as a value", t)
	}
	f, err := strconv.ParseFloat(m[1], 64)
	if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
		return 0, fmt.Sprintf("cannot read %q as a value", t)
	}
	u, err := units.Parse(m[2])
	if err != nil {
		return 0, fmt.Sprintf("%s: %v", t, err)
	}
	if u.Dim != y.Q.Dim {
		return 0, fmt.Sprintf("%s is %s, but %s is %s", t, dimWords(u.Dim), y.Name, dimWords(y.Q.Dim))
	}
	return f * u.SIFactor(), ""
}
