package compose_test

import (
	"bytes"
	"flag"
	"fmt"
	"os"
	"path/filepath"
	"runtime/debug"
	"runtime/metrics"
	"strings"
	"sync/atomic"
	"testing"
	"time"

	"github.com/plinth-calc/plinth/doc/compose"
	"github.com/plinth-calc/plinth/doc/pdf"
)

var bigEngine = flag.Bool("big", false, "run BenchmarkRenderEngine1000")

// writeEngineBenchPackage writes an invented package of n sheets, each a
// pad with its own ground block, footing block and bearing block (the
// engine's full trace printed), so most of the pages are engine output.
func writeEngineBenchPackage(dir string, n int) error {
	y := "project: Ashgrove Sidings depot (generated)\njob: \"9002\"\nclient: Example Rail Ltd\nby: GEN\nchecked: \"\"\n" +
		"revisions:\n  - {rev: A, date: 2026-05-04, by: GEN, note: Generated for the benchmark}\n"
	if err := os.WriteFile(filepath.Join(dir, "package.yaml"), []byte(y), 0o644); err != nil {
		return err
	}
	for i := 1; i <= n; i++ {
		var s strings.Builder
		fmt.Fprintf(&s, "---\ntitle: Pad P%d\ncalc: \"9002-%04d\"\n---\n\n# Pad P%d on firm clay\n\n", i, i, i)
		s.WriteString("The pad carries a column of the depot frame; the ground is made ground over firm clay.\n\n")
		fmt.Fprintf(&s, "```ground site\nwater = %d.%d m            # groundwater below ground level\n\n", 1+i%2, i%10)
		s.WriteString("| layer     | top (m) | gamma (kN/m3) | gamma_sat (kN/m3) | c_u (kPa) | phi' (deg) | c' (kPa) | m_v (m2/MN) | c_v (m2/yr) |\n")
		s.WriteString("| ---       | ---     | ---           | ---               | ---       | ---        | ---      | ---         | ---         |\n")
		s.WriteString("| Fill      | 0.0     | 18            | 19                |           | 28         | 0        |             |             |\n")
		fmt.Fprintf(&s, "| Firm clay | 0.6     | 19            | 20                | %d        | 24         | 3        | 0.1         | 3           |\n```\n\n", 55+i%20)
		fmt.Fprintf(&s, "```footing P%d\nshape = square\nB = %d.%d m\nD = 1.0 m\n\n", i, 2+i%2, i%10)
		s.WriteString("| action  | type      | V (kN) | psi_0 |\n| ---     | ---       | ---    | ---   |\n")
		fmt.Fprintf(&s, "| Dead    | permanent | %d    |       |\n| Imposed | variable  | %d    | 0.7   |\n```\n\n", 400+i%200, 150+i%100)
		fmt.Fprintf(&s, "```bearing P%d on site\n```\n\nThe pad is {P%d.util} utilised in bearing.\n", i, i)
		if err := os.WriteFile(filepath.Join(dir, fmt.Sprintf("%04d-pad.md", i)), []byte(s.String()), 0o644); err != nil {
			return err
		}
	}
	return nil
}

// BenchmarkRenderEngine100 renders 100 engine sheets (about 560 pages)
// from their evaluated form: compose, layout and the PDF. Target: 0.6 s
// and 150 MB peak.
func BenchmarkRenderEngine100(b *testing.B) { benchEngine(b, 100) }

// BenchmarkRenderEngine1000 renders 1,000 engine sheets. Target: 6 s and
// 500 MB peak. Run with -big.
func BenchmarkRenderEngine1000(b *testing.B) {
	if !*bigEngine {
		b.Skip("run with -big")
	}
	benchEngine(b, 1000)
}

func benchEngine(b *testing.B, n int) { benchPackage(b, writeEngineBenchPackage, n) }

// BenchmarkEvalEngine100 loads, parses and evaluates the 100 engine
// sheets (the engine's bearing checks included): the part of plinth
// render before BenchmarkRenderEngine100's.
func BenchmarkEvalEngine100(b *testing.B) {
	dir := b.TempDir()
	if err := writeEngineBenchPackage(dir, 100); err != nil {
		b.Fatal(err)
	}
	cpu0 := cpuSeconds()
	b.ReportAllocs()
	b.ResetTimer()
	for b.Loop() {
		evaluate(b, dir)
	}
	b.StopTimer()
	if cpu := cpuSeconds() - cpu0; cpu > 0 {
		b.ReportMetric(cpu/float64(b.N), "cpu-s/op")
	}
}

// benchPackage renders a generated package of n sheets from its
// evaluated form as plinth render does (compose, layout with each
// sheet's bodies painted as soon as they are final, the PDF) and reports pages, PDF size,
// peak memory and the CPU time per render (the machine may be shared,
// so wall time alone says little).
func benchPackage(b *testing.B, write func(string, int) error, n int) {
	dir := b.TempDir()
	if err := write(dir, n); err != nil {
		b.Fatal(err)
	}
	res := evaluate(b, dir)
	debug.FreeOSMemory()
	peak := watchPeak()
	cpu0 := cpuSeconds()
	b.ReportAllocs()
	b.ResetTimer()
	var pages, size int
	for b.Loop() {
		bodies := pdf.NewBodies()
		p, d := pagesOf(res, compose.Options{}, bodies)
		if d.HasErrors() {
			b.Fatal(d)
		}
		pages = len(p.Pages)
		var buf bytes.Buffer
		if err := pdf.Write(&buf, p, pdf.Options{Release: true, Bodies: bodies}); err != nil {
			b.Fatal(err)
		}
		size = buf.Len()
	}
	b.StopTimer()
	cpu := cpuSeconds() - cpu0
	b.ReportMetric(float64(pages), "pages")
	b.ReportMetric(float64(size)/1e6, "MB-pdf")
	b.ReportMetric(peak()/1e6, "MB-peak")
	if cpu > 0 {
		b.ReportMetric(cpu/float64(b.N), "cpu-s/op")
	}
}

// watchPeak samples the memory the Go runtime holds from the system
// (mapped less released: what is resident, near enough) every
// millisecond until the returned function is called, which returns the
// most seen, in bytes.
func watchPeak() func() float64 {
	s := []metrics.Sample{{Name: "/memory/classes/total:bytes"}, {Name: "/memory/classes/heap/released:bytes"}}
	read := func() uint64 {
		metrics.Read(s)
		return s[0].Value.Uint64() - s[1].Value.Uint64()
	}
	var most atomic.Uint64
	most.Store(read())
	stop := make(chan struct{})
	done := make(chan struct{})
	go func() {
		defer close(done)
		t := time.NewTicker(time.Millisecond)
		defer t.Stop()
		for {
			select {
			case <-stop:
				return
			case <-t.C:
				if v := read(); v > most.Load() {
					most.Store(v)
				}
			}
		}
	}()
	return func() float64 {
		close(stop)
		<-done
		return float64(max(most.Load(), read()))
	}
}

// TestWriteEngineBenchPackage writes the engine benchmark package of
// $PLINTH_BENCH_SHEETS sheets (default 100) to $PLINTH_ENGINE_DIR, for
// timing the command itself; it does nothing otherwise.
func TestWriteEngineBenchPackage(t *testing.T) {
	dir := os.Getenv("PLINTH_ENGINE_DIR")
	if dir == "" {
		t.Skip("set PLINTH_ENGINE_DIR to write the engine benchmark package")
	}
	n := 100
	if v := os.Getenv("PLINTH_BENCH_SHEETS"); v != "" {
		fmt.Sscan(v, &n)
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	if err := writeEngineBenchPackage(dir, n); err != nil {
		t.Fatal(err)
	}
}
