package scenario

import (
	"math"
	"slices"
	"strconv"
	"strings"

	"fieldhead/calc"
)

// A slip is a value typed in the wrong unit or scale that still reads: a
// discharge gauge of 415 with the picker left at Pa, 0.02 typed into a
// percentage box for a 2 % meter, 0.3 for a 30 % glycol share. Read
// refuses such a value at its box, with what was probably meant, unless
// the person keeps it as typed: the link's keep parameter lists the
// values kept (Draft.Keep), and any change to a kept value drops it from
// the list.

// slipRule is how one field's slips are recognised.
type slipRule uint8

const (
	// slipPascals: a line, gauge or site pressure typed in Pa below 10 kPa
	// in size (4 cm of water: no pump gauge or line reads that little;
	// common practice).
	slipPascals slipRule = iota + 1
	// slipGigapascals: an elastic or bulk modulus below 0.1 GPa (softer
	// than any pipe wall or liquid, common practice): typed in Pa, kPa or
	// MPa where GPa was meant.
	slipGigapascals
	// slipShare: an efficiency or a speed typed as a fraction into a
	// percentage box (calc.FractionSlip).
	slipShare
	// slipGlycol: a glycol share below 1 % by mass or volume, which
	// protects against almost no frost (common practice): a fraction typed
	// into the percentage box (0.3 for 30 %).
	slipGlycol
	// slipAccuracy: an instrument accuracy finer than any field
	// instrument's (calc.AccuracySlip).
	slipAccuracy
)

// slipRules lists every field whose slips Read catches. Every pressure
// and every percentage of the vocabulary is here or in slipExempt
// (TestSlipTableCoversEveryField).
var slipRules = map[string]slipRule{
	"p1": slipPascals, "p2": slipPascals, "pl": slipPascals, "ps": slipPascals, "pd": slipPascals,
	"baro": slipPascals, "gss": slipPascals, "gsd": slipPascals, "pexp": slipPascals,
	"epipe": slipGigapascals, "kliq": slipGigapascals,
	"etam": slipShare, "etat": slipShare, "peff": slipShare, "gly": slipGlycol, "glyv": slipGlycol, "spd": slipShare,
	"gcs": slipAccuracy, "gcd": slipAccuracy, "uqm": slipAccuracy, "upin": slipAccuracy,
}

// slipExempt are the pressures and percentages with no slip rule, and why.
var slipExempt = map[string]string{
	"pv":  "a vapour pressure may be a few pascals (a cold liquid, an oil)",
	"cv":  "the Convert view converts whatever it is given, small or not",
	"dpc": "a small circuit's drop may well be a few thousand pascals, and some gauges read in Pa",
}

// KeepParam is the parameter listing the values kept as typed though they
// look like slips: their names, comma separated.
const KeepParam = "keep"

// kept reads the keep parameter's names.
func (r *reader) kept() map[string]bool {
	out := map[string]bool{}
	for _, n := range strings.Split(r.in.Choice(KeepParam), ",") {
		if n = strings.TrimSpace(n); n != "" {
			out[n] = true
		}
	}
	return out
}

// slips refuses the values that look like slips and are not kept.
func (r *reader) slips() {
	kept := r.kept()
	for name, v := range r.in.vals {
		if v.Bad || kept[name] {
			continue
		}
		base := name
		if n, f := splitSegment(name); n > 0 {
			base = f
		}
		var fe *calc.FieldError
		switch slipRules[base] {
		case slipPascals:
			fe = unitSlip(name, v, 1e4, []string{"Pa"}, "kPa", 1e3)
		case slipGigapascals:
			fe = unitSlip(name, v, 1e8, []string{"Pa", "kPa", "MPa"}, "GPa", 1e9)
		case slipGlycol:
			if v.SI > 0 && v.SI < 0.01 {
				fe = calc.NewFieldError(name, calc.OutOfRange).Got(calc.Num(v.SI)).Because(calc.ReasonFractionTyped, calc.Num(v.SI*100))
			}
		case slipShare:
			if v.Dim != calc.Dimensionless {
				break // a speed in rpm or Hz
			}
			for i, x := range append([]float64{v.SI}, v.List...) {
				if meant, slip := calc.FractionSlip(x); slip && (i > 0 || v.List == nil) {
					fe = calc.NewFieldError(name, calc.OutOfRange).Got(calc.Num(x)).Because(calc.ReasonFractionTyped, calc.Num(meant/100))
					if v.List != nil {
						fe.At(i)
					}
					break
				}
			}
		case slipAccuracy:
			if meant, slip := calc.AccuracySlip(v.SI); slip {
				fe = calc.NewFieldError(name, calc.OutOfRange).Got(calc.Num(v.SI)).Because(calc.ReasonAccuracySlip, calc.Num(meant/100))
			}
		}
		if fe != nil {
			r.record(fe)
			r.taint(name)
		}
	}
}

// unitSlip reports a quantity typed in one of the units from that makes
// it smaller than below (SI) though not zero, where the unit meant (of
// factor to SI) would make it plausible: "415 Pa" for a gauge is 415 kPa
// meant. Only a unit typed is judged; the sheet's default units never
// make a slip.
func unitSlip(name string, v Value, below float64, from []string, meant string, factor float64) *calc.FieldError {
	num, unit := Split(v.Text)
	x, err := strconv.ParseFloat(strings.ReplaceAll(strings.ReplaceAll(num, ",", "."), "−", "-"), 64)
	if unit == "" || err != nil || x == 0 || !(math.Abs(v.SI) < below) || math.Abs(x*factor) < below {
		return nil
	}
	u, uerr := calc.LookupUnit(strings.TrimSpace(strings.TrimSuffix(strings.TrimSuffix(unit, "(g)"), "(a)")))
	if uerr != nil || !slices.Contains(from, u.Symbol) {
		return nil
	}
	return calc.NewFieldError(name, calc.OutOfRange).Typed(num).OneOf(unit, meant).Got(calc.Fig(v.SI, v.Dim)).Because(calc.ReasonUnitSlip)
}

// Slippable reports whether a value of param is refused as a slip unless
// kept (its problem's reason is a slip's).
func Slippable(fe *calc.FieldError) bool {
	if fe == nil {
		return false
	}
	switch fe.Reason {
	case calc.ReasonUnitSlip, calc.ReasonAccuracySlip, calc.ReasonFractionTyped:
		return true
	}
	return false
}
