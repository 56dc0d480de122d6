package scenario

import (
	"sort"
	"strings"
	"time"

	"fieldhead/calc"
)

// A pump's history: the kept sheets that name one pump tag, lined up by
// their edit time.

// HistoryEntry is one sheet of a pump's history, its figures in SI.
type HistoryEntry struct {
	Title  string
	Link   string
	Edited time.Time
	// Head is the pump's head at the duty flow Flow (the guarantee flow
	// qg, else the sheet's flow q) from the tested curve, when it covers
	// that flow (AtDuty); else reading 1's own head at its flow Flow.
	Flow, Head float64
	AtDuty     bool
	// PumpEff and WireEff are reading 1's efficiencies (the pump's own
	// at the duty flow from the tested curve when AtDuty), 0 when not
	// known; EnergyPerVolume its electrical input per volume, J/m³.
	PumpEff, WireEff float64
	EnergyPerVolume  float64
	// Lost is the yearly cost of the efficiency lost against the
	// history's baseline, at this sheet's hydraulic power, running hours
	// and tariff; nil without them.
	Lost *calc.LostEfficiency
}

// HistoryBase says what a history's lost efficiency is counted against.
type HistoryBase uint8

const (
	BaseNone      HistoryBase = iota // no baseline: no cost
	BaseDataSheet                    // the data sheet's efficiency at each reading's flow times the motor's
	BaseFirstTest                    // the first sheet's wire-to-water efficiency
)

// History is one pump tag's sheets, oldest first; Undated counts its
// sheets whose edit time is not known (left out of the line-up).
type History struct {
	Tag     string
	Entries []HistoryEntry
	Base    HistoryBase
	Undated int
}

// Histories gathers the kept sheets by pump tag (the tag as typed, its
// case and spaces ignored for matching), each history oldest first; the
// tags in alphabetical order. Sheets without a tag are left out.
func Histories(kept []KeptSheet) []History {
	byTag := map[string]*History{}
	type withSheet struct {
		e         HistoryEntry
		base      float64 // data sheet η × motor η at reading 1's flow, 0 unknown
		hyd       float64
		hours, tf float64
	}
	rows := map[string][]withSheet{}
	for _, k := range kept {
		in := Read(k.Scen)
		tag := strings.TrimSpace(in.Choice("tag"))
		if tag == "" {
			continue
		}
		key := strings.ToLower(strings.Join(strings.Fields(tag), " "))
		h := byTag[key]
		if h == nil {
			h = &History{Tag: tag}
			byTag[key] = h
		}
		if k.Edited.IsZero() {
			h.Undated++
			continue
		}
		r := Evaluate(in)
		w := withSheet{e: HistoryEntry{Title: in.Choice("name"), Link: k.Scen.Encode(), Edited: k.Edited}}
		if f := r.Field; f != nil {
			w.e.Flow, w.e.Head, w.e.PumpEff, w.e.WireEff, w.hyd = f.Q, f.Head, f.PumpEfficiency, f.Efficiency, f.HydraulicPower
			if m := in.Num("etam"); f.CurveEfficiency > 0 && m > 0 {
				w.base = f.CurveEfficiency * m
			}
		}
		if t := r.Test; t != nil {
			duty, ok := in.Value("qg")
			if !ok {
				duty, ok = in.Value("q")
			}
			if hd, _, covered := t.Head(duty.SI); ok && covered && t.HasCurve() {
				w.e.Flow, w.e.Head, w.e.AtDuty = duty.SI, hd, true
				if eta, _, ok := t.Efficiency(duty.SI); ok {
					w.e.PumpEff = eta
				}
			}
		}
		if en := r.Energy; en != nil && en.Measured {
			w.e.EnergyPerVolume = en.PerVolume
		}
		w.hours, w.tf = in.Num("hours"), in.Num("tariff")
		rows[key] = append(rows[key], w)
	}
	var out []History
	for key, h := range byTag {
		ws := rows[key]
		sort.SliceStable(ws, func(i, j int) bool { return ws[i].e.Edited.Before(ws[j].e.Edited) })
		h.Base = BaseDataSheet
		for _, w := range ws {
			if w.base == 0 && w.e.WireEff > 0 {
				h.Base = BaseFirstTest
			}
		}
		if h.Base == BaseFirstTest && (len(ws) == 0 || ws[0].e.WireEff == 0) {
			h.Base = BaseNone
		}
		for _, w := range ws {
			base := w.base
			if h.Base == BaseFirstTest {
				base = ws[0].e.WireEff
			}
			if h.Base != BaseNone && w.e.WireEff > 0 && base > 0 && w.hours > 0 && w.tf > 0 {
				if l, err := calc.LostEfficiencyCost(w.hyd, w.e.WireEff, base, w.hours, w.tf); err == nil {
					w.e.Lost = &l
				}
			}
			h.Entries = append(h.Entries, w.e)
		}
		out = append(out, *h)
	}
	sort.Slice(out, func(i, j int) bool { return strings.ToLower(out[i].Tag) < strings.ToLower(out[j].Tag) })
	return out
}

// NextSheet is the sheet New sheet starts from the open one s: its view
// and unit system, and, for the same site, the site (altitude or
// barometer) and the pump tag; with a tag, the pump's own facts too (the
// data sheet, the gauges' places and pipes, the motor, the instruments,
// the grade and guarantee, the running hours and tariff), so that the
// next visit to the pump needs only its readings. Every reading, the
// title and the line are left behind.
func NextSheet(s Scenario) Scenario {
	var out Scenario
	keep := []string{"view", "units", "alt", "baro", "tag"}
	if strings.TrimSpace(s.Get("tag")) != "" {
		keep = append(keep, "liq", "t", "pq", "ph", "peff", "pnpsh", "spd", "nrat", "fmains", "pumps",
			"zs", "zd", "ds", "dsn", "dss", "dd", "ddn", "dds", "etam", "grade", "qg", "hg", "etag", "hours", "tariff")
		keep = append(keep, accuracyParams...)
	}
	for _, p := range keep {
		if v := s.Get(p); v != "" {
			_ = out.Set(p, v)
		}
	}
	return out
}

// HistoryDemo is three invented visits to the demo's duty pump, tag
// "BS-3 P1", a year apart from first to last: one reading each on the
// first two, the test at five flows (PumpTestDemo) on the last. For the
// demo and the browser test only, never a check value.
func HistoryDemo() []KeptSheet {
	visit := func(name, when string, readings [][2]string) KeptSheet {
		s := PumpTestDemo()
		for k := 2; k <= calc.TestMaxReadings; k++ {
			for _, f := range readingFields {
				_ = s.Set(ReadingParam(f, k), "")
			}
		}
		_ = s.Set("name", name)
		for _, kv := range readings {
			_ = s.Set(kv[0], kv[1])
		}
		t, _ := parseRFC3339(when)
		return KeptSheet{Scen: s, Edited: t}
	}
	last := PumpTestDemo()
	_ = last.Set("name", "BS-3 P1, test at five flows")
	t, _ := parseRFC3339("2026-03-12T10:20:00Z")
	return []KeptSheet{
		visit("BS-3 P1, spring visit", "2025-03-10T09:40:00Z", [][2]string{{"qm", "43L/s"}, {"ps", "-19kPa"}, {"pd", "458kPa"}, {"pin", "31.5kW"}}),
		visit("BS-3 P1, autumn visit", "2025-09-15T14:05:00Z", [][2]string{{"qm", "42L/s"}, {"ps", "-18.5kPa"}, {"pd", "445kPa"}, {"pin", "31.4kW"}}),
		{Scen: last, Edited: t},
	}
}
