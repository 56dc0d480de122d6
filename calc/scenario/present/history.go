package present

import (
	"slices"
	"strconv"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The site book's histories: the sheets of one pump tag lined up by date.

// HistoryCards are the site book's history cards, one per pump tag, in the
// units asked for (the book's, not any one sheet's).
func HistoryCards(kept []scenario.KeptSheet, us bool) []Card {
	var out []Card
	for i, h := range scenario.Histories(kept) {
		out = append(out, historyCard(h, i+1, us))
	}
	return out
}

// historyCard is one pump's history: its chart, its table and the cost of
// the efficiency lost.
func historyCard(h scenario.History, n int, us bool) Card {
	id := "history-" + strconv.Itoa(n)
	c := Card{ID: id, Class: "history", Title: "History of pump " + h.Tag}
	show := func(v float64, dim calc.Dimension) string { return minus(scenario.Show(v, dim, us)) }
	if len(h.Entries) == 0 {
		c.Blocks = []Block{text("muted", "", "No sheet of this pump has a known edit time (each came from an older sheets file), so none can be dated.")}
		return c
	}
	first := h.Entries[0].Edited
	days := func(e scenario.HistoryEntry) float64 { return e.Edited.Sub(first).Hours() / 24 }
	hu, qu := displayUnit("hp", us), displayUnit("q", us)
	pct := displayUnit("peff", us)
	eu := calc.DefaultUnit(calc.SpecificEnergy, us)
	ch := &Chart{ID: id + "-chart", Kind: "history", Title: "Pump " + h.Tag + " over time",
		XLabel: "days since " + first.Format("2 Jan 2006"), YLabel: "head H (" + hu.Symbol + ")",
		Y2Label: "efficiency η (" + pct.Symbol + ")", Y3Label: "energy (" + eu.Symbol + ")"}
	var head, pump, wire, energy Curve
	head.Role, head.Name = RoleHistoryHead, "head"
	pump.Role, pump.Name = RoleHistoryPumpEff, "pump alone"
	wire.Role, wire.Name = RoleHistoryWireEff, "wire to water"
	energy.Role, energy.Name = RoleHistoryEnergy, "per volume"
	t := &Table{ID: id + "-table", Class: "grid figures", Head: []string{"sheet", "date", "flow", "head", "pump efficiency", "wire-to-water", "energy", "yearly cost of η lost"}}
	for _, e := range h.Entries {
		x := days(e)
		if e.Head > 0 {
			head.X, head.Y = append(head.X, x), append(head.Y, hu.FromSI(e.Head))
		}
		if e.PumpEff > 0 {
			pump.X, pump.Y = append(pump.X, x), append(pump.Y, pct.FromSI(e.PumpEff))
		}
		if e.WireEff > 0 {
			wire.X, wire.Y = append(wire.X, x), append(wire.Y, pct.FromSI(e.WireEff))
		}
		if e.EnergyPerVolume > 0 {
			energy.X, energy.Y = append(energy.X, x), append(energy.Y, eu.FromSI(e.EnergyPerVolume))
		}
		dash := func(ok bool, s string) string {
			if !ok {
				return "—"
			}
			return s
		}
		flow := dash(e.Flow > 0, show(e.Flow, calc.Flow))
		if e.AtDuty {
			flow += ", duty"
		}
		cost := "—"
		if e.Lost != nil {
			cost = number(e.Lost.YearCost, 4)
		}
		title := e.Title
		if title == "" {
			title = "untitled sheet"
		}
		t.Rows = append(t.Rows, Row{Head: title, Cells: []Cell{
			{Text: e.Edited.Format("2006-01-02"), Label: "date"},
			{Text: flow, Label: "flow"},
			{Text: dash(e.Head > 0, show(e.Head, calc.Length)), Label: "head"},
			{Text: dash(e.PumpEff > 0, percent(e.PumpEff)), Label: "pump efficiency"},
			{Text: dash(e.WireEff > 0, percent(e.WireEff)), Label: "wire-to-water"},
			{Text: dash(e.EnergyPerVolume > 0, show(e.EnergyPerVolume, calc.SpecificEnergy)), Label: "energy per volume"},
			{ID: id + "-cost-" + strconv.Itoa(len(t.Rows)+1), Text: cost, Label: "yearly cost of the efficiency lost"},
		}})
	}
	for _, cu := range []Curve{head, pump, wire, energy} {
		if len(cu.X) > 0 {
			ch.Curves = append(ch.Curves, cu)
		}
	}
	// The axes span at least a tenth of the largest head, ten points of
	// efficiency and a fifth of the largest energy per volume (our own
	// choice): wide enough that a field reading's scatter (a percent or
	// two of head, a point or two of efficiency, common practice) stays
	// small, narrow enough that a pump's wear shows.
	ch.Y2Span = pct.FromSI(0.10)
	if len(head.Y) > 0 {
		ch.YSpan = slices.Max(head.Y) / 10
	}
	if len(energy.Y) > 0 {
		ch.Y3Span = slices.Max(energy.Y) / 5
	}
	base := map[scenario.HistoryBase]string{
		scenario.BaseNone:      "No cost of the efficiency lost: it needs the readings' motor input, and a data sheet with efficiencies and the motor's efficiency, or a first test to compare with.",
		scenario.BaseDataSheet: "The cost of the efficiency lost is the extra electrical input for the same hydraulic power at each sheet's wire-to-water efficiency instead of the data sheet's pump efficiency at its flow times the motor's, over the sheet's running hours at its tariff (as the energy card has them), in the tariff's currency. A negative figure is a saving.",
		scenario.BaseFirstTest: "The cost of the efficiency lost is the extra electrical input for the same hydraulic power at each sheet's wire-to-water efficiency instead of the first test's (" + percent(h.Entries[0].WireEff) + "), over the sheet's running hours at its tariff (as the energy card has them), in the tariff's currency. A negative figure is a saving.",
	}[h.Base]
	note := "Each row is a kept sheet whose pump tag is " + h.Tag + ", dated by its last edit. The head is read off the tested curve at the duty flow (marked duty beside the flow) when the sheet has a test at several flows covering it, else it is reading 1's own, at its own flow (a head at another flow is not the same point of the curve: compare like with like). Flows are in " + qu.Symbol + "."
	if h.Undated > 0 {
		note += " " + strconv.Itoa(h.Undated) + " more sheet(s) of this tag have no known edit time (from an older sheets file) and are left out."
	}
	c.Blocks = []Block{
		{Kind: BlockChart, ID: ch.ID, Text: "Head against the date (heavy accent line, open rings: readings taken on site); below, the pump's own efficiency (solid) and wire-to-water (dashed), then the energy used per volume pumped.", Chart: ch},
		{Kind: BlockTable, ID: t.ID, Table: t},
		text("note-text", id+"-base", base),
		text("muted", "", note),
	}
	ch.Caption = c.Blocks[0].Text
	return c
}
