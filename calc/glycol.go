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

// Range accepted by GlycolMix.
const (
	// GlycolMaxMassFraction is the highest glycol mass fraction accepted,
	// 0.6 (60 % by mass), the top of the range usually tabulated for
	// secondary coolants (Melinder 2010 covers 0 to about 0.6).
	GlycolMaxMassFraction = 0.6
	// GlycolMaxTemperature is the highest temperature accepted, 373.15 K
	// (100 °C). The lowest is the mix's freezing point (GlycolFreezingPoint).
	GlycolMaxTemperature = 373.15
	// GlycolMaxPressure is the highest absolute pressure accepted, 10 MPa,
	// as for water; the properties are taken at atmospheric pressure except
	// the water part of the density (IF97 at the pressure given).
	GlycolMaxPressure = WaterMaxPressure
)

// glycolData holds the constants of one glycol. Every number in it is from
// memory: the published coefficient sets (Melinder 2010) and handbook tables
// could not be reached when this was written, so these are recalled
// handbook-level values, good to about 1 % in density, 2 K in freezing
// point and 15 % in viscosity, and are marked so wherever they are shown.
type glycolData struct {
	molarMass float64 // kg/mol, from the formula and IUPAC standard atomic weights
	// rho20 is the pure glycol's density at 20 °C (kg/m³) and drho its
	// change per kelvin (kg/m³/K), a straight line (from memory).
	rho20, drho float64
	// excess is the mix's excess specific volume over w·(1−w), m³/kg: the
	// mix is denser than its parts' volumes added. Chosen so that the 50 %
	// mix at 20 °C has the density recalled for it (from memory: 1065 kg/m³
	// ethylene, 1038 kg/m³ propylene glycol).
	excess float64
	// freeze is the freezing point (°C) at mass fractions 0, 0.1, … 0.6
	// (from memory; 0 °C for water).
	freeze [7]float64
	// vogel holds, for mass fractions 0.1, 0.2, … 0.6, the constants of
	// ln(μ/mPa·s) = A + B/(T − C), T in K: the Vogel equation through three
	// recalled viscosities of each mix (from memory; the points are listed
	// in glycol_test.go).
	vogel [6][3]float64
}

var glycols = [...]glycolData{
	EthyleneGlycol: {
		molarMass: 62.068e-3,
		rho20:     1113.5, drho: -0.70,
		excess: -4.3864e-5,
		freeze: [7]float64{0, -3.4, -7.9, -14.1, -22.3, -33.8, -48.3},
		vogel: [6][3]float64{
			{-4.0401, 740.08, 119.88},
			{-4.2672, 893.41, 104.56},
			{-3.8335, 766.22, 124.80},
			{-4.6187, 1171.66, 85.05},
			{-5.3046, 1570.68, 57.05},
			{-5.0106, 1503.45, 68.03},
		},
	},
	PropyleneGlycol: {
		molarMass: 76.095e-3,
		rho20:     1036.1, drho: -0.70,
		excess: -8.0345e-5,
		freeze: [7]float64{0, -3.3, -7.1, -12.7, -21.1, -33.5, -51.1},
		vogel: [6][3]float64{
			{-4.0702, 764.55, 121.02},
			{-3.5086, 612.50, 146.49},
			{-3.2995, 599.62, 154.06},
			{-3.0142, 574.06, 162.69},
			{-2.9838, 630.80, 161.06},
			{-3.2309, 773.23, 152.11},
		},
	},
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
// in a mix of glycol g and water at glycol mass fraction w (0 to 0.6): a
// monotone cubic (Fritsch–Carlson) through recalled freezing points at
// every 10 % (from memory). A bad w is a *FieldError naming "w".
func GlycolFreezingPoint(g Glycol, w float64) (float64, error) {
	d, err := g.data()
	if err != nil {
		return 0, err
	}
	if err := glycolCheckShare(w); err != nil {
		return 0, err
	}
	return 273.15 + glycolFreeze(d, w), nil
}

func glycolFreeze(d glycolData, w float64) float64 {
	xs := []float64{0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6}
	return newPchip(xs, d.freeze[:]).eval(w)
}

// GlycolVolumeFraction converts a glycol mass fraction w (0 to 0.6) to the
// volume fraction the trade usually means by "% by volume": the glycol's
// volume over the sum of the glycol's and the water's volumes measured
// apart at 20 °C, before mixing (the mix itself shrinks a little). The
// glycol's density is from memory, the water's from IF97 at 20 °C and
// 101.325 kPa. A bad w is a *FieldError naming "w".
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

// GlycolMix returns the properties of a mix of glycol g and water, glycol
// mass fraction w (0 to 0.6), at temperature tK (from the mix's freezing
// point to 100 °C) and absolute pressure pPa (from the mix's vapour
// pressure to 10 MPa):
//   - density: the pure liquids' volumes added, plus an excess volume
//     w·(1−w)·v_E; water from IF97 region 1 (at 0 °C below 0 °C), the
//     glycol a straight line in temperature (constants from memory);
//   - dynamic viscosity: ln μ linear in w between rows every 10 % by mass,
//     each row the Vogel equation through three recalled viscosities (from
//     memory), and water (IAPWS 2008, at 0 °C below 0 °C) at w = 0;
//   - vapour pressure: Raoult's law, the water's mole fraction times
//     water's IF97 saturation pressure (at 0 °C below 0 °C, which errs
//     high, the safe side for NPSH); the glycol's own vapour pressure is
//     a few pascals and is left out. An approximation: real mixes deviate
//     a little from Raoult's law.
//
// Outside the range: a *FieldError naming "w", "t" (with the freezing
// point when below it) or "p". Not the properties of a commercial inhibited
// glycol, whose additives change them: its maker's data sheet governs.
func GlycolMix(g Glycol, w, tK, pPa float64) (Fluid, error) {
	d, err := g.data()
	if err != nil {
		return Fluid{}, err
	}
	if err := glycolCheckShare(w); err != nil {
		return Fluid{}, err
	}
	tf := 273.15 + glycolFreeze(d, w)
	switch {
	case math.IsNaN(tK) || tK > GlycolMaxTemperature+waterTempSlack:
		return Fluid{}, NewFieldError("t", OutOfRange).Got(Fig(tK, Temperature)).Within(Fig(tf, Temperature), Fig(GlycolMaxTemperature, Temperature)).Because(ReasonGlycolTemperature)
	case tK < tf-1e-9:
		return Fluid{}, NewFieldError("t", BelowLimit).Got(Fig(tK, Temperature)).AtLeast(Fig(tf, Temperature)).Typed(g.String()).Because(ReasonGlycolFreezes, Num(w))
	case tK > GlycolMaxTemperature:
		tK = GlycolMaxTemperature
	}
	tw := math.Max(tK, WaterMinTemperature) // water's formulations are not taken below 0 °C
	pv := glycolWaterMoleFraction(d, w) * if97SaturationPressureCore(tw)
	if math.IsNaN(pPa) || pPa < pv || pPa > GlycolMaxPressure {
		return Fluid{}, NewFieldError("p", OutOfRange).Got(Fig(pPa, Pressure)).Within(Fig(pv, Pressure), Fig(GlycolMaxPressure, Pressure)).Because(ReasonBoils, Fig(tK, Temperature))
	}
	pw := math.Max(pPa, if97SaturationPressureCore(tw))
	rhoW := if97Region1DensityCore(tw, pw)
	rhoG := d.rho20 + d.drho*(tK-293.15)
	rho := 1 / (w/rhoG + (1-w)/rhoW + w*(1-w)*d.excess)
	return Fluid{
		Name:           glycolPercent(w) + " " + g.String() + " by mass at " + formatCelsius(tK),
		Density:        rho,
		Viscosity:      glycolViscosity(d, w, tK, waterViscosityCore(tw, rhoW)),
		VapourPressure: pv,
		Temperature:    tK,
	}, nil
}

// glycolWaterMoleFraction is the water's mole fraction at glycol mass
// fraction w.
func glycolWaterMoleFraction(d glycolData, w float64) float64 {
	nw := (1 - w) / glycolWaterMolar
	return nw / (nw + w/d.molarMass)
}

// glycolViscosity interpolates ln μ linearly in w between the rows; muW is
// water's viscosity (Pa·s), the row at w = 0.
func glycolViscosity(d glycolData, w, tK, muW float64) float64 {
	row := func(i int) float64 { // ln μ in Pa·s of row i (w = 0.1·i)
		if i == 0 {
			return math.Log(muW)
		}
		c := d.vogel[i-1]
		return c[0] + c[1]/(tK-c[2]) + math.Log(1e-3)
	}
	i := int(math.Floor(w * 10))
	if i >= 6 {
		return math.Exp(row(6))
	}
	f := w*10 - float64(i)
	if i == 0 { // written so that w = 0 gives water's μ to the last bit
		return muW * math.Exp(f*(row(1)-row(0)))
	}
	return math.Exp((1-f)*row(i) + f*row(i+1))
}
