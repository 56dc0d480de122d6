package calc

import (
	"math"
	"testing"
)

func TestEffAtLineCurvedMpmath(t *testing.T) {
	// Source: by hand, with the root by python3-mpmath 1.2 (Debian). Three
	// readings at 20, 40 and 60 L/s, heads 50, 44, 30 m and pump
	// efficiencies 0.60, 0.72, 0.70: curves the monotone cubic bends, so
	// the crossing is not a line's. The Fritsch–Carlson slopes worked by
	// hand (equal steps h = 0.02 m³/s; the three-point end formula with
	// its limits, as scipy's PchipInterpolator has them):
	//   head: secants −300, −700; inner 2/(1/−300 + 1/−700) = −420; ends
	//     (3·−300 + 700)/2 = −100 and (3·−700 + 300)/2 = −900.
	//   efficiency: secants 6, −1 change sign, so the inner slope is 0;
	//     ends (3·6 + 1)/2 = 9.5 and (3·−1 − 6)/2 = −4.5, which passes
	//     3·|−1| where the secants change sign, so −3.
	// Guarantee 45 L/s, 40 m, 70 %: the line H = (40/0.045)·Q meets the
	// head curve on 40–60 L/s, a cubic Hermite piece, found by
	// mpmath.findroot:
	//
	//	import mpmath as mp; mp.mp.dps = 30
	//	def herm(y0, y1, d0, d1, a, b, q):
	//	    h = b - a; t = (q - a)/h
	//	    return (y0*(2*t**3-3*t**2+1) + h*d0*(t**3-2*t**2+t)
	//	            + y1*(-2*t**3+3*t**2) + h*d1*(t**3-t**2))
	//	a, b = mp.mpf('0.04'), mp.mpf('0.06')
	//	H = lambda q: herm(44, 30, -420, -900, a, b, q)
	//	E = lambda q: herm(mp.mpf('0.72'), mp.mpf('0.70'), 0, -3, a, b, q)
	//	k = mp.mpf(40)/mp.mpf('0.045')
	//	q = mp.findroot(lambda q: H(q) - k*q, mp.mpf('0.045'))
	//	print(q, H(q), E(q))
	//	# 0.0459908932452198144076338181081 40.8807939957509461401189494294
	//	# 0.719462455093694557760368512629
	//
	// (The slopes agree with scipy 1.10's PchipInterpolator.derivative():
	// −100, −420, −900 and 9.5, 0, −3.) Grade 2B (from memory): 0.719 ≥
	// 0.70·0.95 = 0.665, within; the head at 45 L/s, H(0.045) = 41.475 m,
	// lies on the head bar 38–42 m: within.
	pt := exactTest(t, []float64{0.02, 0.04, 0.06}, []float64{50, 44, 30}, []float64{0.60, 0.72, 0.70}, 0)
	if h, _, _ := pt.Head(0.045); math.Abs(h-41.475) > 1e-12 {
		t.Errorf("tested head at 45 L/s %.15g, by hand 41.475", h)
	}
	a := judge2B(t, pt, Guarantee{Q: 0.045, H: 40, Eff: 0.70})
	e := a.Efficiency
	for _, c := range []struct {
		what      string
		got, want float64
	}{
		{"crossing flow", e.Flow, 0.0459908932452198144},
		{"crossing head", e.Head, 40.8807939957509461},
		{"efficiency there", e.Value, 0.719462455093694558},
	} {
		if math.Abs(c.got-c.want) > 1e-12*c.want {
			t.Errorf("%s: %.17g, mpmath %.17g", c.what, c.got, c.want)
		}
	}
	if e.Status != EffRead || e.U != 0 || e.Judgement.Verdict != Within || a.FlowHead != Within || a.Verdict != Within {
		t.Errorf("efficiency %v ± %g (%v), flow and head %v, verdict %v", e.Status, e.U, e.Judgement.Verdict, a.FlowHead, a.Verdict)
	}
}

// judge2B judges pt against gp under grade 2B, failing the test on an
// error.
func judge2B(t *testing.T, pt PumpTest, gp Guarantee) GuaranteeAcceptance {
	t.Helper()
	g, _ := LookupGrade("2B")
	a, err := pt.AcceptGuarantee(gp, g)
	if err != nil {
		t.Fatal(err)
	}
	return a
}
