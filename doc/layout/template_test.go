package layout_test

import (
	"bytes"
	"errors"
	"image"
	"image/png"
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/layout/draw"
	sheetmodel "github.com/plinth-calc/plinth/doc/sheet"
	"github.com/plinth-calc/plinth/templates"
)

func TestBuiltinTemplates(t *testing.T) {
	// the names the parser accepts are the templates built in
	if got, want := strings.Join(templates.PageNames(), ","), strings.Join(sheetmodel.Templates, ","); got != want || got != "a4,letter" {
		t.Errorf("built-in templates %q, the sheet model knows %q", got, want)
	}
	for _, tt := range []struct {
		name string
		w, h float64 // points; ISO 216 A4 is 210 × 297 mm, US Letter 8.5 × 11 in
	}{{"a4", 595.28, 841.89}, {"letter", 612, 792}} {
		tpl, err := layout.BuiltinTemplate(tt.name)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(float64(tpl.Page.Width)-tt.w) > 0.01 || math.Abs(float64(tpl.Page.Height)-tt.h) > 0.01 {
			t.Errorf("%s: %v × %v", tt.name, tpl.Page.Width, tpl.Page.Height)
		}
		doc := sheet(para(2, "x"))
		doc.Template = tpl
		if _, diags := layout.Document(doc); diags.HasErrors() {
			t.Errorf("%s: %v", tt.name, diags)
		}
	}
	if _, err := layout.BuiltinTemplate("a3"); err == nil {
		t.Error("a3 should not exist")
	}
}

func TestParseLength(t *testing.T) {
	for in, want := range map[string]float64{"72": 72, "1in": 72, "25.4mm": 72, "2.54cm": 72, "9pt": 9, " 10 mm ": 28.3465} {
		got, err := layout.ParseLength(in)
		if err != nil || math.Abs(got-want) > 0.001 {
			t.Errorf("ParseLength(%q) = %v, %v; want %v", in, got, err, want)
		}
	}
	for _, in := range []string{"", "mm", "-3mm", "3 furlongs"} {
		if _, err := layout.ParseLength(in); err == nil {
			t.Errorf("ParseLength(%q) accepted", in)
		}
	}
}

func a4() string {
	b, _ := templates.Page("a4")
	return string(b)
}

func TestTemplateErrors(t *testing.T) {
	tests := []struct {
		name, edit, with, want string
	}{
		{"unknown field", "name: A4", "name: A4\ncolour: red", "field colour not found"},
		{"no sheet field", `text: "{sheet} of {sheets}"`, `text: "x"`, "no {sheet} field"},
		{"no checked field", `text: "{checked}   {checked_date}"`, `text: "{checked_date}"`, "no {checked} field"},
		{"footer without fingerprint", `left: "inputs {fingerprint}"`, `left: "inputs"`, "footer has no {fingerprint}"},
		{"cell outside", "w: 24mm,  h: 7mm, label: Sheet", "w: 90mm,  h: 7mm, label: Sheet", "lies outside the title block"},
		{"bad length", "height: 14mm", "height: tall", `bad length "tall"`},
		{"unknown placeholder", `text: "{sheet} of {sheets}"`, `text: "{sheet} of {sheet_count}"`, "unknown field {sheet_count}; fields are:"},
		{"misspelt placeholder", `text: "{sheet} of {sheets}"`, `text: "{sheet} of {shets}"`, "unknown field {shets}; did you mean {sheets}?"},
		{"bad align", "label: Rev.,", "label: Rev., align: middle,", `align "middle"`},
	}
	for _, tt := range tests {
		src := a4()
		if !strings.Contains(src, tt.edit) {
			t.Fatalf("%s: template lacks %q", tt.name, tt.edit)
		}
		_, err := layout.LoadTemplate([]byte(strings.Replace(src, tt.edit, tt.with, 1)), nil)
		if err == nil || !strings.Contains(err.Error(), tt.want) {
			t.Errorf("%s: err = %v, want %q", tt.name, err, tt.want)
		}
	}
}

func TestTemplateLogo(t *testing.T) {
	img := image.NewGray(image.Rect(0, 0, 40, 20))
	var logo bytes.Buffer
	png.Encode(&logo, img)
	src := strings.Replace(a4(), "  cells:", "  logo: {path: logo.png, x: 150mm, y: 1mm, w: 27mm, h: 6mm}\n  cells:", 1)
	read := func(path string) ([]byte, error) {
		if path != "logo.png" {
			return nil, errors.New("outside the package")
		}
		return logo.Bytes(), nil
	}
	tpl, err := layout.LoadTemplate([]byte(src), read)
	if err != nil {
		t.Fatal(err)
	}
	doc := sheet(para(2, "x"))
	doc.Template = tpl
	p, diags := layout.Document(doc)
	if diags.HasErrors() {
		t.Fatal(diags)
	}
	found := false
	for _, it := range p.Pages[0].Boxes[0].Items {
		if im, ok := it.(draw.Image); ok {
			found = true
			if math.Abs(im.W/im.H-2) > 1e-9 || im.H > 6*72/25.4+1e-9 {
				t.Errorf("logo %v × %v: aspect or size wrong", im.W, im.H)
			}
		}
	}
	if !found {
		t.Error("no logo in the title block")
	}
	if _, err := layout.LoadTemplate([]byte(src), nil); err == nil {
		t.Error("a logo with no file reader should fail")
	}
	bad := func(string) ([]byte, error) { return []byte("not an image"), nil }
	if _, err := layout.LoadTemplate([]byte(src), bad); err == nil || !strings.Contains(err.Error(), "not a PNG or JPEG") {
		t.Errorf("bad logo: %v", err)
	}
}
