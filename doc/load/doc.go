// Package load reads a plinth package from disk: the sheets of a folder (or
// one sheet) and its package.yaml, as source files. It is the only package
// of the parser stages that does I/O, and the gatekeeper for files a sheet
// names (images, page templates, partial-factor files): Package.ReadInside
// refuses a path that is absolute or leads outside the package folder,
// whether by ".." or through a symbolic link.
//
// # Which files are sheets
//
// Given a folder, the sheets are the files directly in it (not in
// subfolders) whose names end in ".md" (any letter case), except names
// starting with "_" or "." (drafts, hidden files) and README.md (any
// case), which describes the package rather than being part of it. They
// are ordered by file name, byte by byte ("01-ground.md" before
// "02-loads.md"; "10-x.md" sorts before "2-x.md", so number with leading
// zeros). package.yaml, if present in the folder, holds the shared
// settings; a package.yml beside it is reported and ignored.
//
// Given a single .md file, the package is that sheet alone, rooted at the
// file's folder: its package.yaml (if any) still applies, so the title
// block is right, and images resolve inside that folder; other sheets of
// the folder are not loaded (Single is true, and a uses entry naming one
// is an error reported by doc/parse).
package load
