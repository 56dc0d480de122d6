package calc

import (
	"fmt"
	"math"
	"testing"
)

// parabolaEff is η = 0.8 − 100·(Q − 0.045)², Q in m³/s: a constructed
// efficiency curve whose peak is exactly 80 % at 45 L/s.
func parabolaEff(q float64) float64 { return 0.8 - 100*(q-0.045)*(q-0.045) }

func TestBestEfficiency(t *testing.T) {
	// Source: the vertex of a parabola (elementary algebra). Points taken
	// on a parabola with its peak at 45 L/s and 80 % give back that peak
	// exactly, wherever the three points around the highest one lie; a
	// sheet whose highest efficiency is its last point reports that point
	// at the edge.
	pts := func(qs ...float64) []PumpPoint {
		var out []PumpPoint
		for i, q := range qs {
			p := PumpPoint{Q: q, H: 60 - 300*q - float64(i)}
			if q > 0 {
				p.Eff = parabolaEff(q)
			}
			out = append(out, p)
		}
		return out
	}
	tests := []struct {
		name           string
		pts            []PumpPoint
		wantQ, wantEff float64
		edge           bool
	}{
		{"peak between the points", pts(0, 0.02, 0.04, 0.055, 0.07), 0.045, 0.8, false},
		{"uneven spacing", pts(0.01, 0.03, 0.05, 0.08), 0.045, 0.8, false},
		{"peak beyond the last point", pts(0, 0.01, 0.02, 0.03), 0.03, parabolaEff(0.03), true},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			c, err := FitPump(tc.pts)
			if err != nil {
				t.Fatal(err)
			}
			b, ok := c.BestEfficiency()
			if !ok {
				t.Fatal("no BEP")
			}
			if math.Abs(b.Q-tc.wantQ) > 1e-12 || math.Abs(b.Eff-tc.wantEff) > 1e-12 || b.AtEdge != tc.edge {
				t.Errorf("BEP %.15g m³/s, %.15g (edge %v); want %g, %g (edge %v)", b.Q, b.Eff, b.AtEdge, tc.wantQ, tc.wantEff, tc.edge)
			}
			if h, _ := c.Head(b.Q); h != b.H {
				t.Errorf("head at the BEP %g, curve %g", b.H, h)
			}
			// The preferred region is 70–120 % of the BEP flow (ANSI/HI
			// 9.6.3, from memory).
			lo, hi := b.Region()
			if lo != 0.7*b.Q || hi != 1.2*b.Q || !b.InRegion(b.Q) || b.InRegion(1.21*b.Q) || b.InRegion(0.69*b.Q) {
				t.Errorf("region %g–%g for BEP %g", lo, hi, b.Q)
			}
		})
	}
	c, err := FitPump([]PumpPoint{{Q: 0, H: 10}, {Q: 0.01, H: 8}, {Q: 0.02, H: 5}})
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := c.BestEfficiency(); ok {
		t.Error("a curve without efficiencies gave a BEP")
	}
}

func ExamplePumpCurve_BestEfficiency() {
	c, _ := FitPump([]PumpPoint{
		{Q: 0, H: 48}, {Q: 0.010, H: 46.5, Eff: 0.52}, {Q: 0.020, H: 42, Eff: 0.71},
		{Q: 0.030, H: 35, Eff: 0.77}, {Q: 0.040, H: 25, Eff: 0.72},
	})
	b, _ := c.BestEfficiency()
	lo, hi := b.Region()
	fmt.Printf("BEP %.1f L/s at %.1f %%; preferred region %.1f to %.1f L/s\n", b.Q*1000, b.Eff*100, lo*1000, hi*1000)
	// Output:
	// BEP 30.5 L/s at 77.0 %; preferred region 21.3 to 36.5 L/s
}
