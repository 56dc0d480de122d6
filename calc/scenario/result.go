package scenario

import "fieldhead/calc"

// Result is everything the views show for one scenario. Each part is nil
// when its inputs are missing or bad; the reasons are in Errors, keyed by
// parameter, so the app can put each message beside its own field while the
// other parts still render.
type Result struct {
	Errors   map[string]*calc.FieldError // parameter → why it cannot be used (Field is the parameter)
	Warnings []Warning                   // cautions about the results, next to what they concern

	US bool // the scenario asks for US customary units

	// Inputs is what the results were worked out from: the scenario as
	// Read made it.
	Inputs Inputs

	Fluid        *calc.Fluid // the liquid at its temperature
	SitePressure float64     // Pa absolute
	SiteFrom     SiteSource  // how the site pressure was found
	// LiquidFrom says where the pressure the liquid's properties were
	// taken at (Fluid.Pressure) came from.
	LiquidFrom LiquidSource
	// Glycol is the glycol mix's make-up (liq=eg or pg), nil for other liquids.
	Glycol *GlycolMix

	Run     *RunResult          // the pipe run (Run view; friction in the balance)
	RunView *RunView            // the run the Run view shows (view=regime only) and its sizing table
	Line    *calc.LineResult    // the line of segments at the flow (also when the balance cannot be solved)
	Balance *calc.BalanceResult // the two-point energy balance
	Convert *ConvertResult      // the Convert view

	// VapourLine holds, for each node of Balance.Profile, the level the
	// hydraulic grade line would have where the absolute pressure in the
	// pipe equals the liquid's vapour pressure: Z + (p_v − p_site)/(ρg),
	// on the profile's gauge basis. An HGL at or below it means cavitation
	// or a broken column.
	VapourLine []float64

	Pump     *PumpResult      // the pump curve, system curve and operating point
	NPSH     *calc.NPSHResult // NPSH at the pump
	NPSHFlow float64          // the flow NPSH was worked out at, m³/s (0: not known, the suction loss typed)
	// NPSHSuction says where NPSH's suction loss comes from.
	NPSHSuction NPSHSuction
	Field       *calc.FieldCheck // the pump's performance from gauge readings
	// FieldBands are the field check's uncertainty bands from the
	// instruments' accuracy, nil when no accuracy is given.
	FieldBands *calc.FieldBands
	// Acceptance is the field check judged under the chosen ISO 9906
	// grade, nil without a grade or a data sheet to compare with.
	Acceptance *calc.Acceptance
	// Test is the readings as a test at several points (two or more, or
	// one judged by a guarantee flow), Guarantee the test judged against
	// the guarantee point under the grade.
	Test        *TestResult
	Guarantee   *GuaranteeResult
	Energy      *EnergyResult       // energy per volume pumped (measured, else at the operating point)
	Turbine     *calc.TurbineResult // the turbine's output at the flow
	BestTurbine *calc.TurbineResult // at the flow that gives the most output
	Surge       *SurgeResult        // a closure at point 2, when a closure time is given
	// Heat is the load the flow carries between the supply and return
	// temperatures, or the flow worked out from a load (heat.go).
	Heat *Heat
	// Valves are the line's control valves at the flow: authority and the
	// IEC 60534-2-1 check (valve.go).
	Valves []ValveResult
}

// Warning is a caution about a result. Param names the input it concerns,
// or is empty for the scenario as a whole; Topic groups it for display
// ("balance", "run", "convert", "liquid", "site").
// A warning from calc says what it is about as data (Code, Figures), worded
// by the view model; one of scenario's own, or of calc.CautionText, holds a
// sentence in Text that quotes its figures behind marks: word it with Words.
type Warning struct {
	Param   string
	Topic   string
	Segment int // the segment of a line it is about, 0 none
	Code    calc.Caution
	Text    string
	Figures []calc.Figure
}

// Calc is the warning as calc's type, for its Words and String.
func (w Warning) Calc() calc.Warning {
	return calc.Warning{Field: w.Param, Segment: w.Segment, Code: w.Code, Text: w.Text, Figures: w.Figures}
}

// Words writes the sentence of a warning of Text with each figure written
// by show; "" for a coded one.
func (w Warning) Words(show func(calc.Figure) string) string { return w.Calc().Words(show) }

// String is a line for logs: the sentence with its figures in SI, or a
// coded warning's name and figures.
func (w Warning) String() string { return w.Calc().String() }

// RunResult is the pipe run as evaluated, with the dimensions actually used.
type RunResult struct {
	calc.RunResult
	Length    float64        // m
	Diameter  float64        // inside diameter used, m
	Roughness float64        // m
	Pipe      *calc.PipeSize // when picked from the tables
	Material  *calc.Material // when picked by key
	Flow      float64        // m³/s
}

// ConvertResult holds one value seen in every way a field engineer may need.
type ConvertResult struct {
	Gauge    float64 // Pa, relative to the site pressure
	Absolute float64 // Pa
	Head     float64 // m of the liquid at its temperature (gauge)
	// AbsoluteHead is Absolute as a head of the liquid, m (0 without a liquid).
	AbsoluteHead float64
	Rows         []ConvertRow
}

// ConvertRow is one line of the conversion table.
type ConvertRow struct {
	Label string // e.g. "gauge pressure", "head of this liquid"
	Text  string // formatted value with its unit
}

// SiteSource says how the site pressure was found.
type SiteSource uint8

const (
	SiteStandard  SiteSource = iota // the standard sea-level pressure: neither altitude nor barometer given
	SiteAltitude                    // the ISO 2533 standard atmosphere at the site altitude
	SiteBarometer                   // the barometer reading
)

// LiquidSource says which pressure water's and seawater's properties were
// taken at (doc.go, "pl").
type LiquidSource uint8

const (
	LiquidTyped      LiquidSource = iota // pl, the line pressure stated
	LiquidPoints                         // the mean of the points' typed pressures
	LiquidSite                           // the site pressure: no pl and no point pressure
	LiquidSaturation                     // the vapour pressure: the points' mean or the site pressure lay below it
	LiquidTypedProps                     // a liquid of typed properties: no pressure
	LiquidLoop                           // a closed loop's static pressure (pexp) at its connection
)

// GlycolMix is the make-up of a glycol–water mix and its freezing point.
type GlycolMix struct {
	Glycol         calc.Glycol
	MassFraction   float64 // kg of glycol per kg of mix
	VolumeFraction float64 // glycol's share of the unmixed volumes at 20 °C
	ByVolume       bool    // the share was given by volume (glyv)
	FreezingPoint  float64 // K
}
