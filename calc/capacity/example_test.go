package capacity_test

import (
	"fmt"

	"github.com/plinth-calc/plinth/calc/capacity"
)

func ExampleTable() {
	r, err := capacity.Table(input())
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, row := range r.Rows {
		fmt.Printf("B = %.1f m: q_a,b = %.0f kPa, q_a,s = %.0f kPa, q_allow = %.0f kPa (%s)\n",
			row.B, row.QBearing/1e3, row.QSettle/1e3, row.QAllow/1e3, row.Governs)
	}
	// Output:
	// B = 1.0 m: q_a,b = 173 kPa, q_a,s = 221 kPa, q_allow = 173 kPa (bearing)
	// B = 2.0 m: q_a,b = 173 kPa, q_a,s = 127 kPa, q_allow = 127 kPa (settlement)
	// B = 3.0 m: q_a,b = 173 kPa, q_a,s = 95 kPa, q_allow = 95 kPa (settlement)
	// B = 4.0 m: q_a,b = 173 kPa, q_a,s = 79 kPa, q_allow = 79 kPa (settlement)
}
