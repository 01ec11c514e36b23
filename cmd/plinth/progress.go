package main

import (
	"fmt"
	"io"
	"os"
	"sync"
	"sync/atomic"
	"time"
)

// progress prints one self-overwriting line on standard error while a
// render runs: sheets laid out and pages written. It starts printing
// after a second, and only when standard error is a terminal.
type progress struct {
	w               io.Writer
	sheets, sheetsN atomic.Int64
	pages, pagesN   atomic.Int64
	stop            chan struct{}
	wg              sync.WaitGroup
	printed         bool
	once            sync.Once
}

// newProgress starts the progress line on w, or returns nil when w is not
// a terminal (every method of a nil progress does nothing).
func newProgress(w io.Writer) *progress {
	f, ok := w.(*os.File)
	if !ok {
		return nil
	}
	if fi, err := f.Stat(); err != nil || fi.Mode()&os.ModeCharDevice == 0 {
		return nil
	}
	p := &progress{w: w, stop: make(chan struct{})}
	p.wg.Add(1)
	go p.run()
	return p
}

func (p *progress) run() {
	defer p.wg.Done()
	delay := time.NewTimer(time.Second)
	defer delay.Stop()
	select {
	case <-p.stop:
		return
	case <-delay.C:
	}
	tick := time.NewTicker(200 * time.Millisecond)
	defer tick.Stop()
	for {
		p.print()
		select {
		case <-p.stop:
			return
		case <-tick.C:
		}
	}
}

func (p *progress) print() {
	p.printed = true
	line := fmt.Sprintf("plinth: %d/%d sheets laid out", p.sheets.Load(), p.sheetsN.Load())
	if n := p.pagesN.Load(); n > 0 {
		line += fmt.Sprintf(", %d/%d pages written", p.pages.Load(), n)
	}
	fmt.Fprintf(p.w, "\r%s\x1b[K", line)
}

// sheet records sheets laid out (layout.Doc.Progress).
func (p *progress) sheet(done, total int) {
	p.sheets.Store(int64(done))
	p.sheetsN.Store(int64(total))
}

// page records pages written (pdf.Options.Progress).
func (p *progress) page(done, total int) {
	p.pages.Store(int64(done))
	p.pagesN.Store(int64(total))
}

// done stops the line and clears it, so what follows starts on a clean
// line.
func (p *progress) done() {
	if p == nil {
		return
	}
	p.once.Do(func() {
		close(p.stop)
		p.wg.Wait()
		if p.printed {
			fmt.Fprint(p.w, "\r\x1b[K")
		}
	})
}

// sheetFunc and pageFunc are the callbacks, nil when there is no line.
func (p *progress) sheetFunc() func(int, int) {
	if p == nil {
		return nil
	}
	return p.sheet
}

func (p *progress) pageFunc() func(int, int) {
	if p == nil {
		return nil
	}
	return p.page
}
