package compose_test

import (
	"regexp"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/sheet"
)

var (
	// "local_shear = yes", "method = auto": an option written as a sheet
	// line inside engine text.
	optionLine = regexp.MustCompile(`\b([a-z][a-z_]*[a-z]|K_s|r_a) = ([A-Za-z][A-Za-z0-9:().-]*)`)
	// "(option K_s)", "option two_layer"
	optionWord = regexp.MustCompile(`\boption ([A-Za-z][A-Za-z_]*)`)
)

// TestNamedOptionsExist: every option a caution or note of the engine
// recommends exists in some block kind, with a value that block accepts
// (one once recommended method = auto, which the parser rejects). Runs
// over every method and option word (the glyph test's package).
func TestNamedOptionsExist(t *testing.T) {
	if testing.Short() {
		t.Skip("evaluates many variants")
	}
	res := evaluate(t, glyphPackage(t))
	lookup := func(name string) []sheet.OptionSpec {
		var out []sheet.OptionSpec
		for _, k := range sheet.Specs {
			if o, ok := k.Option(name); ok {
				out = append(out, o)
			}
		}
		return out
	}
	named := 0
	for _, s := range traceStrings(res) {
		for _, m := range optionLine.FindAllStringSubmatch(s, -1) {
			m[2] = strings.TrimRight(m[2], ":.)")
			specs := lookup(m[1])
			if len(specs) == 0 {
				continue // a symbol in a formula (r_q = q_2/q_1), not an option
			}
			named++
			ok := false
			for _, o := range specs {
				ok = ok || o.Allows(m[2]) || (len(o.Words) == 0 && o.Form != "")
			}
			if !ok {
				t.Errorf("%q recommends %s = %s, which no block accepts", s, m[1], m[2])
			}
		}
		for _, m := range optionWord.FindAllStringSubmatch(s, -1) {
			named++
			if len(lookup(m[1])) == 0 {
				t.Errorf("%q names option %s, which no block has", s, m[1])
			}
		}
	}
	if named < 3 {
		t.Errorf("only %d option names found in engine text", named)
	}
}
