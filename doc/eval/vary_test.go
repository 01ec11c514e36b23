package eval_test

import (
	"fmt"
	"math"
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
