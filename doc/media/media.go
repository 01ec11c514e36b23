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

// Check reads data as a PNG or JPEG image: its header, its declared size
// (at least one pixel, at most MaxPixels), then every pixel. The error
// says what is wrong in words a user can act on.
func Check(data []byte) (Info, error) {
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
	if _, _, err := image.Decode(bytes.NewReader(data)); err != nil {
		return in, fmt.Errorf("is a damaged %s file: %v", map[string]string{"png": "PNG", "jpeg": "JPEG"}[format], err)
	}
	return in, nil
}
