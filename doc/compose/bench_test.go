package compose_test

import (
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// writeBenchPackage writes an invented package of n calc sheets, each
// about three pages: prose with citations and values, a table, two calc
// blocks of inputs, formulas and checks, and a caution.
func writeBenchPackage(dir string, n int) error {
	var y strings.Builder
	y.WriteString("project: Ashgrove Sidings depot (generated)\njob: \"9001\"\nclient: Example Rail Ltd\nby: GEN\nchecked: \"\"\n")
	y.WriteString("revisions:\n  - {rev: A, date: 2026-05-04, by: GEN, note: Generated for the benchmark}\n")
	y.WriteString("references:\n  SI: Ashgrove Sidings site investigation, 2026\n  LOADS: Depot frame analysis, revision B\n")
	if err := os.WriteFile(filepath.Join(dir, "package.yaml"), []byte(y.String()), 0o644); err != nil {
		return err
	}
	for i := 1; i <= n; i++ {
		var s strings.Builder
		fmt.Fprintf(&s, "---\ntitle: Base %d\ncalc: \"9001-%03d\"\n---\n\n# Base %d\n\n", i, i, i)
		for p := 0; p < 3; p++ {
			s.WriteString("The base carries a column of the depot frame [LOADS]; the ground is firm clay over gravel [SI]. ")
			s.WriteString("Characteristic values are cautious estimates; the design values follow from the partial factors. ")
			s.WriteString("The pressure under the base is {q_Ed} against a resistance of {q_Rd}.\n\n")
		}
		s.WriteString("| Item | Value | Source |\n| --- | ---: | --- |\n")
		for r := 0; r < 8+6*(i%2); r++ {
			fmt.Fprintf(&s, "| row %d | %d.%d | [SI] |\n", r, r+1, i%10)
		}
		s.WriteString("\n## Inputs\n\n```calc\n")
		fmt.Fprintf(&s, "B = %d.%d m          # base width\nL = %d.%d m          # base length\nD = 1.0 m          # depth\n", 1+i%3, i%10, 2+i%3, i%7)
		s.WriteString("G_k = 640 kN       # permanent [LOADS]\nQ_k = 310 kN       # imposed [LOADS]\nH_k = 28 kN        # horizontal [LOADS]\n")
		s.WriteString("M_k = 48 kNm       # moment [LOADS]\nc_u = 65 kPa       # undrained strength [SI]\ngamma = 19.5 kN/m3 # unit weight [SI]\n")
		s.WriteString("gamma_G = 1.35     # factor\ngamma_Q = 1.5      # factor\ngamma_cu = 1.4     # factor\n```\n\n## Working\n\n```calc\n")
		s.WriteString("V_d = gamma_G * G_k + gamma_Q * Q_k        # design vertical action\n")
		s.WriteString("e_B = M_k / (G_k + Q_k) -> mm                # eccentricity\n")
		s.WriteString("B' = B - 2 * e_B                             # effective width\n")
		s.WriteString("A' = B' * L                                  # effective area\n")
		s.WriteString("s_c = 1 + 0.2 * B' / L                       # shape factor\n")
		s.WriteString("i_c = 0.5 * (1 + sqrt(1 - H_k / (A' * c_u / gamma_cu)))   # inclination factor\n")
		s.WriteString("q = gamma * D                                # overburden\n")
		s.WriteString("q_Rd = (pi + 2) * c_u / gamma_cu * s_c * i_c + q   # design resistance pressure\n")
		s.WriteString("R_d = q_Rd * A' -> kN                        # design resistance\n")
		s.WriteString("q_Ed = V_d / A' -> kPa:1                     # design pressure\n")
		s.WriteString("util = V_d / R_d -> %:0                      # utilisation\n")
		s.WriteString("check V_d <= R_d                             # bearing\n")
		s.WriteString("check e_B <= B / 6                           # middle third\n")
		s.WriteString("N_q = exp(pi * tan(25 deg)) * tan(45 deg + 25 deg / 2)^2   # a factor\n")
		s.WriteString("N_gamma = 2 * (N_q - 1) * tan(25 deg)        # another\n")
		s.WriteString("```\n\n> [!NOTE]\n> The base is checked for bearing only; settlement is checked elsewhere.\n\n")
		for p := 0; p < 7; p++ {
			s.WriteString("A closing paragraph repeats the basis of the design so the sheet runs to a realistic length, with the values ")
			s.WriteString("quoted inline: the effective width is {B'} and the utilisation {util}.\n\n")
		}
		if err := os.WriteFile(filepath.Join(dir, fmt.Sprintf("%03d-base.md", i)), []byte(s.String()), 0o644); err != nil {
			return err
		}
	}
	return nil
}

// TestWriteBenchPackage writes the benchmark package to $PLINTH_BENCH_DIR
// (for timing the command itself); it does nothing otherwise.
func TestWriteBenchPackage(t *testing.T) {
	dir := os.Getenv("PLINTH_BENCH_DIR")
	if dir == "" {
		t.Skip("set PLINTH_BENCH_DIR to write the benchmark package")
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	if err := writeBenchPackage(dir, 100); err != nil {
		t.Fatal(err)
	}
}

// BenchmarkRender100 renders a generated 100-sheet package (about 300
// pages) from its evaluated form: compose, layout (two passes for the
// cover's page numbers) and the PDF. Target: 0.15 s on two cores.
func BenchmarkRender100(b *testing.B) { benchPackage(b, writeBenchPackage, 100) }

// BenchmarkRenderDemo renders the example package end to end, as plinth
// render does: load, parse, evaluate (with the engine), compose, layout
// and the PDF. Target: under 300 ms.
func BenchmarkRenderDemo(b *testing.B) {
	b.ReportAllocs()
	pages := 0
	for b.Loop() {
		res := evaluate(b, "../../examples/brackenfield")
		_, p := render(b, res)
		pages = len(p.Pages)
	}
	// The example's length (issue target: at most 35 pages with the
	// default detail = governing), reported rather than tested.
	b.ReportMetric(float64(pages), "pages")
}
