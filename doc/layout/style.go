package layout

import "github.com/plinth-calc/plinth/doc/layout/draw"

// The house design: sizes in points, colours restrained. One accent colour
// (a dark slate blue) marks structure; red and green only ever support the
// words NOT OK and OK.
const (
	bodySize    = 8.6
	mathSize    = MathSize
	bodyLead    = 1.3 // line height / size
	noteSize    = 7.3
	tableSize   = 8.5
	compactSize = 7.6 // compact tables (Table.Compact)
	codeSize    = 8.2
	captionSize = 8.2
	paraGap     = 4.0 // space between paragraphs
	calcGap     = 1.0 // space between calc lines
	calcPad     = 0.7 // space above and below a calc line's formula
)

// MathSize is the size calculation lines set their formulas in (compose
// measures formulas at it to decide how to print them).
const MathSize = 8.4

var headingSize = [4]float64{0, 12, 10.2, 9.4}
var headingGap = [4]float64{0, 11, 8, 6}

var (
	ink      = draw.Color{R: 26, G: 26, B: 30}
	muted    = draw.Color{R: 88, G: 92, B: 100}
	accent   = draw.Color{R: 36, G: 64, B: 104}
	linkInk  = draw.Color{R: 26, G: 78, B: 160}
	ruleInk  = draw.Color{R: 150, G: 154, B: 162}
	hairInk  = draw.Color{R: 208, G: 211, B: 216}
	shade    = draw.Color{R: 242, G: 243, B: 245}
	headFill = draw.Color{R: 232, G: 235, B: 240}
	okInk    = draw.Color{R: 22, G: 110, B: 52}
	badInk   = draw.Color{R: 190, G: 28, B: 28}
	badFill  = draw.Color{R: 253, G: 236, B: 236}
)
