package calc

// Fluid holds the properties of a liquid at one state, in SI units. It is
// what every hydraulic computation in this package consumes; Water,
// Seawater and CustomLiquid build one.
type Fluid struct {
	Name           string  // short description, e.g. "water at 18 °C"
	Density        float64 // ρ, kg/m³
	Viscosity      float64 // dynamic viscosity μ, Pa·s
	VapourPressure float64 // saturation pressure at the liquid's temperature, Pa (absolute)
	Temperature    float64 // K; 0 when not known (custom liquid)
	// Pressure is the absolute pressure, Pa, the properties were taken at
	// (the line pressure); 0 for a liquid of typed properties.
	Pressure float64
}

// KinematicViscosity returns ν = μ/ρ in m²/s.
func (f Fluid) KinematicViscosity() float64 { return f.Viscosity / f.Density }

// StandardGravity is g₀ = 9.806 65 m/s² (exact by definition; NIST SP 811, 2008).
const StandardGravity = 9.80665
