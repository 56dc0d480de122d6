package scenario

import (
	"slices"
	"strings"
	"sync"
	"unicode"

	"fieldhead/calc"
)

// DimensionOf reports the kind of quantity a parameter holds; ok is false
// for parameters that hold a choice, a count or free text.
func DimensionOf(param string) (calc.Dimension, bool) {
	p, _, ok := Lookup(param)
	if !ok || (p.Kind != KindQuantity && p.Kind != KindList) {
		return 0, false
	}
	return p.Dim, true
}

// DefaultUnit is the unit a value of param takes when typed without one.
func DefaultUnit(param string, us bool) string {
	p, _, ok := Lookup(param)
	if !ok {
		return ""
	}
	if us {
		return p.US
	}
	return p.SI
}

// UnitChoices lists unit symbols for a picker beside param, the default
// first, then the units of its dimension a value of its kind is given in
// (a gauge's reading never in GPa, an elevation never in µm) and the row's
// ExtraUnits. A value typed or linked in a unit left out is still read.
// The list is kept once made: the view model asks for it for every box
// on every edit. The caller gets its own copy.
func UnitChoices(param string, us bool) []string {
	return slices.Clone(unitChoicesKept(param, us))
}

// unitChoicesKept is UnitChoices' list itself, for callers that only read
// it (a copy for each box's check cost an edit a few dozen allocations).
func unitChoicesKept(param string, us bool) []string {
	k := unitChoicesKey{param, us}
	unitChoicesMu.Lock()
	out, ok := unitChoicesMade[k]
	unitChoicesMu.Unlock()
	if !ok {
		out, ok = unitChoices(param, us)
		if !ok {
			return nil
		}
		unitChoicesMu.Lock()
		if unitChoicesMade == nil {
			unitChoicesMade = map[unitChoicesKey][]string{}
		}
		unitChoicesMade[k] = out
		unitChoicesMu.Unlock()
	}
	return out
}

type unitChoicesKey struct {
	param string
	us    bool
}

var (
	unitChoicesMu   sync.Mutex
	unitChoicesMade map[unitChoicesKey][]string // only parameters of the vocabulary: bounded
)

// unitRange is which units of its dimension a parameter's picker offers.
// A picker lists the units its kind of value is read or given in, so that
// a slip of the finger cannot pick GPa beside kPa for a suction gauge or
// km beside m for an elevation (common practice: gauges read in kPa, bar,
// MPa, psi or a liquid column; a modulus in GPa or ksi).
type unitRange uint8

const (
	unitsReading  unitRange = iota // a reading or a setting: see leaves
	unitsAll                       // every unit of the dimension
	unitsDistance                  // a length of pipe: km too
	unitsFine                      // a roughness: µm too
	unitsModulus                   // an elastic or bulk modulus: GPa, MPa, psi and ksi only
)

// leaves reports whether a picker of range r leaves out the unit sym of
// dim: a pressure reading GPa and ksi, a length km (but a run's) and µm
// (but a roughness), a power read at a motor Btu/h and TR (heat loads
// take every unit), a time days.
func (r unitRange) leaves(dim calc.Dimension, sym string) bool {
	if r == unitsAll {
		return false
	}
	switch dim {
	case calc.Pressure:
		if r == unitsModulus {
			return sym != "GPa" && sym != "MPa" && sym != "psi" && sym != "ksi"
		}
		return sym == "GPa" || sym == "ksi"
	case calc.Length:
		return (sym == "km" && r != unitsDistance) || (sym == "µm" && r != unitsFine)
	case calc.Power:
		return sym == "Btu/h" || sym == "TR"
	case calc.Duration:
		return sym == "d"
	}
	return false
}

func unitChoices(param string, us bool) ([]string, bool) {
	p, _, ok := Lookup(param)
	if !ok || (p.Kind != KindQuantity && p.Kind != KindList) {
		return nil, false
	}
	out := []string{DefaultUnit(param, us)}
	add := func(sym string) {
		for _, have := range out {
			if have == sym {
				return
			}
		}
		out = append(out, sym)
	}
	for _, u := range calc.UnitsFor(p.Dim) {
		if !p.units.leaves(p.Dim, u.Symbol) {
			add(u.Symbol)
		}
	}
	for _, u := range p.ExtraUnits {
		add(u)
	}
	return out, true
}

// Split separates a typed value into its number and its unit text:
// "45 L/s" → "45", "L/s"; "-18kPa" and "−18kPa" → "-18" or "−18", "kPa";
// "1e-3 m" → "1e-3", "m".
func Split(text string) (number, unit string) {
	s := strings.TrimSpace(text)
	i := 0
	for i < len(s) {
		c := s[i]
		switch {
		case c >= '0' && c <= '9', c == '.', c == ',', c == '+', c == '-':
			i++
		case strings.HasPrefix(s[i:], "−"): // a minus sign, as calc.Parse reads it
			i += len("−")
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
// solve, alpha, fm, mat, nps, sch, p1ref, p2ref, cvref, fit and the
// segments' own), or nil.
//
// The lists depend on the parameter alone and are built once; callers must
// not change the slice.
func Choices(param string) []Choice {
	p, n, f := paramRef(param) // Lookup would copy the row and word a segment's label
	if p == nil || p.choices == nil {
		return nil
	}
	base := param
	if n > 0 {
		base = f
	}
	choiceMu.Lock()
	defer choiceMu.Unlock()
	c, ok := choiceCache[base]
	if !ok {
		c = p.choices()
		choiceCache[base] = c
	}
	return c
}

var (
	choiceMu    sync.Mutex
	choiceCache = map[string][]Choice{}
)

// printable reports whether s is short plain text (for the free-text name).
func printable(s string) bool {
	for _, r := range s {
		if !unicode.IsPrint(r) {
			return false
		}
	}
	return true
}
