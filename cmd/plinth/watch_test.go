package main

import (
	"bytes"
	"context"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"
)

// syncBuf is a bytes.Buffer safe for the watch goroutine and the test.
type syncBuf struct {
	mu sync.Mutex
	b  bytes.Buffer
}

func (s *syncBuf) Write(p []byte) (int, error) {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.Write(p)
}

func (s *syncBuf) String() string {
	s.mu.Lock()
	defer s.mu.Unlock()
	return s.b.String()
}

// TestWatch: the first render, then a save that flips a check (listed
// first, then the results), then a save with an input error (printed; the
// PDF is left as it was), then a stop that leaves no temporary file.
func TestWatch(t *testing.T) {
	pkg := copyPackage(t)
	dir := filepath.Dir(pkg)
	out := filepath.Join(dir, "w.pdf")
	ctx, cancel := context.WithCancel(context.Background())
	var stdout, stderr syncBuf
	rendered := make(chan int, 8)
	done := make(chan int)
	go func() { done <- watch(ctx, options{path: pkg, output: out}, &stdout, &stderr, rendered) }()
	next := func(what string) int {
		t.Helper()
		select {
		case st := <-rendered:
			return st
		case <-time.After(20 * time.Second):
			cancel()
			t.Fatalf("%s: no render\n%s", what, stdout.String())
		}
		return 0
	}
	if st := next("first render"); st != exitOK {
		t.Fatalf("first render: status %d\n%s", st, stdout.String())
	}
	time.Sleep(100 * time.Millisecond) // let the watcher settle
	ground := filepath.Join(pkg, "01-ground.md")
	b, _ := os.ReadFile(ground)
	const old = "| 0.08        | 2.5         | [GIR] Table 4"
	os.WriteFile(ground, []byte(strings.Replace(string(b), old, "| 0.09        | 2.5         | [GIR] Table 4", 1)), 0o644)
	if st := next("after the change"); st != exitNotOK {
		t.Errorf("after the change: status %d", st)
	}
	good, _ := os.ReadFile(out)
	text := stdout.String()
	flip := strings.Index(text, "FLIPPED OK → NOT OK  P1 settlement: s_total <= s_lim")
	res := strings.Index(text, "P1.s_total: 24.6 mm → 26.8 mm (+8.9 %)")
	if flip < 0 || res < 0 || res < flip {
		t.Errorf("the flipped check, then the results, were not printed:\n%s", text)
	}
	os.WriteFile(ground, []byte(strings.Replace(string(b), old, "| 0.09 kPa    | 2.5         | [GIR] Table 4", 1)), 0o644)
	if st := next("after the error"); st != exitErrors {
		t.Errorf("after the error: status %d", st)
	}
	if !strings.Contains(stdout.String(), "01-ground.md:42:") || !strings.Contains(stdout.String(), "is left as it was") {
		t.Errorf("the error was not printed:\n%s", stdout.String())
	}
	if now, _ := os.ReadFile(out); !bytes.Equal(now, good) {
		t.Error("a render with input errors changed the last good PDF")
	}
	cancel()
	select {
	case st := <-done:
		if st != exitOK {
			t.Errorf("stopped with status %d", st)
		}
	case <-time.After(10 * time.Second):
		t.Fatal("watch did not stop")
	}
	if left := leftovers(t, dir, "brackenfield", "w.pdf"); len(left) > 0 {
		t.Errorf("left behind: %v", left)
	}
}
