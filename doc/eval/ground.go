package eval

import (
	"errors"
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// groundColumns are the columns a ground table may have (SHEET-FORMAT §3).
var groundColumns = []colSpec{
	{name: "layer", text: true, what: "layer name"},
	{name: "type", text: true, what: "fine or coarse; default: fine when c_u is given"},
	{name: "top", dims: []units.Dim{units.Length}, required: true, what: "depth of the top below ground level"},
	{name: "gamma", dims: []units.Dim{units.UnitWeight}, required: true, what: "bulk unit weight"},
	{name: "gamma_sat", dims: []units.Dim{units.UnitWeight}, what: "saturated unit weight"},
	{name: "c_u", dims: []units.Dim{units.Pressure}, what: "undrained shear strength"},
	{name: "phi'", dims: []units.Dim{units.Angle}, what: "effective angle of shearing resistance"},
	{name: "phi'_cv", dims: []units.Dim{units.Angle}, what: "critical-state angle of shearing resistance"},
	{name: "c'", dims: []units.Dim{units.Pressure}, what: "effective cohesion"},
	{name: "E_u", dims: []units.Dim{units.Pressure}, what: "undrained Young's modulus"},
	{name: "E'", dims: []units.Dim{units.Pressure}, what: "drained Young's modulus"},
	{name: "nu", dims: []units.Dim{units.None}, what: "Poisson's ratio"},
	{name: "m_v", dims: []units.Dim{units.Compliance}, what: "coefficient of volume compressibility"},
	{name: "c_v", dims: []units.Dim{units.Diffusivity}, what: "coefficient of consolidation"},
	{name: "C_c", dims: []units.Dim{units.None}, what: "compression index"},
	{name: "C_r", dims: []units.Dim{units.None}, what: "recompression index"},
	{name: "e_0", dims: []units.Dim{units.None}, what: "initial void ratio"},
	{name: "sigma'_p", dims: []units.Dim{units.Pressure}, what: "preconsolidation pressure"},
	{name: "OCR", dims: []units.Dim{units.None}, what: "overconsolidation ratio"},
	{name: "C_alpha", dims: []units.Dim{units.None}, what: "secondary compression index"},
	{name: "N", dims: []units.Dim{units.None}, what: "SPT blow count"},
	{name: "q_c", dims: []units.Dim{units.Pressure}, what: "cone resistance"},
	{name: "D_r", dims: []units.Dim{units.None}, what: "relative density"},
	{name: "source", text: true, what: "where the layer's parameters come from"},
}

// Ground is an evaluated ground block.
type Ground struct {
	Name   string
	Span   source.Span
	Sheet  *Sheet
	Model  site.Ground
	Water  *Symbol // nil when no groundwater is given
	GammaW *Symbol // nil when the default applies
	// Columns of the table as written, their header units, and the
	// symbols of each layer's cells (nil where a cell is empty or text).
	Columns []string
	Units   []units.Unit
	Layers  []GroundLayer
	OK      bool // the model is valid and may be used by analyses
}

// GroundLayer is one row of the ground table.
type GroundLayer struct {
	Name   string
	Type   string
	Source sheet.Str
	Cells  []*Symbol
}

// ground evaluates a ground block's table into a site.Ground.
func (e *evaluator) ground(s *Sheet, b *sheet.Ground) {
	g := &Ground{Name: b.Name.Value, Span: b.Span, Sheet: s}
	s.blocks[b] = &Block{Kind: sheet.KindGround, Name: g.Name, Span: b.Span, Sheet: s, Ground: g}
	s.grounds[g.Name] = g
	prefix := g.Name + "."
	g.Water = s.local[prefix+"water"]
	e.assumedOverride(s, prefix+"gamma_w", b.Name.Span)
	g.GammaW = s.local[prefix+"gamma_w"]
	g.Model = site.Ground{Name: g.Name}
	ok := e.unknownStmts(sheet.KindGround, g.Name, b.Lines)
	var platform source.Span
	for _, o := range b.Options() {
		if o.Name.Value != "platform" {
			continue
		}
		platform = o.Value.Span
		switch v := strings.TrimSpace(o.Value.Value); v {
		case "yes":
			g.Model.Platform = true
		case "no":
		default:
			spec, _ := sheet.LookupOption(sheet.KindGround, "platform")
			hint := ""
			if n, near := suggest.Nearest(v, spec.Words); near {
				hint = "did you mean " + n + "?"
			}
			e.errs.AddHint(o.Value.Span, hint, "platform = %q: expected %s", v, strings.Join(spec.Words, ", "))
			ok = false
		}
	}
	if g.Water != nil {
		if !e.wantDim(g.Water, units.Length, "water (depth of the groundwater table below ground level)") {
			ok = false
		}
		g.Model.Water = site.Some(g.Water.Q.V)
	}
	if g.GammaW != nil && g.Water == nil {
		e.errs.AddHint(g.GammaW.Span, "add a line water = … (depth of the water table), or remove this one",
			"gamma_w is used only with a water table")
		ok = false
	}
	if g.GammaW != nil {
		if !e.wantDim(g.GammaW, units.UnitWeight, "gamma_w (unit weight of water)") {
			ok = false
		}
		g.Model.GammaW = g.GammaW.Q.V
	}
	if b.Table == nil {
		e.errs.Add(b.Span, "ground %s has no layer table: add a pipe table with top and gamma columns", g.Name)
		return
	}
	t, cells, rowOK, columns := e.blockTable(s, b.Table, prefix)
	if t == nil {
		return
	}
	ok = ok && allTrue(rowOK)
	g.Columns, g.Units = columns, t.units
	for i := range b.Table.Rows {
		gl := GroundLayer{Name: t.text(i, "layer"), Type: t.text(i, "type"), Cells: cells[i]}
		gl.Source, _ = t.textCell(i, "source")
		l := site.Layer{Name: gl.Name}
		if l.Name == "" {
			l.Name = fmt.Sprintf("layer %d", i+1)
		}
		switch gl.Type {
		case "":
		case "fine":
			l.Type = site.Fine
		case "coarse":
			l.Type = site.Coarse
		default:
			c, _ := t.textCell(i, "type")
			e.errs.Add(c.Span, "type %q: expected fine or coarse", gl.Type)
			ok = false
		}
		for j, y := range cells[i] {
			if y == nil {
				continue
			}
			setLayer(&l, t.specs[j].name, y.Q.V)
		}
		g.Model.Layers = append(g.Model.Layers, l)
		g.Layers = append(g.Layers, gl)
	}
	// Validate even when some cells failed, so every error of the run is
	// listed; problems in rows with a failed cell are not reported again.
	if err := g.Model.Validate(); err != nil {
		e.siteErrors(err, b.Span, func(layer int, param string) source.Span {
			if param == "platform" && platform.File != nil {
				return platform
			}
			if layer >= 1 && layer <= len(rowOK) && !rowOK[layer-1] {
				return source.Span{}
			}
			if layer < 1 || layer > len(cells) {
				return b.Name.Span
			}
			if param == "water" || param == "gamma_w" {
				if y := s.local[prefix+param]; y != nil {
					return y.Span
				}
			}
			for j, sp := range t.specs {
				if sp != nil && sp.name == param && cells[layer-1][j] != nil {
					return cells[layer-1][j].Span
				}
			}
			return b.Table.Rows[layer-1].Span
		})
		return
	}
	g.OK = ok
}

// setLayer stores a cell's SI value in the layer field its column names.
func setLayer(l *site.Layer, col string, v float64) {
	opt := site.Some(v)
	switch col {
	case "top":
		l.Top = v
	case "gamma":
		l.Gamma = v
	case "gamma_sat":
		l.GammaSat = opt
	case "c_u":
		l.Cu = opt
	case "phi'":
		l.Phi = opt
	case "phi'_cv":
		l.PhiCv = opt
	case "c'":
		l.C = opt
	case "E_u":
		l.Eu = opt
	case "E'":
		l.E = opt
	case "nu":
		l.Nu = opt
	case "m_v":
		l.Mv = opt
	case "c_v":
		l.Cv = opt
	case "C_c":
		l.Cc = opt
	case "C_r":
		l.Cr = opt
	case "e_0":
		l.E0 = opt
	case "sigma'_p":
		l.SigmaP = opt
	case "OCR":
		l.OCR = opt
	case "C_alpha":
		l.Calpha = opt
	case "N":
		l.N = opt
	case "q_c":
		l.Qc = opt
	case "D_r":
		l.Dr = opt
	}
}

// wantDim reports a block statement of the wrong dimension.
func (e *evaluator) wantDim(y *Symbol, d units.Dim, what string) bool {
	if y.Q.Dim == d {
		return true
	}
	e.errs.AddHint(y.Span, densityHint(d, y.Q.Dim), "%s needs %s, not %s", what, dimWords(d), dimWords(y.Q.Dim))
	return false
}

// densityHint tells how to turn a density (t/m3, Mg/m3) into the unit
// weight expected, and is "" for any other mismatch.
func densityHint(want, got units.Dim) string {
	if want != units.UnitWeight || got != units.Density {
		return ""
	}
	return "a density is a mass per volume: multiply it by g, the standard acceleration of gravity (9.80665 m/s2), e.g. 1.9 t/m3 * g"
}

// siteErrors reports the engine's input errors at the cells they concern.
func (e *evaluator) siteErrors(err error, fallback source.Span, at func(layer int, param string) source.Span) {
	var list site.Errors
	if !errors.As(err, &list) {
		list = site.Errors{err}
	}
	for _, x := range list {
		var re *site.RangeError
		var ie *site.InputError
		switch {
		case errors.As(x, &re):
			if sp := at(re.Layer, re.Param); sp.File != nil {
				e.errs.Add(sp, "%s", x.Error())
			}
		case errors.As(x, &ie):
			if sp := at(ie.Layer, ie.Param); sp.File != nil {
				e.errs.Add(sp, "%s", x.Error())
			}
		default:
			e.errs.Add(fallback, "%s", x.Error())
		}
	}
}
