package calc

import "math"

// pchip is a shape-preserving piecewise cubic Hermite interpolant through
// points (x[k], y[k]), x strictly increasing, with slopes d[k] at the
// points.
//
// The method is the monotone piecewise cubic interpolation of F. N.
// Fritsch and R. E. Carlson, "Monotone piecewise cubic interpolation",
// SIAM J. Numer. Anal. 17(2):238–246 (1980): on each interval the cubic
// Hermite piece is monotone when the slopes at its ends have the sign of
// the interval's secant and are not too large (their sufficient
// conditions), and a slope is zero where the data have a local extremum.
// The interior slopes are the weighted harmonic mean of the neighbouring
// secants of F. N. Fritsch and J. Butland, SIAM J. Sci. Stat. Comput.
// 5(2):300–304 (1984), which satisfies those conditions; the end slopes are
// the one-sided three-point estimate limited to keep the shape (C. Moler,
// Numerical Computing with MATLAB, 2004, §3.6). This is the scheme of
// SLATEC's PCHIM and of scipy.interpolate.PchipInterpolator, against which
// the tests check it. Monotone data give a monotone curve; no piece
// overshoots the data either side of it.
type pchip struct {
	x, y, d []float64
}

// sign returns −1, 0 or +1.
func pchipSign(v float64) float64 {
	switch {
	case v > 0:
		return 1
	case v < 0:
		return -1
	}
	return 0
}

// pchipEdge is the one-sided three-point end slope with its shape limits:
// h0, m0 the end interval's width and secant, h1, m1 the next one's.
func pchipEdge(h0, h1, m0, m1 float64) float64 {
	d := ((2*h0+h1)*m0 - h0*m1) / (h0 + h1)
	switch {
	case pchipSign(d) != pchipSign(m0):
		return 0
	case pchipSign(m0) != pchipSign(m1) && math.Abs(d) > 3*math.Abs(m0):
		return 3 * m0
	}
	return d
}

// newPchip builds the interpolant. x must be strictly increasing with at
// least two points (two points give the straight line); the caller checks.
func newPchip(x, y []float64) pchip {
	n := len(x)
	p := pchip{x: append([]float64(nil), x...), y: append([]float64(nil), y...), d: make([]float64, n)}
	h := make([]float64, n-1)
	m := make([]float64, n-1)
	for k := 0; k < n-1; k++ {
		h[k] = x[k+1] - x[k]
		m[k] = (y[k+1] - y[k]) / h[k]
	}
	if n == 2 {
		p.d[0], p.d[1] = m[0], m[0]
		return p
	}
	for k := 1; k < n-1; k++ {
		if pchipSign(m[k-1]) != pchipSign(m[k]) || m[k-1] == 0 || m[k] == 0 {
			continue // local extremum or flat: slope 0
		}
		w1 := 2*h[k] + h[k-1]
		w2 := h[k] + 2*h[k-1]
		p.d[k] = 1 / ((w1/m[k-1] + w2/m[k]) / (w1 + w2))
	}
	p.d[0] = pchipEdge(h[0], h[1], m[0], m[1])
	p.d[n-1] = pchipEdge(h[n-2], h[n-3], m[n-2], m[n-3])
	return p
}

// eval returns the interpolant at t, which must lie in [x[0], x[n−1]]. A
// data abscissa belongs to the interval on its right, and the last one
// gives the last value, so the data are reproduced exactly.
func (p pchip) eval(t float64) float64 {
	n := len(p.x)
	if t >= p.x[n-1] {
		return p.y[n-1]
	}
	k, s, c0, c1 := p.piece(t)
	return ((c0*s+c1)*s+p.d[k])*s + p.y[k]
}

// slope returns the interpolant's derivative at t, which must lie in
// [x[0], x[n−1]]; at a data abscissa it is the slope d[k] there (the
// pieces meet with equal slopes: the curve is C¹).
func (p pchip) slope(t float64) float64 {
	n := len(p.x)
	if t >= p.x[n-1] {
		return p.d[n-1]
	}
	k, s, c0, c1 := p.piece(t)
	return (3*c0*s+2*c1)*s + p.d[k]
}

// piece finds the interval k holding t (below x[n−1]) and the cubic there
// in powers of s = t − x[k]: y[k] + d[k]·s + c1·s² + c0·s³.
func (p pchip) piece(t float64) (k int, s, c0, c1 float64) {
	n := len(p.x)
	for k < n-2 && t >= p.x[k+1] {
		k++
	}
	h := p.x[k+1] - p.x[k]
	slope := (p.y[k+1] - p.y[k]) / h
	c := (p.d[k] + p.d[k+1] - 2*slope) / h
	return k, t - p.x[k], c / h, (slope-p.d[k])/h - c
}
