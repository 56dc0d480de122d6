package calc

import "math"

// HeatLiquid says how a HeatCarrier's density and specific heat are found.
type HeatLiquid uint8

// The liquids a HeatCarrier can be.
const (
	// HeatWater: density and cp from IAPWS-IF97 region 1 (Water's range,
	// 0–100 °C, psat to 10 MPa).
	HeatWater HeatLiquid = iota
	// HeatGlycol: a glycol–water mix, Melinder (2010), as GlycolMix and
	// GlycolProperties.
	HeatGlycol
	// HeatSeawater: seawater of salinity Salinity, as SeawaterAt and
	// SeawaterHeatCapacity.
	HeatSeawater
	// HeatGiven: Density and HeatCapacity given, the same at every
	// temperature.
	HeatGiven
)

// HeatCarrier is the liquid that carries heat to or from a load, and what
// its properties need besides the temperature.
type HeatCarrier struct {
	Liquid   HeatLiquid
	Pressure float64 // absolute pressure, Pa (water, glycol, seawater)
	Glycol   Glycol  // HeatGlycol: which glycol
	Share    float64 // HeatGlycol: glycol mass fraction, 0–0.6
	Salinity float64 // HeatSeawater: absolute salinity, kg/kg, 0–0.12

	Density      float64 // HeatGiven: kg/m³
	HeatCapacity float64 // HeatGiven: specific isobaric heat capacity, J/(kg·K)
}

// HeatProps are a carrier's density and specific heat at one temperature.
type HeatProps struct {
	Temperature  float64 // K
	Density      float64 // kg/m³
	HeatCapacity float64 // cp, J/(kg·K)
	// Warnings: a glycol mix above Melinder's tables
	// (CautionGlycolExtrapolated, field "t").
	Warnings []Warning
}

// heatMaxCapacity bounds a given cp: no liquid reaches 10 kJ/(kg·K)
// (water's, about 4.2, is among the highest).
const heatMaxCapacity = 1e4

// At returns the carrier's density and cp at temperature tK. Errors are
// those of the property functions (*FieldError naming "t", "p", "w" or
// "sal"), "rho" or "cp" for a HeatGiven carrier, and "liq" (UnknownChoice)
// for an unknown Liquid.
func (c HeatCarrier) At(tK float64) (HeatProps, error) {
	out := HeatProps{Temperature: tK}
	switch c.Liquid {
	case HeatWater:
		fl, err := Water(tK, c.Pressure)
		if err != nil {
			return HeatProps{}, err
		}
		out.Density, out.HeatCapacity = fl.Density, if97Region1HeatCapacityCore(fl.Temperature, fl.Pressure)
	case HeatGlycol:
		fl, err := GlycolMix(c.Glycol, c.Share, tK, c.Pressure)
		if err != nil {
			return HeatProps{}, err
		}
		st, _ := GlycolProperties(c.Glycol, c.Share, tK) // GlycolMix has checked the same inputs
		out.Density, out.HeatCapacity = fl.Density, st.SpecificHeat
		if st.Extrapolated {
			out.Warnings = append(out.Warnings, Warn("t", CautionGlycolExtrapolated, Fig(tK, Temperature), Fig(GlycolFitMaxTemperature, Temperature)))
		}
	case HeatSeawater:
		fl, err := SeawaterAt(tK, c.Pressure, c.Salinity)
		if err != nil {
			return HeatProps{}, err
		}
		cp, err := SeawaterHeatCapacity(tK, c.Pressure, c.Salinity)
		if err != nil {
			return HeatProps{}, err
		}
		out.Density, out.HeatCapacity = fl.Density, cp
	case HeatGiven:
		switch {
		case !(c.Density > 0) || c.Density > 1e5:
			return HeatProps{}, NewFieldError("rho", NotPositive).Got(Fig(c.Density, Density))
		case !(c.HeatCapacity > 0) || c.HeatCapacity > heatMaxCapacity:
			return HeatProps{}, NewFieldError("cp", OutOfRange).Got(Num(c.HeatCapacity)).Within(Num(0), Num(heatMaxCapacity))
		}
		out.Density, out.HeatCapacity = c.Density, c.HeatCapacity
	default:
		return HeatProps{}, NewFieldError("liq", UnknownChoice)
	}
	return out, nil
}

// HeatFlow is a load and the flow that carries it between two
// temperatures.
type HeatFlow struct {
	Load     float64 // heat carried, W (≥ 0)
	Flow     float64 // volumetric flow at the mean temperature, m³/s
	MassFlow float64 // kg/s
	// Supply is the temperature of the liquid going to the load, Return
	// that coming back from it, K; Cooling is true when the supply is the
	// colder (the liquid takes heat from the load).
	Supply, Return float64
	Cooling        bool
	// Props are the carrier's properties at the mean temperature
	// (Supply + Return)/2, the ones used; its Warnings are those of the
	// warmer of the two temperatures.
	Props HeatProps
}

// FlowForLoad returns the flow of carrier c that carries load (W, ≥ 0)
// between supply and return temperatures tSupply and tReturn (K):
//
//	Q = P / (ρ·cp·|ΔT|),
//
// the steady-flow energy balance of a liquid whose enthalpy change is
// cp·ΔT, with ρ and cp taken at the mean temperature (common practice;
// with cp varying almost linearly between the two temperatures, as it does
// for water over a loop's few kelvin, this equals the enthalpy
// difference to well under 0.1 %). Q is the volume flow at the mean
// temperature; a meter in the supply or return line reads it times
// ρ_mean/ρ_there. Pressure work and the pump's heat are left out.
//
// Both temperatures must lie in the carrier's range (errors naming
// "tsup" or "tret" in place of the property function's "t"); equal
// temperatures carry no heat (Inconsistent on "tret", Other "tsup",
// ReasonNoTemperatureDifference); a negative or non-finite load is an
// error on "load". Glycol above Melinder's tables adds
// CautionGlycolExtrapolated to Props.Warnings.
func FlowForLoad(c HeatCarrier, load, tSupply, tReturn float64) (HeatFlow, error) {
	if math.IsNaN(load) || math.IsInf(load, 0) || load < 0 {
		return HeatFlow{}, NewFieldError("load", Negative).Got(Fig(load, Power))
	}
	hf, err := heatAtMean(c, tSupply, tReturn)
	if err != nil {
		return HeatFlow{}, err
	}
	hf.Load = load
	hf.MassFlow = load / (hf.Props.HeatCapacity * math.Abs(tSupply-tReturn))
	hf.Flow = hf.MassFlow / hf.Props.Density
	return hf, nil
}

// LoadOfFlow returns the heat a flow q (m³/s at the mean temperature,
// ≥ 0) of carrier c carries between tSupply and tReturn (K):
// P = ρ·Q·cp·|ΔT|, the reverse of FlowForLoad, with the same properties,
// range and errors (a bad flow is an error on "q").
func LoadOfFlow(c HeatCarrier, q, tSupply, tReturn float64) (HeatFlow, error) {
	if math.IsNaN(q) || math.IsInf(q, 0) || q < 0 {
		return HeatFlow{}, NewFieldError("q", Negative).Got(Fig(q, Flow))
	}
	hf, err := heatAtMean(c, tSupply, tReturn)
	if err != nil {
		return HeatFlow{}, err
	}
	hf.Flow = q
	hf.MassFlow = q * hf.Props.Density
	hf.Load = hf.MassFlow * hf.Props.HeatCapacity * math.Abs(tSupply-tReturn)
	return hf, nil
}

// heatAtMean checks both temperatures against the carrier's range and
// returns the carrier's properties at their mean.
func heatAtMean(c HeatCarrier, tSupply, tReturn float64) (HeatFlow, error) {
	for _, t := range [...]struct {
		field string
		v     float64
	}{{"tsup", tSupply}, {"tret", tReturn}} {
		if _, err := c.At(t.v); err != nil {
			return HeatFlow{}, renameField(err, "t", t.field)
		}
	}
	if tSupply == tReturn {
		return HeatFlow{}, NewFieldError("tret", Inconsistent).With("tsup").Got(Fig(tReturn, Temperature)).Because(ReasonNoTemperatureDifference)
	}
	p, err := c.At((tSupply + tReturn) / 2)
	if err != nil { // cannot happen for the liquids above: each range is an interval
		return HeatFlow{}, err
	}
	// A caution (glycol above its tables) is worst at the warmer end.
	hot, _ := c.At(math.Max(tSupply, tReturn))
	p.Warnings = hot.Warnings
	return HeatFlow{Supply: tSupply, Return: tReturn, Cooling: tSupply < tReturn, Props: p}, nil
}

// renameField returns err with its field from renamed to, when err is a
// *FieldError naming from; err itself otherwise.
func renameField(err error, from, to string) error {
	fe, ok := err.(*FieldError)
	if !ok || fe.Field != from {
		return err
	}
	c := *fe
	c.Field = to
	return &c
}
