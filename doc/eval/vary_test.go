package eval_test

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
)

const varySheet = "# T\n\n```ground site\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) |\n| --- | --- | --- | --- |\n| Clay | 0 | 19 | 60 |\n```\n\n" +
	"```footing F\nshape = square\nB = 1.6 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 700 |\n```\n\n" +
	"```bearing F on site\ndrainage = undrained\nvary = site.clay.c_u: -30 % .. +30 %\n```\n"

// blockOf evaluates the sheet src with --set arguments (evalSheet) and
// returns its first block for which has holds.
func blockOf(t *testing.T, src string, has func(*eval.Block) bool, set ...string) *eval.Block {
	t.Helper()
	res, _ := evalSheet(t, src, set...)
	for _, b := range res.Sheets[0].Blocks() {
		if has(b) {
			return b
		}
	}
	t.Fatal("no such block")
	return nil
}

func evalWith(t *testing.T, src string, set ...string) *eval.Block {
	t.Helper()
	return blockOf(t, src, func(b *eval.Block) bool { return b.Bearing != nil }, set...)
}

// The vary option's rows are the block's governing utilisation with the
// input set to each value by --set, and its flip is where the
// utilisation is 1: checked by evaluating the sheet with --set at the
// rows and at the flip (tolerance: the solver's, 1e-4 of the range).
func TestVaryAgreesWithSet(t *testing.T) {
	b := evalWith(t, varySheet)
	v := b.Vary.Inputs[0]
	if v == nil || len(v.Rows) != eval.VarySteps {
		t.Fatalf("vary %+v", v)
	}
	if math.Abs(v.Rows[0].P-42e3) > 1e-6 || math.Abs(v.Rows[len(v.Rows)-1].P-78e3) > 1e-6 {
		t.Errorf("range %v .. %v, want 42 .. 78 kPa", v.Rows[0].P, v.Rows[len(v.Rows)-1].P)
	}
	for _, r := range v.Rows {
		one := evalWith(t, varySheet, fmt.Sprintf("site.clay.c_u=%g kPa", r.P/1e3))
		if u := one.Checks[0].Util; math.Abs(u-r.Util) > 1e-12 {
			t.Errorf("c_u = %g kPa: vary %v, --set %v", r.P/1e3, r.Util, u)
		}
	}
	if len(v.Crossings) != 1 {
		t.Fatalf("crossings %+v (rows %+v)", v.Crossings, v.Rows)
	}
	at := evalWith(t, varySheet, fmt.Sprintf("site.clay.c_u=%.6f kPa", v.Crossings[0].P/1e3))
	if u := at.Checks[0].Util; math.Abs(u-1) > 1e-3 {
		t.Errorf("utilisation at the flip %v kPa is %v, not 1", v.Crossings[0].P/1e3, u)
	}
	if v.Crossings[0].Rising {
		t.Error("utilisation falls as c_u rises")
	}
}

func evalPlatform(t *testing.T, src string) *eval.Block {
	t.Helper()
	return blockOf(t, src, func(b *eval.Block) bool { return b.Platform != nil })
}

// governing is a block's highest utilisation, as the vary option reads it.
// flipBetween reports whether a flip at p lies between two rows of v
// with opposite verdicts.
func flipBetween(v *eval.VaryResult, p float64) bool {
	k := 1
	for k < len(v.Rows) && v.Rows[k].P < p {
		k++
	}
	return k < len(v.Rows) && (v.Rows[k-1].Util > 1) != (v.Rows[k].Util > 1)
}

func governing(b *eval.Block) float64 {
	u := 0.0
	for _, c := range b.Checks {
		if c.HasUtil() && c.Util > u {
			u = c.Util
		}
	}
	return u
}

// Two inputs of one block, each varied on its own: c_u over a range and
// the footing's width at listed values. Each row of each table is the
// block's governing utilisation with that input alone set to the row's
// value by --set (the other at its value on the sheet); each flip lies
// between two rows of opposite verdict, and --set at the flip gives a
// utilisation of 1 (tolerance: the solver's, 1e-4 of the range).
const varyTwo = "# T\n\n```ground site\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) |\n| --- | --- | --- | --- |\n| Clay | 0 | 19 | 60 |\n```\n\n" +
	"```footing F\nshape = square\nB = 1.6 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 700 |\n```\n\n" +
	"```bearing F on site\ndrainage = undrained\nvary = site.clay.c_u: -30 % .. +30 %\nvary = F.B: 1.4 m, 1.5 m, 1.6m, 1.8 m, 2 m\n```\n\n" +
	"At the least c_u the utilisation is {F.vary.site.clay.c_u.util_at_min}; at B = 2 m it is {F.vary.F.B.util_at_max}.\n"

func TestVaryTwoInputs(t *testing.T) {
	res, _ := evalSheet(t, varyTwo)
	var b *eval.Block
	for _, x := range res.Sheets[0].Blocks() {
		if x.Bearing != nil {
			b = x
		}
	}
	if b == nil || b.Vary == nil || len(b.Vary.Inputs) != 2 {
		t.Fatalf("vary %+v", b)
	}
	cu, width := b.Vary.Inputs[0], b.Vary.Inputs[1]
	if cu.Symbol != "site.clay.c_u" || cu.List || len(cu.Rows) != eval.VarySteps || width.Symbol != "F.B" || !width.List {
		t.Fatalf("inputs %+v %+v", cu, width)
	}
	for i, want := range []float64{1.4, 1.5, 1.6, 1.8, 2} {
		if math.Abs(width.Rows[i].P-want) > 1e-12 {
			t.Errorf("B row %d = %v, want %v m (exactly the values listed)", i, width.Rows[i].P, want)
		}
	}
	for _, v := range b.Vary.Inputs {
		unit := map[string]string{"site.clay.c_u": "kPa", "F.B": "m"}[v.Symbol]
		si := map[string]float64{"kPa": 1e3, "m": 1}[unit]
		for _, r := range v.Rows {
			one := evalWith(t, varyTwo, fmt.Sprintf("%s=%.12g %s", v.Symbol, r.P/si, unit))
			if u := governing(one); math.Abs(u-r.Util) > 1e-12 {
				t.Errorf("%s = %g %s: vary %v, --set %v", v.Symbol, r.P/si, unit, r.Util, u)
			}
		}
		if len(v.Crossings) == 0 {
			t.Errorf("%s: no flip in %+v", v.Symbol, v.Rows)
		}
		for _, x := range v.Crossings {
			if !flipBetween(v, x.P) {
				t.Errorf("%s: flip at %v not between rows of opposite verdict: %+v", v.Symbol, x.P, v.Rows)
			}
			at := evalWith(t, varyTwo, fmt.Sprintf("%s=%.9g %s", v.Symbol, x.P/si, unit))
			if u := governing(at); math.Abs(u-1) > 1e-3 {
				t.Errorf("%s: utilisation at the flip %v is %v, not 1", v.Symbol, x.P, u)
			}
		}
	}
	// the results: under PREFIX.vary.SYMBOL with several inputs, the plain
	// names only with one
	s := res.Sheets[0]
	for name, want := range map[string]float64{
		"F.vary.site.clay.c_u.util_at_min": cu.Rows[0].Util, "F.vary.site.clay.c_u.util_at_max": cu.Rows[len(cu.Rows)-1].Util,
		"F.vary.F.B.util_at_min": width.Rows[0].Util, "F.vary.F.B.util_at_max": width.Rows[len(width.Rows)-1].Util,
	} {
		if y := s.Lookup(name); y == nil || y.Q.V != want {
			t.Errorf("%s = %+v, want %v", name, y, want)
		}
	}
	if s.Lookup("F.util_at_min") != nil {
		t.Error("F.util_at_min defined with two inputs")
	}
	// ranked by the spread of utilisation, widest first
	spread := func(v *eval.VaryResult) float64 { lo, hi := v.Spread(); return hi - lo }
	r := b.Vary.Ranked
	if len(r) != 2 || spread(b.Vary.Inputs[r[0]]) < spread(b.Vary.Inputs[r[1]]) {
		t.Errorf("ranked %v", r)
	}
	t.Logf("c_u rows %+v flips %+v; B rows %+v flips %+v", cu.Rows, cu.Crossings, width.Rows, width.Crossings)
}

// A list of percentages of the input's value, and values written without
// a space before the unit: evaluated at exactly those values.
func TestVaryListPercent(t *testing.T) {
	src := strings.Replace(varySheet, "vary = site.clay.c_u: -30 % .. +30 %", "vary = site.clay.c_u: -30 %, 0 %, +30 %, 90kPa", 1)
	v := evalWith(t, src).Vary.Inputs[0]
	for i, want := range []float64{42e3, 60e3, 78e3, 90e3} {
		if math.Abs(v.Rows[i].P-want) > 1e-9 {
			t.Errorf("row %d at %v, want %v", i, v.Rows[i].P, want)
		}
	}
	if len(v.Crossings) != 1 || !(v.Crossings[0].P > 42e3 && v.Crossings[0].P < 60e3) {
		t.Errorf("flips %+v", v.Crossings)
	}
}

// The example's platform block varies two inputs, the subgrade's c_u over
// a range and the platform's φ′ at listed values: each row is the block's
// utilisation with that input alone set by --set (sheet-qualified, as a
// user would give it), and each flip lies between rows of opposite
// verdict.
func TestVaryExamplePlatform(t *testing.T) {
	for _, ex := range examples(t) {
		for _, s := range ex.res.Sheets {
			for _, b := range s.Blocks() {
				if b.Platform == nil || b.Vary == nil {
					continue
				}
				if len(b.Vary.Inputs) < 2 {
					t.Errorf("%s: %d inputs varied", b.Name, len(b.Vary.Inputs))
				}
				for _, v := range b.Vary.Inputs {
					for _, r := range v.Rows {
						set := fmt.Sprintf("%s:%s=%.12g %s", s.Name(), v.Symbol, r.P/v.Unit.SIFactor(), v.Unit.Name)
						res, d := eval.Package(ex.pkg, eval.WithoutVary(eval.Options{Set: []string{set}}))
						if d.HasErrors() {
							t.Fatal(d)
						}
						var u float64 = -1
						for _, t2 := range res.Sheets {
							for _, nb := range t2.Blocks() {
								if t2.Name() == s.Name() && nb.Name == b.Name && nb.Platform != nil {
									u = governing(nb)
								}
							}
						}
						if math.Abs(u-r.Util) > 1e-12 {
							t.Errorf("%s: vary %v, --set %s %v", b.Name, r.Util, set, u)
						}
					}
					for _, x := range v.Crossings {
						if !flipBetween(v, x.P) {
							t.Errorf("%s %s: flip %v not between rows of opposite verdict", b.Name, v.Symbol, x.P)
						}
					}
				}
				return
			}
		}
	}
	t.Fatal("no platform block varies in the examples")
}
