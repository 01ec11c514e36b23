package sheet_test

import (
	"fmt"
	"testing"

	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

func TestOptions(t *testing.T) {
	o, ok := sheet.LookupOption(sheet.KindBearing, "approach")
	if !ok || !o.Allows("DA2") || o.Allows("DA4") {
		t.Errorf("approach = %+v, %v", o, ok)
	}
	if _, ok := sheet.LookupOption(sheet.KindGround, "water"); ok {
		t.Error("water is a statement in a ground block, not an option")
	}
	if k, ok := sheet.LookupKind("settlement"); !ok || k != sheet.KindSettlement || k.String() != "settlement" {
		t.Errorf("LookupKind(settlement) = %v, %v", k, ok)
	}
}

// str returns a set value with a span in f.
func str(f *source.File, v string) sheet.Str {
	return sheet.Str{Value: v, Span: source.Span{File: f, Start: 0, End: 1}}
}

func TestMerge(t *testing.T) {
	pf, sf := source.NewFile("package.yaml", []byte("x")), source.NewFile("01.md", []byte("x"))
	pkg := sheet.Meta{
		Keys:       []sheet.Str{str(pf, "project"), str(pf, "by"), str(pf, "references"), str(pf, "revisions")},
		Project:    str(pf, "Harrier Lane"),
		By:         str(pf, "AB"),
		References: []sheet.Reference{{Key: str(pf, "GI"), Text: str(pf, "GI report")}, {Key: str(pf, "S1"), Text: str(pf, "Loads")}},
		Revisions:  []sheet.Revision{{Rev: str(pf, "P1")}},
	}
	sh := sheet.Meta{
		Keys:       []sheet.Str{str(sf, "by"), str(sf, "checked"), str(sf, "references")},
		By:         str(sf, "CD"),
		Checked:    str(sf, ""),
		References: []sheet.Reference{{Key: str(sf, "S1"), Text: str(sf, "Loads rev B")}, {Key: str(sf, "S2"), Text: str(sf, "Drawings")}},
	}
	m := sheet.Merge(&pkg, &sh)
	got := fmt.Sprintf("%s %s %q %v", m.Project.Value, m.By.Value, m.Checked.Value, m.Checked.IsSet())
	if got != `Harrier Lane CD "" true` {
		t.Errorf("merged fields: %s", got)
	}
	var refs string
	for _, r := range m.References {
		refs += r.Key.Value + "=" + r.Text.Value + ";"
	}
	if refs != "GI=GI report;S1=Loads rev B;S2=Drawings;" {
		t.Errorf("references: %s", refs)
	}
	if len(m.Revisions) != 1 || len(m.Keys) != 5 {
		t.Errorf("revisions %d, keys %d", len(m.Revisions), len(m.Keys))
	}
	if len(pkg.References) != 2 || pkg.References[1].Text.Value != "Loads" {
		t.Error("Merge changed its defaults")
	}
}

func TestCitesIn(t *testing.T) {
	text := "groundwater [GI] and [EN1997-1], not [1] or [ x]"
	f := source.NewFile("n.md", []byte("# "+text))
	cites := sheet.CitesIn(sheet.Str{Value: text, Span: source.Span{File: f, Start: 2, End: 2 + len(text)}})
	var got string
	for _, c := range cites {
		got += fmt.Sprintf("%s@%s ", c.Key.Value, c.Key.Span.Pos())
	}
	if got != "GI@n.md:1:16 EN1997-1@n.md:1:25 " {
		t.Errorf("cites: %s", got)
	}
}
