package calc

import "github.com/martinlindhe/unit"

// Defining constants of the non-SI units, from github.com/martinlindhe/unit
// where its value is the exact definition, and spelled out here where the
// library has no such unit or rounds it (psi, inHg, mmHg; see the tests).
const (
	cvInch     = float64(unit.Inch)             // 0.0254 m, exact
	cvFoot     = float64(unit.Foot)             // 0.3048 m, exact
	cvPound    = float64(unit.AvoirdupoisPound) // 0.453 592 37 kg, exact
	cvUSGallon = float64(unit.USLiquidGallon)   // 231 in³, exact
	cvCubicFt  = float64(unit.CubicFoot)        // 1728 in³, exact
	cvLitre    = float64(unit.Liter)            // 1e-3 m³, exact
	cvMinute   = float64(unit.Minute)           // 60 s
	cvHour     = float64(unit.Hour)             // 3600 s
	cvDay      = float64(unit.Day)              // 86 400 s
	cvKWh      = 3.6e6                          // J per kWh, exact
	cvCalIT    = 4.1868                         // J per calorie (International Table), exact

	// Conventional densities of the manometer liquids (ISO 31-3, as used
	// by NIST SP 811 for the "conventional" water and mercury units).
	cvRhoWater   = 1000.0  // kg/m³
	cvRhoMercury = 13595.1 // kg/m³

	cvPsi       = cvPound * StandardGravity / (cvInch * cvInch) // lbf/in²
	cvHorsePwr  = 550 * cvFoot * cvPound * StandardGravity      // 550 ft·lbf/s
	cvElecHP    = 746.0                                         // W, by definition
	cvCelsius0  = 273.15                                        // K at 0 °C
	cvFahrFac   = 5.0 / 9.0                                     // K per °F
	cvFahr0     = 459.67 * cvFahrFac                            // K at 0 °F
	cvWaterCol  = cvRhoWater * StandardGravity                  // Pa per metre of water
	cvMercuryCl = cvRhoMercury * StandardGravity                // Pa per metre of mercury

	// The British thermal unit (International Table) heats a pound of
	// water by 1 °F as the IT calorie heats a gram by 1 K:
	// 1055.055 852 62 J, exact. A ton of refrigeration is 12 000 Btu/h
	// (the heat that melts a short ton of ice at 0 °C in a day,
	// rounded), 3.516 852 8 kW.
	cvBtuIT   = cvCalIT * cvPound * 1000 * cvFahrFac // J
	cvBtuPerH = cvBtuIT / cvHour                     // W
	cvTonRef  = 12000 * cvBtuPerH                    // W
)

// unitEntry is one row of the unit catalogue.
type unitEntry struct {
	Unit
	aliases      []string // other accepted spellings (normalised on lookup)
	noFold       bool     // match case exactly (mega- and milli- prefixes)
	defSI, defUS bool     // DefaultUnit for metric / US users
}

// unitTable is the unit catalogue, by dimension, metric units first and then
// US customary ones; UnitsFor keeps this order. It is never modified.
var unitTable = []unitEntry{
	{Unit: Unit{"", Dimensionless, 1, 0, "plain number"}, defSI: true, defUS: true},
	{Unit: Unit{"%", Dimensionless, 0.01, 0, "percent"}, aliases: []string{"percent"}},

	{Unit: Unit{"m", Length, float64(unit.Meter), 0, "metre"}, aliases: []string{"metre", "metres", "meter", "meters"}, defSI: true},
	{Unit: Unit{"mm", Length, float64(unit.Millimeter), 0, "millimetre"}},
	{Unit: Unit{"cm", Length, float64(unit.Centimeter), 0, "centimetre"}},
	{Unit: Unit{"km", Length, float64(unit.Kilometer), 0, "kilometre"}},
	{Unit: Unit{"µm", Length, float64(unit.Micrometer), 0, "micrometre"}, aliases: []string{"micron", "microns"}},
	{Unit: Unit{"ft", Length, cvFoot, 0, "foot"}, aliases: []string{"feet", "foot"}, defUS: true},
	{Unit: Unit{"in", Length, cvInch, 0, "inch"}, aliases: []string{"inch", "inches"}},

	{Unit: Unit{"kPa", Pressure, float64(unit.Kilopascal), 0, "kilopascal"}, defSI: true},
	{Unit: Unit{"bar", Pressure, float64(unit.Bar), 0, "bar"}},
	{Unit: Unit{"MPa", Pressure, float64(unit.Megapascal), 0, "megapascal"}, aliases: []string{"mpa", "MPA", "Mpa"}, noFold: true},
	{Unit: Unit{"Pa", Pressure, float64(unit.Pascal), 0, "pascal"}},
	{Unit: Unit{"mbar", Pressure, float64(unit.Millibar), 0, "millibar"}},
	{Unit: Unit{"atm", Pressure, float64(unit.Atmosphere), 0, "standard atmosphere"}},
	{Unit: Unit{"mH2O", Pressure, cvWaterCol, 0, "metre of water, conventional"}, aliases: []string{"mWC"}},
	{Unit: Unit{"cmH2O", Pressure, cvWaterCol / 100, 0, "centimetre of water, conventional"}, aliases: []string{"cmWC"}},
	{Unit: Unit{"mmH2O", Pressure, cvWaterCol / 1000, 0, "millimetre of water, conventional"}, aliases: []string{"mmWC"}},
	{Unit: Unit{"mmHg", Pressure, cvMercuryCl / 1000, 0, "millimetre of mercury, conventional"}},
	{Unit: Unit{"GPa", Pressure, float64(unit.Gigapascal), 0, "gigapascal"}, aliases: []string{"gpa", "GPA", "Gpa"}, noFold: true},
	{Unit: Unit{"psi", Pressure, cvPsi, 0, "pound-force per square inch"}, aliases: []string{"lbf/in2"}, defUS: true},
	{Unit: Unit{"ksi", Pressure, 1000 * cvPsi, 0, "kilopound-force per square inch"}},
	{Unit: Unit{"ftH2O", Pressure, cvWaterCol * cvFoot, 0, "foot of water, conventional"}, aliases: []string{"ftWC"}},
	{Unit: Unit{"inH2O", Pressure, cvWaterCol * cvInch, 0, "inch of water, conventional"}, aliases: []string{"inWC"}},
	{Unit: Unit{"inHg", Pressure, cvMercuryCl * cvInch, 0, "inch of mercury, conventional"}},

	{Unit: Unit{"m/s", Velocity, float64(unit.MetersPerSecond), 0, "metre per second"}, defSI: true},
	{Unit: Unit{"ft/s", Velocity, float64(unit.FeetPerSecond), 0, "foot per second"}, aliases: []string{"fps", "ft/sec"}, defUS: true},

	{Unit: Unit{"L/s", Flow, cvLitre, 0, "litre per second"}, aliases: []string{"lps", "l/sec"}, defSI: true},
	{Unit: Unit{"m³/h", Flow, 1 / cvHour, 0, "cubic metre per hour"}, aliases: []string{"m3/hr"}},
	{Unit: Unit{"m³/s", Flow, 1, 0, "cubic metre per second"}, aliases: []string{"cumec", "cumecs"}},
	{Unit: Unit{"L/min", Flow, cvLitre / cvMinute, 0, "litre per minute"}, aliases: []string{"lpm"}},
	{Unit: Unit{"ML/d", Flow, float64(unit.Megaliter) / cvDay, 0, "megalitre per day"}, aliases: []string{"Ml/d", "ML/day", "MLD"}, noFold: true},
	{Unit: Unit{"gpm", Flow, cvUSGallon / cvMinute, 0, "US gallon per minute"}, aliases: []string{"USgpm", "gal/min"}, defUS: true},
	{Unit: Unit{"cfs", Flow, cvCubicFt, 0, "cubic foot per second"}, aliases: []string{"ft3/s"}},
	{Unit: Unit{"MGD", Flow, 1e6 * cvUSGallon / cvDay, 0, "million US gallons per day"}, aliases: []string{"mgd"}, noFold: true},

	{Unit: Unit{"°C", Temperature, 1, cvCelsius0, "degree Celsius"}, aliases: []string{"C"}, defSI: true},
	{Unit: Unit{"K", Temperature, float64(unit.Kelvin), 0, "kelvin"}, aliases: []string{"degK"}},
	{Unit: Unit{"°F", Temperature, cvFahrFac, cvFahr0, "degree Fahrenheit"}, aliases: []string{"F"}, defUS: true},

	{Unit: Unit{"kg/m³", Density, 1, 0, "kilogram per cubic metre"}, defSI: true},
	{Unit: Unit{"g/cm³", Density, 1000, 0, "gram per cubic centimetre"}, aliases: []string{"g/cc", "g/mL"}},
	{Unit: Unit{"kg/L", Density, 1000, 0, "kilogram per litre"}},
	{Unit: Unit{"lb/ft³", Density, cvPound / cvCubicFt, 0, "pound per cubic foot"}, aliases: []string{"pcf"}, defUS: true},

	{Unit: Unit{"mPa·s", DynamicViscosity, 1e-3, 0, "millipascal second"}, aliases: []string{"mPas", "mpa.s", "mpas"}, noFold: true, defSI: true},
	{Unit: Unit{"Pa·s", DynamicViscosity, 1, 0, "pascal second"}, aliases: []string{"Pas"}},
	{Unit: Unit{"cP", DynamicViscosity, 1e-3, 0, "centipoise"}, aliases: []string{"cps", "centipoise"}, defUS: true},
	{Unit: Unit{"P", DynamicViscosity, 0.1, 0, "poise"}, aliases: []string{"poise"}},

	{Unit: Unit{"mm²/s", KinematicViscosity, 1e-6, 0, "square millimetre per second"}, defSI: true},
	{Unit: Unit{"m²/s", KinematicViscosity, 1, 0, "square metre per second"}},
	{Unit: Unit{"cSt", KinematicViscosity, 1e-6, 0, "centistokes"}, defUS: true},
	{Unit: Unit{"St", KinematicViscosity, 1e-4, 0, "stokes"}},
	{Unit: Unit{"ft²/s", KinematicViscosity, float64(unit.SquareFoot), 0, "square foot per second"}},

	{Unit: Unit{"kW", Power, float64(unit.Kilowatt), 0, "kilowatt"}, defSI: true},
	{Unit: Unit{"W", Power, float64(unit.Watt), 0, "watt"}},
	{Unit: Unit{"MW", Power, float64(unit.Megawatt), 0, "megawatt"}, noFold: true},
	{Unit: Unit{"hp", Power, cvHorsePwr, 0, "horsepower (mechanical, 550 ft·lbf/s)"}, defUS: true},
	{Unit: Unit{"hp(E)", Power, cvElecHP, 0, "horsepower (electric, 746 W)"}, aliases: []string{"hpE"}},
	{Unit: Unit{"Btu/h", Power, cvBtuPerH, 0, "British thermal unit (IT) per hour"}, aliases: []string{"Btu/hr", "Btuh", "BTUH"}},
	{Unit: Unit{"TR", Power, cvTonRef, 0, "ton of refrigeration (12 000 Btu/h)"}, aliases: []string{"ton", "tons", "RT"}},

	{Unit: Unit{"m²", Area, float64(unit.SquareMeter), 0, "square metre"}, defSI: true},
	{Unit: Unit{"cm²", Area, float64(unit.SquareCentimeter), 0, "square centimetre"}},
	{Unit: Unit{"mm²", Area, float64(unit.SquareMillimeter), 0, "square millimetre"}},
	{Unit: Unit{"ft²", Area, float64(unit.SquareFoot), 0, "square foot"}, aliases: []string{"sqft"}, defUS: true},
	{Unit: Unit{"in²", Area, float64(unit.SquareInch), 0, "square inch"}},

	{Unit: Unit{"kg", Mass, float64(unit.Kilogram), 0, "kilogram"}, defSI: true},
	{Unit: Unit{"g", Mass, float64(unit.Gram), 0, "gram"}},
	{Unit: Unit{"t", Mass, float64(unit.Tonne), 0, "tonne"}},
	{Unit: Unit{"lb", Mass, cvPound, 0, "pound (avoirdupois)"}, aliases: []string{"lbm", "lbs"}, defUS: true},

	{Unit: Unit{"s", Duration, float64(unit.Second), 0, "second"}, aliases: []string{"sec"}, defSI: true, defUS: true},
	{Unit: Unit{"min", Duration, cvMinute, 0, "minute"}},
	{Unit: Unit{"h", Duration, cvHour, 0, "hour"}, aliases: []string{"hr"}},
	{Unit: Unit{"d", Duration, cvDay, 0, "day"}, aliases: []string{"day"}},

	{Unit: Unit{"kWh/m³", SpecificEnergy, cvKWh, 0, "kilowatt-hour per cubic metre"}, defSI: true},
	{Unit: Unit{"kWh/kgal", SpecificEnergy, cvKWh / (1000 * cvUSGallon), 0, "kilowatt-hour per thousand US gallons"}, defUS: true},

	{Unit: Unit{"kWh/(m³·100 m)", SpecificEnergyHead, cvKWh / 100, 0, "kilowatt-hour per cubic metre and 100 m of head"}, aliases: []string{"kWh/(m³·100m)"}, defSI: true},
	{Unit: Unit{"kWh/(kgal·100 ft)", SpecificEnergyHead, cvKWh / (1000 * cvUSGallon * 100 * cvFoot), 0, "kilowatt-hour per thousand US gallons and 100 ft of head"}, aliases: []string{"kWh/(kgal·100ft)"}, defUS: true},

	{Unit: Unit{"rpm", Frequency, 1 / cvMinute, 0, "revolutions per minute"}, aliases: []string{"r/min", "rev/min", "min-1"}, defSI: true, defUS: true},
	{Unit: Unit{"Hz", Frequency, 1, 0, "hertz"}, aliases: []string{"hz"}},
}
