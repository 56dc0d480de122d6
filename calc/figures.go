package calc

// The figures each Caution and Reason quotes, by dimension and in order:
// the one declaration of what lands in each slot of Warning.Figures and
// FieldError.Figures. Every call site in calc and calc/scenario is checked
// against it (TestFigureCallSites), and the view model words each caution
// and reason from exactly these (present's TestEveryCautionWorded). A
// caution or reason not listed quotes no figures.

// FigureDims lists the dimensions of the figures a warning of this
// caution carries, in order; nil for none.
func (c Caution) FigureDims() []Dimension {
	if int(c) < len(cautionFigureDims) {
		return cautionFigureDims[c]
	}
	return nil
}

// FigureDims lists the dimensions of the figures an error of this reason
// carries after its named ones (Value, Min, Max), in order; nil for none.
func (r Reason) FigureDims() []Dimension {
	if int(r) < len(reasonFigureDims) {
		return reasonFigureDims[r]
	}
	return nil
}

// The tables are arrays indexed by code, laid out as data (a map is built
// by code at start-up).

var cautionFigureDims = [...][]Dimension{
	CautionValveAuthorityLow:      {Dimensionless, Dimensionless},
	CautionValveAuthorityBelowAim: {Dimensionless, Dimensionless},
	CautionValveChoked:            {Pressure, Pressure, Flow},
	CautionValveCavitation:        {Pressure, Pressure},
	CautionGuaranteeNoHead:        {Flow},
	CautionOperatingOffRegion:     {Flow, Flow, Flow, Dimensionless, Dimensionless},
	CautionMeasuredOffRegion:      {Flow, Flow, Flow, Dimensionless, Dimensionless},
	CautionColumnBreaks:           {Pressure, Length, Pressure}, // no call site today; as its comment says
	CautionBelowVapourPressure:    {Pressure, Pressure},
	CautionBoilingAtLine:          {Pressure, Pressure},
	CautionDroopingCurve:          {Flow},
	CautionDutyOverspeed:          {Dimensionless},
	CautionFittingSizes:           {Length, Length, Length},
	CautionFlowOffSheet:           {Flow, Flow, Flow},
	CautionGlycolExtrapolated:     {Temperature, Temperature},
	CautionHazenSmallPipe:         {Length},
	CautionHeadNotPositive:        {Length},
	CautionHighPointAir:           {Dimensionless, Dimensionless, Length, Length, Length},
	CautionHighPointBreaks:        {Dimensionless, Dimensionless, Length, Length, Flow, Flow},
	CautionHighPointStill:         {Dimensionless, Dimensionless, Length, Length},
	CautionInletBreaks:            {Dimensionless, Dimensionless, Length, Length, Flow, Flow},
	CautionInletBreaksStill:       {Dimensionless, Dimensionless, Length, Length},
	CautionInletSuction:           {Dimensionless, Dimensionless, Length, Length, Length},
	CautionLastSegmentEnd:         {Length, Length},
	CautionMotorEffHigh:           {Dimensionless, Dimensionless},
	CautionNPSHBelow:              {Length, Length},
	CautionNPSHCurveCut:           {Flow},
	CautionNPSHLowMargin:          {Length, Length, Length, Dimensionless, Length},
	CautionNPSHMargin:             {Length, Length, Length, Dimensionless, Length},
	CautionNPSHNone:               {Length},
	CautionNPSHUnrated:            {Length, Length},
	CautionNoGrossHead:            {Length},
	CautionNoOutput:               {Length, Length},
	CautionOperatingUnstable:      {Flow, Flow},
	CautionOverspeed:              {Dimensionless},
	CautionPointVelocityHigh:      {Velocity, Velocity},
	CautionPumpEffAbove100:        {Dimensionless},
	CautionPumpEffHigh:            {Dimensionless, Dimensionless},
	CautionSheetEffHigh:           {Dimensionless, Dimensionless, Dimensionless},
	CautionStandardAtmosphere:     {Pressure},
	CautionSurgeDvAboveFlow:       {Velocity, Velocity},
	CautionSurgeColumnUnknown:     {Pressure},
	CautionSurgeSlow:              {Duration, Duration, Pressure},
	CautionSwameeJainRange:        {Dimensionless, Dimensionless},
	CautionTransitionalRun:        {Dimensionless},
	CautionVelocityHigh:           {Velocity, Velocity, Velocity},
	CautionVelocityLow:            {Velocity, Velocity, Velocity},
	CautionWireAbove100:           {Dimensionless},
	CautionWireAbovePump:          {Dimensionless, Dimensionless},
	CautionWireLow:                {Dimensionless, Dimensionless},
}

var reasonFigureDims = [...][]Dimension{
	ReasonAccuracySlip:       {Dimensionless},
	ReasonColumnBreaksNoFlow: {Dimensionless},
	ReasonBoils:              {Temperature},
	ReasonBulkModulus:        {Pressure},
	ReasonBulkSalinity:       {Dimensionless},
	ReasonFirstPointBelow:    {Flow, Length, Length},
	ReasonFlowTwice:          {Dimensionless},
	ReasonFractionTyped:      {Dimensionless},
	ReasonFrictionReynolds:   {Dimensionless},
	ReasonGlycolFreezes:      {Dimensionless},
	ReasonGlycolVolume:       {Dimensionless},
	ReasonHeadBelowStatic:    {Length, Length},
	ReasonHeadNeverReached:   {Length, Flow},
	ReasonNoSolutionBelow:    {Flow, Velocity},
	ReasonProfileExponent:    {Dimensionless},
	ReasonPumpRunsOut:        {Flow, Length, Length},
	ReasonRegimeJump:         {Flow},
	ReasonShutOffBelowLine:   {Length, Length},
	ReasonSpeedBeyondSheet:   {Flow, Dimensionless, Dimensionless},
	ReasonSpeedBottomOver:    {Dimensionless, Flow, Length, Length},
	ReasonSpeedTopShort:      {Dimensionless, Length, Flow, Length},
	ReasonSurgeUnbounded:     {Velocity},
	ReasonThinWall:           {Length},
	ReasonTopBelowLine:       {Length, Flow, Length},
	ReasonTurbineNoZero:      {Flow, Velocity},
	ReasonWallModulus:        {Pressure, Pressure},
}
