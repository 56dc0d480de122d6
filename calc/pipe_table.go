package calc

// Pipe dimension tables, in millimetres. All figures were recalled without
// the standards at hand ("from memory"); the tests spot-check them.

// frSteelRow is one nominal pipe size of ASME B36.10M (carbon steel:
// schedules 40 and 80, STD and XS) and ASME B36.19M (stainless: 10S and
// 40S), which share the outside diameter. Zero means "not listed".
type frSteelRow struct {
	nps                           string
	od                            float64
	s40, s80, std, xs, s10s, s40s float64
}

// frSteelRows: OD and wall thickness, mm, ASME B36.10M / B36.19M, from
// memory. STD equals schedule 40 up to NPS 10 and is 9.53 mm above; XS
// equals schedule 80 up to NPS 8 and is 12.70 mm above; 40S equals
// schedule 40 up to NPS 10.
var frSteelRows = [...]frSteelRow{
	{"1/2", 21.3, 2.77, 3.73, 2.77, 3.73, 2.11, 2.77},
	{"3/4", 26.7, 2.87, 3.91, 2.87, 3.91, 2.11, 2.87},
	{"1", 33.4, 3.38, 4.55, 3.38, 4.55, 2.77, 3.38},
	{"1-1/4", 42.2, 3.56, 4.85, 3.56, 4.85, 2.77, 3.56},
	{"1-1/2", 48.3, 3.68, 5.08, 3.68, 5.08, 2.77, 3.68},
	{"2", 60.3, 3.91, 5.54, 3.91, 5.54, 2.77, 3.91},
	{"2-1/2", 73.0, 5.16, 7.01, 5.16, 7.01, 3.05, 5.16},
	{"3", 88.9, 5.49, 7.62, 5.49, 7.62, 3.05, 5.49},
	{"3-1/2", 101.6, 5.74, 8.08, 5.74, 8.08, 3.05, 5.74},
	{"4", 114.3, 6.02, 8.56, 6.02, 8.56, 3.05, 6.02},
	{"5", 141.3, 6.55, 9.53, 6.55, 9.53, 3.40, 6.55},
	{"6", 168.3, 7.11, 10.97, 7.11, 10.97, 3.40, 7.11},
	{"8", 219.1, 8.18, 12.70, 8.18, 12.70, 3.76, 8.18},
	{"10", 273.0, 9.27, 15.09, 9.27, 12.70, 4.19, 9.27},
	{"12", 323.8, 10.31, 17.48, 9.53, 12.70, 4.57, 9.53},
	{"14", 355.6, 11.13, 19.05, 9.53, 12.70, 4.78, 0},
	{"16", 406.4, 12.70, 21.44, 9.53, 12.70, 4.78, 0},
	{"18", 457.0, 14.27, 23.83, 9.53, 12.70, 4.78, 0},
	{"20", 508.0, 15.09, 26.19, 9.53, 12.70, 5.54, 0},
	{"24", 610.0, 17.48, 30.96, 9.53, 12.70, 6.35, 0},
}

// frPEOD: polyethylene pipe outside diameters, mm, of the ISO 4427 /
// EN 12201 series (from memory).
var frPEOD = [...]float64{20, 25, 32, 40, 50, 63, 75, 90, 110, 125, 140, 160,
	180, 200, 225, 250, 280, 315, 355, 400, 450, 500, 560, 630}

// frPESDR lists the PE standard dimension ratios offered and the smallest
// OD listed for each (below it the standard's minimum wall, not OD/SDR,
// governs, so those sizes are left out).
var frPESDR = [...]struct {
	sdr   float64
	name  string
	minOD float64
}{
	{11, "SDR11", 25},
	{17, "SDR17", 40},
}
