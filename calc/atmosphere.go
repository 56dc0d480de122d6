package calc

import "math"

// ISO 2533 standard atmosphere, troposphere layer.
const (
	isaP0   = 101325.0  // Pa, sea-level pressure
	isaT0   = 288.15    // K, sea-level temperature
	isaL    = 0.0065    // K/m, temperature lapse rate in the troposphere
	isaR    = 287.05287 // J/(kg·K), specific gas constant of air, R*/M
	isaHMin = -2000.0   // m, lowest geopotential altitude of the ISO 2533 tables
	isaHMax = 11000.0   // m, tropopause
)

// StandardAtmosphere returns the pressure in pascals of the ISO 2533
// standard atmosphere at geopotential altitude altitude (metres above mean
// sea level), from the troposphere relation
//
//	p = p0·(1 − L·H/T0)^(g0/(R·L))
//
// with p0 = 101 325 Pa, T0 = 288.15 K, L = 0.0065 K/m, g0 = 9.806 65 m/s²
// and R = 287.052 87 J/(kg·K). Accepted: −2000 m to 11 000 m (the
// tropopause); outside is a *FieldError naming "alt". For site work the
// difference between geopotential and geometric altitude (about 0.03 % at
// 2000 m) is below the day-to-day variation of the barometer.
func StandardAtmosphere(altitude float64) (float64, error) {
	if math.IsNaN(altitude) || altitude < isaHMin || altitude > isaHMax {
		return 0, NewFieldError("alt", OutsideValidity).Got(Fig(altitude, Length)).Within(Fig(isaHMin, Length), Fig(isaHMax, Length)).Because(ReasonISA)
	}
	return isaP0 * math.Pow(1-isaL*altitude/isaT0, StandardGravity/(isaR*isaL)), nil
}

// GaugeToAbsolute returns the absolute pressure for a gauge reading, given
// the local barometric (ambient) pressure; all in pascals. It does not
// validate; callers check that the result is physically possible.
func GaugeToAbsolute(gauge, barometric float64) float64 { return gauge + barometric }

// AbsoluteToGauge returns the gauge reading for an absolute pressure, given
// the local barometric (ambient) pressure; all in pascals.
func AbsoluteToGauge(absolute, barometric float64) float64 { return absolute - barometric }
