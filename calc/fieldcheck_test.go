package calc

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// fcReadings are gauge readings on a running pump (invented inputs).
var fcReadings = FieldReadings{Ps: -18e3, Pd: 430e3, Zs: 0, Zd: 0.8, Ds: 0.2027, Dd: 0.1541, Q: 0.041, PowerIn: 31e3}

// TestCheckPumpAgainstBalance: the pump head from readings is the head a
// pump must add between the two gauge points of the energy equation (head
// form) with α = 1 and no loss between the gauges, computed here by
// Balance.Solve, an independent path.
func TestCheckPumpAgainstBalance(t *testing.T) {
	const site = 98.8e3
	r := fcReadings
	fc, err := CheckPump(testLiquid, r, nil)
	if err != nil {
		t.Fatal(err)
	}
	b := Balance{Fluid: testLiquid, SitePressure: site, Alpha: AlphaUnity,
		In:  Point{P: site + r.Ps, Z: r.Zs, D: r.Ds},
		Out: Point{P: site + r.Pd, Z: r.Zd, D: r.Dd}, Q: r.Q}
	br, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(fc.Head-br.Value) > 1e-12*br.Value {
		t.Errorf("head %.15g, balance %.15g", fc.Head, br.Value)
	}
	if math.Abs(fc.HydraulicPower-br.PumpPower) > 1e-9*br.PumpPower {
		t.Errorf("hydraulic power %.15g, balance %.15g", fc.HydraulicPower, br.PumpPower)
	}
	if fc.Efficiency != fc.HydraulicPower/r.PowerIn {
		t.Errorf("efficiency %g is not hydraulic/electrical", fc.Efficiency)
	}
}

// TestCheckPumpBarColumn: 100 kPa across a pump with level gauges and
// equal pipes is about 10.2 m of water (1 bar ≈ 10.2 m of water, common
// practice).
func TestCheckPumpBarColumn(t *testing.T) {
	fc, err := CheckPump(testLiquid, FieldReadings{Ps: 0, Pd: 100e3, Ds: 0.1, Dd: 0.1, Q: 0.01}, nil)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(fc.Head-10.2) > 0.01 || fc.VelocityHead != 0 || fc.Efficiency != 0 {
		t.Errorf("head %g m (velocity term %g, η %g), want about 10.2 m", fc.Head, fc.VelocityHead, fc.Efficiency)
	}
}

// TestCheckPumpCurve: a reading on the curve deviates by nothing; one 5 %
// high by 5 % (definition of the deviation); beyond the sheet there is a
// warning and no comparison.
func TestCheckPumpCurve(t *testing.T) {
	c, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	h, _ := c.Head(0.025)
	rhog := testLiquid.Density * StandardGravity
	r := FieldReadings{Ps: 0, Pd: h * rhog, Ds: 0.1, Dd: 0.1, Q: 0.025}
	fc, err := CheckPump(testLiquid, r, &c)
	if err != nil {
		t.Fatal(err)
	}
	if !fc.HasCurve || math.Abs(fc.Deviation) > 1e-12 || math.Abs(fc.CurveHead-h) > 0 || fc.CurveEfficiency == 0 {
		t.Errorf("on the curve: %+v", fc)
	}
	r.Pd = 1.05 * h * rhog
	fc, _ = CheckPump(testLiquid, r, &c)
	if math.Abs(fc.DeviationPct-5) > 1e-9 {
		t.Errorf("5 %% high: deviation %g %%", fc.DeviationPct)
	}
	r.Q = 0.05
	fc, _ = CheckPump(testLiquid, r, &c)
	if fc.HasCurve || !fcHas(fc.Warnings, "qm", "flow off sheet") {
		t.Errorf("beyond the sheet: %+v", fc)
	}
}

// fcHas reports whether a warning for field contains sub.
func fcHas(ws []Warning, field, sub string) bool {
	for _, w := range ws {
		if w.Field == field && strings.Contains(w.String(), sub) {
			return true
		}
	}
	return false
}

// TestCheckPumpWarnings: an efficiency above 100 % cannot be right; one
// below 30 % deserves a look (CheckPump's documented thresholds).
func TestCheckPumpWarnings(t *testing.T) {
	r := FieldReadings{Ps: 0, Pd: 300e3, Ds: 0.1, Dd: 0.1, Q: 0.02}
	hyd := r.Q * r.Pd // ρgQH with H = Δp/(ρg)
	for _, tc := range []struct {
		pin  float64
		want string
	}{{0.9 * hyd, "wire above 100 f0=1.111"}, {hyd / 0.2, "wire low f0=0.2000 f1=0.3000"}} {
		r.PowerIn = tc.pin
		fc, err := CheckPump(testLiquid, r, nil)
		if err != nil {
			t.Fatal(err)
		}
		if !fcHas(fc.Warnings, "pin", tc.want) {
			t.Errorf("input %g W: warnings %+v, want %q", tc.pin, fc.Warnings, tc.want)
		}
	}
	r.PowerIn = hyd / 0.65
	if fc, _ := CheckPump(testLiquid, r, nil); len(fc.Warnings) != 0 || math.Abs(fc.Efficiency-0.65) > 1e-12 {
		t.Errorf("65 %%: %+v", fc)
	}
	r.Pd, r.Ps = 0, 200e3
	if fc, _ := CheckPump(testLiquid, r, nil); !fcHas(fc.Warnings, "pd", "head not positive") {
		t.Errorf("negative head: %+v", fc.Warnings)
	}
}

// TestCheckPumpErrors: every bad reading names its field.
func TestCheckPumpErrors(t *testing.T) {
	tests := []struct {
		field string
		mod   func(*FieldReadings)
	}{
		{"ps", func(r *FieldReadings) { r.Ps = math.NaN() }},
		{"ps", func(r *FieldReadings) { r.Ps = -150e3 }},
		{"pd", func(r *FieldReadings) { r.Pd = math.Inf(1) }},
		{"zs", func(r *FieldReadings) { r.Zs = math.NaN() }},
		{"zd", func(r *FieldReadings) { r.Zd = math.Inf(-1) }},
		{"ds", func(r *FieldReadings) { r.Ds = 0 }},
		{"dd", func(r *FieldReadings) { r.Dd = -0.1 }},
		{"qm", func(r *FieldReadings) { r.Q = 0 }},
		{"pin", func(r *FieldReadings) { r.PowerIn = -1 }},
	}
	for _, tc := range tests {
		r := fcReadings
		tc.mod(&r)
		_, err := CheckPump(testLiquid, r, nil)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != tc.field {
			t.Errorf("%s: got %v", tc.field, err)
		}
	}
	var fe *FieldError
	if _, err := CheckPump(Fluid{}, fcReadings, nil); !errors.As(err, &fe) || fe.Field != "rho" {
		t.Errorf("no density: %v", err)
	}
}
