package parse

import (
	"github.com/yuin/goldmark/ast"
	"github.com/yuin/goldmark/parser"
	"github.com/yuin/goldmark/text"
	"github.com/yuin/goldmark/util"
)

// Goldmark extensions: nodes and parsers for {interpolations}, literal
// braces and [KEY] citations, and a fenced-code parser that records where
// a block's closing fence is (goldmark silently runs an unclosed fence to
// the end of its container).

var (
	kindInterp = ast.NewNodeKind("PlinthInterp")
	kindBrace  = ast.NewNodeKind("PlinthBrace")
	kindCite   = ast.NewNodeKind("PlinthCite")
)

// interpNode is {…}: [start, end) covers the braces. unclosed marks a '{'
// with no '}' after it on its line (end is then start+1).
type interpNode struct {
	ast.BaseInline
	start, end int
	unclosed   bool
}

// braceNode is "{{" or "}}", a literal brace.
type braceNode struct {
	ast.BaseInline
	start, end int
	value      string
}

// citeNode is [KEY], brackets included.
type citeNode struct {
	ast.BaseInline
	start, end int
}

func (n *interpNode) Kind() ast.NodeKind         { return kindInterp }
func (n *braceNode) Kind() ast.NodeKind          { return kindBrace }
func (n *citeNode) Kind() ast.NodeKind           { return kindCite }
func (n *interpNode) Dump(src []byte, level int) { ast.DumpHelper(n, src, level, nil, nil) }
func (n *braceNode) Dump(src []byte, level int)  { ast.DumpHelper(n, src, level, nil, nil) }
func (n *citeNode) Dump(src []byte, level int)   { ast.DumpHelper(n, src, level, nil, nil) }

// braceParser reads {…}, {{ and }}. A lone } is left as text.
type braceParser struct{}

func (braceParser) Trigger() []byte { return []byte{'{', '}'} }

func (braceParser) Parse(parent ast.Node, block text.Reader, pc parser.Context) ast.Node {
	line, seg := block.PeekLine()
	if len(line) == 0 {
		return nil
	}
	start := seg.Start
	if len(line) > 1 && line[1] == line[0] {
		block.Advance(2)
		return &braceNode{start: start, end: start + 2, value: string(line[0])}
	}
	if line[0] == '}' {
		return nil
	}
	for i := 1; i < len(line) && line[i] != '\n' && line[i] != '\r'; i++ {
		if line[i] == '}' {
			block.Advance(i + 1)
			return &interpNode{start: start, end: start + i + 1}
		}
	}
	block.Advance(1)
	return &interpNode{start: start, end: start + 1, unclosed: true}
}

// citeParser reads [KEY] when it is not a link: KEY matches
// [A-Za-z][A-Za-z0-9_.-]*, the ']' is not followed by '(' or '[', and no
// link reference definition has that label.
type citeParser struct{}

func (citeParser) Trigger() []byte { return []byte{'['} }

func (citeParser) Parse(parent ast.Node, block text.Reader, pc parser.Context) ast.Node {
	line, seg := block.PeekLine()
	if len(line) < 3 || !isLetter(line[1]) {
		return nil
	}
	i := 2
	for i < len(line) && (isLetter(line[i]) || isDigit(line[i]) || line[i] == '_' || line[i] == '.' || line[i] == '-') {
		i++
	}
	if i >= len(line) || line[i] != ']' {
		return nil
	}
	if i+1 < len(line) && (line[i+1] == '(' || line[i+1] == '[') {
		return nil
	}
	if _, ok := pc.Reference(util.ToLinkReference(line[1:i])); ok {
		return nil
	}
	block.Advance(i + 1)
	return &citeNode{start: seg.Start, end: seg.Start + i + 1}
}

func isLetter(b byte) bool { return b >= 'a' && b <= 'z' || b >= 'A' && b <= 'Z' }
func isDigit(b byte) bool  { return b >= '0' && b <= '9' }

// fenceParser wraps goldmark's fenced-code parser and records, as the
// attribute closeAttr, the end offset of the closing fence line.
type fenceParser struct{ parser.BlockParser }

var closeAttr = []byte("plinth-close")

func (p fenceParser) Continue(node ast.Node, reader text.Reader, pc parser.Context) parser.State {
	_, seg := reader.PeekLine()
	st := p.BlockParser.Continue(node, reader, pc)
	if st&parser.Close != 0 {
		node.SetAttribute(closeAttr, seg.Stop)
	}
	return st
}
