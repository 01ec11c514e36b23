package compose

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/units"
	"github.com/plinth-calc/plinth/doc/eval"
	"github.com/plinth-calc/plinth/doc/layout"
	"github.com/plinth-calc/plinth/doc/sketch"
)

// sketch draws the footing's section (doc/sketch) on the ground of the
// first analysis that uses it, with the characteristic actions summed as
// given (and the self-weight W the engine adds with self_weight = auto) and, when a bearing block checks it, the effective width of the
// governing case. A footing no analysis uses is drawn on no ground.
func (c *composer) sketch(s *eval.Sheet, b *eval.Block) []layout.Block {
	f := b.Footing
	m := f.Model
	var on *eval.Ground
	var gov *eval.Block
	for _, x := range c.footingUses()[f] {
		if on == nil {
			on = x.On
		}
		if f.NoB && x.Size != nil && m.B == 0 {
			m = x.Size.Footing // drawn at the size its size block chose
		}
		if gov == nil && x.Bearing != nil && x.Bearing.Governing >= 0 {
			gov = x
		}
	}
	if m.B == 0 {
		return nil // a footing to be sized that no size block sized: nothing to draw
	}
	sk := sketch.Footing{Shape: m.Shape.String(), B: m.B, L: m.L, D: m.D}
	if f.SelfWeight {
		sk.Thickness = f.H
	}
	if on != nil {
		g := on.Model
		if g.Water.Set {
			w := g.Water.V
			sk.Water = &w
		}
		layers := g.Layers
		if t, ok := g.PlatformDepth(); ok && m.D < t { // the ground model states it (platform = yes)
			sk.Platform = &sketch.Platform{Name: layers[0].Name, Thickness: t}
			layers = layers[1:]
		}
		for _, l := range layers {
			sk.Layers = append(sk.Layers, sketch.Layer{Name: l.Name, Top: l.Top})
		}
	}
	sum, w := f.Resultant(on) // the engine's sum, with its self-weight W (0 unless self_weight = auto)
	sk.V, sk.H, sk.M = sum.V, sum.HB, sum.MB
	fu := units.MustParse(m.ForceUnit())
	mu := units.MustParse(m.MomentUnit())
	if sk.V != 0 {
		sk.VLabel = "ΣV = " + valueText(units.Quantity{V: sk.V, Dim: fu.Dim}, fu, -1)
		if w != 0 {
			sk.VLabel += " incl. W = " + valueText(units.Quantity{V: w, Dim: fu.Dim}, fu, -1)
		}
	}
	if sk.H != 0 {
		sk.HLabel = "ΣH = " + valueText(units.Quantity{V: sk.H, Dim: fu.Dim}, fu, -1)
	}
	if sk.M != 0 {
		sk.MLabel = "ΣM = " + valueText(units.Quantity{V: sk.M, Dim: mu.Dim}, mu, -1)
	}
	// the sketch takes kN and kNm
	sk.V, sk.H, sk.M = sk.V/1e3, sk.H/1e3, sk.M/1e3
	if gov != nil {
		cs := gov.Bearing.Cases[gov.Bearing.Governing]
		if cs.B > 0 && cs.B < m.B {
			bp := cs.B
			sk.BEff = &bp
		}
	}
	items, err := sketch.Draw(sk, c.width, sketchHeight)
	if err != nil {
		c.diags.Warn(b.Span, "footing %s: no section sketch: %v", f.Name, err)
		return nil
	}
	caption := fmt.Sprintf("Footing %s: section through B", f.Name)
	if f.NoB {
		caption += " at the width its size block chose"
	}
	if on != nil {
		caption += " on ground model " + on.Name
	}
	caption += "; characteristic actions as given, all rows added"
	if w != 0 {
		caption += " with the self-weight W plinth adds (self_weight = auto)"
	}
	if sk.BEff != nil {
		caption += fmt.Sprintf("; B′ of the governing bearing case (%s)", gov.Bearing.Cases[gov.Bearing.Governing].Combination)
	}
	return []layout.Block{&layout.Drawing{Pos: b.Span, W: c.width, H: sketchHeight, Items: items, Caption: []layout.Run{txt(caption + ".")}}}
}

// footingUses lists the analyses of every footing in document order,
// indexed once per document (a search of every sheet for each footing's
// sketch grew with the square of the sheets).
func (c *composer) footingUses() map[*eval.Footing][]*eval.Block {
	if c.uses != nil {
		return c.uses
	}
	c.uses = map[*eval.Footing][]*eval.Block{}
	for _, t := range c.res.Sheets {
		for _, x := range t.Blocks() {
			if x.Of != nil {
				c.uses[x.Of] = append(c.uses[x.Of], x)
			}
		}
	}
	return c.uses
}

// sketchHeight is the height of a footing's section sketch in points
// (about a fifth of an A4 text column).
const sketchHeight = 180
