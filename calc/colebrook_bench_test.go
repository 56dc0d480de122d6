package calc

import "testing"

// frBenchInputs is a spread of (Re, ε/D) pairs over the Moody chart used by
// the friction-factor benchmarks, so that no call can be folded away.
var frBenchInputs = [...][2]float64{
	{4e3, 0}, {1e4, 1e-5}, {3e4, 1e-3}, {1e5, 1e-4}, {3e5, 5e-3}, {1e6, 1e-6},
	{3e6, 2e-2}, {1e7, 1e-3}, {5e4, 5e-2}, {2e5, 2e-4}, {8e5, 0}, {6e3, 1e-2},
	{2e7, 1e-5}, {1e8, 1e-4}, {7e4, 3e-4}, {4e5, 1e-3},
}

// frBench runs fn over frBenchInputs and keeps the results alive.
func frBench(b *testing.B, fn func(re, rr float64) (float64, error)) {
	sum := 0.0
	for i := 0; i < b.N; i++ {
		in := frBenchInputs[i%len(frBenchInputs)]
		f, err := fn(in[0], in[1])
		if err != nil {
			b.Fatal(err)
		}
		sum += f
	}
	if sum <= 0 {
		b.Fatal("no result")
	}
}

// BenchmarkColebrook: Clamond (2009) solver. Budget (product brief): at
// most 2× BenchmarkSwameeJain.
func BenchmarkColebrook(b *testing.B) { frBench(b, Colebrook) }

// BenchmarkSwameeJain: the explicit reference for the Colebrook budget.
func BenchmarkSwameeJain(b *testing.B) { frBench(b, SwameeJain) }

// BenchmarkHaaland: the other explicit formula.
func BenchmarkHaaland(b *testing.B) { frBench(b, Haaland) }

// BenchmarkColebrookFixedPoint: the textbook iteration from f = 0.02.
func BenchmarkColebrookFixedPoint(b *testing.B) {
	frBench(b, func(re, rr float64) (float64, error) {
		f, _, err := ColebrookFixedPoint(re, rr)
		return f, err
	})
}

// BenchmarkRunEvaluate: one pipe run with fittings at a turbulent flow.
func BenchmarkRunEvaluate(b *testing.B) {
	r := Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3,
		Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}}
	fl := Fluid{Density: 998.6, Viscosity: 1.05e-3}
	sum := 0.0
	for i := 0; i < b.N; i++ {
		res, err := r.Evaluate(fl, 0.045+1e-6*float64(i%16))
		if err != nil {
			b.Fatal(err)
		}
		sum += res.TotalLoss
	}
	if sum <= 0 {
		b.Fatal("no result")
	}
}
