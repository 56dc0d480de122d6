package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// demoCurve is the duty pump of the invented demo scenario (booster station
// BS-3): its data-sheet heads, with the NPSHr list of the share-link
// vocabulary's example. Illustration only, not reference values.
func demoCurve() calc.PumpCurve {
	ls := 1e-3 // L/s in m³/s
	c, err := calc.FitPump([]calc.PumpPoint{
		{Q: 0, H: 62}, {Q: 20 * ls, H: 59, NPSHr: 2.2}, {Q: 40 * ls, H: 52, NPSHr: 2.8},
		{Q: 55 * ls, H: 44, NPSHr: 3.6}, {Q: 70 * ls, H: 33, NPSHr: 4.9},
	})
	if err != nil {
		panic(err)
	}
	return c
}

// demoBalance is the demo's line: from the wet-well surface (212.0 m) up to
// the Crest reservoir (251.0 m) through 640 m of NPS 8 schedule 40 steel
// with its valves, elbows and exit, 18 °C water at 210 m altitude. A
// 6 m suction pipe with a sharp entrance up to the pump (214.5 m) is
// assumed for the illustration.
func demoBalance() calc.Balance {
	site, _ := calc.StandardAtmosphere(210)
	water, _ := calc.Water(291.15, site)
	pipe, _ := calc.LookupPipe("8", "40")
	steel, _ := calc.LookupMaterial("steel")
	run := func(l float64, fit ...calc.FittingCount) calc.Run {
		return calc.Run{Length: l, Diameter: pipe.ID, Roughness: steel.Roughness, Fittings: fit}
	}
	return calc.Balance{Fluid: water, SitePressure: site,
		In:  calc.Point{P: site, Z: 212.0},
		Out: calc.Point{P: site, Z: 251.0},
		Line: &calc.Line{Segments: []calc.Segment{
			{Run: run(6, calc.FittingCount{Key: "entry_sharp", Count: 1}), EndZ: 214.5},
			{Run: run(640, calc.FittingCount{Key: "gate", Count: 2}, calc.FittingCount{Key: "elbow90lr", Count: 6},
				calc.FittingCount{Key: "check_swing", Count: 1}, calc.FittingCount{Key: "exit", Count: 1}), EndZ: 251.0},
		}},
		PumpAfter: 1,
	}
}

// The demo pump's data sheet fitted by monotone cubic interpolation, read
// between the points and at a reduced speed.
func ExampleFitPump() {
	c := demoCurve()
	h, _ := c.Head(0.045)
	fmt.Printf("H(45 L/s) = %.2f m\n", h)
	_, ok := c.Head(0.075)
	fmt.Println("defined at 75 L/s:", ok)
	slow, _ := c.AtSpeed(0.9)
	hs, _ := slow.Head(0.9 * 0.045)
	fmt.Printf("at 90 %% speed: H(40.5 L/s) = %.2f m, shut-off %.2f m\n", hs, slow.ShutoffHead())
	// Output:
	// H(45 L/s) = 49.66 m
	// defined at 75 L/s: false
	// at 90 % speed: H(40.5 L/s) = 40.23 m, shut-off 50.22 m
}

// Where the demo pump runs on the demo line.
func ExampleOperatingPoint() {
	op, err := calc.OperatingPoint(demoCurve(), demoBalance())
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("Q = %.2f L/s, H = %.2f m, hydraulic power %.1f kW\n", op.Q*1e3, op.H, op.HydraulicPower/1e3)
	fmt.Printf("losses %.2f m, NPSHr %.2f m\n", op.Balance.FrictionHead, op.NPSHr)
	// Output:
	// Q = 51.24 L/s, H = 46.26 m, hydraulic power 23.2 kW
	// losses 7.26 m, NPSHr 3.36 m
}

// NPSH available at the demo pump at its operating point, against its
// NPSHr there.
func ExampleNPSH() {
	b := demoBalance()
	op, err := calc.OperatingPoint(demoCurve(), b)
	if err != nil {
		fmt.Println(err)
		return
	}
	hs, _ := calc.SuctionLoss(b, op.Q)
	r, err := calc.NPSH(b.Fluid, calc.NPSHInput{SurfacePressure: b.SitePressure,
		SurfaceZ: 212.0, PumpZ: 214.5, SuctionLoss: hs, NPSHr: op.NPSHr})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("NPSHa %.2f m, NPSHr %.2f m, margin %.2f m, ratio %.2f: %v\n", r.Available, r.Required, r.Margin, r.Ratio, r.Level)
	// Output:
	// NPSHa 7.25 m, NPSHr 3.36 m, margin 3.89 m, ratio 2.16: ok
}
