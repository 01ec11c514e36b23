package eval

import (
	"bytes"

	"go.yaml.in/yaml/v3"

	"github.com/plinth-calc/plinth/calc/design"
)

// annex returns the partial-factor sets in force for a sheet: the
// EN 1997-1 recommended values, or the file named by factors: (YAML in the
// form of design.Annex, read from inside the package).
func (e *evaluator) annex(s *Sheet) (design.Annex, bool) {
	f := s.Meta.Factors
	if !f.IsSet() || f.Value == "" {
		return design.Recommended(), true
	}
	if a, ok := e.annexes[f.Value]; ok {
		return a.annex, a.ok
	}
	var a design.Annex
	ok := false
	switch {
	case e.pkg.Inside == nil:
		e.errs.Add(f.Span, "factors file %s cannot be read here", f.Value)
	default:
		data, err := e.pkg.Inside.ReadInside(f.Value)
		if err != nil {
			e.errs.Add(f.Span, "factors file %s: %v", f.Value, err)
			break
		}
		dec := yaml.NewDecoder(bytes.NewReader(data))
		dec.KnownFields(true)
		if err := dec.Decode(&a); err != nil {
			e.errs.Add(f.Span, "factors file %s: %v", f.Value, err)
			break
		}
		if len(a.Approaches) == 0 {
			e.errs.Add(f.Span, "factors file %s defines no approaches", f.Value)
			break
		}
		ok = true
		for _, ap := range a.Approaches {
			if err := ap.Validate(); err != nil {
				e.errs.Add(f.Span, "factors file %s: approach %s: %v", f.Value, ap.Name, err)
				ok = false
			}
		}
	}
	if e.annexes == nil {
		e.annexes = map[string]annexEntry{}
	}
	e.annexes[f.Value] = annexEntry{a, ok}
	return a, ok
}

type annexEntry struct {
	annex design.Annex
	ok    bool
}
