package calc_test

import (
	"fmt"
	"strings"

	"fieldhead/calc"
)

func ExampleParse() {
	q, err := calc.Parse("q", "240 gpm", calc.Flow, "L/s")
	fmt.Printf("%.11g m³/s %v\n", q, err)
	fmt.Println(calc.FormatValue(q, "L/s", 3))

	_, err = calc.Parse("d1", "203 kPa", calc.Length, "mm")
	fmt.Println(err)
	// Output:
	// 0.015141647136 m³/s <nil>
	// 15.1 L/s
	// d1: wrong dimension input="kPa"
}

func ExampleParsePressure() {
	pa, ref, err := calc.ParsePressure("p2", "430 kPa(g)", "kPa")
	fmt.Println(pa, ref, err)
	// Output: 430000 gauge <nil>
}

func ExampleFormatValue() {
	fmt.Println(calc.FormatValue(291.15, "°F", 3))
	fmt.Println(calc.FormatValue(0.203, "in", 4))
	// Output:
	// 64.4 °F
	// 7.992 in
}

func ExampleUnitsFor() {
	var syms []string
	for _, u := range calc.UnitsFor(calc.Flow) {
		syms = append(syms, u.Symbol)
	}
	fmt.Println(strings.Join(syms, " "))
	fmt.Println(calc.DefaultUnit(calc.Flow, true).Name)
	// Output:
	// L/s m³/h m³/s L/min ML/d gpm cfs MGD
	// US gallon per minute
}
