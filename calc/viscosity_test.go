package calc

import (
	"math"
	"testing"
)

func TestWaterViscosityTable4(t *testing.T) {
	// Source: IAPWS 2008 release on the viscosity of ordinary water
	// substance, Table 4 — sample points for verifying the correlating
	// equation (eq. 10) with μ2 = 1; μ in μPa·s quoted to 6 decimals.
	tests := []struct{ tK, rho, muMicro float64 }{
		{298.15, 998, 889.735100},
		{298.15, 1200, 1437.649467},
		{373.15, 1000, 307.883622},
		{433.15, 1, 14.538324},
		{433.15, 1000, 217.685358},
		{873.15, 1, 32.619287},
		{873.15, 100, 35.802262},
		{873.15, 600, 77.430195},
		{1173.15, 1, 44.217245},
		{1173.15, 100, 47.640433},
		{1173.15, 400, 64.154608},
	}
	worst := 0.0
	for _, tc := range tests {
		got, err := WaterViscosity(tc.tK, tc.rho)
		if err != nil {
			t.Fatalf("WaterViscosity(%g, %g): %v", tc.tK, tc.rho, err)
		}
		d := math.Abs(got*1e6 - tc.muMicro)
		worst = math.Max(worst, d)
		if d > 0.6e-6 {
			t.Errorf("WaterViscosity(%g, %g) = %.9f µPa·s, IAPWS 2008 Table 4 gives %.6f", tc.tK, tc.rho, got*1e6, tc.muMicro)
		}
	}
	t.Logf("viscosity vs IAPWS 2008 Table 4: max deviation %.3g µPa·s", worst)
}

func TestWaterViscosityAgainstPythonIAPWS(t *testing.T) {
	// Source: python3-iapws (Debian), iapws._iapws._Viscosity(rho, T) without
	// the critical-enhancement arguments (μ2 = 1) at the Table 4 points,
	// committed in testdata/refs/if97.tsv by testdata/refs/gen/gen_water.py.
	n, worst := 0, 0.0
	for _, r := range wtReadTSV(t, "../testdata/refs/if97.tsv") {
		if r["kind"] != "visc" {
			continue
		}
		tK, rho, want := wtNum(t, r["t_K"]), wtNum(t, r["p_Pa_or_rho"]), wtNum(t, r["w_or_value"])
		got, err := WaterViscosity(tK, rho)
		if err != nil {
			t.Fatal(err)
		}
		e := wtRelErr(got, want)
		worst = math.Max(worst, e)
		if e > 1e-12 {
			t.Errorf("μ(%g K, %g kg/m³): Go %.17g, python3-iapws %.17g (rel %.3g)", tK, rho, got, want, e)
		}
		n++
	}
	if n != 11 {
		t.Fatalf("read %d viscosity rows from if97.tsv, want 11", n)
	}
	t.Logf("viscosity vs python3-iapws: max relative deviation %.3g over %d points", worst, n)
}

func TestWaterViscosityErrors(t *testing.T) {
	// Source: IAPWS 2008 viscosity release, range of validity up to
	// 1173.15 K; lower bound 273.15 K as accepted by this package.
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name    string
		tK, rho float64
		field   string
	}{
		{"below 273.15 K", 273.1, 999, "t"},
		{"above 1173.15 K", 1173.2, 100, "t"},
		{"NaN T", nan, 999, "t"},
		{"Inf T", inf, 999, "t"},
		{"zero rho", 300, 0, "rho"},
		{"negative rho", 300, -1, "rho"},
		{"NaN rho", 300, nan, "rho"},
		{"Inf rho", 300, inf, "rho"},
	}
	for _, tc := range tests {
		_, err := WaterViscosity(tc.tK, tc.rho)
		if f := wtFieldOf(err); f != tc.field {
			t.Errorf("WaterViscosity %s: error %v, want *FieldError on %q", tc.name, err, tc.field)
		}
	}
}
