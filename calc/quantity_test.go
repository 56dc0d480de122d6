package calc

import (
	"errors"
	"math"
	"math/rand/v2"
	"slices"
	"strconv"
	"strings"
	"testing"
)

// Exact conversion definitions used for expected values below (NIST SP 811
// (2008) App. B, from memory): lbf/in² = 0.453 592 37 kg × 9.806 65 m/s² /
// (0.0254 m)²; ft = 0.3048 m; US gal = 231 in³; °F → K: (t + 459.67)/1.8.
const (
	refPsi   = 0.45359237 * 9.80665 / (0.0254 * 0.0254)
	refUSGal = 231 * 0.0254 * 0.0254 * 0.0254
)

func TestParse(t *testing.T) {
	rows := []struct {
		text string
		dim  Dimension
		def  string
		want float64
	}{
		{"250 kPa", Pressure, "", 250e3},                                             // SI prefix
		{"-18kPa", Pressure, "", -18e3},                                              // SI prefix
		{"−18 kPa", Pressure, "", -18e3},                                             // U+2212 minus sign
		{"+430 kPa", Pressure, "", 430e3},                                            // SI prefix
		{"12.5 psi", Pressure, "", 12.5 * refPsi},                                    // psi, NIST SP 811 (2008) App. B, from memory
		{"12,5 psi", Pressure, "", 12.5 * refPsi},                                    // decimal comma
		{"12,5psi", Pressure, "", 12.5 * refPsi},                                     // no space
		{"2.5 bar", Pressure, "", 2.5e5},                                             // bar 1.0 E+05, NIST SP 811 (2008) App. B, from memory
		{"10 mH2O", Pressure, "", 98066.5},                                           // conventional, 1000 kg/m³ × gₙ, NIST SP 811 (2008) App. B, from memory
		{"30 inHg", Pressure, "", 30 * 13595.1 * 9.80665 * 0.0254},                   // conventional mercury, NIST SP 811 (2008) App. B, from memory
		{"1 atm", Pressure, "", 101325},                                              // standard atmosphere, NIST SP 811 (2008) App. B, from memory
		{"430", Pressure, "kPa", 430e3},                                              // default unit
		{"3.2 m", Length, "", 3.2},                                                   // SI
		{"3.2m", Length, "", 3.2},                                                    // SI
		{"40 ft", Length, "", 12.192},                                                // foot 0.3048 m, NIST SP 811 (2008) App. B, from memory
		{"8 in", Length, "", 0.2032},                                                 // inch 0.0254 m, NIST SP 811 (2008) App. B, from memory
		{"203", Length, "mm", 0.203},                                                 // default unit
		{"0.045 mm", Length, "", 45e-6},                                              // SI prefix
		{"45 µm", Length, "", 45e-6},                                                 // SI prefix
		{"45 um", Length, "", 45e-6},                                                 // ASCII micro
		{"1.5e-3 m", Length, "", 1.5e-3},                                             // exponent
		{"2E3mm", Length, "", 2},                                                     // exponent, no space
		{".5 m", Length, "", 0.5},                                                    // leading point
		{"5. m", Length, "", 5},                                                      // trailing point
		{"0,045 mm", Length, "", 45e-6},                                              // comma, leading zero: not grouping
		{"1,2345 m", Length, "", 1.2345},                                             // comma, four decimals: not grouping
		{"15 L/s", Flow, "", 0.015},                                                  // liter 1.0 E-03 m³, NIST SP 811 (2008) App. B, from memory
		{"15 l/s", Flow, "", 0.015},                                                  // lower-case litre
		{"240 gpm", Flow, "", 240 * refUSGal / 60},                                   // gallon (U.S.) per minute, NIST SP 811 (2008) App. B, from memory
		{"0.5 m3/h", Flow, "", 0.5 / 3600},                                           // hour 3.6 E+03 s, NIST SP 811 (2008) App. B, from memory
		{"0.5 m³/h", Flow, "", 0.5 / 3600},                                           // hour 3.6 E+03 s, NIST SP 811 (2008) App. B, from memory
		{"1 cfs", Flow, "", 0.3048 * 0.3048 * 0.3048},                                // cubic foot per second, NIST SP 811 (2008) App. B, from memory
		{"18 °C", Temperature, "", 291.15},                                           // T/K = t/°C + 273.15, NIST SP 811 (2008) App. B, from memory
		{"18°C", Temperature, "", 291.15},                                            // no space
		{"18 C", Temperature, "", 291.15},                                            // plain C
		{"64 F", Temperature, "", (64 + 459.67) / 1.8},                               // T/K = (t/°F + 459.67)/1.8, NIST SP 811 (2008) App. B, from memory
		{"-40 °F", Temperature, "", 233.15},                                          // −40 °F = −40 °C, from the same relation
		{"300 K", Temperature, "", 300},                                              // SI
		{"0 K", Temperature, "", 0},                                                  // absolute zero is allowed
		{"1.0 mPa·s", DynamicViscosity, "", 1e-3},                                    // SI prefix
		{"1,0 mPa.s", DynamicViscosity, "", 1e-3},                                    // ASCII dot product
		{"1.0 cP", DynamicViscosity, "", 1e-3},                                       // centipoise, NIST SP 811 (2008) App. B, from memory
		{"1.0 cSt", KinematicViscosity, "", 1e-6},                                    // centistokes, NIST SP 811 (2008) App. B, from memory
		{"998 kg/m3", Density, "", 998},                                              // SI
		{"62.4 lb/ft3", Density, "", 62.4 * 0.45359237 / (0.3048 * 0.3048 * 0.3048)}, // lb and ft, NIST SP 811 (2008) App. B, from memory
		{"1.5 m/s", Velocity, "", 1.5},                                               // SI
		{"31 kW", Power, "", 31e3},                                                   // SI prefix
		{"10 hp", Power, "", 10 * 550 * 0.3048 * 0.45359237 * 9.80665},               // horsepower 550 ft·lbf/s, NIST SP 811 (2008) App. B, from memory
		{"75 %", Dimensionless, "", 0.75},                                            // percent
		{"0.75", Dimensionless, "", 0.75},                                            // bare number
		{"  250   kPa  ", Pressure, "", 250e3},                                       // surrounding spaces
		{"250\u00a0kPa", Pressure, "", 250e3},                                        // no-break space
		{"1e-999 m", Length, "", 0},                                                  // underflows to zero: representable
	}
	for _, r := range rows {
		got, err := Parse("x", r.text, r.dim, r.def)
		if err != nil {
			t.Errorf("Parse(%q, %v): %v", r.text, r.dim, err)
			continue
		}
		if math.Abs(got-r.want) > 1e-12*math.Abs(r.want) {
			t.Errorf("Parse(%q, %v) = %.17g, want %.17g", r.text, r.dim, got, r.want)
		}
	}
}

func TestParseErrors(t *testing.T) {
	// What is wrong, as data (present's TestParseErrorWords words each row
	// as the page shows it): the kind, the reason, and the text at fault.
	_, err := Parse("d1", "3 kPa", Length, "mm")
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "d1" || fe.Kind != WrongDimension || fe.Input != "kPa" || fe.Dim != Length || fe.UnitDim != Pressure {
		t.Errorf("got %#v, want a wrong dimension, a pressure unit \"kPa\" for a length", err)
	}
	rows := []struct {
		text  string
		dim   Dimension
		def   string
		kind  Kind
		why   Reason
		input string
	}{
		{"", Pressure, "kPa", Missing, ReasonNone, ""},
		{"   ", Pressure, "kPa", Missing, ReasonNone, ""},
		{"abc", Pressure, "kPa", NotANumber, ReasonNone, "abc"},
		{"kPa", Pressure, "kPa", NotANumber, ReasonNone, "kPa"},
		{"-", Length, "m", NotANumber, ReasonNone, "-"},
		{"NaN", Length, "m", NotFinite, ReasonNone, "NaN"},
		{"nan m", Length, "m", NotANumber, ReasonNone, "nan m"},
		{"Inf", Length, "m", NotFinite, ReasonNone, "Inf"},
		{"-inf", Length, "m", NotFinite, ReasonNone, "-inf"},
		{"∞", Length, "m", NotFinite, ReasonNone, "∞"},
		{"1e999", Length, "m", NotFinite, ReasonNone, "1e999"},
		{"1e999 m", Length, "", NotFinite, ReasonNone, "1e999"},
		{"1e308 psi", Pressure, "", NotFinite, ReasonNone, "1e308 psi"},
		{"1.2.3 m", Length, "", NotANumber, ReasonGrouping, "1.2.3"},
		{"1,250.5 m", Length, "", NotANumber, ReasonGrouping, "1,250.5"},
		{"1,250 m", Length, "", NotANumber, ReasonAmbiguousComma, "1,250"},
		{"-2,500 kPa", Pressure, "", NotANumber, ReasonAmbiguousComma, "-2,500"},
		{"250", Pressure, "", NoUnit, ReasonNone, "250"},
		{"3 kPz", Pressure, "", UnknownUnit, ReasonNone, "kPz"},
		{"4 ...", Dimensionless, "%", UnknownUnit, ReasonNone, "..."}, // dots are no unit (found by FuzzScenario: the box showed 4 %, the sheet used 4)
		{"3 mPa", Pressure, "", UnknownUnit, ReasonNone, "mPa"},
		{"3 m m", Length, "", UnknownUnit, ReasonNone, "m m"},
		{"3", Length, "furlong", UnknownUnit, ReasonNone, "furlong"},
		{"10 m", Pressure, "", WrongDimension, ReasonWaterColumn, "m"},
		{"10 mH2O", Length, "", WrongDimension, ReasonNone, "mH2O"},
		{"15 L/s", Velocity, "", WrongDimension, ReasonNone, "L/s"},
		{"2 m²", Length, "", WrongDimension, ReasonNone, "m²"},
		{"50 %", Length, "", WrongDimension, ReasonNone, "%"},
		{"30 psig", Pressure, "", UnknownUnit, ReasonPressureRef, "psig"},
		{"-300 °C", Temperature, "", BelowLimit, ReasonAbsoluteZero, "-300 °C"},
		{"-1 K", Temperature, "", BelowLimit, ReasonAbsoluteZero, "-1 K"},
		{"3 m", Dimension(42), "", WrongDimension, ReasonNone, "m"},
	}
	for _, r := range rows {
		v, err := Parse("fld", r.text, r.dim, r.def)
		var fe *FieldError
		if !errors.As(err, &fe) {
			t.Errorf("Parse(%q, %v) = %g, %v; want a *FieldError", r.text, r.dim, v, err)
			continue
		}
		if fe.Field != "fld" || fe.Kind != r.kind || fe.Reason != r.why || fe.Input != r.input || fe.Dim != r.dim {
			t.Errorf("Parse(%q, %v): %v\n want %v (%v), input %q", r.text, r.dim, err, r.kind, r.why, r.input)
		}
		// (A plain number's SI unit has no symbol to list.)
		if si := DefaultUnit(r.dim, false).Symbol; fe.Kind == UnknownUnit && fe.Reason == ReasonNone && si != "" && !slices.Contains(fe.Choices, si) {
			t.Errorf("Parse(%q, %v): choices %v lack the SI unit", r.text, r.dim, fe.Choices)
		}
	}
}

func TestParsePressure(t *testing.T) {
	rows := []struct {
		text, def string
		want      float64
		ref       PressureRef
	}{
		{"30 psig", "", 30 * refPsi, Gauge},        // psi, NIST SP 811 (2008) App. B, from memory
		{"14.7 psia", "", 14.7 * refPsi, Absolute}, // psi, NIST SP 811 (2008) App. B, from memory
		{"14.7 psi abs", "", 14.7 * refPsi, Absolute},
		{"2.1 bara", "", 2.1e5, Absolute}, // bar, NIST SP 811 (2008) App. B, from memory
		{"4.3 barg", "", 4.3e5, Gauge},
		{"430 kPa(g)", "", 430e3, Gauge},
		{"430 kPa (g)", "", 430e3, Gauge},
		{"430 kPa g", "", 430e3, Gauge},
		{"430 kPa gauge", "", 430e3, Gauge},
		{"101 kPaA", "", 101e3, Absolute},
		{"101 kPa(a)", "", 101e3, Absolute},
		{"101 kPa (abs)", "", 101e3, Absolute},
		{"0.5 MPag", "", 0.5e6, Gauge},
		{"-18 kPa", "", -18e3, RefUnspecified},
		{"29.9 inHg", "", 29.9 * 13595.1 * 9.80665 * 0.0254, RefUnspecified}, // "g" of inHg is no suffix
		{"29.9 inHga", "", 29.9 * 13595.1 * 9.80665 * 0.0254, Absolute},
		{"100 Pa", "", 100, RefUnspecified}, // "a" of Pa is no suffix
		{"430", "kPa(g)", 430e3, Gauge},
		{"430", "kPa", 430e3, RefUnspecified},
	}
	for _, r := range rows {
		pa, ref, err := ParsePressure("p1", r.text, r.def)
		if err != nil || ref != r.ref || math.Abs(pa-r.want) > 1e-12*math.Abs(r.want) {
			t.Errorf("ParsePressure(%q, %q) = %.15g, %v, %v; want %.15g, %v", r.text, r.def, pa, ref, err, r.want, r.ref)
		}
	}
	for _, text := range []string{"", "30 psix", "30 g", "30 mg", "3 m", "NaN psig"} {
		_, ref, err := ParsePressure("p1", text, "")
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != "p1" || ref != RefUnspecified || fe.Dim != Pressure || fe.Kind == KindOther {
			t.Errorf("ParsePressure(%q) = %v, %v; want a *FieldError for p1", text, ref, err)
		}
	}
	for r, s := range map[PressureRef]string{RefUnspecified: "unspecified", Gauge: "gauge", Absolute: "absolute"} {
		if r.String() != s {
			t.Errorf("%d.String() = %q, want %q", r, r.String(), s)
		}
	}
}

func TestFormatNumber(t *testing.T) {
	// Rounding to significant digits, decimal notation (common practice).
	for _, r := range []struct {
		x      float64
		digits int
		want   string
	}{
		{45, 3, "45.0"},
		{45.04999, 3, "45.0"},
		{0.045, 2, "0.045"},
		{0.0004567, 2, "0.00046"},
		{9.996, 3, "10.0"},
		{99.96, 3, "100"},
		{123456, 3, "123000"},
		{123456, 6, "123456"},
		{-18.04, 3, "-18.0"},
		{-0.0001, 2, "-0.00010"},
		{-0.00001, 1, "-0.00001"},
		{0, 3, "0.00"},
		{math.Copysign(0, -1), 2, "0.0"},
		{-0.0004, 1, "-0.0004"},
		{1, 1, "1"},
		{1.5, 0, "2"}, // digits clamped to 1
		{1.2e-7, 2, "1.2e-7"},
		{6.02e23, 3, "6.02e23"},
		{999999999999.9, 3, "1.00e12"},
		{math.NaN(), 3, "—"},
		{math.Inf(-1), 3, "—"},
	} {
		if got := FormatNumber(r.x, r.digits); got != r.want {
			t.Errorf("FormatNumber(%g, %d) = %q, want %q", r.x, r.digits, got, r.want)
		}
	}
}

// TestFormatNumberAsBefore holds FormatNumber, written into one buffer, to
// the string-built form it replaced (kept here as the reference), over
// random numbers of every magnitude it writes and every digit count.
func TestFormatNumberAsBefore(t *testing.T) {
	before := func(x float64, digits int) string {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return "—"
		}
		digits = min(max(digits, 1), 17)
		if x == 0 {
			x = 0
		}
		e := strconv.FormatFloat(x, 'e', digits-1, 64)
		k := strings.IndexByte(e, 'e')
		exp, _ := strconv.Atoi(e[k+1:])
		mant := e[:k]
		sign := ""
		if mant[0] == '-' {
			sign, mant = "-", mant[1:]
		}
		ds := strings.Replace(mant, ".", "", 1)
		if strings.Trim(ds, "0") == "" {
			sign = ""
		}
		if exp < -6 || exp >= 12 {
			return sign + mant + "e" + strconv.Itoa(exp)
		}
		switch {
		case exp < 0:
			return sign + "0." + strings.Repeat("0", -exp-1) + ds
		case exp+1 >= len(ds):
			return sign + ds + strings.Repeat("0", exp+1-len(ds))
		default:
			return sign + ds[:exp+1] + "." + ds[exp+1:]
		}
	}
	r := rand.New(rand.NewPCG(1, 2))
	for i := range 200000 {
		x := (r.Float64()*2 - 1) * math.Pow(10, float64(r.IntN(40)-20))
		if i%7 == 0 {
			x = math.Round(x*1000) / 1000 // ties and short decimals
		}
		d := r.IntN(19) // 0 and 18 are clamped
		if got, want := FormatNumber(x, d), before(x, d); got != want {
			t.Fatalf("FormatNumber(%v, %d) = %q, before %q", x, d, got, want)
		}
		if got, want := FormatValue(x, "kPa", d), before(x/1000, d)+" kPa"; got != want {
			t.Fatalf("FormatValue(%v, kPa, %d) = %q, before %q", x, d, got, want)
		}
	}
}

func TestFormatValue(t *testing.T) {
	for _, r := range []struct {
		si     float64
		unit   string
		digits int
		want   string
	}{
		{0.045, "L/s", 3, "45.0 L/s"},
		{0.045, "l/s", 3, "45.0 L/s"},
		{291.15, "°C", 3, "18.0 °C"},
		{291.15, "C", 3, "18.0 °C"},
		{233.15, "F", 3, "-40.0 °F"},                      // −40 °C = −40 °F, NIST SP 811 (2008) App. B relation, from memory
		{6894.757293168361, "psi", 4, "1.000 psi"},        // psi, NIST SP 811 (2008) App. B, from memory
		{100000, "psi", 4, "14.50 psi"},                   // 1 bar / 6894.757 Pa, NIST SP 811 (2008) App. B, from memory
		{12.192, "ft", 3, "40.0 ft"},                      // foot, NIST SP 811 (2008) App. B, from memory
		{0.015141647136, "gpm", 3, "240 gpm"},             // gallon (U.S.) per minute, NIST SP 811 (2008) App. B, from memory
		{1e-3, "mPa·s", 2, "1.0 mPa·s"},                   // SI prefix
		{0.75, "%", 2, "75 %"},                            // percent
		{0.75, "", 2, "0.75"},                             // plain number
		{3, "furlong", 2, `3.0 [unknown unit "furlong"]`}, // unknown unit stays visible
	} {
		if got := FormatValue(r.si, r.unit, r.digits); got != r.want {
			t.Errorf("FormatValue(%g, %q, %d) = %q, want %q", r.si, r.unit, r.digits, got, r.want)
		}
	}
	// Round trip through Parse for every unit: x → text → x to 12 digits.
	for _, e := range unitTable {
		si := e.ToSI(1.23456789012)
		back, err := Parse("x", e.Format(si, 15), e.Dim, "")
		if err != nil || math.Abs(back-si) > 1e-12*math.Abs(si) {
			t.Errorf("%s: %q → %g, %v; want %g", e.Symbol, e.Format(si, 15), back, err, si)
		}
	}
}

func BenchmarkParse(b *testing.B) {
	for b.Loop() {
		if _, err := Parse("q", "240 gpm", Flow, ""); err != nil {
			b.Fatal(err)
		}
		if _, err := Parse("t", "18 °C", Temperature, ""); err != nil {
			b.Fatal(err)
		}
	}
}
