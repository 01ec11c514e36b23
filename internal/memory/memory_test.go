package memory

import (
	"runtime/debug"
	"testing"
)

func TestCap(t *testing.T) {
	before := debug.SetMemoryLimit(-1)
	defer debug.SetMemoryLimit(before)
	pace := debug.SetGCPercent(100)
	defer debug.SetGCPercent(pace)
	t.Setenv("GOMEMLIMIT", "")
	t.Setenv("GOGC", "")
	got := Cap()
	SetPace()
	if p := debug.SetGCPercent(100); p != Pace {
		t.Errorf("pace %d, want %d", p, Pace)
	}
	t.Setenv("GOGC", "100")
	SetPace()
	if p := debug.SetGCPercent(100); p != 100 {
		t.Errorf("with GOGC set, Cap set the pace %d", p)
	}
	if got < Floor {
		t.Errorf("limit %d below the floor %d", got, Floor)
	}
	if now := debug.SetMemoryLimit(-1); now != got {
		t.Errorf("limit in force %d, Cap said %d", now, got)
	}
	t.Setenv("GOMEMLIMIT", "1GiB")
	if got := Cap(); got != 0 {
		t.Errorf("with GOMEMLIMIT set, Cap set %d", got)
	}
}
