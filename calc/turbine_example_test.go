package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// larkspur is the turbine side of the invented demo: a spring box at
// 1020 m feeding a turbine at 905 m through 1400 m of PE pipe of 130.8 mm
// inside diameter (an entrance and the turbine's inlet valve are assumed),
// water near 8 °C at the site's standard-atmosphere pressure.
// Illustration only, not reference values.
func larkspur() calc.Balance {
	site, _ := calc.StandardAtmosphere(905)
	water, _ := calc.Water(281.15, site)
	pe, _ := calc.LookupMaterial("pe")
	return calc.Balance{Fluid: water, SitePressure: site,
		In:  calc.Point{P: site, Z: 1020},
		Out: calc.Point{P: site, Z: 905, D: 0.1308},
		Q:   0.022,
		Line: &calc.Line{Segments: []calc.Segment{{Run: calc.Run{Length: 1400, Diameter: 0.1308, Roughness: pe.Roughness,
			Fittings: []calc.FittingCount{{Key: "entry_sharp", Count: 1}, {Key: "gate", Count: 1}}}, EndZ: 905}}},
	}
}

// The demo turbine at its design flow, 82 % efficient.
func ExampleTurbine() {
	r, err := calc.Turbine(larkspur(), 0.82)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("gross %.1f m, losses %.2f m, exit %.2f m, net %.2f m: %.1f kW\n",
		r.GrossHead, r.Losses, r.ExitVelocityHead, r.NetHead, r.Power/1e3)
	// Output:
	// gross 115.0 m, losses 24.69 m, exit 0.14 m, net 90.17 m: 15.9 kW
}

// The flow that gives the demo line the most output.
func ExampleBestTurbineFlow() {
	r, err := calc.BestTurbineFlow(larkspur(), 0.82, 0)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("best flow %.1f L/s: net %.1f m of %.1f m, %.1f kW\n", r.Q*1e3, r.NetHead, r.GrossHead, r.Power/1e3)
	// Output:
	// best flow 28.8 L/s: net 74.3 m of 115.0 m, 17.2 kW
}
