package calc

import "math"

// Reference constants of the IAPWS 2008 viscosity release.
const (
	viscTcrit   = 647.096 // K, T*
	viscRhoCrit = 322.0   // kg/m³, ρ*
	viscMuRef   = 1e-6    // Pa·s, μ*
	viscTmin    = 273.15  // K, lower bound accepted here (IF97 region 1 starts here)
	viscTmax    = 1173.15 // K, upper bound of the release
)

// viscH0 holds H0…H3 of the dilute-gas term μ0 (IAPWS 2008 viscosity
// release, Table 1).
var viscH0 = [4]float64{1.67752, 2.20462, 0.6366564, -0.241605}

// viscH1Term is one nonzero coefficient H_ij of the residual term μ1.
type viscH1Term struct {
	I, J int
	H    float64
}

// viscH1 holds the 21 nonzero coefficients H_ij of μ1 (IAPWS 2008
// viscosity release, Table 2).
var viscH1 = [21]viscH1Term{
	{0, 0, 5.20094e-1},
	{1, 0, 8.50895e-2},
	{2, 0, -1.08374},
	{3, 0, -2.89555e-1},
	{0, 1, 2.22531e-1},
	{1, 1, 9.99115e-1},
	{2, 1, 1.88797},
	{3, 1, 1.26613},
	{5, 1, 1.20573e-1},
	{0, 2, -2.81378e-1},
	{1, 2, -9.06851e-1},
	{2, 2, -7.72479e-1},
	{3, 2, -4.89837e-1},
	{4, 2, -2.57040e-1},
	{0, 3, 1.61913e-1},
	{1, 3, 2.57399e-1},
	{0, 4, -3.25372e-2},
	{3, 4, 6.98452e-2},
	{4, 5, 8.72102e-3},
	{3, 6, -4.35673e-3},
	{5, 6, -5.93264e-4},
}

// waterViscosityCore evaluates μ = μ*·μ0(T̄)·μ1(T̄, ρ̄) with μ2 = 1, without
// range checks.
func waterViscosityCore(tK, rho float64) float64 {
	tr := tK / viscTcrit
	dr := rho / viscRhoCrit

	// Eq. 11: μ0 = 100·√T̄ / Σ H_i/T̄^i.
	sum0 := 0.0
	ti := 1.0
	for _, h := range viscH0 {
		sum0 += h / ti
		ti *= tr
	}
	mu0 := 100 * math.Sqrt(tr) / sum0

	// Eq. 12: μ1 = exp(ρ̄ Σ Σ H_ij (1/T̄ − 1)^i (ρ̄ − 1)^j).
	x := 1/tr - 1
	y := dr - 1
	var xp [6]float64
	var yp [7]float64
	xp[0], yp[0] = 1, 1
	for i := 1; i < len(xp); i++ {
		xp[i] = xp[i-1] * x
	}
	for j := 1; j < len(yp); j++ {
		yp[j] = yp[j-1] * y
	}
	sum1 := 0.0
	for _, t := range viscH1 {
		sum1 += t.H * xp[t.I] * yp[t.J]
	}
	mu1 := math.Exp(dr * sum1)

	return viscMuRef * mu0 * mu1
}

// WaterViscosity returns the dynamic viscosity of water in Pa·s at
// temperature tK (kelvin) and density rho (kg/m³), from the IAPWS 2008
// release on the viscosity of ordinary water substance, eq. 10:
// μ = μ*·μ0(T)·μ1(T, ρ)·μ2, with the critical enhancement μ2 taken as 1 as
// the release allows for industrial use away from the critical point.
//
// Accepted: 273.15 K ≤ T ≤ 1173.15 K and a positive, finite density. The
// caller is responsible for (T, ρ) being a fluid state inside the release's
// range of validity, e.g. a density from IF97Region1Density. Bad input is a
// *FieldError naming "t" or "rho".
func WaterViscosity(tK, rho float64) (float64, error) {
	if math.IsNaN(tK) || tK < viscTmin || tK > viscTmax {
		return 0, NewFieldError("t", OutsideValidity).Got(Fig(tK, Temperature)).Within(Fig(viscTmin, Temperature), Fig(viscTmax, Temperature)).Because(ReasonIAPWSViscosity)
	}
	if math.IsNaN(rho) || math.IsInf(rho, 0) || rho <= 0 {
		return 0, NewFieldError("rho", NotPositive).Got(Fig(rho, Density))
	}
	return waterViscosityCore(tK, rho), nil
}
