package calc

import (
	"math"
	"testing"
)

// pchipSets are the data sets of testdata/refs/pchip.tsv (written by
// testdata/refs/gen/gen_line.py; keep the two in step).
var pchipSets = map[string][2][]float64{
	"falling":   {{0, 1, 2.5, 3, 4.5, 6}, {50, 49, 45, 42, 30, 11}},
	"peak":      {{0.5, 1, 2, 3, 4, 5.5}, {0.2, 0.45, 0.7, 0.78, 0.74, 0.5}},
	"wiggly":    {{0, 1, 2, 3, 4, 5, 6, 7}, {1, 2, 2, 3, 1, 1.5, 4, 3}},
	"three":     {{0, 2, 3}, {10, 9, 3}},
	"edgezero":  {{0, 1, 2, 3}, {0, 1, 10, 11}},
	"edgelimit": {{0, 1, 2, 3}, {0, 1, -5, -6}},
}

// TestPchipScipy: our interpolant against scipy.interpolate.PchipInterpolator
// (Debian python3-scipy, the reference implementation of the Fritsch–Carlson
// monotone scheme with Fritsch–Butland slopes), table pchip.tsv, within
// 1e-12 of the data's scale.
func TestPchipScipy(t *testing.T) {
	built := map[string]pchip{}
	seen := map[string]int{}
	for _, row := range lnReadTSV(t, "pchip.tsv") {
		name := row["set"]
		set, ok := pchipSets[name]
		if !ok {
			t.Fatalf("pchip.tsv set %q unknown to the test", name)
		}
		p, ok := built[name]
		if !ok {
			p = newPchip(set[0], set[1])
			built[name] = p
		}
		scale := 0.0
		for _, y := range set[1] {
			scale = math.Max(scale, math.Abs(y))
		}
		x, want := lnNum(t, row, "x"), lnNum(t, row, "y")
		// scipy PchipInterpolator (pchip.tsv), 1e-12 of the data's scale.
		if got := p.eval(x); math.Abs(got-want) > 1e-12*scale {
			t.Errorf("%s at %g: %.17g, scipy %.17g", name, x, got, want)
		}
		seen[name]++
	}
	for name := range pchipSets {
		if seen[name] == 0 {
			t.Errorf("set %s has no rows in pchip.tsv", name)
		}
	}
}

// TestPchipShape: properties of the Fritsch–Carlson scheme (Fritsch &
// Carlson 1980): the data are reproduced exactly; on every interval the
// curve stays between the interval's end values (monotone data give a
// monotone curve, no overshoot).
func TestPchipShape(t *testing.T) {
	for name, set := range pchipSets {
		x, y := set[0], set[1]
		p := newPchip(x, y)
		for i := range x {
			if got := p.eval(x[i]); got != y[i] {
				t.Errorf("%s: at node %g got %.17g, want %g", name, x[i], got, y[i])
			}
		}
		for k := 0; k+1 < len(x); k++ {
			lo, hi := math.Min(y[k], y[k+1]), math.Max(y[k], y[k+1])
			prev := y[k]
			for j := 1; j < 200; j++ {
				v := p.eval(x[k] + (x[k+1]-x[k])*float64(j)/200)
				if v < lo-1e-12 || v > hi+1e-12 {
					t.Errorf("%s: interval %d overshoots: %g outside [%g, %g]", name, k, v, lo, hi)
					break
				}
				if (y[k+1]-y[k])*(v-prev) < -1e-12 {
					t.Errorf("%s: interval %d not monotone", name, k)
					break
				}
				prev = v
			}
		}
	}
}

// BenchmarkPchipEval: one evaluation of an eight-point curve.
func BenchmarkPchipEval(b *testing.B) {
	set := pchipSets["wiggly"]
	p := newPchip(set[0], set[1])
	s := 0.0
	for i := 0; i < b.N; i++ {
		s += p.eval(float64(i%700) / 100)
	}
	if math.IsNaN(s) {
		b.Fatal("NaN")
	}
}
