package calc

import (
	"errors"
	"math"
	"testing"
)

// TestTurbineHeads: gross head is the static and pressure difference;
// net head is gross minus the losses and the exit velocity head, the
// balance's turbine head (energy equation, head form); output is
// ρ·g·Q·H_net·η.
func TestTurbineHeads(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 100e3,
		In:  Point{P: 100e3, Z: 120},
		Out: Point{P: 100e3, Z: 5, D: 0.12}, Q: 0.022,
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 600, Diameter: 0.1308, Roughness: 0.007e-3, ExtraK: 0.5}, EndZ: 60},
			{Run: Run{Length: 800, Diameter: 0.1308, Roughness: 0.007e-3, ExtraK: 1}, EndZ: 5},
		}}}
	r, err := Turbine(b, 0.8)
	if err != nil {
		t.Fatal(err)
	}
	if r.GrossHead != 115 {
		t.Errorf("gross head %g, want 115 m (z1 − z2)", r.GrossHead)
	}
	net := r.GrossHead - r.Losses - r.ExitVelocityHead
	if math.Abs(r.NetHead-net) > 1e-12*net || r.Losses != r.Balance.Line.TotalLoss {
		t.Errorf("net head %.15g, gross − losses − exit = %.15g", r.NetHead, net)
	}
	rhog := testLiquid.Density * StandardGravity
	if math.Abs(r.Power-rhog*b.Q*r.NetHead*0.8) > 1e-9*r.Power || math.Abs(r.HydraulicPower*0.8-r.Power) > 1e-9*r.Power {
		t.Errorf("power %g, hydraulic %g", r.Power, r.HydraulicPower)
	}
	b.Q = 0.2 // far too much for the pipe: no head left
	r, err = Turbine(b, 0.8)
	if err != nil {
		t.Fatal(err)
	}
	if r.NetHead >= 0 || !fcHas(r.Warnings, "q", "no output") {
		t.Errorf("overloaded line: net %g, %+v", r.NetHead, r.Warnings)
	}
}

// TestBestTurbineFlowThird: for a line whose losses are ∝ Q², output
// ρgQ(H − kQ²)η is largest where the losses take one third of the gross
// head (the classic result, common practice; from dP/dQ = 0). Here the
// losses are fittings only, K·V²/(2g), with and without an exit velocity
// head (also ∝ Q²).
func TestBestTurbineFlowThird(t *testing.T) {
	for _, outD := range []float64{0, 0.08} {
		b := Balance{Fluid: testLiquid, SitePressure: 100e3,
			In: Point{P: 100e3, Z: 80}, Out: Point{P: 100e3, Z: 0, D: outD},
			Line: pmKLine(12, 0.1)}
		r, err := BestTurbineFlow(b, 0.85, 0)
		if err != nil {
			t.Fatal(err)
		}
		used := (r.Losses + r.ExitVelocityHead) / r.GrossHead
		if math.Abs(used-1.0/3) > 1e-6 {
			t.Errorf("outlet d %g: losses take %.9f of the gross head at the best flow, want 1/3", outD, used)
		}
		// Closed form of the same optimum: Q = √(H/(3k)).
		v := math.Sqrt(2 * StandardGravity * 80 / 3 / (12 + tbExitK(outD)))
		if q := v * math.Pi * 0.01 / 4; math.Abs(r.Q-q) > 1e-6*q {
			t.Errorf("outlet d %g: best flow %.9g, closed form %.9g", outD, r.Q, q)
		}
		// With an upper bound below the optimum, the bound wins (output
		// rises up to it).
		rb, err := BestTurbineFlow(b, 0.85, 0.5*r.Q)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(rb.Q-0.5*r.Q) > 1e-8*r.Q {
			t.Errorf("bounded search: %g, want the bound %g", rb.Q, 0.5*r.Q)
		}
	}
}

// tbExitK is the exit velocity head at an outlet of diameter outD (0: none)
// as a K on the 0.1 m line's velocity head, (0.1/outD)⁴ (continuity).
func tbExitK(outD float64) float64 {
	if outD == 0 {
		return 0
	}
	r := 0.1 / outD
	return r * r * r * r
}

// TestTurbineErrors: bad efficiencies, no gross head, bad search bound.
func TestTurbineErrors(t *testing.T) {
	b := Balance{Fluid: testLiquid, SitePressure: 100e3,
		In: Point{P: 100e3, Z: 80}, Out: Point{P: 100e3}, Q: 0.01, Line: pmKLine(12, 0.1)}
	var fe *FieldError
	for _, e := range []float64{0, -0.5, 1.2, math.NaN()} {
		if _, err := Turbine(b, e); !errors.As(err, &fe) || fe.Field != "etat" {
			t.Errorf("Turbine η %g: %v", e, err)
		}
		if _, err := BestTurbineFlow(b, e, 0); !errors.As(err, &fe) || fe.Field != "etat" {
			t.Errorf("BestTurbineFlow η %g: %v", e, err)
		}
	}
	if _, err := BestTurbineFlow(b, 0.8, -1); !errors.As(err, &fe) || fe.Field != "q" {
		t.Errorf("negative bound: %v", err)
	}
	up := b
	up.In.Z, up.Out.Z = 0, 10
	if _, err := BestTurbineFlow(up, 0.8, 0); !errors.As(err, &fe) || fe.Field != "z1" {
		t.Errorf("uphill: %v", err)
	}
	if r, err := Turbine(up, 0.8); err != nil || !fcHas(r.Warnings, "z1", "gross head") {
		t.Errorf("uphill turbine: %v %+v", err, r.Warnings)
	}
	free := Balance{Fluid: testLiquid, SitePressure: 100e3, In: Point{P: 100e3, Z: 80}, Out: Point{P: 100e3}, FrictionHead: 1}
	if _, err := BestTurbineFlow(free, 0.8, 0); !errors.As(err, &fe) || fe.Field != "q" {
		t.Errorf("no pipe: %v", err)
	}
}

// BenchmarkBestTurbineFlow: the golden-section search over a two-segment
// line (with the zero-output bound found first).
func BenchmarkBestTurbineFlow(b *testing.B) {
	bal := Balance{Fluid: testLiquid, SitePressure: 100e3,
		In: Point{P: 100e3, Z: 1020}, Out: Point{P: 100e3, Z: 905},
		Line: &Line{Segments: []Segment{
			{Run: Run{Length: 700, Diameter: 0.1308, Roughness: 0.007e-3, ExtraK: 0.5}, EndZ: 960},
			{Run: Run{Length: 700, Diameter: 0.1308, Roughness: 0.007e-3, ExtraK: 1}, EndZ: 905},
		}}}
	for i := 0; i < b.N; i++ {
		if _, err := BestTurbineFlow(bal, 0.8, 0); err != nil {
			b.Fatal(err)
		}
	}
}
