package pdf_test

import (
	"bytes"
	"fmt"
	"github.com/plinth-calc/plinth/calc/units"
	"image"
	"image/color"
	"image/jpeg"
	"image/png"
	"math"
	"strings"

	"github.com/plinth-calc/plinth/calc/severity"
	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
	"github.com/plinth-calc/plinth/doc/source"
)

// The demo package: an invented site, firm and footing, for looking at the
// output as a user would.

// lines is a stand-in source file of the given name: a span at the start
// of each line prints as name:line:1.
func lines(name string) func(line int) source.Span {
	f := source.NewFile(name, []byte(strings.Repeat("\n", 2000)))
	return func(line int) source.Span { return source.Span{File: f, Start: f.LineStart(line)} }
}

var at = lines("02-bearing.md")

func q(num, unit string) eqn.Node { return eqn.Quantity(num, unit) }

func sym(s string) eqn.Node { return eqn.Sym{Name: s} }

type vals map[string]eqn.Node

func (v vals) subst(e trace.Expr) eqn.Node { return conv(e, v) }

// conv typesets an engine formula for the demo, with the values of v put
// in for its symbols: a small stand-in for compose's converter
// (parentheses by precedence, stacked fractions, powers as superscripts,
// tan² for the power of a function, √ for sqrt, × between values), enough
// to give the writer every kind of formula node.
func conv(e trace.Expr, v vals) eqn.Node {
	n, _ := convPrec(e, v)
	return n
}

// convPrec converts e and says how tightly it binds: 1 sum, 2 product,
// 3 negation, 4 fraction, 5 power, 6 atom.
func convPrec(e trace.Expr, v vals) (eqn.Node, int) {
	wrap := func(n eqn.Node, p, min int) eqn.Node {
		if p < min {
			return eqn.Paren(n)
		}
		return n
	}
	switch e := e.(type) {
	case trace.Sym:
		if x, ok := v[e.Name]; ok {
			if _, row := x.(eqn.Row); row {
				return x, 2
			}
			return x, 6
		}
		return eqn.Sym{Name: e.Name}, 6
	case trace.Num:
		if e.Unit == "deg" {
			return eqn.Num{Text: units.Significant(e.V*180/math.Pi, 6) + "°"}, 6
		}
		return eqn.Number(e.V, 6), 6
	case trace.Neg:
		x, p := convPrec(e.X, v)
		return eqn.Row{eqn.Op{Text: "−"}, wrap(x, p, 4)}, 3
	case trace.Call:
		var args []eqn.Node
		for _, a := range e.Args {
			args = append(args, conv(a, v))
		}
		if e.Fn == "sqrt" && len(args) == 1 {
			return eqn.Sqrt{X: args[0]}, 6
		}
		return eqn.Func{Name: e.Fn, Args: args}, 6
	case trace.Op:
		l, lp := convPrec(e.L, v)
		r, rp := convPrec(e.R, v)
		switch e.Op {
		case '+':
			return eqn.Row{l, eqn.Op{Text: "+"}, r}, 1
		case '-':
			return eqn.Row{l, eqn.Op{Text: "−"}, wrap(r, rp, 2)}, 1
		case '*':
			sign := "·"
			if v != nil {
				sign = "×"
			}
			return eqn.Row{wrap(l, lp, 2), eqn.Op{Text: sign}, wrap(r, rp, 2)}, 2
		case '/':
			return eqn.Frac{Num: l, Den: r}, 4
		case '^':
			if f, ok := l.(eqn.Func); ok && f.Name != "sqrt" {
				f.Sup = r
				return f, 6
			}
			return eqn.Script{Base: wrap(l, lp, 6), Sup: r}, 5
		}
	}
	return eqn.Text{Text: "?"}, 6
}

func stmt(line int, name string, e trace.Expr, v vals, result eqn.Node, note string, ref string) *layout.Statement {
	s := &layout.Statement{Pos: at(line), Symbol: sym(name), Expr: conv(e, nil), Result: result, Ref: ref}
	if v != nil {
		s.Subst = v.subst(e)
	}
	if note != "" {
		s.Note = []layout.Run{{Text: note}}
	}
	return s
}

func input(line int, name string, value eqn.Node, note, ref string) *layout.Input {
	return &layout.Input{Pos: at(line), Symbol: sym(name), Value: value, Note: []layout.Run{{Text: note}}, Ref: ref}
}

func para(line int, runs ...layout.Run) *layout.Para { return &layout.Para{Pos: at(line), Runs: runs} }

func txt(s string) layout.Run { return layout.Run{Text: s} }

func demoPNG() []byte {
	const w, h = 480, 220
	img := image.NewRGBA(image.Rect(0, 0, w, h))
	for y := 0; y < h; y++ {
		for x := 0; x < w; x++ {
			c := color.RGBA{238, 240, 243, 255}
			switch {
			case y > 150: // dense sand
				c = color.RGBA{222, 205, 160, 255}
			case y > 70: // firm clay
				c = color.RGBA{176, 150, 120, 255}
			case y > 40:
				c = color.RGBA{140, 125, 105, 255}
			}
			if x > 180 && x < 300 && y > 40 && y < 75 { // the footing
				c = color.RGBA{150, 150, 155, 255}
			}
			if y == 100 && x%8 < 5 { // water table
				c = color.RGBA{40, 90, 200, 255}
			}
			img.Set(x, y, c)
		}
	}
	var b bytes.Buffer
	_ = png.Encode(&b, img)
	return b.Bytes()
}

// demoJPEG is a small photograph-like gradient.
func demoJPEG() []byte {
	img := image.NewRGBA(image.Rect(0, 0, 160, 90))
	for y := 0; y < 90; y++ {
		for x := 0; x < 160; x++ {
			img.Set(x, y, color.RGBA{uint8(90 + x/2), uint8(110 + y), 140, 255})
		}
	}
	var b bytes.Buffer
	_ = jpeg.Encode(&b, img, &jpeg.Options{Quality: 80})
	return b.Bytes()
}

// sketch is a footing section drawn with vector primitives.
func sketch() *layout.Drawing {
	d := &layout.Drawing{Pos: at(40), W: 300, H: 150, Caption: []layout.Run{{Text: "Section through footing P1 (not to scale)"}}}
	gl := draw.Stroke(draw.Gray(40), 1)
	d.Items = []draw.Item{
		draw.Line{X1: 10, Y1: 40, X2: 290, Y2: 40, Paint: gl},
		draw.Rect{X: 100, Y: 80, W: 100, H: 30, Paint: draw.Paint{Stroke: draw.Gray(30), Width: 0.8, Fill: draw.Gray(215), Filled: true}},
		draw.Rect{X: 138, Y: 10, W: 24, H: 70, Paint: draw.Paint{Stroke: draw.Gray(30), Width: 0.8, Fill: draw.Gray(235), Filled: true}},
		draw.Line{X1: 10, Y1: 95, X2: 290, Y2: 95, Paint: draw.Paint{Stroke: draw.Color{R: 40, G: 90, B: 200}, Width: 0.7, Dash: []float64{4, 3}}},
		draw.Poly{Points: []draw.Point{draw.Pt(250, 89), draw.Pt(258, 89), draw.Pt(254, 95)}, Closed: true, Paint: draw.Fill(draw.Color{R: 40, G: 90, B: 200})},
		draw.Text{X: 262, Y: 92, Face: fonts.Italic, Size: 7.5, Color: draw.Gray(40), Text: "water"},
		draw.Line{X1: 100, Y1: 125, X2: 200, Y2: 125, Paint: draw.Stroke(draw.Gray(60), 0.5)},
		draw.Line{X1: 100, Y1: 120, X2: 100, Y2: 130, Paint: draw.Stroke(draw.Gray(60), 0.5)},
		draw.Line{X1: 200, Y1: 120, X2: 200, Y2: 130, Paint: draw.Stroke(draw.Gray(60), 0.5)},
		draw.Text{X: 150, Y: 122, Face: fonts.Italic, Size: 8, Color: draw.Gray(30), Align: draw.Center, Text: "B = 2.4 m"},
		draw.Line{X1: 215, Y1: 40, X2: 215, Y2: 110, Paint: draw.Stroke(draw.Gray(60), 0.5)},
		draw.Text{X: 220, Y: 78, Face: fonts.Italic, Size: 8, Color: draw.Gray(30), Text: "D = 1.0 m"},
		draw.Poly{Points: []draw.Point{draw.Pt(20, 60), draw.Pt(40, 70), draw.Pt(60, 62), draw.Pt(80, 72)}, Paint: draw.Stroke(draw.Gray(120), 0.6)},
	}
	return d
}

func demoDoc(longTable int) layout.Doc {
	fields := layout.Fields{Project: "Kestrel Park distribution centre", Job: "4471", Client: "Example Developments Ltd",
		Rev: "P2", By: "AB", Date: "2026-11-30"}
	f1 := fields
	f1.Title, f1.Calc, f1.Checked, f1.CheckedDate = "Ground model", "C-01", "CD", "2026-12-02"
	f2 := fields
	f2.Title, f2.Calc = "Pad footing P1: bearing resistance", "C-02"

	// sheet 1: ground model with a long table
	var rows []layout.Row
	for i := 0; i < longTable; i++ {
		top := 0.5 * float64(i)
		rows = append(rows, layout.Row{Pos: at(20 + i), Cells: []layout.Cell{
			{txt(fmt.Sprintf("BH%02d", 1+i/6))}, {txt(fmt.Sprintf("%.1f", top))}, {txt(fmt.Sprintf("%.1f", top+0.5))},
			{txt([]string{"Made ground: brick and concrete fragments in sandy gravel", "Firm brown silty CLAY", "Firm to stiff grey CLAY with occasional fine gravel", "Medium dense SAND", "Dense sand and gravel"}[i%5])},
			{txt(fmt.Sprintf("%d", 8+3*i%40))}, {txt(fmt.Sprintf("%.0f", 45+7*math.Sin(float64(i))))},
		}})
	}
	ground := []layout.Block{
		&layout.Heading{Pos: at(3), Level: 1, Runs: []layout.Run{txt("Ground conditions")}},
		para(5, txt("The site lies on "), layout.Run{Text: "firm to stiff clay", Style: layout.Italic},
			txt(" over dense sand. Groundwater was struck at "), layout.Run{Math: q("2.0", "m")},
			txt(" below ground level in every borehole, rising to "), layout.Run{Text: "1.5 m", Style: layout.Bold},
			txt(" after 20 minutes. Borehole logs are in the ground investigation report, Appendix B; see also "),
			layout.Run{Text: "https://example.com/reports/kestrel-park/ground-investigation/final/appendix-b/logs.pdf", Style: layout.Mono},
			txt(" and the check register in "), layout.Run{Text: "section 3", Link: "register"}, txt(". Design values use γ"),
			layout.Run{Text: "M", Shift: layout.Sub}, txt(" from Set M2 where it governs; c"), layout.Run{Text: "u", Shift: layout.Sub},
			txt(" is taken as "), layout.Run{Math: eqn.Row{sym("c_u"), eqn.Op{Text: "="}, q("60", "kPa")}}, txt(" (E = mc"), layout.Run{Text: "2", Shift: layout.Sup}, txt(" is not used).")),
		&layout.Heading{Pos: at(10), Level: 2, Runs: []layout.Run{txt("Strata")}},
		&layout.List{Pos: at(12), Items: [][]layout.Block{
			{para(12, txt("Made ground to 0.6 m: "), layout.Run{Text: "not a founding stratum", Style: layout.Bold})},
			{para(13, txt("Firm brown silty clay, 0.6 m to 5.0 m, undrained strength rising with depth")),
				&layout.List{Pos: at(14), Ordered: true, Items: [][]layout.Block{
					{para(14, txt("hand vanes: 55 kPa to 80 kPa"))},
					{para(15, txt("triaxial (UU): 60 kPa mean of six"))},
				}}},
			{para(16, txt("Dense sand below 5.0 m"))},
		}},
		&layout.Table{Pos: at(18), Caption: []layout.Run{txt("Table 1. Strata encountered in boreholes BH01 to BH09")},
			Header: []layout.Cell{{txt("Hole")}, {txt("Top (m)")}, {txt("Base (m)")}, {txt("Description")}, {txt("SPT N")}, {txt("w (%)")}},
			Align:  []layout.Align{layout.AlignLeft, layout.AlignRight, layout.AlignRight, layout.AlignLeft, layout.AlignRight, layout.AlignRight},
			Rows:   rows},
		&layout.Image{Pos: at(60), Data: demoPNG(), Caption: []layout.Run{txt("Figure 1. Idealised ground model at P1")}},
		&layout.Image{Pos: at(61), Data: demoJPEG(), Width: 120, Caption: []layout.Run{txt("Photograph 1. Trial pit TP2 (JPEG)")}},
		&layout.Code{Pos: at(62), Text: "```ground site\nwater = 2.0 m     # groundwater below ground level [GIR]\n| layer     | top (m) | gamma (kN/m3) | c_u (kPa) |\n| Firm clay | 0.6     | 19            | 60        |\n```"},
	}

	// sheet 2: bearing
	v := vals{
		"phi'": q("24", "deg"), "phi'_d": q("24", "deg"), "N_q": eqn.Num{Text: "9.60"}, "B'": q("2.2", "m"), "L'": q("3.0", "m"),
		"c'": q("3", "kPa"), "N_c": eqn.Num{Text: "19.32"}, "q'": q("19", "kPa"), "gamma'": q("9.2", "kN/m3"), "N_gamma": eqn.Num{Text: "7.66"},
		"s_q": eqn.Num{Text: "1.30"}, "s_c": eqn.Num{Text: "1.34"}, "s_gamma": eqn.Num{Text: "0.78"}, "q": q("245", "kPa"), "B": q("2.4", "m"),
		"nu": eqn.Num{Text: "0.3"}, "E'": q("10", "MPa"), "I_s": eqn.Num{Text: "1.12"}, "e_B": q("0.10", "m"),
		"V_d": q("1883", "kN"), "A'": q("6.60", "m2"),
	}
	S, N := trace.S, trace.N
	nq := trace.Mul(trace.Pow(S("e"), trace.Mul(S("pi"), trace.Fn("tan", S("phi'_d")))), trace.Pow(trace.Fn("tan", trace.Add(trace.Deg(45), trace.Div(S("phi'_d"), N(2)))), N(2)))
	nc := trace.Mul(trace.Sub(S("N_q"), N(1)), trace.Fn("cot", S("phi'_d")))
	ng := trace.Mul(N(2), trace.Sub(S("N_q"), N(1)), trace.Fn("tan", S("phi'_d")))
	sq := trace.Add(N(1), trace.Mul(trace.Div(S("B'"), S("L'")), trace.Fn("sin", S("phi'_d"))))
	qult := trace.Add(trace.Mul(S("c'"), S("N_c"), S("s_c")), trace.Mul(S("q'"), S("N_q"), S("s_q")),
		trace.Mul(N(0.5), S("gamma'"), S("B'"), S("N_gamma"), S("s_gamma")))
	settle := trace.Mul(trace.Div(trace.Mul(S("q"), S("B"), trace.Sub(N(1), trace.Pow(S("nu"), N(2)))), S("E'")), S("I_s"))
	rootEx := trace.Fn("sqrt", trace.Add(trace.Pow(S("e_B"), N(2)), trace.Pow(trace.Div(S("B'"), N(6)), N(2))))
	bearing := []layout.Block{
		&layout.Heading{Pos: at(3), Level: 1, Runs: []layout.Run{txt("Design situation")}},
		para(4, txt("Pad footing P1 carries the column loads from the frame analysis [S1]. Design Approach 1, Combination 2 governs the drained case; values below are for that combination.")),
		input(6, "B", q("2.4", "m"), "footing width", ""),
		input(7, "L", q("3.0", "m"), "footing length", ""),
		input(8, "D", q("1.0", "m"), "depth of the underside below ground level", ""),
		input(9, "phi'_k", q("24", "deg"), "characteristic angle of shearing resistance", "GIR"),
		input(10, "gamma_phi'", eqn.Num{Text: "1.25"}, "partial factor, Set M2", "EN 1997-1 Table A.4"),
		stmt(11, "phi'_d", trace.Fn("atan", trace.Div(trace.Fn("tan", S("phi'_k")), S("gamma_phi'"))),
			vals{"phi'_k": q("24", "deg"), "gamma_phi'": eqn.Num{Text: "1.25"}}, q("19.6", "deg"), "design angle", "EN 1997-1 2.4.6.2"),
		&layout.Heading{Pos: at(14), Level: 2, Runs: []layout.Run{txt("Bearing capacity factors")}},
		stmt(15, "N_q", nq, v, eqn.Num{Text: "9.60"}, "", "EN 1997-1 D.4"),
		stmt(16, "N_c", nc, v, eqn.Num{Text: "19.32"}, "", "EN 1997-1 D.4"),
		stmt(17, "N_gamma", ng, v, eqn.Num{Text: "7.66"}, "with δ ≥ φ′/2 (rough base)", "EN 1997-1 D.4"),
		stmt(18, "s_q", sq, v, eqn.Num{Text: "1.30"}, "shape factor, rectangle", "EN 1997-1 D.4"),
		&layout.Heading{Pos: at(20), Level: 2, Runs: []layout.Run{txt("Resistance")}},
		stmt(21, "q_ult", qult, v, q("473", "kPa"), "drained bearing resistance per unit area of the effective foundation", "EN 1997-1 (D.2)"),
		stmt(22, "R_d", trace.Mul(S("A'"), S("q_ult")), vals{"A'": q("6.60", "m2"), "q_ult": q("473", "kPa")}, q("3122", "kN"), "design resistance", ""),
		stmt(23, "e'", rootEx, v, q("0.389", "m"), "a made-up radical to show the bar", ""),
		stmt(24, "s_i", settle, v, q("22.1", "mm"), "immediate settlement, flexible footing, centre", "Poulos & Davis 1974"),
		&layout.Heading{Pos: at(26), Level: 1, Anchor: "register", Runs: []layout.Run{txt("Checks")}},
		&layout.Check{Pos: at(27), Anchor: "chk-bearing", Left: sym("V_d"), LeftValue: q("1883", "kN"), Rel: "<=", Right: sym("R_d"), RightValue: q("3122", "kN"),
			Util: 0.603, OK: true, Note: []layout.Run{txt("bearing resistance, drained, DA1-2")}},
		&layout.Check{Pos: at(28), Anchor: "chk-settle", Left: sym("s_i"), LeftValue: q("22.1", "mm"), Rel: "<=", Right: sym("s_lim"), RightValue: q("20", "mm"),
			Util: 1.105, OK: false, Note: []layout.Run{txt("settlement limit for the frame [S1]")}},
		&layout.Check{Pos: at(29), Anchor: "chk-ecc", Left: sym("e_B"), LeftValue: q("0.10", "m"), Rel: "<=", Right: eqn.Frac{Num: sym("B"), Den: eqn.Num{Text: "6"}}, RightValue: q("0.40", "m"),
			Util: 0.25, OK: true},
		&layout.Caution{Pos: at(31), Severity: severity.Warning, Title: []layout.Run{txt("Settlement exceeds the limit")},
			Body: []layout.Block{para(32, txt("The immediate settlement alone exceeds the 20 mm limit. Consider widening the footing to 2.8 m or founding on the dense sand at 5.0 m; the consolidation settlement of the clay has not yet been added."))}},
		&layout.Caution{Pos: at(34), Severity: severity.Note, Body: []layout.Block{para(35, txt("Short-term (undrained) case is on sheet C-03."))}},
		&layout.Caution{Pos: at(36), Severity: severity.Caution, Title: []layout.Run{txt("Method near its limits")},
			Body: []layout.Block{para(37, txt("Load inclination H/V = 0.19: inclination factors from EN 1997-1 Annex D are approximate beyond 0.2."))}},
		&layout.Heading{Pos: at(39), Level: 2, Runs: []layout.Run{txt("Footing sketch")}},
		sketch(),
		&layout.Heading{Pos: at(45), Level: 2, Runs: []layout.Run{txt("Check register")}},
		&layout.Table{Pos: at(46), Header: []layout.Cell{{txt("Check")}, {txt("Utilisation")}, {txt("Result")}},
			Align: []layout.Align{0, layout.AlignRight, layout.AlignCenter},
			Rows: []layout.Row{
				{Cells: []layout.Cell{{{Text: "Bearing resistance", Link: "chk-bearing"}}, {txt("0.60")}, {txt("OK")}}},
				{Cells: []layout.Cell{{{Text: "Settlement", Link: "chk-settle"}}, {txt("1.11")}, {{Text: "NOT OK", Style: layout.Bold}}}},
				{Cells: []layout.Cell{{{Text: "Eccentricity", Link: "chk-ecc"}}, {txt("0.25")}, {txt("OK")}}},
			}},
	}
	return layout.Doc{
		Info: layout.Info{Title: "Kestrel Park: foundation calculations", Author: "AB", Subject: "Pad footing design",
			Keywords: "bearing settlement", Fingerprint: "9f2c41d07be35a6e1c0d2b8f44a91e7d5c3b2a190f8e7d6c5b4a39281706f5e4"},
		Sheets: []layout.Sheet{
			{Pos: lines("01-ground.md")(1), Fields: f1, Blocks: ground},
			{Pos: at(1), Fields: f2, Blocks: bearing},
		},
	}
}
