package layout_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/source"
)

func ExampleDocument() {
	f := source.NewFile("01-loads.md", []byte("---\ntitle: Abutment loads\ncalc: L-01\n---\n# Loads\n\n    G_k = 420 kN  # permanent action\n"))
	pos := func(line int) source.Span { return source.Span{File: f, Start: f.LineStart(line)} }
	doc := layout.Doc{
		Info: layout.Info{Title: "Heron Quay", Fingerprint: "5be0c3a1d2e4f60718293a4b5c6d7e8f"},
		Sheets: []layout.Sheet{{
			Pos:    pos(1),
			Fields: layout.Fields{Project: "Heron Quay footbridge", Title: "Abutment loads", Calc: "L-01", By: "AB"},
			Blocks: []layout.Block{
				&layout.Heading{Pos: pos(5), Level: 1, Runs: []layout.Run{{Text: "Loads"}}},
				&layout.Input{Pos: pos(7), Symbol: eqn.Sym{Name: "G_k"}, Value: eqn.Quantity("420", "kN"),
					Note: []layout.Run{{Text: "permanent action"}}},
			},
		}},
	}
	pages, diags := layout.Document(doc)
	if diags.HasErrors() {
		fmt.Println(diags)
		return
	}
	for _, b := range pages.Pages[0].Boxes {
		fmt.Println(b.Kind, b.Pos)
	}
	// Output:
	// title-block 01-loads.md:1:1
	// footer 01-loads.md:1:1
	// heading 01-loads.md:5:1
	// input 01-loads.md:7:1
}
