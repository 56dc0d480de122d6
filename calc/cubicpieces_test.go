package calc

import (
	"math"
	"math/rand/v2"
	"slices"
	"sort"
	"testing"
)

// TestSortFloat64s: sortFloat64s leaves every slice in the order the
// standard library's sort.Float64s gives, bit for bit (which of +0 and -0
// comes first included), NaNs first; on random slices rich in ties.
func TestSortFloat64s(t *testing.T) {
	pool := []float64{math.NaN(), math.Copysign(0, -1), 0, 1, -1, 2.5, math.Inf(1), math.Inf(-1), 1e-300}
	r := rand.New(rand.NewPCG(1, 2))
	for n := 0; n < 300; n++ {
		x := make([]float64, n%70)
		for i := range x {
			if r.IntN(3) == 0 {
				x[i] = r.NormFloat64()
			} else {
				x[i] = pool[r.IntN(len(pool))]
			}
		}
		want, got := slices.Clone(x), slices.Clone(x)
		sort.Float64s(want)
		sortFloat64s(got)
		for i := range want {
			if math.Float64bits(got[i]) != math.Float64bits(want[i]) {
				t.Fatalf("%v: sorted to %v, sort.Float64s gives %v", x, got, want)
			}
		}
	}
}
