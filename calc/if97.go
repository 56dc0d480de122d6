package calc

import "math"

// This file implements the two parts of IAPWS-IF97 (the IAPWS Industrial
// Formulation 1997 for the Thermodynamic Properties of Water and Steam,
// 2007 revision) that a liquid-line calculator needs: the fundamental
// equation of region 1 (compressed and saturated liquid) and the
// saturation-pressure equation of region 4.

// Reference values and the specific gas constant of IF97.
const (
	if97R      = 461.526 // J/(kg·K), specific gas constant of water in IF97
	if97R1Pref = 16.53e6 // Pa, p* of region 1
	if97R1Tref = 1386.0  // K, T* of region 1
	if97Tmin   = 273.15  // K, lower temperature bound of regions 1 and 4
	if97R1Tmax = 623.15  // K, upper temperature bound of region 1
	if97R1Pmax = 100e6   // Pa, upper pressure bound of region 1
	if97Tcrit  = 647.096 // K, critical temperature, upper bound of region 4
	if97R4Pref = 1e6     // Pa, p* of region 4
	if97R4Tref = 1.0     // K, T* of region 4
	if97R1Imax = 32      // largest exponent I in region 1
	if97R1Jmin = -41     // smallest exponent J in region 1
	if97R1Jmax = 17      // largest exponent J in region 1
)

// if97Region1Term is one term n·(7.1 − π)^I·(τ − 1.222)^J of the
// dimensionless Gibbs free energy γ of region 1 (IF97 Table 2).
type if97Region1Term struct {
	I, J int
	N    float64
}

// if97Region1 holds the 34 coefficients and exponents of IF97 region 1
// (IAPWS-IF97, 2007 revision, Table 2).
var if97Region1 = [34]if97Region1Term{
	{0, -2, 0.14632971213167},
	{0, -1, -0.84548187169114},
	{0, 0, -0.37563603672040e1},
	{0, 1, 0.33855169168385e1},
	{0, 2, -0.95791963387872},
	{0, 3, 0.15772038513228},
	{0, 4, -0.16616417199501e-1},
	{0, 5, 0.81214629983568e-3},
	{1, -9, 0.28319080123804e-3},
	{1, -7, -0.60706301565874e-3},
	{1, -1, -0.18990068218419e-1},
	{1, 0, -0.32529748770505e-1},
	{1, 1, -0.21841717175414e-1},
	{1, 3, -0.52838357969930e-4},
	{2, -3, -0.47184321073267e-3},
	{2, 0, -0.30001780793026e-3},
	{2, 1, 0.47661393906987e-4},
	{2, 3, -0.44141845330846e-5},
	{2, 17, -0.72694996297594e-15},
	{3, -4, -0.31679644845054e-4},
	{3, 0, -0.28270797985312e-5},
	{3, 6, -0.85205128120103e-9},
	{4, -5, -0.22425281908000e-5},
	{4, -2, -0.65171222895601e-6},
	{4, 10, -0.14341729937924e-12},
	{5, -8, -0.40516996860117e-6},
	{8, -11, -0.12734301741641e-8},
	{8, -6, -0.17424871230634e-9},
	{21, -29, -0.68762131295531e-18},
	{23, -31, 0.14478307828521e-19},
	{29, -38, 0.26335781662795e-22},
	{30, -39, -0.11947622640071e-22},
	{31, -40, 0.18228094581404e-23},
	{32, -41, -0.93537087292458e-25},
}

// if97Gibbs1 holds γ and its partial derivatives for region 1 at one
// (π, τ) point; subscripts p and t denote ∂/∂π and ∂/∂τ.
type if97Gibbs1 struct {
	pi, tau                  float64
	g, gp, gpp, gt, gtt, gpt float64
}

// if97Region1Gibbs evaluates the dimensionless Gibbs free energy of region 1
// and its first and second derivatives (IF97 eq. 7 and Table 4). It does not
// check the range; callers do.
func if97Region1Gibbs(tK, pPa float64) if97Gibbs1 {
	pi := pPa / if97R1Pref
	tau := if97R1Tref / tK
	a := 7.1 - pi
	b := tau - 1.222

	// Integer powers by repeated multiplication: a^i for i = 0…32 and
	// b^j for j = −43…17 (index j − bOff); the second τ-derivative needs
	// two powers below the smallest exponent J.
	const bOff = if97R1Jmin - 2
	var ap [if97R1Imax + 1]float64
	ap[0] = 1
	for i := 1; i <= if97R1Imax; i++ {
		ap[i] = ap[i-1] * a
	}
	var bp [if97R1Jmax - bOff + 1]float64
	bp[-bOff] = 1
	for j := 1; j <= if97R1Jmax; j++ {
		bp[j-bOff] = bp[j-1-bOff] * b
	}
	inv := 1 / b
	for j := -1; j >= bOff; j-- {
		bp[j-bOff] = bp[j+1-bOff] * inv
	}
	// a^i for i ≥ 0; a negative power only arises multiplied by I = 0.
	pa := func(i int) float64 {
		if i < 0 {
			return 0
		}
		return ap[i]
	}
	pb := func(j int) float64 { return bp[j-bOff] }

	r := if97Gibbs1{pi: pi, tau: tau}
	for _, t := range if97Region1 {
		fi, fj := float64(t.I), float64(t.J)
		r.g += t.N * ap[t.I] * pb(t.J)
		r.gp -= t.N * fi * pa(t.I-1) * pb(t.J)
		r.gpp += t.N * fi * (fi - 1) * pa(t.I-2) * pb(t.J)
		r.gt += t.N * fj * ap[t.I] * pb(t.J-1)
		r.gtt += t.N * fj * (fj - 1) * ap[t.I] * pb(t.J-2)
		r.gpt -= t.N * fi * fj * pa(t.I-1) * pb(t.J-1)
	}
	return r
}

// if97Region1Props holds the region 1 properties checked against IF97 Table 5.
type if97Region1Props struct {
	v  float64 // specific volume, m³/kg
	h  float64 // specific enthalpy, J/kg
	u  float64 // specific internal energy, J/kg
	s  float64 // specific entropy, J/(kg·K)
	cp float64 // specific isobaric heat capacity, J/(kg·K)
	w  float64 // speed of sound, m/s
}

// if97Region1Properties evaluates the relations of IF97 Table 3 without
// range checks.
func if97Region1Properties(tK, pPa float64) if97Region1Props {
	g := if97Region1Gibbs(tK, pPa)
	rt := if97R * tK
	d := g.gp - g.tau*g.gpt
	return if97Region1Props{
		v:  rt / pPa * g.pi * g.gp,
		h:  rt * g.tau * g.gt,
		u:  rt * (g.tau*g.gt - g.pi*g.gp),
		s:  if97R * (g.tau*g.gt - g.g),
		cp: -if97R * g.tau * g.tau * g.gtt, // as if97Region1HeatCapacityCore
		w:  math.Sqrt(rt * g.gp * g.gp / (d*d/(g.tau*g.tau*g.gtt) - g.gpp)),
	}
}

// if97Region1DensityCore returns ρ = 1/v from region 1 without range checks.
func if97Region1DensityCore(tK, pPa float64) float64 {
	g := if97Region1Gibbs(tK, pPa)
	return pPa / (if97R * tK * g.pi * g.gp)
}

// IF97Region1Density returns the density of liquid water in kg/m³ from the
// fundamental equation of IAPWS-IF97 region 1 (2007 revision, eq. 7),
// for temperature tK in kelvin and absolute pressure pPa in pascals.
//
// The range is that of region 1: 273.15 K ≤ T ≤ 623.15 K and
// psat(T) ≤ p ≤ 100 MPa, with psat from the region 4 saturation equation.
// Outside it the result is a *FieldError naming "t" or "p"; nothing is
// extrapolated.
func IF97Region1Density(tK, pPa float64) (float64, error) {
	if err := if97Region1Check(tK, pPa); err != nil {
		return 0, err
	}
	return if97Region1DensityCore(tK, pPa), nil
}

// IF97Region1HeatCapacity returns the specific isobaric heat capacity cp
// of liquid water in J/(kg·K) from the same fundamental equation,
// cp = −R·τ²·γ_ττ (IF97 Table 3), for temperature tK in kelvin and
// absolute pressure pPa in pascals. Range and errors as
// IF97Region1Density. cp is finite throughout region 1; it rises steeply
// only near 350 °C, close to the critical point.
func IF97Region1HeatCapacity(tK, pPa float64) (float64, error) {
	if err := if97Region1Check(tK, pPa); err != nil {
		return 0, err
	}
	return if97Region1HeatCapacityCore(tK, pPa), nil
}

// if97Region1HeatCapacityCore is cp from region 1 without range checks.
func if97Region1HeatCapacityCore(tK, pPa float64) float64 {
	g := if97Region1Gibbs(tK, pPa)
	return -if97R * g.tau * g.tau * g.gtt
}

// if97Region1Check refuses a state outside region 1 with a *FieldError
// naming "t" or "p".
func if97Region1Check(tK, pPa float64) error {
	if math.IsNaN(tK) || tK < if97Tmin || tK > if97R1Tmax {
		return NewFieldError("t", OutsideValidity).Got(Fig(tK, Temperature)).Within(Fig(if97Tmin, Temperature), Fig(if97R1Tmax, Temperature)).Because(ReasonIF97)
	}
	if math.IsNaN(pPa) || pPa <= 0 || pPa > if97R1Pmax {
		return NewFieldError("p", AboveLimit).Got(Fig(pPa, Pressure)).AtMost(Fig(if97R1Pmax, Pressure)).Because(ReasonIF97)
	}
	ps := if97SaturationPressureCore(tK)
	if tK <= if97Tcrit && pPa < ps {
		return NewFieldError("p", BelowLimit).Got(Fig(pPa, Pressure)).AtLeast(Fig(ps, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
	}
	return nil
}

// if97Region4 holds the coefficients n1…n10 of the IF97 saturation equation
// (IAPWS-IF97, 2007 revision, Table 34); index 0 is unused.
var if97Region4 = [11]float64{
	0,
	0.11670521452767e4,
	-0.72421316703206e6,
	-0.17073846940092e2,
	0.12020824702470e5,
	-0.32325550322333e7,
	0.14915108613530e2,
	-0.48232657361591e4,
	0.40511340542057e6,
	-0.23855557567849,
	0.65017534844798e3,
}

// if97SaturationPressureCore evaluates IF97 eq. 30 without range checks.
func if97SaturationPressureCore(tK float64) float64 {
	n := &if97Region4
	x := tK / if97R4Tref
	th := x + n[9]/(x-n[10])
	a := th*th + n[1]*th + n[2]
	b := n[3]*th*th + n[4]*th + n[5]
	c := n[6]*th*th + n[7]*th + n[8]
	q := 2 * c / (-b + math.Sqrt(b*b-4*a*c))
	q *= q
	return if97R4Pref * q * q
}

// SaturationPressure returns the vapour (saturation) pressure of water in
// pascals at temperature tK in kelvin, from the saturation-pressure equation
// of IAPWS-IF97 region 4 (2007 revision, eq. 30). The equation holds from
// 273.15 K to the critical temperature 647.096 K; outside that range the
// result is a *FieldError naming "t".
func SaturationPressure(tK float64) (float64, error) {
	if math.IsNaN(tK) || tK < if97Tmin || tK > if97Tcrit {
		return 0, NewFieldError("t", OutsideValidity).Got(Fig(tK, Temperature)).Within(Fig(if97Tmin, Temperature), Fig(if97Tcrit, Temperature)).Because(ReasonIF97Saturation)
	}
	return if97SaturationPressureCore(tK), nil
}
