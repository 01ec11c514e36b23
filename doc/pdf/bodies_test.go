package pdf

import (
	"bytes"
	"compress/zlib"
	"hash/adler32"
	"io"
	"strings"
	"testing"
)

// TestJoin: a page's furniture compressed at Write and its body
// compressed ahead read back as one zlib stream, the two in order, with
// the checksum of the whole (the standard library's reader checks it).
func TestJoin(t *testing.T) {
	cases := [][2]string{
		{"", ""},
		{"BT /F1 9 Tf ET\n", ""},
		{"", "0 0 0 RG 1 w 10 10 m 20 20 l S\n"},
		{strings.Repeat("BT 1 0 0 1 72 700 Tm <0036> Tj ET\n", 500), strings.Repeat("72 600 m 520 600 l S\n", 3000)},
	}
	p := &painter{ahead: true}
	z := newZipper()
	for _, c := range cases {
		head, body := []byte(c[0]), []byte(c[1])
		d, err := p.deflate(body)
		if err != nil {
			t.Fatal(err)
		}
		out, err := z.join(head, &bodyStream{z: d, adler: adler32.Checksum(body), n: len(body)})
		if err != nil {
			t.Fatal(err)
		}
		r, err := zlib.NewReader(bytes.NewReader(out))
		if err != nil {
			t.Fatal(err)
		}
		got, err := io.ReadAll(r)
		if err != nil {
			t.Fatalf("%d+%d bytes: %v", len(head), len(body), err)
		}
		if want := c[0] + c[1]; string(got) != want {
			t.Errorf("%d+%d bytes: read back %d bytes, not the %d joined", len(head), len(body), len(got), len(want))
		}
	}
}

func TestAdler32Combine(t *testing.T) {
	a := []byte(strings.Repeat("plinth ", 20000))
	for _, cut := range []int{0, 1, 7, 65520, 65521, 65522, len(a) - 1, len(a)} {
		got := adler32Combine(adler32.Checksum(a[:cut]), adler32.Checksum(a[cut:]), len(a)-cut)
		if want := adler32.Checksum(a); got != want {
			t.Errorf("cut at %d: %08x, want %08x", cut, got, want)
		}
	}
}
