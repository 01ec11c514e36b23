package eval

import (
	"crypto/sha256"
	"encoding/binary"
	"encoding/hex"
	"fmt"
	"path/filepath"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// parseOverrides reads the --set arguments and finds the input each one
// replaces. Errors point into a pseudo-file named "--set" holding the
// argument, so "--set c_u=55kPx:1:8: unknown unit" shows the column.
func (e *evaluator) parseOverrides(args []string) {
	e.over = map[*Sheet]map[string]*Override{}
	for _, arg := range args {
		f := source.NewFile("--set "+arg, []byte(arg))
		o := &Override{Arg: arg}
		lhs, rhs, ok := strings.Cut(arg, "=")
		if !ok {
			e.errs.Add(spanOf(f, 0, len(arg)), "expected name=value, e.g. --set c_u=55kPa")
			continue
		}
		name := strings.TrimSpace(lhs)
		if i := strings.LastIndex(name, ".md:"); i >= 0 {
			o.Sheet, name = name[:i+3], name[i+4:]
		}
		o.Name = name
		valStart := len(lhs) + 1
		x, errs := expr.ParseExpr(rhs, valStart)
		if len(errs) > 0 {
			e.addErrs(f, errs)
			continue
		}
		if ids := expr.Idents(x); len(ids) > 0 {
			e.errs.Add(spanOf(f, ids[0].Pos, ids[0].End), "a --set value must be a number with its unit, not a symbol")
			continue
		}
		q, errs := expr.Eval(x, expr.MapEnv{})
		if len(errs) > 0 {
			e.addErrs(f, errs)
			continue
		}
		o.Q = q
		o.Unit = units.Display(q.Dim)
		if n, ok := x.(*expr.Num); ok && n.HasUnit {
			o.Unit = n.Unit
		}
		t, sp := e.overrideTarget(f, o)
		if t == nil {
			continue
		}
		d, _ := e.lookupDef(t.Index, name)
		if !d.input {
			e.errs.Add(spanOf(f, 0, len(lhs)), "%s on %s is calculated (%s), not an input: only inputs can be set", name, t.Name(), posText(d.span, nil))
			continue
		}
		if d.dim != q.Dim {
			e.errs.Add(sp, "%s is %s but the value given is %s", name, dimWords(d.dim), dimWords(q.Dim))
			continue
		}
		if e.over[t] == nil {
			e.over[t] = map[string]*Override{}
		}
		if e.over[t][name] != nil {
			e.errs.Add(spanOf(f, 0, len(arg)), "%s on %s is set twice", name, t.Name())
			continue
		}
		e.over[t][name] = o
		e.res.Overrides = append(e.res.Overrides, o)
	}
}

// collectAssumable records, per sheet, the assumed values --set may give
// though no statement defines them: NAME.gamma_w of each ground block
// (default 9.81 kN/m³) and NAME.gamma_c and NAME.h of each footing block
// (defaults 24 kN/m³ and D).
func (e *evaluator) collectAssumable() {
	e.assumable = make([]map[string]def, len(e.res.Sheets))
	for i := range e.res.Sheets {
		m := map[string]def{}
		for _, g := range e.blockNames[i]["ground"] {
			m[g+".gamma_w"] = def{input: true, dim: units.UnitWeight}
		}
		for _, f := range e.blockNames[i]["footing"] {
			m[f+".gamma_c"] = def{input: true, dim: units.UnitWeight}
			m[f+".h"] = def{input: true, dim: units.Length}
		}
		for n := range m {
			if _, ok := e.defs[i][n]; ok {
				delete(m, n) // written: an ordinary input
			}
		}
		e.assumable[i] = m
	}
}

// lookupDef finds name on sheet index i: a definition, or an assumed
// value --set may give.
func (e *evaluator) lookupDef(i int, name string) (def, bool) {
	if d, ok := e.defs[i][name]; ok {
		return d, true
	}
	d, ok := e.assumable[i][name]
	return d, ok
}

// assumedOverride returns the symbol a --set of an assumed value (one no
// statement defines) makes, placed at the block's name; nil when there
// is none.
func (e *evaluator) assumedOverride(s *Sheet, name string, at source.Span) *Symbol {
	o := e.over[s][name]
	if o == nil || s.local[name] != nil {
		return nil
	}
	y := &Symbol{Name: name, Q: o.Q, Unit: o.Unit, Decimals: -1, Span: at, Sheet: s, Input: true, Override: o,
		Note: sheet.Str{Value: "assumed value given by --set"}}
	o.Target = y
	s.local[name] = y
	s.Symbols = append(s.Symbols, y)
	return y
}

// overrideTarget finds the sheet an override applies to.
func (e *evaluator) overrideTarget(f *source.File, o *Override) (*Sheet, source.Span) {
	nameSpan := spanOf(f, 0, strings.Index(o.Arg, "="))
	valSpan := spanOf(f, nameSpan.End+1, len(o.Arg))
	if o.Sheet != "" {
		t := e.res.byName[o.Sheet]
		if t == nil {
			e.errs.Add(nameSpan, "no sheet named %s in this package", o.Sheet)
			return nil, valSpan
		}
		if _, ok := e.lookupDef(t.Index, o.Name); !ok {
			e.errs.AddHint(nameSpan, e.nearest(o.Name, t), "%s is not defined on %s", o.Name, o.Sheet)
			return nil, valSpan
		}
		return t, valSpan
	}
	var found []*Sheet
	for _, s := range e.res.Sheets {
		if _, ok := e.lookupDef(s.Index, o.Name); ok {
			found = append(found, s)
		}
	}
	switch len(found) {
	case 0:
		e.errs.AddHint(nameSpan, e.nearest(o.Name, nil), "%s is not defined on any sheet", o.Name)
		return nil, valSpan
	case 1:
		return found[0], valSpan
	}
	var where []string
	for _, s := range found {
		d, _ := e.lookupDef(s.Index, o.Name)
		where = append(where, posText(d.span, nil))
	}
	e.errs.AddHint(nameSpan, fmt.Sprintf("write --set %s:%s=...", found[0].Name(), o.Name),
		"%s is defined on several sheets: %s", o.Name, strings.Join(where, ", "))
	return nil, valSpan
}

// nearest suggests a defined name close to name (on s, or anywhere).
func (e *evaluator) nearest(name string, s *Sheet) string {
	var names []string
	for _, t := range e.res.Sheets {
		if s == nil || s == t {
			names = append(names, sortedKeys(e.defs[t.Index])...)
		}
	}
	if n, ok := suggest.Nearest(name, names); ok {
		return fmt.Sprintf("did you mean %s?", n)
	}
	return ""
}

// dimWords names a dimension for messages: "a stress (kPa)".
func dimWords(d units.Dim) string {
	kinds := []struct {
		d    units.Dim
		word string
	}{
		{units.Length, "a length"}, {units.Area, "an area"}, {units.Volume, "a volume"},
		{units.Force, "a force"}, {units.Pressure, "a stress"}, {units.UnitWeight, "a unit weight"},
		{units.LineLoad, "a force per metre"}, {units.Moment, "a moment"}, {units.Angle, "an angle"},
		{units.Time, "a time"}, {units.Compliance, "a compressibility"}, {units.Diffusivity, "a consolidation coefficient"},
		{units.Mass, "a mass"}, {units.Velocity, "a velocity"},
		{units.Accel, "an acceleration"}, {units.Density, "a density"},
	}
	if d.IsNone() {
		return "a pure number"
	}
	u := units.Display(d).Name
	for _, k := range kinds {
		if k.d == d {
			return k.word + " (" + u + ")"
		}
	}
	return "a quantity in " + u
}

// Fingerprint is the SHA-256 of the package's source files in order (each
// as its file name, length and bytes) followed by the --set arguments in
// force. File names, not paths, enter it, so the same package gives the
// same fingerprint wherever it lies and however its path was typed. A
// printed document carries its first 12 hex digits on every page.
func (r *Result) Fingerprint() string {
	var names []string
	var texts [][]byte
	for _, f := range r.Src.Files {
		names = append(names, filepath.Base(f.Path))
		texts = append(texts, f.Text)
	}
	var sets []string
	for _, o := range r.Overrides {
		sets = append(sets, o.Arg)
	}
	return Fingerprint(names, texts, sets)
}

// Fingerprint is the one definition of the input fingerprint: the SHA-256
// of each file's name and bytes in order (each preceded by its length)
// and then each --set argument as "--set ARG". plinth verify recomputes it
// from the files a PDF embeds with this same function.
func Fingerprint(names []string, texts [][]byte, sets []string) string {
	h := sha256.New()
	var n [8]byte
	put := func(b []byte) {
		binary.BigEndian.PutUint64(n[:], uint64(len(b)))
		h.Write(n[:])
		h.Write(b)
	}
	for i, name := range names {
		put([]byte(name))
		put(texts[i])
	}
	for _, s := range sets {
		put([]byte("--set " + s))
	}
	return hex.EncodeToString(h.Sum(nil))
}
