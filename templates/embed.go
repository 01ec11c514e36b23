// Package templates holds plinth's built-in page templates and the
// starter package as data files, embedded in the binary. A page template
// is YAML; see page-a4.yaml for the format, which doc/layout decodes
// (layout.LoadTemplate). The starter package (starter/) is what
// "plinth init" writes.
package templates

import (
	"embed"
	"fmt"
	"io/fs"
	"sort"
	"strings"
)

//go:embed page-*.yaml
var pages embed.FS

//go:embed starter
var starter embed.FS

// Starter returns the files of the starter package by name, sorted.
func Starter() (names []string, files map[string][]byte) {
	files = map[string][]byte{}
	ents, _ := fs.ReadDir(starter, "starter")
	for _, e := range ents {
		b, err := starter.ReadFile("starter/" + e.Name())
		if err == nil {
			names = append(names, e.Name())
			files[e.Name()] = b
		}
	}
	sort.Strings(names)
	return names, files
}

// PageNames lists the built-in page templates ("a4", "letter"), sorted.
func PageNames() []string {
	ents, _ := fs.Glob(pages, "page-*.yaml")
	var out []string
	for _, e := range ents {
		out = append(out, strings.TrimSuffix(strings.TrimPrefix(e, "page-"), ".yaml"))
	}
	sort.Strings(out)
	return out
}

// Page returns the YAML of the built-in page template name.
func Page(name string) ([]byte, error) {
	b, err := pages.ReadFile("page-" + strings.ToLower(name) + ".yaml")
	if err != nil {
		return nil, fmt.Errorf("no built-in page template %q (have %s)", name, strings.Join(PageNames(), ", "))
	}
	return b, nil
}
