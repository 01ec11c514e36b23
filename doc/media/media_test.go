package media_test

import (
	"bytes"
	"encoding/binary"
	"hash/crc32"
	"image"
	"image/color"
	"image/jpeg"
	"image/png"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/doc/media"
)

func pngBytes(t *testing.T, w, h int) []byte {
	t.Helper()
	im := image.NewRGBA(image.Rect(0, 0, w, h))
	im.Set(0, 0, color.RGBA{255, 0, 0, 255})
	var b bytes.Buffer
	if err := png.Encode(&b, im); err != nil {
		t.Fatal(err)
	}
	return b.Bytes()
}

// hugeHeader is a PNG signature and IHDR chunk declaring w × h pixels,
// with no image data: DecodeConfig reads it, Decode would need w·h·4
// bytes.
func hugeHeader(w, h uint32) []byte {
	var b bytes.Buffer
	b.WriteString("\x89PNG\r\n\x1a\n")
	ihdr := make([]byte, 13)
	binary.BigEndian.PutUint32(ihdr[0:], w)
	binary.BigEndian.PutUint32(ihdr[4:], h)
	ihdr[8], ihdr[9] = 8, 6 // 8-bit RGBA
	var n [4]byte
	binary.BigEndian.PutUint32(n[:], 13)
	b.Write(n[:])
	chunk := append([]byte("IHDR"), ihdr...)
	b.Write(chunk)
	binary.BigEndian.PutUint32(n[:], crc32.ChecksumIEEE(chunk))
	b.Write(n[:])
	return b.Bytes()
}

func TestCheck(t *testing.T) {
	good := pngBytes(t, 40, 20)
	var jb bytes.Buffer
	if err := jpeg.Encode(&jb, image.NewGray(image.Rect(0, 0, 200, 200)), nil); err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name string
		data []byte
		err  string
	}{
		{"png", good, ""},
		{"jpeg", jb.Bytes(), ""},
		{"text", []byte("not an image"), "is not a PNG or JPEG file"},
		{"truncated png", good[:len(good)-20], "is a damaged PNG file"},
		{"truncated jpeg", jb.Bytes()[:len(jb.Bytes())-100], "is a damaged JPEG file"},
		{"20000 px square header", hugeHeader(20000, 20000), "is 20000 × 20000 pixels (400 megapixels): the limit is 50 megapixels"},
	} {
		_, err := media.Check(c.data)
		switch {
		case c.err == "" && err != nil:
			t.Errorf("%s: %v", c.name, err)
		case c.err != "" && (err == nil || !strings.Contains(err.Error(), c.err)):
			t.Errorf("%s: error %v, want %q", c.name, err, c.err)
		}
	}
}
