package calc

import "math"

// Accuracy is what the instruments of a field test are good for, each a
// limit of error (±), 0 when not stated.
type Accuracy struct {
	// ClassS and ClassD are the suction and discharge gauges' accuracy
	// classes (EN 837-1: the limit of error as a share of the span, 0.016
	// for class 1.6), SpanS and SpanD their spans, Pa (full scale less the
	// scale's start: 600 kPa for a −100 … 500 kPa gauge).
	ClassS, SpanS, ClassD, SpanD float64
	Flow                         float64 // flow meter, share of the reading (0.02 for ±2 %)
	Power                        float64 // power meter, share of the reading
	Height                       float64 // each gauge's height, ± m
}

// Term is one reading's part of a result's uncertainty: Field names the
// reading ("ps", "pd", "zs", "zd", "qm", "pin"); U is the part, in the
// result's own unit, never negative (|c_i|·u(x_i), JCGM 100:2008 §5.1.3).
type Term struct {
	Field string
	U     float64
}

// Band is a result's uncertainty: U, the root-sum-square of its Terms,
// and the terms themselves, largest first.
type Band struct {
	U     float64
	Terms []Term
}

// Dominant returns the reading whose term is largest ("" when U is 0).
func (b Band) Dominant() string {
	if len(b.Terms) == 0 || b.Terms[0].U == 0 {
		return ""
	}
	return b.Terms[0].Field
}

// FieldBands holds the bands of a field check's results: flow (m³/s,
// the flow meter's share of the reading), pump head (m), hydraulic power
// (W), wire-to-water and pump efficiency (shares).
// Wire and Pump are empty without a measured input (and, for Pump, a
// motor efficiency, which is taken as exact).
type FieldBands struct {
	Flow, Head, Power, Wire, Pump Band
}

// Uncertainty propagates the instruments' accuracy a to the results of a
// field check fc on liquid fl, to first order: each result's band is the
// root-sum-square of the parts each reading contributes, the part being
// the result's sensitivity to the reading times the reading's limit (the
// law of propagation of uncertainty of the GUM, JCGM 100:2008 §5.1, for
// independent inputs). Every limit is taken as the same kind of bound, so
// the bands are bounds of that kind too (to turn limits of a rectangular
// distribution into standard uncertainties, divide each, and so each
// band, by √3). With
//
//	H = (pd − ps)/(ρg) + (zd − zs) + (Vd² − Vs²)/(2g),  V = 4Q/(πD²)
//
// the sensitivities are ±1/(ρg) to the gauges, ±1 to the heights and
// 2·hv/Q to the flow (hv the velocity-head term); hydraulic power ρ·g·Q·H
// takes ρ·g·(H + 2·hv) from the flow; the efficiencies add the power
// meter's share. The density, the pipe diameters and the motor's
// efficiency are taken as exact. Validity: small limits (a few per cent),
// where the first-order terms dominate. Errors name the field whose
// accuracy is not a finite share or length at or above zero.
func (fc FieldCheck) Uncertainty(fl Fluid, a Accuracy) (FieldBands, error) {
	for _, c := range []struct {
		field string
		v     float64
	}{{"gcs", a.ClassS}, {"gss", a.SpanS}, {"gcd", a.ClassD}, {"gsd", a.SpanD},
		{"uqm", a.Flow}, {"upin", a.Power}, {"uz", a.Height}} {
		if math.IsNaN(c.v) || math.IsInf(c.v, 0) || c.v < 0 {
			return FieldBands{}, NewFieldError(c.field, Negative).Got(Num(c.v))
		}
	}
	if !(fl.Density > 0) || !(fc.Q > 0) {
		return FieldBands{}, NewFieldError("qm", NotPositive)
	}
	rhog := fl.Density * StandardGravity
	up := func(class, span float64) float64 { return class * span / rhog }
	uq := a.Flow * fc.Q
	head := band(
		Term{"ps", up(a.ClassS, a.SpanS)},
		Term{"pd", up(a.ClassD, a.SpanD)},
		Term{"zs", a.Height},
		Term{"zd", a.Height},
		Term{"qm", math.Abs(2 * fc.VelocityHead / fc.Q * uq)},
	)
	power := band(
		Term{"ps", rhog * fc.Q * up(a.ClassS, a.SpanS)},
		Term{"pd", rhog * fc.Q * up(a.ClassD, a.SpanD)},
		Term{"zs", rhog * fc.Q * a.Height},
		Term{"zd", rhog * fc.Q * a.Height},
		Term{"qm", math.Abs(rhog * (fc.Head + 2*fc.VelocityHead) * uq)},
	)
	out := FieldBands{Flow: band(Term{"qm", uq}), Head: head, Power: power}
	if fc.Efficiency > 0 {
		share := func(eta float64) Band {
			terms := make([]Term, 0, len(power.Terms)+1)
			for _, t := range power.Terms {
				terms = append(terms, Term{t.Field, math.Abs(t.U / fc.HydraulicPower * eta)})
			}
			return band(append(terms, Term{"pin", eta * a.Power})...)
		}
		out.Wire = share(fc.Efficiency)
		if fc.PumpEfficiency > 0 {
			out.Pump = share(fc.PumpEfficiency)
		}
	}
	return out, nil
}

// band sums terms by root-sum-square and sorts them, largest first (a
// stable order: ties keep the readings' order).
func band(terms ...Term) Band {
	var s float64
	for _, t := range terms {
		s += t.U * t.U
	}
	for i := 1; i < len(terms); i++ {
		for j := i; j > 0 && terms[j].U > terms[j-1].U; j-- {
			terms[j], terms[j-1] = terms[j-1], terms[j]
		}
	}
	return Band{U: math.Sqrt(s), Terms: terms}
}
