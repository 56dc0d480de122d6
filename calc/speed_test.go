package calc

import (
	"errors"
	"fmt"
	"math"
	"testing"
)

func TestSpeedForDuty(t *testing.T) {
	// Source: the affinity laws (Q ∝ n, H ∝ n²). A duty read off the
	// curve at a known speed (AtSpeed, then Combine) must give that speed
	// back: the round trip checks the root finder against the laws as
	// AtSpeed applies them.
	base, err := FitPump(pmTestPoints)
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []struct {
		ratio    float64
		count    int
		parallel bool
		q        float64
	}{
		{0.85, 1, false, 0.025},
		{1, 1, false, 0.03},
		{1.1, 1, false, 0.012},
		{0.7, 2, true, 0.04},
		{0.9, 2, false, 0.02},
		{0.6, 3, true, 0.05},
	} {
		t.Run(fmt.Sprintf("%g×%d %v", tc.ratio, tc.count, tc.parallel), func(t *testing.T) {
			c, err := base.AtSpeed(tc.ratio)
			if err != nil {
				t.Fatal(err)
			}
			if c, err = c.Combine(tc.count, tc.parallel); err != nil {
				t.Fatal(err)
			}
			h, ok := c.Head(tc.q)
			if !ok {
				t.Fatalf("%g m³/s is off the curve", tc.q)
			}
			r, err := SpeedForDuty(base, tc.count, tc.parallel, tc.q, h)
			if err != nil {
				t.Fatal(err)
			}
			if math.Abs(r-tc.ratio) > 1e-9 {
				t.Errorf("speed %.12g, want %g", r, tc.ratio)
			}
		})
	}
	// No speed in range, said plainly (field qsp): a duty above what the
	// pump gives at the top speed, and one below what it gives at the
	// lowest speed that still reaches the flow.
	for _, tc := range []struct {
		q, h float64
		kind Kind
		why  Reason
	}{
		{0.03, 1000, NoSolution, ReasonSpeedTopShort},
		{0.03, 0.01, NoSolution, ReasonSpeedBottomOver},
		{1, 10, NoSolution, ReasonSpeedBeyondSheet},
		{0, 10, NotPositive, ReasonNone},
		{0.03, math.NaN(), NoSolution, ReasonLineHeadNotFinite},
	} {
		_, err := SpeedForDuty(base, 1, false, tc.q, tc.h)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Kind != tc.kind || fe.Reason != tc.why || fe.Field != "qsp" {
			t.Errorf("q %g, h %g: error %v, want %v (%v) on qsp", tc.q, tc.h, err, tc.kind, tc.why)
		}
		if tc.why == ReasonSpeedTopShort && (len(fe.Figures) != 4 || fe.Figures[0].Value != PumpSpeedRatioMax) {
			t.Errorf("q %g, h %g: figures %v, want the top speed first", tc.q, tc.h, fe.Figures)
		}
	}
}

func TestFlowForHead(t *testing.T) {
	// Source: the system curve (SystemCurve, solved in full) read
	// backwards: the flow found for the head the line needs at a flow is
	// that flow. Below the static head there is no flow, said plainly.
	b := Balance{Fluid: testLiquid, SitePressure: 101325, In: Point{P: 101325}, Out: Point{P: 101325, Z: 20}, Line: pmKLine(10, 0.1)}
	for _, q := range []float64{0.001, 0.01, 0.03, 0.2} {
		sys, err := SystemCurve(b, []float64{q})
		if err != nil {
			t.Fatal(err)
		}
		got, err := FlowForHead(b, sys[0].H, 0.04)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(got-q) > 1e-9*q {
			t.Errorf("flow %.12g for the head at %g m³/s", got, q)
		}
	}
	for _, tc := range []struct {
		h, guess float64
		kind     Kind
		why      Reason
	}{
		{15, 0.04, NoSolution, ReasonHeadBelowStatic},
		{1e9, 0.04, NoSolution, ReasonHeadNeverReached},
		{math.NaN(), 0.04, NotFinite, ReasonNone},
		{30, 0, Missing, ReasonNone},
	} {
		_, err := FlowForHead(b, tc.h, tc.guess)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Kind != tc.kind || fe.Reason != tc.why || fe.Field != "hsp" {
			t.Errorf("h %g: error %v, want %v (%v) on hsp", tc.h, err, tc.kind, tc.why)
		}
	}
}

func ExampleSpeedForDuty() {
	c, _ := FitPump([]PumpPoint{{Q: 0, H: 48}, {Q: 0.01, H: 46.5}, {Q: 0.02, H: 42}, {Q: 0.03, H: 35}, {Q: 0.04, H: 25}})
	r, err := SpeedForDuty(c, 1, false, 0.025, 30)
	fmt.Printf("%.1f %% speed, %v\n", r*100, err)
	// Output:
	// 90.2 % speed, <nil>
}

func BenchmarkSpeedForDuty(b *testing.B) {
	c, _ := FitPump(pmTestPoints)
	for i := 0; i < b.N; i++ {
		_, _ = SpeedForDuty(c, 1, false, 0.025, 30)
	}
}
