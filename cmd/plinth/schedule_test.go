package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const scheduleGround = "```ground site\nwater = 1.5 m\n\n" +
	"| layer      | top (m) | gamma (kN/m3) | gamma_sat (kN/m3) | c_u (kPa) | phi' (deg) | c' (kPa) | m_v (m2/MN) | c_v (m2/yr) |\n" +
	"| ---        | ---     | ---           | ---               | ---       | ---        | ---      | ---         | ---         |\n" +
	"| Firm clay  | 0.0     | 19            | 20                | 60        | 24         | 3        | 0.1         | 3           |\n" +
	"| Stiff clay | 8.0     | 20            | 20.5              | 120       | 26         | 5        | 0.05        | 5           |\n```\n\n"

// scheduleSheets writes an invented n × n column grid twice: as one
// schedule block, and as n² footing blocks each with its own size block
// (the brute-force loop over the footing block the schedule must agree
// with).
func scheduleSheets(t testing.TB, n int) (sched, single string) {
	dir := t.TempDir()
	var a, b strings.Builder
	a.WriteString("---\ntitle: Schedule\n---\n\n# Schedule\n\n" + scheduleGround)
	b.WriteString("---\ntitle: Pads\n---\n\n# Pads\n\n" + scheduleGround)
	a.WriteString("```schedule GRID on site\nshape = square\nD = 1.0 m\nstep = 0.05 m\n\n| footing | x (m) | y (m) | G (kN) | Q (kN) | psi_0 | psi_2 |\n| --- | --- | --- | --- | --- | --- | --- |\n")
	for i := 0; i < n; i++ {
		for j := 0; j < n; j++ {
			G := 300 + 40*((i*7+j*3)%9)
			Q := G / 3
			name := fmt.Sprintf("P%d_%d", i, j)
			fmt.Fprintf(&a, "| %s | %d | %d | %d | %d | 0.7 | 0.3 |\n", name, 6*j, 6*i, G, Q)
			fmt.Fprintf(&b, "```footing %s\nshape = square\nD = 1.0 m\n\n| action | type | V (kN) | psi_0 | psi_2 |\n| --- | --- | --- | --- | --- |\n| Dead | permanent | %d | | |\n| Imposed | variable | %d | 0.7 | 0.3 |\n```\n\n```size %s on site\nstep = 0.05 m\n```\n\n", name, G, Q, name)
		}
	}
	a.WriteString("```\n")
	sched, single = filepath.Join(dir, "schedule.md"), filepath.Join(dir, "single.md")
	for p, s := range map[string]string{sched: a.String(), single: b.String()} {
		if err := os.WriteFile(p, []byte(s), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return sched, single
}

func checkJSON(t testing.TB, path string) jsonReport {
	var out, errb bytes.Buffer
	if code := run([]string{"check", "--json", path}, &out, &errb); code != 0 {
		t.Fatalf("check %s: exit %d: %s", path, code, errb.String())
	}
	var r jsonReport
	if err := json.Unmarshal(out.Bytes(), &r); err != nil {
		t.Fatal(err)
	}
	return r
}

// A 100-row schedule's JSON agrees, row by row, with 100 footing blocks
// each sized by its own size block (the same engine by another route:
// the footing block's action table and one sizing per block), and the
// distortion of every neighbour pair is |s_A − s_B|/L by hand.
func TestScheduleAgreesWithSizeBlocks(t *testing.T) {
	sched, single := scheduleSheets(t, 10)
	a, b := checkJSON(t, sched), checkJSON(t, single)
	var grid *jsonBlock
	sized := map[string]jsonBlock{}
	for i, blk := range a.Blocks {
		if blk.Kind == "schedule" {
			grid = &a.Blocks[i]
		}
	}
	for _, blk := range b.Blocks {
		if blk.Kind == "size" {
			sized[blk.Name] = blk
		}
	}
	if grid == nil || len(sized) != 100 {
		t.Fatalf("schedule %v, %d size blocks", grid != nil, len(sized))
	}
	s := map[string]float64{}
	rows := 0
	for _, c := range grid.Cases {
		if c.Check != "size" {
			continue
		}
		rows++
		one := sized[c.Name]
		if c.Factors["B"] != one.Results["B"] || math.Abs(c.Util-one.Results["util"]) > 1e-12 || c.Factors["s_total"] != one.Results["s_total"] {
			t.Errorf("%s: schedule B %v util %v s %v; size block B %v util %v s %v", c.Name, c.Factors["B"], c.Util, c.Factors["s_total"],
				one.Results["B"], one.Results["util"], one.Results["s_total"])
		}
		s[c.Name] = c.Factors["s_total"]
	}
	if rows != 100 {
		t.Fatalf("%d rows", rows)
	}
	pairs := 0
	for _, c := range grid.Cases {
		if c.Check != "differential" {
			continue
		}
		pairs++
		ab := strings.Split(c.Name, " to ")
		hand := math.Abs(s[ab[0]]-s[ab[1]]) / c.Factors["L"]
		if math.Abs(c.Factors["beta"]-hand) > 1e-15 || c.Factors["L"] != 6 {
			t.Errorf("%s: β %v, hand %v (L %v)", c.Name, c.Factors["beta"], hand, c.Factors["L"])
		}
	}
	if pairs != 2*10*10-20 {
		t.Errorf("%d neighbour pairs, want 180 (the grid lines)", pairs)
	}
}

// grid200 writes a 10 × 20 schedule (invented loads) into dir.
func grid200(b *testing.B) string {
	var a strings.Builder
	a.WriteString("---\ntitle: Schedule\n---\n\n# Schedule\n\n" + scheduleGround)
	a.WriteString("```schedule GRID on site\nshape = square\nD = 1.0 m\n\n| footing | x (m) | y (m) | G (kN) | Q (kN) | psi_0 | psi_2 |\n| --- | --- | --- | --- | --- | --- | --- |\n")
	for i := 0; i < 10; i++ {
		for j := 0; j < 20; j++ {
			G := 300 + 40*((i*7+j*3)%9)
			fmt.Fprintf(&a, "| P%d_%d | %d | %d | %d | %d | 0.7 | 0.3 |\n", i, j, 6*j, 6*i, G, G/3)
		}
	}
	a.WriteString("```\n")
	p := filepath.Join(b.TempDir(), "grid.md")
	if err := os.WriteFile(p, []byte(a.String()), 0o644); err != nil {
		b.Fatal(err)
	}
	return p
}

// A 200-row schedule end to end through check. Target: under 1 s.
func BenchmarkScheduleCheck200(b *testing.B) {
	sched := grid200(b)
	for b.Loop() {
		var out, errb bytes.Buffer
		if code := run([]string{"check", sched}, &out, &errb); code != 0 {
			b.Fatalf("exit %d: %s", code, errb.String())
		}
	}
}

// The same schedule rendered to PDF. Target: under 3 s.
func BenchmarkScheduleRender200(b *testing.B) {
	sched := grid200(b)
	pdf := filepath.Join(filepath.Dir(sched), "out.pdf")
	for b.Loop() {
		var out, errb bytes.Buffer
		if code := run([]string{"render", sched, "-o", pdf}, &out, &errb); code != 0 {
			b.Fatalf("exit %d: %s", code, errb.String())
		}
	}
}

// A row's ground column sizes that footing on the other ground model:
// the same as a size block on that ground.
func TestScheduleRowGround(t *testing.T) {
	dir := t.TempDir()
	soft := "```ground soft\n| layer | top (m) | gamma (kN/m3) | c_u (kPa) | m_v (m2/MN) | E_u (MPa) |\n| --- | --- | --- | --- | --- | --- |\n| Soft clay | 0 | 18 | 35 | 0.2 | 12 |\n```\n\n"
	sched := "---\ntitle: S\n---\n\n# S\n\n" + scheduleGround + soft +
		"```schedule G on site\nshape = square\nD = 1.0 m\n\n| footing | x (m) | y (m) | G (kN) | ground |\n| --- | --- | --- | --- | --- |\n| A | 0 | 0 | 500 | |\n| B | 6 | 0 | 500 | soft |\n```\n"
	single := "---\ntitle: S\n---\n\n# S\n\n" + soft +
		"```footing B\nshape = square\nD = 1.0 m\n\n| action | type | V (kN) |\n| --- | --- | --- |\n| Dead | permanent | 500 |\n```\n\n```size B on soft\n```\n"
	pa, pb := filepath.Join(dir, "a.md"), filepath.Join(dir, "b.md")
	os.WriteFile(pa, []byte(sched), 0o644)
	os.WriteFile(pb, []byte(single), 0o644)
	a, b := checkJSON(t, pa), checkJSON(t, pb)
	var rowA, rowB float64
	for _, blk := range a.Blocks {
		if blk.Kind == "schedule" {
			rowA, rowB = blk.Results["a.B"], blk.Results["b.B"]
		}
	}
	var want float64
	for _, blk := range b.Blocks {
		if blk.Kind == "size" {
			want = blk.Results["B"]
		}
	}
	if rowB != want || rowB <= rowA {
		t.Errorf("row B on soft clay: %v, size block %v (row A on the site model %v)", rowB, want, rowA)
	}
}
