package eval_test

import (
	"fmt"
	"math"
	"testing"

	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

const varySheet = "# T\n\n```ground site\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) |\n| --- | --- | --- | --- |\n| Clay | 0 | 19 | 60 |\n```\n\n" +
	"```footing F\nshape = square\nB = 1.6 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 700 |\n```\n\n" +
	"```bearing F on site\ndrainage = undrained\nvary = site.clay.c_u: -30 % .. +30 %\n```\n"

func evalWith(t *testing.T, src string, set ...string) *eval.Block {
	t.Helper()
	f := source.NewFile("p.md", []byte(src))
	s, pd := parse.Sheet(f)
	if pd.HasErrors() {
		t.Fatal(pd)
	}
	res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{Set: set})
	if d.HasErrors() {
		t.Fatal(d)
	}
	for _, b := range res.Sheets[0].Blocks() {
		if b.Bearing != nil {
			return b
		}
	}
	t.Fatal("no bearing block")
	return nil
}

// The vary option's rows are the block's governing utilisation with the
// input set to each value by --set, and its flip is where the
// utilisation is 1: checked by evaluating the sheet with --set at the
// rows and at the flip (tolerance: the solver's, 1e-4 of the range).
func TestVaryAgreesWithSet(t *testing.T) {
	b := evalWith(t, varySheet)
	v := b.Vary
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
	f := source.NewFile("m.md", []byte(src))
	s, pd := parse.Sheet(f)
	if pd.HasErrors() {
		t.Fatal(pd)
	}
	res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	for _, b := range res.Sheets[0].Blocks() {
		if b.Platform != nil {
			return b
		}
	}
	t.Fatal("no platform block")
	return nil
}

// vary on a capacity block follows the allowable pressure at the
// footing's own width: each row equals the table evaluated with --set.
func TestVaryCapacity(t *testing.T) {
	src := "# C\n\n```ground site\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) | m_v (m2/MN) | E_u (MPa) |\n| --- | --- | --- | --- | --- | --- |\n| Clay | 0 | 19 | 60 | 0.1 | 30 |\n```\n\n" +
		"```footing F\nshape = square\nB = 2 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 500 |\n```\n\n" +
		"```capacity F on site\nwidths = 1 m, 2 m\nvary = site.clay.c_u: 40 kPa .. 80 kPa\n```\n"
	get := func(set ...string) *eval.Block {
		f := source.NewFile("c.md", []byte(src))
		s, pd := parse.Sheet(f)
		if pd.HasErrors() {
			t.Fatal(pd)
		}
		res, d := eval.Package(&sheet.Package{Dir: ".", Sheets: []*sheet.Sheet{s}, Files: []*source.File{f}}, eval.Options{Set: set})
		if d.HasErrors() {
			t.Fatal(d)
		}
		for _, b := range res.Sheets[0].Blocks() {
			if b.Capacity != nil {
				return b
			}
		}
		t.Fatal("no capacity block")
		return nil
	}
	b := get()
	if b.Vary == nil || len(b.Vary.Rows) != eval.VarySteps {
		t.Fatalf("vary %+v", b.Vary)
	}
	for _, r := range b.Vary.Rows {
		one := get(fmt.Sprintf("site.clay.c_u=%g kPa", r.P/1e3))
		if q := one.Capacity.Rows[one.Capacity.Own].QAllow; math.Abs(q-r.Util) > 1e-9*q {
			t.Errorf("c_u = %g kPa: vary %v, --set %v", r.P/1e3, r.Util, q)
		}
	}
}
