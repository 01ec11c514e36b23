package pdf_test

import (
	"flag"
	"fmt"
	"io"
	"testing"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/pdf"
)

// bigDoc is a generated package of about 10 pages per sheet: prose,
// calculation lines with fractions and roots, checks, a long table and a
// caution on each sheet.
func bigDoc(sheets int) layout.Doc {
	d := demoDoc(0)
	S, N := trace.S, trace.N
	e := trace.Add(trace.Mul(S("c'"), S("N_c"), S("s_c")), trace.Mul(S("q'"), S("N_q"), S("s_q")),
		trace.Mul(N(0.5), S("gamma'"), trace.Div(S("B'"), trace.Fn("sqrt", S("L'"))), S("N_gamma")))
	v := vals{"c'": q("3", "kPa"), "N_c": eqn.Num{Text: "19.32"}, "s_c": eqn.Num{Text: "1.34"}, "q'": q("19", "kPa"),
		"N_q": eqn.Num{Text: "9.60"}, "s_q": eqn.Num{Text: "1.30"}, "gamma'": q("9.2", "kN/m3"), "B'": q("2.2", "m"),
		"L'": q("3.0", "m"), "N_gamma": eqn.Num{Text: "7.66"}}
	prose := "The footing is founded in firm clay below the made ground; the groundwater table lies above the underside, so effective stresses are used throughout and the buoyant unit weight below the water table. "
	var out []layout.Sheet
	for s := 0; s < sheets; s++ {
		pos := lines(fmt.Sprintf("%02d.md", s+1))
		var bs []layout.Block
		for sec := 0; sec < 6; sec++ {
			bs = append(bs, &layout.Heading{Pos: pos(sec * 100), Level: 1, Runs: []layout.Run{txt(fmt.Sprintf("Section %d", sec+1))}})
			bs = append(bs, &layout.Para{Pos: pos(sec*100 + 1), Runs: []layout.Run{txt(prose + prose), {Text: "Bold words", Style: layout.Bold}, txt(" and " + prose)}})
			for i := 0; i < 14; i++ {
				bs = append(bs, &layout.Statement{Pos: pos(sec*100 + 2 + i), Symbol: sym(fmt.Sprintf("q_ult_%d", i)), Expr: conv(e, nil),
					Subst: v.subst(e), Result: q("473", "kPa"), Note: []layout.Run{txt("drained bearing resistance")}, Ref: "EN 1997-1 D.4"})
			}
			bs = append(bs, &layout.Check{Pos: pos(sec*100 + 20), Left: sym("V_d"), LeftValue: q("1883", "kN"), Rel: "<=", Right: sym("R_d"),
				RightValue: q("3122", "kN"), Util: 0.6, OK: true, Anchor: fmt.Sprintf("c%d-%d", s, sec)})
		}
		var rows []layout.Row
		for i := 0; i < 60; i++ {
			rows = append(rows, layout.Row{Pos: pos(700 + i), Cells: []layout.Cell{{txt(fmt.Sprintf("%d", i))}, {txt("Firm to stiff grey CLAY with occasional fine gravel")}, {txt("19.0")}, {txt("60")}}})
		}
		bs = append(bs, &layout.Table{Pos: pos(699), Header: []layout.Cell{{txt("Layer")}, {txt("Description")}, {txt("γ (kN/m³)")}, {txt("c_u (kPa)")}},
			Align: []layout.Align{0, 0, layout.AlignRight, layout.AlignRight}, Rows: rows})
		bs = append(bs, &layout.Caution{Pos: pos(800), Severity: severity.Note, Body: []layout.Block{&layout.Para{Pos: pos(801), Runs: []layout.Run{txt(prose)}}}})
		f := d.Sheets[1].Fields
		f.Calc = fmt.Sprintf("C-%02d", s+1)
		out = append(out, layout.Sheet{Pos: pos(1), Fields: f, Blocks: bs})
	}
	d.Sheets = out
	return d
}

func TestBigDocPages(t *testing.T) {
	p, diags := layout.Document(bigDoc(25))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	t.Logf("%d pages", len(p.Pages))
	if len(p.Pages) < 200 { // the house style sets about 9 pages a sheet
		t.Errorf("only %d pages", len(p.Pages))
	}
}

// BenchmarkRender lays out and writes a ~230-page package. Target: under
// 1 s and 200 MB on one core.
func BenchmarkRender(b *testing.B) {
	doc := bigDoc(25)
	b.ReportAllocs()
	for b.Loop() {
		p, diags := layout.Document(doc)
		if diags.HasErrors() {
			b.Fatal(diags)
		}
		if err := pdf.Write(io.Discard, p, pdf.Options{Time: when}); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkLayout(b *testing.B) {
	doc := bigDoc(25)
	b.ReportAllocs()
	for b.Loop() {
		if _, diags := layout.Document(doc); diags.HasErrors() {
			b.Fatal(diags)
		}
	}
}

func BenchmarkWrite(b *testing.B) {
	p, diags := layout.Document(bigDoc(25))
	if diags.HasErrors() {
		b.Fatal(diags)
	}
	b.ReportAllocs()
	for b.Loop() {
		if err := pdf.Write(io.Discard, p, pdf.Options{Time: when}); err != nil {
			b.Fatal(err)
		}
	}
}

// TestBigRender renders the ~230-page package once; run alone under
// /usr/bin/time -v to see peak memory:
//
//	go test -c && /usr/bin/time -v ./pdf.test -test.run BigRender -big
func TestBigRender(t *testing.T) {
	if !*big {
		t.Skip("run with -big")
	}
	p, diags := layout.Document(bigDoc(25))
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	var n countWriter
	if err := pdf.Write(&n, p, pdf.Options{Time: when}); err != nil {
		t.Fatal(err)
	}
	t.Logf("%d pages, %d bytes", len(p.Pages), int(n))
}

var big = flag.Bool("big", false, "render the big package in TestBigRender")

type countWriter int

func (c *countWriter) Write(p []byte) (int, error) { *c += countWriter(len(p)); return len(p), nil }
