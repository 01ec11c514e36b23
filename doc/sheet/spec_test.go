package sheet_test

import (
	"os"
	"regexp"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/kind"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/sheet"
)

// TestSpecs checks every block kind's declaration: words in Kind order,
// each option and result once, every option with its words or form, a
// default and a line of documentation, every result with a meaning and a
// unit plinth parses.
func TestSpecs(t *testing.T) {
	if len(sheet.Specs) != len(sheet.Kinds) {
		t.Fatalf("%d specs, %d kinds", len(sheet.Specs), len(sheet.Kinds))
	}
	for i, sp := range sheet.Specs {
		k := sheet.Kind(i)
		if sp == nil || sp.Word != k.String() || sp.Doc == "" {
			t.Fatalf("kind %d: spec %+v", i, sp)
		}
		seen := map[string]bool{}
		for _, o := range append(append([]kind.Option{}, sp.Options...), sp.Statements...) {
			if seen[o.Name] {
				t.Errorf("%s: %s listed twice", k, o.Name)
			}
			seen[o.Name] = true
			if len(o.Words) == 0 && o.Form == "" {
				t.Errorf("%s %s: neither words nor a form", k, o.Name)
			}
			if (o.Value == kind.Word) != (o.Form == "") {
				t.Errorf("%s %s: value %s with form %q", k, o.Name, o.Value, o.Form)
			}
			if o.Default == "" || o.Doc == "" {
				t.Errorf("%s %s: no default or no documentation", k, o.Name)
			}
		}
		for _, r := range sp.Results {
			if seen[r.Symbol] {
				t.Errorf("%s: result %s listed twice", k, r.Symbol)
			}
			seen[r.Symbol] = true
			if r.Meaning == "" {
				t.Errorf("%s %s: no meaning", k, r.Symbol)
			}
			for _, u := range []string{r.Unit, kind.PerRun(r.Unit)} {
				if _, err := units.Parse(u); u != "" && err != nil {
					t.Errorf("%s %s: unit %q: %v", k, r.Symbol, u, err)
				}
			}
		}
		if (sp.Header == kind.On || sp.Header == kind.To || sp.Header == kind.NamedOn) != (len(sp.Results) > 0) {
			t.Errorf("%s: an analysis defines results, an input block none", k)
		}
	}
}

// TestREADMEOptions compares the README's options table and result
// symbols with the specs: the same options for each block, every word an
// option accepts written there in backquotes (the default first when it
// is a word), and every result symbol named in its block's list.
func TestREADMEOptions(t *testing.T) {
	b, err := os.ReadFile("../../README.md")
	if err != nil {
		t.Fatal(err)
	}
	text := string(b)
	i := strings.Index(text, "**Options** (default first):")
	j := strings.Index(text, "**Result symbols**")
	if i < 0 || j < i {
		t.Fatal("README: no options table followed by the result symbols")
	}
	tick := regexp.MustCompile("`([^`]+)`")
	rows := map[string]map[string]string{} // block → option → values cell
	block := ""
	for _, line := range strings.Split(text[i:j], "\n") {
		cells := strings.Split(line, "|")
		if len(cells) < 5 || strings.HasPrefix(strings.TrimSpace(cells[1]), "---") || strings.TrimSpace(cells[1]) == "block" {
			continue
		}
		if b := strings.TrimSpace(cells[1]); b != "" {
			block = b
		}
		if rows[block] == nil {
			rows[block] = map[string]string{}
		}
		for _, m := range tick.FindAllStringSubmatch(cells[2], -1) {
			rows[block][m[1]] = strings.TrimSpace(strings.Join(cells[3:len(cells)-1], "|"))
		}
	}
	for _, sp := range sheet.Specs {
		if len(sp.Options) == 0 || sp.Header == kind.Named {
			continue // calc; ground and footing are documented in the blocks table
		}
		got := rows[sp.Word]
		for _, o := range sp.Options {
			cell, ok := got[o.Name]
			if !ok {
				t.Errorf("README options: %s %s is missing", sp.Word, o.Name)
				continue
			}
			if cell == "as above" {
				continue
			}
			var ws []string
			for _, m := range tick.FindAllStringSubmatch(cell, -1) {
				ws = append(ws, m[1])
			}
			for _, w := range o.Words {
				if !contains(ws, w) {
					t.Errorf("README options: %s %s does not name the word %s", sp.Word, o.Name, w)
				}
			}
			if d := strings.Fields(o.Default)[0]; o.Allows(d) && (len(ws) == 0 || ws[0] != d) && !strings.HasPrefix(cell, d) {
				t.Errorf("README options: %s %s should give its default %s first", sp.Word, o.Name, d)
			}
		}
		for name := range got {
			if _, ok := sp.Option(name); !ok {
				t.Errorf("README options: %s has no option %s", sp.Word, name)
			}
		}
	}
	for b := range rows {
		if k, ok := sheet.LookupKind(b); !ok || len(k.Spec().Options) == 0 {
			t.Errorf("README options: no block %s", b)
		}
	}
	// Result symbols: "- bearing: `R_d` …" up to the next item.
	list := text[j:]
	if s := strings.Index(list, "\n- "); s > 0 {
		list = list[s:]
	}
	if e := strings.Index(list, "\n\n"); e > 0 {
		list = list[:e]
	}
	items := map[string]string{}
	for _, it := range strings.Split(list, "\n- ")[1:] {
		name, rest, _ := strings.Cut(it, ":")
		items[strings.TrimSpace(name)] = rest
	}
	for _, sp := range sheet.Specs {
		if len(sp.Results) == 0 {
			continue
		}
		var named []string
		for _, m := range tick.FindAllStringSubmatch(items[sp.Word], -1) {
			named = append(named, m[1])
		}
		for _, r := range sp.Results {
			if !contains(named, r.Symbol) {
				t.Errorf("README result symbols: %s %s is missing", sp.Word, r.Symbol)
			}
		}
		for _, r := range sp.RowResults {
			if !contains(named, r.Symbol) {
				t.Errorf("README result symbols: %s row result %s is missing", sp.Word, r.Symbol)
			}
		}
		for _, n := range named {
			if strings.Contains(n, " ") || strings.HasPrefix(n, "_") || n == "NAME.ROW" {
				continue // an option as written (`tilt = yes`), a suffix (`_h`), the row prefix
			}
			if _, ok := sp.Result(n); !ok && !rowResult(sp, n) {
				if _, opt := sp.Option(n); !opt {
					t.Errorf("README result symbols: %s has no result %s", sp.Word, n)
				}
			}
		}
	}
}

func rowResult(sp *kind.Spec, n string) bool {
	for _, r := range sp.RowResults {
		if r.Symbol == n {
			return true
		}
	}
	return false
}

func contains(list []string, s string) bool {
	for _, x := range list {
		if x == s {
			return true
		}
	}
	return false
}
