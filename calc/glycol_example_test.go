package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// A chilled-water loop with 30 % propylene glycol by mass at 7 °C. The
// glycol constants are recalled values (from memory): the figures are good
// to about 1 % (density) and 15 % (viscosity).
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
	// 30 % propylene glycol by mass at 7 °C: ρ 1031 kg/m³, μ 4.3 mPa·s, pv 0.91 kPa, freezes at -12.7 °C, 29.2 % by volume
}

// Below its freezing point a mix is refused, naming the temperature.
func ExampleGlycolMix_frozen() {
	_, err := calc.GlycolMix(calc.EthyleneGlycol, 0.20, 273.15-10, 101325)
	fmt.Println(err)
	// Output:
	// t: below limit (glycol freezes) input="ethylene glycol" value=-10.00 °C min=-7.900 °C f0=0.2000
}
