package compose_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
)

const varySheet = "---\ntitle: Vary\ncalc: \"V-01\"\n---\n\n# Vary\n\n" +
	"```ground site\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) | phi' (deg) | c' (kPa) | E_u (MPa) | m_v (m2/MN) |\n| --- | --- | --- | --- | --- | --- | --- | --- |\n| Clay | 0 | 19 | 60 | 24 | 5 | 20 | 0.1 |\n```\n\n" +
	"```footing F\nshape = square\nB = 1.6 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 700 |\n```\n\n" +
	"```bearing F on site\ndrainage = undrained\nvary = site.clay.c_u: -30 % .. +30 %\nvary = F.B: 1.4 m, 1.5 m, 1.6 m, 2 m\n```\n\n" +
	"```capacity F on site as CF\nwidths = 1.2 m, 1.6 m, 2 m\nvary = site.clay.c_u: 40 kPa, 60 kPa\nvary = site.clay.gamma: 17 kN/m3 .. 21 kN/m3\n```\n"

// tables lists the tables of a document, inside side-by-side blocks too.
func tables(doc layout.Doc) []*layout.Table {
	var out []*layout.Table
	var walk func([]layout.Block)
	walk = func(bs []layout.Block) {
		for _, b := range bs {
			switch b := b.(type) {
			case *layout.Table:
				out = append(out, b)
			case *layout.Beside:
				walk(b.Left)
				walk(b.Right)
			}
		}
	}
	for _, s := range doc.Sheets {
		walk(s.Blocks)
	}
	return out
}

func runsText(rs []layout.Run) string {
	var b strings.Builder
	for _, r := range rs {
		if r.Math != nil {
			b.WriteString(eqn.String(r.Math))
		}
		b.WriteString(r.Text)
	}
	return b.String()
}

// A block varying several inputs prints a summary row per input, in the
// order of the spread of its utilisation (eval's Ranked), then each
// input's table with a row per value; a capacity block likewise with its
// allowable pressures. The document renders.
func TestVarySeveral(t *testing.T) {
	res, _ := pkg(t, map[string]string{"package.yaml": "project: P\n", "01-vary.md": varySheet})
	var blocks []*eval.Block
	for _, b := range res.Sheets[0].Blocks() {
		if b.Vary != nil {
			blocks = append(blocks, b)
		}
	}
	if len(blocks) != 2 {
		t.Fatalf("%d blocks vary", len(blocks))
	}
	doc, d := compose.Document(res, compose.Options{})
	if d.HasErrors() {
		t.Fatal(d)
	}
	ts := tables(doc)
	for _, b := range blocks {
		var summary *layout.Table
		inputs := map[string]*layout.Table{}
		for _, tb := range ts {
			c := runsText(tb.Caption)
			if strings.Contains(c, " of "+b.Name+" ") && strings.Contains(c, "at the least and the greatest value of each input") {
				summary = tb
			}
			for _, v := range b.Vary.Inputs {
				if c == b.Name+" against "+eqn.String(eqn.Sym{Name: v.Symbol}) {
					inputs[v.Symbol] = tb
				}
			}
		}
		if summary == nil || len(summary.Rows) != len(b.Vary.Inputs) {
			t.Fatalf("%s: summary %+v", b.Name, summary)
		}
		for i, k := range b.Vary.Ranked {
			v := b.Vary.Inputs[k]
			if got := runsText(summary.Rows[i].Cells[0]); got != eqn.String(eqn.Sym{Name: v.Symbol}) {
				t.Errorf("%s: summary row %d is %q, want %s", b.Name, i, got, v.Symbol)
			}
			if tb := inputs[v.Symbol]; tb == nil || len(tb.Rows) != len(v.Rows) {
				t.Errorf("%s: table of %s %+v", b.Name, v.Symbol, tb)
			}
		}
	}
	if pdf, _ := render(t, res); len(pdf) == 0 {
		t.Error("no PDF")
	}
}
