package calc

import (
	"math"
	"strconv"
	"strings"
)

// FormatNumber writes x with the given number of significant digits
// (clamped to 1…17), keeping trailing zeros: FormatNumber(45, 3) is "45.0",
// FormatNumber(123456, 3) is "123000", FormatNumber(0.0004567, 2) is
// "0.00046". Magnitudes below 1e-6 or from 1e12 up use an exponent,
// "1.2e-7". A non-finite x gives "—".
func FormatNumber(x float64, digits int) string {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return "—"
	}
	digits = min(max(digits, 1), 17)
	if x == 0 {
		x = 0 // drop the sign of −0
	}
	e := strconv.FormatFloat(x, 'e', digits-1, 64) // "-4.50e+01"
	k := strings.IndexByte(e, 'e')
	exp, _ := strconv.Atoi(e[k+1:])
	mant := e[:k]
	sign := ""
	if mant[0] == '-' {
		sign, mant = "-", mant[1:]
	}
	ds := strings.Replace(mant, ".", "", 1) // the significant digits
	if strings.Trim(ds, "0") == "" {
		sign = "" // rounds to zero
	}
	if exp < -6 || exp >= 12 {
		return sign + mant + "e" + strconv.Itoa(exp)
	}
	switch {
	case exp < 0:
		return sign + "0." + strings.Repeat("0", -exp-1) + ds
	case exp+1 >= len(ds):
		return sign + ds + strings.Repeat("0", exp+1-len(ds))
	default:
		return sign + ds[:exp+1] + "." + ds[exp+1:]
	}
}

// Format writes si, a value in the SI unit of u's dimension, in u with the
// given number of significant digits and u's symbol: "45.0 L/s", "18.0 °C".
func (u Unit) Format(si float64, digits int) string {
	s := FormatNumber(u.FromSI(si), digits)
	if u.Symbol == "" {
		return s
	}
	return s + " " + u.Symbol
}

// FormatValue writes si, a value in SI units, in the unit named by unit
// (any spelling LookupUnit accepts) with digits significant digits:
// FormatValue(0.045, "L/s", 3) is "45.0 L/s". For an unknown unit it writes
// the SI number followed by a bracketed note, so the gap is visible.
func FormatValue(si float64, unit string, digits int) string {
	u, ok := lookupUnit(unit)
	if !ok {
		return FormatNumber(si, digits) + " [unknown unit " + quoteInput(unit) + "]"
	}
	return u.Format(si, digits)
}
