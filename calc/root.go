package calc

import (
	"errors"
	"math"
)

// errNoBracket is returned by brent when f(a) and f(b) have the same sign.
var errNoBracket = errors.New("root not bracketed")

// brent finds x in [a, b] with f(x) = 0 by Brent's method (R. P. Brent,
// Algorithms for Minimization without Derivatives, 1973, ch. 4): bisection
// safeguarding inverse quadratic interpolation, so it converges for any
// continuous f whose signs differ at the ends, and lands on the jump when f
// is discontinuous there. tol is the absolute tolerance on x. An interval
// not narrowed to tol within 200 steps is an error (errNoConvergence), never
// an unconverged root.
func brent(f func(float64) float64, a, b, tol float64) (float64, error) {
	fa, fb := f(a), f(b)
	if math.IsNaN(fa) || math.IsNaN(fb) {
		return 0, errors.New("function is not defined at the ends of the range")
	}
	if fa == 0 {
		return a, nil
	}
	if fb == 0 {
		return b, nil
	}
	if (fa > 0) == (fb > 0) {
		return 0, errNoBracket
	}
	c, fc := a, fa
	d := b - a
	e := d
	for iter := 0; iter < 200; iter++ {
		if (fb > 0) == (fc > 0) {
			c, fc = a, fa
			d = b - a
			e = d
		}
		if math.Abs(fc) < math.Abs(fb) {
			a, b, c = b, c, b
			fa, fb, fc = fb, fc, fb
		}
		tol1 := 2*eps64*math.Abs(b) + 0.5*tol
		m := 0.5 * (c - b)
		if math.Abs(m) <= tol1 || fb == 0 {
			return b, nil
		}
		if math.Abs(e) >= tol1 && math.Abs(fa) > math.Abs(fb) {
			var p, q, r float64
			s := fb / fa
			if a == c {
				p = 2 * m * s
				q = 1 - s
			} else {
				q = fa / fc
				r = fb / fc
				p = s * (2*m*q*(q-r) - (b-a)*(r-1))
				q = (q - 1) * (r - 1) * (s - 1)
			}
			if p > 0 {
				q = -q
			} else {
				p = -p
			}
			if 2*p < math.Min(3*m*q-math.Abs(tol1*q), math.Abs(e*q)) {
				e = d
				d = p / q
			} else {
				d = m
				e = m
			}
		} else {
			d = m
			e = m
		}
		a, fa = b, fb
		if math.Abs(d) > tol1 {
			b += d
		} else if m > 0 {
			b += tol1
		} else {
			b -= tol1
		}
		fb = f(b)
		if math.IsNaN(fb) {
			return 0, errors.New("function is not defined inside the range")
		}
	}
	return b, errNoConvergence
}

// errNoConvergence is returned by brent when the tolerance is not reached
// within its iteration limit; the root is then not reported at all.
var errNoConvergence = errors.New("root not found to the tolerance within 200 iterations")

// eps64 is the float64 machine epsilon.
const eps64 = 2.220446049250313e-16
