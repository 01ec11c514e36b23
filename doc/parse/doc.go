// Package parse turns plinth source files into the sheet tree: YAML front
// matter and package.yaml into sheet.Meta, the Markdown body (goldmark with
// GFM tables) into prose nodes, and fenced plinth blocks into statements
// (parsed by doc/expr), options and tables. It does no I/O of its own:
// Package asks doc/load about the files a sheet names.
//
// Entry points, one per stage input:
//
//	Sheet(f)   one sheet file      → *sheet.Sheet
//	config(f)  a package.yaml file → sheet.Meta
//	Package(p) a loaded package    → *sheet.Package (sheets, settings, cross-checks)
//
// Every problem is collected, not just the first, as source diagnostics
// sorted by position. Parsing goes on after an error wherever the rest of
// the file can still be read sensibly; it stops for a file that is not
// UTF-8 and for unclosed front matter, and skips the contents of an
// unclosed plinth fence (which would swallow the rest of the file).
//
// # Front matter
//
// A sheet may start with a line "---", YAML, and a closing "---" line. The
// keys are sheet.MetaKeys; an unknown key is an error with the nearest
// known key suggested, a repeated key an error naming the first one's line.
// package.yaml takes the same keys except uses.
//
// # Prose
//
// CommonMark with GFM tables (no strikethrough, linkify, task lists or
// footnotes). {symbol} and {symbol -> unit[:decimals]} interpolate values
// ({{ and }}, or \{, are literal braces; an interpolation stays on one
// line; a lone } is text); [KEY]
// cites a reference unless it is a link; "> [!NOTE]", "> [!WARNING]" and
// "> [!CAUTION]" open boxed cautions. Raw HTML is dropped with a warning;
// HTML comments are dropped silently (they are comments).
//
// # Plinth blocks
//
// A fenced block whose info string starts with calc, ground, footing,
// bearing, settlement or capacity is a plinth block; one a single edit
// away from those words (calcs, grund) is an error; any other fenced block
// is code. Plinth blocks stand at the top level of a sheet. In every block
// blank lines are skipped and "# ..." lines are comments. A calc block
// holds statements and checks; ground and footing blocks hold statements,
// the word options of sheet.Options (shape = rectangle) and one pipe table
// whose rows start with "|"; bearing, settlement and capacity blocks hold
// "name = value [# note]" options.
package parse
