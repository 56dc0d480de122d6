package present

import (
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The Report view is the printed sheet of the scenario: every input as
// typed, with its unit, every result, both charts, the warnings, the
// methods and their sources and the share link (which the page fills in,
// with the date). The cautions are the Sheet's, drawn around every view.

// reportView is the Report view.
func (b *builder) reportView() []Card {
	name := b.in.Choice("name")
	if name == "" {
		name = "Untitled sheet"
	}
	system := "SI units"
	if b.us {
		system = "US customary units"
	}
	cards := []Card{
		{ID: "report-head", Class: "rhead", Blocks: []Block{
			text("rtitle", "report-title", name),
			text("rmeta", "", "Fieldhead calculation sheet · "+system),
			text("rdate", "report-date", ""),
		}},
		b.reportInputs(),
		b.reportResults(),
	}
	if c, ok := b.reportCharts(); ok {
		cards = append(cards, c)
	}
	warn := b.allWarnings()
	cards = append(cards,
		Card{ID: "report-warnings", Class: "rsec", Title: "Warnings", Blocks: []Block{
			maybe(len(warn) > 0, Block{Kind: BlockWarnings, Items: warn}),
			maybe(len(warn) == 0, text("", "", "None for these inputs.")),
		}},
		Card{ID: "report-methods", Class: "rsec", Title: "Methods and sources", Blocks: []Block{
			{Kind: BlockList, Class: "methods", Items: b.methodLines()},
		}},
		Card{ID: "report-link", Class: "rsec", Title: "This sheet as a link", Blocks: []Block{
			text("linktext", "report-url", ""),
			text("muted small", "", "Open the link on any device to see and change the same calculation."),
		}},
	)
	return cards
}

// methodLines are the methods and their sources, one line each, in the
// sheet's units.
func (b *builder) methodLines() []string {
	ms := methodsOf(b.us)
	out := make([]string, 0, len(ms))
	for _, m := range ms {
		out = append(out, m.What+": "+m.How)
	}
	return out
}

// inputValue writes a parameter's text for the sheet: with the default
// unit named when none was typed, lists spaced, fittings and choices in
// words.
func (b *builder) inputValue(p string) string {
	raw := strings.TrimSpace(b.d.Typed(p))
	base := p
	if _, f := scenario.SegmentOf(p); f != "" {
		base = f
	}
	switch base {
	case "fit":
		if v, ok := b.in.Value(p); ok && len(v.Fittings) > 0 {
			list := v.Fittings
			parts := make([]string, 0, len(list))
			for _, e := range list {
				parts = append(parts, strconv.Itoa(e.Count)+" × "+fittingName(e.Key))
			}
			return strings.Join(parts, "; ")
		}
		return raw
	case "pq", "ph", "peff", "pnpsh":
		cells, unit := b.d.Cells(p)
		if unit == "" {
			unit = scenario.DefaultUnit(p, b.us)
		}
		return strings.Join(cells, ", ") + " " + unit
	case "pafter":
		if raw == "0" {
			return "at point 1"
		}
		return "after segment " + raw
	}
	if cs := scenario.Choices(p); len(cs) > 0 {
		for _, c := range cs {
			if c.Value == raw {
				if strings.EqualFold(c.Label, raw) {
					return raw
				}
				return c.Label + " (" + raw + ")"
			}
		}
		return raw
	}
	return b.asEntered(p)
}

// reportInputs lists every input of the scenario, the segments in a table
// of their own.
func (b *builder) reportInputs() Card {
	t := &Table{ID: "report-inputs", Class: "grid inputs", Head: []string{"input", "in the link", "value as entered"}}
	for _, p := range scenario.Params {
		if p == "view" || p == "name" || !b.in.Given(p) {
			continue
		}
		b.shown[p] = true
		val := Cell{Text: b.inputValue(p), Label: "value as entered", Error: b.problem(p)}
		if val.Error != "" {
			val.ErrorID = "err-" + DomID(p)
		}
		t.Rows = append(t.Rows, Row{Head: scenario.Label(p), Cells: []Cell{{Text: p, Label: "in the link"}, val}})
	}
	n := b.in.Segments
	return Card{ID: "report-inputs-card", Class: "rsec", Title: "Inputs", Blocks: []Block{
		{Kind: BlockTable, Table: t},
		maybe(n > 0, Block{Kind: BlockHeading, Text: "Segments of the line, from point 1"}),
		maybe(n > 0, b.segmentInputs(n)),
		maybe(n > 0, text("muted small", "", "In the link these are sN.l, sN.nps, sN.sch, sN.d, sN.mat, sN.eps, sN.fit, sN.k and sN.z, N being the segment's number.")),
	}}
}

// segmentInputs is one row per segment: its inputs as entered, each cell
// with its parameters' problems.
func (b *builder) segmentInputs(n int) Block {
	cols := []struct {
		head   string
		fields []string
	}{
		{"length", []string{"l"}}, {"pipe", []string{"nps", "sch", "d"}}, {"wall", []string{"mat", "eps"}},
		{"fittings", []string{"fit"}}, {"extra ΣK", []string{"k"}}, {"end elevation", []string{"z"}},
	}
	t := &Table{ID: "report-segments", Class: "grid inputs", Head: []string{"segment"}}
	for _, c := range cols {
		t.Head = append(t.Head, c.head)
	}
	for i := 1; i <= n; i++ {
		row := Row{Head: strconv.Itoa(i)}
		for _, c := range cols {
			var parts, errs []string
			errID := ""
			for _, f := range c.fields {
				p := scenario.SegmentParam(i, f)
				b.shown[p] = true
				if b.in.Given(p) {
					v := b.inputValue(p)
					switch f {
					case "nps":
						// The size in its catalogue's notation (NPS, OD, DN,
						// inch) when the pair names a catalogue pipe.
						v = "size " + v
						if ps := b.pipeOf(scenario.SegmentParam(i, "")); ps != nil {
							v = sizeName(*ps)
						}
					}
					parts = append(parts, v)
				}
				if m := b.problem(p); m != "" {
					errs = append(errs, m)
					if errID == "" {
						errID = "err-" + DomID(p)
					}
				}
			}
			if len(parts) == 0 && c.fields[0] == "z" {
				parts = append(parts, "at point 2")
			}
			row.Cells = append(row.Cells, Cell{Text: strings.Join(parts, "; "), Label: c.head,
				Error: strings.Join(errs, "; "), ErrorID: errID})
		}
		t.Rows = append(t.Rows, row)
	}
	return Block{Kind: BlockTable, Table: t}
}

// reportResults lists every result the scenario has; its blocks keep
// their places whichever results there are.
func (b *builder) reportResults() Card {
	br := b.r.Balance
	var answer, budget Block
	if br != nil {
		label := solveLabels[b.solve()]
		if label == "" {
			label = b.solve()
		}
		main := b.solvedText(br.Value)
		switch p := b.solve(); p {
		case "p1", "p2":
			alt := b.absolute(br.Value)
			if b.in.Choice(p+"ref") == "a" {
				alt = b.gauge(br.Value - b.r.SitePressure)
			}
			main += " (" + alt + ")"
		}
		answer = Block{Kind: BlockFacts, Class: "facts", Facts: []Fact{
			{ID: "report-answer", Label: label + " (the unknown)", Value: main, Key: true},
			{Label: "at a flow of", Value: b.param("q", br.Q)},
			{Label: b.lossesName(), Value: b.head(br.FrictionHead)},
		}}
		if b.isLoop() {
			answer.Facts = append(answer.Facts, Fact{ID: "report-loop", Label: "line", Value: "closed loop: no static head, the pump head is the friction, fittings and components round the loop"})
		}
		if h := b.r.Heat; h != nil {
			answer.Facts = append(answer.Facts, Fact{Label: "heat load carried", Value: b.param("load", h.Load)})
		}
		for _, v := range b.r.Valves {
			st := "not checked for choked flow"
			if c := v.Check; c != nil {
				switch {
				case c.Choked:
					st = "CHOKED (IEC 60534-2-1)"
				case c.Cavitation:
					st = "CAVITATING (IEC 60534-2-1)"
				default:
					st = "not choked (IEC 60534-2-1)"
				}
			}
			answer.Facts = append(answer.Facts, Fact{Label: "valve " + v.Name, Value: "authority " + number(v.Authority.N, 2) + " · " + st,
				Key: v.Check != nil && (v.Check.Choked || v.Check.Cavitation)})
		}
		t := &Table{ID: "report-budget", Class: "grid", Head: []string{"term", "side", "head", "as pressure"}}
		for _, it := range br.Budget {
			if it.Head == 0 {
				continue
			}
			side := "supplied"
			if it.Side < 0 {
				side = "used"
			}
			t.Rows = append(t.Rows, Row{Head: b.budgetLabel(it.Key, it.Label), Cells: []Cell{
				{Text: side, Label: "side"}, {Text: b.head(it.Head), Label: "head"},
				{Text: b.show(it.Pressure, calc.Pressure), Label: "as pressure"},
			}})
		}
		budget = Block{Kind: BlockTable, Table: t}
	} else {
		answer = text("muted", "", "The energy balance has no answer: "+b.whyNone(scenario.PartBalance))
	}
	line := br != nil && br.Line != nil
	kt := b.fittingKTable()

	opFacts := b.operatingFacts()
	var op Block
	if opFacts != nil {
		o := b.r.Pump.Operating
		op = Block{Kind: BlockFacts, Class: "facts", Facts: append([]Fact{
			{ID: "report-op", Label: "flow and head", Value: b.param("q", o.Q) + " at " + b.head(o.H), Key: true},
		}, opFacts...)}
	}
	level, npsh, note := b.npshBlocks()
	fieldFacts := b.fieldFacts()
	energy := b.energyFacts()
	t := b.r.Turbine
	var turb Block
	if t != nil {
		turb = Block{Kind: BlockFacts, Class: "facts", Facts: append([]Fact{
			{ID: "report-turbine", Label: "output at " + b.param("q", t.Q), Value: b.show(t.Power, calc.Power), Key: true},
		}, b.turbineFacts()...)}
	}
	heading := func(ok bool, s string) Block { return maybe(ok, Block{Kind: BlockHeading, Text: s}) }
	liquid := b.liquidFacts()
	// The test at several flows prints its table and tested curve; one
	// reading is the field check above.
	multi := b.r.Test != nil && b.r.Test.HasCurve()
	return Card{ID: "report-results", Class: "rsec", Title: "Results", Blocks: append([]Block{
		heading(liquid != nil, "Liquid"),
		maybe(liquid != nil, Block{Kind: BlockFacts, Class: "facts", Facts: liquid}),
		heading(br != nil, "Energy balance"),
		answer,
		heading(br != nil, "Where the head goes"),
		maybe(br != nil, budget),
		heading(line, "Losses by segment"),
		b.segmentTable(),
		heading(kt.Kind == BlockTable, "Loss coefficients of the fittings"),
		kt,
		heading(opFacts != nil, "Operating point"),
		maybe(opFacts != nil, op),
		heading(b.r.NPSH != nil, "Cavitation check (NPSH)"),
		level, npsh, note,
		heading(fieldFacts != nil, "Field check from gauge readings"),
		maybe(fieldFacts != nil, Block{Kind: BlockFacts, Class: "facts", Facts: fieldFacts}),
		heading(b.r.FieldBands != nil, "How sure the field check is"),
		b.bandBlock(),
		heading(b.r.Acceptance != nil, "Acceptance"),
		b.verdictBlock(),
		b.verdictFacts(),
		heading(multi, "Test at several flows"),
		maybe(multi, b.testTable()),
		maybe(multi, b.testFacts()),
		heading(b.r.Guarantee != nil, "Acceptance by the guarantee point"),
		maybe(b.r.Guarantee != nil, b.guaranteeLevel()),
		b.guaranteeFacts(),
		heading(b.r.Pump != nil && (b.r.Pump.SpeedFor != nil || b.r.Pump.Speed != 1 || b.r.Pump.Rated > 0), "Speed"),
		b.speedFacts(),
		heading(energy != nil, "Energy per volume pumped"),
		maybe(energy != nil, Block{Kind: BlockFacts, Class: "facts", Facts: energy}),
		heading(t != nil, "Turbine"),
		maybe(t != nil, turb),
	}, b.reportSurge()...)}
}

// reportCharts holds both charts; ok is false when there is neither.
func (b *builder) reportCharts() (Card, bool) {
	pump := b.pumpChart("pump-chart", "Pump head curve through the data-sheet points, the line's system curve and the operating point where they meet, the best-efficiency point with the preferred region around it, the measured point and any speed asked for; below, NPSH required and available.")
	profile := b.profileChart("profile-chart", "Pipe elevation, energy and hydraulic grade lines and the vapour-pressure line along the line, from point 1.")
	hasPump, hasProfile := pump.Kind == BlockChart, profile.Kind == BlockChart
	if profile.Text == "" && hasProfile {
		profile.Text = profile.Chart.Caption
	}
	return Card{ID: "report-charts", Class: "rsec charts", Title: "Charts", Blocks: []Block{
		maybe(hasPump, Block{Kind: BlockHeading, Text: "Pump and system curves"}),
		pump,
		// The test's marks in words, after the figure: in its caption the
		// pump chart would no longer fit a Letter page.
		maybe(hasPump && b.r.Test != nil, text("caption", "report-test-marks", "The test on the pump chart above."+b.testCaption())),
		maybe(hasProfile, Block{Kind: BlockHeading, Text: "Energy and hydraulic grade lines"}),
		profile,
	}}, hasPump || hasProfile
}

// fittingKTable lists, for the report, the loss coefficient used for each
// fitting of the line's segments (or of the single run) and the method
// that gave it; an empty block when no fitting was computed.
func (b *builder) fittingKTable() Block {
	type where struct {
		name string
		ks   []calc.FittingK
	}
	var all []where
	if br := b.r.Balance; br != nil && br.Line != nil {
		for i, sg := range br.Line.Segments {
			all = append(all, where{"segment " + strconv.Itoa(i+1), sg.Fittings})
		}
	} else if r := b.r.Run; r != nil && b.in.Segments == 0 {
		all = append(all, where{"pipe run", r.Fittings})
	}
	cols := []string{"where", "fitting", "count", "K each", "method"}
	// Left-aligned and wrapping (as the inputs): the method column holds
	// formulas.
	t := &Table{ID: "report-fitting-k", Class: "grid inputs", Head: cols}
	for _, w := range all {
		for _, k := range w.ks {
			method := k.Method
			if k.Formula != "" && k.Method != "given" {
				method += ", " + k.Formula
			}
			t.Rows = append(t.Rows, Row{Head: w.name, Cells: []Cell{
				{Text: fittingName(k.Key), Label: cols[1]},
				{Text: strconv.Itoa(k.Count), Label: cols[2]},
				{Text: number(k.K, 3), Label: cols[3]},
				{Text: method, Label: cols[4]},
			}})
		}
	}
	if len(t.Rows) == 0 {
		return Block{Kind: BlockEmpty}
	}
	return Block{Kind: BlockTable, Table: t}
}
