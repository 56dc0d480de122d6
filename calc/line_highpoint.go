package calc

import "math"

// HighPoint is a stretch of a line where the hydraulic grade line falls
// below the pipe crown (the pressure at the top of the pipe is below the
// site's atmospheric pressure) or the pressure falls to the liquid's
// vapour pressure. Consecutive profile nodes that fail are one high point;
// its figures are those of the node with the lowest pressure.
type HighPoint struct {
	// Segment is the 1-based segment of the lowest-pressure node; AtEnd is
	// true when that node is the segment's end, false for its start.
	Segment int
	AtEnd   bool
	// Distance is the node's chainage along the pipe from point 1, m; Z
	// the pipe's elevation there, m.
	Distance, Z float64
	// BelowCrown is how far the HGL lies below the pipe crown (the pipe's
	// elevation plus half its inside diameter), m; ≤ 0 when it does not.
	BelowCrown float64
	// Pressure is the absolute pressure at the pipe's crown there, Pa,
	// from the HGL (the lowest in the cross-section; at the line's two
	// ends, whose elevations are points 1 and 2, the pressure at that
	// elevation). Where Breaks is true it is not a pressure the liquid can
	// hold (it may be below zero): show it as "below the vapour pressure".
	Pressure float64
	// Breaks is true when Pressure is at or below the vapour pressure (or
	// zero): the liquid column breaks there.
	Breaks bool
	// AtPump is true when the node is the pump's inlet (the end of segment
	// PumpAfter, with a pump head): a suction problem rather than a crest.
	AtPump bool
}

// gradeNodes builds the EGL/HGL nodes of the line carrying lr's flow, from
// point 1's state in and the pump head hp, as described at profile.
func (b Balance) gradeNodes(in PointState, hp float64, lr *LineResult) []ProfileNode {
	g := StandardGravity
	rhog := b.Fluid.Density * g
	segs := b.Line.Segments
	nodes := make([]ProfileNode, 0, 2*len(segs)+2)
	nodes = append(nodes, ProfileNode{Z: in.Z, EGL: in.TotalHead,
		HGL: in.TotalHead - in.VelocityHead, Pressure: in.P})
	egl, dist, z := in.TotalHead, 0.0, in.Z
	node := func(seg int, hv float64) ProfileNode {
		hgl := egl - hv
		return ProfileNode{Distance: dist, Z: z, EGL: egl, HGL: hgl,
			Pressure: (hgl-z)*rhog + b.SitePressure, Segment: seg}
	}
	for i := range segs {
		sr := &lr.Segments[i]
		if b.PumpAfter == i {
			egl += hp
		}
		egl -= sr.TransitionLoss
		hv := lineAlpha(b.Alpha, &sr.RunResult) * sr.Velocity * sr.Velocity / (2 * g)
		start := node(i+1, hv)
		dist += segs[i].Length
		z = segs[i].EndZ
		egl -= sr.TotalLoss + sr.ComponentLoss
		nodes = append(nodes, start, node(i+1, hv))
	}
	if b.PumpAfter == len(segs) {
		egl += hp
		last := &lr.Segments[len(segs)-1]
		nodes = append(nodes, node(len(segs), lineAlpha(b.Alpha, &last.RunResult)*last.Velocity*last.Velocity/(2*g)))
	}
	return nodes
}

// crown is the height of the pipe's crown above node n's elevation, half
// the inside diameter, or 0 at the line's two ends (total its length):
// their elevations are those of points 1 and 2, often a tank's surface
// rather than the pipe.
func (b Balance) crown(n ProfileNode, total float64) float64 {
	if n.Distance == 0 || n.Distance == total || n.Segment < 1 {
		return 0
	}
	return b.Line.Segments[n.Segment-1].Diameter / 2
}

// highPoints finds the high points of a profile (nodes as gradeNodes builds
// them; point 1, nodes[0], is checked by the balance itself). Both checks
// take the crown, where the pressure in a full pipe is lowest: the HGL
// below it (sub-atmospheric) and the pressure there at or below the vapour
// pressure (the column breaks). The centreline would put the break half a
// diameter of head too late: the unsafe side.
func (b Balance) highPoints(nodes []ProfileNode, pumpHead float64) []HighPoint {
	pv := b.Fluid.VapourPressure
	rhog := b.Fluid.Density * StandardGravity
	total := b.Line.Length()
	var out []HighPoint
	in := false
	for k := 1; k < len(nodes); k++ {
		n := nodes[k]
		seg := n.Segment
		c := b.crown(n, total)
		below := n.Z + c - n.HGL
		if c == 0 {
			below = 0
		}
		p := n.Pressure - rhog*c
		breaks := p <= pv || p <= 0
		if below <= 0 && !breaks {
			in = false
			continue
		}
		// A node is a segment's start when it is the first of its segment's
		// pair (k odd), its end otherwise; the node a pump after the last
		// segment adds is that segment's end too.
		hp := HighPoint{Segment: seg, AtEnd: k%2 == 0 || k > 2*len(b.Line.Segments), Distance: n.Distance, Z: n.Z,
			BelowCrown: below, Pressure: p, Breaks: breaks}
		hp.AtPump = pumpHead > 0 && k%2 == 0 && k <= 2*len(b.Line.Segments) && seg == b.PumpAfter
		if !in {
			out = append(out, hp)
			in = true
			continue
		}
		last := &out[len(out)-1]
		if p < last.Pressure {
			*last = hp
		}
		last.Breaks = last.Breaks || breaks
	}
	return out
}

// fullFlow returns the largest flow the line carries with the pipe full
// (no node's crown at or below the vapour pressure, as highPoints checks),
// with point 1's total head and the pump head held as in r and the surplus
// head at smaller flows taken up at point 2 (a throttling valve at the
// outlet): the flow at which the lowest crown pressure along the line
// equals the vapour pressure, by Brent's method over [0, r.Q]. The
// pressure at every node falls as the flow rises (more friction upstream,
// more velocity head), so the root is unique.
//
// Errors, as *FieldError naming "q": NoSolution with
// ReasonColumnBreaksNoFlow when even no flow keeps the column whole (a
// high point above the static level from point 1 less the vapour head;
// Figures[0] the segment of the lowest crown pressure); NotPositive when
// r.Q is not above zero; NotConverged when the root cannot be found; or
// the error of evaluating the line at a smaller flow.
func (b Balance) fullFlow(r *BalanceResult) (float64, error) {
	if !(r.Q > 0) {
		return 0, NewFieldError("q", NotPositive).Got(Fig(r.Q, Flow))
	}
	pv := math.Max(b.Fluid.VapourPressure, 0)
	rhog := b.Fluid.Density * StandardGravity
	total := b.Line.Length()
	var evalErr error
	lowest := 0 // the segment of the lowest crown pressure at the last flow tried
	f := func(q float64) float64 {
		lr, err := b.Line.Evaluate(b.Fluid, q)
		if err != nil {
			evalErr = err
			return math.NaN()
		}
		nodes := b.gradeNodes(r.In, r.PumpHead, &lr)
		pmin := math.Inf(1)
		for _, n := range nodes[1:] {
			if p := n.Pressure - rhog*b.crown(n, total); p < pmin {
				pmin, lowest = p, n.Segment
			}
		}
		return pmin - pv
	}
	if f0 := f(0); evalErr == nil && f0 <= 0 {
		return 0, NewFieldError("q", NoSolution).Because(ReasonColumnBreaksNoFlow, Num(float64(lowest)))
	}
	q, err := brent(f, 0, r.Q, r.Q*1e-12)
	switch {
	case evalErr != nil:
		return 0, evalErr
	case err != nil:
		return 0, NewFieldError("q", NotConverged).Got(Fig(r.Q, Flow))
	}
	return q, nil
}

// highPointWarnings words one warning per high point, and the full-pipe
// flow fq when the column breaks and fok (fullFlow found it).
func highPointWarnings(hps []HighPoint, q, fq float64, fok bool) []Warning {
	var out []Warning
	for _, hp := range hps {
		at := Num(0)
		if hp.AtEnd {
			at = Num(1)
		}
		place := []Figure{Num(float64(hp.Segment)), at, Fig(hp.Distance, Length), Fig(hp.Z, Length)}
		var w Warning
		switch {
		case hp.AtPump && hp.Breaks && fok:
			w = Warn("z", CautionInletBreaks, append(place, Fig(fq, Flow), Fig(q, Flow))...)
		case hp.AtPump && hp.Breaks:
			w = Warn("z", CautionInletBreaksStill, place...)
		case hp.AtPump:
			w = Warn("z", CautionInletSuction, append(place, Fig(hp.BelowCrown, Length))...)
		case hp.Breaks && fok:
			w = Warn("z", CautionHighPointBreaks, append(place, Fig(fq, Flow), Fig(q, Flow))...)
		case hp.Breaks:
			w = Warn("z", CautionHighPointStill, place...)
		default:
			w = Warn("z", CautionHighPointAir, append(place, Fig(hp.BelowCrown, Length))...)
		}
		w.Segment = hp.Segment
		out = append(out, w)
	}
	return out
}
