package calc

import (
	"errors"
	"math"
	"math/rand"
	"testing"
)

// lnRandomLine draws a line of 1–20 segments (diameters 50–500 mm, lengths
// up to 500 m, roughness up to 0.5 mm, ΣK up to 5, ends within ±30 m):
// inputs for property tests, not reference values.
func lnRandomLine(rng *rand.Rand) *Line {
	n := 1 + rng.Intn(MaxSegments)
	l := &Line{}
	for i := 0; i < n; i++ {
		l.Segments = append(l.Segments, Segment{
			Run: Run{Length: 500 * rng.Float64(), Diameter: 0.05 + 0.45*rng.Float64(),
				Roughness: 0.5e-3 * rng.Float64(), ExtraK: 5 * rng.Float64()},
			EndZ: 60*rng.Float64() - 30,
		})
	}
	return l
}

// TestSystemCurveReference: the system head of the lines of
// line_system.tsv (python3-mpmath: lift, pressure difference, outlet
// velocity head and every segment loss), within 1e-11 relative.
func TestSystemCurveReference(t *testing.T) {
	cases, _ := lnLoadRefs(t)
	for _, row := range lnReadTSV(t, "line_system.tsv") {
		c := cases[row["case"]+"@"+row["q"]]
		if c == nil {
			t.Fatalf("line_system.tsv case %s@%s not in line.tsv", row["case"], row["q"])
		}
		b := Balance{Fluid: c.fl, SitePressure: 101325,
			In:   Point{P: lnNum(t, row, "p1"), Z: lnNum(t, row, "z1")},
			Out:  Point{P: lnNum(t, row, "p2"), Z: lnNum(t, row, "z2"), D: lnNum(t, row, "d2")},
			Line: &c.line}
		pts, err := SystemCurve(b, []float64{c.q})
		if err != nil {
			t.Fatalf("%s@%s: %v", row["case"], row["q"], err)
		}
		// python3-mpmath system head (line_system.tsv), 1e-11 relative.
		if want := lnNum(t, row, "h_sys"); !lnClose(pts[0].H, want, 1e-11) {
			t.Errorf("%s@%s: H_sys = %.16g, want %.16g (line_system.tsv)", row["case"], row["q"], pts[0].H, want)
		}
		// The same balance solved for the pump head agrees (SystemCurve's
		// definition).
		b.Q = c.q
		r, err := b.Solve()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(r.Value-pts[0].H) > 1e-12*math.Max(1, math.Abs(r.Value)) {
			t.Errorf("%s@%s: Solve hp %.16g, SystemCurve %.16g", row["case"], row["q"], r.Value, pts[0].H)
		}
	}
}

// TestSystemCurveRises: a property of any line whose losses grow with the
// flow (Darcy–Weisbach with f = 64/Re or Colebrook–White, K·V²/(2g)):
// the system curve never falls as the flow rises, and at zero flow it is
// the static head.
func TestSystemCurveRises(t *testing.T) {
	rng := rand.New(rand.NewSource(4))
	for trial := 0; trial < 200; trial++ {
		l := lnRandomLine(rng)
		b := Balance{Fluid: testLiquid, SitePressure: 101325, Alpha: AlphaUnity,
			In:   Point{P: 101325 + 1e5*rng.Float64(), Z: 10 * rng.Float64()},
			Out:  Point{P: 101325 + 1e5*rng.Float64(), Z: 50 * rng.Float64(), D: 0.1 + 0.2*rng.Float64()},
			Line: l}
		pts, err := SystemCurve(b, Flows(0.2*l.minDiameter()*l.minDiameter(), 60))
		if err != nil {
			t.Fatal(err)
		}
		static := b.Out.Z - b.In.Z + (b.Out.P-b.In.P)/(testLiquid.Density*StandardGravity)
		if math.Abs(pts[0].H-static) > 1e-12*(1+math.Abs(static)) {
			t.Errorf("trial %d: H_sys(0) = %.15g, want the static head %.15g", trial, pts[0].H, static)
		}
		for i := 1; i < len(pts); i++ {
			if pts[i].H <= pts[i-1].H {
				t.Fatalf("trial %d: system curve falls or stays level from Q=%g (H %.15g) to Q=%g (H %.15g)", trial, pts[i-1].Q, pts[i-1].H, pts[i].Q, pts[i].H)
			}
		}
	}
}

// TestProfileProperties: properties of the EGL/HGL profile (definitions in
// the energy equation, head form): it starts at point 1's total head; the
// last node's EGL is point 2's total head plus the turbine head; without a
// pump the EGL never rises along the line; with one it rises by exactly
// the pump head at the pump's node; HGL = EGL − α·V²/(2g) of the segment;
// the pressure is (HGL − Z)·ρg + site pressure.
func TestProfileProperties(t *testing.T) {
	rng := rand.New(rand.NewSource(11))
	rhog := testLiquid.Density * StandardGravity
	for trial := 0; trial < 300; trial++ {
		l := lnRandomLine(rng)
		n := len(l.Segments)
		b := Balance{Fluid: testLiquid, SitePressure: 95e3,
			In:   Point{P: 95e3 + 5e5*rng.Float64(), Z: 20 * rng.Float64()},
			Out:  Point{P: 95e3 + 1e5*rng.Float64(), Z: 20 * rng.Float64(), D: 0.1},
			Q:    0.1 * l.minDiameter() * l.minDiameter() * (0.01 + rng.Float64()),
			Line: l, PumpAfter: rng.Intn(n + 1)}
		withPump := trial%2 == 0
		if withPump {
			b.Unknown = SolvePumpHead
			b.TurbineHead = 5 * rng.Float64()
		} else {
			b.Unknown = SolveP2 // no pump head: the line alone
		}
		r, err := b.Solve()
		if err != nil {
			t.Fatalf("trial %d: %v", trial, err)
		}
		p := r.Profile
		if len(p) < 2*n+1 {
			t.Fatalf("trial %d: %d nodes for %d segments", trial, len(p), n)
		}
		if p[0].EGL != r.In.TotalHead || p[0].Distance != 0 || p[0].Pressure != r.In.P {
			t.Errorf("trial %d: first node %+v, point 1 total head %g", trial, p[0], r.In.TotalHead)
		}
		last := p[len(p)-1]
		if want := r.Out.TotalHead + r.TurbineHead; math.Abs(last.EGL-want) > 1e-9*(1+math.Abs(want)) {
			t.Errorf("trial %d: last EGL %.15g, want point 2 total head + h_turbine = %.15g", trial, last.EGL, want)
		}
		if math.Abs(last.Distance-l.Length()) > 1e-9*l.Length() {
			t.Errorf("trial %d: last node at %g m, line is %g m", trial, last.Distance, l.Length())
		}
		// The pump's node: the start of segment PumpAfter+1 (index
		// 1+2·PumpAfter), or one node after the last segment. There the
		// EGL rises by the pump head less the transition loss charged at
		// that junction; everywhere else it never rises.
		pumpNode, pumpRise := 1+2*b.PumpAfter, r.PumpHead
		if b.PumpAfter < n {
			pumpRise -= r.Line.Segments[b.PumpAfter].TransitionLoss
		}
		if !withPump {
			pumpNode = -1
		}
		for i := 1; i < len(p); i++ {
			if p[i].Distance < p[i-1].Distance {
				t.Fatalf("trial %d: distance goes back at node %d", trial, i)
			}
			d := p[i].EGL - p[i-1].EGL
			switch {
			case i == pumpNode:
				if math.Abs(d-pumpRise) > 1e-9*(1+math.Abs(pumpRise)) {
					t.Errorf("trial %d: EGL changes by %.12g at the pump, want %.12g", trial, d, pumpRise)
				}
			case d > 0:
				t.Errorf("trial %d: the EGL rises by %g at node %d, away from any pump", trial, d, i)
			}
			if math.Abs(p[i].Pressure-((p[i].HGL-p[i].Z)*rhog+b.SitePressure)) > 1e-6 {
				t.Errorf("trial %d node %d: pressure %g is not (HGL − Z)ρg + site", trial, i, p[i].Pressure)
			}
			if s := p[i].Segment; s > 0 {
				sr := r.Line.Segments[s-1]
				if hv := p[i].EGL - p[i].HGL; math.Abs(hv-lineAlpha(b.Alpha, &sr.RunResult)*sr.Velocity*sr.Velocity/(2*StandardGravity)) > 1e-12*(1+hv) {
					t.Errorf("trial %d node %d: EGL − HGL = %g is not the segment's velocity head", trial, i, hv)
				}
			}
		}
	}
}

// TestBalanceLineMatchesRun: a one-segment line in the balance gives the
// same answer as the single run (Line adds no loss of its own).
func TestBalanceLineMatchesRun(t *testing.T) {
	run := Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3,
		Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}}
	b := Balance{Fluid: testLiquid, SitePressure: 98.8e3,
		In: Point{P: 98.8e3, Z: 212}, Out: Point{P: 98.8e3, Z: 251}, Q: 0.045, Run: &run}
	r1, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	b.Run, b.Line = nil, &Line{Segments: []Segment{{Run: run, EndZ: 251}}}
	r2, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if r1.Value != r2.Value || r2.Line == nil || r2.Run != nil {
		t.Errorf("line %.15g, run %.15g", r2.Value, r1.Value)
	}
	var sum float64
	for _, it := range r2.Budget {
		sum += float64(it.Side) * it.Head
	}
	// The budget's two sides balance (the energy equation).
	if math.Abs(sum) > 1e-9 {
		t.Errorf("budget off by %g m", sum)
	}
}

// TestBalanceLineFlowRoundTrip: solving for the flow with the pump head
// found at a flow gives that flow back (a property of the equation).
func TestBalanceLineFlowRoundTrip(t *testing.T) {
	cases, order := lnLoadRefs(t)
	for _, key := range order {
		c := cases[key]
		b := Balance{Fluid: c.fl, SitePressure: 101325,
			In: Point{P: 101325, Z: 0}, Out: Point{P: 101325, Z: 10}, Q: c.q, Line: &c.line}
		r, err := b.Solve()
		if err != nil {
			t.Fatal(err)
		}
		b.PumpHead, b.Unknown = r.Value, SolveFlow
		rq, err := b.Solve()
		if err != nil {
			t.Fatalf("%s: %v", key, err)
		}
		if math.Abs(rq.Value-c.q) > 1e-9*c.q {
			t.Errorf("%s: q = %.12g, want %.12g", key, rq.Value, c.q)
		}
	}
}

// TestBalanceLineErrors: inconsistent line inputs name their field.
func TestBalanceLineErrors(t *testing.T) {
	l := &Line{Segments: []Segment{{Run: Run{Length: 10, Diameter: 0.1}}}}
	base := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 5}, Q: 0.01, Line: l}
	tests := []struct {
		name  string
		mod   func(*Balance)
		field string
	}{
		{"run and line", func(b *Balance) { b.Run = &Run{Length: 1, Diameter: 0.1} }, "l"},
		{"pump after too far", func(b *Balance) { b.PumpAfter = 2 }, "pafter"},
		{"pump after negative", func(b *Balance) { b.PumpAfter = -1 }, "pafter"},
		{"solve hf", func(b *Balance) { b.Unknown = SolveFrictionHead }, "solve"},
		{"no segments", func(b *Balance) { b.Line = &Line{} }, "line"},
		{"bad segment", func(b *Balance) { b.Line = &Line{Segments: []Segment{{Run: Run{Length: 10}}}} }, "1:d"},
		{"bad segment, flow", func(b *Balance) {
			b.Line = &Line{Segments: []Segment{{Run: Run{Length: 10}}}}
			b.Unknown = SolveFlow
		}, "1:d"},
		{"no viscosity", func(b *Balance) { b.Fluid.Viscosity = 0 }, "mu"},
	}
	for _, tc := range tests {
		b := base
		tc.mod(&b)
		_, err := b.Solve()
		var fe *FieldError
		if !errors.As(err, &fe) || segField(fe) != tc.field {
			t.Errorf("%s: got %v, want a *FieldError for %q", tc.name, err, tc.field)
		}
	}
}

// TestProfileVapourWarning: a line that climbs far above its supply drops
// the absolute pressure below the vapour pressure at the crest, which the
// profile flags on that segment. Hydrostatics: climbing 12 m above an open
// surface at about 1 bar leaves a negative absolute pressure (1 bar ≈
// 10.2 m of water, common practice).
func TestProfileVapourWarning(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In:  Point{P: 101325, Z: 0},
		Out: Point{P: 101325, Z: -5},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 20, Diameter: 0.1}, EndZ: 12},
			{Run: Run{Length: 40, Diameter: 0.1}, EndZ: -5},
		}}, Unknown: SolveFlow}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	found := 0
	for _, w := range r.Warnings {
		if w.Field == "z" && (w.Code == CautionHighPointBreaks || w.Code == CautionHighPointStill || w.Code == CautionHighPointAir) {
			found++
			if w.Segment != 1 || w.Code != CautionHighPointStill {
				t.Errorf("high point warning: %+v", w)
			}
		}
	}
	if found != 1 {
		t.Errorf("want one high-point warning on segment 1, got %d: %+v", found, r.Warnings)
	}
	if len(r.HighPoints) != 1 || !r.HighPoints[0].Breaks || r.FullFlowKnown {
		t.Errorf("high points %+v, full flow known %v", r.HighPoints, r.FullFlowKnown)
	}
}

// TestSystemCurveMatchesSolve: each point of the system curve is the
// balance solved for the pump head at that flow, to the last bit (the
// curve folds the fittings into ΣK once, which changes no figure).
func TestSystemCurveMatchesSolve(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325,
		In: Point{P: 101325}, Out: Point{P: 150e3, Z: 40, D: 0.15}, Line: benchLine20(), PumpAfter: 3}
	flows := Flows(0.08, 17)
	pts, err := SystemCurve(b, flows)
	if err != nil {
		t.Fatal(err)
	}
	for i, q := range flows {
		b.Q = q
		r, err := b.Solve()
		if err != nil {
			t.Fatal(err)
		}
		if pts[i].Q != q || pts[i].H != r.Value || pts[i].Transitional != r.Transitional {
			t.Errorf("Q %g: curve %+v, Solve %.17g (transitional %v)", q, pts[i], r.Value, r.Transitional)
		}
	}
	if f := Flows(1, 5); len(f) != 5 || f[0] != 0 || f[4] != 1 || f[2] != 0.5 {
		t.Errorf("Flows(1, 5) = %v", f)
	}
	for _, f := range [][]float64{Flows(1, 1), Flows(0, 5), Flows(math.NaN(), 5), Flows(math.Inf(1), 5)} {
		if f != nil {
			t.Errorf("bad Flows input gave %v", f)
		}
	}
	var fe *FieldError
	for _, bad := range [][]float64{nil, {0.01, -0.01}, {math.NaN()}} {
		if _, err := SystemCurve(b, bad); !errors.As(err, &fe) || fe.Field != "q" {
			t.Errorf("SystemCurve(%v): %v", bad, err)
		}
	}
}

// TestSystemCurveRun: with a single run the curve is also the balance
// solved at each flow, to the last bit, the run untouched.
func TestSystemCurveRun(t *testing.T) {
	run := &Run{Length: 640, Diameter: 0.2027, Roughness: 0.045e-3,
		Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "elbow90lr", Count: 6}, {Key: "check_swing", Count: 1}, {Key: "exit", Count: 1}}}
	b := Balance{Fluid: testLiquid, SitePressure: 101325, Alpha: AlphaProfile,
		In: Point{P: 101325, Z: 212}, Out: Point{P: 101325, Z: 251, D: 0.2027}, Run: run}
	frCurveMatchesSolve(t, b, Flows(0.07, 8), 0)
	if len(run.Fittings) != 4 || run.ExtraK != 0 {
		t.Errorf("the caller's run was changed: %+v", run)
	}
}

// frCurveMatchesSolve checks that SystemCurve(b, flows) equals b solved at
// each flow, within rel (relative; 0: to the last bit).
func frCurveMatchesSolve(t *testing.T, b Balance, flows []float64, rel float64) {
	t.Helper()
	pts, err := SystemCurve(b, flows)
	if err != nil {
		t.Fatal(err)
	}
	for i, q := range flows {
		b.Q = q
		r, err := b.Solve()
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(pts[i].H-r.Value) > rel*math.Abs(r.Value) {
			t.Errorf("Q %g: curve %.17g, Solve %.17g", q, pts[i].H, r.Value)
		}
	}
}
