package calc

import "math"

// CustomLiquid builds a Fluid from properties the user supplies: density
// rho (kg/m³), dynamic viscosity mu (Pa·s) and vapour pressure pv (Pa,
// absolute). rho must lie in the range of liquids the balance accepts
// (1 to 1e5 kg/m³, far beyond any real liquid either way, so that no head
// computed from it overflows), mu must be positive and finite, pv finite
// and not negative (0 for a liquid whose vapour pressure is negligible).
// Bad values
// are a *FieldError naming "rho", "mu" or "pv". Temperature is left 0
// (unknown).
func CustomLiquid(rho, mu, pv float64) (Fluid, error) {
	if !(rho >= minDensity && rho <= maxDensity) {
		return Fluid{}, NewFieldError("rho", OutOfRange).Got(Fig(rho, Density)).Within(Fig(minDensity, Density), Fig(maxDensity, Density))
	}
	if !(mu > 0) || math.IsInf(mu, 0) {
		return Fluid{}, NewFieldError("mu", NotPositive).Got(Fig(mu, DynamicViscosity))
	}
	if !(pv >= 0) || math.IsInf(pv, 0) {
		return Fluid{}, NewFieldError("pv", Negative).Got(Fig(pv, Pressure)).Because(ReasonAbsolutePressure)
	}
	return Fluid{
		Name:           "custom liquid",
		Density:        rho,
		Viscosity:      mu,
		VapourPressure: pv,
	}, nil
}
