package calc

import (
	"fmt"
	"testing"
)

// A five-point test of the demo's duty pump (readings invented), judged
// against a guarantee of 45 L/s at 41 m and 70 % under grade 2B.
func ExamplePumpTest_AcceptGuarantee() {
	pt, err := CheckPumpTest(Fluid{Density: 998.6}, scipySetup, scipyReadings, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, p := range pt.Points {
		fmt.Printf("reading %d: %.0f L/s, %.2f ± %.2f m\n", p.Item, p.Check.Q*1000, p.Check.Head, p.HeadU)
	}
	g, _ := LookupGrade("2B")
	a, err := pt.AcceptGuarantee(Guarantee{Q: 0.045, H: 41, Eff: 0.70}, g)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("head bar %.2f to %.2f m, flow bar %.1f to %.1f L/s: %v\n",
		a.Cross.HeadLow, a.Cross.HeadHigh, a.Cross.FlowLow*1000, a.Cross.FlowHigh*1000, a.FlowHead)
	e := a.Efficiency
	fmt.Printf("efficiency at %.2f L/s on the line: %.3f ± %.3f (at least %.3f): %v\n",
		e.Flow*1000, e.Value, e.U, e.Judgement.Low, e.Judgement.Verdict)
	fmt.Println("verdict:", a.Verdict)
	// Output:
	// reading 2: 15 L/s, 60.05 ± 1.07 m
	// reading 4: 28 L/s, 56.02 ± 1.10 m
	// reading 1: 41 L/s, 46.71 ± 1.25 m
	// reading 5: 52 L/s, 37.42 ± 1.46 m
	// reading 3: 60 L/s, 29.03 ± 1.74 m
	// head bar 38.95 to 43.05 m, flow bar 41.4 to 48.6 L/s: cannot tell
	// efficiency at 46.46 L/s on the line: 0.705 ± 0.026 (at least 0.665): within
	// verdict: cannot tell
}

func BenchmarkCheckPumpTest(b *testing.B) {
	fl := Fluid{Density: 998.6}
	c, err := FitPump([]PumpPoint{{0, 62, 0, 0}, {0.02, 59, 0.55, 0}, {0.04, 52, 0.74, 0}, {0.055, 44, 0.72, 0}, {0.07, 33, 0.6, 0}})
	if err != nil {
		b.Fatal(err)
	}
	g, _ := LookupGrade("2B")
	for b.Loop() {
		pt, err := CheckPumpTest(fl, scipySetup, scipyReadings, &c)
		if err != nil {
			b.Fatal(err)
		}
		if _, err := pt.AcceptGuarantee(Guarantee{Q: 0.045, H: 41, Eff: 0.70}, g); err != nil {
			b.Fatal(err)
		}
	}
}
