package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// The field visit of the invented demo: suction gauge −18 kPa, discharge
// gauge 430 kPa, the gauges 0.8 m apart vertically, 41 L/s, 31 kW into the
// motor; both gauges are taken to sit on NPS 8 schedule 40 pipe.
// Illustration only, not reference values.
func ExampleCheckPump() {
	site, _ := calc.StandardAtmosphere(210)
	water, _ := calc.Water(291.15, site)
	pipe, _ := calc.LookupPipe("8", "40")
	curve := demoCurve()
	fc, err := calc.CheckPump(water, calc.FieldReadings{Ps: -18e3, Pd: 430e3, Zs: 0, Zd: 0.8,
		Ds: pipe.ID, Dd: pipe.ID, Q: 0.041, PowerIn: 31e3}, &curve)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("H = %.2f m, %.1f kW hydraulic, wire-to-water %.0f %%\n", fc.Head, fc.HydraulicPower/1e3, fc.Efficiency*100)
	fmt.Printf("data sheet %.2f m: %+.2f m (%+.1f %%)\n", fc.CurveHead, fc.Deviation, fc.DeviationPct)
	// Output:
	// H = 46.55 m, 18.7 kW hydraulic, wire-to-water 60 %
	// data sheet 51.56 m: -5.02 m (-9.7 %)
}
