package present

import (
	"errors"
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// lineView is the pipe between the points as segments, their losses and
// the grade lines.
func (b *builder) lineView() []Card {
	return []Card{b.lineCard(), b.profileCard(), b.segmentTableCard(), b.segmentList()}
}

// lineCard is the line's answer: its total loss at the flow.
func (b *builder) lineCard() Card {
	n := b.d.ShownSegments()
	a := &Answer{Label: "Friction and fittings", NoneID: "line-loss"}
	facts := Block{Kind: BlockEmpty}
	br := b.r.Balance
	if br == nil || br.Line == nil {
		a.None, a.Why = true, "Describe the pipe below as segments, from point 1 to point 2."
		if n > 0 {
			a.Why = b.whyNone(scenario.PartBalance)
		}
	} else {
		l := br.Line
		a.Label = "Friction and fittings at " + b.param("q", br.Q)
		if l.ComponentLoss != 0 {
			a.Label = "Friction, fittings and components at " + b.param("q", br.Q)
		}
		a.Values = []Value{{"line-loss", b.head(l.TotalLoss)}}
		if l.Transitional && l.TotalLossLow != l.TotalLossHigh {
			a.Subs = []string{"transitional flow in the line: between " + b.head(l.TotalLossLow) + " and " + b.head(l.TotalLossHigh)}
		}
		length := ""
		if len(br.Profile) > 0 {
			length = b.param("l", br.Profile[len(br.Profile)-1].Distance)
		}
		facts = Block{Kind: BlockFacts, Facts: []Fact{
			{Label: "pipe friction", Value: b.head(l.MajorLoss)},
			{Label: "fittings", Value: b.head(l.MinorLoss)},
			{Label: "changes of diameter", Value: b.head(l.TransitionLoss)},
			{Label: "length of the line", Value: length},
			{Label: "segments", Value: strconv.Itoa(len(l.Segments))},
		}}
		if l.ComponentLoss != 0 {
			facts.Facts = append(facts.Facts, Fact{Label: "components (by name in the loss table)", Value: b.head(l.ComponentLoss)})
		}
		facts.Facts = append(facts.Facts, b.highPointFacts()...)
	}
	isLine := func(w scenario.Warning) bool {
		n, _ := scenario.SegmentOf(w.Param)
		return w.Topic == "line" || n > 0 || w.Segment > 0
	}
	return Card{ID: "line-card", Class: "answer-card", Title: "Line, point 1 to point 2", Blocks: []Block{
		{Kind: BlockAnswer, ID: "answer", Answer: a}, facts, fields(b.pumpPlace(n)), b.warnings(isLine),
	}}
}

// fullFlowAnswer is the Balance view's answer when it solves for the flow
// and the column breaks at a high point: the flow of the balance needs a
// full pipe past it, so the headline is the largest flow the line carries
// full, with the balance's figure below it. ok is false otherwise.
func (b *builder) fullFlowAnswer() (a Answer, ok bool) {
	br := b.r.Balance
	if br == nil || b.solve() != "q" || !b.brokenColumn() {
		return a, false
	}
	if !br.FullFlowKnown {
		if why := b.fullFlowFailed(); why != "" {
			return Answer{Label: "Flow (the unknown): the most the line carries full was not found",
				Values: []Value{{"answer-value", "not found"}},
				Subs:   []string{why, "a full pipe would carry " + b.param("q", br.Q)}}, true
		}
		return Answer{Label: "Flow (the unknown): the line cannot run full",
			Values: []Value{{"answer-value", "none full"}},
			Subs:   []string{"below vapour pressure — column breaks at a high point even with no flow (see the warning); a full pipe would carry " + b.param("q", br.Q)}}, true
	}
	return Answer{Label: "Flow (the unknown): the most the line carries full",
		Values: []Value{{"answer-value", b.param("q", br.FullFlow)}},
		Subs: []string{"limited by a high point, where the pressure would fall below vapour pressure — column breaks beyond this flow (see the warning)",
			"the balance with the pipe full past the high point would give " + b.param("q", br.Q) + ", which it cannot carry"}}, true
}

// fullFlowFailed words why the largest full flow was not found, "" when
// it was, or when none exists (the column breaks even with no flow).
func (b *builder) fullFlowFailed() string {
	br := b.r.Balance
	var fe *calc.FieldError
	if br.FullFlowKnown || br.FullFlowErr == nil || errors.As(br.FullFlowErr, &fe) && fe.Reason == calc.ReasonColumnBreaksNoFlow {
		return ""
	}
	if fe == nil {
		return br.FullFlowErr.Error()
	}
	return ErrorText(fe, b.us)
}

// brokenColumn reports whether the column breaks at a high point.
func (b *builder) brokenColumn() bool {
	for _, hp := range b.r.Balance.HighPoints {
		if hp.Breaks {
			return true
		}
	}
	return false
}

// highPointFacts are the line card's facts on its high points.
func (b *builder) highPointFacts() []Fact {
	br := b.r.Balance
	var out []Fact
	for i, hp := range br.HighPoints {
		where := "high point, start"
		switch {
		case hp.AtPump:
			where = "pump inlet, end"
		case hp.AtEnd:
			where = "high point, end"
		}
		v := b.head(hp.BelowCrown) + " below the pipe crown (below atmospheric)"
		if hp.Breaks {
			v = "below vapour pressure — column breaks"
		}
		out = append(out, Fact{ID: "high-point-" + strconv.Itoa(i+1), Label: where + " of segment " + strconv.Itoa(hp.Segment) +
			" (" + b.param("l", hp.Distance) + " from point 1)", Value: v})
	}
	if b.brokenColumn() {
		v := "none: the column breaks even with no flow"
		if why := b.fullFlowFailed(); why != "" {
			v = "not found: " + why
		}
		if br.FullFlowKnown {
			v = b.param("q", br.FullFlow) + " (the surplus head taken by a valve at point 2)"
		}
		out = append(out, Fact{ID: "full-flow", Label: "largest flow the line carries full", Value: v, Key: true})
	}
	return out
}

// pumpPlace is the choice of where the pump sits on the line.
func (b *builder) pumpPlace(n int) Field {
	f := b.field("pafter", FieldPicker, "", "")
	cur, _ := b.d.Box("pafter")
	cur = strings.TrimSpace(cur)
	choices := []scenario.Choice{}
	for k := 0; k <= n; k++ {
		v := strconv.Itoa(k)
		label := "after segment " + v
		switch {
		case k == 0:
			label = "at point 1, before segment 1"
		case k == n:
			label += ", at point 2"
		}
		choices = append(choices, scenario.Choice{Value: v, Label: label})
	}
	f.Options = choiceOptions(choices, cur, "not given: after segment 1, or at point 1 with one segment")
	for i := range f.Options {
		if strings.HasSuffix(f.Options[i].Text, "(not recognised)") {
			f.Options[i].Text = cur + " (not a segment of this line)"
		}
	}
	return f
}

// pumpAfter is the segment the pump follows as the link gives it, or by
// the vocabulary's default: after segment 1 when there are two or more,
// else at point 1. −1 when pafter cannot be read.
func (b *builder) pumpAfter() int {
	if v := b.in.Choice("pafter"); v != "" {
		k, err := strconv.Atoi(v)
		if err != nil || k < 0 {
			return -1
		}
		return k
	}
	if b.in.Segments > 1 {
		return 1
	}
	return 0
}

// profileCard holds the grade-line chart.
func (b *builder) profileCard() Card {
	ch := b.profileChart("profile-chart", "Dashed: the energy grade line (total head). Accent: the hydraulic grade line, one velocity head below it; its height above the pipe is the pressure head in the pipe. Dotted: the level at which the pressure in the pipe would fall to the liquid's vapour pressure; the hydraulic grade line must stay well above it.")
	if ch.Kind == BlockEmpty {
		ch = text("muted", "", "Drawn once the line has a result.")
	}
	return Card{ID: "profile-card", Class: "chart-card", Title: "Energy and hydraulic grade lines", Blocks: []Block{ch}}
}

// profileChart is the grade lines along the line in display units, an
// empty block without a line.
func (b *builder) profileChart(id, caption string) Block {
	br := b.r.Balance
	if br == nil || len(br.Profile) == 0 {
		return Block{Kind: BlockEmpty}
	}
	lu, zu := displayUnit("l", b.us), displayUnit("z1", b.us)
	n := len(br.Profile)
	dist, z, egl, hgl := make([]float64, n), make([]float64, n), make([]float64, n), make([]float64, n)
	for i, p := range br.Profile {
		dist[i], z[i], egl[i], hgl[i] = lu.FromSI(p.Distance), zu.FromSI(p.Z), zu.FromSI(p.EGL), zu.FromSI(p.HGL)
	}
	ch := &Chart{ID: id, Kind: "profile", Caption: caption,
		Title:  "Along the line at " + b.param("q", br.Q),
		XLabel: "distance from point 1 (" + lu.Symbol + ")",
		YLabel: "elevation and head (" + zu.Symbol + ", gauge basis)",
		Curves: []Curve{
			{Role: RolePipe, Name: "pipe elevation", X: dist, Y: z},
			{Role: RoleEGL, Name: "energy grade line (EGL)", X: dist, Y: egl},
			{Role: RoleHGL, Name: "hydraulic grade line (HGL)", X: dist, Y: hgl},
		}}
	if len(b.r.VapourLine) == n {
		v := make([]float64, n)
		for i, y := range b.r.VapourLine {
			v[i] = zu.FromSI(y)
		}
		ch.Curves = append(ch.Curves, Curve{Role: RoleVapour, Name: "vapour-pressure line", X: dist, Y: v})
	}
	first, last := br.Profile[0], br.Profile[n-1]
	ch.Markers = append(ch.Markers, Marker{X: dist[0], Y: zu.FromSI(first.Z), Label: "1"}, Marker{X: dist[n-1], Y: zu.FromSI(last.Z), Label: "2"})
	if k := b.pumpAfter(); br.PumpHead > 0 && k >= 0 {
		for i, p := range br.Profile {
			if p.Segment == k+1 {
				ch.Markers = append(ch.Markers, Marker{X: dist[i], Y: egl[i], Label: "pump", Pump: true})
				break
			}
		}
	}
	return Block{Kind: BlockChart, ID: id, Chart: ch}
}

// displayUnit is the unit a parameter is shown in.
func displayUnit(param string, us bool) calc.Unit {
	u, err := calc.LookupUnit(scenario.DefaultUnit(param, us))
	if err != nil {
		return calc.Unit{Factor: 1}
	}
	return u
}

// segmentTableCard is the table of losses by segment.
func (b *builder) segmentTableCard() Card {
	c := Card{ID: "seg-results", Title: "Losses by segment"}
	t := b.segmentTable()
	if br := b.r.Balance; br != nil && br.Line != nil {
		c.Title += " at " + b.param("q", br.Q)
	}
	c.Blocks = []Block{t}
	return c
}

// segmentTable lists each segment's flow and losses; an empty block
// without a line.
func (b *builder) segmentTable() Block {
	br := b.r.Balance
	if br == nil || br.Line == nil {
		return Block{Kind: BlockEmpty}
	}
	l := br.Line
	cols := []string{"segment", "velocity", "Reynolds number", "regime", "friction factor f", "pipe friction", "fittings (ΣK)", "change of diameter"}
	// A line of one bore has no losses at changes of diameter: a column of
	// zeros would only push the table past a tablet's width.
	changes := l.TransitionLoss != 0
	if !changes {
		cols = cols[:len(cols)-1]
	}
	hasCmp := false
	t := &Table{ID: "seg-table", Class: "grid figures", Head: cols}
	cell := func(col int, text string) Cell { return Cell{Text: text, Label: cols[col]} }
	for i, r := range l.Segments {
		f := number(r.Friction, 4)
		if r.FrictionLow != r.FrictionHigh {
			f = number(r.FrictionLow, 4) + "–" + number(r.FrictionHigh, 4)
		}
		t.Rows = append(t.Rows, Row{Head: "segment " + strconv.Itoa(i+1), Cells: []Cell{
			cell(1, b.show(r.Velocity, calc.Velocity)),
			cell(2, plainNumber(r.Reynolds)),
			{Text: r.Regime.String(), Label: cols[3], Badge: "rg rg-" + r.Regime.String()},
			cell(4, f),
			cell(5, b.head(r.MajorLoss)),
			cell(6, b.head(r.MinorLoss)+" ("+number(r.SumK, 3)+")"),
		}})
		if changes {
			last := &t.Rows[len(t.Rows)-1]
			last.Cells = append(last.Cells, cell(7, b.head(r.TransitionLoss)))
		}
		// A component is a row of its own under its segment, so the
		// table keeps its width on a tablet.
		for _, c := range r.Components {
			hasCmp = true
			t.Rows = append(t.Rows, Row{Head: "segment " + strconv.Itoa(i+1) + " component " + c.Name + ": " + b.head(c.Head) +
				" (" + b.show(c.Pressure, calc.Pressure) + ")", HeadSpan: len(cols), Class: "cmp"})
		}
	}
	total := "friction and fittings, point 1 to point 2"
	t.Foot = []Row{{Head: "whole line", HeadSpan: 5, Class: "sum", Cells: []Cell{
		cell(5, b.head(l.MajorLoss)), cell(6, b.head(l.MinorLoss))}}}
	if changes {
		t.Foot[0].Cells = append(t.Foot[0].Cells, cell(7, b.head(l.TransitionLoss)))
	}
	if hasCmp {
		total = "friction, fittings and components, point 1 to point 2"
		t.Foot = append(t.Foot, Row{Head: "components: " + b.head(l.ComponentLoss), HeadSpan: len(cols), Class: "sum cmp"})
	}
	t.Foot = append(t.Foot, Row{Head: total, HeadSpan: 5, Class: "sum total", Cells: []Cell{
		{ID: "seg-total", Text: b.head(l.TotalLoss), Span: len(cols) - 5}}})
	return Block{Kind: BlockTable, Table: t}
}

// segmentList is the ordered list of segment cards from point 1 to point
// 2, with the pump where it sits.
func (b *builder) segmentList() Card {
	n := b.d.ShownSegments()
	pump := b.pumpAfter()
	br := b.r.Balance
	hasPump := b.solve() == "hp" || b.in.Given("hp") || b.in.Given("pq")
	elev := func(p string, z float64) string {
		switch {
		case br != nil:
			return "elevation " + b.param(p, z) + " (on the Balance view)"
		case b.in.Given(p):
			return "elevation " + b.asEntered(p) + " (on the Balance view)"
		}
		return "elevation not given (on the Balance view)"
	}
	var z1, z2 float64
	if br != nil {
		z1, z2 = br.In.Z, br.Out.Z
	}
	pumpNode := func() Block {
		detail := "(its data sheet is on the Pump view)"
		if b.in.Given("zp") {
			detail = "centreline " + b.asEntered("zp")
		}
		return Block{Kind: BlockNode, Node: &Node{ID: "pump-node", Num: "▲", Title: "Pump", Detail: detail, Pump: true}}
	}
	blocks := []Block{{Kind: BlockNode, Node: &Node{ID: "node-1", Num: "1", Title: "Point 1", Detail: elev("z1", z1)}}}
	for i := 1; i <= n; i++ {
		if pump == i-1 && hasPump {
			blocks = append(blocks, pumpNode())
		}
		c := b.segmentCard(i, n)
		blocks = append(blocks, Block{Kind: BlockCard, Card: &c})
	}
	if pump == n && n > 0 && hasPump {
		blocks = append(blocks, pumpNode())
	}
	blocks = append(blocks, Block{Kind: BlockNode, Node: &Node{ID: "node-2", Num: "2", Title: "Point 2", Detail: elev("z2", z2)}})
	label := "Add a segment"
	if n == 0 && b.in.Given("l") {
		label = "Make the pipe run segment 1"
	}
	blocks = append(blocks, Block{Kind: BlockButtons, Buttons: []Button{{ID: "seg-add", Text: "+ " + label, Class: "act",
		Disabled: n >= scenario.MaxSegments, Act: Action{Do: "seg-add"}}}})
	blocks = append(blocks, b.surveyBox())
	return Card{ID: "segments", Class: "seglist", Title: "Segments, in the direction of flow", Blocks: blocks}
}

// surveyBox is where a survey table is pasted to make the segments.
func (b *builder) surveyBox() Block {
	lu, zu := scenario.DefaultUnit("l", b.us), scenario.DefaultUnit("z1", b.us)
	return Block{Kind: BlockSurvey, Survey: &Survey{ID: "survey-text", Title: "Make the segments from a survey",
		Label: "Chainage and elevation, one point a line (" + lu + ", " + zu + ")",
		Hint: "Paste two columns from a spreadsheet (tab, semicolon or comma separated). A header row is skipped; length units it names, as in “Chainage (ft)”, are used for their column. " +
			"Each pair of points becomes a segment: its length the slope length between them, its end the second point's elevation. " +
			"Segments already here keep their pipe, fittings and components; new ones take the last segment's pipe, and the exit moves to the new last segment.",
		Text: b.d.Survey, Made: b.d.SurveyMade, Status: b.d.PipeStatus(), Notes: b.d.SurveyNotes, Open: len(b.d.SurveyNotes) > 0 || b.d.SurveyMade != "",
		Button: Button{ID: "survey-paste", Text: "Make the segments", Class: "act"}, Pipe: b.givePipe()}}
}

// givePipe is the button giving segment 1's pipe to the segments without
// one; none when every segment has its own, disabled (saying why) while
// segment 1 has none to give.
func (b *builder) givePipe() Button {
	without := b.d.WithoutPipe()
	if len(without) == 0 {
		return Button{}
	}
	bt := Button{ID: "survey-pipe", Text: "Give segment 1's pipe to the others", Class: "act",
		Hint: "to " + strconv.Itoa(len(without)) + " segment" + map[bool]string{true: "", false: "s"}[len(without) == 1] + " without a pipe or a wall of its own; none already given is replaced"}
	if !b.d.HasPipe(1) {
		bt.Disabled, bt.Hint = true, "segment 1 has no pipe to give yet"
	}
	return bt
}

// segmentCard is one segment's inputs and its figures at the flow.
func (b *builder) segmentCard(n, count int) Card {
	num := strconv.Itoa(n)
	p := func(f string) string { return scenario.SegmentParam(n, f) }
	zHint := ""
	if n == count {
		zHint = "(blank: at point 2)"
	}
	confirm := ""
	for _, f := range scenario.SegmentFields {
		if b.in.Given(p(f)) {
			confirm = "Remove segment " + num + " and its values?"
		}
	}
	c := Card{ID: "seg-" + num, Class: "seg", Num: num, Title: "Segment " + num, Controls: []Button{
		{ID: "seg-up-" + num, Text: "↑", Label: "move segment " + num + " up", Class: "step", Disabled: n == 1, Act: Action{Do: "seg-move", N: n, Step: -1}},
		{ID: "seg-down-" + num, Text: "↓", Label: "move segment " + num + " down", Class: "step", Disabled: n == count, Act: Action{Do: "seg-move", N: n, Step: +1}},
		{ID: "seg-del-" + num, Text: "✕", Label: "remove segment " + num, Class: "step", Confirm: confirm, Act: Action{Do: "seg-remove", N: n}},
	}}
	blocks := []Block{fields(b.quantity(p("l"), "", ""), b.quantity(p("z"), "", zHint)), b.toggle(p("pipe"))}
	if b.d.SideOf(p("pipe")) == "d" {
		blocks = append(blocks, fields(b.quantity(p("d"), "", "")))
	} else {
		blocks = append(blocks, b.pipePickers(scenario.SegmentParam(n, "")))
	}
	blocks = append(blocks, b.toggle(p("rough")))
	if b.d.SideOf(p("rough")) == "eps" {
		blocks = append(blocks, fields(b.quantity(p("eps"), "", "")))
	} else {
		blocks = append(blocks, fields(b.picker(p("mat"), "", "choose…")))
	}
	blocks = append(blocks, b.fittings(p("fit")), fields(b.plain(p("k"), "", "", true)))
	line := ""
	if br := b.r.Balance; br != nil && br.Line != nil && n <= len(br.Line.Segments) {
		r := br.Line.Segments[n-1]
		line = "velocity " + b.show(r.Velocity, calc.Velocity) + " · Re " + plainNumber(r.Reynolds) + " (" + r.Regime.String() +
			") · pipe friction " + b.head(r.MajorLoss) + " + fittings " + b.head(r.MinorLoss)
		if r.TransitionLoss != 0 {
			line += " + change of diameter " + b.head(r.TransitionLoss)
		}
		if len(r.Components) > 0 {
			line += " + components: " + b.componentText(r.Components)
		}
	}
	cmp := b.plain(p("cmp"), "", "", false)
	note := "A drop given at a rated flow scales with the flow squared (rated on the liquid in service). A valve's Kv (m³/h at 1 bar) or Cv (US gal/min at 1 psi) is the one at its present opening."
	if b.us {
		cmp.Placeholder = "chiller:6.5psi@190gpm, valve:cv46"
		note = "A drop given at a rated flow scales with the flow squared (rated on the liquid in service). A valve's Cv (US gal/min at 1 psi) is the one at its present opening."
	}
	blocks = append(blocks, fields(cmp), text("muted", "", note))
	c.Blocks = append(blocks, text("computed", "seg-line-"+num, line))
	return c
}

// componentText lists components' drops by name, as heads and pressures
// in the sheet's units.
func (b *builder) componentText(cs []calc.ComponentLoss) string {
	parts := make([]string, len(cs))
	for i, c := range cs {
		parts[i] = c.Name + " " + b.head(c.Head) + " (" + b.show(c.Pressure, calc.Pressure) + ")"
	}
	return strings.Join(parts, "; ")
}

// lineSummary stands in the Balance view for the single run's inputs when
// the friction comes from a line of segments.
func (b *builder) lineSummary(n int) Block {
	what := "Friction and fittings come from the line of " + strconv.Itoa(n) + " segments"
	if n == 1 {
		what = "Friction and fittings come from the line of 1 segment"
	}
	t := what + ": shown once the balance has an answer."
	if br := b.r.Balance; br != nil && br.Line != nil {
		l := br.Line
		cmp := ""
		if l.ComponentLoss != 0 {
			cmp = " + components " + b.head(l.ComponentLoss)
		}
		t = what + ": pipe friction " + b.head(l.MajorLoss) + " + fittings " + b.head(l.MinorLoss) +
			" + changes of diameter " + b.head(l.TransitionLoss) + cmp + " = " + b.head(l.TotalLoss)
	}
	return Block{Kind: BlockText, ID: "line-total", Class: "computed", Text: t, Buttons: []Button{
		{ID: "to-line", Text: "Open the Line view", Class: "act", Act: Action{Do: "choose", Param: "view", Value: "line"}}}}
}

// fittings is the fitting editor of p ("fit", "s2.fit").
func (b *builder) fittings(p string) Block {
	b.shown[p] = true
	v, ok := b.in.Value(p)
	list := v.Fittings
	f := &Fittings{Param: p, AddID: "add-fit", Usable: ok || !b.in.Given(p), Open: b.in.Bad(p) || b.r.Errors[p] != nil}
	if p != "fit" {
		f.AddID = "add-" + DomID(p)
	}
	used := map[string]calc.FittingK{}
	for _, k := range b.fittingKs(p) {
		used[k.Key] = k
	}
	for _, fc := range list {
		name := fittingName(fc.Key)
		k := ""
		if u, ok := used[fc.Key]; ok {
			k = "K " + number(u.K, 3) + " each (" + u.Method
			if u.Formula != "" && u.Method != "given" {
				k += ", " + u.Formula
			}
			k += ")"
		}
		f.Items = append(f.Items, Fitting{Key: fc.Key, Name: name, Count: fc.Count, K: k,
			Less: Button{Text: "−", Label: "one fewer " + name, Class: "step", Act: Action{Do: "fit-step", Param: p, Value: fc.Key, N: -1}},
			More: Button{Text: "+", Label: "one more " + name, Class: "step", Act: Action{Do: "fit-step", Param: p, Value: fc.Key, N: +1}},
		})
	}
	f.Add = append([]Option{{"", "Add a fitting…", true}}, choiceOptions(scenario.Choices("fit"), "", "")...)
	f.AsText = b.plain(p, "key:count, comma separated", "", false)
	return Block{Kind: BlockFittings, Fittings: f}
}

// fittingName is the name of a fitting key.
func fittingName(key string) string {
	for _, c := range scenario.Choices("fit") {
		if c.Value == key {
			return c.Label
		}
	}
	return key
}

// asEntered is a value as typed, its number and unit spaced for reading
// ("45L/s" → "45 L/s"); one typed without a unit names the default unit it
// is taken in.
func (b *builder) asEntered(p string) string {
	raw := strings.TrimSpace(b.d.Typed(p))
	row, _, _ := scenario.Lookup(p)
	if row.Kind != scenario.KindQuantity {
		return raw
	}
	num, unit := scenario.Split(raw)
	switch {
	case num == "":
		return raw
	case unit == "":
		return num + " " + scenario.DefaultUnit(p, b.us) + " (default unit)"
	}
	return num + " " + unit
}

// fittingKs are the loss coefficients the result used for the fittings of
// p ("fit" of the single run, "s2.fit" of a segment), none before there is
// a result.
func (b *builder) fittingKs(p string) []calc.FittingK {
	if p == "fit" {
		if r := b.r.Run; r != nil {
			return r.Fittings
		}
		return nil
	}
	n, _ := scenario.SegmentOf(p)
	if rv := b.r.RunView; rv != nil && rv.Run != nil && rv.Segment == n {
		return rv.Run.Fittings // the Run view's segment, solved alone
	}
	if br := b.r.Balance; br != nil && br.Line != nil && n >= 1 && n <= len(br.Line.Segments) {
		return br.Line.Segments[n-1].Fittings
	}
	if l := b.r.Line; l != nil && n >= 1 && n <= len(l.Segments) {
		return l.Segments[n-1].Fittings
	}
	return nil
}
