package calc

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"
)

// PressureRef says what a pressure reading is measured from.
type PressureRef int

// Pressure references. RefUnspecified means the input did not say.
const (
	RefUnspecified PressureRef = iota
	Gauge                      // relative to the surrounding atmosphere
	Absolute                   // relative to vacuum
)

// String returns "unspecified", "gauge" or "absolute".
func (r PressureRef) String() string {
	switch r {
	case Gauge:
		return "gauge"
	case Absolute:
		return "absolute"
	}
	return "unspecified"
}

// Parse reads a value with its unit, such as "250 kPa", "-18kPa", "12,5 psi",
// "3.2m", "15 L/s", "0.5 m³/h", "64 F" or "45 µm", and returns it in the SI
// unit of dim. The decimal separator may be a point or a comma; digit
// grouping is not accepted, and "1,250" (comma and three digits) is refused
// as ambiguous. A number without a unit is taken in defaultUnit, or refused
// when defaultUnit is empty (except for Dimensionless). Temperatures below
// absolute zero are refused.
//
// Every error is a *FieldError whose Field is field and whose Dim is dim:
// its Kind says what is wrong (Missing, NotANumber, NotFinite, NoUnit,
// UnknownUnit, WrongDimension, BelowLimit for a temperature below absolute
// zero), Input the text at fault, e.g. `d1: wrong dimension input="kPa"`.
func Parse(field, text string, dim Dimension, defaultUnit string) (float64, error) {
	v, _, err := parseQuantity(field, text, dim, defaultUnit, false)
	return v, err
}

// ParsePressure is Parse for a pressure that may say whether it is gauge or
// absolute: "30 psig", "2.1 bara", "430 kPa(g)", "430 kPa g", "101 kPaA",
// "14.7 psi abs". The returned pressure is the number as read, in Pa; ref
// tells which reference the input named (RefUnspecified if none).
// defaultUnit may carry a reference too, e.g. "kPa(g)".
func ParsePressure(field, text string, defaultUnit string) (pa float64, ref PressureRef, err error) {
	return parseQuantity(field, text, Pressure, defaultUnit, true)
}

func parseQuantity(field, text string, dim Dimension, defaultUnit string, withRef bool) (float64, PressureRef, error) {
	fail := func(k Kind, input string) (float64, PressureRef, error) {
		e := NewFieldError(field, k).Typed(input)
		e.Dim = dim
		return 0, RefUnspecified, e
	}
	s := strings.TrimSpace(text)
	if s == "" {
		return fail(Missing, "")
	}
	num, unitText := splitNumber(s)
	if num == "" {
		if isNonFinite(s) {
			return fail(NotFinite, s)
		}
		return fail(NotANumber, s)
	}
	x, k, why := parseDecimal(num)
	if k != KindOther {
		v, ref, err := fail(k, num)
		err.(*FieldError).Reason = why
		return v, ref, err
	}
	fromDefault := unitText == ""
	if fromDefault {
		if defaultUnit == "" && dim != Dimensionless {
			return fail(NoUnit, num)
		}
		unitText = defaultUnit
	}
	ref := RefUnspecified
	if withRef {
		unitText, ref = splitPressureRef(unitText)
	}
	u, ok := lookupUnit(unitText)
	var e *FieldError
	switch {
	case !ok && dim == Pressure && !withRef && hasPressureRef(unitText):
		e = NewFieldError(field, UnknownUnit).Because(ReasonPressureRef)
	case !ok:
		e = NewFieldError(field, UnknownUnit).OneOf(symbolList(dim)...)
	case u.Dim != dim && dim == Pressure && u.Dim == Length:
		e = NewFieldError(field, WrongDimension).Because(ReasonWaterColumn)
	case u.Dim != dim:
		e = NewFieldError(field, WrongDimension)
	}
	if e != nil {
		e.Input, e.Dim, e.UnitDim = unitText, dim, u.Dim
		return 0, RefUnspecified, e
	}
	si := u.ToSI(x)
	if math.IsInf(si, 0) || math.IsNaN(si) {
		return fail(NotFinite, s)
	}
	if dim == Temperature && si < 0 {
		v, ref, err := fail(BelowLimit, s)
		err.(*FieldError).Got(Fig(si, Temperature)).AtLeast(Fig(0, Temperature)).Because(ReasonAbsoluteZero)
		return v, ref, err
	}
	return si, ref, nil
}

// splitNumber splits s into a leading number (sign normalised to ASCII,
// empty if s has no digits there) and the rest, trimmed.
func splitNumber(s string) (num, rest string) {
	var b strings.Builder
	i := 0
	if r, n := utf8.DecodeRuneInString(s); r == '+' || r == '-' || r == '−' {
		if r != '+' {
			b.WriteByte('-')
		}
		i = n
	}
	digits := false
	for ; i < len(s); i++ {
		c := s[i]
		if c >= '0' && c <= '9' {
			digits = true
		} else if c != '.' && c != ',' {
			break
		}
		b.WriteByte(c)
	}
	if !digits {
		return "", s
	}
	// An exponent only if a digit follows "e", "e+" or "e-".
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		if j < len(s) && s[j] >= '0' && s[j] <= '9' {
			k := j
			for k < len(s) && s[k] >= '0' && s[k] <= '9' {
				k++
			}
			b.WriteString(s[i:k])
			i = k
		}
	}
	return b.String(), strings.TrimSpace(s[i:])
}

// parseDecimal parses a number from splitNumber. On failure it returns the
// kind of error (KindOther: none) and its reason.
func parseDecimal(num string) (float64, Kind, Reason) {
	mant, exp := num, ""
	if k := strings.IndexAny(num, "eE"); k >= 0 {
		mant, exp = num[:k], num[k:]
	}
	dots, commas := strings.Count(mant, "."), strings.Count(mant, ",")
	if dots+commas > 1 {
		return 0, NotANumber, ReasonGrouping
	}
	if commas == 1 {
		k := strings.IndexByte(mant, ',')
		whole, frac := strings.TrimPrefix(mant[:k], "-"), mant[k+1:]
		if len(frac) == 3 && len(whole) >= 1 && len(whole) <= 3 && whole[0] != '0' {
			return 0, NotANumber, ReasonAmbiguousComma
		}
		mant = mant[:k] + "." + frac
	}
	x, err := strconv.ParseFloat(mant+exp, 64)
	switch {
	case errors.Is(err, strconv.ErrRange):
		return 0, NotFinite, ReasonNone
	case err != nil:
		return 0, NotANumber, ReasonNone
	}
	return x, KindOther, ReasonNone
}

func isNonFinite(s string) bool {
	s = strings.ToLower(strings.TrimLeft(s, "+-−"))
	switch s {
	case "nan", "inf", "infinity", "∞":
		return true
	}
	return false
}

// pressureRefSuffixes are the gauge/absolute markers, longest first.
var pressureRefSuffixes = [...]struct {
	suffix string
	ref    PressureRef
}{
	{"(absolute)", Absolute}, {"(gauge)", Gauge}, {"(abs)", Absolute},
	{"absolute", Absolute}, {"gauge", Gauge}, {"abs", Absolute},
	{"(g)", Gauge}, {"(a)", Absolute}, {"g", Gauge}, {"a", Absolute},
}

// splitPressureRef removes a gauge/absolute marker from a pressure unit:
// "psig" → "psi", Gauge; "kPa(a)" → "kPa", Absolute. A text that is itself
// a unit ("inHg", "Pa") or whose remainder is no pressure unit is returned
// unchanged.
func splitPressureRef(u string) (string, PressureRef) {
	t := strings.TrimSpace(u)
	if _, ok := lookupUnit(t); ok {
		return t, RefUnspecified
	}
	for _, p := range pressureRefSuffixes {
		n := len(t) - len(p.suffix)
		if n <= 0 || !strings.EqualFold(t[n:], p.suffix) {
			continue
		}
		base := strings.TrimSpace(t[:n])
		if b, ok := lookupUnit(base); ok && b.Dim == Pressure {
			return base, p.ref
		}
	}
	return t, RefUnspecified
}

func hasPressureRef(u string) bool {
	_, ref := splitPressureRef(u)
	return ref != RefUnspecified
}

// quoteInput quotes user text for a message, shortened if long.
func quoteInput(s string) string {
	const limit = 32
	if utf8.RuneCountInString(s) > limit {
		r := []rune(s)
		s = string(r[:limit]) + "…"
	}
	return strconv.Quote(s)
}
