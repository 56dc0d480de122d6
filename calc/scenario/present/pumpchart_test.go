package present

import (
	"math"
	"testing"

	"fieldhead/calc/scenario"
)

// TestMeasuredBox: with instrument accuracies the pump chart's measured
// point carries its uncertainty as ± in the chart's own units: the flow's
// is the flow meter's share of the reading (2 % of 41 L/s = 0.82 L/s, by
// the definition of "% of reading"; 649.9 gpm × 2 % in the US sheet), the
// head's the propagated band (calc.FieldCheck.Uncertainty, checked there
// against python3-uncertainties) converted to m or ft. The preferred
// region is a band to keep to, the best-efficiency point a peak, the
// speed for 70 L/s its own role.
func TestMeasuredBox(t *testing.T) {
	for _, tc := range []struct {
		name string
		sc   scenario.Scenario
		dq   float64 // the flow's ±, display units
	}{
		{"SI", with(t, testedDemo(t, scenario.Demo()), "gss", "250kPa", "gsd", "1000kPa"), 0.02 * 41},
		{"US", with(t, testedDemo(t, usDemo(t)), "gss", "36psi", "gsd", "145psi"), 0},
	} {
		t.Run(tc.name, func(t *testing.T) {
			sh, r := sheetOf(t, tc.sc, "pump")
			ch := findChart(sh, "pump-chart")
			if ch == nil || r.FieldBands == nil {
				t.Fatal("no pump chart or no bands")
			}
			hu := displayUnit("hp", r.US)
			qu := displayUnit("q", r.US)
			var measured, peak *Marker
			for i := range ch.Markers {
				switch ch.Markers[i].Role {
				case MarkMeasured:
					measured = &ch.Markers[i]
				case MarkPeak:
					peak = &ch.Markers[i]
				}
			}
			if measured == nil || peak == nil {
				t.Fatalf("markers %+v: want a measured point and a peak", ch.Markers)
			}
			wantQ := qu.FromSI(0.02 * r.Field.Q)
			if tc.dq > 0 && math.Abs(wantQ-tc.dq) > 1e-9 {
				t.Fatalf("the flow meter's 2 %% of %v L/s is %v, want %v", qu.FromSI(r.Field.Q), wantQ, tc.dq)
			}
			if math.Abs(measured.DX-wantQ) > 1e-9*wantQ || math.Abs(measured.DY-hu.FromSI(r.FieldBands.Head.U)) > 1e-9 {
				t.Errorf("box ±%v × ±%v, want ±%v flow and ±%v head", measured.DX, measured.DY, wantQ, hu.FromSI(r.FieldBands.Head.U))
			}
			keep := 0
			for _, b := range ch.Bands {
				if b.Keep {
					keep++
				}
			}
			speed := 0
			for _, c := range ch.Curves {
				if c.Role == RoleSpeed {
					speed++
				}
			}
			if keep != 1 || speed != 1 {
				t.Errorf("%d bands to keep to (want the preferred region), %d speed curves (want the one for 70 L/s)", keep, speed)
			}
		})
	}
}

// findChart returns the chart with id in the sheet's cards, nil if none.
func findChart(sh Sheet, id string) *Chart {
	for _, v := range sh.Cards {
		for _, b := range v.Blocks {
			if b.Kind == BlockChart && b.ID == id {
				return b.Chart
			}
		}
	}
	return nil
}
