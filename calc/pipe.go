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
	StandardPE     = "ISO 4427 / EN 12201"
)

// PipeSize is one pipe of a dimension standard. Lengths are in metres.
type PipeSize struct {
	Standard string  // e.g. "ASME B36.10M"
	NPS      string  // nominal size: inches for steel ("1-1/2", "8"), OD in mm for PE ("160")
	Schedule string  // "40", "80", "STD", "XS", "10S", "40S", "SDR11", "SDR17"
	OD       float64 // outside diameter, m
	Wall     float64 // wall thickness, m
	ID       float64 // inside diameter OD − 2·Wall, m
}

// frSchedules lists the schedules in the order PipeSizes reports them.
var frSchedules = [...]string{"40", "80", "STD", "XS", "10S", "40S", "SDR11", "SDR17"}

// PipeSizes returns every tabulated pipe, by schedule then size:
//
//   - ASME B36.10M carbon steel, schedules 40, 80, STD and XS, NPS 1/2–24;
//   - ASME B36.19M stainless steel, 10S (NPS 1/2–24) and 40S (NPS 1/2–12);
//   - polyethylene to the ISO 4427 / EN 12201 OD series, SDR 11 (OD
//     25–630 mm) and SDR 17 (OD 40–630 mm), with the wall taken as OD/SDR:
//     a mean-wall approximation; the standards tabulate rounded minimum
//     walls, and real mean walls are slightly thicker.
//
// The dimensions were recalled without the documents at hand (from
// memory). The slice is freshly built.
func PipeSizes() []PipeSize {
	var out []PipeSize
	for _, s := range frSchedules {
		out = append(out, frSchedulePipes(s)...)
	}
	return out
}

// frSchedulePipes builds the pipes of one canonical schedule.
func frSchedulePipes(sch string) []PipeSize {
	var out []PipeSize
	for _, p := range frPESDR {
		if p.name != sch {
			continue
		}
		for _, od := range frPEOD {
			if od < p.minOD {
				continue
			}
			wall := od / p.sdr
			out = append(out, PipeSize{Standard: StandardPE, NPS: strconv.FormatFloat(od, 'f', -1, 64),
				Schedule: sch, OD: od / 1000, Wall: wall / 1000, ID: (od - 2*wall) / 1000})
		}
		return out
	}
	for _, r := range frSteelRows {
		std := StandardB3610M
		var wall float64
		switch sch {
		case "40":
			wall = r.s40
		case "80":
			wall = r.s80
		case "STD":
			wall = r.std
		case "XS":
			wall = r.xs
		case "10S":
			wall, std = r.s10s, StandardB3619M
		case "40S":
			wall, std = r.s40s, StandardB3619M
		}
		if wall == 0 {
			continue
		}
		// Round the ID to 0.01 mm so that it reads as the tables print it.
		id := math.Round((r.od-2*wall)*100) / 100
		out = append(out, PipeSize{Standard: std, NPS: r.nps, Schedule: sch,
			OD: r.od / 1000, Wall: wall / 1000, ID: id / 1000})
	}
	return out
}

// frNormSchedule maps user spellings ("sch 40", "Sch40", "std", "40s",
// "SDR 11") to the canonical schedule name, or "" if unknown.
func frNormSchedule(s string) string {
	t := strings.ToLower(strings.TrimSpace(s))
	t = strings.NewReplacer(" ", "", ".", "", "-", "", "_", "").Replace(t)
	t = strings.TrimPrefix(t, "schedule")
	t = strings.TrimPrefix(t, "sch")
	for _, c := range frSchedules {
		if strings.ToLower(c) == t {
			return c
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

// LookupPipe returns the pipe of nominal size nps in the given schedule.
// Schedules: "40", "80", "STD", "XS" (ASME B36.10M), "10S", "40S"
// (ASME B36.19M), "SDR11", "SDR17" (PE, nps is then the OD in mm);
// spellings such as "sch 40" or "SDR 11" are accepted. Sizes may be
// written "1-1/2", "1 1/2" or "1.5". Errors: *FieldError for field "sch"
// (unknown schedule) or "nps" (size not in that schedule, with the list of
// sizes that are).
func LookupPipe(nps, schedule string) (PipeSize, error) {
	sch := frNormSchedule(schedule)
	if sch == "" {
		return PipeSize{}, fieldErrorf("sch", "unknown schedule %q; expected one of %s", schedule, strings.Join(frSchedules[:], ", "))
	}
	pipes := frSchedulePipes(sch)
	v, ok := frNPSValue(nps)
	if ok {
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
	return PipeSize{}, fieldErrorf("nps", "no size %q in schedule %s; sizes listed: %s", nps, sch, strings.Join(sizes, ", "))
}
