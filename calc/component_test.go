package calc

import (
	"math"
	"os/exec"
	"strconv"
	"strings"
	"testing"
)

// TestKvFromCvGNUUnits checks the Cv → Kv factor against GNU units (Debian
// package "units"): from the definitions (IEC 60534-1, ANSI/ISA-75.01.01),
// (Kv/Cv)² = (gal/min)²/psi in (m³/h)²/bar. GNU units 2.2x prints
// 0.748186344414461 for `units -t -d 15 '(gallon/min)^2/psi' '(m^3/hr)^2/bar'`;
// the test runs it when installed and uses that printed figure otherwise.
func TestKvFromCvGNUUnits(t *testing.T) {
	want := 0.748186344414461 // GNU units, as printed above
	if path, err := exec.LookPath("units"); err == nil {
		out, err := exec.Command(path, "-t", "-d", "15", "(gallon/min)^2/psi", "(m^3/hr)^2/bar").Output()
		if err != nil {
			t.Fatal(err)
		}
		if want, err = strconv.ParseFloat(strings.TrimSpace(string(out)), 64); err != nil {
			t.Fatal(err)
		}
	}
	got := KvFromCv(1)
	if math.Abs(got*got-want) > 1e-12*want {
		t.Errorf("Kv of Cv 1 squared = %.15g, GNU units %.15g", got*got, want)
	}
	// Cv = 1.156·Kv, the rounded factor of the trade (common practice).
	if r := 1 / got; math.Abs(r-1.156) > 0.0005 {
		t.Errorf("Cv/Kv = %.6g, want about 1.156", r)
	}
}

// waterAt15 is the density of water at 15 °C and 101.325 kPa, ρ0 of
// IEC 60534-2-1: python3-iapws, IAPWS97(T=288.15, P=0.101325).rho.
const waterAt15 = 999.101114187188

// TestComponentLoss: drops from the definitions of Kv and Cv (IEC
// 60534-1, ANSI/ISA-75.01.01: the flow in m³/h at 1 bar, in US gal/min at
// 1 psi, of water), the relative density against water at 15 °C
// (IEC 60534-2-1) and the square law of a rated drop (Δp ∝ Q², common
// practice for turbulent flow through fixed passages).
func TestComponentLoss(t *testing.T) {
	const m3h = 1.0 / 3600
	gpm := 231 * 0.0254 * 0.0254 * 0.0254 / 60      // NIST SP 811: gal (US) = 231 in³ exactly
	psi := 0.45359237 * 9.80665 / (0.0254 * 0.0254) // NIST SP 811: lbf/in²
	tests := []struct {
		name   string
		c      Component
		rho, q float64
		wantDp float64 // Pa
	}{
		{"Kv 10 at 10 m³/h of water at 15 °C: 1 bar", Component{Name: "v", Kind: ComponentValve, Kv: 10}, waterAt15, 10 * m3h, 1e5},
		{"Kv 10 at 5 m³/h: a quarter bar", Component{Name: "v", Kind: ComponentValve, Kv: 10}, waterAt15, 5 * m3h, 0.25e5},
		{"Kv 10, a liquid 1.04 times as dense", Component{Name: "v", Kind: ComponentValve, Kv: 10}, 1.04 * waterAt15, 10 * m3h, 1.04e5},
		// not 1 bar: 1000 kg/m³ is 1.0009 times water at 15 °C
		{"Kv 10 at 10 m³/h of 1000 kg/m³", Component{Name: "v", Kind: ComponentValve, Kv: 10}, 1000, 10 * m3h, 1e5 * 1000 / waterAt15},
		{"Cv 1 at 1 gpm of water: 1 psi", Component{Name: "v", Kind: ComponentValve, Kv: KvFromCv(1)}, waterAt15, gpm, psi},
		{"Cv 46 at 190 gpm", Component{Name: "v", Kind: ComponentValve, Kv: KvFromCv(46)}, waterAt15, 190 * gpm, (190.0 / 46) * (190.0 / 46) * psi},
		{"45 kPa at 12 L/s, at 6 L/s", Component{Name: "chiller", RatedDrop: 45e3, RatedFlow: 0.012}, 1030, 0.006, 11.25e3},
		{"45 kPa at 12 L/s, at 18 L/s", Component{Name: "chiller", RatedDrop: 45e3, RatedFlow: 0.012}, 1030, 0.018, 101.25e3},
		{"3 m at 10 L/s, at 5 L/s, as a head", Component{Name: "coil", RatedHead: 3, RatedFlow: 0.01}, 1000, 0.005, 0.75 * 1000 * StandardGravity},
		{"no flow", Component{Name: "coil", RatedHead: 3, RatedFlow: 0.01}, 1000, 0, 0},
	}
	for _, tt := range tests {
		l, err := tt.c.Loss(tt.rho, tt.q)
		if err != nil {
			t.Errorf("%s: %v", tt.name, err)
			continue
		}
		// 1e-9: ρ0 is IF97 in Go and in python3-iapws, printed to 15 digits
		if math.Abs(l.Pressure-tt.wantDp) > 1e-9*math.Max(tt.wantDp, 1) {
			t.Errorf("%s: Δp %.15g, want %.15g", tt.name, l.Pressure, tt.wantDp)
		}
		if h := l.Pressure / (tt.rho * StandardGravity); math.Abs(l.Head-h) > 1e-12*math.Max(h, 1) || l.Name != tt.c.Name {
			t.Errorf("%s: head %v, want %v (name %q)", tt.name, l.Head, h, l.Name)
		}
	}
}

// TestComponentBadInput: each bad component is an error naming "cmp" and
// the component, never a loss.
func TestComponentBadInput(t *testing.T) {
	tests := []struct {
		name   string
		c      Component
		kind   Kind
		reason Reason
	}{
		{"a Cv of 0", Component{Name: "valve", Kind: ComponentValve}, NotPositive, ReasonValveCoefficient},
		{"a negative Kv", Component{Name: "valve", Kind: ComponentValve, Kv: -3}, NotPositive, ReasonValveCoefficient},
		{"a Kv beyond any valve", Component{Name: "valve", Kind: ComponentValve, Kv: 2e9}, AboveLimit, ReasonValveCoefficient},
		{"a negative rated drop", Component{Name: "coil", RatedDrop: -5e3, RatedFlow: 0.01}, Negative, ReasonComponentDrop},
		{"a negative rated head", Component{Name: "coil", RatedHead: -1, RatedFlow: 0.01}, Negative, ReasonComponentDrop},
		{"a rated flow of 0", Component{Name: "coil", RatedDrop: 5e3}, NotPositive, ReasonComponentFlow},
		{"a NaN drop", Component{Name: "coil", RatedDrop: math.NaN(), RatedFlow: 0.01}, Negative, ReasonComponentDrop},
		{"both a pressure and a head", Component{Name: "coil", RatedDrop: 5e3, RatedHead: 1, RatedFlow: 0.01}, Inconsistent, ReasonComponentDropBoth},
		{"no kind", Component{Name: "pump", Kind: 9}, UnknownChoice, ReasonComponentKind},
	}
	for _, tt := range tests {
		_, err := tt.c.Loss(1000, 0.01)
		fe, ok := err.(*FieldError)
		if !ok || fe.Field != "cmp" || fe.Kind != tt.kind || fe.Reason != tt.reason || fe.Input != tt.c.Name {
			t.Errorf("%s: %v, want cmp %v (%v) naming %q", tt.name, err, tt.kind, tt.reason, tt.c.Name)
		}
	}
	// the value given is kept, in SI with its dimension
	_, err := Component{Name: "coil", RatedDrop: -5e3, RatedFlow: 0.01}.Loss(1000, 0.01)
	if fe, ok := err.(*FieldError); !ok || fe.Value == nil || *fe.Value != Fig(-5e3, Pressure) {
		t.Errorf("a negative rated drop: %v, want the value -5 kPa kept", err)
	}
	if _, err := (Component{Name: "coil", RatedDrop: 5e3, RatedFlow: 0.01}).Loss(0, 0.01); err == nil || err.(*FieldError).Field != "rho" || err.(*FieldError).Kind != NotPositive {
		t.Errorf("a density of 0: %v, want rho not positive", err)
	}
}

// TestLineComponents: a segment's components add to its loss, the line's
// total and the budget by name, and lower the grade line at its end.
func TestLineComponents(t *testing.T) {
	seg := Segment{Run: Run{Length: 100, Diameter: 0.1, Roughness: 5e-5}, EndZ: 0}
	plain := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325},
		Line: &Line{Segments: []Segment{seg}}, Q: 0.012, Unknown: SolvePumpHead}
	seg.Components = []Component{{Name: "chiller", RatedDrop: 45e3, RatedFlow: 0.012}, {Name: "valve", Kind: ComponentValve, Kv: 43.2}}
	with := plain
	with.Line = &Line{Segments: []Segment{seg}}
	r0, err := plain.Solve()
	if err != nil {
		t.Fatal(err)
	}
	r1, err := with.Solve()
	if err != nil {
		t.Fatal(err)
	}
	// 45 kPa at its rated flow; the valve passes 43.2 m³/h of water at
	// 15 °C at 1 bar, so 12 L/s (43.2 m³/h) drops 1 bar times the relative
	// density (the Kv definition, IEC 60534-2-1).
	wantH := (45e3 + 1e5*testLiquid.Density/waterAt15) / (testLiquid.Density * StandardGravity)
	if d := r1.PumpHead - r0.PumpHead; math.Abs(d-wantH) > 1e-9 || math.Abs(r1.Line.ComponentLoss-wantH) > 1e-9 {
		t.Errorf("components add %v (line %v), want %v", d, r1.Line.ComponentLoss, wantH)
	}
	var names []string
	var sum float64
	for _, it := range r1.Budget {
		if strings.HasPrefix(it.Key, "cmp") {
			names = append(names, it.Label)
		}
		sum += float64(it.Side) * it.Head
	}
	if strings.Join(names, "|") != "chiller (segment 1)|valve (segment 1)" || math.Abs(sum) > 1e-9 {
		t.Errorf("budget components %v, balance of the budget %v", names, sum)
	}
	if last := r1.Profile[len(r1.Profile)-1]; math.Abs(last.EGL-r1.Out.TotalHead) > 1e-9 {
		t.Errorf("profile ends at EGL %v, point 2 at %v", last.EGL, r1.Out.TotalHead)
	}
}
