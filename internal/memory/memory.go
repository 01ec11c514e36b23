package memory

import (
	"math"
	"os"
	"runtime/debug"
	"runtime/metrics"
)

// Floor is the least limit Cap sets: a document that needs less never
// meets it.
const Floor = 450 << 20

// Factor times the heap live at the last collection is the limit Cap
// sets above Floor: room for the layout's work on top of the evaluated
// and composed document, which it keeps, so a very long document is
// never held to a limit it cannot keep (the collector would then run
// all the time).
const Factor = 2.25

// Pace is the collector's GOGC SetPace sets for compose, the layout and
// the PDF: the heap may grow to 2.5 times what is live before a
// collection, rather than the default 2, since those stages allocate fast and keep little
// (about a fifth less time on two cores for 100 sheets of prose; the
// peak stays within the benchmarks' targets, and the soft limit bounds
// it on long documents, where it binds before the pace does).
const Pace = 150

// SetPace sets the collector's pace to Pace for the stages after
// evaluation (compose, layout, the PDF), unless GOGC sets it.
func SetPace() {
	if os.Getenv("GOGC") == "" {
		debug.SetGCPercent(Pace)
	}
}

// Cap sets the runtime's soft memory limit to the larger of Floor and
// Factor times the heap live at the last collection, and returns it. It
// leaves a limit set through GOMEMLIMIT alone (and returns 0).
func Cap() int64 {
	if os.Getenv("GOMEMLIMIT") != "" {
		return 0
	}
	s := []metrics.Sample{{Name: "/gc/heap/live:bytes"}}
	metrics.Read(s)
	var live uint64
	if s[0].Value.Kind() == metrics.KindUint64 {
		live = s[0].Value.Uint64()
	}
	limit := int64(math.Max(Floor, Factor*float64(live)))
	debug.SetMemoryLimit(limit)
	return limit
}
