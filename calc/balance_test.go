package calc

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"
)

// testLiquid is a round-number liquid so that closed forms are exact.
var testLiquid = Fluid{Name: "test liquid", Density: 1000, Viscosity: 1e-3, VapourPressure: 2000}

func TestBrent(t *testing.T) {
	tests := []struct {
		name string
		f    func(float64) float64
		a, b float64
		want float64
		src  string
	}{
		// The fixed point of cos, 0.739085133215160641655312087673873404…
		// (python3-mpmath: findroot(lambda x: cos(x)-x, 0.7) at 40 digits).
		{"cos x = x", func(x float64) float64 { return math.Cos(x) - x }, 0, 1, 0.7390851332151607, "python3-mpmath"},
		// √2 = 1.41421356237309504880… (python3-mpmath sqrt(2)).
		{"x² = 2", func(x float64) float64 { return x*x - 2 }, 0, 2, math.Sqrt2, "python3-mpmath"},
		// A step: Brent lands on the jump at 0.5 (by construction).
		{"step", func(x float64) float64 {
			if x < 0.5 {
				return -1
			}
			return 1
		}, 0, 1, 0.5, "construction"},
	}
	for _, tc := range tests {
		got, err := brent(tc.f, tc.a, tc.b, 1e-15)
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		if math.Abs(got-tc.want) > 1e-14 {
			t.Errorf("%s: root %.17g, want %.17g (%s)", tc.name, got, tc.want, tc.src)
		}
	}
	if _, err := brent(func(x float64) float64 { return x*x + 1 }, -1, 1, 1e-12); !errors.Is(err, errNoBracket) {
		t.Errorf("no root: got %v, want errNoBracket", err)
	}
	// A tolerance no interval can meet (below zero) runs out the iteration
	// limit: an error, not the last iterate (by construction).
	if x, err := brent(func(x float64) float64 { return x*x - 2 }, 0, 2, -1); !errors.Is(err, errNoConvergence) {
		t.Errorf("unreachable tolerance: got %v, %v; want errNoConvergence", x, err)
	}
}

// TestBalanceTorricelli: an open tank emptying through a short nozzle,
// no losses: V = √(2gh) (Torricelli's law).
func TestBalanceTorricelli(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In:      Point{P: 101325, Z: 5},
		Out:     Point{P: 101325, Z: 0, D: 0.02},
		Unknown: SolveFlow}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	want := math.Pi / 4 * 0.02 * 0.02 * math.Sqrt(2*StandardGravity*5)
	if math.Abs(r.Value-want) > 1e-12*want {
		t.Errorf("q = %.15g, want %.15g (Torricelli's law)", r.Value, want)
	}
}

// TestBalanceRoundTrip: solving for each unknown in turn, with the others
// set from one consistent state, gives that state back. This is a property
// of the equation, not a reference value; the reference checks are the
// case files in testdata/cases.
func TestBalanceRoundTrip(t *testing.T) {
	run := &Run{Length: 300, Diameter: 0.1, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "elbow90", Count: 4}}}
	base := Balance{Fluid: testLiquid, SitePressure: 100e3,
		In:  Point{P: 150e3, Z: 20, D: 0.1},
		Out: Point{P: 300e3, Z: 35, D: 0.08},
		Q:   0.012, TurbineHead: 0, Run: run, Unknown: SolvePumpHead}
	r0, err := base.Solve()
	if err != nil {
		t.Fatal(err)
	}
	base.PumpHead = r0.Value
	for _, u := range []Unknown{SolveP1, SolveP2, SolveZ1, SolveZ2, SolveFlow} {
		b := base
		b.Unknown = u
		r, err := b.Solve()
		if err != nil {
			t.Fatalf("%v: %v", u, err)
		}
		want := map[Unknown]float64{SolveP1: base.In.P, SolveP2: base.Out.P, SolveZ1: base.In.Z, SolveZ2: base.Out.Z, SolveFlow: base.Q}[u]
		if math.Abs(r.Value-want) > 1e-9*math.Abs(want) {
			t.Errorf("solve %v = %.12g, want %.12g", u, r.Value, want)
		}
	}
	// Without the run, the friction head it gave closes the balance again.
	b := base
	b.Run, b.Unknown = nil, SolveFrictionHead
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Value-r0.FrictionHead) > 1e-9 {
		t.Errorf("hf = %.12g, want %.12g", r.Value, r0.FrictionHead)
	}
}

// TestBalanceBudget: the budget's two sides are equal once solved.
func TestBalanceBudget(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In:  Point{P: 101325, Z: 10},
		Out: Point{P: 301325, Z: 30, D: 0.1},
		Q:   0.02, Run: &Run{Length: 500, Diameter: 0.1, Roughness: 0.1e-3, ExtraK: 2}}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	var sum float64
	for _, it := range r.Budget {
		sum += float64(it.Side) * it.Head
		if math.Abs(it.Pressure-testLiquid.Density*StandardGravity*it.Head) > 1e-9*math.Abs(it.Pressure)+1e-9 {
			t.Errorf("%s: pressure %.6g is not ρgh", it.Key, it.Pressure)
		}
	}
	if math.Abs(sum) > 1e-9 {
		t.Errorf("budget sides differ by %.3g m", sum)
	}
	if math.Abs(r.PumpPower-testLiquid.Density*StandardGravity*0.02*r.Value) > 1e-6 {
		t.Errorf("pump power %.6g is not ρgQh", r.PumpPower)
	}
}

// TestBalanceTransitional: in transitional flow both bounds are reported,
// the design value is the turbulent one, and a warning says so.
func TestBalanceTransitional(t *testing.T) {
	d := 0.01
	q := 3000 * 1e-3 / (1000 * d) * math.Pi * d * d / 4 // Re = 3000
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In: Point{P: 101325}, Out: Point{P: 101325, D: d},
		Q: q, Run: &Run{Length: 20, Diameter: d}}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if !r.Transitional || !(r.ValueLow < r.ValueHigh) {
		t.Fatalf("want a transitional range, got %+v", r)
	}
	if r.Value != r.ValueHigh {
		t.Errorf("design value %.6g should be the turbulent (upper) bound %.6g", r.Value, r.ValueHigh)
	}
	if !hasWarning(r, "transitional") {
		t.Errorf("no transitional warning in %v", r.Warnings)
	}
}

func hasWarning(r BalanceResult, text string) bool {
	for _, w := range r.Warnings {
		if strings.Contains(w.String(), text) {
			return true
		}
	}
	return false
}

func TestBalanceWarnings(t *testing.T) {
	// Point 1 is 12 m above a suction that pulls its pressure below the
	// vapour pressure: the check must fire.
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In:  Point{P: 101325, Z: 0},
		Out: Point{P: 1000, Z: 0},
		Q:   0, Unknown: SolvePumpHead}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if !hasWarning(r, "below vapour pressure") {
		t.Errorf("no vapour-pressure warning: %v", r.Warnings)
	}
	if !hasWarning(r, "pump head negative") {
		t.Errorf("no negative-pump warning: %v", r.Warnings)
	}
}

func TestBalanceErrors(t *testing.T) {
	ok := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325}}
	tests := []struct {
		name  string
		mod   func(*Balance)
		field string
	}{
		{"no density", func(b *Balance) { b.Fluid.Density = 0 }, "rho"},
		{"NaN elevation", func(b *Balance) { b.In.Z = math.NaN() }, "z1"},
		{"infinite head", func(b *Balance) { b.TurbineHead = math.Inf(1) }, "ht"},
		{"negative diameter", func(b *Balance) { b.Out.D = -1 }, "d2"},
		{"negative flow", func(b *Balance) { b.Q = -1 }, "q"},
		{"flow with nothing that depends on it", func(b *Balance) { b.Unknown = SolveFlow }, "q"},
		{"friction unknown with a run", func(b *Balance) {
			b.Run = &Run{Length: 1, Diameter: 0.1}
			b.Unknown = SolveFrictionHead
		}, "solve"},
		{"no solution in range", func(b *Balance) {
			b.In.Z, b.Out.Z = 0, 10
			b.Out.D = 0.1
			b.Unknown = SolveFlow
		}, "q"},
		{"bad unknown", func(b *Balance) { b.Unknown = 42 }, "solve"},
	}
	for _, tc := range tests {
		b := ok
		tc.mod(&b)
		_, err := b.Solve()
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != tc.field {
			t.Errorf("%s: got %v, want a FieldError on %q", tc.name, err, tc.field)
		}
	}
}

func TestParseUnknown(t *testing.T) {
	for i, n := range unknownNames {
		u, err := ParseUnknown(n)
		if err != nil || u != Unknown(i) || u.String() != n {
			t.Errorf("%q: got %v, %v", n, u, err)
		}
	}
	if _, err := ParseUnknown("x"); err == nil {
		t.Error("ParseUnknown(x): want an error")
	}
}

// ExampleBalance_Solve sizes the pump of the invented Alder Flats booster
// station: wet well at 212.0 m to the Crest reservoir at 251.0 m, 45 L/s
// through 640 m of 8-inch schedule 40 steel.
func ExampleBalance_Solve() {
	water, _ := Water(291.15, 98.8e3)
	pipe, _ := LookupPipe("8", "40")
	b := Balance{
		Fluid:        water,
		SitePressure: 98.8e3,
		In:           Point{P: 98.8e3, Z: 212.0}, // wet-well surface, open to the air
		Out:          Point{P: 98.8e3, Z: 251.0}, // reservoir surface
		Q:            0.045,
		Run: &Run{Length: 640, Diameter: pipe.ID, Roughness: 0.045e-3,
			Fittings: []FittingCount{{Key: "entry_sharp", Count: 1}, {Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}},
		Unknown: SolvePumpHead,
	}
	r, err := b.Solve()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("pump head %.1f m, friction %.2f m, hydraulic power %.1f kW\n", r.Value, r.FrictionHead, r.PumpPower/1e3)
	// Output: pump head 44.6 m, friction 5.63 m, hydraulic power 19.7 kW
}

func BenchmarkBalance(b *testing.B) {
	water, _ := Water(291.15, 98.8e3)
	bal := Balance{Fluid: water, SitePressure: 98.8e3,
		In: Point{P: 98.8e3, Z: 212}, Out: Point{P: 98.8e3, Z: 251}, Q: 0.045,
		Run: &Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3,
			Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}}}
	for i := 0; i < b.N; i++ {
		if _, err := bal.Solve(); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkBalanceFlow(b *testing.B) {
	water, _ := Water(291.15, 98.8e3)
	bal := Balance{Fluid: water, SitePressure: 98.8e3,
		In: Point{P: 98.8e3, Z: 251}, Out: Point{P: 98.8e3, Z: 212}, Unknown: SolveFlow,
		Run: &Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3, ExtraK: 1.5}}
	for i := 0; i < b.N; i++ {
		if _, err := bal.Solve(); err != nil {
			b.Fatal(err)
		}
	}
}
