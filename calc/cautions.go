package calc

import (
	"strconv"
	"strings"
)

// Caution is what a Warning is about. Like FieldError's Kind and Reason it
// is data, worded by the view model in the reader's units; the figures a
// caution quotes are listed in its comment, in the order they stand in
// Warning.Figures.
type Caution uint16

// The cautions. CautionText: no code, Text holds the words (none is built so).
const (
	CautionText Caution = iota

	// A pipe run.
	CautionNoFlow          // no flow: all losses are zero
	CautionFittingSizes    // the inside diameter Figures[0] is outside the sizes the fitting methods were published for (Figures[1]–Figures[2])
	CautionLaminarHazen    // laminar flow: friction from 64/Re; Hazen–Williams does not apply
	CautionLaminarFittings // laminar flow: the fittings' K values are turbulent-flow figures
	CautionSwameeJainRange // Swamee–Jain outside its fitted range: Re Figures[0], ε/D Figures[1]
	CautionTransitionalRun // transitional flow, Re Figures[0]: the larger of the laminar and turbulent losses is used
	CautionHazenSmallPipe  // Hazen–Williams is meant for pipes of about Figures[0] and larger
	CautionVelocityLow     // velocity Figures[0] is low for a liquid line (usual Figures[1]–Figures[2])
	CautionVelocityHigh    // velocity Figures[0] is high for a liquid line (usual Figures[1]–Figures[2])
	CautionColumnBreaks    // the absolute pressure falls to Figures[0] at Figures[1] from point 1, at or below the vapour pressure Figures[2]

	// The balance.
	CautionTransitionalBalance  // transitional flow: the result is shown as a range; the design value uses the turbulent bound
	CautionAlphaUnity           // α taken as 1: give the diameter at this point to find its regime
	CautionPumpHeadNegative     // the pump head comes out negative: no pump is needed
	CautionTurbineHeadNegative  // the turbine head comes out negative: the line needs a pump
	CautionFrictionHeadNegative // the friction head comes out negative: check the readings and the direction of flow
	CautionNoAbsolutePressure   // the absolute pressure at this point is zero or negative
	CautionBelowVapourPressure  // the absolute pressure Figures[0] is at or below the vapour pressure Figures[1]
	CautionPointVelocityHigh    // a velocity of Figures[0] is unusually high (common practice keeps below Figures[1])

	// NPSH: Figures[0] is NPSH available; then as listed.
	CautionNPSHNone      // NPSH available is not above zero: the liquid boils at the inlet
	CautionNPSHUnrated   // no NPSH required given; Figures[1] the least margin of common practice
	CautionNPSHBelow     // below the Figures[1] required: the pump will cavitate
	CautionNPSHLowMargin // above the Figures[1] required by only Figures[2] (ratio Figures[3]); Figures[4] the least margin
	CautionNPSHMargin    // against Figures[1] required: margin Figures[2], ratio Figures[3]; Figures[4] the least margin

	// Turbines.
	CautionNoGrossHead // the gross head Figures[0] is not positive: nothing for a turbine to take
	CautionNoOutput    // the losses Figures[0] and the exit velocity head use up the gross head Figures[1]

	// Field checks: efficiencies are shares (0.76).
	CautionHeadNotPositive // the readings give a pump head of Figures[0]
	CautionWireAbove100    // the wire-to-water efficiency Figures[0] is above 100 %
	CautionWireLow         // the wire-to-water efficiency Figures[0] is below Figures[1]
	CautionWireAbovePump   // the wire-to-water efficiency Figures[0] is above the data sheet's pump efficiency Figures[1]
	CautionFlowOffSheet    // the measured flow Figures[0] lies outside the data sheet's flows (Figures[1] to Figures[2])
	CautionPumpEffAbove100 // the pump's own efficiency Figures[0] is above 100 %
	CautionPumpEffHigh     // the pump's own efficiency Figures[0] is above the Figures[1] that even the largest pumps hardly reach

	// The sheet's checks (calc/scenario).
	CautionDroopingCurve       // the data sheet's head rises with flow up to Figures[0] (a drooping curve)
	CautionOperatingNeedsHp    // the operating point needs the balance solved for the pump head
	CautionOperatingUnstable   // the operating point Figures[0] lies where the head rises with flow (up to Figures[1])
	CautionOperatingOffRegion  // the operating point Figures[0] lies outside the preferred region Figures[1] to Figures[2] (shares Figures[3]–Figures[4] of the best-efficiency flow)
	CautionMeasuredOffRegion   // the measured flow, as CautionOperatingOffRegion
	CautionSuctionLossZero     // no line of segments: the suction losses are taken as zero
	CautionNPSHCurveCut        // the NPSH available cannot be worked out from flow Figures[0] on: its curve stops there
	CautionMotorEffHigh        // a motor efficiency Figures[0] is above the Figures[1] the best large motors hardly reach
	CautionTurbineNeedsHt      // the turbine's output needs the balance solved for the turbine head
	CautionLastSegmentEnd      // the last segment ends at Figures[0] but point 2 is at Figures[1]
	CautionStandardAtmosphere  // no site altitude or barometer: the standard sea-level pressure Figures[0] is used
	CautionBoilingAtSite       // the water is at or above its boiling point at the site pressure
	CautionSheetEffHigh        // data-sheet point Figures[0]: an efficiency Figures[1] above the Figures[2] the largest pumps hardly reach
	CautionOverspeed           // a speed of Figures[0] (a share) of the data sheet's overspeeds the pump
	CautionBEPAtEnd            // the data sheet's highest efficiency is at its first or last point
	CautionDutyOverspeed       // this duty needs Figures[0] (a share) of the data sheet's speed
	CautionPowerAccuracyUnused // a power meter's accuracy without its reading is not used
	CautionNoAccuracy          // no instrument accuracy is given: the verdict takes every reading as exact
	CautionGradeNeedsSheet     // the acceptance grade needs the data sheet's head at the measured flow
	CautionConvertBelowZero    // the value converted is at or below absolute zero pressure

	// High points and the pump's inlet on a line of segments: Figures[0]
	// the segment, Figures[1] 1 at its end or 0 at its start, Figures[2]
	// the distance from point 1, Figures[3] the elevation; then as listed.
	CautionInletBreaks      // the grade line falls below the vapour-pressure line at the pump's inlet; full only up to Figures[4], not the balance's Figures[5]
	CautionInletBreaksStill // the grade line is below the vapour-pressure line at the pump's inlet even with no flow
	CautionInletSuction     // the grade line is Figures[4] below the pipe crown at the pump's inlet: below atmospheric
	CautionHighPointBreaks  // the grade line falls below the vapour-pressure line at a high point; full only up to Figures[4], not the balance's Figures[5]
	CautionHighPointStill   // the grade line is below the vapour-pressure line at a high point even with no flow
	CautionHighPointAir     // the grade line is Figures[4] below the pipe crown at a high point: below atmospheric

	// The surge estimate.
	CautionSurgeNoLength    // the line has no length: any closure counts as slow
	CautionSurgeSlow        // the closure Figures[0] is slower than the round trip Figures[1]: Joukowsky's Figures[2] is an upper bound
	CautionSurgeColumnParts // the low swing reaches the vapour pressure: the column may part
	CautionSurgeDvAboveFlow // the velocity change Figures[0] is larger than the flow velocity at the valve Figures[1]

	// The liquid.
	CautionBoilingAtLine    // the water boils at the pressure taken for its properties (Figures[0], absolute); taken at the saturation pressure Figures[1]
	CautionGlycolBoiling    // the glycol mix boils at the site pressure; its properties are taken at its vapour pressure
	CautionGlycolInhibitors // commercial glycols differ from the pure mixes computed

	// A glycol mix above the source's tables.
	CautionGlycolExtrapolated // the mix at Figures[0] is above Figures[1], where Melinder's (2010) tables stop: its properties are the fits extrapolated

	// Control valves.
	CautionValveAuthorityLow      // the valve's authority Figures[0] (a share) is below the usual minimum Figures[1] (common practice)
	CautionValveAuthorityBelowAim // the valve's authority Figures[0] (a share) is below the usual aim Figures[1] (common practice)
	CautionValveChoked            // the drop Figures[0] across the valve reaches the choked drop Figures[1]: the flow is limited to Figures[2] (IEC 60534-2-1)
	CautionValveCavitation        // the drop Figures[0] reaches the incipient-cavitation drop Figures[1] = xFz·(p1 − pv) (IEC 60534-2-1)

	// A pump test judged by its guarantee point.
	CautionGuaranteeNoFlow // a grade and a test, but no guarantee flow (qg) nor duty flow (q) to judge it at
	CautionGuaranteeNoHead // no guarantee head typed, and no data sheet covering the guarantee flow Figures[0]

	// The surge estimate, again (kept last: the codes above keep their
	// numbers).
	CautionSurgeColumnUnknown // the static pressure at the valve is not known: the low swing parts the column unless it is above Figures[0], gauge (the rise plus the vapour pressure, less the site's pressure)
	cautionEnd
)

// Cautions lists every Caution but CautionText, for tests of their wording.
func Cautions() []Caution {
	out := make([]Caution, 0, cautionEnd-1)
	for c := CautionText + 1; c < cautionEnd; c++ {
		out = append(out, c)
	}
	return out
}

// String is a short name of the caution, for logs.
func (c Caution) String() string {
	if int(c) < len(cautionNames) {
		return cautionNames[c]
	}
	return "caution " + strconv.Itoa(int(c))
}

// cautionNames are the cautions' names in order (TestReasonNames keeps
// them in step with the constants).
var cautionNames = [...]string{"text",
	"no flow",
	"fitting sizes",
	"laminar hazen",
	"laminar fittings",
	"swamee jain range",
	"transitional run",
	"hazen small pipe",
	"velocity low",
	"velocity high",
	"column breaks",
	"transitional balance",
	"alpha unity",
	"pump head negative",
	"turbine head negative",
	"friction head negative",
	"no absolute pressure",
	"below vapour pressure",
	"point velocity high",
	"npsh none",
	"npsh unrated",
	"npsh below",
	"npsh low margin",
	"npsh margin",
	"no gross head",
	"no output",
	"head not positive",
	"wire above 100",
	"wire low",
	"wire above pump",
	"flow off sheet",
	"pump eff above 100",
	"pump eff high",
	"drooping curve",
	"operating needs hp",
	"operating unstable",
	"operating off region",
	"measured off region",
	"suction loss zero",
	"npsh curve cut",
	"motor eff high",
	"turbine needs ht",
	"last segment end",
	"standard atmosphere",
	"boiling at site",
	"sheet eff high",
	"overspeed",
	"bep at end",
	"duty overspeed",
	"power accuracy unused",
	"no accuracy",
	"grade needs sheet",
	"convert below zero",
	"inlet breaks",
	"inlet breaks still",
	"inlet suction",
	"high point breaks",
	"high point still",
	"high point air",
	"surge no length",
	"surge slow",
	"surge column parts",
	"surge dv above flow",
	"boiling at line",
	"glycol boiling",
	"glycol inhibitors",
	"glycol extrapolated",
	"valve authority low",
	"valve authority below aim",
	"valve choked",
	"valve cavitation",
	"guarantee no flow",
	"guarantee no head",
	"surge column unknown",
}

// Warn builds a Warning about field of caution c quoting figs.
func Warn(field string, c Caution, figs ...Figure) Warning {
	return Warning{Field: field, Code: c, Figures: figs}
}

// terse is a coded warning's line for logs: its name and figures in SI.
func (w Warning) terse() string {
	var b strings.Builder
	b.WriteString(w.Code.String())
	for i, f := range w.Figures {
		b.WriteString(" f" + strconv.Itoa(i) + "=" + f.SI())
	}
	return b.String()
}
