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
// solution's flow. It sets r.HighPoints (see HighPoint) and, when the
// column breaks at one, r.FullFlow or r.FullFlowErr (see fullFlow), and words one warning
// per high point.
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
	nodes := b.gradeNodes(r.In, r.PumpHead, lr)
	r.HighPoints = b.highPoints(nodes, r.PumpHead)
	broken := false
	for _, hp := range r.HighPoints {
		broken = broken || hp.Breaks
	}
	if broken {
		var err error
		r.FullFlow, err = b.fullFlow(r)
		r.FullFlowKnown, r.FullFlowErr = err == nil, err
	}
	return nodes, highPointWarnings(r.HighPoints, r.Q, r.FullFlow, r.FullFlowKnown)
}
