package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// The Darcy friction factor at Re = 1e5 and ε/D = 1e-4; the exact value
// (python3-mpmath, Lambert-W form) is 0.018513866077471642…
func ExampleColebrook() {
	f, err := calc.Colebrook(1e5, 1e-4)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("f = %.12f\n", f)
	// Output: f = 0.018513866077
}

// Out-of-range input is an error naming the field, not a number.
func ExampleColebrook_error() {
	_, err := calc.Colebrook(1e5, 0.2)
	fmt.Println(err)
	// Output: eps: out of range (relative roughness) value=0.2000 min=0.000 max=0.05000
}
