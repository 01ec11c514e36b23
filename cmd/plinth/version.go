package main

import "runtime/debug"

// Version is plinth's version: the module version it was built at (as
// go install PATH@vX.Y.Z records it), else the VCS revision the binary
// was built from, else "devel". It is written into every PDF's document
// information and every check --json object.
func Version() string {
	bi, ok := debug.ReadBuildInfo()
	if !ok {
		return "devel"
	}
	if v := bi.Main.Version; v != "" && v != "(devel)" {
		return v
	}
	rev, dirty := "", false
	for _, s := range bi.Settings {
		switch s.Key {
		case "vcs.revision":
			rev = s.Value
		case "vcs.modified":
			dirty = s.Value == "true"
		}
	}
	if len(rev) > 12 {
		rev = rev[:12]
	}
	switch {
	case rev == "":
		return "devel"
	case dirty:
		return "devel-" + rev + "-dirty"
	}
	return "devel-" + rev
}
