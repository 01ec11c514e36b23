package compose

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/site"
	"github.com/plinth-calc/plinth/doc/eval"
)

// tilt prints a settlement block's tilt working (tilt = yes): the
// founding layer's modulus, the SLS moment, the radius, tan θ, θ and the
// edge settlement difference, with the half-space cautions.
func (c *composer) tilt(o *engineOut, st *eval.SettleResult) {
	tr := st.TiltTrace()
	if tr == nil {
		return
	}
	t := st.Tilt
	kind := "drained E′ (long term)"
	if t.Kind == "E_u" {
		kind = "undrained E_u (short term)"
	}
	o.label("Tilt under the serviceability moment")
	o.para(txt(fmt.Sprintf("The footing is taken as rigid on an elastic half-space with the founding layer's %s; the moment uses the factors of the serviceability combination (%s).", kind, st.Service.Name)))
	o.steps(tr, indices(len(tr.Steps)), "tilt")
	o.rest(tr, "tilt", nil)
}

// within prints a settlement block's centre-against-corner working
// (within = yes).
func (c *composer) within(o *engineOut, st *eval.SettleResult) {
	if st.Within == nil {
		return
	}
	tr := &st.Within.Trace
	o.label("Differential settlement within the footing")
	at := "At the centre, a corner and the middles of the sides"
	if sh := o.b.Of.Model.Shape; sh == site.Strip || sh == site.Circle {
		at = "At the centre and the edge"
	}
	o.para(txt(at + ", by the method, stresses and sublayers above, with the rectangles placed around each point as for at = corner."))
	o.steps(tr, indices(len(tr.Steps)), "within the footing")
	o.rest(tr, "within the footing", nil)
}
