package present

import (
	"math"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// solveLabels name the unknown above the answer.
var solveLabels = map[string]string{
	"hp": "Pump head", "ht": "Turbine head", "hf": "Friction head",
	"p1": "Pressure at point 1", "p2": "Pressure at point 2",
	"z1": "Elevation of point 1", "z2": "Elevation of point 2", "q": "Flow",
}

// balanceView is the two-point energy balance: the answer, the two
// points, what lies between them, the liquid and where the head goes.
func (b *builder) balanceView() []Card {
	// Each card is built once: building one marks its warnings listed
	// and its parameters shown, so a card built and dropped would hide
	// them from the cards kept.
	var cards []Card
	if b.isLoop() {
		cards = []Card{b.answerCard(), b.loopCard(), b.betweenCard(), b.liquidCard(), b.budgetCard()}
	} else {
		cards = []Card{b.answerCard(), b.pointCard("1", "in"), b.pointCard("2", "out"), b.betweenCard(), b.liquidCard(), b.budgetCard()}
	}
	if b.wantsSurge() {
		cards = append(cards, b.surgeCard())
	}
	return cards
}

// solvedText is a value of the unknown as the sheet shows it; a pressure
// reads the way its point's gauge reads it (gauge unless the point is
// marked absolute).
func (b *builder) solvedText(v float64) string {
	switch p := b.solve(); p {
	case "p1", "p2":
		if b.in.Choice(p+"ref") == "a" {
			return b.absolute(v)
		}
		return b.gauge(v - b.r.SitePressure)
	default:
		return b.param(p, v)
	}
}

// answerCard is the choice of the unknown and the answer in large type.
func (b *builder) answerCard() Card {
	b.shown["solve"] = true
	cur := b.solve()
	var btns []Button
	for _, c := range scenario.Choices("solve") {
		if b.isLoop() && c.Value != "hp" && c.Value != "q" {
			continue // a loop has no points to solve for
		}
		btns = append(btns, Button{ID: "solve-" + c.Value, Text: c.Label, Class: "seg", On: c.Value == cur,
			Act: Action{Do: "choose", Param: "solve", Value: c.Value}})
	}
	label := solveLabels[cur]
	if label == "" {
		label = cur
	}
	a := &Answer{Label: label + " (the unknown)", NoneID: "answer-value"}
	if br := b.r.Balance; br != nil {
		a.Values = []Value{{"answer-value", b.solvedText(br.Value)}}
		a.Subs = b.answerLines()
		if full, ok := b.fullFlowAnswer(); ok {
			a.Label, a.Values, a.Subs = full.Label, full.Values, append(full.Subs, a.Subs...)
		}
	} else {
		a.None, a.Why = true, b.whyNone(scenario.PartBalance)
	}
	if b.isLoop() {
		a.Label += " · closed loop"
	}
	// A loop offers two unknowns: a grid of two columns, so no empty
	// cells sit in the frame beside them.
	grid := "solve-grid"
	if b.isLoop() {
		grid += " two"
	}
	return Card{ID: "answer-card", Class: "answer-card", Title: "Solve for", Blocks: []Block{
		{Kind: BlockButtons, Class: grid, Buttons: btns},
		maybe(b.problem("solve") != "", text("msg err", "err-solve", b.problem("solve"))),
		{Kind: BlockAnswer, ID: "answer", Answer: a},
		b.warnings(nil, "balance", "run", "site", "liquid"),
		b.loopSwitch(),
	}}
}

// answerLines are the smaller lines under the answer.
func (b *builder) answerLines() []string {
	br := b.r.Balance
	var out []string
	if br.Transitional && br.ValueLow != br.ValueHigh {
		out = append(out, "transitional flow: between "+b.solvedText(br.ValueLow)+" and "+b.solvedText(br.ValueHigh))
	}
	switch p := b.solve(); p {
	case "p1", "p2":
		if b.in.Choice(p+"ref") == "a" {
			out = append(out, b.gauge(br.Value-b.r.SitePressure))
		} else {
			out = append(out, b.absolute(br.Value))
		}
	}
	if br.PumpHead > 0 {
		out = append(out, "hydraulic power of the pump "+b.show(br.PumpPower, calc.Power))
	}
	if br.TurbineHead > 0 {
		out = append(out, "hydraulic power to the turbine "+b.show(br.TurbinePower, calc.Power)+" (before machine losses)")
	}
	out = append(out, "at a flow of "+b.param("q", br.Q)+", "+b.lossesName()+" "+b.head(br.FrictionHead))
	if pr := b.r.Pump; pr != nil && pr.Operating != nil {
		out = append(out, "the data-sheet pump runs at "+b.param("q", pr.Operating.Q)+" and "+b.head(pr.Operating.H)+" (Pump view)")
	}
	return out
}

// lossesName names the balance's friction head by what it holds: the
// components' drops too when the line has any.
func (b *builder) lossesName() string {
	if l := b.r.Line; l != nil && l.ComponentLoss != 0 {
		return "friction, fittings and components"
	}
	return "friction and fittings"
}

// pointCard is one end of the balance.
func (b *builder) pointCard(n, role string) Card {
	p := func(f string) string { return f + n }
	speed := b.quantity(p("v"), "", "")
	if b.d.SideOf("pt"+n) == "d" {
		speed = b.quantity(p("d"), "", "")
	}
	line := ""
	if br := b.r.Balance; br != nil {
		ps := br.In
		if n == "2" {
			ps = br.Out
		}
		line = "velocity " + b.show(ps.Velocity, calc.Velocity)
		if ps.HasRegime {
			line += " · Re " + plainNumber(ps.Reynolds) + " (" + ps.Regime.String() + ")"
		}
		line += " · α " + number(ps.Alpha, 2) + " · total head " + b.head(ps.TotalHead)
	}
	return Card{ID: "point-" + n, Class: "point", Num: n, Title: "Point " + n + " (" + role + ")", Blocks: []Block{
		fields(b.quantity(p("p"), "", "")),
		fields(b.ref(p("p") + "ref")),
		fields(b.quantity(p("z"), "", "")),
		b.toggle("pt" + n),
		fields(speed),
		text("computed", "", line),
	}}
}

// betweenCard holds the flow, the heads and the friction between the points.
func (b *builder) betweenCard() Card {
	blocks := append(b.flowFields(), fields(b.quantity("hp", "", ""), b.quantity("ht", "", "")))
	title := "Between the points"
	if b.isLoop() {
		blocks, title = append(b.flowFields(), fields(b.quantity("hp", "", ""))), "Round the loop"
	}
	if pipe := b.loopPipe(); b.isLoop() && pipe != nil {
		blocks = append(blocks, pipe...)
	} else if n := b.in.Segments; n > 0 {
		blocks = append(blocks, b.lineSummary(n))
	} else {
		blocks = append(blocks, b.toggle("fric"))
		if b.d.SideOf("fric") == "hf" {
			blocks = append(blocks, fields(b.quantity("hf", "", "")))
		} else {
			blocks = append(blocks, b.runInputs(false)...)
			line := ""
			if r := b.r.Run; r != nil {
				line = "pipe friction " + b.head(r.MajorLoss) + " + fittings " + b.head(r.MinorLoss) + " = " +
					b.head(r.TotalLoss) + " · Re " + plainNumber(r.Reynolds) + " (" + r.Regime.String() + ")"
			}
			blocks = append(blocks, text("computed", "run-line", line))
		}
	}
	blocks = append(blocks, fields(b.picker("alpha", "", "")))
	blocks = append(blocks, b.valveBlocks()...)
	return Card{ID: "between", Class: "between", Title: title, Blocks: blocks}
}

// budgetCard is "Where the head goes": each term of the balance as a bar.
func (b *builder) budgetCard() Card {
	c := Card{ID: "budget", Class: "budget", Title: "Where the head goes"}
	br := b.r.Balance
	if br == nil {
		c.Blocks = []Block{text("muted", "", "Shown once the balance has an answer.")}
		return c
	}
	maxAbs := 0.0
	for _, it := range br.Budget {
		maxAbs = math.Max(maxAbs, math.Abs(it.Head))
	}
	if maxAbs == 0 {
		maxAbs = 1
	}
	unknown := b.solve()
	units := "metres"
	if b.us {
		units = "feet"
	}
	bud := &Budget{Note: "Heads in " + units + " of the liquid, gauge basis; elevations measured from the lower point. Terms that are zero are left out. Hatched bars are negative."}
	sides := []struct {
		sign  int
		title string
	}{{+1, "Supplied at point 1 and by the pump"}, {-1, "Used at point 2, by the line and the turbine"}}
	if b.isLoop() { // one point: nothing held or given there
		sides[0].title, sides[1].title = "Supplied by the pump", "Used round the loop"
	}
	for _, side := range sides {
		bs := BudgetSide{Title: side.title}
		total := 0.0
		for _, it := range br.Budget {
			if it.Side != side.sign {
				continue
			}
			total += it.Head
			isUnknown := it.Key == unknown || (unknown == "hf" && (it.Key == "major" || it.Key == "minor"))
			if it.Head == 0 && !isUnknown {
				continue
			}
			bs.Rows = append(bs.Rows, BudgetRow{Label: b.budgetLabel(it.Key, it.Label), Head: b.head(it.Head), Pressure: b.show(it.Pressure, calc.Pressure),
				Width: int(math.Round(math.Abs(it.Head) / maxAbs * 100)), Negative: it.Head < 0, Unknown: isUnknown})
		}
		bs.Total = b.head(total)
		bud.Sides = append(bud.Sides, bs)
	}
	c.Blocks = []Block{{Kind: BlockBudget, Budget: bud}}
	return c
}

// budgetLabels name the terms of the balance by their key.
var budgetLabels = map[string]string{
	"p1": "pressure head at 1", "v1": "velocity head at 1", "z1": "elevation of 1 above the lower point", "hp": "added by the pump",
	"p2": "pressure head at 2", "v2": "velocity head at 2", "z2": "elevation of 2 above the lower point", "ht": "taken by the turbine",
	"major": "pipe friction", "minor": "fittings", "hf": "friction and other losses",
}

// budgetLabel names a budget term; with a line of segments the fittings'
// term also holds the changes of diameter. A key this table lacks keeps
// calc's words.
func (b *builder) budgetLabel(key, fallback string) string {
	if key == "minor" && b.r.Balance != nil && b.r.Balance.Line != nil {
		return "fittings and changes of diameter"
	}
	if l := budgetLabels[key]; l != "" {
		return l
	}
	return fallback
}
