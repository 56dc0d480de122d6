package calc

import (
	"math"
)

// TurbineResult is the turbine side of a line at one flow.
type TurbineResult struct {
	Q float64 // flow, m³/s
	// GrossHead is the static and pressure difference between the
	// points, (p1 − p2)/(ρg) + z1 − z2, m, with no flow terms.
	GrossHead float64
	// NetHead is the head left for the turbine at Q, m: GrossHead minus
	// the line's losses and the exit velocity head, plus any velocity head
	// at point 1. It is the balance's turbine head.
	NetHead          float64
	Losses           float64 // friction and fittings between the points at Q, m
	ExitVelocityHead float64 // α·V²/(2g) at point 2, m
	Efficiency       float64 // turbine-and-generator efficiency used, fraction
	HydraulicPower   float64 // ρ·g·Q·NetHead, W
	Power            float64 // output, ρ·g·Q·NetHead·η, W
	// LossShare is Losses/GrossHead and NetShare NetHead/GrossHead, the
	// shares of the gross head lost in the line and left for the turbine
	// (0 when there is no gross head).
	LossShare, NetShare float64
	// StaticInlet is the gauge pressure at point 2's elevation with the
	// flow stopped, point 1's level and pressure held there:
	// p1 (gauge) + ρ·g·(z1 − z2), Pa. It is what the turbine's inlet valve
	// and the pipe there hold at rest, before any surge.
	StaticInlet float64
	// StaticInletHead is StaticInlet as a head of the liquid, m.
	StaticInletHead float64
	Balance         BalanceResult
	Warnings        []Warning
}

// checkTurbineEff validates a turbine efficiency (field "etat").
func checkTurbineEff(eff float64) error {
	if math.IsNaN(eff) || !(eff > 0 && eff <= 1) {
		return NewFieldError("etat", OutOfRange).Got(Num(eff)).Within(Num(0), Num(1)).Because(ReasonEfficiency)
	}
	return nil
}

// Turbine evaluates the turbine side of balance b at its flow b.Q: gross
// head, net head after the line's losses and the exit velocity head, and
// the output ρ·g·Q·H_net·η with eff the turbine-and-generator efficiency
// (a fraction, above 0 and at most 1; field "etat"). b's Unknown is taken
// as the turbine head; any pump head is ignored. A net head at or below
// zero is reported with a warning (no output at this flow).
func Turbine(b Balance, eff float64) (TurbineResult, error) {
	if err := checkTurbineEff(eff); err != nil {
		return TurbineResult{}, err
	}
	b.Unknown, b.PumpHead = SolveTurbineHead, 0
	br, err := b.Solve()
	if err != nil {
		return TurbineResult{}, err
	}
	rhog := b.Fluid.Density * StandardGravity
	r := TurbineResult{Q: br.Q, NetHead: br.Value, Losses: br.FrictionHead,
		ExitVelocityHead: br.Out.VelocityHead, Efficiency: eff, Balance: br}
	r.GrossHead = (b.In.P-b.Out.P)/rhog + b.In.Z - b.Out.Z
	r.HydraulicPower = rhog * r.Q * r.NetHead
	r.Power = r.HydraulicPower * eff
	if r.GrossHead > 0 {
		r.LossShare, r.NetShare = r.Losses/r.GrossHead, r.NetHead/r.GrossHead
	}
	r.StaticInlet = br.In.P - b.SitePressure + rhog*(br.In.Z-br.Out.Z)
	r.StaticInletHead = r.StaticInlet / rhog
	if r.GrossHead <= 0 {
		r.Warnings = append(r.Warnings, Warn("z1", CautionNoGrossHead, Fig(r.GrossHead, Length)))
	} else if r.NetHead <= 0 {
		r.Warnings = append(r.Warnings, Warn("q", CautionNoOutput, Fig(r.Losses, Length), Fig(r.GrossHead, Length)))
	}
	return r, nil
}

// goldenMax maximises f over [a, b] by golden-section search (J. Kiefer,
// "Sequential minimax search for a maximum", Proc. Amer. Math. Soc.
// 4(3):502–506, 1953) to an interval of width tol, assuming f unimodal
// there. It returns the best abscissa evaluated.
func goldenMax(f func(float64) float64, a, b, tol float64) float64 {
	invPhi := (math.Sqrt(5) - 1) / 2
	c := b - invPhi*(b-a)
	d := a + invPhi*(b-a)
	fc, fd := f(c), f(d)
	for i := 0; i < 200 && b-a > tol; i++ {
		if fc > fd {
			b, d, fd = d, c, fc
			c = b - invPhi*(b-a)
			fc = f(c)
		} else {
			a, c, fc = c, d, fd
			d = a + invPhi*(b-a)
			fd = f(d)
		}
	}
	if fc > fd {
		return c
	}
	return d
}

// BestTurbineFlow finds the flow that gives the most turbine output from
// the line of balance b, by golden-section search (Kiefer, 1953) of the
// output ρ·g·Q·H_net(Q)·η over (0, qmax], and evaluates the turbine there
// (see Turbine). qmax 0 means up to the flow at which the net head falls to
// zero. Output is unimodal in Q for a line whose losses rise with flow; for
// losses ∝ Q² the optimum is where losses and exit velocity head take one
// third of the gross head (common practice), which the tests check. Errors:
// "etat" for the efficiency, "z1" when there is no gross head, "q" for a
// bad qmax or a line whose net head never falls to zero.
func BestTurbineFlow(b Balance, eff, qmax float64) (TurbineResult, error) {
	if err := checkTurbineEff(eff); err != nil {
		return TurbineResult{}, err
	}
	if math.IsNaN(qmax) || math.IsInf(qmax, 0) || qmax < 0 {
		return TurbineResult{}, NewFieldError("q", Negative).Got(Fig(qmax, Flow)).Because(ReasonSearchLimit)
	}
	orig := b
	b.Unknown, b.PumpHead, b.TurbineHead, b.Q = SolveTurbineHead, 0, 0, 0
	if err := b.check(); err != nil {
		return TurbineResult{}, err
	}
	b = b.lumped()
	rhog := b.Fluid.Density * StandardGravity
	if gross := (b.In.P-b.Out.P)/rhog + b.In.Z - b.Out.Z; gross <= 0 {
		return TurbineResult{}, NewFieldError("z1", NoSolution).Got(Fig(gross, Length)).Because(ReasonNoGrossHead)
	}
	var evalErr error
	net := func(q float64) float64 {
		st, err := b.at(q, boundTurbulent)
		if err != nil {
			evalErr = err
			return math.NaN()
		}
		return b.residual(st) // with no pump or turbine head: what is left for the turbine
	}
	if qmax == 0 {
		dmin := math.Inf(1)
		for _, d := range []float64{b.In.D, b.Out.D} {
			if d > 0 {
				dmin = math.Min(dmin, d)
			}
		}
		if b.Run != nil {
			dmin = math.Min(dmin, b.Run.Diameter)
		}
		if b.Line != nil {
			dmin = math.Min(dmin, b.Line.minDiameter())
		}
		if math.IsInf(dmin, 1) {
			return TurbineResult{}, NewFieldError("q", NoSolution).Because(ReasonOutputUnbound)
		}
		qbig := 30 * math.Pi * dmin * dmin / 4 // 30 m/s in the narrowest pipe
		hb := net(qbig)
		if evalErr != nil {
			return TurbineResult{}, evalErr
		}
		if hb > 0 {
			return TurbineResult{}, NewFieldError("q", NoSolution).Because(ReasonTurbineNoZero, Fig(qbig, Flow), Fig(30, Velocity))
		}
		q0, err := brent(net, qbig*1e-9, qbig, qbig*1e-13)
		if evalErr != nil {
			return TurbineResult{}, evalErr
		}
		if err != nil {
			return TurbineResult{}, NewFieldError("q", NotConverged)
		}
		qmax = q0
	}
	power := func(q float64) float64 { return q * net(q) }
	q := goldenMax(power, 0, qmax, 1e-10*qmax)
	if evalErr != nil {
		return TurbineResult{}, evalErr
	}
	orig.Q = q
	return Turbine(orig, eff)
}
