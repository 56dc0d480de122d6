package calc

import "testing"

func TestFractionSlip(t *testing.T) {
	// Source: common practice — a fraction (0.78) typed into a
	// percentage box reads as 0.78 %; anything up to 1.5 % is taken as
	// such a slip and the percentage meant is 100 times the number typed.
	for _, tc := range []struct {
		v, meant float64
		slip     bool
	}{
		{0.0078, 78, true},
		{0.015, 150, true},
		{0.0001, 1, true},
		{0.016, 0, false},
		{0.78, 0, false},
		{0, 0, false},
		{-0.005, 0, false},
	} {
		m, s := FractionSlip(tc.v)
		if s != tc.slip || (s && abs(m-tc.meant) > 1e-9) {
			t.Errorf("FractionSlip(%g) = %g, %v; want %g, %v", tc.v, m, s, tc.meant, tc.slip)
		}
	}
}

func abs(v float64) float64 {
	if v < 0 {
		return -v
	}
	return v
}
