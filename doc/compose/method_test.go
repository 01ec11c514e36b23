package compose_test

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/layout"
)

// The bearing method line names Terzaghi's local-shear reduction exactly
// when the engine used it (local_shear = yes), and keeps "EN 1997-1:2004
// Annex D" alone under auto on loose sand, where the engine only warns.
func TestMethodLineLocalShear(t *testing.T) {
	for _, r := range []struct {
		opt  string
		want string
		not  string
	}{
		{"local_shear = yes", "Method: EN 1997-1:2004 Annex D with Terzaghi's (1943) local-shear reduction.", ""},
		{"local_shear = auto", "Method: EN 1997-1:2004 Annex D.", "local-shear reduction."},
	} {
		dir := t.TempDir()
		sheet := "---\ntitle: Pad\ncalc: \"1\"\n---\n\n```ground site\n| layer | top (m) | gamma (kN/m3) | phi' (deg) | N |\n| --- | --- | --- | --- | --- |\n| Loose sand | 0 | 18 | 30 | 8 |\n```\n\n" +
			"```footing F1\nshape = square\nB = 2 m\nD = 1 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 300 |\n```\n\n```bearing F1 on site\n" + r.opt + "\n```\n"
		if err := os.WriteFile(filepath.Join(dir, "01-pad.md"), []byte(sheet), 0o644); err != nil {
			t.Fatal(err)
		}
		doc, d := compose.Document(evaluate(t, dir), compose.Options{})
		if d.HasErrors() {
			t.Fatal(d)
		}
		var text strings.Builder
		for _, s := range doc.Sheets {
			for _, b := range s.Blocks {
				if p, ok := b.(*layout.Para); ok {
					for _, run := range p.Runs {
						text.WriteString(run.Text)
					}
					text.WriteString("\n")
				}
			}
		}
		got := text.String()
		if !strings.Contains(got, r.want) || (r.not != "" && strings.Contains(got, r.not)) {
			t.Errorf("%s: method line not as wanted %q:\n%s", r.opt, r.want, got)
		}
	}
}
