package calc

import (
	"math"
	"strings"
)

// Domain shared by the turbulent friction-factor functions (Colebrook,
// ColebrookFixedPoint, SwameeJain, Haaland). The lower Reynolds limit is
// the start of the transitional band, where these serve as the turbulent
// bound; the upper limits are those of the Moody (1944) chart.
const (
	FrictionReMin       = ReLaminarMax // lowest Re accepted by the turbulent formulas
	FrictionReMax       = 1e8          // highest Re accepted (edge of the Moody chart)
	FrictionRelRoughMax = 0.05         // highest ε/D accepted (edge of the Moody chart)
)

// Published fitting ranges of the explicit formulas. Outside them the
// functions still answer inside the shared domain, but Run.Evaluate warns.
const (
	swameeJainReMin = 5e3  // Swamee & Jain (1976)
	swameeJainRRMin = 1e-6 // Swamee & Jain (1976)
	swameeJainRRMax = 1e-2 // Swamee & Jain (1976)
	laminarReLimit  = ReTurbulentMin
)

// FrictionMethod selects how the turbulent friction loss of a pipe run is
// computed. Laminar flow always uses f = 64/Re whatever the method.
type FrictionMethod int

// Friction methods. The zero value is MethodColebrook.
const (
	MethodColebrook     FrictionMethod = iota // Colebrook–White, solved to machine precision
	MethodSwameeJain                          // Swamee & Jain (1976) explicit
	MethodHaaland                             // Haaland (1983) explicit
	MethodHazenWilliams                       // Hazen–Williams, water only
)

// String returns the method's share-link name: "colebrook", "swamee-jain",
// "haaland" or "hazen-williams".
func (m FrictionMethod) String() string {
	switch m {
	case MethodColebrook:
		return "colebrook"
	case MethodSwameeJain:
		return "swamee-jain"
	case MethodHaaland:
		return "haaland"
	case MethodHazenWilliams:
		return "hazen-williams"
	}
	return "unknown"
}

// ParseFrictionMethod reads a method name as produced by String, case
// insensitive, also accepting the short forms "cw", "sj" and "hw".
// Unknown names give a *FieldError for field "method".
func ParseFrictionMethod(s string) (FrictionMethod, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "colebrook", "colebrook-white", "cw":
		return MethodColebrook, nil
	case "swamee-jain", "swameejain", "sj":
		return MethodSwameeJain, nil
	case "haaland":
		return MethodHaaland, nil
	case "hazen-williams", "hazenwilliams", "hw":
		return MethodHazenWilliams, nil
	}
	return 0, NewFieldError("method", UnknownChoice).Typed(s).OneOf("colebrook", "swamee-jain", "haaland", "hazen-williams")
}

// frCheckTurbulent validates the inputs of the turbulent friction-factor
// functions.
func frCheckTurbulent(re, relRough float64) error {
	if math.IsNaN(re) || math.IsInf(re, 0) || re <= 0 {
		return NewFieldError("re", NotPositive).Got(Num(re))
	}
	if re < FrictionReMin || re > FrictionReMax {
		return NewFieldError("re", OutsideValidity).Got(Num(re)).Within(Num(FrictionReMin), Num(FrictionReMax)).Because(ReasonTurbulentFriction)
	}
	if math.IsNaN(relRough) || relRough < 0 || relRough > FrictionRelRoughMax {
		return NewFieldError("eps", OutOfRange).Got(Num(relRough)).Within(Num(0), Num(FrictionRelRoughMax)).Because(ReasonRelativeRoughness)
	}
	return nil
}

// LaminarFriction returns the Darcy friction factor of laminar flow,
// f = 64/Re (Hagen–Poiseuille). re must be positive and at most 4000 (the
// top of the transitional band, where 64/Re is the laminar bound); field
// "re".
func LaminarFriction(re float64) (float64, error) {
	if math.IsNaN(re) || re <= 0 || re > laminarReLimit {
		return 0, NewFieldError("re", OutsideValidity).Got(Num(re)).Within(Num(0), Num(laminarReLimit)).Because(ReasonLaminarFriction)
	}
	return 64 / re, nil
}

// SwameeJain returns the Darcy friction factor from the explicit formula
// of Swamee & Jain (1976):
//
//	f = 0.25 / [log10(ε/(3.7D) + 5.74/Re^0.9)]²
//
// fitted for 5000 ≤ Re ≤ 10⁸ and 10⁻⁶ ≤ ε/D ≤ 10⁻². Its authors state
// about 1 %; against the exact Colebrook–White solution the largest
// deviation in that range is 2.83 % (too high), at its corner Re = 5000,
// ε/D = 10⁻² (tested against python3-mpmath). It accepts the wider domain of
// Colebrook (Re 2300…10⁸, ε/D 0…0.05; fields "re", "eps").
func SwameeJain(re, relRough float64) (float64, error) {
	if err := frCheckTurbulent(re, relRough); err != nil {
		return 0, err
	}
	l := math.Log10(relRough/3.7 + 5.74/math.Pow(re, 0.9))
	return 0.25 / (l * l), nil
}

// Haaland returns the Darcy friction factor from the explicit formula of
// Haaland (1983):
//
//	1/√f = −1.8·log10[(ε/(3.7D))^1.11 + 6.9/Re]
//
// stated to be within about 1.5 % of Colebrook–White. Domain as Colebrook
// (Re 2300…10⁸, ε/D 0…0.05; fields "re", "eps").
func Haaland(re, relRough float64) (float64, error) {
	if err := frCheckTurbulent(re, relRough); err != nil {
		return 0, err
	}
	t := 6.9 / re
	if relRough > 0 {
		t += math.Pow(relRough/3.7, 1.11)
	}
	x := -1.8 * math.Log10(t)
	return 1 / (x * x), nil
}
