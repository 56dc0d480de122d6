package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// The system curve of the demo line (see demoBalance), each flow solved in
// full. Illustration only, not reference values.
func ExampleSystemCurve() {
	pts, err := calc.SystemCurve(demoBalance(), calc.Flows(0.06, 4))
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range pts {
		fmt.Printf("%.0f L/s: %.2f m\n", p.Q*1e3, p.H)
	}
	// Output:
	// 0 L/s: 39.00 m
	// 20 L/s: 40.24 m
	// 40 L/s: 43.54 m
	// 60 L/s: 48.80 m
}
