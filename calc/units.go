package calc

import (
	"strings"
	"unicode"
)

// Dimension is the kind of physical quantity a value or unit measures. The
// zero value is Dimensionless, so a forgotten dimension rejects every unit
// rather than silently taking one.
type Dimension int

// The dimensions known to this package. Head of a liquid is a Length; the
// conventional water-column units (mH2O, ftH2O, ...) are Pressure units.
const (
	Dimensionless      Dimension = iota // plain number or percentage
	Length                              // m
	Pressure                            // Pa
	Velocity                            // m/s
	Flow                                // volumetric flow, m³/s
	Temperature                         // K (thermodynamic temperature)
	Density                             // kg/m³
	DynamicViscosity                    // Pa·s
	KinematicViscosity                  // m²/s
	Power                               // W
	Area                                // m²
	Mass                                // kg
	Duration                            // s
	// SpecificEnergy is energy per volume pumped, J/m³ (reported in
	// kWh/m³ by water utilities).
	SpecificEnergy
	// SpecificEnergyHead is specific energy per unit of head, J/m⁴
	// (reported in kWh/(m³·100 m)).
	SpecificEnergyHead
	// Frequency is a rotational speed or a supply frequency, Hz (1/s).
	Frequency
)

// dimInfo describes one dimension for messages.
type dimInfo struct {
	name    string // used in messages: "a length"
	article string
	example string // a typical input
}

var dimInfos = [...]dimInfo{
	Dimensionless:      {"number", "a", "0.75"},
	Length:             {"length", "a", "203 mm"},
	Pressure:           {"pressure", "a", "250 kPa"},
	Velocity:           {"velocity", "a", "1.5 m/s"},
	Flow:               {"volumetric flow", "a", "45 L/s"},
	Temperature:        {"temperature", "a", "18 °C"},
	Density:            {"density", "a", "998 kg/m³"},
	DynamicViscosity:   {"dynamic viscosity", "a", "1.0 mPa·s"},
	KinematicViscosity: {"kinematic viscosity", "a", "1.0 mm²/s"},
	Power:              {"power", "a", "31 kW"},
	Area:               {"area", "an", "0.03 m²"},
	Mass:               {"mass", "a", "12 kg"},
	Duration:           {"duration", "a", "30 s"},
	SpecificEnergy:     {"specific energy", "a", "0.45 kWh/m³"},
	SpecificEnergyHead: {"specific energy per head", "a", "0.4 kWh/(m³·100 m)"},
	Frequency:          {"speed or frequency", "a", "1450 rpm"},
}

func (d Dimension) valid() bool { return d >= 0 && int(d) < len(dimInfos) }

// String returns the lower-case name of the dimension as used in messages,
// such as "length", "pressure" or "volumetric flow".
func (d Dimension) String() string {
	if !d.valid() {
		return "unknown dimension"
	}
	return dimInfos[d].name
}

// expected returns "a pressure, e.g. 250 kPa" for messages.
func (d Dimension) expected() string {
	if !d.valid() {
		return "a value of an unknown dimension"
	}
	i := dimInfos[d]
	return i.article + " " + i.name + ", e.g. " + i.example
}

// Unit is a unit of measure. A value v in this unit is v·Factor + Offset in
// the SI unit of its dimension (Offset is non-zero only for °C and °F).
type Unit struct {
	Symbol string    // display symbol, e.g. "kPa", "m³/h", "°C"
	Dim    Dimension // what the unit measures
	Factor float64   // SI value of one unit, less Offset
	Offset float64   // SI value of zero in this unit
	Name   string    // descriptive name, e.g. "kilopascal"
}

// ToSI converts v, expressed in u, to the SI unit of u's dimension.
func (u Unit) ToSI(v float64) float64 { return v*u.Factor + u.Offset }

// FromSI converts si, expressed in the SI unit of u's dimension, to u.
func (u Unit) FromSI(si float64) float64 { return (si - u.Offset) / u.Factor }

// unitIndex finds units by normalised spelling. It is built once and only
// read afterwards.
type unitIndex struct {
	exact map[string]int // normalised alias → index in unitTable
	fold  map[string]int // lower-cased alias → index, unambiguous ones only
}

var unitLookup = buildUnitIndex()

func buildUnitIndex() unitIndex {
	ix := unitIndex{exact: map[string]int{}, fold: map[string]int{}}
	clash := map[string]bool{}
	for i, e := range unitTable {
		for _, a := range append([]string{e.Symbol}, e.aliases...) {
			k := normUnit(a)
			if _, dup := ix.exact[k]; !dup {
				ix.exact[k] = i
			}
			if e.noFold {
				continue
			}
			f := strings.ToLower(k)
			if j, ok := ix.fold[f]; ok && j != i {
				clash[f] = true
			}
			ix.fold[f] = i
		}
	}
	for f := range clash {
		delete(ix.fold, f)
	}
	return ix
}

// normUnit reduces the spelling variants of a unit symbol to one ASCII form:
// "m³/h" and "m^3 / h" become "m3/h", "mPa·s" and "mPa s" become "mPa.s",
// "µm" becomes "um", "°C" and "deg C" become "degC".
func normUnit(s string) string {
	var b strings.Builder
	space := false
	for _, r := range strings.TrimSpace(s) {
		if unicode.IsSpace(r) {
			space = true
			continue
		}
		if space {
			b.WriteByte('.')
			space = false
		}
		switch r {
		case '³':
			b.WriteByte('3')
		case '²', '₂':
			b.WriteByte('2')
		case 'µ', 'μ':
			b.WriteByte('u')
		case '·', '⋅', '•', '∙', '*':
			b.WriteByte('.')
		case '°', 'º', '˚':
			b.WriteString("deg")
		case '℃':
			b.WriteString("degC")
		case '℉':
			b.WriteString("degF")
		case '⁄', '∕':
			b.WriteByte('/')
		case '^':
		default:
			b.WriteRune(r)
		}
	}
	n := b.String()
	for _, p := range [...][2]string{
		{"..", "."}, {"./", "/"}, {"/.", "/"}, {"deg.", "deg"},
		{".H2O", "H2O"}, {".Hg", "Hg"}, {".wc", "wc"}, {".WC", "WC"},
	} {
		for strings.Contains(n, p[0]) {
			n = strings.ReplaceAll(n, p[0], p[1])
		}
	}
	// A symbol of dots and spaces alone is no unit at all, never the plain
	// number's empty symbol ("4 ..." is not 4).
	if t := strings.Trim(n, "."); t != "" || strings.TrimSpace(s) == "" {
		return t
	}
	return strings.TrimSpace(s)
}

// LookupUnit finds a unit by its symbol or one of its common spellings:
// "kPa", "kpa", "psi", "m3/h", "m³/h", "L/s", "l/s", "gpm", "°C", "C",
// "degC", "°F", "F", "mPa·s", "mPa.s", "cP", "µm", "um", "mH2O", "inWC".
// Case is ignored where that is unambiguous; mega-prefixed units (MPa, MW,
// ML/d, MGD) and mPa·s are matched only as listed, so "mPa" is never taken
// for "MPa". The empty symbol is the plain number (Dimensionless). An
// unknown symbol gives a *FieldError with Field "unit".
func LookupUnit(sym string) (Unit, error) {
	if u, ok := lookupUnit(sym); ok {
		return u, nil
	}
	return Unit{}, NewFieldError("unit", UnknownUnit).Typed(sym)
}

func lookupUnit(sym string) (Unit, bool) {
	// Most symbols read are already in normal form (a picker's, a link's):
	// normUnit is idempotent, so one found as it is needs no normalising,
	// which allocates and took about 4 % of an edit's Go time.
	if i, ok := unitLookup.exact[sym]; ok {
		return unitTable[i].Unit, true
	}
	k := normUnit(sym)
	if i, ok := unitLookup.exact[k]; ok {
		return unitTable[i].Unit, true
	}
	if i, ok := unitLookup.fold[strings.ToLower(k)]; ok {
		return unitTable[i].Unit, true
	}
	return Unit{}, false
}

// UnitsFor lists the units of a dimension for a unit picker: SI and other
// metric units first, then US customary units. The slice is a fresh copy.
func UnitsFor(dim Dimension) []Unit {
	var us []Unit
	for _, e := range unitTable {
		if e.Dim == dim {
			us = append(us, e.Unit)
		}
	}
	return us
}

// DefaultUnit returns the unit a new input of this dimension starts in: a
// metric one, or the usual US customary one when us is true (US practice
// keeps cP and cSt for viscosity). An unknown dimension gives the zero Unit.
func DefaultUnit(dim Dimension, us bool) Unit {
	for _, e := range unitTable {
		if e.Dim == dim && ((us && e.defUS) || (!us && e.defSI)) {
			return e.Unit
		}
	}
	return Unit{}
}

// symbolList lists the symbols of a dimension, for an error's choices.
func symbolList(dim Dimension) []string {
	var s []string
	for _, u := range UnitsFor(dim) {
		if u.Symbol != "" {
			s = append(s, u.Symbol)
		}
	}
	return s
}

// symbolsFor lists the symbols of a dimension as text.
//
// Deprecated: errors carry symbolList as data; kept for code written
// against it.
func symbolsFor(dim Dimension) string { return strings.Join(symbolList(dim), ", ") }
