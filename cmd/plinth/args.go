package main

import (
	"errors"
	"fmt"
	"strings"
)

// errHelp is returned by parseArgs for -h or --help: the command prints
// its help on standard output and exits 0.
var errHelp = errors.New("help asked")

// options are the parsed command-line arguments. Flags may come before or
// after PATH.
type options struct {
	path    string
	sets    []string
	json    bool
	layout  bool
	verbose bool
	output  string
	since   string // render --since: the earlier revision to compare with
}

// parseArgs reads args for cmd; allowed names the flags the command takes.
func parseArgs(cmd string, args []string, allowed ...string) (options, error) {
	var o options
	ok := map[string]bool{}
	for _, a := range allowed {
		ok[a] = true
	}
	for i := 0; i < len(args); i++ {
		a := args[i]
		name, val, hasVal := strings.Cut(a, "=")
		if !strings.HasPrefix(a, "-") || a == "-" {
			if o.path != "" {
				return o, fmt.Errorf("%s takes one PATH, got %q and %q", cmd, o.path, a)
			}
			o.path = a
			continue
		}
		name = strings.TrimLeft(name, "-")
		if name == "h" || name == "help" {
			return o, errHelp
		}
		if name == "o" {
			name = "output"
		}
		if name == "v" {
			name = "verbose"
		}
		if !ok[name] {
			return o, fmt.Errorf("%s: unknown flag %s", cmd, a)
		}
		value := func() (string, error) {
			if hasVal {
				return val, nil
			}
			if i+1 >= len(args) {
				return "", fmt.Errorf("%s: flag %s needs a value", cmd, a)
			}
			i++
			return args[i], nil
		}
		switch name {
		case "json", "layout", "verbose":
			if hasVal {
				return o, fmt.Errorf("%s: --%s takes no value", cmd, name)
			}
			o.json = o.json || name == "json"
			o.layout = o.layout || name == "layout"
			o.verbose = o.verbose || name == "verbose"
		case "set":
			v, err := value()
			if err != nil {
				return o, err
			}
			o.sets = append(o.sets, v)
		case "output":
			v, err := value()
			if err != nil {
				return o, err
			}
			o.output = v
		case "since":
			v, err := value()
			if err != nil {
				return o, err
			}
			o.since = v
		}
	}
	if o.path == "" {
		return o, fmt.Errorf("%s needs a PATH (a package folder or a sheet)", cmd)
	}
	return o, nil
}
