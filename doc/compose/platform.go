package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

// platform prints a platform block: the verdict and the thickness the
// method requires first, a row per loading case, the working, and the
// EN 1997-1 two-layer check of the same track beside it.
func (c *composer) platform(s *eval.Sheet, b *eval.Block) []layout.Block {
	r := b.Platform
	o := c.engineOut(s, b)
	m := units.MustParse("m")
	kPa := units.MustParse("kPa")
	length := metres
	o.head(fmt.Sprintf("Working platform %s on %s (BR 470)", b.Name, b.On.Name))
	need := "the subgrade alone cannot carry the track: a platform is needed"
	if !r.Needed {
		need = "the subgrade alone carries the track: the method needs no platform"
	}
	intro := fmt.Sprintf("Method: BR 470 (2004) Appendix A, %s subgrade. Thickness checked: D = %s (the ground model's platform); the method requires %s (at least %s; used up to %s). %s.",
		r.Subgrade, length(r.D), length(r.DReq), length(r.DMin), length(r.DMax), strings.ToUpper(need[:1])+need[1:])
	if len(b.Options) > 0 {
		intro += " Options: " + strings.Join(b.Options, ", ") + "."
	}
	o.para(txt(intro))
	if mt := b.Mat; mt != nil {
		o.label("Outrigger mat")
		how := "checked"
		if mt.Sized {
			how = "sized for the allowable pressure"
		}
		o.para(txt(fmt.Sprintf("The mat, %s × %s, %s: bearing pressure %s against the allowable (utilisation %s); at the subgrade, %s below, the stress is %s by load spread and %s under the centre (Boussinesq). Its pressure is loading case 1 of the platform below.",
			length(mt.B), length(mt.L), how, valueText(units.Quantity{V: mt.Q, Dim: units.Pressure}, kPa, -1), units.Utilisation(mt.Util), length(mt.Z),
			valueText(units.Quantity{V: mt.Spread, Dim: units.Pressure}, kPa, -1), valueText(units.Quantity{V: mt.Centre, Dim: units.Pressure}, kPa, -1))))
		o.steps(&mt.Trace, indices(len(mt.Trace.Steps)), "outrigger mat")
		if ch := findCheck(b, "mat"); ch != nil {
			o.add(c.checkBlock(o.p, ch, "mat_q", "q_a"))
		}
		o.rest(&mt.Trace, "outrigger mat", nil)
	}
	t := &layout.Table{Pos: o.p,
		Header: []layout.Cell{{txt("Case")}, unitHeader("q_k", "kPa"), {txt("γq")}, unitHeader("q_d", "kPa"), unitHeader("R_s", "kPa"),
			unitHeader("R_p", "kPa"), unitHeader("D_req", "m"), unitHeader("R_d", "kPa"), {txt("Utilisation")}, {txt("EN 1997-1")}, {txt("Verdict")}},
		Align: []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight,
			layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignRight, layout.AlignLeft},
		Caption: []layout.Run{txt("Each loading case at the thickness checked: the subgrade alone ("), {Math: eqn.Sym{Name: "R_s"}, Own: true},
			txt("), the platform material alone ("), {Math: eqn.Sym{Name: "R_p"}, Own: true},
			txt(", the upper limit), the thickness required and the resistance with the platform; beside it the EN 1997-1 two-layer utilisation of the same track.")}}
	for _, k := range r.Cases {
		verdict := verdictOf(k.OK)
		ec7 := "—"
		if k.EC7 != nil && k.EC7.Governing >= 0 {
			ec7 = units.Utilisation(k.EC7.Cases[k.EC7.Governing].Util)
		}
		dreq := units.Printed(k.DReq, m, -1)
		if !k.Solvable {
			dreq = "none"
		}
		t.Rows = append(t.Rows, layout.Row{Pos: b.Span, Cells: []layout.Cell{{txt(k.Name)}, {txt(units.Printed(k.Q, kPa, -1))}, {txt(units.Printed(k.Factor, units.Dimensionless, -1))},
			{txt(units.Printed(k.QD, kPa, -1))}, {txt(units.Printed(k.Rs, kPa, -1))}, {txt(units.Printed(k.Rp, kPa, -1))}, {txt(dreq)},
			{txt(units.Printed(k.Rd, kPa, -1))}, {txt(units.Utilisation(k.Util))}, {txt(ec7)}, {verdict}}})
	}
	o.add(t)
	if ch := findCheck(b, "platform"); ch != nil {
		o.add(c.checkBlock(o.p, ch, "q_d", "R_d"))
	}
	o.rest(&r.Trace, "platform", nil)
	o.label("Working")
	o.steps(&r.Trace, indices(len(r.Trace.Steps)), "platform")
	for _, k := range r.Cases {
		if k.EC7 == nil || k.EC7.Governing < 0 {
			if k.EC7Err != nil {
				o.para(txt(fmt.Sprintf("EN 1997-1 comparison, %s: not made (%v).", k.Name, k.EC7Err)))
			}
			continue
		}
		g := k.EC7.Cases[k.EC7.Governing]
		o.para(txt(fmt.Sprintf("EN 1997-1 comparison, %s: the track as a %s × %s footing on the platform over the subgrade (%s, %s): utilisation %s, governing case %s. The two methods differ in their factors and mechanism: the platform is designed by BR 470, and where EN 1997-1 gives the higher utilisation the engineer should review the difference.",
			k.Name, length(k.W), length(k.L), k.EC7.MethodLine, k.EC7.Approach, units.Utilisation(g.Util), g.Name)))
	}
	return o.done()
}
