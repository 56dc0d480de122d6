package scenario

import (
	"math"
	"testing"
	"time"
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

// TestHistoryByHand: three sheets of one pump of our own (not the demo's)
// over a year give the history chart's points and the cost figures,
// worked by hand. Liquid of 1000 kg/m³, gauges level on pipes of one size
// (no velocity head, so H = (pd − ps)/(ρg)), g = 9.80665 m/s² (the
// standard gravity, NIST SP 811), motor 90 %, data sheet 75 % at 40 L/s
// (a knot: no interpolation), 2000 h a year at 0.15 per kWh (1 kWh =
// 3.6 MJ, NIST SP 811). Every sheet's reading 1 is at 40 L/s:
//
//	sheet  H     P_in     P_hyd = ρgQH   η_w2w = P_hyd/P_in   η_pump = η_w2w/0.9
//	1      40 m  24 kW    15 690.64 W    0.653776667          0.726418519
//	2      38 m  24.5 kW  14 906.108 W   0.608412571          0.676013968
//	3      36 m  25 kW    14 121.576 W   0.564863040          0.627625600
//
// Energy per volume P_in/Q: 600 000, 612 500, 625 000 J/m³. The extra
// input against the data sheet, P_in − P_hyd/(0.75·0.90), over 2000 h at
// 0.15: 754.607 W → 226.382; 2416.877 W → 725.063; 4079.147 W →
// 1223.744 a year. Sheet 3 also has readings at 30 L/s (41 m, 21 kW)
// and 50 L/s (31 m, 28 kW) on one straight line, which the monotone cubic
// keeps, so its head at the duty flow of 45 L/s is 33.5 m; its pump
// efficiency there from python3-scipy 1.10's PchipInterpolator over
// (0.6382106, 0.6276256, 0.6031868) is 0.6174804303225309.
func TestHistoryByHand(t *testing.T) {
	base := "liq=custom&rho=1000kg/m3&mu=1mPa.s&pv=2kPa&baro=101.325kPa&q=45L/s" +
		"&pq=0,20,40,60L/s&ph=50,46,38,26m&peff=0,60,75,70%25" +
		"&zs=0m&zd=0m&ds=150mm&dd=150mm&etam=90%25&hours=2000&tariff=0.15&ps=0kPa&qm=40L/s"
	sheet := func(tag, when, more string) KeptSheet {
		t.Helper()
		s, err := Parse(base + "&tag=" + tag + more)
		if err != nil {
			t.Fatal(err)
		}
		at, err := time.Parse(time.RFC3339, when)
		if err != nil {
			t.Fatal(err)
		}
		return KeptSheet{Scen: s, Edited: at}
	}
	// Kept out of order, and the tag typed differently once.
	kept := []KeptSheet{
		sheet("P-7", "2025-01-20T10:00:00Z", "&pd=353.0394kPa&pin=25kW&qm2=30L/s&ps2=0kPa&pd2=402.07265kPa&pin2=21kW&qm3=50L/s&ps3=0kPa&pd3=304.00615kPa&pin3=28kW"),
		sheet("P-7", "2024-01-22T09:00:00Z", "&pd=392.266kPa&pin=24kW"),
		sheet("p-7 ", "2024-07-18T15:30:00Z", "&pd=372.6527kPa&pin=24.5kW"),
	}
	hs := Histories(kept)
	if len(hs) != 1 || len(hs[0].Entries) != 3 || hs[0].Base != BaseDataSheet {
		t.Fatalf("histories %+v", hs)
	}
	want := []struct {
		flow, head, pump, wire, perVolume, cost float64
		atDuty                                  bool
	}{
		{0.04, 40, 0.7264185185185186, 0.6537766666666667, 600000, 226.3822222222222, false},
		{0.04, 38, 0.6760139682539683, 0.6084125714285714, 612500, 725.0631111111111, false},
		{0.045, 33.5, 0.6174804303225309, 0.56486304, 625000, 1223.744, true},
	}
	near := func(i int, what string, got, want float64) {
		t.Helper()
		if math.Abs(got-want) > 1e-9*math.Abs(want) {
			t.Errorf("sheet %d: %s %.12g, by hand %.12g", i+1, what, got, want)
		}
	}
	for i, e := range hs[0].Entries {
		w := want[i]
		if e.AtDuty != w.atDuty {
			t.Errorf("sheet %d: at duty %v, want %v", i+1, e.AtDuty, w.atDuty)
		}
		near(i, "flow", e.Flow, w.flow)
		near(i, "head", e.Head, w.head)
		near(i, "pump efficiency", e.PumpEff, w.pump)
		near(i, "wire-to-water efficiency", e.WireEff, w.wire)
		near(i, "energy per volume", e.EnergyPerVolume, w.perVolume)
		if e.Lost == nil {
			t.Errorf("sheet %d: no cost", i+1)
			continue
		}
		near(i, "yearly cost", e.Lost.YearCost, w.cost)
	}
}
