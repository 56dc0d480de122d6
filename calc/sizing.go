package calc

import (
	"errors"
	"math"
)

// Default sizing limits: a velocity band and a loss-gradient limit that
// pumped water lines are commonly sized to (common practice, from memory:
// about 2–8 ft/s, and up to about 4 ft of friction per 100 ft of pipe in
// building-services practice). A site or a code may ask for others; they
// are defaults only.
const (
	SizingVelocityLow  = 0.6  // m/s
	SizingVelocityHigh = 2.4  // m/s
	SizingGradientMax  = 0.04 // m of friction per m of pipe (4 per 100)
)

// SizingLimits are the marks a sizing table checks each size against.
type SizingLimits struct {
	VelocityLow, VelocityHigh float64 // band of mean velocity, m/s, 0 ≤ low < high
	GradientMax               float64 // largest pipe-friction gradient, m per m, > 0
}

// The same marks as a US sheet states them, each a round figure of its own
// rather than the metric one converted (0.6–2.4 m/s would read 1.97–7.87
// ft/s): a band of 2 to 8 ft/s (common practice for pumped water lines,
// from memory), in m/s. The gradient, a ratio, is SizingGradientMax in
// both: 4 ft per 100 ft (common practice, from memory).
const (
	SizingVelocityLowUS  = 2 * 0.3048 // m/s: 2 ft/s (1 ft = 0.3048 m exactly, NIST SP 811)
	SizingVelocityHighUS = 8 * 0.3048 // m/s: 8 ft/s
)

// DefaultSizingLimits returns SizingVelocityLow, SizingVelocityHigh and
// SizingGradientMax.
func DefaultSizingLimits() SizingLimits {
	return SizingLimits{SizingVelocityLow, SizingVelocityHigh, SizingGradientMax}
}

// DefaultSizingLimitsFor returns the defaults a sheet in US customary
// units (us) or in SI uses: SizingVelocityLowUS, SizingVelocityHighUS and
// SizingGradientMax, or DefaultSizingLimits.
func DefaultSizingLimitsFor(us bool) SizingLimits {
	if us {
		return SizingLimits{SizingVelocityLowUS, SizingVelocityHighUS, SizingGradientMax}
	}
	return DefaultSizingLimits()
}

// SizingRow is one size of a sizing table.
type SizingRow struct {
	Pipe PipeSize
	// Run is the run in this size: velocity, Reynolds number, regime,
	// friction factor, the K of each fitting at this size, losses. Its
	// zero value when Err is set.
	Run RunResult
	// Gradient is the head lost to pipe friction per length of pipe,
	// f·V²/(2g·D), m per m: the loss gradient, whatever the run's length
	// (the larger bound in transitional flow).
	Gradient float64
	InBand   bool  // VelocityLow ≤ velocity ≤ VelocityHigh
	UnderMax bool  // Gradient ≤ GradientMax
	Err      error // why this size could not be evaluated (a fitting method's size range, a Reynolds number out of range), else nil
}

// Fits reports whether the size is inside the velocity band and under the
// gradient limit.
func (r SizingRow) Fits() bool { return r.Err == nil && r.InBand && r.UnderMax }

// SizeRun evaluates run r carrying flow q (m³/s, > 0) of liquid fl in each
// of sizes (inside diameters from the pipe catalogue, smallest first),
// keeping the run's length, roughness or Hazen–Williams C, fittings and
// friction method: the fittings' K are worked out at each size (Crane
// TP-410's f_T and Hooper's 1 in/D term depend on it). Each row is marked
// against lim. A size that cannot be evaluated keeps its place with Err
// set (the other sizes still come); an error is returned only for inputs
// that spoil every size: the liquid, the run's length, roughness, method or
// fittings (fields as Run.Evaluate names them), the flow ("q"), the limits
// ("vlo", "vhi", "grad") or no sizes ("sch").
func SizeRun(r Run, fl Fluid, q float64, sizes []PipeSize, lim SizingLimits) ([]SizingRow, error) {
	switch {
	case math.IsNaN(q) || math.IsInf(q, 0) || !(q > 0):
		return nil, NewFieldError("q", NotPositive).Got(Fig(q, Flow))
	case math.IsNaN(lim.VelocityLow) || math.IsInf(lim.VelocityLow, 0) || lim.VelocityLow < 0:
		return nil, NewFieldError("vlo", Negative).Got(Fig(lim.VelocityLow, Velocity))
	case math.IsNaN(lim.VelocityHigh) || math.IsInf(lim.VelocityHigh, 0) || !(lim.VelocityHigh > lim.VelocityLow):
		return nil, NewFieldError("vhi", BelowLimit).AtLeast(Fig(lim.VelocityLow, Velocity)).Got(Fig(lim.VelocityHigh, Velocity)).Because(ReasonVelocityBand)
	case math.IsNaN(lim.GradientMax) || math.IsInf(lim.GradientMax, 0) || !(lim.GradientMax > 0):
		return nil, NewFieldError("grad", NotPositive).Got(Num(lim.GradientMax * 100))
	case len(sizes) == 0:
		return nil, NewFieldError("sch", Missing)
	}
	// The inputs shared by every size are checked once, at the first
	// size's bore, so that one bad length or fitting is one error, not a
	// row of them.
	probe := r
	probe.Diameter = sizes[0].ID
	if err := probe.validate(fl); err != nil {
		// ε/D too large at the smallest bore spoils only the small sizes.
		var fe *FieldError
		if !errors.As(err, &fe) || fe.Field != "eps" || !(r.Roughness >= 0) {
			return nil, err
		}
	}
	if err := r.checkFittings(); err != nil {
		return nil, err
	}
	out := make([]SizingRow, len(sizes))
	for i, p := range sizes {
		out[i].Pipe = p
		s := r
		s.Diameter = p.ID
		res, err := s.Evaluate(fl, q)
		if err != nil {
			out[i].Err = err
			continue
		}
		out[i].Run = res
		out[i].Gradient = res.Gradient
		out[i].InBand = res.Velocity >= lim.VelocityLow && res.Velocity <= lim.VelocityHigh
		out[i].UnderMax = out[i].Gradient <= lim.GradientMax
	}
	return out, nil
}
