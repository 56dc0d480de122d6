package present

import (
	"errors"
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"
)

// The Run view (link value view=regime, kept from its first name): the
// loss of one run — the single run, or any segment of the line — at the
// flow, the K of each of its fittings, and the same run in every size of a
// pipe class with the sizes inside the velocity band and under the
// loss-gradient limit marked.

// runInputs are the inputs of the single pipe run; withFlow adds the flow
// (the Run view has no other place for it).
func (b *builder) runInputs(withFlow bool) []Block { return b.runFields("", withFlow) }

// runFields are the inputs of the run with prefix pre ("" the single
// run, "s2." segment 2).
func (b *builder) runFields(pre string, withFlow bool) []Block {
	var first []Field
	if withFlow {
		first = append(first, b.quantity("q", "", ""))
	}
	first = append(first, b.quantity(pre+"l", "Length of the run", ""))
	out := []Block{fields(first...), b.toggle(pre + "pipe")}
	if b.d.SideOf(pre+"pipe") == "d" {
		out = append(out, fields(b.quantity(pre+"d", "", "")))
	} else {
		out = append(out, b.pipePickers(pre))
	}
	out = append(out, b.toggle(pre+"rough"))
	if b.d.SideOf(pre+"rough") == "eps" {
		out = append(out, fields(b.quantity(pre+"eps", "", "")))
	} else {
		out = append(out, fields(b.picker(pre+"mat", "", "choose…")))
	}
	out = append(out, b.fittings(pre+"fit"), fields(b.plain(pre+"k", "", "", true), b.picker("fm", "", "")))
	if b.in.Choice("fm") == calc.MethodHazenWilliams.String() {
		out = append(out, fields(b.plain("chw", "", "", true)))
	}
	return out
}

// runSegment is the segment of the line the Run view shows, 0 for the
// single run.
func (b *builder) runSegment() int {
	if rv := b.r.RunView; rv != nil {
		return rv.Segment
	}
	n := b.in.Segments
	if n == 0 {
		return 0
	}
	return b.in.RunSegment()
}

// pipeOf is the pipe size the run of prefix pre ("" or "s2.") names by
// nominal size and schedule, nil when it names none or it is in error.
func (b *builder) pipeOf(pre string) *calc.PipeSize {
	if b.in.Side(pre+"pipe") == "d" {
		return nil
	}
	for _, p := range []string{pre + "nps", pre + "sch"} {
		if v, ok := b.in.Value(p); ok && v.Pipe != nil {
			return v.Pipe
		}
	}
	return nil
}

// regimeView is the Run view: the loss of the run shown, its inputs, the
// sizing table and the liquid.
func (b *builder) regimeView() []Card {
	seg := b.runSegment()
	in := Card{ID: "run", Class: "run", Title: "Pipe run", Blocks: b.runInputs(true)}
	if seg > 0 {
		pre := scenario.SegmentParam(seg, "")
		in.Title = "Segment " + strconv.Itoa(seg) + " of the line"
		in.Blocks = append([]Block{text("muted", "", "What is changed here changes segment "+strconv.Itoa(seg)+" of the line (Line view) too.")},
			b.runFields(pre, true)...)
	}
	return []Card{b.runCard(seg), in, b.sizingCard(), b.liquidCard()}
}

// segmentPicker is the choice of the segment the Run view shows, each
// named by its length and pipe as typed.
func (b *builder) segmentPicker(seg int) Block {
	n := b.in.Segments
	if n == 0 {
		return Block{Kind: BlockEmpty}
	}
	f := b.field("rseg", FieldPicker, "Segment shown", "")
	var cs []scenario.Choice
	for k := 1; k <= n; k++ {
		pre := scenario.SegmentParam(k, "")
		label := "segment " + strconv.Itoa(k)
		if b.in.Given(pre + "l") {
			label += ": " + b.asEntered(pre+"l")
		}
		ps := b.pipeOf(pre)
		switch {
		case ps != nil:
			label += ", " + sizeName(*ps) + " " + scenario.ClassName(ps.Catalogue, ps.Schedule)
		case b.in.Given(pre + "d"):
			label += ", " + b.asEntered(pre+"d") + " bore"
		}
		cs = append(cs, scenario.Choice{Value: strconv.Itoa(k), Label: label})
	}
	cur := b.in.Choice("rseg")
	if cur == "" {
		cur = strconv.Itoa(seg)
	}
	f.Options = choiceOptions(cs, cur, "")
	return fields(f)
}

// runCard headlines the run's loss: head lost and pressure drop at the
// flow, then how it splits, the K of each fitting and the flow's regime.
func (b *builder) runCard(seg int) Card {
	c := Card{ID: "run-answer", Class: "answer-card", Title: "Loss in the run"}
	if seg > 0 {
		c.Title = "Loss in segment " + strconv.Itoa(seg)
	}
	picker := b.segmentPicker(seg)
	var r *scenario.RunResult
	if rv := b.r.RunView; rv != nil {
		r = rv.Run
	}
	fl := b.r.Fluid
	if r == nil || fl == nil {
		c.Blocks = []Block{picker, {Kind: BlockAnswer, ID: "answer", Answer: &Answer{None: true, NoneID: "answer-value", Why: b.whyNone(scenario.PartRunView)}},
			Block{Kind: BlockEmpty}, Block{Kind: BlockEmpty}, b.warnings(nil, "run", "runview", "liquid")}
		return c
	}
	dp := r.PressureDrop
	a := &Answer{Label: "Lost at " + b.param("q", r.Flow) + ": head, and pressure drop",
		Values: []Value{{"answer-value", b.head(r.TotalLoss)}, {"run-dp", b.show(dp, calc.Pressure)}},
		Subs:   []string{"pipe friction " + b.head(r.MajorLoss) + " + fittings " + b.head(r.MinorLoss) + " (ΣK " + number(r.SumK, 3) + ")"}}
	if r.TotalLossLow != r.TotalLossHigh {
		a.Subs = append(a.Subs, "transitional flow: between "+b.head(r.TotalLossLow)+" and "+b.head(r.TotalLossHigh)+"; the larger is shown")
	}
	friction := number(r.Friction, 4)
	if r.FrictionLow != r.FrictionHigh {
		friction += " (between " + number(r.FrictionLow, 4) + " and " + number(r.FrictionHigh, 4) + ")"
	}
	pipe := b.param("d", r.Diameter) + " inside"
	if r.Pipe != nil {
		pipe = sizeName(*r.Pipe) + ", " + scenario.ClassName(r.Pipe.Catalogue, r.Pipe.Schedule) + " (" + r.Pipe.Standard + "): " + pipe
	}
	rough := b.param("eps", r.Roughness)
	if r.Material != nil {
		rough += " (" + r.Material.Name + ")"
	}
	facts := []Fact{
		{ID: "run-grad", Label: "pipe friction per " + hundred(b.us), Value: b.perHundred(r.Gradient), Key: true},
		{ID: "run-v", Label: "mean velocity", Value: b.show(r.Velocity, calc.Velocity)},
		{ID: "run-re", Label: "Reynolds number and regime", Value: plainNumber(r.Reynolds) + ", " + r.Regime.String() + " flow"},
		{Label: "Darcy friction factor f", Value: friction},
		{Label: "kinetic-energy factor α", Value: number(r.Alpha, 3)},
		{Label: "pipe", Value: pipe},
		{Label: "roughness", Value: rough},
		{Label: "length", Value: b.param("l", r.Length)},
	}
	c.Blocks = []Block{picker, {Kind: BlockAnswer, ID: "answer", Answer: a},
		{Kind: BlockFacts, ID: "run-facts", Class: "facts", Facts: facts},
		b.runKTable(r),
		b.warnings(nil, "run", "runview", "liquid")}
	return c
}

// perHundred is "per 100 m" or "per 100 ft".
func perHundred(us bool) string { return "per " + strings.TrimSuffix(hundred(us), " of pipe") }

// short writes a default for a hint: two significant digits.
func (b *builder) short(v float64, dim calc.Dimension) string {
	return minus(calc.FormatValue(v, calc.DefaultUnit(dim, b.us).Symbol, 2))
}

// perHundred writes a friction gradient (m per m) as the head lost over
// 100 of the sheet's length unit, in that unit: 0.005 is 0.5 m per 100 m
// and 0.5 ft per 100 ft (not 100 m's head written in ft).
func (b *builder) perHundred(gradient float64) string {
	return b.head(gradient * 100 * calc.DefaultUnit(calc.Length, b.us).Factor)
}

// hundred is "100 m" or "100 ft" of pipe.
func hundred(us bool) string {
	if us {
		return "100 ft of pipe"
	}
	return "100 m of pipe"
}

// runKTable lists the run's fittings with the K used for each at the
// run's size and the head they lose; an empty block without fittings.
func (b *builder) runKTable(r *scenario.RunResult) Block {
	if len(r.Fittings) == 0 {
		return Block{Kind: BlockEmpty}
	}
	// How each K is found (method and formula) is in the fitting editor.
	cols := []string{"fitting", "number", "K each", "head lost"}
	// A plain grid: names wrap in the answer's narrow column, and on the
	// narrowest phones each name stands above its three figures.
	t := &Table{ID: "run-fits", Class: "grid", Head: cols}
	for _, k := range r.Fittings {
		t.Rows = append(t.Rows, Row{Head: fittingName(k.Key), Cells: []Cell{
			{Text: strconv.Itoa(k.Count), Label: cols[1]},
			{Text: number(k.K, 3), Label: cols[2]},
			{Text: b.head(k.Head), Label: cols[3]},
		}})
	}
	return Block{Kind: BlockTable, Table: t}
}

// sizingCard is the run in every size of a pipe class at the flow, with
// the sizes inside the velocity band and under the loss-gradient limit
// marked.
func (b *builder) sizingCard() Card {
	def := calc.DefaultSizingLimitsFor(b.us)
	per := perHundred(b.us)
	grad := b.plain("grad", "", "("+per+"; blank: "+number(def.GradientMax*100, 1)+", common practice)", true)
	lo := b.quantity("vlo", "", "(blank: "+limit(b.short(def.VelocityLow, calc.Velocity))+", common practice)")
	hi := b.quantity("vhi", "", "(blank: "+limit(b.short(def.VelocityHigh, calc.Velocity))+")")
	rv := b.r.RunView
	var sz *scenario.Sizing
	if rv != nil {
		sz = rv.Sizing
	}
	blank := "the run's own class"
	if sz != nil && !b.in.Given("szsch") {
		blank += ": " + scenario.ClassName(sz.Catalogue.Key, sz.Class)
	}
	c := Card{ID: "sizing", Class: "sizing", Title: "Sizes compared", Blocks: []Block{
		fields(b.picker("szsch", "", blank)),
		fields(lo, hi, grad),
	}}
	if sz == nil {
		why := "Needs the run's result above, and a pipe class to compare (the run's own when it is picked by size)."
		if rv != nil && rv.Run != nil && !b.in.Given("szsch") {
			why = "Pick the pipe class whose sizes to compare."
		}
		return appendBlocks(c, text("muted", "sizing-why", why), Block{Kind: BlockEmpty}, Block{Kind: BlockEmpty})
	}
	c.Title = "Sizes compared at " + b.param("q", rv.Run.Flow)
	return appendBlocks(c, text("computed", "sizing-what", b.sizingNote(rv, sz)), b.sizingTable(rv, sz),
		text("note-text", "sizing-marks", "✓ fits: within the velocity band "+b.short(sz.Limits.VelocityLow, calc.Velocity)+" to "+
			b.short(sz.Limits.VelocityHigh, calc.Velocity)+" and a pipe friction of at most "+number(sz.Limits.GradientMax*100, 3)+
			" "+per+" (defaults: common practice for water lines, from memory; set your own above). "+
			"A size that fits both is a starting point: cost, surge, standard stock and local codes decide."))
}

func appendBlocks(c Card, bs ...Block) Card { c.Blocks = append(c.Blocks, bs...); return c }

// sizingNote says what is kept from the run while the size changes.
func (b *builder) sizingNote(rv *scenario.RunView, sz *scenario.Sizing) string {
	r := rv.Run
	t := sz.Catalogue.Name + ", " + scenario.ClassName(sz.Catalogue.Key, sz.Class) + " (" + sz.Catalogue.Standard + "): the run's " +
		b.param("l", r.Length) + ", its roughness " + b.param("eps", r.Roughness) + " and its fittings in each size, the fittings' K worked out for each size"
	for _, p := range []string{"steel", "ss", "pvc"} {
		if sz.Catalogue.Key == p {
			return t
		}
	}
	return t + "; this catalogue's sizes are from memory"
}

// sizingTable is the sizing table, from the smallest size whose velocity
// is at most twice the band's top to the first below half its bottom
// (the rest are far from any choice).
func (b *builder) sizingTable(rv *scenario.RunView, sz *scenario.Sizing) Block {
	// The marks come next to the size, where a narrow screen still shows
	// them without scrolling the table.
	cols := []string{"size", "marks", "inside diameter", "velocity", "Reynolds number", "pipe friction, " + perHundred(b.us), "loss of the run"}
	t := &Table{ID: "sizing-table", Class: "grid figures wide", Head: cols}
	lim := sz.Limits
	here := rv.Run.Diameter
	for _, row := range sz.Rows {
		r := row.Run
		if row.Err == nil && (r.Velocity > 2*lim.VelocityHigh || r.Velocity < lim.VelocityLow/2) && !sameBore(row.Pipe.ID, here) {
			continue
		}
		name := sizeName(row.Pipe)
		switch {
		case b.us && row.Pipe.Catalogue == "pe":
			name = "ISO 4427 size " + row.Pipe.NPS // a designation; its figure is in mm
		case row.Pipe.DN > 0:
			name = "NPS " + row.Pipe.NPS // the DN is in the run's facts; the table is kept narrow
		}
		cls, this := "", ""
		if sameBore(row.Pipe.ID, here) {
			cls, this = "here", " · this run"
		}
		if row.Err != nil {
			t.Rows = append(t.Rows, Row{Head: name, Class: cls, Cells: []Cell{
				{Text: "not worked out: " + b.errWords(row.Err) + this, Label: cols[1]},
				{Text: b.param("d", row.Pipe.ID), Label: cols[2]},
				{Text: "—", Label: cols[3], Span: 4}}})
			continue
		}
		mark := Cell{Label: cols[1]}
		switch {
		case row.Fits():
			mark.Text, mark.Badge = "✓ fits", "rg"
		default:
			var why []string
			if !row.InBand {
				if r.Velocity > lim.VelocityHigh {
					why = append(why, "velocity high")
				} else {
					why = append(why, "velocity low")
				}
			}
			if !row.UnderMax {
				why = append(why, "friction high")
			}
			mark.Text = strings.Join(why, ", ")
		}
		mark.Text += this
		t.Rows = append(t.Rows, Row{Head: name, Class: cls, Cells: []Cell{
			mark,
			{Text: b.param("d", row.Pipe.ID), Label: cols[2]},
			{Text: b.show(r.Velocity, calc.Velocity), Label: cols[3]},
			{Text: plainNumber(r.Reynolds), Label: cols[4]},
			{Text: b.perHundred(row.Gradient), Label: cols[5]},
			{Text: b.head(r.TotalLoss), Label: cols[6]},
		}})
	}
	return Block{Kind: BlockTable, Table: t}
}

// sameBore reports whether two inside diameters are the same to 0.05 mm.
func sameBore(a, b float64) bool { return a-b < 0.05e-3 && b-a < 0.05e-3 }

// errWords words an error from calc in the sheet's units.
func (b *builder) errWords(err error) string {
	var fe *calc.FieldError
	if errors.As(err, &fe) {
		return fe.Words(b.figure)
	}
	return err.Error()
}

// sizingMethod is the Methods entry of the sizing table, its defaults in
// the sheet's units.
func sizingMethod(us bool) string {
	lim := calc.DefaultSizingLimitsFor(us)
	v := calc.DefaultUnit(calc.Velocity, us).Symbol
	per := strings.TrimSuffix(hundred(us), " of pipe")
	return "the run's length, roughness, fittings and friction method kept and evaluated in each size of one pipe class, the fittings' K worked out for each size; " +
		"sizes marked inside a velocity band (default " + limit(minus(calc.FormatValue(lim.VelocityLow, v, 2))) + " to " + limit(minus(calc.FormatValue(lim.VelocityHigh, v, 2))) +
		") and under a pipe-friction limit (default " + number(lim.GradientMax*100, 1) + " per " + per + "); the defaults are common practice for water lines, from memory, and may be set per sheet."
}
