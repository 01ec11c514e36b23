package main

import (
	"bytes"
	"context"
	"fmt"
	"io"
	"io/fs"
	"os"
	"os/signal"
	"path/filepath"
	"strings"
	"syscall"
	"time"

	"github.com/fsnotify/fsnotify"
)

// debounce is how long watch waits after the last change before it
// renders: an editor's save is often several events.
const debounce = 250 * time.Millisecond

// watchCmd implements "plinth watch PATH [-o FILE] [--set name=value]...":
// it renders, then renders again after every save, until interrupted.
func watchCmd(args []string, stdout, stderr io.Writer) int {
	o, err := parseArgs("watch", args, "set", "output")
	if err == errHelp {
		fmt.Fprint(stdout, helps["watch"])
		return exitOK
	}
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	return watch(ctx, o, stdout, stderr, nil)
}

// watch renders o.path on every change under its folder until ctx ends.
// rendered, when not nil, receives each render's exit status (for tests).
func watch(ctx context.Context, o options, stdout, stderr io.Writer, rendered chan<- int) int {
	fi, err := os.Stat(o.path)
	if err != nil {
		fmt.Fprintf(stderr, "plinth: %s: %v\n", o.path, describe(err))
		return exitErrors
	}
	dir := o.path
	if !fi.IsDir() {
		dir = filepath.Dir(o.path)
	}
	out := o.output
	if out == "" {
		out = defaultOutput(o.path)
	}
	w, err := fsnotify.NewWatcher()
	if err != nil {
		fmt.Fprintf(stderr, "plinth: watch: %v\n", err)
		return exitErrors
	}
	defer w.Close()
	addTree := func(root string) {
		filepath.WalkDir(root, func(p string, d fs.DirEntry, err error) error {
			if err != nil || !d.IsDir() {
				return nil
			}
			if p != root && (strings.HasPrefix(d.Name(), ".") || strings.HasPrefix(d.Name(), "_")) {
				return filepath.SkipDir
			}
			w.Add(p)
			return nil
		})
	}
	addTree(dir)
	outAbs, _ := filepath.Abs(out)
	relevant := func(name string) bool {
		base := filepath.Base(name)
		if strings.HasPrefix(base, ".") || strings.HasSuffix(base, "~") || strings.HasSuffix(base, ".swp") {
			return false // editors' and render's temporary files
		}
		if a, _ := filepath.Abs(name); a == outAbs || strings.EqualFold(filepath.Ext(name), ".pdf") {
			return false
		}
		return true
	}
	var last *side
	once := func() {
		start := time.Now()
		res, diags := evaluate(o.path, o.sets)
		var buf bytes.Buffer
		status := exitErrors
		if res != nil && !diags.HasErrors() {
			rargs := []string{o.path, "-o", out}
			for _, s := range o.sets {
				rargs = append(rargs, "--set", s)
			}
			status = render(rargs, &buf, &buf)
		} else {
			printDiags(&buf, diags)
		}
		took := time.Since(start)
		if isTerminal(stdout) {
			fmt.Fprint(stdout, "\033[H\033[2J") // one screen per render
		}
		fmt.Fprintf(stdout, "\n── %s  render %.2f s ──\n", time.Now().Format("15:04:05"), took.Seconds())
		if status == exitErrors {
			fmt.Fprint(stdout, buf.String())
			if last != nil {
				fmt.Fprintf(stdout, "input errors: %s is left as it was (the last good render)\n", out)
			}
		} else {
			cur := &side{spec: o.path, res: res, diags: diags}
			if last != nil {
				c := compare(last, cur)
				printWatch(stdout, c)
			}
			last = cur
			fmt.Fprint(stdout, buf.String())
		}
		if rendered != nil {
			rendered <- status
		}
	}
	once()
	var timer *time.Timer
	var fire <-chan time.Time
	for {
		select {
		case <-ctx.Done():
			if timer != nil {
				timer.Stop()
			}
			fmt.Fprintln(stdout, "\nwatch stopped")
			return exitOK
		case ev, ok := <-w.Events:
			if !ok {
				return exitOK
			}
			if ev.Has(fsnotify.Create) {
				if fi, err := os.Stat(ev.Name); err == nil && fi.IsDir() {
					addTree(ev.Name)
				}
			}
			if !relevant(ev.Name) || ev.Op == fsnotify.Chmod {
				continue
			}
			if timer == nil {
				timer = time.NewTimer(debounce)
			} else {
				timer.Reset(debounce)
			}
			fire = timer.C
		case err, ok := <-w.Errors:
			if !ok {
				return exitOK
			}
			fmt.Fprintf(stderr, "plinth: watch: %v\n", err)
		case <-fire:
			fire = nil
			once()
		}
	}
}

// printWatch prints what changed since the last good render: checks that
// flipped first, then checks added or removed, then results and inputs.
func printWatch(w io.Writer, c *changes) {
	n := len(c.Flipped) + len(c.Added) + len(c.Removed) + len(c.Results) + len(c.Inputs)
	if n == 0 {
		fmt.Fprintln(w, "no value changed since the last render")
		return
	}
	for _, f := range c.Flipped {
		fmt.Fprintf(w, "FLIPPED %s → %s  %s  %s:%d\n", f.Old, f.New, f.Expr, f.File, f.Line)
	}
	for _, f := range c.Added {
		fmt.Fprintf(w, "check added: %s %s  %s:%d\n", f.New, f.Expr, f.File, f.Line)
	}
	for _, f := range c.Removed {
		fmt.Fprintf(w, "check removed: %s  %s:%d\n", f.Expr, f.File, f.Line)
	}
	for _, v := range append(append([]valueChange(nil), c.Results...), c.Inputs...) {
		pct := ""
		if v.Percent != nil {
			pct = fmt.Sprintf(" (%+.1f %%)", *v.Percent)
		}
		old, cur := v.Old, v.New
		if old == "" {
			old = "—"
		}
		if cur == "" {
			cur = "—"
		}
		fmt.Fprintf(w, "  %s: %s → %s%s  %s:%d\n", v.Name, old, cur, pct, v.NewFile, v.NewLine)
	}
}

// isTerminal reports whether w is a terminal (a character device).
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	fi, err := f.Stat()
	return err == nil && fi.Mode()&os.ModeCharDevice != 0
}
