// Package calc is Fieldhead's calculation core: liquid properties, units,
// flow regime, friction and fitting losses, and the steady-flow energy
// balance between two points of a liquid line. It has no user-interface
// code and no mutable package state; it builds for native targets and for
// GOOS=js GOARCH=wasm.
//
// # Units
//
// Every value inside the package is SI: metres, pascals, kilograms per cubic
// metre, pascal seconds, cubic metres per second, kelvin, watts. Pressures
// of points are absolute; gauge values are converted at the edge with the
// site's barometric pressure. Heads are metres of the flowing liquid at its
// own density, never "conventional" water columns (those are pressure
// units, see the units table). Text with units is read by Parse and
// ParsePressure and written by FormatValue; conversion factors follow NIST
// SP 811 (2008), Appendix B.
//
// # The energy balance and its sign convention
//
// Point 1 is where the liquid comes from, point 2 where it goes. In metres
// of the liquid,
//
//	p1/(ρg) + α1·V1²/(2g) + z1 + h_pump = p2/(ρg) + α2·V2²/(2g) + z2 + h_turbine + h_friction
//
// h_pump is head added by a pump, h_turbine head taken by a turbine,
// h_friction the losses between the points (pipe friction plus fittings);
// all three are positive in normal service, and a negative result is
// reported with a warning, not hidden. g is the standard 9.806 65 m/s².
// α is the kinetic-energy correction factor: 2 for laminar flow (parabolic
// profile), 1 for turbulent flow unless a power-law profile estimate is
// asked for. Re = ρVD/μ; laminar below 2300, transitional from 2300 to
// 4000, turbulent above (common practice). Transitional flow is flagged and
// computed at both bounds.
//
// # Friction
//
// Losses follow Darcy–Weisbach, h = f·(L/D)·V²/(2g), plus ΣK·V²/(2g) for
// fittings. The Darcy friction factor is 64/Re in laminar flow and, in
// turbulent flow, the Colebrook–White equation solved to machine precision,
// with the explicit Swamee–Jain (up to 2.83 % off in its fitted range) and
// Haaland formulas as alternatives; Hazen–Williams is offered for water.
//
// # Fittings, pipes and materials
//
// A fitting's K depends on the pipe's inside diameter: Crane TP-410's
// K = n·f_T (CraneFT) for valves, elbows, bends and tees, Hooper's 2-K
// K = K1/Re + K∞(1 + 1 in/D) and Darby's 3-K K = K1/Re + Ki(1 + Kd/Dn^0.3)
// (DarbyNominalSize) for the kinds Crane does not give, fixed values for
// entrances and the exit (Fitting.KAt). A run reports the K it
// used for each fitting (RunResult.Fittings); a FittingCount may give its
// own K instead. Pipe sizes come in catalogues, each with its notation
// (Catalogues, LookupPipe); materials carry their roughness with its
// source (MaterialTable). Rows that could not be checked against a
// reference library say "from memory".
//
// # Lines, pumps and turbines
//
// A Line is an ordered list of segments from point 1 to point 2, each a Run
// with the elevation of its end; each segment's friction uses its own
// velocity and Reynolds number, and changes of diameter add a Borda–Carnot
// expansion or a contraction loss. A balance with a line carries its
// energy and hydraulic grade lines (EGL, HGL) node by node; the pump sits
// after segment PumpAfter.
//
// SystemCurve gives the head the line needs at each flow, each solved in
// full (Colebrook–White at every flow, no k·Q² fit). A PumpCurve is fitted
// through 3 to 8 data-sheet points by the monotone piecewise cubic of
// Fritsch and Carlson (1980) and is not extrapolated beyond the last
// point; AtSpeed applies the affinity laws and Combine puts identical
// pumps in parallel or in series. OperatingPoint intersects the two
// curves by Brent's method. CheckPump turns gauge readings into pump head,
// hydraulic power and wire-to-water efficiency. NPSH compares the NPSH
// available at the pump inlet with the NPSH required. Turbine and
// BestTurbineFlow give a turbine's net head and output, the flow that
// maximises it, the losses' share of the gross head and the no-flow
// pressure at the turbine's inlet.
//
// # Surge
//
// Surge.Evaluate is a screening estimate of water hammer for a valve
// closing at the end of a line: each pipe's wave speed by Korteweg (1878,
// WaveSpeed, in the form of Wylie & Streeter 1993), the wave's round trip
// 2L/a, and Joukowsky's rise ρ·a·Δv, which is an upper bound for a closure
// slower than 2L/a. WaterBulkModulus and SeawaterBulkModulus give the
// liquid's bulk modulus from its speed of sound; materials carry an
// elastic modulus (from memory). It is no transient analysis.
//
// # Pump tests
//
// A data sheet may droop (its head rising once, up to its highest point);
// Unstable gives that rising part and OperatingPoint looks for the stable
// crossing. BestEfficiency finds the best-efficiency point by three-point
// peak interpolation and its preferred region (70–120 % of its flow, after
// ANSI/HI 9.6.3, from memory). SpeedForDuty finds, by the affinity laws and
// Brent's method, the speed that meets a duty on the system curve.
// FieldCheck.Uncertainty propagates the instruments' limits (EN 837-1 gauge
// classes, meters in % of reading, heights in ±m) to first order (the
// GUM's law of propagation), naming the reading that dominates each band;
// Accept judges the result under an ISO 9906 grade (Grades, factors from
// memory): within, outside, or cannot tell. EnergyUse gives the energy per
// volume pumped beside its ideal ρ·g·H. FractionSlip and the efficiency
// limits catch values typed a hundred times too small.
//
// # Liquids
//
// Water from 0 °C to 100 °C, compressed liquid up to 10 MPa: density from
// IAPWS-IF97 region 1, viscosity from the IAPWS 2008 release, vapour
// pressure from the IF97 saturation line. Seawater of 35 g/kg from 0 °C to
// 40 °C up to 10 MPa: Sharqawy et al. (2010), compressed in the ratio of
// pure water's IF97 densities. Both take the absolute pressure in the line
// (Fluid.Pressure records it). Outside a formulation's range the functions
// return an error; they never extrapolate. Glycol–water mixes (ethylene and
// propylene glycol, 0 to 60 % by mass) follow Melinder's (2010) fits from
// the freezing point to 40 °C, where the source's tables stop, and the
// fits extrapolated from there to 100 °C (GlycolState.Extrapolated says
// so); the density is compressed as seawater's. A custom liquid takes
// typed properties.
//
// # Errors
//
// Functions return errors rather than panicking. An error about an input is
// a *FieldError whose Field is the share-link parameter (or quantity) at
// fault, so the app can show it beside the field. It is data, not a
// sentence: a Kind (missing, not a number, out of range, no solution…), a
// Reason for the specific case, and the value, limits, choices or counts
// involved as Figures (SI value and dimension). The view model words it in
// the reader's units (calc/scenario/present/errors.go); Error is a terse
// line in SI for Go callers. Build errors with NewFieldError and its
// methods. Warnings are data the same way: a Warning's Code (a Caution)
// and Figures, built with Warn.
package calc
