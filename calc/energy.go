package calc

import "math"

// Energy is the energy a pump set uses per volume pumped.
type Energy struct {
	// PerVolume is the input power over the flow, J/m³ (1 kWh/m³ =
	// 3.6 MJ/m³).
	PerVolume float64
	// PerVolumeHead is PerVolume per metre of head, J/m⁴ (reported per
	// 100 m of head, kWh/(m³·100 m)).
	PerVolumeHead float64
	// Ideal is the least energy per volume that lifts the liquid by the
	// head, ρ·g·H, J/m³: what a set of 100 % efficiency would use.
	Ideal float64
	// IdealHead is Ideal per metre of head, ρ·g, J/m⁴ (about 0.272
	// kWh/(m³·100 m) for water).
	IdealHead float64
	// YearCost is the input power times the yearly running hours times
	// the tariff, in the tariff's currency; 0 when no tariff or hours
	// were given.
	YearCost float64
	// YearEnergy is the energy used in a year, J; 0 without hours.
	YearEnergy float64
}

// EnergyUse works out the energy per volume pumped from the input
// power (W, electrical for a wire-to-water figure, or the shaft power),
// the flow q (m³/s) and the head h (m) delivered to a liquid of density
// rho (kg/m³): E = P/Q, beside the ideal ρ·g·H (the definition of
// specific energy used by water utilities; common practice). hours (per
// year) and tariff (currency per kWh) are optional (0): their product with
// the power gives a yearly cost. Errors name "pin", "qm", "hours" and
// "tariff".
func EnergyUse(power, q, h, rho, hours, tariff float64) (Energy, error) {
	ok := func(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }
	switch {
	case !ok(power) || !(power > 0):
		return Energy{}, NewFieldError("pin", NotPositive).Got(Fig(power, Power))
	case !ok(q) || !(q > 0):
		return Energy{}, NewFieldError("qm", NotPositive).Got(Fig(q, Flow))
	case !ok(h) || !(h > 0):
		return Energy{}, NewFieldError("qm", NotPositive).Got(Fig(h, Length)).Because(ReasonHeadForEnergy)
	case !ok(rho) || !(rho > 0):
		return Energy{}, NewFieldError("rho", NotPositive).Got(Fig(rho, Density))
	case !ok(hours) || hours < 0 || hours > 8784:
		return Energy{}, NewFieldError("hours", OutOfRange).Got(Num(hours)).Within(Num(0), Num(8784))
	case !ok(tariff) || tariff < 0:
		return Energy{}, NewFieldError("tariff", Negative).Got(Num(tariff))
	}
	e := Energy{PerVolume: power / q, Ideal: rho * StandardGravity * h, IdealHead: rho * StandardGravity}
	e.PerVolumeHead = e.PerVolume / h
	e.YearEnergy = power * hours * 3600
	e.YearCost = e.YearEnergy / 3.6e6 * tariff
	return e, nil
}
