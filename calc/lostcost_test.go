package calc

import (
	"math"
	"testing"
)

// TestLostEfficiencyCost checks the yearly cost by hand arithmetic.
func TestLostEfficiencyCost(t *testing.T) {
	cases := []struct {
		name                          string
		hyd, now, base, hours, tariff float64
		extraW, kWh, cost             float64
	}{
		// 18 kW hydraulic at 60 % instead of 66 %: 18000·(1/0.60 − 1/0.66)
		// = 30000 − 27272.73 = 2727.27 W; over 4000 h: 10909.09 kWh; at
		// 0.12 per kWh: 1309.09. (1 kWh = 3.6 MJ, NIST SP 811.)
		{"worn", 18000, 0.60, 0.66, 4000, 0.12, 2727.2727, 10909.0909, 1309.0909},
		// Better than the baseline: a saving, negative.
		{"better", 10000, 0.5, 0.4, 1000, 0.2, -5000, -5000, -1000},
		// No hours: no energy, no cost.
		{"idle", 10000, 0.5, 0.6, 0, 0.2, 3333.3333, 0, 0},
	}
	for _, c := range cases {
		got, err := LostEfficiencyCost(c.hyd, c.now, c.base, c.hours, c.tariff)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if math.Abs(got.ExtraPower-c.extraW) > 1e-3 || math.Abs(got.YearEnergy/3.6e6-c.kWh) > 1e-3 || math.Abs(got.YearCost-c.cost) > 1e-3 {
			t.Errorf("%s: %+v (kWh %v), want %v W, %v kWh, %v", c.name, got, got.YearEnergy/3.6e6, c.extraW, c.kWh, c.cost)
		}
	}
	for _, bad := range [][5]float64{{0, 0.5, 0.6, 1, 1}, {1, 0, 0.6, 1, 1}, {1, 0.5, 1.2, 1, 1}, {1, 0.5, 0.6, -1, 1}, {1, 0.5, 0.6, 1, math.NaN()}} {
		if _, err := LostEfficiencyCost(bad[0], bad[1], bad[2], bad[3], bad[4]); err == nil {
			t.Errorf("%v: no error", bad)
		}
	}
}
