package chart

import "math"

// Tick placement follows the "loose labeling" procedure of P. S. Heckbert,
// "Nice numbers for graph labels", in Graphics Gems (A. S. Glassner, ed.,
// Academic Press, 1990), recalled from memory: the step is the data range
// divided by the wanted tick count less one, rounded to a nice number of
// 1, 2 or 5 × 10^k; the limits are extended outwards to whole steps.
// Heckbert first rounds the range itself up to a nice number; we skip that
// step because it can double the span (a range of 60 becomes 100), which
// wastes a tablet's height. Ends fixed by the caller are kept as they are.

// niceNum returns a number of the form 1, 2, 5 or 10 × 10^k near x > 0:
// the nearest such number if round is set, else the smallest one ≥ x.
func niceNum(x float64, round bool) float64 {
	if !(x > 0) || math.IsInf(x, 0) {
		return 0
	}
	e := math.Floor(math.Log10(x))
	p := math.Pow(10, e)
	f := x / p
	var nf float64
	if round {
		switch {
		case f < 1.5:
			nf = 1
		case f < 3:
			nf = 2
		case f < 7:
			nf = 5
		default:
			nf = 10
		}
	} else {
		switch {
		case f <= 1:
			nf = 1
		case f <= 2:
			nf = 2
		case f <= 5:
			nf = 5
		default:
			nf = 10
		}
	}
	return nf * p
}

// scale maps one data axis onto a pixel span.
type scale struct {
	lo, hi float64   // data limits
	p0, p1 float64   // pixel positions of lo and hi
	ticks  []float64 // tick values within [lo, hi]
	step   float64   // tick step (0 when the ticks are not evenly spaced)
}

// px maps v to a pixel coordinate. Halving first keeps the differences
// finite for any finite input (halving is exact in binary floating point).
func (s *scale) px(v float64) float64 {
	return s.p0 + (v/2-s.lo/2)/(s.hi/2-s.lo/2)*(s.p1-s.p0)
}

// extent collects the finite values seen on one axis.
type extent struct {
	lo, hi float64
	n      int
}

func (e *extent) add(v float64) {
	if !finite(v) {
		return
	}
	if e.n == 0 || v < e.lo {
		e.lo = v
	}
	if e.n == 0 || v > e.hi {
		e.hi = v
	}
	e.n++
}

// limits returns the data limits for an axis before tick rounding: the
// extent of the data, overridden by fixed ends, widened when empty or flat.
// fixLo and fixHi report which ends are fixed.
func limits(e extent, min, max *float64) (lo, hi float64, fixLo, fixHi bool) {
	lo, hi = 0, 1
	if e.n > 0 {
		lo, hi = e.lo, e.hi
	}
	if min != nil && finite(*min) {
		lo, fixLo = *min, true
	}
	if max != nil && finite(*max) {
		hi, fixHi = *max, true
	}
	if lo > hi {
		lo, hi = hi, lo
		fixLo, fixHi = fixHi, fixLo
	}
	if span := hi - lo; span <= math.Max(math.Abs(lo), math.Abs(hi))*1e-12 || span < 1e-300 {
		// Flat or empty: open a window around the value.
		pad := math.Abs(lo) * 0.1
		if pad < 1e-300 {
			pad = 1
		}
		switch {
		case fixLo && fixHi:
			lo -= pad
			hi += pad
			fixLo, fixHi = false, false
		case fixHi:
			lo = hi - pad
		case fixLo || lo == 0:
			hi = lo + pad
		default:
			lo -= pad
			hi += pad
		}
	}
	return lo, hi, fixLo, fixHi
}

// niceScale chooses limits and ticks for data in [lo, hi] with about n
// ticks (n ≥ 2). Unfixed ends are extended to whole steps.
func niceScale(lo, hi float64, fixLo, fixHi bool, n int) scale {
	if n < 2 {
		n = 2
	}
	return stepScale(lo, hi, fixLo, fixHi, niceNum((hi-lo)/float64(n-1), true))
}

// stepScale lays out data in [lo, hi] with ticks d apart. Unfixed ends
// are extended to whole steps.
func stepScale(lo, hi float64, fixLo, fixHi bool, d float64) scale {
	s := scale{lo: lo, hi: hi}
	span := hi - lo
	if !finite(span) || !(d > 0) || !finite(d) {
		// Beyond float range: fall back to the two ends.
		s.ticks = []float64{lo, hi}
		return s
	}
	if !fixLo {
		s.lo = math.Floor(lo/d) * d
	}
	if !fixHi {
		s.hi = math.Ceil(hi/d) * d
	}
	if !finite(s.lo) || !finite(s.hi) || s.hi <= s.lo {
		s.lo, s.hi = lo, hi
	}
	k0 := math.Ceil(s.lo/d - 1e-9)
	k1 := math.Floor(s.hi/d + 1e-9)
	if k1-k0 > 100 || k1 < k0 {
		s.ticks = []float64{s.lo, s.hi}
		return s
	}
	s.step = d
	for k := k0; k <= k1; k++ {
		t := k * d
		if math.Abs(t) < d*1e-9 {
			t = 0
		}
		s.ticks = append(s.ticks, t)
	}
	return s
}
