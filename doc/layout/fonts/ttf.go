package fonts

import (
	"encoding/binary"
	"errors"
	"fmt"
)

// ttf is the part of a TrueType font plinth needs to measure text.
type ttf struct {
	upem       int
	ascent     int // hhea ascender, font units (positive up)
	descent    int // hhea descender, font units (negative)
	capHeight  int
	xHeight    int
	advances   []uint16 // per glyph, font units
	yMin, yMax []int16  // per glyph ink extent, font units (0, 0 when empty)
	low        []uint16 // glyph index for runes below lowLimit (0 = none)
	high       map[rune]uint16
	kern       map[uint32]int16 // (left<<16 | right) glyph pair → font units
	glyphCount int
}

const lowLimit = 0x3000

type reader struct {
	b   []byte
	err error
}

func (r *reader) u16(off int) int {
	if off < 0 || off+2 > len(r.b) {
		r.err = errors.New("truncated font table")
		return 0
	}
	return int(binary.BigEndian.Uint16(r.b[off:]))
}

func (r *reader) i16(off int) int { return int(int16(r.u16(off))) }

func (r *reader) u32(off int) int {
	if off < 0 || off+4 > len(r.b) {
		r.err = errors.New("truncated font table")
		return 0
	}
	return int(binary.BigEndian.Uint32(r.b[off:]))
}

func parseTTF(data []byte) (*ttf, error) {
	r := &reader{b: data}
	n := r.u16(4)
	tables := map[string]int{}
	for i := 0; i < n; i++ {
		rec := 12 + 16*i
		if rec+16 > len(data) {
			return nil, errors.New("truncated table directory")
		}
		tables[string(data[rec:rec+4])] = r.u32(rec + 8)
	}
	for _, t := range []string{"head", "hhea", "hmtx", "cmap", "maxp", "loca", "glyf"} {
		if _, ok := tables[t]; !ok {
			return nil, fmt.Errorf("font has no %s table", t)
		}
	}
	f := &ttf{high: map[rune]uint16{}, kern: map[uint32]int16{}}
	head := tables["head"]
	f.upem = r.u16(head + 18)
	if f.upem == 0 {
		return nil, errors.New("font has zero units per em")
	}
	f.glyphCount = r.u16(tables["maxp"] + 4)
	hhea := tables["hhea"]
	f.ascent = r.i16(hhea + 4)
	f.descent = r.i16(hhea + 6)
	nh := r.u16(hhea + 34)
	if nh == 0 {
		return nil, errors.New("font has no horizontal metrics")
	}
	hmtx := tables["hmtx"]
	f.advances = make([]uint16, f.glyphCount)
	for g := 0; g < f.glyphCount; g++ {
		i := g
		if i >= nh {
			i = nh - 1
		}
		f.advances[g] = uint16(r.u16(hmtx + 4*i))
	}
	f.parseBounds(r, r.i16(head+50), tables["loca"], tables["glyf"])
	if os2, ok := tables["OS/2"]; ok && r.u16(os2) >= 2 {
		f.xHeight = r.i16(os2 + 86)
		f.capHeight = r.i16(os2 + 88)
	}
	if f.capHeight == 0 {
		f.capHeight = f.ascent * 7 / 10
	}
	if f.xHeight == 0 {
		f.xHeight = f.ascent / 2
	}
	f.low = make([]uint16, lowLimit)
	if err := f.parseCmap(r, tables["cmap"]); err != nil {
		return nil, err
	}
	if k, ok := tables["kern"]; ok {
		f.parseKern(r, k)
	}
	if r.err != nil {
		return nil, r.err
	}
	return f, nil
}

func (f *ttf) set(c rune, g int) {
	if g == 0 || g >= f.glyphCount {
		return
	}
	if c >= 0 && c < lowLimit {
		f.low[c] = uint16(g)
	} else {
		f.high[c] = uint16(g)
	}
}

// parseCmap reads the Unicode subtable: (3,10) format 12 if present, else
// (3,1) format 4 — the same choice the PDF writer makes.
func (f *ttf) parseCmap(r *reader, cmap int) error {
	n := r.u16(cmap + 2)
	off4, off12 := -1, -1
	for i := 0; i < n; i++ {
		rec := cmap + 4 + 8*i
		pid, eid, off := r.u16(rec), r.u16(rec+2), r.u32(rec+4)
		switch {
		case pid == 3 && eid == 10:
			off12 = cmap + off
		case pid == 3 && eid == 1:
			off4 = cmap + off
		}
	}
	if off4 < 0 {
		return errors.New("font has no Unicode (3,1) cmap")
	}
	if r.u16(off4) != 4 {
		return errors.New("font's (3,1) cmap is not format 4")
	}
	seg := r.u16(off4+6) / 2
	ends := off4 + 14
	starts := ends + 2*seg + 2
	deltas := starts + 2*seg
	ranges := deltas + 2*seg
	for s := 0; s < seg; s++ {
		end, start := r.u16(ends+2*s), r.u16(starts+2*s)
		delta, ro := r.u16(deltas+2*s), r.u16(ranges+2*s)
		if start == 0xFFFF {
			continue
		}
		for c := start; c <= end && r.err == nil; c++ {
			var g int
			if ro == 0 {
				g = (c + delta) & 0xFFFF
			} else {
				g = r.u16(ranges + 2*s + ro + 2*(c-start))
				if g != 0 {
					g = (g + delta) & 0xFFFF
				}
			}
			f.set(rune(c), g)
		}
	}
	if off12 >= 0 && r.u16(off12) == 12 {
		groups := r.u32(off12 + 12)
		for i := 0; i < groups && r.err == nil; i++ {
			rec := off12 + 16 + 12*i
			start, end, g := r.u32(rec), r.u32(rec+4), r.u32(rec+8)
			for c := start; c <= end && c-start < 0x10000; c++ {
				f.set(rune(c), g+c-start)
			}
		}
	}
	return r.err
}

// parseKern reads format 0 subtables of a version 0 'kern' table.
func (f *ttf) parseKern(r *reader, kern int) {
	if r.u16(kern) != 0 {
		return
	}
	n := r.u16(kern + 2)
	sub := kern + 4
	for i := 0; i < n && r.err == nil; i++ {
		length, coverage := r.u16(sub+2), r.u16(sub+4)
		if coverage&0xF0 == 0 && coverage&1 == 1 { // format 0, horizontal
			pairs := r.u16(sub + 6)
			for p := 0; p < pairs; p++ {
				rec := sub + 14 + 6*p
				f.kern[uint32(r.u16(rec))<<16|uint32(r.u16(rec+2))] = int16(r.i16(rec + 4))
			}
		}
		if length == 0 {
			break
		}
		sub += length
	}
}

// parseBounds reads each glyph's vertical ink extent from its glyf header.
func (f *ttf) parseBounds(r *reader, locFormat, loca, glyf int) {
	f.yMin = make([]int16, f.glyphCount)
	f.yMax = make([]int16, f.glyphCount)
	for g := 0; g < f.glyphCount && r.err == nil; g++ {
		var start, end int
		if locFormat == 0 {
			start, end = 2*r.u16(loca+2*g), 2*r.u16(loca+2*g+2)
		} else {
			start, end = r.u32(loca+4*g), r.u32(loca+4*g+4)
		}
		if end <= start {
			continue
		}
		f.yMin[g] = int16(r.i16(glyf + start + 4))
		f.yMax[g] = int16(r.i16(glyf + start + 8))
	}
}
