package eval

import "github.com/plinth-calc/plinth/doc/source"

func spanOf(f *source.File, start, end int) source.Span {
	return source.Span{File: f, Start: start, End: end}
}
