package present

import (
	"math"
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The Pump view: where the pump runs on the line, the NPSH margin, the
// pump and system chart, the data sheet, the pump as installed, the field
// check from gauge readings and, for a line that feeds a turbine, the
// turbine's output.

// pumpView is the Pump view. With the balance solved for a turbine head it
// shows the turbine side instead.
func (b *builder) pumpView() []Card {
	if b.solve() == "ht" {
		return []Card{b.turbineCard(), b.surgeCard(), b.profileCard(), {ID: "pump-side", Title: "Pump side", Blocks: []Block{
			text("muted", "", "The pump's operating point, NPSH and data sheet apply when the balance solves for the pump head."),
			{Kind: BlockButtons, Buttons: []Button{{ID: "to-hp", Text: "Solve for the pump head", Class: "act",
				Act: Action{Do: "choose", Param: "solve", Value: "hp"}}}},
		}}}
	}
	cards := []Card{b.operatingCard(), b.npshCard(), b.pumpChartCard(), b.dataSheetCard(), b.pumpSetupCard(),
		b.liquidCard(), b.fieldCard(), b.testCard(), b.energyCard()}
	if b.in.Given("etat") {
		cards = append(cards, b.turbineCard())
	}
	return cards
}

// operatingCard is where the pump runs on the line.
func (b *builder) operatingCard() Card {
	b.shown["solve"] = true
	pr := b.r.Pump
	a := &Answer{Label: "Operating point", None: true, NoneID: "op-q"}
	switch {
	case pr == nil:
		a.Why = "Enter the pump's data sheet below: at least three flows and heads."
		if b.in.Given("pq") || b.in.Given("ph") {
			a.Why = b.whyNone(scenario.PartPump)
		}
	case pr.Operating == nil:
		for _, p := range []string{"pq", "ph", "spd", "pumps"} {
			if m := b.problem(p); m != "" {
				a.Why = m
				break
			}
		}
		if a.Why == "" {
			a.Why = b.whyNone(scenario.PartOperating)
		}
	default:
		op := pr.Operating
		a = &Answer{Label: "Operating point: flow and head",
			Values: []Value{{"op-q", b.param("q", op.Q)}, {"op-h", b.head(op.H)}}}
		if br := b.r.Balance; br != nil && br.Solve == calc.SolvePumpHead {
			a.Subs = []string{"duty asked for " + b.param("q", br.Q) + ": the line needs " + b.head(br.Value) + " there"}
		}
	}
	facts := b.operatingFacts()
	return Card{ID: "operating", Class: "answer-card", Title: "Where the pump runs", Blocks: []Block{
		{Kind: BlockAnswer, ID: "answer", Answer: a},
		maybe(facts != nil, Block{Kind: BlockFacts, Class: "facts", Facts: facts}),
		maybe(b.problem("solve") != "", text("msg err", "err-solve", b.problem("solve"))),
		b.warnings(nil, "pump", "balance"),
	}}
}

// operatingFacts are the figures at the operating point, nil without one.
func (b *builder) operatingFacts() []Fact {
	pr := b.r.Pump
	if pr == nil || pr.Operating == nil {
		return nil
	}
	op := pr.Operating
	eff, shaft := "not known (no efficiencies on the data sheet)", "not known (needs the efficiency)"
	if op.Eff > 0 {
		eff = percent(op.Eff)
	}
	if op.ShaftPower > 0 {
		shaft = b.show(op.ShaftPower, calc.Power)
	}
	out := []Fact{
		{ID: "op-eff", Label: "pump efficiency η", Value: eff},
		{ID: "op-shaft", Label: "power at the pump shaft", Value: shaft},
		{ID: "op-hyd", Label: "hydraulic power (to the liquid)", Value: b.show(op.HydraulicPower, calc.Power)},
	}
	if op.NPSHr > 0 {
		out = append(out, Fact{Label: "NPSH required here", Value: b.head(op.NPSHr)})
	}
	return append(out, Fact{Label: "pumps running", Value: curveName(pr)})
}

// curveName says which pump curve is drawn: the data sheet's single pump,
// or the pumps as they run (speed, arrangement).
func curveName(pr *scenario.PumpResult) string {
	name := "one pump"
	if pr.Count > 1 {
		arr := "in series"
		if pr.Parallel {
			arr = "in parallel"
		}
		name = countWord(pr.Count) + " pumps " + arr
	}
	if pr.Speed != 1 {
		return name + " at " + percent(pr.Speed) + " speed"
	}
	return name + " at full speed"
}

// countWord writes a small count in words.
func countWord(n int) string {
	words := []string{"", "one", "two", "three", "four", "five", "six", "seven", "eight"}
	if n > 0 && n < len(words) {
		return words[n]
	}
	return plainNumber(float64(n))
}

// npshLevel is the margin's verdict in words and its badge class.
func npshLevel(l calc.NPSHLevel) (text, class string) {
	switch l {
	case calc.NPSHOK:
		return "✓ Margin adequate", "lvl-ok"
	case calc.NPSHCaution:
		return "⚠ Caution: small margin", "lvl-caution"
	case calc.NPSHDanger:
		return "✕ Danger: the pump will cavitate", "lvl-danger"
	}
	return "NPSH required not given: no margin to judge", "lvl-none"
}

// npshBlocks are the NPSH verdict, its breakdown and its note; each is an
// empty block without an NPSH result.
func (b *builder) npshBlocks() (level, facts, note Block) {
	n := b.r.NPSH
	if n == nil {
		e := Block{Kind: BlockEmpty}
		return e, e, e
	}
	t, cls := npshLevel(n.Level)
	level = Block{Kind: BlockLevel, ID: "npsh-level", Class: cls, Text: t}
	signed := func(v float64) string {
		if v < 0 {
			return "− " + b.head(-v)
		}
		return "+ " + b.head(v)
	}
	src := "pressure on the source surface (" + b.absolute(n.SurfacePressure) + ")"
	if b.r.SitePressure > 0 && math.Abs(n.SurfacePressure-b.r.SitePressure) < 1 {
		src = "atmosphere on the source surface (site pressure " + b.absolute(b.r.SitePressure) + ")"
	}
	static := "source surface above the pump centreline"
	if n.StaticHead < 0 {
		static = "source surface below the pump centreline (suction lift)"
	}
	if b.isLoop() { // the loop's level is set where its vessel connects
		src = "the loop's static pressure at the vessel's connection (" + b.absolute(n.SurfacePressure) + ")"
		static = "connection above the pump centreline"
		if n.StaticHead < 0 {
			static = "connection below the pump centreline"
		}
	}
	loss := "suction losses"
	switch sc := b.r.NPSHSuction; {
	case sc.Typed:
		loss += " (typed)"
	case sc.After == 1:
		loss += " (segment 1, at " + b.param("q", b.r.NPSHFlow) + ")"
	case sc.After > 1:
		loss += " (segments 1 to " + strconv.Itoa(sc.After) + ", at " + b.param("q", b.r.NPSHFlow) + ")"
	default:
		loss += " (none: no suction pipe given)"
	}
	fs := []Fact{
		{ID: "npsh-p", Label: src, Value: signed(n.PressureHead)},
		{ID: "npsh-z", Label: static, Value: signed(n.StaticHead)},
		{ID: "npsh-loss", Label: loss, Value: signed(-n.LossHead)},
		{ID: "npsh-pv", Label: "vapour pressure of the liquid (" + b.absolute(b.r.Fluid.VapourPressure) + ")", Value: signed(-n.VapourHead)},
		{ID: "npsh-a", Label: "NPSH available", Value: b.head(n.Available), Key: true},
	}
	if n.Level != calc.NPSHUnrated {
		from := "typed"
		if !b.in.Given("npshr") {
			from = "data sheet, at " + b.param("q", b.r.NPSHFlow)
		}
		fs = append(fs,
			Fact{ID: "npsh-r", Label: "NPSH required (" + from + ")", Value: b.head(n.Required)},
			Fact{ID: "npsh-margin", Label: "margin", Value: b.head(n.Margin), Key: true},
			Fact{ID: "npsh-ratio", Label: "ratio available ÷ required (at least 1.1, ANSI/HI 9.6.1, from memory)", Value: number(n.Ratio, 3)},
		)
	}
	return level, Block{Kind: BlockFacts, ID: "npsh-facts", Class: "facts", Facts: fs}, text("note-text", "npsh-note", b.caution(n.Note))
}

// npshCard is NPSH available against required, from the suction side
// alone: the source, the pump's height, the suction loss and the NPSH the
// pump requires, each box in the card.
func (b *builder) npshCard() Card {
	why := "Enter the pump centreline elevation to work out the NPSH available."
	if b.in.Given("zp") {
		why = b.whyNone(scenario.PartNPSH)
	}
	typed := b.d.SideOf("npsh") == "typed"
	level, facts, note := b.npshBlocks()
	suction := Block{Kind: BlockEmpty}
	if n := b.in.Segments; n > 0 && !b.in.Given("hs") {
		suction = fields(b.pumpPlace(n))
	}
	return Card{ID: "npsh", Class: "npsh", Title: "Cavitation check (NPSH), suction side", Blocks: []Block{
		maybe(b.r.NPSH == nil, text("muted", "npsh-why", why)),
		level, facts, note,
		b.warnings(nil, "npsh", "site", "liquid"),
		{Kind: BlockHeading, Text: "Suction side"},
		b.npshSource(),
		b.npshLevels(),
		fields(b.quantity("hs", "", "")),
		suction,
		b.toggle("npsh"),
		maybe(typed, fields(b.quantity("npshr", "", ""))),
	}}
}

// npshSource is the box of the pressure that sets the suction's level:
// on an open line the source surface's, on a closed loop the static
// pressure where the expansion vessel or pressurisation unit connects.
func (b *builder) npshSource() Block {
	if b.isLoop() {
		return fields(b.quantity("pexp", "", ""), b.ref("pexpref"))
	}
	return fields(b.quantity("p1", "Pressure on the source surface", "(0 gauge: open to the air)"), b.ref("p1ref"))
}

// npshLevels are the elevations of that pressure's point and of the pump.
func (b *builder) npshLevels() Block {
	if b.isLoop() {
		return fields(b.quantity("zexp", "", ""), b.quantity("zp", "", ""))
	}
	return fields(b.quantity("z1", "Source surface elevation", ""), b.quantity("zp", "", ""))
}

// pumpChartCard holds the pump and system chart.
func (b *builder) pumpChartCard() Card {
	pr := b.r.Pump
	// The chart's language (DEVELOPERS.md, "chart language") in words.
	caption := "Heavy accent line: the pump's head curve as it runs, through the data sheet's points (filled dots). Dashed ink: the head the line needs at each flow. They cross at the operating point (ringed). Each line is named at its end."
	if pr != nil && len(pr.System) > 0 {
		caption += " At zero flow the line needs " + b.head(pr.System[0].H) + " (levels and pressures alone); the rest is friction, fittings and velocity head."
	}
	if pr != nil && pr.BEP != nil {
		caption += " The tinted band is the preferred operating region, 70–120 % of the best-efficiency flow (ANSI/HI 9.6.3, from memory), around the best-efficiency point (filled triangle)."
	}
	if b.r.Field != nil {
		caption += " The open ring is the field check's measured flow and head"
		if b.r.FieldBands != nil {
			caption += "; the box around it spans the readings' uncertainty, ± flow across and ± head up and down"
		}
		caption += "."
	}
	caption += b.testCaption()
	if pr != nil && pr.SpeedFor != nil {
		caption += " A thinner accent curve is the pump at the speed that meets the flow asked for."
	}
	if pr != nil && pr.Curve.HasEfficiency() {
		caption += " The strip below: the pump's efficiency at each flow."
	}
	if pr != nil && (pr.Curve.HasNPSHr() || len(pr.NPSHa) > 0) {
		caption += " Bottom strip: NPSH the pump requires (solid) and NPSH available at its inlet (dashed); available must stay above required."
	}
	return Card{ID: "pump-chart-card", Class: "chart-card", Title: "Pump and system curves", Blocks: []Block{
		maybe(pr == nil, text("muted", "", "Drawn once the data sheet has at least three points.")),
		b.pumpChart("pump-chart", caption),
	}}
}

// chartSamples is the number of flows a fitted curve is drawn through.
const chartSamples = 61

// sampleCurve evaluates f at chartSamples flows from lo to hi and returns
// them in display units; flows where f has no value are left out.
func sampleCurve(lo, hi float64, f func(q float64) (float64, bool), xu, yu calc.Unit) (xs, ys []float64) {
	if !(hi > lo) {
		return nil, nil
	}
	for i := 0; i < chartSamples; i++ {
		q := lo + (hi-lo)*float64(i)/float64(chartSamples-1)
		if i == chartSamples-1 {
			q = hi
		}
		if y, ok := f(q); ok {
			xs, ys = append(xs, xu.FromSI(q)), append(ys, yu.FromSI(y))
		}
	}
	return xs, ys
}

// curvePoints converts points of a curve into display units.
func curvePoints(pts []calc.CurvePoint, xu, yu calc.Unit) (xs, ys []float64) {
	for _, p := range pts {
		xs, ys = append(xs, xu.FromSI(p.Q)), append(ys, yu.FromSI(p.H))
	}
	return xs, ys
}

// pumpChart is the pump and system chart in display units, an empty block
// when there is no pump curve.
func (b *builder) pumpChart(id, caption string) Block {
	pr := b.r.Pump
	if pr == nil {
		return Block{Kind: BlockEmpty}
	}
	qu, hu := displayUnit("q", b.us), displayUnit("hp", b.us)
	ch := &Chart{ID: id, Kind: "pump", Caption: caption, Title: "Pump against the line",
		XLabel: "flow Q (" + qu.Symbol + ")", YLabel: "head H (" + hu.Symbol + ")"}
	add := func(role CurveRole, name string, xs, ys []float64) {
		if len(xs) > 0 {
			ch.Curves = append(ch.Curves, Curve{Role: role, Name: name, X: xs, Y: ys})
		}
	}
	c := pr.Curve
	xs, ys := sampleCurve(c.MinFlow(), c.MaxFlow(), c.Head, qu, hu)
	add(RolePump, curveName(pr), xs, ys)
	if pr.Speed != 1 || pr.Count > 1 {
		base := pr.Base
		xs, ys = sampleCurve(base.MinFlow(), base.MaxFlow(), base.Head, qu, hu)
		add(RolePumpBase, "data sheet, one pump at full speed", xs, ys)
	}
	var pts []calc.CurvePoint
	for _, p := range pr.Base.Points() {
		pts = append(pts, calc.CurvePoint{Q: p.Q, H: p.H})
	}
	xs, ys = curvePoints(pts, qu, hu)
	add(RoleDataPoints, "data-sheet points", xs, ys)
	if len(pr.System) > 0 {
		xs, ys = curvePoints(pr.System, qu, hu)
		add(RoleSystem, "system curve of the line", xs, ys)
		if last := pr.System[len(pr.System)-1].Q; last > c.MaxFlow() {
			x0 := qu.FromSI(c.MaxFlow())
			ch.Bands = append(ch.Bands, Band{X0: x0, X1: x0 - 1, Label: "beyond the data sheet"})
		}
	}
	if op := pr.Operating; op != nil {
		ch.Markers = append(ch.Markers, Marker{X: qu.FromSI(op.Q), Y: hu.FromSI(op.H),
			Label: "operating point\n" + b.param("q", op.Q) + ", " + b.head(op.H)})
	}
	if lo, hi, drooping := c.Unstable(); drooping {
		ch.Bands = append(ch.Bands, Band{X0: qu.FromSI(lo), X1: qu.FromSI(hi), Label: "head rises with flow: unstable"})
	}
	if bep := pr.BEP; bep != nil {
		lo, hi := bep.Region()
		ch.Bands = append(ch.Bands, Band{X0: qu.FromSI(lo), X1: qu.FromSI(hi), Keep: true,
			Label: "preferred region"}) // its bounds are in the caption and the facts: a band's label must fit a phone's chart
		ch.Markers = append(ch.Markers, Marker{X: qu.FromSI(bep.Q), Y: hu.FromSI(bep.H), Role: MarkPeak,
			Label: "best efficiency\n" + b.param("q", bep.Q) + ", " + percent(bep.Eff)})
	}
	b.testChart(ch, qu, hu)
	if f := b.r.Field; f != nil && f.Head > 0 && b.r.Test == nil {
		label := "measured\n" + b.param("qm", f.Q) + ", " + b.head(f.Head)
		m := Marker{X: qu.FromSI(f.Q), Y: hu.FromSI(f.Head), Role: MarkMeasured}
		if u := b.r.FieldBands; u != nil {
			label += " ± " + b.head(u.Head.U)
			// The box spans the band either side: in display units, as a
			// difference (no offset in any flow or length unit).
			m.DX, m.DY = qu.FromSI(f.Q+u.Flow.U)-m.X, hu.FromSI(f.Head+u.Head.U)-m.Y
		}
		m.Label = label
		ch.Markers = append(ch.Markers, m)
	}
	if sf := pr.SpeedFor; sf != nil {
		xs, ys = sampleCurve(sf.Curve.MinFlow(), sf.Curve.MaxFlow(), sf.Curve.Head, qu, hu)
		goal := b.param("qsp", sf.Q)
		if sf.ByHead {
			goal = b.head(sf.H)
		}
		add(RoleSpeed, "at "+percent(sf.Ratio)+" speed for "+goal, xs, ys)
	}
	if c.HasEfficiency() {
		pct := displayUnit("peff", b.us)
		xs, ys = sampleCurve(c.MinFlow(), c.MaxFlow(), c.Efficiency, qu, pct)
		add(RoleEfficiency, "pump efficiency η", xs, ys)
		ch.Y2Label = "efficiency η (" + pct.Symbol + ")"
	}
	if c.HasNPSHr() {
		xs, ys = sampleCurve(c.MinFlow(), c.MaxFlow(), c.NPSHr, qu, hu)
		add(RoleNPSHRequired, "NPSH required", xs, ys)
	}
	if len(pr.NPSHa) > 0 {
		xs, ys = curvePoints(pr.NPSHa, qu, hu)
		add(RoleNPSHAvailable, "NPSH available", xs, ys)
	}
	if c.HasNPSHr() || len(pr.NPSHa) > 0 {
		ch.Y3Label = "NPSH (" + hu.Symbol + ")"
	}
	return Block{Kind: BlockChart, ID: id, Text: caption, Chart: ch}
}

// dataColumns are the data sheet's columns: a list parameter each.
var dataColumns = []struct {
	param, head, name string
	optional          bool
}{
	{"pq", "Flow Q", "flow", false},
	{"ph", "Head H", "head", false},
	{"peff", "η", "efficiency", true},
	{"pnpsh", "NPSHr", "NPSH required", true},
}

// dataSheetCard is the data-sheet table: MinRows to MaxRows rows of Q, H
// and, when given, η and NPSHr.
func (b *builder) dataSheetCard() Card {
	n := b.d.RowCount()
	cols := dataColumns
	if b.d.SideOf("npsh") == "typed" {
		cols = cols[:3]
	}
	ds := &DataSheet{Note: "Points read off the maker's curve for one pump at full speed, lowest flow first (" +
		strconv.Itoa(scenario.MinRows) + " to " + strconv.Itoa(scenario.MaxRows) +
		"). Efficiency and NPSH required are optional, but give them at every point or not at all."}
	cells := map[string][]string{}
	for _, c := range cols {
		b.shown[c.param] = true
		ds.Columns = append(ds.Columns, Column{Param: c.param, Head: c.head, Name: c.name, Optional: c.optional,
			UnitID: "unit-" + c.param, Units: b.unitOptions(c.param, "", b.d.ListUnit(c.param)), Error: b.problem(c.param)})
		vs, _ := b.d.Cells(c.param)
		for len(vs) < n {
			vs = append(vs, "")
		}
		cells[c.param] = vs
		f := b.field(c.param, FieldPlain, "Data-sheet "+c.name+" ("+c.param+"), comma separated, unit after the last", "")
		f.Box = b.d.Typed(c.param)
		if b.d.Edit == c.param {
			f.Box = b.d.Text
		}
		ds.AsText = append(ds.AsText, f)
	}
	for i := 0; i < n; i++ {
		num := strconv.Itoa(i + 1)
		row := DataRow{Num: num, Remove: Button{ID: "row-del-" + num, Text: "✕", Label: "remove point " + num, Class: "step",
			Disabled: n <= scenario.MinRows, Act: Action{Do: "row-remove", N: i}}}
		for _, c := range cols {
			row.Cells = append(row.Cells, DataCell{ID: "in-" + c.param + "-" + strconv.Itoa(i), Text: cells[c.param][i],
				Label: c.name + ", point " + num, Bad: b.r.Errors[c.param] != nil, Param: c.param, Row: i})
		}
		ds.Rows = append(ds.Rows, row)
	}
	ds.Add = Button{ID: "row-add", Text: "+ Add a point", Class: "act", Disabled: n >= scenario.MaxRows, Act: Action{Do: "row-add"}}
	return Card{ID: "datasheet-card", Title: "Pump data sheet", Blocks: []Block{
		{Kind: BlockDataSheet, ID: "datasheet", Class: "grid datasheet", DataSheet: ds},
	}}
}

// pumpSetupCard is the speed, the arrangement, the pump's elevation and
// the NPSH it requires.
func (b *builder) pumpSetupCard() Card {
	return Card{ID: "pump-setup", Title: "Pump as installed", Blocks: []Block{
		fields(b.quantity("spd", "", ""), b.picker("pumps", "", "")),
		fields(b.quantity("nrat", "", ""), b.quantity("fmains", "", "")),
		b.toggle("spfor"),
		maybe(b.d.SideOf("spfor") != "h", fields(b.quantity("qsp", "", ""))),
		maybe(b.d.SideOf("spfor") == "h", fields(b.quantity("hsp", "", ""))),
		b.speedFacts(),
	}}
}

// speedFacts are the running speed in rpm or Hz and the speed solved for
// a flow; an empty block without them.
func (b *builder) speedFacts() Block {
	pr := b.r.Pump
	if pr == nil {
		return Block{Kind: BlockEmpty}
	}
	inUnits := func(r float64) string {
		var parts []string
		if pr.Rated > 0 {
			parts = append(parts, b.show(r*pr.Rated, calc.Frequency))
		}
		if pr.Mains > 0 {
			parts = append(parts, "drive at "+b.param("fmains", r*pr.Mains))
		}
		if len(parts) == 0 {
			return ""
		}
		return " (" + strings.Join(parts, ", ") + ")"
	}
	var fs []Fact
	if pr.Speed != 1 || pr.Rated > 0 {
		fs = append(fs, Fact{ID: "speed-now", Label: "speed used", Value: percent(pr.Speed) + " of the data sheet's" + inUnits(pr.Speed)})
	}
	if sf := pr.SpeedFor; sf != nil {
		what := b.param("qsp", sf.Q)
		if sf.ByHead {
			what = "a head of " + b.head(sf.H) + " (at " + b.param("qsp", sf.Q) + ")"
		}
		fs = append(fs, Fact{ID: "speed-for", Label: "speed for " + what + " on this line (affinity laws)",
			Value: percent(sf.Ratio) + inUnits(sf.Ratio), Key: true},
			Fact{Label: "head the line needs at that flow", Value: b.head(sf.H)})
	}
	if fs == nil {
		return Block{Kind: BlockEmpty}
	}
	return Block{Kind: BlockFacts, ID: "speed-results", Class: "facts", Facts: fs}
}

// fieldCard is the field check: gauge readings in, the pump's real
// performance out.
func (b *builder) fieldCard() Card {
	facts := b.fieldFacts()
	return Card{ID: "field", Title: "Field check from gauge readings", Blocks: []Block{
		fields(b.plain("tag", "", "", false)),
		fields(b.quantity("ps", "", ""), b.quantity("pd", "", "")),
		fields(b.quantity("zs", "", ""), b.quantity("zd", "", "")),
		b.toggle("gsp"),
		b.gaugePipe("gsp", "ds", "dsn", "dss"),
		b.toggle("gdp"),
		b.gaugePipe("gdp", "dd", "ddn", "dds"),
		fields(b.quantity("qm", "", ""), b.quantity("pin", "", ""), b.quantity("etam", "", "")),
		maybe(facts != nil, Block{Kind: BlockFacts, ID: "field-results", Class: "facts", Facts: facts}),
		{Kind: BlockHeading, Text: "How sure the test is: each instrument's accuracy"},
		fields(b.quantity("gcs", "", ""), b.quantity("gss", "", "")),
		fields(b.quantity("gcd", "", ""), b.quantity("gsd", "", "")),
		fields(b.quantity("uqm", "", ""), b.quantity("upin", "", ""), b.quantity("uz", "", "")),
		b.bandBlock(),
		fields(b.picker("grade", "", "no grade: no verdict")),
		b.verdictBlock(),
		b.verdictFacts(),
		b.warnings(nil, "field"),
	}}
}

// gaugePipe is the pipe at a gauge: its inside diameter, or a nominal size
// and schedule from the catalogues, as the group's switch says.
func (b *builder) gaugePipe(group, d, nps, sch string) Block {
	if b.d.SideOf(group) == "nps" {
		return fields(b.picker(nps, "", "pick a size"), b.picker(sch, "", "pick a schedule or class"))
	}
	return fields(b.quantity(d, "", ""))
}

// readingName names a reading for the sentence "improve …".
func readingName(p string) string {
	switch p {
	case "ps", "pd":
		return "the " + strings.TrimSuffix(scenario.Label(p), " reading") + " (a finer class or a span closer to the reading)"
	case "qm":
		return "the flow meter"
	case "pin":
		return "the power meter"
	case "zs", "zd":
		return "the gauges' heights (measure them, e.g. with a level)"
	}
	return scenario.Label(p)
}

// bandBlock shows each result of the field check as value ± band and the
// reading that dominates it; an empty block without accuracies.
func (b *builder) bandBlock() Block {
	f, u := b.r.Field, b.r.FieldBands
	if f == nil || u == nil {
		return Block{Kind: BlockEmpty}
	}
	most := func(bd calc.Band) string {
		if d := bd.Dominant(); d != "" {
			return "; mostly from " + readingName(d)
		}
		return ""
	}
	fs := []Fact{
		{ID: "band-head", Label: "pump head", Value: b.head(f.Head) + " " + whole("± "+b.head(u.Head.U)) + most(u.Head), Key: true},
		{ID: "band-power", Label: "hydraulic power", Value: b.show(f.HydraulicPower, calc.Power) + " " + whole("± "+b.show(u.Power.U, calc.Power)) + most(u.Power)},
	}
	if f.Efficiency > 0 {
		fs = append(fs, Fact{ID: "band-wire", Label: "wire-to-water efficiency", Value: percent(f.Efficiency) + " " + whole("± "+percent(u.Wire.U)) + most(u.Wire)})
	}
	if f.PumpEfficiency > 0 {
		fs = append(fs, Fact{ID: "band-pump", Label: "efficiency of the pump alone", Value: percent(f.PumpEfficiency) + " " + whole("± "+percent(u.Pump.U)) + most(u.Pump), Key: true})
	}
	fs = append(fs, Fact{Label: "how the bands are found", Value: "each accuracy taken as a limit (±); the limits added in quadrature, first order (the GUM's law of propagation); density, pipe sizes and motor efficiency taken as exact"})
	return Block{Kind: BlockFacts, ID: "field-bands", Class: "facts", Facts: fs}
}

// verdictBlock is the acceptance verdict's badge; empty without one.
func (b *builder) verdictBlock() Block {
	a := b.r.Acceptance
	if a == nil {
		return Block{Kind: BlockEmpty}
	}
	g := "grade " + a.Grade.Name
	switch a.Verdict {
	case calc.Within:
		return Block{Kind: BlockLevel, ID: "accept-level", Class: "lvl-ok", Text: "✓ Within " + g + " at this flow"}
	case calc.Outside:
		return Block{Kind: BlockLevel, ID: "accept-level", Class: "lvl-danger", Text: "✕ Outside " + g + " at this flow"}
	}
	return Block{Kind: BlockLevel, ID: "accept-level", Class: "lvl-caution", Text: "? This test cannot tell: the band of the readings reaches across a limit of " + g + "; improve " + readingName(a.Improve)}
}

// verdictFacts are what the verdict compares; nil block without one.
func (b *builder) verdictFacts() Block {
	a, f := b.r.Acceptance, b.r.Field
	if a == nil || f == nil {
		return Block{Kind: BlockEmpty}
	}
	word := map[calc.Verdict]string{calc.Within: "within", calc.Outside: "outside", calc.CannotTell: "cannot tell"}
	fs := []Fact{{ID: "accept-head", Label: "head allowed at this flow (data sheet's " + b.head(f.CurveHead) + ")",
		Value: b.head(a.Head.Low) + " to " + b.head(a.Head.High) + ": " + word[a.Head.Verdict]}}
	if a.Efficiency.Verdict != calc.VerdictNone {
		fs = append(fs, Fact{ID: "accept-eff", Label: "pump efficiency allowed (data sheet's " + percent(f.CurveEfficiency) + ")",
			Value: "at least " + percent(a.Efficiency.Low) + ": " + word[a.Efficiency.Verdict]})
	} else {
		fs = append(fs, Fact{Label: "pump efficiency", Value: "not judged (needs the electrical input and the motor efficiency)"})
	}
	fs = append(fs, Fact{Label: "tolerances", Value: "ISO 9906 grade " + a.Grade.Name + ", quoted from memory; the flow tolerance is not used for a single point, so the verdict is the stricter"})
	return Block{Kind: BlockFacts, ID: "accept-facts", Class: "facts", Facts: fs}
}

// fieldFacts are the field check's figures, nil without a field check.
func (b *builder) fieldFacts() []Fact {
	f := b.r.Field
	if f == nil {
		return nil
	}
	out := []Fact{
		{ID: "field-head", Label: "pump head delivered", Value: b.head(f.Head), Key: true},
		{Label: "of which: gauge pressure difference", Value: b.head(f.PressureHead)},
		{Label: "gauge height difference", Value: b.head(f.ElevationHead)},
		{Label: "velocity head difference", Value: b.head(f.VelocityHead)},
		{ID: "field-power", Label: "hydraulic power", Value: b.show(f.HydraulicPower, calc.Power)},
	}
	if f.Efficiency > 0 {
		out = append(out, Fact{ID: "field-eff", Label: "wire-to-water efficiency", Value: percent(f.Efficiency), Key: true})
	}
	if f.PumpEfficiency > 0 {
		out = append(out,
			Fact{ID: "field-shaft", Label: "power at the pump shaft (input × motor efficiency)", Value: b.show(f.ShaftPower, calc.Power)},
			Fact{ID: "field-pump-eff", Label: "efficiency of the pump alone", Value: percent(f.PumpEfficiency), Key: true})
	}
	if f.HasCurve {
		out = append(out,
			Fact{Label: "data-sheet head at this flow", Value: b.head(f.CurveHead)},
			Fact{ID: "field-dev", Label: "below (−) or above the data sheet",
				Value: b.head(f.Deviation) + " (" + number(f.DeviationPct, 3) + " %)"},
		)
		if f.CurveEfficiency > 0 {
			out = append(out, Fact{Label: "data-sheet pump efficiency here (pump alone)", Value: percent(f.CurveEfficiency)})
		}
		if f.HasEffDeviation {
			out = append(out, Fact{ID: "field-eff-dev", Label: "pump efficiency below (−) or above the data sheet",
				Value: signed(f.EffDeviation*100) + " percentage points"})
		}
	}
	if pr := b.r.Pump; pr != nil && pr.SingleBEP != nil {
		bep := pr.SingleBEP
		lo, hi := bep.Region()
		out = append(out,
			Fact{ID: "field-bep", Label: "measured flow as a share of the best-efficiency flow (" + b.param("q", bep.Q) + ")", Value: percent(f.Q / bep.Q)},
			Fact{Label: "preferred operating region (ANSI/HI 9.6.3, from memory)", Value: b.param("q", lo) + " to " + b.param("q", hi)})
	}
	return out
}

// signed writes a number with its sign, three significant digits: "+2.1",
// "−5.72".
func signed(v float64) string {
	if v > 0 {
		return "+" + number(v, 3)
	}
	return number(v, 3)
}

// energyCard is the energy used per volume pumped and its yearly cost.
func (b *builder) energyCard() Card {
	facts := b.energyFacts()
	return Card{ID: "energy", Title: "Energy per volume pumped", Blocks: []Block{
		maybe(facts == nil, text("muted", "", "Worked out from the field check's measured input, or from the operating point when the data sheet has efficiencies.")),
		maybe(facts != nil, Block{Kind: BlockFacts, ID: "energy-results", Class: "facts", Facts: facts}),
		fields(b.plain("hours", "", "", true), b.plain("tariff", "", "", true)),
	}}
}

// energyFacts are the specific energy figures, nil without them.
func (b *builder) energyFacts() []Fact {
	en := b.r.Energy
	if en == nil {
		return nil
	}
	basis := "the measured electrical input (" + b.show(en.Power, calc.Power) + ")"
	switch {
	case !en.Measured && en.Shaft:
		basis = "the shaft power at the operating point (" + b.show(en.Power, calc.Power) + "; motor losses not included: give the motor efficiency)"
	case !en.Measured:
		basis = "the operating point's shaft power over the motor efficiency (" + b.show(en.Power, calc.Power) + ")"
	}
	out := []Fact{
		{ID: "energy-vol", Label: "energy per volume", Value: b.show(en.PerVolume, calc.SpecificEnergy), Key: true},
		{ID: "energy-head", Label: "per volume and head", Value: b.show(en.PerVolumeHead, calc.SpecificEnergyHead)},
		{ID: "energy-ideal", Label: "least possible (ρ·g·H, a loss-free set)", Value: b.show(en.Ideal, calc.SpecificEnergy) + " · " + b.show(en.IdealHead, calc.SpecificEnergyHead)},
		{Label: "worked out from", Value: basis + " at " + b.param("q", en.Q) + " and " + b.head(en.H)},
	}
	if en.YearCost > 0 {
		out = append(out, Fact{ID: "energy-cost", Label: "cost per year (running hours × input power × tariff)", Value: plainNumber(en.YearCost) + " in the tariff's currency", Key: true})
	}
	return out
}

// turbineCard is the turbine's output on the line (solve=ht).
func (b *builder) turbineCard() Card {
	t := b.r.Turbine
	solved := b.solve() == "ht"
	// The turbine's answer is the page's answer when the view is the
	// turbine side; beside the operating point it keeps an id of its own.
	id := "turb-answer"
	if solved {
		id = "answer"
	}
	var a *Answer
	switch {
	case t != nil:
		a = &Answer{Label: "Output at " + b.param("q", t.Q), Values: []Value{{"turb-power", b.show(t.Power, calc.Power)}}}
	case solved:
		a = &Answer{None: true, NoneID: "turb-power", Why: b.whyNone(scenario.PartTurbine)}
	}
	facts := b.turbineFacts()
	offer := t == nil && !solved
	return Card{ID: "turbine", Class: "answer-card", Title: "Turbine on the line", Blocks: []Block{
		fields(b.quantity("etat", "", "")),
		maybe(a != nil, Block{Kind: BlockAnswer, ID: id, Answer: a}),
		maybe(facts != nil, Block{Kind: BlockFacts, Class: "facts", Facts: facts}),
		maybe(offer, text("muted", "", "The output needs the balance solved for the turbine head.")),
		maybe(offer, Block{Kind: BlockButtons, Buttons: []Button{{ID: "to-ht", Text: "Solve for the turbine head", Class: "act",
			Act: Action{Do: "choose", Param: "solve", Value: "ht"}}}}),
		b.warnings(nil, "turbine", "balance"),
	}}
}

// turbineFacts are the turbine's figures at the flow and at the best flow,
// nil without a turbine result.
func (b *builder) turbineFacts() []Fact {
	t := b.r.Turbine
	if t == nil {
		return nil
	}
	out := []Fact{
		{ID: "turb-gross", Label: "gross head (levels and pressures)", Value: b.head(t.GrossHead)},
		{Label: "line losses at this flow", Value: b.head(t.Losses)},
		{Label: "velocity head left at the outlet", Value: b.head(t.ExitVelocityHead)},
		{ID: "turb-net", Label: "net head for the turbine", Value: b.head(t.NetHead), Key: true},
		{Label: "hydraulic power (before the machine)", Value: b.show(t.HydraulicPower, calc.Power)},
	}
	if best := b.r.BestTurbine; best != nil {
		out = append(out,
			Fact{ID: "turb-best", Label: "most output: at " + b.param("q", best.Q), Value: b.show(best.Power, calc.Power), Key: true},
			Fact{Label: "net head at that flow", Value: b.head(best.NetHead)},
		)
	}
	return append(out, b.hydroFacts(t)...)
}
