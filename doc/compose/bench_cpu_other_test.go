//go:build !unix

package compose_test

// cpuSeconds is not measured here: the benchmarks leave out cpu-s/op.
func cpuSeconds() float64 { return 0 }
