package calc

import "math"

// CurvePoint is one point of a system curve: the pump head H (m) the
// balance needs at flow Q (m³/s). Transitional is true when some part of
// the line (or a point) is in transitional flow at Q; H is then the design
// value, on the turbulent bound.
type CurvePoint struct {
	Q, H         float64
	Transitional bool
}

// SystemCurve returns the system curve of balance b at each of the flows
// (m³/s, each ≥ 0): the pump head the balance needs at that flow with the
// turbine head fixed,
//
//	H_sys(Q) = Δz + Δ(p/ρg) + Δ(αV²/2g) + h_friction(Q) + h_turbine
//
// (Δ = point 2 − point 1). Each flow is solved in full: friction factors
// (Colebrook or the run's method) and α are evaluated at every Q, with no
// k·Q² fit. b's Unknown, Q and PumpHead are ignored. Errors are those of
// the balance, and "q" for a negative or non-finite flow or an empty list.
func SystemCurve(b Balance, flows []float64) ([]CurvePoint, error) {
	b, err := b.forSystem()
	if err != nil {
		return nil, err
	}
	if len(flows) == 0 {
		return nil, NewFieldError("q", TooFew).AtLeast(Num(1))
	}
	out := make([]CurvePoint, len(flows))
	for i, q := range flows {
		if math.IsNaN(q) || math.IsInf(q, 0) || q < 0 {
			return nil, NewFieldError("q", Negative).Got(Fig(q, Flow))
		}
		h, tr, err := b.systemHead(q)
		if err != nil {
			return nil, err
		}
		out[i] = CurvePoint{Q: q, H: h, Transitional: tr}
	}
	return out, nil
}

// Flows returns n evenly spaced flows from 0 to qmax inclusive, for a
// system curve. It returns nil unless n ≥ 2 and qmax is positive and
// finite.
func Flows(qmax float64, n int) []float64 {
	if n < 2 || !(qmax > 0) || math.IsInf(qmax, 0) {
		return nil
	}
	out := make([]float64, n)
	for i := range out {
		out[i] = qmax * float64(i) / float64(n-1)
	}
	out[n-1] = qmax
	return out
}

// forSystem prepares b for repeated evaluation at many flows: pump head
// unknown and zero, flow supplied per call, the inputs checked once, and
// the fittings of the run or line folded into ΣK once (identical results).
func (b Balance) forSystem() (Balance, error) {
	b.Unknown, b.PumpHead, b.Q = SolvePumpHead, 0, 0
	if err := b.check(); err != nil {
		return b, err
	}
	return b.lumped(), nil
}

// lumped returns b with the fittings of its run or line folded into ΣK
// (see Line.lumped): the same results, faster when evaluated many times.
func (b Balance) lumped() Balance {
	if b.Line != nil {
		l := b.Line.lumped()
		b.Line = &l
	}
	if b.Run != nil && len(b.Run.Fittings) > 0 {
		r := b.Run.lumped()
		b.Run = &r
	}
	return b
}

// systemHead is the pump head the balance needs at flow q (b prepared by
// forSystem), on the design bound, and whether any part is transitional.
func (b Balance) systemHead(q float64) (float64, bool, error) {
	st, err := b.at(q, boundTurbulent)
	if err != nil {
		return 0, false, err
	}
	return -b.residual(st), st.trans, nil
}
