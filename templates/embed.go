// Package templates holds plinth's built-in page templates as data files,
// embedded in the binary. A page template is YAML; see page-a4.yaml for the
// format, which doc/layout decodes (layout.LoadTemplate).
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
