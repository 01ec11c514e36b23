package eval

import (
	"errors"
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/size"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// scheduleCol are the columns of a schedule's table: one footing a row,
// its centre on the plan and its characteristic actions (the permanent
// and the variable ones, each with its horizontal action and moment along
// B); D overrides the block's depth.
var scheduleCol = []colSpec{
	{name: "footing", text: true, required: true, what: "name of the footing"},
	{name: "x", dims: []units.Dim{units.Length}, required: true, what: "x of its centre on the plan"},
	{name: "y", dims: []units.Dim{units.Length}, required: true, what: "y of its centre on the plan"},
	{name: "G", dims: []units.Dim{units.Force}, required: true, what: "permanent vertical action"},
	{name: "Q", dims: []units.Dim{units.Force}, what: "variable vertical action"},
	{name: "psi_0", dims: []units.Dim{units.None}, what: "combination factor ψ0 of the variable action"},
	{name: "psi_2", dims: []units.Dim{units.None}, what: "quasi-permanent factor ψ2 of the variable action"},
	{name: "H_G", dims: []units.Dim{units.Force}, what: "permanent horizontal action along B"},
	{name: "H_Q", dims: []units.Dim{units.Force}, what: "variable horizontal action along B"},
	{name: "M_G", dims: []units.Dim{units.Moment}, what: "permanent moment along B"},
	{name: "M_Q", dims: []units.Dim{units.Moment}, what: "variable moment along B"},
	{name: "D", dims: []units.Dim{units.Length}, what: "depth of this footing's underside, in place of the block's D"},
	{name: "ground", text: true, what: "the ground model of this footing, in place of the block's"},
	{name: "source", text: true, what: "where the row's values come from"},
}

// ScheduleResult is a schedule block's answer.
type ScheduleResult struct {
	*size.Schedule
	Names    []string // the footings' names, by row
	Keys     []string // their symbol form (NAME.KEY.B)
	Sources  []string // each row's source column ("" when none)
	Grounds  []string // each row's own ground model ("" for the block's)
	X, Y     []float64
	Ecc      size.Ecc
	NoSettle bool
	Footing  site.Footing // the shape and depth the rows share (B = 0)
}

// schedule sizes every row of a schedule block's table on its ground
// model.
func (e *evaluator) schedule(s *Sheet, b *sheet.Analysis, blk *Block, o opts) bool {
	hdr := headerSpan(b.Span)
	sc := scope{e: e, s: s}
	ok := true
	f := &Footing{Name: blk.Name, Span: b.Span, Sheet: s, NoB: true, OK: true}
	switch o.word("shape", "") {
	case "square":
		f.Model.Shape = site.Square
	case "circle":
		f.Model.Shape = site.Circle
	case "rectangle":
		f.Model.Shape = site.Rectangle
	default:
		e.errs.AddHint(hdr, "add a line: shape = square (or circle, rectangle with a ratio)", "a schedule needs the shape of its footings")
		ok = false
	}
	if x := o["D"]; x != nil {
		q, qok := e.quantity(sc, x, units.Length, "a depth")
		ok = ok && qok
		f.Model.D = q.V
	} else {
		e.errs.AddHint(hdr, "add a line such as D = 1.0 m", "a schedule needs the depth D of its footings")
		ok = false
	}
	if f.Model.Shape == site.Rectangle && o["ratio"] == nil && ok {
		e.errs.AddHint(hdr, "add a line such as ratio = 1.5 (L/B)", "a schedule of rectangles needs their ratio L/B")
		ok = false
	}
	if b.Table == nil {
		e.errs.AddHint(hdr, "add a table with footing, x, y and G columns", "a schedule needs a table of footings")
		return false
	}
	t, cells, rowOK, _ := e.blockTable(s, b.Table, blk.Name+".")
	if t == nil || !ok || !allTrue(rowOK) {
		return false
	}
	blk.Of = f
	bin, bok := e.bearingInput(s, b, blk, o, "bearing_method")
	sin, sok := e.settleInput(s, blk, o, "settlement_method")
	if !bok || !sok {
		return false
	}
	base := size.Input{Bearing: bin}
	base.Bearing.Actions = nil
	ok = e.sizeOptions(sc, o, &base, sin) && ok
	if x := o["ratio"]; x != nil {
		q, qok := e.quantity(sc, x, units.None, "a pure number")
		ok = ok && qok
		if f.Model.Shape != site.Rectangle {
			e.errs.Add(x.Name.Span, "ratio sizes rectangles; the schedule's footings are %ss", f.Model.Shape)
			ok = false
		}
		base.Plan, base.Ratio = size.Ratio, q.V
	}
	res := &ScheduleResult{Ecc: base.Ecc, NoSettle: base.Settle == nil, Footing: f.Model}
	in := size.ScheduleInput{Base: base}
	if x := o["beta_limit"]; x != nil {
		q, qok := e.quantity(sc, x, units.None, "a pure number")
		ok = ok && qok
		in.BetaLimit = q.V
		if res.NoSettle {
			e.errs.Add(x.Name.Span, "beta_limit needs the settlement check (settlement = no)")
			ok = false
		}
	}
	val := func(row []*Symbol, col string) (float64, bool) {
		for j, sp := range t.specs {
			if sp != nil && sp.name == col && row[j] != nil {
				return row[j].Q.V, true
			}
		}
		return 0, false
	}
	for i, row := range cells {
		name := t.text(i, "footing")
		x, _ := val(row, "x")
		y, _ := val(row, "y")
		G, _ := val(row, "G")
		r := size.Row{Name: name, X: x, Y: y}
		perm := site.Action{Name: "Permanent", Kind: site.Permanent, V: G}
		perm.HB, _ = val(row, "H_G")
		perm.MB, _ = val(row, "M_G")
		r.Actions = append(r.Actions, perm)
		vr := site.Action{Name: "Variable", Kind: site.Variable}
		vr.V, _ = val(row, "Q")
		vr.HB, _ = val(row, "H_Q")
		vr.MB, _ = val(row, "M_Q")
		if v, has := val(row, "psi_0"); has {
			vr.Psi0 = site.Some(v)
		}
		if v, has := val(row, "psi_2"); has {
			vr.Psi2 = site.Some(v)
		}
		if vr.V != 0 || vr.HB != 0 || vr.MB != 0 {
			r.Actions = append(r.Actions, vr)
		}
		if d, has := val(row, "D"); has {
			r.D = site.Some(d)
		}
		if c, has := t.textCell(i, "ground"); has && strings.TrimSpace(c.Value) != "" {
			name := sheet.Str{Value: strings.TrimSpace(c.Value), Span: c.Span}
			if g, gok := e.findGround(s, name); gok {
				m := g.Model
				r.Ground = &m
				res.Grounds = append(res.Grounds, g.Name)
			} else {
				ok = false
				res.Grounds = append(res.Grounds, "")
			}
		} else {
			res.Grounds = append(res.Grounds, "")
		}
		res.Names = append(res.Names, name)
		res.Sources = append(res.Sources, t.text(i, "source"))
		res.Keys = append(res.Keys, t.keys[i])
		res.X, res.Y = append(res.X, x), append(res.Y, y)
		in.Rows = append(in.Rows, r)
	}
	if !ok {
		return false
	}
	out, err := size.SizeSchedule(in)
	if err != nil {
		e.scheduleErrors(err, t, hdr, o)
		return false
	}
	res.Schedule = out
	blk.Schedule = res
	blk.Of = nil // the rows are the footings; no footing block
	e.scheduleResults(s, blk, res)
	return true
}

// scheduleErrors reports a schedule's errors at the row (and cell) they
// belong to.
func (e *evaluator) scheduleErrors(err error, t *table, hdr source.Span, o opts) {
	var list site.Errors
	if !errors.As(err, &list) {
		list = site.Errors{err}
	}
	for _, one := range list {
		var re *size.RowError
		if !errors.As(one, &re) {
			e.siteErrors(one, hdr, func(int, string) source.Span { return hdr })
			continue
		}
		at := t.grid.Rows[re.Row].Span
		col := map[string]string{"name": "footing", "x": "x", "G": "G"}[re.Param]
		if c, has := t.textCell(re.Row, col); has && col == "footing" {
			at = c.Span
		} else if col != "" {
			for j, sp := range t.specs {
				if sp != nil && sp.name == col && j < len(t.grid.Rows[re.Row].Cells) {
					at = t.grid.Rows[re.Row].Cells[j].Span
				}
			}
		}
		var ns *size.NoSize
		if errors.As(re.Err, &ns) {
			e.errs.AddHint(at, "a larger max, a deeper footing (the D column) or a smaller load", "%s: %v", t.text(re.Row, "footing"), re.Err)
			continue
		}
		e.errs.Add(at, "%v", re.Err)
	}
}

// scheduleResults defines each row's results and the block's, and enters
// a check per row and one for the distortion between neighbours.
func (e *evaluator) scheduleResults(s *Sheet, blk *Block, r *ScheduleResult) {
	m := units.MustParse("m")
	mm := units.MustParse("mm")
	def := func(name string, q units.Quantity, u units.Unit, note string, util bool) {
		y := &Symbol{Name: blk.Name + "." + name, Q: q, Unit: u, Decimals: -1, Note: sheet.Str{Value: note}, Span: headerSpan(blk.Span), Sheet: s}
		if util {
			y.Decimals, y.Bounds = 2, []float64{1}
		}
		s.local[y.Name] = y
		s.Symbols = append(s.Symbols, y)
		blk.Results = append(blk.Results, y)
	}
	for i, row := range r.Rows {
		k := r.Keys[i]
		of := func(sym string) string { return size.ScheduleSpec.RowMeaning(sym) + " (" + r.Names[i] + ")" }
		def(k+".B", units.Quantity{V: row.B, Dim: units.Length}, m, of("B"), false)
		if r.Footing.Shape == site.Rectangle {
			def(k+".L", units.Quantity{V: row.L, Dim: units.Length}, m, of("L"), false)
		}
		def(k+".util", units.Quantity{V: row.At.Util()}, units.Dimensionless, of("util"), true)
		if row.Settle != nil {
			def(k+".s_total", units.Quantity{V: row.Settle.Total, Dim: units.Length}, mm, of("s_total"), false)
		}
		gov := row.At.Checks[row.At.Governing]
		note := fmt.Sprintf("%s at B = %s governs", gov.Name, units.Printed(row.B, m, -1))
		if row.Below != nil {
			note += fmt.Sprintf("; at %s m it gives %s", units.Printed(row.Below.B, m, -1), units.Utilisation(row.Below.Util()))
		}
		e.addCheck(s, blk, blk.Name+" "+r.Names[i]+" size: util <= 1", "<=", units.Quantity{V: row.At.Util()}, units.Quantity{V: 1}, units.Dimensionless, row.At.Util(), row.At.OK, note)
	}
	def("util_max", units.Quantity{V: r.UtilMax}, units.Dimensionless, size.ScheduleSpec.Meaning("util_max"), true)
	if r.PairMax >= 0 {
		p := r.Pairs[r.PairMax]
		def("beta_max", units.Quantity{V: r.BetaMax}, units.Dimensionless, size.ScheduleSpec.Meaning("beta_max"), false)
		def("beta_lim", units.Quantity{V: p.Diff.Limit}, units.Dimensionless, size.ScheduleSpec.Meaning("beta_lim"), false)
		e.addCheck(s, blk, blk.Name+" differential: beta_max <= beta_lim", "<=", units.Quantity{V: r.BetaMax}, units.Quantity{V: p.Diff.Limit},
			units.Dimensionless, p.Diff.Util, p.Diff.OK, fmt.Sprintf("largest between neighbours: %s to %s, %s m apart", r.Names[p.A], r.Names[p.B], units.Printed(p.Spacing, m, -1)))
	}
	blk.Cautions = append(blk.Cautions, r.Trace.Cautions...)
	blk.Sources = mergeSources(blk.Sources, r.Trace.Sources)
	for _, row := range r.Rows {
		blk.Cautions = append(blk.Cautions, row.Bearing.Trace.Cautions...)
		if row.Settle != nil {
			blk.Cautions = append(blk.Cautions, row.Settle.Trace.Cautions...)
		}
		blk.Sources = mergeSources(blk.Sources, row.Trace.Sources, row.Bearing.Trace.Sources)
		if row.Settle != nil {
			blk.Sources = mergeSources(blk.Sources, row.Settle.Trace.Sources)
		}
	}
}
