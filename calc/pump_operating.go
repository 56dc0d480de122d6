package calc

import "math"

// OperatingResult is where a pump runs on a line: the intersection of its
// curve with the system curve.
type OperatingResult struct {
	Q     float64 // flow, m³/s
	H     float64 // pump head at Q, m (equal to the system's head there)
	Eff   float64 // pump efficiency at Q, fraction; 0 when the curve has none
	NPSHr float64 // NPSH required at Q, m; 0 when the curve has none there
	// ShaftPower is ρ·g·Q·H/η, W, when the efficiency is known; else 0.
	ShaftPower float64
	// HydraulicPower is ρ·g·Q·H, W: the power given to the liquid.
	HydraulicPower float64
	// Balance is the balance solved for the pump head at Q (the system's
	// side): heads at the points, losses, budget, line profile, warnings.
	Balance BalanceResult
}

// OperatingPoint finds where pump curve c meets the system curve of
// balance b: the flow at which the pump's head equals the head the line
// needs (SystemCurve), found by Brent's method over the data sheet's flows
// [MinFlow, MaxFlow]. b's Unknown, Q and PumpHead are ignored; its turbine
// head is kept.
//
// For a drooping curve (Unstable) whose shut-off head is below the line's
// need, the search starts at the highest head, so the crossing found is
// the stable one on the falling part.
//
// When the curves do not meet within the data sheet the error says why:
// the pump's shut-off head is below what the line needs at zero flow (field
// "ph"), or at the last data-sheet point the pump still gives more than
// the line needs, so it would run out beyond the sheet (field "pq").
func OperatingPoint(c PumpCurve, b Balance) (OperatingResult, error) {
	if len(c.points) == 0 {
		return OperatingResult{}, NewFieldError("pq", Missing)
	}
	orig := b
	b, err := b.forSystem()
	if err != nil {
		return OperatingResult{}, err
	}
	qa, qb := c.MinFlow(), c.MaxFlow()
	ha, _ := c.Head(qa)
	sa, _, err := b.systemHead(qa)
	if err != nil {
		return OperatingResult{}, err
	}
	if _, top, drooping := c.Unstable(); drooping && ha < sa {
		// A drooping curve may still meet the line past its highest
		// head: search from there (the stable crossing).
		ht, _ := c.Head(top)
		st, _, err := b.systemHead(top)
		if err != nil {
			return OperatingResult{}, err
		}
		if ht < st {
			return OperatingResult{}, NewFieldError("ph", NoSolution).Because(ReasonTopBelowLine, Fig(ht, Length), Fig(top, Flow), Fig(st, Length))
		}
		qa, ha, sa = top, ht, st
	}
	if ha < sa {
		if qa == 0 {
			return OperatingResult{}, NewFieldError("ph", NoSolution).Because(ReasonShutOffBelowLine, Fig(ha, Length), Fig(sa, Length))
		}
		return OperatingResult{}, NewFieldError("ph", NoSolution).Because(ReasonFirstPointBelow, Fig(qa, Flow), Fig(ha, Length), Fig(sa, Length))
	}
	hb, _ := c.Head(qb)
	sb, _, err := b.systemHead(qb)
	if err != nil {
		return OperatingResult{}, err
	}
	if hb > sb {
		return OperatingResult{}, NewFieldError("pq", NoSolution).Because(ReasonPumpRunsOut, Fig(qb, Flow), Fig(hb, Length), Fig(sb, Length))
	}
	var evalErr error
	f := func(q float64) float64 {
		h, _ := c.Head(q)
		s, _, err := b.systemHead(q)
		if err != nil {
			evalErr = err
			return math.NaN()
		}
		return h - s
	}
	q, err := brent(f, qa, qb, 1e-13*qb)
	if evalErr != nil {
		return OperatingResult{}, evalErr
	}
	if err != nil {
		return OperatingResult{}, NewFieldError("q", NotConverged)
	}
	h, _ := c.Head(q)
	// Brent lands on a jump when the system curve is discontinuous (α or
	// the friction factor switching at the laminar–turbulent limit).
	if r := f(q); math.Abs(r) > 1e-6*(1+math.Abs(h)) {
		return OperatingResult{}, NewFieldError("q", NoSolution).Because(ReasonRegimeJump, Fig(q, Flow))
	}
	orig.Unknown, orig.Q = SolvePumpHead, q
	br, err := orig.Solve()
	if err != nil {
		return OperatingResult{}, err
	}
	res := OperatingResult{Q: q, H: h, Balance: br}
	rhog := b.Fluid.Density * StandardGravity
	res.HydraulicPower = rhog * q * h
	if e, ok := c.Efficiency(q); ok && e > 0 {
		res.Eff = e
		res.ShaftPower = res.HydraulicPower / e
	}
	if n, ok := c.NPSHr(q); ok {
		res.NPSHr = n
	}
	return res, nil
}
