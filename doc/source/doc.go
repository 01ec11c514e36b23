// Package source holds plinth's input files, byte-offset spans into them,
// line:column lookup and the diagnostic list every stage reports into.
//
// Offsets are byte offsets into File.Text. Columns are 1-based and count
// runes, so a column matches what an editor shows for lines holding °, ³ or
// Greek letters. A List collects every problem of a run and sorts them by
// file and position, the way go/scanner's ErrorList does.
package source
