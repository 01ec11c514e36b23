package media

import (
	"bytes"
	"fmt"
	"image"
	_ "image/jpeg" // decoders for image.DecodeConfig and image.Decode
	_ "image/png"
)

// MaxPixels is the largest image plinth accepts: 50 megapixels (e.g.
// 8660 × 5774), far more than a figure printed on a page needs, and small
// enough that decoding it stays within a few hundred megabytes.
const MaxPixels = 50_000_000

// Info is what Check found: the format ("png" or "jpeg") and pixel size.
type Info struct {
	Format        string
	Width, Height int
}

// Header reads data's PNG or JPEG header only: the format and a declared
// size of at least one pixel and at most MaxPixels. It is what a stage
// that lays out an image already checked in full needs.
func Header(data []byte) (Info, error) {
	cfg, format, err := image.DecodeConfig(bytes.NewReader(data))
	if err != nil || (format != "png" && format != "jpeg") {
		return Info{}, fmt.Errorf("is not a PNG or JPEG file")
	}
	in := Info{Format: format, Width: cfg.Width, Height: cfg.Height}
	if cfg.Width <= 0 || cfg.Height <= 0 {
		return in, fmt.Errorf("has no pixels (%d × %d)", cfg.Width, cfg.Height)
	}
	if px := int64(cfg.Width) * int64(cfg.Height); px > MaxPixels {
		return in, fmt.Errorf("is %d × %d pixels (%.0f megapixels): the limit is %d megapixels; scale it down", cfg.Width, cfg.Height, float64(px)/1e6, MaxPixels/1_000_000)
	}
	return in, nil
}

// Check reads data as a PNG or JPEG image: its header (see Header), then
// every pixel, so a damaged or truncated file is found. The error says
// what is wrong in words a user can act on.
func Check(data []byte) (Info, error) {
	in, err := Header(data)
	if err != nil {
		return in, err
	}
	if _, _, err := image.Decode(bytes.NewReader(data)); err != nil {
		return in, fmt.Errorf("is a damaged %s file: %v", map[string]string{"png": "PNG", "jpeg": "JPEG"}[in.Format], err)
	}
	return in, nil
}
