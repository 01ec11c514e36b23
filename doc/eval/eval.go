package eval

import (
	"fmt"
	"path/filepath"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/size"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// Options control an evaluation.
type Options struct {
	// Set holds --set arguments: "name=value" or "sheet.md:name=value".
	Set []string
	// Prior holds the diagnostics of the earlier stages (load, parse), so
	// that a package with parse errors is still evaluated and every
	// independent error of the run is listed: a statement on a line with
	// a prior error is not evaluated (its name counts as failed, so its
	// uses are not reported again), and no evaluation diagnostic is added
	// on a line that already has one.
	Prior source.List
	// noVary is set on the runs the vary option makes, which vary
	// nothing themselves.
	noVary bool
}

// Package evaluates every sheet of p. It returns the result even when
// there are errors, so a caller can list every problem of the run; a
// result with errors must not be rendered.
func Package(p *sheet.Package, opt Options) (res *Result, diags source.List) {
	e := &evaluator{pkg: p, res: &Result{Src: p, byName: map[string]*Sheet{}}, prior: opt.Prior.Lines()}
	defer func() {
		// A defect of plinth's own must not take the caller down: it
		// becomes an error at the block or statement being evaluated.
		if r := recover(); r != nil {
			diags = append(e.errs, internalError(e.at, p.Dir, r))
			res = e.res
		}
	}()
	for i, s := range p.Sheets {
		es := &Sheet{
			Src: s, Meta: p.Effective(s), Index: i,
			stmts:    map[*sheet.Stmt]any{},
			interps:  map[*sheet.Interp]*Interp{},
			local:    map[string]*Symbol{},
			blocks:   map[sheet.Block]*Block{},
			grounds:  map[string]*Ground{},
			footings: map[string]*Footing{},
		}
		e.res.Sheets = append(e.res.Sheets, es)
		e.res.byName[es.Name()] = es
	}
	e.defs = make([]map[string]def, len(e.res.Sheets))
	e.blockNames = make([]map[string][]string, len(e.res.Sheets))
	e.tables = map[*sheet.Grid]*table{}
	for i, s := range e.res.Sheets {
		e.defs[i] = e.collect(s)
	}
	e.resolveUses()
	e.collectAssumable()
	e.parseOverrides(opt.Set)
	for _, s := range e.order() {
		e.sheet(s)
	}
	e.varyAll(opt)
	e.pastVary = true
	e.splitContext()
	e.register()
	e.bounds()
	for _, s := range e.res.Sheets {
		if opt.noVary {
			break // a vary run reads blocks only; its prose may quote the vary results, which it has not
		}
		e.prose(s)
	}
	e.errs = e.errs.OffLines(e.prior)
	e.errs.Sort()
	return e.res, e.errs
}

// splitContext moves the context sheets (pulled in by uses for a
// single-sheet run) out of the printed sheets.
func (e *evaluator) splitContext() {
	var printed []*Sheet
	for _, s := range e.res.Sheets {
		if s.Src.Context {
			e.res.Context = append(e.res.Context, s)
		} else {
			printed = append(printed, s)
		}
	}
	e.res.Sheets = printed
}

// def is a name defined on a sheet, found before evaluation.
type def struct {
	span  source.Span
	input bool      // a value given directly (no symbol in its expression)
	dim   units.Dim // an input's dimension (for checking --set values)
	late  bool      // a vary result: defined after every block, for prose only
}

type evaluator struct {
	pkg  *sheet.Package
	res  *Result
	errs source.List
	defs []map[string]def // per sheet index
	// assumable are the values the engine assumes when a block does not
	// give them (ground gamma_w, footing gamma_c and h), per sheet index:
	// --set may give them though no statement defines them.
	assumable  []map[string]def
	failed     map[string]bool // "sheet\x00name" of symbols whose evaluation failed
	over       map[*Sheet]map[string]*Override
	tables     map[*sheet.Grid]*table
	blockNames []map[string][]string // per sheet: "ground"/"footing" → names defined
	annexes    map[string]annexEntry
	prior      map[source.Line]bool // lines with an earlier stage's error
	at         source.Span          // the block or statement being evaluated, for internal errors
	// pastVary is set once the vary runs are done (or skipped for earlier
	// errors, or in a vary run itself): a vary result missing then has
	// its own error, or none is due
	pastVary bool
}

// internalError is the diagnostic for a panic inside plinth: it names the
// input being processed and asks for a report, since no input should
// cause one.
func internalError(at source.Span, dir string, r any) source.Diagnostic {
	d := source.Diagnostic{Span: at, Path: dir, Msg: fmt.Sprintf("internal error while evaluating this (please report): %v", r)}
	if at.File != nil {
		d.Span.End = d.Span.Start
	}
	return d
}

// spoilt reports whether the line at sp holds an earlier stage's error.
func (e *evaluator) spoilt(sp source.Span) bool {
	if len(e.prior) == 0 || sp.File == nil {
		return false
	}
	return e.prior[source.LineOf(sp)]
}

// collect finds every name a sheet defines, reporting redefinitions.
func (e *evaluator) collect(s *Sheet) map[string]def {
	defs := map[string]def{}
	add := func(name string, d def) {
		if old, ok := defs[name]; ok {
			e.errs.Add(d.span, "%s is already defined at %s", name, posText(old.span, s.Src.File))
			return
		}
		defs[name] = d
	}
	for _, b := range s.Src.Body {
		prefix := blockPrefix(b)
		for _, st := range blockStmts(b) {
			if a, ok := st.X.(*expr.Assign); ok {
				d := def{span: symSpan(st, a), input: len(expr.Idents(a.X)) == 0}
				if d.input {
					d.dim, _ = expr.Dims(a.X, expr.MapEnv{})
				}
				add(prefix+a.Sym.Name, d)
			}
		}
		for _, c := range e.tableDefs(b) {
			add(c.name, c.def)
		}
		e.blockDefs(s, b, add, func(name string) bool { _, ok := defs[name]; return ok })
	}
	return defs
}

// tableDefs reads a ground or footing table (once, kept for evaluation)
// and lists the symbols its cells define.
func (e *evaluator) tableDefs(b sheet.Block) []namedDef {
	var t *table
	switch b := b.(type) {
	case *sheet.Ground:
		if b.Table != nil {
			t = e.readTable(b.Table, groundColumns, b.Name.Value+".", "layer", "L")
			e.tables[b.Table] = t
		}
	case *sheet.Footing:
		if b.Table != nil {
			t = e.readTable(b.Table, footingCol, b.Name.Value+".", "action", "A")
			e.tables[b.Table] = t
		}
	case *sheet.Analysis:
		if b.Kind == sheet.KindSchedule && b.Table != nil {
			t = e.readTable(b.Table, scheduleCol, b.ResultPrefix().Value+".", "footing", "F")
			e.tables[b.Table] = t
		}
	}
	if t == nil || !t.ok {
		return nil
	}
	return t.defs()
}

// blockDefs records ground, footing and analysis names, and the result
// symbols an analysis will define.
func (e *evaluator) blockDefs(s *Sheet, b sheet.Block, add func(string, def), has func(string) bool) {
	names := e.blockNames[s.Index]
	if names == nil {
		names = map[string][]string{}
		e.blockNames[s.Index] = names
	}
	reg := func(kind string, n sheet.Str) {
		for _, k := range []string{"ground", "footing"} {
			if containsStr(names[k], n.Value) {
				e.errs.Add(n.Span, "%s is already the name of a %s on this sheet", n.Value, k)
				return
			}
		}
		names[kind] = append(names[kind], n.Value)
	}
	switch b := b.(type) {
	case *sheet.Ground:
		reg("ground", b.Name)
	case *sheet.Footing:
		reg("footing", b.Name)
	case *sheet.Analysis:
		p := b.ResultPrefix()
		varied := varyOptions(b)
		for _, n := range b.Kind.Spec().ResultNames() {
			r, _ := b.Kind.Spec().Result(n)
			if r.When == "vary" && len(varied) != 1 {
				// none without the vary option; with several inputs, each its
				// own (PREFIX.vary.SYMBOL.n)
				for _, o := range varied {
					if y := varyName(o); y != "" && !has(p.Value+"."+kind.VaryName(y, n)) {
						add(p.Value+"."+kind.VaryName(y, n), def{span: o.Span, late: true})
					}
				}
				continue
			}
			if _, dup := e.defs[s.Index][p.Value+"."+n]; dup {
				continue
			}
			if b.Kind == sheet.KindSize && (n == "B" || n == "L") && has(p.Value+"."+n) {
				// the footing's own B or L: a size block reports a given B
				// itself, and a rectangle's given L is the fixed length
				continue
			}
			add(p.Value+"."+n, def{span: headerSpan(b.Span), late: r.When == "vary"})
		}
		if t := e.tables[b.Table]; b.Kind == sheet.KindSchedule && t != nil && t.ok {
			for i, key := range t.keys {
				for _, r := range size.RowResults {
					add(p.Value+"."+key+"."+r.Symbol, def{span: t.grid.Rows[i].Span})
				}
			}
		}
	}
}

// blockPrefix is the name prefix of statements inside a block: "" for
// calc, "NAME." for ground and footing blocks.
func blockPrefix(b sheet.Block) string {
	switch b := b.(type) {
	case *sheet.Ground:
		return b.Name.Value + "."
	case *sheet.Footing:
		return b.Name.Value + "."
	}
	return ""
}

// blockLines lists the lines of a plinth block (nil for prose).
func blockLines(b sheet.Block) []sheet.Line {
	switch b := b.(type) {
	case *sheet.Calc:
		return b.Lines
	case *sheet.Ground:
		return b.Lines
	case *sheet.Footing:
		return b.Lines
	case *sheet.Analysis:
		return b.Lines
	}
	return nil
}

// blockStmts lists the statements of a plinth block.
func blockStmts(b sheet.Block) []*sheet.Stmt {
	var out []*sheet.Stmt
	for _, l := range blockLines(b) {
		if st, ok := l.(*sheet.Stmt); ok {
			out = append(out, st)
		}
	}
	return out
}

func symSpan(st *sheet.Stmt, a *expr.Assign) source.Span {
	return source.Span{File: st.Span.File, Start: a.Sym.Pos, End: a.Sym.End}
}

// posText names a span for a message: "line 12" in the same file, else
// "02-loads.md:12:1" (sheets of a package share a folder, so the file name
// is enough).
func posText(sp source.Span, here *source.File) string {
	p := sp.Pos()
	if sp.File == here {
		return fmt.Sprintf("line %d", p.Line)
	}
	return fmt.Sprintf("%s:%d:%d", filepath.Base(p.Path), p.Line, p.Col)
}

// resolveUses links each sheet to the sheets it uses and reports unknown
// names, a sheet using itself and redefinitions of used symbols.
func (e *evaluator) resolveUses() {
	var names []string
	for _, s := range e.res.Sheets {
		names = append(names, s.Name())
	}
	for _, s := range e.res.Sheets {
		for _, u := range s.Meta.Uses {
			t := e.res.byName[u.Value]
			switch {
			case t == nil:
				hint := ""
				if n, ok := suggest.Nearest(u.Value, names); ok {
					hint = fmt.Sprintf("did you mean %s?", n)
				}
				e.errs.AddHint(u.Span, hint, "uses %q: no such sheet in this package", u.Value)
			case t == s:
				e.errs.Add(u.Span, "a sheet cannot use itself")
			default:
				s.Uses = append(s.Uses, t)
			}
		}
	}
	for i, s := range e.res.Sheets {
		for _, name := range sortedKeys(e.defs[i]) {
			for _, t := range s.Uses {
				if d, ok := e.defs[t.Index][name]; ok {
					e.errs.Add(e.defs[i][name].span, "%s is already defined on %s (used by this sheet): redefining a used symbol is not allowed", name, posText(d.span, nil))
				}
			}
		}
	}
}

func sortedKeys[V any](m map[string]V) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

// order returns the sheets in evaluation order: file-name order, except
// that used sheets come first. A uses cycle is reported once, at the
// uses entry that closes it.
func (e *evaluator) order() []*Sheet {
	const (
		white = iota
		grey
		black
	)
	state := make([]int, len(e.res.Sheets))
	var out []*Sheet
	var visit func(s *Sheet, path []*Sheet)
	visit = func(s *Sheet, path []*Sheet) {
		state[s.Index] = grey
		path = append(path, s)
		for _, t := range s.Uses {
			switch state[t.Index] {
			case grey:
				var names []string
				start := 0
				for i, p := range path {
					if p == t {
						start = i
					}
				}
				for _, p := range path[start:] {
					names = append(names, p.Name())
				}
				names = append(names, t.Name())
				e.errs.Add(usesSpan(s, t.Name()), "uses cycle: %s", strings.Join(names, " → "))
			case white:
				visit(t, path)
			}
		}
		state[s.Index] = black
		out = append(out, s)
	}
	for _, s := range e.res.Sheets {
		if state[s.Index] == white {
			visit(s, nil)
		}
	}
	return out
}

func usesSpan(s *Sheet, name string) source.Span {
	for _, u := range s.Meta.Uses {
		if u.Value == name {
			return u.Span
		}
	}
	return source.Span{File: s.Src.File}
}

// bounds gives each symbol that is a side of a check the other side's
// value, so that it never prints onto or across it (Symbol.Bounds).
func (e *evaluator) bounds() {
	for _, s := range append(append([]*Sheet(nil), e.res.Context...), e.res.Sheets...) {
		for _, c := range s.Checks {
			if y := c.Sides[0]; y != nil && y.Q.Dim == c.R.Dim {
				y.Bounds = append(y.Bounds, c.R.V)
			}
			if y := c.Sides[1]; y != nil && y.Q.Dim == c.L.Dim {
				y.Bounds = append(y.Bounds, c.L.V)
			}
		}
	}
}

// register builds the check register in printing order.
func (e *evaluator) register() {
	for _, s := range e.res.Sheets {
		for _, c := range s.Checks {
			c.Anchor = fmt.Sprintf("check-%d", len(e.res.Checks)+1)
			e.res.Checks = append(e.res.Checks, c)
		}
	}
}
