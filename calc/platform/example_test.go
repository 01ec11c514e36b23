package platform_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/platform"
)

// A piling rig on an invented site: 0.6 m tracks, a 40° crushed-rock
// platform over clay of c_u = 30 kPa.
func ExampleDesign() {
	r, err := platform.Design(clay())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, k := range r.Cases {
		fmt.Printf("%s: R_s = %.1f kPa, util without platform %.2f, D_req = %.3f m\n", k.Name, k.Rs/1e3, k.UtilNone, k.DReq)
	}
	fmt.Printf("D = %.3f m, util %.3f, EN 1997-1 util %.2f\n", r.D, r.Cases[r.Governing].Util, r.Cases[0].EC7.Cases[r.Cases[0].EC7.Governing].Util)
	// Output:
	// Case 1: R_s = 160.4 kPa, util without platform 1.87, D_req = 0.601 m
	// Case 2: R_s = 163.5 kPa, util without platform 1.83, D_req = 0.567 m
	// D = 0.601 m, util 1.000, EN 1997-1 util 0.97
}

func ExampleMat() {
	r, err := platform.Mat(platform.MatInput{F: 400e3, QAllow: 150e3, Step: 0.1})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("B_req = %.3f m, B = %.1f m, q = %.1f kPa\n", r.BReq, r.B, r.Q/1e3)
	// Output: B_req = 1.633 m, B = 1.7 m, q = 138.4 kPa
}
