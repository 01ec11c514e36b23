package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"

	"github.com/plinth-calc/plinth/templates"
)

// initPackage implements "plinth init DIR": it writes the starter package
// (a ground-model sheet and a pad sheet) into DIR, creating it, and never
// overwrites a file that exists.
func initPackage(args []string, stdout, stderr io.Writer) int {
	for _, a := range args {
		if a == "-h" || a == "--help" || a == "-help" {
			fmt.Fprint(stdout, helps["init"])
			return exitOK
		}
		if strings.HasPrefix(a, "-") {
			fmt.Fprintf(stderr, "plinth: init: unknown flag %s (a folder name cannot start with -)\n", a)
			return exitErrors
		}
	}
	if len(args) != 1 {
		fmt.Fprintln(stderr, "plinth: init takes one DIR, the folder to create the starter package in")
		return exitErrors
	}
	dir := args[0]
	names, files := templates.Starter()
	for _, n := range names {
		if _, err := os.Stat(filepath.Join(dir, n)); err == nil {
			fmt.Fprintf(stderr, "plinth: %s already exists; init writes nothing over existing files\n", filepath.Join(dir, n))
			return exitErrors
		}
	}
	if err := os.MkdirAll(dir, 0o755); err != nil {
		fmt.Fprintf(stderr, "plinth: %v\n", err)
		return exitErrors
	}
	for _, n := range names {
		if err := os.WriteFile(filepath.Join(dir, n), files[n], 0o644); err != nil {
			fmt.Fprintf(stderr, "plinth: %v\n", err)
			return exitErrors
		}
		fmt.Fprintln(stdout, filepath.Join(dir, n))
	}
	fmt.Fprintf(stdout, "next: plinth check %s, then plinth render %s\n", dir, dir)
	return exitOK
}
