package parse_test

import (
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/doc/source"
)

// TestSmall parses short sheets and checks one fact of each tree.
func TestSmall(t *testing.T) {
	for _, c := range []struct {
		name, src string
		check     func(*sheet.Sheet) string // "" when right
	}{
		{"fence closed at end of file without a newline", "```calc\nq = 1 kPa\n```", func(s *sheet.Sheet) string {
			if c, ok := s.Body[0].(*sheet.Calc); !ok || len(c.Lines) != 1 {
				return "no calc block with one line"
			}
			return ""
		}},
		{"byte order mark before front matter", "\ufeff---\ntitle: T\n---\ntext\n", func(s *sheet.Sheet) string {
			if s.Meta.Title.Value != "T" {
				return "title not read"
			}
			return ""
		}},
		{"statement positions after multibyte runes", "```calc\nγ_w = 9.81 kN/m³   # water, 10 °C\n```\n", func(s *sheet.Sheet) string {
			st := s.Body[0].(*sheet.Calc).Lines[0].(*sheet.Stmt)
			note := st.Note()
			if got := note.Span.Pos().String(); got != ":2:22" || note.Span.Text() != "water, 10 °C" {
				return "note at " + got + ": " + note.Span.Text()
			}
			return ""
		}},
		{"option note and value spans", "```settlement F on g\nlimit = 25 mm  # [GI] limit\n```\n", func(s *sheet.Sheet) string {
			o := s.Body[0].(*sheet.Analysis).Options()[0]
			if o.Value.Span.Text() != "25 mm" || o.Note.Value != "[GI] limit" || len(sheet.CitesIn(o.Note)) != 1 {
				return "value " + o.Value.Span.Text() + ", note " + o.Note.Value
			}
			return ""
		}},
		{"result prefix", "```bearing F2 on site as F2_vesic\nmethod = vesic\n```\n", func(s *sheet.Sheet) string {
			a := s.Body[0].(*sheet.Analysis)
			if a.ResultPrefix().Value != "F2_vesic" || a.Footing.Value != "F2" || a.Ground.Value != "site" {
				return "names wrong"
			}
			return ""
		}},
		{"table cells with escaped pipes and no outer pipes", "```ground g\nlayer | top (m)\n--- | ---\nA \\| B | 0\n```\n", func(s *sheet.Sheet) string {
			// rows must start with "|" in plinth blocks: these lines are statements
			g := s.Body[0].(*sheet.Ground)
			if g.Table != nil {
				return "table read from lines without a leading |"
			}
			return ""
		}},
		{"escaped pipe inside a cell", "```ground g\n| layer | top (m) |\n| --- | --- |\n| A \\| B | 0 |\n```\n", func(s *sheet.Sheet) string {
			g := s.Body[0].(*sheet.Ground)
			if g.Table == nil || len(g.Table.Rows) != 1 || g.Table.Rows[0].Cells[0].Value != "A | B" {
				return "escaped pipe split the cell"
			}
			return ""
		}},
		{"image inside text splits the paragraph", "See ![plan](f.png) here.\n", func(s *sheet.Sheet) string {
			if len(s.Body) != 3 {
				return "not split in three"
			}
			if p := s.Body[2].(*sheet.Paragraph); p.Text[0].(*sheet.Text).Value != "here." {
				return "text after the image not trimmed"
			}
			return ""
		}},
	} {
		s, _ := parse.Sheet(source.NewFile("", []byte(c.src)))
		if msg := c.check(s); msg != "" {
			t.Errorf("%s: %s", c.name, msg)
		}
	}
}

// TestOneErrorPerProblem checks that a bad line gives its own error and
// that parsing goes on after it.
func TestOneErrorPerProblem(t *testing.T) {
	src := "```calc\na = 1 +\nb = 2\nc = * 3\n```\n\n{unclosed\n\n```bearing F on g\nmethd = ec7\n```\n"
	s, diags := parse.Sheet(source.NewFile("x.md", []byte(src)))
	var lines []string
	for _, d := range diags {
		lines = append(lines, d.Pos().String())
	}
	if got := strings.Join(lines, " "); got != "x.md:2:8 x.md:4:5 x.md:7:1 x.md:10:1" {
		t.Errorf("diagnostics at %s:\n%v", got, diags)
	}
	if c := s.Body[0].(*sheet.Calc); len(c.Lines) != 3 {
		t.Errorf("calc lines: %d", len(c.Lines))
	}
}
