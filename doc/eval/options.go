package eval

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// opts are an analysis block's options by name, values checked against
// sheet.Options: a word option holds one of its words, other options are
// read by the accessor that knows their form.
type opts map[string]*sheet.Option

// options reads and checks an analysis block's options. It returns nil if
// any is invalid (the errors are reported).
func (e *evaluator) options(b *sheet.Analysis) opts {
	out := opts{}
	ok := true
	for _, o := range b.Options() {
		spec, known := sheet.LookupOption(b.Kind, o.Name.Value)
		if !known {
			continue // reported by the parser
		}
		if prev := out[o.Name.Value]; prev != nil && !spec.Repeat {
			e.errs.Add(o.Name.Span, "option %s is given twice (first at %s)", o.Name.Value, posText(prev.Span, o.Span.File))
			ok = false
			continue
		}
		if prev := out[o.Name.Value]; prev == nil {
			out[o.Name.Value] = o // a repeated option: its first line (read in full by its own reader)
		}
		v := strings.TrimSpace(o.Value.Value)
		if spec.Words != nil && spec.Form == "" && !spec.Allows(v) {
			hint := ""
			if n, near := suggest.Nearest(v, spec.Words); near {
				hint = fmt.Sprintf("did you mean %s?", n)
			}
			e.errs.AddHint(o.Value.Span, hint, "%s = %q: expected %s", spec.Name, v, strings.Join(spec.Words, ", "))
			ok = false
		}
	}
	if !ok {
		return nil
	}
	return out
}

// word returns a word option's value, or def when absent.
func (o opts) word(name, def string) string {
	if x := o[name]; x != nil {
		return strings.TrimSpace(x.Value.Value)
	}
	return def
}

// quantity evaluates an option holding one value with a unit of
// dimension d. It returns ok=false (reported) for a bad value.
func (e *evaluator) quantity(sc scope, o *sheet.Option, d units.Dim, what string) (units.Quantity, bool) {
	n, errs := expr.ParseExpr(o.Value.Value, o.Value.Span.Start)
	if len(errs) > 0 {
		e.addErrs(o.Span.File, errs)
		return units.Quantity{}, false
	}
	if _, ok := sc.resolve(n, o.Span.File); !ok {
		return units.Quantity{}, false
	}
	q, errs := expr.Eval(n, sc)
	if len(errs) > 0 {
		e.addErrs(o.Span.File, errs)
		return units.Quantity{}, false
	}
	if q.Dim != d {
		e.errs.Add(o.Value.Span, "%s = %s: expected %s (%s)", o.Name.Value, o.Value.Value, what, dimWords(d))
		return units.Quantity{}, false
	}
	return q, true
}

// list evaluates an option holding a comma-separated list of values of
// dimension d ("1.0 m, 1.5 m, 2.0 m").
func (e *evaluator) list(sc scope, o *sheet.Option, d units.Dim, what string) ([]units.Quantity, bool) {
	ns, errs := expr.ParseList(o.Value.Value, o.Value.Span.Start)
	if len(errs) > 0 {
		e.addErrs(o.Span.File, errs)
		return nil, false
	}
	var out []units.Quantity
	ok := true
	for _, n := range ns {
		if _, rok := sc.resolve(n, o.Span.File); !rok {
			ok = false
			continue
		}
		q, errs := expr.Eval(n, sc)
		if len(errs) > 0 {
			e.addErrs(o.Span.File, errs)
			ok = false
			continue
		}
		if q.Dim != d {
			p, end := n.Span()
			e.errs.Add(spanOf(o.Span.File, p, end), "%s: each value must be %s (%s), not %s", o.Name.Value, what, dimWords(d), dimWords(q.Dim))
			ok = false
			continue
		}
		out = append(out, q)
	}
	if ok && len(out) == 0 {
		e.errs.Add(o.Value.Span, "%s needs at least one value", o.Name.Value)
		ok = false
	}
	return out, ok
}
