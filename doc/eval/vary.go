package eval

import (
	"fmt"
	"math"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/calc/vary"
	"github.com/plinth-calc/plinth/doc/expr"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// VaryResult is a block's sensitivity to one input: the governing
// utilisation over the range, and where the verdict flips.
type VaryResult struct {
	Symbol string     // the input varied, as written (site.firm_clay.c_u)
	Unit   units.Unit // its display unit
	Base   float64    // its value in the package (SI)
	*vary.Result
}

// VarySteps is the number of values a vary range is evaluated at.
const VarySteps = 5

// varyAll evaluates the vary option of every analysis block: the whole
// package again for each value of the input (through --set, so the
// number comes from the same engine by the same route), the block's
// governing utilisation read off each run.
func (e *evaluator) varyAll(opt Options) {
	if opt.noVary || e.errs.HasErrors() {
		return
	}
	for _, s := range e.res.Sheets {
		for _, b := range s.Src.Body {
			a, ok := b.(*sheet.Analysis)
			if !ok {
				continue
			}
			blk := s.blocks[a]
			var x *sheet.Option
			for _, o := range a.Options() {
				if o.Name.Value == "vary" {
					x = o
				}
			}
			if x == nil || blk == nil || (len(blk.Checks) == 0 && blk.Capacity == nil) {
				continue
			}
			e.varyBlock(opt, s, a, blk, x)
		}
	}
}

func (e *evaluator) varyBlock(opt Options, s *Sheet, a *sheet.Analysis, blk *Block, x *sheet.Option) {
	name, rng, ok := strings.Cut(x.Value.Value, ":")
	name = strings.TrimSpace(name)
	lo, hi, found := strings.Cut(rng, "..")
	if !ok || !found {
		e.errs.AddHint(x.Value.Span, "write vary = site.clay.c_u: 40 kPa .. 80 kPa, or site.clay.c_u: -20 % .. +20 %", "vary = %s: expected SYMBOL: FROM .. TO", x.Value.Value)
		return
	}
	var y *Symbol
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		if z := t.local[name]; z != nil {
			y = z
			break
		}
	}
	if y == nil || y.Sheet == nil {
		e.errs.Add(x.Value.Span, "vary: %s is not a symbol of this sheet or a sheet it uses", name)
		return
	}
	if y.Expr == nil || len(expr.Idents(y.Expr)) > 0 {
		e.errs.AddHint(x.Value.Span, "vary one of the inputs it comes from", "vary: %s is not an input (it is computed), so it cannot be varied", name)
		return
	}
	end := func(text string) (float64, bool) {
		t := strings.TrimSpace(text)
		if strings.HasSuffix(t, "%") {
			f, err := strconv.ParseFloat(strings.TrimSpace(strings.TrimSuffix(t, "%")), 64)
			if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
				return 0, false
			}
			return y.Q.V * (1 + f/100), true
		}
		num, unit, _ := strings.Cut(t, " ")
		f, err := strconv.ParseFloat(num, 64)
		if err != nil || math.IsNaN(f) || math.IsInf(f, 0) {
			return 0, false
		}
		u, err := units.Parse(strings.TrimSpace(unit))
		if err != nil || u.Dim != y.Q.Dim {
			return 0, false
		}
		return f * u.SIFactor(), true
	}
	from, ok1 := end(lo)
	to, ok2 := end(hi)
	if !ok1 || !ok2 {
		e.errs.AddHint(x.Value.Span, "each end a number with the unit of "+name+" ("+y.Unit.Name+"), or a percentage of its value", "vary = %s: cannot read the range", x.Value.Value)
		return
	}
	if from > to {
		from, to = to, from
	}
	sheetName := y.Sheet.Name()
	f := func(p float64) (float64, error) {
		var set []string
		for _, arg := range opt.Set { // the varied input replaces its own --set
			lhs, _, _ := strings.Cut(arg, "=")
			lhs = strings.TrimSpace(lhs)
			if i := strings.LastIndex(lhs, ".md:"); i >= 0 {
				lhs = lhs[i+4:]
			}
			if lhs != name {
				set = append(set, arg)
			}
		}
		set = append(set, fmt.Sprintf("%s:%s=%s %s", sheetName, name, strconv.FormatFloat(p/y.Unit.SIFactor(), 'g', 12, 64), y.Unit.Name))
		res, diags := Package(e.pkg, Options{Set: set, Prior: opt.Prior, noVary: true})
		if diags.HasErrors() {
			return 0, fmt.Errorf("%s", diags[0].Msg)
		}
		for _, t := range append(res.Sheets, res.Context...) {
			if t.Src == s.Src {
				if nb := t.blocks[a]; nb != nil {
					return measure(nb), nil
				}
			}
		}
		return 0, fmt.Errorf("the block gave no result")
	}
	r, err := vary.Table(f, from, to, VarySteps, vary.Options{Symbol: name, Unit: y.Unit.Name, Tol: 1e-4 * (to - from)})
	if err != nil {
		e.errs.Add(x.Value.Span, "%v", err) // "vary: at … = …: why"
		return
	}
	blk.Vary = &VaryResult{Symbol: name, Unit: y.Unit, Base: y.Q.V, Result: r}
	first, last := r.Rows[0], r.Rows[len(r.Rows)-1]
	if blk.Capacity != nil {
		e.defineResults(s, blk, []trace.Value{{Symbol: "q_allow_at_min", V: first.Util, Unit: "kPa"}, {Symbol: "q_allow_at_max", V: last.Util, Unit: "kPa"}})
		return
	}
	e.defineResults(s, blk, []trace.Value{{Symbol: "util_at_min", V: first.Util}, {Symbol: "util_at_max", V: last.Util}})
}

// measure is what a vary option follows: a capacity table's allowable
// pressure at the footing's own width (Pa), else the block's governing
// utilisation.
func measure(b *Block) float64 {
	if b.Capacity != nil {
		return b.Capacity.Rows[b.Capacity.Own].QAllow
	}
	return governingUtil(b)
}

// governingUtil is the highest utilisation among a block's checks.
func governingUtil(b *Block) float64 {
	u := 0.0
	for _, c := range b.Checks {
		if c.HasUtil() && c.Util > u {
			u = c.Util
		}
	}
	return u
}
