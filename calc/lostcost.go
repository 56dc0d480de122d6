package calc

import "math"

// LostEfficiency is what a fall in a pump set's efficiency costs over a
// year: the extra electrical input to deliver the same hydraulic power at
// the lower efficiency.
type LostEfficiency struct {
	// ExtraPower is P_hyd·(1/η_now − 1/η_base), W: above zero when the
	// set now runs less efficiently than its baseline.
	ExtraPower float64
	// YearEnergy is ExtraPower over the running hours, J; YearCost that
	// energy at the tariff (currency per kWh), in the tariff's currency.
	YearEnergy, YearCost float64
}

// LostEfficiencyCost works out the yearly cost of running at efficiency
// now instead of base (both wire-to-water, or both the pump's own with
// the same motor; shares above 0 and at most 1) for hydraulic power
// hydraulic (W), hours per year and a tariff per kWh (1 kWh = 3.6 MJ,
// NIST SP 811). The baseline is the caller's: a first test, or the data
// sheet's efficiency times the motor's. A negative figure is a saving.
// Errors name "hours" and "tariff" (negative or not finite), and "peff"
// for an efficiency outside (0, 1] or a power not finite and above zero.
func LostEfficiencyCost(hydraulic, now, base, hours, tariff float64) (LostEfficiency, error) {
	bad := func(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) }
	switch {
	case bad(hours) || hours < 0:
		return LostEfficiency{}, NewFieldError("hours", Negative).Got(Num(hours))
	case bad(tariff) || tariff < 0:
		return LostEfficiency{}, NewFieldError("tariff", Negative).Got(Num(tariff))
	case bad(hydraulic) || !(hydraulic > 0):
		return LostEfficiency{}, NewFieldError("peff", NotPositive).Got(Fig(hydraulic, Power))
	case !(now > 0 && now <= 1):
		return LostEfficiency{}, NewFieldError("peff", OutOfRange).Got(Num(now)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
	case !(base > 0 && base <= 1):
		return LostEfficiency{}, NewFieldError("peff", OutOfRange).Got(Num(base)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
	}
	extra := hydraulic * (1/now - 1/base)
	e := extra * hours * 3600
	return LostEfficiency{ExtraPower: extra, YearEnergy: e, YearCost: e / 3.6e6 * tariff}, nil
}
