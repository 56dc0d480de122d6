package calc

import (
	"errors"
	"math"
	"testing"
)

// FuzzParse checks that Parse never panics, that every error is a
// *FieldError naming the field, and that every accepted value is finite
// and survives formatting and parsing again.
func FuzzParse(f *testing.F) {
	for _, s := range []string{
		"250 kPa", "-18kPa", "12,5 psi", "3.2m", "40 ft", "15 L/s", "240 gpm",
		"0.5 m³/h", "18 °C", "64 F", "1.0 mPa·s", "45 µm", "30 psig", "430 kPa(g)",
		"", "NaN", "Inf", "1e999", "1,250 m", "1.2.3", "-", "°", "e5", "5e", "5e+",
		"\xff kPa", "1e308 psi", "-300 °C", "10 mH2O", "75 %",
	} {
		f.Add(s, int(Pressure))
		f.Add(s, int(Length))
	}
	f.Fuzz(func(t *testing.T, text string, d int) {
		dim := Dimension(d)
		for _, def := range []string{"", DefaultUnit(dim, false).Symbol} {
			v, err := Parse("fz", text, dim, def)
			if err != nil {
				var fe *FieldError
				if !errors.As(err, &fe) || fe.Field != "fz" || fe.Kind == KindOther {
					t.Fatalf("Parse(%q, %d): %#v is not a *FieldError for \"fz\"", text, d, err)
				}
				continue
			}
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("Parse(%q, %d) = %g without an error", text, d, v)
			}
		}
		pa, _, err := ParsePressure("fz", text, "kPa")
		if err == nil && (math.IsNaN(pa) || math.IsInf(pa, 0)) {
			t.Fatalf("ParsePressure(%q) = %g without an error", text, pa)
		}
		_ = FormatValue(pa, text, d)
	})
}
