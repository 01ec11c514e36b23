// Command plinth evaluates calc sheets and renders calculation packages.
//
//	plinth check PATH [--set name=value]... [--json]
//	plinth render PATH [-o FILE] [--set name=value]...
//	plinth diff OLD NEW [--json]
//	plinth verify FILE.pdf [PATH] [--render]
//	plinth extract FILE.pdf DIR
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
  plinth render PATH [-o FILE] [--set name=value]... [--since OLD]
  plinth diff OLD NEW [--json]    what changed between two packages
  plinth verify FILE.pdf [PATH] [--render]   check a PDF against its inputs
  plinth extract FILE.pdf DIR     write the package a PDF carries to DIR
  plinth watch PATH [-o FILE] [--set name=value]...   render on every save
  plinth init DIR         write a starter package (ground model and a pad) to DIR
  plinth version          print the version
  plinth help [COMMAND]   this overview, or one command's flags (also COMMAND -h)

PATH is a package folder (sheets *.md in file-name order, optional
package.yaml) or a single sheet.

  --set name=value        override an input for a variant run (repeatable);
                          sheet.md:name=value where several sheets define name
  --json                  (check) print one JSON object instead of tables
  -o, --output FILE       (render) the PDF to write (default: <folder>.pdf
                          beside a package folder, <sheet>.pdf beside a sheet)

Exit status: 0 all checks OK, 1 a check is NOT OK, 2 input errors.
`

// helps are the subcommands' own help texts (plinth help CMD, CMD -h).
var helps = map[string]string{
	"check": `Usage: plinth check PATH [flags]

Evaluates every sheet of PATH (a package folder or one sheet) and prints
every symbol and check, or one JSON object. Writes nothing.

Flags (before or after PATH):
  --set name=value   override an input for a variant run (repeatable);
                     sheet.md:name=value where several sheets define name
  --json             print one JSON object (documented in the README)
  --layout           also lay out every page (as render does, without
                     writing a PDF), to find problems only layout can
  -v, --verbose      list the engine's NOTEs too (CAUTIONs and WARNINGs
                     are always listed after the checks)
  -h, --help         print this help

Exit status: 0 all checks OK, 1 a check is NOT OK, 2 input errors.
`,
	"render": `Usage: plinth render PATH [flags]

Evaluates PATH (a package folder or one sheet) and writes the calculation
package as a PDF, through a temporary file renamed into place only when
complete: a failed run leaves an earlier PDF untouched.

Flags (before or after PATH):
  -o, --output FILE  the PDF to write (default: <folder>.pdf beside a
                     package folder, <sheet>.pdf beside a sheet)
  --set name=value   override an input for a variant run (repeatable)
  --since OLD        add a page "Changes since revision X" after the
                     summary (what plinth diff OLD PATH prints) and
                     change bars beside the lines whose values changed
                     (OLD a folder, a sheet, REV:path or a PDF plinth
                     wrote)
  -h, --help         print this help

Every PDF embeds the package's source files and a manifest (plinth
verify, plinth extract).

Exit status: 0 all checks OK, 1 a check is NOT OK (the PDF is written),
2 input errors (nothing is written).
`,
	"diff": `Usage: plinth diff OLD NEW [--json]

Evaluates two packages and prints what changed: checks whose verdict
changed (OK → NOT OK first), checks added or removed, results whose
displayed value changed (with the change in %), inputs changed (with
file:line on each side) and the package fields changed (revision,
checker). Values equal at display precision are not changes. Sheets are
matched by calc number, then by file name.

OLD and NEW are each a package folder or sheet, a git revision of one
(REV:path, path relative to the working folder, read with the git
command), or a PDF plinth wrote (its embedded inputs).

Flags:
  --json             print one JSON object (documented in the README)
  -h, --help         print this help

Exit status: 0 no check became NOT OK, 1 one did, 2 input errors in
either side (listed with the side named).
`,
	"verify": `Usage: plinth verify FILE.pdf [PATH] [--render]

Checks the package a PDF carries: each embedded file against its SHA-256,
and the input fingerprint recomputed from them against the one in the
document information and the one printed on every page. With PATH, lists
the working files that differ from those the PDF was made from (added,
removed, changed, with a line count).
With --render, renders again from the embedded inputs and confirms the
PDF is byte-identical (when the plinth version matches).

Flags:
  --render           re-render from the embedded inputs and compare
  -h, --help         print this help

Exit status: 0 verified, 1 mismatch, 2 unreadable.
`,
	"extract": `Usage: plinth extract FILE.pdf DIR

Writes the package a PDF carries (its sheets, package.yaml, templates,
factor files, images) into DIR, creating it. Never overwrites a file and
never writes outside DIR.

Flags:
  -h, --help         print this help

Exit status: 0 written, 2 unreadable PDF or a file exists.
`,
	"watch": `Usage: plinth watch PATH [flags]

Renders PATH as plinth render does, then again after every save to a file
of the package folder (debounced), until Ctrl-C. Each render prints the
time it took, the checks that flipped since the last good render, then the
results and inputs that changed. On input errors it prints them and leaves
the last good PDF untouched.

Flags (before or after PATH):
  -o, --output FILE  the PDF to write (default as for render)
  --set name=value   override an input for a variant run (repeatable)
  -h, --help         print this help

Exit status: 0 when stopped, 2 bad flags or PATH.
`,
	"init": `Usage: plinth init DIR

Writes a starter package (a ground-model sheet and a pad) into DIR,
creating it. Never overwrites a file.

Flags:
  -h, --help         print this help

Exit status: 0 written, 2 a file exists or cannot be written.
`,
	"version": `Usage: plinth version

Prints plinth's version (also written into every PDF's document
information and every check --json object).
`,
	"help": `Usage: plinth help [COMMAND]

Prints the overview, or the help of one command.
`,
}

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
		if len(rest) > 0 && cmd == "help" {
			h, ok := helps[rest[0]]
			if !ok {
				fmt.Fprintf(stderr, "plinth: help: unknown command %q\n\n%s", rest[0], usage)
				return exitErrors
			}
			fmt.Fprint(stdout, h)
			return exitOK
		}
		fmt.Fprint(stdout, usage)
		return exitOK
	case "version", "-version", "--version":
		fmt.Fprintf(stdout, "plinth %s\n", Version())
		return exitOK
	case "check":
		return check(rest, stdout, stderr)
	case "render":
		return render(rest, stdout, stderr)
	case "init":
		return initPackage(rest, stdout, stderr)
	case "diff":
		return diffCmd(rest, stdout, stderr)
	case "watch":
		return watchCmd(rest, stdout, stderr)
	case "verify":
		return verifyCmd(rest, stdout, stderr)
	case "extract":
		return extractCmd(rest, stdout, stderr)
	}
	fmt.Fprintf(stderr, "plinth: unknown command %q\n\n%s", cmd, usage)
	return exitErrors
}
