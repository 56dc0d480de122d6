package chart

import (
	"math"
	"slices"
	"testing"
)

// isNiceStep reports whether d is 1, 2 or 5 × 10^k.
func isNiceStep(d float64) bool {
	if !(d > 0) {
		return false
	}
	e := math.Floor(math.Log10(d))
	m := d / math.Pow(10, e)
	for _, n := range []float64{1, 2, 5, 10} {
		if math.Abs(m-n) < 1e-9*n {
			return true
		}
	}
	return false
}

func TestNiceNum(t *testing.T) {
	// Heckbert (1990) nice-number rule, recalled from memory; values worked by hand.
	cases := []struct {
		x     float64
		round bool
		want  float64
	}{
		{62, false, 100},      // 6.2 > 5 → 10 × 10¹
		{25, true, 20},        // 2.5 < 3 → 2 × 10¹
		{0.0034, true, 0.005}, // 3.4 < 7 → 5 × 10⁻³
		{1.4, true, 1},        // 1.4 < 1.5 → 1
		{7.5, true, 10},       // ≥ 7 → 10
		{2, false, 2},         // exactly 2 stays 2
		{2.01, false, 5},      // just over 2 → 5
		{4.5e9, false, 5e9},   // large magnitude
	}
	for _, c := range cases {
		if got := niceNum(c.x, c.round); math.Abs(got-c.want) > 1e-12*c.want {
			t.Errorf("niceNum(%v, %v) = %v, want %v", c.x, c.round, got, c.want)
		}
	}
	for _, bad := range []float64{0, -1, math.NaN(), math.Inf(1)} {
		if got := niceNum(bad, true); got != 0 {
			t.Errorf("niceNum(%v) = %v, want 0", bad, got)
		}
	}
}

func TestNiceScaleProperties(t *testing.T) {
	// Properties of Heckbert (1990) loose labeling, from memory: the step is 1, 2 or 5 × 10^k,
	// the ticks are whole multiples of it, evenly spaced, and cover the data.
	cases := []struct {
		lo, hi float64
		n      int
	}{
		{0, 62, 5}, {0, 62, 8}, {0, 1, 5}, {-3.7, 12.2, 6}, {212, 251, 6}, {0.0013, 0.0071, 4},
		{-1e9, 3e9, 5}, {1e-12, 9e-12, 7}, {98.6, 98.7, 5}, {-250, -10, 3}, {0, 62, 2}, {0, 640, 9},
	}
	for _, c := range cases {
		s := niceScale(c.lo, c.hi, false, false, c.n)
		if !isNiceStep(s.step) {
			t.Errorf("[%v,%v] n=%d: step %v is not 1-2-5", c.lo, c.hi, c.n, s.step)
			continue
		}
		if len(s.ticks) < 2 || len(s.ticks) > 2*c.n+2 {
			t.Errorf("[%v,%v] n=%d: %d ticks", c.lo, c.hi, c.n, len(s.ticks))
		}
		if tol := 1e-9 * s.step; s.ticks[0] > c.lo+tol || s.ticks[len(s.ticks)-1] < c.hi-tol {
			t.Errorf("[%v,%v]: ticks %v do not cover the data", c.lo, c.hi, s.ticks)
		}
		if s.lo != s.ticks[0] || s.hi != s.ticks[len(s.ticks)-1] {
			t.Errorf("[%v,%v]: loose limits %v..%v are not the end ticks %v", c.lo, c.hi, s.lo, s.hi, s.ticks)
		}
		for i, tk := range s.ticks {
			k := tk / s.step
			if math.Abs(k-math.Round(k)) > 1e-6 {
				t.Errorf("[%v,%v]: tick %v not a multiple of %v", c.lo, c.hi, tk, s.step)
			}
			if i > 0 {
				if d := tk - s.ticks[i-1]; math.Abs(d-s.step) > 1e-6*s.step {
					t.Errorf("[%v,%v]: uneven spacing %v vs step %v", c.lo, c.hi, d, s.step)
				}
			}
		}
		// Loose but not wasteful: at most one step of slack at each end.
		if c.lo-s.lo >= s.step || s.hi-c.hi >= s.step {
			t.Errorf("[%v,%v]: limits %v..%v overshoot by a whole step %v", c.lo, c.hi, s.lo, s.hi, s.step)
		}
	}
	// Range 0–62 with 5 ticks, by hand: 62/4 = 15.5 rounds to the nice step 20 (0, 20, …, 80);
	// with 8 ticks wanted, 62/7 ≈ 8.9 rounds to 10 (0, 10, …, 70). Heckbert (1990) rule, from memory.
	if s := niceScale(0, 62, false, false, 5); s.step != 20 || s.hi != 80 {
		t.Errorf("0–62, 5 ticks: step %v, top %v; want 20, 80", s.step, s.hi)
	}
	if s := niceScale(0, 62, false, false, 8); s.step != 10 || s.hi != 70 {
		t.Errorf("0–62, 8 ticks: step %v, top %v; want 10, 70", s.step, s.hi)
	}
}

func TestNiceScaleFixedEnds(t *testing.T) {
	// A fixed end is kept exactly; ticks stay inside the limits (design rule of this package).
	s := niceScale(0, 62, true, true, 5)
	if s.lo != 0 || s.hi != 62 {
		t.Fatalf("fixed limits moved: %v..%v", s.lo, s.hi)
	}
	for _, tk := range s.ticks {
		if tk < 0 || tk > 62 {
			t.Errorf("tick %v outside fixed limits", tk)
		}
	}
	if s := niceScale(0, 62, true, false, 5); s.lo != 0 || s.hi != 80 {
		t.Errorf("fixed low end: %v..%v, want 0..80", s.lo, s.hi)
	}
}

func TestLimits(t *testing.T) {
	// Flat and empty data open a window instead of dividing by zero (design rule of this package).
	cases := []struct {
		name     string
		e        extent
		min, max *float64
	}{
		{"empty", extent{}, nil, nil},
		{"flat", extent{lo: 5, hi: 5, n: 3}, nil, nil},
		{"flat zero", extent{lo: 0, hi: 0, n: 1}, nil, nil},
		{"fixed equal", extent{lo: 1, hi: 2, n: 2}, Fix(3), Fix(3)},
		{"fixed min above data", extent{lo: -5, hi: -1, n: 2}, Fix(0), nil},
		{"tiny", extent{lo: 1e-320, hi: 1e-320, n: 1}, nil, nil},
	}
	for _, c := range cases {
		lo, hi, _, _ := limits(c.e, c.min, c.max)
		if !(hi > lo) || !finite(lo) || !finite(hi) {
			t.Errorf("%s: limits %v..%v", c.name, lo, hi)
		}
	}
}

func TestTickLabel(t *testing.T) {
	// Formatting rules of this package: decimals from the step (Heckbert 1990, from memory),
	// a true minus sign U+2212 and m×10ⁿ beyond 10⁶ (common typographic practice).
	cases := []struct {
		v, step, big float64
		want         string
	}{
		{20, 10, 80, "20"},
		{2.5, 0.5, 10, "2.5"},
		{0.3, 0.1, 1, "0.3"},
		{-40, 20, 80, "−40"},
		{0, 0.2, 1, "0"},
		{212, 2, 251, "212"},
		{2e6, 1e6, 5e6, "2×10⁶"},
		{1e6, 1e6, 5e6, "10⁶"},
		{1.2e6, 2e5, 2e6, "1.2×10⁶"},
		{-5e-4, 1e-4, 1e-3 / 2, "−5×10⁻⁴"},
		{0.0015, 0.0005, 0.002, "0.0015"},
		{7.5, 2.5, 10, "7.5"},
		{0.75, 0.25, 1, "0.75"},
		{1250, 250, 1250, "1250"},
	}
	for _, c := range cases {
		if got := tickLabel(c.v, c.step, c.big); got != c.want {
			t.Errorf("tickLabel(%v, %v, %v) = %q, want %q", c.v, c.step, c.big, got, c.want)
		}
	}
}

func TestAppendNum(t *testing.T) {
	// Coordinates are rounded to 0.1 px with no "-0" (format rule of this package).
	cases := map[float64]string{0: "0", -0.01: "0", 12.34: "12.3", -12.36: "-12.4", 7: "7", 0.05: "0.1", -0.5: "-0.5", 1e16: "10000000000000000"}
	for v, want := range cases {
		if got := string(appendNum(nil, v)); got != want {
			t.Errorf("appendNum(%v) = %q, want %q", v, got, want)
		}
	}
}

func TestAtLeast(t *testing.T) {
	// An automatic axis spans at least YSpan about its data's middle, moves
	// only its free ends, and does not go below 0 when its data do not
	// (design rule of this package: a history's strip of 65–71 % with a
	// span of 10 points is 63–73, of 70.9–71.0 % is 65.95–75.95).
	cases := []struct {
		name         string
		lo, hi, span float64
		fixLo, fixHi bool
		wantLo       float64
		wantHi       float64
	}{
		{"no span", 70.9, 71, 0, false, false, 70.9, 71},
		{"wide enough", 40, 71, 10, false, false, 40, 71},
		{"about the middle", 65, 71, 10, false, false, 63, 73},
		{"close readings", 70.9, 71, 10, false, false, 65.95, 75.95},
		{"not below zero", 0.20, 0.21, 0.5, false, false, 0, 0.5},
		{"negative data may", -1, 1, 4, false, false, -2, 2},
		{"fixed low end", 0, 2, 10, true, false, 0, 10},
		{"fixed high end", 95, 100, 10, false, true, 90, 100},
		{"both fixed", 1, 2, 10, true, true, 1, 2},
		{"not a number", 1, 2, math.NaN(), false, false, 1, 2},
	}
	for _, c := range cases {
		lo, hi := atLeast(c.lo, c.hi, c.fixLo, c.fixHi, c.span)
		if math.Abs(lo-c.wantLo) > 1e-9 || math.Abs(hi-c.wantHi) > 1e-9 {
			t.Errorf("%s: %v..%v, want %v..%v", c.name, lo, hi, c.wantLo, c.wantHi)
		}
	}
}

func TestXAxisFitsItsWidth(t *testing.T) {
	// Design rule of this package (layoutX): of the 1-2-5 steps whose
	// labels fit, the x axis takes the one that wastes the least width;
	// where that leaves the ends alone, a step of 2.5 × 10^k that fits adds
	// ticks between them. 70 L/s is 1109.5 gpm (GNU units), the demo pump's
	// last data-sheet flow.
	cases := []struct {
		width   int
		hi      float64
		want    []float64
		comment string
	}{
		{720, 1109.5, []float64{0, 200, 400, 600, 800, 1000, 1200}, "a tablet: seven labels fit"},
		{380, 1109.5, []float64{0, 500, 1000, 1500}, "a 390 px phone: four labels"},
		{720, 70, []float64{0, 10, 20, 30, 40, 50, 60, 70}, "no waste at all"},
		{340, 45, []float64{0, 25, 50}, "a 360 px phone: not the ends 0 and 50 alone"},
		{380, 45, []float64{0, 10, 20, 30, 40, 50}, "a 390 px phone: six labels fit"},
	}
	for _, c := range cases {
		r := newRenderer(&Chart{Width: c.width, Series: []Series{{Name: "a", X: []float64{0, c.hi}, Y: []float64{10, 200}}}})
		r.render(nil)
		if !slices.Equal(r.x.ticks, c.want) {
			t.Errorf("width %d, data to %v (%s): ticks %v, want %v", c.width, c.hi, c.comment, r.x.ticks, c.want)
		}
	}
}
