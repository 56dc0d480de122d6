package calc

import "math"

// AlphaLaminar returns the kinetic-energy correction factor of fully
// developed laminar pipe flow, α = 2, exact for the parabolic
// (Hagen–Poiseuille) velocity profile.
func AlphaLaminar() float64 { return 2 }

// AlphaTurbulent returns α = 1, the value taken for turbulent flow when no
// velocity-profile estimate is asked for (common practice; the true value
// is a few per cent above 1, see AlphaPowerLaw).
func AlphaTurbulent() float64 { return 1 }

// AlphaParabolicNumeric computes α = ∫u³dA / (V³A) for the parabolic
// profile u = 2V(1 − (r/R)²) by composite Simpson integration over r with
// n intervals (n is rounded up to an even number, at least 2). The result
// tends to AlphaLaminar; it exists to show where the 2 comes from.
func AlphaParabolicNumeric(n int) float64 {
	if n < 2 {
		n = 2
	}
	if n%2 == 1 {
		n++
	}
	// Work with R = 1 and V = 1: α = 2∫₀¹ u(r)³ r dr / (V³·1), since
	// A = π and dA = 2πr dr.
	g := func(r float64) float64 {
		u := 2 * (1 - r*r)
		return u * u * u * r
	}
	h := 1 / float64(n)
	sum := g(0) + g(1)
	for i := 1; i < n; i++ {
		w := 2.0
		if i%2 == 1 {
			w = 4
		}
		sum += w * g(float64(i)*h)
	}
	return 2 * sum * h / 3
}

// AlphaPowerLawN returns the kinetic-energy correction factor of the
// power-law velocity profile u/umax = (1 − r/R)^(1/n):
//
//	α = (n+1)³(2n+1)³ / (4n⁴(n+3)(2n+3))
//
// obtained by integrating the profile (mean velocity
// V = 2n²umax/((n+1)(2n+1))). n = 7 is the usual choice (common practice),
// giving α ≈ 1.058. n must lie in 1…20 (field "n").
func AlphaPowerLawN(n float64) (float64, error) {
	if math.IsNaN(n) || n < 1 || n > 20 {
		return 0, NewFieldError("n", OutOfRange).Got(Num(n)).Within(Num(1), Num(20)).Because(ReasonPowerLawN)
	}
	a := (n + 1) * (2*n + 1)
	return a * a * a / (4 * n * n * n * n * (n + 3) * (2*n + 3)), nil
}

// Range of AlphaPowerLaw: the n(Re) relation holds for a centre-line
// Reynolds number above 2×10⁴; the upper end is kept within the range of
// the smooth-pipe profile measurements behind such relations.
const (
	alphaPowerLawReUMin = 2e4
	alphaPowerLawReMax  = 1e7
)

// AlphaPowerLaw estimates α for turbulent flow at mean-velocity Reynolds
// number re from the power-law profile, with the exponent from
//
//	n = −1.7 + 1.8·log10(Re_U)
//
// where Re_U is the Reynolds number on the centre-line velocity (relation
// given in Fox & McDonald, Introduction to Fluid Mechanics, section on
// turbulent pipe velocity profiles, for Re_U > 2×10⁴ — cited from memory).
// Re_U = re·umax/V is found by a few fixed-point steps on n. It returns α
// and n. re must give Re_U ≥ 2×10⁴ (about re ≥ 1.6×10⁴) and re ≤ 10⁷
// (field "re"); outside, use AlphaPowerLawN with a chosen n, or α = 1.
func AlphaPowerLaw(re float64) (alpha, n float64, err error) {
	if math.IsNaN(re) || re <= 0 || re > alphaPowerLawReMax {
		return 0, 0, NewFieldError("re", OutsideValidity).Got(Num(re)).AtMost(Num(alphaPowerLawReMax)).Because(ReasonProfileAlpha)
	}
	n = 7
	for i := 0; i < 60; i++ {
		ratio := (n + 1) * (2*n + 1) / (2 * n * n) // umax/V
		next := -1.7 + 1.8*math.Log10(re*ratio)
		if next < 1 {
			break
		}
		done := math.Abs(next-n) <= 1e-14*n
		n = next
		if done {
			break
		}
	}
	reU := re * (n + 1) * (2*n + 1) / (2 * n * n)
	if !(reU >= alphaPowerLawReUMin) {
		return 0, 0, NewFieldError("re", OutsideValidity).Got(Num(re)).AtLeast(Num(alphaPowerLawReUMin)).Because(ReasonProfileAlpha)
	}
	alpha, err = AlphaPowerLawN(n)
	if err != nil {
		return 0, 0, NewFieldError("re", OutsideValidity).Got(Num(re)).Within(Num(1), Num(20)).Because(ReasonProfileExponent, Num(n))
	}
	return alpha, n, nil
}
