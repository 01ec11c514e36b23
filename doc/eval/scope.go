package eval

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// scope resolves names for one statement: the block's own symbols (when
// inside a ground or footing block), then the sheet's, then the used
// sheets'.
type scope struct {
	e      *evaluator
	s      *Sheet
	prefix string // "P1." inside footing P1
	all    bool   // prose: any symbol of the sheet, wherever defined
}

// find returns the symbol a name refers to.
func (sc scope) find(name string) *Symbol {
	if sc.prefix != "" {
		if y := sc.s.local[sc.prefix+name]; y != nil {
			return y
		}
	}
	if y := sc.s.local[name]; y != nil {
		return y
	}
	for _, t := range sc.s.Uses {
		if y := t.local[name]; y != nil {
			return y
		}
	}
	return nil
}

// Lookup implements expr.Env.
func (sc scope) Lookup(name string) (units.Quantity, bool) {
	if y := sc.find(name); y != nil {
		return y.Q, true
	}
	return units.Quantity{}, false
}

// resolve finds every symbol n reads. It reports each unresolved one with
// what the engineer most likely meant, and returns ok=false if any is
// unresolved (or failed earlier, which was reported then).
func (sc scope) resolve(n expr.Node, file *source.File) ([]*Symbol, bool) {
	var used []*Symbol
	seen := map[*Symbol]bool{}
	ok := true
	for _, id := range expr.Idents(n) {
		y := sc.find(id.Name)
		if y != nil {
			if !seen[y] {
				seen[y] = true
				used = append(used, y)
			}
			continue
		}
		ok = false
		sp := source.Span{File: file, Start: id.Pos, End: id.End}
		sc.unresolved(id.Name, sp)
	}
	return used, ok
}

// unresolved reports a name that has no value here.
func (sc scope) unresolved(name string, sp source.Span) {
	e, s := sc.e, sc.s
	for _, full := range sc.candidates(name) {
		if e.failed[s.Name()+"\x00"+full] {
			return // its own error was reported
		}
		if d, ok := e.defs[s.Index][full]; ok && d.late {
			if e.pastVary {
				return // the vary runs reported why it is missing, or earlier errors stopped them
			}
			e.errs.AddHint(sp, "quote it in prose ({"+full+"}), which is read after the vary runs", "%s is a result of the vary option at %s, computed after every block of the package, so a statement cannot use it", name, posText(d.span, s.Src.File))
			return
		} else if ok {
			e.errs.Add(sp, "%s is used above its definition at %s", name, posText(d.span, s.Src.File))
			return
		}
		for _, t := range s.Uses {
			if e.failed[t.Name()+"\x00"+full] {
				return
			}
		}
	}
	for _, t := range e.res.Sheets {
		if t == s {
			continue
		}
		if d, ok := e.defs[t.Index][name]; ok {
			e.errs.AddHint(sp, fmt.Sprintf("add %s to this sheet's uses", t.Name()),
				"%s is defined on %s, which this sheet does not use", name, posText(d.span, nil))
			return
		}
	}
	hint := ""
	if near, ok := suggest.Nearest(name, sc.visible()); ok {
		hint = fmt.Sprintf("did you mean %s?", near)
	}
	e.errs.AddHint(sp, hint, "undefined symbol %s", name)
}

// candidates are the full names a name may stand for here.
func (sc scope) candidates(name string) []string {
	if sc.prefix != "" {
		return []string{sc.prefix + name, name}
	}
	return []string{name}
}

// visible lists the names that could be meant here, for suggestions.
func (sc scope) visible() []string {
	var out []string
	add := func(m map[string]def) {
		for n := range m {
			if sc.prefix != "" && strings.HasPrefix(n, sc.prefix) {
				out = append(out, strings.TrimPrefix(n, sc.prefix))
			}
			out = append(out, n)
		}
	}
	add(sc.e.defs[sc.s.Index])
	for _, t := range sc.s.Uses {
		add(sc.e.defs[t.Index])
	}
	for _, t := range sc.s.Uses {
		for n := range t.local {
			out = append(out, n)
		}
	}
	for n := range sc.s.local {
		out = append(out, n)
	}
	return sortedUnique(out)
}

func sortedUnique(in []string) []string {
	m := map[string]bool{}
	for _, s := range in {
		m[s] = true
	}
	return sortedKeys(m)
}

// addErrs reports expression errors (file offsets) as diagnostics.
func (e *evaluator) addErrs(f *source.File, errs []expr.Error) {
	for _, x := range errs {
		e.errs.Add(source.Span{File: f, Start: x.Pos, End: x.End}, "%s", x.Msg)
	}
}
