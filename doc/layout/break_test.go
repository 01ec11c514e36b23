package layout

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout/draw"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestBreakLongWord: a word wider than its line breaks into lines that
// fit, with a hyphen only between two letters, and the text is kept
// (common practice of typesetting; no hyphen in numbers or URLs).
func TestBreakLongWord(t *testing.T) {
	cases := []struct {
		name, text string
		width      float64
		hyphen     bool
	}{
		{"letters", strings.Repeat("abc", 2000), 120, true},
		{"digits", "1" + strings.Repeat("0", 3000), 120, false},
		{"url", "https://example.com/" + strings.Repeat("ab/", 500), 120, false},
		{"narrow", strings.Repeat("w", 50), 0.5, false}, // one character a line
		{"negative", strings.Repeat("w", 50), -8, false},
	}
	e := &engine{}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			lines := e.setText(plain(c.text), c.width, bodyStyle, source.Span{File: source.NewFile("a.md", nil)})
			var got strings.Builder
			hyphens := 0
			for i, ln := range lines {
				if ln.w > c.width+1e-6 && c.width > 8 {
					t.Errorf("line %d is %.1f pt wide, over %.1f", i, ln.w, c.width)
				}
				for _, it := range ln.appendItems(nil, 0, 0) {
					s := it.(draw.Text).Text
					if i < len(lines)-1 && strings.HasSuffix(s, "-") {
						s = strings.TrimSuffix(s, "-")
						hyphens++
					}
					got.WriteString(s)
				}
			}
			if got.String() != c.text {
				t.Errorf("text changed: %d characters in, %d out", len(c.text), got.Len())
			}
			if c.hyphen != (hyphens > 0) {
				t.Errorf("%d hyphens over %d lines", hyphens, len(lines))
			}
			if c.width <= 1 && len(lines) != 50 {
				t.Errorf("%d lines, want one a character", len(lines))
			}
		})
	}
}
