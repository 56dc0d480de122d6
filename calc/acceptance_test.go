package calc

import (
	"fmt"
	"math"
	"testing"
)

func TestGrades(t *testing.T) {
	// Source: ISO 9906 (2012) tolerance factors, from memory (flow / head
	// / power / efficiency): 1U +10/+6/+10/≥0; 1E ±5/±3/+4/≥0; 1B
	// ±5/±3/+4/−3; 2B ±8/±5/+8/−5; 2U +16/+10/+16/−5; 3B ±9/±7/+9/−7 %.
	want := map[string][6]float64{ // flow low, flow high, head low, head high, power, efficiency
		"1U": {0, 10, 0, 6, 10, 0}, "1E": {-5, 5, -3, 3, 4, 0}, "1B": {-5, 5, -3, 3, 4, -3},
		"2B": {-8, 8, -5, 5, 8, -5}, "2U": {0, 16, 0, 10, 16, -5}, "3B": {-9, 9, -7, 7, 9, -7},
	}
	if len(Grades) != len(want) {
		t.Fatalf("%d grades, want %d", len(Grades), len(want))
	}
	for name, w := range want {
		g, ok := LookupGrade(name)
		if !ok {
			t.Fatalf("no grade %s", name)
		}
		got := [6]float64{g.FlowLow, g.FlowHigh, g.HeadLow, g.HeadHigh, g.PowerHigh, g.EffLow}
		for i := range got {
			if math.Abs(got[i]*100-w[i]) > 1e-9 {
				t.Errorf("%s factor %d: %g %%, want %g %%", name, i, got[i]*100, w[i])
			}
		}
	}
	if _, ok := LookupGrade("4A"); ok {
		t.Error("found grade 4A")
	}
	if g, ok := LookupGrade(" 2b "); !ok || g.Name != "2B" {
		t.Errorf("2b: %+v %v", g, ok)
	}
}

func TestAccept(t *testing.T) {
	// Source: the three outcomes of judging a measured value ± its band
	// against a tolerance (our rule, after the GUM's use of an interval
	// for conformity): within when the whole band is inside, outside when
	// the whole band is outside, else this test cannot tell. Tolerances:
	// ISO 9906 grades from memory (2B: head ±5 %, efficiency −5 %; 1U:
	// head 0 to +6 %, efficiency ≥ 0).
	fc := func(h, eta float64) FieldCheck {
		return FieldCheck{HasCurve: true, CurveHead: 40, Head: h, CurveEfficiency: 0.75,
			PumpEfficiency: eta, HasEffDeviation: eta > 0}
	}
	bands := func(uh, ue float64) FieldBands {
		return FieldBands{Head: Band{U: uh, Terms: []Term{{"pd", uh}}}, Pump: Band{U: ue, Terms: []Term{{"qm", ue}}}}
	}
	for _, tc := range []struct {
		name    string
		grade   string
		fc      FieldCheck
		b       FieldBands
		head    Verdict
		eff     Verdict
		verdict Verdict
		improve string
	}{
		{"on the curve, tight bands", "2B", fc(40, 0.75), bands(0.5, 0.01), Within, Within, Within, ""},
		{"6 % low with a tight band", "2B", fc(37.6, 0.75), bands(0.2, 0.01), Outside, Within, Outside, ""},
		{"head band wider than the tolerance", "2B", fc(40, 0.75), bands(3, 0.01), CannotTell, Within, CannotTell, "pd"},
		{"efficiency straddles its limit", "2B", fc(40, 0.715), bands(0.5, 0.02), Within, CannotTell, CannotTell, "qm"},
		{"efficiency far below", "2B", fc(40, 0.6), bands(0.5, 0.02), Within, Outside, Outside, ""},
		{"one-sided grade: below the guarantee is outside", "1U", fc(39, 0.8), bands(0.2, 0.01), Outside, Within, Outside, ""},
		{"one-sided grade: a band at the guarantee cannot tell", "1U", fc(40.5, 0.8), bands(1, 0.01), CannotTell, Within, CannotTell, "pd"},
		{"no pump efficiency: head alone", "3B", fc(41, 0), bands(0.5, 0), Within, VerdictNone, Within, ""},
	} {
		t.Run(tc.name, func(t *testing.T) {
			g, _ := LookupGrade(tc.grade)
			a, ok := Accept(tc.fc, tc.b, g)
			if !ok {
				t.Fatal("not judged")
			}
			if a.Head.Verdict != tc.head || a.Efficiency.Verdict != tc.eff || a.Verdict != tc.verdict || a.Improve != tc.improve {
				t.Errorf("head %v, efficiency %v, verdict %v, improve %q; want %v, %v, %v, %q",
					a.Head.Verdict, a.Efficiency.Verdict, a.Verdict, a.Improve, tc.head, tc.eff, tc.verdict, tc.improve)
			}
		})
	}
	if _, ok := Accept(FieldCheck{Head: 40}, FieldBands{}, Grades[0]); ok {
		t.Error("judged without a data sheet")
	}
}

func ExampleAccept() {
	g, _ := LookupGrade("2B")
	fc := FieldCheck{HasCurve: true, CurveHead: 40, Head: 38.5}
	a, _ := Accept(fc, FieldBands{Head: Band{U: 1.4, Terms: []Term{{"pd", 1.2}, {"ps", 0.7}}}}, g)
	fmt.Printf("%s: %v (head allowed %.0f to %.0f m); improve %s\n", g.Name, a.Verdict, a.Head.Low, a.Head.High, a.Improve)
	// Output:
	// 2B: cannot tell (head allowed 38 to 42 m); improve pd
}
