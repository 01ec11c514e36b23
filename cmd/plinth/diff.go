package main

import (
	"fmt"
	"math"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// changes is what differs between two evaluated packages, in the order
// diff prints it. It is also the JSON of "plinth diff --json" (an
// interface: fields are added, never renamed or removed).
type changes struct {
	Old     diffSide      `json:"old"`
	New     diffSide      `json:"new"`
	Sheets  []sheetMatch  `json:"sheets"`
	Flipped []checkChange `json:"checks_flipped"` // OK → NOT OK first
	Added   []checkChange `json:"checks_added"`
	Removed []checkChange `json:"checks_removed"`
	Results []valueChange `json:"results_changed"`
	Inputs  []valueChange `json:"inputs_changed"`
	Fields  []fieldChange `json:"fields_changed"`
	Errors  []diffError   `json:"errors"`
	Version string        `json:"version"`
}

type diffSide struct {
	Spec        string   `json:"spec"`
	Fingerprint string   `json:"fingerprint"`
	Revision    string   `json:"revision"`
	Sets        []string `json:"sets"`
}

// sheetMatch pairs a sheet of each side: by calc number, else by file
// name; a sheet on one side only has the other name empty.
type sheetMatch struct {
	Old string `json:"old"`
	New string `json:"new"`
	By  string `json:"by"` // "calc", "name", or "" for a sheet on one side
}

type checkChange struct {
	Sheet   string   `json:"sheet"`
	Expr    string   `json:"expr"`
	Old     string   `json:"old"` // OK, NOT OK, or "" when added
	New     string   `json:"new"`
	OldUtil *float64 `json:"old_util"`
	NewUtil *float64 `json:"new_util"`
	File    string   `json:"file"`
	Line    int      `json:"line"`
}

type valueChange struct {
	Sheet   string   `json:"sheet"`
	Name    string   `json:"name"`
	Old     string   `json:"old"` // displayed value, "" when added
	New     string   `json:"new"` // "" when removed
	Percent *float64 `json:"percent"`
	OldFile string   `json:"old_file"`
	OldLine int      `json:"old_line"`
	NewFile string   `json:"new_file"`
	NewLine int      `json:"new_line"`
}

type fieldChange struct {
	Sheet string `json:"sheet"` // "" for package.yaml
	Field string `json:"field"`
	Old   string `json:"old"`
	New   string `json:"new"`
}

type diffError struct {
	Side    string `json:"side"` // old or new
	Message string `json:"message"`
}

// becameNotOK reports whether a check is NOT OK in the new package that
// was OK (or absent) in the old.
func (c *changes) becameNotOK() bool {
	for _, f := range c.Flipped {
		if f.New == "NOT OK" {
			return true
		}
	}
	for _, a := range c.Added {
		if a.New == "NOT OK" {
			return true
		}
	}
	return false
}

// compare finds the changes from a to b.
func compare(a, b *side) *changes {
	c := &changes{Old: sideInfo(a), New: sideInfo(b), Sheets: []sheetMatch{}, Flipped: []checkChange{}, Added: []checkChange{},
		Removed: []checkChange{}, Results: []valueChange{}, Inputs: []valueChange{}, Fields: []fieldChange{}, Errors: []diffError{}, Version: Version()}
	pairs := matchSheets(a.res, b.res)
	for _, p := range pairs {
		m := sheetMatch{By: p.by}
		if p.a != nil {
			m.Old = p.a.Name()
		}
		if p.b != nil {
			m.New = p.b.Name()
		}
		c.Sheets = append(c.Sheets, m)
	}
	c.Fields = append(c.Fields, metaChanges("", &a.res.Src.Meta, &b.res.Src.Meta)...)
	var ups, downs []checkChange
	for _, p := range pairs {
		name := ""
		if p.b != nil {
			name = p.b.Name()
		} else {
			name = p.a.Name()
		}
		if p.a != nil && p.b != nil {
			c.Fields = append(c.Fields, metaChanges(name, &p.a.Src.Meta, &p.b.Src.Meta)...)
		}
		ca, cb := checkKeys(p.a), checkKeys(p.b)
		for _, k := range cb.order {
			nc := cb.m[k]
			oc, ok := ca.m[k]
			ch := checkChange{Sheet: name, Expr: nc.Text, New: nc.Verdict(), NewUtil: util(nc)}
			ch.File, ch.Line = b.where(nc.Span)
			if !ok {
				c.Added = append(c.Added, ch)
				continue
			}
			ch.Old, ch.OldUtil = oc.Verdict(), util(oc)
			if oc.OK && !nc.OK {
				downs = append(downs, ch)
			} else if !oc.OK && nc.OK {
				ups = append(ups, ch)
			}
		}
		for _, k := range ca.order {
			if _, ok := cb.m[k]; !ok {
				oc := ca.m[k]
				ch := checkChange{Sheet: name, Expr: oc.Text, Old: oc.Verdict(), OldUtil: util(oc)}
				ch.File, ch.Line = a.where(oc.Span)
				c.Removed = append(c.Removed, ch)
			}
		}
		ya, yb := symbols(p.a), symbols(p.b)
		for _, y := range orderOf(p.b) {
			o := ya[y.Name]
			if v, ok := valueDiff(a, b, name, o, y); ok {
				if y.Input && (o == nil || o.Input) {
					c.Inputs = append(c.Inputs, v)
				} else {
					c.Results = append(c.Results, v)
				}
			}
		}
		for _, y := range orderOf(p.a) {
			if yb[y.Name] == nil {
				v, _ := valueDiff(a, b, name, y, nil)
				if y.Input {
					c.Inputs = append(c.Inputs, v)
				} else {
					c.Results = append(c.Results, v)
				}
			}
		}
	}
	c.Flipped = append(append(c.Flipped, downs...), ups...)
	return c
}

func sideInfo(s *side) diffSide {
	d := diffSide{Spec: s.spec, Sets: []string{}}
	if s.res != nil {
		d.Fingerprint = s.res.Fingerprint()
		d.Revision = s.res.Src.Meta.Revision.Value
		for _, o := range s.res.Overrides {
			d.Sets = append(d.Sets, o.Arg)
		}
	}
	return d
}

func util(c *eval.Check) *float64 {
	if !c.HasUtil() {
		return nil
	}
	u := c.Util
	return &u
}

type pair struct {
	a, b *eval.Sheet
	by   string
}

// matchSheets pairs the sheets of a and b: first by calc number (when it
// is given and unique on both sides), then by file name; the pairs come in
// b's order, then a's sheets that have no partner.
func matchSheets(a, b *eval.Result) []pair {
	calcs := func(r *eval.Result) map[string]*eval.Sheet {
		m, dup := map[string]*eval.Sheet{}, map[string]bool{}
		for _, s := range r.Sheets {
			k := s.Src.Meta.Calc.Value
			if k == "" {
				continue
			}
			if m[k] != nil {
				dup[k] = true
			}
			m[k] = s
		}
		for k := range dup {
			delete(m, k)
		}
		return m
	}
	ca, cb := calcs(a), calcs(b)
	used := map[*eval.Sheet]bool{}
	var out []pair
	for _, s := range b.Sheets {
		if k := s.Src.Meta.Calc.Value; k != "" && cb[k] == s && ca[k] != nil && !used[ca[k]] {
			used[ca[k]] = true
			out = append(out, pair{ca[k], s, "calc"})
			continue
		}
		out = append(out, pair{nil, s, ""})
	}
	for i := range out {
		if out[i].a != nil {
			continue
		}
		if o := a.Sheet(out[i].b.Name()); o != nil && !used[o] {
			used[o] = true
			out[i].a, out[i].by = o, "name"
		}
	}
	for _, s := range a.Sheets {
		if !used[s] {
			out = append(out, pair{s, nil, ""})
		}
	}
	return out
}

type checkSet struct {
	order []string
	m     map[string]*eval.Check
}

// checkKeys keys a sheet's checks by their text and occurrence.
func checkKeys(s *eval.Sheet) checkSet {
	cs := checkSet{m: map[string]*eval.Check{}}
	if s == nil {
		return cs
	}
	seen := map[string]int{}
	for _, c := range s.Checks {
		seen[c.Text]++
		k := fmt.Sprintf("%s#%d", c.Text, seen[c.Text])
		cs.order = append(cs.order, k)
		cs.m[k] = c
	}
	return cs
}

func symbols(s *eval.Sheet) map[string]*eval.Symbol {
	m := map[string]*eval.Symbol{}
	for _, y := range orderOf(s) {
		if m[y.Name] == nil {
			m[y.Name] = y
		}
	}
	return m
}

func orderOf(s *eval.Sheet) []*eval.Symbol {
	if s == nil {
		return nil
	}
	return s.Symbols
}

// valueDiff compares a symbol of each side at the new side's display
// precision (its unit and decimals); o or y is nil when the symbol is on
// one side only.
func valueDiff(a, b *side, sheet string, o, y *eval.Symbol) (valueChange, bool) {
	var v valueChange
	v.Sheet = sheet
	if o != nil {
		v.Name, v.Old = o.Name, o.Text()
		v.OldFile, v.OldLine = a.where(o.Span)
	}
	if y == nil {
		return v, true
	}
	v.Name, v.New = y.Name, y.Text()
	v.NewFile, v.NewLine = b.where(y.Span)
	if o == nil {
		return v, true
	}
	if o.Q.Dim == y.Q.Dim {
		if eval.Format(o.Q, y.Unit, y.Decimals) == v.New {
			return v, false
		}
		if o.Q.V != 0 {
			p := (y.Q.V - o.Q.V) / math.Abs(o.Q.V) * 100
			v.Percent = &p
		}
	}
	return v, true
}

// metaChanges lists the package fields that changed: revision, checker,
// check date, designer and date.
func metaChanges(sheetName string, a, b *sheet.Meta) []fieldChange {
	var out []fieldChange
	for _, f := range []struct {
		name string
		a, b sheet.Str
	}{
		{"revision", a.Revision, b.Revision},
		{"checked", a.Checked, b.Checked},
		{"checked_date", a.CheckedDate, b.CheckedDate},
		{"by", a.By, b.By},
		{"date", a.Date, b.Date},
	} {
		if f.a.Value != f.b.Value {
			out = append(out, fieldChange{Sheet: sheetName, Field: f.name, Old: f.a.Value, New: f.b.Value})
		}
	}
	return out
}
