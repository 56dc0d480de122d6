package calc

import (
	"errors"
	"fmt"
	"math"
	"math/rand"
	"testing"
)

// pmTestPoints is a data sheet with efficiency and NPSHr (invented inputs
// for properties, not reference values).
var pmTestPoints = []PumpPoint{
	{Q: 0, H: 48, Eff: 0, NPSHr: 0},
	{Q: 0.01, H: 46.5, Eff: 0.52, NPSHr: 1.8},
	{Q: 0.02, H: 42, Eff: 0.71, NPSHr: 2.1},
	{Q: 0.03, H: 35, Eff: 0.77, NPSHr: 2.9},
	{Q: 0.04, H: 25, Eff: 0.72, NPSHr: 4.2},
}

// TestFitPumpScipy: the head curve against scipy.interpolate.PchipInterpolator
// (python3-scipy, table pchip.tsv, set "falling"), within 1e-12 of the
// data's scale; beyond the data the curve is not defined.
func TestFitPumpScipy(t *testing.T) {
	set := pchipSets["falling"]
	pts := make([]PumpPoint, len(set[0]))
	for i := range pts {
		pts[i] = PumpPoint{Q: set[0][i], H: set[1][i]}
	}
	c, err := FitPump(pts)
	if err != nil {
		t.Fatal(err)
	}
	n := 0
	for _, row := range lnReadTSV(t, "pchip.tsv") {
		if row["set"] != "falling" {
			continue
		}
		h, ok := c.Head(lnNum(t, row, "x"))
		// scipy PchipInterpolator (pchip.tsv), 1e-12 × 50 m.
		if want := lnNum(t, row, "y"); !ok || math.Abs(h-want) > 1e-12*50 {
			t.Errorf("Head(%s) = %.17g, %v; scipy %.17g", row["x"], h, ok, want)
		}
		n++
	}
	if n == 0 {
		t.Fatal("no rows for set falling")
	}
	for _, q := range []float64{-1e-9, 6 + 1e-9, math.NaN(), math.Inf(1)} {
		if _, ok := c.Head(q); ok {
			t.Errorf("Head(%g) defined beyond the data sheet (no extrapolation)", q)
		}
	}
}

// TestPumpCurveShape: the curve passes through the data sheet's points and
// falls strictly between them (monotone interpolation, Fritsch & Carlson
// 1980); efficiency and NPSHr stay within their neighbours' range.
func TestPumpCurveShape(t *testing.T) {
	c, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range pmTestPoints {
		if h, ok := c.Head(p.Q); !ok || h != p.H {
			t.Errorf("Head(%g) = %g, %v; want the data point %g", p.Q, h, ok, p.H)
		}
		if e, ok := c.Efficiency(p.Q); !ok || e != p.Eff {
			t.Errorf("Efficiency(%g) = %g, %v; want %g", p.Q, e, ok, p.Eff)
		}
		n, ok := c.NPSHr(p.Q)
		if p.Q == 0 && ok {
			t.Errorf("NPSHr defined at zero flow, where the sheet gives none")
		}
		if p.Q > 0 && (!ok || n != p.NPSHr) {
			t.Errorf("NPSHr(%g) = %g, %v; want %g", p.Q, n, ok, p.NPSHr)
		}
	}
	prev := math.Inf(1)
	for i := 0; i <= 400; i++ {
		q := c.MaxFlow() * float64(i) / 400
		h, ok := c.Head(q)
		if !ok || !(h < prev) {
			t.Fatalf("head %g at %g does not fall (previous %g)", h, q, prev)
		}
		prev = h
		if e, _ := c.Efficiency(q); e < 0 || e > 0.77 {
			t.Errorf("efficiency %g at %g outside the data's range", e, q)
		}
	}
	if c.ShutoffHead() != 48 || c.MaxFlow() != 0.04 || c.MinFlow() != 0 || !c.HasEfficiency() || !c.HasNPSHr() {
		t.Errorf("accessors: %g %g %g %v %v", c.ShutoffHead(), c.MaxFlow(), c.MinFlow(), c.HasEfficiency(), c.HasNPSHr())
	}
	bare, err := FitPump([]PumpPoint{{0, 10, 0, 0}, {1, 9, 0, 0}, {2, 5, 0, 0}})
	if err != nil {
		t.Fatal(err)
	}
	if _, ok := bare.Efficiency(1); ok || bare.HasEfficiency() || bare.HasNPSHr() {
		t.Errorf("efficiency defined without data")
	}
}

// TestFitPumpErrors: points that do not make a falling curve, or lists
// that are incomplete, are refused with the field and the point named.
func TestFitPumpErrors(t *testing.T) {
	ok := func() []PumpPoint { return append([]PumpPoint(nil), pmTestPoints...) }
	tests := []struct {
		name  string
		pts   []PumpPoint
		field string
		point string
	}{
		{"too few", ok()[:2], "pq", "3 to 8"},
		{"too many", append(ok(), ok()...), "pq", "3 to 8"},
		{"negative flow", func() []PumpPoint { p := ok(); p[0].Q = -0.01; return p }(), "pq", "point 1"},
		{"flow not rising", func() []PumpPoint { p := ok(); p[3].Q = 0.02; return p }(), "pq", "point 4"},
		{"flow NaN", func() []PumpPoint { p := ok(); p[2].Q = math.NaN(); return p }(), "pq", "point 3"},
		{"head rising again after falling", func() []PumpPoint { p := ok(); p[3].H = 43; return p }(), "ph", "point 4"},
		{"head rising to the last point", func() []PumpPoint { p := ok(); p[4].H = 50; return p }(), "ph", "point 5"},
		{"head level", func() []PumpPoint { p := ok(); p[4].H = 35; return p }(), "ph", "point 5"},
		{"head negative", func() []PumpPoint { p := ok(); p[4].H = -1; return p }(), "ph", "point 5"},
		{"efficiency missing", func() []PumpPoint { p := ok(); p[2].Eff = 0; return p }(), "peff", "point 3"},
		{"efficiency above 1", func() []PumpPoint { p := ok(); p[3].Eff = 77; return p }(), "peff", "point 4"},
		{"efficiency at shut-off", func() []PumpPoint { p := ok(); p[0].Eff = 0.1; return p }(), "peff", "point 1"},
		{"NPSHr missing", func() []PumpPoint { p := ok(); p[4].NPSHr = 0; return p }(), "pnpsh", "point 5"},
		{"NPSHr negative", func() []PumpPoint { p := ok(); p[2].NPSHr = -2; return p }(), "pnpsh", "point 3"},
	}
	for _, tc := range tests {
		_, err := FitPump(tc.pts)
		var fe *FieldError
		item := 0
		fmt.Sscanf(tc.point, "point %d", &item)
		if !errors.As(err, &fe) || fe.Field != tc.field || fe.Item != item || fe.Kind == KindOther ||
			(item == 0 && (fe.Min == nil || fe.Min.Value != 3 || fe.Max == nil || fe.Max.Value != 8)) {
			t.Errorf("%s: got %v, want a *FieldError for %q mentioning %q", tc.name, err, tc.field, tc.point)
		}
	}
}

// TestAffinityLaws: a speed change moves every point of the curve by the
// affinity laws, Q ∝ n, H ∝ n², η unchanged, NPSHr ∝ n² (the pump
// affinity laws), exactly up to rounding.
func TestAffinityLaws(t *testing.T) {
	c, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range []float64{0.8, 0.95, 1.1} {
		s, err := c.AtSpeed(r)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(s.MaxFlow()-r*c.MaxFlow()) > 1e-15 || math.Abs(s.ShutoffHead()-r*r*c.ShutoffHead()) > 1e-12 {
			t.Errorf("ratio %g: max flow %g, shut-off %g", r, s.MaxFlow(), s.ShutoffHead())
		}
		for i := 0; i <= 100; i++ {
			q := c.MaxFlow() * float64(i) / 100
			h, _ := c.Head(q)
			hs, ok := s.Head(r * q)
			// Affinity laws: H(n) = (n/n₀)²·H₀ at Q = (n/n₀)·Q₀.
			if !ok || math.Abs(hs-r*r*h) > 1e-12*h {
				t.Errorf("ratio %g, Q %g: head %.15g, want %.15g", r, q, hs, r*r*h)
			}
			e, _ := c.Efficiency(q)
			es, _ := s.Efficiency(r * q)
			if math.Abs(es-e) > 1e-13 {
				t.Errorf("ratio %g, Q %g: efficiency %.15g, want %.15g", r, q, es, e)
			}
			if n, ok := c.NPSHr(q); ok {
				ns, _ := s.NPSHr(r * q)
				if math.Abs(ns-r*r*n) > 1e-12*n {
					t.Errorf("ratio %g, Q %g: NPSHr %.15g, want %.15g", r, q, ns, r*r*n)
				}
			}
		}
	}
	var fe *FieldError
	for _, r := range []float64{0, -1, 3, math.NaN()} {
		if _, err := c.AtSpeed(r); !errors.As(err, &fe) || fe.Field != "spd" {
			t.Errorf("AtSpeed(%g): %v", r, err)
		}
	}
}

// TestCombine: identical pumps in parallel add their flows at equal head;
// in series they add their heads at equal flow (the usual rule for
// identical pumps, common practice); each runs at the single pump's
// efficiency.
func TestCombine(t *testing.T) {
	c, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	for _, n := range []int{1, 2, 3} {
		par, err := c.Combine(n, true)
		if err != nil {
			t.Fatal(err)
		}
		ser, err := c.Combine(n, false)
		if err != nil {
			t.Fatal(err)
		}
		fn := float64(n)
		for i := 0; i <= 50; i++ {
			q := c.MaxFlow() * float64(i) / 50
			h, _ := c.Head(q)
			e, _ := c.Efficiency(q)
			hp, ok1 := par.Head(fn * q)
			hs, ok2 := ser.Head(q)
			ep, _ := par.Efficiency(fn * q)
			es, _ := ser.Efficiency(q)
			if !ok1 || !ok2 || math.Abs(hp-h) > 1e-12*h || math.Abs(hs-fn*h) > 1e-12*fn*h ||
				math.Abs(ep-e) > 1e-13 || math.Abs(es-e) > 1e-13 {
				t.Errorf("n=%d, Q %g: parallel %g (η %g), series %g (η %g); single %g (η %g)", n, q, hp, ep, hs, es, h, e)
			}
		}
	}
	var fe *FieldError
	if _, err := c.Combine(0, true); !errors.As(err, &fe) || fe.Field != "pumps" {
		t.Errorf("Combine(0): %v", err)
	}
	if _, err := (PumpCurve{}).Combine(2, true); !errors.As(err, &fe) || fe.Field != "pq" {
		t.Errorf("Combine on an empty curve: %v", err)
	}
}

// pmKLine is a line of fittings only (no pipe length): losses K·V²/(2g).
func pmKLine(k, d float64) *Line {
	return &Line{Segments: []Segment{{Run: Run{Length: 0, Diameter: d, ExtraK: k}}}}
}

// TestOperatingPointScipy: operating points against scipy (pchip_operating.tsv:
// PchipInterpolator for the pump, brentq for the crossing with
// dz + K·V²/(2g)), within 1e-10 relative.
func TestOperatingPointScipy(t *testing.T) {
	sets := map[string][2][]float64{
		"steep":  {{0, 0.01, 0.02, 0.03, 0.04}, {40, 38.5, 34, 26, 15}},
		"flat":   {{0, 0.02, 0.05, 0.08}, {22, 21.6, 20, 16}},
		"nozero": {{0.005, 0.01, 0.015, 0.02, 0.03, 0.035}, {30, 29, 27.5, 25, 18, 13}},
	}
	for _, row := range lnReadTSV(t, "pchip_operating.tsv") {
		set := sets[row["set"]]
		pts := make([]PumpPoint, len(set[0]))
		for i := range pts {
			pts[i] = PumpPoint{Q: set[0][i], H: set[1][i]}
		}
		c, err := FitPump(pts)
		if err != nil {
			t.Fatal(err)
		}
		b := Balance{Fluid: testLiquid, SitePressure: 101325,
			In: Point{P: 101325}, Out: Point{P: 101325, Z: lnNum(t, row, "dz")},
			Line: pmKLine(lnNum(t, row, "k"), lnNum(t, row, "d"))}
		op, err := OperatingPoint(c, b)
		if err != nil {
			t.Fatalf("%s: %v", row["set"], err)
		}
		// scipy PchipInterpolator + brentq (pchip_operating.tsv), 1e-10 relative.
		if q, h := lnNum(t, row, "q"), lnNum(t, row, "h"); !lnClose(op.Q, q, 1e-10) || !lnClose(op.H, h, 1e-10) {
			t.Errorf("%s: Q %.16g H %.16g; scipy Q %.16g H %.16g", row["set"], op.Q, op.H, q, h)
		}
	}
}

// TestOperatingPointOnBothCurves: a property of the intersection: the
// operating point's head is the pump's head at its flow and the head the
// balance needs there, within 1e-8 m, over random pumps and lines; its
// powers are ρgQH and ρgQH/η.
func TestOperatingPointOnBothCurves(t *testing.T) {
	rng := rand.New(rand.NewSource(7))
	met := 0
	for trial := 0; trial < 300; trial++ {
		l := lnRandomLine(rng)
		qmax := 0.2 * l.minDiameter() * l.minDiameter() * (0.2 + rng.Float64())
		n := PumpMinPoints + rng.Intn(PumpMaxPoints-PumpMinPoints+1)
		pts := make([]PumpPoint, n)
		h := 20 + 80*rng.Float64()
		for i := range pts {
			pts[i] = PumpPoint{Q: qmax * float64(i) / float64(n-1), H: h, Eff: 0.3 + 0.5*rng.Float64()}
			if i == 0 {
				pts[i].Eff = 0
			}
			h *= 0.6 + 0.39*rng.Float64()
		}
		c, err := FitPump(pts)
		if err != nil {
			t.Fatal(err)
		}
		b := Balance{Fluid: testLiquid, SitePressure: 101325,
			In: Point{P: 101325, Z: 0}, Out: Point{P: 101325, Z: 30 * rng.Float64()}, Line: l}
		op, err := OperatingPoint(c, b)
		if err != nil {
			var fe *FieldError
			if !errors.As(err, &fe) || fe.Kind != NoSolution {
				t.Fatalf("trial %d: %v", trial, err)
			}
			continue
		}
		met++
		hp, ok := c.Head(op.Q)
		sys, err := SystemCurve(b, []float64{op.Q})
		if err != nil {
			t.Fatal(err)
		}
		if !ok || math.Abs(hp-op.H) > 1e-8 || math.Abs(sys[0].H-op.H) > 1e-8 || math.Abs(op.Balance.PumpHead-op.H) > 1e-8 {
			t.Errorf("trial %d: Q %g, H %.12g, pump %.12g, system %.12g, balance %.12g", trial, op.Q, op.H, hp, sys[0].H, op.Balance.PumpHead)
		}
		rhog := testLiquid.Density * StandardGravity
		if math.Abs(op.HydraulicPower-rhog*op.Q*op.H) > 1e-9*op.HydraulicPower ||
			(op.Eff > 0 && math.Abs(op.ShaftPower-op.HydraulicPower/op.Eff) > 1e-9*op.ShaftPower) {
			t.Errorf("trial %d: powers %g, %g (η %g)", trial, op.HydraulicPower, op.ShaftPower, op.Eff)
		}
	}
	if met < 50 {
		t.Errorf("only %d of 300 random pumps met their line; the property is barely exercised", met)
	}
}

// TestOperatingPointNoMeet: the two ways the curves can miss each other
// within the data sheet, each explained.
func TestOperatingPointNoMeet(t *testing.T) {
	c, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	high := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 60}, Line: pmKLine(10, 0.1)}
	_, err = OperatingPoint(c, high)
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "ph" || fe.Reason != ReasonShutOffBelowLine ||
		len(fe.Figures) != 2 || math.Abs(fe.Figures[0].Value-48) > 1e-9 || math.Abs(fe.Figures[1].Value-60) > 0.01 {
		t.Errorf("lift above shut-off: %v", err)
	}
	easy := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 5}, Line: pmKLine(1, 0.3)}
	_, err = OperatingPoint(c, easy)
	if !errors.As(err, &fe) || fe.Field != "pq" || fe.Reason != ReasonPumpRunsOut {
		t.Errorf("runs out: %v", err)
	}
	if _, err := OperatingPoint(PumpCurve{}, easy); !errors.As(err, &fe) || fe.Field != "pq" {
		t.Errorf("empty curve: %v", err)
	}
}
