package layout

import (
	"fmt"
	"sort"
	"strings"

	"github.com/plinth-calc/plinth/doc/source"
)

// Problem is something that stopped the layout, at the source position of
// the block it concerns.
type Problem struct {
	Pos source.Position
	Msg string
}

func (p Problem) Error() string {
	if s := p.Pos.String(); s != "" {
		return s + ": " + p.Msg
	}
	return p.Msg
}

// Problems is the error Document returns: every problem found, sorted by
// position.
type Problems []Problem

func (ps Problems) Error() string {
	var b strings.Builder
	for i, p := range ps {
		if i > 0 {
			b.WriteByte('\n')
		}
		b.WriteString(p.Error())
	}
	return b.String()
}

func (ps *Problems) add(pos source.Position, format string, args ...any) {
	*ps = append(*ps, Problem{Pos: pos, Msg: fmt.Sprintf(format, args...)})
}

func (ps Problems) sorted() Problems {
	sort.SliceStable(ps, func(i, j int) bool {
		a, b := ps[i].Pos, ps[j].Pos
		if a.Path != b.Path {
			return a.Path < b.Path
		}
		if a.Line != b.Line {
			return a.Line < b.Line
		}
		if a.Col != b.Col {
			return a.Col < b.Col
		}
		return ps[i].Msg < ps[j].Msg
	})
	out := ps[:0]
	for i, p := range ps {
		if i > 0 && p == ps[i-1] {
			continue
		}
		out = append(out, p)
	}
	return out
}
