package suggest_test

import (
	"fmt"
	"testing"

	"github.com/plinth-calc/plinth/internal/suggest"
)

func TestNearest(t *testing.T) {
	keys := []string{"project", "job", "client", "title", "calc", "by", "date", "checked", "checked_date"}
	for _, c := range []struct{ in, want string }{
		{"titel", "title"},     // transposition: one edit
		{"Title", "title"},     // letter case
		{"chekced", "checked"}, // transposition and a long name
		{"byy", "by"},          // one edit, short name
		{"colour", ""},         // nothing close
		{"title", ""},          // itself is never suggested
		{"x", ""},              // a single letter is not corrected
		{"bz", "by"},           // two runes, one edit
		{"", ""},
	} {
		got, ok := suggest.Nearest(c.in, keys)
		if got != c.want || ok != (c.want != "") {
			t.Errorf("Nearest(%q) = %q, %v; want %q", c.in, got, ok, c.want)
		}
	}
	cells := []string{"site.firm_clay.top", "site.firm_clay.c'", "site.firm_clay.c_u", "site.firm_clay.phi'"}
	for _, c := range []struct{ in, want string }{
		{"site.firm_clay.cu", "site.firm_clay.c_u"}, // underscores only, before the equally near c'
		{"site.firm_clay.C_U", "site.firm_clay.c_u"},
		{"site.firm_clay.phi", "site.firm_clay.phi'"},
	} {
		if got, _ := suggest.Nearest(c.in, cells); got != c.want {
			t.Errorf("Nearest(%q) = %q; want %q", c.in, got, c.want)
		}
	}
	// The length rule: one edit up to four runes, two beyond.
	for _, c := range []struct {
		in   string
		cand []string
		want string
	}{
		{"kpa", []string{"kPa"}, "kPa"},          // case wins
		{"degs", []string{"deg"}, "deg"},         // four runes, one edit
		{"dgrs", []string{"deg"}, ""},            // four runes, two edits
		{"gruond", []string{"ground"}, "ground"}, // a transposition is one edit
		{"grnd", []string{"ground"}, ""},         // four runes, two edits
		{"setlment", []string{"settlement"}, "settlement"},
	} {
		if got, _ := suggest.Nearest(c.in, c.cand); got != c.want {
			t.Errorf("Nearest(%q, %q) = %q; want %q", c.in, c.cand, got, c.want)
		}
	}
}

func TestDistance(t *testing.T) {
	if d := suggest.Distance("γ_w", "g_w"); d != 1 {
		t.Errorf("Distance counts runes, not bytes: %d", d)
	}
	// Optimal string alignment: a transposition is one edit (hand-counted).
	for _, c := range []struct {
		a, b string
		d    int
	}{
		{"clac", "calc", 1}, {"cehck", "check", 1}, {"grund", "ground", 1},
		{"ca", "abc", 3}, {"kitten", "sitting", 3}, {"", "abc", 3}, {"abc", "abc", 0},
	} {
		if d := suggest.Distance(c.a, c.b); d != c.d {
			t.Errorf("Distance(%q, %q) = %d, want %d", c.a, c.b, d, c.d)
		}
	}
}

func ExampleNearest() {
	fmt.Println(suggest.Nearest("gammasat", []string{"gamma", "gamma_sat"}))
	fmt.Println(suggest.Nearest("shpae", []string{"shape", "self_weight"}))
	// Output:
	// gamma_sat true
	// shape true
}
