package sketch

import (
	"math"

	"github.com/plinth-calc/plinth/doc/layout/fonts"
)

// sk is a sketch laid out: the section's scale and place, the label
// column and the plan's box.
type sk struct {
	f       Footing
	w, h    float64
	s       float64 // points per metre in the section
	half    float64 // half the section's width, m
	zBot    float64 // depth of the section's bottom, m
	t       float64 // footing thickness, m
	cw      float64 // column (or wall) width, m
	xc, yGL float64 // page position of the footing's centre line and of GL
	colTop  float64 // page y of the column's top
	labX    float64 // left of the layer label column
	labW    float64
	plan    bool
	planX   float64 // left of the plan's box
	planW   float64
	titleY  float64 // baseline of the titles; 0 = none
	noteY   float64 // baseline of the note on deep groundwater; 0 = none
}

const (
	colAbove  = 16.0 // column above GL (or above the footing), points
	loadRoom  = 38.0 // above the column: the V arrow and its label
	belowBase = 30.0 // under the base: B dimension and its label
	planGap   = 18.0
	dimShift  = 12.0 // how far the B dimensions may move down off a line
)

func (k *sk) X(x float64) float64 { return k.xc + x*k.s }
func (k *sk) Y(z float64) float64 { return k.yGL + z*k.s }

func clamp(v, lo, hi float64) float64 { return math.Max(lo, math.Min(hi, v)) }

func (k *sk) loads() bool { return k.f.V != 0 || k.f.H != 0 || k.f.M != 0 }

// labels are the layer label column's lines: platform first, then layers
// whose top is inside the sketch.
type label struct {
	z    float64
	text string
	plat bool
}

func (k *sk) labels(zBot float64) []label {
	var ls []label
	if p := k.f.Platform; p != nil {
		n := p.Name
		if n == "" {
			n = "Working platform"
		}
		ls = append(ls, label{0, n + " (" + metres(p.Thickness) + " thick)", true})
	}
	plat := 0.0
	if k.f.Platform != nil {
		plat = k.f.Platform.Thickness
	}
	for i, l := range k.f.Layers {
		top := math.Max(l.Top, plat) // under the platform, the layer shows from its base
		if i+1 < len(k.f.Layers) && k.f.Layers[i+1].Top <= plat {
			continue // wholly replaced by the platform
		}
		if top < zBot {
			from := "from GL"
			if top > 0 {
				from = "from " + metres(top)
			}
			ls = append(ls, label{top, l.Name + " " + from, false})
		}
	}
	return ls
}

// arrange scales the section to fit w × h beside its labels and plan.
func arrange(f Footing, w, h float64) (*sk, error) {
	k := &sk{f: f, w: w, h: h, plan: f.Shape != "strip"}
	B, D := f.B, f.D
	k.t = f.Thickness
	if k.t == 0 {
		k.t = clamp(0.35*B, 0.25, 0.6)
		if D >= 0.25 {
			k.t = math.Min(k.t, D)
		}
	}
	k.cw = math.Min(clamp(0.3*B, 0.25, 0.6), 0.6*B)
	if f.Shape == "strip" {
		k.cw = math.Min(clamp(0.25*B, 0.2, 0.4), 0.6*B)
	}
	k.half = B/2 + math.Max(math.Max(0.8*B, 0.9), 0.5*D)
	k.zBot = D + math.Max(2*B, 1)
	if f.Platform != nil {
		k.zBot = math.Max(k.zBot, f.Platform.Thickness+0.5)
	}
	top := pad
	if k.plan || f.Shape == "strip" {
		k.titleY = top + ascent(sizeTitle)
		top += ascent(sizeTitle) + descent(sizeTitle) + 4
	}
	above := colAbove + 4 + loadRoomIf(k.loads())
	stick := math.Max(0, k.t-D) // metres of footing above GL
	bottom := pad
	if f.Water != nil && *f.Water >= k.zBot {
		bottom += ascent(sizeText) + descent(sizeText) + 2
	}
	if k.plan {
		k.planW = clamp(0.26*w, 90, 150)
	}
	// the widest label sets the label column
	for _, l := range k.labels(math.Inf(1)) {
		k.labW = math.Max(k.labW, textW(fonts.Regular, sizeText, l.text))
	}
	if k.labW > 0 {
		k.labW += 6
	}
	availW := w - 2*pad - k.labW
	if k.plan {
		availW -= planGap + k.planW
	}
	// room each side of the footing, in points, for the D dimension and
	// the groundwater label
	sideP := 12 + 3 + 2 + textW(fonts.Regular, sizeText, "D = "+metres(D))
	if f.Water != nil {
		sideP = math.Max(sideP, 14+6+2+textW(fonts.Regular, sizeText, waterLabel(*f.Water)))
	}
	// each side of the footing is sideM metres, and at least sideP points
	sideM := k.half - B/2
	sw := math.Min((availW-2*sideP)/B, availW/(B+2*sideM))
	for range 4 {
		k.s = math.Min(sw, (h-top-bottom-above)/(k.zBot+stick))
		if k.s <= 0 || B*k.s < 24 {
			return nil, &Error{Param: "w × h", Value: num(w) + " × " + num(h), Want: "leaves too little room to draw the footing"}
		}
		need := D + (belowBase+dimShift)/k.s
		if f.BEff != nil {
			need += 18 / k.s
		}
		if need <= k.zBot+1e-9 {
			break
		}
		k.zBot = need
	}
	k.half = B/2 + math.Max(sideM, sideP/k.s)
	above += stick * k.s
	// a section narrower than its room goes deeper, showing more ground
	k.zBot = math.Max(k.zBot, (h-top-bottom-above)/k.s)
	used := 2*k.half*k.s + k.labW
	if k.plan {
		used += planGap + k.planW
	}
	x0 := (w - used) / 2
	k.xc = x0 + k.half*k.s
	k.labX = x0 + 2*k.half*k.s + 6
	k.planX = x0 + 2*k.half*k.s + k.labW + planGap
	k.yGL = top + above
	k.colTop = k.Y(math.Min(0, D-k.t)) - colAbove
	if f.Water != nil && *f.Water >= k.zBot {
		k.noteY = k.Y(k.zBot) + 2 + ascent(sizeText)
	}
	return k, nil
}

func loadRoomIf(b bool) float64 {
	if b {
		return loadRoom
	}
	return 0
}
