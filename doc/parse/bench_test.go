package parse_test

import (
	"fmt"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/parse"
	"github.com/plinth-calc/plinth/doc/source"
)

// benchSheet is a sheet of 50 statements in five calc blocks with prose,
// a ground block and a footing block between them.
func benchSheet() []byte {
	var b strings.Builder
	b.WriteString("---\ntitle: Benchmark sheet\ncalc: B-01\nby: AB\nuses: [01-ground.md]\n---\n\n# Pad footing P1\n\n")
	b.WriteString("```ground site\nwater = 2.0 m   # below ground level [GI]\n\n")
	b.WriteString("| layer | top (m) | gamma (kN/m3) | c_u (kPa) | phi' (deg) |\n| --- | --- | --- | --- | --- |\n")
	b.WriteString("| Clay | 0.0 | 19 | 60 | 24 |\n| Sand | 5.0 | 20 | | 36 |\n```\n\n")
	for blk := 0; blk < 5; blk++ {
		fmt.Fprintf(&b, "## Step %d\n\nThe design pressure is {q_%d -> kPa:1} from the loads [S1]; see **below**.\n\n```calc\n", blk+1, blk)
		for i := 0; i < 10; i++ {
			n := blk*10 + i
			switch i % 3 {
			case 0:
				fmt.Fprintf(&b, "q_%d = (950 kN + 1.5 * 400 kN) / (2.4 m * 3.0 m) -> kPa:1   # design pressure %d\n", n, n)
			case 1:
				fmt.Fprintf(&b, "N_q%d = exp(pi * tan(30°)) * tan(45° + 30°/2)^2\n", n)
			default:
				fmt.Fprintf(&b, "check q_%d <= 250 kPa   # within the allowable [GI]\n", n-2)
			}
		}
		b.WriteString("```\n\n")
	}
	return []byte(b.String())
}

// BenchmarkSheet parses one 50-statement sheet. The pipeline target is
// 100 such sheets evaluated in under 50 ms, so this must stay well under
// 0.5 ms per sheet.
func BenchmarkSheet(b *testing.B) {
	text := benchSheet()
	f := source.NewFile("bench.md", text)
	if _, d := parse.Sheet(f); d.HasErrors() {
		b.Fatal(d)
	}
	b.SetBytes(int64(len(text)))
	b.ReportAllocs()
	for b.Loop() {
		parse.Sheet(f)
	}
}
