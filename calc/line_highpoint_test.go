package calc

import (
	"errors"
	"math"
	"testing"
)

// highPointWarnings returns the warnings of r that name a high point.
func highPointWarns(r BalanceResult) []Warning {
	var out []Warning
	for _, w := range r.Warnings {
		switch w.Code {
		case CautionHighPointBreaks, CautionHighPointStill, CautionHighPointAir:
			out = append(out, w)
		}
	}
	return out
}

// TestHighPointsOnePerStretch: a crest that runs flat over two segments
// is one high point (one warning), and a second crest beyond a dip is
// another. Hydrostatics: 9 m above an open surface at 101.325 kPa leaves
// about 13 kPa absolute before any loss (1 bar ≈ 10.2 m of water, common
// practice), so the losses of the flow push both crests to the vapour
// pressure.
func TestHighPointsOnePerStretch(t *testing.T) {
	mk := func(ends ...float64) *Line {
		l := &Line{}
		for _, z := range ends {
			l.Segments = append(l.Segments, Segment{Run: Run{Length: 300, Diameter: 0.1, Roughness: 5e-5}, EndZ: z})
		}
		return l
	}
	tests := []struct {
		name   string
		line   *Line
		want   []int // segment of each high point's lowest node
		breaks []bool
	}{
		{"flat crest over two segments", mk(9, 9, 9, -30), []int{3}, []bool{true}},
		{"two crests", mk(9, -20, 9, -30), []int{1, 3}, []bool{true, true}},
		{"no crest: the pipe drops first", mk(-25, -27, -29, -30), nil, nil},
	}
	for _, tt := range tests {
		b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: -30},
			Line: tt.line, Unknown: SolveFlow}
		r, err := b.Solve()
		if err != nil {
			t.Fatalf("%s: %v", tt.name, err)
		}
		ws := highPointWarns(r)
		if len(ws) != len(tt.want) || len(r.HighPoints) != len(tt.want) {
			t.Errorf("%s: %d warnings, %d high points, want %d: %+v", tt.name, len(ws), len(r.HighPoints), len(tt.want), ws)
			continue
		}
		for i, hp := range r.HighPoints {
			if hp.Segment != tt.want[i] || hp.Breaks != tt.breaks[i] || ws[i].Segment != hp.Segment {
				t.Errorf("%s: high point %d = %+v, warning %+v", tt.name, i, hp, ws[i])
			}
			if !r.FullFlowKnown || !(r.FullFlow > 0 && r.FullFlow < r.Q) {
				t.Errorf("%s: full flow %v (known %v) against %v", tt.name, r.FullFlow, r.FullFlowKnown, r.Q)
			}
			for _, f := range ws[i].Figures {
				if f.Dim == Pressure {
					t.Errorf("%s: a high point's warning shows a pressure: %+v", tt.name, ws[i])
				}
			}
		}
	}
}

// TestFullFlowLaminar: a viscous liquid climbing to a crest in laminar
// flow. The largest flow with the column whole at the crest's crown (D/2
// above its centreline, where the pressure in the full pipe is lowest)
// closes
//
//	(p_site − p_v)/(ρg) − h − D/2 = 32·μ·L·V/(ρ·g·D²) + α·V²/(2g),  α = 2,
//
// the Hagen–Poiseuille loss (published law) plus the laminar velocity
// head (α = 2 laminar, common practice), a quadratic in V solved here in
// closed form. With the centreline (no D/2) the flow would be 0.5 % larger:
// the unsafe side.
func TestFullFlowLaminar(t *testing.T) {
	fl := Fluid{Name: "oil", Density: 1000, Viscosity: 0.5, VapourPressure: 2000}
	const d, l, h, site = 0.05, 100.0, 5.0, 101325.0
	b := Balance{Fluid: fl, SitePressure: site, In: Point{P: site}, Out: Point{P: site, Z: -50},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: l, Diameter: d}, EndZ: h},
			{Run: Run{Length: l, Diameter: d}, EndZ: -50},
		}}, Unknown: SolveFlow}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	g := StandardGravity
	a := 32 * fl.Viscosity * l / (fl.Density * g * d * d)
	flowAt := func(H float64) float64 {
		v := (-a + math.Sqrt(a*a+4*H/g)) / (2 / g)
		return v * math.Pi * d * d / 4
	}
	H := (site-fl.VapourPressure)/(fl.Density*g) - h
	want, centre := flowAt(H-d/2), flowAt(H)
	v := want / (math.Pi * d * d / 4)
	if re := fl.Density * v * d / fl.Viscosity; re > 2000 {
		t.Fatalf("the check needs laminar flow, Re %v", re)
	}
	if !r.FullFlowKnown || math.Abs(r.FullFlow-want) > 1e-9*want {
		t.Errorf("full flow %v (known %v), want %v", r.FullFlow, r.FullFlowKnown, want)
	}
	if centre/want < 1.004 {
		t.Errorf("the centreline's flow %v is not above the crown's %v", centre, want)
	}
	if len(r.HighPoints) != 1 || r.HighPoints[0].Segment != 1 || !r.HighPoints[0].AtEnd {
		t.Errorf("high points %+v", r.HighPoints)
	}
}

// TestHighPointCrownPressure: the pressure a high point reports is the
// crown's, the centreline's less ρ·g·D/2 (hydrostatics), so a crest whose
// centreline is just above the vapour pressure breaks. Still water
// (no flow to speak of) from an open surface at 101.325 kPa to a crest
// h above it: the centreline holds p_site − ρgh; with h chosen so that it
// is 0.2 m of liquid above p_v, the crown of a 0.5 m pipe is 0.05 m below.
func TestHighPointCrownPressure(t *testing.T) {
	fl := Fluid{Name: "test", Density: 1000, Viscosity: 1e-3, VapourPressure: 2000}
	const site, d = 101325.0, 0.5
	g := StandardGravity
	h := (site-fl.VapourPressure)/(fl.Density*g) - 0.2
	b := Balance{Fluid: fl, SitePressure: site, In: Point{P: site}, Out: Point{P: site},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 10, Diameter: d}, EndZ: h},
			{Run: Run{Length: 10, Diameter: d}, EndZ: 0},
		}}, Q: 1e-6, Unknown: SolvePumpHead}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if len(r.HighPoints) != 1 || !r.HighPoints[0].Breaks {
		t.Fatalf("high points %+v: the crown is below the vapour pressure", r.HighPoints)
	}
	want := site - fl.Density*g*(h+d/2)
	if hp := r.HighPoints[0]; math.Abs(hp.Pressure-want) > 1 {
		t.Errorf("crown pressure %v Pa, want %v", hp.Pressure, want)
	}
}

// TestFullFlowNoFlowBreaks: a crest higher than the atmosphere can lift
// the liquid (10.1 m of water, 1 bar ≈ 10.2 m, common practice) breaks the
// column even with no flow: the full-pipe flow is unknown and says why.
func TestFullFlowNoFlowBreaks(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: -30},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 50, Diameter: 0.1, Roughness: 5e-5}, EndZ: 12},
			{Run: Run{Length: 50, Diameter: 0.1, Roughness: 5e-5}, EndZ: -30},
		}}, Unknown: SolveFlow}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	var fe *FieldError
	if r.FullFlowKnown || !errors.As(r.FullFlowErr, &fe) || fe.Field != "q" || fe.Kind != NoSolution ||
		fe.Reason != ReasonColumnBreaksNoFlow || len(fe.Figures) != 1 || fe.Figures[0] != Num(1) {
		t.Errorf("full flow %v known %v, error %#v", r.FullFlow, r.FullFlowKnown, r.FullFlowErr)
	}
	found := false
	for _, w := range r.Warnings {
		found = found || w.Code == CautionHighPointStill
	}
	if !found {
		t.Errorf("no %v warning: %+v", CautionHighPointStill, r.Warnings)
	}
}

// TestHighPointBelowCrown: a pumped main whose grade line passes just
// under a crest, above the vapour pressure: a sub-atmospheric high point
// (HGL below the crown, common practice to avoid) with no break and no
// full-pipe flow.
func TestHighPointBelowCrown(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 0},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 10, Diameter: 0.2}, EndZ: 2},
			{Run: Run{Length: 10, Diameter: 0.2}, EndZ: 0},
		}}, Q: 0.001, Unknown: SolvePumpHead}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	ws := highPointWarns(r)
	if len(r.HighPoints) != 1 || r.HighPoints[0].Breaks || r.FullFlowKnown || len(ws) != 1 {
		t.Fatalf("high points %+v, warnings %+v", r.HighPoints, ws)
	}
	// The HGL at the crest: no flow to speak of, so about the level of
	// point 1; the crown is 2 m + D/2 above it.
	if hp := r.HighPoints[0]; math.Abs(hp.BelowCrown-2.1) > 0.01 || ws[0].Code != CautionHighPointAir || len(ws[0].Figures) != 5 ||
		ws[0].Figures[0] != Num(1) || ws[0].Figures[1] != Num(1) || ws[0].Figures[2] != Fig(10, Length) || ws[0].Figures[3] != Fig(2, Length) ||
		ws[0].Figures[4] != Fig(hp.BelowCrown, Length) {
		t.Errorf("below crown %v: %v", hp.BelowCrown, ws[0])
	}
}

// TestHighPointAtPumpInlet: a long, lossy suction run ending at the pump
// (after segment 1) drops the pressure at the pump's inlet below the
// vapour pressure: worded as the pump's inlet, not a crest. The suction
// run alone at 30 L/s in 100 mm pipe over 300 m loses far more than the
// 10.1 m the atmosphere supplies (1 bar ≈ 10.2 m of water, common
// practice).
func TestHighPointAtPumpInlet(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 20},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 300, Diameter: 0.1, Roughness: 5e-5}, EndZ: 0},
			{Run: Run{Length: 100, Diameter: 0.1, Roughness: 5e-5}, EndZ: 20},
		}}, PumpAfter: 1, Q: 0.03, Unknown: SolvePumpHead}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	if len(r.HighPoints) != 1 || !r.HighPoints[0].AtPump || !r.HighPoints[0].Breaks || !r.FullFlowKnown {
		t.Fatalf("high points %+v", r.HighPoints)
	}
	found := false
	for _, w := range r.Warnings {
		// the end of segment 1, 300 m from point 1 at elevation 0, full
		// only up to the full-pipe flow, not the balance's 30 L/s
		found = found || w.Code == CautionInletBreaks && w.Segment == 1 && len(w.Figures) == 6 && w.Figures[0] == Num(1) &&
			w.Figures[2] == Fig(300, Length) && w.Figures[3] == Fig(0, Length) && w.Figures[4] == Fig(r.FullFlow, Flow) && w.Figures[5] == Fig(0.03, Flow)
	}
	if !found {
		t.Errorf("warnings %+v", r.Warnings)
	}
}

// TestFullFlowTurbulentCrown: a gravity main over a crest 8 m above the
// supply in turbulent flow. Source: python3-mpmath, the root of the crest
// crown's pressure p_site + ρg(z1 − hf − V²/2g − z − D/2) = p_v with
// Colebrook-White friction, testdata/refs/gen/gen_linechecks.py (the
// case "crest 8 m above the supply" of testdata/cases/ref-highpoint.case).
func TestFullFlowTurbulentCrown(t *testing.T) {
	fl := Fluid{Name: "water", Density: 1000, Viscosity: 1e-3, VapourPressure: 2340}
	b := Balance{Fluid: fl, SitePressure: 101325, In: Point{P: 101325, Z: 100}, Out: Point{P: 101325, Z: 60},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 2000, Diameter: 0.2, Roughness: 5e-5}, EndZ: 108},
			{Run: Run{Length: 3000, Diameter: 0.2, Roughness: 5e-5}, EndZ: 60},
		}}, Unknown: SolveFlow}
	r, err := b.Solve()
	if err != nil {
		t.Fatal(err)
	}
	const want = 0.0139932481759755 // m³/s, mpmath
	if !r.FullFlowKnown || wtRelErr(r.FullFlow, want) > 1e-9 || r.FullFlowErr != nil {
		t.Errorf("full flow %.15g (known %v, %v), mpmath %.15g", r.FullFlow, r.FullFlowKnown, r.FullFlowErr, want)
	}
}
