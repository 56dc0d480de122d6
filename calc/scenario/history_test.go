package scenario

import (
	"math"
	"testing"
)

// TestHistoryDemo: three sheets of one tag over a year line up oldest
// first; the last one's head is read off its tested curve at the duty
// flow; the yearly cost of each is checked by hand against the data
// sheet's efficiency at its flow times the motor's.
func TestHistoryDemo(t *testing.T) {
	kept := HistoryDemo()
	other := Demo() // no tag: not in any history
	kept = append(kept, KeptSheet{Scen: other, Edited: kept[0].Edited})
	undated := kept[0].Scen.Clone()
	_ = undated.Set("tag", "bs-3  p1") // the same tag, case and spaces aside
	kept = append(kept, KeptSheet{Scen: undated})
	hs := Histories(kept)
	if len(hs) != 1 {
		t.Fatalf("%d histories, want 1", len(hs))
	}
	h := hs[0]
	if h.Tag != "BS-3 P1" || len(h.Entries) != 3 || h.Undated != 1 || h.Base != BaseDataSheet {
		t.Fatalf("history %q: %d entries, %d undated, base %v", h.Tag, len(h.Entries), h.Undated, h.Base)
	}
	for i := 1; i < 3; i++ {
		if !h.Entries[i-1].Edited.Before(h.Entries[i].Edited) {
			t.Errorf("entries not oldest first: %v then %v", h.Entries[i-1].Edited, h.Entries[i].Edited)
		}
	}
	first, last := h.Entries[0], h.Entries[2]
	if first.AtDuty || math.Abs(first.Flow-0.043) > 1e-12 {
		t.Errorf("first visit: at duty %v, flow %v; want reading 1's own flow 43 L/s", first.AtDuty, first.Flow)
	}
	r := Evaluate(Read(PumpTestDemo()))
	hd, _, _ := r.Test.Head(0.045)
	if !last.AtDuty || last.Flow != 0.045 || last.Head != hd {
		t.Errorf("last: at duty %v, flow %v, head %v; want the tested curve at 45 L/s, %v", last.AtDuty, last.Flow, last.Head, hd)
	}
	for i, e := range h.Entries {
		rr := Evaluate(Read(kept[i].Scen))
		f := rr.Field
		// By hand: extra input = P_hyd·(1/η_w2w − 1/(η_sheet·η_motor)),
		// over 4000 h a year at 0.12 per kWh (1 kWh = 3.6 MJ, NIST SP
		// 811); η_w2w = P_hyd/P_in, the input as typed.
		pin := []float64{31.5e3, 31.4e3, 31e3}[i]
		eta := f.HydraulicPower / pin
		base := f.CurveEfficiency * 0.93
		want := f.HydraulicPower * (1/eta - 1/base) * 4000 / 1000 * 0.12
		if e.Lost == nil || math.Abs(e.Lost.YearCost-want) > 1e-6*math.Abs(want) {
			t.Errorf("entry %d: lost %+v, want a yearly cost of %.2f", i, e.Lost, want)
		}
		if e.EnergyPerVolume <= 0 || math.Abs(e.EnergyPerVolume-pin/f.Q) > 1e-6 {
			t.Errorf("entry %d: energy per volume %v J/m³, want P_in/Q = %v", i, e.EnergyPerVolume, pin/f.Q)
		}
	}
	if !(h.Entries[2].Lost.YearCost > h.Entries[0].Lost.YearCost) {
		t.Errorf("the wear costs less a year later: %v then %v", h.Entries[0].Lost.YearCost, h.Entries[2].Lost.YearCost)
	}
}

// TestNextSheet: New sheet keeps the view, units, site and tag, and with a
// tag the pump's own facts; never a reading or the title.
func TestNextSheet(t *testing.T) {
	n := NextSheet(PumpTestDemo())
	for _, p := range []string{"view", "units", "alt", "tag", "pq", "ph", "peff", "zd", "ds", "etam", "gcs", "grade", "hours"} {
		if n.Get(p) != PumpTestDemo().Get(p) {
			t.Errorf("%s: %q, want %q kept", p, n.Get(p), PumpTestDemo().Get(p))
		}
	}
	for _, p := range []string{"name", "qm", "ps", "pd", "pin", "qm2", "q", "z2", "s1.l"} {
		if n.Has(p) {
			t.Errorf("%s kept: %q", p, n.Get(p))
		}
	}
	plain := NextSheet(Demo())
	if plain.Has("pq") || plain.Get("alt") != "210m" {
		t.Errorf("without a tag: pq %q, alt %q; want the site alone", plain.Get("pq"), plain.Get("alt"))
	}
}
