package calc

import (
	"errors"
	"math"
	"testing"
)

// droopPoints is a drooping data sheet (invented): the head rises from
// 40 m at shut-off to 44 m at 10 L/s, then falls.
var droopPoints = []PumpPoint{{Q: 0, H: 40}, {Q: 0.01, H: 44}, {Q: 0.02, H: 42}, {Q: 0.03, H: 35}, {Q: 0.04, H: 25}}

func TestDroopingCurve(t *testing.T) {
	// Sources: Fritsch & Carlson (1980) — the monotone interpolant passes
	// through every point and keeps the data's shape on each interval, so
	// it rises on the rising part and peaks at the highest point; a line
	// whose static head lies between the shut-off and the highest head
	// meets such a curve on its falling part as well, the stable crossing
	// (common practice).
	c, err := FitPump(droopPoints)
	if err != nil {
		t.Fatalf("a drooping curve was refused: %v", err)
	}
	lo, hi, ok := c.Unstable()
	if !ok || lo != 0 || hi != 0.01 {
		t.Errorf("unstable region %g–%g (%v), want 0–0.01 m³/s", lo, hi, ok)
	}
	prev := math.Inf(-1)
	for q := 0.0; q <= 0.01; q += 0.0005 {
		h, _ := c.Head(q)
		if h < prev-1e-12 || h > 44+1e-12 {
			t.Errorf("head %g at %g m³/s: not rising to the peak without overshoot", h, q)
		}
		prev = h
	}
	if _, _, ok := mustFit(t, pmTestPoints).Unstable(); ok {
		t.Error("a falling curve has an unstable region")
	}
	// Static head 42 m, above the 40 m shut-off but below the 44 m peak.
	b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 42}, Line: pmKLine(10, 0.1)}
	op, err := OperatingPoint(c, b)
	if err != nil {
		t.Fatal(err)
	}
	if op.Q <= hi {
		t.Errorf("operating point %g m³/s lies in the rising part, want the falling part", op.Q)
	}
	sys, _ := SystemCurve(b, []float64{op.Q})
	if math.Abs(sys[0].H-op.H) > 1e-8 {
		t.Errorf("pump %g m, line %g m at the operating point", op.H, sys[0].H)
	}
	// Above the peak: no meeting, said plainly.
	b.Out.Z = 50
	var fe *FieldError
	if _, err := OperatingPoint(c, b); !errors.As(err, &fe) || fe.Field != "ph" || fe.Reason != ReasonTopBelowLine {
		t.Errorf("lift above the peak: %v", err)
	}
	// The affinity laws keep the shape.
	if s, err := c.AtSpeed(0.8); err != nil {
		t.Error(err)
	} else if _, hi8, ok := s.Unstable(); !ok || math.Abs(hi8-0.008) > 1e-15 {
		t.Errorf("at 80 %%: unstable to %g m³/s (%v), want 0.008", hi8, ok)
	}
}

func mustFit(t *testing.T, pts []PumpPoint) PumpCurve {
	t.Helper()
	c, err := FitPump(pts)
	if err != nil {
		t.Fatal(err)
	}
	return c
}
