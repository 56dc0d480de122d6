package calc

import (
	"errors"
	"math"
)

// SpeedForDuty returns the speed ratio n/n₀ at which count identical pumps
// of data-sheet curve base (in parallel, or in series) deliver flow q
// (m³/s) against head h (m): the duty point of a system curve. By the
// affinity laws the pumps' head at q and ratio r is
//
//	H(r) = s·r²·H₀(q/(p·r))
//
// with p = count in parallel (else 1) and s = count in series (else 1);
// the ratio solving H(r) = h is found by Brent's method on the speeds
// where q/(p·r) lies on the data sheet, within PumpSpeedRatioMin to
// PumpSpeedRatioMax. For a curve whose head falls with flow H(r) rises
// with r, so the root is unique. When no speed in that range meets the
// duty the error says so plainly (field "qsp"): the duty needs more head
// than the pumps give at the highest speed, or less than they give at the
// lowest speed that still reaches the flow on the data sheet.
func SpeedForDuty(base PumpCurve, count int, parallel bool, q, h float64) (float64, error) {
	if len(base.points) == 0 {
		return 0, fieldErrorf("pq", "no pump curve: give the data-sheet points")
	}
	if count < 1 || count > PumpMaxCombined {
		return 0, fieldErrorf("pumps", "the number of identical pumps must be 1 to %d, got %d", PumpMaxCombined, count)
	}
	if math.IsNaN(q) || math.IsInf(q, 0) || !(q > 0) {
		return 0, fieldErrorf("qsp", "give the flow to reach (above zero)")
	}
	if math.IsNaN(h) || math.IsInf(h, 0) {
		return 0, fieldErrorf("qsp", "the head the line needs at that flow is not a finite number")
	}
	p, s := 1.0, 1.0
	if parallel {
		p = float64(count)
	} else {
		s = float64(count)
	}
	lo, hi := PumpSpeedRatioMin, PumpSpeedRatioMax
	// q/(p·r) must lie within the sheet's flows.
	lo = math.Max(lo, q/(p*base.MaxFlow()))
	if base.MinFlow() > 0 {
		hi = math.Min(hi, q/(p*base.MinFlow()))
	}
	if !(lo <= hi) {
		return 0, fieldErrorf("qsp", "no speed in range: %v is beyond what the data sheet covers between %g %% and %g %% speed", Fig(q, Flow), PumpSpeedRatioMin*100, PumpSpeedRatioMax*100)
	}
	f := func(r float64) float64 {
		x := math.Min(math.Max(q/(p*r), base.MinFlow()), base.MaxFlow())
		h0, _ := base.Head(x)
		return s*r*r*h0 - h
	}
	r, err := brent(f, lo, hi, 1e-12)
	switch {
	case errors.Is(err, errNoBracket) && f(hi) < 0:
		return 0, fieldErrorf("qsp", "no speed in range: even at %g %% speed the pumps give only %v at %v, and the line needs %v", hi*100, Fig(f(hi)+h, Length), Fig(q, Flow), Fig(h, Length))
	case errors.Is(err, errNoBracket):
		return 0, fieldErrorf("qsp", "no speed in range: at %.4g %% speed, the lowest at which the data sheet still reaches %v, the pumps already give %v and the line needs only %v (throttling or a smaller impeller, not speed, would meet this duty)", lo*100, Fig(q, Flow), Fig(f(lo)+h, Length), Fig(h, Length))
	case err != nil:
		return 0, fieldErrorf("qsp", "the speed for this duty could not be found: %v", err)
	}
	return r, nil
}
