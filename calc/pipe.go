package calc

import (
	"math"
	"strconv"
	"strings"
	"sync"
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

// frClassPipes returns the pipes of one canonical class name, a fresh
// copy of the table built once (every look-up of a size reads it).
func frClassPipes(sch string) []PipeSize {
	frBuilt.Do(frBuild)
	rows, ok := frByClass[sch]
	if !ok {
		return nil
	}
	return append([]PipeSize(nil), rows...)
}

// The tables every look-up reads, built on first use (not at start-up):
// the pipes by class, each pipe's size as a number (0 when unreadable),
// and the class names by their frScheduleKey (the first class of a key).
var (
	frBuilt     sync.Once
	frByClass   map[string][]PipeSize
	frNPSByCls  map[string][]float64
	frSchedules map[string]string
)

func frBuild() {
	frByClass = make(map[string][]PipeSize, len(frClasses))
	frNPSByCls = make(map[string][]float64, len(frClasses))
	frSchedules = make(map[string]string, len(frClasses))
	for _, c := range frClasses {
		rows, nps := frBuildClass(c.name)
		frByClass[c.name] = rows
		frNPSByCls[c.name] = nps
		if k := frScheduleKey(c.name); frSchedules[k] == "" {
			frSchedules[k] = c.name
		}
	}
}

// frBuildClass builds the pipes of one canonical class name, with each
// pipe's size as a number (0 when unreadable).
func frBuildClass(sch string) ([]PipeSize, []float64) {
	for _, c := range frClasses {
		if c.name != sch {
			continue
		}
		rows := c.table()
		out := make([]PipeSize, 0, len(rows))
		nps := make([]float64, 0, len(rows))
		for _, r := range rows {
			size, _ := frNPSValue(r.size)
			od, wall := r.od, r.wall
			if c.inch {
				od, wall = od*25.4, wall*25.4
			}
			lining := 0.0
			if c.cat == "di" {
				lining = frLining(size)
			}
			id := od - 2*(wall+lining)
			if c.idRound > 0 {
				// Round the ID as the tables print it.
				id = math.Round(id/c.idRound) * c.idRound
			}
			p := PipeSize{Catalogue: c.cat, Standard: c.standard, NPS: r.size, Schedule: c.name,
				OD: od / 1000, Wall: wall / 1000, Lining: lining / 1000, ID: id / 1000, FromMemory: c.memo}
			if c.cat == "steel" || c.cat == "ss" {
				p.DN = steelDN(size)
			}
			out, nps = append(out, p), append(nps, size)
		}
		return out, nps
	}
	return nil, nil
}

// frNormSchedule maps user spellings ("sch 40", "Sch40", "std", "40s",
// "SDR 11", "type L", "pvc sdr 21") to the canonical class name, or "" if
// unknown.
func frNormSchedule(s string) string {
	frBuilt.Do(frBuild)
	return frSchedules[frScheduleKey(s)]
}

// frScheduleKey is a class name as frNormSchedule compares it.
func frScheduleKey(s string) string {
	t := strings.ToLower(strings.TrimSpace(s))
	t = frScheduleSeparators.Replace(t)
	for _, p := range []string{"schedule", "sch", "type"} {
		t = strings.TrimPrefix(t, p)
	}
	return t
}

var frScheduleSeparators = strings.NewReplacer(" ", "", ".", "", "-", "", "_", "")

// frNPSValue reads a nominal size as a number: "1-1/2", "1 1/2", "1.5",
// "1½", `8"`, "NPS 8", "8 in"; for PE also "160mm", "DN160", "d160".
// frFractions spells out the fraction characters and drops inch marks.
var frFractions = strings.NewReplacer("½", " 1/2", "¼", " 1/4", "¾", " 3/4", "\"", "", "”", "")

func frNPSValue(s string) (float64, bool) {
	t := strings.ToLower(strings.TrimSpace(s))
	t = frFractions.Replace(t)
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
		return PipeSize{}, NewFieldError("sch", UnknownChoice).Typed(schedule).OneOf(all...)
	}
	pipes := frByClass[sch] // built by frNormSchedule; read only
	size := nps
	if t := strings.ToLower(strings.TrimSpace(nps)); strings.HasPrefix(t, "dn") && len(pipes) > 0 && pipes[0].DN > 0 {
		if dn, ok := frNPSValue(t); ok && dn == math.Trunc(dn) {
			size = SteelNPS(int(dn))
		}
	}
	if v, ok := frNPSValue(size); ok {
		for i, w := range frNPSByCls[sch] {
			if w == v {
				return pipes[i], nil
			}
		}
	}
	sizes := make([]string, len(pipes))
	for i, p := range pipes {
		sizes[i] = p.NPS
	}
	return PipeSize{}, NewFieldError("nps", UnknownChoice).Typed(nps).OneOf(sizes...).With("sch")
}
