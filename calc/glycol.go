package calc

import (
	"math"
	"strconv"
)

// Glycol names the glycol of a glycol–water mix.
type Glycol uint8

// The glycols GlycolMix knows. The zero value is no glycol and is refused.
const (
	EthyleneGlycol  Glycol = iota + 1 // ethane-1,2-diol, C₂H₆O₂
	PropyleneGlycol                   // propane-1,2-diol, C₃H₈O₂
)

// String names the glycol in words: "ethylene glycol".
func (g Glycol) String() string {
	switch g {
	case EthyleneGlycol:
		return "ethylene glycol"
	case PropyleneGlycol:
		return "propylene glycol"
	}
	return "glycol(" + strconv.Itoa(int(g)) + ")"
}

// Range accepted by GlycolMix and GlycolProperties.
const (
	// GlycolMaxMassFraction is the highest glycol mass fraction accepted,
	// 0.6 (60 % by mass), the top of Melinder's (2010) fits.
	GlycolMaxMassFraction = 0.6
	// GlycolMaxTemperature is the highest temperature accepted, 373.15 K
	// (100 °C). The lowest is the mix's freezing point (GlycolFreezingPoint).
	GlycolMaxTemperature = 373.15
	// GlycolFitMaxTemperature is 313.15 K (40 °C), where Melinder's (2010)
	// tables stop. Above it, up to GlycolMaxTemperature, the fits are
	// extrapolated (see GlycolProperties).
	GlycolFitMaxTemperature = 313.15
	// GlycolMaxPressure is the highest absolute pressure accepted, 10 MPa,
	// as for water.
	GlycolMaxPressure = WaterMaxPressure
)

// glycolData holds the constants of one glycol.
type glycolData struct {
	molarMass float64 // kg/mol, from the formula and IUPAC standard atomic weights
	// rho20 is the pure glycol's density at 20 °C (kg/m³), used only to
	// convert a share by volume (from memory: Melinder's fits stop at 60 %
	// and give no pure glycol).
	rho20 float64
	fit   *melinderFit
}

var glycols = [...]glycolData{
	EthyleneGlycol:  {molarMass: 62.068e-3, rho20: 1113.5, fit: &melinderEthylene},
	PropyleneGlycol: {molarMass: 76.095e-3, rho20: 1036.1, fit: &melinderPropylene},
}

// glycolWaterMolar is the molar mass of ordinary water, 18.015 268 g/mol
// (IAPWS-IF97).
const glycolWaterMolar = 18.015268e-3

func (g Glycol) data() (glycolData, error) {
	if g != EthyleneGlycol && g != PropyleneGlycol {
		return glycolData{}, NewFieldError("glycol", UnknownChoice).Typed(g.String()).OneOf(EthyleneGlycol.String(), PropyleneGlycol.String())
	}
	return glycols[g], nil
}

// glycolPercent writes a fraction as a percentage, "30 %".
func glycolPercent(f float64) string {
	return strconv.FormatFloat(f*100, 'g', 4, 64) + " %"
}

func glycolCheckShare(w float64) error {
	if !(w >= 0 && w <= GlycolMaxMassFraction) {
		return NewFieldError("w", OutOfRange).Got(Num(w)).Within(Num(0), Num(GlycolMaxMassFraction)).Because(ReasonGlycolMass)
	}
	return nil
}

// GlycolFreezingPoint returns the temperature (K) at which ice first forms
// in a mix of glycol g and water at glycol mass fraction w (0 to 0.6), from
// Melinder's (2010) fit. The fit gives +0.0003 °C for ethylene glycol at
// 0 %; no freezing point is put above water's 0 °C. A bad w is a
// *FieldError naming "w".
func GlycolFreezingPoint(g Glycol, w float64) (float64, error) {
	d, err := g.data()
	if err != nil {
		return 0, err
	}
	if err := glycolCheckShare(w); err != nil {
		return 0, err
	}
	return glycolFreeze(d, w), nil
}

// glycolFreeze is the freezing point, K, at mass fraction w.
func glycolFreeze(d glycolData, w float64) float64 {
	dx := w*100 - d.fit.xm
	f := d.fit.freeze
	tf := f[0] + dx*(f[1]+dx*(f[2]+dx*(f[3]+dx*(f[4]+dx*f[5]))))
	return 273.15 + math.Min(tf, 0)
}

// GlycolVolumeFraction converts a glycol mass fraction w (0 to 0.6) to the
// volume fraction the trade usually means by "% by volume": the glycol's
// volume over the sum of the glycol's and the water's volumes measured
// apart at 20 °C, before mixing (the mix itself shrinks a little). The
// pure glycol's density at 20 °C is from memory (1113.5 kg/m³ ethylene,
// 1036.1 kg/m³ propylene glycol), the water's from IF97 at 20 °C and
// 101.325 kPa. Every other figure of this file is on the mass basis. A bad
// w is a *FieldError naming "w".
func GlycolVolumeFraction(g Glycol, w float64) (float64, error) {
	d, err := g.data()
	if err != nil {
		return 0, err
	}
	if err := glycolCheckShare(w); err != nil {
		return 0, err
	}
	vg := w / d.rho20
	return vg / (vg + (1-w)/glycolWater20()), nil
}

// GlycolMassFraction converts a volume fraction phi, as defined by
// GlycolVolumeFraction, to the mass fraction. phi must give a mass
// fraction from 0 to 0.6 (about 0 to 57 % by volume for ethylene glycol,
// 59 % for propylene glycol); else a *FieldError naming "phi" quoting the
// range by volume.
func GlycolMassFraction(g Glycol, phi float64) (float64, error) {
	d, err := g.data()
	if err != nil {
		return 0, err
	}
	maxPhi, _ := GlycolVolumeFraction(g, GlycolMaxMassFraction)
	if !(phi >= 0 && phi <= maxPhi*(1+1e-12)) {
		return 0, NewFieldError("phi", OutOfRange).Got(Num(phi)).Within(Num(0), Num(maxPhi)).Because(ReasonGlycolVolume, Num(GlycolMaxMassFraction))
	}
	mg := phi * d.rho20
	return math.Min(mg/(mg+(1-phi)*glycolWater20()), GlycolMaxMassFraction), nil
}

// glycolWater20 is water's density at 20 °C and 101.325 kPa (IF97).
func glycolWater20() float64 { return if97Region1DensityCore(293.15, 101325) }

// GlycolState is what Melinder's (2010) fits give for a glycol–water mix
// at one temperature, at atmospheric pressure.
type GlycolState struct {
	Density       float64 // ρ, kg/m³
	Viscosity     float64 // dynamic viscosity μ, Pa·s
	SpecificHeat  float64 // isobaric specific heat cp, J/(kg·K)
	Conductivity  float64 // thermal conductivity λ, W/(m·K)
	FreezingPoint float64 // K, as GlycolFreezingPoint
	// Extrapolated is true above GlycolFitMaxTemperature (40 °C): the fits
	// carried past the source's tables.
	Extrapolated bool
}

// GlycolProperties returns density, viscosity, specific heat and thermal
// conductivity of a mix of glycol g and water, glycol mass fraction w (0
// to 0.6), at temperature tK, from Melinder's (2010) fitted equations (the
// coefficients and their checks: glycol_melinder.go). The source tabulates
// them from the freezing point to 40 °C; from 40 °C to 100 °C the fits are
// extrapolated and Extrapolated is set. At 0 % they give IAPWS water within
// 0.1 % in density, 0.25 % in cp, 1.1 % in λ and 2 % in viscosity all the
// way to 100 °C, and every property stays smooth and monotone in w there;
// how far they hold for the mixes above 40 °C is not known from the
// source. Atmospheric pressure throughout (the source's).
//
// A bad w is a *FieldError naming "w"; a temperature below the freezing
// point a *FieldError naming "t" of kind BelowLimit quoting the freezing
// point, one above 100 °C or NaN a *FieldError naming "t".
func GlycolProperties(g Glycol, w, tK float64) (GlycolState, error) {
	d, err := g.data()
	if err != nil {
		return GlycolState{}, err
	}
	if err := glycolCheckShare(w); err != nil {
		return GlycolState{}, err
	}
	tf := glycolFreeze(d, w)
	switch {
	case math.IsNaN(tK) || tK > GlycolMaxTemperature+waterTempSlack:
		return GlycolState{}, NewFieldError("t", OutOfRange).Got(Fig(tK, Temperature)).Within(Fig(tf, Temperature), Fig(GlycolMaxTemperature, Temperature)).Because(ReasonGlycolTemperature)
	case tK < tf-1e-9:
		return GlycolState{}, NewFieldError("t", BelowLimit).Got(Fig(tK, Temperature)).AtLeast(Fig(tf, Temperature)).Typed(g.String()).Because(ReasonGlycolFreezes, Num(w))
	case tK > GlycolMaxTemperature:
		tK = GlycolMaxTemperature
	}
	fit := d.fit
	dx, dt := w*100-fit.xm, tK-273.15-fit.tm
	return GlycolState{
		Density:       fit.rho.at(dx, dt),
		Viscosity:     1e-3 * math.Exp(fit.lnMu.at(dx, dt)),
		SpecificHeat:  fit.cp.at(dx, dt),
		Conductivity:  fit.lambda.at(dx, dt),
		FreezingPoint: tf,
		Extrapolated:  tK > GlycolFitMaxTemperature+waterTempSlack,
	}, nil
}

// at sums the polynomial at dx = x − xm, dt = t − tm, Horner's way in
// both.
func (c *melinderPoly) at(dx, dt float64) float64 {
	var f float64
	for i := len(c) - 1; i >= 0; i-- {
		r := c[i]
		f = f*dx + r[0] + dt*(r[1]+dt*(r[2]+dt*r[3]))
	}
	return f
}

// GlycolMix returns the properties of a mix of glycol g and water, glycol
// mass fraction w (0 to 0.6), at temperature tK (from the mix's freezing
// point to 100 °C) and absolute pressure pPa (from the mix's vapour
// pressure to 10 MPa), as a Fluid:
//   - density and viscosity from Melinder's (2010) fits, as
//     GlycolProperties (extrapolated above 40 °C); the density, given
//     there at atmospheric pressure, compressed to pPa in the ratio of pure
//     water's IF97 densities, as for Seawater (at 0 °C below 0 °C);
//   - vapour pressure: Raoult's law, the water's mole fraction times
//     water's IF97 saturation pressure (at 0 °C below 0 °C, which errs
//     high, the safe side for NPSH); the glycol's own vapour pressure, a
//     few pascals, is left out. Melinder gives no vapour pressure: this is
//     the ideal-solution law, not a fit to measurements, and how far real
//     mixes depart from it has not been checked here.
//
// For specific heat and thermal conductivity, see GlycolProperties.
// Outside the range: a *FieldError naming "w", "t" (with the freezing
// point when below it) or "p". Not the properties of a commercial inhibited
// glycol, whose additives change them: its maker's data sheet governs.
func GlycolMix(g Glycol, w, tK, pPa float64) (Fluid, error) {
	st, err := GlycolProperties(g, w, tK)
	if err != nil {
		return Fluid{}, err
	}
	d, _ := g.data()
	tK = math.Min(tK, GlycolMaxTemperature)
	tw := math.Max(tK, WaterMinTemperature) // water's formulations are not taken below 0 °C
	psat := if97SaturationPressureCore(tw)
	pv := glycolWaterMoleFraction(d, w) * psat
	if math.IsNaN(pPa) || pPa < pv || pPa > GlycolMaxPressure {
		return Fluid{}, NewFieldError("p", OutOfRange).Got(Fig(pPa, Pressure)).Within(Fig(pv, Pressure), Fig(GlycolMaxPressure, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
	}
	// water's IF97 region 1 is taken no lower than its saturation pressure
	compress := if97Region1DensityCore(tw, math.Max(pPa, psat)) / if97Region1DensityCore(tw, math.Max(seawaterRefPressure, psat))
	return Fluid{
		Name:           glycolPercent(w) + " " + g.String() + " by mass at " + formatCelsius(tK),
		Density:        st.Density * compress,
		Viscosity:      st.Viscosity,
		VapourPressure: pv,
		Temperature:    tK,
		Pressure:       pPa,
	}, nil
}

// glycolWaterMoleFraction is the water's mole fraction at glycol mass
// fraction w.
func glycolWaterMoleFraction(d glycolData, w float64) float64 {
	nw := (1 - w) / glycolWaterMolar
	return nw / (nw + w/d.molarMass)
}
