package calc

import (
	"errors"
	"fmt"
	"math"
	"testing"
)

// The figures of each row are checked against python3-fluids in
// testdata/cases/ref-fluids-sizing.case; these tests check what SizeRun
// refuses and how it marks.

func TestSizeRunRefuses(t *testing.T) {
	water := Fluid{Density: 998.2, Viscosity: 1.0016e-3}
	sizes, err := Catalogues()[0].Sizes("40")
	if err != nil {
		t.Fatal(err)
	}
	run := Run{Length: 100, Roughness: 0.045e-3, Method: MethodColebrook}
	lim := DefaultSizingLimits()
	for _, c := range []struct {
		name  string
		r     Run
		q     float64
		lim   SizingLimits
		sizes []PipeSize
		field string
	}{
		{"no flow", run, 0, lim, sizes, "q"},
		{"NaN flow", run, math.NaN(), lim, sizes, "q"},
		{"band upside down", run, 0.01, SizingLimits{2, 1, 0.04}, sizes, "vhi"},
		{"negative band", run, 0.01, SizingLimits{-1, 1, 0.04}, sizes, "vlo"},
		{"no gradient limit", run, 0.01, SizingLimits{0.6, 2.4, 0}, sizes, "grad"},
		{"no sizes", run, 0.01, lim, nil, "sch"},
		{"negative length", Run{Length: -1, Roughness: 1e-5}, 0.01, lim, sizes, "length"},
		{"unknown fitting", Run{Length: 1, Roughness: 1e-5, Fittings: []FittingCount{{Key: "nozzle9", Count: 1}}}, 0.01, lim, sizes, "fit"},
		{"negative fitting count", Run{Length: 1, Roughness: 1e-5, Fittings: []FittingCount{{Key: "gate", Count: -1}}}, 0.01, lim, sizes, "fit"},
	} {
		_, err := SizeRun(c.r, water, c.q, c.sizes, c.lim)
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != c.field {
			t.Errorf("%s: got %v, want an error naming %q", c.name, err, c.field)
		}
	}
}

// The marks follow their definitions (velocity within the band, pipe
// friction per length at most the limit), and the rows keep the
// catalogue's order.
func TestSizeRunMarks(t *testing.T) {
	water := Fluid{Density: 998.2, Viscosity: 1.0016e-3}
	sizes, _ := Catalogues()[0].Sizes("40")
	rows, err := SizeRun(Run{Length: 500, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "gate", Count: 2}}},
		water, 0.035, sizes, DefaultSizingLimits())
	if err != nil {
		t.Fatal(err)
	}
	if len(rows) != len(sizes) {
		t.Fatalf("%d rows for %d sizes", len(rows), len(sizes))
	}
	fits := 0
	for i, r := range rows {
		if r.Pipe.ID != sizes[i].ID {
			t.Errorf("row %d is %s, want %s", i, r.Pipe.Label(), sizes[i].Label())
		}
		if r.Err != nil {
			continue
		}
		v := r.Run.Velocity
		if in := v >= SizingVelocityLow && v <= SizingVelocityHigh; in != r.InBand {
			t.Errorf("%s: velocity %g marked in band %v", r.Pipe.Label(), v, r.InBand)
		}
		if under := r.Gradient <= SizingGradientMax; under != r.UnderMax {
			t.Errorf("%s: gradient %g marked under the limit %v", r.Pipe.Label(), r.Gradient, r.UnderMax)
		}
		if got := r.Gradient * 500; math.Abs(got-r.Run.MajorLoss) > 1e-12*r.Run.MajorLoss {
			t.Errorf("%s: gradient × length %g is not the pipe friction %g", r.Pipe.Label(), got, r.Run.MajorLoss)
		}
		if r.Fits() {
			fits++
		}
	}
	if fits == 0 {
		t.Error("no size of schedule 40 steel fits 35 L/s of water at the default marks")
	}
}

func ExampleSizeRun() {
	water := Fluid{Density: 998.2, Viscosity: 1.0016e-3}
	sizes, _ := Catalogues()[0].Sizes("40") // carbon steel, schedule 40
	run := Run{Length: 1200, Roughness: 0.045e-3, Fittings: []FittingCount{{Key: "gate", Count: 2}, {Key: "exit", Count: 1}}}
	rows, _ := SizeRun(run, water, 0.035, sizes, DefaultSizingLimits())
	for _, r := range rows {
		if r.Fits() {
			fmt.Printf("%s: %.2f m/s, %.2f m per 100 m, %.1f m in all\n", r.Pipe.Label(), r.Run.Velocity, r.Gradient*100, r.Run.TotalLoss)
		}
	}
	// Output:
	// NPS 6 sch 40: 1.88 m/s, 1.98 m per 100 m, 24.0 m in all
	// NPS 8 sch 40: 1.08 m/s, 0.50 m per 100 m, 6.1 m in all
	// NPS 10 sch 40: 0.69 m/s, 0.16 m per 100 m, 2.0 m in all
}
