package calc

import (
	"math"
	"strconv"
)

// Range and composition accepted by Seawater.
const (
	// SeawaterSalinity is the absolute salinity Seawater assumes, 35 g/kg
	// (0.035 kg/kg), typical of the open ocean.
	SeawaterSalinity = 0.035
	// SeawaterMaxSalinity is the highest absolute salinity SeawaterAt
	// accepts, 0.12 kg/kg (120 g/kg): desalination brines, inside the
	// range of the density and viscosity correlations (to 150–160 g/kg)
	// and of TEOS-10's fit at atmospheric pressure, against which the
	// density is checked.
	SeawaterMaxSalinity = 0.12
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
// at temperature tK (kelvin) and absolute pressure pPa (pascals): SeawaterAt
// with SeawaterSalinity. Range, sources and errors as SeawaterAt.
func Seawater(tK, pPa float64) (Fluid, error) {
	return SeawaterAt(tK, pPa, SeawaterSalinity)
}

// SeawaterAt returns the properties of seawater (or a brine of sea salt)
// of absolute salinity sA (kg/kg) at temperature tK (kelvin) and absolute
// pressure pPa (pascals), from the correlations of Sharqawy, Lienhard and
// Zubair, "Thermophysical properties of seawater: a review of existing
// correlations and data", Desalination and Water Treatment 16 (2010)
// 354–380:
//   - density from their eq. (8) (atmospheric pressure; stated accuracy
//     ±0.1 %, valid to 160 g/kg, from memory), compressed to pPa in the
//     ratio of pure water's IF97 densities, ρ(T, p) =
//     ρ8(T, S)·ρw(T, p)/ρw(T, 101 325 Pa). Seawater is a little less
//     compressible than pure water, so this overstates the rise. Against
//     TEOS-10 (python3-gsw): within 0.09 % at 0–42 g/kg over the whole
//     pressure range, and within 0.07 % at atmospheric pressure up to
//     120 g/kg. Above 42 g/kg TEOS-10 itself is fitted at atmospheric
//     pressure only, so the compression of a brine is not checked,
//   - dynamic viscosity from their eq. (22), μ = μw·(1 + A·S + B·S²), with
//     the pure-water μw from the IAPWS 2008 viscosity formulation at the
//     IF97 density (stated accuracy ±1.5 %, valid to 150 g/kg, from
//     memory; no reference library has seawater viscosity to check it),
//   - vapour pressure taken as that of pure water (IF97 eq. 30). Dissolved
//     salt lowers it, by about 2 % at 35 g/kg and about 7 % at 120 g/kg,
//     so this overstates it, which errs on the safe side for a cavitation
//     (NPSH) check.
//
// At sA = 0 the viscosity is water's; the density is eq. (8)'s pure-water
// fit, within 0.03 % of IF97 from 0 to 40 °C.
//
// Accepted: 273.15 K ≤ T ≤ 313.15 K (0 °C to 40 °C), pv ≤ p ≤ 10 MPa and
// 0 ≤ sA ≤ 0.12 kg/kg (SeawaterMaxSalinity). Anything else is a
// *FieldError naming "t", "p" or "sal" (ReasonSeawaterSalinity).
func SeawaterAt(tK, pPa, sA float64) (Fluid, error) {
	if math.IsNaN(sA) || sA < 0 || sA > SeawaterMaxSalinity {
		return Fluid{}, NewFieldError("sal", OutOfRange).Got(Num(sA)).Within(Num(0), Num(SeawaterMaxSalinity)).Because(ReasonSeawaterSalinity)
	}
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
	rhoW := if97Region1DensityCore(tK, pPa)
	return Fluid{
		Name:           "seawater (" + strconv.FormatFloat(math.Round(sA*1e5)/100, 'f', -1, 64) + " g/kg) at " + formatCelsius(tK),
		Density:        seawaterDensity(t, sA) * rhoW / if97Region1DensityCore(tK, seawaterRefPressure),
		Viscosity:      seawaterViscosityRatio(t, sA) * waterViscosityCore(tK, rhoW),
		VapourPressure: pv,
		Temperature:    tK,
		Pressure:       pPa,
	}, nil
}

// SeawaterHeatCapacity returns the specific isobaric heat capacity of
// seawater of absolute salinity sA (kg/kg) at temperature tK (kelvin) and
// absolute pressure pPa (pascals), in J/(kg·K), from the correlation of
// Jamieson, Tudhope, Morris and Cartwright, "Physical properties of sea
// water solutions: heat capacity", Desalination 7 (1969) 23–30, the one
// Sharqawy et al. (2010, eq. 9) recommend (atmospheric pressure; stated
// accuracy ±0.28 %, valid 0–180 °C and 0–180 g/kg; coefficients and range
// from memory). It takes the 1968 temperature scale and practical
// salinity: T68 = 1.00024·T90, SP = SA/1.00472 (Millero et al., 2008).
// Like the density, it is carried to pPa in the ratio of pure water's IF97
// cp, cp(T, p) = cpJ(T, S)·cpw(T, p)/cpw(T, 101 325 Pa): pressure lowers
// cp by about 1 % at 10 MPa, a little less in seawater than in water.
//
// Checked against TEOS-10 (python3-gsw) and IAPWS-08 (python3-iapws):
// within 0.4 % from 0 to 40 °C and 0 to 120 g/kg at atmospheric pressure,
// and at 0–42 g/kg up to 10 MPa (at 0 g/kg and 0 °C it is 0.3 % below
// IAPWS water). Range and errors as SeawaterAt.
func SeawaterHeatCapacity(tK, pPa, sA float64) (float64, error) {
	fl, err := SeawaterAt(tK, pPa, sA)
	if err != nil {
		return 0, err
	}
	tK = fl.Temperature
	t68 := 1.00024 * tK
	s := sA * 1000 / 1.00472 // g/kg, practical salinity scale
	a := 5.328 + s*(-9.76e-2+s*4.04e-4)
	b := -6.913e-3 + s*(7.351e-4+s*(-3.15e-6))
	c := 9.6e-6 + s*(-1.927e-6+s*8.23e-9)
	d := 2.5e-9 + s*(1.666e-9+s*(-7.125e-12))
	cp := 1000 * (a + t68*(b+t68*(c+t68*d)))
	return cp * if97Region1HeatCapacityCore(tK, pPa) / if97Region1HeatCapacityCore(tK, seawaterRefPressure), nil
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
