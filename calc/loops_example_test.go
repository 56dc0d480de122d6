package calc_test

import (
	"fmt"

	"fieldhead/calc"
)

// A chilled-water coil of 350 kW on 7/12 °C: the flow of water it needs,
// with IAPWS-IF97 density and cp at the mean temperature, 9.5 °C.
func ExampleFlowForLoad() {
	c := calc.HeatCarrier{Liquid: calc.HeatWater, Pressure: 3e5}
	hf, err := calc.FlowForLoad(c, 350e3, 273.15+7, 273.15+12)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.2f L/s (cooling %v), ρ %.1f kg/m³, cp %.0f J/(kg·K)\n", hf.Flow*1e3, hf.Cooling, hf.Props.Density, hf.Props.HeatCapacity)
	// Output: 16.69 L/s (cooling true), ρ 999.8 kg/m³, cp 4195 J/(kg·K)
}

// The heat 12 L/s of 30 % propylene glycol carries on a 5 K rise.
func ExampleLoadOfFlow() {
	c := calc.HeatCarrier{Liquid: calc.HeatGlycol, Glycol: calc.PropyleneGlycol, Share: 0.3, Pressure: 3e5}
	hf, err := calc.LoadOfFlow(c, 0.012, 273.15+7, 273.15+12)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.0f kW\n", hf.Load/1e3)
	// Output: 236 kW
}

// A valve that takes 30 kPa of a 120 kPa circuit has an authority of 0.25,
// the usual minimum.
func ExampleValveAuthority() {
	a, _ := calc.ValveAuthority(30e3, 90e3)
	fmt.Println(a.N, a.BelowMinimum, a.BelowAim)
	// Output: 0.25 false true
}

// Hot water near 90 °C across a valve with FL 0.85: the drop exceeds the
// choked drop, so the valve passes no more than its choked flow.
func ExampleCheckValveLiquid() {
	c, err := calc.CheckValveLiquid(calc.ValveLiquid{Kv: 18, FL: 0.85, XFz: 0.4, P1: 200e3, Drop: 120e3,
		Density: 965.3, VapourPressure: 70.18e3})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("choked %v at %.1f kPa: %.2f L/s; cavitation from %.1f kPa: %v\n",
		c.Choked, c.ChokedDrop/1e3, c.ChokedFlow*1e3, c.IncipientDrop/1e3, c.Cavitation)
	// Output: choked true at 96.6 kPa: 5.00 L/s; cavitation from 51.9 kPa: true
}

// A desalination brine of 70 g/kg at 25 °C.
func ExampleSeawaterAt() {
	f, err := calc.SeawaterAt(273.15+25, 2e5, 0.070)
	if err != nil {
		fmt.Println(err)
		return
	}
	cp, _ := calc.SeawaterHeatCapacity(273.15+25, 2e5, 0.070)
	fmt.Printf("%s: ρ %.1f kg/m³, μ %.3f mPa·s, cp %.0f J/(kg·K)\n", f.Name, f.Density, f.Viscosity*1e3, cp)
	// Output: seawater (70 g/kg) at 25 °C: ρ 1050.3 kg/m³, μ 1.041 mPa·s, cp 3835 J/(kg·K)
}
