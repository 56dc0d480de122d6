package scenario

import (
	"math"
	"slices"
	"strconv"
	"strings"
	"testing"

	"fieldhead/calc"
)

// TestOneReadingLinksUnchanged: a sheet of one reading reads as it always
// has: no test at several points, no guarantee verdict, and a decimal comma
// in the flow still a decimal comma (the reason the readings are numbered
// parameters, not lists in qm).
func TestOneReadingLinksUnchanged(t *testing.T) {
	for _, q := range []string{
		Demo().Encode(),
		Demo().Encode() + "&grade=2B&uqm=2%",
		"liq=water&t=18C&ps=-18kPa&pd=430kPa&zs=0m&zd=0.8m&ds=202.7mm&dd=154.1mm&qm=41,5L/s&pin=31kW",
	} {
		s, err := Parse(q)
		if err != nil {
			t.Fatalf("%s: %v", q, err)
		}
		r := Evaluate(Read(s))
		if r.Field == nil || r.Test != nil || r.Guarantee != nil {
			t.Errorf("%s: field %v, test %v, guarantee %v; want the field check alone", q, r.Field != nil, r.Test != nil, r.Guarantee != nil)
		}
		if g := r.Inputs.ReadingsGiven(); !slices.Equal(g, []int{1}) {
			t.Errorf("%s: readings %v, want [1]", q, g)
		}
	}
	s, _ := Parse("liq=water&t=18C&qm=41,5L/s")
	in := Read(s)
	if got := in.Num("qm"); math.Abs(got-0.0415) > 1e-12 {
		t.Errorf("qm=41,5L/s reads %v m³/s, want 0.0415 (decimal comma)", got)
	}
}

// TestReadingParams: every reading's parameter is in the vocabulary, in
// link order after the field check's, and names its reading.
func TestReadingParams(t *testing.T) {
	for k := 1; k <= calc.TestMaxReadings; k++ {
		for _, f := range readingFields {
			p := ReadingParam(f, k)
			if !isKnown(p) {
				t.Errorf("%s: not a parameter", p)
			}
			if gf, gk := ReadingOf(p); gf != f || gk != k {
				t.Errorf("ReadingOf(%s) = %s, %d", p, gf, gk)
			}
			// The table writes each reading's row out; it takes the
			// first reading's quantity and units and names its number.
			r, _, _ := Lookup(p)
			first, _, _ := Lookup(f)
			n := strconv.Itoa(k)
			if k > 1 && (r.Kind != first.Kind || r.Dim != first.Dim || r.SI != first.SI || r.US != first.US ||
				!strings.HasSuffix(r.Label, ", reading "+n) || !strings.HasSuffix(r.Missing, " of reading "+n) ||
				r.Box == "" || r.Group != "" || r.Segment) {
				t.Errorf("%s: row %+v does not match reading 1's %+v", p, r, first)
			}
		}
	}
	for _, p := range []string{"qm9", "ps1", "pd0", "pinx", "q", "p2"} {
		if _, k := ReadingOf(p); k != 0 {
			t.Errorf("ReadingOf(%s) = reading %d, want none", p, k)
		}
	}
}

// TestPumpTestDemo: the five readings come back by rising flow with their
// numbers on the sheet; reading 2's head by hand; the guarantee point by
// the duty flow is the data sheet's there.
func TestPumpTestDemo(t *testing.T) {
	s, err := Parse(PumpTestDemo().Encode())
	if err != nil {
		t.Fatal(err)
	}
	r := Evaluate(Read(s))
	if r.Test == nil {
		t.Fatalf("no test; errors %v", r.Errors)
	}
	if want := []int{2, 3, 1, 4, 5}; !slices.Equal(r.Test.Reading, want) {
		t.Errorf("readings by rising flow %v, want %v", r.Test.Reading, want)
	}
	// Reading 2 by hand: ρ = 998.597 kg/m³ (python3-iapws, IAPWS97 at
	// 18 °C and 0.101325 MPa), g = 9.80665 m/s² (standard gravity, NIST
	// SP 811). Δp = 548 − (−12) = 560 kPa → 57.183 m; Δz = 0.8 m;
	// velocity head: Q = 0.020 m³/s in 154.1 mm (v = 1.07235 m/s) and
	// 202.7 mm (v = 0.61977 m/s): (1.07235² − 0.61977²)/(2g) = 0.03905 m.
	// H = 57.183 + 0.8 + 0.039 = 58.022 m.
	rho, g := 998.5972667497481, 9.80665
	vd := 0.020 / (math.Pi / 4 * 0.1541 * 0.1541)
	vs := 0.020 / (math.Pi / 4 * 0.2027 * 0.2027)
	want := 560e3/(rho*g) + 0.8 + (vd*vd-vs*vs)/(2*g)
	if got := r.Test.Points[0].Check.Head; math.Abs(got-want) > 2e-3 {
		t.Errorf("reading 2 head %.4f m, want %.4f m by hand", got, want)
	}
	gr := r.Guarantee
	if gr == nil {
		t.Fatal("no guarantee verdict")
	}
	// The data sheet at the duty flow, 45 L/s: scipy's PchipInterpolator
	// (python3-scipy) through (0, 62), (20, 59), (40, 52), (55, 44), (70,
	// 33) gives 49.66350742757276 m, and through the efficiencies 0, 52,
	// 71, 76, 72 % gives 73.36844462358368 %.
	if gr.FlowFrom != FromDuty || gr.HeadFrom != FromSheet || gr.EffFrom != FromSheet {
		t.Errorf("sources %v %v %v, want duty, sheet, sheet", gr.FlowFrom, gr.HeadFrom, gr.EffFrom)
	}
	if math.Abs(gr.Guarantee.Q-0.045) > 1e-12 || math.Abs(gr.Guarantee.H-49.66350742757276) > 1e-9 || math.Abs(gr.Guarantee.Eff-0.7336844462358368) > 1e-9 {
		t.Errorf("guarantee %+v", gr.Guarantee)
	}
	// Grade 2B (±8 % flow, ±5 % head, from memory): the tested curve runs
	// about 5 m below the data sheet across the flow bar, under the head
	// bar's foot (47.18 m): outside.
	if gr.FlowHead != calc.Outside || gr.Verdict != calc.Outside || gr.Basis != calc.CrossCurve {
		t.Errorf("verdict %v (flow and head %v, basis %v), want outside on the curve", gr.Verdict, gr.FlowHead, gr.Basis)
	}
}

// TestReadingErrorsNamed: a reading's problem is reported under that
// reading's own box.
func TestReadingErrorsNamed(t *testing.T) {
	base := Demo().Encode() + "&qm2=20L/s&pd2=548kPa&qm3=30L/s&ps3=-14kPa&pd3=508kPa"
	s, _ := Parse(base)
	r := Evaluate(Read(s))
	if fe := r.Errors["ps2"]; fe == nil || fe.Kind != calc.Missing {
		t.Errorf("ps2 missing: errors %v", r.Errors)
	}
	if r.Test != nil || r.Field == nil {
		t.Errorf("test %v, field %v: want the field check alone", r.Test != nil, r.Field != nil)
	}
	s, _ = Parse(Demo().Encode() + "&qm2=30L/s&ps2=-12kPa&pd2=548kPa&qm3=30L/s&ps3=-14kPa&pd3=508kPa")
	r = Evaluate(Read(s))
	fe := r.Errors["qm3"]
	if fe == nil || fe.Reason != calc.ReasonFlowTwice || len(fe.Figures) == 0 || fe.Figures[0].Value != 2 {
		t.Errorf("a flow twice: errors %v, want qm3 naming reading 2", r.Errors)
	}
	s, _ = Parse(Demo().Encode() + "&ps2=415Pa&qm2=30L/s&pd2=500kPa")
	if !Slippable(Read(s).Problems["ps2"]) {
		t.Error("415 Pa on reading 2's suction gauge is not caught as a slip")
	}
}

// TestDraftReadings: a reading added shows empty boxes; one removed moves
// the later readings up, with their values.
func TestDraftReadings(t *testing.T) {
	d := NewDraft(PumpTestDemo())
	if n := d.ShownReadings(); n != 5 {
		t.Fatalf("%d readings shown, want 5", n)
	}
	d.AddReading()
	if n := d.ShownReadings(); n != 6 || d.Scen.Has("qm6") {
		t.Errorf("after AddReading: %d shown, qm6 %q", n, d.Scen.Get("qm6"))
	}
	d.RemoveReading(3)
	if got := d.Scen.Get("qm3"); got != "50L/s" || d.Scen.Has("qm5") || d.ShownReadings() != 5 {
		t.Errorf("after removing reading 3: qm3 %q, qm5 %q, %d shown", got, d.Scen.Get("qm5"), d.ShownReadings())
	}
	d.RemoveReading(1) // the field check's own: not removed
	if !d.Scen.Has("qm") {
		t.Error("reading 1 removed")
	}
}
