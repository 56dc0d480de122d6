package calc

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"
)

func TestSurgeAgainstMpmath(t *testing.T) {
	// Source: Korteweg's wave speed in the form of Wylie & Streeter (1993),
	// the round trip 2L/a and Joukowsky's rise ρ·a·Δv, re-computed at 40
	// digits in python3-mpmath (testdata/refs/gen/gen_surge.py →
	// testdata/refs/surge.tsv).
	rows := wtReadTSV(t, "../testdata/refs/surge.tsv")
	if len(rows) < 7 {
		t.Fatalf("read %d rows from surge.tsv, want 7", len(rows))
	}
	for _, r := range rows {
		n := func(c string) float64 { return wtNum(t, r[c]) }
		a, err := WaveSpeed(n("k_Pa"), n("rho"), n("d_m"), n("e_m"), n("E_Pa"), n("c"))
		if err != nil {
			t.Fatalf("%s: %v", r["name"], err)
		}
		s := Surge{Density: n("rho"), BulkModulus: n("k_Pa"), ClosureTime: 1e-3,
			Pipes: []SurgePipe{{Length: n("L_m"), Diameter: n("d_m"), Wall: n("e_m"), Modulus: n("E_Pa"), Restraint: n("c"), Velocity: n("dv")}}}
		res, err := s.Evaluate()
		if err != nil {
			t.Fatalf("%s: %v", r["name"], err)
		}
		for _, c := range []struct {
			name      string
			got, want float64
		}{
			{"a (WaveSpeed)", a, n("a")}, {"a", res.WaveSpeed, n("a")}, {"2L/a", res.Period, n("period")},
			{"Δp", res.DeltaP, n("dp")}, {"Δh", res.DeltaH, n("dh")},
		} {
			if e := wtRelErr(c.got, c.want); e > 1e-13 {
				t.Errorf("%s %s: %.17g, mpmath %.17g (rel %.2g)", r["name"], c.name, c.got, c.want, e)
			}
		}
	}
}

func TestLiquidBulkModulusAgainstLibraries(t *testing.T) {
	// Sources: python3-iapws (IAPWS-IF97 region 1, K_s = ρ·w²) and
	// python3-gsw (TEOS-10 sound speed of seawater at SA 35 g/kg), in
	// testdata/refs/surge_liquids.tsv by gen_surge.py.
	rows := wtReadTSV(t, "../testdata/refs/surge_liquids.tsv")
	nw, ns := 0, 0
	for _, r := range rows {
		tK, p, want := wtNum(t, r["t_K"]), wtNum(t, r["p_Pa"]), wtNum(t, r["value"])
		switch r["kind"] {
		case "water_ks":
			got, err := WaterBulkModulus(tK, p)
			if err != nil {
				t.Fatalf("T %g p %g: %v", tK, p, err)
			}
			// The same formulation in double precision.
			if e := wtRelErr(got, want); e > 1e-12 {
				t.Errorf("water K_s at %g K, %g Pa: %.17g, python3-iapws %.17g (rel %.2g)", tK, p, got, want, e)
			}
			nw++
		case "seawater_c":
			// Mackenzie (1981) at the practical salinity that 35 g/kg
			// stands for, against TEOS-10: within 0.5 m/s (0.035 %) over
			// 0–40 °C, beyond Mackenzie's own 2–30 °C.
			got := mackenzieSoundSpeed(tK-273.15, SeawaterSalinity*1000*35/35.16504)
			if d := math.Abs(got - want); d > 0.5 {
				t.Errorf("seawater c at %g K: Mackenzie %.4f, python3-gsw %.4f (|Δ| %.3f m/s)", tK, got, want, d)
			}
			k, err := SeawaterBulkModulus(tK, p)
			if err != nil {
				t.Fatal(err)
			}
			f, _ := Seawater(tK, p)
			if e := wtRelErr(k, f.Density*want*want); e > 8e-4 {
				t.Errorf("seawater K_s at %g K: %.6g, ρ·c²(gsw) %.6g (rel %.2g)", tK, k, f.Density*want*want, e)
			}
			ns++
		}
	}
	if nw < 20 || ns < 6 {
		t.Fatalf("read %d water and %d seawater rows", nw, ns)
	}
}

func TestSurgeBadInputs(t *testing.T) {
	// Source: the domain of Korteweg's and Joukowsky's formulas — positive
	// moduli, density, closure time and velocity; a wall thinner than half
	// the bore (else there is no pipe).
	nan := math.NaN()
	pipe := SurgePipe{Length: 100, Diameter: 0.2, Wall: 0.008, Modulus: 207e9, Velocity: 1.5}
	good := Surge{Density: 998, BulkModulus: 2.2e9, ClosureTime: 0.5, Pipes: []SurgePipe{pipe}}
	with := func(f func(*Surge)) Surge {
		s := good
		s.Pipes = append([]SurgePipe(nil), good.Pipes...)
		f(&s)
		return s
	}
	cases := []struct {
		name  string
		s     Surge
		field string
	}{
		{"closure time 0", with(func(s *Surge) { s.ClosureTime = 0 }), "tc"},
		{"closure time negative", with(func(s *Surge) { s.ClosureTime = -1 }), "tc"},
		{"closure time NaN", with(func(s *Surge) { s.ClosureTime = nan }), "tc"},
		{"wall 0", with(func(s *Surge) { s.Pipes[0].Wall = 0 }), "wall"},
		{"wall negative", with(func(s *Surge) { s.Pipes[0].Wall = -0.001 }), "wall"},
		{"wall half the bore", with(func(s *Surge) { s.Pipes[0].Wall = 0.1 }), "wall"},
		{"wall over half the bore", with(func(s *Surge) { s.Pipes[0].Wall = 0.15 }), "wall"},
		{"wall NaN", with(func(s *Surge) { s.Pipes[0].Wall = nan }), "wall"},
		{"modulus 0", with(func(s *Surge) { s.Pipes[0].Modulus = 0 }), "epipe"},
		{"modulus negative", with(func(s *Surge) { s.Pipes[0].Modulus = -1e9 }), "epipe"},
		{"modulus NaN", with(func(s *Surge) { s.Pipes[0].Modulus = nan }), "epipe"},
		{"bulk modulus 0", with(func(s *Surge) { s.BulkModulus = 0 }), "kliq"},
		{"bulk modulus negative", with(func(s *Surge) { s.BulkModulus = -2e9 }), "kliq"},
		{"density 0", with(func(s *Surge) { s.Density = 0 }), "rho"},
		{"restraint 0 is 1, but negative is refused", with(func(s *Surge) { s.Pipes[0].Restraint = -1 }), "cr"},
		{"restraint above 2", with(func(s *Surge) { s.Pipes[0].Restraint = 3 }), "cr"},
		{"velocity change negative", with(func(s *Surge) { s.DeltaV = -1 }), "dv"},
		{"no flow to stop", with(func(s *Surge) { s.Pipes[0].Velocity = 0 }), "dv"},
		{"diameter 0", with(func(s *Surge) { s.Pipes[0].Diameter = 0 }), "d"},
		{"no pipes", with(func(s *Surge) { s.Pipes = nil }), "q"},
		{"negative length", with(func(s *Surge) { s.Pipes[0].Length = -1 }), "length"},
		{"a rise beyond any number", with(func(s *Surge) { s.DeltaV = 1e306 }), "dv"},
		// c·K·D/(E·e) overflows float64 (IEEE 754: above about 1.8e308), so
		// the wave speed is 0; with no length 2L/a was 0/0 (found by
		// FuzzScenario: wall=1e-309mm, s1.l=0).
		{"a wall too thin for any wave speed", with(func(s *Surge) { s.Pipes[0].Wall = 1e-312; s.Pipes[0].Length = 0 }), "wall"},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, err := c.s.Evaluate()
			var fe *FieldError
			if !errors.As(err, &fe) {
				t.Fatalf("error %v, want a *FieldError for %q", err, c.field)
			}
			if fe.Field != c.field {
				t.Errorf("field %q (%v), want %q", fe.Field, err, c.field)
			}
			if strings.Contains(err.Error(), "NaN") {
				t.Errorf("message quotes NaN: %v", err)
			}
		})
	}
	if _, err := WaveSpeed(2.2e9, 998, 0.2, 0.1, 207e9, 1); err == nil {
		t.Error("WaveSpeed took a wall of half the bore")
	}
	if a, err := WaveSpeed(2.2e9, 998, 0.2, 1e-312, 207e9, 1); err == nil {
		t.Errorf("WaveSpeed of a wall of 1e-312 m: %g, want an error", a)
	}
	if _, err := WaveSpeed(0, 998, 0.2, 0.008, 207e9, 1); err == nil {
		t.Error("WaveSpeed took a bulk modulus of 0")
	}
	// A later pipe's error names its segment.
	s := with(func(s *Surge) {
		s.Pipes = append(s.Pipes, SurgePipe{Length: 10, Diameter: 0.1, Wall: 0.06, Modulus: 1e9})
	})
	_, err := s.Evaluate()
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Field != "wall" || fe.Segment != 2 {
		t.Errorf("second pipe's bad wall: %v (%+v)", err, fe)
	}
}

func TestSurgeSlowClosureAndColumn(t *testing.T) {
	// Source: Joukowsky's rise holds for a closure within 2L/a; a slower
	// one is warned about as an upper bound (Wylie & Streeter 1993). The
	// low swing static − Δp at or below the vapour pressure flags a parted
	// column (common practice).
	pipe := SurgePipe{Length: 1000, Diameter: 0.2, Wall: 0.008, Modulus: 207e9, Velocity: 2}
	s := Surge{Density: 998, BulkModulus: 2.2e9, ClosureTime: 0.5, Pipes: []SurgePipe{pipe},
		Static: 101325 + 200e3, VapourPressure: 2339}
	fast, err := s.Evaluate()
	if err != nil {
		t.Fatal(err)
	}
	if !fast.Fast || len(fast.Warnings) == 0 || !fast.ColumnParts {
		t.Errorf("0.5 s over %v s: fast %v, column parts %v, warnings %v", fast.Period, fast.Fast, fast.ColumnParts, fast.Warnings)
	}
	if got, want := fast.Peak, s.Static+fast.DeltaP; got != want {
		t.Errorf("peak %g, want static + Δp %g", got, want)
	}
	s.ClosureTime = 2 * fast.Period
	slow, err := s.Evaluate()
	if err != nil {
		t.Fatal(err)
	}
	if slow.Fast || slow.DeltaP != fast.DeltaP {
		t.Errorf("slow closure: fast %v, Δp %g (the upper bound stays %g)", slow.Fast, slow.DeltaP, fast.DeltaP)
	}
	found := false
	for _, w := range slow.Warnings {
		found = found || (w.Field == "tc" && w.Code == CautionSurgeSlow && len(w.Figures) == 3 && w.Figures[0] == Fig(s.ClosureTime, Duration) &&
			w.Figures[1] == Fig(slow.Period, Duration) && w.Figures[2] == Fig(slow.DeltaP, Pressure))
	}
	if !found {
		t.Errorf("no upper-bound warning for a slow closure: %v", slow.Warnings)
	}
	// Two pipes in series: the round trip adds up, the rise is the valve pipe's.
	s.ClosureTime = 0.1
	s.Pipes = []SurgePipe{{Length: 500, Diameter: 0.3, Wall: 0.01, Modulus: 207e9, Velocity: 2 * (0.2 * 0.2) / (0.3 * 0.3)}, pipe}
	two, err := s.Evaluate()
	if err != nil {
		t.Fatal(err)
	}
	a1 := waveSpeed(2.2e9, 998, 0.3, 0.01, 207e9, 1)
	if e := wtRelErr(two.Period, 2*500/a1+fast.Period); e > 1e-14 {
		t.Errorf("series round trip %g, want %g", two.Period, 2*500/a1+fast.Period)
	}
	if two.DeltaP != fast.DeltaP {
		t.Errorf("series Δp %g, want the valve pipe's %g", two.DeltaP, fast.DeltaP)
	}
}

func TestMaterialModuli(t *testing.T) {
	// Source: every material has an elastic modulus, marked from memory
	// (no reference library here tabulates them), within the handbook
	// ranges its source names (plastics 0.5–5 GPa, metals 50–250 GPa).
	for _, m := range MaterialTable() {
		if !(m.Modulus > 0.5e9 && m.Modulus < 250e9) {
			t.Errorf("%s: modulus %g Pa", m.Key, m.Modulus)
		}
		if !strings.Contains(m.ModulusSource, "from memory") {
			t.Errorf("%s: modulus source %q does not say from memory", m.Key, m.ModulusSource)
		}
	}
}

func ExampleSurge_Evaluate() {
	// A small-hydro penstock (invented): 450 m of 500 mm steel with an 8 mm
	// wall, 0.55 m³/s of water at 10 °C; the inlet valve shuts in 0.6 s.
	k, _ := WaterBulkModulus(283.15, 96e3)
	w, _ := Water(283.15, 96e3)
	v := 0.55 / (math.Pi * 0.5 * 0.5 / 4)
	r, _ := Surge{Density: w.Density, BulkModulus: k, ClosureTime: 0.6,
		Pipes: []SurgePipe{{Length: 450, Diameter: 0.5, Wall: 0.008, Modulus: 207e9, Velocity: v}}}.Evaluate()
	fmt.Printf("a %.0f m/s, 2L/a %.2f s, fast %v, rise %.0f m (%.1f MPa)\n", r.WaveSpeed, r.Period, r.Fast, r.DeltaH, r.DeltaP/1e6)
	// Output: a 1133 m/s, 2L/a 0.79 s, fast true, rise 324 m (3.2 MPa)
}

func BenchmarkSurge(b *testing.B) {
	s := Surge{Density: 998, BulkModulus: 2.2e9, ClosureTime: 0.5,
		Pipes: []SurgePipe{{Length: 640, Diameter: 0.2027, Wall: 0.00818, Modulus: 207e9, Velocity: 1.4}}}
	for i := 0; i < b.N; i++ {
		if _, err := s.Evaluate(); err != nil {
			b.Fatal(err)
		}
	}
}
