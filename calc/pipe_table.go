package calc

import "math"

// Pipe dimension tables. Each class lists its sizes with outside diameter
// and wall thickness, in millimetres or, for the standards written in
// inches, in inches. Every class names its source; the classes checked
// against python3-fluids' tables (fluids.piping) are compared row by row
// with testdata/refs/pipes.tsv by TestPipeTablesAgainstFluids; the others
// are marked from memory.

// frRow is one size of a class: the nominal size in the catalogue's
// notation, the outside diameter and the wall.
type frRow struct {
	size     string
	od, wall float64
}

// frClass is one schedule, type, SDR or wall class of a catalogue.
type frClass struct {
	cat      string  // catalogue key
	name     string  // class as written in links: "40", "10S", "PVC-SDR21", "L", "SDR11", "K9"
	inch     bool    // rows in inches (converted exactly, 25.4 mm/in)
	idRound  float64 // ID rounded to this many mm (0: not rounded)
	memo     bool    // the rows were recalled without the standard at hand
	standard string  // e.g. "ASME B36.10M"
	lining   float64 // mm of cement-mortar lining on each side (ductile iron)
	// The rows, built on first use by table from constants the linker
	// lays out as data: the outside diameters (od) and walls of the
	// steel, PVC and copper classes, the pipe series k of PE and the
	// class k of ductile iron. Calls in the table itself were 16 KB of
	// start-up code in the wasm.
	od    frODs
	walls []float64
	k     float64
}

// frODs names a list of outside diameters of NPS ½–24 (a name, not the
// slice: copying another variable's slice into the table is start-up code
// again).
type frODs uint8

const (
	frODB3610 frODs = iota // ASME B36.10M, mm
	frODB3619              // ASME B36.19M, mm
	frODIPS                // iron pipe size, inches
)

// table is the class's rows.
func (c *frClass) table() []frRow {
	switch c.cat {
	case "copper":
		return frCopper(c.walls...)
	case "pe":
		return frPE(c.k)
	case "di":
		return frDuctile(c.k)
	}
	od := frOD3610
	switch c.od {
	case frODB3619:
		od = frOD3619
	case frODIPS:
		od = frIPS
	}
	return frSteel(od, c.walls...)
}

// Nominal sizes of ASME B36.10M / B36.19M used by several classes.
var frNPS = [...]string{"1/2", "3/4", "1", "1-1/4", "1-1/2", "2", "2-1/2", "3", "3-1/2", "4",
	"5", "6", "8", "10", "12", "14", "16", "18", "20", "24"}

// frSteelDN: the DN (ISO 6708 metric designation) ASME B36.10M lists beside
// each NPS, from memory.
var frSteelDN = [...]int{15, 20, 25, 32, 40, 50, 65, 80, 90, 100,
	125, 150, 200, 250, 300, 350, 400, 450, 500, 600}

// frSteel builds rows of NPS ½–24 from outside diameters and walls, mm,
// skipping walls given as 0 (size not listed).
func frSteel(od []float64, wall ...float64) []frRow {
	var out []frRow
	for i, w := range wall {
		if w > 0 {
			out = append(out, frRow{frNPS[i], od[i], w})
		}
	}
	return out
}

// Outside diameters, mm: ASME B36.10M (carbon steel) and ASME B36.19M
// (stainless, which gives 273.1 and 323.9 for NPS 10 and 12), as in
// python3-fluids' tables.
var (
	frOD3610 = []float64{21.3, 26.7, 33.4, 42.2, 48.3, 60.3, 73.0, 88.9, 101.6, 114.3,
		141.3, 168.3, 219.1, 273.0, 323.8, 355.6, 406.4, 457.0, 508.0, 610.0}
	frOD3619 = []float64{21.3, 26.7, 33.4, 42.2, 48.3, 60.3, 73.0, 88.9, 101.6, 114.3,
		141.3, 168.3, 219.1, 273.1, 323.9, 355.6, 406.4, 457.0, 508.0, 610.0}
)

// ASTM D1785 / D2241 (PVC) sizes, inches: the iron-pipe-size outside
// diameters of NPS ½–24 (5.563 in for NPS 5 as fluids' 141.3002 mm).
var frIPS = []float64{0.840, 1.050, 1.315, 1.660, 1.900, 2.375, 2.875, 3.500, 4.000, 4.500,
	5.563, 6.625, 8.625, 10.750, 12.750, 14.000, 16.000, 18.000, 20.000, 24.000}

// frCopperSize: ASTM B88 nominal sizes, inches; the outside diameter is
// the nominal size plus 1/8 in (from memory).
var frCopperSize = [...]string{"1/4", "3/8", "1/2", "5/8", "3/4", "1", "1-1/4", "1-1/2", "2", "2-1/2",
	"3", "3-1/2", "4", "5", "6", "8", "10", "12"}

// frCopper builds ASTM B88 rows (inches) from the walls of frCopperSize,
// skipping walls given as 0 (size not listed).
func frCopper(wall ...float64) []frRow {
	var out []frRow
	for i, w := range wall {
		if w > 0 {
			v, _ := frNPSValue(frCopperSize[i])
			out = append(out, frRow{frCopperSize[i], v + 0.125, w})
		}
	}
	return out
}

// frClasses holds every class, in the order PipeSizes reports them.
var frClasses = [...]frClass{
	// ASME B36.10M, carbon steel; python3-fluids schedule_lookup '40',
	// '80', 'STD', 'XS'.
	{cat: "steel", name: "40", idRound: 0.01, standard: StandardB3610M, od: frODB3610, walls: []float64{
		2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 10.31, 11.13, 12.70, 14.27, 15.09, 17.48}},
	{cat: "steel", name: "80", idRound: 0.01, standard: StandardB3610M, od: frODB3610, walls: []float64{
		3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.70, 15.09, 17.48, 19.05, 21.44, 23.83, 26.19, 30.96}},
	{cat: "steel", name: "STD", idRound: 0.01, standard: StandardB3610M, od: frODB3610, walls: []float64{
		2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53}},
	{cat: "steel", name: "XS", idRound: 0.01, standard: StandardB3610M, od: frODB3610, walls: []float64{
		3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70}},
	// ASME B36.19M, stainless steel; python3-fluids '5S', '10S', '40S',
	// '80S'.
	{cat: "ss", name: "5S", idRound: 0.01, standard: StandardB3619M, od: frODB3619, walls: []float64{
		1.65, 1.65, 1.65, 1.65, 1.65, 1.65, 2.11, 2.11, 2.11, 2.11, 2.77, 2.77, 2.77, 3.40, 3.96, 3.96, 4.19, 4.19, 4.78, 5.54}},
	{cat: "ss", name: "10S", idRound: 0.01, standard: StandardB3619M, od: frODB3619, walls: []float64{
		2.11, 2.11, 2.77, 2.77, 2.77, 2.77, 3.05, 3.05, 3.05, 3.05, 3.40, 3.40, 3.76, 4.19, 4.57, 4.78, 4.78, 4.78, 5.54, 6.35}},
	{cat: "ss", name: "40S", idRound: 0.01, standard: StandardB3619M, od: frODB3619, walls: []float64{
		2.77, 2.87, 3.38, 3.56, 3.68, 3.91, 5.16, 5.49, 5.74, 6.02, 6.55, 7.11, 8.18, 9.27, 9.53, 9.53, 9.53, 9.53, 9.53, 9.53}},
	{cat: "ss", name: "80S", idRound: 0.01, standard: StandardB3619M, od: frODB3619, walls: []float64{
		3.73, 3.91, 4.55, 4.85, 5.08, 5.54, 7.01, 7.62, 8.08, 8.56, 9.53, 10.97, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70, 12.70}},
	// ASTM D1785 PVC schedules 40 and 80, inches; python3-fluids
	// '40D1785', '80D1785'.
	{cat: "pvc", name: "PVC40", inch: true, standard: StandardD1785, od: frODIPS, walls: []float64{
		0.109, 0.113, 0.133, 0.140, 0.145, 0.154, 0.203, 0.216, 0.226, 0.237, 0.258, 0.280, 0.322, 0.365, 0.406, 0.437, 0.500, 0.562, 0.593, 0.687}},
	{cat: "pvc", name: "PVC80", inch: true, standard: StandardD1785, od: frODIPS, walls: []float64{
		0.147, 0.154, 0.179, 0.191, 0.200, 0.218, 0.276, 0.300, 0.318, 0.337, 0.375, 0.432, 0.500, 0.593, 0.687, 0.750, 0.843, 0.937, 1.031, 1.218}},
	// ASTM D2241 PVC, SDR 21 and 26, inches; python3-fluids 'DR21D2241',
	// 'DR26D2241'.
	{cat: "pvc", name: "PVC-SDR21", inch: true, standard: StandardD2241, od: frODIPS, walls: []float64{
		0, 0.060, 0.063, 0.079, 0.090, 0.113, 0.137, 0.167, 0.190, 0.214, 0.265, 0.316, 0.410, 0.511, 0.606, 0.666, 0.762, 0.857, 0.952, 1.143}},
	{cat: "pvc", name: "PVC-SDR26", inch: true, standard: StandardD2241, od: frODIPS, walls: []float64{
		0, 0, 0.060, 0.064, 0.073, 0.091, 0.110, 0.135, 0.154, 0.173, 0.214, 0.255, 0.332, 0.413, 0.490, 0.538, 0.615, 0.692, 0.769, 0.923}},
	// ASTM B88 copper water tube, types K, L and M, inches: outside
	// diameters (nominal + 1/8 in; python3-fluids' 'DR21D2241CTS' copper
	// tube sizes agree for 1–2 in) and walls from memory.
	{cat: "copper", name: "K", inch: true, memo: true, standard: StandardB88, walls: []float64{
		0.035, 0.049, 0.049, 0.049, 0.065, 0.065, 0.065, 0.072, 0.083, 0.095, 0.109, 0.120, 0.134, 0.160, 0.192, 0.271, 0.338, 0.405}},
	{cat: "copper", name: "L", inch: true, memo: true, standard: StandardB88, walls: []float64{
		0.030, 0.035, 0.040, 0.042, 0.045, 0.050, 0.055, 0.060, 0.070, 0.080, 0.090, 0.100, 0.110, 0.125, 0.140, 0.200, 0.250, 0.280}},
	{cat: "copper", name: "M", inch: true, memo: true, standard: StandardB88, walls: []float64{
		0, 0.025, 0.028, 0, 0.032, 0.035, 0.042, 0.049, 0.058, 0.065, 0.072, 0.083, 0.095, 0.109, 0.122, 0.170, 0.212, 0.254}},
	// Polyethylene, ISO 4427: built by frPE below.
	{cat: "pe", name: "SDR9", memo: true, standard: StandardPE, k: 6},
	{cat: "pe", name: "SDR11", memo: true, standard: StandardPE, k: 7},
	{cat: "pe", name: "SDR13.6", memo: true, standard: StandardPE, k: 8},
	{cat: "pe", name: "SDR17", memo: true, standard: StandardPE, k: 9},
	{cat: "pe", name: "SDR21", memo: true, standard: StandardPE, k: 10},
	{cat: "pe", name: "SDR26", memo: true, standard: StandardPE, k: 11},
	// Ductile iron, ISO 2531 class K9 with an ISO 4179 cement-mortar
	// lining: built by frDuctile below.
	{cat: "di", name: "K9", memo: true, standard: StandardDI, k: 9},
}

// frPEOD: polyethylene pipe outside diameters, mm, of the ISO 4427 series
// (from memory).
var frPEOD = [...]float64{20, 25, 32, 40, 50, 63, 75, 90, 110, 125, 140, 160,
	180, 200, 225, 250, 280, 315, 355, 400, 450, 500, 560, 630}

// frPE builds the sizes of the SDR of pipe series S = 10^(k/10), the
// R10 preferred number of ISO 4065 (S 4, 5, 6.3, 8, 10, 12.5 for k = 6…11,
// named SDR 9, 11, 13.6, 17, 21, 26 = 2S + 1 rounded): the wall is
// OD/(2S + 1) with the exact S, rounded up to the next 0.1 mm (the ISO 4065
// calculation, from memory; it gives, for instance, 5.4 mm for OD 90
// SDR 17 where 90/17 would round to 5.3). Sizes whose wall would be under
// 2.0 mm are left out (there the standard's minimum wall, not the SDR,
// governs; from memory).
func frPE(k float64) []frRow {
	sdr := 2*math.Pow(10, k/10) + 1
	var out []frRow
	for _, od := range frPEOD {
		w := od / sdr
		if w < 2.0 {
			continue
		}
		// Round up to 0.1 mm, ignoring the last bits of the division
		// (160/11 = 14.5454…, 110/11 = 10 exactly).
		w = frCeilTenth(w)
		out = append(out, frRow{frG(od), od, w})
	}
	return out
}

// frCeilTenth rounds w up to the next 0.1, treating values within 1e-9
// of a tenth as that tenth.
func frCeilTenth(w float64) float64 {
	t := w * 10
	n := float64(int64(t))
	if t-n > 1e-9 {
		n++
	}
	return n / 10
}

// frDIDN and frDIOD: ductile iron DN and outside diameter, mm (ISO 2531,
// from memory).
var (
	frDIDN = [...]float64{80, 100, 125, 150, 200, 250, 300, 350, 400, 450, 500, 600, 700, 800, 900, 1000}
	frDIOD = [...]float64{98, 118, 144, 170, 222, 274, 326, 378, 429, 480, 532, 635, 738, 842, 945, 1048}
)

// frDuctile builds class K pipes of ISO 2531: nominal iron wall
// K·(0.5 + 0.001·DN) mm, at least 6.0 mm, rounded to 0.1 mm (from
// memory). The lining is taken off the bore by PipeSizes (frLining).
func frDuctile(k float64) []frRow {
	var out []frRow
	for i, dn := range frDIDN {
		w := k * (0.5 + 0.001*dn)
		if w < 6 {
			w = 6
		}
		w = float64(int64(w*10+0.5+1e-9)) / 10
		out = append(out, frRow{frG(dn), frDIOD[i], w})
	}
	return out
}

// frLining returns the nominal cement-mortar lining thickness, mm, of a
// ductile-iron pipe of DN dn by ISO 4179 (from memory): 3 mm up to DN 300,
// 5 mm up to DN 600, 6 mm above.
func frLining(dn float64) float64 {
	switch {
	case dn <= 300:
		return 3
	case dn <= 600:
		return 5
	}
	return 6
}
