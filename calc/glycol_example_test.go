package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// A chilled-water loop with 30 % propylene glycol by mass at 7 °C:
// density, viscosity and freezing point from Melinder's (2010) fits, the
// vapour pressure by Raoult's law.
func ExampleGlycolMix() {
	f, err := calc.GlycolMix(calc.PropyleneGlycol, 0.30, 273.15+7, 101325)
	if err != nil {
		fmt.Println(err)
		return
	}
	tf, _ := calc.GlycolFreezingPoint(calc.PropyleneGlycol, 0.30)
	phi, _ := calc.GlycolVolumeFraction(calc.PropyleneGlycol, 0.30)
	fmt.Printf("%s: ρ %.0f kg/m³, μ %.1f mPa·s, pv %.2f kPa, freezes at %.1f °C, %.1f %% by volume\n",
		f.Name, f.Density, f.Viscosity*1e3, f.VapourPressure/1e3, tf-273.15, phi*100)
	// Output:
	// 30 % propylene glycol by mass at 7 °C: ρ 1029 kg/m³, μ 5.1 mPa·s, pv 0.91 kPa, freezes at -12.8 °C, 29.2 % by volume
}

// Below its freezing point a mix is refused, naming the temperature.
func ExampleGlycolMix_frozen() {
	_, err := calc.GlycolMix(calc.EthyleneGlycol, 0.20, 273.15-10, 101325)
	fmt.Println(err)
	// Output:
	// t: below limit (glycol freezes) input="ethylene glycol" value=-10.00 °C min=-7.949 °C f0=0.2000
}

// Specific heat and thermal conductivity for a heat balance; above 40 °C
// the figures are the fits extrapolated, and say so.
func ExampleGlycolProperties() {
	for _, tC := range []float64{7, 60} {
		s, err := calc.GlycolProperties(calc.EthyleneGlycol, 0.30, 273.15+tC)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("%g °C: ρ %.1f kg/m³, μ %.3f mPa·s, cp %.0f J/(kg·K), λ %.4f W/(m·K), extrapolated %v\n",
			tC, s.Density, s.Viscosity*1e3, s.SpecificHeat, s.Conductivity, s.Extrapolated)
	}
	// Output:
	// 7 °C: ρ 1042.8 kg/m³, μ 3.312 mPa·s, cp 3679 J/(kg·K), λ 0.4527 W/(m·K), extrapolated false
	// 60 °C: ρ 1017.5 kg/m³, μ 0.866 mPa·s, cp 3829 J/(kg·K), λ 0.5002 W/(m·K), extrapolated true
}
