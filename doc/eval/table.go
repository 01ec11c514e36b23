package eval

import (
	"fmt"
	"strings"
	"unicode"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// colSpec describes a column a ground or footing table may have.
type colSpec struct {
	name     string
	dims     []units.Dim // accepted dimensions (nil for a text column)
	text     bool        // a text column
	required bool
	what     string // a few words for messages and the printed header
}

func (c colSpec) accepts(d units.Dim) bool {
	for _, x := range c.dims {
		if x == d {
			return true
		}
	}
	return false
}

// table is a ground or footing table read at collection time: its columns
// matched to specs, each row's key (for symbol names) and parsed cells.
type table struct {
	grid   *sheet.Grid
	specs  []*colSpec   // per column; nil for an unknown column (reported)
	units  []units.Unit // per column: the header unit (Dimensionless if none)
	keys   []string     // per row: "firm_clay", "L2", "dead"
	cells  [][]expr.Node
	prefix string // "site." — symbols are prefix + key + "." + column
	ok     bool   // header readable: every column known, units fit
}

// slug turns a row's name into a symbol part: lower case, runs of other
// characters as "_" ("Firm clay" → firm_clay). It returns "" when nothing
// usable is left or the result starts with a digit.
func slug(s string) string {
	var b strings.Builder
	under := false
	for _, r := range strings.ToLower(strings.TrimSpace(s)) {
		if r < 128 && (unicode.IsLetter(r) || unicode.IsDigit(r)) {
			if under && b.Len() > 0 {
				b.WriteByte('_')
			}
			under = false
			b.WriteRune(r)
		} else {
			under = true
		}
	}
	out := b.String()
	if out == "" || unicode.IsDigit(rune(out[0])) {
		return ""
	}
	return out
}

// readTable matches a grid's header against specs and parses its cells.
// nameCol is the text column whose cells name the rows; rows without a
// usable name are keyed by fallback and their 1-based index ("L2").
func (e *evaluator) readTable(g *sheet.Grid, specs []colSpec, prefix, nameCol, fallback string) *table {
	t := &table{grid: g, prefix: prefix, ok: true}
	seen := map[string]source.Span{}
	var names []string
	for _, sp := range specs {
		names = append(names, sp.name)
	}
	for _, c := range g.Columns {
		var spec *colSpec
		for i := range specs {
			if specs[i].name == c.Name.Value {
				spec = &specs[i]
			}
		}
		u := units.Dimensionless
		switch {
		case spec == nil:
			hint := "columns are: " + strings.Join(names, ", ")
			if n, ok := suggest.Nearest(c.Name.Value, names); ok {
				hint = fmt.Sprintf("did you mean %s?", n)
			}
			e.errs.AddHint(c.Name.Span, hint, "unknown column %q", c.Name.Value)
			t.ok = false
		case seen[spec.name].File != nil:
			e.errs.Add(c.Name.Span, "column %s appears twice (first at %s)", spec.name, posText(seen[spec.name], c.Name.Span.File))
			t.ok = false
		case spec.text:
			if c.Unit.IsSet() && c.Unit.Value != "" {
				e.errs.Add(c.Unit.Span, "column %s holds text and takes no unit", spec.name)
				t.ok = false
			}
		default:
			if c.Unit.IsSet() && strings.TrimSpace(c.Unit.Value) != "" && c.Unit.Value != "-" {
				pu, err := units.Parse(c.Unit.Value)
				if err != nil {
					pe, _ := err.(*units.ParseError)
					sp := c.Unit.Span
					if pe != nil {
						sp = spanOf(sp.File, sp.Start+pe.Off, sp.Start+max(pe.End, pe.Off+1))
						e.errs.Add(sp, "%s", pe.Msg)
					} else {
						e.errs.Add(sp, "%v", err)
					}
					t.ok = false
					break
				}
				u = pu
			}
			if !spec.accepts(u.Dim) {
				want := make([]string, len(spec.dims))
				for i, d := range spec.dims {
					want[i] = units.Display(d).Name
				}
				where := c.Unit.Span
				if !c.Unit.IsSet() || c.Unit.Value == "" {
					where = c.Name.Span
				}
				if want[0] == "" {
					e.errs.Add(where, "column %s (%s) is a pure number: remove the unit %q", spec.name, spec.what, u.Name)
				} else if u.Name == "" {
					e.errs.AddHint(where, fmt.Sprintf("write the unit in the header, e.g. %s (%s)", spec.name, want[0]),
						"column %s (%s) needs a unit", spec.name, spec.what)
				} else {
					e.errs.AddHint(where, densityHint(spec.dims[0], u.Dim), "column %s (%s) needs a unit of %s, not %s", spec.name, spec.what, strings.Join(want, " or "), u.Name)
				}
				t.ok = false
			}
		}
		if spec != nil {
			seen[spec.name] = c.Name.Span
		}
		t.specs = append(t.specs, spec)
		t.units = append(t.units, u)
	}
	for _, sp := range specs {
		if sp.required && seen[sp.name].File == nil {
			e.errs.Add(g.Span, "the table needs a %s column (%s)", sp.name, sp.what)
			t.ok = false
		}
	}
	keys := map[string]bool{}
	for i, r := range g.Rows {
		key := ""
		for j, c := range g.Columns {
			if c.Name.Value == nameCol && j < len(r.Cells) {
				key = slug(r.Cells[j].Value)
			}
		}
		if key == "" || keys[key] {
			key = fmt.Sprintf("%s%d", fallback, i+1)
		}
		keys[key] = true
		t.keys = append(t.keys, key)
		row := make([]expr.Node, len(r.Cells))
		for j, c := range r.Cells {
			if j >= len(t.specs) || t.specs[j] == nil || t.specs[j].text || strings.TrimSpace(c.Value) == "" || c.Value == "-" {
				continue
			}
			n, errs := expr.ParseExpr(c.Value, c.Span.Start)
			if len(errs) > 0 {
				e.addErrs(c.Span.File, errs)
				continue
			}
			row[j] = n
		}
		t.cells = append(t.cells, row)
	}
	return t
}

// cellName is the symbol a cell defines: "site.firm_clay.c_u".
func (t *table) cellName(row, col int) string {
	return t.prefix + t.keys[row] + "." + t.specs[col].name
}

// defs lists the symbols the table's cells define, for collection.
func (t *table) defs() []namedDef {
	var out []namedDef
	for i, row := range t.cells {
		for j, n := range row {
			if n == nil {
				continue
			}
			d := def{span: t.grid.Rows[i].Cells[j].Span, input: len(expr.Idents(n)) == 0, dim: t.units[j].Dim}
			if x, ok := n.(*expr.Num); ok && x.HasUnit {
				d.dim = x.Unit.Dim
			} else if len(t.specs[j].dims) > 0 && t.units[j].Dim.IsNone() {
				d.dim = t.specs[j].dims[0]
			}
			out = append(out, namedDef{t.cellName(i, j), d})
		}
	}
	return out
}

type namedDef struct {
	name string
	def  def
}

// text returns the text of a text column in a row ("" when absent).
func (t *table) text(row int, col string) string {
	for j, sp := range t.specs {
		if sp != nil && sp.name == col && j < len(t.grid.Rows[row].Cells) {
			return strings.TrimSpace(t.grid.Rows[row].Cells[j].Value)
		}
	}
	return ""
}

// textCell returns the cell of a text column in a row.
func (t *table) textCell(row int, col string) (sheet.Str, bool) {
	for j, sp := range t.specs {
		if sp != nil && sp.name == col && j < len(t.grid.Rows[row].Cells) {
			return t.grid.Rows[row].Cells[j], true
		}
	}
	return sheet.Str{}, false
}

// evalCells evaluates every cell of the table in scope sc, defining a
// symbol for each. Values written without a unit are in the header's unit.
// It returns the symbols per row and column (nil where empty) and, per
// row, whether every cell evaluated.
func (e *evaluator) evalCells(sc scope, t *table) ([][]*Symbol, []bool) {
	good := make([]bool, len(t.cells))
	out := make([][]*Symbol, len(t.cells))
	for i, row := range t.cells {
		out[i] = make([]*Symbol, len(t.specs))
		ok := true
		for j, n := range row {
			if n == nil {
				continue
			}
			cell := t.grid.Rows[i].Cells[j]
			name := t.cellName(i, j)
			used, rok := sc.resolve(n, cell.Span.File)
			if !rok {
				ok = false
				e.fail(sc.s, name)
				continue
			}
			q, errs := expr.Eval(n, sc)
			if len(errs) > 0 {
				e.addErrs(cell.Span.File, errs)
				ok = false
				e.fail(sc.s, name)
				continue
			}
			spec, hu := t.specs[j], t.units[j]
			if q.Dim.IsNone() && !hu.Dim.IsNone() {
				q = units.Quantity{V: q.V * hu.Factor, Dim: hu.Dim}
			}
			if !spec.accepts(q.Dim) && !(q.Dim.IsNone() && spec.accepts(units.None)) {
				e.errs.AddHint(cell.Span, densityHint(spec.dims[0], q.Dim), "%s needs %s, but %q is %s", spec.name, dimWords(spec.dims[0]), cell.Value, dimWords(q.Dim))
				ok = false
				e.fail(sc.s, name)
				continue
			}
			y := &Symbol{
				Name: name, Q: q, Unit: hu, Decimals: -1, Span: cell.Span, Sheet: sc.s,
				Expr: n, Input: len(used) == 0, Uses: used,
			}
			if y.Unit.Dim != q.Dim {
				y.Unit = units.Display(q.Dim)
			}
			if o := e.over[sc.s][name]; o != nil {
				y.Q, y.Override, o.Target = o.Q, o, y
			}
			if src, ok := t.textCell(i, "source"); ok {
				y.Note = src
				y.Cites = e.cites(sc.s, src)
			}
			sc.s.local[name] = y
			sc.s.Symbols = append(sc.s.Symbols, y)
			out[i][j] = y
		}
		good[i] = ok
	}
	return out, good
}

// allTrue reports whether every element is true.
func allTrue(b []bool) bool {
	for _, x := range b {
		if !x {
			return false
		}
	}
	return true
}

// blockTable evaluates the table of a ground or footing block: the table
// read at collection time, every cell's symbol by row and column, whether
// each row evaluated, and the column names as written. It returns nil for
// a table whose header could not be read (already reported).
func (e *evaluator) blockTable(s *Sheet, g *sheet.Grid, prefix string) (t *table, cells [][]*Symbol, rowOK []bool, columns []string) {
	t = e.tables[g]
	if t == nil || !t.ok {
		return nil, nil, nil, nil
	}
	cells, rowOK = e.evalCells(scope{e: e, s: s, prefix: prefix}, t)
	for _, c := range g.Columns {
		columns = append(columns, c.Name.Value)
	}
	return t, cells, rowOK, columns
}
