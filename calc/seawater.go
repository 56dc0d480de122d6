package calc

import "math"

// Range and composition accepted by Seawater.
const (
	// SeawaterSalinity is the absolute salinity Seawater assumes, 35 g/kg
	// (0.035 kg/kg), typical of the open ocean.
	SeawaterSalinity = 0.035
	// SeawaterMinTemperature is the lowest temperature Seawater accepts,
	// 273.15 K (0 °C).
	SeawaterMinTemperature = 273.15
	// SeawaterMaxTemperature is the highest temperature Seawater accepts,
	// 313.15 K (40 °C), the range of sea and intake temperatures over which
	// the density correlation has been checked against IAPWS-08.
	SeawaterMaxTemperature = 313.15
	// SeawaterMaxPressure is the highest absolute pressure Seawater
	// accepts, 10 MPa: it covers seawater reverse-osmosis feed pumps
	// (about 5.5–8 MPa, common practice) and lies inside the TEOS-10 and
	// IAPWS-08 ranges the density is checked against.
	SeawaterMaxPressure = 10e6
	// seawaterRefPressure is the pressure of the atmospheric density
	// correlation, 101 325 Pa.
	seawaterRefPressure = 101325.0
)

// Seawater returns the properties of seawater of absolute salinity 35 g/kg
// at temperature tK (kelvin) and absolute pressure pPa (pascals), from the
// correlations of Sharqawy, Lienhard and Zubair, "Thermophysical properties
// of seawater: a review of existing correlations and data", Desalination
// and Water Treatment 16 (2010) 354–380:
//   - density from their eq. (8) (atmospheric pressure; stated accuracy
//     ±0.1 %), compressed to pPa in the ratio of pure water's IF97
//     densities, ρ(T, p) = ρ8(T)·ρw(T, p)/ρw(T, 101 325 Pa). Seawater is
//     a little less compressible than pure water, so this overstates the
//     rise; against TEOS-10 (python3-gsw) the result stays within 0.08 %
//     over the whole range, inside eq. (8)'s own ±0.1 %,
//   - dynamic viscosity from their eq. (22), μ = μw·(1 + A·S + B·S²), with
//     the pure-water μw from the IAPWS 2008 viscosity formulation at the
//     IF97 density (stated accuracy ±1.5 %),
//   - vapour pressure taken as that of pure water (IF97 eq. 30). Dissolved
//     salt lowers it by about 2 %, so this overstates it slightly, which
//     errs on the safe side for a cavitation (NPSH) check.
//
// Accepted: 273.15 K ≤ T ≤ 313.15 K (0 °C to 40 °C) and
// pv ≤ p ≤ 10 MPa. Anything else is a *FieldError naming "t" or "p".
func Seawater(tK, pPa float64) (Fluid, error) {
	switch {
	case math.IsNaN(tK) || tK < SeawaterMinTemperature-waterTempSlack || tK > SeawaterMaxTemperature+waterTempSlack:
		return Fluid{}, NewFieldError("t", OutsideValidity).Got(Fig(tK, Temperature)).Within(Fig(SeawaterMinTemperature, Temperature), Fig(SeawaterMaxTemperature, Temperature)).Because(ReasonSeawaterProperties)
	case tK < SeawaterMinTemperature:
		tK = SeawaterMinTemperature
	case tK > SeawaterMaxTemperature:
		tK = SeawaterMaxTemperature
	}
	pv := if97SaturationPressureCore(tK)
	if math.IsNaN(pPa) || pPa < pv || pPa > SeawaterMaxPressure {
		return Fluid{}, NewFieldError("p", OutOfRange).Got(Fig(pPa, Pressure)).Within(Fig(pv, Pressure), Fig(SeawaterMaxPressure, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
	}
	t := tK - 273.15 // °C
	s := SeawaterSalinity
	rhoW := if97Region1DensityCore(tK, pPa)
	return Fluid{
		Name:           "seawater (35 g/kg) at " + formatCelsius(tK),
		Density:        seawaterDensity(t, s) * rhoW / if97Region1DensityCore(tK, seawaterRefPressure),
		Viscosity:      seawaterViscosityRatio(t, s) * waterViscosityCore(tK, rhoW),
		VapourPressure: pv,
		Temperature:    tK,
		Pressure:       pPa,
	}, nil
}

// seawaterDensity is eq. (8) of Sharqawy et al. (2010): density in kg/m³ at
// atmospheric pressure, t in °C, s in kg/kg.
func seawaterDensity(t, s float64) float64 {
	rhoW := 9.999e2 + t*(2.034e-2+t*(-6.162e-3+t*(2.261e-5+t*(-4.657e-8))))
	return rhoW + s*(8.020e2+t*(-2.001+t*(1.677e-2+t*(-3.060e-5)))-1.613e-5*s*t*t)
}

// seawaterViscosityRatio is μsw/μw from eq. (22) of Sharqawy et al. (2010),
// t in °C, s in kg/kg.
func seawaterViscosityRatio(t, s float64) float64 {
	a := 1.541 + t*(1.998e-2+t*(-9.52e-5))
	b := 7.974 + t*(-7.561e-2+t*4.724e-4)
	return 1 + a*s + b*s*s
}
