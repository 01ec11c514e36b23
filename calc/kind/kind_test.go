package kind_test

import (
	"reflect"
	"testing"

	"github.com/plinth-calc/plinth/calc/kind"
)

func TestSpec(t *testing.T) {
	s := kind.Spec{Word: "x",
		Options: []kind.Option{{Name: "a", Words: []string{"yes", "no"}}, {Name: "b", Value: kind.Number, Form: "a number"}},
		Results: []kind.Result{{Symbol: "r", Unit: "kN", Meaning: "the r"}, {Symbol: "q", When: "a = yes"}}}
	if o, ok := s.Option("a"); !ok || !o.Allows("no") || o.Allows("maybe") {
		t.Errorf("Option(a) = %+v, %v", o, ok)
	}
	if got := s.OptionNames(); !reflect.DeepEqual(got, []string{"a", "b"}) {
		t.Errorf("OptionNames = %v", got)
	}
	if got := s.ResultNames(); !reflect.DeepEqual(got, []string{"r", "q"}) {
		t.Errorf("ResultNames() = %v", got)
	}
	if got := s.ResultNames(""); !reflect.DeepEqual(got, []string{"r"}) {
		t.Errorf(`ResultNames("") = %v`, got)
	}
	if got := s.ResultNames("a = yes"); !reflect.DeepEqual(got, []string{"q"}) {
		t.Errorf("ResultNames(a = yes) = %v", got)
	}
	if s.Meaning("r") != "the r" || s.Meaning("z") != "" {
		t.Error("Meaning")
	}
	p := s.Pick(map[string]string{"b": "c"}, "b", "a", "nope")
	if len(p) != 3 || p[0].Name != "c" || p[0].Form != "a number" || p[1].Name != "a" || p[2].Doc != "" {
		t.Errorf("Pick = %+v", p)
	}
	if s.Options[1].Name != "b" {
		t.Error("Pick renamed the original")
	}
	for in, want := range map[string]string{"kN": "kN/m", "kNm": "kNm/m", "m2": "m2/m", "kPa": "kPa", "": ""} {
		if got := kind.PerRun(in); got != want {
			t.Errorf("PerRun(%q) = %q", in, got)
		}
	}
}
