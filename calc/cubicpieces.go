package calc

import (
	"math"
	"sort"
)

// cubicBreaks returns the flows that split [a, b] into pieces on which f
// is monotone, sorted: a, b, the knots strictly between them, and the
// points between knots where the slope df is zero. f must be a single
// cubic between consecutive knots (a sum of interpolants on those knots,
// or their difference), so df is a quadratic there: it is fitted exactly
// from three values of df and its roots solved in closed form, which
// finds every extremum without a grid that could step over one.
func cubicBreaks(df func(float64) float64, a, b float64, knots []float64) []float64 {
	xs := []float64{a}
	for _, k := range knots {
		if k > a && k < b {
			xs = append(xs, k)
		}
	}
	xs = append(xs, b)
	sortFloat64s(xs)
	out := make([]float64, 0, 3*len(xs))
	for i := 0; i+1 < len(xs); i++ {
		lo, hi := xs[i], xs[i+1]
		out = append(out, lo)
		h := hi - lo
		if !(h > 0) {
			continue
		}
		// df(lo + s) = A s² + B s + C, from its values at s = 0, h/2, h.
		d0, d1, d2 := df(lo), df(lo+h/2), df(hi)
		A := 2 * (d2 - 2*d1 + d0) / (h * h)
		B := (4*d1 - 3*d0 - d2) / h
		C := d0
		for _, s := range quadRoots(A, B, C, h) {
			if s > 0 && s < h {
				out = append(out, lo+s)
			}
		}
	}
	out = append(out, b)
	sortFloat64s(out)
	return out
}

// sortFloat64s sorts x as sort.Float64s does (NaNs first), to the same
// order: sort.Slice runs the same pattern-defeating quicksort on the same
// comparison, and its code is in the wasm already, where sort.Float64s
// would add a copy of the sort for float64 (about 14 KB).
func sortFloat64s(x []float64) {
	sort.Slice(x, func(i, j int) bool { return x[i] < x[j] || (x[i] != x[i] && x[j] == x[j]) })
}

// quadRoots returns the real roots of A s² + B s + C; a quadratic term
// negligible across the width h is dropped, leaving the linear root (the
// cancelling form of the quadratic formula keeps both roots accurate).
func quadRoots(A, B, C, h float64) []float64 {
	scale := math.Abs(B)*h + math.Abs(C)
	if math.Abs(A)*h*h <= 1e-12*scale {
		if B == 0 {
			return nil
		}
		return []float64{-C / B}
	}
	disc := B*B - 4*A*C
	if disc < 0 {
		return nil
	}
	q := -(B + math.Copysign(math.Sqrt(disc), B)) / 2
	if q == 0 {
		return []float64{0}
	}
	return []float64{q / A, C / q}
}

// extremes returns where f is least and greatest over breaks (from
// cubicBreaks, so the extremes of f lie on them) and its values there.
func extremes(f func(float64) float64, breaks []float64) (xmin, fmin, xmax, fmax float64) {
	xmin, xmax = breaks[0], breaks[0]
	fmin = f(breaks[0])
	fmax = fmin
	for _, x := range breaks[1:] {
		switch v := f(x); {
		case v < fmin:
			xmin, fmin = x, v
		case v > fmax:
			xmax, fmax = x, v
		}
	}
	return
}

// cubicRoots returns the zeros of f between consecutive breaks (from
// cubicBreaks, so f is monotone between them and each piece holds at most
// one), found by Brent's method to tol; a zero on a break is found once.
func cubicRoots(f func(float64) float64, breaks []float64, tol float64) []float64 {
	var out []float64
	for i := 0; i+1 < len(breaks); i++ {
		lo, hi := breaks[i], breaks[i+1]
		flo, fhi := f(lo), f(hi)
		if flo == 0 {
			if len(out) == 0 || out[len(out)-1] != lo {
				out = append(out, lo)
			}
			continue
		}
		if fhi == 0 {
			out = append(out, hi)
			continue
		}
		if (flo > 0) == (fhi > 0) {
			continue
		}
		if x, err := brent(f, lo, hi, tol); err == nil {
			out = append(out, x)
		}
	}
	return out
}
