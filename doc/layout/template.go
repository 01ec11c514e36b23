package layout

import (
	"bytes"
	"errors"
	"fmt"
	"github.com/plinth-calc/plinth/doc/media"
	_ "image/jpeg" // logo formats
	_ "image/png"
	"regexp"
	"sort"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"

	"github.com/plinth-calc/plinth/internal/suggest"
	"github.com/plinth-calc/plinth/templates"
)

// Length is a distance in points. In a template file it is written with a
// unit — "12mm", "1.5cm", "0.5in", "9pt" — or as a bare number of points.
type Length float64

// UnmarshalYAML reads a length with its unit.
func (l *Length) UnmarshalYAML(n *yaml.Node) error {
	v, err := parseLength(n.Value)
	if err != nil {
		return fmt.Errorf("line %d: %v", n.Line, err)
	}
	*l = Length(v)
	return nil
}

// parseLength reads "12mm", "1.5cm", "0.5in", "9pt" or a bare number of
// points, and returns points.
func parseLength(s string) (float64, error) {
	s = strings.TrimSpace(s)
	unit := 1.0
	for _, u := range []struct {
		suffix string
		pt     float64
	}{{"mm", 72 / 25.4}, {"cm", 72 / 2.54}, {"in", 72}, {"pt", 1}} {
		if strings.HasSuffix(s, u.suffix) {
			s, unit = strings.TrimSpace(strings.TrimSuffix(s, u.suffix)), u.pt
			break
		}
	}
	v, err := strconv.ParseFloat(s, 64)
	if err != nil || v < 0 || v > 1e5 {
		return 0, fmt.Errorf("bad length %q: want a non-negative number with mm, cm, in or pt", s)
	}
	return v * unit, nil
}

// Template is a page design: paper size, margins, the title block printed
// at the top of every page, and the footer printed at the bottom. Built-in
// templates are "a4" and "letter"; a firm supplies its own as YAML (see
// templates/page-a4.yaml for the format).
type Template struct {
	Name       string     `yaml:"name"`
	Page       PageSize   `yaml:"page"`
	Margin     Margins    `yaml:"margin"`
	TitleBlock TitleBlock `yaml:"title_block"`
	Footer     Footer     `yaml:"footer"`
	// Logo holds the logo image bytes once loaded.
	Logo []byte `yaml:"-"`
}

// PageSize is the paper size.
type PageSize struct {
	Width  Length `yaml:"width"`
	Height Length `yaml:"height"`
}

// Margins are the distances from the paper edges to the title block
// (top), the footer (bottom) and the text (sides).
type Margins struct {
	Top    Length `yaml:"top"`
	Right  Length `yaml:"right"`
	Bottom Length `yaml:"bottom"`
	Left   Length `yaml:"left"`
}

// TitleBlock is the boxed block of fields at the top of each page, as wide
// as the text. Cells are placed relative to its top-left corner.
type TitleBlock struct {
	Height    Length      `yaml:"height"`
	Gap       Length      `yaml:"gap"`        // space between it and the text
	Line      Length      `yaml:"line"`       // rule width of the cell borders
	LabelSize Length      `yaml:"label_size"` // size of cell labels
	ValueSize Length      `yaml:"value_size"` // default size of cell values
	Cells     []TitleCell `yaml:"cells"`
	Logo      *Logo       `yaml:"logo"`
}

// TitleCell is one bordered cell: a small label at its top left and a
// value below it. Text is the value with {field} placeholders: project,
// job, client, title, calc, rev, by, date, checked, checked_date, sheet,
// sheets, page, pages, fingerprint, or a firm's own field name (Fields.Extra).
// {checked} prints NOT CHECKED when the sheet has no checker.
type TitleCell struct {
	X     Length `yaml:"x"`
	Y     Length `yaml:"y"`
	W     Length `yaml:"w"`
	H     Length `yaml:"h"`
	Label string `yaml:"label"`
	Text  string `yaml:"text"`
	Size  Length `yaml:"size"`  // value size; 0 = ValueSize
	Bold  bool   `yaml:"bold"`  // value in bold
	Align string `yaml:"align"` // left (default), center, right
}

// Logo is an image placed in the title block, read from Path by the
// loader's readFile function.
type Logo struct {
	Path string `yaml:"path"`
	X    Length `yaml:"x"`
	Y    Length `yaml:"y"`
	W    Length `yaml:"w"`
	H    Length `yaml:"h"`
}

// Footer is the line at the foot of each page: left, centre and right
// texts with the same placeholders as title cells. It must carry
// {fingerprint} and {page}.
type Footer struct {
	Height Length `yaml:"height"`
	Size   Length `yaml:"size"`
	Left   string `yaml:"left"`
	Center string `yaml:"center"`
	Right  string `yaml:"right"`
}

// BodyWidth is the width of the text column.
func (t *Template) BodyWidth() float64 {
	return float64(t.Page.Width - t.Margin.Left - t.Margin.Right)
}

// body is the text area: left, top, width, height.
func (t *Template) body() (x, y, w, h float64) {
	x = float64(t.Margin.Left)
	y = float64(t.Margin.Top + t.TitleBlock.Height + t.TitleBlock.Gap)
	w = t.BodyWidth()
	h = float64(t.Page.Height-t.Margin.Bottom-t.Footer.Height) - y
	return
}

// BuiltinTemplate returns a built-in template by name ("a4", "letter").
func BuiltinTemplate(name string) (*Template, error) {
	data, err := templates.Page(name)
	if err != nil {
		return nil, err
	}
	return LoadTemplate(data, nil)
}

var placeholder = regexp.MustCompile(`\{([A-Za-z0-9_]*)\}`)

// LoadTemplate decodes a template from YAML and checks it. readFile reads
// the logo named by the template (the caller restricts which paths it may
// read); it may be nil for a template without a logo.
func LoadTemplate(data []byte, readFile func(path string) ([]byte, error)) (*Template, error) {
	var t Template
	dec := yaml.NewDecoder(bytes.NewReader(data))
	dec.KnownFields(true)
	if err := dec.Decode(&t); err != nil {
		return nil, fmt.Errorf("page template: %v", err)
	}
	if err := t.check(); err != nil {
		return nil, fmt.Errorf("page template %s: %v", t.Name, err)
	}
	if lg := t.TitleBlock.Logo; lg != nil {
		if readFile == nil {
			return nil, fmt.Errorf("page template %s: logo %s: no way to read files here", t.Name, lg.Path)
		}
		b, err := readFile(lg.Path)
		if err != nil {
			return nil, fmt.Errorf("page template %s: logo: %v", t.Name, err)
		}
		if _, err := media.Check(b); err != nil {
			return nil, fmt.Errorf("page template %s: logo %s %v", t.Name, lg.Path, err)
		}
		t.Logo = b
	}
	return &t, nil
}

var knownFields = map[string]bool{
	"project": true, "job": true, "client": true, "title": true, "calc": true,
	"rev": true, "by": true, "date": true, "checked": true, "checked_date": true,
	"sheet": true, "sheets": true, "page": true, "pages": true, "fingerprint": true,
}

// fieldHint suggests the known field nearest an unknown one, or lists them.
func fieldHint(name string) string {
	names := make([]string, 0, len(knownFields))
	for n := range knownFields {
		names = append(names, n)
	}
	sort.Strings(names)
	if n, ok := suggest.Nearest(name, names); ok {
		return "did you mean {" + n + "}?"
	}
	return "fields are: " + strings.Join(names, ", ")
}

func (t *Template) check() error {
	var errs []error
	bad := func(format string, args ...any) { errs = append(errs, fmt.Errorf(format, args...)) }
	if t.Name == "" {
		bad("name is missing")
	}
	if t.Page.Width < 144 || t.Page.Height < 144 {
		bad("page size %.1f × %.1f pt is too small", t.Page.Width, t.Page.Height)
	}
	if t.BodyWidth() < 144 {
		bad("margins leave a text column of %.1f pt; want at least 144 pt", t.BodyWidth())
	}
	if _, _, _, h := t.body(); h < 144 {
		bad("margins, title block and footer leave %.1f pt of text height; want at least 144 pt", h)
	}
	tb := &t.TitleBlock
	if tb.LabelSize == 0 {
		tb.LabelSize = 5.5
	}
	if tb.ValueSize == 0 {
		tb.ValueSize = 8.5
	}
	if tb.Line == 0 {
		tb.Line = 0.5
	}
	if t.Footer.Size == 0 {
		t.Footer.Size = 6.5
	}
	w := Length(t.BodyWidth())
	seen := map[string]bool{}
	uses := func(where, s string) {
		for _, m := range placeholder.FindAllStringSubmatch(s, -1) {
			if m[1] == "" {
				bad("%s: empty placeholder {}", where)
			} else if !knownFields[m[1]] {
				bad("%s: unknown field {%s}; %s", where, m[1], fieldHint(m[1]))
			}
			seen[m[1]] = true
		}
	}
	for i, c := range tb.Cells {
		where := fmt.Sprintf("title_block cell %d (%s)", i+1, c.Label)
		if c.W <= 0 || c.H <= 0 || c.X+c.W > w+0.01 || c.Y+c.H > tb.Height+0.01 {
			bad("%s lies outside the title block (%.1f × %.1f pt)", where, w, tb.Height)
		}
		switch c.Align {
		case "", "left", "center", "right":
		default:
			bad("%s: align %q: want left, center or right", where, c.Align)
		}
		uses(where, c.Text)
	}
	if lg := tb.Logo; lg != nil {
		if lg.Path == "" {
			bad("title_block logo has no path")
		}
		if lg.W <= 0 || lg.H <= 0 || lg.X+lg.W > w+0.01 || lg.Y+lg.H > tb.Height+0.01 {
			bad("title_block logo lies outside the title block")
		}
	}
	for _, f := range []string{"sheet", "checked"} {
		if !seen[f] {
			bad("title block has no {%s} field; every page must show it", f)
		}
	}
	footer := map[string]bool{}
	for _, s := range []string{t.Footer.Left, t.Footer.Center, t.Footer.Right} {
		for _, m := range placeholder.FindAllStringSubmatch(s, -1) {
			footer[m[1]] = true
		}
		uses("footer", s)
	}
	for _, f := range []string{"fingerprint", "page"} {
		if !footer[f] {
			bad("footer has no {%s}; every page footer must carry it", f)
		}
	}
	if t.Footer.Height < t.Footer.Size {
		bad("footer height %.1f pt is less than its text size", t.Footer.Height)
	}
	return errors.Join(errs...)
}
