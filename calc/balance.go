package calc

import (
	"fmt"
	"math"
)

// Unknown names the one quantity a Balance solves for. Its String form is
// the share-link parameter of that quantity.
type Unknown int

// The quantities a Balance can solve for.
const (
	SolvePumpHead     Unknown = iota // h_pump, m
	SolveTurbineHead                 // h_turbine, m
	SolveFrictionHead                // h_friction, m
	SolveP1                          // pressure at point 1, Pa absolute
	SolveP2                          // pressure at point 2, Pa absolute
	SolveZ1                          // elevation of point 1, m
	SolveZ2                          // elevation of point 2, m
	SolveFlow                        // volumetric flow, m³/s
)

var unknownNames = [...]string{"hp", "ht", "hf", "p1", "p2", "z1", "z2", "q"}

func (u Unknown) String() string {
	if u < 0 || int(u) >= len(unknownNames) {
		return fmt.Sprintf("Unknown(%d)", int(u))
	}
	return unknownNames[u]
}

// ParseUnknown reads a share-link name of an unknown ("hp", "q", …).
func ParseUnknown(s string) (Unknown, error) {
	for i, n := range unknownNames {
		if s == n {
			return Unknown(i), nil
		}
	}
	return 0, NewFieldError("solve", UnknownChoice).Typed(s).OneOf("hp", "ht", "hf", "p1", "p2", "z1", "z2", "q")
}

// AlphaMode chooses the kinetic-energy correction factor α at each point.
type AlphaMode int

// The ways of choosing α.
const (
	// AlphaFromRegime takes α from the regime at the point: 2 laminar, 1
	// turbulent; in transitional flow both bounds are computed. A point
	// given by velocity alone has no regime and takes α = 1 with a warning.
	AlphaFromRegime AlphaMode = iota
	// AlphaUnity takes α = 1 everywhere (the usual turbulent simplification).
	AlphaUnity
	// AlphaPowerLaw estimates α in turbulent flow from a power-law velocity
	// profile (see AlphaPowerLaw); laminar points still take 2.
	AlphaProfile
)

// Point is one end of the balance. P is absolute. The velocity is V, unless
// D is positive, in which case it is Q/(πD²/4) and the regime follows
// from the Reynolds number at D.
type Point struct {
	P float64 // absolute pressure, Pa
	Z float64 // elevation above the datum, m
	V float64 // mean velocity, m/s (used when D is 0)
	D float64 // inside diameter, m (0: use V)
}

// Balance is the steady-flow energy balance between two points in head form,
// in metres of the flowing liquid:
//
//	p1/(ρg) + α1·V1²/(2g) + z1 + h_pump = p2/(ρg) + α2·V2²/(2g) + z2 + h_turbine + h_friction
//
// Exactly one quantity, named by Unknown, is unknown; its input field is
// ignored. When Run is non-nil the friction head is that run's total loss
// at the flow, and FrictionHead is ignored; likewise when Line is non-nil
// (give Run or Line, not both).
type Balance struct {
	Fluid        Fluid
	SitePressure float64 // Pa absolute, for gauge heads in the budget and vapour checks
	In, Out      Point
	Q            float64 // m³/s
	PumpHead     float64 // m
	TurbineHead  float64 // m
	FrictionHead float64 // m
	Run          *Run
	// Line, when non-nil, is the pipe path between the points as a list of
	// segments: the friction head is the line's TotalLoss at the flow (its
	// bounds in transitional flow), and the result carries the line and
	// its EGL/HGL profile.
	Line *Line
	// PumpAfter places the pump on the line, for the profile: it sits
	// after segment PumpAfter (1-based; 0 means at point 1). Used only
	// with Line. A change of diameter at the pump is still charged as a
	// sudden expansion or contraction, a little on the safe side, since a
	// pump's data-sheet head is measured between its own flanges.
	PumpAfter int
	Alpha     AlphaMode
	Unknown   Unknown
	// MaxFlow bounds the flow search when Unknown is SolveFlow, m³/s. Zero
	// means the flow at 30 m/s in the narrowest diameter given.
	MaxFlow float64
}

// PointState is one end of the balance as evaluated.
type PointState struct {
	P            float64 // absolute pressure, Pa
	Z            float64 // m
	Velocity     float64 // m/s
	Reynolds     float64 // 0 when the point has no diameter
	Regime       Regime
	HasRegime    bool    // false when the point is given by velocity alone
	Alpha        float64 // α used in the design result
	PressureHead float64 // (p − p_site)/(ρg), m: gauge, as a gauge would read it
	VelocityHead float64 // α·V²/(2g), m
	TotalHead    float64 // PressureHead + VelocityHead + Z, m (energy grade, gauge basis)
}

// BudgetItem is one term of "Where the head goes": the head it supplies
// (Side +1, on the point-1 side of the equation) or uses (Side −1), in
// metres of the liquid and as the pressure ρ·g·h.
type BudgetItem struct {
	Key      string // "p1", "v1", "z1", "hp", "p2", "v2", "z2", "ht", "major", "minor", "hf"
	Label    string
	Side     int
	Head     float64 // m
	Pressure float64 // Pa
}

// BalanceResult is a solved balance.
type BalanceResult struct {
	Solve Unknown
	// Value is the solved unknown in SI (Pa absolute for p1, p2; m for
	// heads and elevations; m³/s for flow), on the design assumptions:
	// α and friction of the turbulent bound where flow is transitional.
	Value float64
	// Transitional is true when a point or the run is in transitional flow;
	// ValueLow and ValueHigh then bound the unknown over the laminar and
	// turbulent assumptions. Otherwise both equal Value.
	Transitional        bool
	ValueLow, ValueHigh float64

	Q, PumpHead, TurbineHead, FrictionHead float64
	In, Out                                PointState
	Run                                    *RunResult
	// Line is the line evaluated at the solution's flow, when the balance
	// has one; Profile is then its EGL/HGL profile (see ProfileNode).
	Line    *LineResult
	Profile []ProfileNode
	// HighPoints are the stretches of the line where the HGL falls below
	// the pipe crown or the vapour-pressure line, one per stretch. When
	// the column breaks at one and FullFlowKnown is true, FullFlow is the
	// largest flow the line carries full, m³/s (see Balance.fullFlow);
	// when the column breaks and FullFlowKnown is false, FullFlowErr (a
	// *FieldError naming "q") says why that flow is not known.
	HighPoints    []HighPoint
	FullFlow      float64
	FullFlowKnown bool
	FullFlowErr   error
	// PumpAfter is the pump's place on the line as used for the profile.
	PumpAfter int

	Budget       []BudgetItem
	PumpPower    float64 // hydraulic power ρ·g·Q·h_pump, W
	TurbinePower float64 // hydraulic power ρ·g·Q·h_turbine, W (before machine efficiency)
	Warnings     []Warning
}

// bound selects the assumptions for transitional flow.
type bound int

const (
	boundTurbulent bound = iota // α = 1 and the turbulent friction factor (the design case)
	boundLaminar                // α = 2 and f = 64/Re
)

// state holds every term of the balance at one flow.
type state struct {
	in, out PointState
	hf      float64
	run     *RunResult
	line    *LineResult
	trans   bool
	warn    []Warning
}

// Solve solves the balance for its unknown.
func (b Balance) Solve() (BalanceResult, error) {
	// The unknown's own input is ignored, whatever it holds.
	switch b.Unknown {
	case SolvePumpHead:
		b.PumpHead = 0
	case SolveTurbineHead:
		b.TurbineHead = 0
	case SolveFrictionHead:
		b.FrictionHead = 0
	case SolveP1:
		b.In.P = b.SitePressure
	case SolveP2:
		b.Out.P = b.SitePressure
	case SolveZ1:
		b.In.Z = 0
	case SolveZ2:
		b.Out.Z = 0
	case SolveFlow:
		b.Q = 0
	}
	if err := b.check(); err != nil {
		return BalanceResult{}, err
	}
	design, st, err := b.solveFor(boundTurbulent)
	if err != nil {
		return BalanceResult{}, err
	}
	res := b.result(design, st)
	res.ValueLow, res.ValueHigh = design, design
	if st.trans {
		res.Transitional = true
		if lam, _, err := b.solveFor(boundLaminar); err == nil {
			res.ValueLow, res.ValueHigh = math.Min(design, lam), math.Max(design, lam)
		}
		res.Warnings = append(res.Warnings, Warn(b.Unknown.String(), CautionTransitionalBalance))
	}
	return res, nil
}

// Limits of the inputs, in SI: far beyond any liquid line, they keep every
// term of the balance finite.
const (
	maxPressure  = 1e9   // Pa
	maxElevation = 2e4   // m
	maxHead      = 1e5   // m
	maxFlow      = 1e3   // m³/s
	maxVelocity  = 1e3   // m/s
	maxDiameter  = 100.0 // m
	minDiameter  = 1e-5  // m
	minDensity   = 1.0   // kg/m³
	maxDensity   = 1e5   // kg/m³
)

// check validates the inputs that every unknown needs.
func (b Balance) check() error {
	fl := b.Fluid
	if !(fl.Density > 0) || math.IsInf(fl.Density, 0) {
		return NewFieldError("rho", NotPositive).Got(Fig(fl.Density, Density))
	}
	if b.Unknown < 0 || int(b.Unknown) >= len(unknownNames) {
		return NewFieldError("solve", UnknownChoice)
	}
	finite := []struct {
		field string
		v     float64
		skip  Unknown
	}{
		{"p1", b.In.P, SolveP1}, {"p2", b.Out.P, SolveP2},
		{"z1", b.In.Z, SolveZ1}, {"z2", b.Out.Z, SolveZ2},
		{"q", b.Q, SolveFlow}, {"hp", b.PumpHead, SolvePumpHead},
		{"ht", b.TurbineHead, SolveTurbineHead}, {"hf", b.FrictionHead, SolveFrictionHead},
		{"v1", b.In.V, -1}, {"v2", b.Out.V, -1}, {"d1", b.In.D, -1}, {"d2", b.Out.D, -1},
		{"baro", b.SitePressure, -1},
	}
	for _, c := range finite {
		if c.skip != b.Unknown && (math.IsNaN(c.v) || math.IsInf(c.v, 0)) {
			return NewFieldError(c.field, NotFinite)
		}
	}
	// Magnitudes far beyond any liquid line are refused, so that no term
	// of the balance can overflow into an infinite result.
	for _, c := range []struct {
		field, what string
		v, max      float64
		skip        Unknown
	}{
		{"p1", "pressure", b.In.P, maxPressure, SolveP1}, {"p2", "pressure", b.Out.P, maxPressure, SolveP2},
		{"baro", "pressure", b.SitePressure, maxPressure, -1},
		{"z1", "elevation", b.In.Z, maxElevation, SolveZ1}, {"z2", "elevation", b.Out.Z, maxElevation, SolveZ2},
		{"hp", "head", b.PumpHead, maxHead, SolvePumpHead}, {"ht", "head", b.TurbineHead, maxHead, SolveTurbineHead},
		{"hf", "head", b.FrictionHead, maxHead, SolveFrictionHead},
		{"q", "flow", b.Q, maxFlow, SolveFlow},
		{"v1", "velocity", b.In.V, maxVelocity, -1}, {"v2", "velocity", b.Out.V, maxVelocity, -1},
		{"d1", "diameter", b.In.D, maxDiameter, -1}, {"d2", "diameter", b.Out.D, maxDiameter, -1},
	} {
		if c.skip != b.Unknown && math.Abs(c.v) > c.max {
			return NewFieldError(c.field, AboveLimit).Got(Num(c.v)).AtMost(Num(c.max)).Because(ReasonFarBeyond)
		}
	}
	for _, d := range []struct {
		field string
		v     float64
	}{{"d1", b.In.D}, {"d2", b.Out.D}} {
		if d.v > 0 && d.v < minDiameter {
			return NewFieldError(d.field, BelowLimit).Got(Fig(d.v, Length)).AtLeast(Fig(minDiameter, Length)).Because(ReasonCheckUnit)
		}
	}
	if fl.Density < minDensity || fl.Density > maxDensity {
		return NewFieldError("rho", OutOfRange).Got(Fig(fl.Density, Density)).Within(Fig(minDensity, Density), Fig(maxDensity, Density))
	}
	if b.In.D < 0 {
		return NewFieldError("d1", NotPositive).Got(Fig(b.In.D, Length))
	}
	if b.Out.D < 0 {
		return NewFieldError("d2", NotPositive).Got(Fig(b.Out.D, Length))
	}
	if b.Unknown != SolveFlow && b.Q < 0 {
		return NewFieldError("q", Negative).Got(Fig(b.Q, Flow)).Because(ReasonFlowDirection)
	}
	if b.Run != nil && b.Line != nil {
		return NewFieldError("l", Inconsistent).With("line").Because(ReasonRunOrSegments)
	}
	if b.Line != nil {
		if err := b.Line.check(); err != nil {
			return err
		}
		if b.PumpAfter < 0 || b.PumpAfter > len(b.Line.Segments) {
			return NewFieldError("pafter", OutOfRange).Got(Num(float64(b.PumpAfter))).Within(Num(0), Num(float64(len(b.Line.Segments)))).Because(ReasonPumpAfter)
		}
		if b.Unknown == SolveFrictionHead {
			return NewFieldError("solve", Inconsistent).With("hf").Because(ReasonHfFromSegments)
		}
	}
	if (b.In.D > 0 || b.Out.D > 0 || b.Run != nil || b.Line != nil) && !(fl.Viscosity > 0) {
		return NewFieldError("mu", NotPositive).Got(Fig(fl.Viscosity, DynamicViscosity))
	}
	if b.Run != nil && b.Unknown == SolveFrictionHead {
		return NewFieldError("solve", Inconsistent).With("hf").Because(ReasonHfFromRun)
	}
	if b.Unknown == SolveFlow && b.Run == nil && b.Line == nil && b.In.D == 0 && b.Out.D == 0 {
		return NewFieldError("q", NoSolution).Because(ReasonFlowIndependent)
	}
	return nil
}

// at evaluates every term at flow q under the given bound.
func (b Balance) at(q float64, bd bound) (state, error) {
	var st state
	g := StandardGravity
	rho := b.Fluid.Density
	pt := func(p Point, field string) (PointState, error) {
		ps := PointState{P: p.P, Z: p.Z, Velocity: p.V}
		if p.D > 0 {
			ps.Velocity = q / (math.Pi * p.D * p.D / 4)
			ps.Reynolds = Reynolds(rho, math.Abs(ps.Velocity), p.D, b.Fluid.Viscosity)
			ps.Regime = RegimeOf(ps.Reynolds)
			ps.HasRegime = true
		}
		ps.Alpha = 1
		switch {
		case ps.HasRegime && ps.Regime == Laminar && b.Alpha != AlphaUnity:
			ps.Alpha = 2
		case ps.HasRegime && ps.Regime == Transitional && b.Alpha != AlphaUnity:
			st.trans = true
			if bd == boundLaminar {
				ps.Alpha = 2
			}
		case ps.HasRegime && ps.Regime == Turbulent && b.Alpha == AlphaProfile:
			a, _, err := AlphaPowerLaw(ps.Reynolds)
			if err != nil {
				return ps, err
			}
			ps.Alpha = a
		case !ps.HasRegime && ps.Velocity != 0 && b.Alpha == AlphaFromRegime:
			st.warn = append(st.warn, Warn("d"+field[1:], CautionAlphaUnity))
		}
		ps.PressureHead = (p.P - b.SitePressure) / (rho * g)
		ps.VelocityHead = ps.Alpha * ps.Velocity * ps.Velocity / (2 * g)
		ps.TotalHead = ps.PressureHead + ps.VelocityHead + ps.Z
		return ps, nil
	}
	var err error
	if st.in, err = pt(b.In, "v1"); err != nil {
		return st, err
	}
	if st.out, err = pt(b.Out, "v2"); err != nil {
		return st, err
	}
	st.hf = b.FrictionHead
	if b.Run != nil {
		rr, err := b.Run.Evaluate(b.Fluid, q)
		if err != nil {
			return st, err
		}
		st.run = &rr
		st.hf = rr.TotalLoss
		if rr.Regime == Transitional {
			st.trans = true
			if bd == boundLaminar {
				st.hf = rr.TotalLossLow
			} else {
				st.hf = rr.TotalLossHigh
			}
		}
	}
	if b.Line != nil {
		lr, err := b.Line.Evaluate(b.Fluid, q)
		if err != nil {
			return st, err
		}
		st.line = &lr
		st.hf = lr.TotalLoss
		if lr.Transitional {
			st.trans = true
			if bd == boundLaminar {
				st.hf = lr.TotalLossLow
			} else {
				st.hf = lr.TotalLossHigh
			}
		}
	}
	return st, nil
}

// residual is (point-1 side) − (point-2 side) of the balance, in metres.
func (b Balance) residual(st state) float64 {
	return st.in.TotalHead + b.PumpHead - st.out.TotalHead - b.TurbineHead - st.hf
}

// solveFor returns the unknown under one bound, and the state at the solution.
func (b Balance) solveFor(bd bound) (float64, state, error) {
	g := StandardGravity
	rhog := b.Fluid.Density * g
	if b.Unknown == SolveFlow {
		return b.solveFlow(bd)
	}
	st, err := b.at(b.Q, bd)
	if err != nil {
		return 0, st, err
	}
	// Set the unknown's own term to zero, then the residual is what it must supply.
	switch b.Unknown {
	case SolvePumpHead:
		return -b.residual(st), st, nil
	case SolveTurbineHead, SolveFrictionHead:
		return b.residual(st), st, nil
	case SolveP1:
		r := b.residual(st) // p1 enters with +1/(ρg)
		return b.In.P - r*rhog, st, nil
	case SolveP2:
		r := b.residual(st)
		return b.Out.P + r*rhog, st, nil
	case SolveZ1:
		return b.In.Z - b.residual(st), st, nil
	case SolveZ2:
		return b.Out.Z + b.residual(st), st, nil
	}
	return 0, st, NewFieldError("solve", UnknownChoice)
}

// solveFlow finds the flow that closes the balance, by Brent's method over
// (0, MaxFlow].
func (b Balance) solveFlow(bd bound) (float64, state, error) {
	qmax := b.MaxFlow
	if qmax <= 0 {
		dmin := math.Inf(1)
		for _, d := range []float64{b.In.D, b.Out.D} {
			if d > 0 {
				dmin = math.Min(dmin, d)
			}
		}
		if b.Run != nil && b.Run.Diameter > 0 {
			dmin = math.Min(dmin, b.Run.Diameter)
		}
		if b.Line != nil {
			dmin = math.Min(dmin, b.Line.minDiameter())
		}
		qmax = 30 * math.Pi * dmin * dmin / 4
	}
	var evalErr error
	f := func(q float64) float64 {
		st, err := b.at(q, bd)
		if err != nil {
			evalErr = err
			return math.NaN()
		}
		return b.residual(st)
	}
	qmin := qmax * 1e-9
	q, err := brent(f, qmin, qmax, qmax*1e-13)
	if evalErr != nil {
		return 0, state{}, evalErr
	}
	if err == errNoBracket {
		if f(qmin) < 0 {
			return 0, state{}, NewFieldError("q", NoSolution).Because(ReasonNoFlowPossible)
		}
		return 0, state{}, NewFieldError("q", NoSolution).Because(ReasonNoSolutionBelow, Fig(qmax, Flow), Fig(30, Velocity))
	}
	if err != nil {
		return 0, state{}, NewFieldError("q", NotConverged)
	}
	st, err := b.at(q, bd)
	if err != nil {
		return 0, st, err
	}
	// Brent lands on a jump if the residual is discontinuous (α or f
	// switching at the laminar/turbulent limit); a real root has a small
	// residual.
	if r := b.residual(st); math.Abs(r) > 1e-6*(1+math.Abs(st.in.TotalHead)+math.Abs(st.out.TotalHead)) {
		return 0, st, NewFieldError("q", NoSolution).Because(ReasonRegimeJump, Fig(q, Flow))
	}
	return q, st, nil
}

// result fills a BalanceResult from the design solution.
func (b Balance) result(v float64, st state) BalanceResult {
	g := StandardGravity
	rho := b.Fluid.Density
	r := BalanceResult{Solve: b.Unknown, Value: v, Q: b.Q, PumpHead: b.PumpHead,
		TurbineHead: b.TurbineHead, FrictionHead: st.hf, Run: st.run, Line: st.line, PumpAfter: b.PumpAfter}
	switch b.Unknown {
	case SolvePumpHead:
		r.PumpHead = v
	case SolveTurbineHead:
		r.TurbineHead = v
	case SolveFrictionHead:
		r.FrictionHead = v
	case SolveFlow:
		r.Q = v
	case SolveP1, SolveZ1:
		// Recompute the point-1 terms with the solved value.
		if b.Unknown == SolveP1 {
			st.in.P = v
		} else {
			st.in.Z = v
		}
		st.in.PressureHead = (st.in.P - b.SitePressure) / (rho * g)
		st.in.TotalHead = st.in.PressureHead + st.in.VelocityHead + st.in.Z
	case SolveP2, SolveZ2:
		if b.Unknown == SolveP2 {
			st.out.P = v
		} else {
			st.out.Z = v
		}
		st.out.PressureHead = (st.out.P - b.SitePressure) / (rho * g)
		st.out.TotalHead = st.out.PressureHead + st.out.VelocityHead + st.out.Z
	}
	r.In, r.Out = st.in, st.out
	r.Warnings = append(r.Warnings, st.warn...)
	if st.run != nil {
		for _, w := range st.run.Warnings {
			if w.Field == "" {
				w.Field = "l"
			}
			r.Warnings = append(r.Warnings, w)
		}
	}
	if st.line != nil {
		r.Warnings = append(r.Warnings, lineWarnings(st.line, r.Q)...)
	}

	add := func(key, label string, side int, h float64) {
		r.Budget = append(r.Budget, BudgetItem{Key: key, Label: label, Side: side, Head: h, Pressure: rho * g * h})
	}
	add("p1", "pressure head at 1", +1, r.In.PressureHead)
	add("v1", "velocity head at 1", +1, r.In.VelocityHead)
	// Elevations enter the budget above the lower point, so the bars show
	// the lift rather than the height of the datum.
	zref := math.Min(r.In.Z, r.Out.Z)
	add("z1", "elevation of 1 above the lower point", +1, r.In.Z-zref)
	add("hp", "added by the pump", +1, r.PumpHead)
	add("p2", "pressure head at 2", -1, r.Out.PressureHead)
	add("v2", "velocity head at 2", -1, r.Out.VelocityHead)
	add("z2", "elevation of 2 above the lower point", -1, r.Out.Z-zref)
	add("ht", "taken by the turbine", -1, r.TurbineHead)
	if st.run != nil && b.Unknown != SolveFrictionHead {
		major, minor := st.run.MajorLoss, st.run.MinorLoss
		if st.run.Regime == Transitional && st.run.TotalLoss > 0 {
			scale := r.FrictionHead / st.run.TotalLoss
			major, minor = major*scale, minor*scale
		}
		add("major", "pipe friction", -1, major)
		add("minor", "fittings", -1, minor)
	} else if st.line != nil {
		for _, t := range st.line.budgetTerms(r.FrictionHead) {
			add(t.key, t.label, -1, t.head)
		}
	} else {
		add("hf", "friction and other losses", -1, r.FrictionHead)
	}
	if st.line != nil {
		var w []Warning
		r.Profile, w = b.profile(&r, st.line)
		r.Warnings = append(r.Warnings, w...)
	}

	r.PumpPower = rho * g * r.Q * r.PumpHead
	r.TurbinePower = rho * g * r.Q * r.TurbineHead

	switch {
	case b.Unknown == SolvePumpHead && v < 0:
		r.Warnings = append(r.Warnings, Warn("hp", CautionPumpHeadNegative))
	case b.Unknown == SolveTurbineHead && v < 0:
		r.Warnings = append(r.Warnings, Warn("ht", CautionTurbineHeadNegative))
	case b.Unknown == SolveFrictionHead && v < 0:
		r.Warnings = append(r.Warnings, Warn("hf", CautionFrictionHeadNegative))
	}
	pv := b.Fluid.VapourPressure
	for i, p := range []PointState{r.In, r.Out} {
		n := fmt.Sprint(i + 1)
		switch {
		case p.P <= 0:
			r.Warnings = append(r.Warnings, Warn("p"+n, CautionNoAbsolutePressure))
		case pv > 0 && p.P <= pv:
			r.Warnings = append(r.Warnings, Warn("p"+n, CautionBelowVapourPressure, Fig(p.P, Pressure), Fig(pv, Pressure)))
		}
		if v := math.Abs(p.Velocity); v > 6 {
			r.Warnings = append(r.Warnings, Warn("v"+n, CautionPointVelocityHigh, Fig(v, Velocity), Fig(3, Velocity)))
		}
	}
	return r
}
