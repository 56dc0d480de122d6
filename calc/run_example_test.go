package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// The delivery line of the demo booster station (an invented scenario):
// 640 m of NPS 8 schedule 40 steel with two gate valves, six long-radius
// elbows, a swing check valve and the exit, carrying 45 L/s of water near
// 18 °C. The printed figures illustrate the call; they are not reference
// values.
func ExampleRun_Evaluate() {
	pipe, _ := calc.LookupPipe("8", "40")
	steel, _ := calc.LookupMaterial("steel")
	run := calc.Run{
		Length:    640,
		Diameter:  pipe.ID,
		Roughness: steel.Roughness,
		Fittings: []calc.FittingCount{
			{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6},
			{Key: "check_swing", Count: 1}, {Key: "exit", Count: 1},
		},
	}
	water := calc.Fluid{Name: "water near 18 °C", Density: 998.6, Viscosity: 1.053e-3}
	res, err := run.Evaluate(water, 0.045)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("V = %.3f m/s, Re = %.0f (%v), f = %.5f\n", res.Velocity, res.Reynolds, res.Regime, res.Friction)
	fmt.Printf("ΣK = %.2f, major %.2f m + minor %.2f m = %.2f m\n", res.SumK, res.MajorLoss, res.MinorLoss, res.TotalLoss)
	// Output:
	// V = 1.394 m/s, Re = 268007 (turbulent), f = 0.01663
	// ΣK = 3.81, major 5.20 m + minor 0.38 m = 5.58 m
}
