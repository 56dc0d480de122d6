package calc

// ProfileNode is one point of the energy and hydraulic grade lines along a
// line, for the profile chart. Heads are on the gauge basis of
// PointState.TotalHead: pressure head above the site pressure plus
// elevation (plus velocity head for the EGL).
type ProfileNode struct {
	Distance float64 // along the pipe from point 1, m
	Z        float64 // elevation of the pipe, m
	EGL      float64 // energy grade line, m
	HGL      float64 // hydraulic grade line, EGL − α·V²/(2g), m
	Pressure float64 // absolute pressure in the pipe, (HGL − Z)·ρ·g + site pressure, Pa
	Segment  int     // the 1-based segment the node belongs to; 0 for point 1
}

// lineAlpha is the kinetic-energy factor of a segment for the profile, on
// the design assumptions of the balance: 2 laminar, 1 turbulent (or the
// power-law estimate when asked for), 1 in transitional flow (the turbulent
// bound).
func lineAlpha(mode AlphaMode, rr *RunResult) float64 {
	if mode == AlphaUnity {
		return 1
	}
	switch rr.Regime {
	case Laminar:
		return AlphaLaminar()
	case Turbulent:
		if mode == AlphaProfile {
			if a, _, err := AlphaPowerLaw(rr.Reynolds); err == nil {
				return a
			}
		}
	}
	return AlphaTurbulent()
}

// profile builds the EGL/HGL profile of a balance with a line, from the
// solved result r (point heads, pump head) and the line evaluated at the
// solution's flow, with warnings where the pressure in the pipe falls to
// the vapour pressure.
//
// The first node is point 1 itself. Each segment then has a node at its
// start and one at its end; friction and fittings are spread along the
// segment and lumped at its end (the EGL is drawn straight from the start
// node to the end node), the transition loss of a change of diameter drops
// the EGL at the junction, and the pump head lifts it at the pump's node
// (after segment PumpAfter; at point 1 when PumpAfter is 0). A pump after
// the last segment gives one more node there. The profile stops upstream
// of any turbine, taken at point 2: the last node's EGL is
// Out.TotalHead + h_turbine.
func (b Balance) profile(r *BalanceResult, lr *LineResult) ([]ProfileNode, []Warning) {
	g := StandardGravity
	rhog := b.Fluid.Density * g
	segs := b.Line.Segments
	nodes := make([]ProfileNode, 0, 2*len(segs)+2)
	nodes = append(nodes, ProfileNode{Z: r.In.Z, EGL: r.In.TotalHead,
		HGL: r.In.TotalHead - r.In.VelocityHead, Pressure: r.In.P})
	egl, dist, z := r.In.TotalHead, 0.0, r.In.Z
	node := func(seg int, hv float64) ProfileNode {
		hgl := egl - hv
		return ProfileNode{Distance: dist, Z: z, EGL: egl, HGL: hgl,
			Pressure: (hgl-z)*rhog + b.SitePressure, Segment: seg}
	}
	var warn []Warning
	pv := b.Fluid.VapourPressure
	for i := range segs {
		sr := &lr.Segments[i]
		if b.PumpAfter == i {
			egl += r.PumpHead
		}
		egl -= sr.TransitionLoss
		hv := lineAlpha(b.Alpha, &sr.RunResult) * sr.Velocity * sr.Velocity / (2 * g)
		start := node(i+1, hv)
		dist += segs[i].Length
		z = segs[i].EndZ
		egl -= sr.TotalLoss
		end := node(i+1, hv)
		nodes = append(nodes, start, end)
		for _, n := range [2]ProfileNode{start, end} {
			if n.Pressure <= pv || n.Pressure <= 0 {
				w := Warn("z", CautionColumnBreaks, Fig(n.Pressure, Pressure), Fig(n.Distance, Length), Fig(pv, Pressure))
				w.Segment = i + 1
				warn = append(warn, w)
				break
			}
		}
	}
	if b.PumpAfter == len(segs) {
		egl += r.PumpHead
		last := &lr.Segments[len(segs)-1]
		nodes = append(nodes, node(len(segs), lineAlpha(b.Alpha, &last.RunResult)*last.Velocity*last.Velocity/(2*g)))
	}
	return nodes, warn
}
