package calc

import (
	"fmt"
	"math"
	"testing"
)

func TestUncertainty(t *testing.T) {
	// Sources: the GUM's law of propagation (JCGM 100:2008 §5.1) for
	// independent inputs, worked by hand; EN 837-1's accuracy class as a
	// share of the span (a 0–10 bar class 1.0 gauge: ±10 kPa anywhere on
	// the scale). With level gauges and equal pipes the head's band is the
	// two gauges' limits added in quadrature over ρ·g; about 40 m measured
	// so gives about ±3.6 % (worked arithmetic of our own).
	fl := Fluid{Density: 1000}
	r := FieldReadings{Ps: 0, Pd: 392e3, Ds: 0.15, Dd: 0.15, Q: 0.03, PowerIn: 18e3, MotorEff: 0.92}
	fc, err := CheckPump(fl, r, nil)
	if err != nil {
		t.Fatal(err)
	}
	rhog := 1000 * StandardGravity
	tests := []struct {
		name            string
		a               Accuracy
		head, power     float64
		wire, dominated string
	}{
		{"gauges only", Accuracy{ClassS: 0.01, SpanS: 1e6, ClassD: 0.01, SpanD: 1e6},
			math.Sqrt2 * 1e4 / rhog, math.Sqrt2 * 1e4 * 0.03, "", "ps"},
		{"flow only, equal pipes: the head does not see it", Accuracy{Flow: 0.02},
			0, rhog * fc.Head * 0.02 * 0.03, "", "qm"},
		{"heights only", Accuracy{Height: 0.01}, math.Sqrt2 * 0.01, rhog * 0.03 * math.Sqrt2 * 0.01, "", "zs"},
		{"discharge gauge dominant", Accuracy{ClassS: 0.006, SpanS: 2.5e5, ClassD: 0.016, SpanD: 1.6e6},
			math.Hypot(1500, 25600) / rhog, 0.03 * math.Hypot(1500, 25600), "", "pd"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			u, err := fc.Uncertainty(fl, tc.a)
			if err != nil {
				t.Fatal(err)
			}
			if math.Abs(u.Head.U-tc.head) > 1e-12*(1+tc.head) || math.Abs(u.Power.U-tc.power) > 1e-9*(1+tc.power) {
				t.Errorf("head ±%.15g (want %.15g), power ±%.15g (want %.15g)", u.Head.U, tc.head, u.Power.U, tc.power)
			}
			if d := u.Power.Dominant(); d != tc.dominated {
				t.Errorf("power dominated by %q, want %q (terms %+v)", d, tc.dominated, u.Power.Terms)
			}
			// Wire-to-water and pump efficiency share the power's relative
			// band when the power meter is exact.
			if rel := u.Power.U / fc.HydraulicPower; math.Abs(u.Wire.U-rel*fc.Efficiency) > 1e-12 || math.Abs(u.Pump.U-rel*fc.PumpEfficiency) > 1e-12 {
				t.Errorf("wire ±%g, pump ±%g; want %g and %g", u.Wire.U, u.Pump.U, rel*fc.Efficiency, rel*fc.PumpEfficiency)
			}
		})
	}
	// The flow's band is the meter's share of the reading (a ±2 % meter
	// reading 30 L/s: ±0.6 L/s, the definition of "% of reading").
	if u, _ := fc.Uncertainty(fl, Accuracy{Flow: 0.02}); math.Abs(u.Flow.U-0.0006) > 1e-15 || u.Flow.Dominant() != "qm" {
		t.Errorf("flow band ±%g m³/s, want ±0.0006 from qm", u.Flow.U)
	}
	// The power meter adds its share to the efficiencies only.
	u, _ := fc.Uncertainty(fl, Accuracy{Power: 0.015})
	if u.Head.U != 0 || u.Power.U != 0 || math.Abs(u.Wire.U-0.015*fc.Efficiency) > 1e-15 || u.Wire.Dominant() != "pin" {
		t.Errorf("power meter only: %+v", u)
	}
	for _, a := range []Accuracy{{ClassS: -0.01}, {SpanD: math.NaN()}, {Flow: math.Inf(1)}, {Height: -1}} {
		if _, err := fc.Uncertainty(fl, a); err == nil || err.(*FieldError).Kind != Negative {
			t.Errorf("%+v: error %v", a, err)
		}
	}
}

func ExampleFieldCheck_Uncertainty() {
	fl := Fluid{Density: 1000}
	fc, _ := CheckPump(fl, FieldReadings{Pd: 392e3, Ds: 0.15, Dd: 0.15, Q: 0.03, PowerIn: 18e3}, nil)
	u, _ := fc.Uncertainty(fl, Accuracy{ClassS: 0.01, SpanS: 1e6, ClassD: 0.01, SpanD: 1e6, Flow: 0.02, Power: 0.015})
	fmt.Printf("head %.1f ± %.2f m; wire-to-water %.1f ± %.1f %%, mostly from %s\n",
		fc.Head, u.Head.U, fc.Efficiency*100, u.Wire.U*100, u.Wire.Dominant())
	// Output:
	// head 40.0 ± 1.44 m; wire-to-water 65.3 ± 2.9 %, mostly from ps
}
