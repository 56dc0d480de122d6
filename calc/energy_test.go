package calc

import (
	"fmt"
	"math"
	"strings"
	"testing"
)

func TestEnergyUse(t *testing.T) {
	// Sources: the definition of specific energy, E = P/Q, and of its
	// ideal, ρ·g·H (common practice); 1 kWh = 3.6 MJ (NIST SP 811 (2008)
	// App. B). The ideal for water is about 0.272 kWh/(m³·100 m) (common
	// practice).
	e, err := EnergyUse(20e3, 0.05, 30, 1000, 4000, 0.2)
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"kWh/m³", e.PerVolume / 3.6e6, 20.0 / (0.05 * 3600)},
		{"kWh/(m³·100 m)", e.PerVolumeHead * 100 / 3.6e6, 20.0 / (0.05 * 3600) / 0.3},
		{"ideal kWh/m³", e.Ideal / 3.6e6, 1000 * 9.80665 * 30 / 3.6e6},
		{"yearly kWh", e.YearEnergy / 3.6e6, 20 * 4000},
		{"yearly cost", e.YearCost, 20 * 4000 * 0.2},
	} {
		if math.Abs(c.got-c.want) > 1e-12*c.want {
			t.Errorf("%s: %.15g, want %.15g", c.name, c.got, c.want)
		}
	}
	if v := e.IdealHead * 100 / 3.6e6; math.Abs(v-0.272) > 0.0005 {
		t.Errorf("ideal %.4g kWh/(m³·100 m), want about 0.272", v)
	}
	for _, tc := range []struct {
		p, q, h, rho, hours, tariff float64
		field                       string
	}{
		{0, 0.05, 30, 1000, 0, 0, "pin"},
		{math.NaN(), 0.05, 30, 1000, 0, 0, "pin"},
		{20e3, 0, 30, 1000, 0, 0, "qm"},
		{20e3, 0.05, -1, 1000, 0, 0, "qm"},
		{20e3, 0.05, 30, 0, 0, 0, "rho"},
		{20e3, 0.05, 30, 1000, 9000, 0, "hours"},
		{20e3, 0.05, 30, 1000, 100, -1, "tariff"},
	} {
		if _, err := EnergyUse(tc.p, tc.q, tc.h, tc.rho, tc.hours, tc.tariff); err == nil || !strings.HasPrefix(err.Error(), tc.field+":") {
			t.Errorf("%+v: error %v, want one on %s", tc, err, tc.field)
		}
	}
}

func ExampleEnergyUse() {
	e, _ := EnergyUse(20e3, 0.05, 30, 1000, 4000, 0.2)
	fmt.Printf("%.4f kWh/m³ (ideal %.4f), %.0f a year\n", e.PerVolume/3.6e6, e.Ideal/3.6e6, e.YearCost)
	// Output:
	// 0.1111 kWh/m³ (ideal 0.0817), 16000 a year
}
