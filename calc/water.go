package calc

import (
	"math"
	"strconv"
)

// Range accepted by Water.
const (
	// WaterMinTemperature is the lowest temperature Water accepts, 273.15 K
	// (0 °C), the lower bound of IAPWS-IF97 region 1.
	WaterMinTemperature = 273.15
	// WaterMaxTemperature is the highest temperature Water accepts,
	// 373.15 K (100 °C).
	WaterMaxTemperature = 373.15
	// WaterMaxPressure is the highest absolute pressure Water accepts,
	// 10 MPa (100 bar). It covers PN 100 pipework with margin and lies well
	// inside IF97 region 1 (≤ 100 MPa) and the IAPWS 2008 viscosity range.
	WaterMaxPressure = 10e6

	// waterTempSlack absorbs rounding in °C/°F → K conversions at the
	// range ends (e.g. 100 + 273.15); inputs within it are set to the bound.
	waterTempSlack = 1e-9
)

// Water returns the properties of liquid water at temperature tK (kelvin)
// and absolute pressure pPa (pascals):
//   - density from the IAPWS-IF97 region 1 fundamental equation,
//   - dynamic viscosity from the IAPWS 2008 viscosity release with μ2 = 1,
//   - vapour pressure from the IF97 saturation-pressure equation (eq. 30).
//
// Accepted: 273.15 K ≤ T ≤ 373.15 K (0 °C to 100 °C, both included) and
// psat(T) ≤ p ≤ 10 MPa. A pressure below psat(T) means the water would be
// vapour. Anything else is a *FieldError naming "t" or "p" with the valid
// range; the formulations are never extrapolated.
func Water(tK, pPa float64) (Fluid, error) {
	switch {
	case math.IsNaN(tK) || tK < WaterMinTemperature-waterTempSlack || tK > WaterMaxTemperature+waterTempSlack:
		return Fluid{}, NewFieldError("t", OutsideValidity).Got(Fig(tK, Temperature)).Within(Fig(WaterMinTemperature, Temperature), Fig(WaterMaxTemperature, Temperature)).Because(ReasonWaterProperties)
	case tK < WaterMinTemperature:
		tK = WaterMinTemperature
	case tK > WaterMaxTemperature:
		tK = WaterMaxTemperature
	}
	ps := if97SaturationPressureCore(tK)
	if math.IsNaN(pPa) || pPa < ps || pPa > WaterMaxPressure {
		if !math.IsNaN(pPa) && pPa < ps {
			return Fluid{}, NewFieldError("p", BelowLimit).Got(Fig(pPa, Pressure)).Within(Fig(ps, Pressure), Fig(WaterMaxPressure, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
		}
		return Fluid{}, NewFieldError("p", OutOfRange).Got(Fig(pPa, Pressure)).Within(Fig(ps, Pressure), Fig(WaterMaxPressure, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
	}
	rho := if97Region1DensityCore(tK, pPa)
	return Fluid{
		Name:           "water at " + formatCelsius(tK),
		Density:        rho,
		Viscosity:      waterViscosityCore(tK, rho),
		VapourPressure: ps,
		Temperature:    tK,
		Pressure:       pPa,
	}, nil
}

// formatCelsius renders a kelvin temperature as "18 °C", rounded to 0.01 K.
func formatCelsius(tK float64) string {
	c := math.Round((tK-273.15)*100) / 100
	if c == 0 {
		c = 0 // no "-0"
	}
	return strconv.FormatFloat(c, 'f', -1, 64) + " °C"
}

// formatKelvin renders a temperature for an error message, e.g. "380 K (106.85 °C)".
func formatKelvin(tK float64) string {
	if math.IsNaN(tK) || math.IsInf(tK, 0) {
		return strconv.FormatFloat(tK, 'g', -1, 64) + " K"
	}
	return strconv.FormatFloat(tK, 'g', 8, 64) + " K (" + formatCelsius(tK) + ")"
}
