package eval

import (
	"math"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

var (
	forceDims  = []units.Dim{units.Force, units.LineLoad} // pads: kN; strips: kN/m
	momentDims = []units.Dim{units.Moment, units.Force}   // pads: kNm; strips: kNm/m (= kN)
	footingCol = []colSpec{
		{name: "action", text: true, what: "name of the action"},
		{name: "type", text: true, required: true, what: "permanent or variable"},
		{name: "V", dims: forceDims, required: true, what: "vertical action, downward positive"},
		{name: "H_B", dims: forceDims, what: "horizontal action parallel to B"},
		{name: "H_L", dims: forceDims, what: "horizontal action parallel to L"},
		{name: "M_B", dims: momentDims, what: "moment moving the resultant along B"},
		{name: "M_L", dims: momentDims, what: "moment moving the resultant along L"},
		{name: "psi_0", dims: []units.Dim{units.None}, what: "combination factor ψ0"},
		{name: "psi_2", dims: []units.Dim{units.None}, what: "quasi-permanent factor ψ2"},
		{name: "favourable", text: true, what: "yes: always favourable (permanent at γ_G,inf, variable left out); no or empty: decided per effect"},
		{name: "source", text: true, what: "where the action comes from"},
	}
)

// Footing is an evaluated footing block.
type Footing struct {
	Name    string
	Span    source.Span
	Sheet   *Sheet
	Model   site.Footing
	Actions []site.Action
	// The actions table as written: column names, header units, and each
	// row's cell symbols (nil where empty or text).
	Columns []string
	Units   []units.Unit
	Rows    [][]*Symbol
	Sources []sheet.Str
	// SelfWeight is set by "self_weight = auto": analyses add the
	// footing's weight (GammaC over thickness H) and the backfill over it.
	SelfWeight bool
	GammaC     float64 // N/m3
	H          float64 // footing thickness, m
	// GammaCGiven and HGiven say whether gamma_c and h were written
	// (else 24 kN/m3 and D are assumed).
	GammaCGiven, HGiven bool
	// NoB: the footing gives no B, so only a size block may use it (it
	// chooses B); Model.B is then 0.
	NoB bool
	OK  bool
}

// footing evaluates a footing block: shape, dimensions and actions.
func (e *evaluator) footing(s *Sheet, b *sheet.Footing) {
	f := &Footing{Name: b.Name.Value, Span: b.Span, Sheet: s, GammaC: 24e3}
	s.blocks[b] = &Block{Kind: sheet.KindFooting, Name: f.Name, Span: b.Span, Sheet: s, Footing: f}
	s.footings[f.Name] = f
	prefix := f.Name + "."
	ok := e.unknownStmts(sheet.KindFooting, f.Name, b.Lines)
	f.Model.Name = f.Name
	shapeSet := false
	for _, o := range b.Options() {
		switch o.Name.Value {
		case "shape":
			sh, good := site.ParseShape(o.Value.Value)
			if !good {
				e.errs.Add(o.Value.Span, "shape %q: expected strip, square, rectangle or circle", o.Value.Value)
				ok = false
			}
			f.Model.Shape, shapeSet = sh, good
		case "self_weight":
			switch o.Value.Value {
			case "auto":
				f.SelfWeight = true
			case "no":
			default:
				e.errs.Add(o.Value.Span, "self_weight %q: expected auto or no", o.Value.Value)
				ok = false
			}
		}
	}
	if !shapeSet && ok {
		e.errs.AddHint(b.Name.Span, "add a line: shape = rectangle (or strip, square, circle)", "footing %s has no shape", f.Name)
		ok = false
	}
	e.assumedOverride(s, prefix+"gamma_c", b.Name.Span)
	e.assumedOverride(s, prefix+"h", b.Name.Span)
	get := func(name string, d units.Dim, what string, required bool) (float64, bool) {
		y := s.local[prefix+name]
		if y == nil {
			if required {
				e.errs.AddHint(b.Name.Span, "add a line such as "+name+" = 2.0 m", "footing %s needs %s (%s)", f.Name, name, what)
			}
			return 0, !required
		}
		return y.Q.V, e.wantDim(y, d, name+" ("+what+")")
	}
	var good bool
	f.Model.B, good = get("B", units.Length, "width; diameter of a circle", false)
	ok = ok && good
	f.NoB = s.local[prefix+"B"] == nil
	if f.Model.Shape == site.Rectangle {
		f.Model.L, good = get("L", units.Length, "length", !f.NoB)
		ok = ok && good
	} else if y := s.local[prefix+"L"]; y != nil && shapeSet {
		b0 := s.local[prefix+"B"]
		switch {
		case f.Model.Shape == site.Square && b0 != nil && y.Q.Dim == units.Length && sameLength(y.Q.V, b0.Q.V):
			// L = B on a square is what the trade writes: accepted.
		case f.Model.Shape == site.Square && b0 != nil && y.Q.Dim == units.Length:
			e.errs.AddHint(y.Span, "write shape = rectangle, or leave L out", "L = %g m differs from B = %g m: a square has L = B", y.Q.V, b0.Q.V)
			ok = false
		case f.Model.Shape == site.Square:
			ok = ok && e.wantDim(y, units.Length, "L (length)")
		default:
			e.errs.Add(y.Span, "L is given for a %s footing: only a rectangle has a separate length", f.Model.Shape)
			ok = false
		}
	}
	f.Model.D, good = get("D", units.Length, "depth of the underside below ground level", true)
	ok = ok && good
	f.Model.Alpha, good = get("alpha", units.Angle, "inclination of the base", false)
	ok = ok && good
	if v, g := get("gamma_c", units.UnitWeight, "unit weight of the footing", false); g && s.local[prefix+"gamma_c"] != nil {
		f.GammaC, f.GammaCGiven = v, true
	} else {
		ok = ok && g
	}
	if y := s.local[prefix+"gamma_c"]; y != nil && !f.SelfWeight {
		e.errs.AddHint(y.Span, "add a line self_weight = auto, or remove this one",
			"gamma_c is used only with self_weight = auto; without it the actions include the footing's weight")
		ok = false
	}
	f.H = f.Model.D
	if v, g := get("h", units.Length, "thickness of the footing", false); g && s.local[prefix+"h"] != nil {
		f.H, f.HGiven = v, true
	} else {
		ok = ok && g
	}
	if ok {
		m := f.Model
		if f.NoB { // validated at each width the size block tries; the rest here
			m.B = site.MinWidth
			if m.Shape == site.Rectangle && m.L == 0 {
				m.L = m.B
			}
		}
		if err := m.Validate(); err != nil {
			e.siteErrors(err, b.Name.Span, func(_ int, param string) source.Span {
				if y := s.local[prefix+param]; y != nil {
					return y.Span
				}
				return b.Name.Span
			})
			ok = false
		}
	}
	if f.SelfWeight && (f.H <= 0 || f.H > f.Model.D) && ok {
		sp := b.Name.Span
		if y := s.local[prefix+"h"]; y != nil {
			sp = y.Span
		}
		e.errs.Add(sp, "footing thickness h = %g m must be more than 0 and at most D = %g m", f.H, f.Model.D)
		ok = false
	}
	if b.Table == nil {
		e.errs.AddHint(b.Name.Span, "add a pipe table with action, type and V columns", "footing %s has no table of actions", f.Name)
		return
	}
	t, cells, rowOK, columns := e.blockTable(s, b.Table, prefix)
	if t == nil {
		return
	}
	ok = ok && allTrue(rowOK)
	f.Columns, f.Units, f.Rows = columns, t.units, cells
	strip := f.Model.Shape == site.Strip
	for i, row := range cells {
		a := site.Action{Name: t.text(i, "action")}
		src, _ := t.textCell(i, "source")
		f.Sources = append(f.Sources, src)
		switch t.text(i, "type") {
		case "permanent":
			a.Kind = site.Permanent
		case "variable":
			a.Kind = site.Variable
		default:
			c, _ := t.textCell(i, "type")
			e.errs.Add(c.Span, "type %q: expected permanent or variable", c.Value)
			ok = false
		}
		switch fav := t.text(i, "favourable"); fav {
		case "", "no":
		case "yes":
			// permanent: γ_G,inf in every combination; variable: left
			// out (γ_Q = 0) of every combination, named in each case
			a.Favourable = true
		default:
			c, _ := t.textCell(i, "favourable")
			e.errs.AddHint(c.Span, "yes: always favourable (a permanent action at γ_G,inf, a variable one left out); no or empty: each effect factored by whether it is unfavourable", "favourable %q: expected yes or no", fav)
			ok = false
		}
		for j, y := range row {
			if y == nil {
				continue
			}
			name := t.specs[j].name
			if (name == "V" || name == "H_B" || name == "H_L") && shapeSet {
				want := units.Force
				if strip {
					want = units.LineLoad
				}
				if y.Q.Dim != want {
					e.errs.Add(y.Span, "%s of a %s footing is in %s (%s)", name, f.Model.Shape, units.Display(want).Name, map[bool]string{true: "per metre run", false: "a force"}[strip])
					ok = false
				}
			}
			if (name == "M_B" || name == "M_L") && shapeSet {
				want, unit := units.Moment, "kNm"
				if strip {
					want, unit = units.Force, "kNm/m"
				}
				if y.Q.Dim != want {
					e.errs.Add(y.Span, "%s of a %s footing is in %s", name, f.Model.Shape, unit)
					ok = false
				}
			}
			v := y.Q.V
			switch name {
			case "V":
				a.V = v
			case "H_B":
				a.HB = v
			case "H_L":
				a.HL = v
			case "M_B":
				a.MB = v
			case "M_L":
				a.ML = v
			case "psi_0":
				a.Psi0 = site.Some(v)
			case "psi_2":
				a.Psi2 = site.Some(v)
			}
		}
		f.Actions = append(f.Actions, a)
	}
	if ok {
		if err := site.ValidateActions(f.Name, f.Actions); err != nil {
			e.siteErrors(err, b.Table.Span, func(int, string) source.Span { return b.Table.Span })
			ok = false
		}
	}
	f.OK = ok
}

// sameLength reports whether two lengths (m) agree to 1e-9 relative, so
// L = B written in different units (2500 mm, 2.5 m) still counts as equal.
func sameLength(a, b float64) bool {
	return math.Abs(a-b) <= 1e-9*math.Max(math.Abs(a), math.Abs(b))
}
