package calc_test

import (
	"fmt"
	"math"
	"testing"

	"fieldhead/calc"
)

// A gate valve and a threaded elbow in NPS 3 schedule 40: the Crane K
// falls with size, the Hooper K also with the Reynolds number. The figures
// illustrate the call.
func ExampleFitting_KAt() {
	pipe, _ := calc.LookupPipe("3", "40")
	for _, key := range []string{"gate", "elbow90_thr"} {
		f, _ := calc.LookupFitting(key)
		k1, _ := f.KAt(pipe.ID, 2e4)
		k2, _ := f.KAt(pipe.ID, math.Inf(1))
		fmt.Printf("%s (%v, %s): K %.3f at Re 2e4, %.3f fully turbulent\n", key, f.Method, f.Formula(pipe.ID), k1, k2)
	}
	// Output:
	// gate (Crane TP-410, K = 8·f_T): K 0.138 at Re 2e4, 0.138 fully turbulent
	// elbow90_thr (Hooper 2-K, K = 800/Re + 0.4·(1 + 1 in/D)): K 0.570 at Re 2e4, 0.530 fully turbulent
}

// The fully turbulent friction factor Crane TP-410 multiplies, by size.
func ExampleCraneFT() {
	for _, nps := range []string{"1", "4", "16"} {
		p, _ := calc.LookupPipe(nps, "40")
		ft, _ := calc.CraneFT(p.ID)
		fmt.Printf("NPS %s: f_T = %.4f\n", nps, ft)
	}
	// Output:
	// NPS 1: f_T = 0.0223
	// NPS 4: f_T = 0.0162
	// NPS 16: f_T = 0.0124
}

// BenchmarkCraneFT: one f_T (a Colebrook solve).
func BenchmarkCraneFT(b *testing.B) {
	for i := 0; i < b.N; i++ {
		if _, err := calc.CraneFT(0.1 + float64(i%7)*0.01); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFittingKsHooper: the K list of a run with Reynolds-dependent
// fittings, as Run.Evaluate forms it at every flow.
func BenchmarkFittingKsHooper(b *testing.B) {
	r := calc.Run{Length: 10, Diameter: 0.0525, Fittings: []calc.FittingCount{
		{Key: "elbow90_thr", Count: 4}, {Key: "gate", Count: 2}, {Key: "exit", Count: 1}}}
	for i := 0; i < b.N; i++ {
		if _, _, err := r.FittingKs(1e4 + float64(i%5)); err != nil {
			b.Fatal(err)
		}
	}
}
