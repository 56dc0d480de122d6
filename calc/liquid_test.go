package calc

import (
	"math"
	"testing"
)

func TestCustomLiquid(t *testing.T) {
	// Source: CustomLiquid passes the user's values through unchanged;
	// ν = μ/ρ by definition. Values are arbitrary inputs, not properties of
	// any real liquid.
	fl, err := CustomLiquid(850, 0.004, 0)
	if err != nil {
		t.Fatal(err)
	}
	if fl.Density != 850 || fl.Viscosity != 0.004 || fl.VapourPressure != 0 || fl.Temperature != 0 {
		t.Errorf("CustomLiquid(850, 0.004, 0) = %+v", fl)
	}
	if got, want := fl.KinematicViscosity(), 0.004/850.0; wtRelErr(got, want) > 1e-15 {
		t.Errorf("KinematicViscosity = %g, want %g", got, want)
	}
	if fl.Name == "" {
		t.Error("CustomLiquid: empty Name")
	}
}

func TestCustomLiquidErrors(t *testing.T) {
	// Source: validation rules CustomLiquid documents (ρ, μ > 0 and finite;
	// pv ≥ 0 and finite).
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name        string
		rho, mu, pv float64
		field       string
	}{
		{"zero rho", 0, 1e-3, 2000, "rho"},
		{"negative rho", -1000, 1e-3, 2000, "rho"},
		{"NaN rho", nan, 1e-3, 2000, "rho"},
		{"Inf rho", inf, 1e-3, 2000, "rho"},
		{"zero mu", 1000, 0, 2000, "mu"},
		{"negative mu", 1000, -1e-3, 2000, "mu"},
		{"NaN mu", 1000, nan, 2000, "mu"},
		{"Inf mu", 1000, inf, 2000, "mu"},
		{"negative pv", 1000, 1e-3, -1, "pv"},
		{"NaN pv", 1000, 1e-3, nan, "pv"},
		{"Inf pv", 1000, 1e-3, inf, "pv"},
	}
	for _, tc := range tests {
		fl, err := CustomLiquid(tc.rho, tc.mu, tc.pv)
		if f := wtFieldOf(err); f != tc.field {
			t.Errorf("CustomLiquid %s: got %+v, %v; want *FieldError on %q", tc.name, fl, err, tc.field)
		}
	}
}
