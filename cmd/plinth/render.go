package main

import (
	"fmt"
	"io"
)

// render implements "plinth render" (see the PDF issue).
func render(args []string, stdout, stderr io.Writer) int {
	fmt.Fprintln(stderr, "plinth: render is not built yet")
	return exitErrors
}
