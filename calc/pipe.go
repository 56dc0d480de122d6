package calc

import (
	"math"
	"strconv"
	"strings"
)

// Pipe standards named in PipeSize.Standard.
const (
	StandardB3610M = "ASME B36.10M"
	StandardB3619M = "ASME B36.19M"
	StandardD1785  = "ASTM D1785"
	StandardD2241  = "ASTM D2241"
	StandardB88    = "ASTM B88"
	StandardPE     = "ISO 4427"
	StandardDI     = "ISO 2531 / ISO 4179"
)

// PipeSize is one pipe of a dimension standard. Lengths are in metres.
type PipeSize struct {
	Catalogue string  // key of its Catalogue: "steel", "ss", "pvc", "copper", "pe", "di"
	Standard  string  // e.g. "ASME B36.10M"
	NPS       string  // nominal size in the catalogue's notation: "1-1/2" (inch), "160" (PE OD, mm), "200" (DN)
	Schedule  string  // class: "40", "10S", "PVC-SDR21", "L", "SDR11", "K9"
	DN        int     // metric designation where the standard gives one (steel), else 0
	OD        float64 // outside diameter, m
	Wall      float64 // wall thickness, m (iron only; a lining is not included)
	Lining    float64 // cement-mortar lining on each side, m (ductile iron), else 0
	ID        float64 // inside diameter OD − 2·(Wall + Lining), m
	// FromMemory is set when the row was recalled without the standard at
	// hand and could not be checked against a reference library.
	FromMemory bool
}

// Label returns the size in its catalogue's notation, such as "NPS 8
// sch 40", "NPS 2 PVC-SDR21", "1/2 in type L", "OD 160 SDR11" or
// "DN 200 K9".
func (p PipeSize) Label() string {
	switch p.Catalogue {
	case "copper":
		return p.NPS + " in type " + p.Schedule
	case "pe":
		return "OD " + p.NPS + " " + p.Schedule
	case "di":
		return "DN " + p.NPS + " " + p.Schedule
	case "pvc":
		return "NPS " + p.NPS + " " + p.Schedule
	}
	return "NPS " + p.NPS + " sch " + p.Schedule
}

// Catalogue is a family of pipe sizes under one standard, written in its
// own notation.
type Catalogue struct {
	Key      string   // "steel", "ss", "pvc", "copper", "pe", "di"
	Name     string   // human label
	Standard string   // the dimension standard(s)
	Notation string   // how sizes are written: "NPS", "NPS (IPS)", "nominal inch", "OD mm", "DN"
	Classes  []string // schedules, types, SDRs or wall classes, as LookupPipe takes them
	Material string   // key of the usual Material
	Source   string   // where the figures come from, and what is from memory
}

// catalogueTable holds the catalogues, in the order Catalogues reports
// them.
var catalogueTable = [...]Catalogue{
	{Key: "steel", Name: "carbon steel pipe", Standard: StandardB3610M, Notation: "NPS", Material: "steel",
		Source: "ASME B36.10M via python3-fluids fluids.piping (schedules 40, 80, STD, XS); DN beside NPS from memory"},
	{Key: "ss", Name: "stainless steel pipe", Standard: StandardB3619M, Notation: "NPS", Material: "ss",
		Source: "ASME B36.19M via python3-fluids fluids.piping (5S, 10S, 40S, 80S); DN beside NPS from memory"},
	{Key: "pvc", Name: "PVC pressure pipe", Standard: StandardD1785 + ", " + StandardD2241, Notation: "NPS (IPS)", Material: "pvc",
		Source: "ASTM D1785 schedules 40 and 80, ASTM D2241 SDR 21 and 26, via python3-fluids fluids.piping"},
	{Key: "copper", Name: "copper water tube", Standard: StandardB88, Notation: "nominal inch", Material: "copper",
		Source: "ASTM B88 types K, L, M from memory; outside diameters agree with python3-fluids' copper tube sizes (ASTM D2241 CTS) for 1–2 in"},
	{Key: "pe", Name: "polyethylene pipe", Standard: StandardPE, Notation: "OD mm", Material: "pe",
		Source: "ISO 4427 OD series and SDR 9–26, from memory; wall OD/(2S + 1) with S the exact ISO 4065 R10 series value, rounded up to 0.1 mm (ISO 4065 calculation, from memory)"},
	{Key: "di", Name: "ductile iron pipe, cement-mortar lined", Standard: StandardDI, Notation: "DN", Material: "ductile",
		Source: "ISO 2531 outside diameters and class K9 walls, ISO 4179 lining thickness, all from memory"},
}

// Catalogues returns every pipe catalogue with its classes. The slice is
// freshly built.
func Catalogues() []Catalogue {
	out := make([]Catalogue, len(catalogueTable))
	copy(out, catalogueTable[:])
	for i := range out {
		for _, c := range frClasses {
			if c.cat == out[i].Key {
				out[i].Classes = append(out[i].Classes, c.name)
			}
		}
	}
	return out
}

// LookupCatalogue returns the catalogue with the given key (case
// insensitive); an unknown key gives a *FieldError for field "cat".
func LookupCatalogue(key string) (Catalogue, error) {
	k := strings.ToLower(strings.TrimSpace(key))
	var keys []string
	for _, c := range Catalogues() {
		if c.Key == k {
			return c, nil
		}
		keys = append(keys, c.Key)
	}
	return Catalogue{}, fieldErrorf("cat", "unknown pipe catalogue %q; expected one of %s", key, strings.Join(keys, ", "))
}

// Sizes returns the sizes of one class of the catalogue, smallest first.
// An unknown class gives a *FieldError for field "sch".
func (c Catalogue) Sizes(class string) ([]PipeSize, error) {
	sch := frNormSchedule(class)
	for _, name := range c.Classes {
		if name == sch {
			return frClassPipes(sch), nil
		}
	}
	return nil, fieldErrorf("sch", "no class %q in the %s catalogue; expected one of %s", class, c.Name, strings.Join(c.Classes, ", "))
}

// PipeSizes returns every tabulated pipe, class by class in the order of
// Catalogues:
//
//   - ASME B36.10M carbon steel, schedules 40, 80, STD, XS, NPS 1/2–24;
//   - ASME B36.19M stainless steel, 5S, 10S, 40S, 80S, NPS 1/2–24;
//   - PVC: ASTM D1785 schedules 40 and 80 (NPS 1/2–24), ASTM D2241 SDR 21
//     (NPS 3/4–24) and SDR 26 (NPS 1–24), as classes "PVC40", "PVC80",
//     "PVC-SDR21", "PVC-SDR26";
//   - ASTM B88 copper tube types K, L (1/4–12 in) and M (3/8–12 in);
//   - polyethylene, ISO 4427 OD 20–630 mm, SDR 9, 11, 13.6, 17, 21, 26;
//   - ductile iron, ISO 2531 class K9, DN 80–1000, with the ISO 4179
//     cement-mortar lining taken off the bore.
//
// Rows recalled without the standard at hand have FromMemory set (see
// Catalogue.Source). The slice is freshly built.
func PipeSizes() []PipeSize {
	var out []PipeSize
	for _, c := range frClasses {
		out = append(out, frClassPipes(c.name)...)
	}
	return out
}

// frClassPipes builds the pipes of one canonical class name.
func frClassPipes(sch string) []PipeSize {
	for _, c := range frClasses {
		if c.name != sch {
			continue
		}
		out := make([]PipeSize, 0, len(c.rows))
		for _, r := range c.rows {
			od, wall := r.od, r.wall
			if c.inch {
				od, wall = od*25.4, wall*25.4
			}
			lining := 0.0
			if c.cat == "di" {
				dn, _ := frNPSValue(r.size)
				lining = frLining(dn)
			}
			id := od - 2*(wall+lining)
			if c.idRound > 0 {
				// Round the ID as the tables print it.
				id = math.Round(id/c.idRound) * c.idRound
			}
			p := PipeSize{Catalogue: c.cat, Standard: c.standard, NPS: r.size, Schedule: c.name,
				OD: od / 1000, Wall: wall / 1000, Lining: lining / 1000, ID: id / 1000, FromMemory: c.memo}
			if c.cat == "steel" || c.cat == "ss" {
				p.DN = SteelDN(r.size)
			}
			out = append(out, p)
		}
		return out
	}
	return nil
}

// SteelDN returns the DN that ASME B36.10M lists beside nominal pipe
// size nps ("8" → 200; from memory), or 0 for a size not listed.
func SteelDN(nps string) int {
	v, ok := frNPSValue(nps)
	if !ok {
		return 0
	}
	for i, n := range frNPS {
		if w, _ := frNPSValue(n); w == v {
			return frSteelDN[i]
		}
	}
	return 0
}

// SteelNPS returns the nominal pipe size ASME B36.10M lists beside DN dn
// (200 → "8"; from memory), or "" for a DN not listed.
func SteelNPS(dn int) string {
	for i, d := range frSteelDN {
		if d == dn {
			return frNPS[i]
		}
	}
	return ""
}

// frNormSchedule maps user spellings ("sch 40", "Sch40", "std", "40s",
// "SDR 11", "type L", "pvc sdr 21") to the canonical class name, or "" if
// unknown.
func frNormSchedule(s string) string {
	n := func(s string) string {
		t := strings.ToLower(strings.TrimSpace(s))
		t = strings.NewReplacer(" ", "", ".", "", "-", "", "_", "").Replace(t)
		for _, p := range []string{"schedule", "sch", "type"} {
			t = strings.TrimPrefix(t, p)
		}
		return t
	}
	t := n(s)
	for _, c := range frClasses {
		if n(c.name) == t {
			return c.name
		}
	}
	return ""
}

// frNPSValue reads a nominal size as a number: "1-1/2", "1 1/2", "1.5",
// "1½", `8"`, "NPS 8", "8 in"; for PE also "160mm", "DN160", "d160".
func frNPSValue(s string) (float64, bool) {
	t := strings.ToLower(strings.TrimSpace(s))
	t = strings.NewReplacer("½", " 1/2", "¼", " 1/4", "¾", " 3/4", "\"", "", "”", "").Replace(t)
	for _, p := range []string{"nps", "dn", "de", "d"} {
		if strings.HasPrefix(t, p) {
			t = t[len(p):]
			break
		}
	}
	for _, suf := range []string{"inches", "inch", "in", "mm"} {
		t = strings.TrimSuffix(strings.TrimSpace(t), suf)
	}
	t = strings.TrimSpace(t)
	if strings.HasPrefix(t, "-") || strings.HasPrefix(t, "+") {
		return 0, false
	}
	t = strings.ReplaceAll(t, "-", " ")
	if t == "" {
		return 0, false
	}
	var total float64
	for _, part := range strings.Fields(t) {
		if num, den, ok := strings.Cut(part, "/"); ok {
			a, err1 := strconv.ParseFloat(num, 64)
			b, err2 := strconv.ParseFloat(den, 64)
			if err1 != nil || err2 != nil || b == 0 {
				return 0, false
			}
			total += a / b
			continue
		}
		v, err := strconv.ParseFloat(part, 64)
		if err != nil {
			return 0, false
		}
		total += v
	}
	if math.IsNaN(total) || math.IsInf(total, 0) || total <= 0 {
		return 0, false
	}
	return total, true
}

// LookupPipe returns the pipe of nominal size nps in the given class
// (schedule, type, SDR or wall class; see PipeSizes and Catalogues).
// Class spellings such as "sch 40", "SDR 11", "type L" or "pvc sdr 21" are
// accepted. Inch sizes may be written "1-1/2", "1 1/2" or "1.5"; PE sizes
// as the OD in mm ("160", "160mm", "d160"); ductile iron as the DN ("200",
// "DN200"); steel and stainless sizes also as their DN ("DN 200" for
// NPS 8). Errors: *FieldError for field "sch" (unknown class) or "nps"
// (size not in that class, with the list of sizes that are).
func LookupPipe(nps, schedule string) (PipeSize, error) {
	sch := frNormSchedule(schedule)
	if sch == "" {
		var all []string
		for _, c := range frClasses {
			all = append(all, c.name)
		}
		return PipeSize{}, fieldErrorf("sch", "unknown schedule or class %q; expected one of %s", schedule, strings.Join(all, ", "))
	}
	pipes := frClassPipes(sch)
	size := nps
	if t := strings.ToLower(strings.TrimSpace(nps)); strings.HasPrefix(t, "dn") && len(pipes) > 0 && pipes[0].DN > 0 {
		if dn, ok := frNPSValue(t); ok && dn == math.Trunc(dn) {
			size = SteelNPS(int(dn))
		}
	}
	if v, ok := frNPSValue(size); ok {
		for _, p := range pipes {
			if w, _ := frNPSValue(p.NPS); w == v {
				return p, nil
			}
		}
	}
	sizes := make([]string, len(pipes))
	for i, p := range pipes {
		sizes[i] = p.NPS
	}
	return PipeSize{}, fieldErrorf("nps", "no size %q in class %s; sizes listed: %s", nps, sch, strings.Join(sizes, ", "))
}
