package calc

import "testing"

// benchLine20 is a 20-segment line of steel pipe in four sizes, each
// segment with fittings, climbing 40 m: a spread of Reynolds numbers and
// diameter changes for the system-curve budget.
func benchLine20() *Line {
	ds := [...]float64{0.2027, 0.1541, 0.2545, 0.1282}
	l := &Line{}
	for i := 0; i < 20; i++ {
		l.Segments = append(l.Segments, Segment{
			Run: Run{Length: 20 + 5*float64(i), Diameter: ds[i%len(ds)], Roughness: 0.045e-3,
				Fittings: []FittingCount{{Key: "elbow90lr", Count: 2}, {Key: "gate", Count: 1}}},
			EndZ: 2 * float64(i+1),
		})
	}
	return l
}

// BenchmarkSystemCurve100x20: 100 flows over a 20-segment line, each solved
// in full. Budget (product brief): ≤ 1 ms per curve, native.
func BenchmarkSystemCurve100x20(b *testing.B) {
	water, err := Water(291.15, 101325)
	if err != nil {
		b.Fatal(err)
	}
	bal := Balance{Fluid: water, SitePressure: 101325,
		In: Point{P: 101325, Z: 0}, Out: Point{P: 101325, Z: 40}, Line: benchLine20()}
	flows := Flows(0.08, 100)
	b.ReportAllocs()
	for i := 0; i < b.N; i++ {
		if _, err := SystemCurve(bal, flows); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkLineEvaluate20: one flow through the 20-segment line.
func BenchmarkLineEvaluate20(b *testing.B) {
	l := benchLine20()
	for i := 0; i < b.N; i++ {
		if _, err := l.Evaluate(testLiquid, 0.04); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkOperatingPoint20: a five-point pump on the 20-segment line.
func BenchmarkOperatingPoint20(b *testing.B) {
	c, err := FitPump([]PumpPoint{{0, 120, 0, 0}, {0.02, 115, 0, 0}, {0.04, 104, 0, 0}, {0.06, 88, 0, 0}, {0.08, 66, 0, 0}})
	if err != nil {
		b.Fatal(err)
	}
	bal := Balance{Fluid: testLiquid, SitePressure: 101325,
		In: Point{P: 101325}, Out: Point{P: 101325, Z: 40}, Line: benchLine20()}
	for i := 0; i < b.N; i++ {
		if _, err := OperatingPoint(c, bal); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFitPump: fitting an eight-point data sheet with efficiency and
// NPSHr.
func BenchmarkFitPump(b *testing.B) {
	pts := []PumpPoint{{0, 50, 0, 0}, {0.01, 49, 0.4, 1.5}, {0.02, 47, 0.6, 1.7}, {0.03, 44, 0.7, 2},
		{0.04, 40, 0.76, 2.4}, {0.05, 35, 0.77, 3}, {0.06, 28, 0.73, 3.8}, {0.07, 20, 0.65, 5}}
	for i := 0; i < b.N; i++ {
		if _, err := FitPump(pts); err != nil {
			b.Fatal(err)
		}
	}
}
