package calc

import (
	"math"
	"testing"
)

func TestStandardAtmosphere(t *testing.T) {
	// Source: ISO 2533 standard atmosphere table, pressure at geopotential
	// altitude, quoted to 6 significant digits (11 000 m to 5) — from memory.
	tests := []struct {
		h, p float64
		sig  int
	}{
		{-1000, 113929, 6},
		{0, 101325, 6},
		{1000, 89874.6, 6},
		{2000, 79495.2, 6},
		{3000, 70108.5, 6},
		{11000, 22632, 5},
	}
	for _, tc := range tests {
		got, err := StandardAtmosphere(tc.h)
		if err != nil {
			t.Fatalf("StandardAtmosphere(%g): %v", tc.h, err)
		}
		if !wtCloseDigits(got, tc.p, tc.sig) {
			t.Errorf("StandardAtmosphere(%g) = %.7g Pa, ISO 2533 (from memory) %g Pa", tc.h, got, tc.p)
		}
	}
	// Source: ISO 2533 defines p0 = 101 325 Pa exactly at H = 0.
	if p, _ := StandardAtmosphere(0); p != 101325 {
		t.Errorf("StandardAtmosphere(0) = %.17g, want exactly 101325", p)
	}
}

func TestStandardAtmosphereErrors(t *testing.T) {
	// Source: range of the troposphere layer as this package documents it,
	// −2000 m (start of the ISO 2533 tables) to 11 000 m (tropopause).
	for _, h := range []float64{-2000.1, 11000.1, 1e9, math.NaN(), math.Inf(1), math.Inf(-1)} {
		if _, err := StandardAtmosphere(h); wtFieldOf(err) != "alt" {
			t.Errorf("StandardAtmosphere(%g): error %v, want *FieldError on \"alt\"", h, err)
		}
	}
	for _, h := range []float64{-2000, 11000} {
		if p, err := StandardAtmosphere(h); err != nil || !(p > 0) {
			t.Errorf("StandardAtmosphere(%g) = %g, %v; want a pressure", h, p, err)
		}
	}
}

func TestGaugeAbsolute(t *testing.T) {
	// Source: definition of gauge pressure, p_abs = p_gauge + p_ambient
	// (common practice).
	tests := []struct{ gauge, baro, abs float64 }{
		{430e3, 101325, 531325},
		{-18e3, 98827.5, 80827.5},
		{0, 95000, 95000},
	}
	for _, tc := range tests {
		if got := GaugeToAbsolute(tc.gauge, tc.baro); got != tc.abs {
			t.Errorf("GaugeToAbsolute(%g, %g) = %g, want %g", tc.gauge, tc.baro, got, tc.abs)
		}
		if got := AbsoluteToGauge(tc.abs, tc.baro); got != tc.gauge {
			t.Errorf("AbsoluteToGauge(%g, %g) = %g, want %g", tc.abs, tc.baro, got, tc.gauge)
		}
	}
}
