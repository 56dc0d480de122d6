package calc

import (
	"bytes"
	"math"
	"strconv"
)

// FormatNumber writes x with the given number of significant digits
// (clamped to 1…17), keeping trailing zeros: FormatNumber(45, 3) is "45.0",
// FormatNumber(123456, 3) is "123000", FormatNumber(0.0004567, 2) is
// "0.00046". Magnitudes below 1e-6 or from 1e12 up use an exponent,
// "1.2e-7". A non-finite x gives "—".
func FormatNumber(x float64, digits int) string {
	var buf [40]byte
	return string(appendNumber(buf[:0], x, digits))
}

// appendNumber appends FormatNumber(x, digits) to dst. The figures of
// every sheet are written on every edit: built in one buffer, a figure
// costs one allocation, where the strings' cuts and joins cost five.
func appendNumber(dst []byte, x float64, digits int) []byte {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return append(dst, "—"...)
	}
	digits = min(max(digits, 1), 17)
	if x == 0 {
		x = 0 // drop the sign of −0
	}
	var eb [32]byte
	e := strconv.AppendFloat(eb[:0], x, 'e', digits-1, 64) // "-4.50e+01"
	k := bytes.IndexByte(e, 'e')
	exp := 0
	for _, c := range e[k+2:] { // after the exponent's sign, which AppendFloat always writes
		exp = exp*10 + int(c-'0')
	}
	if e[k+1] == '-' {
		exp = -exp
	}
	mant := e[:k]
	neg := mant[0] == '-'
	if neg {
		mant = mant[1:]
	}
	var db [24]byte
	ds, zero := db[:0], true // the significant digits
	for _, c := range mant {
		if c != '.' {
			ds = append(ds, c)
			zero = zero && c == '0'
		}
	}
	if neg && !zero { // a number that rounds to zero has no sign
		dst = append(dst, '-')
	}
	if exp < -6 || exp >= 12 {
		dst = append(append(dst, mant...), 'e')
		return strconv.AppendInt(dst, int64(exp), 10)
	}
	switch {
	case exp < 0:
		dst = append(dst, "0."...)
		for range -exp - 1 {
			dst = append(dst, '0')
		}
		return append(dst, ds...)
	case exp+1 >= len(ds):
		dst = append(dst, ds...)
		for range exp + 1 - len(ds) {
			dst = append(dst, '0')
		}
		return dst
	default:
		return append(append(append(dst, ds[:exp+1]...), '.'), ds[exp+1:]...)
	}
}

// Format writes si, a value in the SI unit of u's dimension, in u with the
// given number of significant digits and u's symbol: "45.0 L/s", "18.0 °C".
func (u Unit) Format(si float64, digits int) string {
	var buf [56]byte
	b := appendNumber(buf[:0], u.FromSI(si), digits)
	if u.Symbol != "" {
		b = append(append(b, ' '), u.Symbol...)
	}
	return string(b)
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
