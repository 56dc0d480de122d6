package calc

// Limits that catch a value typed a hundred times too small or a reading
// that no machine of the kind reaches.
const (
	// PercentSlipMax is the largest share read from a percentage box that
	// is taken as a slip: 1.5 typed where "%" is meant gives 0.015, and no
	// pump, motor or turbine set of practical interest runs that badly,
	// while 0.78 typed for 78 % is the usual slip (common practice: a
	// fraction written into a percentage field). Such a value is refused
	// with the percentage it probably meant (FractionSlip).
	PercentSlipMax = 0.015
	// PumpEfficiencyHigh is the pump efficiency above which a figure is
	// flagged as implausible: the largest water pumps reach about 90–94 %
	// (common practice, from memory).
	PumpEfficiencyHigh = 0.95
	// MotorEfficiencyHigh is the motor efficiency above which a figure is
	// flagged: the best large induction motors reach about 97 % (common
	// practice, from memory).
	MotorEfficiencyHigh = 0.98
	// AccuracyPlausibleMin is the smallest instrument accuracy taken as
	// typed, 0.1 % (a share): the finest classes of EN 837-1 test gauges
	// (class 0.1) and of flow and power meters used in the field are about
	// that fine (common practice, from memory); "0.02" typed into a
	// percentage box (0.02 %) is a fraction meant as 2 %.
	AccuracyPlausibleMin = 0.001
)

// AccuracySlip reports whether accuracy v (a share, as read from a
// percentage box) is finer than any field instrument's, and the percentage
// then probably meant ("2" for 0.0002). Zero and negative values are not
// slips (they are judged elsewhere).
func AccuracySlip(v float64) (meant float64, slip bool) {
	if v > 0 && v < AccuracyPlausibleMin {
		return v * 1e4, true
	}
	return 0, false
}

// FractionSlip reports whether share v (as read from a percentage box:
// "0.78 %" is 0.0078) looks like a fraction typed where a percentage was
// meant, and the percentage then probably meant ("78" for 0.0078). Zero
// and negative values are not slips (they are judged elsewhere).
func FractionSlip(v float64) (meant float64, slip bool) {
	if v > 0 && v <= PercentSlipMax {
		return v * 1e4, true
	}
	return 0, false
}
