package eval

import (
	"fmt"
	"strings"

	"github.com/plinth-calc/plinth/calc/platform"

	"github.com/plinth-calc/plinth/calc/bearing"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/suggest"
)

// Block is an evaluated plinth block other than calc: a ground model, a
// footing, or an analysis with the engine's result. Results are the
// symbols the analysis defines (PREFIX.R_d ...), Checks its governing
// checks (they enter the check register). Nothing here is recomputed
// later: the document prints the engine's trace as it is.
type Block struct {
	Kind    sheet.Kind
	Name    string // ground/footing name, or the analysis' result prefix
	Span    source.Span
	Sheet   *Sheet
	Ground  *Ground
	Footing *Footing
	// Analyses: the ground and footing analysed, and the engine results.
	On       *Ground
	Of       *Footing
	Bearing  *bearing.Result
	Settle   *SettleResult
	Capacity *CapacityResult
	Diff     *DiffResult // differential blocks
	Size     *SizeResult // size blocks
	Schedule *ScheduleResult
	Platform *PlatformResult
	Mat      *platform.MatResult // a platform block's outrigger mat
	Vary     *Sensitivity        // the vary lines' tables, when given
	Options  []string            // the options in force, "method = ec7", for printing
	Results  []*Symbol
	Checks   []*Check
	Cautions []trace.Caution // every engine caution, in trace order
	Sources  []trace.Source  // every publication the engine cited
	// SelfWeight is the working of the self-weight the analysis added to
	// the footing's actions (self_weight = auto); empty otherwise.
	SelfWeight trace.Trace
}

// selfWeight records the self-weight working of an analysis block.
func (b *Block) selfWeight() {
	if b.Of != nil && b.On != nil && len(b.SelfWeight.Steps) == 0 {
		selfWeight(b.Of, b.On, &b.SelfWeight)
	}
}

// Stratum is the name of the layer of the analysed ground at the
// footing's underside (a depth exactly at a boundary belongs to the
// layer below); "" for a block that is not an analysis.
func (b *Block) Stratum() string {
	if b.Of == nil || b.On == nil || len(b.On.Model.Layers) == 0 {
		return ""
	}
	return b.On.Model.Layers[b.On.Model.At(b.Of.Model.D)].Name
}

// Block returns the evaluated form of a ground, footing or analysis block.
func (s *Sheet) Block(b sheet.Block) *Block { return s.blocks[b] }

// Blocks lists the sheet's evaluated blocks in document order.
func (s *Sheet) Blocks() []*Block {
	var out []*Block
	for _, b := range s.Src.Body {
		if x := s.blocks[b]; x != nil {
			out = append(out, x)
		}
	}
	return out
}

// findFooting and findGround look a block name up on the sheet and the
// sheets it uses.
func (e *evaluator) findFooting(s *Sheet, name sheet.Str) (*Footing, bool) {
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		if f := t.footings[name.Value]; f != nil {
			return f, f.OK
		}
	}
	e.missingBlock(s, name, "footing", func(t *Sheet) []string { return keysOf(t.footings) })
	return nil, false
}

func (e *evaluator) findGround(s *Sheet, name sheet.Str) (*Ground, bool) {
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		if g := t.grounds[name.Value]; g != nil {
			return g, g.OK
		}
	}
	e.missingBlock(s, name, "ground", func(t *Sheet) []string { return keysOf(t.grounds) })
	return nil, false
}

func keysOf[V any](m map[string]V) []string { return sortedKeys(m) }

// missingBlock reports a footing or ground name that is not defined above.
func (e *evaluator) missingBlock(s *Sheet, name sheet.Str, kind string, names func(*Sheet) []string) {
	for _, t := range e.res.Sheets {
		if t != s && containsStr(e.blockNames[t.Index][kind], name.Value) {
			e.errs.AddHint(name.Span, "add "+t.Name()+" to this sheet's uses", "%s %s is defined on %s, which this sheet does not use", kind, name.Value, t.Name())
			return
		}
	}
	if containsStr(e.blockNames[s.Index][kind], name.Value) {
		e.errs.Add(name.Span, "%s %s is defined below this block: define it first", kind, name.Value)
		return
	}
	var all []string
	for _, t := range append([]*Sheet{s}, s.Uses...) {
		all = append(all, e.blockNames[t.Index][kind]...)
	}
	hint := ""
	if n, ok := suggest.Nearest(name.Value, all); ok {
		hint = fmt.Sprintf("did you mean %s?", n)
	} else if len(all) == 0 {
		hint = fmt.Sprintf("define it in a ```%s %s block", kind, name.Value)
	}
	e.errs.AddHint(name.Span, hint, "no %s named %s", kind, name.Value)
}

func containsStr(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}

// analysis evaluates a bearing, settlement or capacity block.
func (e *evaluator) analysis(s *Sheet, b *sheet.Analysis) {
	blk := &Block{Kind: b.Kind, Name: b.ResultPrefix().Value, Span: b.Span, Sheet: s}
	s.blocks[b] = blk
	if b.Kind == sheet.KindDifferential {
		e.differential(s, b, blk)
		return
	}
	if b.Kind == sheet.KindSchedule || b.Kind == sheet.KindPlatform {
		g, gok := e.findGround(s, b.Ground)
		blk.On = g
		opts := e.options(b)
		run := e.schedule
		if b.Kind == sheet.KindPlatform {
			run = e.platformBlock
		}
		if !gok || opts == nil || !run(s, b, blk, opts) {
			e.failResults(s, blk)
		}
		return
	}
	f, fok := e.findFooting(s, b.Footing)
	g, gok := e.findGround(s, b.Ground)
	blk.Of, blk.On = f, g
	opts := e.options(b)
	if !fok || !gok || opts == nil {
		e.failResults(s, blk)
		return
	}
	for _, o := range b.Options() {
		blk.Options = append(blk.Options, o.Name.Value+" = "+o.Value.Value)
	}
	if f.NoB && b.Kind != sheet.KindSize {
		e.errs.AddHint(b.Footing.Span, "size it with a block such as ```size "+f.Name+" on "+b.Ground.Value+"```, or give the footing its B",
			"footing %s has no B, which a %s block needs", f.Name, b.Kind)
		e.failResults(s, blk)
		return
	}
	var ok bool
	switch b.Kind {
	case sheet.KindSize:
		ok = e.sizeBlock(s, b, blk, opts)
	case sheet.KindBearing:
		ok = e.bearing(s, b, blk, opts)
	case sheet.KindSettlement:
		ok = e.settlement(s, b, blk, opts)
	case sheet.KindCapacity:
		ok = e.capacity(s, b, blk, opts)
	}
	if !ok {
		e.failResults(s, blk)
	}
}

// failResults marks an analysis' result names as failed so uses of them
// are not reported again.
func (e *evaluator) failResults(s *Sheet, blk *Block) {
	for _, n := range blk.Kind.Spec().ResultNames() {
		e.fail(s, blk.Name+"."+n)
	}
}

// defineResults turns engine summary values into symbols PREFIX.name,
// each with its meaning from the kind's spec as its note.
func (e *evaluator) defineResults(s *Sheet, blk *Block, vals []trace.Value) {
	spec := blk.Kind.Spec()
	for _, v := range vals {
		name := blk.Name + "." + v.Symbol
		if old := s.local[name]; old != nil {
			e.errs.AddHint(blk.Span, fmt.Sprintf("name this block's results: %s ... as %s_2", strings.Fields(blk.Span.Text())[0], blk.Name),
				"%s is already defined at %s", name, posText(old.Span, s.Src.File))
			return
		}
		if _, ok := spec.Result(v.Symbol); !ok {
			e.errs.Add(blk.Span, "internal: the engine gave %s, which the %s block's spec does not declare", v.Symbol, blk.Kind)
		}
		u, err := units.Parse(v.Unit)
		if err != nil {
			e.errs.Add(blk.Span, "internal: the engine gave %s an unknown unit %q", v.Symbol, v.Unit)
			continue
		}
		y := &Symbol{
			Name: name, Q: units.Quantity{V: v.V, Dim: u.Dim}, Unit: u, Decimals: -1,
			Note: sheet.Str{Value: spec.Meaning(v.Symbol)}, Span: headerSpan(blk.Span), Sheet: s,
		}
		if strings.HasPrefix(v.Symbol, "util") && u.Dim == units.None {
			// a utilisation: two decimals, never printed onto or across 1
			y.Decimals, y.Bounds = 2, []float64{1}
		}
		s.local[name] = y
		s.Symbols = append(s.Symbols, y)
		blk.Results = append(blk.Results, y)
	}
}

// headerSpan is the first line of a block (its fence and info string).
func headerSpan(sp source.Span) source.Span {
	t := sp.Text()
	if i := strings.IndexByte(t, '\n'); i >= 0 {
		sp.End = sp.Start + i
	}
	return sp
}

// side is the result symbol name when it holds the check side's value q
// (a block's H_d is its governing bearing case's, which need not be the
// governing sliding case's), else nil.
func side(s *Sheet, name string, q units.Quantity) *Symbol {
	if y := s.local[name]; y != nil && y.Q == q {
		return y
	}
	return nil
}

// addCheck enters an engine check into the sheet's checks. Its text is
// "NAME kind: left op right" with the block's result names as the sides.
func (e *evaluator) addCheck(s *Sheet, blk *Block, text, op string, l, r units.Quantity, u units.Unit, util float64, ok bool, note string) *Check {
	c := &Check{
		Text: text, Op: op, L: l, R: r, Unit: u, Util: util, OK: ok,
		Note: sheet.Str{Value: note}, Span: headerSpan(blk.Span), Sheet: s,
	}
	if _, rel, ok := strings.Cut(text, ": "); ok {
		if f := strings.Fields(rel); len(f) == 3 {
			c.Sides = [2]*Symbol{side(s, blk.Name+"."+f[0], l), side(s, blk.Name+"."+f[2], r)}
		}
	}
	s.Checks = append(s.Checks, c)
	blk.Checks = append(blk.Checks, c)
	return c
}
