package scenario

// demo is the invented demo of the product brief: the Alder Flats
// Irrigation Cooperative's booster station BS-3, lifting from the river
// intake wet well to the Crest reservoir. It is for the demo only, never a
// check value.
var demo = [][2]string{
	{"view", "balance"}, {"units", "si"}, {"name", "Alder Flats BS-3, wet well to Crest reservoir"},
	{"liq", "water"}, {"t", "18C"}, {"alt", "210m"},
	{"p1", "0kPa"}, {"z1", "212m"}, {"v1", "0m/s"},
	{"p2", "0kPa"}, {"z2", "251m"}, {"v2", "0m/s"},
	{"q", "45L/s"}, {"solve", "hp"},
	{"l", "640m"}, {"nps", "8"}, {"sch", "40"}, {"mat", "steel"},
	{"fit", "entry_sharp:1,gate:2,elbow90lr:6,check_swing:1,exit:1"},
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
