package memory

import (
	"runtime/debug"
	"testing"
)

func TestCap(t *testing.T) {
	before := debug.SetMemoryLimit(-1)
	defer debug.SetMemoryLimit(before)
	t.Setenv("GOMEMLIMIT", "")
	got := Cap()
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
