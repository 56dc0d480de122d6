package calc

import (
	"errors"
	"math"
	"testing"
)

// glycolAnchors are the viscosities (mPa·s) the Vogel rows of glycol.go are
// drawn through: recalled handbook-level values for mixes by mass (from
// memory; no published table could be reached to check them). The test
// only shows that the stored constants reproduce them.
var glycolAnchors = []struct {
	g   Glycol
	w   float64
	pts [3][2]float64 // °C, mPa·s
}{
	{EthyleneGlycol, 0.1, [3][2]float64{{0, 2.2}, {20, 1.26}, {80, 0.42}}},
	{EthyleneGlycol, 0.2, [3][2]float64{{-5, 3.3}, {20, 1.60}, {80, 0.51}}},
	{EthyleneGlycol, 0.3, [3][2]float64{{-10, 5.5}, {20, 2.05}, {80, 0.62}}},
	{EthyleneGlycol, 0.4, [3][2]float64{{-20, 10.5}, {20, 2.75}, {80, 0.78}}},
	{EthyleneGlycol, 0.5, [3][2]float64{{-30, 23}, {20, 3.85}, {80, 1.00}}},
	{EthyleneGlycol, 0.6, [3][2]float64{{-40, 60}, {20, 5.3}, {80, 1.30}}},
	{PropyleneGlycol, 0.1, [3][2]float64{{0, 2.6}, {20, 1.45}, {80, 0.46}}},
	{PropyleneGlycol, 0.2, [3][2]float64{{-5, 4.6}, {20, 1.95}, {80, 0.58}}},
	{PropyleneGlycol, 0.3, [3][2]float64{{-10, 9.0}, {20, 2.75}, {80, 0.75}}},
	{PropyleneGlycol, 0.4, [3][2]float64{{-20, 28}, {20, 4.0}, {80, 1.0}}},
	{PropyleneGlycol, 0.5, [3][2]float64{{-30, 110}, {20, 6.0}, {80, 1.35}}},
	{PropyleneGlycol, 0.6, [3][2]float64{{-40, 550}, {20, 9.5}, {80, 1.85}}},
}

func TestGlycolViscosityRows(t *testing.T) {
	for _, a := range glycolAnchors {
		for _, p := range a.pts {
			f, err := GlycolMix(a.g, a.w, 273.15+p[0], 101325)
			if err != nil {
				if p[0] >= -20 || a.w < 0.5 {
					t.Errorf("%v %v at %v °C: %v", a.g, a.w, p[0], err)
				}
				// an anchor below the mix's own freezing point only shapes the curve
				continue
			}
			if got := f.Viscosity * 1e3; math.Abs(got/p[1]-1) > 0.002 {
				t.Errorf("%v %v at %v °C: μ = %.4g mPa·s, the row is drawn through %v (from memory)", a.g, a.w, p[0], got, p[1])
			}
		}
	}
}

// Recalled densities (from memory): the 50 % mixes at 20 °C fix the excess
// volume; the 30 % mixes are a second recalled point.
func TestGlycolDensityRecalled(t *testing.T) {
	for _, c := range []struct {
		g          Glycol
		w, tC, rho float64
		tol        float64
	}{
		{EthyleneGlycol, 0.5, 20, 1065, 0.0005},
		{PropyleneGlycol, 0.5, 20, 1038, 0.0005},
		{EthyleneGlycol, 0.3, 20, 1039, 0.005},
		{PropyleneGlycol, 0.3, 20, 1026, 0.005},
	} {
		f, err := GlycolMix(c.g, c.w, 273.15+c.tC, 101325)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(f.Density/c.rho-1) > c.tol {
			t.Errorf("%v %v at %v °C: ρ = %.2f, recalled %v (from memory)", c.g, c.w, c.tC, f.Density, c.rho)
		}
	}
}

// At w = 0 the mix is water: IF97 density and saturation pressure, IAPWS
// 2008 viscosity, as Water (itself checked against python3-iapws).
func TestGlycolWaterLimit(t *testing.T) {
	for _, g := range []Glycol{EthyleneGlycol, PropyleneGlycol} {
		for _, tC := range []float64{0, 5, 20, 60, 99} {
			w, err := Water(273.15+tC, 2e5)
			if err != nil {
				t.Fatal(err)
			}
			m, err := GlycolMix(g, 0, 273.15+tC, 2e5)
			if err != nil {
				t.Fatal(err)
			}
			if m.Density != w.Density || m.Viscosity != w.Viscosity || m.VapourPressure != w.VapourPressure {
				t.Errorf("%v at 0 %% and %v °C: %+v, water %+v", g, tC, m, w)
			}
		}
	}
}

// Properties move the way every published table of these mixes does:
// density and viscosity rise with the glycol share, viscosity falls with
// temperature, the freezing point falls with the share, with no jump at
// the 10 % rows; nothing is NaN.
func TestGlycolShape(t *testing.T) {
	for _, g := range []Glycol{EthyleneGlycol, PropyleneGlycol} {
		prevTf := 274.0
		for i := 0; i <= 120; i++ {
			w := float64(i) * 0.005
			tf, err := GlycolFreezingPoint(g, w)
			if err != nil || !(tf < prevTf) && i > 0 {
				t.Fatalf("%v w %v: freezing %v after %v (%v)", g, w, tf, prevTf, err)
			}
			prevTf = tf
			var prev Fluid
			for tK := math.Ceil(tf); tK <= 373; tK += 1 {
				f, err := GlycolMix(g, w, tK, 101325)
				if err != nil {
					t.Fatalf("%v w %v at %v K: %v", g, w, tK, err)
				}
				if math.IsNaN(f.Density+f.Viscosity+f.VapourPressure) || f.Density < 900 || f.Density > 1130 {
					t.Fatalf("%v w %v at %v K: %+v", g, w, tK, f)
				}
				if prev.Viscosity != 0 && !(f.Viscosity < prev.Viscosity) {
					t.Errorf("%v w %v: viscosity does not fall with temperature at %v K", g, w, tK)
				}
				if w >= 0.01 {
					lo, err := GlycolMix(g, w-0.005, tK, 101325)
					if err != nil {
						continue // the weaker mix is frozen here
					}
					if !(f.Viscosity > lo.Viscosity) || !(f.Density > lo.Density) || !(f.VapourPressure < lo.VapourPressure) {
						t.Errorf("%v at %v K: w %v → %v: μ %v → %v, ρ %v → %v", g, tK, w-0.005, w, lo.Viscosity, f.Viscosity, lo.Density, f.Density)
					}
					if r := f.Viscosity / lo.Viscosity; r > 1.15 {
						t.Errorf("%v at %v K: viscosity jumps ×%.3f from w %v to %v", g, tK, r, w-0.005, w)
					}
				}
				prev = f
			}
		}
	}
}

// The mass and volume fractions convert both ways; the volume fraction is
// the glycol's share of the unmixed volumes at 20 °C, so a glycol denser
// than water has a smaller share by volume than by mass.
func TestGlycolFractions(t *testing.T) {
	for _, g := range []Glycol{EthyleneGlycol, PropyleneGlycol} {
		for _, w := range []float64{0, 0.05, 0.2, 0.3, 0.45, 0.6} {
			phi, err := GlycolVolumeFraction(g, w)
			if err != nil {
				t.Fatal(err)
			}
			back, err := GlycolMassFraction(g, phi)
			if err != nil || math.Abs(back-w) > 1e-12 {
				t.Errorf("%v: w %v → φ %v → w %v (%v)", g, w, phi, back, err)
			}
			d := glycols[g]
			want := (w / d.rho20) / (w/d.rho20 + (1-w)/998.2061)
			if math.Abs(phi-want) > 1e-6 || (w > 0 && !(phi < w)) {
				t.Errorf("%v: w %v → φ %v, want %v", g, w, phi, want)
			}
		}
	}
}

func TestGlycolErrors(t *testing.T) {
	for _, c := range []struct {
		name  string
		err   error
		field string
	}{
		{"share above 60 %", glycolErr(GlycolMix(PropyleneGlycol, 0.61, 280, 101325)), "w"},
		{"negative share", glycolErr(GlycolMix(EthyleneGlycol, -0.1, 280, 101325)), "w"},
		{"NaN share", glycolErr(GlycolMix(EthyleneGlycol, math.NaN(), 280, 101325)), "w"},
		{"below freezing", glycolErr(GlycolMix(PropyleneGlycol, 0.3, 273.15-13, 101325)), "t"},
		{"above 100 °C", glycolErr(GlycolMix(PropyleneGlycol, 0.3, 380, 2e5)), "t"},
		{"NaN temperature", glycolErr(GlycolMix(PropyleneGlycol, 0.3, math.NaN(), 2e5)), "t"},
		{"boiling", glycolErr(GlycolMix(EthyleneGlycol, 0.3, 363.15, 5e4)), "p"},
		{"pressure above 10 MPa", glycolErr(GlycolMix(EthyleneGlycol, 0.3, 300, 2e7)), "p"},
		{"no glycol", glycolErr(GlycolMix(0, 0.3, 300, 2e5)), "glycol"},
		{"volume share too high", func() error { _, err := GlycolMassFraction(EthyleneGlycol, 0.58); return err }(), "phi"},
		{"freezing share too high", func() error { _, err := GlycolFreezingPoint(EthyleneGlycol, 0.7); return err }(), "w"},
	} {
		var fe *FieldError
		if !errors.As(c.err, &fe) || fe.Field != c.field {
			t.Errorf("%s: %v, want a FieldError on %q", c.name, c.err, c.field)
		}
	}
	// the message for a mix below its freezing point quotes it
	err := glycolErr(GlycolMix(PropyleneGlycol, 0.3, 273.15-13, 101325))
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Kind != BelowLimit || fe.Reason != ReasonGlycolFreezes || fe.Input != "propylene glycol" ||
		fe.Value == nil || fe.Min == nil || math.Abs(fe.Min.Value-(273.15-12.70)) > 0.005 || len(fe.Figures) != 1 || fe.Figures[0] != Num(0.3) {
		t.Errorf("below its freezing point: %v, want the freezing point -12.70 °C and the share 30 %%", err)
	}
}

func glycolErr(_ Fluid, err error) error { return err }

func BenchmarkGlycolMix(b *testing.B) {
	for i := 0; i < b.N; i++ {
		if _, err := GlycolMix(PropyleneGlycol, 0.3, 280.15, 101325); err != nil {
			b.Fatal(err)
		}
	}
}
