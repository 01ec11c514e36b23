package eval_test

import (
	"math"
	"strings"
	"testing"

	"github.com/plinth-calc/plinth/calc/platform"
	"github.com/plinth-calc/plinth/calc/site"
)

// An outrigger mat in a platform block is sized as platform.Mat sizes it
// (rounded up to 0.05 m), checked against the allowable pressure by hand
// (q = F/B²), and its pressure is the platform's loading case 1.
func TestOutriggerMat(t *testing.T) {
	src := "# M\n\n```ground pf\nplatform = yes\n\n| layer | top (m) | gamma (kN/m3) | phi' (deg) | c_u (kPa) |\n| --- | --- | --- | --- | --- |\n| Rock | 0 | 20 | 40 | |\n| Clay | 0.6 | 17 | | 60 |\n```\n\n" +
		"```platform M on pf\noutrigger = 430 kN\nallowable = 200 kPa\n```\n"
	var blk = evalPlatform(t, src)
	m := blk.Mat
	if m == nil || blk.Platform == nil {
		t.Fatal("no mat or platform result")
	}
	direct, err := platform.Mat(platform.MatInput{Name: "M", F: 430e3, QAllow: 200e3, Step: 0.05, Z: site.Some(0.6)})
	if err != nil {
		t.Fatal(err)
	}
	if m.B != direct.B || m.B != 1.5 || math.Abs(m.Q-430e3/2.25) > 1e-6 || math.Abs(m.Util-m.Q/200e3) > 1e-12 {
		t.Errorf("mat B %v (direct %v) q %v util %v", m.B, direct.B, m.Q, m.Util)
	}
	c := blk.Platform.Cases[0]
	if c.Q != m.Q || c.W != m.B || c.L != m.L {
		t.Errorf("case 1 %+v is not the mat's pressure on its area", c)
	}
	var found bool
	for _, ch := range blk.Checks {
		found = found || strings.Contains(ch.Text, "mat: mat_q <= q_a")
	}
	if !found {
		t.Error("the mat's check is not in the register")
	}
}
