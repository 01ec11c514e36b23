package compose_test

import (
	"fmt"
	"os"
	"path/filepath"
	"reflect"
	"sort"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/trace"
	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/eqn"
	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// allOptions is a sheet added to the example package that runs every
// bearing and settlement method with every option word, so the glyph
// test sees every string the engine can print.
func allOptions() string {
	var b strings.Builder
	b.WriteString("---\ntitle: Every method\ncalc: \"G-99\"\nuses: [01-ground.md, 02-loads.md, 03-pad-p1.md, 04-strip-s1.md, 05-crane-platform.md]\n---\n\n# Every method\n\n")
	n := 0
	block := func(kind, on string, opts ...string) {
		n++
		fmt.Fprintf(&b, "```%s %s as X%d\n%s\n```\n\n", kind, on, n, strings.Join(opts, "\n"))
	}
	for _, m := range []string{"ec7", "vesic", "meyerhof", "hansen", "terzaghi"} {
		for _, a := range []string{"DA1", "DA2", "DA3", "FS(3.0)"} {
			for _, ls := range []string{"auto", "yes", "no"} {
				block("bearing", "P1 on site", "method = "+m, "approach = "+a, "drainage = both", "local_shear = "+ls, "sliding = yes")
			}
		}
		block("bearing", "S1 on east", "method = "+m, "drainage = drained", "interface = precast", "local_shear = auto")
		block("bearing", "S1 on east", "method = "+m, "drainage = drained", "delta = 20 deg", "local_shear = yes")
		block("bearing", "OR1 on platform", "method = "+m, "drainage = undrained", "two_layer = auto")
		block("bearing", "OR1 on platform", "method = "+m, "two_layer = no")
	}
	for _, st := range []string{"boussinesq", "2:1"} {
		for _, at := range []string{"centre", "corner", "characteristic"} {
			for _, rigid := range []string{"no", "yes"} {
				for _, ld := range []string{"characteristic", "quasi-permanent"} {
					common := []string{"stress = " + st, "at = " + at, "rigid = " + rigid, "load = " + ld}
					block("settlement", "P1 on site", append([]string{"times = 0.5 yr, 1 yr"}, common...)...)
					block("settlement", "P1 on site", append([]string{"method = elastic"}, common...)...)
					block("settlement", "P1 on site", append([]string{"method = consolidation", "times = 1 yr"}, common...)...)
					block("settlement", "S1 on east", append([]string{"method = schmertmann"}, common...)...)
					block("settlement", "S1 on east", append([]string{"method = burland-burbidge"}, common...)...)
				}
			}
		}
	}
	// the options of every engine input (issue 10, points 6–8)
	block("bearing", "P1 on site", "approach = FS(3.0)", "fs_on = gross", "drainage = both")
	block("bearing", "OR1 on platform", "spread = 0.3")
	block("settlement", "P1 on site", "life = 100 yr", "drainage_paths = one-way", "depth = stress(0.2)", "times = 1 yr")
	block("settlement", "P1 on site", "skempton_bjerrum = 0.4", "depth = width(3)", "drainage_paths = two-way")
	block("settlement", "P1 on site", "method = consolidation", "depth = 12 m", "sublayers = 20")
	block("settlement", "S1 on east", "method = schmertmann", "schmertmann = 1970", "life = 25 yr")
	block("settlement", "S1 on east", "method = burland-burbidge", "fluctuating = yes", "grain = fine-silty")
	block("settlement", "S1 on east", "method = burland-burbidge", "grain = gravel")
	block("capacity", "S1 on east", "widths = 0.6 m, 0.9 m, 1.5 m")
	block("capacity", "P1 on site", "widths = 1.5 m, 2.7 m", "settlement_method = elastic", "local_shear = yes")
	return b.String()
}

// glyphPackage copies the example into a temporary folder with the
// every-method sheet added.
func glyphPackage(t *testing.T) string {
	dir := filepath.Join(t.TempDir(), "pkg")
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	src := "../../examples/brackenfield"
	ents, err := os.ReadDir(src)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range ents {
		b, err := os.ReadFile(filepath.Join(src, e.Name()))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(dir, e.Name()), b, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if err := os.WriteFile(filepath.Join(dir, "99-every-method.md"), []byte(allOptions()), 0o644); err != nil {
		t.Fatal(err)
	}
	return dir
}

// TestOwnGlyphs enumerates every string plinth itself prints — every
// step note, symbol, reference and caution the engine produced for every
// method and option, the citations of its sources, the unit names, and
// every run of plinth's own wording in the composed document — and checks
// each character against the embedded faces. Plinth's own text must
// never fail a render: fonts.Spell may respell it (⅔ as 2/3), but what
// it leaves must be in the face.
func TestOwnGlyphs(t *testing.T) {
	if testing.Short() {
		t.Skip("renders many variants")
	}
	dir := glyphPackage(t)
	runs := []struct {
		name string
		sets []string
	}{
		{"as written", nil},
		{"local shear", []string{"site.firm_to_stiff_sandy_clay.c_u=30kPa"}},
		{"loose sand", []string{"east.loose_to_medium_dense_sand.N=3"}},
	}
	missing := map[string]map[rune]bool{} // face → runes
	where := map[rune]string{}
	check := func(s string, face fonts.Face, what string) {
		f := fonts.Get(face)
		for _, r := range fonts.Spell(s, face) {
			if r == '\n' || r == '\t' || f.Has(r) {
				continue
			}
			if missing[face.String()] == nil {
				missing[face.String()] = map[rune]bool{}
			}
			missing[face.String()][r] = true
			if where[r] == "" {
				where[r] = fmt.Sprintf("%s %q", what, s)
			}
		}
	}
	textFaces := []fonts.Face{fonts.Regular, fonts.Bold, fonts.Italic, fonts.BoldItalic}
	anyFace := func(s, what string) {
		for _, f := range textFaces {
			check(s, f, what)
		}
	}
	for _, name := range units.Names() {
		anyFace(name, "unit")
	}
	var strs int
	for _, r := range runs {
		res := evaluate(t, dir, r.sets...)
		for _, s := range traceStrings(res) {
			strs++
			anyFace(s, "engine text")
		}
		doc, d := compose.Document(res, compose.Options{})
		if d.HasErrors() {
			t.Fatalf("%s: %v", r.name, d)
		}
		walkOwn(doc, func(run layout.Run) {
			strs++
			if run.Math != nil {
				if _, err := eqn.Layout(run.Math, eqn.Style{Size: 9.5}); err != nil {
					t.Errorf("%s: math %s: %v", r.name, eqn.String(run.Math), err)
				}
				return
			}
			face := run.Style
			if face == layout.Mono {
				check(run.Text, fonts.Mono, "own text")
				return
			}
			anyFace(run.Text, "own text") // a run may be set bold (headings, table heads)
		})
		if _, diags := layout.Document(doc); diags.HasErrors() {
			t.Errorf("%s: layout: %v", r.name, diags)
		}
	}
	t.Logf("%d strings checked", strs)
	if strs < 1000 {
		t.Errorf("only %d strings enumerated", strs)
	}
	for face, rs := range missing {
		var list []string
		for r := range rs {
			list = append(list, fmt.Sprintf("%q (U+%04X) in %s", r, r, where[r]))
		}
		sort.Strings(list)
		t.Errorf("%s lacks:\n  %s", face, strings.Join(list, "\n  "))
	}
}

// traceStrings collects every string held in every trace in res: step
// symbols, formulas' symbol and function names, notes, cases, units and
// references, caution messages, source citations.
func traceStrings(res *eval.Result) []string {
	seen := map[string]bool{}
	var out []string
	walkTraces(reflect.ValueOf(res), false, map[uintptr]bool{}, func(s string) {
		if s != "" && !seen[s] {
			seen[s] = true
			out = append(out, s)
		}
	})
	sort.Strings(out)
	return out
}

var traceType = reflect.TypeOf(trace.Trace{})

// walkTraces finds every trace.Trace reachable from v and passes each
// string inside it to add.
func walkTraces(v reflect.Value, in bool, seen map[uintptr]bool, add func(string)) {
	switch v.Kind() {
	case reflect.String:
		if in {
			add(v.String())
		}
	case reflect.Pointer:
		if v.IsNil() || seen[v.Pointer()] {
			return
		}
		seen[v.Pointer()] = true
		walkTraces(v.Elem(), in, seen, add)
	case reflect.Interface:
		if !v.IsNil() {
			walkTraces(v.Elem(), in, seen, add)
		}
	case reflect.Struct:
		in = in || v.Type() == traceType
		for i := 0; i < v.NumField(); i++ {
			walkTraces(v.Field(i), in, seen, add)
		}
	case reflect.Slice, reflect.Array:
		for i := 0; i < v.Len(); i++ {
			walkTraces(v.Index(i), in, seen, add)
		}
	case reflect.Map:
		it := v.MapRange()
		for it.Next() {
			walkTraces(it.Key(), in, seen, add)
			walkTraces(it.Value(), in, seen, add)
		}
	}
}

// walkOwn calls fn for every run of plinth's own text in doc.
func walkOwn(doc layout.Doc, fn func(layout.Run)) {
	runs := func(rs []layout.Run) {
		for _, r := range rs {
			if r.Own {
				fn(r)
			}
		}
	}
	var blocks func([]layout.Block)
	blocks = func(bs []layout.Block) {
		for _, b := range bs {
			switch b := b.(type) {
			case *layout.Heading:
				runs(b.Runs)
			case *layout.Para:
				runs(b.Runs)
			case *layout.List:
				for _, it := range b.Items {
					blocks(it)
				}
			case *layout.Table:
				runs(b.Caption)
				for _, c := range b.Header {
					runs(c)
				}
				for _, r := range b.Rows {
					for _, c := range r.Cells {
						runs(c)
					}
				}
			case *layout.Image:
				runs(b.Caption)
			case *layout.Drawing:
				runs(b.Caption)
			case *layout.Statement:
				runs(b.Note)
			case *layout.Input:
				runs(b.Note)
			case *layout.Check:
				runs(b.Note)
			case *layout.Caution:
				runs(b.Title)
				blocks(b.Body)
			case *layout.Beside:
				blocks(b.Left)
				blocks(b.Right)
			}
		}
	}
	for _, s := range doc.Sheets {
		blocks(s.Blocks)
	}
}
