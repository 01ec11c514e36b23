// Package media checks the raster images a package names (figures in
// sheets, logos in page templates) before anything lays them out, so that
// plinth check refuses what plinth render would, and no image can exhaust
// memory: the declared size is read from the header first and refused
// above MaxPixels, then the whole image is decoded, so a corrupt or
// truncated PNG or JPEG is found rather than trusted from its header.
// It is a leaf package: doc/parse and doc/layout both use it.
package media
