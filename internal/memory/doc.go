// Package memory holds the collector's pace plinth render sets once the
// package is evaluated (SetPace) and the soft memory limit it sets once
// the document is composed and before it is laid out (Cap). It complements
// the structural savings of the pipeline (each sheet's page bodies
// painted and dropped as soon as they are laid out, doc/pdf Bodies):
// the evaluated package and the composed document stay in memory to the
// end, and the collector's default pacing lets the heap reach twice
// what is live — more while the layout allocates quickly during a
// collection. The compose benchmarks call Cap at the same point, so
// their MB-peak is what the command uses.
package memory
