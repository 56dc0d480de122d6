package scenario

import (
	"strings"
	"unicode"

	"fieldhead/calc"
)

// field describes how one parameter's value is read.
type field struct {
	dim    calc.Dimension
	si, us string // default units for a value typed without one
}

// fields lists the parameters that hold a quantity. Diameters and
// roughness default to mm or in; everything else to the usual field unit.
var fields = map[string]field{
	"t":    {calc.Temperature, "°C", "°F"},
	"rho":  {calc.Density, "kg/m³", "lb/ft³"},
	"mu":   {calc.DynamicViscosity, "mPa·s", "cP"},
	"pv":   {calc.Pressure, "kPa", "psi"},
	"alt":  {calc.Length, "m", "ft"},
	"baro": {calc.Pressure, "kPa", "psi"},
	"p1":   {calc.Pressure, "kPa", "psi"},
	"p2":   {calc.Pressure, "kPa", "psi"},
	"z1":   {calc.Length, "m", "ft"},
	"z2":   {calc.Length, "m", "ft"},
	"v1":   {calc.Velocity, "m/s", "ft/s"},
	"v2":   {calc.Velocity, "m/s", "ft/s"},
	"d1":   {calc.Length, "mm", "in"},
	"d2":   {calc.Length, "mm", "in"},
	"q":    {calc.Flow, "L/s", "gpm"},
	"hp":   {calc.Length, "m", "ft"},
	"ht":   {calc.Length, "m", "ft"},
	"hf":   {calc.Length, "m", "ft"},
	"l":    {calc.Length, "m", "ft"},
	"d":    {calc.Length, "mm", "in"},
	"eps":  {calc.Length, "mm", "in"},
	"cv":   {calc.Pressure, "kPa", "psi"},
	// The pump: data-sheet lists (one unit for the whole list, written at
	// its end: pq=0,20,40L/s) and the speed.
	"pq":    {calc.Flow, "L/s", "gpm"},
	"ph":    {calc.Length, "m", "ft"},
	"peff":  {calc.Dimensionless, "%", "%"},
	"pnpsh": {calc.Length, "m", "ft"},
	"spd":   {calc.Dimensionless, "%", "%"},
	"zp":    {calc.Length, "m", "ft"},
	"npshr": {calc.Length, "m", "ft"},
	// The field check's readings.
	"ps":   {calc.Pressure, "kPa", "psi"},
	"pd":   {calc.Pressure, "kPa", "psi"},
	"zs":   {calc.Length, "m", "ft"},
	"zd":   {calc.Length, "m", "ft"},
	"ds":   {calc.Length, "mm", "in"},
	"dd":   {calc.Length, "mm", "in"},
	"qm":   {calc.Flow, "L/s", "gpm"},
	"pin":  {calc.Power, "kW", "hp"},
	"etat": {calc.Dimensionless, "%", "%"},
}

// baseParam maps a segment parameter to the single-run parameter it
// mirrors ("s3.d" → "d"); a segment's end elevation reads like z1.
func baseParam(param string) string {
	if len(param) > 2 && param[0] == 's' {
		if _, f, ok := strings.Cut(param, "."); ok {
			if f == "z" {
				return "z1"
			}
			return f
		}
	}
	return param
}

// DimensionOf reports the kind of quantity a parameter holds; ok is false
// for parameters that hold a choice, a count or free text.
func DimensionOf(param string) (calc.Dimension, bool) {
	f, ok := fields[baseParam(param)]
	return f.dim, ok
}

// DefaultUnit is the unit a value of param takes when typed without one.
func DefaultUnit(param string, us bool) string {
	f, ok := fields[baseParam(param)]
	if !ok {
		return ""
	}
	if us {
		return f.us
	}
	return f.si
}

// UnitChoices lists unit symbols for a picker beside param, the default
// first. Convert's value (cv) also offers heads of the liquid (m, ft).
func UnitChoices(param string, us bool) []string {
	f, ok := fields[baseParam(param)]
	if !ok {
		return nil
	}
	def := DefaultUnit(param, us)
	out := []string{def}
	add := func(u calc.Unit) {
		for _, have := range out {
			if have == u.Symbol {
				return
			}
		}
		out = append(out, u.Symbol)
	}
	for _, u := range calc.UnitsFor(f.dim) {
		add(u)
	}
	if param == "cv" {
		for _, u := range calc.UnitsFor(calc.Length) {
			if u.Symbol == "m" || u.Symbol == "ft" {
				add(u)
			}
		}
	}
	return out
}

// Split separates a typed value into its number and its unit text:
// "45 L/s" → "45", "L/s"; "-18kPa" → "-18", "kPa"; "1e-3 m" → "1e-3", "m".
func Split(text string) (number, unit string) {
	s := strings.TrimSpace(text)
	i := 0
	for i < len(s) {
		c := s[i]
		switch {
		case c >= '0' && c <= '9', c == '.', c == ',', c == '+', c == '-':
			i++
		case (c == 'e' || c == 'E') && i > 0 && i+1 < len(s) && (isDigit(s[i+1]) || ((s[i+1] == '-' || s[i+1] == '+') && i+2 < len(s) && isDigit(s[i+2]))):
			i++
		default:
			return strings.TrimSpace(s[:i]), strings.TrimSpace(s[i:])
		}
	}
	return s, ""
}

func isDigit(c byte) bool { return c >= '0' && c <= '9' }

// Choice is one option of an enumerated parameter.
type Choice struct {
	Value string // as written in the link
	Label string // as shown to a person
}

// Choices lists the options of an enumerated parameter (view, units, liq,
// solve, alpha, fm, mat, nps, sch, p1ref, p2ref, cvref, fit), or nil.
func Choices(param string) []Choice {
	switch baseParam(param) {
	case "view":
		return []Choice{{"balance", "Balance"}, {"convert", "Convert"}, {"regime", "Regime"},
			{"line", "Line"}, {"pump", "Pump"}, {"report", "Report"}}
	case "units":
		return []Choice{{"si", "SI"}, {"us", "US"}}
	case "liq":
		return []Choice{{"water", "Water"}, {"seawater", "Seawater, 35 g/kg (0–40 °C)"}, {"custom", "Other liquid (typed properties)"}}
	case "solve":
		return []Choice{
			{"hp", "pump head"}, {"ht", "turbine head"}, {"hf", "friction head"},
			{"p1", "pressure at 1"}, {"p2", "pressure at 2"},
			{"z1", "elevation of 1"}, {"z2", "elevation of 2"}, {"q", "flow"},
		}
	case "alpha":
		return []Choice{{"auto", "from the regime (2 laminar, 1 turbulent)"}, {"1", "1 everywhere"}, {"pl", "power-law profile estimate"}}
	case "fm":
		return []Choice{
			{calc.MethodColebrook.String(), "Colebrook–White"},
			{calc.MethodSwameeJain.String(), "Swamee–Jain (explicit)"},
			{calc.MethodHaaland.String(), "Haaland (explicit)"},
			{calc.MethodHazenWilliams.String(), "Hazen–Williams (water)"},
		}
	case "pumps":
		return []Choice{{"1", "one pump"}, {"2p", "two in parallel"}, {"2s", "two in series"},
			{"3p", "three in parallel"}, {"3s", "three in series"}}
	case "p1ref", "p2ref", "cvref":
		return []Choice{{"g", "gauge"}, {"a", "absolute"}}
	case "mat":
		var out []Choice
		for _, m := range calc.MaterialTable() {
			out = append(out, Choice{m.Key, m.Name})
		}
		return out
	case "nps":
		var out []Choice
		seen := map[string]bool{}
		for _, p := range calc.PipeSizes() {
			if !seen[p.NPS] {
				seen[p.NPS] = true
				out = append(out, Choice{p.NPS, p.NPS})
			}
		}
		return out
	case "sch":
		var out []Choice
		seen := map[string]bool{}
		for _, p := range calc.PipeSizes() {
			if !seen[p.Schedule] {
				seen[p.Schedule] = true
				out = append(out, Choice{p.Schedule, p.Schedule})
			}
		}
		return out
	case "fit":
		var out []Choice
		for _, f := range calc.FittingTable() {
			out = append(out, Choice{f.Key, f.Name})
		}
		return out
	}
	return nil
}

// printable reports whether s is short plain text (for the free-text name).
func printable(s string) bool {
	for _, r := range s {
		if !unicode.IsPrint(r) {
			return false
		}
	}
	return true
}
