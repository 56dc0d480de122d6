package calc

import (
	"errors"
	"math"
	"testing"
)

func TestSeawaterAgainstIAPWS08(t *testing.T) {
	// Source: python3-iapws (Debian), iapws.iapws08.SeaWater (IAPWS-08
	// seawater formulation) at S = 0.035 kg/kg, 0–40 °C, 0.1–10 MPa, committed
	// in testdata/refs/water_seawater.tsv by testdata/refs/gen/gen_water.py.
	// Density: Sharqawy et al. (2010) state ±0.1 % for their eq. (8) (stated
	// accuracy from memory). Vapour pressure: ours is pure water's, so it
	// must lie at or above IAPWS-08's a_w·psat and by no more than 2.5 %.
	rows := wtReadTSV(t, "../testdata/refs/water_seawater.tsv")
	if len(rows) < 27 {
		t.Fatalf("water_seawater.tsv: %d rows; table looks truncated", len(rows))
	}
	worstRho, worstPv := 0.0, 0.0
	for _, r := range rows {
		tK, pPa := wtNum(t, r["t_K"]), wtNum(t, r["p_Pa"])
		rho, aw := wtNum(t, r["rho_kg_m3"]), wtNum(t, r["a_w"])
		fl, err := Seawater(tK, pPa)
		if err != nil {
			t.Errorf("Seawater(%g, %g): %v", tK, pPa, err)
			continue
		}
		e := wtRelErr(fl.Density, rho)
		worstRho = math.Max(worstRho, e)
		if e > 1e-3 {
			t.Errorf("Seawater(%g K, %g Pa) ρ = %.6f, IAPWS-08 %.6f (rel %.3g > 0.1 %%)", tK, pPa, fl.Density, rho, e)
		}
		pvSea := aw * if97SaturationPressureCore(tK)
		over := fl.VapourPressure/pvSea - 1
		worstPv = math.Max(worstPv, over)
		if over < 0 || over > 0.025 {
			t.Errorf("Seawater(%g K) pv = %.6g Pa, IAPWS-08 seawater %.6g Pa (%.3g above)", tK, fl.VapourPressure, pvSea, over)
		}
	}
	t.Logf("Seawater vs IAPWS-08 (python3-iapws): max rel. density deviation %.3g; pv overstated by at most %.3g", worstRho, worstPv)
}

func TestSeawaterViscosity(t *testing.T) {
	// Source: ITTC Recommended Procedure 7.5-02-01-03 (2011), fresh water and
	// seawater properties, seawater at 15 °C: ν = 1.18831e-6 m²/s,
	// ρ = 1026.021 kg/m³ — from memory. Tolerance: ±1.5 %, the accuracy
	// Sharqawy et al. (2010) state for their eq. (22) (from memory).
	want := 1.18831e-6 * 1026.021
	fl, err := Seawater(288.15, 101325)
	if err != nil {
		t.Fatal(err)
	}
	if e := wtRelErr(fl.Viscosity, want); e > 0.015 {
		t.Errorf("Seawater(15 °C) μ = %.6g Pa·s, ITTC %.6g (rel %.3g)", fl.Viscosity, want, e)
	} else {
		t.Logf("Seawater(15 °C) μ = %.6g Pa·s vs ITTC (from memory) %.6g: rel %.3g", fl.Viscosity, want, e)
	}
	// Source: Sharqawy et al. (2010) eq. (22) is a ratio to pure water;
	// salt raises the viscosity, so μsw/μw > 1 everywhere in range.
	for tK := 273.15; tK <= 313.15; tK += 5 {
		sw, err1 := Seawater(tK, 2e5)
		w, err2 := Water(tK, 2e5)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if !(sw.Viscosity > w.Viscosity) {
			t.Errorf("T=%g K: seawater μ %g not above pure water %g", tK, sw.Viscosity, w.Viscosity)
		}
	}
}

func TestSeawaterErrors(t *testing.T) {
	// Source: the range Seawater documents (0–40 °C, pv–10 MPa).
	nan := math.NaN()
	tests := []struct {
		name    string
		tK, pPa float64
		field   string
	}{
		{"below 0 °C", 272.15, 101325, "t"},
		{"above 40 °C", 313.16, 101325, "t"},
		{"NaN T", nan, 101325, "t"},
		{"Inf T", math.Inf(1), 101325, "t"},
		{"below pv", 293.15, 2000, "p"},
		{"zero p", 293.15, 0, "p"},
		{"above 10 MPa", 293.15, 10e6 + 1, "p"},
		{"NaN p", 293.15, nan, "p"},
		{"Inf p", 293.15, math.Inf(1), "p"},
	}
	for _, tc := range tests {
		fl, err := Seawater(tc.tK, tc.pPa)
		if f := wtFieldOf(err); f != tc.field {
			t.Errorf("Seawater %s: got %+v, %v; want *FieldError on %q", tc.name, fl, err, tc.field)
		}
	}
}

func TestSeawaterAgainstTEOS10(t *testing.T) {
	// Source: python3-gsw (Debian; TEOS-10), gsw.rho at SA = 35 g/kg, CT
	// from gsw.CT_from_t, sea pressure p − 101 325 Pa, 0–40 °C and
	// 0.1–10 MPa absolute, committed in testdata/refs/seawater_gsw.tsv by
	// testdata/refs/gen/gen_fluids.py. Tolerance: the ±0.1 % Sharqawy et
	// al. (2010) state for their eq. (8) (from memory); the compression
	// taken from pure water must not spend more than that.
	rows := wtReadTSV(t, "../testdata/refs/seawater_gsw.tsv")
	if len(rows) < 50 {
		t.Fatalf("seawater_gsw.tsv: %d rows; table looks truncated", len(rows))
	}
	worst, atT, atP := 0.0, 0.0, 0.0
	for _, r := range rows {
		tK, pPa, rho := wtNum(t, r["t_K"]), wtNum(t, r["p_Pa"]), wtNum(t, r["rho_kg_m3"])
		fl, err := Seawater(tK, pPa)
		if err != nil {
			t.Errorf("Seawater(%g, %g): %v", tK, pPa, err)
			continue
		}
		if e := wtRelErr(fl.Density, rho); e > worst {
			worst, atT, atP = e, tK, pPa
		}
		if e := wtRelErr(fl.Density, rho); e > 1e-3 {
			t.Errorf("Seawater(%g K, %g Pa) ρ = %.6f, TEOS-10 %.6f (rel %.3g > 0.1 %%)", tK, pPa, fl.Density, rho, e)
		}
		if fl.Pressure != pPa {
			t.Errorf("Seawater(%g K, %g Pa).Pressure = %g", tK, pPa, fl.Pressure)
		}
	}
	t.Logf("Seawater vs TEOS-10 (python3-gsw): max rel. density deviation %.3g at %g K, %g Pa", worst, atT, atP)
}

// TestSeawaterSalinity: SeawaterAt and SeawaterHeatCapacity from 0 to
// 120 g/kg against TEOS-10 (python3-gsw, gsw.rho_t_exact, gsw.cp_t_exact)
// and IAPWS-08 (python3-iapws, iapws08.SeaWater), committed in
// testdata/refs/loops_seawater.tsv by testdata/refs/gen/gen_loops.py:
// 0–42 g/kg at 0.1–10 MPa (TEOS-10's full range), above 42 g/kg at
// atmospheric pressure only (where TEOS-10 was fitted to 120 g/kg).
// Tolerances: density ±0.1 % (Sharqawy et al. (2010) eq. (8), stated
// accuracy, from memory); cp ±0.5 %, the ±0.28 % Jamieson et al. (1969)
// state against their data (from memory) with room for the pressure
// taken from pure water; the two references agree with each other to
// 0.01 % in ρ and 0.1 % in cp.
func TestSeawaterSalinity(t *testing.T) {
	rows := wtReadTSV(t, "../testdata/refs/loops_seawater.tsv")
	if len(rows) < 100 {
		t.Fatalf("loops_seawater.tsv: %d rows; table looks truncated", len(rows))
	}
	worstRho, worstCp := 0.0, 0.0
	for _, r := range rows {
		sa, tK, pPa := wtNum(t, r["sa"]), wtNum(t, r["t_K"]), wtNum(t, r["p_Pa"])
		fl, err := SeawaterAt(tK, pPa, sa)
		if err != nil {
			t.Errorf("SeawaterAt(%g, %g, %g): %v", tK, pPa, sa, err)
			continue
		}
		cp, err := SeawaterHeatCapacity(tK, pPa, sa)
		if err != nil {
			t.Errorf("SeawaterHeatCapacity(%g, %g): %v", tK, sa, err)
			continue
		}
		for _, ref := range []string{"gsw", "iapws08"} {
			rho, c := wtNum(t, r["rho_"+ref]), wtNum(t, r["cp_"+ref])
			e := wtRelErr(fl.Density, rho)
			worstRho = math.Max(worstRho, e)
			if e > 1e-3 {
				t.Errorf("SeawaterAt(%g K, %g Pa, %g) ρ = %.6f, %s %.6f (rel %.3g)", tK, pPa, sa, fl.Density, ref, rho, e)
			}
			e = wtRelErr(cp, c)
			worstCp = math.Max(worstCp, e)
			if e > 5e-3 {
				t.Errorf("SeawaterHeatCapacity(%g K, %g Pa, %g) = %.6g, %s %.6g (rel %.3g)", tK, pPa, sa, cp, ref, c, e)
			}
		}
	}
	t.Logf("SeawaterAt vs TEOS-10 and IAPWS-08: max rel. deviation ρ %.3g, cp %.3g", worstRho, worstCp)
}

// TestSeawaterAtLimits: at 0 g/kg the viscosity is water's (eq. (22)'s
// ratio is 1) and the density within 0.03 % of IF97 (eq. (8)'s pure-water
// fit); salt raises density and viscosity and lowers cp (TEOS-10's
// trend, monotone over the grid); 35 g/kg is Seawater; and a salinity
// outside 0–120 g/kg is an error on "sal".
func TestSeawaterAtLimits(t *testing.T) {
	for tK := 273.15; tK <= 313.15; tK += 5 {
		w, _ := Water(tK, 2e5)
		s0, err := SeawaterAt(tK, 2e5, 0)
		if err != nil || s0.Viscosity != w.Viscosity || wtRelErr(s0.Density, w.Density) > 3e-4 {
			t.Errorf("T=%g: 0 g/kg %+v, water %+v, %v", tK, s0, w, err)
		}
		last, _ := SeawaterAt(tK, 2e5, 0)
		lastCp, _ := SeawaterHeatCapacity(tK, 2e5, 0)
		for sa := 0.01; sa <= SeawaterMaxSalinity+1e-12; sa += 0.01 {
			fl, err := SeawaterAt(tK, 2e5, sa)
			cp, err2 := SeawaterHeatCapacity(tK, 2e5, sa)
			if err != nil || err2 != nil || !(fl.Density > last.Density) || !(fl.Viscosity > last.Viscosity) || !(cp < lastCp) {
				t.Errorf("T=%g, S=%g: %+v cp %v (%v, %v) not past %+v cp %v", tK, sa, fl, cp, err, err2, last, lastCp)
			}
			last, lastCp = fl, cp
		}
		a, _ := Seawater(tK, 2e5)
		b, _ := SeawaterAt(tK, 2e5, 0.035)
		if a != b {
			t.Errorf("T=%g: Seawater %+v, SeawaterAt 35 g/kg %+v", tK, a, b)
		}
	}
	for _, sa := range []float64{-0.001, 0.1201, math.NaN(), math.Inf(1)} {
		var fe *FieldError
		_, err := SeawaterAt(293.15, 2e5, sa)
		_, err2 := SeawaterHeatCapacity(293.15, 2e5, sa)
		if !errors.As(err, &fe) || fe.Field != "sal" || fe.Kind != OutOfRange || fe.Reason != ReasonSeawaterSalinity ||
			fe.Max == nil || fe.Max.Value != 0.12 || wtFieldOf(err2) != "sal" {
			t.Errorf("salinity %g: %v, %v", sa, err, err2)
		}
	}
	if _, err := SeawaterHeatCapacity(320, 2e5, 0.035); wtFieldOf(err) != "t" {
		t.Errorf("cp at 47 °C: %v, want an error on t", err)
	}
	if fl, _ := SeawaterAt(293.15, 2e5, 0.07); fl.Name != "seawater (70 g/kg) at 20 °C" {
		t.Errorf("name %q", fl.Name)
	}
}
