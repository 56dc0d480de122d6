package calc

import (
	"bufio"
	"fmt"
	"math"
	"os"
	"strconv"
	"strings"
	"testing"
)

// wtReadTSV reads a tab-separated reference table: lines starting with '#'
// are comments, the first other line names the columns.
func wtReadTSV(t testing.TB, path string) []map[string]string {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatalf("open reference table: %v", err)
	}
	defer f.Close()
	var cols []string
	var rows []map[string]string
	sc := bufio.NewScanner(f)
	for sc.Scan() {
		line := sc.Text()
		if line == "" || strings.HasPrefix(line, "#") {
			continue
		}
		fields := strings.Split(line, "\t")
		if cols == nil {
			cols = fields
			continue
		}
		if len(fields) != len(cols) {
			t.Fatalf("%s: %d fields, header has %d: %q", path, len(fields), len(cols), line)
		}
		r := make(map[string]string, len(cols))
		for i, c := range cols {
			r[c] = fields[i]
		}
		rows = append(rows, r)
	}
	if err := sc.Err(); err != nil {
		t.Fatal(err)
	}
	return rows
}

// wtNum parses a number from a reference table.
func wtNum(t testing.TB, s string) float64 {
	t.Helper()
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("bad number %q in reference table: %v", s, err)
	}
	return v
}

func TestWaterAgainstPythonIAPWSGrid(t *testing.T) {
	// Source: python3-iapws (Debian): iapws97._Region1 (density),
	// iapws._iapws._Viscosity with μ2 = 1 (viscosity), iapws97._PSat_T
	// (saturation pressure), over 0–100 °C × 0.1–10 MPa, committed in
	// testdata/refs/water.tsv by testdata/refs/gen/gen_water.py. Rows marked
	// "vapour" have p < psat and must be refused on "p".
	rows := wtReadTSV(t, "../testdata/refs/water.tsv")
	var liquid, vapour int
	var wRho, wMu, wPs float64
	for _, r := range rows {
		tK, pPa, ps := wtNum(t, r["t_K"]), wtNum(t, r["p_Pa"]), wtNum(t, r["psat_Pa"])
		gotPs, err := SaturationPressure(tK)
		if err != nil {
			t.Fatal(err)
		}
		wPs = math.Max(wPs, wtRelErr(gotPs, ps))
		fl, err := Water(tK, pPa)
		switch r["phase"] {
		case "vapour":
			vapour++
			if wtFieldOf(err) != "p" {
				t.Errorf("Water(%g K, %g Pa): p < psat %g Pa, want *FieldError on \"p\", got %v", tK, pPa, ps, err)
			}
			continue
		case "liquid":
			liquid++
		default:
			t.Fatalf("unknown phase %q", r["phase"])
		}
		if err != nil {
			t.Errorf("Water(%g K, %g Pa): %v", tK, pPa, err)
			continue
		}
		rho, mu := wtNum(t, r["rho_kg_m3"]), wtNum(t, r["mu_Pa_s"])
		eRho, eMu, ePs := wtRelErr(fl.Density, rho), wtRelErr(fl.Viscosity, mu), wtRelErr(fl.VapourPressure, ps)
		wRho, wMu, wPs = math.Max(wRho, eRho), math.Max(wMu, eMu), math.Max(wPs, ePs)
		if eRho > 1e-6 || ePs > 1e-6 || eMu > 1e-5 {
			t.Errorf("Water(%g K, %g Pa) = ρ %.17g μ %.17g pv %.17g; python3-iapws ρ %.17g μ %.17g pv %.17g",
				tK, pPa, fl.Density, fl.Viscosity, fl.VapourPressure, rho, mu, ps)
		}
		if fl.Temperature != tK {
			t.Errorf("Water(%g K, …).Temperature = %g", tK, fl.Temperature)
		}
	}
	if liquid < 150 || vapour < 1 {
		t.Fatalf("water.tsv: %d liquid and %d vapour rows; table looks truncated", liquid, vapour)
	}
	t.Logf("Water vs python3-iapws over %d liquid + %d vapour points: max rel. deviation ρ %.3g, μ %.3g, pv %.3g",
		liquid, vapour, wRho, wMu, wPs)
}

func TestWaterRangeEnds(t *testing.T) {
	// Source: the range Water documents (0–100 °C, psat(T)–10 MPa), with
	// psat from IF97 eq. 30; 0 °C and 100 °C must be accepted exactly, also
	// when they come from a °C or °F conversion.
	tests := []struct {
		name    string
		tK, pPa float64
	}{
		{"0 °C at 1 atm", 0 + 273.15, 101325},
		{"0 °C at its vapour pressure", 273.15, if97SaturationPressureCore(273.15)},
		{"100 °C from °C", 100 + 273.15, 2e5},
		{"212 °F from °F", (212-32)*5.0/9 + 273.15, 2e5},
		{"32 °F from °F", (32-32)*5.0/9 + 273.15, 101325},
		{"100 °C at its vapour pressure", 373.15, if97SaturationPressureCore(373.15)},
		{"10 MPa", 300, 10e6},
	}
	for _, tc := range tests {
		fl, err := Water(tc.tK, tc.pPa)
		if err != nil {
			t.Errorf("%s: Water(%v, %v): %v", tc.name, tc.tK, tc.pPa, err)
			continue
		}
		if !(fl.Density > 900 && fl.Density < 1010 && fl.Viscosity > 2e-4 && fl.Viscosity < 2e-3 && fl.VapourPressure > 600) {
			t.Errorf("%s: implausible %+v", tc.name, fl)
		}
	}
}

func TestWaterErrors(t *testing.T) {
	// Source: the range Water documents; psat(100 °C) = 101 418 Pa from IF97
	// eq. 30 exceeds one standard atmosphere, so 100 °C at 101 325 Pa is
	// vapour.
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name    string
		tK, pPa float64
		field   string
	}{
		{"below 0 °C", 273.14, 101325, "t"},
		{"above 100 °C", 373.16, 2e5, "t"},
		{"0 K", 0, 101325, "t"},
		{"negative K", -5, 101325, "t"},
		{"NaN T", nan, 101325, "t"},
		{"+Inf T", inf, 101325, "t"},
		{"-Inf T", -inf, 101325, "t"},
		{"zero p", 293.15, 0, "p"},
		{"negative p", 293.15, -1000, "p"},
		{"NaN p", 293.15, nan, "p"},
		{"+Inf p", 293.15, inf, "p"},
		{"-Inf p", 293.15, -inf, "p"},
		{"above 10 MPa", 293.15, 10e6 + 1, "p"},
		{"below psat at 0 °C", 273.15, 600, "p"},
		{"100 °C at 1 atm", 373.15, 101325, "p"},
		{"80 °C at 40 kPa", 353.15, 40e3, "p"},
	}
	for _, tc := range tests {
		fl, err := Water(tc.tK, tc.pPa)
		if f := wtFieldOf(err); f != tc.field {
			t.Errorf("Water %s: got %+v, %v; want *FieldError on %q", tc.name, fl, err, tc.field)
		}
	}
}

func TestWaterName(t *testing.T) {
	// Source: formatting convention of this package (°C, to 0.01 K).
	tests := []struct {
		tK   float64
		want string
	}{
		{273.15, "water at 0 °C"},
		{291.15, "water at 18 °C"},
		{293.65, "water at 20.5 °C"},
	}
	for _, tc := range tests {
		fl, err := Water(tc.tK, 2e5)
		if err != nil {
			t.Fatal(err)
		}
		if fl.Name != tc.want {
			t.Errorf("Water(%g).Name = %q, want %q", tc.tK, fl.Name, tc.want)
		}
	}
}

// ExampleWater computes the barometric pressure at a site 210 m above sea
// level and the properties of 18 °C water in an open wet well there.
// The printed figures agree with python3-iapws (iapws97._Region1,
// iapws._iapws._Viscosity, iapws97._PSat_T) at the same state.
func ExampleWater() {
	pAtm, err := StandardAtmosphere(210)
	if err != nil {
		fmt.Println(err)
		return
	}
	w, err := Water(18+273.15, pAtm)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%s, %.1f Pa absolute\n", w.Name, pAtm)
	fmt.Printf("density %.3f kg/m³\n", w.Density)
	fmt.Printf("viscosity %.5f mPa·s\n", w.Viscosity*1e3)
	fmt.Printf("vapour pressure %.1f Pa\n", w.VapourPressure)
	fmt.Printf("kinematic viscosity %.4e m²/s\n", w.KinematicViscosity())

	_, err = Water(18+273.15, 1500)
	fmt.Println(err)
	// Output:
	// water at 18 °C, 98827.5 Pa absolute
	// density 998.596 kg/m³
	// viscosity 1.05268 mPa·s
	// vapour pressure 2064.7 Pa
	// kinematic viscosity 1.0542e-06 m²/s
	// p: below limit (boils) value=1.500 kPa min=2.065 kPa max=10000 kPa f0=18.00 °C
}

func BenchmarkWater(b *testing.B) {
	for i := 0; b.Loop(); i++ {
		if _, err := Water(291.15+float64(i%50), 4e5); err != nil {
			b.Fatal(err)
		}
	}
}
