package calc

import "math"

// Range of speed ratios accepted by PumpCurve.AtSpeed.
const (
	PumpSpeedRatioMin = 0.1 // lowest n/n₀ accepted
	PumpSpeedRatioMax = 2.0 // highest n/n₀ accepted
)

// PumpMaxCombined is the largest number of identical pumps Combine
// accepts.
const PumpMaxCombined = 8

// AtSpeed returns the curve at ratio = n/n₀ of the data sheet's speed, by
// the pump affinity laws for a given impeller: each point moves to
//
//	Q = ratio·Q₀,  H = ratio²·H₀,  η = η₀,  NPSHr = ratio²·NPSHr₀
//
// and the curve is fitted again through the moved points (the
// interpolation scheme is unchanged by such scaling, so the result is the
// scaled curve). The laws for Q and H follow from similarity of the
// velocity triangles; η unchanged is the usual approximation, fair for
// moderate changes; NPSHr ∝ n² is approximate only (common practice; real
// NPSHr often changes with a higher power of speed, so check the maker's
// data for large changes). ratio must lie in 0.1–2, a plausibility range
// of ours rather than a published limit (field "spd").
func (c PumpCurve) AtSpeed(ratio float64) (PumpCurve, error) {
	if len(c.points) == 0 {
		return PumpCurve{}, NewFieldError("pq", Missing)
	}
	if math.IsNaN(ratio) || ratio < PumpSpeedRatioMin || ratio > PumpSpeedRatioMax {
		return PumpCurve{}, NewFieldError("spd", OutOfRange).Got(Num(ratio)).Within(Num(PumpSpeedRatioMin), Num(PumpSpeedRatioMax))
	}
	pts := c.Points()
	r2 := ratio * ratio
	for i := range pts {
		pts[i].Q *= ratio
		pts[i].H *= r2
		pts[i].NPSHr *= r2
	}
	return FitPump(pts)
}

// Combine returns the curve of n identical pumps (1 to 8, field "pumps")
// working together: in parallel, the flows add at equal head (each point
// moves to n·Q at the same H); in series, the heads add at equal flow (n·H
// at the same Q). Each pump then runs at the single pump's point, so the
// efficiency at the combined point is the single pump's; the NPSHr is the
// single pump's at its own flow (in series, that of the first pump, the
// only one drawing from the suction line).
func (c PumpCurve) Combine(n int, parallel bool) (PumpCurve, error) {
	if len(c.points) == 0 {
		return PumpCurve{}, NewFieldError("pq", Missing)
	}
	if n < 1 || n > PumpMaxCombined {
		return PumpCurve{}, countErr("pumps", n, 1, PumpMaxCombined)
	}
	pts := c.Points()
	for i := range pts {
		if parallel {
			pts[i].Q *= float64(n)
		} else {
			pts[i].H *= float64(n)
		}
	}
	return FitPump(pts)
}
