package severity_test

import (
	"testing"

	"github.com/plinth-calc/plinth/calc/severity"
)

// The order and the words are the one definition the engine, the sheet
// model and the layout share (common practice: ANSI Z535.4 ranks WARNING
// above CAUTION).
func TestOrderAndWords(t *testing.T) {
	if !(severity.Note < severity.Caution && severity.Caution < severity.Warning) {
		t.Fatal("want NOTE < CAUTION < WARNING")
	}
	for i, w := range severity.Words {
		l, ok := severity.Parse(w)
		if !ok || int(l) != i || l.String() != w || l.Meaning() == "" {
			t.Errorf("word %q: level %d %v, string %q, meaning %q", w, l, ok, l.String(), l.Meaning())
		}
	}
	if _, ok := severity.Parse("DANGER"); ok {
		t.Error("DANGER is not a level")
	}
	if s := severity.Level(7).String(); s != "Level(7)" || severity.Level(7).Valid() {
		t.Errorf("out of range: %q", s)
	}
}
