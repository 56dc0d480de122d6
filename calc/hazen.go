package calc

import "math"

// Accepted range of the Hazen–Williams C factor. Published values for
// pipe materials fall inside it (common practice).
const (
	HazenCMin = 40.0  // lowest C accepted (very old, tuberculated pipe)
	HazenCMax = 160.0 // highest C accepted (smoothest plastics)
)

// HazenWilliamsHeadLoss returns the friction head loss in metres of water
// for flow q (m³/s, ≥ 0) through length metres (≥ 0) of pipe with inside
// diameter d (m, > 0) and Hazen–Williams factor c, from the SI form of the
// Hazen–Williams formula
//
//	h = 10.67·L·Q^1.852 / (C^1.852·D^4.8704)
//
// The formula is empirical, for water near ordinary temperatures in
// turbulent flow; it has no viscosity term. Fields: "q", "d", "length",
// "chw" (C must lie in 40…160).
func HazenWilliamsHeadLoss(q, d, length, c float64) (float64, error) {
	if math.IsNaN(q) || math.IsInf(q, 0) || q < 0 {
		return 0, NewFieldError("q", Negative).Got(Fig(q, Flow))
	}
	if math.IsNaN(d) || math.IsInf(d, 0) || d <= 0 {
		return 0, NewFieldError("d", NotPositive).Got(Fig(d, Length))
	}
	if math.IsNaN(length) || math.IsInf(length, 0) || length < 0 {
		return 0, NewFieldError("length", Negative).Got(Fig(length, Length))
	}
	if math.IsNaN(c) || c < HazenCMin || c > HazenCMax {
		return 0, NewFieldError("chw", OutOfRange).Got(Num(c)).Within(Num(HazenCMin), Num(HazenCMax))
	}
	if q == 0 || length == 0 {
		return 0, nil
	}
	return 10.67 * length * math.Pow(q/c, 1.852) / math.Pow(d, 4.8704), nil
}
