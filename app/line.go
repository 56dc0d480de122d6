package main

import (
	"fmt"
	"strconv"
	"strings"

	"fieldhead/calc"
	"fieldhead/calc/scenario"

	"github.com/maxence-charriere/go-app/v10/pkg/app"
)

// The Line view: the pipe between the points as an ordered list of
// segments (sN. parameters), their losses and the EGL/HGL profile.

// segmentLabels name a segment's fields in words.
var segmentLabels = map[string]string{
	"l": "length", "d": "inside diameter", "nps": "nominal size", "sch": "schedule", "mat": "material",
	"eps": "roughness", "fit": "fittings", "k": "extra ΣK", "z": "elevation of its end",
}

// runFields are the single run's parameters, which become segment 1's when
// a line is started from the run.
var runFields = []string{"l", "d", "nps", "sch", "mat", "eps", "fit", "k"}

// allParams lists every parameter a sheet may hold: the vocabulary's and
// every segment's.
func allParams() []string {
	out := append([]string(nil), scenario.Params...)
	for n := 1; n <= scenario.MaxSegments; n++ {
		for _, f := range scenario.SegmentFields {
			out = append(out, scenario.SegmentParam(n, f))
		}
	}
	return out
}

// segmentOf splits a segment parameter "s3.d" into 3 and "d".
func segmentOf(p string) (int, string, bool) {
	if !strings.HasPrefix(p, "s") {
		return 0, "", false
	}
	num, f, ok := strings.Cut(p[1:], ".")
	if !ok {
		return 0, "", false
	}
	n, err := strconv.Atoi(num)
	if err != nil || n < 1 {
		return 0, "", false
	}
	return n, f, true
}

// labelOf names a parameter in words.
func labelOf(p string) string {
	if n, f, ok := segmentOf(p); ok {
		return fmt.Sprintf("segment %d %s", n, segmentLabels[f])
	}
	if l := paramLabels[p]; l != "" {
		return l
	}
	return p
}

// segmentCount is the number of segments in the scenario: the highest N
// with any sN. parameter.
func (s *sheet) segmentCount() int {
	n := 0
	for i := 1; i <= scenario.MaxSegments; i++ {
		for _, f := range scenario.SegmentFields {
			if s.scen.Has(scenario.SegmentParam(i, f)) {
				n = i
				break
			}
		}
	}
	return n
}

// shownSegments is the number of segment cards: those in the scenario and
// a new one still empty.
func (s *sheet) shownSegments() int {
	return max(s.segmentCount(), s.segs)
}

// pumpAfter is the segment the pump follows as the link gives it (pafter),
// or by the vocabulary's default: after segment 1 when there are two or
// more, else at point 1. -1 when pafter cannot be read.
func (s *sheet) pumpAfter() int {
	if v := strings.TrimSpace(s.scen.Get("pafter")); v != "" {
		k, err := strconv.Atoi(v)
		if err != nil || k < 0 {
			return -1
		}
		return k
	}
	if s.segmentCount() > 1 {
		return 1
	}
	return 0
}

// segState is everything the sheet holds for one segment: the link's text,
// the boxes and pickers, and the either/or choices.
type segState struct {
	raw, box, pick map[string]string
	mode           map[string]string
}

func (s *sheet) takeSegment(n int) segState {
	st := segState{raw: map[string]string{}, box: map[string]string{}, pick: map[string]string{}, mode: map[string]string{}}
	for _, f := range scenario.SegmentFields {
		p := scenario.SegmentParam(n, f)
		st.raw[f], st.box[f], st.pick[f] = s.scen.Get(p), s.box[p], s.pick[p]
	}
	for _, g := range []string{"pipe", "rough"} {
		st.mode[g] = s.mode["s"+strconv.Itoa(n)+"."+g]
	}
	return st
}

func (s *sheet) putSegment(n int, st segState) {
	for _, f := range scenario.SegmentFields {
		p := scenario.SegmentParam(n, f)
		_ = s.scen.Set(p, st.raw[f])
		s.box[p], s.pick[p] = st.box[f], st.pick[f]
	}
	for _, g := range []string{"pipe", "rough"} {
		s.mode["s"+strconv.Itoa(n)+"."+g] = st.mode[g]
	}
}

// onSegMove swaps segment n with its neighbour (delta −1 up, +1 down). The
// pump keeps its place in the order (after the same number of segments).
func (s *sheet) onSegMove(n, delta int) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("moving a segment")
		m := n + delta
		if m < 1 || m > s.shownSegments() {
			return
		}
		a, b := s.takeSegment(n), s.takeSegment(m)
		s.putSegment(n, b)
		s.putSegment(m, a)
		s.changed()
	}
}

// onSegRemove removes segment n; the later ones move up a number, and a
// pump after a removed segment moves up with them.
func (s *sheet) onSegRemove(n int) app.EventHandler {
	return func(ctx app.Context, e app.Event) {
		defer s.contain("removing a segment")
		count := s.shownSegments()
		has := false
		for _, f := range scenario.SegmentFields {
			has = has || s.scen.Has(scenario.SegmentParam(n, f))
		}
		if has && !app.Window().Call("confirm", fmt.Sprintf("Remove segment %d and its values?", n)).Bool() {
			return
		}
		for i := n; i < count; i++ {
			s.putSegment(i, s.takeSegment(i+1))
		}
		s.putSegment(count, segState{})
		s.segs = count - 1
		if v := strings.TrimSpace(s.scen.Get("pafter")); v != "" {
			if k, err := strconv.Atoi(v); err == nil && k >= n && k > 0 {
				s.setParam("pafter", strconv.Itoa(k-1))
			}
		}
		s.changed()
	}
}

// onSegAdd adds a segment at the end. The first segment of a sheet that has
// a single pipe run takes that run over (a link holds one or the other);
// a later one starts with the previous segment's pipe and wall.
func (s *sheet) onSegAdd(ctx app.Context, e app.Event) {
	defer s.contain("adding a segment")
	count := s.shownSegments()
	if count >= scenario.MaxSegments {
		return
	}
	if count == 0 && s.scen.Has("l") {
		st := segState{raw: map[string]string{}, box: map[string]string{}, pick: map[string]string{}, mode: map[string]string{}}
		for _, f := range runFields {
			st.raw[f], st.box[f], st.pick[f] = s.scen.Get(f), s.box[f], s.pick[f]
			_ = s.scen.Set(f, "")
			delete(s.box, f)
			delete(s.pick, f)
		}
		st.mode["pipe"], st.mode["rough"] = s.mode["pipe"], s.mode["rough"]
		s.putSegment(1, st)
		_ = s.scen.Set("hf", "") // the line now sets the friction; the box keeps the text
		s.segs = 1
		s.changed()
		return
	}
	next := count + 1
	if count > 0 {
		prev := s.takeSegment(count)
		st := segState{raw: map[string]string{}, box: map[string]string{}, pick: map[string]string{}, mode: prev.mode}
		for _, f := range []string{"d", "nps", "sch", "mat", "eps"} {
			st.raw[f], st.box[f], st.pick[f] = prev.raw[f], prev.box[f], prev.pick[f]
		}
		s.putSegment(next, st)
	}
	s.segs = next
	s.changed()
}

// lineInputs are the parameters the line's result depends on.
func (s *sheet) lineInputs() []string {
	out := balanceInputs()
	for n := 1; n <= s.shownSegments(); n++ {
		for _, f := range scenario.SegmentFields {
			out = append(out, scenario.SegmentParam(n, f))
		}
	}
	return out
}

// lineView is the Line view.
func (s *sheet) lineView() app.UI {
	return app.Div().Class("stack").Body(
		app.Div().Class("duo").Body(s.lineCard(), s.profileCard()),
		s.segmentTable(),
		s.segmentList(),
	)
}

// lineCard is the line's answer: its total loss at the flow.
func (s *sheet) lineCard() app.UI {
	us := s.us()
	n := s.shownSegments()
	body := []app.UI{app.H2().Text("Line, point 1 to point 2")}
	b := s.res.Balance
	if b == nil || b.Line == nil {
		why := "Describe the pipe below as segments, from point 1 to point 2."
		if n > 0 {
			why = s.toCheck(s.lineInputs()...)
		}
		body = append(body, app.Div().Class("answer").ID("answer").Body(
			app.Div().Class("answer-label").Text("Friction and fittings"),
			app.Div().Class("answer-value none").ID("line-loss").Text("—"),
			app.Div().Class("answer-sub").ID("answer-why").Text(why)))
	} else {
		l := b.Line
		ans := []app.UI{
			app.Div().Class("answer-label").Text("Friction and fittings at " + scenario.ShowParam("q", b.Q, us)),
			app.Div().Class("answer-value").ID("line-loss").Text(scenario.Show(l.TotalLoss, calc.Length, us)),
		}
		if l.Transitional && l.TotalLossLow != l.TotalLossHigh {
			ans = append(ans, app.Div().Class("answer-sub").Text("transitional flow in the line: between "+
				scenario.Show(l.TotalLossLow, calc.Length, us)+" and "+scenario.Show(l.TotalLossHigh, calc.Length, us)))
		}
		length := ""
		if len(b.Profile) > 0 {
			length = scenario.ShowParam("l", b.Profile[len(b.Profile)-1].Distance, us)
		}
		body = append(body, app.Div().Class("answer").ID("answer").Body(ans...),
			app.Dl().Class("facts").Body(
				fact("pipe friction", scenario.Show(l.MajorLoss, calc.Length, us)),
				fact("fittings", scenario.Show(l.MinorLoss, calc.Length, us)),
				fact("changes of diameter", scenario.Show(l.TransitionLoss, calc.Length, us)),
				fact("length of the line", length),
				fact("segments", strconv.Itoa(len(l.Segments))),
			))
	}
	body = append(body, s.pumpPlace(n))
	body = append(body, s.lineWarnings()...)
	return app.Section().Class("card answer-card").ID("line-card").Body(body...)
}

// lineWarnings are the warnings about the line: its own and those about a
// segment's parameter, whatever part of the result raised them.
func (s *sheet) lineWarnings() []app.UI {
	var items []app.UI
	for _, w := range s.warnings() {
		_, _, seg := segmentOf(w.Param)
		if (w.Topic == "line" || w.Topic == "" || seg) && !s.warned[w.Text] {
			s.warned[w.Text] = true
			items = append(items, app.Li().Text(w.String()))
		}
	}
	if len(items) == 0 {
		return nil
	}
	return []app.UI{app.Div().Class("warnbox").Attr("role", "note").Body(
		app.Div().Class("warnhead").Body(app.Span().Class("tag").Text("Warning"), app.Text(" Read before using the result")),
		app.Ul().Body(items...),
	)}
}

// pumpPlace is the choice of where the pump sits on the line.
func (s *sheet) pumpPlace(n int) app.UI {
	s.shown["pafter"] = true
	cur := strings.TrimSpace(s.scen.Get("pafter"))
	opts := []app.UI{app.Option().Value("").Selected(cur == "").Text("not given: after segment 1, or at point 1 with one segment")}
	known := cur == ""
	for k := 0; k <= n; k++ {
		v := strconv.Itoa(k)
		label := "after segment " + v
		switch {
		case k == 0:
			label = "at point 1, before segment 1"
		case k == n:
			label += ", at point 2"
		}
		known = known || cur == v
		opts = append(opts, app.Option().Value(v).Selected(cur == v).Text(label))
	}
	if !known {
		opts = append(opts, app.Option().Value(cur).Selected(true).Text(cur+" (not a segment of this line)"))
	}
	bad := s.res.Errors["pafter"] != nil
	body := []app.UI{
		app.Label().For("in-pafter").Class("lbl").Body(app.Text("Pump position"), hintUI("(for the profile and the suction side of NPSH)")),
		app.Select().ID("in-pafter").Class(classIf("pick", bad, "bad")).OnChange(s.onChoice("pafter")).Body(opts...),
	}
	body = append(body, s.fieldNotes("pafter")...)
	return app.Div().Class(classIf("field", bad, "has-err")).ID("f-pafter").Body(body...)
}

// profileCard holds the EGL/HGL chart.
func (s *sheet) profileCard() app.UI {
	body := []app.UI{app.H2().Text("Energy and hydraulic grade lines")}
	c := s.profileChart()
	if c == nil {
		body = append(body, app.P().Class("muted").Text("Drawn once the line has a result."))
	} else {
		body = append(body, chartFigure("profile-chart", c,
			"Dashed: the energy grade line (total head). Accent: the hydraulic grade line, one velocity head below it; its height above the pipe is the pressure head in the pipe. Dotted: the level at which the pressure in the pipe would fall to the liquid's vapour pressure; the hydraulic grade line must stay well above it."))
	}
	return app.Section().Class("card chart-card").ID("profile-card").Body(body...)
}

// segmentTable is the card of segmentGrid.
func (s *sheet) segmentTable() app.UI {
	b := s.res.Balance
	if b == nil || b.Line == nil {
		return nil
	}
	return app.Section().Class("card").ID("seg-results").Body(
		app.H2().Text("Losses by segment at "+scenario.ShowParam("q", b.Q, s.us())),
		s.segmentGrid(),
	)
}

// segmentGrid lists each segment's flow and losses.
func (s *sheet) segmentGrid() app.UI {
	b := s.res.Balance
	if b == nil || b.Line == nil {
		return nil
	}
	us := s.us()
	l := b.Line
	cols := []string{"segment", "velocity", "Reynolds number", "regime", "friction factor f", "pipe friction", "fittings (ΣK)", "change of diameter"}
	var head []app.UI
	for _, c := range cols {
		head = append(head, app.Th().Scope("col").Text(c))
	}
	// cell is a figure labelled with its column, for the stacked layout on
	// phones (the label is drawn by the stylesheet from data-label).
	cell := func(col int, text string) app.HTMLTd { return app.Td().DataSet("label", cols[col]).Text(text) }
	var rows []app.UI
	for i, r := range l.Segments {
		f := fmt.Sprintf("%.4f", r.Friction)
		if r.FrictionLow != r.FrictionHigh {
			f = fmt.Sprintf("%.4f–%.4f", r.FrictionLow, r.FrictionHigh)
		}
		rows = append(rows, app.Tr().Body(
			app.Th().Scope("row").Text("segment "+strconv.Itoa(i+1)),
			cell(1, scenario.Show(r.Velocity, calc.Velocity, us)),
			cell(2, plainNumber(r.Reynolds)),
			app.Td().DataSet("label", cols[3]).Body(app.Span().Class("rg rg-"+r.Regime.String()).Text(r.Regime.String())),
			cell(4, f),
			cell(5, scenario.Show(r.MajorLoss, calc.Length, us)),
			cell(6, scenario.Show(r.MinorLoss, calc.Length, us)+fmt.Sprintf(" (%.3g)", r.SumK)),
			cell(7, scenario.Show(r.TransitionLoss, calc.Length, us)),
		))
	}
	foot := []app.UI{
		app.Tr().Class("sum").Body(
			app.Th().Scope("row").ColSpan(5).Text("whole line"),
			cell(5, scenario.Show(l.MajorLoss, calc.Length, us)),
			cell(6, scenario.Show(l.MinorLoss, calc.Length, us)),
			cell(7, scenario.Show(l.TransitionLoss, calc.Length, us)),
		),
		app.Tr().Class("sum total").Body(
			app.Th().Scope("row").ColSpan(5).Text("friction and fittings, point 1 to point 2"),
			app.Td().ColSpan(3).ID("seg-total").Text(scenario.Show(l.TotalLoss, calc.Length, us)),
		),
	}
	return app.Div().Class("tablewrap").Body(
		app.Table().Class("grid figures").ID("seg-table").Body(
			app.THead().Body(app.Tr().Body(head...)),
			app.TBody().Body(rows...),
			app.TFoot().Body(foot...),
		))
}

// segmentList is the ordered list of segment cards, from point 1 to point
// 2, with the pump drawn where it sits.
func (s *sheet) segmentList() app.UI {
	us := s.us()
	n := s.shownSegments()
	pump := s.pumpAfter()
	b := s.res.Balance
	node := func(id, num, title, detail string) app.UI {
		return app.Div().Class("node").ID(id).Body(
			app.Span().Class("num").Text(num),
			app.Strong().Text(" "+title),
			app.Span().Class("muted").Text(" "+detail),
		)
	}
	elev := func(p string, z float64) string {
		if b != nil {
			return "elevation " + scenario.ShowParam(p, z, us)
		}
		if s.scen.Has(p) {
			return "elevation " + s.rawShown(p)
		}
		return "elevation not given"
	}
	var z1, z2 float64
	if b != nil {
		z1, z2 = b.In.Z, b.Out.Z
	}
	pumpNode := func() app.UI {
		detail := "(its data sheet is on the Pump view)"
		if s.scen.Has("zp") {
			detail = "centreline " + s.rawShown("zp")
		}
		return app.Div().Class("node pump-node").ID("pump-node").Body(
			app.Span().Class("num").Text("▲"),
			app.Strong().Text(" Pump"),
			app.Span().Class("muted").Text(" "+detail),
		)
	}
	body := []app.UI{
		app.H2().Text("Segments, in the direction of flow"),
		node("node-1", "1", "Point 1", elev("z1", z1)+" (on the Balance view)"),
	}
	for i := 1; i <= n; i++ {
		if pump == i-1 && s.hasPump() {
			body = append(body, pumpNode())
		}
		body = append(body, s.segmentCard(i, n))
	}
	if pump == n && n > 0 && s.hasPump() {
		body = append(body, pumpNode())
	}
	body = append(body, node("node-2", "2", "Point 2", elev("z2", z2)+" (on the Balance view)"))
	label := "Add a segment"
	if n == 0 && s.scen.Has("l") {
		label = "Make the pipe run segment 1"
	}
	body = append(body, app.Button().Type("button").ID("seg-add").Class("act").Disabled(n >= scenario.MaxSegments).
		Text("+ "+label).OnClick(s.onSegAdd))
	return app.Section().Class("seglist").ID("segments").Body(body...)
}

// hasPump reports whether the scenario has a pump on the line: a pump head
// solved for or given, or a data sheet.
func (s *sheet) hasPump() bool {
	return s.solve() == "hp" || s.scen.Has("hp") || s.scen.Has("pq")
}

// segmentCard is one segment's inputs and its figures at the flow.
func (s *sheet) segmentCard(n, count int) app.UI {
	us := s.us()
	pre := "s" + strconv.Itoa(n) + "."
	p := func(f string) string { return pre + f }
	num := strconv.Itoa(n)
	zHint := ""
	if n == count {
		zHint = "(blank: at point 2)"
	}
	ctl := app.Div().Class("segctl").Body(
		app.Button().Type("button").ID("seg-up-"+num).Class("step").Aria("label", "move segment "+num+" up").
			Disabled(n == 1).Text("↑").OnClick(s.onSegMove(n, -1), app.EventScope(n, -1)),
		app.Button().Type("button").ID("seg-down-"+num).Class("step").Aria("label", "move segment "+num+" down").
			Disabled(n == count).Text("↓").OnClick(s.onSegMove(n, +1), app.EventScope(n, +1)),
		app.Button().Type("button").ID("seg-del-"+num).Class("step").Aria("label", "remove segment "+num).
			Text("✕").OnClick(s.onSegRemove(n), app.EventScope(n)),
	)
	body := []app.UI{
		app.Div().Class("seghead").Body(
			app.H2().Body(app.Span().Class("num").Text(num), app.Text(" Segment "+num)),
			ctl,
		),
	}
	pipe := []app.UI{
		app.Div().Class("row2").Body(
			s.quantity(p("l"), "Length", ""),
			s.quantity(p("z"), "Elevation at its end", zHint),
		),
		s.toggle(p("pipe"), "Pipe given by"),
	}
	if s.current(p("pipe")) == "d" {
		pipe = append(pipe, s.quantity(p("d"), "Inside diameter", ""))
	} else {
		pipe = append(pipe, app.Div().Class("row2").Body(
			s.choice(p("nps"), "Nominal size", "choose…"),
			s.choice(p("sch"), "Schedule or class", "choose…"),
		))
	}
	pipe = append(pipe, s.toggle(p("rough"), "Wall roughness from"))
	if s.current(p("rough")) == "eps" {
		pipe = append(pipe, s.quantity(p("eps"), "Absolute roughness", ""))
	} else {
		pipe = append(pipe, s.choice(p("mat"), "Material", "choose…"))
	}
	body = append(body, app.Div().Class("segbody").Body(
		app.Div().Class("segcol").Body(pipe...),
		app.Div().Class("segcol").Body(s.fittingsFor(p("fit")), s.plain(p("k"), "Extra loss coefficient ΣK", "(optional)", true)),
	))
	if b := s.res.Balance; b != nil && b.Line != nil && n <= len(b.Line.Segments) {
		r := b.Line.Segments[n-1]
		line := fmt.Sprintf("velocity %s · Re %s (%s) · pipe friction %s + fittings %s",
			scenario.Show(r.Velocity, calc.Velocity, us), plainNumber(r.Reynolds), r.Regime,
			scenario.Show(r.MajorLoss, calc.Length, us), scenario.Show(r.MinorLoss, calc.Length, us))
		if r.TransitionLoss != 0 {
			line += " + change of diameter " + scenario.Show(r.TransitionLoss, calc.Length, us)
		}
		body = append(body, app.P().Class("computed").ID("seg-line-"+num).Text(line))
	}
	return app.Section().Class("card seg").ID("seg-" + num).Body(body...)
}

// lineSummary stands in the Balance view for the single run's inputs when
// the friction comes from a line of segments.
func (s *sheet) lineSummary(n int) app.UI {
	us := s.us()
	what := fmt.Sprintf("Friction and fittings come from the line of %d segments", n)
	if n == 1 {
		what = "Friction and fittings come from the line of 1 segment"
	}
	text := what + ": shown once the balance has an answer."
	if b := s.res.Balance; b != nil && b.Line != nil {
		l := b.Line
		text = fmt.Sprintf("%s: pipe friction %s + fittings %s + changes of diameter %s = %s",
			what, scenario.Show(l.MajorLoss, calc.Length, us), scenario.Show(l.MinorLoss, calc.Length, us),
			scenario.Show(l.TransitionLoss, calc.Length, us), scenario.Show(l.TotalLoss, calc.Length, us))
	}
	return app.Div().Class("field").ID("f-line").Body(
		app.Div().Class("lbl").Text("Friction head between the points"),
		app.P().Class("computed").ID("line-total").Text(text),
		app.Button().Type("button").ID("to-line").Class("act").Text("Open the Line view").OnClick(s.choose("view", "line")),
	)
}
