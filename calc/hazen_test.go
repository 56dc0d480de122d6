package calc

import (
	"errors"
	"math"
	"testing"
)

func TestHazenWilliamsForms(t *testing.T) {
	// The SI form h = 10.67·L·Q^1.852/(C^1.852·D^4.8704) against two other
	// published forms of Hazen–Williams (both from memory): the velocity
	// form V = 0.849·C·R^0.63·S^0.54 (SI, R = D/4) and the US form
	// h = 4.73·L·Q^1.852/(C^1.852·D^4.87) (ft, ft³/s). They differ only by
	// the rounding of their coefficients: allow 0.5 %.
	const ft = 0.3048 // m, exact (NIST SP 811, 2008)
	for _, c := range []struct{ q, d, l, chw float64 }{
		{0.1, 0.3, 1000, 120}, {0.045, 0.2027, 640, 130}, {0.002, 0.05, 50, 150}, {1.5, 1.2, 5000, 100},
	} {
		h, err := HazenWilliamsHeadLoss(c.q, c.d, c.l, c.chw)
		if err != nil {
			t.Fatal(err)
		}
		v := c.q / (math.Pi * c.d * c.d / 4)
		s := math.Pow(v/(0.849*c.chw*math.Pow(c.d/4, 0.63)), 1/0.54)
		if hv := s * c.l; math.Abs(h/hv-1) > 0.005 {
			t.Errorf("%+v: SI form %.5g m, velocity form %.5g m", c, h, hv)
		}
		hus := 4.73 * (c.l / ft) * math.Pow(c.q/(ft*ft*ft), 1.852) / (math.Pow(c.chw, 1.852) * math.Pow(c.d/ft, 4.87)) * ft
		if math.Abs(h/hus-1) > 0.005 {
			t.Errorf("%+v: SI form %.5g m, US form %.5g m", c, h, hus)
		}
	}
}

func TestHazenWilliamsScaling(t *testing.T) {
	// Hazen–Williams: h ∝ L, h ∝ Q^1.852, h ∝ C^−1.852, h ∝ D^−4.8704.
	h0, _ := HazenWilliamsHeadLoss(0.05, 0.2, 100, 120)
	checks := []struct {
		name  string
		q, d  float64
		l, c  float64
		ratio float64
	}{
		{"length ×2", 0.05, 0.2, 200, 120, 2},
		{"flow ×2", 0.1, 0.2, 100, 120, math.Pow(2, 1.852)},
		{"C ×1.25", 0.05, 0.2, 100, 150, math.Pow(1.25, -1.852)},
		{"diameter ×2", 0.05, 0.4, 100, 120, math.Pow(2, -4.8704)},
	}
	for _, c := range checks {
		h, err := HazenWilliamsHeadLoss(c.q, c.d, c.l, c.c)
		if err != nil || math.Abs(h/h0/c.ratio-1) > 1e-12 {
			t.Errorf("%s: ratio %.15g, want %.15g (%v)", c.name, h/h0, c.ratio, err)
		}
	}
	// No flow or no length: no loss.
	for _, c := range [][2]float64{{0, 100}, {0.05, 0}} {
		if h, err := HazenWilliamsHeadLoss(c[0], 0.2, c[1], 120); err != nil || h != 0 {
			t.Errorf("HazenWilliamsHeadLoss(q=%g, L=%g) = %g, %v; want 0", c[0], c[1], h, err)
		}
	}
}

func TestHazenWilliamsValidation(t *testing.T) {
	nan := math.NaN()
	cases := []struct {
		q, d, l, c float64
		field      string
	}{
		{-0.01, 0.2, 100, 120, "q"}, {nan, 0.2, 100, 120, "q"}, {math.Inf(1), 0.2, 100, 120, "q"},
		{0.05, 0, 100, 120, "d"}, {0.05, -0.2, 100, 120, "d"}, {0.05, nan, 100, 120, "d"},
		{0.05, 0.2, -1, 120, "length"}, {0.05, 0.2, nan, 120, "length"},
		{0.05, 0.2, 100, 0, "chw"}, {0.05, 0.2, 100, 39, "chw"}, {0.05, 0.2, 100, 161, "chw"}, {0.05, 0.2, 100, nan, "chw"},
	}
	for _, c := range cases {
		var fe *FieldError
		if h, err := HazenWilliamsHeadLoss(c.q, c.d, c.l, c.c); !errors.As(err, &fe) || fe.Field != c.field {
			t.Errorf("HazenWilliamsHeadLoss(%g, %g, %g, %g) = %g, %v; want *FieldError for %q", c.q, c.d, c.l, c.c, h, err, c.field)
		}
	}
}
