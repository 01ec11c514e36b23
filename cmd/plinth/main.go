// Command plinth evaluates calc sheets and renders calculation packages.
//
//	plinth check PATH [--set name=value]... [--json]
//	plinth render PATH [-o FILE] [--set name=value]...
//	plinth init DIR
//
// Exit status: 0 when every check is OK, 1 when a check is NOT OK, 2 for
// input errors (every error of the run is listed as path:line:col: message).
package main

import (
	"fmt"
	"io"
	"os"
)

const usage = `plinth — calculation packages for shallow foundations

Usage:
  plinth check PATH [--set name=value]... [--json]
  plinth render PATH [-o FILE] [--set name=value]...
  plinth init DIR         write a starter package (ground model and a pad) to DIR
  plinth help

PATH is a package folder (sheets *.md in file-name order, optional
package.yaml) or a single sheet.

  --set name=value        override an input for a variant run (repeatable);
                          sheet.md:name=value where several sheets define name
  --json                  (check) print one JSON object instead of tables
  -o, --output FILE       (render) the PDF to write (default: <folder>.pdf
                          beside a package folder, <sheet>.pdf beside a sheet)

Exit status: 0 all checks OK, 1 a check is NOT OK, 2 input errors.
`

// Exit statuses.
const (
	exitOK     = 0
	exitNotOK  = 1
	exitErrors = 2
)

func main() {
	os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
}

// run is main without the process: it returns the exit status.
func run(args []string, stdout, stderr io.Writer) int {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return exitErrors
	}
	cmd, rest := args[0], args[1:]
	switch cmd {
	case "help", "-h", "--help":
		fmt.Fprint(stdout, usage)
		return exitOK
	case "check":
		return check(rest, stdout, stderr)
	case "render":
		return render(rest, stdout, stderr)
	case "init":
		return initPackage(rest, stdout, stderr)
	}
	fmt.Fprintf(stderr, "plinth: unknown command %q\n\n%s", cmd, usage)
	return exitErrors
}
