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
}

// materialTable holds the pipe materials. The values were recalled
// without a document at hand; each row says so and gives the usual range.
var materialTable = [...]Material{
	{"steel", "commercial steel, new", 0.045e-3, 120,
		"ε from memory (Moody 1944 chart value 0.045 mm); C from memory (typical 120–140)"},
	{"ss", "stainless steel", 0.015e-3, 140,
		"from memory (typical handbook values: ε 0.002–0.015 mm, C 140–150)"},
	{"ci", "cast iron, uncoated", 0.26e-3, 130,
		"ε from memory (Moody 1944 chart value 0.26 mm); C from memory (new 130, falling to about 100 with age)"},
	{"ductile", "ductile iron, cement-mortar lined", 0.1e-3, 140,
		"from memory (typical handbook values: ε 0.03–0.3 mm depending on lining, C 130–140)"},
	{"galv", "galvanized steel", 0.15e-3, 120,
		"ε from memory (Moody 1944 chart value 0.15 mm); C from memory (typical 110–120)"},
	{"copper", "copper or brass, drawn tubing", 0.0015e-3, 140,
		"ε from memory (Moody 1944 chart value for drawn tubing 0.0015 mm); C from memory (typical 130–140)"},
	{"pe", "polyethylene (PE)", 0.007e-3, 150,
		"from memory (typical handbook values: ε 0.0015–0.007 mm, upper value taken; C 140–150)"},
	{"pvc", "PVC", 0.0015e-3, 150,
		"from memory (typical handbook values: ε 0.0015–0.007 mm; C 140–150)"},
	{"concrete", "concrete", 1.0e-3, 120,
		"from memory (Moody 1944 chart range ε 0.3–3 mm, middle value taken; C 100–140)"},
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
	return Material{}, fieldErrorf("mat", "unknown pipe material %q; expected one of %s", key, strings.Join(keys, ", "))
}
