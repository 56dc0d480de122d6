package calc

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// TestNPSHAgainstBalance: NPSH available is the absolute total head at the
// pump inlet above the vapour pressure, (p_inlet − p_v)/(ρg) + V²/(2g),
// with the inlet found independently by Balance.Solve (energy equation from
// the source surface through the suction pipe, α = 1).
func TestNPSHAgainstBalance(t *testing.T) {
	const site = 96e3
	suction := Run{Length: 8, Diameter: 0.15, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "entry_sharp", Count: 1}, {Key: "elbow90", Count: 1}}}
	for _, q := range []float64{0.005, 0.02, 0.04} {
		b := Balance{Fluid: testLiquid, SitePressure: site, Alpha: AlphaUnity,
			In: Point{P: site, Z: 100}, Out: Point{Z: 103.2, D: 0.15}, Q: q, Run: &suction, Unknown: SolveP2}
		br, err := b.Solve()
		if err != nil {
			t.Fatal(err)
		}
		want := (br.Value-testLiquid.VapourPressure)/(testLiquid.Density*StandardGravity) + br.Out.VelocityHead
		r, err := NPSH(testLiquid, NPSHInput{SurfacePressure: site, SurfaceZ: 100, PumpZ: 103.2, SuctionLoss: br.FrictionHead})
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(r.Available-want) > 1e-12*want || r.Level != NPSHUnrated || r.Margin != r.Available {
			t.Errorf("q %g: NPSHa %.15g, via the balance %.15g (%v)", q, r.Available, want, r.Level)
		}
	}
}

// TestNPSHBarColumn: cold water under a full standard atmosphere, pump
// level with the surface, no losses: NPSHa is about 10.1 m (1 bar ≈ 10.2 m
// of water, common practice; 101.325 kPa less about 2 kPa of vapour
// pressure at 18 °C, IF97 via Water).
func TestNPSHBarColumn(t *testing.T) {
	w, err := Water(291.15, 101325)
	if err != nil {
		t.Fatal(err)
	}
	r, err := NPSH(w, NPSHInput{SurfacePressure: 101325})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Available-10.1) > 0.05 {
		t.Errorf("NPSHa %g m, want about 10.1 m", r.Available)
	}
}

// TestNPSHLevels: the grading documented on NPSH: danger below NPSHr,
// caution below a ratio of 1.1 (ANSI/HI 9.6.1's low end, from memory) or a
// margin of 0.6 m (common practice, from memory), otherwise ok. NPSHa is
// set to 10 m (ρg = 10 kPa/m: 100 kPa surface, no vapour pressure).
func TestNPSHLevels(t *testing.T) {
	fl := Fluid{Density: 10e3 / StandardGravity}
	tests := []struct {
		npshr float64
		lvl   NPSHLevel
		note  string
	}{
		{12, NPSHDanger, "npsh below"},
		{10.01, NPSHDanger, "npsh below"},
		{9.2, NPSHCaution, "npsh low margin"}, // ratio 1.087 < 1.1
		{9.05, NPSHOK, "npsh margin"},         // ratio 1.105 ≥ 1.1, margin 0.95 m ≥ 0.6 m
		{5, NPSHOK, "npsh margin"},
		{0, NPSHUnrated, "npsh unrated"},
	}
	for _, tc := range tests {
		r, err := NPSH(fl, NPSHInput{SurfacePressure: 100e3, NPSHr: tc.npshr})
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(r.Available-10) > 1e-12 || r.Level != tc.lvl || !strings.Contains(r.Note.String(), tc.note) {
			t.Errorf("NPSHr %g: NPSHa %g, %v, note %q; want %v, %q", tc.npshr, r.Available, r.Level, r.Note.String(), tc.lvl, tc.note)
		}
	}
	// A small pump with a low NPSHr: the ratio is large but the margin
	// below 0.6 m → caution.
	r, _ := NPSH(fl, NPSHInput{SurfacePressure: 100e3, SurfaceZ: 0, PumpZ: 8.6, NPSHr: 1})
	if r.Level != NPSHCaution || math.Abs(r.Ratio-1.4) > 1e-12 || math.Abs(r.Margin-0.4) > 1e-12 {
		t.Errorf("small margin: %+v", r)
	}
	// A suction lift beyond the barometric column: nothing available.
	r, _ = NPSH(fl, NPSHInput{SurfacePressure: 100e3, PumpZ: 11})
	if r.Level != NPSHDanger {
		t.Errorf("lift 11 m: %+v", r)
	}
	for l, s := range map[NPSHLevel]string{NPSHOK: "ok", NPSHCaution: "caution", NPSHDanger: "danger", NPSHUnrated: "no NPSHr", 9: "unknown"} {
		if l.String() != s {
			t.Errorf("%d.String() = %q, want %q", int(l), l.String(), s)
		}
	}
}

// TestNPSHErrors: bad inputs name their field.
func TestNPSHErrors(t *testing.T) {
	ok := NPSHInput{SurfacePressure: 100e3, SurfaceZ: 1, PumpZ: 2, SuctionLoss: 0.5, NPSHr: 3}
	tests := []struct {
		field string
		fl    Fluid
		mod   func(*NPSHInput)
	}{
		{"rho", Fluid{}, func(*NPSHInput) {}},
		{"pv", Fluid{Density: 1000, VapourPressure: -1}, func(*NPSHInput) {}},
		{"p1", testLiquid, func(in *NPSHInput) { in.SurfacePressure = 0 }},
		{"z1", testLiquid, func(in *NPSHInput) { in.SurfaceZ = math.NaN() }},
		{"zp", testLiquid, func(in *NPSHInput) { in.PumpZ = math.Inf(1) }},
		{"hs", testLiquid, func(in *NPSHInput) { in.SuctionLoss = -0.1 }},
		{"npshr", testLiquid, func(in *NPSHInput) { in.NPSHr = -1 }},
	}
	for _, tc := range tests {
		in := ok
		tc.mod(&in)
		_, err := NPSH(tc.fl, in)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != tc.field {
			t.Errorf("%s: got %v", tc.field, err)
		}
	}
}

// TestSuctionLoss: the suction loss of a balance is the loss of the
// segments before the pump (LossThrough), nothing for a pump at point 1,
// and an error without a line.
func TestSuctionLoss(t *testing.T) {
	cases, order := lnLoadRefs(t)
	c := cases[order[0]]
	b := Balance{Fluid: c.fl, Line: &c.line, PumpAfter: 2}
	got, err := SuctionLoss(b, c.q)
	if err != nil {
		t.Fatal(err)
	}
	lr, _ := c.line.Evaluate(c.fl, c.q)
	if got != lr.LossThrough(2) {
		t.Errorf("suction loss %g, want %g", got, lr.LossThrough(2))
	}
	b.PumpAfter = 0
	if got, err := SuctionLoss(b, c.q); err != nil || got != 0 {
		t.Errorf("pump at point 1: %g, %v", got, err)
	}
	var fe *FieldError
	b.PumpAfter = 9
	if _, err := SuctionLoss(b, c.q); !errors.As(err, &fe) || fe.Field != "pafter" {
		t.Errorf("pump after 9: %v", err)
	}
	b.Line = nil
	if _, err := SuctionLoss(b, c.q); !errors.As(err, &fe) || fe.Field != "pafter" {
		t.Errorf("no line: %v", err)
	}
}
