package layout_test

import (
	"bytes"
	"flag"
	"math"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
	"github.com/plinth-calc/plinth/internal/golden"
)

var update = flag.Bool("update", false, "rewrite golden files")

// src is the sheet the test blocks come from: at(n) is the start of its
// line n.
var src = source.NewFile("s.md", []byte(strings.Repeat("line\n", 200)))

func at(line int) source.Span { return source.Span{File: src, Start: src.LineStart(line)} }

func txt(s string) layout.Run { return layout.Run{Text: s} }

func para(line int, s string) *layout.Para {
	return &layout.Para{Pos: at(line), Runs: []layout.Run{txt(s)}}
}

func sheet(blocks ...layout.Block) layout.Doc {
	return layout.Doc{
		Info: layout.Info{Title: "T", Fingerprint: "0123456789abcdef0123"},
		Sheets: []layout.Sheet{{Pos: at(1), Fields: layout.Fields{Project: "Heron Quay", Title: "Test", Calc: "T-1", By: "AB"},
			Blocks: blocks}},
	}
}

func goldenPages(t *testing.T, name string, p *layout.Pages) {
	t.Helper()
	var b bytes.Buffer
	if err := p.Dump(&b); err != nil {
		t.Fatal(err)
	}
	golden.Compare(t, filepath.Join("testdata", name+".golden"), b.Bytes(), *update)
}

func TestGoldenBasic(t *testing.T) {
	// q·B / √(E′ + 1), as compose converts the engine's formula
	e := eqn.Frac{Num: eqn.Row{eqn.Sym{Name: "q"}, eqn.Op{Text: "·"}, eqn.Sym{Name: "B"}},
		Den: eqn.Sqrt{X: eqn.Row{eqn.Sym{Name: "E'"}, eqn.Op{Text: "+"}, eqn.Num{Text: "1"}}}}
	doc := sheet(
		&layout.Heading{Pos: at(2), Level: 1, Anchor: "top", Runs: []layout.Run{txt("Loads")}},
		&layout.Para{Pos: at(3), Runs: []layout.Run{txt("Plain, "), {Text: "bold", Style: layout.Bold}, txt(", "),
			{Text: "italic", Style: layout.Italic}, txt(" and "), {Text: "mono", Style: layout.Mono}, txt(" with a "), {Text: "link", Link: "top"},
			txt(" and x"), {Text: "2", Shift: layout.Sup}, txt(".")}},
		&layout.Statement{Pos: at(5), Symbol: eqn.Sym{Name: "s"}, Expr: e, Result: eqn.Quantity("12.5", "mm"),
			Note: []layout.Run{txt("settlement")}, Ref: "Ref 1"},
		&layout.Check{Pos: at(6), Left: eqn.Sym{Name: "s"}, LeftValue: eqn.Quantity("12.5", "mm"), Rel: "<=", Right: eqn.Sym{Name: "s_lim"},
			RightValue: eqn.Quantity("25", "mm"), Util: 0.5, OK: true, Anchor: "c1"},
		&layout.Table{Pos: at(8), Header: []layout.Cell{{txt("a")}, {txt("b")}}, Align: []layout.Align{0, layout.AlignRight},
			Rows: []layout.Row{{Pos: at(10), Cells: []layout.Cell{{txt("one")}, {txt("1.0")}}}}},
		&layout.Caution{Pos: at(12), Severity: severity.Warning, Title: []layout.Run{txt("Watch")}, Body: []layout.Block{para(13, "Body text.")}},
		&layout.Drawing{Pos: at(15), W: 100, H: 40, Items: []draw.Item{
			draw.Line{X1: 0, Y1: 0, X2: 100, Y2: 40, Paint: draw.Paint{Stroke: draw.Gray(0), Width: 1, Dash: []float64{2, 1}}},
			draw.Text{X: 50, Y: 20, Face: fonts.Regular, Size: 8, Align: draw.Center, Text: "mid"}}},
	)
	p, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	goldenPages(t, "basic", p)
}

func TestTableSplitsWithHeader(t *testing.T) {
	var rows []layout.Row
	for i := 0; i < 120; i++ {
		rows = append(rows, layout.Row{Pos: at(10 + i), Cells: []layout.Cell{{txt("row")}, {txt("a longer cell that wraps onto a second line when the column is narrow enough to need it")}}})
	}
	doc := sheet(&layout.Table{Pos: at(9), Header: []layout.Cell{{txt("Name")}, {txt("Text")}}, Rows: rows})
	p, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	if len(p.Pages) < 3 {
		t.Fatalf("want the table over several pages, got %d", len(p.Pages))
	}
	for i, pg := range p.Pages {
		var kinds []string
		for _, b := range pg.Boxes {
			kinds = append(kinds, b.Kind)
		}
		if kinds[2] != "table-header" {
			t.Errorf("page %d starts with %v, want the header repeated", i+1, kinds[:4])
		}
		if i > 0 && pg.Boxes[2].Y > pg.Boxes[0].Y+pg.Boxes[0].H+30 {
			t.Errorf("page %d: header at y %.1f, not at the top of the text", i+1, pg.Boxes[2].Y)
		}
	}
	if p.Pages[0].Boxes[0].Kind != "title-block" {
		t.Error("no title block")
	}
}

func TestProblems(t *testing.T) {
	tall := make([]eqn.Node, 0)
	for i := 0; i < 1000; i++ {
		tall = append(tall, eqn.Frac{Num: eqn.Frac{Num: eqn.Num{Text: "1"}, Den: eqn.Num{Text: "2"}}, Den: eqn.Frac{Num: eqn.Num{Text: "3"}, Den: eqn.Num{Text: "4"}}}, eqn.Op{Text: "="})
	}
	doc := sheet(
		para(3, "a missing glyph 漢 here"),
		&layout.Para{Pos: at(4), Runs: []layout.Run{{Text: "dangling", Link: "nowhere"}}},
		&layout.Anchor{Pos: at(5), Name: "twice"},
		&layout.Anchor{Pos: at(6), Name: "twice"},
		&layout.Statement{Pos: at(7), Symbol: eqn.Sym{Name: "x"}, Expr: eqn.Row(tall)},
		&layout.Image{Pos: at(8), Data: []byte("GIF89a")},
		&layout.Check{Pos: at(9), Left: eqn.Sym{Name: "a"}, Rel: "≪", Right: eqn.Sym{Name: "b"}},
	)
	_, ps := layout.Document(doc)
	if !ps.HasErrors() {
		t.Fatal("want problems")
	}
	want := []string{
		`s.md:3:1: character '漢' (U+6F22) in "a missing glyph 漢 here" is not in font DejaVu Serif`,
		`s.md:4:1: link to "nowhere", which is not an anchor in this document`,
		`s.md:6:1: anchor "twice" is defined twice (first at s.md:5:1)`,
		`s.md:7:1: this calculation line is`,
		`s.md:8:1: image is not a PNG or JPEG file`,
		`s.md:9:1: check relation "≪"`,
	}
	if len(ps) != len(want) {
		t.Fatalf("got %d problems:\n%v", len(ps), ps)
	}
	for i, w := range want {
		if !strings.HasPrefix(ps[i].Error(), w) {
			t.Errorf("problem %d:\n got %s\nwant %s…", i, ps[i].Error(), w)
		}
	}
}

// keptWithNext lays out n lines of filler, then kept and a line that
// follows it, then a tail too long for the page to be taken back by
// shrinking the gaps, for n from 40 to 69 (past a page break), and
// reports each page that ends with the box ends says is kept's.
func keptWithNext(t *testing.T, kept layout.Block, ends func(*layout.Box) bool) {
	t.Helper()
	for n := 40; n < 70; n++ {
		var bs []layout.Block
		for i := 0; i < n; i++ {
			bs = append(bs, para(2+i, "Filler line."))
		}
		bs = append(bs, kept, para(81, "Follows it."))
		for i := 0; i < 30; i++ {
			bs = append(bs, para(100+i, "Tail line."))
		}
		p, diags := layout.Document(sheet(bs...))
		if diags.HasErrors() {
			t.Fatal(diags)
		}
		for _, pg := range p.Pages {
			if ends(pg.Boxes[len(pg.Boxes)-1]) {
				t.Errorf("%d lines of filler: page %d ends with the block kept with the next", n, pg.Number)
			}
		}
	}
}

func TestKeepHeadingWithNext(t *testing.T) {
	keptWithNext(t, &layout.Heading{Pos: at(80), Level: 2, Runs: []layout.Run{txt("Kept")}}, func(b *layout.Box) bool { return b.Kind == "heading" })
}

// TestKeepLabelWithNext checks that a run-in label (Para.Label, the
// engine's "Zone of influence") never ends a page.
func TestKeepLabelWithNext(t *testing.T) {
	keptWithNext(t, &layout.Para{Pos: at(80), Runs: []layout.Run{{Text: "Label", Style: layout.BoldItalic}}, Label: true}, func(b *layout.Box) bool { return b.Pos == at(80) })
}

func TestVariantAndNotChecked(t *testing.T) {
	doc := sheet(para(2, "Body."))
	doc.Info.Variant = []string{"c_u = 55 kPa", "B = 2.6 m"}
	p, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var b bytes.Buffer
	p.Dump(&b)
	for _, s := range []string{`"VARIANT"`, `"inputs overridden: c_u = 55 kPa; B = 2.6 m"`, `"NOT CHECKED"`, `"inputs 0123456789ab"`, `"1 of 1"`} {
		if !strings.Contains(b.String(), s) {
			t.Errorf("dump lacks %s", s)
		}
	}
}

func TestLongWordBreaks(t *testing.T) {
	long := strings.Repeat("abcdefghij/", 30)
	p, diags := layout.Document(sheet(para(2, "see "+long+" end")))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	tpl, _ := layout.BuiltinTemplate("a4")
	limit := float64(tpl.Margin.Left) + tpl.BodyWidth() + 0.01
	for _, b := range p.Pages[0].Boxes {
		for _, it := range b.Items {
			if tx, ok := it.(draw.Text); ok && b.Kind == "line" {
				if r := tx.Bounds(); b.X+r.X+r.W > limit {
					t.Errorf("text %q runs to %.1f, past %.1f", tx.Text, b.X+r.X+r.W, limit)
				}
				if strings.Contains(tx.Text, "abc") && !strings.HasSuffix(tx.Text, "/") && !strings.HasSuffix(tx.Text, "abcdefghij/") && !strings.Contains(tx.Text, "end") && tx.Text != long {
					// every break inside the long word falls after a '/'
					if !strings.HasSuffix(tx.Text, "/") {
						t.Errorf("broke %q not at a slash", tx.Text)
					}
				}
			}
		}
	}
}

// TestOwnText: plinth's own text is spelled for the fonts (⅔ as 2/3), and
// a character still missing is an internal error of plinth with no
// position of the user's, while the same character in the user's text is
// an error at the user's line.
func TestOwnText(t *testing.T) {
	doc := sheet(
		&layout.Para{Pos: at(3), Runs: []layout.Run{{Text: "c* = ⅔c", Own: true}}},
		&layout.Para{Pos: at(4), Runs: []layout.Run{{Text: "engine 漢", Own: true}}},
		para(5, "user 漢"),
		&layout.Statement{Pos: at(6), Symbol: eqn.Sym{Name: "x"}, Expr: eqn.Text{Text: "漢"}, Own: true},
	)
	_, ps := layout.Document(doc)
	if len(ps) != 3 {
		t.Fatalf("want 3 problems, got %v", ps)
	}
	for i, line := range []string{"s.md:6:1", "s.md:4:1"} { // sorted by message
		if p := ps[i]; p.Pos().Path != "" || !strings.Contains(p.Msg, "internal error in plinth") || !strings.Contains(p.Msg, line) {
			t.Errorf("own text problem %d = %q at %v", i, p.Msg, p.Pos())
		}
	}
	if p := ps[2]; p.Pos().Line != 5 || strings.Contains(p.Msg, "plinth") {
		t.Errorf("user text problem = %q at %v", p.Msg, p.Pos())
	}
	pages, diags := layout.Document(sheet(&layout.Para{Pos: at(3), Runs: []layout.Run{{Text: "c* = ⅔c", Own: true}}}))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var text []string
	for _, b := range pages.Pages[0].Boxes {
		b.Walk(func(b *layout.Box) {
			for _, it := range b.Items {
				if x, ok := it.(draw.Text); ok {
					text = append(text, x.Text)
				}
			}
		})
	}
	if s := strings.Join(text, " "); !strings.Contains(s, "2/3c") || strings.Contains(s, "⅔") {
		t.Errorf("own text set as %q", s)
	}
}

// Numbers in a right-aligned column line up on the decimal point (a whole
// number's end sits where the point would be), as text, as formulas and as
// formulas of a number and its unit.
func TestDecimalAlignment(t *testing.T) {
	nums := []string{"245.7", "18", "2.457", "1250", "−0.12", "24.6", "2.4", "19.5", "7"}
	var rows []layout.Row
	for i, n := range nums {
		c := layout.Cell{txt(n)}
		switch {
		case i == 6: // a formula of a number and its unit
			c = layout.Cell{{Math: eqn.Row{eqn.Num{Text: n}, eqn.Space{Em: 0.2}, eqn.Unit("m")}}}
		case i == 7:
			c = layout.Cell{{Math: eqn.Row{eqn.Num{Text: n}, eqn.Space{Em: 0.2}, eqn.Unit("kN/m3")}}}
		case i == 8: // a lone number as a formula
			c = layout.Cell{{Math: eqn.Num{Text: n}}}
		}
		rows = append(rows, layout.Row{Pos: at(10 + i), Cells: []layout.Cell{{txt("row")}, c}})
	}
	doc := sheet(&layout.Table{Pos: at(9), Header: []layout.Cell{{txt("Name")}, {txt("Value")}}, Align: []layout.Align{0, layout.AlignRight}, Rows: rows})
	p, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var points []float64
	for _, b := range p.Pages[0].Boxes {
		if b.Kind != "row" {
			continue
		}
		for _, it := range b.Items {
			tx, ok := it.(draw.Text)
			if !ok || tx.Text == "row" || !slices.Contains(nums, tx.Text) {
				continue // the row name, a unit
			}
			whole, _, _ := strings.Cut(tx.Text, ".")
			points = append(points, b.X+tx.Start()+fonts.Get(tx.Face).Width(whole, tx.Size))
		}
	}
	if len(points) != len(nums) {
		t.Fatalf("found %d numbers, want %d", len(points), len(nums))
	}
	for i, x := range points {
		if math.Abs(x-points[0]) > 0.01 {
			t.Errorf("%s: decimal point at x %.2f, want %.2f as %s", nums[i], x, points[0], nums[0])
		}
	}
}
