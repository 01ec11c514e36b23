package compose

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
)

// differential prints a differential block: the two settlements compared
// (with where they come from), the engine's working for Δs, β and β_lim,
// its cautions and the check.
func (c *composer) differential(s *eval.Sheet, b *eval.Block) []layout.Block {
	d := b.Diff
	o := c.engineOut(s, b)
	o.head(fmt.Sprintf("Differential settlement of %s and %s", d.A.Of.Name, d.B.Of.Name))
	where := func(x *eval.Block) string {
		p := x.Span.Pos()
		at := fmt.Sprintf("line %d", p.Line)
		if x.Sheet != s {
			at = fmt.Sprintf("%s:%d", x.Sheet.Name(), p.Line)
		}
		return fmt.Sprintf("s_A = %s (%s.s_total, the settlement block at %s)", valueText(units.Quantity{V: x.Settle.Total, Dim: units.Length}, mm, -1), x.Name, at)
	}
	intro := fmt.Sprintf("Compared: the total settlements of the two settlement blocks, %s; %s. Spacing L = %s, centre to centre.",
		where(d.A), strings.Replace(where(d.B), "s_A", "s_B", 1), valueText(units.Quantity{V: d.Spacing, Dim: units.Length}, mU, -1))
	if len(b.Options) > 0 {
		intro += " Options: " + strings.Join(b.Options, ", ") + "."
	}
	o.para(richText(intro, layout.Regular)...)
	tr := &d.Trace
	o.steps(tr, indices(len(tr.Steps)), "angular distortion")
	o.rest(tr, "angular distortion", nil)
	if ch := findCheck(b, "angular distortion"); ch != nil {
		o.add(c.checkBlock(o.p, ch, "beta", "beta_lim"))
	}
	c.sources(b)
	return o.blocks
}
