package eval

import (
	"errors"
	"fmt"
	"strconv"
	"strings"

	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/calc/vary"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// VaryResult is a block's sensitivity to one input: the governing
// utilisation (a capacity table's allowable pressure) at each value, and
// where the verdict flips.
type VaryResult struct {
	Symbol string      // the input varied, as written (site.firm_clay.c_u)
	Unit   units.Unit  // its display unit
	Base   float64     // its value in the package (SI)
	List   bool        // the values were listed (else a range in VarySteps)
	Span   source.Span // the vary line's value
	*vary.Result
}

// Sensitivity is a block's vary lines, each input varied on its own (the
// others at their values in the package).
type Sensitivity struct {
	Inputs []*VaryResult // in the order of the lines
	Ranked []int         // indexes of Inputs, the widest spread of utilisation first (vary.Rank)
}

// varyAll evaluates the vary lines of every analysis block: the whole
// package again for each value of each input (through --set, so the
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
			xs := varyOptions(a)
			if len(xs) == 0 || blk == nil || (len(blk.Checks) == 0 && blk.Capacity == nil) {
				continue
			}
			e.varyBlock(opt, s, a, blk, xs)
		}
	}
}

func (e *evaluator) varyBlock(opt Options, s *Sheet, a *sheet.Analysis, blk *Block, xs []*sheet.Option) {
	var lines []varyLine
	seen := map[string]*sheet.Option{}
	total, ok := 0, true
	for _, x := range xs {
		l, lok := e.readVary(s, x)
		if !lok {
			ok = false
			continue
		}
		if prev := seen[l.name]; prev != nil {
			e.errs.AddHint(x.Value.Span, "one vary line per input: give its values on one line", "vary: %s is varied already at %s", l.name, posText(prev.Value.Span, x.Span.File))
			ok = false
			continue
		}
		seen[l.name] = x
		n := VarySteps
		if l.list {
			n = len(l.ps)
		}
		if total += n; total > MaxVaryValues {
			e.errs.AddHint(x.Value.Span, "vary fewer inputs or list fewer values in this block",
				"vary: this block's vary lines ask for %d evaluations of the package, at most %d (each value is an evaluation of the whole package; a range counts %d)", total, MaxVaryValues, VarySteps)
			ok = false
			break
		}
		lines = append(lines, l)
	}
	if !ok {
		return
	}
	sens := &Sensitivity{}
	for _, l := range lines {
		if r := e.varyInput(opt, s, a, l); r != nil {
			sens.Inputs = append(sens.Inputs, r)
		} else {
			ok = false // reported at its line; the others still run, to report theirs
		}
	}
	if !ok {
		return
	}
	var rs []*vary.Result
	for _, r := range sens.Inputs {
		rs = append(rs, r.Result)
	}
	sens.Ranked = vary.Rank(rs)
	blk.Vary = sens
	at := func(r *VaryResult) (first, last float64) { return r.Rows[0].Util, r.Rows[len(r.Rows)-1].Util }
	lo, hi, unit := "util_at_min", "util_at_max", ""
	if blk.Capacity != nil {
		lo, hi, unit = "q_allow_at_min", "q_allow_at_max", "kPa"
	}
	if len(sens.Inputs) == 1 {
		first, last := at(sens.Inputs[0])
		e.defineResults(s, blk, []trace.Value{{Symbol: lo, V: first, Unit: unit}, {Symbol: hi, V: last, Unit: unit}})
		return
	}
	spec := blk.Kind.Spec()
	for i, r := range sens.Inputs {
		first, last := at(r)
		for _, v := range []trace.Value{{Symbol: lo, V: first, Unit: unit}, {Symbol: hi, V: last, Unit: unit}} {
			u := units.MustParse(v.Unit)
			y := &Symbol{Name: blk.Name + "." + kind.VaryName(r.Symbol, v.Symbol), Q: units.Quantity{V: v.V, Dim: u.Dim}, Unit: u, Decimals: -1,
				Note: sheet.Str{Value: spec.Meaning(v.Symbol) + " (" + r.Symbol + ")"}, Span: lines[i].opt.Span, Sheet: s}
			if unit == "" {
				y.Decimals, y.Bounds = 2, []float64{1} // a utilisation: never printed onto or across 1
			}
			if old := s.local[y.Name]; old != nil {
				e.errs.Add(lines[i].opt.Value.Span, "%s is already defined at %s", y.Name, posText(old.Span, s.Src.File))
				continue
			}
			s.local[y.Name] = y
			s.Symbols = append(s.Symbols, y)
			blk.Results = append(blk.Results, y)
		}
	}
}

// varyInput evaluates the package at each value of one vary line and
// solves for the flips; nil when a value fails (reported at its text).
func (e *evaluator) varyInput(opt Options, s *Sheet, a *sheet.Analysis, l varyLine) *VaryResult {
	y, name := l.y, l.name
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
	var r *vary.Result
	var err error
	lo, hi := l.ps[0], l.ps[len(l.ps)-1]
	o := vary.Options{Symbol: name, Unit: y.Unit.Name, Tol: 1e-4 * (hi - lo)}
	if l.list {
		r, err = vary.Values(f, l.ps, o)
	} else {
		r, err = vary.Table(f, lo, hi, VarySteps, o)
	}
	if err != nil {
		// at the value's own text: a listed value, or an end of the range
		sp := l.opt.Value.Span
		var re *vary.RowError
		if errors.As(err, &re) {
			switch {
			case l.list && re.Row >= 0:
				sp = l.at[re.Row]
			case !l.list && re.Row == 0:
				sp = l.at[0]
			case !l.list && re.Row == VarySteps-1:
				sp = l.at[1]
			}
		}
		e.errs.Add(sp, "%v", err) // "vary: at … = …: why"
		return nil
	}
	return &VaryResult{Symbol: name, Unit: y.Unit, Base: y.Q.V, List: l.list, Span: l.opt.Value.Span, Result: r}
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
