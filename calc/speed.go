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
		return 0, NewFieldError("pq", Missing)
	}
	if count < 1 || count > PumpMaxCombined {
		return 0, countErr("pumps", count, 1, PumpMaxCombined)
	}
	if math.IsNaN(q) || math.IsInf(q, 0) || !(q > 0) {
		return 0, NewFieldError("qsp", NotPositive)
	}
	if math.IsNaN(h) || math.IsInf(h, 0) {
		return 0, NewFieldError("qsp", NoSolution).Because(ReasonLineHeadNotFinite)
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
		return 0, NewFieldError("qsp", NoSolution).Because(ReasonSpeedBeyondSheet, Fig(q, Flow), Num(PumpSpeedRatioMin), Num(PumpSpeedRatioMax))
	}
	f := func(r float64) float64 {
		x := math.Min(math.Max(q/(p*r), base.MinFlow()), base.MaxFlow())
		h0, _ := base.Head(x)
		return s*r*r*h0 - h
	}
	r, err := brent(f, lo, hi, 1e-12)
	switch {
	case errors.Is(err, errNoBracket) && f(hi) < 0:
		return 0, NewFieldError("qsp", NoSolution).Because(ReasonSpeedTopShort, Num(hi), Fig(f(hi)+h, Length), Fig(q, Flow), Fig(h, Length))
	case errors.Is(err, errNoBracket):
		return 0, NewFieldError("qsp", NoSolution).Because(ReasonSpeedBottomOver, Num(lo), Fig(q, Flow), Fig(f(lo)+h, Length), Fig(h, Length))
	case err != nil:
		return 0, NewFieldError("qsp", NotConverged)
	}
	return r, nil
}

// FlowForHead returns the flow (m³/s) at which the system curve of balance
// b needs head h (m): the duty a pump giving h would run at on this line.
// The system curve rises with flow (friction and fittings only add), so
// the flow is found by Brent's method from zero upwards, the search range
// widened from qGuess (a flow of the right order, such as the data
// sheet's last) by doubling, up to 2¹⁰ times it. Errors (field "hsp"): the
// line needs more than h at zero flow (no flow at that head), or no flow
// in range needs as much.
func FlowForHead(b Balance, h, qGuess float64) (float64, error) {
	if math.IsNaN(h) || math.IsInf(h, 0) {
		return 0, NewFieldError("hsp", NotFinite)
	}
	if !(qGuess > 0) || math.IsInf(qGuess, 0) {
		return 0, NewFieldError("hsp", Missing).With("pq")
	}
	b, err := b.forSystem()
	if err != nil {
		return 0, err
	}
	var evalErr error
	f := func(q float64) float64 {
		s, _, err := b.systemHead(q)
		if err != nil {
			evalErr = err
			return math.NaN()
		}
		return s - h
	}
	if f0 := f(0); evalErr != nil {
		return 0, evalErr
	} else if f0 > 0 {
		return 0, NewFieldError("hsp", NoSolution).Because(ReasonHeadBelowStatic, Fig(f0+h, Length), Fig(h, Length))
	}
	hi := qGuess
	for i := 0; f(hi) < 0 || evalErr != nil; i++ {
		if evalErr != nil {
			// The line cannot be worked out at such a flow (beyond the
			// friction formulas' range): no duty in range.
			return 0, NewFieldError("hsp", NoSolution).Because(ReasonHeadNeverReached, Fig(h, Length), Fig(hi, Flow))
		}
		if i == 10 {
			return 0, NewFieldError("hsp", NoSolution).Because(ReasonHeadNeverReached, Fig(h, Length), Fig(hi, Flow))
		}
		hi *= 2
	}
	q, err := brent(f, 0, hi, 1e-13*hi)
	if evalErr != nil {
		return 0, evalErr
	}
	if err != nil {
		return 0, NewFieldError("hsp", NotConverged)
	}
	return q, nil
}
