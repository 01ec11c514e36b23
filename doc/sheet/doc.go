// Package sheet defines plinth's parsed sheet tree: the front matter and
// package.yaml fields (Meta), the prose nodes converted from goldmark's
// Markdown tree, and the plinth blocks (calc, ground, footing, bearing,
// settlement, capacity) with their statements, options and tables.
//
// Every node carries the source.Span it was read from: byte offsets into
// its file, so every later stage can point a diagnostic at path:line:col.
// Values are kept as written (strings with spans); their meaning — units,
// column names, option values, references — is checked by the evaluator,
// using the data this package holds (Options, MetaKeys).
//
// The tree is built by doc/parse; doc/load reads the files from disk.
package sheet
