package layout

import (
	"regexp"
	"strings"
	"testing"
)

// TestExpand: the hand-written placeholder scan fills what the pattern
// matches, and nothing else.
func TestExpand(t *testing.T) {
	value := func(f string) (string, bool) { return "<" + f + ">", f != "bad" }
	for _, c := range []struct{ in, want string }{
		{"", ""}, {"plain", "plain"}, {"{sheet} of {sheets}", "<sheet> of <sheets>"}, {"{}", "<>"},
		{"{a b}", "{a b}"}, {"{{x}}", "{<x>}"}, {"x{", "x{"}, {"{x", "{x"}, {"é{a_1}é", "é<a_1>é"}, {"  {p}  ", "<p>"},
	} {
		got, _ := expand(c.in, value)
		if got != c.want {
			t.Errorf("expand(%q) = %q, want %q", c.in, got, c.want)
		}
		re := regexp.MustCompile(`\{([A-Za-z0-9_]*)\}`)
		if want := strings.TrimSpace(re.ReplaceAllStringFunc(c.in, func(m string) string { v, _ := value(m[1 : len(m)-1]); return v })); got != want {
			t.Errorf("expand(%q) = %q, the pattern gives %q", c.in, got, want)
		}
	}
	if _, ok := expand("a {bad} b", value); ok {
		t.Error("a warning value did not clear ok")
	}
}
