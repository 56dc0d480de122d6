package calc

// Flow-regime limits on the Reynolds number, common practice for liquid
// lines: laminar below 2300, turbulent above 4000, transitional between.
const (
	// ReLaminarMax is the Reynolds number below which pipe flow is taken
	// as laminar (common practice).
	ReLaminarMax = 2300.0
	// ReTurbulentMin is the Reynolds number above which pipe flow is taken
	// as fully turbulent (common practice).
	ReTurbulentMin = 4000.0
)

// Regime classifies pipe flow by its Reynolds number.
type Regime int

// Flow regimes, in order of increasing Reynolds number.
const (
	Laminar      Regime = iota // Re < 2300
	Transitional               // 2300 ≤ Re ≤ 4000
	Turbulent                  // Re > 4000
)

// String returns "laminar", "transitional" or "turbulent".
func (r Regime) String() string {
	switch r {
	case Laminar:
		return "laminar"
	case Transitional:
		return "transitional"
	case Turbulent:
		return "turbulent"
	}
	return "unknown"
}

// Reynolds returns the Reynolds number Re = ρ·V·D/μ for density rho
// (kg/m³), mean velocity v (m/s), inside diameter d (m) and dynamic
// viscosity mu (Pa·s). It is the bare formula and does not validate its
// inputs; Run.Evaluate validates before calling it.
func Reynolds(rho, v, d, mu float64) float64 { return rho * v * d / mu }

// RegimeOf classifies a Reynolds number: below ReLaminarMax laminar, above
// ReTurbulentMin turbulent, transitional in between (both limits included
// in the transitional band). A NaN is reported as Transitional, the
// regime that carries a warning everywhere it is shown.
func RegimeOf(re float64) Regime {
	switch {
	case re < ReLaminarMax:
		return Laminar
	case re > ReTurbulentMin:
		return Turbulent
	}
	return Transitional
}
