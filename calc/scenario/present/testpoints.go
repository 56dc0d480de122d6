package present

import (
	"strconv"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The test at several flows: the readings after the field check's own,
// the tested curve's figures and shortfall from the data sheet, and the
// verdict by the guarantee point (ISO 9906's tolerance cross).

// testCard is the test at several flows and its guarantee verdict. With
// one reading and no grade it holds only the button that adds a reading.
func (b *builder) testCard() Card {
	n := b.d.ShownReadings()
	blocks := []Block{text("muted", "", "Throttle the discharge valve and read the same gauges and meters at other flows (up to "+
		strconv.Itoa(calc.TestMaxReadings)+" readings): the tested curve then shows whether the whole curve has moved, not only this flow. Reading 1 is the field check above.")}
	for k := 2; k <= n; k++ {
		num := strconv.Itoa(k)
		blocks = append(blocks,
			Block{Kind: BlockHeading, Text: "Reading " + num},
			fields(b.quantity(scenario.ReadingParam("qm", k), "", ""), b.quantity(scenario.ReadingParam("ps", k), "", ""),
				b.quantity(scenario.ReadingParam("pd", k), "", ""), b.quantity(scenario.ReadingParam("pin", k), "", "")),
			Block{Kind: BlockButtons, Buttons: []Button{{ID: "reading-del-" + num, Text: "✕", Label: "remove reading " + num, Class: "step",
				Act: Action{Do: "reading-remove", N: k}}}})
	}
	blocks = append(blocks, Block{Kind: BlockButtons, Buttons: []Button{{ID: "reading-add", Text: "+ Add a reading at another flow", Class: "act",
		Disabled: n >= calc.TestMaxReadings, Act: Action{Do: "reading-add"}}}})
	blocks = append(blocks, b.testTable(), b.testFacts())
	if b.in.Given("grade") {
		blocks = append(blocks, Block{Kind: BlockHeading, Text: "Acceptance by the guarantee point (grade above)"},
			fields(b.quantity("qg", "", ""), b.quantity("hg", "", ""), b.quantity("etag", "", "")),
			b.guaranteeLevel(), b.guaranteeFacts())
	}
	blocks = append(blocks, b.warnings(nil, "test"))
	return Card{ID: "test", Title: "Test at several flows", Blocks: blocks}
}

// testTable is each reading worked out, by rising flow; empty without a
// test.
func (b *builder) testTable() Block {
	t := b.r.Test
	if t == nil {
		return Block{Kind: BlockEmpty}
	}
	tb := &Table{ID: "test-table", Class: "grid figures", Head: []string{"reading", "flow", "pump head", "pump efficiency", "wire-to-water", "head vs data sheet"}}
	// With bands, a figure's band may go under it ("banded" lets the
	// cells wrap) where the six columns do not fit on one line (a tablet
	// held upright): each figure and its unit, and each band, stay whole.
	keep := func(s string) string { return s }
	band := func(v, u string) string { return v }
	if t.Bands {
		tb.Class += " banded"
		keep = whole
		band = func(v, u string) string { return whole(v) + " " + whole("± "+u) }
	}
	for i, p := range t.Points {
		k := strconv.Itoa(t.Reading[i])
		c := p.Check
		head := band(b.head(c.Head), b.head(p.Bands.Head.U))
		eff, wire, dev := "—", "—", "—"
		if c.PumpEfficiency > 0 {
			eff = band(percent(c.PumpEfficiency), percent(p.Bands.Pump.U))
		}
		if c.Efficiency > 0 {
			wire = keep(percent(c.Efficiency))
		}
		if c.HasCurve {
			dev = keep(b.head(c.Deviation))
		}
		cells := []Cell{{Text: keep(b.param("qm", c.Q)), Label: "flow"}, {ID: "test-head-" + k, Text: head, Label: "pump head"},
			{Text: eff, Label: "pump efficiency"}, {Text: wire, Label: "wire-to-water"}, {Text: dev, Label: "head vs data sheet"}}
		tb.Rows = append(tb.Rows, Row{Head: "reading " + k, Cells: cells})
	}
	return Block{Kind: BlockTable, ID: "test-table", Table: tb}
}

// testFacts are the tested curve's range and its largest shortfall from
// the data sheet; empty without a tested curve.
func (b *builder) testFacts() Block {
	t := b.r.Test
	if t == nil || !t.HasCurve() {
		return Block{Kind: BlockEmpty}
	}
	fs := []Fact{{ID: "test-range", Label: "tested curve, through " + strconv.Itoa(len(t.Points)) + " readings (monotone cubic, as the data sheet's)",
		Value: b.param("qm", t.MinFlow()) + " to " + b.param("qm", t.MaxFlow())}}
	if t.HasSheet {
		h := t.Sheet.Head
		fs = append(fs, Fact{ID: "test-short-head", Key: true, Label: "largest head shortfall from the data sheet, " + b.param("qm", t.Sheet.From) + " to " + b.param("qm", t.Sheet.To),
			Value: b.head(h.Short) + " (" + number(h.Share*100, 3) + " %) at " + b.param("qm", h.Flow) + b.band(h.U, t.Bands, b.head)})
		if t.Sheet.HasEff {
			e := t.Sheet.Eff
			fs = append(fs, Fact{ID: "test-short-eff", Key: true, Label: "largest shortfall of the pump's own efficiency",
				Value: number(e.Short*100, 3) + " percentage points at " + b.param("qm", e.Flow) + " (" + percent(e.Tested) + " against " + percent(e.Sheet) + ")" + b.band(e.U, t.Bands, percent)})
		}
	}
	if t.Bands {
		fs = append(fs, Fact{Label: "the band about the tested curve", Value: "each reading's band, with the flow meter's part taken along the curve, joined by the same monotone interpolation; each reading's errors taken as independent (a bias common to all readings would shift the whole curve and is not modelled)"})
	}
	return Block{Kind: BlockFacts, ID: "test-facts", Class: "facts", Facts: fs}
}

// band writes " (± u)" when the test has bands.
func (b *builder) band(u float64, has bool, show func(float64) string) string {
	if !has {
		return ""
	}
	return " (tested value " + whole("± "+show(u)) + ")"
}

// guaranteeLevel is the verdict by the guarantee point's badge.
func (b *builder) guaranteeLevel() Block {
	g := b.r.Guarantee
	if g == nil {
		if b.r.Test == nil && b.in.Given("grade") {
			return text("muted", "", "Judged by the guarantee point with two readings or more, or with one reading once the guarantee flow is typed.")
		}
		return Block{Kind: BlockEmpty}
	}
	name := "grade " + g.Grade.Name
	switch g.Verdict {
	case calc.Within:
		return Block{Kind: BlockLevel, ID: "guarantee-level", Class: "lvl-ok", Text: "✓ Meets the guarantee point, " + name}
	case calc.Outside:
		return Block{Kind: BlockLevel, ID: "guarantee-level", Class: "lvl-danger", Text: "✕ Fails the guarantee point, " + name}
	}
	return Block{Kind: BlockLevel, ID: "guarantee-level", Class: "lvl-caution", Text: "? This test cannot tell whether the pump meets the guarantee point, " + name}
}

// verdictWord words a verdict for the facts.
func verdictWord(v calc.Verdict) string {
	return map[calc.Verdict]string{calc.Within: "within", calc.Outside: "outside", calc.CannotTell: "cannot tell", calc.VerdictNone: "not judged"}[v]
}

// guaranteeFacts are what the guarantee verdict compares and how.
func (b *builder) guaranteeFacts() Block {
	g := b.r.Guarantee
	if g == nil {
		return Block{Kind: BlockEmpty}
	}
	gp, x := g.Guarantee, g.Cross
	from := map[scenario.GuaranteeSource]string{scenario.FromTyped: "typed", scenario.FromDuty: "the duty flow", scenario.FromSheet: "the data sheet's", scenario.FromNone: ""}
	point := b.param("qg", gp.Q) + " (" + from[g.FlowFrom] + "), " + b.head(gp.H) + " (" + from[g.HeadFrom] + ")"
	if gp.Eff > 0 {
		point += ", pump efficiency " + percent(gp.Eff) + " (" + from[g.EffFrom] + ")"
	}
	fs := []Fact{
		{ID: "guarantee-point", Label: "guarantee point", Value: point},
		{ID: "guarantee-cross", Label: "tolerance cross, grade " + g.Grade.Name + " (factors from memory)",
			Value: "flow " + b.param("qg", x.FlowLow) + " to " + b.param("qg", x.FlowHigh) + " at " + b.head(x.H) + "; head " + b.head(x.HeadLow) + " to " + b.head(x.HeadHigh) + " at " + b.param("qg", x.Q)},
		{ID: "guarantee-flowhead", Label: "flow and head: the tested curve through the cross", Value: verdictWord(g.FlowHead), Key: true},
	}
	switch g.Basis {
	case calc.CrossPoint:
		fs = append(fs, Fact{Label: "one reading", Value: "one reading shows no curve: judged for any head curve that falls with flow through the reading's box, which settles it only when the box lies in a quarter of the cross the curve cannot avoid, or beyond both bars; the efficiency is not read. Add readings on either side of the guarantee flow for a verdict."})
	default:
		how := "the verdict counts every curve within the tested curve's band: within when each of them meets the cross, outside when none does, cannot tell when some do"
		if !g.Covered {
			how += "; the readings do not span the flow bar, and beyond them the curve is not known"
		}
		fs = append(fs, Fact{Label: "how uncertainty enters", Value: how})
	}
	e := g.Efficiency
	switch e.Status {
	case calc.EffRead:
		fs = append(fs, Fact{ID: "guarantee-eff", Key: true, Label: "pump efficiency where the tested curve meets the line from the origin through the guarantee point (" + b.param("qg", e.Flow) + ", " + b.head(e.Head) + ")",
			Value: percent(e.Value) + " " + whole("± "+percent(e.U)) + ", at least " + percent(e.Judgement.Low) + " allowed: " + verdictWord(e.Judgement.Verdict)})
	case calc.EffNotGuaranteed:
		fs = append(fs, Fact{Label: "pump efficiency", Value: "not guaranteed (none typed, none on the data sheet)"})
	case calc.EffNoCurve:
		fs = append(fs, Fact{Label: "pump efficiency", Value: "not read: every reading needs the motor's input, and the motor's efficiency is needed"})
	case calc.EffOnePoint:
		fs = append(fs, Fact{Label: "pump efficiency", Value: "not read from one reading"})
	case calc.EffLineMissed:
		fs = append(fs, Fact{Label: "pump efficiency", Value: "not read: the tested curve does not meet the line from the origin within the tested flows"})
	}
	return Block{Kind: BlockFacts, ID: "guarantee-facts", Class: "facts", Facts: fs}
}

// testCaption says in words what the test adds to the pump chart.
func (b *builder) testCaption() string {
	t := b.r.Test
	if t == nil {
		return ""
	}
	out := " The open rings are the test's readings"
	if t.Bands {
		out += ", each in its uncertainty box"
	}
	out += "."
	if t.HasCurve() {
		out += " The medium accent line is the tested head curve through them"
		if t.Bands {
			out += ", between dotted edges of its band"
		}
		out += "."
	}
	if g := b.r.Guarantee; g != nil {
		out += " The filled diamond is the guarantee point, with grade " + g.Grade.Name + "'s tolerance cross through it (flow bar across, head bar up and down); the thin dash-dot line runs from the origin through it, and the efficiency is read where the tested curve meets it."
	}
	return out
}

// testChart adds the test to the pump chart: the readings with their
// boxes, the tested curve and its band, the guarantee point's cross and
// the line from the origin through it.
func (b *builder) testChart(ch *Chart, qu, hu calc.Unit) {
	t := b.r.Test
	if t == nil {
		return
	}
	for i, p := range t.Points {
		c := p.Check
		m := Marker{X: qu.FromSI(c.Q), Y: hu.FromSI(c.Head), Role: MarkMeasured,
			Label: "reading " + strconv.Itoa(t.Reading[i]) + "\n" + b.param("qm", c.Q) + ", " + b.head(c.Head)}
		if t.Bands {
			m.DX, m.DY = qu.FromSI(c.Q+p.Bands.Flow.U)-m.X, hu.FromSI(c.Head+p.Bands.Head.U)-m.Y
		}
		ch.Markers = append(ch.Markers, m)
	}
	if t.HasCurve() {
		mid := func(q float64) (float64, bool) { h, _, ok := t.Head(q); return h, ok }
		xs, ys := sampleCurve(t.MinFlow(), t.MaxFlow(), mid, qu, hu)
		ch.Curves = append(ch.Curves, Curve{Role: RoleTested, Name: "tested", X: xs, Y: ys})
		if t.Bands {
			for _, sign := range []float64{1, -1} {
				edge := func(q float64) (float64, bool) { h, u, ok := t.Head(q); return h + sign*u, ok }
				xs, ys := sampleCurve(t.MinFlow(), t.MaxFlow(), edge, qu, hu)
				ch.Curves = append(ch.Curves, Curve{Role: RoleTestedBand, X: xs, Y: ys})
			}
		}
	}
	g := b.r.Guarantee
	if g == nil {
		return
	}
	x := g.Cross
	ch.Markers = append(ch.Markers, Marker{X: qu.FromSI(x.Q), Y: hu.FromSI(x.H), Role: MarkGuarantee,
		Label: "guarantee\n" + b.param("qg", x.Q) + ", " + b.head(x.H),
		Cross: &Cross{X0: qu.FromSI(x.FlowLow), X1: qu.FromSI(x.FlowHigh), Y0: hu.FromSI(x.HeadLow), Y1: hu.FromSI(x.HeadHigh)}})
	// The line from the origin through the guarantee point, to the
	// tested flows' end (a straight line: two points).
	end := max(t.MaxFlow(), x.FlowHigh)
	ch.Curves = append(ch.Curves, Curve{Role: RoleOriginLine, X: []float64{0, qu.FromSI(end)}, Y: []float64{0, hu.FromSI(x.H / x.Q * end)}})
}
