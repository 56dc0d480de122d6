package calc

import "strconv"

// Reason is the specific case of a FieldError when its Kind alone does not
// say enough (which formulation's range, which rule of a data sheet). The
// figures a reason quotes are listed in its comment, in the order they
// stand in FieldError.Figures; the view model has a wording for each.
type Reason uint16

// The reasons. ReasonNone: the Kind says it all.
const (
	ReasonNone Reason = iota

	// Reading a value.
	ReasonGrouping       // NotANumber: Input has more than one separator (digit grouping)
	ReasonAmbiguousComma // NotANumber: Input has a comma and three digits ("1,250"): grouping or decimal?
	ReasonPressureRef    // UnknownUnit: Input names gauge or absolute, which the field does not take
	ReasonWaterColumn    // WrongDimension: a length unit typed for a pressure (mH2O, ftH2O are pressures)
	ReasonAbsoluteZero   // BelowLimit: a temperature below absolute zero
	ReasonOrHead         // WrongDimension, UnknownUnit: a pressure, or a head of the liquid, is accepted

	// Liquids and their properties.
	ReasonWaterProperties    // OutsideValidity: the water properties' temperature range
	ReasonSeawaterProperties // OutsideValidity: the seawater properties' temperature range
	ReasonIF97               // OutsideValidity, AboveLimit: IAPWS-IF97 region 1 (liquid water)
	ReasonIF97Saturation     // OutsideValidity: the IAPWS-IF97 saturation line
	ReasonIAPWSViscosity     // OutsideValidity: the IAPWS 2008 viscosity formulation
	ReasonISA                // OutsideValidity: the ISO 2533 troposphere
	ReasonBoils              // BelowLimit, OutOfRange: absolute pressure against the vapour pressure (Min) at Figures[0] (a temperature)
	ReasonAbsolutePressure   // NotPositive, BelowLimit: an absolute pressure must be above zero
	ReasonBelowVacuum        // BelowLimit: a gauge reading below full vacuum
	ReasonFarBeyond          // AboveLimit: a magnitude far beyond any liquid line (check the unit)
	ReasonCheckUnit          // BelowLimit: a value so small its unit is likely wrong

	// Pipes, fittings and friction.
	ReasonRelativeRoughness // AboveLimit, OutOfRange: ε/D beyond the Moody chart
	ReasonHazenViscosity    // OutsideValidity: Hazen–Williams' range of kinematic viscosity (Value, Min, Max)
	ReasonTurbulentFriction // OutsideValidity: the turbulent friction formulas' Reynolds range
	ReasonLaminarFriction   // OutsideValidity: 64/Re's Reynolds range
	ReasonFrictionReynolds  // OutsideValidity: at this flow, Re (Value) lies outside the friction formula's range (Max)
	ReasonCraneFT           // OutsideValidity: diameters Crane TP-410's f_T is defined for
	ReasonExpansion         // BelowLimit: an expansion's downstream diameter below the upstream one (Min)
	ReasonContraction       // AboveLimit: a contraction's downstream diameter above the upstream one (Max)
	ReasonFittingCount      // Negative, OutOfRange: the count of fitting Input
	ReasonFittingK          // Negative, OutOfRange: the K given for fitting Input ("key@text" when it could not be read)
	ReasonListedTwice       // Inconsistent: fitting Input is listed twice
	ReasonFittingMethod     // UnknownChoice: fitting Input has no method of working out its K
	ReasonPowerLawN         // OutOfRange: a power-law exponent n
	ReasonProfileAlpha      // OutsideValidity: profile-based α's Reynolds range
	ReasonProfileExponent   // OutsideValidity: the profile exponent (Figures[0]) from Re (Value) is outside Min…Max

	// The balance and the line.
	ReasonRunOrSegments   // Inconsistent: a single run and a line of segments both given
	ReasonHfFromSegments  // Inconsistent: hf is worked out from the segments, so it cannot be the unknown
	ReasonHfFromRun       // Inconsistent: hf is worked out from the pipe run, so it cannot be the unknown
	ReasonFlowIndependent // NoSolution: the balance does not depend on the flow
	ReasonFlowDirection   // Negative: number the points so that the liquid flows from 1 to 2
	ReasonNoFlowPossible  // NoSolution: even at almost no flow point 1 cannot reach point 2
	ReasonNoSolutionBelow // NoSolution: even at Figures[0] (a flow; Figures[1] a velocity in the narrowest pipe) point 1 has head to spare
	ReasonRegimeJump      // NoSolution: the curve jumps across the laminar–turbulent limit near Figures[0] (a flow)
	ReasonPumpAfter       // OutOfRange: the segment the pump follows
	ReasonSuctionSegments // Missing: the suction loss comes from the segments before the pump
	ReasonSegmentEnd      // NotFinite: the elevation of a segment's end
	ReasonSegmentGap      // Missing: a segment's length (segments are numbered from point 1 without gaps)

	// Pumps.
	ReasonFlowsRising       // BelowLimit: a data-sheet flow must be above the previous point's (Min)
	ReasonCurveLevel        // Inconsistent: a data-sheet head equals the previous point's
	ReasonCurveMustFall     // AboveLimit: past its top, a head must be below the previous point's (Max)
	ReasonCurveEndsHigh     // Inconsistent: the data sheet ends on its highest head
	ReasonZeroFlowEff       // Inconsistent: a data-sheet efficiency at zero flow must be 0
	ReasonEfficiency        // OutOfRange: an efficiency above 0 and at most 100 %
	ReasonTopBelowLine      // NoSolution: the pump's highest head Figures[0] (at flow Figures[1]) is below the Figures[2] the line needs there
	ReasonShutOffBelowLine  // NoSolution: the shut-off head Figures[0] is below the Figures[1] the line needs at zero flow
	ReasonFirstPointBelow   // NoSolution: at the first point (flow Figures[0]) the pump's head Figures[1] is below the line's Figures[2]
	ReasonPumpRunsOut       // NoSolution: beyond the last point (flow Figures[0]) the pump still gives Figures[1] against the line's Figures[2]
	ReasonSpeedBeyondSheet  // NoSolution: flow Figures[0] is beyond the data sheet between Figures[1] and Figures[2] (speed ratios)
	ReasonSpeedTopShort     // NoSolution: even at speed ratio Figures[0] the pumps give only Figures[1] at Figures[2] and the line needs Figures[3]
	ReasonSpeedBottomOver   // NoSolution: at speed ratio Figures[0], the lowest reaching Figures[1], the pumps give Figures[2] and the line needs only Figures[3]
	ReasonLineHeadNotFinite // NoSolution: the head the line needs at the flow to reach is not finite
	ReasonHeadBelowStatic   // NoSolution: the line needs Figures[0] at zero flow; a head of Figures[1] moves no liquid
	ReasonHeadNeverReached  // NoSolution: the line needs less than Figures[0] at every flow up to Figures[1]
	ReasonHeadForEnergy     // NotPositive: an energy per volume and head needs a head above zero (Value)
	ReasonGoTogether        // Missing: a gauge's accuracy class and span (Other) go together
	ReasonFlowTwice         // Inconsistent: test reading Item has the flow (Value) of reading Figures[0] (an item number); each flow once

	// Turbines.
	ReasonNoGrossHead    // NoSolution: the gross head (Value) is not positive
	ReasonOutputUnbound  // NoSolution: the output keeps rising with flow (no pipe to limit it)
	ReasonTurbineNoZero  // NoSolution: even at Figures[0] (Figures[1] in the narrowest pipe) head is left for the turbine
	ReasonSearchLimit    // Negative: the largest flow to search
	ReasonFractionTyped  // OutOfRange: a share typed as a fraction into a percentage (Value; Figures[0] the likely meaning)
	ReasonSpeedReference // Missing: a speed in Input's unit needs Other to compare with
	ReasonTitle          // AboveLimit: the title must be plain text of at most Max characters
	ReasonPumpsCount     // UnknownChoice: pumps working together: 1, or a count and p or s

	// The line pressure.
	ReasonPointsMean // BelowLimit, OutOfRange: as ReasonBoils, the pressure being the mean of the points' pressures: state the line pressure

	// Components (field "cmp"): Input is the component's name, or
	// "name:text" with the text that could not be read.
	ReasonComponentFlow     // NotPositive, AboveLimit: the rated flow (Value) of component Input
	ReasonComponentDrop     // Negative, AboveLimit: the rated drop (Value, a pressure or a head) of component Input
	ReasonComponentDropBoth // Inconsistent: component Input's rated drop is given both as a pressure and as a head
	ReasonValveCoefficient  // NotPositive, AboveLimit: a valve's Cv or Kv (Value, a Kv) must be above zero
	ReasonComponentKind     // UnknownChoice: component Input is of no known kind
	ReasonComponentSyntax   // UnknownChoice: item Input is not name:drop@flow or name:cv… / name:kv…
	ReasonComponentName     // AboveLimit: component name Input has more than Max characters
	ReasonComponentSpec     // UnknownChoice: "name:spec" Input is neither drop@flow nor cv… / kv…
	ReasonValveNumber       // NotANumber: "name:spec" Input: the number after cv or kv
	ReasonComponentValue    // NoUnit, NotANumber, UnknownUnit: "name:text" Input, the drop (Dim Pressure) or the rated flow (Dim Flow)

	// Fittings by Darby's 3-K method.
	ReasonDarbySize // BelowLimit: the inside diameter (Value) below the smallest schedule 40 bore Darby's nominal size is taken from (Min)

	// Glycol mixes: shares are mass or volume fractions (0.3).
	ReasonGlycolMass        // OutOfRange: the glycol share by mass (Value) from Min to Max
	ReasonGlycolVolume      // OutOfRange: the glycol share by volume (Value) from Min to Max; Figures[0] the largest share by mass
	ReasonGlycolTemperature // OutOfRange: a glycol mix's temperature (Value) from its freezing point (Min) to Max
	ReasonGlycolFreezes     // BelowLimit: the mix of Input (a glycol) at share by mass Figures[0] freezes at Min; the temperature is Value

	// The surge estimate.
	ReasonThinWall       // AboveLimit: a wall (Value) of at least half the inside diameter Figures[0]
	ReasonRestraint      // OutOfRange: the restraint factor (Value) above Min and at most Max, near 1
	ReasonSurgePipe      // Missing: the surge needs the pipe between the points
	ReasonNoFlowToStop   // Missing: there is no flow to stop at the valve
	ReasonSurgeUnbounded // NotFinite: the surge is beyond any number; Figures[0] the velocity change
	ReasonVelocityChange // NotPositive: a velocity change given must be above zero (blank: the whole flow velocity)
	ReasonBulkModulus    // NotPositive: a liquid's bulk modulus; Figures[0] water's near 20 °C
	ReasonBulkUnknown    // Missing: the bulk modulus is known only for water and seawater
	ReasonWallModulus    // NotPositive: a pipe wall's elastic modulus; Figures[0] steel's, Figures[1] PE's
	ReasonSurgeWall      // Missing: the wall thickness (or a nominal size and schedule) for the surge
	ReasonSurgeModulus   // Missing: the wall's elastic modulus (or the pipe's material) for the surge

	// The Run view and its sizing table.
	ReasonVelocityBand // BelowLimit: the velocity band's high end (Value) must be above its low end (Min)
	ReasonRunSegment   // OutOfRange: the segment shown (Input) must be one of the line's, Min to Max
	ReasonSizingClass  // UnknownChoice: Input is not a pipe class of any catalogue

	// Reading the inputs.
	ReasonBothSides    // Inconsistent: both ways of giving one value are given (Other names the other side's); give one
	ReasonUnitSlip     // OutOfRange: Input (the number typed) in Choices[0] is Value, implausibly small for the field: Choices[1] was probably meant
	ReasonAccuracySlip // OutOfRange: an accuracy (Value, a share) finer than any field instrument's; Figures[0] the share probably meant
	ReasonDamagedValue // NotANumber: the value (Input) holds a line break or another control character no link writes: damaged in transit

	// Loops, heat and control valves.
	ReasonSeawaterSalinity        // OutOfRange: a seawater salinity (Value, kg/kg) from Min to Max, the seawater correlations' range
	ReasonNoTemperatureDifference // Inconsistent: the supply and return temperatures (Value) are equal: no heat is carried
	ReasonValveFactor             // OutOfRange: a valve's FL or xFz (Value) must be above Min (0) and at most Max (1)
	ReasonValveInletBoils         // BelowLimit: a valve's inlet pressure (Value) must be above the liquid's vapour pressure (Min)
	ReasonColumnBreaksNoFlow      // NoSolution: the column breaks at a high point even with no flow (Figures[0] the segment), so no flow keeps the pipe full
	ReasonLoopUnknown             // Inconsistent: a closed loop solves for the pump head or the flow only (no points, no static head)
	ReasonHeatLiquid              // Inconsistent: a load and its flow need the liquid's specific heat: water, seawater or a glycol mix, not typed properties
	ReasonValveNeedsStatic        // Missing: a valve's IEC 60534-2-1 check needs the loop's static pressure (the pressure at its inlet)
	ReasonValveFactorTwice        // Inconsistent: a valve's FL or xFz (Other) given twice in one component ("name:spec" Input)
	ReasonBulkSalinity            // Missing: seawater's bulk modulus is known only at the standard salinity; Value the sheet's salinity (kg/kg)
	ReasonBeyondNumbers           // NotFinite: the value (Value) is a number, but what is worked out from it (a velocity, a loss) leaves the range of numbers
	reasonEnd
)

// Reasons lists every Reason but ReasonNone, for tests of their wording.
func Reasons() []Reason {
	out := make([]Reason, 0, reasonEnd-1)
	for r := ReasonNone + 1; r < reasonEnd; r++ {
		out = append(out, r)
	}
	return out
}

// String is a short name of the reason, for Error and logs.
func (r Reason) String() string {
	if int(r) < len(reasonNames) {
		return reasonNames[r]
	}
	return "reason " + strconv.Itoa(int(r))
}

// reasonNames are the reasons' names in order (TestReasonNames keeps them
// in step with the constants).
var reasonNames = [...]string{"none",
	"grouping",
	"ambiguous comma",
	"pressure ref",
	"water column",
	"absolute zero",
	"or head",
	"water properties",
	"seawater properties",
	"if97",
	"if97 saturation",
	"iapws viscosity",
	"isa",
	"boils",
	"absolute pressure",
	"below vacuum",
	"far beyond",
	"check unit",
	"relative roughness",
	"hazen viscosity",
	"turbulent friction",
	"laminar friction",
	"friction reynolds",
	"crane ft",
	"expansion",
	"contraction",
	"fitting count",
	"fitting k",
	"listed twice",
	"fitting method",
	"power law n",
	"profile alpha",
	"profile exponent",
	"run or segments",
	"hf from segments",
	"hf from run",
	"flow independent",
	"flow direction",
	"no flow possible",
	"no solution below",
	"regime jump",
	"pump after",
	"suction segments",
	"segment end",
	"segment gap",
	"flows rising",
	"curve level",
	"curve must fall",
	"curve ends high",
	"zero flow eff",
	"efficiency",
	"top below line",
	"shut off below line",
	"first point below",
	"pump runs out",
	"speed beyond sheet",
	"speed top short",
	"speed bottom over",
	"line head not finite",
	"head below static",
	"head never reached",
	"head for energy",
	"go together",
	"flow twice",
	"no gross head",
	"output unbound",
	"turbine no zero",
	"search limit",
	"fraction typed",
	"speed reference",
	"title",
	"pumps count",
	"points mean",
	"component flow",
	"component drop",
	"component drop both",
	"valve coefficient",
	"component kind",
	"component syntax",
	"component name",
	"component spec",
	"valve number",
	"component value",
	"darby size",
	"glycol mass",
	"glycol volume",
	"glycol temperature",
	"glycol freezes",
	"thin wall",
	"restraint",
	"surge pipe",
	"no flow to stop",
	"surge unbounded",
	"velocity change",
	"bulk modulus",
	"bulk unknown",
	"wall modulus",
	"surge wall",
	"surge modulus",
	"velocity band",
	"run segment",
	"sizing class",
	"both sides",
	"unit slip",
	"accuracy slip",
	"damaged value",
	"seawater salinity",
	"no temperature difference",
	"valve factor",
	"valve inlet boils",
	"column breaks no flow",
	"loop unknown",
	"heat liquid",
	"valve needs static",
	"valve factor twice",
	"bulk salinity",
	"beyond numbers",
}

// countErr reports n items where min to max are accepted (TooFew or
// TooMany).
func countErr(field string, n, min, max int) *FieldError {
	k := TooMany
	if n < min {
		k = TooFew
	}
	return NewFieldError(field, k).Given(n).Within(Num(float64(min)), Num(float64(max)))
}
