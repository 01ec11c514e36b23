package parse_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

func ExampleSheet() {
	text := "---\ntitle: Pad P1\n---\n\nPressure {q -> kPa:0} [GI].\n\n```calc\nq = 950 kN / (2.4 m)^2 -> kPa   # bearing pressure\n```\n\n```bearing P1 on site\nmethod = vesic\n```\n"
	s, diags := parse.Sheet(source.NewFile("p1.md", []byte(text)))
	fmt.Println("title:", s.Meta.Title.Value, "errors:", len(diags))
	for _, b := range s.Body {
		switch b := b.(type) {
		case *sheet.Paragraph:
			for _, x := range b.Text {
				switch x := x.(type) {
				case *sheet.Interp:
					fmt.Printf("interp %s at %s\n", x.Src.Value, x.Span.Pos())
				case *sheet.Cite:
					fmt.Printf("cite %s at %s\n", x.Key.Value, x.Span.Pos())
				}
			}
		case *sheet.Calc:
			fmt.Printf("calc statement at %s: %s\n", b.Lines[0].Where().Pos(), b.Lines[0].Where().Text())
		case *sheet.Analysis:
			o := b.Options()[0]
			fmt.Printf("%s %s on %s: %s = %s\n", b.Kind, b.Footing.Value, b.Ground.Value, o.Name.Value, o.Value.Value)
		}
	}
	// Output:
	// title: Pad P1 errors: 0
	// interp q -> kPa:0 at p1.md:5:10
	// cite GI at p1.md:5:23
	// calc statement at p1.md:8:1: q = 950 kN / (2.4 m)^2 -> kPa   # bearing pressure
	// bearing P1 on site: method = vesic
}
