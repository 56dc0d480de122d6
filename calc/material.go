package calc

import (
	"sort"
	"strings"
)

// Material describes a pipe material: its absolute roughness ε (m) for
// Darcy–Weisbach and its Hazen–Williams C factor, both typical values for
// clean pipe in service, with the source of the figures.
type Material struct {
	Key       string  // short id used in share links, e.g. "steel"
	Name      string  // human label
	Roughness float64 // absolute roughness ε, m
	HazenC    float64 // Hazen–Williams C, dimensionless
	Source    string  // where the figures come from
	// Modulus is the wall material's elastic (Young's) modulus, Pa, for
	// the wave speed of a surge (WaveSpeed); ModulusSource says where it
	// comes from.
	Modulus       float64
	ModulusSource string
}

// Sources of the roughness figures and the elastic moduli.
const (
	srcModulusMemo = "E from memory (typical handbook value, "
	srcMoody       = "python3-fluids fluids.friction._roughness (Moody 1944 chart values, feet converted to metres; Moody attribution from memory)"
	srcFarshad     = "Farshad & Rieke (2006), SPE Projects, Facilities & Construction 1(3), mean roughness, as python3-fluids fluids.friction._Farshad_roughness"
	srcHHR         = "Idelchik & Ginevskiy, Handbook of Hydraulic Resistance (4th ed.), as python3-fluids fluids.friction.HHR_roughness"
)

// materialTable holds the pipe materials. Hazen–Williams C factors are
// typical values recalled without a document at hand (from memory), and
// so are the elastic moduli: none of the reference libraries here
// tabulates them. Plastics creep, their modulus falling with temperature
// and load time; a pressure wave loads the wall for milliseconds, so the
// short-term figure applies (common practice).
var materialTable = [...]Material{
	{"steel", "commercial steel, new", 0.045e-3, 120,
		"ε Moody (1944) chart 0.00015 ft, from memory; within " + srcHHR + " 'Seamless steel tubes, New and unused' 0.02–0.1 mm; C from memory (typical 120–140)",
		207e9, srcModulusMemo + "carbon steel 200–210 GPa)"},
	{"ss", "stainless steel, bare", 0.055e-3, 140,
		"ε " + srcFarshad + " ['Cr13, bare']; C from memory (typical 140–150)",
		193e9, srcModulusMemo + "austenitic stainless 190–200 GPa)"},
	{"ss_ep", "stainless steel, electropolished", 0.030e-3, 150,
		"ε " + srcFarshad + " ['Cr13, electropolished bare']; C from memory (typical 140–150)",
		193e9, srcModulusMemo + "austenitic stainless 190–200 GPa)"},
	{"ci", "cast iron, uncoated", 0.259e-3, 130,
		"ε " + srcMoody + " ['Cast iron']; C from memory (new 130, falling to about 100 with age)",
		100e9, srcModulusMemo + "grey cast iron 80–140 GPa)"},
	{"ci_asphalt", "cast iron, asphalt coated", 0.122e-3, 130,
		"ε " + srcMoody + " ['Asphalted cast iron']; C from memory (typical 130)",
		100e9, srcModulusMemo + "grey cast iron 80–140 GPa)"},
	{"ductile", "ductile iron, cement-mortar lined", 0.033e-3, 140,
		"ε " + srcFarshad + " ['Cement lining']; C from memory (typical 130–140)",
		166e9, srcModulusMemo + "ductile iron 160–170 GPa; the mortar lining is left out)"},
	{"galv", "galvanized steel", 0.152e-3, 120,
		"ε " + srcMoody + " ['Galvanized iron']; " + srcHHR + " gives 0.10–0.15 mm for ordinary galvanization; C from memory (typical 110–120)",
		207e9, srcModulusMemo + "carbon steel 200–210 GPa; the zinc layer is left out)"},
	{"copper", "copper or brass, drawn tubing", 1.52e-6, 140,
		"ε " + srcMoody + " ['Brass']; " + srcHHR + " gives 0.0015–0.01 mm for seamless brass and copper tubes; C from memory (typical 130–140)",
		117e9, srcModulusMemo + "copper 110–130 GPa)"},
	{"pe", "polyethylene (PE)", 0.007e-3, 150,
		"from memory (typical handbook values: ε 0.0015–0.007 mm, upper value taken; C 140–150); no plastic pipe in the reference libraries' tables",
		1.0e9, srcModulusMemo + "PE 80 and PE 100 short-term 0.8–1.4 GPa at 20 °C, lower when warm)"},
	{"pvc", "PVC", 0.0015e-3, 150,
		"from memory (typical handbook values: ε 0.0015–0.007 mm; C 140–150); no plastic pipe in the reference libraries' tables",
		3.0e9, srcModulusMemo + "PVC-U short-term 2.4–3.3 GPa at 20 °C)"},
	{"concrete", "concrete", 1.0e-3, 120,
		"ε middle of the range of " + srcMoody + " ['Concrete'] 0.305 mm to ['Rough concrete'] 3.05 mm; C from memory (100–140)",
		30e9, srcModulusMemo + "concrete 20–40 GPa; a reinforced or thick wall needs its own figure)"},
}

// MaterialTable returns every pipe material, sorted by key. The slice is
// a fresh copy.
func MaterialTable() []Material {
	out := make([]Material, len(materialTable))
	copy(out, materialTable[:])
	sort.Slice(out, func(i, j int) bool { return out[i].Key < out[j].Key })
	return out
}

// LookupMaterial returns the material with the given key (case
// insensitive). An unknown key gives a *FieldError for field "mat" that
// lists the known keys.
func LookupMaterial(key string) (Material, error) {
	k := strings.ToLower(strings.TrimSpace(key))
	for _, m := range materialTable {
		if m.Key == k {
			return m, nil
		}
	}
	keys := make([]string, 0, len(materialTable))
	for _, m := range MaterialTable() {
		keys = append(keys, m.Key)
	}
	return Material{}, NewFieldError("mat", UnknownChoice).Typed(key).OneOf(keys...)
}
