package calc

import (
	"math"
)

// Usual mean-velocity range of liquid lines (common practice). Outside it
// Run.Evaluate adds a warning.
const (
	RunVelocityLow  = 0.3 // m/s
	RunVelocityHigh = 3.0 // m/s
)

// Kinematic viscosity range, m²/s, in which Run.Evaluate accepts the
// Hazen–Williams method: water from about 0 °C to about 50 °C.
const (
	hazenNuMin = 0.5e-6
	hazenNuMax = 1.8e-6
	hazenDMin  = 0.05 // m; smaller pipes draw a warning
)

// FittingCount is a number of identical fittings in a run, by key of
// FittingTable. When Override is set, K replaces the table's method for
// these fittings (a figure from the maker's data sheet, say); it must be
// finite and zero or positive.
type FittingCount struct {
	Key      string
	Count    int
	K        float64 // per fitting, used when Override is set
	Override bool
}

// FittingK is the loss coefficient a run used for one kind of fitting.
type FittingK struct {
	Key     string
	Count   int
	K       float64 // per fitting, at the run's diameter and Reynolds number
	Method  string  // "Crane TP-410", "Hooper 2-K", "fixed" or "given"
	Formula string  // e.g. "K = 8·f_T"; for a given K, "K = 0.12"
	Source  string  // the table's source; empty for a given K
	// Head is the head all Count of them lose at the run's velocity,
	// Count·K·V²/(2g), m (RunResult.Fittings only; 0 at zero flow).
	Head float64
}

// Run is one straight pipe run of constant inside diameter with its
// fittings. Lengths in metres. Method selects the turbulent friction
// factor; laminar flow always uses 64/Re. HazenC is used only by
// MethodHazenWilliams, Roughness by the other methods.
type Run struct {
	Length    float64 // m, ≥ 0
	Diameter  float64 // inside diameter, m, > 0
	Roughness float64 // absolute roughness ε, m, ≥ 0 (ε/D ≤ 0.05)
	Fittings  []FittingCount
	ExtraK    float64 // further loss coefficients, added to ΣK
	Method    FrictionMethod
	HazenC    float64 // Hazen–Williams C, for MethodHazenWilliams

	// extraK1 is Σ Count·K1 of Hooper fittings folded into ExtraK by
	// lumped: ΣK gains extraK1/Re.
	extraK1 float64
}

// RunResult is a Run evaluated at one flow. Losses are heads in metres of
// the flowing liquid.
type RunResult struct {
	Velocity float64 // mean velocity, m/s
	Reynolds float64
	Regime   Regime
	Alpha    float64 // kinetic-energy factor of the design bound: 2 laminar, 1 turbulent
	// Friction is the Darcy factor used for MajorLoss. In transitional flow
	// it is the bound giving the larger loss (normally the turbulent one).
	// For Hazen–Williams it is the equivalent Darcy factor. 0 at zero flow.
	Friction                  float64
	FrictionLow, FrictionHigh float64 // bounds in transitional flow; equal to Friction otherwise
	MajorLoss                 float64 // pipe friction, f·(L/D)·V²/(2g)
	MinorLoss                 float64 // fittings, ΣK·V²/(2g)
	VelocityHead              float64 // V²/(2g), m
	// Gradient is the head lost to pipe friction per length of pipe,
	// f·V²/(2g·D), m per m (the larger bound in transitional flow).
	Gradient float64
	// PressureDrop is TotalLoss as a pressure of the liquid, ρ·g·TotalLoss, Pa.
	PressureDrop  float64
	TotalLoss     float64 // MajorLoss + MinorLoss (the larger bound in transitional flow)
	TotalLossLow  float64 // transitional flow: total with the smaller friction bound
	TotalLossHigh float64 // transitional flow: total with the larger bound (= TotalLoss)
	SumK          float64 // ΣK of the fittings plus ExtraK
	// Fittings lists the K used for each kind of fitting, in the run's
	// order: at the run's diameter and Reynolds number (fully turbulent
	// at zero flow).
	Fittings []FittingK
	Warnings []Warning // Field "d" or "q" where one input is to blame, else empty
}

// frCheckPositive reports whether v is finite and > 0.
func frCheckPositive(v float64) bool { return v > 0 && !math.IsInf(v, 0) }

// frCheckNonNeg reports whether v is finite and ≥ 0.
func frCheckNonNeg(v float64) bool { return v >= 0 && !math.IsInf(v, 0) }

// SumK returns ΣK of the run's fittings plus ExtraK, fully turbulent
// (Hooper's K1/Re terms left out; see FittingKs). Errors name field "fit"
// (unknown key, negative count, bad K override or a diameter outside the
// method's range) or "k" (bad ExtraK).
func (r Run) SumK() (float64, error) {
	_, sum, err := r.fittingKs(math.Inf(1), false)
	return sum, err
}

// ReDependent reports whether a fitting of the run has a K that changes
// with the Reynolds number (Hooper 2-K, not overridden).
func (r Run) ReDependent() bool {
	return r.extraK1 > 0 || r.anyFitting(Fitting.ReDependent)
}

// lumped returns the run with its fittings folded into ExtraK (fully
// turbulent ΣK) and extraK1 (the Hooper K1 terms), the same ΣK at any
// Reynolds number to rounding, without the table look-ups. A run whose
// ΣK cannot be formed is returned as it is, for Evaluate to report.
func (r Run) lumped() Run {
	if len(r.Fittings) == 0 {
		return r
	}
	k, err := r.SumK()
	if err != nil {
		return r
	}
	for _, fc := range r.Fittings {
		if f := frFitting(fc.Key); f.ReDependent() && !fc.Override {
			r.extraK1 += float64(fc.Count) * f.K1
		}
	}
	r.ExtraK, r.Fittings = k, nil
	return r
}

// FittingKs returns the K of each kind of fitting of the run in the run's
// inside diameter at Reynolds number re (+Inf: fully turbulent), and
// ΣK = ExtraK + Σ Count·K in the run's order. Errors name field "fit"
// (unknown key, negative count, bad K override, a diameter outside the
// method's range, re not positive) or "k" (bad ExtraK).
func (r Run) FittingKs(re float64) ([]FittingK, float64, error) {
	return r.fittingKs(re, true)
}

// fittingKs is FittingKs; with each false it returns ΣK alone, without
// the list of fittings and their formulas' text, which a solver's
// iterations and a sum replaced at once do not show.
func (r Run) fittingKs(re float64, each bool) ([]FittingK, float64, error) {
	if err := r.checkFittings(); err != nil {
		return nil, 0, err
	}
	sum := r.ExtraK
	if r.extraK1 > 0 && !math.IsInf(re, 1) {
		sum += r.extraK1 / re
	}
	var out []FittingK
	ft := 0.0 // Crane's f_T at the run's diameter, once found
	for _, fc := range r.Fittings {
		f := frFitting(fc.Key) // known: checkFittings
		fk := FittingK{Key: f.Key, Count: fc.Count}
		if fc.Override {
			fk.K = fc.K
			if each {
				fk.Method, fk.Formula = "given", "K = "+frG(fc.K)
			}
		} else {
			err := frCheckKInputs(r.Diameter, re)
			if err == nil && f.Method == KCrane && ft == 0 {
				ft, err = CraneFT(r.Diameter)
			}
			var k float64
			if err == nil {
				k, err = f.kAt(r.Diameter, re, ft)
			}
			if err != nil {
				return nil, 0, fittingErr(fc.Key, err)
			}
			fk.K = k
			if each {
				fk.Method, fk.Formula, fk.Source = f.Method.String(), f.Formula(r.Diameter), f.Source
			}
		}
		sum += float64(fc.Count) * fk.K
		if each {
			out = append(out, fk)
		}
	}
	return out, sum, nil
}

// checkFittings checks what does not depend on the size: ExtraK, and each
// fitting's key, count and given K.
func (r Run) checkFittings() error {
	if !frCheckNonNeg(r.ExtraK) {
		return NewFieldError("k", Negative).Got(Num(r.ExtraK))
	}
	for _, fc := range r.Fittings {
		if frFitting(fc.Key) == nil {
			_, err := LookupFitting(fc.Key)
			return err
		}
		if fc.Count < 0 {
			return NewFieldError("fit", Negative).Typed(fc.Key).Got(Num(float64(fc.Count))).Because(ReasonFittingCount)
		}
		if fc.Override && !frCheckNonNeg(fc.K) {
			return NewFieldError("fit", Negative).Typed(fc.Key).Got(Num(fc.K)).Because(ReasonFittingK)
		}
	}
	return nil
}

// anyFitting reports whether a fitting of the run, present and not given
// a K, satisfies ok.
func (r Run) anyFitting(ok func(Fitting) bool) bool {
	for _, fc := range r.Fittings {
		if f := frFitting(fc.Key); f != nil && !fc.Override && fc.Count > 0 && ok(*f) {
			return true
		}
	}
	return false
}

// validate checks the run and the liquid.
func (r Run) validate(fl Fluid) error {
	if !frCheckPositive(fl.Density) {
		return NewFieldError("rho", NotPositive).Got(Fig(fl.Density, Density))
	}
	if !frCheckPositive(fl.Viscosity) {
		return NewFieldError("mu", NotPositive).Got(Fig(fl.Viscosity, DynamicViscosity))
	}
	if !frCheckNonNeg(r.Length) {
		return NewFieldError("length", Negative).Got(Fig(r.Length, Length))
	}
	if !frCheckPositive(r.Diameter) {
		return NewFieldError("d", NotPositive).Got(Fig(r.Diameter, Length))
	}
	switch r.Method {
	case MethodColebrook, MethodSwameeJain, MethodHaaland:
		if !frCheckNonNeg(r.Roughness) {
			return NewFieldError("eps", Negative).Got(Fig(r.Roughness, Length))
		}
		if rr := r.Roughness / r.Diameter; rr > FrictionRelRoughMax {
			return NewFieldError("eps", AboveLimit).Got(Num(rr)).AtMost(Num(FrictionRelRoughMax)).Because(ReasonRelativeRoughness)
		}
	case MethodHazenWilliams:
		if r.HazenC == 0 {
			return NewFieldError("chw", Missing)
		}
		if math.IsNaN(r.HazenC) || r.HazenC < HazenCMin || r.HazenC > HazenCMax {
			return NewFieldError("chw", OutOfRange).Got(Num(r.HazenC)).Within(Num(HazenCMin), Num(HazenCMax))
		}
		if nu := fl.KinematicViscosity(); nu < hazenNuMin || nu > hazenNuMax {
			return NewFieldError("method", OutsideValidity).Got(Fig(nu, KinematicViscosity)).Within(Fig(hazenNuMin, KinematicViscosity), Fig(hazenNuMax, KinematicViscosity)).Because(ReasonHazenViscosity)
		}
	default:
		return NewFieldError("method", UnknownChoice).Given(int(r.Method))
	}
	return nil
}

// turbulentFriction returns the Darcy f of the run's method at Reynolds
// number re and velocity v; outside reports Swamee–Jain used outside its
// fitted range.
func (r Run) turbulentFriction(re, v, q float64) (f float64, outside bool, err error) {
	rr := r.Roughness / r.Diameter
	switch r.Method {
	case MethodColebrook:
		f, err = Colebrook(re, rr)
	case MethodSwameeJain:
		f, err = SwameeJain(re, rr)
		if err == nil && (re < swameeJainReMin || rr < swameeJainRRMin || rr > swameeJainRRMax) {
			outside = true
		}
	case MethodHaaland:
		f, err = Haaland(re, rr)
	case MethodHazenWilliams:
		// Equivalent Darcy factor: h/L from Hazen–Williams, f = (h/L)·D·2g/V².
		var hl float64
		hl, err = HazenWilliamsHeadLoss(q, r.Diameter, 1, r.HazenC)
		f = hl * r.Diameter * 2 * StandardGravity / (v * v)
		if err == nil && re > FrictionReMax {
			err = NewFieldError("re", AboveLimit).Got(Num(re)).AtMost(Num(FrictionReMax))
		}
	}
	if err != nil {
		return 0, false, frictionRangeErr(re, err)
	}
	return f, outside, nil
}

// Evaluate computes velocity, Reynolds number, regime, α, the Darcy
// friction factor and the major (pipe), minor (fittings) and total head
// losses of the run carrying flow q (m³/s, ≥ 0) of liquid fl.
//
// Laminar flow (Re < 2300) uses f = 64/Re and α = 2. Turbulent flow
// (Re > 4000) uses the run's Method and α = 1. Transitional flow
// (2300 ≤ Re ≤ 4000, common practice) is computed with both 64/Re and the
// turbulent formula; the design figures (Friction, MajorLoss, TotalLoss,
// Alpha) are those of the larger loss, the bounds are in FrictionLow/High
// and TotalLossLow/High, and a warning says so. q = 0 gives zero losses.
//
// Warnings also flag velocities outside 0.3–3 m/s (common practice for
// liquid lines), fitting K values applied to laminar flow, and explicit
// formulas used outside their fitted range. Bad inputs give a *FieldError
// naming "rho", "mu", "length", "d", "eps", "fit", "k", "method", "chw" or
// "q".
func (r Run) Evaluate(fl Fluid, q float64) (RunResult, error) {
	if err := r.validate(fl); err != nil {
		return RunResult{}, err
	}
	// A sum at Re, below, replaces the fully turbulent one: the first is
	// then only checked, not listed.
	again := q > 0 && r.ReDependent()
	ks, sumK, err := r.fittingKs(math.Inf(1), !again)
	if err != nil {
		return RunResult{}, err
	}
	if math.IsNaN(q) || math.IsInf(q, 0) || q < 0 {
		return RunResult{}, NewFieldError("q", Negative).Got(Fig(q, Flow))
	}
	area := math.Pi * r.Diameter * r.Diameter / 4
	if !(area > 0) || math.IsInf(area, 0) {
		// A bore whose area leaves the floating-point range (1e-200 m,
		// 1e200 m): no velocity can be worked out from it.
		return RunResult{}, NewFieldError("d", NotFinite).Got(Fig(r.Diameter, Length)).Because(ReasonBeyondNumbers)
	}
	v := q / area
	re := Reynolds(fl.Density, v, r.Diameter, fl.Viscosity)
	if q > 0 && !(v > 0 && re > 0 && !math.IsInf(v, 0) && !math.IsInf(re, 0)) {
		// The velocity or the Reynolds number leaves the floating-point
		// range: a flow far beyond any pipe's.
		return RunResult{}, NewFieldError("q", NotFinite).Got(Fig(q, Flow)).Because(ReasonBeyondNumbers)
	}
	if again {
		if ks, sumK, err = r.FittingKs(re); err != nil {
			return RunResult{}, err
		}
	}
	res := RunResult{SumK: sumK, Fittings: ks}
	res.Velocity, res.Reynolds, res.Regime = v, re, RegimeOf(re)
	if (r.Diameter < KDiameterMin || r.Diameter > KDiameterMax) && r.anyFitting(func(f Fitting) bool { return f.Method != KFixed }) {
		res.Warnings = append(res.Warnings, Warn("d", CautionFittingSizes, Fig(r.Diameter, Length), Fig(KDiameterMin, Length), Fig(KDiameterMax, Length)))
	}
	if q == 0 {
		res.Alpha = AlphaLaminar()
		res.Warnings = append(res.Warnings, Warn("q", CautionNoFlow))
		return res, nil
	}
	hv := v * v / (2 * StandardGravity)
	ld := r.Length / r.Diameter
	res.MinorLoss, res.VelocityHead = sumK*hv, hv
	for i := range res.Fittings {
		res.Fittings[i].Head = float64(res.Fittings[i].Count) * res.Fittings[i].K * hv
	}

	switch res.Regime {
	case Laminar:
		f := 64 / re
		res.Alpha = AlphaLaminar()
		res.Friction, res.FrictionLow, res.FrictionHigh = f, f, f
		if r.Method == MethodHazenWilliams {
			res.Warnings = append(res.Warnings, Warn("", CautionLaminarHazen))
		}
		if sumK > r.ExtraK && r.anyFitting(func(f Fitting) bool { return !f.ReDependent() }) {
			res.Warnings = append(res.Warnings, Warn("", CautionLaminarFittings))
		}
	case Transitional:
		fLam := 64 / re
		fTurb, w, err := r.turbulentFriction(re, v, q)
		if err != nil {
			return RunResult{}, err
		}
		if w {
			res.Warnings = append(res.Warnings, Warn("", CautionSwameeJainRange, Num(re), Num(r.Roughness/r.Diameter)))
		}
		res.FrictionLow, res.FrictionHigh = math.Min(fLam, fTurb), math.Max(fLam, fTurb)
		res.Friction = res.FrictionHigh
		res.Alpha = AlphaTurbulent()
		if fLam > fTurb {
			res.Alpha = AlphaLaminar()
		}
		res.Warnings = append(res.Warnings, Warn("", CautionTransitionalRun, Num(re)))
	default:
		f, w, err := r.turbulentFriction(re, v, q)
		if err != nil {
			return RunResult{}, err
		}
		if w {
			res.Warnings = append(res.Warnings, Warn("", CautionSwameeJainRange, Num(re), Num(r.Roughness/r.Diameter)))
		}
		res.Alpha = AlphaTurbulent()
		res.Friction, res.FrictionLow, res.FrictionHigh = f, f, f
	}
	if r.Method == MethodHazenWilliams && r.Diameter < hazenDMin && res.Regime != Laminar {
		res.Warnings = append(res.Warnings, Warn("d", CautionHazenSmallPipe, Fig(hazenDMin, Length)))
	}
	res.MajorLoss = res.Friction * ld * hv
	res.TotalLoss = res.MajorLoss + res.MinorLoss
	res.Gradient = res.Friction * hv / r.Diameter
	res.PressureDrop = res.TotalLoss * fl.Density * StandardGravity
	res.TotalLossLow = res.FrictionLow*ld*hv + res.MinorLoss
	res.TotalLossHigh = res.FrictionHigh*ld*hv + res.MinorLoss
	if math.IsInf(res.TotalLossHigh, 0) || math.IsNaN(res.TotalLossHigh) || math.IsInf(res.PressureDrop, 0) || math.IsNaN(res.PressureDrop) {
		// Finite inputs whose losses overflow (a length or a flow far
		// beyond any line's).
		return RunResult{}, NewFieldError("q", NotFinite).Got(Fig(q, Flow)).Because(ReasonBeyondNumbers)
	}
	switch {
	case v < RunVelocityLow:
		res.Warnings = append(res.Warnings, Warn("q", CautionVelocityLow, Fig(v, Velocity), Fig(RunVelocityLow, Velocity), Fig(RunVelocityHigh, Velocity)))
	case v > RunVelocityHigh:
		res.Warnings = append(res.Warnings, Warn("q", CautionVelocityHigh, Fig(v, Velocity), Fig(RunVelocityLow, Velocity), Fig(RunVelocityHigh, Velocity)))
	}
	return res, nil
}
