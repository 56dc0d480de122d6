package scenario

// demo is the invented demo of the product brief: the Alder Flats
// Irrigation Cooperative's booster station BS-3, lifting from the river
// intake wet well to the Crest reservoir, with the duty pump's data sheet
// and the readings of a site visit. The efficiency and NPSH-required
// figures are invented too. It is for the demo only, never a check value.
var demo = [][2]string{
	{"view", "balance"}, {"units", "si"}, {"name", "Alder Flats BS-3, wet well to Crest reservoir"},
	{"liq", "water"}, {"t", "18C"}, {"alt", "210m"},
	{"p1", "0kPa"}, {"z1", "212m"}, {"v1", "0m/s"},
	{"p2", "0kPa"}, {"z2", "251m"}, {"v2", "0m/s"},
	{"q", "45L/s"}, {"solve", "hp"},
	// Suction: wet well to the pump centreline; then the rising main.
	{"s1.l", "8m"}, {"s1.nps", "8"}, {"s1.sch", "40"}, {"s1.mat", "steel"},
	{"s1.fit", "entry_sharp:1,elbow90lr:1,gate:1"}, {"s1.z", "214.5m"},
	{"s2.l", "632m"}, {"s2.nps", "8"}, {"s2.sch", "40"}, {"s2.mat", "steel"},
	{"s2.fit", "gate:1,elbow90lr:5,check_swing:1,exit:1"}, {"s2.z", "251m"},
	{"pq", "0,20,40,55,70L/s"}, {"ph", "62,59,52,44,33m"},
	{"peff", "0,52,71,76,72%"}, {"pnpsh", "0,2.0,2.6,3.4,4.6m"},
	{"zp", "214.5m"}, {"pafter", "1"},
	{"ps", "-18kPa"}, {"pd", "430kPa"}, {"zs", "0m"}, {"zd", "0.8m"},
	{"ds", "202.7mm"}, {"dd", "154.1mm"}, {"qm", "41L/s"}, {"pin", "31kW"},
	{"cv", "430kPa"},
}

// Demo returns the demo scenario.
func Demo() Scenario {
	s := Scenario{raw: make(map[string]string, len(demo))}
	for _, kv := range demo {
		s.raw[kv[0]] = kv[1]
	}
	return s
}

// turbineDemo is the brief's second invented scenario: the Larkspur Hollow
// spring box feeding a run-of-river turbine.
var turbineDemo = [][2]string{
	{"view", "pump"}, {"units", "si"}, {"name", "Larkspur Hollow spring box to turbine"},
	{"liq", "water"}, {"t", "8C"}, {"alt", "1020m"},
	{"p1", "0kPa"}, {"z1", "1020m"}, {"v1", "0m/s"},
	{"p2", "0kPa"}, {"z2", "905m"}, {"d2", "130.8mm"},
	{"q", "22L/s"}, {"solve", "ht"}, {"etat", "80%"},
	{"s1.l", "1400m"}, {"s1.d", "130.8mm"}, {"s1.mat", "pe"}, {"s1.fit", "entry_round:1"}, {"s1.z", "905m"},
}

// TurbineDemo returns the turbine-side demo scenario.
func TurbineDemo() Scenario {
	s := Scenario{raw: make(map[string]string, len(turbineDemo))}
	for _, kv := range turbineDemo {
		s.raw[kv[0]] = kv[1]
	}
	return s
}
