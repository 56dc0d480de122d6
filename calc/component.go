package calc

import "math"

// ComponentKind says how a Component's loss is given.
type ComponentKind uint8

const (
	// ComponentRated is a drop measured or specified at a rated flow (a
	// chiller, a coil, a strainer, a meter from its data sheet).
	ComponentRated ComponentKind = iota
	// ComponentValve is a control valve by its flow coefficient at the
	// opening it has (Kv, or Cv converted to Kv).
	ComponentValve
)

// Flow-coefficient reference conditions of IEC 60534-1 and ANSI/ISA-75.01.01
// (the definitions; the factor below follows from them and the exact unit
// definitions of NIST SP 811):
//
//   - Kv is the flow of water in m³/h that passes with a pressure drop of
//     1 bar (10⁵ Pa);
//   - Cv is the flow of water in US gallons per minute that passes with a
//     drop of 1 psi.
//
// So Cv = Kv · (m³/h in gpm) · sqrt(psi in bar) = 1.156…·Kv. Another
// liquid's drop scales with its relative density ρ1/ρ0, ρ0 the density of
// water at 15 °C (IEC 60534-2-1; ValveRefDensity).
const (
	kvFlowUnit   = 1.0 / 3600                               // m³/s in one m³/h
	kvDropUnit   = 1e5                                      // Pa in one bar
	cvFlowUnit   = 231 * 0.0254 * 0.0254 * 0.0254 / 60      // m³/s in one US gal/min (231 in³ exactly)
	cvDropUnit   = 0.45359237 * 9.80665 / (0.0254 * 0.0254) // Pa in one psi (lbf/in²)
	componentMax = 1e9                                      // bound on a given coefficient, flow or drop (SI)
)

// KvFromCv converts a Cv (US gal/min at 1 psi) to a Kv (m³/h at 1 bar):
// Kv = Cv/1.156…, the factor from the definitions above.
func KvFromCv(cv float64) float64 {
	return cv * (cvFlowUnit / kvFlowUnit) / math.Sqrt(cvDropUnit/kvDropUnit)
}

// Component is a named loss on a segment beside its pipe and fittings.
//
// A ComponentRated loss scales with the square of the flow from its rated
// point (turbulent flow through a fixed geometry, common practice): the
// drop at flow Q is RatedDrop·(Q/RatedFlow)² when the drop is given as a
// pressure (RatedDrop > 0 or RatedHead 0), or a head RatedHead·(Q/RatedFlow)²
// of the flowing liquid. The rating is taken to be for the liquid in
// service: no density or viscosity correction is made (a drop rated on
// water and used for a denser liquid scales in proportion to the density
// if given as a pressure, and stays the same as a head; neither holds in
// laminar flow, where the drop goes with Q, not Q²).
//
// A ComponentValve is a control valve by its flow coefficient Kv at the
// opening it has (the Kv or Cv given is the one at the current opening,
// not the valve's rated one). Its drop, from the definition of Kv
// (IEC 60534-1) and the sizing equation for incompressible, non-choked
// turbulent flow (IEC 60534-2-1, piping geometry factor 1: a valve of the
// pipe's size; the equation's form from memory, checked against
// python3-fluids), is Δp = 1 bar · (Q/(Kv m³/h))² · ρ/ρ0, ρ0 = 999.10 kg/m³
// the density of water at 15 °C (ValveRefDensity). Choked flow and
// cavitation in the valve are checked by CheckValveLiquid, not here.
type Component struct {
	Name      string
	Kind      ComponentKind
	RatedDrop float64 // Pa at RatedFlow (ComponentRated, pressure form)
	RatedHead float64 // m of the flowing liquid at RatedFlow (ComponentRated, head form)
	RatedFlow float64 // m³/s (ComponentRated)
	Kv        float64 // m³/h at 1 bar (ComponentValve)
	// FL and XFz are a ComponentValve's liquid pressure recovery factor
	// and incipient-cavitation factor from its data sheet, for
	// CheckValveLiquid; 0 when not given. They do not change the drop.
	FL, XFz float64
}

// ComponentLoss is a component's drop at one flow.
type ComponentLoss struct {
	Name     string
	Head     float64 // m of the flowing liquid
	Pressure float64 // Pa
}

// check validates the component. Errors are *FieldError for field "cmp",
// Input the component's name.
func (c Component) check() error {
	bad := func(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) || v > componentMax }
	// limit reports a value that is not above zero (or, with neg, is
	// negative) or is beyond componentMax.
	limit := func(r Reason, k Kind, v Figure) *FieldError {
		if v.Value > componentMax || math.IsInf(v.Value, 1) {
			k = AboveLimit
		}
		fe := NewFieldError("cmp", k).Typed(c.Name).Got(v).Because(r)
		if k == AboveLimit {
			fe.AtMost(Figure{componentMax, v.Dim})
		}
		return fe
	}
	switch c.Kind {
	case ComponentRated:
		switch {
		case bad(c.RatedFlow) || !(c.RatedFlow > 0):
			return limit(ReasonComponentFlow, NotPositive, Fig(c.RatedFlow, Flow))
		case bad(c.RatedDrop) || c.RatedDrop < 0:
			return limit(ReasonComponentDrop, Negative, Fig(c.RatedDrop, Pressure))
		case bad(c.RatedHead) || c.RatedHead < 0:
			return limit(ReasonComponentDrop, Negative, Fig(c.RatedHead, Length))
		case c.RatedDrop > 0 && c.RatedHead > 0:
			return NewFieldError("cmp", Inconsistent).Typed(c.Name).Because(ReasonComponentDropBoth)
		}
	case ComponentValve:
		if bad(c.Kv) || !(c.Kv > 0) {
			return limit(ReasonValveCoefficient, NotPositive, Num(c.Kv))
		}
	default:
		return NewFieldError("cmp", UnknownChoice).Typed(c.Name).Because(ReasonComponentKind)
	}
	return nil
}

// Loss returns the component's drop carrying flow q (m³/s, ≥ 0) of a
// liquid of density rho (kg/m³, > 0). Errors are *FieldError for field
// "cmp" (a bad component) or "rho".
func (c Component) Loss(rho, q float64) (ComponentLoss, error) {
	if err := c.check(); err != nil {
		return ComponentLoss{}, err
	}
	if !(rho > 0) || math.IsInf(rho, 0) {
		return ComponentLoss{}, NewFieldError("rho", NotPositive).Got(Fig(rho, Density))
	}
	rhog := rho * StandardGravity
	out := ComponentLoss{Name: c.Name}
	switch c.Kind {
	case ComponentRated:
		r := q / c.RatedFlow
		if c.RatedHead > 0 {
			out.Head = c.RatedHead * r * r
			out.Pressure = out.Head * rhog
		} else {
			out.Pressure = c.RatedDrop * r * r
			out.Head = out.Pressure / rhog
		}
	case ComponentValve:
		r := q / (c.Kv * kvFlowUnit)
		out.Pressure = kvDropUnit * r * r * rho / ValveRefDensity()
		out.Head = out.Pressure / rhog
	}
	return out, nil
}
